/**
 * Tridiagonal systems and their O(n) direct solvers (Thomas algorithm, no pivoting).
 *
 * System, row i (0 <= i < n): lower[i] x[i-1] + diag[i] x[i] + upper[i] x[i+1] = rhs[i];
 * lower[0] and upper[n-1] are never read. Units are the caller's (for the fin: W/K, K and W).
 *
 * Thomas, L. H., 1949, "Elliptic problems in linear difference equations over a network", Watson
 * Sci. Comput. Lab. report, Columbia University [from memory]; Golub, G. H. & Van Loan, C. F., Matrix
 * Computations, §4.3 (banded systems) [from memory for the section]. Forward elimination
 * c_i = u_i / (d_i - l_i c_{i-1}), y_i = (r_i - l_i y_{i-1}) / (d_i - l_i c_{i-1}); back substitution
 * x_i = y_i - c_i x_{i+1}. Stable without pivoting for diagonally dominant matrices, which the fin's
 * conservative assembly always gives (an M-matrix, strictly dominant in the base row).
 *
 * The two-sided variant eliminates from both ends at once and meets in the middle row p
 * (a "twisted" factorisation, as in Meurant, G., 1992, "A review on the inverse of symmetric
 * tridiagonal and block tridiagonal matrices", SIAM J. Matrix Anal. Appl. 13(3) [from memory]). Same
 * operation count; the two sweeps are independent chains of divisions, which a superscalar CPU runs
 * side by side, so it takes about half the time of the one-sided sweep.
 *
 * Both solvers here read only lower, diag and upper. For the fin, whose diagonal is the sum of the
 * off-diagonals plus a much smaller convective conductance, use the row-sum solvers of
 * conservative-thomas.ts (the default, `solveTridiagonal`): they keep that small part exactly.
 */
import { conservativeThomas } from './conservative-thomas.js';
import type { TridiagonalSolver, TridiagonalSystem } from './tridiagonal-system.js';

export type { RowSumSystem, TridiagonalSolver, TridiagonalSystem } from './tridiagonal-system.js';
export { createTridiagonalSystem } from './tridiagonal-system.js';

/**
 * One-sided Thomas solve into caller-provided arrays (no allocation).
 * solution and work need length >= n; the system is not modified.
 */
export function thomasInto(system: TridiagonalSystem, solution: Float64Array, work: Float64Array): Float64Array {
  const { lower, diag, upper, rhs } = system;
  const n = diag.length;
  const c = work;
  const x = solution;
  let w = 1 / (diag[0] as number);
  c[0] = n > 1 ? (upper[0] as number) * w : 0;
  x[0] = (rhs[0] as number) * w;
  for (let i = 1; i < n; i++) {
    const l = lower[i] as number;
    w = 1 / ((diag[i] as number) - l * (c[i - 1] as number));
    c[i] = (upper[i] as number) * w;
    x[i] = ((rhs[i] as number) - l * (x[i - 1] as number)) * w;
  }
  for (let i = n - 2; i >= 0; i--) x[i] = (x[i] as number) - (c[i] as number) * (x[i + 1] as number);
  return x;
}

/**
 * Two-sided Thomas solve into caller-provided arrays (no allocation).
 * solution and work need length >= n; the system is not modified.
 */
export function twoSidedThomasInto(system: TridiagonalSystem, solution: Float64Array, work: Float64Array): Float64Array {
  const { lower, diag, upper, rhs } = system;
  const n = diag.length;
  if (n < 3) return thomasInto(system, solution, work);
  const c = work; // c[i], i < p: top sweep; c[j], j > p: bottom sweep
  const x = solution; // y[i] and z[j] before back substitution
  const p = n >> 1;
  const last = n - 1;
  let w = 1 / (diag[0] as number);
  c[0] = (upper[0] as number) * w;
  x[0] = (rhs[0] as number) * w;
  let v = 1 / (diag[last] as number);
  c[last] = (lower[last] as number) * v;
  x[last] = (rhs[last] as number) * v;
  let i = 1;
  let j = last - 1;
  for (; i < p && j > p; i++, j--) {
    const l = lower[i] as number;
    w = 1 / ((diag[i] as number) - l * (c[i - 1] as number));
    c[i] = (upper[i] as number) * w;
    x[i] = ((rhs[i] as number) - l * (x[i - 1] as number)) * w;
    const u = upper[j] as number;
    v = 1 / ((diag[j] as number) - u * (c[j + 1] as number));
    c[j] = (lower[j] as number) * v;
    x[j] = ((rhs[j] as number) - u * (x[j + 1] as number)) * v;
  }
  for (; i < p; i++) {
    const l = lower[i] as number;
    w = 1 / ((diag[i] as number) - l * (c[i - 1] as number));
    c[i] = (upper[i] as number) * w;
    x[i] = ((rhs[i] as number) - l * (x[i - 1] as number)) * w;
  }
  for (; j > p; j--) {
    const u = upper[j] as number;
    v = 1 / ((diag[j] as number) - u * (c[j + 1] as number));
    c[j] = (lower[j] as number) * v;
    x[j] = ((rhs[j] as number) - u * (x[j + 1] as number)) * v;
  }
  const l = lower[p] as number;
  const u = upper[p] as number;
  x[p] =
    ((rhs[p] as number) - l * (x[p - 1] as number) - u * (x[p + 1] as number)) /
    ((diag[p] as number) - l * (c[p - 1] as number) - u * (c[p + 1] as number));
  let down = p - 1;
  let up = p + 1;
  for (; down >= 0 && up < n; down--, up++) {
    x[down] = (x[down] as number) - (c[down] as number) * (x[down + 1] as number);
    x[up] = (x[up] as number) - (c[up] as number) * (x[up - 1] as number);
  }
  for (; down >= 0; down--) x[down] = (x[down] as number) - (c[down] as number) * (x[down + 1] as number);
  for (; up < n; up++) x[up] = (x[up] as number) - (c[up] as number) * (x[up - 1] as number);
  return x;
}

/** One-sided Thomas solve (allocates the solution and one work array). */
export const thomas: TridiagonalSolver = (system) => {
  const n = system.diag.length;
  return thomasInto(system, new Float64Array(n), new Float64Array(n));
};

/** Two-sided Thomas solve (allocates the solution and one work array). */
export const twoSidedThomas: TridiagonalSolver = (system) => {
  const n = system.diag.length;
  return twoSidedThomasInto(system, new Float64Array(n), new Float64Array(n));
};

/** The default solver of the 1-D fin: the two-sided row-sum Thomas solve (conservative-thomas.ts). */
export const solveTridiagonal: TridiagonalSolver = conservativeThomas;
