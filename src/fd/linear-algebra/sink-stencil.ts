/**
 * A 3-D sink system held as its structured stencils (the multigrid's levels in sheet layout, aggregation.ts):
 *   plate cell (i, j, k), index (i ny + j) nz + k: conductances to (i+1, j, k), (i, j+1, k) and (i, j, k+1);
 *   fin node (row J, layer l), index offset_f + J L_f + l: conductances to (J+1, l) and (J, l+1);
 *   every other coupling (a fin's root on the plate's top cells) in a short list, by line;
 *   each unknown's conductance to fixed temperatures (its row sum, `excess`) and the matrix diagonal.
 * The matrix is the conductance matrix of csr.ts (units W/K):
 *   (A x)_p = e_p x_p + sum_q G_pq (x_p − x_q),
 * evaluated in that difference form like csrResidual, with neighbour offsets (strides) in place of column
 * indices. A line is a plate column in z or a fin row along its height, the lines of the line relaxation
 * (sink-stencil-relaxation.ts) and of levelLines (aggregation.ts), in that order; the couplings along a line are
 * `line` (index p to p + 1, 0 at a line's last member).
 */
import type { CsrMatrix } from './csr.js';
import { levelUnknowns, type SinkLevelGrid } from './aggregation.js';

export interface SinkStencil {
  readonly grid: SinkLevelGrid;
  readonly n: number;
  /** Plate cells nx ny nz (they come first). */
  readonly plate: number;
  /** Conductance from unknown p to p + 1 along its line (plate z, fin layers); 0 at a line's end, W/K. */
  readonly line: Float64Array;
  /** Plate: conductance from (i, j, k) to (i+1, j, k) and to (i, j+1, k); 0 on the last plane, W/K. */
  readonly gx: Float64Array;
  readonly gy: Float64Array;
  /** Fin node p (at p − plate): conductance to the next row's node of the same layer; 0 on the last row, W/K. */
  readonly row: Float64Array;
  /** Conductance to fixed temperatures (row sum), W/K. */
  readonly excess: Float64Array;
  /** A_pp: excess plus every coupling of p, W/K. */
  readonly diagonal: Float64Array;
  /** Other couplings, both directions, grouped by the line of `from`: entries [extraStart[l], extraStart[l + 1]). */
  readonly extraStart: Int32Array;
  readonly extraFrom: Int32Array;
  readonly extraTo: Int32Array;
  readonly extraG: Float64Array;
}

/** Lines of a level: the first member and the length of each, plate columns then fin rows. */
export interface StencilLines {
  readonly first: Int32Array;
  readonly length: Int32Array;
  /** Per fin: the index of its first line, its node offset and layers. */
  readonly finLine: Int32Array;
  readonly finOffset: Int32Array;
  readonly longest: number;
}

export function stencilLines(g: SinkLevelGrid): StencilLines {
  const columns = g.nx * g.ny;
  const count = columns + g.fins.reduce((s, f) => s + f.rows, 0);
  const first = new Int32Array(count);
  const length = new Int32Array(count);
  for (let c = 0; c < columns; c++) {
    first[c] = c * g.nz;
    length[c] = g.nz;
  }
  const finLine = new Int32Array(g.fins.length);
  const finOffset = new Int32Array(g.fins.length);
  let l = columns;
  let offset = columns * g.nz;
  let longest = g.nz;
  g.fins.forEach((f, index) => {
    finLine[index] = l;
    finOffset[index] = offset;
    longest = Math.max(longest, f.layers);
    for (let r = 0; r < f.rows; r++) {
      first[l] = offset + r * f.layers;
      length[l++] = f.layers;
    }
    offset += f.rows * f.layers;
  });
  return { first, length, finLine, finOffset, longest };
}

/** The line of unknown p. */
export function lineOf(g: SinkLevelGrid, lines: StencilLines, p: number): number {
  const plate = g.nx * g.ny * g.nz;
  if (p < plate) return Math.floor(p / g.nz);
  let f = g.fins.length - 1;
  while (lines.finOffset[f] > p) f--;
  return lines.finLine[f] + Math.floor((p - lines.finOffset[f]) / g.fins[f].layers);
}

/** Couplings not in the stencil, one direction each (from < to), before grouping. */
export interface ExtraCouplings {
  from: number[];
  to: number[];
  g: number[];
}

/**
 * The stencil from its parts: groups the extra couplings by line (both directions) and forms the diagonal as the
 * excess plus every coupling, unless `diagonal` is given.
 */
