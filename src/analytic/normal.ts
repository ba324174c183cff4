/**
 * The standard normal distribution: Phi(z) = (1 + erf(z / sqrt 2)) / 2 and its inverse, from Cephes
 * (`ndtr`, `ndtri`; S. L. Moshier, "Methods and Programs for Mathematical Functions", Ellis Horwood 1989),
 * accurate to about 1e-15 relative. Used to draw normal samples (src/compare/latin-hypercube.ts).
 * Call `await initBessel()` once first (cephes-runtime.ts).
 */
import { cephesLibrary } from './cephes-runtime.js';

/** Phi(z), the probability that a standard normal variable is at most z. */
export function normalCdf(z: number): number {
  if (z === Number.NEGATIVE_INFINITY) return 0;
  if (z === Number.POSITIVE_INFINITY) return 1;
  return cephesLibrary().ndtr(z);
}

/** z with Phi(z) = p, for 0 < p < 1 (-Infinity at 0, +Infinity at 1). */
export function normalQuantile(p: number): number {
  if (p <= 0) return Number.NEGATIVE_INFINITY;
  if (p >= 1) return Number.POSITIVE_INFINITY;
  return cephesLibrary().ndtri(p);
}
