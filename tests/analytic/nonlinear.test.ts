import { describe, expect, it } from 'vitest';
import {
  linearConductivityAdiabatic,
  linearConductivityAdiabaticFin,
  linearConductivityInfiniteFin,
  linearConductivityInfiniteQ,
  linearConductivityLength,
  powerLawHAdiabatic,
  powerLawHAdiabaticFin,
  powerLawHInfiniteFin,
  powerLawHInfiniteProfile,
  powerLawHInfiniteQ,
  powerLawHLength,
  radiatingAdiabaticFin,
  radiatingFinLength,
  radiatingInfiniteFin,
} from '../../src/analytic/nonlinear.js';
import { expectAbsClose, expectRelClose, tenDigits } from './close.js';

// (a) Power-law h = h_b (theta/theta_b)^n. Closed forms from the first integral (Sen & Trinh 1986,
// J. Heat Transfer 108; Unal 1985, IJHMT 28 -- from memory); computed reference values (mpmath, script
// nonlinear.py, each checked with scipy solve_bvp to <= 1e-10). The infinite-fin Q values are printed
// to 12 digits (1e-11), the profile and the table to 10 (`tenDigits`).
describe('power-law h, infinite fin', () => {
  it.each([
    [0.25, 0.942809041582],
    [1 / 3, 0.925820099773],
    [2, 0.707106781187],
    [3, 0.632455532034],
    [-0.5, 1.15470053838],
  ])('n = %d: Q = sqrt(2/(n+2)) = %d', (n, Q) => {
    expectRelClose(powerLawHInfiniteQ(n), Q, 1e-11, 'Q');
    const fin = powerLawHInfiniteFin({ hBase: 10, n, k: 200, P: 2, A: 0.002, thetaBase: 40 });
    expectRelClose(fin.heatRate, Q * Math.sqrt(10 * 2 * 200 * 0.002) * 40, 1e-11, 'q');
  });
  // The profile values are printed with 10 decimals (not 10 significant digits): half a unit of the
  // 10th decimal, 5e-11 absolute, plus round-off.
  it('profile for n = 1/4 at mx = 1 and 5', () => {
    expectAbsClose(powerLawHInfiniteProfile(0.25, 1), 0.4101363273, 5.1e-11, 'u(1)');
    expectAbsClose(powerLawHInfiniteProfile(0.25, 5), 0.0245725306, 5.1e-11, 'u(5)');
  });
});

const powerLawTable: [number, number, number, number, number][] = [
  // n, mL, u_t, Q, eta
  [0.25, 0.5, 0.88927927, 0.4541608241, 0.9083216481],
  [0.25, 1, 0.6678978468, 0.7283030125, 0.7283030125],
  [0.25, 2, 0.3235397197, 0.9048279056, 0.4524139528],
  [1 / 3, 0.5, 0.8900645036, 0.4516161635, 0.9032323271],
  [1 / 3, 1, 0.6738139906, 0.7183075317, 0.7183075317],
  [1 / 3, 2, 0.3402665684, 0.8876142651, 0.4438071326],
  [2, 0.5, 0.902973855, 0.4093807294, 0.8187614588],
  [2, 1, 0.7516220094, 0.5834585319, 0.5834585319],
  [2, 2, 0.541053183, 0.6761302179, 0.338065109],
];
describe.each(powerLawTable)('power-law h, adiabatic tip: n = %d, mL = %d', (n, mL, ut, Q, eta) => {
  it('tip ratio, Q and efficiency', () => {
    const r = powerLawHAdiabatic(n, mL);
    expectRelClose(r.tipRatio, ut, tenDigits, 'u_t');
    expectRelClose(r.Q, Q, tenDigits, 'Q');
    expectRelClose(r.efficiency, eta, tenDigits, 'eta');
    // The length integral evaluated at the tabulated u_t gives back mL; u_t is printed to 10 digits and
    // dmL/du_t is O(1), so 1e-8.
    expectRelClose(powerLawHLength(n, ut), mL, 1e-8, 'mL(u_t)');
  });
  it('dimensional wrapper', () => {
    const k = 180;
    const A = 0.002;
    const P = 2;
    const L = 0.05;
    const m = mL / L;
    const hBase = (m * m * k * A) / P;
    const fin = powerLawHAdiabaticFin({ hBase, n, k, P, A, thetaBase: 60, L });
    expectRelClose(fin.heatRate, Q * Math.sqrt(hBase * P * k * A) * 60, tenDigits, 'q');
    expectRelClose(fin.efficiency, eta, tenDigits, 'eta');
  });
});

describe('power-law h: limits', () => {
  // n = 0 is the linear fin: u_t = 1/cosh(mL), Q = tanh(mL) (Incropera et al. 2007, Table 3.4, from memory).
  // Quadrature and root finding to ~1e-13.
  it.each([0.3, 1, 3, 10])('n = 0 reproduces the linear fin at mL = %d', (mL) => {
    const r = powerLawHAdiabatic(0, mL);
    expectRelClose(r.tipRatio, 1 / Math.cosh(mL), 1e-11, 'u_t');
    expectRelClose(r.Q, Math.tanh(mL), 1e-12, 'Q');
  });
  it('long fins approach the infinite-fin Q', () => {
    for (const n of [0.25, 2]) {
      const r = powerLawHAdiabatic(n, 200);
      expectRelClose(r.Q, powerLawHInfiniteQ(n), 1e-6, `n=${n}`);
    }
  });
  // n = -1/2: the temperature reaches zero at mL_max = sqrt(2(n+2))/(-n) = 2 sqrt(3); beyond, Q is the
  // infinite-fin value (the profile formula vanishes there too).
  it('n < 0 reaches theta = 0 at a finite length', () => {
    const mLmax = Math.sqrt(3) * 2;
    expect(powerLawHInfiniteProfile(-0.5, mLmax * 1.0001)).toBe(0);
    expect(powerLawHAdiabatic(-0.5, mLmax * 1.5).Q).toBe(powerLawHInfiniteQ(-0.5));
    const justShort = powerLawHAdiabatic(-0.5, mLmax * 0.9);
    expect(justShort.tipRatio).toBeGreaterThan(0);
    expectRelClose(powerLawHLength(-0.5, justShort.tipRatio), mLmax * 0.9, 1e-10, 'mL');
  });
});

