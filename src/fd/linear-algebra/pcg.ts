/**
 * Conjugate gradients preconditioned by the multigrid V-cycle (multigrid.ts), for the symmetric positive
 * definite 2-D systems. Hestenes & Stiefel (1952), J. Res. NBS 49, 409-436; preconditioned form as in
 * Saad, "Iterative Methods for Sparse Linear Systems" (2nd ed., 2003), Algorithm 9.1 [from memory].
 *
 * Convergence test: |r|_1 <= tolerance x (sum |rhs| over the coupled rows), the scale of the heat flows,
 * so that the energy balance of the result (which is the sum of the residual over the free nodes) is at
 * that level too. The recursive residual of CG drifts from the true one; the true residual (difference
 * form when the system carries its row sums) is checked at the end, and CG restarted on it while that
 * helps (a restart that does not halve it has met round-off), and while it is above the rounding error of
 * its own evaluation, eps x sum_p |x_p| sum_{q != p} |A_pq| (Higham, "Accuracy and Stability of Numerical
 * Algorithms", 2nd ed. 2002, section 3.1, bound for inner products [from memory]): below that bound a
 * computed residual cannot show any progress, so a restart would only cost iterations.
 */
import { SolverError } from '../../errors.js';
import { buildMultigrid, type Multigrid } from './multigrid.js';
import { applyDifferenceForm, applyStencil9, coupledRhsNorm1, isFivePoint, residual, type Solver2D, type Stencil9, type System2D } from './stencil9.js';

export interface PcgOptions {
  /** Relative residual target (default 1e-12). */
  tolerance?: number;
  /** Iterations per CG run (default 100). */
  maxIterations?: number;
}

export interface PcgReport {
  iterations: number;
  relativeResidual: number;
  levels: { nodesX: number; nodesY: number }[];
}

/**
 * 1e-12: the energy balance of fin solutions was measured at up to ~30x the relative residual (thin plate,
 * 2001 x 51: 2.6e-10 at 1e-11, 2.8e-11 at 1e-12), so 1e-12 keeps it well below 1e-9 (11 iterations
 * instead of 14 for 1e-13).
 */
const DEFAULT_TOLERANCE = 1e-12;
const DEFAULT_MAX_ITERATIONS = 100;
const RESTARTS = 3;
/**
 * CG iterates until its recursive residual meets the tolerance; the true residual, which drifts a little
 * from it, is accepted up to this multiple without a restart (a restart costs a full iteration for a few
 * tens of per cent of residual; the energy balance stays ~1e-10 at 3e-12).
 */
const ACCEPT = 3;
/**
 * A residual still above this after the restarts is a failure. Between the tolerance and this bound the
 * solve is accepted when the restarts stagnate: the round-off floor of grids whose couplings differ by
 * ~1e6 (cusped tips), about 1e-10, which the result's energy balance then reports.
 */
const FAILURE = 1e-7;
/**
 * Unit round-off of doubles. Measured: the true residual of converged fin solves sat at 0.42-0.54 x the
 * bound eps sum |x_p| sum |A_pq| (10000 x 50 thin fin 7.9e-9 against 1.5e-8; 2000 x 50 5.9e-10 against
 * 1.1e-9; 1000 x 1000 block 1.5e-13 against 3.6e-13), and restarts there never halved it; skipping them
 * saves 4 of 12 iterations on 10000 x 50.
 */
const UNIT_ROUNDOFF = 2 ** -53;

/** MG-PCG; a SolverError when it does not reach its residual target (attemptMgPcg asks instead). */
export function solveMgPcg(
  system: System2D,
  opts: PcgOptions = {},
  mg: Multigrid = buildMultigrid(system.matrix),
): { x: Float64Array; report: PcgReport } {
  const attempt = attemptMgPcg(system, opts, mg);
  if (attempt.failure !== null) throw new SolverError(attempt.failure, 'another-2d-grid');
  return { x: attempt.x, report: attempt.report };
}

