import { describe, expect, it } from 'vitest';
import { studyFin2D } from '../../src/fd/two-d/linear-study.js';
import { plateCase, THETA_B } from './cases.js';

// Reference values: computed reference values (scipy/mpmath script fin2d_series.py, adiabatic and
// convective tips), closed form by separation of variables of the 2-D plate fin: eigenvalues
// lambda tan(lambda) = Bi, q' = 2 k theta_b sum w_n G_n; exact 2-D series solutions of this fin are
// published by Moitsheki & Rowjee (2011), Math. Probl. Eng. 2011, 826819, and compared with the 1-D model
// by Campo (2019), Int. J. Heat Technol. 37(1), 197-202. The table gives eta_2D to 9 digits; the heat rate
// follows from eta h A theta_b with A = 2 L (adiabatic tip) or 2 L + 2 b (convective tip) per metre of width.
const adiabatic: [bi: number, mL: number, eta: number][] = [
  [0.01, 0.5, 0.921542567],
  [0.01, 4, 0.249433223],
  [0.1, 1, 0.74449611],
  [0.2, 2, 0.467039393],
  [0.5, 0.5, 0.839309374],
  [1, 2, 0.425087632],
  [2, 1, 0.580980384],
  [2, 4, 0.210326922],
];
const convective: [bi: number, mL: number, eta: number][] = [
  [0.01, 1, 0.726205866],
  [0.1, 0.5, 0.819602687],
  [0.5, 4, 0.200255788],
  [1, 1, 0.462939236],
  [2, 0.5, 0.564214949],
  [2, 2, 0.253603489],
];

describe.each([
  ['adiabatic', adiabatic],
  ['convective', convective],
] as const)('plate fin, %s tip, against the exact 2-D series', (tip, rows) => {
  it.each(rows)('Bi = %s, mL = %s', (bi, mL, eta) => {
    const { c, b, L, h } = plateCase(bi, mL, tip);
    const area = tip === 'adiabatic' ? 2 * L : 2 * L + 2 * b; // per metre of width
    const exact = eta * h * area * THETA_B;
    const s = studyFin2D(c);
    // 1e-4 after extrapolation is the requirement (kept); see the 1e-6 of issue 14 below.
    expect(Math.abs(s.extrapolatedHeatRate_W / exact - 1)).toBeLessThan(1e-4);
    // The GCI must cover the finest grid's true error (Celik et al. 2008: the purpose of Fs = 1.25).
    expect(Math.abs(s.heatRate_W / exact - 1)).toBeLessThan(s.discretizationError);
    // The extrapolated value is the reported one: its own error estimate (one more, coarser grid; refinement.ts,
    // extrapolationError, after Roache 1998) must cover its true error, and be tighter than the finest grid's GCI.
    const e = s.extrapolated;
    expect(e).not.toBeNull();
    expect(Math.abs((e?.heatRate_W ?? Number.NaN) / exact - 1)).toBeLessThan(e?.error ?? Number.NaN);
    expect(e?.error).toBeLessThan(s.discretizationError);
    // Issue 14: the default study's reported (extrapolated) value is within 1e-6 of the exact series (measured
    // 1.5e-8 to 4.9e-7 with the Bi-sized grids of gridFamily2D); the table's 9 digits add at most 1e-9 / eta < 5e-9.
    expect(Math.abs((e?.heatRate_W ?? Number.NaN) / exact - 1)).toBeLessThanOrEqual(1e-6);
    // Observed order: formally 2, reduced by the base corner's log singularity (an independent FV check
    // in fin2d_series.py shows 1.7-1.85 on uniform grids); the default grading lifts it to 1.85-1.99.
    expect(s.heatRate.observedOrder).toBeGreaterThan(1.7);
    expect(s.heatRate.observedOrder).toBeLessThan(2.1);
    // Conservative scheme, direct solve: heat in = heat out to round-off (requirement 1e-9).
    expect(s.energyBalance).toBeLessThan(1e-9);
  });
});

describe('plate fin, infinite tip (exact slowest-mode closure at the cut)', () => {
  // Computed reference values (fin2d_series.py, infinite plate fin): S_inf = q' / (2 k theta_b)
  // of the infinitely long plate, same separation-of-variables series as above.
  it.each([
    [0.01, 0.0998411443],
    [0.1, 0.3117355388],
    [1, 0.9028223479],
    [2, 1.194471288],
  ])('Bi = %s', (bi, sInf) => {
    const { c, k } = plateCase(bi, 1, 'infinite');
    const s = studyFin2D(c);
    // q' (both faces, per metre of width; the case's width is 1 m) = 2 k theta_b S_inf.
    const perWidth = 2 * k * THETA_B * sInf;
    // 1e-4: the requirement; the cut adds < 4e-13 (fin2dCase.ts).
    expect(Math.abs(s.extrapolatedHeatRate_W / perWidth - 1)).toBeLessThan(1e-4);
    // The extrapolated value's own error estimate covers its true error (see above; the cut adds < 4e-13).
    expect(Math.abs((s.extrapolated?.heatRate_W ?? Number.NaN) / perWidth - 1)).toBeLessThan(s.extrapolated?.error ?? Number.NaN);
    // Issue 14: true error <= 1e-6 (measured 1.5e-8 to 6.3e-7); the table's 10 digits add < 1e-9.
    expect(Math.abs((s.extrapolated?.heatRate_W ?? Number.NaN) / perWidth - 1)).toBeLessThanOrEqual(1e-6);
    expect(s.finest.efficiency).toBeNull();
    expect(s.energyBalance).toBeLessThan(1e-9);
  });
});
