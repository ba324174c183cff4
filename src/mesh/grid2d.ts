/**
 * Structured, boundary-fitted grids for the 2-D fin section (see grid2d-section.ts for the coordinates).
 *
 * Nodes (i, j), i = 0..nodesX-1 along the fin (base to tip), j = 0..nodesY-1 across it (symmetry plane or
 * axis to the face). Node p = i * nodesY + j: the short direction is numbered fastest, so the matrices
 * of the 2-D scheme have bandwidth nodesY + 1. Coordinates (m):
 *   x_i  = baseX + s_i,   s_i from a smooth map of i/(nodesX-1) (optionally graded toward the base),
 *   y_ij = eta_j * halfSize(s_i),   eta_j from a smooth map of j/(nodesY-1) (optionally graded toward the face),
 * so every face node lies exactly on the profile (sloped and curved faces are followed, not staircased) and
 * the faces between nodes are chords. Profile kinks (tabulated points) are grid lines.
 * Each quadrilateral cell is split into two triangles by the diagonal that satisfies the Delaunay
 * (opposite-angle) criterion inside the cell; the finite-volume scheme uses those triangles.
 * A sharp tip (zero thickness) collapses the last column to one point; the assembly ties its nodes.
 *
 * Named boundaries: base (i = 0), tip (i = last), face (j = last), symmetry (j = 0: mid-plane or axis).
 * The arrays follow the ndarray convention: shape [nodesX, nodesY], stride [nodesY, 1], offset 0.
 */
import type { Section2D, SectionKind } from './grid2d-section.js';

export type BoundaryName = 'base' | 'tip' | 'face' | 'symmetry';

export interface Grid2D {
  readonly section: SectionKind;
  readonly nodesX: number;
  readonly nodesY: number;
  readonly shape: readonly [number, number];
  readonly stride: readonly [number, number];
  /** Node coordinates, m: along the fin (annular: the radius) and across it (pins: the radius). */
  readonly x: Float64Array;
  readonly y: Float64Array;
  /** Per cell (i * (nodesY - 1) + j): 0 splits along (i, j)-(i+1, j+1), 1 along (i+1, j)-(i, j+1). */
  readonly diagonal: Uint8Array;
  /** The last column is a single point (sharp tip). */
  readonly collapsedTip: boolean;
  /** Whole fin = depth x section: 2 x width (planar), 2 pi (pins), 2 x 2 pi (annular). */
  readonly depth: number;
  /** x of the base (0, or r1 for annular fins). */
  readonly baseX: number;
}

export interface GridOptions {
  /** Nodes along the fin (>= 2). */
  nx: number;
  /** Nodes across the half-thickness or radius (>= 2). */
  ny: number;
  /** Largest over smallest cell length along the fin, smallest at the base (1 = uniform). */
  baseGrading?: number;
  /** Largest over smallest cell height across the fin, smallest at the face (1 = uniform). */
  faceGrading?: number;
}

/**
 * Grids already built, by section key and options: a check solves the same section again and again (the study's
 * grids, the sensitivities' variants of h or k, the uncertainty sample), and building a grid (its Delaunay
 * diagonals) costs as much as a small solve. Up to GRID_CACHE_SIZE grids of at most GRID_CACHE_NODES nodes; safe
 * because nothing writes into a grid's arrays.
 */
const GRID_CACHE_SIZE = 32;
const GRID_CACHE_NODES = 250_000;
const gridCache = new Map<string, Grid2D>();

export function buildGrid2D(section: Section2D, opts: GridOptions): Grid2D {
  const cacheable = section.key !== undefined && opts.nx * opts.ny <= GRID_CACHE_NODES;
  if (!cacheable) return buildGrid2DUncached(section, opts);
  const key = `${section.key as string}|${opts.nx}|${opts.ny}|${opts.baseGrading ?? 1}|${opts.faceGrading ?? 1}`;
  const hit = gridCache.get(key);
  // Equal keys, equal nodes: only the depth (the width of a straight fin) may differ.
  if (hit !== undefined) return hit.depth === section.depth ? hit : { ...hit, depth: section.depth };
  const grid = buildGrid2DUncached(section, opts);
  if (gridCache.size >= GRID_CACHE_SIZE) gridCache.delete(gridCache.keys().next().value as string);
  gridCache.set(key, grid);
  return grid;
}

function buildGrid2DUncached(section: Section2D, opts: GridOptions): Grid2D {
  const { nx, ny } = opts;
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 2 || ny < 2) {
    throw new RangeError(`buildGrid2D: nx and ny must be integers >= 2 (got ${nx} x ${ny})`);
  }
  const along = alongPositions(section, nx, opts.baseGrading ?? 1);
  const eta = stretched(ny, opts.faceGrading ?? 1, 'end');
  const x = new Float64Array(nx * ny);
  const y = new Float64Array(nx * ny);
  for (let i = 0; i < nx; i++) {
    const s = along[i];
    const half = i === nx - 1 && section.sharpTip ? 0 : section.halfSize(s);
    for (let j = 0; j < ny; j++) {
      x[i * ny + j] = section.baseX + s;
      y[i * ny + j] = eta[j] * half;
    }
  }
  return {
    section: section.kind,
    nodesX: nx,
    nodesY: ny,
    shape: [nx, ny],
    stride: [ny, 1],
    x,
    y,
    diagonal: chooseDiagonals(x, y, nx, ny),
    collapsedTip: section.sharpTip,
    depth: section.depth,
    baseX: section.baseX,
  };
}

