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
 * Variables of the steps (the unknowns z the driver steps in; the drops d and θ follow from them):
 * - the potential drop D (K) at most nodes: conduction is linear in D, so a step of the linearised
 *   system is taken where it is exact, and mapped back by d = D^-1(D) (problem/conductivity.ts, dropAt).
 *   For a constant k, D = d: the steps are those of d, bit for bit. Taken in d instead (as before), a step
 *   of a k(T) table that changes k 2000-fold within a few kelvin turned w/κ into a jump across the table
 *   (the line search halved ~18 times a step, and continuation crawled: fuzz case
 *   wild-conductivity-table-hang.yaml).
 * - the ambient variable u = sign(θ) |θ/θ_b|^(n+1) when n < 0 at nodes with |θ| < |θ_b|/4 (chooseVariables):
 *   the convective loss is linear in u, and θ keeps its relative precision down to the underflow, so a fin
 *   that reaches the fluid temperature (dead zone) converges to it (problem/surface-law.ts).
 * With J = Ĵ diag(c) for the column scales c = dU/dz (1 for D up to sign, κ dθ/du for u, floored at
 * COLUMN_FLOOR κ |θ_b| so that nothing under- or overflows; below the floor the coupling it scales is under
 * 1e-20 of the conduction's round-off), the solve stays Ĵ w = -R with tangents (∂loss/∂z)/c; then
 * δD = -w and δu = w / c.
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
import { ambientSlope, ambientVariable, cvLosses, thetaOfAmbient, type FaceLaw } from '../problem/surface-law.js';
import { createTridiagonalSystem, type RowSumSystem, type TridiagonalSolver } from '../linear-algebra/tridiagonal-system.js';
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
  /** True when nodes near the ambient are solved for their ambient variable (n < 0; header). */
  readonly ambientVariables: boolean;
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
/** Smallest column scale of an ambient-variable node, relative to κ |θ_b| (header). */
const COLUMN_FLOOR = 1e-20;
/** A node switches to its ambient variable below this fraction of |θ_b|, and back above twice it. */
const AMBIENT_FRACTION = 0.25;

export interface NewtonOutcome {
  readonly converged: boolean;
  /** Drops d = θ_b - θ and excess temperatures θ of the last iterate, K. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  /**
   * The last iterate's potential drops D(d) (K) and CV losses (W) as the heat rates form them (one-d/newton-heat-rate.ts),
   * so they need not be computed again; null when a node was solved in its ambient variable (its loss formed from u).
   */
  readonly evaluated: { readonly potential: Float64Array; readonly loss: Float64Array } | null;
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

/** State of one iterate: unknowns, drops, temperatures, potential drops, losses, residual and its norms. */
interface State {
  /** The unknowns z_i (header): D_i, or u_i at an ambient-variable node. */
  readonly unknowns: Float64Array;
  /** d_i = θ_b - θ_i, K. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  /** Potential drops D_i = U(θ_b) - U(θ_i), K. */
  readonly potential: Float64Array;
  readonly ratio: Float64Array;
  /** Column scale c_i = |dU_i/dz_i| / k_ref-free: κ_i at a potential node, κ_i dθ/du floored at an ambient one. */
  readonly column: Float64Array;
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
  return stateOver(
    {
      unknowns: new Float64Array(n),
      drop: new Float64Array(n),
      theta: new Float64Array(n),
      potential: new Float64Array(n),
      ratio: new Float64Array(n),
      column: new Float64Array(n),
      loss: new Float64Array(n),
      lossSlope: new Float64Array(n),
      residual: new Float64Array(n),
    },
    n,
  );
}

type StateArrays = Pick<State, 'unknowns' | 'drop' | 'theta' | 'potential' | 'ratio' | 'column' | 'loss' | 'lossSlope' | 'residual'>;

/** The first n entries of an array (itself when it has n). */
export function leading<A extends Float64Array | Uint8Array>(a: A, n: number): A {
  return (a.length === n ? a : a.subarray(0, n)) as A;
}

/** A fresh state on the first n entries of the arrays `a`. */
function stateOver(a: StateArrays, n: number): State {
  return {
    unknowns: leading(a.unknowns, n),
    drop: leading(a.drop, n),
    theta: leading(a.theta, n),
    potential: leading(a.potential, n),
    ratio: leading(a.ratio, n),
    column: leading(a.column, n),
    loss: leading(a.loss, n),
    lossSlope: leading(a.lossSlope, n),
    residual: leading(a.residual, n),
    tip: { value: 0, slope: 0 },
    norm: 0,
    relative: 0,
    heatRate: 0,
    heatRateFloor: 0,
    valid: true,
  };
}

/**
 * The working arrays of Newton solves on meshes of up to `capacity` nodes: the two iterates, the Newton correction,
 * system, solution and scratch, the ambient flags, and room for a setup's conductances and a starting field. A nested
 * solve (one-d/nonlinear-solve.ts) allocates them once for its finest grid, and its coarser starting grids work in
 * their leading entries (`leading`). A solve on a workspace leaves its result (NewtonOutcome's arrays) in it: the
 * next solve on the same workspace overwrites that.
 */
export interface NewtonWorkspace {
  readonly capacity: number;
  readonly iterates: readonly [StateArrays, StateArrays];
  readonly correction: Float64Array;
  readonly system: RowSumSystem;
  readonly solution: Float64Array;
  readonly work: Float64Array;
  readonly ambient: Uint8Array;
  /** K_i, G_i and h_x at the nodes of a setup (newtonSetup) and the drops a solve starts from. */
  readonly conductances: Float64Array;
  readonly convective: Float64Array;
  readonly hNodes: Float64Array;
  readonly start: Float64Array;
}

export function createNewtonWorkspace(capacity: number): NewtonWorkspace {
  return {
    capacity,
    iterates: [createState(capacity), createState(capacity)],
    correction: new Float64Array(capacity),
    system: createTridiagonalSystem(capacity),
    solution: new Float64Array(capacity),
    work: new Float64Array(capacity),
    ambient: new Uint8Array(capacity),
    conductances: new Float64Array(capacity),
    convective: new Float64Array(capacity),
    hNodes: new Float64Array(capacity),
    start: new Float64Array(capacity),
  };
}

/** Fills a state from its unknowns: d, θ, D, κ, losses, residual, norms and the base heat rate (column scales: columnScales). */
function evaluate(setup: NewtonSetup, ambient: Uint8Array, s: State): void {
  const { K, G, law, kirchhoff, boundaries: b } = setup;
  const { unknowns: z, drop, theta, potential: D, loss, residual: R } = s;
  const n = drop.length;
  const last = n - 1;
  const reference = b.base.theta;
  // d = D^-1(z) at every node (one pass over the table), then an ambient-variable node's from its u.
  kirchhoff.dropsAt(z, drop);
  const anyAmbient = setup.ambientVariables;
  for (let i = 0; i < n; i++) {
    if (anyAmbient && ambient[i] === 1) {
      const t = thetaOfAmbient(law, z[i] as number);
      theta[i] = t;
      drop[i] = reference - t;
    } else {
      theta[i] = reference - (drop[i] as number);
    }
  }
  // Fixed temperatures exactly (not through D^-1).
  if (b.base.kind === 'temperature') {
    drop[0] = 0;
    theta[0] = reference;
  }
  if (b.tip.kind === 'temperature') {
    drop[last] = reference - b.tip.theta;
    theta[last] = reference - (drop[last] as number);
  }
  kirchhoff.evaluate(drop, D, s.ratio);
  cvLosses(law, G, setup.mesh.cvSurface, theta, loss, s.lossSlope, anyAmbient ? { flags: ambient, u: z, law } : undefined);
  tipLoss(b, theta[last] as number, s.tip, ambient[last] === 1 ? (z[last] as number) : null);
  const radiates = law.radiative !== 0;
  let norm2 = 0;
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
    // Non-finite, or (with radiation) below absolute zero: not a state.
    if (!Number.isFinite(r) || !Number.isFinite(theta[i] as number) || (radiates && law.ambient_K + (theta[i] as number) < 0)) valid = false;
    norm2 += r * r;
    maxScale = Math.max(maxScale, rowScale);
    previousFlux = flux;
    previousScale = scale;
  }
  s.valid = valid;
  s.norm = Math.sqrt(norm2);
  s.relative = 0;
  // A row whose loss is steep in θ cannot be evaluated more accurately than its slope times the
  // round-off of θ (θ = θ_b - d carries eps |θ_b|; radiation's T = T_amb + θ carries eps T): for n < 0
  // the slope ~ |θ|^n grows without bound as a node approaches the ambient, and that floor rose above
  // 1e-12 of the conduction scale (a converged solve stalled at 1.2e-12 for 50 steps and was called a
  // failure). Such a row is measured against that floor instead, so 1e-12 stays ~4500 round-offs.
  // The rows whose floor is under the conduction scale share its denominator: the largest of their |R_i| is divided
  // once (division is monotone, so that is the largest of their quotients, bit for bit). A row whose |R_i| is at most
  // that largest so far cannot raise the result either way (its quotient is at most common / maxScale): skipped.
  if (maxScale > 0) {
    const thetaScale = Math.abs(reference);
    let common = 0;
    let floored = 0;
    for (let i = 0; i < n; i++) {
      const r = Math.abs(R[i] as number);
      if (r <= common) continue;
      const radiationT = radiates ? Math.abs(law.ambient_K + (theta[i] as number)) : 0;
      let rowFloor: number;
      if (ambient[i] === 1) {
        // At an ambient-variable node the slope is d loss/du, and u carries its own relative precision: only
        // radiation's ε T remains (its θ-slope, 4 ε σ S T^3, times T).
        const radiationSlope = radiates ? 4 * law.radiative * (setup.mesh.cvSurface[i] as number) * radiationT * radiationT * radiationT : 0;
        rowFloor = radiationSlope * radiationT;
      } else {
        rowFloor = Math.abs(s.lossSlope[i] as number) * (thetaScale + radiationT);
      }
      if (rowFloor <= maxScale) common = Math.max(common, r);
      else floored = Math.max(floored, r / Math.max(maxScale, rowFloor));
    }
    s.relative = Math.max(common / maxScale, floored);
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

/**
 * Column scales c_i of an evaluated state (header): κ_i at a potential node, κ_i dθ/du (floored) at an ambient one,
 * written into the state's `column`; κ itself (the state's `ratio`) when no node can be in its ambient variable.
 */
function columnScales(setup: NewtonSetup, ambient: Uint8Array, s: State): Float64Array {
  const { unknowns: z, ratio, column } = s;
  if (!setup.ambientVariables) return ratio;
  const floorScale = COLUMN_FLOOR * Math.abs(setup.boundaries.base.theta);
  for (let i = 0; i < z.length; i++) {
    const kappa = ratio[i] as number;
    column[i] = ambient[i] === 1 ? kappa * Math.max(ambientSlope(setup.law, z[i] as number), floorScale) : kappa;
  }
  return column;
}

/** Newton matrix Ĵ and right-hand side -R of a state (header) with its column scales (columnScales), written into `system`. */
function assembleNewton(setup: NewtonSetup, s: State, column: Float64Array, system: ReturnType<typeof createTridiagonalSystem>): void {
  const { K, boundaries: b } = setup;
  const { lower, diag, upper, rhs, rowSum } = system;
  const { drop, ratio, lossSlope, residual } = s;
  const n = drop.length;
  const last = n - 1;
  // Row i: its tangent, then the conductances K_{i-1} and K_i added in that order; the row sum is the tangent alone.
  for (let i = 0; i < n; i++) {
    const tangent = (lossSlope[i] as number) / (column[i] as number);
    let diagonal = tangent;
    if (i > 0) diagonal += K[i - 1] as number;
    if (i < last) {
      const conductance = K[i] as number;
      diagonal += conductance;
      upper[i] = -conductance;
      lower[i + 1] = -conductance;
    }
    diag[i] = diagonal;
    rowSum[i] = tangent;
    rhs[i] = -(residual[i] as number);
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
    const tip = s.tip.slope / (column[last] as number);
    diag[last] = (diag[last] as number) + tip;
    rowSum[last] = (rowSum[last] as number) + tip;
  }
}

/**
 * z_trial = z + λ δz, keeping fixed temperatures exact; with keepSign, a node whose θ would reach or cross 0
 * goes to a tenth of its θ instead at a potential node (approaching 0 geometrically, as the exact solution
 * does), and to u = 0 at an ambient node (the loss is linear in u: 0 is an ordinary point there).
 */
function step(setup: NewtonSetup, ambient: Uint8Array, from: Float64Array, delta: Float64Array, lambda: number, into: Float64Array): void {
  const n = from.length;
  const b = setup.boundaries;
  const kirchhoff = setup.kirchhoff;
  const reference = b.base.theta;
  for (let i = 0; i < n; i++) {
    const z = (from[i] as number) + lambda * (delta[i] as number);
    into[i] = z;
    if (!setup.keepSign) continue;
    if (ambient[i] === 1) {
      // u has the sign of θ, which keeps that of θ_b: a step across 0 stops at 0 (the loss is linear in u, so
      // u = 0 is an ordinary point; in a dead zone the root is within round-off of it).
      if (z * reference < 0) into[i] = 0;
      continue;
    }
    const before = reference - kirchhoff.dropAt(from[i] as number);
    if (before !== 0 && (reference - kirchhoff.dropAt(z)) * before <= 0) into[i] = kirchhoff.potentialDropAt(reference - 0.1 * before);
  }
  if (b.base.kind === 'temperature') into[0] = 0;
  if (b.tip.kind === 'temperature') into[n - 1] = kirchhoff.potentialDropAt(b.base.theta - b.tip.theta);
}

/**
 * Chooses the variable of every free node with a convective surface (G_i > 0: a node without one, at a sharp
 * tip, has no term linear in u, and its step w / c would be unbounded) from its θ (header), and re-expresses
 * the state's unknowns in it; true when any changed (the state is then re-evaluated). A fixed fraction of θ_b
 * puts every row near the ambient in u, where its residual can vanish (measured: energy balance 2e-15 on a
 * 4001-node cone with n = -1/2; the 2-D rule, loss slope above conduction, left rows in D whose loss is
 * quantised by θ = θ_b - d, and 1e-10). In 2-D the large couplings across a thin section need that rule.
 */
function chooseVariables(setup: NewtonSetup, ambient: Uint8Array, s: State): boolean {
  if (!setup.ambientVariables) return false;
  const b = setup.boundaries;
  const n = ambient.length;
  const threshold = AMBIENT_FRACTION * Math.abs(b.base.theta);
  let changed = false;
  for (let i = 0; i < n; i++) {
    if ((i === 0 && b.base.kind === 'temperature') || (i === n - 1 && b.tip.kind === 'temperature') || !((setup.G[i] as number) > 0)) continue;
    const t = s.theta[i] as number;
    if (ambient[i] === 0 && Math.abs(t) < threshold) {
      ambient[i] = 1;
      s.unknowns[i] = ambientVariable(setup.law, t);
      changed = true;
    } else if (ambient[i] === 1 && Math.abs(t) > 2 * threshold) {
      ambient[i] = 0;
      s.unknowns[i] = s.potential[i] as number;
      changed = true;
    }
  }
  return changed;
}

/** The 1-D fin as a model of the damped Newton driver (newton/damped-newton.ts), working in `workspace` (>= n nodes). */
function newtonModel(setup: NewtonSetup, n: number, solver: TridiagonalSolver | undefined, workspace: NewtonWorkspace): NewtonModel<State> {
  const { lower, diag, upper, rhs, rowSum } = workspace.system;
  const system: RowSumSystem = {
    lower: leading(lower, n),
    diag: leading(diag, n),
    upper: leading(upper, n),
    rhs: leading(rhs, n),
    rowSum: leading(rowSum, n),
  };
  const w = leading(workspace.solution, n);
  const work = leading(workspace.work, n);
  // 1: the node is solved for its ambient variable (shared by every state; changed only in `correction`).
  const ambient = leading(workspace.ambient, n);
  // The driver asks for its two states (current and trial) once.
  const iterates = [...workspace.iterates];
  return {
    linear: setup.linear,
    roundOffRegime: ROUND_OFF_REGIME,
    createState: () => {
      const arrays = iterates.shift();
      if (arrays === undefined) throw new Error('internal: the Newton driver asked for more than two states');
      return stateOver(arrays, n);
    },
    correctionArray: () => leading(workspace.correction, n),
    start: (initial, into) => {
      ambient.fill(0);
      // D(d) of every node; `work` takes the κ that comes with it (not needed here).
      setup.kirchhoff.evaluate(initial, into, work);
    },
    evaluate: (s) => evaluate(setup, ambient, s),
    correction: (s, delta) => {
      if (chooseVariables(setup, ambient, s)) evaluate(setup, ambient, s);
      const column = columnScales(setup, ambient, s);
      assembleNewton(setup, s, column, system);
      const solution = solver ? solver(system) : conservativeThomasInto(system, w, work);
      // Ĵ w = -R with w = δU: δD = -w at a potential node, δu = w / c at an ambient one.
      for (let i = 0; i < n; i++) {
        const wi = solution[i] as number;
        delta[i] = ambient[i] === 1 ? wi / (column[i] as number) : -wi;
      }
    },
    step: (from, delta, lambda, into) => step(setup, ambient, from, delta, lambda, into),
    heatRate: (s) => s.heatRate,
    heatRateFloor: (s, heatRate) => s.heatRateFloor / Math.abs(heatRate),
  };
}

/**
 * Runs damped Newton from the drops `initial` (d = θ_b - θ, K; not modified, not an iterate of `workspace`), in `workspace`
 * when it has room (default: a new one). Never throws on non-convergence: see `failure`.
 */
export function newtonSolve(setup: NewtonSetup, initial: Float64Array, opts: NewtonOptions = {}, workspace?: NewtonWorkspace): NewtonOutcome {
  const n = initial.length;
  const room = workspace !== undefined && n <= workspace.capacity ? workspace : createNewtonWorkspace(n);
  const run = dampedNewton(newtonModel(setup, n, opts.solver, room), initial, {
    maxIterations: opts.maxIterations ?? DEFAULT_MAX_ITERATIONS,
    residualTolerance: opts.residualTolerance ?? DEFAULT_RESIDUAL_TOLERANCE,
    heatRateTolerance: opts.heatRateTolerance ?? DEFAULT_HEAT_RATE_TOLERANCE,
  });
  const { state } = run;
  return {
    converged: run.converged,
    drop: state.drop,
    theta: state.theta,
    evaluated: leading(room.ambient, n).includes(1) ? null : { potential: state.potential, loss: state.loss },
    iterations: run.iterations,
    halvings: run.halvings,
    residual: state.relative,
    heatRateChange: run.heatRateChange,
    failure: run.failure,
  };
}
