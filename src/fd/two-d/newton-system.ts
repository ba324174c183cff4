/**
 * Damped Newton iteration for the nonlinear 2-D fin on one grid.
 *
 * Unknowns: the drops below the base excess, d_p = θ_b - θ_p (K), at every node (fixed-temperature nodes
 * held exact). Residual of node p (W per unit depth; heat leaving its control volume minus heat entering,
 * sign convention of two-d/boundary.ts):
 *   R_p = sum_q K_pq (D_p - D_q) + sum over its boundaries of the exchange e_p,
 * D the Kirchhoff potential drop U(θ_b) - U(θ) (problem/conductivity.ts), so that the first sum is
 * (K U)_p in difference form; e_p = G_p g(θ_p) θ_p + ε σ S_p (T_p^4 - T_s^4) on a cooled face or tip
 * (problem/surface-law.ts, cvLosses), C_p (θ_p - θ_b) = -C_p d_p through a contact resistance.
 *
 * Jacobian: dR_p/dθ_q = K_pq κ_q + δ_pq e'_p, κ = k(T)/k_ref: J = Ĵ diag(κ) with
 *   Ĵ = K + diag(e'_p / κ_p)   (fixed rows and columns eliminated),
 * the linear scheme's matrix with tangent conductances e'/κ on the boundary nodes. e' > 0 (q increases
 * with θ for n > -1) and κ > 0, so Ĵ is symmetric positive definite with row sums e'/κ plus the couplings
 * to fixed nodes: the linear 2-D solvers apply unchanged (banded Cholesky or MG-preconditioned CG,
 * linear-algebra/auto-solver.ts). This symmetrised form was chosen over a nonsymmetric solve of J (banded LU)
 * because it keeps the linear solver's error control, multigrid and memory, and costs nothing: the column
 * scaling is undone after the solve. Step: Ĵ w = -R, δθ = w / κ, δd = -w / κ.
 * For a linear problem started from d = 0, Ĵ is the linear system's matrix and -R(θ_b) its right-hand
 * side minus A θ_b, so the first step gives the linear solution (to the linear solver's residual).
 *
 * Variables of the steps as in 1-D (one-d/newton-system.ts): the potential drop D at most nodes (δD = -w, mapped
 * back by D^-1), the ambient variable u near the fluid temperature when n < 0 (δu = w / c, c = κ dθ/du floored);
 * the tangent conductances are then (de/dz) / c, the matrix stays symmetric positive definite.
 *
 * Damping and stopping: the driver shared with 1-D (newton/damped-newton.ts: Armijo line search, full
 * steps near round-off, here a relative residual <= 1e-8), non-finite trial states and negative absolute
 * temperatures rejected. Converged when the relative
 * residual max_p (|R_p| - f_p) / max_p s_p <= 1e-10 (s_p the sum of the magnitudes of the terms of row p:
 * each coupling's flow |K_pq (D_q - D_p)| and each exchange; f_p the row's round-off floor,
 * RESIDUAL_FLOOR_FACTOR) and the base heat rate changed by <= 1e-10 relative in the last step (or its
 * round-off floor, 16 ε_mach sum of the base rows' s_p).
 */
import { buildSystem2D, type BoundaryTerms2D, type SideTerms } from './boundary.js';
import { heatRatesFromExchange, type HeatRates2D } from './heat-rate.js';
import { ambientSlope, ambientVariable, cvLosses, thetaOfAmbient } from '../problem/surface-law.js';
import { SIDE_NAMES, type Newton2DSetup, type SideName } from './newton-setup.js';
import { chooseSolverMethod, MAX_BANDED_BYTES, prepareSolver2D, type SolverMethod } from '../linear-algebra/auto-solver.js';
import { bandedCholeskyBytes } from '../linear-algebra/banded-cholesky.js';
import { attemptMgPcg } from '../linear-algebra/pcg.js';
import { dampedNewton, type NewtonModel } from '../newton/damped-newton.js';
import type { Stencil9, System2D } from '../linear-algebra/stencil9.js';

export interface Newton2DOptions {
  readonly maxIterations?: number;
  readonly residualTolerance?: number;
  readonly heatRateTolerance?: number;
  /** Linear solver of the Newton systems (default: chosen by grid shape). */
  readonly method?: SolverMethod | 'auto';
}

