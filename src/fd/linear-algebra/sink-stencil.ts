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

/**
 * A level's couplings: Float64Array as assembled; Float32Array on the coarse levels of a multigrid whose smoother
 * stores its coefficients in float32 (sink-stencil-coarse.ts builds them so, with no float64 copy to round).
 */
export type Couplings = Float64Array | Float32Array;

export interface SinkStencil {
  readonly grid: SinkLevelGrid;
  readonly n: number;
  /** Plate cells nx ny nz (they come first). */
  readonly plate: number;
  /** Conductance from unknown p to p + 1 along its line (plate z, fin layers); 0 at a line's end, W/K. */
  readonly line: Couplings;
  /** Plate: conductance from (i, j, k) to (i+1, j, k) and to (i, j+1, k); 0 on the last plane, W/K. */
  readonly gx: Couplings;
  readonly gy: Couplings;
  /** Fin node p (at p − plate): conductance to the next row's node of the same layer; 0 on the last row, W/K. */
  readonly row: Couplings;
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
  parts: { line: Couplings; gx: Couplings; gy: Couplings; row: Couplings; excess: Float64Array; diagonal?: Float64Array },
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
  const line = new Float64Array(n);
  const gx = new Float64Array(plate);
  const gy = new Float64Array(plate);
  const row = new Float64Array(n - plate);
  const diagonal = new Float64Array(n);
  const rowSums = new Float64Array(n);
  const extras: ExtraCouplings = { from: [], to: [], g: [] };
  const target: CsrTarget = { a, line, gx, gy, row, diagonal, rowSums, extras, plate };
  let r = 0;
  for (let i = 0; i < nx; i++)
    for (let j = 0; j < ny; j++) for (let k = 0; k < nz; k++) classifyRow(target, r++, k + 1 < nz, j + 1 < ny ? nz : -1, i + 1 < nx ? ny * nz : -1);
  for (const f of grid.fins) {
    for (let J = 0; J < f.rows; J++) for (let l = 0; l < f.layers; l++) classifyRow(target, r++, l + 1 < f.layers, J + 1 < f.rows ? f.layers : -1, -1);
  }
  const excess = a.excess !== undefined ? Float64Array.from(a.excess) : rowSums;
  return buildStencil(grid, { line, gx, gy, row, excess, diagonal }, extras);
}

interface CsrTarget {
  a: CsrMatrix;
  line: Float64Array;
  gx: Float64Array;
  gy: Float64Array;
  row: Float64Array;
  diagonal: Float64Array;
  rowSums: Float64Array;
  extras: ExtraCouplings;
  plate: number;
}

/**
 * Row r's couplings to higher indices: to r + 1 along its line when `alongLine`, to r + second (plate: the next j;
 * fin: the next row; −1 none) and to r + third (plate: the next i; −1 none); any other pair is an extra.
 */
function classifyRow(t: CsrTarget, r: number, alongLine: boolean, second: number, third: number): void {
  const { rowStart, col, val } = t.a;
  const plateRow = r < t.plate;
  let sum = 0;
  for (let e = rowStart[r]; e < rowStart[r + 1]; e++) {
    const c = col[e];
    const v = val[e];
    sum += v;
    if (c <= r) {
      if (c === r) t.diagonal[r] += v;
      continue;
    }
    const d = c - r;
    if (d === 1 && alongLine) t.line[r] -= v;
    else if (d === second) {
      if (plateRow) t.gy[r] -= v;
      else t.row[r - t.plate] -= v;
    } else if (d === third) t.gx[r] -= v;
    else pushExtra(t.extras, r, c, -v);
  }
  t.rowSums[r] = sum;
}

/**
 * The stencil from an assembly's list of couplings (conductance g[c] between p[c] and q[c], ConductanceBuilder),
 * its diagonal and its conductances to fixed temperatures, classified as stencilFromCsr classifies the matrix's
 * entries, without a pass over the CSR matrix. `known`: the plate's couplings, already placed by the assembly
 * (the list's first `from` entries).
 */
export function stencilFromCouplings(
  grid: SinkLevelGrid,
  couplings: { p: Int32Array; q: Int32Array; g: Float64Array },
  diagonal: Float64Array,
  excess: Float64Array,
  known: { line: Float64Array; gx: Float64Array; gy: Float64Array; from: number },
): SinkStencil {
  const n = levelUnknowns(grid);
  const { nx, ny, nz } = grid;
  const plate = nx * ny * nz;
  const sx = ny * nz;
  const { line, gx, gy } = known;
  const row = new Float64Array(n - plate);
  const extras: ExtraCouplings = { from: [], to: [], g: [] };
  const lines = stencilLines(grid);
  const { p: ps, q: qs, g: gs } = couplings;
  for (let c = known.from; c < ps.length; c++) {
    const r = Math.min(ps[c], qs[c]);
    const t = Math.max(ps[c], qs[c]);
    const g = gs[c];
    const d = t - r;
    if (t < plate) {
      if (d === 1 && (r % nz) + 1 < nz) line[r] += g;
      else if (d === nz && Math.floor(r / nz) % ny !== ny - 1) gy[r] += g;
      else if (d === sx) gx[r] += g;
      else pushExtra(extras, r, t, g);
    } else if (r >= plate) {
      const f = finIndex(lines, r);
      const layers = grid.fins[f].layers;
      const local = r - lines.finOffset[f];
      if (d === 1 && (local % layers) + 1 < layers) line[r] += g;
      else if (d === layers && local + layers < grid.fins[f].rows * layers) row[r - plate] += g;
      else pushExtra(extras, r, t, g);
    } else pushExtra(extras, r, t, g);
  }
  return buildStencil(grid, { line, gx, gy, row, excess: Float64Array.from(excess), diagonal: Float64Array.from(diagonal) }, extras);
}

/** The fin of fin node p (p at or after the plate). */
function finIndex(lines: StencilLines, p: number): number {
  let f = lines.finOffset.length - 1;
  while (lines.finOffset[f] > p) f--;
  return f;
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
