/**
 * Damped Newton iteration for the nonlinear 1-D fin on one mesh.
 *
 * Unknowns: the drops below the base excess, d_i = θ_b - θ_i (K), as the linear solver carries them
 * (drop-system.ts): the base conduction is then formed from drops, without cancellation.
 * Residual of CV i (W; heat leaving minus heat entering, sign convention of boundary.ts):
 *   R_i = F_i - F_{i-1} + loss_i (+ base and tip terms, one-d/newton-boundary.ts),
 *   F_i = K_i (D_{i+1} - D_i),  K_i = k_ref A_{i+1/2} / Δx_i  (interface i, one-d/conductance.ts),
 * with D the Kirchhoff potential drop (problem/conductivity.ts) and loss_i the CV's convection and
 * radiation (problem/surface-law.ts). Fixed-temperature rows are constraints, kept exact.
 *
 * Jacobian: ∂R_i/∂θ_j = M_ij κ_j + δ_ij loss'_i, with M the linear conduction matrix (conductances
 * K_i) and κ = k(T)/k_ref. Written J = Ĵ diag(κ), Ĵ = M + diag(loss'_i / κ_i + boundary slopes / κ_i):
 * Ĵ is the linear fin matrix with tangent conductances on its diagonal, a symmetric tridiagonal
 * M-matrix whose row sums are those tangent conductances (>= 0: q is increasing in θ), so the
 * row-sum Thomas solve (conservative-thomas.ts) applies. Step: Ĵ w = -R, δθ_i = w_i / κ_i = -δd_i.
 * For a linear problem started from d = 0 the first step solves the linear solver's drop system
 * (same matrix; the right-hand side θ_b G_i of its rows, formed in the same order except at a
 * convective or infinite tip), so it reproduces the linear solution to the last bit or so.
 *
 * Damping and stopping: the shared driver (newton/damped-newton.ts: Armijo line search, full steps near
 * round-off, here a relative residual <= 1e-10); trial states with non-finite values or a negative
 * absolute temperature are rejected.
 * Convergence (both): relative residual max_i |R_i| / max(max_j s_j, f_i) <= 1e-12, s_j the sum of the
 * magnitudes of the terms of row j (so 1e-12 is a thousand times the round-off floor whatever the
 * grid) and f_i = |dloss_i/dθ_i| (|θ_b| + T_i with radiation) the round-off floor of a row whose loss
 * is steep in θ (evaluate); and the heat-rate change between the last two iterates <= 1e-12 relative, or the heat
 * rate's round-off floor 16 ε_mach (|terms of Q_base|) / |Q| when that is larger. A linear problem
 * is solved by its first step (its heat rate cannot change beyond round-off), so it stops there. */
import type { Mesh1D } from '../../mesh/index.js';
import { conservativeThomasInto } from '../linear-algebra/conservative-thomas.js';
import { tipLoss, type FlowAndSlope, type NonlinearBoundaries } from './newton-boundary.js';
import type { KirchhoffTransform } from '../problem/conductivity.js';
import { cvLosses, type FaceLaw } from '../problem/surface-law.js';
import { createTridiagonalSystem, type TridiagonalSolver } from '../linear-algebra/tridiagonal-system.js';
import { dampedNewton, type NewtonModel } from '../newton/damped-newton.js';

/** Everything about one mesh that the iteration does not change. */
export interface NewtonSetup {
  readonly mesh: Mesh1D;
  /** Interface conductances K_i = k_ref A_{i+1/2} / Δx_i, W/K (n - 1). */
  readonly K: Float64Array;
  /** Convective conductances of the position part of h, G_i = ∫_CV h_x P dx, W/K (n). */
  readonly G: Float64Array;
  readonly law: FaceLaw;
  readonly kirchhoff: KirchhoffTransform;
  readonly boundaries: NonlinearBoundaries;
  /** True when the problem is linear (one step solves it). */
  readonly linear: boolean;
  /**
   * True when no node may change the sign of its θ in one step: n < 0 (the loss ~ |θ|^(n+1), with an
   * infinite slope at θ = 0, sends a plain Newton step from a small θ to -θ (n = -1/2) or beyond)
   * and no radiation sink on the other side of the ambient, so θ cannot legitimately cross 0.
   */
  readonly keepSign: boolean;
}

