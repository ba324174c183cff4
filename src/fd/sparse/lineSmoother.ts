/**
 * Zebra line Gauss-Seidel across the thin direction: each grid column (fixed i, all j) is solved
 * exactly, with the neighbouring columns at their latest values; even columns first, then odd (or the
 * reverse).
 *
 * For column i: T_i x_i = b_i - (west, north-west, south-west couplings) x_{i-1}
 *                              - (east, north-east, south-east couplings) x_{i+1},
 * T_i tridiagonal (the couplings within the column). The thin direction carries the strongest couplings
 * on elongated cells, and a line solve removes all error along it; reversing the colour order after the
 * coarse-grid correction makes the smoother symmetric, as a conjugate-gradient preconditioner needs. The tridiagonal
 * factors (Thomas algorithm) are computed once per matrix. Trottenberg, Oosterlee & Schuller,
 * "Multigrid" (Academic Press, 2001), section 5.1 on line relaxation for anisotropic problems [from memory].
 */
import type { FullStencil } from './fullStencil.js';

export interface LineFactors {
  /** 1 / (pivot of the Thomas elimination) per node. */
  readonly inversePivot: Float64Array;
  /** Modified super-diagonal c'_j per node. */
  readonly upper: Float64Array;
}

export function factorLines(a: FullStencil): LineFactors {
  const { nodesX: nx, nodesY: ny, c } = a;
  const diag = c[4];
  const south = c[3];
  const north = c[5];
  const inversePivot = new Float64Array(nx * ny);
  const upper = new Float64Array(nx * ny);
  for (let i = 0; i < nx; i++) {
    let prevUpper = 0;
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const pivot = (diag[p] as number) - (south[p] as number) * prevUpper;
      const inv = 1 / pivot;
      inversePivot[p] = inv;
      prevUpper = (north[p] as number) * inv;
      upper[p] = prevUpper;
    }
  }
  return { inversePivot, upper };
}

/**
 * Zebra sweep: the columns of one parity, then the other (evenFirst: even then odd; else odd then even).
 * Even-then-odd before the coarse-grid correction and odd-then-even after it keep the cycle symmetric.
 */
export function zebraLineGaussSeidel(a: FullStencil, lines: LineFactors, b: Float64Array, x: Float64Array, work: Float64Array, evenFirst: boolean): void {
  const nx = a.nodesX;
  const first = evenFirst ? 0 : 1;
  for (let i = first; i < nx; i += 2) solveColumn(a, lines, b, x, work, i);
  for (let i = 1 - first; i < nx; i += 2) solveColumn(a, lines, b, x, work, i);
}

function solveColumn(a: FullStencil, lines: LineFactors, b: Float64Array, x: Float64Array, work: Float64Array, i: number): void {
  const { nodesX: nx, nodesY: ny, c } = a;
  const start = i * ny;
  const end = start + ny;
  const { inversePivot, upper } = lines;
  const south = c[3];
  // Right-hand side of the column: b minus the couplings to the west and east columns.
  for (let j = 0; j < ny; j++) work[j] = b[start + j] as number;
  if (i > 0) subtractNeighbourColumn(work, c[1], c[2], c[0], x, start, ny, -ny);
  if (i + 1 < nx) subtractNeighbourColumn(work, c[7], c[8], c[6], x, start, ny, ny);
  // Thomas: d'_j = (rhs_j - S_j d'_{j-1}) / pivot_j, then x_j = d'_j - c'_j x_{j+1}.
  let prev = 0;
  for (let j = 0; j < ny; j++) {
    const p = start + j;
    prev = ((work[j] as number) - (south[p] as number) * prev) * (inversePivot[p] as number);
    work[j] = prev;
  }
  let next = prev;
  x[end - 1] = next;
  for (let j = ny - 2; j >= 0; j--) {
    next = (work[j] as number) - (upper[start + j] as number) * next;
    x[start + j] = next;
  }
}

/**
 * work_j -= same_j x[q] + up_j x[q + 1] + down_j x[q - 1], q = start + j + shift: the couplings of the
 * column starting at `start` to the neighbouring column (coefficients pointing outside the grid are zero;
 * the first and last rows are peeled so that no index leaves the array).
 */
function subtractNeighbourColumn(
  work: Float64Array,
  same: Float64Array,
  up: Float64Array,
  down: Float64Array,
  x: Float64Array,
  start: number,
  ny: number,
  shift: number,
): void {
  const q0 = start + shift;
  if (ny === 1) {
    work[0] = (work[0] as number) - (same[start] as number) * (x[q0] as number);
    return;
  }
  work[0] = (work[0] as number) - (same[start] as number) * (x[q0] as number) - (up[start] as number) * (x[q0 + 1] as number);
  for (let j = 1; j < ny - 1; j++) {
    const p = start + j;
    const q = q0 + j;
    work[j] =
      (work[j] as number) - (same[p] as number) * (x[q] as number) - (up[p] as number) * (x[q + 1] as number) - (down[p] as number) * (x[q - 1] as number);
  }
  const p = start + ny - 1;
  const q = q0 + ny - 1;
  work[ny - 1] = (work[ny - 1] as number) - (same[p] as number) * (x[q] as number) - (down[p] as number) * (x[q - 1] as number);
}
