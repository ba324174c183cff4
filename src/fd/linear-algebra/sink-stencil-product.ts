/**
 * The products of a sink stencil (sink-stencil.ts) in the difference form of csr.ts, W/K:
 *   out = sign (b − A x),  (A x)_p = e_p x_p + sum_q G_pq (x_p − x_q),
 * over the plate's planes (neighbours by strides), each fin's nodes, then the extra couplings: the residual
 * (sign 1) and the product (sign −1, b = 0) that the multigrid and CG use, equal to csrResidual / csrMultiply on the
 * matrix the stencil stands for (tests/sink/stencil.test.ts).
 */
import type { SinkStencil } from './sink-stencil.js';

/** out = b − A x in the difference form b_p − e_p x_p − sum_q G_pq (x_p − x_q) (out may not alias x). */
export function stencilResidual(s: SinkStencil, x: Float64Array, b: Float64Array, out: Float64Array): void {
  differenceForm(s, x, b, 1, out);
}

/**
 * out = A x in the difference form (out may not alias x): out is zeroed and serves as b, which each node reads
 * just before it writes its own entry (no vector of zeros to read).
 */
export function stencilMultiply(s: SinkStencil, x: Float64Array, out: Float64Array): void {
  out.fill(0);
  differenceForm(s, x, out, -1, out);
}

/**
 * out = sign (b − A x): the plate's planes, each fin's nodes, then the extra couplings (residualPlanes,
 * residualFin, residualExtras, also called plane by plane from a sweep, sink-stencil-relaxation.ts).
 */
function differenceForm(s: SinkStencil, x: Float64Array, b: Float64Array, sign: number, out: Float64Array): void {
  residualPlanes(s, x, b, sign, out, 0, s.grid.nx);
  for (let f = 0; f < s.grid.fins.length; f++) residualFin(s, x, b, sign, out, f);
  residualExtras(s, x, sign, out);
}

/**
 * out = sign (b − A x) on plate planes i0 .. i1 − 1 without the extra couplings. Interior planes in one flat
 * pass: a neighbour across a column's or a plane's j end has a zero coupling there (0 on a line's last member,
 * on the last j of a plane), so only the first and last planes need bounds.
 */
export function residualPlanes(s: SinkStencil, x: Float64Array, b: Float64Array, sign: number, out: Float64Array, i0: number, i1: number): void {
  const { grid, line, gx, gy, excess } = s;
  const { nx, ny, nz } = grid;
  const sx = ny * nz;
  const from = Math.max(i0, 1) * sx;
  const to = Math.min(i1, nx - 1) * sx;
  for (let p = from; p < to; p++) {
    const xp = x[p];
    out[p] =
      sign *
      (b[p] -
        excess[p] * xp +
        line[p] * (x[p + 1] - xp) +
        line[p - 1] * (x[p - 1] - xp) +
        gx[p] * (x[p + sx] - xp) +
        gx[p - sx] * (x[p - sx] - xp) +
        gy[p] * (x[p + nz] - xp) +
        gy[p - nz] * (x[p - nz] - xp));
  }
  if (i0 === 0) edgePlane(s, x, b, sign, out, 0);
  if (nx > 1 && i1 === nx) edgePlane(s, x, b, sign, out, nx - 1);
}

function edgePlane(s: SinkStencil, x: Float64Array, b: Float64Array, sign: number, out: Float64Array, i: number): void {
  const { grid, n, line, gx, gy, excess } = s;
  const { nx, ny, nz } = grid;
  const sx = ny * nz;
  const p0 = i * sx;
  const p1 = p0 + sx;
  for (let p = p0; p < p1; p++) {
    const xp = x[p];
    let v = b[p] - excess[p] * xp;
    if (p > 0) v += line[p - 1] * (x[p - 1] - xp);
    if (p + 1 < n) v += line[p] * (x[p + 1] - xp);
    if (i > 0) v += gx[p - sx] * (x[p - sx] - xp);
    if (i + 1 < nx) v += gx[p] * (x[p + sx] - xp);
    if (p - nz >= p0) v += gy[p - nz] * (x[p - nz] - xp);
    if (p + nz < p1) v += gy[p] * (x[p + nz] - xp);
    out[p] = sign * v;
  }
}

/** First node of each fin (after the plate). */
function finOffset(s: SinkStencil, f: number): number {
  let offset = s.plate;
  for (let k = 0; k < f; k++) offset += s.grid.fins[k].rows * s.grid.fins[k].layers;
  return offset;
}

/** out = sign (b − A x) on fin f's nodes without the extra couplings (interior rows flat, the first and last bounded). */
export function residualFin(s: SinkStencil, x: Float64Array, b: Float64Array, sign: number, out: Float64Array, f: number): void {
  const { plate, line, row, excess } = s;
  const fin = s.grid.fins[f];
  const L = fin.layers;
  const offset = finOffset(s, f);
  const end = offset + fin.rows * L;
  finInterior(x, b, sign, out, line, row, excess, plate, offset + L, end - L, L);
  finEdgeRow(x, b, sign, out, line, row, excess, plate, offset, L, offset, end);
  if (fin.rows > 1) finEdgeRow(x, b, sign, out, line, row, excess, plate, end - L, L, offset, end);
}

/** Rows with a row on either side, nodes from .. to − 1 (L layers a row). */
function finInterior(
  x: Float64Array,
  b: Float64Array,
  sign: number,
  out: Float64Array,
  line: Float64Array,
  row: Float64Array,
  excess: Float64Array,
  plate: number,
  from: number,
  to: number,
  L: number,
): void {
  for (let p = from; p < to; p++) {
    const xp = x[p];
    const q = p - plate;
    out[p] =
      sign * (b[p] - excess[p] * xp + line[p] * (x[p + 1] - xp) + line[p - 1] * (x[p - 1] - xp) + row[q] * (x[p + L] - xp) + row[q - L] * (x[p - L] - xp));
  }
}

/** The row from p0 of a fin occupying offset .. end − 1, each neighbour bounded. */
function finEdgeRow(
  x: Float64Array,
  b: Float64Array,
  sign: number,
  out: Float64Array,
  line: Float64Array,
  row: Float64Array,
  excess: Float64Array,
  plate: number,
  p0: number,
  L: number,
  offset: number,
  end: number,
): void {
  for (let p = p0; p < p0 + L; p++) {
    const xp = x[p];
    let v = b[p] - excess[p] * xp;
    if (p > p0) v += line[p - 1] * (x[p - 1] - xp);
    if (p + 1 < p0 + L) v += line[p] * (x[p + 1] - xp);
    if (p - L >= offset) v += row[p - L - plate] * (x[p - L] - xp);
    if (p + L < end) v += row[p - plate] * (x[p + L] - xp);
    out[p] = sign * v;
  }
}

/** out += sign (the extra couplings' part of b − A x). */
export function residualExtras(s: SinkStencil, x: Float64Array, sign: number, out: Float64Array): void {
  const { extraFrom, extraTo, extraG } = s;
  for (let e = 0; e < extraFrom.length; e++) {
    const p = extraFrom[e];
    out[p] += sign * extraG[e] * (x[extraTo[e]] - x[p]);
  }
}
