/**
 * The nonlinear 2-D solver on linear fins (exponent 0, emissivity 0, constant k) must give the linear 2-D
 * solver's numbers: from the base temperature, its first Newton step solves the linear system with the same
 * matrix (Ĵ = K + diag(G)) for the correction θ - θ_b. No external source: the reference is
 * src/fd/fin2d.ts itself, checked against the exact 2-D series and the published 1-D closed forms in
 * tests/fd2d.
 *
 * Allowance: both solves stop at a relative residual of 1e-12 of the heat flows (banded Cholesky with
 * refinement, MG-PCG), on right-hand sides that differ (θ and θ - θ_b), so the two solutions agree to about
 * that: measured <= 4.5e-12 in the heat rate and <= 1.3e-12 θ_b in the field over the cases below; 2e-11
 * and 1e-11 θ_b leave room for other grids without hiding a wrong term (a missing lumped conductance moves
 * the heat rate by > 1e-4).
 */
import { describe, expect, it } from 'vitest';
import type { Case, HDistribution, Profile, TipCondition } from '../../src/case/types.js';
import { solveFin2D } from '../../src/fd/two-d/linear-solve.js';
import { studyFin2D } from '../../src/fd/two-d/linear-study.js';
import { solveNonlinearFin2D } from '../../src/fd/two-d/nonlinear-solve.js';
import { studyNonlinearFin2D } from '../../src/fd/two-d/nonlinear-study.js';
import { AMBIENT_DEGC, constantK, finCase } from '../support/fin-case.js';

const HEAT_RATE_ALLOWANCE = 2e-11;
const FIELD_ALLOWANCE = 1e-11;
const BASE_DEGC = 90;
const THETA_B = BASE_DEGC - AMBIENT_DEGC;

const linear = (profile: Profile, h: HDistribution, tip: TipCondition, contactResistance = 0): Case =>
  finCase({ profile, k: constantK(50), h, tip, base_degC: BASE_DEGC, contactResistance });

const CASES: [string, Case][] = [
  [
    'plate, convective tip',
    linear({ kind: 'rectangular', length: 0.04, thickness: 0.003, width: 0.1 }, { kind: 'uniform', h: 80 }, { kind: 'convective', h: null }),
  ],
  [
    'plate, linear h, own tip h, contact',
    linear(
      { kind: 'rectangular', length: 0.04, thickness: 0.003, width: 0.1 },
      { kind: 'linear', base: 80, tip: 30 },
      { kind: 'convective', h: 150 },
      2e-4,
    ),
  ],
  [
    'trapezoid, fixed tip temperature',
    linear(
      { kind: 'trapezoidal', length: 0.03, baseThickness: 0.004, tipThickness: 0.001, width: 0.1 },
      { kind: 'uniform', h: 60 },
      { kind: 'temperature', T_degC: 40 },
    ),
  ],
  [
    'triangle (sharp tip)',
    linear({ kind: 'triangular', length: 0.03, baseThickness: 0.004, width: 0.1 }, { kind: 'uniform', h: 60 }, { kind: 'adiabatic' }),
  ],
  [
    'parabolic concave (cusped tip)',
    linear({ kind: 'parabolic-concave', length: 0.03, baseThickness: 0.004, width: 0.1 }, { kind: 'uniform', h: 60 }, { kind: 'adiabatic' }),
  ],
  ['pin, infinite tip (cut and closed)', linear({ kind: 'pin', length: 0.05, diameter: 0.005 }, { kind: 'uniform', h: 100 }, { kind: 'infinite' })],
  [
    'cone, tabulated h',
    linear(
      { kind: 'conical-pin', length: 0.04, baseDiameter: 0.006, tipDiameter: 0.002 },
      { kind: 'points', x: Float64Array.from([0, 0.02, 0.04]), h: Float64Array.from([90, 60, 40]) },
      { kind: 'convective', h: null },
    ),
  ],
  [
    'annular, contact',
    linear({ kind: 'annular', innerRadius: 0.01, outerRadius: 0.03, thickness: 0.002 }, { kind: 'uniform', h: 40 }, { kind: 'convective', h: null }, 1e-4),
  ],
];