export function buildStencil(
  grid: SinkLevelGrid,
  parts: { line: Float64Array; gx: Float64Array; gy: Float64Array; row: Float64Array; excess: Float64Array; diagonal?: Float64Array },
  extras: ExtraCouplings,
): SinkStencil {
  const n = levelUnknowns(grid);
  const plate = grid.nx * grid.ny * grid.nz;
  const lines = stencilLines(grid);
  const count = lines.first.length;
  const m = extras.from.length;
  const lineFrom = new Int32Array(2 * m);
  const extraStart = new Int32Array(count + 1);
  for (let e = 0; e < m; e++) {
    lineFrom[2 * e] = lineOf(grid, lines, extras.from[e]);
    lineFrom[2 * e + 1] = lineOf(grid, lines, extras.to[e]);
    extraStart[lineFrom[2 * e] + 1]++;
    extraStart[lineFrom[2 * e + 1] + 1]++;
  }
  for (let l = 0; l < count; l++) extraStart[l + 1] += extraStart[l];
  const fill = extraStart.slice(0, count);
  const extraFrom = new Int32Array(2 * m);
  const extraTo = new Int32Array(2 * m);
  const extraG = new Float64Array(2 * m);
  for (let e = 0; e < m; e++) {
    const a = fill[lineFrom[2 * e]]++;
    extraFrom[a] = extras.from[e];
    extraTo[a] = extras.to[e];
    extraG[a] = extras.g[e];
    const b = fill[lineFrom[2 * e + 1]]++;
    extraFrom[b] = extras.to[e];
    extraTo[b] = extras.from[e];
    extraG[b] = extras.g[e];
  }
  let diagonal = parts.diagonal;
  if (diagonal === undefined) {
    const { line, gx, gy, row, excess } = parts;
    const d = Float64Array.from(excess);
    for (let p = 0; p + 1 < n; p++) {
      d[p] += line[p];
      d[p + 1] += line[p];
    }
    const sx = grid.ny * grid.nz;
    for (let p = 0; p < plate; p++) {
      d[p] += gx[p] + gy[p];
      if (p + sx < plate) d[p + sx] += gx[p];
      if (p + grid.nz < plate) d[p + grid.nz] += gy[p];
    }
    const offsets = lines.finOffset;
    grid.fins.forEach((f, index) => {
      const o = offsets[index];
      for (let q = 0; q < f.rows * f.layers; q++) {
        const r = row[o - plate + q];
        d[o + q] += r;
        if (q + f.layers < f.rows * f.layers) d[o + q + f.layers] += r;
      }
    });
    for (let e = 0; e < 2 * m; e++) d[extraFrom[e]] += extraG[e];
    diagonal = d;
  }
  return {
    grid,
    n,
    plate,
    line: parts.line,
    gx: parts.gx,
    gy: parts.gy,
    row: parts.row,
    excess: parts.excess,
    diagonal,
    extraStart,
    extraFrom,
    extraTo,
    extraG,
  };
}

/**
 * The stencil of a CSR conductance matrix whose unknowns follow `grid` (levelUnknowns order). Each coupling is
 * read from the upper triangle (the matrix is symmetric); neighbours in the grid go to the stencil, any other
 * pair to the extra list. The diagonal is the matrix's own; the excess its `excess` or its row sums.
 */
export function stencilFromCsr(a: CsrMatrix, grid: SinkLevelGrid): SinkStencil {
  const n = a.n;
  if (n !== levelUnknowns(grid)) throw new Error('stencilFromCsr: the level grid does not describe the matrix');
  const { nx, ny, nz } = grid;
  const plate = nx * ny * nz;
  const sx = ny * nz;
  const line = new Float64Array(n);
  const gx = new Float64Array(plate);
  const gy = new Float64Array(plate);
  const row = new Float64Array(n - plate);
  const diagonal = new Float64Array(n);
  const excess = new Float64Array(n);
  const extras: ExtraCouplings = { from: [], to: [], g: [] };
  const { rowStart, col, val } = a;
  const lines = stencilLines(grid);
  let f = -1;
  let finEnd = plate;
  let layers = 1;
  let offset = plate;
  let finNodes = 0;
  for (let r = 0; r < n; r++) {
    while (r >= finEnd) {
      f++;
      offset = lines.finOffset[f];
      layers = grid.fins[f].layers;
      finNodes = grid.fins[f].rows * layers;
      finEnd = offset + finNodes;
    }
    let sum = 0;
    // Position of r in its block: plate (k, j) or fin (l, row start).
    const k = r < plate ? r % nz : 0;
    const j = r < plate ? Math.floor(r / nz) % ny : 0;
    const l = r >= plate ? (r - offset) % layers : 0;
    for (let e = rowStart[r]; e < rowStart[r + 1]; e++) {
      const c = col[e];
      const v = val[e];
      sum += v;
      if (c === r) {
        diagonal[r] += v;
        continue;
      }
      if (c < r) continue;
      const d = c - r;
      const g = -v;
      if (r < plate && c < plate) {
        if (d === 1 && k + 1 < nz) line[r] += g;
        else if (d === nz && j + 1 < ny) gy[r] += g;
        else if (d === sx) gx[r] += g;
        else pushExtra(extras, r, c, g);
      } else if (r >= plate && c < finEnd) {
        if (d === 1 && l + 1 < layers) line[r] += g;
        else if (d === layers && r - offset + layers < finNodes) row[r - plate] += g;
        else pushExtra(extras, r, c, g);
      } else pushExtra(extras, r, c, g);
    }
    excess[r] = a.excess !== undefined ? a.excess[r] : sum;
  }
  return buildStencil(grid, { line, gx, gy, row, excess, diagonal }, extras);
}

