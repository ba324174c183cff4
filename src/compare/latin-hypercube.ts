/**
 * A seeded Latin-hypercube sample of independent truncated standard normal variables (McKay, Beckman &
 * Conover 1979, "A comparison of three methods for selecting values of input variables in the analysis of
 * output from a computer code", Technometrics 21(2), 239-245).
 *
 * For n points and each variable j: a random permutation pi_j of 0..n-1 and a uniform u in [0, 1) give
 * p_ij = (pi_j(i) + u_ij) / n, one point in each of n equal-probability strata; the truncated normal on
 * [a_j, b_j] is z = Phi^-1(Phi(a_j) + p_ij (Phi(b_j) - Phi(a_j))) (inverse transform). Dimensionless.
 * Random numbers: mulberry32 (T. Ettinger, public domain; 32-bit state, period 2^32), seeded, so the same seed
 * gives the same sample on every machine.
 */
import { normalCdf, normalQuantile } from '../analytic/index.js';

/** mulberry32: uniform numbers in [0, 1) from a 32-bit seed. */
export function seededUniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Truncation bounds of one standard normal variable (may be infinite). */
export interface NormalBounds {
  lower: number;
  upper: number;
}

/**
 * n points of the variables in `bounds`: result[i][j] is point i's value of variable j. Requires n >= 1 and
 * lower < upper for every variable.
 */
export function latinHypercubeNormal(n: number, bounds: readonly NormalBounds[], seed: number): Float64Array[] {
  const next = seededUniform(seed);
  const points = Array.from({ length: n }, () => new Float64Array(bounds.length));
  bounds.forEach(({ lower, upper }, j) => {
    const pLow = normalCdf(lower);
    const pHigh = normalCdf(upper);
    // Fisher-Yates shuffle of the strata.
    const strata = Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) {
      const r = Math.floor(next() * (i + 1));
      [strata[i], strata[r]] = [strata[r] as number, strata[i] as number];
    }
    for (let i = 0; i < n; i++) {
      const p = ((strata[i] as number) + next()) / n;
      // Keep p strictly inside (0, 1) so that an infinite bound is never reached.
      const q = Math.min(Math.max(pLow + p * (pHigh - pLow), Number.MIN_VALUE), 1 - Number.EPSILON);
      (points[i] as Float64Array)[j] = Math.min(Math.max(normalQuantile(q), lower), upper);
    }
  });
  return points;
}
