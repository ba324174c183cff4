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
 * cells' conductances, i.e. by area), is a function of phi: every face of the law depends on it, so the exact
 * Jacobian is J + u v^T with u = dL/dθ_root and v = dθ_root/dphi, a rank-one term solved by Sherman-Morrison
 * (Sherman & Morrison 1950, Ann. Math. Statist. 21(1):124-127): a second CG solve J y = u per step. (Lagging
 * θ_root instead converges with the factor n f, f the fins' share of the cooling: 0.9 a step at n = −0.9.)
 * Converged when |R|_1 <= RESIDUAL_TARGET |b|_1 (the energy balance then holds to that; or below the rounding
 * floor of evaluating R, as in sparse-pcg.ts, for plates of very high conductivity).
 */
import { SolverError } from '../../errors.js';
import type { CsrMatrix } from '../linear-algebra/csr.js';
import { csrResidual } from '../linear-algebra/csr.js';
import { roundingFloor, sparsePcg } from '../linear-algebra/sparse-pcg.js';
import type { Preconditioner } from '../linear-algebra/sink-multigrid.js';
import { sinkFaces, type SinkFaces } from './sink-faces.js';
import type { SinkProblem } from './sink-problem.js';
import type { SinkSystem } from './sink-system.js';
import { dot, norm1 } from '../linear-algebra/vector-ops.js';

const MAX_STEPS = 60;
const MAX_HALVINGS = 20;

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

  const law = problem.powerLaw !== null && exponent !== 0;
  /** θ_root of phi; with `gradient`, d θ_root/d phi into it (nonzero at the roots' plate and fin nodes). */
  const rootMean = (phi: Float64Array, gradient: Float64Array | null): number => {
    let s = 0;
    let w = 0;
    for (let r = 0; r < roots.plate.length; r++) w += roots.gPlate[r];
    gradient?.fill(0);
    for (let r = 0; r < roots.plate.length; r++) {
      const gp = roots.gPlate[r];
      const gf = roots.gFin[r];
      const theta = faces.thetaOf((gp * phi[roots.plate[r]] + gf * phi[roots.fin[r]]) / (gp + gf));
      s += gp * theta;
      if (gradient !== null) {
        const d = gp / w / faces.kappaOf(theta) / (gp + gf);
        gradient[roots.plate[r]] += d * gp;
        gradient[roots.fin[r]] += d * gf;
      }
    }
    const t = s / w;
    if (!(t > 0))
      throw new SolverError(`3-D sink solve: the fins' mean root rise is ${t.toPrecision(3)} K; a power-law h needs the fins above the ambient`);
    return t;
  };
  const slopeOfRoot = new Float64Array(law ? n : 0);
  const gradientOfRoot = new Float64Array(law ? n : 0);
  /** R into `out` (θ_root from phi), dL/dphi into `slope` and dL/dθ_root into `slopeOfRoot`; returns |R|_1. */
  const residual = (phi: Float64Array, out: Float64Array, withSlope: boolean): number => {
    if (law) thetaRoot = rootMean(phi, withSlope ? gradientOfRoot : null);
    csrResidual(conduction, phi, b, out);
    if (withSlope) {
      slope.fill(0);
      slopeOfRoot.fill(0);
    }
    for (let t = 0; t < losses.node.length; t++) {
      const p = losses.node[t];
      const f = faces.face(phi[p], losses.surface[t], losses.half[t], losses.law[t], losses.fixed[t]);
      out[p] -= f.q;
      if (withSlope) {
        slope[p] += f.dq;
        if (law) slopeOfRoot[p] += f.dRef;
      }
    }
    let s = 0;
    for (let r = 0; r < n; r++) s += Math.abs(out[r]);
    return s;
  };

  const phi = Float64Array.from(start);
  const trial = new Float64Array(n);
  const r = new Float64Array(n);
  const rTrial = new Float64Array(n);
  let norm = residual(phi, r, true);
  let cgIterations = 0;
  // Below the rounding floor of evaluating R itself (sparse-pcg.ts) no step can show progress.
  const target = () => Math.max(tolerance * scale, roundingFloor(matrix, phi));
  for (let step = 0; step < MAX_STEPS; step++) {
    if (norm <= target()) {
      return { phi, faces, thetaRoot: law ? thetaRoot : null, steps: step, cgIterations, relativeResidual: norm / scale };
    }
    for (let q = 0; q < n; q++) jacobianVal[rowStart[q]] = diagonalOfC[q] + slope[q];
    // Inexact Newton: the step's own residual need not fall below |R| (quadratic convergence) nor below what the
    // target still asks of it (half of tolerance |b|); at most 1e-2 of |R|.
    const inner = Math.min(1e-2, Math.max(norm / scale, (0.5 * tolerance * scale) / norm));
    const solved = sparsePcg(jacobian, r, pre, inner, maxCg);
    cgIterations += solved.report.iterations;
    const delta = solved.x;
    if (law) {
      // Full Jacobian J + u v^T (u = dL/dθ_root, v = dθ_root/dphi): Sherman-Morrison with a second solve J y = u,
      // delta = x − y (v.x)/(1 + v.y). A denominator near 0 would make the rank-one term unreliable: then the
      // step keeps J alone (θ_root lagged), which still converges, linearly.
      const y = sparsePcg(jacobian, slopeOfRoot, pre, 1e-6, maxCg);
      cgIterations += y.report.iterations;
      const denominator = 1 + dot(gradientOfRoot, y.x);
      if (denominator > 0.05) {
        const c = dot(gradientOfRoot, delta) / denominator;
        for (let q = 0; q < n; q++) delta[q] -= c * y.x[q];
      }
    }
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
    if (!accepted && norm <= target()) accepted = true;
    if (!accepted) {
      throw new SolverError(
        `3-D sink solve: Newton made no progress at step ${step + 1} (relative residual ${(norm / scale).toExponential(2)}, target ${tolerance.toExponential(0)})`,
      );
    }
    norm = residual(phi, r, true);
  }
  throw new SolverError(
    `3-D sink solve: Newton did not converge in ${MAX_STEPS} steps (relative residual ${(norm / scale).toExponential(2)}, target ${tolerance.toExponential(0)})`,
  );
}
