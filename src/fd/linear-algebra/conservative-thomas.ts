/**
 * Row-sum (conservative) Thomas solve for diagonally dominant tridiagonal M-matrices: the default
 * solver of the 1-D fin.
 *
 * Why: the fin's row i is -K_{i-1} θ_{i-1} + (K_{i-1} + K_i + G_i) θ_i - K_i θ_{i+1}, with
 * G_i / K_i ~ (m Δx)^2 (1e-8 at 4000 cells). Stored as a float, the diagonal keeps G_i only to a
 * relative 2 eps K/G; the classic Thomas sweep then loses the heat rate to ~1e-9 at 4000 nodes and
 * ~1e-6 at 1e5 nodes, and the energy balance with it. Parametrising each row by its off-diagonals
 * and its row sum s_i = d_i + l_i + u_i (for the fin: G_i plus boundary conductances, W/K), and
 * eliminating with s carried along, involves only sums of like-signed terms for an M-matrix
 * (l, u <= 0, s >= 0): no cancellation. This is the idea of Grassmann, Taksar & Heyman (1985,
 * Operations Research 33(5), the GTH algorithm) and of Alfa, Xue & Ye (2002, Math. Comp. 71(237),
 * "Accurate computation of the smallest eigenvalue of a diagonally dominant M-matrix") [both from
 * memory]; for the fin it is the classical "fin admittance" recursion Y_i = G_i + K_i Y_{i+1} / (K_i + Y_{i+1}).
 *
 * Elimination from the base (rows 0..p-1) with the previous pivot d'_{i-1} and row sum s'_{i-1}:
 *   s'_i = s_i - l_i s'_{i-1} / d'_{i-1},   d'_i = s'_i - u_i,   r'_i = r_i - l_i r'_{i-1} / d'_{i-1};
 * mirrored from the tip (rows n-1..p+1), the two sweeps meeting at row p (two-sided, as in
 * tridiagonal.ts: two independent chains of divisions run side by side). Back substitution:
 *   x_i = (r'_i - u_i x_{i+1}) / d'_i (top half),  x_j = (r'_j - l_j x_{j-1}) / d'_j (bottom half),
 * with the factors u_i / d'_i and l_j / d'_j kept from the sweeps (one array read per back step).
 * Algebraically the same solution as Thomas for any nonsingular system without pivoting.
 */
import type { TridiagonalSolver, TridiagonalSystem } from './tridiagonal-system.js';

/** Row sums diag + lower + upper of a system that does not carry them (rounded as stored). */
function rowSumsOf(system: TridiagonalSystem): Float64Array {
  const { lower, diag, upper } = system;
  const n = diag.length;
  const sums = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    sums[i] = (diag[i] as number) + (i > 0 ? (lower[i] as number) : 0) + (i < n - 1 ? (upper[i] as number) : 0);
  }
  return sums;
}

/** One-sided row-sum elimination from the last row to the first (used for n < 3). */
export function conservativeThomasFromTipInto(system: TridiagonalSystem, solution: Float64Array, work: Float64Array): Float64Array {
  const { lower, upper, rhs } = system;
  const rowSum = system.rowSum ?? rowSumsOf(system);
  const n = rowSum.length;
  const last = n - 1;
  const x = solution;
  const inverse = work;
  let sumPrime = rowSum[last] as number;
  let w = 1 / (last > 0 ? sumPrime - (lower[last] as number) : sumPrime);
  inverse[last] = w;
  x[last] = (rhs[last] as number) * w;
  let ratio = sumPrime * w;
  for (let j = last - 1; j >= 0; j--) {
    const u = upper[j] as number;
    sumPrime = (rowSum[j] as number) - u * ratio;
    w = 1 / (j > 0 ? sumPrime - (lower[j] as number) : sumPrime);
    inverse[j] = w;
    ratio = sumPrime * w;
    x[j] = ((rhs[j] as number) - u * (x[j + 1] as number)) * w;
  }
  for (let j = 1; j < n; j++) x[j] = (x[j] as number) - (lower[j] as number) * (x[j - 1] as number) * (inverse[j] as number);
  return x;
}