export interface NewtonOptions {
  readonly maxIterations?: number;
  readonly residualTolerance?: number;
  readonly heatRateTolerance?: number;
  /** Tridiagonal solver; default: the row-sum Thomas solve (conservativeThomasInto). */
  readonly solver?: TridiagonalSolver;
}

export const DEFAULT_MAX_ITERATIONS = 50;
export const DEFAULT_RESIDUAL_TOLERANCE = 1e-12;
export const DEFAULT_HEAT_RATE_TOLERANCE = 1e-12;
const ROUND_OFF_REGIME = 1e-10;
const HEAT_RATE_FLOOR_FACTOR = 16 * Number.EPSILON;

export interface NewtonOutcome {
  readonly converged: boolean;
  /** Drops d = θ_b - θ and excess temperatures θ of the last iterate, K. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  /** Newton steps taken. */
  readonly iterations: number;
  /** Step-length halvings of the line search over all steps. */
  readonly halvings: number;
  /** Final relative residual. */
  readonly residual: number;
  /** Relative heat-rate change of the last step. */
  readonly heatRateChange: number;
  /** Why it stopped when it did not converge. */
  readonly failure: string | null;
}

/** State of one iterate: drops, temperatures, potential drops, losses, residual and its norms. */
interface State {
  /** d_i = θ_b - θ_i, K: the unknowns. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  /** Potential drops D_i = U(θ_b) - U(θ_i), K. */
  readonly potential: Float64Array;
  readonly ratio: Float64Array;
  readonly loss: Float64Array;
  readonly lossSlope: Float64Array;
  readonly residual: Float64Array;
  readonly tip: FlowAndSlope;
  norm: number;
  relative: number;
  heatRate: number;
  heatRateFloor: number;
  valid: boolean;
}

function createState(n: number): State {
  return {
    drop: new Float64Array(n),
    theta: new Float64Array(n),
    potential: new Float64Array(n),
    ratio: new Float64Array(n),
    loss: new Float64Array(n),
    lossSlope: new Float64Array(n),
    residual: new Float64Array(n),
    tip: { value: 0, slope: 0 },
    norm: 0,
    relative: 0,
    heatRate: 0,
    heatRateFloor: 0,
    valid: true,
  };
}

