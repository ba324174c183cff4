import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import {
  optimumConcaveParabolicFin,
  optimumConvexParabolicFin,
  optimumPinFin,
  optimumRectangularFin,
  optimumTriangularFin,
  type OptimumResult,
  type OptimumStraightInput,
} from '../../src/analytic/optimum.js';
import {
  straightRectangularFin,
  straightTriangularFin,
  straightConcaveParabolicFin,
  straightConvexParabolicFin,
} from '../../src/analytic/straight-profiles.js';
import { cylindricalPinFin } from '../../src/analytic/spine-profiles.js';
import { expectRelClose } from './close.js';

beforeAll(async () => {
  await initBessel();
});

// Check example (invented inputs for computed reference values, script optimum.py):
// h = 40, k = 180, A_p = 6e-5 m^2, thetaBase = 1 K (q' in W/(m K)).
const example: OptimumStraightInput = { h: 40, k: 180, profileArea: 6e-5, thetaBase: 1 };

// Optimum mL and eta: computed reference values (mpmath findroot, script optimum.py) of the optimum
// conditions of Schmidt, E., 1926, "Die Wärmeübertragung durch Rippen", Z. VDI 70 (rectangular; the concave
// parabola is Schmidt's least-material profile) and the conditions derived in optimum.py for the other
// profiles; commonly quoted 1.419/0.627 (rectangle) and 1.309/0.594 (triangle), e.g. Kraus, Aziz & Welty
// 2001 (from memory). The script prints 12 significant digits for most (tolerance 1e-11: half a unit in
// the 12th digit is <= 5e-12 relative), 10 for the convex parabola's eta (1e-9).
describe.each([
  // name, function, mL, tol, eta, tol, mean thickness / base thickness of the profile
  ['rectangular (Schmidt 1926): sinh 2z = 6z', optimumRectangularFin, 1.41922319002, 1e-11, 0.626706754378, 1e-11, 1],
  ['triangular', optimumTriangularFin, 1.30940206276, 1e-11, 0.59364881288, 1e-11, 1 / 2],
  ['concave parabolic: mL = sqrt 2, eta = 1/2 exactly', optimumConcaveParabolicFin, Math.SQRT2, 1e-14, 0.5, 1e-14, 1 / 3],
  ['convex parabolic', optimumConvexParabolicFin, 1.35395663795, 1e-11, 0.6146872003, 1e-9, 2 / 3],
] as [string, (i: OptimumStraightInput) => OptimumResult, number, number, number, number, number][])(
  'optimum %s',
  (_name, optimum, mL, mLTol, eta, etaTol, meanOverBase) => {
    it('mL and efficiency', () => {
      const r = optimum(example);
      expectRelClose(r.mL, mL, mLTol, 'mL');
      expectRelClose(r.efficiency, eta, etaTol, 'eta');
      expectRelClose(meanOverBase * r.thickness * r.length, example.profileArea, 1e-14, 'profile area');
    });
  },
);

describe('optimum pin of fixed volume: sinh 2z = (10/3) z (script optimum.py)', () => {
  it('mL and efficiency to 12 digits; the heat rate is a maximum over L', () => {
    const input = { h: 40, k: 180, volume: 1e-6, thetaBase: 1 };
    const r = optimumPinFin(input);
    expectRelClose(r.mL, 0.919296357325, 1e-11, 'mL');
    expectRelClose(r.efficiency, 0.789260573809, 1e-11, 'eta');
    expectRelClose((Math.PI * r.thickness * r.thickness * r.length) / 4, input.volume, 1e-14, 'volume');
    const qAt = (L: number) =>
      cylindricalPinFin({ h: input.h, k: input.k, length: L, baseDiameter: Math.sqrt((4 * input.volume) / (Math.PI * L)), thetaBase: 1 }).heatRate;
    expectRelClose(qAt(r.length), r.heatRate, 1e-13, 'q at optimum');
    expect(qAt(r.length * 1.01)).toBeLessThan(r.heatRate);
    expect(qAt(r.length * 0.99)).toBeLessThan(r.heatRate);
  });
});

