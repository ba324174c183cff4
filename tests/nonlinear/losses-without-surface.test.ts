/**
 * cvLosses on a control volume without convective surface (G_i = 0, the node at a sharp or cusped tip)
 * with a power-law h of negative exponent at θ = 0. The flux law q = h_x |θ/θ_b|^n θ (Sen & Trinh 1986,
 * J. Heat Transfer 108, 457-459 [from memory]) gives no heat through no surface, and its slope there is 0;
 * g = |θ/θ_b|^n alone is infinite at θ = 0 for n < 0, and 0 * g put NaN into the 2-D Newton matrix (fuzz
 * finding: plot of a parabolic-convex fin with n = -0.95 ended in "pivot NaN", exit 3;
 * tests/fuzz/cases/power-law-convex-nan-pivot.yaml). The values are exact (no tolerance): 0 and finite.
 */
import { describe, expect, it } from 'vitest';
import { cvLosses, type FaceLaw } from '../../src/fd/problem/surface-law.js';

const law = (exponent: number, radiative = 0): FaceLaw => ({
  exponent,
  inverseBaseExcess: 1 / 60,
  radiative,
  ambient_K: 293.15,
  surroundings_K: 293.15,
});

describe('cvLosses where a CV has no convective surface', () => {
  it.each([-0.95, -0.5, 0.25])('n = %s: loss 0 and slope 0 at θ = 0 and at θ > 0', (n) => {
    const loss = new Float64Array(2);
    const slope = new Float64Array(2);
    cvLosses(law(n), new Float64Array([0, 0]), new Float64Array([0, 0]), new Float64Array([0, 1e-3]), loss, slope);
    expect([...loss]).toEqual([0, 0]);
    expect([...slope]).toEqual([0, 0]);
  });

  it('a CV with surface at θ = 0 keeps the finite stand-in for the infinite slope (n < 0)', () => {
    const loss = new Float64Array(1);
    const slope = new Float64Array(1);
    cvLosses(law(-0.95), new Float64Array([2]), new Float64Array([1]), new Float64Array([0]), loss, slope);
    expect(loss[0]).toBe(0);
    expect(Number.isFinite(slope[0])).toBe(true);
    expect(slope[0]).toBeGreaterThan(0);
  });
});