/** Fills a state from its drops: θ, D, κ, losses, residual, norms and the base heat rate. */
function evaluate(setup: NewtonSetup, s: State): void {
  const { K, G, law, kirchhoff, boundaries: b } = setup;
  const { drop, theta, potential: D, loss, residual: R } = s;
  const n = drop.length;
  const last = n - 1;
  const reference = b.base.theta;
  for (let i = 0; i < n; i++) theta[i] = reference - (drop[i] as number);
  kirchhoff.evaluate(drop, D, s.ratio);
  cvLosses(law, G, setup.mesh.cvSurface, theta, loss, s.lossSlope);
  tipLoss(b, theta[last] as number, s.tip);
  let norm2 = 0;
  let maxResidual = 0;
  let maxScale = 0;
  let valid = true;
  let previousFlux = 0;
  let previousScale = 0;
  for (let i = 0; i < n; i++) {
    let flux = 0;
    let scale = 0;
    if (i < last) {
      const k = K[i] as number;
      const d0 = D[i] as number;
      const d1 = D[i + 1] as number;
      flux = k * (d1 - d0);
      scale = k * (Math.abs(d0) + Math.abs(d1));
    }
    let r = flux - previousFlux + (loss[i] as number);
    let rowScale = scale + previousScale + Math.abs(loss[i] as number);
    let constrained = false;
    if (i === 0) {
      if (b.base.kind === 'temperature') constrained = true;
      else {
        // Heat from the wall through the contact, C_b (θ_b - θ_0) = C_b d_0, enters CV 0.
        r -= b.contact * (drop[0] as number);
        rowScale += b.contact * Math.abs(drop[0] as number);
      }
    }
    if (i === last) {
      if (b.tip.kind === 'temperature') constrained = true;
      else {
        r += s.tip.value;
        rowScale += Math.abs(s.tip.value);
      }
    }
    if (constrained) r = 0;
    R[i] = r;
    if (!Number.isFinite(r) || !Number.isFinite(theta[i] as number)) valid = false;
    norm2 += r * r;
    maxResidual = Math.max(maxResidual, Math.abs(r));
    maxScale = Math.max(maxScale, rowScale);
    previousFlux = flux;
    previousScale = scale;
  }
  if (law.radiative !== 0) {
    for (let i = 0; i < n; i++) if (law.ambient_K + (theta[i] as number) < 0) valid = false;
  }
  s.valid = valid;
  s.norm = Math.sqrt(norm2);
  s.relative = maxScale > 0 ? maxResidual / maxScale : 0;
  // A row whose loss is steep in θ cannot be evaluated more accurately than its slope times the
  // round-off of θ (θ = θ_b - d carries eps |θ_b|; radiation's T = T_amb + θ carries eps T): for n < 0
  // the slope ~ |θ|^n grows without bound as a node approaches the ambient, and that floor rose above
  // 1e-12 of the conduction scale (a converged solve stalled at 1.2e-12 for 50 steps and was called a
  // failure). Such a row is measured against that floor instead, so 1e-12 stays ~4500 round-offs.
  if (maxScale > 0) {
    const thetaScale = Math.abs(reference);
    let relative = 0;
    for (let i = 0; i < n; i++) {
      const radiationT = law.radiative !== 0 ? Math.abs(law.ambient_K + (theta[i] as number)) : 0;
      const rowFloor = Math.abs(s.lossSlope[i] as number) * (thetaScale + radiationT);
      relative = Math.max(relative, Math.abs(R[i] as number) / Math.max(maxScale, rowFloor));
    }
    s.relative = relative;
  }
  if (b.base.kind === 'temperature') {
    const k0 = K[0] as number;
    const d0 = D[0] as number;
    const d1 = D[1] as number;
    s.heatRate = k0 * (d1 - d0) + (loss[0] as number);
    s.heatRateFloor = HEAT_RATE_FLOOR_FACTOR * (k0 * (Math.abs(d0) + Math.abs(d1)) + Math.abs(loss[0] as number));
  } else {
    s.heatRate = b.contact * (drop[0] as number);
    s.heatRateFloor = HEAT_RATE_FLOOR_FACTOR * Math.abs(s.heatRate);
  }
}

/** Newton matrix Ĵ and right-hand side -R of a state (header), written into `system`. */
function assembleNewton(setup: NewtonSetup, s: State, system: ReturnType<typeof createTridiagonalSystem>): void {
  const { K, boundaries: b } = setup;
  const { lower, diag, upper, rhs, rowSum } = system;
  const { drop, ratio, lossSlope, residual } = s;
  const n = drop.length;
  const last = n - 1;
  for (let i = 0; i < n; i++) {
    const tangent = (lossSlope[i] as number) / (ratio[i] as number);
    diag[i] = tangent;
    rowSum[i] = tangent;
    rhs[i] = -(residual[i] as number);
  }
  for (let i = 0; i < last; i++) {
    const conductance = K[i] as number;
    diag[i] = (diag[i] as number) + conductance;
    diag[i + 1] = (diag[i + 1] as number) + conductance;
    upper[i] = -conductance;
    lower[i + 1] = -conductance;
  }
  lower[0] = 0;
  upper[last] = 0;
  if (b.base.kind === 'temperature') {
    diag[0] = 1;
    upper[0] = 0;
    rowSum[0] = 1;
    rhs[0] = (ratio[0] as number) * (drop[0] as number); // κ_0 (θ_b - θ_0)
  } else {
    const contact = b.contact / (ratio[0] as number);
    diag[0] = (diag[0] as number) + contact;
    rowSum[0] = (rowSum[0] as number) + contact;
  }
  if (b.tip.kind === 'temperature') {
    diag[last] = 1;
    lower[last] = 0;
    rowSum[last] = 1;
    rhs[last] = (ratio[last] as number) * ((drop[last] as number) - (b.base.theta - b.tip.theta)); // κ (θ_L - θ)
  } else {
    const tip = s.tip.slope / (ratio[last] as number);
    diag[last] = (diag[last] as number) + tip;
    rowSum[last] = (rowSum[last] as number) + tip;
  }
}

