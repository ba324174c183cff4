/**
 * The products of a sink stencil (sink-stencil.ts) in the difference form of csr.ts, W/K:
 *   out = sign (b − A x),  (A x)_p = e_p x_p + sum_q G_pq (x_p − x_q),
 * over the plate's planes (neighbours by strides), each fin's nodes, then the extra couplings: the residual
 * (sign 1) and the product (sign −1, b = 0) that the multigrid and CG use, equal to csrResidual / csrMultiply on the
 * matrix the stencil stands for (tests/sink/stencil.test.ts). stencilInMemory gives the same two as WebAssembly
 * (src/fd/wasm/assembly/stencil-products.ts, the same operations in the same order, so the same bits).
 */
import type { Couplings, SinkStencil } from './sink-stencil.js';
import { MemoryPlan, type KernelMemory } from '../wasm/kernel-memory.js';

/** Words of a stencil's descriptor for the product kernels (src/fd/wasm/assembly/stencil-products.ts). */
const DESCRIPTOR_WORDS = 18;

/** The bytes stencilInMemory takes: a float64 copy of the stencil's couplings, extras and fin tables. */
export function stencilMemoryBytes(s: SinkStencil): number {
  const fins = s.grid.fins.length;
  const e = s.extraTo.length;
  return new MemoryPlan()
    .add(s.line.length, 8)
    .add(s.gx.length, 8)
    .add(s.gy.length, 8)
    .add(s.row.length, 8)
    .add(s.excess.length, 8)
    .add(e, 4)
    .add(e, 4)
    .add(e, 8)
    .add(fins, 4)
    .add(fins, 4)
    .add(fins, 4)
    .add(DESCRIPTOR_WORDS, 4).bytes;
}

/** The products of s (float64 couplings) as WebAssembly kernels on vectors in `memory`, with s copied into it. */
export interface KernelProducts {
  /** out = A x; returns x · A x (x and out views into the memory). */
  multiply(x: Float64Array, out: Float64Array): number;
  /** out = b − A x; returns |out|_1. */
  residual(x: Float64Array, b: Float64Array, out: Float64Array): number;
}

export function stencilInMemory(s: SinkStencil, memory: KernelMemory): KernelProducts {
  const f64 = (v: ArrayLike<number>): number => memory.copyF64(v);
  const i32 = (v: ArrayLike<number>): number => memory.copyI32(v);
  const fins = s.grid.fins;
  const d = memory.i32(DESCRIPTOR_WORDS);
  d.set([
    s.grid.nx,
    s.grid.ny,
    s.grid.nz,
    s.n,
    s.plate,
    fins.length,
    f64(s.line),
    f64(s.gx),
    f64(s.gy),
    f64(s.row),
    f64(s.excess),
    s.extraTo.length,
    i32(s.extraFrom),
    i32(s.extraTo),
    f64(s.extraG),
    i32(fins.map((_, f) => finOffset(s, f))),
    i32(fins.map((f) => f.rows)),
    i32(fins.map((f) => f.layers)),
  ]);
  const level = d.byteOffset;
  const k = memory.kernels;
  return {
    multiply: (x, out) => k.stencilMultiply(level, x.byteOffset, out.byteOffset),
    residual: (x, b, out) => k.stencilResidual(level, x.byteOffset, b.byteOffset, out.byteOffset),
  };
}

/** out = b − A x in the difference form b_p − e_p x_p − sum_q G_pq (x_p − x_q) (out may not alias x). */
export function stencilResidual(s: SinkStencil, x: Float64Array, b: Float64Array, out: Float64Array): void {
  differenceForm(s, x, b, 1, out);
}

/**
 * out = A x in the difference form (out may not alias x); returns x · A x, summed as each entry is formed (CG's
 * p · A p without a second pass over both vectors). The interior planes by their own loop; the edge planes and
 * the fins, a small part, through the residual's with out zeroed as b.
 */
export function stencilMultiply(s: SinkStencil, x: Float64Array, out: Float64Array): number {
  const { nx, ny, nz } = s.grid;
  const sx = ny * nz;
  let dot = productInterior(s, x, out, sx, Math.max(nx - 1, 1) * sx);
  const edge = (p0: number, p1: number, form: () => void): void => {
    out.fill(0, p0, p1);
    form();
    for (let p = p0; p < p1; p++) dot += x[p] * out[p];
  };
  edge(0, sx, () => edgePlane(s, x, out, -1, out, 0));
  if (nx > 1) edge((nx - 1) * sx, nx * sx, () => edgePlane(s, x, out, -1, out, nx - 1));
  for (let f = 0; f < s.grid.fins.length; f++) {
    const offset = finOffset(s, f);
    edge(offset, offset + s.grid.fins[f].rows * s.grid.fins[f].layers, () => residualFin(s, x, out, -1, out, f));
  }
  const { extraFrom, extraTo, extraG } = s;
  for (let e = 0; e < extraFrom.length; e++) {
    const p = extraFrom[e];
    const d = extraG[e] * (x[p] - x[extraTo[e]]);
    out[p] += d;
    dot += x[p] * d;
  }
  return dot;
}

/** out = A x on the plate's interior planes (indices from .. to − 1, see residualPlanes); returns their x · A x. */
function productInterior(s: SinkStencil, x: Float64Array, out: Float64Array, from: number, to: number): number {
  const { grid, line, gx, gy, excess } = s;
  const { ny, nz } = grid;
  const sx = ny * nz;
  let dot = 0;
  for (let p = from; p < to; p++) {
    const xp = x[p];
    const v =
      excess[p] * xp +
      line[p] * (xp - x[p + 1]) +
      line[p - 1] * (xp - x[p - 1]) +
      gx[p] * (xp - x[p + sx]) +
      gx[p - sx] * (xp - x[p - sx]) +
      gy[p] * (xp - x[p + nz]) +
      gy[p - nz] * (xp - x[p - nz]);
    out[p] = v;
    dot += xp * v;
  }
  return dot;
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
  line: Couplings,
  row: Couplings,
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
  line: Couplings,
  row: Couplings,
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