export const NEWTON_2D_MAX_ITERATIONS = 50;
export const NEWTON_2D_TOLERANCE = 1e-10;
/** Below this relative residual the full step is taken (the line search cannot see a decrease there). */
const ROUND_OFF_REGIME = 1e-8;
const HEAT_RATE_FLOOR_FACTOR = 16 * Number.EPSILON;
/**
 * A row's residual below 16 ε_mach sum_q |K_pq| (|D_p| + |D_q|) is the backward error of any solve in double
 * precision (each D carries ~ε |D|, multiplied by every coupling); only the part above it counts toward
 * convergence. On ordinary grids the floor is ~1e-13 of the heat flows and changes nothing. Next to a
 * cusped tip (parabolic profiles: cells up to ~1e8 times longer than high) couplings of ~1e11 W/K leave
 * residuals of ~1e-7 of the heat flows, in pairs of opposite sign, that no iteration removes (the linear
 * solver's solution has them too). The steps still solve for the whole residual, so no one-signed imbalance
 * hides under the floor: the energy balance stays at round-off (measured 5e-16 on such grids).
 */
const RESIDUAL_FLOOR_FACTOR = 16 * Number.EPSILON;
/** Smallest column scale of an ambient-variable node, relative to κ |θ_b| (one-d/newton-system.ts). */
const COLUMN_FLOOR = 1e-20;
/** A node in its ambient variable goes back to D when its loss slope falls below this fraction of its conduction. */
const AMBIENT_HYSTERESIS = 0.25;

export interface Newton2DOutcome {
  readonly converged: boolean;
  /** Drops d = θ_b - θ, excess temperatures θ, potential drops D of the last iterate, K. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  readonly potential: Float64Array;
  /** Exchange of every node of each side with the outside, W per unit depth (heat leaving positive). */
  readonly exchange: Record<SideName, Float64Array>;
  readonly iterations: number;
  readonly halvings: number;
  readonly residual: number;
  readonly heatRateChange: number;
  readonly rates: HeatRates2D;
  /** The linear solver of the last step. */
  readonly method: SolverMethod;
  readonly failure: string | null;
}

interface State {
  /** The unknowns z of the driver: D, or u at an ambient-variable node (header). */
  readonly unknowns: Float64Array;
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  readonly potential: Float64Array;
  readonly ratio: Float64Array;
  /** Column scale c_p: κ_p, or κ_p dθ/du floored at an ambient-variable node. */
  readonly column: Float64Array;
  readonly residual: Float64Array;
  readonly scale: Float64Array;
  /** Round-off scale of each row: sum_q |K_pq| (|D_p| + |D_q|), W per depth. */
  readonly floor: Float64Array;
  /** Per side: exchange and its slope de/dθ at the side's nodes. */
  readonly exchange: Record<SideName, Float64Array>;
  readonly slope: Record<SideName, Float64Array>;
  /** θ gathered at each side's nodes (work array of cvLosses), and their ambient-variable flags. */
  readonly sideTheta: Record<SideName, Float64Array>;
  readonly sideAmbient: Record<SideName, Uint8Array>;
  readonly sideU: Record<SideName, Float64Array>;
  norm: number;
  relative: number;
  valid: boolean;
}

function createState(setup: Newton2DSetup): State {
  const n = setup.ops.fixed.length;
  const perSide = (): Record<SideName, Float64Array> => {
    const t = setup.ops.terms;
    return { base: new Float64Array(t.base.nodes.length), face: new Float64Array(t.face.nodes.length), tip: new Float64Array(t.tip.nodes.length) };
  };
  const t = setup.ops.terms;
  return {
    unknowns: new Float64Array(n),
    drop: new Float64Array(n),
    theta: new Float64Array(n),
    potential: new Float64Array(n),
    ratio: new Float64Array(n),
    column: new Float64Array(n),
    residual: new Float64Array(n),
    scale: new Float64Array(n),
    floor: new Float64Array(n),
    exchange: perSide(),
    slope: perSide(),
    sideTheta: perSide(),
    sideAmbient: { base: new Uint8Array(t.base.nodes.length), face: new Uint8Array(t.face.nodes.length), tip: new Uint8Array(t.tip.nodes.length) },
    sideU: perSide(),
    norm: 0,
    relative: 0,
    valid: true,
  };
}