// (b) k = k0 (1 + beta theta): Kirchhoff transform and first integral (Aziz & Enamul-Huq 1975,
// J. Heat Transfer 97, perturbation solution -- from memory); computed reference values (script
// nonlinear.py, solve_bvp-checked). Q_inf printed to 12 digits (1e-11), the table to 10.
describe('k linear in theta', () => {
  it.each([
    [-0.2, 0.930949336251],
    [0.2, 1.06458129484],
    [0.5, 1.15470053838],
  ])('infinite fin, B = %d: Q = %d', (B, Q) => {
    expectRelClose(linearConductivityInfiniteQ(B), Q, 1e-11, 'Q');
    const fin = linearConductivityInfiniteFin({ h: 25, k0: 100, beta: B / 50, P: 2, A: 0.003, thetaBase: 50 });
    expectRelClose(fin.Q, Q, 1e-11, 'dimensional Q');
  });
  it.each([
    [-0.2, 0.5, 0.8638786532, 0.4542471239],
    [-0.2, 1, 0.6041527753, 0.7287442891],
    [-0.2, 2, 0.2364407003, 0.9014016118],
    [0.2, 0.5, 0.9034471796, 0.4677556599],
    [0.2, 1, 0.6850065828, 0.788189188],
    [0.2, 2, 0.2952678606, 1.021135597],
    [0.5, 0.5, 0.9211084271, 0.4736988797],
    [0.5, 1, 0.7296757364, 0.8193943147],
    [0.5, 2, 0.3388454767, 1.097974842],
  ])('adiabatic tip, B = %d, m0L = %d', (B, m0L, ut, Q) => {
    const r = linearConductivityAdiabatic(B, m0L);
    expectRelClose(r.tipRatio, ut, tenDigits, 'u_t');
    expectRelClose(r.Q, Q, tenDigits, 'Q');
    expectRelClose(linearConductivityLength(B, ut), m0L, 1e-8, 'm0L(u_t)');
    const L = 0.04;
    const m0 = m0L / L;
    const k0 = 100;
    const A = 0.002;
    const fin = linearConductivityAdiabaticFin({ h: (m0 * m0 * k0 * A) / 2, k0, beta: B / 80, P: 2, A, thetaBase: 80, L });
    expectRelClose(fin.Q, Q, tenDigits, 'dimensional Q');
  });
  // B = 0 is the linear fin: Q = tanh(m0L), u_t = 1/cosh(m0L).
  it('B = 0 reproduces the linear fin', () => {
    const r = linearConductivityAdiabatic(0, 1.7);
    expectRelClose(r.Q, Math.tanh(1.7), 1e-12, 'Q');
    expectRelClose(r.tipRatio, 1 / Math.cosh(1.7), 1e-11, 'u_t');
  });
});

// (c) Pure radiation to a sink (first integral derived in nonlinear.py; classic analyses Bartas & Sellers
// 1960 and Mackay 1963 -- from memory). Example: aluminium plate per metre of width, t = 2 mm
// (A = 0.002 m^2, P = 2 m), k = 180, eps = 0.9, sigma = 5.670374419e-8; computed reference values
// (script nonlinear.py, solve_bvp-checked). 10 digits printed: `tenDigits`.
describe.each([
  [400, 0, 387.9478463, 391.5497438, 123.4494703, 325.919814, 310.5687159],
  [400, 250, 305.1081619, 392.8412605, 104.590532, 338.570427, 259.7736084],
  [600, 300, 963.6363583, 565.2043868, 523.8427201, 419.21103, 919.229832],
])('radiating plate fin, T_b = %d K, T_s = %d K', (Tb, Ts, qInf, Tt5, q5, Tt20, q20) => {
  const input = { emissivity: 0.9, k: 180, P: 2, A: 0.002, baseTemperature_K: Tb, sinkTemperature_K: Ts };
  it('infinite fin', () => {
    expectRelClose(radiatingInfiniteFin(input).heatRate, qInf, tenDigits, "q'_inf");
  });
  it.each([
    [0.05, Tt5, q5],
    [0.2, Tt20, q20],
  ])('adiabatic tip, L = %d m', (L, Tt, q) => {
    const r = radiatingAdiabaticFin({ ...input, L });
    expectRelClose(r.tipTemperature_K, Tt, tenDigits, 'T_tip');
    expectRelClose(r.heatRate, q, tenDigits, "q'");
    // Tip temperature printed to 10 digits; dL/dT_t is moderate, so 1e-7 on the length.
    expectRelClose(radiatingFinLength(input, Tt), L, 1e-7, 'L(T_tip)');
  });
});

describe('radiating fin: long fins', () => {
  it('a very long fin carries the infinite-fin heat rate', () => {
    const input = { emissivity: 0.9, k: 180, P: 2, A: 0.002, baseTemperature_K: 400, sinkTemperature_K: 250 };
    const r = radiatingAdiabaticFin({ ...input, L: 1000 });
    expectRelClose(r.heatRate, radiatingInfiniteFin(input).heatRate, 1e-9, 'q');
    expect(r.tipTemperature_K).toBeGreaterThanOrEqual(250);
  });
});
