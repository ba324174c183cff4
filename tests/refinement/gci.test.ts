import { describe, expect, it } from 'vitest';
import { fitObservedOrder, richardsonGci } from '../../src/fd/study/refinement.js';

describe('richardsonGci (Celik et al. 2008 procedure)', () => {
  it('reproduces the worked example attributed to Celik et al. 2008 (J. Fluids Eng. 130(7) 078001, Table 1)', () => {
    // Inputs N = 18000, 8000, 4500 cells in 2-D, phi = 6.063, 5.972, 5.863. Published outcome
    // (p ~ 1.53, phi_ext ~ 6.1685, GCI_fine ~ 2.2 %) as checked by the pyGCS test suite (tests/test_GCI.py);
    // the digits below are the same procedure evaluated in mpmath (script gci.py).
    const results = [18000, 8000, 4500].map((n, i) => ({ size: n ** -0.5, value: [6.063, 5.972, 5.863][i] as number }));
    const s = richardsonGci(results);
    // 1e-6 relative: the reference values are quoted to 7 significant figures.
    expect(s.observedOrder).toBeCloseTo(1.533969, 5);
    expect(s.extrapolated).toBeCloseTo(6.1684956, 6);
    expect(s.gci).toBeCloseTo(0.0217499, 6);
    expect(s.asymptoticRatio).toBeCloseTo(1.015238, 5);
    expect(s.safetyFactor).toBe(1.25);
    expect(s.oscillatory).toBe(false);
  });

  it('on the exact discrete solution of the 3-point fin scheme (mL = 1, N = 40/20/10) the GCI bounds the true error', () => {
    // Discrete oracle: theta_i = cosh(mu (N - i)) / cosh(mu N), cosh mu = 1 + (mL/N)^2 / 2, base heat from
    // the half-cell balance; the exact fin value is tanh(mL) (Incropera et al. 2007, Table 3.4, adiabatic tip; from memory).
    const q = (mL: number, n: number): number => {
      const d = 1 / n;
      const mu = Math.acosh(1 + (mL * d) ** 2 / 2);
      const th = (i: number): number => Math.cosh(mu * (n - i)) / Math.cosh(mu * n);
      return ((th(0) - th(1)) / d + ((mL ** 2 * d) / 2) * th(0)) / mL;
    };
    const s = richardsonGci([40, 20, 10].map((n) => ({ size: 1 / n, value: q(1, n) })));
    // Reference values from the same procedure in mpmath (gci.py): p = 1.99883078, GCI = 7.9765e-5.
    expect(s.observedOrder).toBeCloseTo(1.99883078, 6);
    expect(s.gci).toBeCloseTo(7.9765e-5, 8);
    const trueError = Math.abs(q(1, 40) - Math.tanh(1)) / Math.tanh(1);
    expect(trueError).toBeLessThan(s.gci);
    expect(Math.abs(s.extrapolated - Math.tanh(1))).toBeLessThan(1e-7); // 4.2e-8 in mpmath
  });

  it('reverts to the formal order with Fs = 3 on oscillatory convergence (Roache 2011)', () => {
    const s = richardsonGci([
      { size: 1, value: 1.0 },
      { size: 2, value: 1.01 },
      { size: 4, value: 0.995 },
    ]);
    expect(s.oscillatory).toBe(true);
    expect(s.safetyFactor).toBe(3);
    expect(s.orderUsed).toBe(2);
    expect(s.converged).toBe(false);
  });

  it('reports a round-off floor instead of a meaningless order', () => {
    const s = richardsonGci([
      { size: 1, value: 1 },
      { size: 2, value: 1 + 1e-16 },
      { size: 4, value: 1 - 2e-16 },
    ]);
    expect(s.observedOrder).toBeNull();
    expect(s.converged).toBe(true);
    expect(s.gci).toBeLessThan(1e-12);
  });

  it('rejects fewer than three grids', () => {
    expect(() =>
      richardsonGci([
        { size: 1, value: 1 },
        { size: 2, value: 2 },
      ]),
    ).toThrow(/at least 3/);
  });
});

describe('fitObservedOrder', () => {
  it('recovers the exponent of a synthetic power law e = C h^p exactly', () => {
    const sizes = [0.1, 0.05, 0.025, 0.0125];
    const fit = fitObservedOrder(
      sizes,
      sizes.map((h) => 3 * h ** 2),
    );
    expect(fit.order).toBeCloseTo(2, 12);
    expect(fit.constant).toBeCloseTo(3, 10);
  });
  it('is the least-squares slope over all grids (finest error doubled: slope 2 - ln2/(2 ln2) = 1.5)', () => {
    const sizes = [0.1, 0.05, 0.025];
    const fit = fitObservedOrder(sizes, [0.01, 0.0025, 0.000625 * 2]);
    expect(fit.order).toBeCloseTo(1.5, 12); // slope of the fitted line through (ln h, ln e): exact
  });
});