/** Exchange and slope (per θ, or per u at an ambient-variable node) of one side at the state's temperatures (header). */
function sideExchange(setup: Newton2DSetup, ambient: Uint8Array, side: SideTerms, s: State): void {
  const name = side.name as SideName;
  const out = s.exchange[name];
  const slope = s.slope[name];
  switch (side.kind) {
    case 'adiabatic':
    case 'fixed':
      out.fill(0);
      slope.fill(0);
      return;
    case 'convective': {
      const theta = s.sideTheta[name];
      const flags = s.sideAmbient[name];
      const u = s.sideU[name];
      side.nodes.forEach((p, e) => {
        theta[e] = s.theta[p] as number;
        flags[e] = ambient[p] as number;
        u[e] = s.unknowns[p] as number;
      });
      const law = name === 'tip' ? setup.tipLaw : setup.faceLaw;
      cvLosses(law, side.conductance, setup.ops.surfaces[name], theta, out, slope, { flags, u, law: setup.faceLaw });
      return;
    }
    case 'contact':
      side.nodes.forEach((p, e) => {
        const c = side.conductance[e] as number;
        out[e] = -c * (s.drop[p] as number);
        slope[e] = ambient[p] === 1 ? c * ambientSlope(setup.faceLaw, s.unknowns[p] as number) : c;
      });
      return;
    default: {
      const never: never = side.kind;
      throw new Error(`nonlinear 2-D: unknown boundary kind ${String(never)}`);
    }
  }
}

/** Fills a state from its unknowns: d, θ, D, κ, column scales, exchanges, residual, row scales and norms. */
function evaluate(setup: Newton2DSetup, ambient: Uint8Array, s: State): void {
  const { K, terms, fixed, fixedDrop } = setup.ops;
  const { unknowns: z, drop, theta, potential: D, residual: R, scale, floor } = s;
  const n = drop.length;
  const thetaBase = setup.thetaBase;
  const kirchhoff = setup.kirchhoff;
  for (let p = 0; p < n; p++) {
    if (fixed[p] === 1) {
      drop[p] = fixedDrop[p] as number;
      theta[p] = thetaBase - (drop[p] as number);
    } else if (ambient[p] === 1) {
      const t = thetaOfAmbient(setup.faceLaw, z[p] as number);
      theta[p] = t;
      drop[p] = thetaBase - t;
    } else {
      const d = kirchhoff.dropAt(z[p] as number);
      drop[p] = d;
      theta[p] = thetaBase - d;
    }
  }
  kirchhoff.evaluate(drop, D, s.ratio);
  const floorScale = COLUMN_FLOOR * Math.abs(thetaBase);
  for (let p = 0; p < n; p++) {
    const kappa = s.ratio[p] as number;
    s.column[p] = ambient[p] === 1 ? kappa * Math.max(ambientSlope(setup.faceLaw, z[p] as number), floorScale) : kappa;
  }
  conductionInto(K, D, R, scale, floor);
  for (const name of SIDE_NAMES) {
    const side = terms[name];
    sideExchange(setup, ambient, side, s);
    const values = s.exchange[name];
    const slopes = s.slope[name];
    // An exchange steep in θ (h ~ θ^n with n < 0 near the ambient; radiation, whose T = T_amb + θ carries
    // ε_mach T) is known only to its slope times the round-off of θ: part of the row's floor.
    const law = name === 'tip' ? setup.tipLaw : setup.faceLaw;
    const surfaces = setup.ops.surfaces[name];
    side.nodes.forEach((p, e) => {
      const v = values[e] as number;
      R[p] = (R[p] as number) + v;
      scale[p] = (scale[p] as number) + Math.abs(v);
      const radiationT = law.radiative !== 0 ? Math.abs(law.ambient_K + (theta[p] as number)) : 0;
      // At an ambient-variable node the slope is per u, which carries its own precision: only radiation's ε T.
      floor[p] =
        (floor[p] as number) +
        (ambient[p] === 1 ? 4 * law.radiative * (surfaces[e] ?? 0) * radiationT ** 4 : Math.abs(slopes[e] as number) * (Math.abs(thetaBase) + radiationT));
    });
  }
  let norm2 = 0;
  let maxResidual = 0;
  let maxScale = 0;
  let valid = true;
  for (let p = 0; p < n; p++) {
    if (fixed[p] === 1) R[p] = 0;
    const r = R[p] as number;
    if (!Number.isFinite(r)) valid = false;
    norm2 += r * r;
    maxResidual = Math.max(maxResidual, Math.abs(r) - RESIDUAL_FLOOR_FACTOR * (floor[p] as number));
    maxScale = Math.max(maxScale, scale[p] as number);
  }
  const law = setup.faceLaw;
  if (law.radiative !== 0) {
    for (let p = 0; p < n; p++) if (law.ambient_K + (theta[p] as number) < 0) valid = false;
  }
  s.valid = valid;
  s.norm = Math.sqrt(norm2);
  s.relative = maxScale > 0 ? maxResidual / maxScale : 0;
}

