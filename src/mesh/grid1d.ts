/**
 * 1-D node sets (uniform or graded, with nodes on every breakpoint) and the vertex-centred mesh
 * built on them: interface cross-sections and control-volume surfaces. Units: m, m^2.
 *
 * Node set: the breakpoints (closer ones merged, see BREAKPOINT_MERGE_FRACTION) split [0, L] into
 * segments; segment s gets n_s cells (shared in proportion to length, at least one) and nodes
 * x = a + (b - a) g(j / n_s), where g maps [0, 1] onto itself: uniform g = xi; power law g = xi^p
 * (toward the base), 1 - (1 - xi)^p (toward the tip), xi^p / (xi^p + (1 - xi)^p) (both); geometric
 * g = (S^xi - 1)/(S - 1), S = stretch. Because g is fixed, doubling every n_s gives a nested grid
 * (systematic refinement by a constant ratio: Roache, P. J., 1998, Verification and Validation in
 * Computational Science and Engineering, Hermosa [from memory]). Grading applies to the first
 * segment (base) and the last (tip).
 *
 * Mesh: CV i spans the interfaces at the midpoints of its cells (half cells at the ends: the
 * vertex-centred finite volume with faces midway between grid points, Patankar, S. V., 1980,
 * Numerical Heat Transfer and Fluid Flow, Hemisphere, §4.6 "practice A" [from memory]). Interface
 * area A((x_i + x_{i+1})/2). The convective conductance of CV i for an h linear between nodes is
 * integrated by Simpson's rule on each half cell, exact when P is at most quadratic within a cell
 * (every profile except the convex parabola, whose spine perimeter and cooled edges have a square
 * root at the tip):
 *   left half of cell [x_i, x_{i+1}], Δ = x_{i+1} - x_i, q = x_i + Δ/4, c = x_i + Δ/2:
 *     ∫ h P ≈ (Δ/12) [h_i P_i + 4 h_q P_q + h_c P_c],  h_q = (3h_i + h_{i+1})/4,  h_c = (h_i + h_{i+1})/2,
 *   so h_i gets (Δ/12)(P_i + 3 P_q + P_c/2) and h_{i+1} gets (Δ/12)(P_q + P_c/2); mirrored on the
 *   right half.
 */
import { areaInto, perimeterInto } from './geometry1d.js';
import type { FinGeometry1D, Grading, GradingEnd, Grid1DSpec, Mesh1D } from './types.js';

/**
 * Breakpoints closer than this fraction of the nominal cell size L/cells are merged into one node:
 * a cell that small adds nothing but round-off (its conductance k A/Δx would dwarf the rest of the
 * row), and the kink it resolved then sits inside a cell of the refined grid, an O(Δx · spacing) effect.
 */
const BREAKPOINT_MERGE_FRACTION = 0.01;

/** The map g: [0,1] -> [0,1] of a grading, with which ends of this segment it refines. */
function gradingMap(grading: Grading, refineStart: boolean, refineEnd: boolean): (xi: number) => number {
  const toward: GradingEnd | 'none' = refineStart && refineEnd ? 'both' : refineStart ? 'base' : refineEnd ? 'tip' : 'none';
  if (toward === 'none') return (xi) => xi;
  switch (grading.kind) {
    case 'uniform':
      return (xi) => xi;
    case 'power': {
      const p = grading.exponent;
      if (toward === 'base') return (xi) => Math.pow(xi, p);
      if (toward === 'tip') return (xi) => 1 - Math.pow(1 - xi, p);
      return (xi) => {
        const a = Math.pow(xi, p);
        return a / (a + Math.pow(1 - xi, p));
      };
    }
    case 'geometric': {
      const s = grading.stretch;
      const towardBase = (xi: number): number => (Math.pow(s, xi) - 1) / (s - 1);
      if (toward === 'base') return towardBase;
      if (toward === 'tip') return (xi) => 1 - towardBase(1 - xi);
      return (xi) => (xi <= 0.5 ? 0.5 * towardBase(2 * xi) : 1 - 0.5 * towardBase(2 * (1 - xi)));
    }
    default: {
      const never: never = grading;
      throw new Error(`unknown grading ${JSON.stringify(never)}`);
    }
  }
}

/**
 * Sorted breakpoints of the geometry and the spec within [0, L], ends included; positions closer than
 * minSpacing (m) to the previous kept one are dropped (the ends always stay).
 */
export function mergeBreakpoints(length: number, minSpacing: number, ...lists: ArrayLike<number>[]): Float64Array {
  const inside: number[] = [];
  for (const list of lists) {
    for (let i = 0; i < list.length; i++) {
      const x = list[i];
      if (x > 0 && x < length) inside.push(x);
    }
  }
  inside.sort((a, b) => a - b);
  const merged: number[] = [0];
  for (const x of inside) {
    if (x - merged[merged.length - 1] >= minSpacing && length - x >= minSpacing) merged.push(x);
  }
  merged.push(length);
  return Float64Array.from(merged);
}

