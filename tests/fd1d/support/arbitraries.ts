/**
 * fast-check generators of random valid linear fin cases: every profile of the case format, cooled
 * or insulated edges, uniform / linear / piecewise-linear h, every tip, with or without a contact
 * resistance. Ranges span practical fins (mm to dm, k from stainless steel to copper, h from natural
 * convection to forced liquid cooling); the values are invented.
 */
import { fc } from '@fast-check/vitest';
import type { HDistribution, Profile, TipCondition } from '../../../src/case/types.js';
import type { LinearFinCase } from '../../../src/fd/problem/linear-case.js';
import { AMBIENT_DEGC, linearFinCase } from '../../support/fin-case.js';

const length = fc.double({ min: 0.005, max: 0.2, noNaN: true });
const thickness = fc.double({ min: 2e-4, max: 0.01, noNaN: true });
const width = fc.double({ min: 0.01, max: 0.5, noNaN: true });
const diameter = fc.double({ min: 0.001, max: 0.02, noNaN: true });
const fraction = fc.double({ min: 0, max: 0.95, noNaN: true });

const tabulated: fc.Arbitrary<Profile> = fc
  .record({
    L: length,
    steps: fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 1, maxLength: 5 }),
    sizes: fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 6, maxLength: 6 }),
    sharpTip: fc.boolean(),
    shape: fc.constantFrom('straight' as const, 'pin' as const),
    scale: thickness,
    w: width,
  })
  .map(({ L, steps, sizes, sharpTip, shape, scale, w }) => {
    const total = steps.reduce((a, b) => a + b, 0);
    const x = [0];
    for (const step of steps) x.push((x[x.length - 1] as number) + (step / total) * L);
    x[x.length - 1] = L;
    const size = x.map((_, i) => (sizes[i] as number) * scale * (shape === 'pin' ? 3 : 1));
    if (sharpTip) size[size.length - 1] = 0;
    return shape === 'straight'
      ? { kind: 'tabulated' as const, shape, x: Float64Array.from(x), size: Float64Array.from(size), width: w }
      : { kind: 'tabulated' as const, shape, x: Float64Array.from(x), size: Float64Array.from(size) };
  });

export const profileArbitrary: fc.Arbitrary<Profile> = fc.oneof(
  fc.record({ kind: fc.constant('rectangular' as const), length, thickness, width }),
  fc.record({ kind: fc.constant('pin' as const), length, diameter }),
  fc.record({ length, baseThickness: thickness, tau: fraction, width }).map(({ length: L, baseThickness, tau, width: w }) => ({
    kind: 'trapezoidal' as const,
    length: L,
    baseThickness,
    tipThickness: tau * baseThickness,
    width: w,
  })),
  fc.record({ kind: fc.constant('triangular' as const), length, baseThickness: thickness, width }),
  fc.record({ kind: fc.constant('parabolic-concave' as const), length, baseThickness: thickness, width }),
  fc.record({ kind: fc.constant('parabolic-convex' as const), length, baseThickness: thickness, width }),
  fc
    .record({ length, baseDiameter: diameter, tau: fraction })
    .map(({ length: L, baseDiameter, tau }) => ({ kind: 'conical-pin' as const, length: L, baseDiameter, tipDiameter: tau * baseDiameter })),
  fc
    .record({ innerRadius: fc.double({ min: 0.003, max: 0.05, noNaN: true }), ratio: fc.double({ min: 1.1, max: 6, noNaN: true }), thickness })
    .map(({ innerRadius, ratio, thickness: t }) => ({ kind: 'annular' as const, innerRadius, outerRadius: ratio * innerRadius, thickness: t })),
  tabulated,
);

const hValue = fc.double({ min: 2, max: 500, noNaN: true });

/** h as a function of the fin length (points need positions within it). */
const hArbitrary = (L: number): fc.Arbitrary<HDistribution> =>
  fc.oneof(
    hValue.map((h) => ({ kind: 'uniform' as const, h })),
    fc.record({ base: fc.double({ min: 0, max: 500, noNaN: true }), tip: hValue }).map(({ base, tip }) => ({ kind: 'linear' as const, base, tip })),
    fc
      .record({
        gaps: fc.array(fc.double({ min: 0.05, max: 1, noNaN: true }), { minLength: 1, maxLength: 4 }),
        values: fc.array(hValue, { minLength: 5, maxLength: 5 }),
      })
      .map(({ gaps, values }) => {
        // Gaps of at least 1 % of L between points (a drawn h distribution, not near-duplicates).
        const total = gaps.reduce((a, b) => a + b, 0);
        const x = [0];
        for (const gap of gaps) x.push((x[x.length - 1] as number) + (gap / total) * L);
        x[x.length - 1] = L;
        return { kind: 'points' as const, x: Float64Array.from(x), h: Float64Array.from(values.slice(0, x.length)) };
      }),
  );

const tipArbitrary = (thetaBase: number): fc.Arbitrary<TipCondition> =>
  fc.oneof(
    fc.constant({ kind: 'adiabatic' as const }),
    fc.constant({ kind: 'convective' as const, h: null }),
    hValue.map((h) => ({ kind: 'convective' as const, h })),
    fc.double({ min: 0, max: 1, noNaN: true }).map((f) => ({ kind: 'temperature' as const, T_degC: AMBIENT_DEGC + f * thetaBase })),
    fc.constant({ kind: 'infinite' as const }),
  );

function lengthOf(profile: Profile): number {
  switch (profile.kind) {
    case 'annular':
      return profile.outerRadius - profile.innerRadius;
    case 'tabulated':
      return profile.x[profile.x.length - 1] as number;
    default:
      return profile.length;
  }
}

export const finCaseArbitrary: fc.Arbitrary<LinearFinCase> = fc
  .record({
    profile: profileArbitrary,
    thetaBase: fc.double({ min: 1, max: 200, noNaN: true }),
    k: fc.double({ min: 5, max: 400, noNaN: true }),
    edges: fc.constantFrom('cooled' as const, 'insulated' as const),
    contact: fc.oneof(fc.constant(0), fc.double({ min: 1e-5, max: 1e-3, noNaN: true })),
  })
  .chain(({ profile, thetaBase, k, edges, contact }) =>
    fc
      .record({ h: hArbitrary(lengthOf(profile)), tip: tipArbitrary(thetaBase) })
      .map(({ h, tip }) => linearFinCase({ profile, thetaBase, k, edges, contactResistance: contact, h, tip })),
  );
