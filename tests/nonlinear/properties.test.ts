/**
 * Properties of the nonlinear fd-1d solution for random fins (fast-check): every profile, power-law or
 * position-dependent h, grey radiation to surroundings colder or hotter than the fluid, k(T) tables,
 * every tip, with or without a contact resistance. Values are invented, over practical ranges.
 *
 * Why they must hold:
 * - monotone in the base temperature: the face flux q(θ) is increasing in θ and k > 0, so the
 *   discrete operator is monotone (an M-function: Ortega, J. M. & Rheinboldt, W. C., 1970, Iterative
 *   Solution of Nonlinear Equations in Several Variables, §13.5 [from memory]); a hotter base gives a
 *   hotter fin everywhere and more heat through the base. The physical law is held fixed:
 *   h = C (θ / 50 K)^n, so h_b = C (θ_b / 50 K)^n changes with θ_b as the case format defines it.
 * - energy balance: the scheme is conservative, so base heat = surface heat up to the converged
 *   residual (the brief's bound 1e-9; measured ~1e-14).
 * - efficiency in (0, 1] for an adiabatic or convective tip when the base is the hottest place and
 *   the surroundings are not hotter than the fluid: every face loses at most what it would at θ_b.
 */
import { fc, test } from '@fast-check/vitest';
import { describe, expect } from 'vitest';
import type { Conductivity, HDistribution, Profile, TipCondition } from '../../src/case/types.js';
import { solveNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { profileArbitrary } from '../fd1d/support/arbitraries.js';
import { AMBIENT_DEGC, finCase } from '../support/fin-case.js';

type Law = { kind: 'power'; C: number; n: number } | { kind: 'fixed'; h: HDistribution };

interface RandomFin {
  profile: Profile;
  edges: 'cooled' | 'insulated';
  k: Conductivity;
  law: Law;
  tip: 'adiabatic' | 'convective' | 'own' | 'infinite' | 'temperature';
  ownH: number;
  emissivity: number;
  surroundingsExcess: number;
  contactResistance: number;
  thetaBase: number;
  rise: number;
}

const conductivity: fc.Arbitrary<Conductivity> = fc.oneof(
  fc.double({ min: 5, max: 400, noNaN: true }).map((k) => ({ kind: 'constant' as const, k })),
  fc
    .array(fc.tuple(fc.double({ min: -50, max: 450, noNaN: true }), fc.double({ min: 5, max: 400, noNaN: true })), { minLength: 2, maxLength: 4 })
    .map((points) => {
      const sorted = [...points].sort((a, b) => a[0] - b[0]).filter((p, i, all) => i === 0 || p[0] - (all[i - 1] as [number, number])[0] > 1);
      return { kind: 'table' as const, T_degC: Float64Array.from(sorted, (p) => p[0]), k: Float64Array.from(sorted, (p) => p[1]) };
    }),
);

const law: fc.Arbitrary<Law> = fc.oneof(
  fc.record({ kind: fc.constant('power' as const), C: fc.double({ min: 2, max: 200, noNaN: true }), n: fc.double({ min: 0, max: 2, noNaN: true }) }),
  fc.double({ min: 2, max: 300, noNaN: true }).map((h) => ({ kind: 'fixed' as const, h: { kind: 'uniform' as const, h } })),
  fc
    .record({ base: fc.double({ min: 0, max: 300, noNaN: true }), tip: fc.double({ min: 2, max: 300, noNaN: true }) })
    .map(({ base, tip }) => ({ kind: 'fixed' as const, h: { kind: 'linear' as const, base, tip } })),
);

const randomFin: fc.Arbitrary<RandomFin> = fc
  .record({
    profile: profileArbitrary,
    edges: fc.constantFrom('cooled' as const, 'insulated' as const),
    k: conductivity,
    law,
    tip: fc.constantFrom('adiabatic' as const, 'convective' as const, 'own' as const, 'infinite' as const, 'temperature' as const),
    ownH: fc.double({ min: 2, max: 300, noNaN: true }),
    emissivity: fc.oneof(fc.constant(0), fc.double({ min: 0.05, max: 1, noNaN: true })),
    surroundingsExcess: fc.double({ min: -60, max: 40, noNaN: true }),
    contactResistance: fc.oneof(fc.constant(0), fc.double({ min: 1e-5, max: 1e-3, noNaN: true })),
    thetaBase: fc.double({ min: 5, max: 300, noNaN: true }),
    rise: fc.double({ min: 1, max: 100, noNaN: true }),
  })
  // The infinite tip needs a uniform section (the case parser enforces it).
  .map((f) => (f.tip === 'infinite' && f.profile.kind !== 'rectangular' && f.profile.kind !== 'pin' ? { ...f, tip: 'adiabatic' as const } : f));

function tipOf(f: RandomFin): TipCondition {
  switch (f.tip) {
    case 'adiabatic':
      return { kind: 'adiabatic' };
    case 'convective':
      return { kind: 'convective', h: null };
    case 'own':
      return { kind: 'convective', h: f.ownH };
    case 'infinite':
      return { kind: 'infinite' };
    case 'temperature':
      // Held at the ambient temperature plus 5 K: below every base temperature drawn.
      return { kind: 'temperature', T_degC: AMBIENT_DEGC + 5 };
  }
}

function caseAt(f: RandomFin, thetaBase: number) {
  const h: HDistribution = f.law.kind === 'power' ? { kind: 'power', base: f.law.C * (thetaBase / 50) ** f.law.n, exponent: f.law.n } : f.law.h;
  return finCase({
    profile: f.profile,
    edges: f.edges,
    k: f.k,
    h,
    tip: tipOf(f),
    base_degC: AMBIENT_DEGC + thetaBase,
    emissivity: f.emissivity,
    surroundings_degC: AMBIENT_DEGC + f.surroundingsExcess,
    contactResistance: f.contactResistance,
  });
}

const nodes = fc.integer({ min: 3, max: 400 });

describe('random nonlinear fins (fast-check)', () => {
  test.prop([randomFin, nodes])('the heat rate rises with the base temperature', (fin, n) => {
    const cooler = solveNonlinearFin1D(caseAt(fin, fin.thetaBase), { nodes: n });
    const hotter = solveNonlinearFin1D(caseAt(fin, fin.thetaBase + fin.rise), { nodes: n });
    expect(hotter.heatRate).toBeGreaterThan(cooler.heatRate);
  });

  test.prop([randomFin, nodes])('energy balance <= 1e-9', (fin, n) => {
    const result = solveNonlinearFin1D(caseAt(fin, fin.thetaBase), { nodes: n });
    expect(result.energyBalance).toBeLessThanOrEqual(1e-9);
    expect(result.newton.residual).toBeLessThanOrEqual(1e-12);
  });

  test.prop([randomFin.filter((f) => (f.tip === 'adiabatic' || f.tip === 'convective' || f.tip === 'own') && f.surroundingsExcess <= 0), nodes])(
    'adiabatic or convective tip, surroundings not hotter than the fluid: 0 < efficiency <= 1',
    (fin, n) => {
      const result = solveNonlinearFin1D(caseAt(fin, fin.thetaBase), { nodes: n });
      expect(result.efficiency).toBeGreaterThan(0);
      // Round-off allowance 1e-12 (the heat rate is converged to 1e-12 relative).
      expect(result.efficiency).toBeLessThanOrEqual(1 + 1e-12);
    },
  );
});
