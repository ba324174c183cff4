/**
 * Newton's method for a nonlinear heat sink: a power-law h on the fins and/or a k(T) table (one law for plate
 * and fins; sink-problem.ts).
 *
 * Unknown: the Kirchhoff potential phi (K) of every node, phi(θ) = (1/k_ref) ∫_0^θ k dθ' (Kirchhoff, 1894,
 * Vorlesungen über die Theorie der Wärme [from memory]), in which conduction is linear, k dT = k_ref dphi: the
 * couplings assembled with k_ref hold unchanged, and the isoflux sources are linear. The nonlinearity sits in
 * the losses (sink-faces.ts: each face's flux q(phi_P) and dq/dphi_P). With b the sources' heat, C the couplings
 * (rows summing to zero, applied in difference form) and L(phi) the losses,
 *   R(phi) = b − C phi − L(phi),   J = C + diag(dL/dphi):
 * the assembled sparsity with a new diagonal, so each Newton step J delta = R is solved by the same
 * multigrid-preconditioned CG; the multigrid built for the linear system at the power law's base h is reused
 * (J differs from that matrix on the diagonal only, and stays symmetric positive definite). Start: that linear
 * system's solution. Steps are damped (halved, at most 20 times, until |R|_1 falls).
 * The power law's reference θ_root, the fins' mean root rise (junction temperatures weighted by the plate
 * cells' conductances, i.e. by area), is taken from the current iterate before every step (lagged: a
 * reference, not a variable of the Jacobian), with a secant correction of the fixed-point map once two values
 * exist, which keeps the update convergent for exponents above 1 (boiling), where the plain map may not be.
 * Converged when |R|_1 <= RESIDUAL_TARGET |b|_1 (the energy balance then holds to that; or below the rounding
 * floor of evaluating R, as in sparse-pcg.ts, for plates of very high conductivity) and θ_root moved by less than
 * 1e-10 of itself in the last step.
 */
import { SolverError } from '../../errors.js';
import type { CsrMatrix } from '../linear-algebra/csr.js';
import { csrResidual } from '../linear-algebra/csr.js';
import { roundingFloor, sparsePcg } from '../linear-algebra/sparse-pcg.js';
import type { Preconditioner } from '../linear-algebra/sink-multigrid.js';
import { sinkFaces, type SinkFaces } from './sink-faces.js';
import type { SinkProblem } from './sink-problem.js';
import type { SinkSystem } from './sink-system.js';

const MAX_STEPS = 60;
const MAX_HALVINGS = 20;
const ROOT_TOLERANCE = 1e-10;

export interface SinkNewtonResult {
  /** Kirchhoff potential of every node, K. */
  phi: Float64Array;
  faces: SinkFaces;
  /** θ_root of the power law at convergence, K (null: linear h). */
  thetaRoot: number | null;
  steps: number;
  cgIterations: number;
  relativeResidual: number;
}

