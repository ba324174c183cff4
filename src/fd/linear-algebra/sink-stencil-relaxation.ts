/**
 * Line Gauss-Seidel on a structured sink stencil (sink-stencil.ts): the same relaxation as line-relaxation.ts
 * (plate columns in z, then fin rows along their height, each line's tridiagonal system solved exactly with the
 * couplings off the line at their current values,
 *   T_l x_l = b_l + sum_{q not on the line} G_lq x_q),
 * read through strides instead of column indices. Forward then backward is symmetric block Gauss-Seidel, SPD for
 * an SPD matrix (Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed. 2003, sections 4.1 and 9.2
 * [from memory]). The lines are factored once from both ends (twistedFactor below); the elimination
 * multipliers g inv are formed on the fly from the couplings.
 * A forward sweep from x = 0 (`fromZero`) skips the couplings to lines not yet visited (their x is 0), so it reads
 * no entry of x before writing it and x need not be zeroed first.
 * Precision 'float32' keeps the sweep's couplings and line factors as Float32Array (half the memory traffic of the
 * sweeps, which are bound by it); x, b and every sum stay Float64. The sweep is then exact line Gauss-Seidel for a
 * matrix within ~6e-8 relative of A entry by entry (float32 rounding, eps/2), which is enough for a preconditioner:
 * CG's own products and residuals use A itself, so the solution's accuracy does not depend on it.
 */
import type { SinkStencil } from './sink-stencil.js';
import { MemoryPlan, type KernelMemory } from '../wasm/kernel-memory.js';

export interface StencilRelaxation {
  /** One sweep over the lines, forward or backward, updating x in place; fromZero: as from x = 0 (x's values on entry are not read; forward only). */
  sweep(b: Float64Array, x: Float64Array, direction: 'forward' | 'backward', fromZero?: boolean): void;
  /**
   * A backward sweep that returns b · x of its result, summed line by line as each is solved (the sweep's last
   * word on a line): a preconditioner's final sweep gives CG its r · z without another pass over both vectors.
   */
  backwardDot(b: Float64Array, x: Float64Array): number;
  /**
   * A forward sweep from x = 0 (x's values on entry are not read) followed by r = b − A x. Each line l was solved from
   *   T_l x_l = b_l + sum_{q on lines before l} G_lq x_q    (the lines after l still at 0),
   * so its residual is the couplings to the lines after it alone, r_l = sum_{q on lines after l} G_lq x_q (the
   * upper block part of A times x: Gauss-Seidel's residual, Saad 2003, section 4.1 [from memory]), formed with the
   * sweep's own coefficients: two products per plate cell (x and y successors) and one per fin node instead of
   * the full difference form. A plate plane's residual is formed as soon as the sweep has passed the next plane
   * (while both are in cache), each fin's after its rows, the extra couplings (fin roots) last.
   */
  forwardResidual(b: Float64Array, x: Float64Array, r: Float64Array): void;
}

/** Storage of the sweep's coefficients: 'float64' the stencil's own arrays, 'float32' rounded copies. */
export type RelaxationPrecision = 'float64' | 'float32';

/** A sweep's coefficient array (its values are read as numbers, so the two kinds share the loops). */
type Coefficients = Float64Array | Float32Array;

/**
 * `memory`, when given, holds the sweep's coefficients (planned with relaxationBytes): a sweep whose vectors are views
 * into the same block runs as WebAssembly (src/fd/wasm/assembly/line-sweeps.ts, the same operations in the same order,
 * so the same bits as the loops below, which serve every other call).
 */
export function stencilRelaxation(s: SinkStencil, precision: RelaxationPrecision = 'float64', memory: KernelMemory | null = null): StencilRelaxation {
  return new StencilLines(s, precision, memory);
}

/** Words of a level's descriptor for the kernels (line-sweeps.ts). */
const DESCRIPTOR_WORDS = 21;

/** The bytes stencilRelaxation(s, precision, memory) takes from `memory`. */
export function relaxationBytes(s: SinkStencil, precision: RelaxationPrecision): number {
  const c = precision === 'float32' ? 4 : 8;
  const lines = s.extraStart.length - 1;
  const extras = s.extraTo.length;
  const fins = s.grid.fins.length;
  return new MemoryPlan()
    .add(s.line.length, c)
    .add(s.gx.length, c)
    .add(s.gy.length, c)
    .add(s.row.length, c)
    .add(s.n, c)
    .add(longestLine(s), 8)
    .add(lines + 1, 4)
    .add(extras, 4)
    .add(extras, 4)
    .add(extras, 8)
    .add(extras, 1)
    .add(fins, 4)
    .add(fins, 4)
    .add(fins, 4)
    .add(fins, 4)
    .add(DESCRIPTOR_WORDS, 4).bytes;
}

