import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel, I0e, I1e } from '../../src/analytic/bessel.js';
import { besselIRatio, besselIRatioGauss, besselIRatioPerron } from '../../src/analytic/bessel-ratio.js';
import { Iv, besselIReflectionRatio } from '../../src/analytic/bessel-real-order.js';
import { expectRelClose, thirteenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

const orders = [0.05, 1 / 3, 0.5, 2 / 3, 0.9, 1, 2, 5, 20];

describe.each(orders)('I_nu/I_{nu-1}, nu = %d', (nu) => {
  // Two independent continued fractions (Gauss: A&S 9.6.26 recurrence; Perron: Gautschi & Slavik 1978,
  // from memory) must agree where both converge; 5e-14 allows the ~50 Lentz steps of round-off.
  it('Gauss and Perron fractions agree for 0.01 <= z <= 100', () => {
    for (const z of [0.01, 0.5, 3, 10, 20, 35, 100]) {
      expectRelClose(besselIRatioGauss(nu, z), besselIRatioPerron(nu, z), 5e-14, `z=${z}`);
    }
  });
  // Against the power series of A&S 9.6.10 (all terms positive for order > -1; independent code path).
  it('matches the ratio of power series for z <= 40', () => {
    for (const z of [1e-4, 0.2, 1, 4, 15, 40]) {
      expectRelClose(besselIRatio(nu, z), Iv(nu, z) / Iv(nu - 1, z), 5e-14, `z=${z}`);
    }
  });
  // Large-z behaviour: r = 1 - (2 nu - 1)/(2z) + O(1/z^2) (from A&S 9.7.1); finite and below 1 for all z.
  it('is finite and tends to 1 at large z', () => {
    for (const z of [1e3, 1e6, 1e12]) {
      const r = besselIRatio(nu, z);
      expect(Number.isFinite(r)).toBe(true);
      expect(Math.abs(r - (1 - (2 * nu - 1) / (2 * z)))).toBeLessThanOrEqual((2 * nu * nu + 1) / (z * z) + 1e-15);
    }
  });
});

describe('closed-form special cases', () => {
  // I_{1/2}(z) = sqrt(2/(pi z)) sinh z, I_{-1/2}(z) = sqrt(2/(pi z)) cosh z (A&S 10.2.13, 10.2.14),
  // so the ratio is tanh z; 1e-14 is round-off of the fraction.
  it('I_{1/2}/I_{-1/2} = tanh z from 1e-6 to 1e4', () => {
    for (const z of [1e-6, 0.1, 1, 7, 19, 21, 60, 1e4]) {
      expectRelClose(besselIRatio(0.5, z), Math.tanh(z), 1e-14, `CF z=${z}`);
      expectRelClose(besselIReflectionRatio(0.5, z), Math.tanh(z), 1e-14, `reflection z=${z}`);
    }
  });
  // I1/I0 against the Cephes scaled kernels (Moshier 1989), a third independent evaluation.
  it('I1/I0 equals I1e/I0e from 1e-3 to 1e6', () => {
    for (const z of [1e-3, 0.7, 2, 19.99, 20.01, 333, 1e6]) {
      expectRelClose(besselIRatio(1, z), I1e(z) / I0e(z), 2e-15 * 10, `z=${z}`);
    }
  });
  // Computed reference values I_{2/3}(4/3) = 1.090349729974, I_{-1/3}(4/3) = 1.488376237711 (mpmath,
  // script bessel_values.py); their ratio is good to ~8e-13 (two 13-digit roundings).
  it('I_{2/3}(4/3)/I_{-1/3}(4/3) from the mpmath values', () => {
    expectRelClose(besselIRatio(2 / 3, 4 / 3), 1.090349729974 / 1.488376237711, 2 * thirteenDigits, 'ratio');
  });
});

describe('I_mu/I_{-mu} across the switch from power series to the asymptotic form at z = 25', () => {
  it.each([1 / 3, 0.5, 2 / 3, 0.8])('mu = %d: continuous to round-off', (mu) => {
    const below = besselIReflectionRatio(mu, 25);
    const above = besselIReflectionRatio(mu, 25 * (1 + 1e-15));
    expectRelClose(above, below, 1e-14, 'jump at 25');
    expect(besselIReflectionRatio(mu, 1e4)).toBe(1);
  });
  it('rejects orders outside (0, 1)', () => {
    expect(() => besselIReflectionRatio(1, 1)).toThrow(RangeError);
    expect(() => besselIRatio(0, 1)).toThrow(RangeError);
  });
});
