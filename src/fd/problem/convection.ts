/**
 * Convection coefficient along the fin for the linear h kinds, W/(m^2*K), x in m from the base:
 * uniform h; linear h = h_b + (h_t - h_b) x / L; piecewise linear through points (x_j, h_j), held
 * constant beyond the first and last points. The kinks of h are returned as breakpoints so that the
 * mesh puts nodes on them: h is then linear between nodes, as the assembly assumes.
 *
 * Ideal convective conductance (for the fin efficiency, Harper & Brown 1922 / Gardner 1945):
 * ∫_0^L h(x) P(x) dx, W/K, integrated exactly piece by piece with the geometry's perimeterIntegral.
 */
import type { FinGeometry1D } from '../../mesh/index.js';
import type { LinearHDistribution } from './linear-case.js';

/** h at position x (m) on a fin of length L (m), W/(m^2*K). */
export function hAt(h: LinearHDistribution, x: number, length: number): number {
  switch (h.kind) {
    case 'uniform':
      return h.h;
    case 'linear':
      return h.base + ((h.tip - h.base) * x) / length;
    case 'points': {
      const xs = h.x;
      const last = xs.length - 1;
      if (x <= (xs[0] as number)) return h.h[0] as number;
      if (x >= (xs[last] as number)) return h.h[last] as number;
      let j = 0;
      while ((xs[j + 1] as number) < x) j++;
      const x0 = xs[j] as number;
      const x1 = xs[j + 1] as number;
      const h0 = h.h[j] as number;
      const h1 = h.h[j + 1] as number;
      return h0 + ((h1 - h0) * (x - x0)) / (x1 - x0);
    }
    default: {
      const never: never = h;
      throw new Error(`unknown h distribution ${JSON.stringify(never)}`);
    }
  }
}

/** Interior kinks of h (m), strictly inside (0, L). */
export function hBreakpoints(h: LinearHDistribution, length: number): Float64Array {
  if (h.kind !== 'points') return new Float64Array(0);
  return Float64Array.from(Array.from(h.x).filter((x) => x > 0 && x < length));
}

/**
 * h at every node, W/(m^2*K) (written into `out` when given): hAt at each node, with the uniform and linear kinds
 * written out (the same expressions, so the same numbers) instead of a call per node.
 */
export function hAtNodes(h: LinearHDistribution, x: Float64Array, length: number, out?: Float64Array): Float64Array {
  const values = out ?? new Float64Array(x.length);
  const n = x.length;
  if (h.kind === 'uniform') {
    values.fill(h.h, 0, n);
  } else if (h.kind === 'linear') {
    const { base, tip } = h;
    for (let i = 0; i < n; i++) values[i] = base + ((tip - base) * (x[i] as number)) / length;
  } else {
    for (let i = 0; i < n; i++) values[i] = hAt(h, x[i] as number, length);
  }
  return values;
}

/** Exact ∫_0^L h P dx, W/K: h is linear between its own kinks and the geometry's breakpoints. */
export function idealConvectiveConductance(geometry: FinGeometry1D, h: LinearHDistribution): number {
  const L = geometry.length;
  const bp = geometry.breakpoints;
  // One piece [0, L] (h without kinks, a profile without breakpoints): the loop below with xs = [0, L], without
  // gathering, sorting and filtering the cuts (every fd-1d solve asks for it).
  if (h.kind !== 'points' && L > 0 && bp.length === 2 && bp[0] === 0 && bp[1] === L)
    return 0 + geometry.perimeterIntegral(0, L, hAt(h, 0, L), hAt(h, L, L));
  const cuts = new Set<number>([0, L, ...geometry.breakpoints, ...hBreakpoints(h, L)]);
  const xs = Array.from(cuts)
    .filter((x) => x >= 0 && x <= L)
    .sort((a, b) => a - b);
  let sum = 0;
  for (let j = 0; j + 1 < xs.length; j++) {
    const a = xs[j] as number;
    const b = xs[j + 1] as number;
    sum += geometry.perimeterIntegral(a, b, hAt(h, a, L), hAt(h, b, L));
  }
  return sum;
}
