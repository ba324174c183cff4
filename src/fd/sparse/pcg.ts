/**
 * Conjugate gradients preconditioned by the multigrid V-cycle (multigrid.ts), for the symmetric positive
 * definite 2-D systems. Hestenes & Stiefel (1952), J. Res. NBS 49, 409-436; preconditioned form as in
 * Saad, "Iterative Methods for Sparse Linear Systems" (2nd ed., 2003), Algorithm 9.1 [from memory].
 *
 * Convergence test: |r|_1 <= tolerance x (sum |rhs| over the coupled rows), the scale of the heat flows,
 * so that the energy balance of the result (which is the sum of the residual over the free nodes) is at
 * that level too. The recursive residual of CG drifts from the true one; the true residual (difference
 * form when the system carries its row sums) is checked at the end, and CG restarted on it while that
 * helps (a restart that does not halve it has met round-off).
 */
import { SolverError } from '../../errors.js';
import { buildMultigrid, type Multigrid } from './multigrid.js';
import { applyDifferenceForm, applyStencil9, coupledRhsNorm1, residual, type Solver2D, type System2D } from './stencil9.js';

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

export function solveMgPcg(system: System2D, opts: PcgOptions = {}, mg: Multigrid = buildMultigrid(system.matrix)): { x: Float64Array; report: PcgReport } {
  const tolerance = opts.tolerance ?? DEFAULT_TOLERANCE;
  const maxIterations = opts.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const n = system.rhs.length;
  const scale = coupledRhsNorm1(system) || 1;
  const x = new Float64Array(n);
  const r = Float64Array.from(system.rhs);
  const z = new Float64Array(n);
  const p = new Float64Array(n);
  const q = new Float64Array(n);
  /** out = A v; returns v . out. */
  const multiply = (v: Float64Array, out: Float64Array): number => {
    if (system.excess !== undefined) return applyDifferenceForm(system.matrix, system.excess, v, out);
    applyStencil9(system.matrix, v, out);
    return dot(v, out);
  };
  let iterations = 0;
  let relative = norm1(r) / scale;
  let previous = Infinity;
  for (let restart = 0; restart <= RESTARTS && relative > ACCEPT * tolerance && relative < 0.5 * previous; restart++) {
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
  }
  const report = { iterations, relativeResidual: relative, levels: mg.levels };
  if (!(relative <= FAILURE)) {
    throw new SolverError(
      `multigrid-preconditioned CG did not converge: relative residual ${relative.toExponential(2)} after ${iterations} iterations ` +
        `on a ${system.matrix.nodesX} x ${system.matrix.nodesY} grid; try another grid (e.g. fewer nodes across) or the direct solver`,
    );
  }
  return { x, report };
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

function norm1(v: Float64Array): number {
  let s = 0;
  for (let k = 0; k < v.length; k++) s += Math.abs(v[k] as number);
  return s;
}
