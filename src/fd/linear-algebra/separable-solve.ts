/**
 * Fast diagonalisation: the direct solve of a 2-D system that is a Kronecker sum (tensor-form.ts),
 *     A = Tx (x) My + Mx (x) Ty      (p = i * nodesY + j; Tx, Mx along the fin, Ty, My across).
 * The generalised eigenproblem across, Ty V = My V diag(lambda) with V^T My V = I, turns A x = f into one
 * tridiagonal system along the fin per eigenvalue:
 *     (Tx + lambda_k Mx) u_k = g_k,   g_i = V^T f_i,   x_i = V u_i      (column i of the grid).
 * Lynch, Rice & Thomas (1964), "Direct solution of partial difference equations by tensor product methods",
 * Numer. Math. 6, 185-199 [from memory]. V = My^(-1/2) W from the symmetric tridiagonal eigenproblem of
 * My^(-1/2) Ty My^(-1/2) (tridiagonal-eigen.ts). Each tridiagonal system is an M-matrix with row sums
 * ax_i + lambda_k mx_i >= 0 and is eliminated in row-sum form (as conservative-thomas.ts: sums of like-signed terms
 * only), so the small heat flows along a thin fin are not lost to the large conductances across it.
 * Cost: eigenproblem ~ nodesY^3 and the along-fin pivots ~ N once, then 2 N nodesY + 4 N multiply-adds per solve
 * (N = nodesX nodesY), against N (nodesY + 1)^2 / 2 for a banded Cholesky factor and 4 N (nodesY + 1) for its
 * substitutions. The eigenvalues carry an absolute error of a few eps ||Ty||: the caller refines the solution
 * against the true matrix (iterative-refinement.ts) and falls back to the band when that does not converge.
 * Units are the caller's.
 */
import { tridiagonalEigen } from './tridiagonal-eigen.js';
import type { TensorForm } from './tensor-form.js';
import type { Stencil9 } from './stencil9.js';

export interface SeparableSolver {
  readonly size: number;
  /** x = A^-1 rhs (into `out` when given; `out` may not be `rhs`). */
  solve(rhs: Float64Array, out?: Float64Array): Float64Array;
}

/** Prepares the solve: eigenvectors across, and the pivots of every along-fin system. */
export function prepareSeparable(form: TensorForm, matrix: Stencil9): SeparableSolver {
  const { nodesX: nx, nodesY: ny, first, last, ex, ax, mx, my, gy, by } = form;
  const cols = last - first + 1;
  const n = nx * ny;
  // My^(-1/2) Ty My^(-1/2): diagonal from like-signed sums, off-diagonal -gy / sqrt(my_j my_j+1).
  const root = new Float64Array(ny);
  for (let j = 0; j < ny; j++) root[j] = Math.sqrt(my[j] as number);
  const diag = new Float64Array(ny);
  const off = new Float64Array(ny - 1);
  for (let j = 0; j < ny; j++) {
    const conductance = (j > 0 ? (gy[j - 1] as number) : 0) + (j + 1 < ny ? (gy[j] as number) : 0) + (by[j] as number);
    diag[j] = conductance / (my[j] as number);
    if (j + 1 < ny) off[j] = -(gy[j] as number) / ((root[j] as number) * (root[j + 1] as number));
  }
  const { values, vectors } = tridiagonalEigen(diag, off);
  // V[j][k] = W[j][k] / sqrt(my_j), and its transpose for the forward transform.
  const v = new Float64Array(ny * ny);
  const vt = new Float64Array(ny * ny);
  for (let j = 0; j < ny; j++) {
    for (let k = 0; k < ny; k++) {
      const value = (vectors[j * ny + k] as number) / (root[j] as number);
      v[j * ny + k] = value;
      vt[k * ny + j] = value;
    }
  }
  // Row-sum elimination of (Tx + lambda_k Mx) from the base, for every k at once: inverse pivots inv[c * ny + k].
  // Row c: -ex_{c-1} u_{c-1} + (ex_{c-1} + ex_c + s_c) u_c - ex_c u_{c+1}, row sum s_c = ax_c + lambda_k mx_c.
  const inv = new Float64Array(cols * ny);
  const ratio = new Float64Array(ny); // s'_{c-1} / d'_{c-1} per k
  for (let c = 0; c < cols; c++) {
    const left = c > 0 ? (ex[c - 1] as number) : 0;
    const right = c + 1 < cols ? (ex[c] as number) : 0;
    for (let k = 0; k < ny; k++) {
      const sum = (ax[c] as number) + (values[k] as number) * (mx[c] as number) + left * (c > 0 ? (ratio[k] as number) : 0);
      const pivot = sum + right;
      inv[c * ny + k] = 1 / pivot;
      ratio[k] = sum / pivot;
    }
  }
  const { diag: matrixDiag } = matrix;
  const work = new Float64Array(cols * ny);
  return {
    size: n,
    solve(rhs: Float64Array, out = new Float64Array(n)): Float64Array {
      if (rhs.length !== n) throw new RangeError(`separable solve: rhs has ${rhs.length} entries, expected ${n}`);
      if (out === rhs) throw new RangeError('separable solve: out must not be rhs');
      // Rows without couplings (fixed nodes) outside the block.
      for (let p = 0; p < first * ny; p++) out[p] = (rhs[p] as number) / (matrixDiag[p] as number);
      for (let p = (last + 1) * ny; p < n; p++) out[p] = (rhs[p] as number) / (matrixDiag[p] as number);
      const g = work;
      forwardToModes(vt, rhs, first * ny, g, cols, ny);
      // Along the fin, every mode at once: forward elimination, then back substitution.
      for (let k = 0; k < ny; k++) g[k] = (g[k] as number) * (inv[k] as number);
      for (let c = 1; c < cols; c++) {
        const e = ex[c - 1] as number;
        const row = c * ny;
        for (let k = 0; k < ny; k++) g[row + k] = ((g[row + k] as number) + e * (g[row - ny + k] as number)) * (inv[row + k] as number);
      }
      for (let c = cols - 2; c >= 0; c--) {
        const e = ex[c] as number;
        const row = c * ny;
        for (let k = 0; k < ny; k++) g[row + k] = (g[row + k] as number) + e * (inv[row + k] as number) * (g[row + ny + k] as number);
      }
      toModes(v, g, 0, out, cols, ny, first * ny);
      return out;
    },
  };
}

