/**
 * Nonlinear fd-1d with conductivity linear in temperature, k = k0 (1 + β θ), constant h, against the
 * first-integral solution through the Kirchhoff variable U = ∫ k dθ / k0.
 *
 * Source: Aziz, A. & Enamul-Huq, S. M., 1975, "Perturbation solution for convecting fin with variable
 * thermal conductivity", J. Heat Transfer 97, 300-301 (from memory), for the problem; the exact heat
 * rate from the first integral (B = β θ_b, m0^2 = h P / (k0 A), Q = q / (sqrt(h P k0 A) θ_b)):
 *   infinite fin Q = sqrt(1 + 2B/3);
 *   adiabatic tip Q = sqrt(1 - u_t^2 + (2/3) B (1 - u_t^3)), m0 L = ∫_{u_t}^1 (1 + B u) du / sqrt(G(u) - G(u_t)),
 *   G(u) = u^2 + (2/3) B u^3.
 * The numbers are computed reference values (mpmath, script nonlinear.py, checked with scipy solve_bvp)
 * of these closed forms, printed to 10 significant digits (infinite Q to 12).
 * The case gives k as a table over temperature; a two-point table [[T_amb, k0], [T_b, k0 (1 + B)]] is
 * exactly k0 (1 + β θ) over the fin's range. A four-point table on the same line, with points inside
 * the range, checks the piecewise Kirchhoff integration across table points.
 */
import { describe, expect, test } from 'vitest';
import type { Conductivity } from '../../src/case/types.js';
import { studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { plateFin } from './support/cases.js';
import { AMBIENT_DEGC, finCase, relative } from '../support/fin-case.js';

const K0 = 100;
const H = 25;
const THETA_B = 50;
/** m0 = sqrt(h P / (k0 A)) of the plate fin, 1/m. */
const M0 = Math.sqrt((H * plateFin.P) / (K0 * plateFin.A));
const SCALE = Math.sqrt(H * plateFin.P * K0 * plateFin.A) * THETA_B;

function linearK(B: number, temperatures: number[]): Conductivity {
  const beta = B / THETA_B;
  return {
    kind: 'table',
    T_degC: Float64Array.from(temperatures),
    k: Float64Array.from(temperatures, (T) => K0 * (1 + beta * (T - AMBIENT_DEGC))),
  };
}

const TABLES: { id: string; points: number[] }[] = [
  { id: 'two points', points: [AMBIENT_DEGC, AMBIENT_DEGC + THETA_B] },
  { id: 'four points on the same line', points: [AMBIENT_DEGC - 10, AMBIENT_DEGC + 17, AMBIENT_DEGC + 41, AMBIENT_DEGC + 90] },
];

/** Computed reference values (nonlinear.py): B, m0 L, u_t, Q. */
const TABLE: [number, number, number, number][] = [
  [-0.2, 0.5, 0.8638786532, 0.4542471239],
  [-0.2, 1, 0.6041527753, 0.7287442891],
  [-0.2, 2, 0.2364407003, 0.9014016118],
  [0.2, 0.5, 0.9034471796, 0.4677556599],
  [0.2, 1, 0.6850065828, 0.788189188],
  [0.2, 2, 0.2952678606, 1.021135597],
  [0.5, 0.5, 0.9211084271, 0.4736988797],
  [0.5, 1, 0.7296757364, 0.8193943147],
  [0.5, 2, 0.3388454767, 1.097974842],
];

const ROWS = TABLES.flatMap(({ id, points }) =>
  TABLE.map(([B, m0L, tipRatio, Q]) => ({ points, B, m0L, tipRatio, Q, name: `${id}, B = ${B}, m0 L = ${m0L}` })),
);

describe.each(ROWS)('k = k0 (1 + β θ), adiabatic tip: $name (Aziz & Enamul-Huq 1975; nonlinear.py)', ({ points, B, m0L, tipRatio, Q }) => {
  test('heat rate, extrapolation, tip temperature, energy balance', () => {
    const c = finCase({
      profile: plateFin.profile(m0L / M0),
      k: linearK(B, points),
      h: { kind: 'uniform', h: H },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + THETA_B,
    });
    const { result, study } = studyNonlinearFin1D(c);
    const error = Math.abs(relative(result.heatRate, Q * SCALE));
    // 1e-6: the default grids' accuracy target (measured <= 4e-8).
    expect(error).toBeLessThan(1e-6);
    // GCI bounds the true error, up to the table's rounding (5e-10).
    expect(error).toBeLessThanOrEqual(study.gci + 5e-10);
    // 10-digit table values (<= 5e-10) plus the extrapolation remainder (measured ~1e-14): 2e-9.
    expect(Math.abs(relative(study.extrapolated, Q * SCALE))).toBeLessThan(2e-9);
    expect(Math.abs((study.observedOrder as number) - 2)).toBeLessThan(0.1);
    // Second-order nodal error at 4000 cells is ~1e-8 θ_b; 1e-6 leaves room.
    expect(Math.abs((result.tipTemperature_degC - AMBIENT_DEGC) / THETA_B - tipRatio)).toBeLessThan(1e-6);
    expect(result.energyBalance).toBeLessThan(1e-12);
  });
});

/** Infinite fin Q = sqrt(1 + 2B/3), 12 digits (nonlinear.py). */
const INFINITE: [number, number][] = [
  [-0.2, 0.930949336251],
  [0.2, 1.06458129484],
  [0.5, 1.15470053838],
];

describe.each(INFINITE)('k = k0 (1 + β θ), infinite fin, B = %d (Aziz & Enamul-Huq 1975; nonlinear.py)', (B, Q) => {
  test('fin cut at m0 L = 1 with the exact continuation', () => {
    const c = finCase({
      profile: plateFin.profile(1 / M0),
      k: linearK(B, [AMBIENT_DEGC, AMBIENT_DEGC + THETA_B]),
      h: { kind: 'uniform', h: H },
      tip: { kind: 'infinite' },
      base_degC: AMBIENT_DEGC + THETA_B,
    });
    const { result, study } = studyNonlinearFin1D(c);
    // 1e-6 target (measured <= 1e-8); the extrapolated value within the 11-12 digits printed (1e-10).
    expect(Math.abs(relative(result.heatRate, Q * SCALE))).toBeLessThan(1e-6);
    expect(Math.abs(relative(study.extrapolated, Q * SCALE))).toBeLessThan(1e-10);
    expect(result.energyBalance).toBeLessThan(1e-12);
  });
});
