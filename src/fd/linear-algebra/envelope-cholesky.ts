/**
 * Cholesky factorisation A = L L^T of a small sparse symmetric positive definite matrix (the coarsest level of the
 * 3-D sink multigrid) in its envelope: row i of L is zero left of f_i, the first column of row i of A, and the fill
 * stays inside the envelope (George & Liu 1981, "Computer Solution of Large Sparse Positive Definite Systems",
 * Prentice-Hall, ch. 4 [from memory]), so only columns f_i..i of each row are stored and formed:
 *   l_ij = (a_ij − sum_k l_ik l_jk) / l_jj  (f_i <= j < i),   l_ii = sqrt(a_ii − sum_k l_ik^2),
 * each sum over k ascending from max(f_i, f_j) (from f_i for the diagonal) to j − 1 (i − 1). Then forward
 * substitution L y = b by rows of L and back substitution L^T x = y by columns of L (each column's rows inside the
 * envelope, ascending).
 * The terms left out are products with an exact zero of the factor, so every entry and every solution is the one the
 * dense column-oriented algorithm gives (Golub & Van Loan, "Matrix Computations", 4th ed. 2013, Algorithm 4.2.1
 * [from memory]; tests/sink/envelope-cholesky.test.ts compares them bit for bit), at a fraction of its n^3/6 multiply-adds:
 * on the 20-fin bench sink's coarsest level (352 unknowns) the envelope holds 17,929 of the 62,128 entries of the
 * lower triangle, and the factorisation takes 0.54e6 multiply-adds instead of 7.3e6.
 */
import { SolverError } from '../../errors.js';
import type { CsrMatrix } from './csr.js';

export interface CholeskyFactor {
  solve(b: Float64Array, x: Float64Array): void;
}

export function envelopeCholesky(a: CsrMatrix): CholeskyFactor {
  const n = a.n;
  const first = envelopeStarts(a);
  // Row i of L: columns first[i]..i, column k at rowAt[i] + k − first[i].
  const rowAt = rowOffsets(first);
  const l = new Float64Array(rowAt[n]);
  scatterLower(a, first, rowAt, l);
  factorRows(l, first, rowAt, n);
  const columns = factorColumns(l, first, rowAt, n);
  return {
    solve(b, x) {
      forward(l, first, rowAt, n, b, x);
      backward(l, rowAt, columns, n, x);
    },
  };
}

/*
 * One loop a function below: each is optimised with the feedback of all its code (the factorisation runs once a
 * multigrid; a function compiled on entering its first loop was deoptimised again by the loops after it).
 */

/** The first column of each row of A (the diagonal where nothing precedes it). */
function envelopeStarts(a: CsrMatrix): Int32Array {
  const first = new Int32Array(a.n);
  for (let r = 0; r < a.n; r++) {
    let f = r;
    for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) if (a.col[e] < f) f = a.col[e];
    first[r] = f;
  }
  return first;
}

function rowOffsets(first: Int32Array): Int32Array {
  const n = first.length;
  const rowAt = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) rowAt[i + 1] = rowAt[i] + i - first[i] + 1;
  return rowAt;
}

/** A's lower triangle into the rows of L (repeated entries summed in row order). */
function scatterLower(a: CsrMatrix, first: Int32Array, rowAt: Int32Array, l: Float64Array): void {
  for (let r = 0; r < a.n; r++) {
    for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) {
      const c = a.col[e];
      if (c <= r) l[rowAt[r] + c - first[r]] += a.val[e];
    }
  }
}

/** L in place, row by row (every entry needs only rows above it and its own row left of it). */
function factorRows(l: Float64Array, first: Int32Array, rowAt: Int32Array, n: number): void {
  for (let i = 0; i < n; i++) {
    const fi = first[i];
    const ri = rowAt[i] - fi;
    for (let j = fi; j < i; j++) {
      const fj = first[j];
      const rj = rowAt[j] - fj;
      let s = l[ri + j];
      for (let k = fi > fj ? fi : fj; k < j; k++) s -= l[ri + k] * l[rj + k];
      l[ri + j] = s / l[rj + j];
    }
    let d = l[ri + i];
    for (let k = fi; k < i; k++) d -= l[ri + k] * l[ri + k];
    if (!(d > 0)) throw new SolverError('3-D sink solve: the coarsest multigrid matrix is not positive definite');
    l[ri + i] = Math.sqrt(d);
  }
}

/** The factor's columns below the diagonal: column i's rows k > i whose envelope reaches it, ascending, and where l_ki is. */
interface Columns {
  start: Int32Array;
  row: Int32Array;
  at: Int32Array;
}

function factorColumns(l: Float64Array, first: Int32Array, rowAt: Int32Array, n: number): Columns {
  const start = columnCounts(first, n);
  const row = new Int32Array(start[n]);
  const at = new Int32Array(start[n]);
  fillColumns(first, rowAt, start.slice(0, n), row, at);
  return { start, row, at };
}

/** Column starts: row k reaches columns first[k]..k − 1. */
function columnCounts(first: Int32Array, n: number): Int32Array {
  const start = new Int32Array(n + 1);
  for (let k = 0; k < n; k++) for (let i = first[k]; i < k; i++) start[i + 1]++;
  return prefixSums(start);
}

/** a[k] += a[k − 1], k ascending; returns a. */
function prefixSums(a: Int32Array): Int32Array {
  for (let k = 1; k < a.length; k++) a[k] += a[k - 1];
  return a;
}

function fillColumns(first: Int32Array, rowAt: Int32Array, fill: Int32Array, row: Int32Array, at: Int32Array): void {
  for (let k = 0; k < first.length; k++) {
    for (let i = first[k]; i < k; i++) {
      row[fill[i]] = k;
      at[fill[i]++] = rowAt[k] + i - first[k];
    }
  }
}

/** L y = b (y in x). */
function forward(l: Float64Array, first: Int32Array, rowAt: Int32Array, n: number, b: Float64Array, x: Float64Array): void {
  for (let i = 0; i < n; i++) {
    const ri = rowAt[i] - first[i];
    let s = b[i];
    for (let k = first[i]; k < i; k++) s -= l[ri + k] * x[k];
    x[i] = s / l[ri + i];
  }
}

/** L^T x = y (y in x, overwritten). */
function backward(l: Float64Array, rowAt: Int32Array, columns: Columns, n: number, x: Float64Array): void {
  const { start, row, at } = columns;
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let e = start[i]; e < start[i + 1]; e++) s -= l[at[e]] * x[row[e]];
    x[i] = s / l[rowAt[i + 1] - 1];
  }
}
