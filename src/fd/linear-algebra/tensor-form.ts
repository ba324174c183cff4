/**
 * Whether a 2-D system is a Kronecker sum, and its one-dimensional factors when it is.
 *
 * A 5-point conduction matrix on a tensor-product grid (rectangular cells, k and the boundary conductances
 * varying the way the cells do) has couplings that factor into a part along and a part across:
 *     A(i,j; i+1,j) = -ex_i my_j,    A(i,j; i,j+1) = -mx_i gy_j,    row sum e_ij = ax_i my_j + mx_i by_j,
 * so that, with the short direction fastest (p = i * nodesY + j),
 *     A = Tx (x) My + Mx (x) Ty,   Tx = Lap(ex) + diag(ax),  Ty = Lap(gy) + diag(by),  Mx, My diagonal,
 * Lap(c) the 1-D conductance Laplacian with couplings c (row sums zero). ex, gy: conductances (W/K, up to a
 * common scale); mx, my: dimensionless weights (the first of each is 1); ax, by >= 0: the row sums (a fin's
 * base and tip terms along x, its face term across). This is the form the fast diagonalisation solver needs
 * (separable-solve.ts). It is read from the assembled matrix itself, not from the case: each factor from one
 * row or column, then every entry checked against the product to SEPARABLE_TOLERANCE. Columns without any
 * coupling (the identity rows of a fixed base or tip, buildSystem2D) are set apart and solved on their own.
 */
import { isFivePoint, type System2D } from './stencil9.js';

/**
 * Largest relative difference between an entry and its factored form. The assembly computes equal products in
 * different orders (a few eps apart); a genuinely non-separable matrix (h varying along the fin, a sloped
 * face, annular or pin weights that differ between the faces and the cells) differs by 1e-4 or more.
 * What remains is removed by the caller's iterative refinement against the true matrix.
 */
const SEPARABLE_TOLERANCE = 1e-10;

export interface TensorForm {
  readonly nodesX: number;
  readonly nodesY: number;
  /** Columns first..last carry the Kronecker sum; the others have no couplings (diagonal rows). */
  readonly first: number;
  readonly last: number;
  /** Along-x conductances between columns first + i and first + i + 1 (last - first of them). */
  readonly ex: Float64Array;
  /** Row-sum part along x, per column of the block (>= 0). */
  readonly ax: Float64Array;
  /** Weights along x, per column of the block (mx[0] = 1). */
  readonly mx: Float64Array;
  /** Weights across, per row (my[0] = 1). */
  readonly my: Float64Array;
  /** Across conductances between rows j and j + 1 (nodesY - 1 of them). */
  readonly gy: Float64Array;
  /** Row-sum part across, per row (>= 0). */
  readonly by: Float64Array;
}

/** The Kronecker-sum factors of the system, or null when its matrix is not one (or carries no row sums). */
export function tensorForm(system: System2D): TensorForm | null {
  const { matrix: a, excess } = system;
  const { nodesX: nx, nodesY: ny, east, north } = a;
  if (excess === undefined || ny < 2 || nx < 2 || !isFivePoint(a)) return null;
  const decoupled = (i: number): boolean => {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      if (east[p] !== 0 || north[p] !== 0 || (i > 0 && east[p - ny] !== 0)) return false;
    }
    return true;
  };
  let first = 0;
  while (first < nx && decoupled(first)) first++;
  let last = nx - 1;
  while (last > first && decoupled(last)) last--;
  const cols = last - first + 1;
  if (cols < 2) return null;
  // Conductances (positive) of the block; any missing coupling inside it means another structure.
  const along = (i: number, j: number): number => -(east[i * ny + j] as number);
  const across = (i: number, j: number): number => -(north[i * ny + j] as number);
  const my = new Float64Array(ny);
  const ex = new Float64Array(cols - 1);
  const e0 = along(first, 0);
  if (!(e0 > 0)) return null;
  for (let j = 0; j < ny; j++) my[j] = along(first, j) / e0;
  for (let c = 0; c + 1 < cols; c++) {
    const i = first + c;
    const base = along(i, 0);
    ex[c] = base;
    for (let j = 0; j < ny; j++) {
      const value = along(i, j);
      if (!(value > 0) || Math.abs(value - base * (my[j] as number)) > SEPARABLE_TOLERANCE * value) return null;
    }
  }
  const mx = new Float64Array(cols);
  const gy = new Float64Array(ny - 1);
  const n0 = across(first, 0);
  if (!(n0 > 0)) return null;
  for (let j = 0; j + 1 < ny; j++) gy[j] = across(first, j);
  for (let c = 0; c < cols; c++) {
    const i = first + c;
    const weight = across(i, 0) / n0;
    mx[c] = weight;
    for (let j = 0; j + 1 < ny; j++) {
      const value = across(i, j);
      if (!(value > 0) || Math.abs(value - weight * (gy[j] as number)) > SEPARABLE_TOLERANCE * value) return null;
    }
  }
  // Row sums: e_ij / (mx_i my_j) = alpha_i + beta_j; alpha from row 0, beta from the middle column, then the
  // constant moved so that the smallest alpha is zero (both parts then non-negative for a conduction matrix).
  const ratio = (c: number, j: number): number => (excess[(first + c) * ny + j] as number) / ((mx[c] as number) * (my[j] as number));
  const mid = cols >> 1;
  const alpha = new Float64Array(cols);
  let least = Infinity;
  for (let c = 0; c < cols; c++) {
    alpha[c] = ratio(c, 0);
    least = Math.min(least, alpha[c] as number);
  }
  const ax = new Float64Array(cols);
  const by = new Float64Array(ny);
  for (let c = 0; c < cols; c++) ax[c] = ((alpha[c] as number) - least) * (mx[c] as number);
  for (let j = 0; j < ny; j++) by[j] = (ratio(mid, j) - ratio(mid, 0) + least) * (my[j] as number);
  for (let j = 0; j < ny; j++) if (!((by[j] as number) >= 0)) return null;
  for (let c = 0; c < cols; c++) {
    for (let j = 0; j < ny; j++) {
      const value = excess[(first + c) * ny + j] as number;
      const fitted = (ax[c] as number) * (my[j] as number) + (mx[c] as number) * (by[j] as number);
      if (!(Math.abs(value - fitted) <= SEPARABLE_TOLERANCE * value)) return null;
    }
  }
  return { nodesX: nx, nodesY: ny, first, last, ex, ax, mx, my, gy, by };
}