/**
 * Two-sided row-sum Thomas solve into caller-provided arrays (no allocation when the system carries
 * rowSum). solution and work need length >= n; the system is not modified.
 */
export function conservativeThomasInto(system: TridiagonalSystem, solution: Float64Array, work: Float64Array): Float64Array {
  const { lower, upper, rhs } = system;
  const rowSum = system.rowSum ?? rowSumsOf(system);
  const n = rowSum.length;
  if (n < 3) return conservativeThomasFromTipInto(system, solution, work);
  const x = solution; // r'_i / d'_i during the sweeps, then the solution
  const factor = work; // u_i / d'_i above row p, l_j / d'_j below: the back-substitution factors
  const p = n >> 1;
  const last = n - 1;
  let sumTop = rowSum[0] as number;
  let w = 1 / (sumTop - (upper[0] as number));
  factor[0] = (upper[0] as number) * w;
  x[0] = (rhs[0] as number) * w;
  let ratioTop = sumTop * w; // s'_{i-1} / d'_{i-1}
  let sumBottom = rowSum[last] as number;
  let v = 1 / (sumBottom - (lower[last] as number));
  factor[last] = (lower[last] as number) * v;
  x[last] = (rhs[last] as number) * v;
  let ratioBottom = sumBottom * v;
  let i = 1;
  let j = last - 1;
  for (; i < p && j > p; i++, j--) {
    const l = lower[i] as number;
    const uTop = upper[i] as number;
    sumTop = (rowSum[i] as number) - l * ratioTop;
    w = 1 / (sumTop - uTop);
    factor[i] = uTop * w;
    ratioTop = sumTop * w;
    x[i] = ((rhs[i] as number) - l * (x[i - 1] as number)) * w;
    const u = upper[j] as number;
    const lBottom = lower[j] as number;
    sumBottom = (rowSum[j] as number) - u * ratioBottom;
    v = 1 / (sumBottom - lBottom);
    factor[j] = lBottom * v;
    ratioBottom = sumBottom * v;
    x[j] = ((rhs[j] as number) - u * (x[j + 1] as number)) * v;
  }
  for (; i < p; i++) {
    const l = lower[i] as number;
    const uTop = upper[i] as number;
    sumTop = (rowSum[i] as number) - l * ratioTop;
    w = 1 / (sumTop - uTop);
    factor[i] = uTop * w;
    ratioTop = sumTop * w;
    x[i] = ((rhs[i] as number) - l * (x[i - 1] as number)) * w;
  }
  for (; j > p; j--) {
    const u = upper[j] as number;
    const lBottom = lower[j] as number;
    sumBottom = (rowSum[j] as number) - u * ratioBottom;
    v = 1 / (sumBottom - lBottom);
    factor[j] = lBottom * v;
    ratioBottom = sumBottom * v;
    x[j] = ((rhs[j] as number) - u * (x[j + 1] as number)) * v;
  }
  const l = lower[p] as number;
  const u = upper[p] as number;
  // Row p with both neighbours eliminated: its pivot is its reduced row sum.
  const pivot = (rowSum[p] as number) - l * ratioTop - u * ratioBottom;
  x[p] = ((rhs[p] as number) - l * (x[p - 1] as number) - u * (x[p + 1] as number)) / pivot;
  let down = p - 1;
  let up = p + 1;
  for (; down >= 0 && up < n; down--, up++) {
    x[down] = (x[down] as number) - (factor[down] as number) * (x[down + 1] as number);
    x[up] = (x[up] as number) - (factor[up] as number) * (x[up - 1] as number);
  }
  for (; down >= 0; down--) x[down] = (x[down] as number) - (factor[down] as number) * (x[down + 1] as number);
  for (; up < n; up++) x[up] = (x[up] as number) - (factor[up] as number) * (x[up - 1] as number);
  return x;
}

/** Two-sided row-sum Thomas solve (allocates the solution and one work array). */
export const conservativeThomas: TridiagonalSolver = (system) => {
  const n = system.diag.length;
  return conservativeThomasInto(system, new Float64Array(n), new Float64Array(n));
};
