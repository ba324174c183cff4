import { beforeAll, describe, expect, it } from 'vitest';
import { I0, I0e, I1, I1e, I2, I2e, In, Ine, K0, K0e, K1, K1e, K2, K2e, Kn, Kne, initBessel } from '../../src/analytic/bessel.js';
import { Iv } from '../../src/analytic/bessel-real-order.js';
import { expectAbsClose, expectRelClose, thirteenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

// Computed reference values (mpmath at 40 digits, script bessel_values.py), shown to 13 significant
// digits; the functions are those of Abramowitz & Stegun 1964, ch. 9. Tolerance 1e-12: rounding of a
// 13-digit value is <= 5e-13 relative, Cephes itself is ~4e-16 (SciPy's build agrees to 3.9e-16).
const unscaled: [number, number, number, number, number][] = [
  [0.1, 1.002501562934, 0.05006252604709, 2.427069024702, 9.853844780871],
  [0.5, 1.063483370741, 0.2578943053909, 0.9244190712277, 1.656441120003],
  [1, 1.266065877752, 0.5651591039925, 0.4210244382407, 0.6019072301972],
  [2, 2.279585302336, 1.590636854637, 0.1138938727495, 0.1398658818165],
  [5, 27.2398718236, 24.33564214245, 0.003691098334043, 0.004044613445452],
  [10, 2815.716628466, 2670.988303701, 1.778006231617e-5, 1.864877345383e-5],
  [50, 2.932553783849e20, 2.903078590104e20, 3.410167749789e-23, 3.444102226718e-23],
];
const scaled: [number, number, number, number, number][] = [
  [0.1, 0.9071009257823, 0.04529844680881, 2.682326102263, 10.89018268305],
  [0.5, 0.6450352704492, 0.1564208031849, 1.524109385774, 2.731009708212],
  [1, 0.4657596075936, 0.2079104153497, 1.144463079807, 1.636153486263],
  [2, 0.3085083225537, 0.2152692892489, 0.8415682150708, 1.033476847069],
  [5, 0.1835408126093, 0.1639722669445, 0.5478075643135, 0.6002738587883],
  [10, 0.1278333371634, 0.1212626813845, 0.3916319344366, 0.4107665705958],
  [50, 0.05656162664745, 0.0559931238929, 0.1768071558574, 0.1785665585588],
];

describe.each(unscaled)('I0, I1, K0, K1 at x = %d (mpmath values, script bessel_values.py)', (x, i0, i1, k0, k1) => {
  it('match to 13 digits', () => {
    expectRelClose(I0(x), i0, thirteenDigits, 'I0');
    expectRelClose(I1(x), i1, thirteenDigits, 'I1');
    expectRelClose(K0(x), k0, thirteenDigits, 'K0');
    expectRelClose(K1(x), k1, thirteenDigits, 'K1');
    // The integer-order builders reproduce orders 0 and 1 exactly (same Cephes kernels).
    expectRelClose(In(1, x), i1, thirteenDigits, 'In(1)');
    expectRelClose(Kn(1, x), k1, thirteenDigits, 'Kn(1)');
  });
});

describe.each(scaled)('scaled I0e, I1e, K0e, K1e at x = %d (mpmath values, script bessel_values.py)', (x, i0, i1, k0, k1) => {
  it('match to 13 digits', () => {
    expectRelClose(I0e(x), i0, thirteenDigits, 'I0e');
    expectRelClose(I1e(x), i1, thirteenDigits, 'I1e');
    expectRelClose(K0e(x), k0, thirteenDigits, 'K0e');
    expectRelClose(K1e(x), k1, thirteenDigits, 'K1e');
  });
});

describe('other orders used by the profile formulas (mpmath values, script bessel_values.py)', () => {
  it('I2(2), I_{2/3}(4/3), I_{-1/3}(4/3)', () => {
    expectRelClose(I2(2), 0.6889484476987, thirteenDigits, 'I2(2)');
    expectRelClose(Iv(2 / 3, 4 / 3), 1.090349729974, thirteenDigits, 'I_{2/3}(4/3)');
    expectRelClose(Iv(-1 / 3, 4 / 3), 1.488376237711, thirteenDigits, 'I_{-1/3}(4/3)');
    expectRelClose(Iv(2, 2), 0.6889484476987, thirteenDigits, 'Iv(2, 2) series');
  });
});

// Abramowitz & Stegun 1964, Handbook of Mathematical Functions, Table 9.8 (10 decimals), as transcribed
// in bessel_values.py. Tolerance 2e-10 absolute (5e-10 for x^2 K2): the table is correct to about +-1
// in the 10th decimal (its differences from mpmath reach 1.5e-10; x^2 K2 has 9 decimals).
const tableNineEight: [number, number, number, number, number, number, number][] = [
  // x, e^-x I0, e^-x I1, x^-2 I2, e^x K0, e^x K1, x^2 K2
  [1, 0.4657596077, 0.2079104154, 0.1357476698, 1.1444630797, 1.6361534863, 1.624838899],
  [2, 0.3085083225, 0.2152692892, 0.1722371119, 0.8415682151, 1.0334768471, 1.015039018],
  [3, 0.2430003542, 0.1968267133, 0.249468049, 0.697761598, 0.80656348, 0.553594126],
  [4, 0.2070019211, 0.1787508394, 0.4013868359, 0.6092976693, 0.6815759452, 0.278422808],
];
describe.each(tableNineEight)('A&S Table 9.8 at x = %d', (x, i0e, i1e, i2s, k0e, k1e, k2s) => {
  it('all six functions within the table accuracy', () => {
    expectAbsClose(I0e(x), i0e, 2e-10, 'e^-x I0');
    expectAbsClose(I1e(x), i1e, 2e-10, 'e^-x I1');
    expectAbsClose(I2(x) / (x * x), i2s, 2e-10, 'x^-2 I2');
    expectAbsClose(K0e(x), k0e, 2e-10, 'e^x K0');
    expectAbsClose(K1e(x), k1e, 2e-10, 'e^x K1');
    expectAbsClose(x * x * K2(x), k2s, 5e-10, 'x^2 K2');
  });
});

// e^-x I0 at the points of SciPy's `test_i0` (scipy/special tests), values of A&S Table 9.8 and its
// large-x companion; same 2e-10 absolute tolerance as above.
describe.each([
  [0.1, 0.9071009258],
  [0.5, 0.6450352706],
  [2.5, 0.2700464416],
  [5, 0.1835408126],
  [20, 0.0897803119],
])('A&S e^-x I0(%d)', (x, value) => {
  it('within 2e-10', () => expectAbsClose(I0e(x), value, 2e-10, 'e^-x I0'));
});

describe('integer orders by ratio (I) and recurrence (K)', () => {
  // Identity checks: Wronskian I_n K_{n+1} + I_{n+1} K_n = 1/x (A&S 9.6.15), which holds for every x
  // and mixes the two independent constructions; in scaled form the exponentials cancel. Round-off of
  // a few products and ratios: 1e-14.
  it.each([0.01, 0.3, 1, 7, 19.9, 20.1, 60, 500, 1e4])('Wronskian for n = 0..6 at x = %d', (x) => {
    for (let n = 0; n <= 6; n++) {
      const w = Ine(n, x) * Kne(n + 1, x) + Ine(n + 1, x) * Kne(n, x);
      expectRelClose(w * x, 1, 1e-14, `n=${n}`);
    }
  });
  it('scaled and unscaled forms agree where both are finite', () => {
    for (const x of [0.2, 3, 30]) {
      expectRelClose(I2e(x), I2(x) * Math.exp(-x), 1e-14, 'I2e');
      expectRelClose(K2e(x), K2(x) * Math.exp(x), 1e-14, 'K2e');
    }
  });
  it('scaled forms stay finite where I overflows and K underflows', () => {
    for (const x of [800, 1e5]) {
      for (let n = 0; n <= 3; n++) {
        expect(Number.isFinite(Ine(n, x)) && Ine(n, x) > 0).toBe(true);
        expect(Number.isFinite(Kne(n, x)) && Kne(n, x) > 0).toBe(true);
        // Large-argument expansion e^{-x} I_n ~ (1 - (mu-1)/(8x) + (mu-1)(mu-9)/(2!(8x)^2) - ...)/sqrt(2 pi x),
        // mu = 4n^2 (A&S 9.7.1); tolerance: twice the first omitted term plus round-off.
        const mu = 4 * n * n;
        const e = 8 * x;
        const series = 1 - (mu - 1) / e + ((mu - 1) * (mu - 9)) / (2 * e * e);
        const omitted = Math.abs(((mu - 1) * (mu - 9) * (mu - 25)) / (6 * e * e * e));
        expectRelClose(Ine(n, x) * Math.sqrt(2 * Math.PI * x), series, 2 * omitted + 1e-14, `Ine(${n})`);
      }
    }
  });
  it('I_n(0) and rejects arguments outside the domain', () => {
    expect(Ine(0, 0)).toBe(1);
    expect(Ine(3, 0)).toBe(0);
    expect(() => K0e(0)).toThrow(RangeError);
    expect(() => I1(-1)).toThrow(RangeError);
    expect(() => Ine(1.5, 1)).toThrow(RangeError);
  });
});
