/**
 * Integrals over a fin's height that the 3-D sink assembly needs, for a fin of unit width (straight) or a pin:
 *   conduction resistance along the height  R(a, b) = ∫_a^b ds / A(s)            (1/m for unit width; 1/m for a pin: m / m^2)
 *   conducting area of a layer              S(a, b) = ∫_a^b A(s) ds             (m^2 per m of width; m^3 for a pin)
 *   convective conductance of a layer       H(a, b) = ∫_a^b h(s) P(s) ds        (W/K per m of width; W/K for a pin)
 * A(s) and P(s) are the 1-D geometry's (src/mesh/geometry1d.ts, thin-fin convention: a straight fin of unit
 * width has A = t(s), P = 2 for its two faces). H is exact for the piecewise-linear h of the case format
 * (geometry.perimeterIntegral between h's kinks and the profile's breakpoints); R and S use the 3-point
 * Gauss-Legendre rule on QUADRATURE_PIECES pieces between breakpoints (exact for the uniform profiles; for a
 * tapered profile 1/A is smooth inside a layer away from a sharp tip, and the layer next to a sharp tip only
 * conducts towards its centre, where 1/A is finite).
 */
import type { FinGeometry1D } from '../../mesh/index.js';
import { hAt, hBreakpoints } from '../problem/convection.js';
import type { LinearHDistribution } from '../problem/linear-case.js';

/** Gauss pieces per segment of R and S (each piece a 3-point rule: error ~ (w/8)^6 for a smooth integrand). */
const QUADRATURE_PIECES = 8;
const GAUSS_NODE = Math.sqrt(3 / 5);

export interface FinIntegrals {
  resistance(a: number, b: number): number;
  area(a: number, b: number): number;
  convection(a: number, b: number): number;
}

export function finIntegrals(geometry: FinGeometry1D, h: LinearHDistribution): FinIntegrals {
  const L = geometry.length;
  const cuts = Array.from(new Set<number>([...geometry.breakpoints, ...hBreakpoints(h, L)])).sort((a, b) => a - b);
  const pieces = (a: number, b: number): number[] => [a, ...cuts.filter((c) => c > a && c < b), b];
  const gauss = (a: number, b: number, f: (s: number) => number): number => {
    let sum = 0;
    for (let p = 0; p < QUADRATURE_PIECES; p++) {
      const lo = a + ((b - a) * p) / QUADRATURE_PIECES;
      const hi = a + ((b - a) * (p + 1)) / QUADRATURE_PIECES;
      const mid = 0.5 * (lo + hi);
      const half = 0.5 * (hi - lo);
      sum += half * ((5 / 9) * (f(mid - half * GAUSS_NODE) + f(mid + half * GAUSS_NODE)) + (8 / 9) * f(mid));
    }
    return sum;
  };
  const overPieces = (a: number, b: number, f: (s: number) => number): number => {
    const xs = pieces(a, b);
    let sum = 0;
    for (let k = 0; k + 1 < xs.length; k++) sum += gauss(xs[k], xs[k + 1], f);
    return sum;
  };
  return {
    resistance: (a, b) => overPieces(a, b, (s) => 1 / geometry.area(s)),
    area: (a, b) => overPieces(a, b, (s) => geometry.area(s)),
    convection: (a, b) => {
      const xs = pieces(a, b);
      let sum = 0;
      for (let k = 0; k + 1 < xs.length; k++) sum += geometry.perimeterIntegral(xs[k], xs[k + 1], hAt(h, xs[k], L), hAt(h, xs[k + 1], L));
      return sum;
    },
  };
}