/** MG-PCG that reports whether it converged (failure: why not, null when it did) instead of throwing. */
export function attemptMgPcg(
  system: System2D,
  opts: PcgOptions = {},
  mg: Multigrid = buildMultigrid(system.matrix),
): { x: Float64Array; report: PcgReport; failure: string | null } {
  const tolerance = opts.tolerance ?? DEFAULT_TOLERANCE;
  const maxIterations = opts.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const n = system.rhs.length;
  const scale = coupledRhsNorm1(system) || 1;
  const x = new Float64Array(n);
  const r = system.rhs.slice();
  const z = new Float64Array(n);
  const p = new Float64Array(n);
  const q = new Float64Array(n);
  const fivePoint = isFivePoint(system.matrix);
  /** out = A v; returns v . out. */
  const multiply = (v: Float64Array, out: Float64Array): number => {
    if (system.excess !== undefined) return applyDifferenceForm(system.matrix, system.excess, v, out, fivePoint);
    applyStencil9(system.matrix, v, out);
    return dot(v, out);
  };
  let iterations = 0;
  let relative = norm1(r) / scale;
  let previous = Infinity;
  let floor = 0;
  for (let restart = 0; restart <= RESTARTS && relative > Math.max(ACCEPT * tolerance, floor) && relative < 0.5 * previous; restart++) {
    previous = relative;
    // CG on A d = r (r the true residual), accumulating d into x.
    mg.apply(r, z);
    p.set(z);
    let rz = dot(r, z);
    for (let it = 0; it < maxIterations; it++) {
      const alpha = rz / multiply(p, q);
      let size = 0;
      for (let k = 0; k < n; k++) {
        x[k] = (x[k] as number) + alpha * (p[k] as number);
        const rk = (r[k] as number) - alpha * (q[k] as number);
        r[k] = rk;
        size += Math.abs(rk);
      }
      iterations++;
      if (size <= tolerance * scale) break;
      mg.apply(r, z);
      const rzNext = dot(r, z);
      const beta = rzNext / rz;
      rz = rzNext;
      for (let k = 0; k < n; k++) p[k] = (z[k] as number) + beta * (p[k] as number);
    }
    residual(system, x, r);
    relative = norm1(r) / scale;
    if (relative > ACCEPT * tolerance) floor = (2 * UNIT_ROUNDOFF * roundingScale(system.matrix, x)) / scale;
  }
  const report = { iterations, relativeResidual: relative, levels: mg.levels };
  const failure =
    relative <= FAILURE
      ? null
      : `multigrid-preconditioned CG did not converge: relative residual ${relative.toExponential(2)} after ${iterations} iterations ` +
        `on a ${system.matrix.nodesX} x ${system.matrix.nodesY} grid`;
  return { x, report, failure };
}

/** The MG-preconditioned CG as a Solver2D. */
export const mgPcgSolver: Solver2D = (system: System2D) => solveMgPcg(system).x;

function dot(a: Float64Array, b: Float64Array): number {
  let s0 = 0;
  let s1 = 0;
  const n = a.length;
  let k = 0;
  for (; k + 1 < n; k += 2) {
    s0 += (a[k] as number) * (b[k] as number);
    s1 += (a[k + 1] as number) * (b[k + 1] as number);
  }
  if (k < n) s0 += (a[k] as number) * (b[k] as number);
  return s0 + s1;
}

/**
 * sum_p |x_p| sum_{q != p} |A_pq|: the size of the terms a residual evaluation adds up (each coupling
 * counted from both of its nodes).
 */
function roundingScale(a: Stencil9, x: Float64Array): number {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = a;
  let s = 0;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const xp = Math.abs(x[p] as number);
      if (j + 1 < ny) {
        const v = Math.abs(north[p] as number);
        s += v * (xp + Math.abs(x[p + 1] as number));
      }
      if (i + 1 < nx) {
        const q = p + ny;
        s += Math.abs(east[p] as number) * (xp + Math.abs(x[q] as number));
        if (j + 1 < ny) s += Math.abs(northEast[p] as number) * (xp + Math.abs(x[q + 1] as number));
        if (j > 0) s += Math.abs(southEast[p] as number) * (xp + Math.abs(x[q - 1] as number));
      }
    }
  }
  return s;
}

function norm1(v: Float64Array): number {
  let s = 0;
  for (let k = 0; k < v.length; k++) s += Math.abs(v[k] as number);
  return s;
}