function longestLine(s: SinkStencil): number {
  let longest = s.grid.nz;
  for (const f of s.grid.fins) longest = Math.max(longest, f.layers);
  return longest;
}

/**
 * The relaxation's state. Its hot loops are top-level functions taking arrays and counts as arguments: a closure
 * per level would share one optimised code object across levels and read every captured value from its context.
 */
class StencilLines implements StencilRelaxation {
  private readonly inv: Coefficients;
  private readonly line: Coefficients;
  private readonly gx: Coefficients;
  private readonly gy: Coefficients;
  private readonly row: Coefficients;
  /** The line's right-hand side, then its eliminated form. */
  private readonly w: Float64Array;
  private readonly finStart: number[] = [];
  private readonly finLine: number[] = [];
  /** Per extra coupling (extraTo order): 1 when its `to` lies on a line after its `from`'s (or on the same line). */
  private readonly extraAhead: Uint8Array;
  /** With a kernel memory: the block and the byte offset of this level's descriptor in it. */
  private readonly wasm: { memory: KernelMemory; level: number } | null = null;

  constructor(
    private readonly s: SinkStencil,
    precision: RelaxationPrecision,
    memory: KernelMemory | null,
  ) {
    const single = precision === 'float32';
    // A copy into the kernel memory, or else: float32 storage rounds a float64 array (a coarse level built in float32
    // by sink-stencil-coarse.ts is used as it is) and float64 storage is the stencil's own.
    const store = (v: Coefficients): Coefficients => {
      if (memory !== null) {
        const c = single ? memory.f32(v.length) : memory.f64(v.length);
        c.set(v);
        return c;
      }
      if (!single) return v;
      return v instanceof Float32Array ? v : new Float32Array(v);
    };
    this.line = store(s.line);
    this.gx = store(s.gx);
    this.gy = store(s.gy);
    this.row = store(s.row);
    this.inv = twistedFactor(
      s,
      this.line,
      memory !== null ? (single ? memory.f32(s.n) : memory.f64(s.n)) : single ? new Float32Array(s.n) : new Float64Array(s.n),
    );
    const longest = longestLine(s);
    this.w = memory !== null ? memory.f64(longest) : new Float64Array(longest);
    let offset = s.plate;
    let l0 = s.grid.nx * s.grid.ny;
    for (const f of s.grid.fins) {
      this.finStart.push(offset);
      this.finLine.push(l0);
      offset += f.rows * f.layers;
      l0 += f.rows;
    }
    // Lines are contiguous in index order: `to` is not on an earlier line when it is at or after its line's start.
    this.extraAhead = memory !== null ? memory.u8(s.extraTo.length) : new Uint8Array(s.extraTo.length);
    const lines = s.extraStart.length - 1;
    const columns = s.grid.nx * s.grid.ny;
    let fin = -1;
    let finEnd = columns;
    for (let l = 0; l < lines; l++) {
      let start: number;
      if (l < columns) start = l * s.grid.nz;
      else {
        while (l >= finEnd) finEnd += s.grid.fins[++fin].rows;
        start = this.finStart[fin] + (l - this.finLine[fin]) * s.grid.fins[fin].layers;
      }
      for (let e = s.extraStart[l]; e < s.extraStart[l + 1]; e++) this.extraAhead[e] = s.extraTo[e] >= start ? 1 : 0;
    }
    if (memory !== null) this.wasm = { memory, level: this.descriptor(memory, single) };
  }

  /** The level's descriptor for the kernels (line-sweeps.ts: its layout), with the extras and fin tables copied in. */
  private descriptor(memory: KernelMemory, single: boolean): number {
    const s = this.s;
    const fins = s.grid.fins;
    const at = (v: ArrayBufferView): number => v.byteOffset;
    const d = memory.i32(DESCRIPTOR_WORDS);
    d.set([
      s.grid.nx,
      s.grid.ny,
      s.grid.nz,
      s.plate,
      fins.length,
      at(this.line),
      at(this.gx),
      at(this.gy),
      at(this.row),
      at(this.inv),
      at(this.w),
      memory.copyI32(s.extraStart),
      memory.copyI32(s.extraFrom),
      memory.copyI32(s.extraTo),
      memory.copyF64(s.extraG),
      at(this.extraAhead),
      memory.copyI32(this.finStart),
      memory.copyI32(this.finLine),
      memory.copyI32(fins.map((f) => f.rows)),
      memory.copyI32(fins.map((f) => f.layers)),
      single ? 1 : 0,
    ]);
    return d.byteOffset;
  }