function pushExtra(extras: ExtraCouplings, from: number, to: number, g: number): void {
  extras.from.push(from);
  extras.to.push(to);
  extras.g.push(g);
}

/** Stored entries of the matrix the stencil stands for (diagonal and both halves of every nonzero coupling). */
export function stencilEntries(s: SinkStencil): number {
  let couplings = 0;
  for (const v of [s.line, s.gx, s.gy, s.row]) for (let p = 0; p < v.length; p++) if (v[p] !== 0) couplings++;
  return s.n + 2 * couplings + s.extraFrom.length;
}

/** The stencil as a CSR matrix (diagonal first in every row, excess kept): the coarsest level's dense solve, tests. */
export function stencilToCsr(s: SinkStencil): CsrMatrix {
  const { n, plate, grid } = s;
  const cols: number[][] = Array.from({ length: n }, (_, r) => [r]);
  const vals: number[][] = Array.from({ length: n }, (_, r) => [s.diagonal[r]]);
  const couple = (p: number, q: number, g: number) => {
    if (g === 0) return;
    cols[p].push(q);
    vals[p].push(-g);
    cols[q].push(p);
    vals[q].push(-g);
  };
  for (let p = 0; p + 1 < n; p++) couple(p, p + 1, s.line[p]);
  const sx = grid.ny * grid.nz;
  for (let p = 0; p < plate; p++) {
    if (p + sx < plate) couple(p, p + sx, s.gx[p]);
    if (p + grid.nz < plate) couple(p, p + grid.nz, s.gy[p]);
  }
  let offset = plate;
  for (const f of grid.fins) {
    for (let q = 0; q + f.layers < f.rows * f.layers; q++) couple(offset + q, offset + q + f.layers, s.row[offset - plate + q]);
    offset += f.rows * f.layers;
  }
  for (let e = 0; e < s.extraFrom.length; e++) {
    if (s.extraFrom[e] < s.extraTo[e]) couple(s.extraFrom[e], s.extraTo[e], s.extraG[e]);
  }
  const rowStart = new Int32Array(n + 1);
  for (let r = 0; r < n; r++) rowStart[r + 1] = rowStart[r] + cols[r].length;
  return { n, rowStart, col: Int32Array.from(cols.flat()), val: Float64Array.from(vals.flat()), excess: Float64Array.from(s.excess) };
}

/** out = b − A x in the difference form b_p − e_p x_p − sum_q G_pq (x_p − x_q) (out may not alias x). */
export function stencilResidual(s: SinkStencil, x: Float64Array, b: Float64Array, out: Float64Array): void {
  differenceForm(s, x, b, 1, out);
}

/** out = A x in the difference form, with `zero` a vector of zeros (out may not alias x). */
export function stencilMultiply(s: SinkStencil, x: Float64Array, zero: Float64Array, out: Float64Array): void {
  differenceForm(s, x, zero, -1, out);
}

/**
 * out = sign (b − A x). Interior planes of the plate and interior rows of a fin in one flat pass each: a neighbour
 * across a column's or a row's end has a zero coupling there (0 on a line's last member, on the last row, on the
 * last j of a plane), so only the blocks' first and last planes or rows need bounds.
 */
function differenceForm(s: SinkStencil, x: Float64Array, b: Float64Array, sign: number, out: Float64Array): void {
  const { grid, n, plate, line, gx, gy, row, excess, extraFrom, extraTo, extraG } = s;
  const { nx, ny, nz } = grid;
  const sx = ny * nz;
  for (let p = sx; p < (nx - 1) * sx; p++) {
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
  const edgePlane = (i: number): void => {
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
  };
  edgePlane(0);
  if (nx > 1) edgePlane(nx - 1);
  let offset = plate;
  for (const f of grid.fins) {
    const L = f.layers;
    const end = offset + f.rows * L;
    for (let p = offset + L; p < end - L; p++) {
      const xp = x[p];
      const q = p - plate;
      out[p] =
        sign *
        (b[p] - excess[p] * xp + line[p] * (x[p + 1] - xp) + line[p - 1] * (x[p - 1] - xp) + row[q] * (x[p + L] - xp) + row[q - L] * (x[p - L] - xp));
    }
    const edgeRow = (p0: number): void => {
      for (let p = p0; p < p0 + L; p++) {
        const xp = x[p];
        let v = b[p] - excess[p] * xp;
        if (p > p0) v += line[p - 1] * (x[p - 1] - xp);
        if (p + 1 < p0 + L) v += line[p] * (x[p + 1] - xp);
        if (p - L >= offset) v += row[p - L - plate] * (x[p - L] - xp);
        if (p + L < end) v += row[p - plate] * (x[p + L] - xp);
        out[p] = sign * v;
      }
    };
    edgeRow(offset);
    if (f.rows > 1) edgeRow(end - L);
    offset = end;
  }
  for (let e = 0; e < extraFrom.length; e++) {
    const p = extraFrom[e];
    out[p] += sign * extraG[e] * (x[extraTo[e]] - x[p]);
  }
}
