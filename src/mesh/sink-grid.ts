/**
 * The tensor-product finite-volume grid of a heat sink's plate (cell-centred), and the layers of its fins.
 *
 * x lines fall on the plate's edges, on every fin footprint's x edges and on every source's x edges; y lines on
 * the plate's ends, the sources' y edges and (pins) the footprints' y edges. Footprints and sources are then
 * unions of whole cells. Each segment between consecutive lines gets max(1, round(length / cellSize)) cells on
 * the unrefined grid, times `refine`: grids with refine 1, 2, 4 are nested with ratio 2 exactly. The plate has
 * `plateLayers x refine` equal layers in z (underside z = 0); a fin `finLayers x refine` equal layers along its
 * height s (root s = 0).
 * Lines closer than 1e-9 of the plate's size are merged (their footprints are taken as touching).
 */
import type { Rectangle, SinkLayout } from './sink-layout.js';

export interface SinkGridSpec {
  /** Target cell size in x and y on the unrefined grid, m. */
  cellSize: number;
  /** Plate layers on the unrefined grid. */
  plateLayers: number;
  /** Fin layers along the height on the unrefined grid. */
  finLayers: number;
  /** Integer factor on every cell count (1, 2, 4, ... give nested grids). */
  refine: number;
}

/** A rectangle as half-open cell ranges [i0, i1) x [j0, j1). */
export interface CellBlock {
  i0: number;
  i1: number;
  j0: number;
  j1: number;
}

export interface SinkGrid {
  /** Cell edges: x (nx + 1), y (ny + 1), z in the plate (nz + 1), s along a fin's height (ns + 1; [0] when bare). */
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  s: Float64Array;
  nx: number;
  ny: number;
  nz: number;
  ns: number;
  fins: CellBlock[];
  sources: CellBlock[];
}

export function buildSinkGrid(layout: SinkLayout, spec: SinkGridSpec): SinkGrid {
  const tol = 1e-9 * Math.max(layout.width, layout.length);
  const xLines = [0, layout.width, ...layout.sources.flatMap((r) => [r.x0, r.x1]), ...layout.fins.flatMap((r) => [r.x0, r.x1])];
  const yLines = [0, layout.length, ...layout.sources.flatMap((r) => [r.y0, r.y1])];
  if (layout.finKind === 'pins') yLines.push(...layout.fins.flatMap((r) => [r.y0, r.y1]));
  const xBreaks = mergeLines(xLines, tol);
  const yBreaks = mergeLines(yLines, tol);
  const x = segmentEdges(xBreaks, spec.cellSize, spec.refine);
  const y = segmentEdges(yBreaks, spec.cellSize, spec.refine);
  const nz = spec.plateLayers * spec.refine;
  const ns = layout.finKind === 'bare' ? 0 : spec.finLayers * spec.refine;
  const z = uniformEdges(layout.thickness, nz);
  const s = ns === 0 ? new Float64Array(1) : uniformEdges(layout.finHeight, ns);
  const block = (r: Rectangle): CellBlock => ({
    i0: lineIndex(x, r.x0, tol),
    i1: lineIndex(x, r.x1, tol),
    j0: lineIndex(y, r.y0, tol),
    j1: lineIndex(y, r.y1, tol),
  });
  return { x, y, z, s, nx: x.length - 1, ny: y.length - 1, nz, ns, fins: layout.fins.map(block), sources: layout.sources.map(block) };
}

function mergeLines(lines: number[], tol: number): number[] {
  const sorted = [...lines].sort((a, b) => a - b);
  const out: number[] = [];
  for (const v of sorted) if (out.length === 0 || v - out[out.length - 1] > tol) out.push(v);
  return out;
}

function segmentEdges(breaks: number[], cellSize: number, refine: number): Float64Array {
  const edges: number[] = [breaks[0]];
  for (let k = 0; k + 1 < breaks.length; k++) {
    const a = breaks[k];
    const b = breaks[k + 1];
    const n = Math.max(1, Math.round((b - a) / cellSize)) * refine;
    for (let c = 1; c <= n; c++) edges.push(c === n ? b : a + ((b - a) * c) / n);
  }
  return Float64Array.from(edges);
}

function uniformEdges(length: number, n: number): Float64Array {
  const e = new Float64Array(n + 1);
  for (let c = 0; c <= n; c++) e[c] = (length * c) / n;
  e[n] = length;
  return e;
}

/** Index of the grid line nearest to v (v is one of the lines up to the merge tolerance). */
function lineIndex(edges: Float64Array, v: number, tol: number): number {
  let lo = 0;
  let hi = edges.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (edges[mid] <= v) lo = mid;
    else hi = mid;
  }
  const best = Math.abs(edges[hi] - v) < Math.abs(edges[lo] - v) ? hi : lo;
  if (Math.abs(edges[best] - v) > tol) throw new RangeError(`sink grid: ${v} m is not a grid line`);
  return best;
}

/** Cell counts of the unrefined grid for a layout and a target cell size (for memory estimates). */
export function sinkGridCells(layout: SinkLayout, spec: SinkGridSpec): { plate: number; fins: number } {
  const g = buildSinkGrid(layout, { ...spec, refine: 1 });
  const r = spec.refine;
  const plate = g.nx * g.ny * g.nz * r ** 3;
  const finRows = layout.finKind === 'plates' ? g.fins.reduce((sum, f) => sum + (f.j1 - f.j0), 0) * r : g.fins.length;
  return { plate, fins: finRows * g.ns * r };
}