export function solveSinkNewton(
  problem: SinkProblem,
  system: SinkSystem,
  start: Float64Array,
  pre: Preconditioner,
  tolerance: number,
  maxCg: number,
): SinkNewtonResult {
  const { matrix, losses, roots } = system;
  const n = matrix.n;
  const exponent = problem.powerLaw?.exponent ?? 0;
  let thetaRoot = 1;
  const faces = sinkFaces(problem.conductivity, exponent, () => thetaRoot);

  // b: the sources' heat (the assembled right-hand side without the linear prescribed-temperature terms).
  const b = Float64Array.from(system.rhs);
  for (let t = 0; t < losses.node.length; t++) if (losses.fixed[t] !== 0) b[losses.node[t]] -= losses.g[t] * losses.fixed[t];
  const scale = norm1(b) || 1;
  // C: the couplings alone (diagonal = −sum of the row's couplings), residual in difference form (excess 0).
  const diagonalOfC = new Float64Array(n);
  const { rowStart, col, val } = matrix;
  for (let r = 0; r < n; r++) {
    if (col[rowStart[r]] !== r) throw new Error('solveSinkNewton: the diagonal must come first in every row');
    let s = 0;
    for (let e = rowStart[r] + 1; e < rowStart[r + 1]; e++) s -= val[e];
    diagonalOfC[r] = s;
  }
  const conduction: CsrMatrix = { n, rowStart, col, val, excess: new Float64Array(n) };
  const jacobianVal = Float64Array.from(val);
  const slope = new Float64Array(n);
  const jacobian: CsrMatrix = { n, rowStart, col, val: jacobianVal, excess: slope };

  const rootMean = (phi: Float64Array): number => {
    let s = 0;
    let w = 0;
    for (let r = 0; r < roots.plate.length; r++) {
      const gp = roots.gPlate[r];
      const gf = roots.gFin[r];
      s += gp * faces.thetaOf((gp * phi[roots.plate[r]] + gf * phi[roots.fin[r]]) / (gp + gf));
      w += gp;
    }
    return s / w;
  };
  /** R into `out`, dL/dphi into `slope`; returns |R|_1. */
  const residual = (phi: Float64Array, out: Float64Array, withSlope: boolean): number => {
    csrResidual(conduction, phi, b, out);
    if (withSlope) slope.fill(0);
    for (let t = 0; t < losses.node.length; t++) {
      const p = losses.node[t];
      const f = faces.face(phi[p], losses.surface[t], losses.half[t], losses.law[t], losses.fixed[t]);
      out[p] -= f.q;
      if (withSlope) slope[p] += f.dq;
    }
    let s = 0;
    for (let r = 0; r < n; r++) s += Math.abs(out[r]);
    return s;
  };

  const phi = Float64Array.from(start);
  const trial = new Float64Array(n);
  const r = new Float64Array(n);
  const rTrial = new Float64Array(n);
  const law = problem.powerLaw !== null;
  let previous: { t: number; f: number } | null = null;
  const checkedRoot = (t: number): number => {
    if (!(t > 0))
      throw new SolverError(`3-D sink solve: the fins' mean root rise is ${t.toPrecision(3)} K; a power-law h needs the fins above the ambient`);
    return t;
  };
  if (law) thetaRoot = checkedRoot(rootMean(phi));
  let rootMoved = law ? Infinity : 0;
  let norm = residual(phi, r, true);
  let cgIterations = 0;
  // Below the rounding floor of evaluating R itself (sparse-pcg.ts) no step can show progress.
  const target = () => Math.max(tolerance * scale, roundingFloor(matrix, phi));
  for (let step = 0; step < MAX_STEPS; step++) {
    if (norm <= target() && rootMoved <= ROOT_TOLERANCE) {
      return { phi, faces, thetaRoot: law ? thetaRoot : null, steps: step, cgIterations, relativeResidual: norm / scale };
    }
    for (let q = 0; q < n; q++) jacobianVal[rowStart[q]] = diagonalOfC[q] + slope[q];
    // Inexact Newton: the step's own residual need not fall below |R| (quadratic convergence) nor below what the
    // target still asks of it (half of tolerance |b|); at most 1e-2 of |R|.
    const inner = Math.min(1e-2, Math.max(norm / scale, (0.5 * tolerance * scale) / norm));
    const { x: delta, report } = sparsePcg(jacobian, r, pre, inner, maxCg);
    cgIterations += report.iterations;
    let lambda = 1;
    let accepted = false;
    for (let h = 0; h <= MAX_HALVINGS; h++, lambda *= 0.5) {
      for (let q = 0; q < n; q++) trial[q] = phi[q] + lambda * delta[q];
      const next = residual(trial, rTrial, false);
      if (next < norm || next <= target()) {
        phi.set(trial);
        accepted = true;
        break;
      }
    }
    if (!accepted && norm <= target()) accepted = true; // at the floor: only θ_root is still moving
    if (!accepted) {
      throw new SolverError(
        `3-D sink solve: Newton made no progress at step ${step + 1} (relative residual ${(norm / scale).toExponential(2)}, target ${tolerance.toExponential(0)})`,
      );
    }
    if (law) {
      const mapped = checkedRoot(rootMean(phi));
      let next = mapped;
      if (previous !== null && previous.t !== thetaRoot) {
        // Secant on the fixed-point map t -> mapped(t): its slope s, the root t + (mapped − t)/(1 − s).
        const s = Math.min(0.9, Math.max(-1, (mapped - previous.f) / (thetaRoot - previous.t)));
        next = thetaRoot + (mapped - thetaRoot) / (1 - s);
      }
      previous = { t: thetaRoot, f: mapped };
      rootMoved = Math.abs(next - thetaRoot) / Math.abs(next);
      thetaRoot = checkedRoot(next);
    }
    norm = residual(phi, r, true);
  }
  throw new SolverError(
    `3-D sink solve: Newton did not converge in ${MAX_STEPS} steps (relative residual ${(norm / scale).toExponential(2)}, target ${tolerance.toExponential(0)})`,
  );
}

function norm1(v: Float64Array): number {
  let s = 0;
  for (let k = 0; k < v.length; k++) s += Math.abs(v[k]);
  return s;
}
