/**
 * Nonlinear fd-1d with grey radiation (h = 0, emissivity > 0) against the radiating-fin solutions,
 * and the exactness of the infinite-tip continuation with convection and radiation together.
 *
 * Sources: the radiating fin k A T'' = σ ε P (T^4 - T_s^4) with no fin-base view factor, the problem of
 * the classic radiating-fin analyses of Bartas, J. G. & Sellers, W. H., 1960, J. Heat Transfer 82, 73,
 * and Mackay, D. B., 1963, Design of Space Powerplants (both from memory). Reference numbers: computed
 * reference values (mpmath quadrature, script nonlinear.py) of the first integral:
 *   infinite fin   q = sqrt(2 σ ε P k A [(T_b^5 - T_s^5)/5 - T_s^4 (T_b - T_s)]);
 *   adiabatic tip  T_s replaced by the tip temperature T_t inside the bracket, L from a quadrature.
 * Check example (invented inputs): aluminium plate per metre of width, t = 2 mm (A = 0.002 m^2, P = 2 m), k = 180 W/(m K),
 * ε = 0.9, σ = 5.670374419e-8 W/(m^2 K^4); values printed to 10 significant digits.
 */
import { describe, expect, test } from 'vitest';
import { solveNonlinearFin1D, studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { KELVIN, plateFin } from './support/cases.js';
import { constantK, finCase, relative } from '../support/fin-case.js';

/** Computed reference values (nonlinear.py): T_b, T_s (K), q'_inf, then for L = 0.05 and 0.2 m: T_tip (K), q' (W/m). */
const TABLE: { Tb: number; Ts: number; infinite: number; rows: { L: number; tip: number; q: number }[] }[] = [
  {
    Tb: 400,
    Ts: 0,
    infinite: 387.9478463,
    rows: [
      { L: 0.05, tip: 391.5497438, q: 123.4494703 },
      { L: 0.2, tip: 325.919814, q: 310.5687159 },
    ],
  },
  {
    Tb: 400,
    Ts: 250,
    infinite: 305.1081619,
    rows: [
      { L: 0.05, tip: 392.8412605, q: 104.590532 },
      { L: 0.2, tip: 338.570427, q: 259.7736084 },
    ],
  },
  {
    Tb: 600,
    Ts: 300,
    infinite: 963.6363583,
    rows: [
      { L: 0.05, tip: 565.2043868, q: 523.8427201 },
      { L: 0.2, tip: 419.21103, q: 919.229832 },
    ],
  },
];

/** The fluid temperature only sets θ = T - T_amb here (h = 0); any value works. */
const AMBIENT = 20;

function radiatingCase(Tb: number, Ts: number, L: number, tip: 'adiabatic' | 'infinite') {
  return finCase({
    profile: plateFin.profile(L),
    k: constantK(180),
    h: { kind: 'uniform', h: 0 },
    tip: { kind: tip },
    base_degC: Tb - KELVIN,
    ambient_degC: AMBIENT,
    emissivity: 0.9,
    surroundings_degC: Ts - KELVIN,
  });
}

const ROWS = TABLE.flatMap(({ Tb, Ts, infinite, rows }) => [
  { Tb, Ts, L: 0.05, tip: 'infinite' as const, q: infinite, T: null, name: `T_b = ${Tb} K, T_s = ${Ts} K, infinite (cut at 0.05 m)` },
  ...rows.map(({ L, tip, q }) => ({ Tb, Ts, L, tip: 'adiabatic' as const, q, T: tip, name: `T_b = ${Tb} K, T_s = ${Ts} K, L = ${L} m` })),
]);

describe.each(ROWS)('radiating fin: $name (Bartas & Sellers 1960; nonlinear.py)', ({ Tb, Ts, L, tip, q, T }) => {
  test('heat rate, extrapolation, tip temperature, energy balance', () => {
    const { result, study } = studyNonlinearFin1D(radiatingCase(Tb, Ts, L, tip));
    const error = Math.abs(relative(result.heatRate, q));
    // 1e-6: the default grids' accuracy target (measured <= 7e-8).
    expect(error).toBeLessThan(1e-6);
    // GCI bounds the true error, up to the table's rounding (5e-10).
    expect(error).toBeLessThanOrEqual(study.gci + 5e-10);
    // 10-digit table values (<= 5e-10) plus the extrapolation remainder (measured <= 2e-10): 1e-9.
    expect(Math.abs(relative(study.extrapolated, q))).toBeLessThan(1e-9);
    if (T !== null) {
      // Second-order nodal error: measured <= 2e-6 K at 4000 cells (L = 0.2 m, T_b = 600 K); 1e-5 K.
      expect(Math.abs(result.tipTemperature_degC + KELVIN - T)).toBeLessThan(1e-5);
    }
    expect(result.energyBalance).toBeLessThan(1e-12);
    // Efficiency: Q_ideal = ε σ (T_b^4 - T_s^4) P L (every face at T_b), so η = q / that.
    const ideal = 0.9 * 5.670374419e-8 * (Tb ** 4 - Ts ** 4) * plateFin.P * L;
    expect(Math.abs(relative(result.efficiency, q / ideal))).toBeLessThan(1e-6);
  });
});

describe('convection (power law) and radiation to surroundings colder than the fluid, infinite tip', () => {
  // Invented case: h = 15 (θ/θ_b)^(1/4) to air at 30 degC, ε = 0.8 to surroundings at -20 degC (the far
  // end of the fin settles where q(θ_e) = 0, between the two). The continuation tip is the first
  // integral of the whole remaining fin (nonlinear-boundary.ts), so the heat rate must not depend on
  // where the fin is cut, and the short fin's tip temperature must be the long fin's temperature there.
  const make = (L: number) =>
    finCase({
      profile: { kind: 'pin', length: L, diameter: 0.001 },
      k: { kind: 'table', T_degC: Float64Array.from([0, 200]), k: Float64Array.from([160, 140]) },
      h: { kind: 'power', base: 15, exponent: 0.25 },
      tip: { kind: 'infinite' },
      base_degC: 150,
      ambient_degC: 30,
      emissivity: 0.8,
      surroundings_degC: -20,
    });

  test('the heat rate does not depend on where the fin is cut', () => {
    // m ~ 23 1/m: the long fin (mL ~ 7) ends close to the equilibrium, the short one (mL ~ 1.2) does not.
    const short = solveNonlinearFin1D(make(0.05), { nodes: 5001 });
    const long = solveNonlinearFin1D(make(0.3), { nodes: 30001 });
    // Same cell size (1e-5 m) on both: each heat rate carries a discretisation error ~1e-9 (second
    // order); 1e-7 would still catch a continuation that is off by a tenth of a percent of the tail.
    expect(Math.abs(relative(short.heatRate, long.heatRate))).toBeLessThan(1e-7);
    // Node 5000 of the long fin sits at x = 0.05 m.
    expect(long.mesh.x[5000]).toBeCloseTo(0.05, 14);
    expect(Math.abs(short.tipTemperature_degC - ((long.theta[5000] as number) + 30))).toBeLessThan(1e-6);
    // The far end of the long fin lies between the fluid and the surroundings.
    expect(long.tipTemperature_degC).toBeLessThan(30);
    expect(long.tipTemperature_degC).toBeGreaterThan(-20);
    expect(short.energyBalance).toBeLessThan(1e-12);
  });
});