/** Cells per segment: proportional to length (largest remainder), at least one each. */
export function allocateCells(breakpoints: Float64Array, cells: number): Int32Array {
  const segments = breakpoints.length - 1;
  const length = breakpoints[segments] - breakpoints[0];
  const counts = new Int32Array(segments);
  const remainders: { index: number; rest: number }[] = [];
  let used = 0;
  for (let s = 0; s < segments; s++) {
    const share = (cells * (breakpoints[s + 1] - breakpoints[s])) / length;
    const whole = Math.max(1, Math.floor(share));
    counts[s] = whole;
    used += whole;
    remainders.push({ index: s, rest: share - whole });
  }
  remainders.sort((a, b) => b.rest - a.rest);
  for (let r = 0; used < cells && r < remainders.length; r++, used++) {
    const index = (remainders[r] as { index: number }).index;
    counts[index] = counts[index] + 1;
  }
  return counts;
}

/** Node positions for a geometry and a grid spec (nodes on every breakpoint). */
export function gridNodes(geometry: FinGeometry1D, spec: Grid1DSpec): { x: Float64Array; cellSize: number } {
  const L = geometry.length;
  const cells = Math.max(1, Math.round(spec.cells));
  const minSpacing = (BREAKPOINT_MERGE_FRACTION * L) / cells;
  const breakpoints = mergeBreakpoints(L, minSpacing, geometry.breakpoints, spec.breakpoints ?? []);
  const refine = spec.refine ?? 1;
  const counts = allocateCells(breakpoints, cells);
  const segments = counts.length;
  let total = 0;
  for (let s = 0; s < segments; s++) total += counts[s] * refine;
  const x = new Float64Array(total + 1);
  const grading = spec.grading ?? { kind: 'uniform' };
  const towardBase = grading.kind !== 'uniform' && grading.toward !== 'tip';
  const towardTip = grading.kind !== 'uniform' && grading.toward !== 'base';
  let node = 0;
  for (let s = 0; s < segments; s++) {
    const a = breakpoints[s];
    const b = breakpoints[s + 1];
    const n = counts[s] * refine;
    const refineStart = towardBase && s === 0;
    const refineEnd = towardTip && s === segments - 1;
    if (grading.kind === 'uniform' || (!refineStart && !refineEnd)) {
      // g(xi) = xi written out: no call per node (a closure called per node is slow until V8 optimises the loop).
      for (let j = 0; j < n; j++) x[node++] = a + (b - a) * (j / n);
      continue;
    }
    const g = gradingMap(grading, refineStart, refineEnd);
    for (let j = 0; j < n; j++) x[node++] = a + (b - a) * g(j / n);
  }
  x[node] = L;
  return { x, cellSize: L / total };
}

/** The vertex-centred mesh of a geometry: node positions, interface areas and CV surfaces. */
/**
 * Recently built meshes by geometry key and grid spec. A map of checks over h or k (or any key that
 * leaves the profile alone) rebuilds the same meshes at every point; a mesh is read-only plain data, so
 * one copy serves them all. 128 entries cover the three study grids of a 41-point row of profiles.
 */
const MESH_CACHE_SIZE = 128;
const meshCache = new Map<string, Mesh1D>();

export function buildMesh1D(geometry: FinGeometry1D, spec: Grid1DSpec): Mesh1D {
  if (geometry.key === undefined) return buildMesh1DUncached(geometry, spec);
  const key = `${geometry.key}|${spec.cells}|${JSON.stringify(spec.grading ?? null)}|${spec.breakpoints ? Array.from(spec.breakpoints).join(',') : ''}|${spec.refine ?? 1}`;
  const hit = meshCache.get(key);
  if (hit) return hit;
  const mesh = buildMesh1DUncached(geometry, spec);
  if (meshCache.size >= MESH_CACHE_SIZE) meshCache.delete(meshCache.keys().next().value as string);
  meshCache.set(key, mesh);
  return mesh;
}

/**
 * Working arrays of buildMesh1DUncached: the points where P is evaluated (four per cell and the tip) and P there.
 * Plain temporaries (the mesh keeps none of them), kept between builds: a check builds a dozen meshes of up to
 * 16 000 points and a map hundreds, and fresh arrays made a good part of their garbage.
 */
let perimeterPoints = new Float64Array(0);
/** Larger meshes (a study refined toward its budget) get arrays of their own: at most 2 MB are kept. */
const MAX_KEPT_POINTS = 131072;
let perimeterValues = new Float64Array(0);