/**
 * toModes(vt, ...) with the columns that hold at most two non-zero values (a fin's right-hand side away from the
 * base and tip: only the face node) done from those values alone: the same sums in the same order (the left-out
 * terms are exact zeros), ny instead of ny^2 products a column.
 */
function forwardToModes(vt: Float64Array, input: Float64Array, from: number, out: Float64Array, cols: number, ny: number): void {
  const sparse = (c: number): boolean => {
    let count = 0;
    for (let j = from + c * ny, end = j + ny; j < end; j++) if (input[j] !== 0 && ++count > 2) return false;
    return true;
  };
  let c = 0;
  while (c < cols) {
    let end = c;
    while (end < cols && !sparse(end)) end++;
    if (end > c) toModes(vt, input, from + c * ny, out, end - c, ny, c * ny);
    for (; end < cols && sparse(end); end++) {
      const a = from + end * ny;
      const o = end * ny;
      out.fill(0, o, o + ny);
      for (let j = 0; j < ny; j++) {
        const f = input[a + j] as number;
        if (f === 0) continue;
        for (let k = 0; k < ny; k++) out[o + k] = (out[o + k] as number) + (vt[k * ny + j] as number) * f;
      }
    }
    c = end;
  }
}

/**
 * out[c][k] = sum_j m[k][j] in[c][j] for the `cols` columns of ny values starting at in[from] (written from
 * out[to]): one ny x ny matrix applied to every column. Four columns and two rows of m a pass: six loads for eight
 * products (one column at a time loads two for one).
 */
function toModes(m: Float64Array, input: Float64Array, from: number, out: Float64Array, cols: number, ny: number, to = 0): void {
  let c = 0;
  for (; c + 3 < cols; c += 4) {
    const a0 = from + c * ny;
    const a1 = a0 + ny;
    const a2 = a1 + ny;
    const a3 = a2 + ny;
    const o0 = to + c * ny;
    let k = 0;
    for (; k + 1 < ny; k += 2) {
      const r0 = k * ny;
      const r1 = r0 + ny;
      let s00 = 0;
      let s01 = 0;
      let s10 = 0;
      let s11 = 0;
      let s20 = 0;
      let s21 = 0;
      let s30 = 0;
      let s31 = 0;
      for (let j = 0; j < ny; j++) {
        const m0 = m[r0 + j] as number;
        const m1 = m[r1 + j] as number;
        const x0 = input[a0 + j] as number;
        const x1 = input[a1 + j] as number;
        const x2 = input[a2 + j] as number;
        const x3 = input[a3 + j] as number;
        s00 += m0 * x0;
        s01 += m1 * x0;
        s10 += m0 * x1;
        s11 += m1 * x1;
        s20 += m0 * x2;
        s21 += m1 * x2;
        s30 += m0 * x3;
        s31 += m1 * x3;
      }
      out[o0 + k] = s00;
      out[o0 + k + 1] = s01;
      out[o0 + ny + k] = s10;
      out[o0 + ny + k + 1] = s11;
      out[o0 + 2 * ny + k] = s20;
      out[o0 + 2 * ny + k + 1] = s21;
      out[o0 + 3 * ny + k] = s30;
      out[o0 + 3 * ny + k + 1] = s31;
    }
    if (k < ny) {
      const r0 = k * ny;
      let s0 = 0;
      let s1 = 0;
      let s2 = 0;
      let s3 = 0;
      for (let j = 0; j < ny; j++) {
        const m0 = m[r0 + j] as number;
        s0 += m0 * (input[a0 + j] as number);
        s1 += m0 * (input[a1 + j] as number);
        s2 += m0 * (input[a2 + j] as number);
        s3 += m0 * (input[a3 + j] as number);
      }
      out[o0 + k] = s0;
      out[o0 + ny + k] = s1;
      out[o0 + 2 * ny + k] = s2;
      out[o0 + 3 * ny + k] = s3;
    }
  }
  for (; c < cols; c++) {
    const a = from + c * ny;
    const oa = to + c * ny;
    for (let k = 0; k < ny; k++) {
      const row = k * ny;
      let s = 0;
      for (let j = 0; j < ny; j++) s += (m[row + j] as number) * (input[a + j] as number);
      out[oa + k] = s;
    }
  }
}