/**
 * out_p = sum_q K_pq (D_p - D_q) (heat conducted out of node p's control volume, W per depth),
 * scale_p = sum_q |K_pq (D_q - D_p)| and floor_p = sum_q |K_pq| (|D_p| + |D_q|), one pass over the upper
 * half of the stencil (each flow once, added to both of its nodes with opposite signs).
 */
function conductionInto(K: Stencil9, D: Float64Array, out: Float64Array, scale: Float64Array, floor: Float64Array): void {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = K;
  out.fill(0);
  scale.fill(0);
  floor.fill(0);
  const flow = (p: number, q: number, c: number): void => {
    if (c === 0) return;
    const dp = D[p] as number;
    const dq = D[q] as number;
    const f = c * (dp - dq);
    out[p] = (out[p] as number) + f;
    out[q] = (out[q] as number) - f;
    const a = Math.abs(f);
    scale[p] = (scale[p] as number) + a;
    scale[q] = (scale[q] as number) + a;
    const m = Math.abs(c) * (Math.abs(dp) + Math.abs(dq));
    floor[p] = (floor[p] as number) + m;
    floor[q] = (floor[q] as number) + m;
  };
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      if (j + 1 < ny) flow(p, p + 1, north[p] as number);
      if (i + 1 < nx) {
        flow(p, p + ny, east[p] as number);
        if (j + 1 < ny) flow(p, p + ny + 1, northEast[p] as number);
        if (j > 0) flow(p, p + ny - 1, southEast[p] as number);
      }
    }
  }
}

/** Heat rates of a state (two-d/heat-rate.ts balances on the potential U - U_b = -D). */
export function stateHeatRates(setup: Newton2DSetup, potentialDrop: Float64Array, exchange: Record<SideName, Float64Array>): HeatRates2D {
  const { K, terms } = setup.ops;
  const potential = potentialDrop.map((v) => -v);
  const bySide = (name: SideName): Float64Array | null => (terms[name].kind === 'fixed' ? null : exchange[name]);
  return heatRatesFromExchange(K, terms, potential, { base: bySide('base'), face: bySide('face'), tip: bySide('tip') });
}

/** Round-off floor of the base heat rate: 16 ε_mach times the magnitudes of the base rows' terms. */
function heatRateFloor(setup: Newton2DSetup, s: State, rates: HeatRates2D): number {
  let sum = 0;
  for (const p of setup.ops.terms.base.nodes) sum += s.scale[p] as number;
  return (HEAT_RATE_FLOOR_FACTOR * sum) / Math.abs(rates.base);
}

/** The symmetrised Newton system Ĵ w = -R of a state (header). */
function newtonSystem(setup: Newton2DSetup, s: State): System2D {
  const { K, terms, fixed } = setup.ops;
  const tangent = (name: SideName): SideTerms => {
    const side = terms[name];
    if (side.kind === 'adiabatic' || side.kind === 'fixed') return { ...side, farTheta: 0 };
    const slope = s.slope[name];
    const conductance = Float64Array.from(side.nodes, (p, e) => (slope[e] as number) / (s.column[p] as number));
    return { ...side, conductance, farTheta: 0 };
  };
  const tangentTerms: BoundaryTerms2D = { base: tangent('base'), face: tangent('face'), tip: tangent('tip') };
  const system = buildSystem2D(K, tangentTerms);
  const rhs = system.rhs as Float64Array;
  for (let p = 0; p < rhs.length; p++) rhs[p] = fixed[p] === 1 ? 0 : -(s.residual[p] as number);
  return system;
}

