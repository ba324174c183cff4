import { describe, expect, it } from 'vitest';
import { designFlags, type FlagInputs } from '../../src/compare/flags.js';
import { estimateOneDError } from '../../src/compare/one-d-error.js';

describe('estimateOneDError (interpolated exact 2-D series error of the 1-D model)', () => {
  // Independent check: the Bi at which tanh(mL)/(mL) over-predicts the exact 2-D plate-fin solution by
  // 1, 2, 5 and 10 % (adiabatic tip), found by root-finding on the eigen-series (separation of
  // variables for the rectangular fin; computed with mpmath in the shared script fin2d_thresholds.py).
  // Interpolating the coarser error table must land near these: within 10 % of the error itself
  // (interpolation linear in ln Bi between rows 0.01, 0.05, 0.1, 0.2, 0.5 is not exact; observed <= 8.4 %).
  it.each([
    [1, 0.0418, 0.01],
    [1, 0.0864, 0.02],
    [1, 0.231, 0.05],
    [2, 0.1202, 0.02],
    [2, 0.326, 0.05],
    [0.5, 0.0755, 0.02],
    [4, 0.1416, 0.02],
  ])('mL = %s, Bi = %s gives about %s', (mL, bi, expected) => {
    const e = estimateOneDError('straight', bi, mL);
    expect(e.withinTable).toBe(true);
    expect(Math.abs(e.error / expected - 1)).toBeLessThan(0.1);
  });

  it('is linear in Bi below the table (small-Bi asymptote of the series: err ~ Bi/6 for a long plate fin)', () => {
    // Long plate fin: err ~ Bi/6 = 0.166 Bi (small-Bi expansion of lambda_1 = sqrt(Bi)(1 - Bi/6)).
    const e = estimateOneDError('straight', 1e-4, 4);
    expect(e.error / 1e-4).toBeCloseTo(0.17, 1);
  });

  it('pins use the axisymmetric series: Bi = hR/k = 0.1, mL = 1 gives 1.703 %', () => {
    // Cylindrical pin, exact axisymmetric Bessel series (computed with scipy/mpmath, pin2d_series.py).
    expect(estimateOneDError('pin', 0.1, 1).error).toBeCloseTo(0.01703, 6);
  });
});

const base: FlagInputs = {
  family: 'straight',
  biot: 1e-4,
  mL: 1,
  effectiveness: 30,
  hAoverkP: 0.01,
  tolerance: 0.02,
  discretizationError: 1e-9,
  converged: true,
  energyBalance: 1e-14,
  measuredOneDDrift: null,
};
const ids = (f: Partial<FlagInputs>): string[] => designFlags({ ...base, ...f }).map((x) => x.flag);

describe('designFlags', () => {
  it('a thin, conductive, well-resolved fin raises no flag', () => expect(ids({})).toEqual([]));
  it('thick fin: warning once the estimated 1-D error exceeds the tolerance', () => {
    const f = designFlags({ ...base, biot: 0.5 });
    expect(f[0]?.flag).toBe('thick-fin');
    expect(f[0]?.severity).toBe('warning');
    expect(f[0]?.message).toMatch(/over-predicts by about 10\.0 %/); // table: Bi = 0.5, mL = 1: +10.005 %
  });
  it('thick fin states the measured drift when the 2-D model ran', () => {
    expect(designFlags({ ...base, biot: 0.5, measuredOneDDrift: 0.07 })[0]?.message).toMatch(/2-D solution shows .* 7\.0 %/);
  });
  // Effectiveness ~2 (Incropera et al. 2007, from memory); mL = 2.65 for 99 % of the infinite fin
  // (tanh 2.65 = 0.9901); hA/(kP) = 1 is where dq/dL at L = 0 changes sign (exact).
  it.each([
    [{ effectiveness: 1.9 }, 'low-effectiveness'],
    [{ mL: 2.7 }, 'long-fin'],
    [{ hAoverkP: 1 }, 'fin-insulates'],
    [{ discretizationError: 0.01 }, 'grid-not-converged'],
    [{ converged: false }, 'grid-not-converged'],
    [{ energyBalance: 1e-6 }, 'energy-balance'],
  ] as [Partial<FlagInputs>, string][])('%o raises %s', (f, flag) => expect(ids(f)).toContain(flag));
  it.each([
    [{ effectiveness: 2.1 }, 'low-effectiveness'],
    [{ mL: 2.6 }, 'long-fin'],
    [{ hAoverkP: 0.99 }, 'fin-insulates'],
  ] as [Partial<FlagInputs>, string][])('%o does not raise %s', (f, flag) => expect(ids(f)).not.toContain(flag));
});
