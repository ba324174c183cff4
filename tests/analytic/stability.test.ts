// Large-argument stability: every closed form written in scaled or ratio form must stay finite at
// mL = 50, 200, 1000 (where I0(2mL) ~ e^2000 overflows) and approach the infinite-fin heat rate of the
// base section, M = sqrt(h P k A) thetaBase. The approach is O(1/mL) for the tapered profiles (e.g.
// I1/I0(2mL) = 1 - 1/(4mL) + ..., A&S 9.7.1; concave parabolic spine 1 - 3/(2mL)), so the tolerance is
// 2/mL; no table is involved.
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
import {
  concaveParabolicSpine,
  conicalSpine,
  convexParabolicSpine,
  cylindricalPinFin,
  truncatedConicalSpine,
  type SpineInput,
} from '../../src/analytic/spine-profiles.js';
import { annularFin, annularFinConvectiveTip, annularFinCorrected, annularFinSchmidt } from '../../src/analytic/annular.js';
import type { ProfileFinResult } from '../../src/analytic/profile-result.js';

beforeAll(async () => {
  await initBessel();
});

const largeMLs = [50, 200, 1000];

function straightInput(mL: number): StraightFinInput {
  const k = 200;
  const baseThickness = 0.002;
  const length = 0.05;
  const m = mL / length;
  return { h: (m * m * k * baseThickness) / 2, k, length, baseThickness, thetaBase: 50 };
}
function spineInput(mL: number): SpineInput {
  const k = 200;
  const baseDiameter = 0.004;
  const length = 0.05;
  const m = mL / length;
  return { h: (m * m * k * baseDiameter) / 4, k, length, baseDiameter, thetaBase: 50 };
}

const straight: [string, (i: StraightFinInput) => ProfileFinResult][] = [
  ['rectangular', straightRectangularFin],
  ['triangular', straightTriangularFin],
  ['concave parabolic', straightConcaveParabolicFin],
  ['convex parabolic', straightConvexParabolicFin],
  ['trapezoid tau = 0.3', (i) => straightTrapezoidalFin({ ...i, tipThickness: 0.3 * i.baseThickness })],
  ['trapezoid tau = 0.999', (i) => straightTrapezoidalFin({ ...i, tipThickness: 0.999 * i.baseThickness })],
  ['Gardner nu = 0.2', (i) => gardnerStraightFin({ ...i, nu: 0.2 })],
  ['Gardner nu = -3', (i) => gardnerStraightFin({ ...i, nu: -3 })],
];
describe.each(straight)('straight %s at large mL', (_name, fin) => {
  it.each(largeMLs)('mL = %d: finite, q -> sqrt(2 h k t_b) thetaBase', (mL) => {
    const input = straightInput(mL);
    const r = fin(input);
    expect(Number.isFinite(r.efficiency) && r.efficiency > 0).toBe(true);
    const qInfinite = Math.sqrt(2 * input.h * input.k * input.baseThickness) * input.thetaBase;
    expect(Math.abs(r.heatRate / qInfinite - 1)).toBeLessThanOrEqual(2 / mL);
  });
});

const spines: [string, (i: SpineInput) => ProfileFinResult][] = [
  ['cylinder', cylindricalPinFin],
  ['cone', conicalSpine],
  ['truncated cone tau = 0.4', (i) => truncatedConicalSpine({ ...i, tipDiameter: 0.4 * i.baseDiameter })],
  ['concave parabolic', concaveParabolicSpine],
  ['convex parabolic', convexParabolicSpine],
];
describe.each(spines)('%s spine at large mL', (_name, fin) => {
  it.each(largeMLs)('mL = %d: finite, q -> sqrt(h P k A) thetaBase of the base section', (mL) => {
    const input = spineInput(mL);
    const r = fin(input);
    expect(Number.isFinite(r.efficiency) && r.efficiency > 0).toBe(true);
    const D = input.baseDiameter;
    const qInfinite = Math.sqrt(input.h * Math.PI * D * input.k * ((Math.PI * D * D) / 4)) * input.thetaBase;
    expect(Math.abs(r.heatRate / qInfinite - 1)).toBeLessThanOrEqual(2 / mL);
  });
});

describe('annular fins at large m r and large radius ratios', () => {
  // An annular fin with m r1 >> 1 and m (r2 - r1) >> 1 carries the infinite radial fin's rate
  // 2 pi r1 t k m thetaBase K1(m r1)/K0(m r1) = ... (1 + 1/(2 m r1) + ...), A&S 9.7.2: tolerance 1/(m r1).
  it.each([
    [50, 10],
    [200, 3],
    [1000, 10],
    [1000, 1000],
  ])('m r1 = %d, r2/r1 = %d', (mr1, ratio) => {
    const innerRadius = 0.01;
    const thickness = 0.001;
    const k = 200;
    const m = mr1 / innerRadius;
    const input = { h: (m * m * k * thickness) / 2, k, innerRadius, outerRadius: ratio * innerRadius, thickness, thetaBase: 20 };
    const qInfinite = 2 * Math.PI * innerRadius * thickness * k * m * input.thetaBase;
    for (const fin of [annularFin, annularFinCorrected, annularFinConvectiveTip]) {
      const r = fin(input);
      expect(Number.isFinite(r.heatRate)).toBe(true);
      expect(Math.abs(r.heatRate / qInfinite - 1)).toBeLessThanOrEqual(1 / mr1);
    }
    expect(Number.isFinite(annularFinSchmidt(input).efficiency)).toBe(true);
  });
  // Small m r1 with a huge radius ratio (thin wire with a wide disc): finite and 0 < eta < 1.
  it('m r1 = 1e-3, r2/r1 = 1e4', () => {
    const innerRadius = 1e-4;
    const m = 10;
    const input = { h: (m * m * 200 * 0.001) / 2, k: 200, innerRadius, outerRadius: 1, thickness: 0.001, thetaBase: 20 };
    for (const fin of [annularFin, annularFinCorrected, annularFinConvectiveTip, annularFinSchmidt]) {
      const eta = fin(input).efficiency;
      expect(Number.isFinite(eta) && eta > 0 && eta < 1).toBe(true);
    }
  });
});