  /** The kernels and the level's descriptor when every vector given is a view into the kernel memory. */
  private kernelsFor(...v: Float64Array[]): { k: KernelMemory['kernels']; level: number } | null {
    const wasm = this.wasm;
    if (wasm === null) return null;
    for (const a of v) if (!wasm.memory.holds(a)) return null;
    return { k: wasm.memory.kernels, level: wasm.level };
  }

  sweep(b: Float64Array, x: Float64Array, direction: 'forward' | 'backward', fromZero = false): void {
    const wasm = this.kernelsFor(b, x);
    if (wasm !== null) {
      if (direction === 'forward') wasm.k.sweepForward(wasm.level, b.byteOffset, x.byteOffset, fromZero ? 1 : 0);
      else wasm.k.sweepBackward(wasm.level, b.byteOffset, x.byteOffset, 0);
      return;
    }
    const nx = this.s.grid.nx;
    if (direction === 'forward') {
      for (let i = 0; i < nx; i++) this.plane(i, b, x, !fromZero, true);
      for (let f = 0; f < this.s.grid.fins.length; f++) this.fin(f, b, x, !fromZero, true);
      return;
    }
    for (let f = this.s.grid.fins.length - 1; f >= 0; f--) this.fin(f, b, x, true, false);
    for (let i = nx - 1; i >= 0; i--) this.plane(i, b, x, true, false);
  }

  backwardDot(b: Float64Array, x: Float64Array): number {
    const wasm = this.kernelsFor(b, x);
    if (wasm !== null) return wasm.k.sweepBackward(wasm.level, b.byteOffset, x.byteOffset, 1);
    let dot = 0;
    for (let f = this.s.grid.fins.length - 1; f >= 0; f--) dot += this.fin(f, b, x, true, false, true);
    for (let i = this.s.grid.nx - 1; i >= 0; i--) dot += this.plane(i, b, x, true, false, true);
    return dot;
  }

  forwardResidual(b: Float64Array, x: Float64Array, r: Float64Array): void {
    const wasm = this.kernelsFor(b, x, r);
    if (wasm !== null) {
      wasm.k.forwardResidual(wasm.level, b.byteOffset, x.byteOffset, r.byteOffset);
      return;
    }
    const s = this.s;
    const { nx, ny, nz } = s.grid;
    // No x.fill(0): a sweep from zero reads only members of lines it has already solved (the extra couplings to
    // later lines and to its own line skipped, addExtras), so every x it reads it has written.
    for (let i = 0; i < nx; i++) {
      this.plane(i, b, x, false, true);
      if (i > 0) aheadPlane(r, x, this.gx, this.gy, (i - 1) * ny * nz, ny, nz, true);
    }
    aheadPlane(r, x, this.gx, this.gy, (nx - 1) * ny * nz, ny, nz, false);
    for (let f = 0; f < s.grid.fins.length; f++) {
      this.fin(f, b, x, false, true);
      const { rows, layers } = s.grid.fins[f];
      aheadFin(r, x, this.row, this.finStart[f], rows * layers, layers, s.plate);
    }
    const { extraFrom, extraTo, extraG } = s;
    const ahead = this.extraAhead;
    for (let e = 0; e < extraTo.length; e++) if (ahead[e] === 1) r[extraFrom[e]] += extraG[e] * x[extraTo[e]];
  }

  /**
   * The columns of plate plane i, j ascending (forward) or descending; ahead: read the unvisited neighbours.
   * withDot: returns b · x over the plane's lines as solved (0 otherwise).
   */
  private plane(i: number, b: Float64Array, x: Float64Array, ahead: boolean, forward: boolean, withDot = false): number {
    const { grid, extraStart, extraFrom, extraTo, extraG } = this.s;
    const { nx, ny, nz } = grid;
    const { inv, w, line, gx, gy } = this;
    const sx = ny * nz;
    const interior = i > 0 && i + 1 < nx;
    let dot = 0;
    for (let t = 0; t < ny; t++) {
      const j = forward ? t : ny - 1 - t;
      const p0 = (i * ny + j) * nz;
      if (interior) gatherInterior(w, b, x, gx, gy, p0, nz, sx, ahead);
      else gatherEdge(w, b, x, gx, gy, p0, nz, sx, i > 0, j > 0, ahead && i + 1 < nx, ahead && j + 1 < ny);
      const l = i * ny + j;
      if (extraStart[l] < extraStart[l + 1]) addExtras(w, x, extraStart, extraFrom, extraTo, extraG, l, p0, ahead ? null : this.extraAhead);
      solveLine(w, x, inv, line, p0, nz);
      if (withDot) dot += lineDot(b, x, p0, nz);
    }
    return dot;
  }

