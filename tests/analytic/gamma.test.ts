import { beforeAll, describe, it, expect } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import { gammaFunction } from '../../src/analytic/gamma.js';
import { expectRelClose } from './close.js';

beforeAll(async () => {
  await initBessel();
});

describe('gammaFunction', () => {
  // Gamma(n) = (n-1)! exactly representable up to 22!; Cephes is accurate to a few ulps: 1e-14.
  it.each([
    [1, 1],
    [2, 1],
    [5, 24],
    [11, 3628800],
    [21, 2432902008176640000],
  ])('Gamma(%d) = %d', (x, value) => expectRelClose(gammaFunction(x), value, 1e-14, `Gamma(${x})`));

  // Gamma(1/2) = sqrt(pi) (A&S 1964, eq. 6.1.8); Gamma(1/3) = 2.6789385347077476337 and
  // Gamma(2/3) = 1.3541179394264004169 (A&S 6.1.10/6.1.11, digits from memory). 1e-14: Cephes accuracy.
  it('special values', () => {
    expectRelClose(gammaFunction(0.5), Math.sqrt(Math.PI), 1e-14, 'Gamma(1/2)');
    // eslint-disable-next-line no-loss-of-precision -- the published digits, more than a double holds
    expectRelClose(gammaFunction(1 / 3), 2.6789385347077476337, 1e-14, 'Gamma(1/3)');
    // eslint-disable-next-line no-loss-of-precision -- the published digits, more than a double holds
    expectRelClose(gammaFunction(2 / 3), 1.3541179394264004169, 1e-14, 'Gamma(2/3)');
  });

  // Reflection formula Gamma(x) Gamma(1-x) = pi / sin(pi x) (A&S 6.1.17), over the orders used by NU2.
  it.each([0.1, 0.25, 1 / 3, 0.45, 0.6, 0.9])('reflection formula at x = %d', (x) => {
    expectRelClose(gammaFunction(x) * gammaFunction(1 - x), Math.PI / Math.sin(Math.PI * x), 1e-14, 'reflection');
  });

  it('rejects poles', () => {
    expect(() => gammaFunction(0)).toThrow(RangeError);
    expect(() => gammaFunction(-2)).toThrow(RangeError);
  });
});
