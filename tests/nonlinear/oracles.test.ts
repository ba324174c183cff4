/**
 * Nonlinear fd-1d against the first-integral oracles of src/analytic/nonlinear.ts at parameters off the
 * reference tables (longer fins, a pin, a strong conductivity slope, radiation from a pin to a warm
 * enclosure). The oracles evaluate the closed forms of Sen & Trinh 1986 (J. Heat Transfer 108,
 * 457-459; power-law h), Aziz & Enamul-Huq 1975 (J. Heat Transfer 97, 300-301; k linear in T) and
 * the classic radiating fin (Bartas & Sellers 1960, J. Heat Transfer 82, 73) [all from memory] by
 * adaptive Gauss-Kronrod quadrature and Brent root finding to ~1e-13, and are themselves checked
 * against the computed reference values of nonlinear.py (mpmath; tests/analytic/nonlinear.test.ts).
 */
import { describe, expect, test } from 'vitest';
import { linearConductivityAdiabaticFin, powerLawHAdiabaticFin, radiatingAdiabaticFin, radiatingInfiniteFin } from '../../src/analytic/nonlinear.js';
import { studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { KELVIN, pinFin, plateFin, type UniformFin } from './support/cases.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

/**
 * Tolerances: 1e-6 on the default study grids (the accuracy target; measured <= 3e-7 at mL = 3);
 * the GCI must bound the true error (the oracle's own error, ~1e-13, is negligible); the Richardson
 * value within 1e-9 (O(h^3) remainder and round-off, measured <= 1e-10).
 */
function expectOracle(result: { heatRate: number }, study: { gci: number; extrapolated: number }, q: number): void {
  const error = Math.abs(relative(result.heatRate, q));
  expect(error).toBeLessThan(1e-6);
  expect(error).toBeLessThanOrEqual(study.gci + 1e-12);
  expect(Math.abs(relative(study.extrapolated, q))).toBeLessThan(1e-9);
}

const FINS: { fin: UniformFin; k: number }[] = [
  { fin: plateFin, k: 200 },
  { fin: pinFin, k: 390 },
];

describe.each(FINS.flatMap(({ fin, k }) => [0.25, 1 / 3, 2].map((n) => ({ fin, k, n, name: `${fin.id}, n = ${n.toFixed(3)}` }))))(
  'power-law h, mL = 3, adiabatic tip: $name (Sen & Trinh 1986)',
  ({ fin, k, n }) => {
    test('heat rate and tip temperature', () => {
      const hBase = 30;
      const thetaBase = 45;
      const m = Math.sqrt((hBase * fin.P) / (k * fin.A));
      const L = 3 / m;
      const oracle = powerLawHAdiabaticFin({ hBase, n, k, P: fin.P, A: fin.A, thetaBase, L });
      const c = finCase({
        profile: fin.profile(L),
        k: constantK(k),
        h: { kind: 'power', base: hBase, exponent: n },
        tip: { kind: 'adiabatic' },
        base_degC: AMBIENT_DEGC + thetaBase,
      });
      const { result, study } = studyNonlinearFin1D(c);
      expectOracle(result, study, oracle.heatRate);
      // Nodal error ~1e-7 θ_b at mL = 3 on 4000 cells; 1e-6 θ_b.
      expect(Math.abs((result.tipTemperature_degC - AMBIENT_DEGC) / thetaBase - oracle.tipRatio)).toBeLessThan(1e-6);
    });
  },
);

describe('k = k0 (1 + β θ), B = 0.8, m0 L = 1.5, pin (Aziz & Enamul-Huq 1975)', () => {
  test('heat rate and tip temperature', () => {
    const k0 = 60;
    const h = 40;
    const thetaBase = 80;
    const beta = 0.8 / thetaBase;
    const m0 = Math.sqrt((h * pinFin.P) / (k0 * pinFin.A));
    const L = 1.5 / m0;
    const oracle = linearConductivityAdiabaticFin({ h, k0, beta, P: pinFin.P, A: pinFin.A, thetaBase, L });
    const c = finCase({
      profile: pinFin.profile(L),
      k: { kind: 'table', T_degC: Float64Array.from([AMBIENT_DEGC, AMBIENT_DEGC + thetaBase]), k: Float64Array.from([k0, k0 * 1.8]) },
      h: { kind: 'uniform', h },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + thetaBase,
    });
    const { result, study } = studyNonlinearFin1D(c);
    expectOracle(result, study, oracle.heatRate);
    expect(Math.abs((result.tipTemperature_degC - AMBIENT_DEGC) / thetaBase - oracle.tipRatio)).toBeLessThan(1e-6);
  });
});

describe('radiating pin, T_b = 500 K, enclosure at 320 K, ε = 0.6, k = 25 (Bartas & Sellers 1960)', () => {
  const input = { emissivity: 0.6, k: 25, P: pinFin.P, A: pinFin.A, baseTemperature_K: 500, sinkTemperature_K: 320 };
  const make = (L: number, tip: 'adiabatic' | 'infinite') =>
    finCase({
      profile: pinFin.profile(L),
      k: constantK(25),
      h: { kind: 'uniform', h: 0 },
      tip: { kind: tip },
      base_degC: 500 - KELVIN,
      emissivity: 0.6,
      surroundings_degC: 320 - KELVIN,
    });

  test('adiabatic tip, L = 0.1 m: heat rate and tip temperature', () => {
    const oracle = radiatingAdiabaticFin({ ...input, L: 0.1 });
    const { result, study } = studyNonlinearFin1D(make(0.1, 'adiabatic'));
    expectOracle(result, study, oracle.heatRate);
    // Nodal error ~1e-7 of the 180 K span on 4000 cells; 1e-5 K.
    expect(Math.abs(result.tipTemperature_degC + KELVIN - oracle.tipTemperature_K)).toBeLessThan(1e-5);
  });

  test('infinite fin cut at 0.02 m with the exact continuation', () => {
    const oracle = radiatingInfiniteFin(input);
    const { result, study } = studyNonlinearFin1D(make(0.02, 'infinite'));
    expectOracle(result, study, oracle.heatRate);
  });
});
