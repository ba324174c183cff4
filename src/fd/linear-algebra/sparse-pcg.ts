/**
 * Preconditioned conjugate gradients on a CSR matrix (Hestenes & Stiefel 1952, J. Res. NBS 49, 409-436;
 * preconditioned form as in Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed. 2003, Algorithm 9.1
 * [from memory]), for the 3-D sink systems.
 *
 * Convergence: |b − A x|_1 <= tolerance x |b|_1. For a conduction system |b|_1 is the heat put in (plus the
 * fixed-temperature terms) and the sum of the residual is the energy imbalance, so the relative residual bounds
 * the energy balance. The recursive residual drifts from the true one; the true residual is computed at the end
 * of every run and CG restarted from it (at most RESTARTS times) while it is above the target and a restart
 * at least halves it; a residual left above the target is accepted only below the rounding floor of its own
 * evaluation (roundingFloor), where no restart can show progress.
 */
import { SolverError } from '../../errors.js';
import { csrMultiply, csrResidual, type CsrMatrix } from './csr.js';
import type { Preconditioner } from './sink-multigrid.js';
import { dot, norm1 } from './vector-ops.js';

export interface SparsePcgReport {
  iterations: number;
  relativeResidual: number;
}

const RESTARTS = 3;

export function sparsePcg(
  a: CsrMatrix,
  b: Float64Array,
  m: Preconditioner,
  tolerance: number,
  maxIterations: number,
  start?: Float64Array,
): { x: Float64Array; report: SparsePcgReport } {
  const n = a.n;
  const bNorm = norm1(b);
  const scale = bNorm || 1;
  // A p lives in the preconditioner's free vector when it offers one (used only between applications).
  const q = m.workspace?.length === n ? m.workspace : new Float64Array(n);
  // CG's vectors in the preconditioner's kernel memory when it offers them: its sweeps, the structured products and
  // the vector updates then run as WebAssembly on them directly; x is copied out at the end.
  const own = m.scratch !== undefined && m.scratch.r.length === n && m.scratch.holds(q) ? m.scratch : null;
  const r = own?.r ?? new Float64Array(n);
  const z = own?.z ?? new Float64Array(n);
  const p = own?.p ?? new Float64Array(n);
  const x = own?.x ?? start ?? new Float64Array(n);
  if (own !== null) {
    if (start !== undefined) x.set(start);
    else x.fill(0);
    own.b.set(b);
  }
  const rhs = own?.b ?? b;
  // The preconditioner's structured copy of A multiplies faster than the CSR form (no column indices).
  const op = m.operator?.(a) ?? {
    multiply(v: Float64Array, out: Float64Array) {
      csrMultiply(a, v, out);
      return dot(v, out);
    },
    residual: (v: Float64Array, rhs: Float64Array, out: Float64Array) => csrResidual(a, v, rhs, out),
  };
  // From zero the residual is b itself (no product to form).
  let relative: number;
  if (start === undefined) {
    r.set(rhs);
    relative = bNorm / scale;
  } else relative = op.residual(x, rhs, r) / scale;
  let iterations = 0;
  let previous = Infinity;
  for (let restart = 0; restart <= RESTARTS && relative > tolerance && relative < 0.5 * previous; restart++) {
    previous = relative;
    let rz = m.apply(r, z);
    p.set(z);
    for (let it = 0; it < maxIterations; it++) {
      const pq = op.multiply(p, q);
      if (!(pq > 0) || !(rz > 0)) break;
      const size = own !== null ? own.step(rz / pq, q) : step(n, rz / pq, p, q, x, r);
      iterations++;
      if (size <= 0.5 * tolerance * scale) break;
      const next = m.apply(r, z);
      const beta = next / rz;
      rz = next;
      if (own !== null) own.direction(beta);
      else direction(n, beta, z, p);
    }
    relative = op.residual(x, rhs, r) / scale;
  }
  const floor = relative > tolerance ? roundingFloor(a, x) / scale : 0;
  if (!(relative <= Math.max(tolerance, floor))) {
    throw new SolverError(
      `3-D sink solve: preconditioned CG reached a relative residual of ${relative.toExponential(2)} (target ${tolerance.toExponential(0)}) after ${iterations} iterations on ${n} unknowns`,
    );
  }
  if (own === null) return { x, report: { iterations, relativeResidual: relative } };
  const out = start ?? new Float64Array(n);
  out.set(x);
  return { x: out, report: { iterations, relativeResidual: relative } };
}

/*
 * CG's vector updates, functions of their own (called every iteration, so optimised early, where a loop inside the
 * solver was recompiled with the whole solver).
 */

/** x += alpha p, r −= alpha q; returns |r|_1. */
function step(n: number, alpha: number, p: Float64Array, q: Float64Array, x: Float64Array, r: Float64Array): number {
  let size = 0;
  for (let k = 0; k < n; k++) {
    x[k] += alpha * p[k];
    r[k] -= alpha * q[k];
    size += Math.abs(r[k]);
  }
  return size;
}

/** p = z + beta p. */
function direction(n: number, beta: number, z: Float64Array, p: Float64Array): void {
  for (let k = 0; k < n; k++) p[k] = z[k] + beta * p[k];
}

/**
 * The rounding error of evaluating the residual itself, 4 eps sum_r |x_r| sum_{q != r} |A_rq| (Higham, "Accuracy
 * and Stability of Numerical Algorithms", 2nd ed. 2002, section 3.1, bound for inner products [from memory]):
 * below it a computed residual cannot show progress. It matters where couplings dwarf the losses (a plate of
 * very high conductivity: k = 1e4 W/(m K) put it at 2e-10 x the heat).
 */
export function roundingFloor(a: CsrMatrix, x: Float64Array): number {
  let s = 0;
  for (let r = 0; r < a.n; r++) {
    let row = 0;
    for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) if (a.col[e] !== r) row += Math.abs(a.val[e]);
    s += Math.abs(x[r]) * row;
  }
  return 4 * 2 ** -53 * s;
}
