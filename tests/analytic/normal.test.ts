/**
 * The standard normal distribution (src/analytic/normal.ts) against mpmath at 40 digits (computed reference values:
 * normal_values.py beside this test, Phi = mpmath.ncdf, inverse = sqrt(2) erfinv(2 p - 1)).
 */
import { describe, expect, it } from 'vitest';
import { normalCdf, normalQuantile } from '../../src/analytic/index.js';

describe('normalCdf', () => {
  it.each([
    [-30, 4.90671392714819e-198],
    [-20, 2.75362411860623e-89],
    [-10, 7.61985302416053e-24],
    [-8, 6.22096057427178e-16],
    [-5, 2.86651571879194e-7],
    [-3.5, 0.000232629079035525],
    [-3, 0.00134989803163009],
    [-2.5, 0.00620966532577614],
    [-1, 0.158655253931457],
    [-0.3, 0.382088577811047],
    [0.3, 0.617911422188953],
    [1, 0.841344746068543],
    [2.5, 0.993790334674224],
    [3, 0.99865010196837],
    [5, 0.999999713348428],
  ])('Phi(%s) = %s to 1e-14 relative', (z, phi) => {
    // 1e-14: the series and continued fraction carry ~30 operations of round-off each (module header); the lower tail
    // keeps its relative accuracy down to 1e-198.
    expect(Math.abs(normalCdf(z) / phi - 1)).toBeLessThan(1e-14);
  });

  it('limits and symmetry', () => {
    expect(normalCdf(0)).toBe(0.5);
    expect(normalCdf(Number.NEGATIVE_INFINITY)).toBe(0);
    expect(normalCdf(Number.POSITIVE_INFINITY)).toBe(1);
    for (const z of [0.1, 0.7, 1.9, 2.99, 3.01, 4.4]) expect(Math.abs(normalCdf(z) + normalCdf(-z) - 1)).toBeLessThan(2e-16);
  });
});

describe('normalQuantile', () => {
  it.each([
    [1e-9, -5.99780701500769],
    [0.0025, -2.8070337683438],
    [0.1587, -0.999815093614744],
    [0.5, 0],
    [0.8413, 0.999815093614744],
    [0.9975, 2.8070337683438],
  ])('Phi^-1(%s) = %s to 1e-13', (p, z) => {
    // Halley steps reach round-off of Phi(z) - p; near p = 1 the input 1 - p itself carries 1e-16 / (1 - p) relative.
    expect(Math.abs(normalQuantile(p) - z)).toBeLessThan(1e-13 * Math.max(1, Math.abs(z)));
  });

  it('inverts normalCdf across the range the sample uses', () => {
    for (let k = 1; k < 400; k++) {
      const p = k / 400;
      expect(Math.abs(normalCdf(normalQuantile(p)) / p - 1)).toBeLessThan(1e-13);
    }
    expect(normalQuantile(0)).toBe(Number.NEGATIVE_INFINITY);
    expect(normalQuantile(1)).toBe(Number.POSITIVE_INFINITY);
  });
});
