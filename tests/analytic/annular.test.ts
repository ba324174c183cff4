import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import { annularFin, annularFinConvectiveTip, annularFinCorrected, annularFinSchmidt, type AnnularFinInput } from '../../src/analytic/annular.js';
import { expectAbsClose, expectRelClose, tenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

/** Geometry with r2/r1 = ratio and m (r2 - r1) = mLc: r1 = 10 mm, t = 1 mm, k = 200, h from m. */
function inputFor(ratio: number, mLc: number): AnnularFinInput {
  const innerRadius = 0.01;
  const outerRadius = ratio * innerRadius;
  const k = 200;
  const thickness = 0.001;
  const m = mLc / (outerRadius - innerRadius);
  return { h: (m * m * k * thickness) / 2, k, innerRadius, outerRadius, thickness, thetaBase: 30 };
}

// Annular fin of constant thickness, adiabatic at r2c: computed reference values (mpmath, script
// profiles.py; scipy solve_bvp agrees to 1e-15), closed form of Gardner 1945 / Incropera et al. 2007, Table 3.5
// [from memory], Shabany 2009 eq. 7.53. Columns m(r2c - r1) = 0.25, 0.5, 1, 2, 3. Tolerance `tenDigits`.
// Schmidt (1949) approximation [from memory]: the same script prints it to 6 significant digits, so
// its tolerance is half a unit of the 6th digit, 5e-7 absolute (all values lie in [0.1, 1)).
const columns = [0.25, 0.5, 1, 2, 3];
const table: [number, number[], number[]][] = [
  [1.5, [0.9751575958, 0.9085273102, 0.722130839, 0.4302401816, 0.2865969404], [0.973691, 0.903854, 0.713765, 0.428863, 0.291291]],
  [2, [0.9713725325, 0.8956359128, 0.6915397721, 0.3933213206, 0.2555327039], [0.969027, 0.888512, 0.680987, 0.396835, 0.267944]],
  [3, [0.965259954, 0.8753268674, 0.6463936181, 0.3435053457, 0.215116581], [0.96189, 0.865907, 0.637016, 0.358307, 0.24064]],
  [5, [0.9564029757, 0.8469881448, 0.5890918161, 0.2875671875, 0.1719540524], [0.952015, 0.836247, 0.585909, 0.318607, 0.213188]],
];

describe.each(table)('annular fin, r2c/r1 = %d', (ratio, exact, schmidt) => {
  it.each(columns.map((c, i) => [c, exact[i] ?? NaN, schmidt[i] ?? NaN]))('m(r2c - r1) = %d', (mLc, eta, etaSchmidt) => {
    const input = inputFor(ratio, mLc);
    const r = annularFin(input);
    expectRelClose(r.efficiency, eta, tenDigits, 'exact eta');
    expectRelClose(r.mL, mLc, 1e-14, 'mL');
    expectAbsClose(annularFinSchmidt(input).efficiency, etaSchmidt, 5e-7 + 1e-12, 'Schmidt eta');
  });
});

// Exact convective rim against the corrected radius r2c = r2 + t/2: computed reference values (mpmath,
// script profiles.py `annular_convtip`). Tolerance `tenDigits` (the relative error column has 2 digits:
// half a unit of its last digit).
describe.each([
  [50, 200, 0.001, 0.01, 0.025, 22.36067977, 0.1624477838, 0.9401588283, 0.9401165579, 4.1e-4],
  [40, 180, 0.002, 0.0125, 0.04, 14.90711985, 0.3457422159, 0.9028151387, 0.9027253335, 5.6e-4],
  [150, 400, 0.0005, 0.005, 0.015, 38.72983346, 0.1792628383, 0.9166447175, 0.9166085889, 2.6e-4],
])('annular fin with convective rim: h=%d k=%d t=%d r1=%d r2=%d', (h, k, thickness, r1, r2, m, qPerK, etaExact, etaCorrected, relErr) => {
  const input = { h, k, thickness, innerRadius: r1, outerRadius: r2, thetaBase: 1 };
  it('exact heat rate and efficiency, corrected-radius efficiency and its error', () => {
    const exact = annularFinConvectiveTip(input);
    expectRelClose(exact.m, m, tenDigits, 'm');
    expectRelClose(exact.heatRate, qPerK, tenDigits, 'q/thetaBase');
    expectRelClose(exact.efficiency, etaExact, tenDigits, 'eta exact');
    const corrected = annularFinCorrected(input);
    expectRelClose(corrected.efficiency, etaCorrected, tenDigits, 'eta(r2c)');
    expect(Math.abs(corrected.heatRate / exact.heatRate - 1 - relErr)).toBeLessThanOrEqual(0.05e-4);
  });
  // hTip = 0 reduces the convective rim to the adiabatic rim at r2 (same algebra, B = 0): round-off 1e-13.
  it('hTip = 0 equals the adiabatic rim', () => {
    expectRelClose(annularFinConvectiveTip({ ...input, hTip: 0 }).heatRate, annularFin(input).heatRate, 1e-13, 'hTip=0');
  });
});

describe('annular fin limits', () => {
  // A thin ring (r2/r1 -> 1) behaves as a straight fin of length r2 - r1: eta -> tanh(mL)/(mL), with a
  // curvature correction O((r2 - r1)/r1) = 1e-6 here.
  it('r2/r1 -> 1 tends to the straight rectangular fin', () => {
    const input = inputFor(1 + 1e-6, 1);
    expectRelClose(annularFin(input).efficiency, Math.tanh(1), 2e-6, 'thin ring');
  });
  it('rejects outer radius <= inner radius', () => {
    expect(() => annularFin({ ...inputFor(2, 1), outerRadius: 0.01 })).toThrow(RangeError);
  });
});
