import { describe, expect, it } from 'vitest';
import {
  correctedLength,
  correctedLengthFin,
  exactCorrectedLength,
  pinCorrectedLength,
  plateCorrectedLength,
} from '../../src/analytic/corrected-length.js';
import { uniformFin } from '../../src/analytic/uniform-fin.js';
import { expectRelClose, tenDigits } from './close.js';

// Corrected length of Harper & Brown 1922 (NACA Report 158, from memory) against the exact convective
// tip; computed reference values (mpmath, script uniform_fin.py / make_tables2.py). The exact length
// L + artanh(beta)/m is derived in uniform_fin.py. Tolerance `tenDigits`: values printed to 10 digits
// (L_c* to 12 digits, so the same tolerance is loose for it).
const D = 0.005;
const cases = [
  {
    name: 'R1',
    h: 40,
    k: 180,
    P: 0.104,
    A: 1e-4,
    L: 0.03,
    thetaBase: 60,
    Lc: 0.03096153846,
    eta: 0.9321568913,
    qLc: 7.203708456,
    qExact: 7.203722261,
    relDiff: -1.92e-6,
    LcExact: 0.030961606956,
  },
  {
    name: 'R2',
    h: 40,
    k: 237,
    P: 2,
    A: 0.001,
    L: 0.025,
    thetaBase: 50,
    Lc: 0.0255,
    eta: 0.9327350245,
    qLc: 95.1389725,
    qExact: 95.13901802,
    relDiff: -4.78e-7,
    LcExact: 0.0255000140654,
  },
  {
    name: 'P1',
    h: 100,
    k: 398,
    P: Math.PI * D,
    A: (Math.PI * D * D) / 4,
    L: 0.05,
    thetaBase: 75,
    Lc: 0.05125,
    eta: 0.8546381502,
    qLc: 5.160090108,
    qExact: 5.160099582,
    relDiff: -1.84e-6,
    LcExact: 0.0512501308873,
  },
  {
    name: 'P2',
    h: 25,
    k: 15,
    P: Math.PI * D,
    A: (Math.PI * D * D) / 4,
    L: 0.1,
    thetaBase: 80,
    Lc: 0.10125,
    eta: 0.2701479107,
    qLc: 0.8593033754,
    qExact: 0.8593034424,
    relDiff: -7.8e-8,
    LcExact: 0.101250869142,
  },
];

describe.each(cases)('corrected length, case $name', (c) => {
  const result = correctedLengthFin(c);
  it('L_c, efficiency and heat rate of the shortcut', () => {
    expectRelClose(result.correctedLength, c.Lc, tenDigits, 'Lc');
    expectRelClose(result.efficiency, c.eta, tenDigits, 'eta(Lc)');
    expectRelClose(result.heatRate, c.qLc, tenDigits, 'q(Lc)');
    expectRelClose(result.area, c.P * c.Lc, tenDigits, 'area P Lc');
  });
  it('its error against the exact convective tip (2-3 digit column: tolerance half a unit of the last digit)', () => {
    const exact = uniformFin({ ...c, tip: { kind: 'convective' } }).heatRate;
    expectRelClose(exact, c.qExact, tenDigits, 'exact q');
    const rel = result.heatRate / exact - 1;
    const lastDigit = Math.pow(10, Math.floor(Math.log10(Math.abs(c.relDiff))) - (c.name === 'P2' ? 1 : 2));
    expect(Math.abs(rel - c.relDiff)).toBeLessThanOrEqual(lastDigit / 2);
  });
  it('the exact corrected length, and that it reproduces the convective tip', () => {
    const LcStar = exactCorrectedLength(c);
    expect(LcStar).not.toBeNull();
    expectRelClose(LcStar ?? NaN, c.LcExact, tenDigits, 'Lc*');
    // tanh(mL + artanh beta) identity: equal to round-off (1e-13).
    const adiabatic = uniformFin({ ...c, L: LcStar ?? NaN, tip: { kind: 'adiabatic' } }).heatRate;
    expectRelClose(adiabatic, uniformFin({ ...c, tip: { kind: 'convective' } }).heatRate, 1e-13, 'q(Lc*)');
  });
});

describe('thin forms and the range of the exact correction', () => {
  it('plate L + t/2 and pin L + D/4 are A/P for a wide plate and for a circle', () => {
    // Per unit width A/P = t/2 exactly when the edges are excluded (P = 2); a circle has A/P = D/4.
    expect(plateCorrectedLength(0.025, 0.001)).toBeCloseTo(correctedLength(0.025, 0.001, 2), 15);
    expect(pinCorrectedLength(0.05, D)).toBeCloseTo(correctedLength(0.05, (Math.PI * D * D) / 4, Math.PI * D), 15);
  });
  it('no exact correction when beta = hA/(kP)^(1/2) >= 1', () => {
    // beta^2 = hA/(kP) = 4 here.
    expect(exactCorrectedLength({ h: 400, k: 1, P: 1, A: 0.01, L: 0.01, thetaBase: 1 })).toBeNull();
  });
  // Worst error of the Harper-Brown form is at L -> 0: tanh(beta)/beta - 1 ~ -beta^2/3. Computed values
  // (script uniform_fin.py): beta^2 = 0.01 -> 0.33 %, 0.03125 -> 1.03 %, 0.09 -> 2.9 %, 0.25 -> 7.6 %;
  // tolerance half a unit of the last printed digit.
  it.each([
    [0.01, 0.33, 0.005],
    [0.03125, 1.03, 0.005],
    [0.09, 2.9, 0.05],
    [0.25, 7.6, 0.05],
  ])('beta^2 = %d: worst error %d %%', (beta2, percent, half) => {
    const P = 1;
    const k = 1;
    const h = 1;
    const A = (beta2 * (k * P)) / h;
    const input = { h, k, P, A, L: 1e-9, thetaBase: 1 };
    const shortcut = correctedLengthFin(input).heatRate;
    const exact = uniformFin({ ...input, tip: { kind: 'convective' } }).heatRate;
    expect(Math.abs(100 * (1 - shortcut / exact) - percent)).toBeLessThanOrEqual(half);
  });
});