function expectSame(a: ReturnType<typeof solveFin2D>, b: ReturnType<typeof solveNonlinearFin2D>): void {
  const relative = (x: number, y: number): number => Math.abs(x / y - 1);
  expect(relative(b.heatRate_W, a.heatRate_W)).toBeLessThan(HEAT_RATE_ALLOWANCE);
  expect(relative(b.surfaceHeatRate_W, a.surfaceHeatRate_W)).toBeLessThan(HEAT_RATE_ALLOWANCE);
  if (a.efficiency === null) expect(b.efficiency).toBeNull();
  else expect(relative(b.efficiency as number, a.efficiency)).toBeLessThan(HEAT_RATE_ALLOWANCE);
  expect(relative(b.effectiveness, a.effectiveness)).toBeLessThan(HEAT_RATE_ALLOWANCE);
  expect(b.biot).toBe(a.biot);
  let worst = 0;
  for (let p = 0; p < a.field.length; p++) worst = Math.max(worst, Math.abs((a.field[p] as number) - (b.field[p] as number)));
  expect(worst).toBeLessThan(FIELD_ALLOWANCE * THETA_B);
}

describe.each(CASES)('%s', (_name, c) => {
  it('one Newton step gives the linear 2-D solution on the same grid', () => {
    const a = solveFin2D(c, { nx: 61, ny: 13 });
    const b = solveNonlinearFin2D(c, { nx: 61, ny: 13 });
    expectSame(a, b);
    expect(b.newton.iterations).toBe(1);
    expect(b.newton.continuationStages).toBe(0);
    expect(b.solver).toBe(a.solver);
  });
});

describe('the nonlinear kinds with their nonlinearity switched off', () => {
  const plate: Profile = { kind: 'rectangular', length: 0.04, thickness: 0.003, width: 0.1 };
  const reference = linear(plate, { kind: 'uniform', h: 80 }, { kind: 'convective', h: null });
  const a = solveFin2D(reference, { nx: 61, ny: 13 });
  it.each([
    ['power law with exponent 0', { ...reference, convection: { ...reference.convection, h: { kind: 'power', base: 80, exponent: 0 } } } as Case],
    [
      'a flat conductivity table',
      {
        ...reference,
        material: { ...reference.material, k: { kind: 'table', T_degC: Float64Array.from([0, 200]), k: Float64Array.from([50, 50]) } },
      } as Case,
    ],
  ])('%s', (_name, c) => {
    // These take the nonlinear path (Kirchhoff table transform, power factor) and converge in a few steps.
    expectSame(a, solveNonlinearFin2D(c, { nx: 61, ny: 13 }));
  });
  it('MG-PCG as the linear solver of the Newton step', () => {
    const viaMg = solveNonlinearFin2D(reference, { nx: 61, ny: 13, method: 'mg-pcg' });
    expect(viaMg.solver).toBe('mg-pcg');
    expectSame(solveFin2D(reference, { nx: 61, ny: 13, method: 'mg-pcg' }), viaMg);
  });
  it('the refinement study: same grids, heat rates and error estimate', () => {
    const s1 = studyFin2D(reference);
    const s2 = studyNonlinearFin2D(reference);
    expect(s2.grids.map((g) => [g.nx, g.ny])).toEqual(s1.grids.map((g) => [g.nx, g.ny]));
    s1.grids.forEach((g, k) => expect(Math.abs((s2.grids[k]?.heatRate_W as number) / g.heatRate_W - 1)).toBeLessThan(HEAT_RATE_ALLOWANCE));
    // The GCI is a ratio of grid differences ~1e-5 of Q: heat-rate agreement of 2e-11 moves it by ~1e-6 of itself.
    expect(Math.abs(s2.discretizationError / s1.discretizationError - 1)).toBeLessThan(1e-5);
  });
});