/**
 * z_trial = z + λ δz, fixed nodes exact; with keepSign a node whose θ would reach or cross 0 goes to a tenth
 * of its θ (potential node) or to u = 0 (ambient node) instead (as in 1-D).
 */
function step(setup: Newton2DSetup, ambient: Uint8Array, from: Float64Array, delta: Float64Array, lambda: number, into: Float64Array): void {
  const { fixed, fixedDrop } = setup.ops;
  const kirchhoff = setup.kirchhoff;
  const reference = setup.thetaBase;
  for (let p = 0; p < from.length; p++) {
    if (fixed[p] === 1) {
      into[p] = kirchhoff.potentialDropAt(fixedDrop[p] as number);
      continue;
    }
    const z = (from[p] as number) + lambda * (delta[p] as number);
    into[p] = z;
    if (!setup.keepSign || ambient[p] === 1) continue;
    const before = reference - kirchhoff.dropAt(from[p] as number);
    if (before !== 0 && (reference - kirchhoff.dropAt(z)) * before <= 0) into[p] = kirchhoff.potentialDropAt(reference - 0.1 * before);
  }
}

/**
 * Power-law conductance of every node, W/K per depth: the G_p of the cooled sides whose law has n < 0 (0 where
 * none: inside the section, on an adiabatic side, at a node without surface). Only such a node has a term linear
 * in u; for any other its column would be the vanishing conduction scale alone, and the step w / c unbounded.
 */
function powerConductance(setup: Newton2DSetup, n: number): Float64Array {
  const G = new Float64Array(n);
  if (!setup.ambientVariables) return G;
  for (const name of SIDE_NAMES) {
    const side = setup.ops.terms[name];
    const law = name === 'tip' ? setup.tipLaw : setup.faceLaw;
    if (side.kind !== 'convective' || law.exponent >= 0) continue;
    side.nodes.forEach((p, e) => {
      if (setup.ops.fixed[p] !== 1) G[p] = (G[p] as number) + (side.conductance[e] as number);
    });
  }
  return G;
}

/**
 * Chooses the variable of every node with a power-law loss, and re-expresses the state's unknowns; true when any
 * changed. A row is solved in the variable in which its dominant term is linear: u once the loss's θ-slope
 * (n + 1) G |θ/θ_b|^n exceeds the conduction's κ |K_pp| (on a thin section the couplings across it are large,
 * and a face node put in u while its neighbour inside stays in D made the step strongly nonlinear there),
 * back to D below a quarter of it.
 */
function chooseVariables(setup: Newton2DSetup, G: Float64Array, ambient: Uint8Array, s: State): boolean {
  if (!setup.ambientVariables) return false;
  const law = setup.faceLaw;
  const diag = setup.ops.K.diag;
  let changed = false;
  for (let p = 0; p < ambient.length; p++) {
    const Gp = G[p] as number;
    if (!(Gp > 0)) continue;
    const t = s.theta[p] as number;
    const lossSlope = t === 0 ? Infinity : (law.exponent + 1) * Gp * Math.pow(Math.abs(t) * law.inverseBaseExcess, law.exponent);
    const conduction = (s.ratio[p] as number) * Math.abs(diag[p] as number);
    if (ambient[p] === 0 && lossSlope > conduction) {
      ambient[p] = 1;
      s.unknowns[p] = ambientVariable(law, t);
      changed = true;
    } else if (ambient[p] === 1 && lossSlope < AMBIENT_HYSTERESIS * conduction) {
      ambient[p] = 0;
      s.unknowns[p] = s.potential[p] as number;
      changed = true;
    }
  }
  return changed;
}

/**
 * One Newton system by the requested linear solver. With the automatic choice, an MG-PCG solve that fails
 * is repeated by the banded factor when it fits in memory: near convergence the right-hand side of a grid
 * with a cusped tip is the round-off of its ~1e8 W/K couplings (paired, summing to nothing), which MG-PCG
 * cannot reduce by its relative target; the direct solve has no such target.
 */
