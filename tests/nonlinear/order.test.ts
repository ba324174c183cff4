/**
 * Observed order of accuracy of the nonlinear fd-1d heat rate: the least-squares slope of
 * log|error| against log(cell size) over four grids (fitObservedOrder), against the first-integral
 * oracles (computed reference values, mpmath script nonlinear.py) for these problems:
 * power-law h (Sen & Trinh 1986, J. Heat Transfer 108 [from memory]), k linear in T (Aziz &
 * Enamul-Huq 1975, J. Heat Transfer 97 [from memory]), radiation (Bartas & Sellers 1960, J. Heat
 * Transfer 82 [from memory]); and on a tapered fin with every nonlinearity at once, where no closed
 * form exists, the three-grid observed order of Celik et al. (2008, J. Fluids Eng. 130(7), 078001).
 * Formal order 2 (vertex-centred finite volumes; the Kirchhoff face flux and the lumped losses are
 * both second order). Tolerance 0.1 on the slope: common practice for a fitted order in the
 * asymptotic range (no source). The grids' errors (1e-4 .. 1e-7) are far above the tables' 10-digit
 * rounding (5e-10), which therefore does not bend the fit.
 */
import { describe, expect, test } from 'vitest';
import type { Case } from '../../src/case/types.js';
import { solveNonlinearFin1D, studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { KELVIN, plateFin } from './support/cases.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

const M = Math.sqrt(50); // plate fin with k = 200, h_b = 10: m^2 = h_b P / (k A) = 50 1/m^2
const POWER_SCALE = Math.sqrt(10 * plateFin.P * 200 * plateFin.A) * 60;
const K_SCALE = Math.sqrt(25 * plateFin.P * 100 * plateFin.A) * 50;

const ORACLES: { id: string; c: Case; q: number }[] = [
  {
    id: 'power-law h, n = 1/3, mL = 1, adiabatic tip (Sen & Trinh 1986; nonlinear.py: Q = 0.7183075317)',
    c: finCase({
      profile: plateFin.profile(1 / M),
      k: constantK(200),
      h: { kind: 'power', base: 10, exponent: 1 / 3 },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + 60,
    }),
    q: 0.7183075317 * POWER_SCALE,
  },
  {
    id: 'power-law h, n = 2, infinite fin cut at mL = 1 (Sen & Trinh 1986; nonlinear.py: Q = 0.707106781187)',
    c: finCase({
      profile: plateFin.profile(1 / M),
      k: constantK(200),
      h: { kind: 'power', base: 10, exponent: 2 },
      tip: { kind: 'infinite' },
      base_degC: AMBIENT_DEGC + 60,
    }),
    q: 0.707106781187 * POWER_SCALE,
  },
  {
    id: 'k = k0 (1 + β θ), B = 0.5, m0 L = 2 (Aziz & Enamul-Huq 1975; nonlinear.py: Q = 1.097974842)',
    c: finCase({
      profile: plateFin.profile(2 / Math.sqrt(250)),
      k: { kind: 'table', T_degC: Float64Array.from([AMBIENT_DEGC, AMBIENT_DEGC + 50]), k: Float64Array.from([100, 150]) },
      h: { kind: 'uniform', h: 25 },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + 50,
    }),
    q: 1.097974842 * K_SCALE,
  },
  {
    id: "radiation, T_b = 600 K, T_s = 300 K, L = 0.2 m (Bartas & Sellers 1960; nonlinear.py: q' = 919.229832 W/m)",
    c: finCase({
      profile: plateFin.profile(0.2),
      k: constantK(180),
      h: { kind: 'uniform', h: 0 },
      tip: { kind: 'adiabatic' },
      base_degC: 600 - KELVIN,
      emissivity: 0.9,
      surroundings_degC: 300 - KELVIN,
    }),
    q: 919.229832,
  },
];

const CELLS = [50, 100, 200, 400];

describe.each(ORACLES)('observed order: $id', ({ c, q }) => {
  test('slope of log|error| over 50..400 cells is 2 within 0.1', () => {
    const errors = CELLS.map((cells) => relative(solveNonlinearFin1D(c, { nodes: cells + 1 }).heatRate, q));
    const { order } = fitObservedOrder(
      CELLS.map((n) => 1 / n),
      errors,
    );
    expect(Math.abs(order - 2)).toBeLessThan(0.1);
  });
});

describe('observed order without an oracle: tapered pin, power-law h, radiation and k(T), convective tip', () => {
  test('Celik three-grid order is 2 within 0.1', () => {
    const c = finCase({
      profile: { kind: 'conical-pin', length: 0.05, baseDiameter: 0.006, tipDiameter: 0.002 },
      k: { kind: 'table', T_degC: Float64Array.from([0, 100, 300]), k: Float64Array.from([230, 210, 160]) },
      h: { kind: 'power', base: 12, exponent: 0.25 },
      tip: { kind: 'convective', h: null },
      base_degC: 250,
      emissivity: 0.7,
      surroundings_degC: 10,
    });
    const { study, result } = studyNonlinearFin1D(c, { nodes: [101, 201, 401] });
    expect(Math.abs((study.observedOrder as number) - 2)).toBeLessThan(0.1);
    // In the asymptotic range the two GCIs differ by r^p (Roache): ratio within 0.05 of 1 (no source).
    expect(Math.abs((study.asymptoticRatio as number) - 1)).toBeLessThan(0.05);
    expect(result.energyBalance).toBeLessThan(1e-12);
  });
});
