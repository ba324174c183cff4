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
import type { FullStencil } from './full-stencil.js';

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
  for (let i = first; i < nx; i += 2) solveColumn(a, lines, b, x, work, i, true);
  for (let i = 1 - first; i < nx; i += 2) solveColumn(a, lines, b, x, work, i, true);
}

/**
 * The pre-smoothing zebra sweep from x = 0 (even columns, then odd): the even columns see only zero
 * neighbours, so they are solved from b alone and x needs no clearing (each odd column is written before
 * it is read).
 */
export function zebraFromZero(a: FullStencil, lines: LineFactors, b: Float64Array, x: Float64Array, work: Float64Array): void {
  const nx = a.nodesX;
  for (let i = 0; i < nx; i += 2) solveColumn(a, lines, b, x, work, i, false);
  for (let i = 1; i < nx; i += 2) solveColumn(a, lines, b, x, work, i, true);
}

function solveColumn(a: FullStencil, lines: LineFactors, b: Float64Array, x: Float64Array, work: Float64Array, i: number, neighbours: boolean): void {
  const { nodesX: nx, nodesY: ny, c } = a;
  const start = i * ny;
  const last = start + ny - 1;
  const { inversePivot, upper } = lines;
  const [sw, w, nw, south, , , se, e, ne] = c;
  // Forward elimination with the right-hand side built on the fly (one pass):
  // rhs_j = b_j - (couplings to the west and east columns) x, d'_j = (rhs_j - S_j d'_{j-1}) / pivot_j.
  // The first and last rows are peeled: their couplings beyond the grid's edge are zero and not read.
  const hasWest = neighbours && i > 0;
  const hasEast = neighbours && i + 1 < nx;
  let prev = 0;
  if (!a.diagonals) {
    // 5-point rows: only the west and east neighbours (the diagonal arrays are zero and not read).
    const ws = hasWest ? 1 : 0;
    const es = hasEast ? 1 : 0;
    for (let p = start; p <= last; p++) {
      const rhs = (b[p] as number) - ws * (w[p] as number) * (x[p - ws * ny] as number) - es * (e[p] as number) * (x[p + es * ny] as number);
      prev = (rhs - (south[p] as number) * prev) * (inversePivot[p] as number);
      work[p - start] = prev;
    }
  } else if (hasWest && hasEast && i >= 2 && i + 2 < nx) {
    // Columns away from the grid's ends: x[q +- 1] exists for every row (the couplings beyond the top and
    // bottom edges are zero), so the loop runs without branches.
    for (let p = start; p <= last; p++) {
      const q = p - ny;
      const t = p + ny;
      const rhs =
        (b[p] as number) -
        (w[p] as number) * (x[q] as number) -
        (sw[p] as number) * (x[q - 1] as number) -
        (nw[p] as number) * (x[q + 1] as number) -
        (e[p] as number) * (x[t] as number) -
        (se[p] as number) * (x[t - 1] as number) -
        (ne[p] as number) * (x[t + 1] as number);
      prev = (rhs - (south[p] as number) * prev) * (inversePivot[p] as number);
      work[p - start] = prev;
    }
  } else
    for (let p = start; p <= last; p++) {
      let rhs = b[p] as number;
      if (hasWest) {
        const q = p - ny;
        rhs -= (w[p] as number) * (x[q] as number);
        if (p > start) rhs -= (sw[p] as number) * (x[q - 1] as number);
        if (p < last) rhs -= (nw[p] as number) * (x[q + 1] as number);
      }
      if (hasEast) {
        const q = p + ny;
        rhs -= (e[p] as number) * (x[q] as number);
        if (p > start) rhs -= (se[p] as number) * (x[q - 1] as number);
        if (p < last) rhs -= (ne[p] as number) * (x[q + 1] as number);
      }
      prev = (rhs - (south[p] as number) * prev) * (inversePivot[p] as number);
      work[p - start] = prev;
    }
  // Back substitution: x_j = d'_j - c'_j x_{j+1}.
  let next = prev;
  x[last] = next;
  for (let p = last - 1; p >= start; p--) {
    next = (work[p - start] as number) - (upper[p] as number) * next;
    x[p] = next;
  }
}