function solveStep(system: System2D, requested: SolverMethod | 'auto'): { w: Float64Array; method: SolverMethod } {
  const { nodesX: nx, nodesY: ny } = system.matrix;
  const method = requested === 'auto' ? chooseSolverMethod(nx, ny) : requested;
  const fits = bandedCholeskyBytes(Math.max(nx, ny), Math.min(nx, ny)) <= MAX_BANDED_BYTES;
  if (requested === 'auto' && method === 'banded-cholesky') {
    // The automatic choice as the linear solve makes it (fast diagonalisation where the system allows it).
    const prepared = prepareSolver2D(system, 'auto');
    const w = prepared.solve(system);
    prepared.release();
    return { w, method: prepared.method };
  }
  if (requested !== 'auto' || method !== 'mg-pcg' || !fits) return { w: prepareSolver2D(system, method).solve(system), method };
  const attempt = attemptMgPcg(system);
  if (attempt.failure === null) return { w: attempt.x, method };
  return { w: prepareSolver2D(system, 'banded-cholesky').solve(system), method: 'banded-cholesky' };
}

/** A 2-D state with the heat rates of its potential and exchanges (set by the model's heatRate). */
interface RatedState extends State {
  rates: HeatRates2D | null;
}

/** The 2-D fin as a model of the damped Newton driver (newton/damped-newton.ts); `method`: the linear solver of the last step. */
function newtonModel(setup: Newton2DSetup, n: number, requested: SolverMethod | 'auto', method: { last: SolverMethod }): NewtonModel<RatedState> {
  // 1: the node is solved for its ambient variable (shared by every state; changed only in `correction`).
  const ambient = new Uint8Array(n);
  const powerG = powerConductance(setup, n);
  return {
    linear: setup.linear,
    roundOffRegime: ROUND_OFF_REGIME,
    createState: () => ({ ...createState(setup), rates: null }),
    // The initial drops as potential drops, with the fixed nodes reset.
    start: (initial, into) => {
      ambient.fill(0);
      for (let p = 0; p < n; p++) into[p] = setup.kirchhoff.potentialDropAt(initial[p] as number);
      step(setup, ambient, into, new Float64Array(n), 0, into);
    },
    evaluate: (s) => evaluate(setup, ambient, s),
    correction: (s, delta) => {
      if (chooseVariables(setup, powerG, ambient, s)) evaluate(setup, ambient, s);
      const solved = solveStep(newtonSystem(setup, s), requested);
      method.last = solved.method;
      const w = solved.w;
      // Ĵ w = -R with w = δU: δD = -w at a potential node, δu = w / c at an ambient one.
      for (let p = 0; p < w.length; p++) delta[p] = ambient[p] === 1 ? (w[p] as number) / (s.column[p] as number) : -(w[p] as number);
    },
    step: (from, delta, lambda, into) => step(setup, ambient, from, delta, lambda, into),
    heatRate: (s) => {
      const rates = stateHeatRates(setup, s.potential, s.exchange);
      s.rates = rates;
      return rates.base;
    },
    heatRateFloor: (s) => heatRateFloor(setup, s, s.rates as HeatRates2D),
  };
}

/** Damped Newton from the drops `initial` (not modified; fixed nodes are reset). Never throws on non-convergence. */
export function newtonSolve2D(setup: Newton2DSetup, initial: Float64Array, opts: Newton2DOptions = {}): Newton2DOutcome {
  const method = { last: 'banded-cholesky' as SolverMethod };
  const run = dampedNewton(newtonModel(setup, initial.length, opts.method ?? 'auto', method), initial, {
    maxIterations: opts.maxIterations ?? NEWTON_2D_MAX_ITERATIONS,
    residualTolerance: opts.residualTolerance ?? NEWTON_2D_TOLERANCE,
    heatRateTolerance: opts.heatRateTolerance ?? NEWTON_2D_TOLERANCE,
  });
  const { state } = run;
  return {
    converged: run.converged,
    drop: state.drop,
    theta: state.theta,
    potential: state.potential,
    exchange: state.exchange,
    iterations: run.iterations,
    halvings: run.halvings,
    residual: state.relative,
    heatRateChange: run.heatRateChange,
    rates: state.rates as HeatRates2D,
    method: method.last,
    failure: run.failure,
  };
}
