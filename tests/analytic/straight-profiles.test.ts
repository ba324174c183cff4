import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import {
  gardnerStraightFin,
  straightConcaveParabolicFin,
  straightConvexParabolicFin,
  straightRectangularFin,
  straightTrapezoidalFin,
  straightTriangularFin,
  type StraightFinInput,
} from '../../src/analytic/straight-profiles.js';
import type { ProfileFinResult } from '../../src/analytic/profile-result.js';
import { expectRelClose, tenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

/** Input with the requested mL: k = 200, t_b = 2 mm, L = 20 mm, h chosen from m^2 = 2h/(k t_b). */
function inputFor(mL: number, extra: Partial<StraightFinInput> = {}): StraightFinInput {
  const k = 200;
  const baseThickness = 0.002;
  const length = 0.02;
  const m = mL / length;
  return { h: (m * m * k * baseThickness) / 2, k, length, baseThickness, thetaBase: 40, ...extra };
}

const mLs = [0.25, 0.5, 1, 1.5, 2, 3];
// Efficiency table 2a (straight fins, m^2 = 2h/(k t_b)): computed reference values (mpmath, script
// profiles.py, each checked by a finite-volume solution with Richardson extrapolation to <= 3e-8), closed
// forms of Harper & Brown 1922 (rectangular) and Gardner 1945 (triangular, parabolic) [from memory].
// Tolerance `tenDigits`: 10 significant digits printed.
const table: [string, (i: StraightFinInput) => ProfileFinResult, number[]][] = [
  ['rectangular', straightRectangularFin, [0.9796746496, 0.9242343145, 0.761594156, 0.6034321691, 0.48201379, 0.3316849179]],
  ['triangular', straightTriangularFin, [0.9699984503, 0.8927799318, 0.697774658, 0.539990196, 0.4317613055, 0.3041197681]],
  ['concave parabolic', straightConcaveParabolicFin, [0.94427191, 0.8284271247, 0.6180339887, 0.4805061467, 0.3903882032, 0.2823756961]],
  ['convex parabolic', straightConvexParabolicFin, [0.9757571602, 0.9110890522, 0.7325766848, 0.5724748432, 0.4563660411, 0.3171423177]],
];

describe.each(table)('straight %s fin (Table 2a)', (_name, fin, etas) => {
  it.each(mLs.map((mL, i) => [mL, etas[i] ?? NaN]))('mL = %d: eta = %d', (mL, eta) => {
    const r = fin(inputFor(mL));
    expectRelClose(r.mL, mL, 1e-14, 'mL');
    expectRelClose(r.efficiency, eta, tenDigits, 'eta');
    // q = eta h (2L) thetaBase per metre of width, and scales with the width.
    const input = inputFor(mL);
    expectRelClose(r.heatRate, eta * input.h * 2 * input.length * input.thetaBase, tenDigits, 'q');
    expectRelClose(fin(inputFor(mL, { width: 0.05 })).heatRate, 0.05 * r.heatRate, 1e-14, 'width');
  });
});

// Trapezoid, tau = t_tip/t_b: computed reference values (script profiles.py, FV-checked), closed form as
// in Kraus, Aziz & Welty 2001 [from memory]. Tolerance `tenDigits`.
describe.each([
  [0.25, [0.905795408, 0.721468559, 0.4469203561]],
  [0.5, [0.9136914315, 0.737799079, 0.4598840083]],
  [0.75, [0.9195561416, 0.7507612219, 0.4714667011]],
] as [number, number[]][])('straight trapezoidal fin, tau = %d', (tau, etas) => {
  it.each([0.5, 1, 2].map((mL, i) => [mL, etas[i] ?? NaN]))('mL = %d: eta = %d', (mL, eta) => {
    const input = inputFor(mL);
    expectRelClose(straightTrapezoidalFin({ ...input, tipThickness: tau * input.baseThickness }).efficiency, eta, tenDigits, 'eta');
  });
});

describe('limits and special cases of the general forms', () => {
  // Limits of the trapezoid (checked in profiles.py to 10 digits): tau -> 1 is the rectangle,
  // tau -> 0 the triangle. tau = 1 - 1e-9: the difference is O(1 - tau), so 1e-8 relative.
  it.each([0.25, 1, 2, 5])('trapezoid tau -> 1 and tau -> 0 at mL = %d', (mL) => {
    const input = inputFor(mL);
    const t = input.baseThickness;
    expectRelClose(
      straightTrapezoidalFin({ ...input, tipThickness: t * (1 - 1e-9) }).efficiency,
      straightRectangularFin(input).efficiency,
      1e-8,
      'tau->1',
    );
    expectRelClose(straightTrapezoidalFin({ ...input, tipThickness: t }).efficiency, straightRectangularFin(input).efficiency, 1e-15, 'tau=1');
    expectRelClose(straightTrapezoidalFin({ ...input, tipThickness: 0 }).efficiency, straightTriangularFin(input).efficiency, 1e-14, 'tau=0');
    // tau = 1e-12: the correction is O(sqrt(tau) * ...) in u_a; 1e-8 is ample.
    expectRelClose(straightTrapezoidalFin({ ...input, tipThickness: t * 1e-12 }).efficiency, straightTriangularFin(input).efficiency, 1e-8, 'tau->0');
  });
  // Gardner 1945 general form [from memory]: nu = 1/2, 0, 1/3 are the rectangle, triangle and convex
  // parabola (profiles.py checks this to 1e-16); identical continued fractions or tanh: 1e-14.
  it.each(mLs)('Gardner nu = 1/2, 0, 1/3 at mL = %d', (mL) => {
    const input = inputFor(mL);
    expectRelClose(gardnerStraightFin({ ...input, nu: 0.5 }).efficiency, straightRectangularFin(input).efficiency, 1e-14, 'nu=1/2');
    expectRelClose(gardnerStraightFin({ ...input, nu: 0 }).efficiency, straightTriangularFin(input).efficiency, 1e-14, 'nu=0');
    expectRelClose(gardnerStraightFin({ ...input, nu: 1 / 3 }).efficiency, straightConvexParabolicFin(input).efficiency, 1e-14, 'nu=1/3');
  });
  // nu -> -infinity is the concave parabola; at nu = -1e6 the difference is O(1/|nu|).
  it('Gardner nu -> -infinity tends to the concave parabola', () => {
    const input = inputFor(1);
    expectRelClose(gardnerStraightFin({ ...input, nu: -1e6 }).efficiency, straightConcaveParabolicFin(input).efficiency, 1e-5, 'nu=-1e6');
  });
  it('rejects a tip thicker than the base and nu >= 1', () => {
    const input = inputFor(1);
    expect(() => straightTrapezoidalFin({ ...input, tipThickness: 1.5 * input.baseThickness })).toThrow(RangeError);
    expect(() => gardnerStraightFin({ ...input, nu: 1 })).toThrow(RangeError);
  });
});