/** Node indices of a named boundary, in order (along the fin for face/symmetry, upward for base/tip). */
export function boundaryNodes(grid: Grid2D, name: BoundaryName): Int32Array {
  const { nodesX: nx, nodesY: ny } = grid;
  // Plain loops: Int32Array.from with a map function walks the iterator protocol (~25x slower in V8), and every
  // assembly of a section (the uncertainty sample's hundreds) asks for the boundaries again.
  switch (name) {
    case 'base':
      return nodeRun(ny, 0, 1);
    case 'tip':
      return nodeRun(ny, (nx - 1) * ny, 1);
    case 'face':
      return nodeRun(nx, ny - 1, ny);
    case 'symmetry':
      return nodeRun(nx, 0, ny);
    default: {
      const never: never = name;
      throw new Error(`boundaryNodes: unknown boundary ${String(never)}`);
    }
  }
}

/** count node indices first, first + stride, ... */
function nodeRun(count: number, first: number, stride: number): Int32Array {
  const nodes = new Int32Array(count);
  for (let k = 0; k < count; k++) nodes[k] = first + k * stride;
  return nodes;
}

/** Radius of a point for the axisymmetric measure (1 for planar sections). */
export function radiusAt(section: SectionKind, x: number, y: number): number {
  switch (section) {
    case 'planar':
      return 1;
    case 'pin':
      return y;
    case 'annular':
      return x;
    default: {
      const never: never = section;
      throw new Error(`radiusAt: unknown section ${String(never)}`);
    }
  }
}

/**
 * Distances from the base of the nodes along the fin: every breakpoint is a node; the cells are shared
 * among the segments in proportion to their lengths (at least one each).
 */
function alongPositions(section: Section2D, nx: number, baseGrading: number): Float64Array {
  const bp = section.breakpoints;
  const segments = bp.length - 1;
  const cells = nx - 1;
  if (cells < segments) throw new RangeError(`buildGrid2D: ${nx} nodes along cannot hold the ${segments + 1} profile points`);
  const L = section.length;
  const counts = shareCells(bp, cells, L);
  const out = new Float64Array(nx);
  let node = 0;
  for (let k = 0; k < segments; k++) {
    const s0 = bp[k];
    const s1 = bp[k + 1];
    const n = counts[k];
    const grading = k === 0 ? baseGrading : 1;
    const t = stretched(n + 1, grading, 'start');
    for (let c = 0; c < n; c++) {
      let u = t[c];
      if (section.tipClustering !== 1 && k === segments - 1) u = 1 - (1 - u) ** section.tipClustering;
      out[node++] = s0 + (s1 - s0) * u;
    }
  }
  out[nx - 1] = L;
  return out;
}

function shareCells(bp: number[], cells: number, L: number): Int32Array {
  const segments = bp.length - 1;
  const counts = new Int32Array(segments).fill(1);
  let left = cells - segments;
  const ideal = bp.slice(1).map((b, k) => ((b - bp[k]) / L) * cells);
  while (left > 0) {
    // Give the next cell to the segment furthest below its share.
    let best = 0;
    let bestGap = -Infinity;
    for (let k = 0; k < segments; k++) {
      const gap = ideal[k] - counts[k];
      if (gap > bestGap) {
        bestGap = gap;
        best = k;
      }
    }
    counts[best] = counts[best] + 1;
    left--;
  }
  return counts;
}

/**
 * n points on [0, 1] from the smooth map u(s) with cell sizes in the ratio `ratio` (largest/smallest),
 * smallest at the start or at the end: u = (R^s - 1)/(R - 1) or its mirror. A smooth map keeps a family
 * of refined grids similar, as Richardson extrapolation requires.
 */
function stretched(n: number, ratio: number, smallAt: 'start' | 'end'): Float64Array {
  if (!(ratio >= 1)) throw new RangeError(`buildGrid2D: grading ratio must be >= 1 (got ${ratio})`);
  const out = new Float64Array(n);
  const lnR = Math.log(ratio);
  const fromStart = (s: number): number => (lnR < 1e-12 ? s : Math.expm1(lnR * s) / Math.expm1(lnR));
  for (let k = 0; k < n; k++) {
    const s = k / (n - 1);
    out[k] = smallAt === 'start' ? fromStart(s) : 1 - fromStart(1 - s);
  }
  out[0] = 0;
  out[n - 1] = 1;
  return out;
}

/** Delaunay choice inside each quadrilateral: the diagonal whose two opposite angles sum to less. */
function chooseDiagonals(x: Float64Array, y: Float64Array, nx: number, ny: number): Uint8Array {
  const out = new Uint8Array((nx - 1) * (ny - 1));
  const angle = (p: number, q: number, r: number): number => {
    // Angle at p between p->q and p->r; NaN when degenerate.
    const ux = x[q] - x[p];
    const uy = y[q] - y[p];
    const vx = x[r] - x[p];
    const vy = y[r] - y[p];
    return Math.atan2(Math.abs(ux * vy - uy * vx), ux * vx + uy * vy);
  };
  for (let i = 0; i + 1 < nx; i++) {
    for (let j = 0; j + 1 < ny; j++) {
      const a = i * ny + j;
      const b = a + ny;
      const c = b + 1;
      const d = a + 1;
      const acOpposite = angle(b, a, c) + angle(d, a, c);
      const bdOpposite = angle(a, b, d) + angle(c, b, d);
      out[i * (ny - 1) + j] = bdOpposite < acOpposite - 1e-12 ? 1 : 0;
    }
  }
  return out;
}