describe('dimensional example h = 40, k = 180, A_p = 6e-5 m^2 (script optimum.py)', () => {
  // Values printed to 10 significant digits (L_opt of the rectangle to 9: 1e-8); the ratios to 8 digits
  // (1e-7); the material ratios for equal heat 0.691 and 0.661 to 3 digits (5e-4 absolute).
  const rect = optimumRectangularFin(example);
  const tri = optimumTriangularFin(example);
  const par = optimumConcaveParabolicFin(example);
  it('rectangle: L_opt, t_opt, q_max', () => {
    expectRelClose(rect.length, 0.0647855856, 1e-8, 'L_opt');
    expectRelClose(rect.thickness, 0.0009261319388, 1e-9, 't_opt');
    expectRelClose(rect.heatRate, 3.248125127, 1e-9, "q'_max");
  });
  it('triangle: L_opt, t_b, q_max and the gain over the rectangle', () => {
    expectRelClose(tri.length, 0.07735765008, 1e-9, 'L_opt');
    expectRelClose(tri.thickness, 0.001551236366, 1e-9, 't_b');
    expectRelClose(tri.heatRate, 3.673862171, 1e-9, "q'_max");
    expectRelClose(tri.heatRate / rect.heatRate, 1.1310716, 1e-7, 'ratio');
    expect(Math.abs(Math.pow(rect.heatRate / tri.heatRate, 3) - 0.691)).toBeLessThanOrEqual(5e-4);
  });
  it('concave parabola: L_opt, q_max and the gain over the rectangle', () => {
    expectRelClose(par.length, 0.09321697518, 1e-9, 'L_opt');
    expectRelClose(par.heatRate, 3.728679007, 1e-9, "q'_max");
    expectRelClose(par.heatRate / rect.heatRate, 1.1479481, 1e-7, 'ratio');
    expect(Math.abs(Math.pow(rect.heatRate / par.heatRate, 3) - 0.661)).toBeLessThanOrEqual(5e-4);
  });
  // Independent check (as optimum.py does): golden-section maximisation of the dimensional heat rate over
  // L with the material fixed, using the efficiency closed forms. The maximum is flat, so L is only
  // located to ~sqrt(eps) relative; the heat rates agree to 1e-12.
  it.each([
    [
      'rectangle',
      optimumRectangularFin,
      (L: number) => straightRectangularFin({ h: 40, k: 180, length: L, baseThickness: 6e-5 / L, thetaBase: 1 }).heatRate,
    ],
    [
      'triangle',
      optimumTriangularFin,
      (L: number) => straightTriangularFin({ h: 40, k: 180, length: L, baseThickness: (2 * 6e-5) / L, thetaBase: 1 }).heatRate,
    ],
    [
      'concave parabola',
      optimumConcaveParabolicFin,
      (L: number) => straightConcaveParabolicFin({ h: 40, k: 180, length: L, baseThickness: (3 * 6e-5) / L, thetaBase: 1 }).heatRate,
    ],
    [
      'convex parabola',
      optimumConvexParabolicFin,
      (L: number) => straightConvexParabolicFin({ h: 40, k: 180, length: L, baseThickness: (1.5 * 6e-5) / L, thetaBase: 1 }).heatRate,
    ],
  ] as [string, (i: OptimumStraightInput) => OptimumResult, (L: number) => number][])('%s: direct maximisation over L agrees', (_n, optimum, q) => {
    let a = 0.005;
    let b = 0.5;
    const g = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 120; i++) {
      const c = b - g * (b - a);
      const d = a + g * (b - a);
      if (q(c) > q(d)) b = d;
      else a = c;
    }
    const best = optimum(example);
    expectRelClose(q(0.5 * (a + b)), best.heatRate, 1e-12, 'q max');
    expectRelClose(0.5 * (a + b), best.length, 1e-6, 'L_opt');
  });
});