/**
 * d_trial = d + λ δd, keeping fixed temperatures exact; with keepSign, a node whose θ would reach or
 * cross 0 goes to a tenth of its θ instead (approaching 0 geometrically, as the exact solution does).
 */
function step(setup: NewtonSetup, from: Float64Array, delta: Float64Array, lambda: number, into: Float64Array): void {
  const n = from.length;
  const b = setup.boundaries;
  const reference = b.base.theta;
  for (let i = 0; i < n; i++) {
    const d = (from[i] as number) + lambda * (delta[i] as number);
    const before = reference - (from[i] as number);
    into[i] = setup.keepSign && before !== 0 && (reference - d) * before <= 0 ? reference - 0.1 * before : d;
  }
  if (b.base.kind === 'temperature') into[0] = 0;
  if (b.tip.kind === 'temperature') into[n - 1] = b.base.theta - b.tip.theta;
}

/** The 1-D fin as a model of the damped Newton driver (newton/damped-newton.ts). */
function newtonModel(setup: NewtonSetup, n: number, solver: TridiagonalSolver | undefined): NewtonModel<State> {
  const system = createTridiagonalSystem(n);
  const w = new Float64Array(n);
  const work = new Float64Array(n);
  return {
    linear: setup.linear,
    roundOffRegime: ROUND_OFF_REGIME,
    createState: () => createState(n),
    start: (initial, into) => into.set(initial),
    evaluate: (s) => evaluate(setup, s),
    correction: (s, delta) => {
      assembleNewton(setup, s, system);
      const solution = solver ? solver(system) : conservativeThomasInto(system, w, work);
      // Ĵ w = -R gives δθ = w / κ, so δd = -w / κ.
      for (let i = 0; i < n; i++) delta[i] = -(solution[i] as number) / (s.ratio[i] as number);
    },
    step: (from, delta, lambda, into) => step(setup, from, delta, lambda, into),
    heatRate: (s) => s.heatRate,
    heatRateFloor: (s, heatRate) => s.heatRateFloor / Math.abs(heatRate),
  };
}

/**
 * Runs damped Newton from the drops `initial` (d = θ_b - θ, K; not modified). Never throws on
 * non-convergence: see `failure`.
 */
export function newtonSolve(setup: NewtonSetup, initial: Float64Array, opts: NewtonOptions = {}): NewtonOutcome {
  const run = dampedNewton(newtonModel(setup, initial.length, opts.solver), initial, {
    maxIterations: opts.maxIterations ?? DEFAULT_MAX_ITERATIONS,
    residualTolerance: opts.residualTolerance ?? DEFAULT_RESIDUAL_TOLERANCE,
    heatRateTolerance: opts.heatRateTolerance ?? DEFAULT_HEAT_RATE_TOLERANCE,
  });
  const { state } = run;
  return {
    converged: run.converged,
    drop: state.drop,
    theta: state.theta,
    iterations: run.iterations,
    halvings: run.halvings,
    residual: state.relative,
    heatRateChange: run.heatRateChange,
    failure: run.failure,
  };
}