/**
 * A and P of a geometry whose section does not change along the fin (a rectangular fin, a pin: the tapered formula
 * with exponent 0), evaluated once by areaInto and perimeterInto (their value at any x), or null.
 */
function constantSection(geometry: FinGeometry1D): { area: number; perimeter: number } | null {
  const f = geometry.formula;
  if (f === undefined || f.kind !== 'tapered' || f.exponent !== 0) return null;
  const at = new Float64Array([0]);
  const area = new Float64Array(1);
  const perimeter = new Float64Array(1);
  areaInto(geometry, at, area);
  perimeterInto(geometry, at, perimeter);
  return { area: area[0] as number, perimeter: perimeter[0] as number };
}

function buildMesh1DUncached(geometry: FinGeometry1D, spec: Grid1DSpec): Mesh1D {
  const { x, cellSize } = gridNodes(geometry, spec);
  const n = x.length;
  const cells = n - 1;
  const dx = new Float64Array(cells);
  const interfaceArea = new Float64Array(cells);
  const weightPrev = new Float64Array(n);
  const weightSelf = new Float64Array(n);
  const weightNext = new Float64Array(n);
  const constant = constantSection(geometry);
  let tipPerimeter: number;
  if (constant !== null) {
    // The same sums as below with every P equal (so the same numbers), without evaluating P at 4 points a cell.
    const { area, perimeter } = constant;
    for (let i = 0; i < cells; i++) {
      const delta = x[i + 1] - x[i];
      dx[i] = delta;
      interfaceArea[i] = area;
      const w = delta / 12;
      weightSelf[i] = weightSelf[i] + w * (perimeter + 3 * perimeter + 0.5 * perimeter);
      weightNext[i] = w * (perimeter + 0.5 * perimeter);
      weightPrev[i + 1] = w * (0.5 * perimeter + perimeter);
      weightSelf[i + 1] = w * (0.5 * perimeter + 3 * perimeter + perimeter);
    }
    tipPerimeter = perimeter;
  } else {
    // P at x_i, x_i + Δ/4, the centre and x_i + 3Δ/4 of every cell, then at x_{n-1}; A at the centres: one batch
    // evaluation each (areaInto, perimeterInto), not five calls of the geometry's closures per cell.
    const points = 4 * cells + 1;
    if (perimeterPoints.length < points && points <= MAX_KEPT_POINTS) {
      perimeterPoints = new Float64Array(points);
      perimeterValues = new Float64Array(points);
    }
    const kept = points <= perimeterPoints.length;
    const at = kept ? perimeterPoints.subarray(0, points) : new Float64Array(points);
    const p = kept ? perimeterValues.subarray(0, points) : new Float64Array(points);
    for (let i = 0; i < cells; i++) {
      const xi = x[i];
      const delta = x[i + 1] - xi;
      dx[i] = delta;
      at[4 * i] = xi;
      at[4 * i + 1] = xi + 0.25 * delta;
      at[4 * i + 2] = xi + 0.5 * delta;
      at[4 * i + 3] = xi + 0.75 * delta;
      interfaceArea[i] = xi + 0.5 * delta;
    }
    at[4 * cells] = x[cells];
    areaInto(geometry, interfaceArea, interfaceArea);
    perimeterInto(geometry, at, p);
    for (let i = 0; i < cells; i++) {
      const pLeft = p[4 * i];
      const pQuarter = p[4 * i + 1];
      const pCentre = p[4 * i + 2];
      const pThreeQuarter = p[4 * i + 3];
      const pRight = p[4 * i + 4];
      const w = dx[i] / 12;
      weightSelf[i] = weightSelf[i] + w * (pLeft + 3 * pQuarter + 0.5 * pCentre);
      weightNext[i] = w * (pQuarter + 0.5 * pCentre);
      weightPrev[i + 1] = w * (0.5 * pCentre + pThreeQuarter);
      weightSelf[i + 1] = w * (0.5 * pCentre + 3 * pThreeQuarter + pRight);
    }
    // P(L): x[n-1] = L exactly (gridNodes), the last point evaluated.
    tipPerimeter = p[4 * cells];
  }
  const cvSurface = new Float64Array(n);
  for (let i = 0; i < n; i++) cvSurface[i] = weightPrev[i] + weightSelf[i] + weightNext[i];
  return {
    nodes: n,
    x,
    dx,
    interfaceArea,
    cvSurface,
    surfaceWeightPrev: weightPrev,
    surfaceWeightSelf: weightSelf,
    surfaceWeightNext: weightNext,
    baseArea: geometry.baseArea,
    tipArea: geometry.tipArea,
    tipPerimeter,
    length: geometry.length,
    cellSize,
  };
}
