/**
 * The standard normal distribution: Phi(z), the probability that a standard normal variable is at most z, and its
 * inverse. Self-contained (no WASM library to load: the check's Latin-hypercube sample calls it, and loading a
 * special-function library for it cost more than the sample's solves).
 *
 * Upper tail Q(x) = 1 - Phi(x), x >= 0, phi(x) = exp(-x^2/2)/sqrt(2 pi):
 *   x <= 2: Q = 1/2 - phi(x) (x + x^3/3 + x^5/(3 5) + x^7/(3 5 7) + ...)   (Marsaglia 2004, "Evaluating the normal
 *           distribution", J. Stat. Softw. 11(4), eq. 1: every term positive, summed until it no longer changes);
 *   x > 2:  Q = phi(x) / (x + 1/(x + 2/(x + 3/(x + ...))))                   (Abramowitz & Stegun 1964, 26.2.14),
 *           evaluated from the 300th level backward (converged to round-off for x > 2).
 * Phi(z) = Q(-z) for z < 0 (so the lower tail keeps its relative accuracy), 1 - Q(z) otherwise. Measured
 * against mpmath (tests/analytic/normal.test.ts): relative error below 1e-14 over |z| <= 30.
 * Inverse: the starting value of Abramowitz & Stegun 26.2.23 (|error| < 4.5e-4), then Halley steps on
 * Phi(z) - p (cubic convergence: three reach round-off), the residual formed in the tail p lies in.
 */

const SQRT_2PI = Math.sqrt(2 * Math.PI);

function density(x: number): number {
  return Math.exp(-0.5 * x * x) / SQRT_2PI;
}

/** Q(x) = 1 - Phi(x) for x >= 0. */
function upperTail(x: number): number {
  if (x <= 2) {
    let term = x;
    let sum = x;
    const x2 = x * x;
    for (let k = 3; k < 400; k += 2) {
      term *= x2 / k;
      const next = sum + term;
      if (next === sum) break;
      sum = next;
    }
    return 0.5 - density(x) * sum;
  }
  let fraction = x;
  for (let k = 300; k >= 1; k--) fraction = x + k / fraction;
  return density(x) / fraction;
}

/** Phi(z), the probability that a standard normal variable is at most z. */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  if (z === Number.NEGATIVE_INFINITY) return 0;
  if (z === Number.POSITIVE_INFINITY) return 1;
  return z < 0 ? upperTail(-z) : 1 - upperTail(z);
}

/** z with Phi(z) = p, for 0 < p < 1 (-Infinity at 0, +Infinity at 1). */
export function normalQuantile(p: number): number {
  if (Number.isNaN(p)) return Number.NaN;
  if (p <= 0) return Number.NEGATIVE_INFINITY;
  if (p >= 1) return Number.POSITIVE_INFINITY;
  // Work in the lower tail (q <= 1/2) and mirror: Phi(-z) = 1 - Phi(z).
  const lower = p <= 0.5;
  const q = lower ? p : 1 - p;
  const t = Math.sqrt(-2 * Math.log(q));
  let x = -(t - (2.515517 + t * (0.802853 + t * 0.010328)) / (1 + t * (1.432788 + t * (0.189269 + t * 0.001308))));
  for (let step = 0; step < 4; step++) {
    // x < 0 here: Phi(x) = Q(-x), accurate relative to q.
    const e = (upperTail(-x) - q) / density(x);
    const next = x - e / (1 + (x * e) / 2);
    if (next === x) break;
    x = next;
  }
  return lower ? x : -x;
}
