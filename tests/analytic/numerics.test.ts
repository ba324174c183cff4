import { describe, expect, it } from 'vitest';
import { integrate, kronrodPanel } from '../../src/analytic/quadrature.js';
import { brentRoot } from '../../src/analytic/roots.js';
import { expectRelClose } from './close.js';

describe('Gauss-Kronrod 7/15 panel', () => {
  // Exactness is what pins the tabulated nodes and weights (QUADPACK QK15, from memory): K15 integrates
  // polynomials up to degree 22 exactly, G7 up to degree 13 (Kronrod 1965). Round-off: 1e-14.
  it.each([0, 1, 2, 5, 8, 13, 20, 22])('K15 exact for x^%d on [0, 1]', (p) => {
    const { kronrod, gauss } = kronrodPanel((x) => Math.pow(x, p), 0, 1);
    expectRelClose(kronrod, 1 / (p + 1), 1e-14, 'K15');
    if (p <= 13) expectRelClose(gauss, 1 / (p + 1), 1e-14, 'G7');
  });
  it('G7 is not exact for degree 14 (so the error estimate is live)', () => {
    const { gauss } = kronrodPanel((x) => Math.pow(x, 14), 0, 1);
    expect(Math.abs(gauss - 1 / 15)).toBeGreaterThan(1e-10);
  });
});

describe('adaptive integration', () => {
  // Closed-form integrals (elementary calculus); tolerance 1e-12 over the default 1e-13 target.
  it('smooth, peaked and endpoint-steep integrands', () => {
    expectRelClose(integrate(Math.exp, 0, 1), Math.E - 1, 1e-12, 'exp');
    expectRelClose(
      integrate((x) => 1 / (1e-4 + x * x), -1, 1),
      (2 / 1e-2) * Math.atan(1 / 1e-2),
      1e-12,
      'Runge peak',
    );
    // integral_0^1 x^{-1/2} dx = 2: an integrable endpoint singularity, never evaluated at 0.
    expectRelClose(
      integrate((x) => 1 / Math.sqrt(x), 0, 1, { maxPanels: 5000, relTolerance: 1e-10 }),
      2,
      1e-9,
      'x^-1/2',
    );
  });
});

describe('brentRoot', () => {
  // Roots known in closed form; Brent converges to ~4 eps |x|.
  it('finds sqrt(2), the Dottie number and a root near 0 to round-off', () => {
    expectRelClose(
      brentRoot((x) => x * x - 2, 0, 2),
      Math.SQRT2,
      1e-15,
      'sqrt2',
    );
    const dottie = brentRoot((x) => Math.cos(x) - x, 0, 1);
    expect(Math.abs(Math.cos(dottie) - dottie)).toBeLessThan(1e-15);
    expectRelClose(
      brentRoot((x) => x - 1e-200, -1, 1),
      1e-200,
      1e-15,
      'tiny root',
    );
  });
  it('rejects a non-bracketing interval', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(RangeError);
  });
});
