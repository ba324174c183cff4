/**
 * The spreading series for isoflux rectangular sources on a plate with a uniform h on the opposite face
 * (Muzychka, Culham & Yovanovich 2003, J. Electron. Packag. 125(2):178-185; the centred source and the strip are
 * the special cases of Yovanovich, Muzychka & Culham 1999, J. Thermophys. Heat Transfer 13(4)). Reference values:
 * tests/reference/spreading_series.py (numpy, 2500 x 2500 terms; the values it prints are in its docstring), an
 * independent implementation of the same series.
 */
import { describe, expect, it } from 'vitest';
import { spreadingSeries, type SpreadingSource } from '../../src/analytic/spreading-series.js';

const plate = { width: 0.04, length: 0.04, thickness: 0.003, conductivity: 170 };
const h = 300;

describe('published check values (a = b = 40 mm, t = 3 mm, k = 170, h = 300, Q = 10 W)', () => {
  // Tolerance: our truncation bound (the series' own error, at most ~2e-5 K at relativeTolerance 1e-6) plus
  // 1e-6 K for the reference's own truncation at 2500 x 2500 terms (below 2e-7 K, references.md section 9).
  it.each([
    ['centred 8 x 8 mm', [0.02, 0.02], [0.008, 0.008], 25.138826398],
    ['near a corner, 8 x 12 mm at (8, 10) mm', [0.008, 0.01], [0.008, 0.012], 27.632964293],
    ['a strip 4 x 40 mm across the plate', [0.02, 0.02], [0.004, 0.04], 22.512851675],
  ] as const)('%s', (_name, centre, size, expected) => {
    const r = spreadingSeries({ plate, h, sources: [{ centre, size, power: 10 }], relativeTolerance: 1e-6 });
    const bound = r.truncationBound_K[0] ?? NaN;
    expect(bound).toBeLessThan(3e-5);
    expect(Math.abs((r.sourceRise_K[0] ?? NaN) - expected)).toBeLessThanOrEqual(bound + 1e-6);
  });

  it('two sources superposed (10 W and 6 W), each source’s mean within the bound of the script’s', () => {
    const sources: SpreadingSource[] = [
      { centre: [0.012, 0.014], size: [0.008, 0.008], power: 10 },
      { centre: [0.028, 0.026], size: [0.006, 0.01], power: 6 },
    ];
    const r = spreadingSeries({ plate, h, sources, relativeTolerance: 1e-6 });
    [37.866368005, 35.02552613].forEach((expected, j) => {
      expect(Math.abs((r.sourceRise_K[j] ?? NaN) - expected)).toBeLessThanOrEqual((r.truncationBound_K[j] ?? NaN) + 1e-6);
    });
  });
});

describe('the truncation bound', () => {
  // The bound must hold: a coarse series differs from a much finer one by no more than the coarse one's bound.
  it.each([
    ['centred', [{ centre: [0.02, 0.02], size: [0.008, 0.008], power: 10 }]],
    [
      'corner and strip together',
      [
        { centre: [0.008, 0.01], size: [0.008, 0.012], power: 10 },
        { centre: [0.03, 0.02], size: [0.004, 0.04], power: 3 },
      ],
    ],
  ] as [string, SpreadingSource[]][])('%s: |coarse - fine| <= coarse bound, and the bound falls as 1/M^2', (_name, sources) => {
    const coarse = spreadingSeries({ plate, h, sources, relativeTolerance: 1e-3 });
    const fine = spreadingSeries({ plate, h, sources, relativeTolerance: 1e-6 });
    sources.forEach((_, j) => {
      const gap = Math.abs((coarse.sourceRise_K[j] ?? NaN) - (fine.sourceRise_K[j] ?? NaN));
      expect(gap).toBeLessThanOrEqual((coarse.truncationBound_K[j] ?? NaN) + (fine.truncationBound_K[j] ?? NaN));
    });
    // 1000 times tighter needs about sqrt(1000) = 32 times the terms per axis (1/M^2).
    const ratio = fine.terms[0] / coarse.terms[0];
    expect(ratio).toBeGreaterThan(25);
    expect(ratio).toBeLessThan(40);
  });

  it('stops at maxTermsPerAxis and says how far it got', () => {
    const r = spreadingSeries({
      plate,
      h,
      sources: [{ centre: [0.02, 0.02], size: [0.001, 0.001], power: 1 }],
      relativeTolerance: 1e-9,
      maxTermsPerAxis: 200,
    });
    expect(r.terms).toEqual([200, 200]);
    expect(r.truncationBound_K[0]).toBeGreaterThan(1e-9 * r.plateMeanRise_K);
  });
});