  /** The rows of fin f, ascending (forward) or descending; withDot as for plane. */
  private fin(f: number, b: Float64Array, x: Float64Array, ahead: boolean, forward: boolean, withDot = false): number {
    const { plate, extraStart, extraFrom, extraTo, extraG } = this.s;
    const { rows, layers } = this.s.grid.fins[f];
    const { inv, w, line, row } = this;
    let dot = 0;
    for (let t = 0; t < rows; t++) {
      const r = forward ? t : rows - 1 - t;
      const p0 = this.finStart[f] + r * layers;
      gatherFin(w, b, x, row, p0, layers, plate, r > 0, ahead && r + 1 < rows);
      const l = this.finLine[f] + r;
      if (extraStart[l] < extraStart[l + 1]) addExtras(w, x, extraStart, extraFrom, extraTo, extraG, l, p0, ahead ? null : this.extraAhead);
      solveLine(w, x, inv, line, p0, layers);
      if (withDot) dot += lineDot(b, x, p0, layers);
    }
    return dot;
  }
}

/** b · x over one line's members (p0 .. p0 + len − 1). */
function lineDot(b: Float64Array, x: Float64Array, p0: number, len: number): number {
  let s = 0;
  for (let q = p0; q < p0 + len; q++) s += b[q] * x[q];
  return s;
}

/** r = the couplings of plate plane at p0 to its successors in y and (east: when there is a next plane) in x. */
function aheadPlane(r: Float64Array, x: Float64Array, gx: Coefficients, gy: Coefficients, p0: number, ny: number, nz: number, east: boolean): void {
  const sx = ny * nz;
  const inner = (ny - 1) * nz;
  if (east) {
    for (let q = p0; q < p0 + inner; q++) r[q] = gx[q] * x[q + sx] + gy[q] * x[q + nz];
    for (let q = p0 + inner; q < p0 + sx; q++) r[q] = gx[q] * x[q + sx];
  } else {
    for (let q = p0; q < p0 + inner; q++) r[q] = gy[q] * x[q + nz];
    for (let q = p0 + inner; q < p0 + sx; q++) r[q] = 0;
  }
}

/** r = the couplings of a fin's nodes (from p0, count of them) to the next row's. */
function aheadFin(r: Float64Array, x: Float64Array, row: Coefficients, p0: number, count: number, layers: number, plate: number): void {
  const last = p0 + count - layers;
  for (let q = p0; q < last; q++) r[q] = row[q - plate] * x[q + layers];
  for (let q = last; q < p0 + count; q++) r[q] = 0;
}

/** w = b + the couplings of an interior plane's column to its neighbours (ahead: also (i+1, j) and (i, j+1)). */
function gatherInterior(
  w: Float64Array,
  b: Float64Array,
  x: Float64Array,
  gx: Coefficients,
  gy: Coefficients,
  p0: number,
  nz: number,
  sx: number,
  ahead: boolean,
): void {
  if (ahead) {
    for (let k = 0, q = p0; k < nz; k++, q++) w[k] = b[q] + gx[q - sx] * x[q - sx] + gx[q] * x[q + sx] + gy[q - nz] * x[q - nz] + gy[q] * x[q + nz];
  } else {
    for (let k = 0, q = p0; k < nz; k++, q++) w[k] = b[q] + gx[q - sx] * x[q - sx] + gy[q - nz] * x[q - nz];
  }
}

/** As gatherInterior for a column of the first or last plane, with each neighbour by its own flag. */
function gatherEdge(
  w: Float64Array,
  b: Float64Array,
  x: Float64Array,
  gx: Coefficients,
  gy: Coefficients,
  p0: number,
  nz: number,
  sx: number,
  west: boolean,
  south: boolean,
  east: boolean,
  north: boolean,
): void {
  for (let k = 0, q = p0; k < nz; k++, q++) {
    let v = b[q];
    if (west) v += gx[q - sx] * x[q - sx];
    if (south) v += gy[q - nz] * x[q - nz];
    if (east) v += gx[q] * x[q + sx];
    if (north) v += gy[q] * x[q + nz];
    w[k] = v;
  }
}

