/**
 * Line Gauss-Seidel on a structured sink stencil (sink-stencil.ts): the same relaxation as line-relaxation.ts
 * (plate columns in z, then fin rows along their height, each line's tridiagonal system solved exactly with the
 * couplings off the line at their current values,
 *   T_l x_l = b_l + sum_{q not on the line} G_lq x_q),
 * read through strides instead of column indices. Forward then backward is symmetric block Gauss-Seidel, SPD for
 * an SPD matrix (Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed. 2003, sections 4.1 and 9.2
 * [from memory]). The lines are factored once (Thomas algorithm without pivoting, diagonally dominant M-matrix
 * lines): inv_p = 1 / (A_pp − G_{p−1,p}^2 inv_{p−1}); the elimination multipliers G_{p,p+1} inv_p are formed
 * on the fly from the couplings.
 * A forward sweep from x = 0 (`fromZero`) skips the couplings to lines not yet visited (their x is 0).
 */
import type { SinkStencil } from './sink-stencil.js';

export interface StencilRelaxation {
  /** One sweep over the lines, forward or backward, updating x in place; fromZero: x is 0 on entry (forward only). */
  sweep(b: Float64Array, x: Float64Array, direction: 'forward' | 'backward', fromZero?: boolean): void;
}

export function stencilRelaxation(s: SinkStencil): StencilRelaxation {
  const { grid, n, plate, line, gx, gy, row, diagonal, extraStart, extraTo, extraFrom, extraG } = s;
  const { nx, ny, nz } = grid;
  const sx = ny * nz;
  const inv = new Float64Array(n);
  // Factor: lines are contiguous; line[p − 1] is 0 at each line's first member.
  for (let p = 0; p < n; p++) {
    const g = p > 0 ? line[p - 1] : 0;
    inv[p] = 1 / (diagonal[p] - (g === 0 ? 0 : g * g * inv[p - 1]));
  }
  let longest = nz;
  for (const f of grid.fins) longest = Math.max(longest, f.layers);
  /** The line's right-hand side from the extra couplings, then its forward elimination. */
  const w = new Float64Array(longest);

  /** w = the extra couplings' part of line l's right-hand side (zero for most lines). */
  const extrasOf = (l: number, x: Float64Array, p0: number, len: number): void => {
    w.fill(0, 0, len);
    for (let e = extraStart[l]; e < extraStart[l + 1]; e++) w[extraFrom[e] - p0] += extraG[e] * x[extraTo[e]];
  };

  /** Back substitution of the line from p0 (w holds the eliminated right-hand side). */
  const backSubstitute = (p0: number, len: number, x: Float64Array): void => {
    let next = 0;
    for (let k = len - 1; k >= 0; k--) {
      const p = p0 + k;
      next = w[k] + line[p] * inv[p] * next;
      x[p] = next;
    }
  };

  /**
   * Plate column (i, j). Inside the plate's first and last planes a neighbour across the plane's j ends has a
   * zero coupling, so interior planes read every neighbour without bounds; ahead: whether the unvisited
   * neighbours (i+1, j+1) are read (false in a forward sweep from zero).
   */
  const column = (i: number, j: number, b: Float64Array, x: Float64Array, ahead: boolean): void => {
    const p0 = (i * ny + j) * nz;
    extrasOf(i * ny + j, x, p0, nz);
    let y = 0;
    let g = 0;
    if (i > 0 && i + 1 < nx) {
      if (ahead) {
        for (let k = 0; k < nz; k++) {
          const q = p0 + k;
          const v = w[k] + b[q] + gx[q - sx] * x[q - sx] + gx[q] * x[q + sx] + gy[q - nz] * x[q - nz] + gy[q] * x[q + nz];
          y = (v + g * y) * inv[q];
          w[k] = y;
          g = line[q];
        }
      } else {
        for (let k = 0; k < nz; k++) {
          const q = p0 + k;
          const v = w[k] + b[q] + gx[q - sx] * x[q - sx] + gy[q - nz] * x[q - nz];
          y = (v + g * y) * inv[q];
          w[k] = y;
          g = line[q];
        }
      }
    } else {
      for (let k = 0; k < nz; k++) {
        const q = p0 + k;
        let v = w[k] + b[q];
        if (i > 0) v += gx[q - sx] * x[q - sx];
        if (j > 0) v += gy[q - nz] * x[q - nz];
        if (ahead && i + 1 < nx) v += gx[q] * x[q + sx];
        if (ahead && j + 1 < ny) v += gy[q] * x[q + nz];
        y = (v + g * y) * inv[q];
        w[k] = y;
        g = line[q];
      }
    }
    backSubstitute(p0, nz, x);
  };

  /** Fin row r (line l, first node p0) of a fin with `rows` rows of `layers` nodes. */
  const finRow = (l: number, p0: number, layers: number, r: number, rows: number, b: Float64Array, x: Float64Array, ahead: boolean): void => {
    extrasOf(l, x, p0, layers);
    let y = 0;
    let g = 0;
    const below = r > 0;
    const above = ahead && r + 1 < rows;
    for (let k = 0; k < layers; k++) {
      const q = p0 + k;
      let v = w[k] + b[q];
      if (below) v += row[q - layers - plate] * x[q - layers];
      if (above) v += row[q - plate] * x[q + layers];
      y = (v + g * y) * inv[q];
      w[k] = y;
      g = line[q];
    }
    backSubstitute(p0, layers, x);
  };

  const finStart: number[] = [];
  const finLine: number[] = [];
  let offset = plate;
  let l0 = nx * ny;
  for (const f of grid.fins) {
    finStart.push(offset);
    finLine.push(l0);
    offset += f.rows * f.layers;
    l0 += f.rows;
  }

  return {
    sweep(b, x, direction, fromZero = false) {
      if (direction === 'forward') {
        for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) column(i, j, b, x, !fromZero);
        grid.fins.forEach((f, index) => {
          for (let r = 0; r < f.rows; r++) finRow(finLine[index] + r, finStart[index] + r * f.layers, f.layers, r, f.rows, b, x, !fromZero);
        });
        return;
      }
      for (let index = grid.fins.length - 1; index >= 0; index--) {
        const f = grid.fins[index];
        for (let r = f.rows - 1; r >= 0; r--) finRow(finLine[index] + r, finStart[index] + r * f.layers, f.layers, r, f.rows, b, x, true);
      }
      for (let i = nx - 1; i >= 0; i--) for (let j = ny - 1; j >= 0; j--) column(i, j, b, x, true);
    },
  };
}