describe('exact limits and symmetries', () => {
  it('a source covering the whole underside is 1-D: rise = Q (t/k + 1/h) / (a b), every series term zero', () => {
    // sin(m pi / 2) cos(m pi / 2) = sin(m pi)/2 = 0: only A0 remains (1e-12: round-off of sin(m pi) over 1e3 terms).
    const r = spreadingSeries({ plate, h, sources: [{ centre: [0.02, 0.02], size: [0.04, 0.04], power: 10 }] });
    const oneD = (10 * (0.003 / 170 + 1 / 300)) / (0.04 * 0.04);
    expect(Math.abs((r.sourceRise_K[0] ?? NaN) - oneD) / oneD).toBeLessThan(1e-12);
    expect(r.plateMeanRise_K).toBeCloseTo(oneD, 12);
  });

  it('adds R\u2032\u2032 Q / (c d) to its own source only', () => {
    const base = { centre: [0.02, 0.02] as const, size: [0.008, 0.008] as const, power: 10 };
    const other = { centre: [0.032, 0.032] as const, size: [0.004, 0.004] as const, power: 2 };
    const without = spreadingSeries({ plate, h, sources: [base, other] });
    const withR = spreadingSeries({ plate, h, sources: [{ ...base, contactResistance: 2e-5 }, other] });
    expect((withR.sourceRise_K[0] ?? NaN) - (without.sourceRise_K[0] ?? NaN)).toBeCloseTo((2e-5 * 10) / 0.008 ** 2, 10);
    expect(withR.sourceRise_K[1]).toBe(without.sourceRise_K[1]);
  });

  it('reciprocity: the mean rise over B per watt at A equals that over A per watt at B (Green’s function symmetry)', () => {
    // Checks the cross terms, where a c_i / c_j mix-up would show; 1e-9 relative: both at relativeTolerance 1e-7 (bounds ~1e-6 K).
    const A = { centre: [0.01, 0.013] as const, size: [0.006, 0.01] as const };
    const B = { centre: [0.027, 0.03] as const, size: [0.012, 0.004] as const };
    const atB = spreadingSeries({
      plate,
      h,
      sources: [
        { ...A, power: 1 },
        { ...B, power: 0 },
      ],
      relativeTolerance: 1e-7,
    });
    const atA = spreadingSeries({
      plate,
      h,
      sources: [
        { ...A, power: 0 },
        { ...B, power: 1 },
      ],
      relativeTolerance: 1e-7,
    });
    const bound = (atB.truncationBound_K[1] ?? NaN) + (atA.truncationBound_K[0] ?? NaN);
    expect(Math.abs((atB.sourceRise_K[1] ?? NaN) - (atA.sourceRise_K[0] ?? NaN))).toBeLessThanOrEqual(bound);
  });

  it('mirror symmetry: a source and its mirror image about x = a/2 have the same mean rise', () => {
    const left = spreadingSeries({ plate, h, sources: [{ centre: [0.011, 0.017], size: [0.006, 0.008], power: 5 }] });
    const right = spreadingSeries({ plate, h, sources: [{ centre: [0.029, 0.017], size: [0.006, 0.008], power: 5 }] });
    expect(right.sourceRise_K[0]).toBeCloseTo(left.sourceRise_K[0] ?? NaN, 9);
  });

  it('superposition: two sources together equal the sum of each alone', () => {
    const s1: SpreadingSource = { centre: [0.012, 0.014], size: [0.01, 0.008], power: 8 };
    const s2: SpreadingSource = { centre: [0.03, 0.026], size: [0.006, 0.012], power: 4 };
    const both = spreadingSeries({ plate, h, sources: [s1, s2], maxTermsPerAxis: 600, relativeTolerance: 1e-12 });
    const one = spreadingSeries({ plate, h, sources: [s1, { ...s2, power: 0 }], maxTermsPerAxis: 600, relativeTolerance: 1e-12 });
    const two = spreadingSeries({ plate, h, sources: [{ ...s1, power: 0 }, s2], maxTermsPerAxis: 600, relativeTolerance: 1e-12 });
    both.sourceRise_K.forEach((r, j) => expect(r).toBeCloseTo((one.sourceRise_K[j] ?? NaN) + (two.sourceRise_K[j] ?? NaN), 10));
  });
});
