/**
 * Nonlinear fd-2d on fins without a closed form (thick, tapered, radial, radiating, k over temperature,
 * contact resistance, fixed tip temperature): observed order of accuracy over the study's three grids,
 * the GCI against a finer grid, and the energy balance.
 *
 * Expected order: 2, the order of the control-volume finite-element scheme on triangles (Baliga, B. R. &
 * Patankar, S. V., 1980, Numer. Heat Transfer 3, 393-409; from memory) that fd-2d uses; Newton converged to
 * 1e-10 does not change it. Where Bi across the thickness is not small, the logarithmic flux singularity at
 * the base corner (fixed temperature meeting a cooled face) lowers the observed order: an independent
 * uniform-grid finite-volume check of the exact 2-D plate-fin series found 1.7-1.85 (computed reference
 * values, script fin2d_series.py; series of the rectangular fin as in Moitsheki & Rowjee 2011, Math. Probl.
 * Eng. 826819), the graded grids of fd-2d measure 1.85-1.99 on linear fins.
 */
import { describe, expect, it } from 'vitest';
import type { Case, Conductivity } from '../../src/case/types.js';
import { studyNonlinearFin2D } from '../../src/fd/two-d/nonlinear-study.js';
import { constantK, finCase } from '../support/fin-case.js';

const table: Conductivity = { kind: 'table', T_degC: Float64Array.from([20, 80, 150]), k: Float64Array.from([15, 18, 25]) };
const BASE = 150;

/** [name, case, Bi across the thickness at the base is small (thin) or not (thick)] */
const CASES: [string, Case, 'thin' | 'thick'][] = [
  [
    'plate, n = 1/4, convective tip',
    finCase({
      profile: { kind: 'rectangular', length: 0.05, thickness: 0.002, width: 0.1 },
      k: constantK(200),
      h: { kind: 'power', base: 20, exponent: 0.25 },
      tip: { kind: 'convective', h: null },
      base_degC: BASE,
    }),
    'thin',
  ],
  [
    'pin, radiation and k(T), own tip h',
    finCase({
      profile: { kind: 'pin', length: 0.04, diameter: 0.008 },
      k: table,
      h: { kind: 'uniform', h: 10 },
      tip: { kind: 'convective', h: 30 },
      base_degC: BASE,
      emissivity: 0.8,
    }),
    'thin',
  ],
  [
    'annular, n = 1/3, radiation, contact',
    finCase({
      profile: { kind: 'annular', innerRadius: 0.01, outerRadius: 0.04, thickness: 0.003 },
      k: constantK(30),
      h: { kind: 'power', base: 15, exponent: 1 / 3 },
      tip: { kind: 'convective', h: null },
      base_degC: BASE,
      emissivity: 0.9,
      contactResistance: 2e-4,
    }),
    'thin',
  ],
  [
    'plate, k(T), radiation to warm walls, fixed tip',
    finCase({
      profile: { kind: 'rectangular', length: 0.03, thickness: 0.004, width: 0.1 },
      k: table,
      h: { kind: 'uniform', h: 50 },
      tip: { kind: 'temperature', T_degC: 60 },
      base_degC: BASE,
      emissivity: 0.7,
      surroundings_degC: 100,
    }),
    'thin',
  ],
  [
    'triangle, radiation',
    finCase({
      profile: { kind: 'triangular', length: 0.03, baseThickness: 0.006, width: 0.1 },
      k: constantK(15),
      h: { kind: 'uniform', h: 20 },
      base_degC: BASE,
      emissivity: 0.9,
    }),
    'thin',
  ],
  [
    'parabolic concave (cusped tip), n = 1/4',
    finCase({
      profile: { kind: 'parabolic-concave', length: 0.03, baseThickness: 0.006, width: 0.1 },
      k: constantK(50),
      h: { kind: 'power', base: 60, exponent: 0.25 },
      base_degC: BASE,
    }),
    'thin',
  ],
  [
    'thick plate, n = 1/4, Bi = 0.5',
    finCase({
      profile: { kind: 'rectangular', length: 0.02, thickness: 0.01, width: 0.1 },
      k: constantK(20),
      h: { kind: 'power', base: 2000, exponent: 0.25 },
      tip: { kind: 'convective', h: null },
      base_degC: BASE,
    }),
    'thick',
  ],
  [
    'thick trapezoid, n = 2, Bi = 0.23',
    finCase({
      profile: { kind: 'trapezoidal', length: 0.02, baseThickness: 0.006, tipThickness: 0.002, width: 0.1 },
      k: constantK(40),
      h: { kind: 'power', base: 3000, exponent: 2 },
      base_degC: BASE,
    }),
    'thick',
  ],
];

describe.each(CASES)('%s', (_name, c, thickness) => {
  it('observed order, energy balance, Newton steps', () => {
    const s = studyNonlinearFin2D(c);
    const p = s.heatRate.observedOrder as number;
    if (thickness === 'thin') {
      // Thin fins: the corner singularity carries little weight; within 0.1 of the formal order 2
      // (measured 1.97-2.00).
      expect(Math.abs(p - 2)).toBeLessThan(0.1);
    } else {
      // Bi 0.2-0.5: the base corner lowers it (measured 1.92-1.93); at least 1.7 as found on uniform grids.
      expect(p).toBeGreaterThanOrEqual(1.7);
      expect(p).toBeLessThan(2.1);
    }
    // Conservative fluxes, converged Newton: heat in = heat out (requirement 1e-9; measured <= 1.2e-15).
    expect(s.energyBalance).toBeLessThan(1e-9);
    // Nested iteration: each finer grid starts from the coarser solution and needs few steps (measured 2-3;
    // the coarsest grid, started from the base temperature, 4-7).
    for (const steps of s.iterations.slice(1)) expect(steps).toBeLessThanOrEqual(4);
  });
});

describe('the GCI bounds the error', () => {
  it("thick plate: the three-grid GCI covers the distance to a fourth grid's extrapolation", () => {
    const c = (CASES[6] as [string, Case, string])[1];
    const four = studyNonlinearFin2D(c, { levels: 4 });
    const three = studyNonlinearFin2D(c);
    // Celik et al. 2008 (J. Fluids Eng. 130(7), 078001): GCI_fine (Fs = 1.25) is meant to bound the finest
    // grid's error. The Richardson value of the two finest of four grids (one refinement beyond) stands in
    // for the grid-converged heat rate; measured error / GCI = 0.79.
    const error = Math.abs(three.heatRate_W / four.extrapolatedHeatRate_W - 1);
    expect(error).toBeLessThan(three.discretizationError);
    expect(error).toBeGreaterThan(three.discretizationError / 10); // and is not wildly pessimistic
  });
});