/** w = b + a fin row's couplings to the rows below and above (when they are read). */
function gatherFin(
  w: Float64Array,
  b: Float64Array,
  x: Float64Array,
  row: Coefficients,
  p0: number,
  layers: number,
  plate: number,
  below: boolean,
  above: boolean,
): void {
  for (let k = 0, q = p0; k < layers; k++, q++) {
    let v = b[q];
    if (below) v += row[q - layers - plate] * x[q - layers];
    if (above) v += row[q - plate] * x[q + layers];
    w[k] = v;
  }
}

/**
 * w += the extra couplings' part of line l's right-hand side; `skip` given (a sweep from zero): without the
 * couplings it flags (to a later line or the same one, whose x is still 0 in such a sweep).
 */
function addExtras(
  w: Float64Array,
  x: Float64Array,
  start: Int32Array,
  from: Int32Array,
  to: Int32Array,
  g: Float64Array,
  l: number,
  p0: number,
  skip: Uint8Array | null,
): void {
  for (let e = start[l]; e < start[l + 1]; e++) if (skip === null || skip[e] === 0) w[from[e] - p0] += g[e] * x[to[e]];
}

/**
 * x[p0 .. p0 + len) = T^-1 w, eliminating from both ends towards the middle member m = floor(len / 2) at once
 * (two independent recurrences instead of one twice as long), then substituting back outwards from m.
 */
function solveLine(w: Float64Array, x: Float64Array, inv: Coefficients, line: Coefficients, p0: number, len: number): void {
  const m = len >> 1;
  let yTop = 0;
  let gTop = 0;
  let yBottom = 0;
  for (let t = 0; t < m; t++) {
    const q = p0 + t;
    yTop = (w[t] + gTop * yTop) * inv[q];
    w[t] = yTop;
    gTop = line[q];
    const k = len - 1 - t;
    if (k > m) {
      const qb = p0 + k;
      yBottom = (w[k] + line[qb] * yBottom) * inv[qb];
      w[k] = yBottom;
    }
  }
  const pm = p0 + m;
  const xm = (w[m] + gTop * yTop + line[pm] * yBottom) * inv[pm];
  x[pm] = xm;
  let xTop = xm;
  let xBottom = xm;
  for (let t = 1; t <= m; t++) {
    const q = pm - t;
    xTop = w[m - t] + line[q] * inv[q] * xTop;
    x[q] = xTop;
    if (m + t < len) {
      const qb = pm + t;
      xBottom = w[m + t] + line[qb - 1] * inv[qb] * xBottom;
      x[qb] = xBottom;
    }
  }
}

/**
 * The twisted factorisation of every line (Thomas elimination from both ends, diagonally dominant M-matrix lines,
 * no pivoting): with the line's members 0 .. len − 1, couplings g_k between k and k + 1, and m = floor(len / 2),
 *   k < m  inv_k = 1 / (A_kk − g_{k−1}^2 inv_{k−1})     (from the top),
 *   k > m  inv_k = 1 / (A_kk − g_k^2 inv_{k+1})          (from the bottom),
 *   k = m  inv_m = 1 / (A_mm − g_{m−1}^2 inv_{m−1} − g_m^2 inv_{m+1}).
 * `line` the couplings as the sweeps store them, `inv` filled (in float32 storage each inv_k is rounded before the
 * next step reads it, so the factors are exact for a diagonal within float32 rounding of A's).
 */
function twistedFactor(s: SinkStencil, line: Coefficients, inv: Coefficients): Coefficients {
  const { grid, diagonal } = s;
  const factor = (p0: number, len: number): void => {
    const m = len >> 1;
    for (let k = 0; k < m; k++) {
      const p = p0 + k;
      inv[p] = 1 / (diagonal[p] - (k > 0 ? line[p - 1] * line[p - 1] * inv[p - 1] : 0));
    }
    for (let k = len - 1; k > m; k--) {
      const p = p0 + k;
      inv[p] = 1 / (diagonal[p] - (k + 1 < len ? line[p] * line[p] * inv[p + 1] : 0));
    }
    const p = p0 + m;
    inv[p] = 1 / (diagonal[p] - (m > 0 ? line[p - 1] * line[p - 1] * inv[p - 1] : 0) - (m + 1 < len ? line[p] * line[p] * inv[p + 1] : 0));
  };
  for (let c = 0; c < grid.nx * grid.ny; c++) factor(c * grid.nz, grid.nz);
  let offset = s.plate;
  for (const f of grid.fins) {
    for (let r = 0; r < f.rows; r++) factor(offset + r * f.layers, f.layers);
    offset += f.rows * f.layers;
  }
  return inv;
}
