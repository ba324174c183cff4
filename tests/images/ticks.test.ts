/**
 * Tick values: P. S. Heckbert (1990), "Nice numbers for graph labels", Graphics Gems, pp. 61-63.
 * The expected values in the examples are worked by hand from that algorithm (nicenum, loose labelling).
 */
import { describe, expect, it } from 'vitest';
import { fc, test } from '@fast-check/vitest';
import { formatLogTick, formatTick, linearTicks, logTicks, niceNumber } from '../../src/images/ticks.js';

/** True when step = m * 10^k with m in {1, 2, 5} (to 1e-9 relative: floating-point powers of ten). */
function isRoundStep(step: number): boolean {
  const k = Math.floor(Math.log10(step) + 1e-12);
  const m = step / 10 ** k;
  return [1, 2, 5, 10].some((n) => Math.abs(m - n) < 1e-9 * n);
}

describe('Heckbert nice numbers', () => {
  it.each([
    // [x, round, expected]: fraction thresholds 1.5 / 3 / 7 when rounding, 1 / 2 / 5 for the ceiling.
    [0.0734, true, 0.1],
    [0.0734, false, 0.1],
    [1.4, true, 1],
    [1.4, false, 2],
    [2.9, true, 2],
    [2.9, false, 5],
    [438, false, 500],
    [125, true, 100],
    [6.9e5, true, 5e5],
  ])('nicenum(%d, %s) = %d', (x, round, expected) => {
    expect(niceNumber(x, round)).toBeCloseTo(expected, 12);
  });

  it('labels 105..543 with 5 ticks as 100, 200, ..., 600 (loose labelling)', () => {
    // range = nicenum(438, false) = 500; d = nicenum(500 / 4, true) = 100.
    const t = linearTicks(105, 543, 5);
    expect(t.values).toEqual([100, 200, 300, 400, 500, 600]);
    expect(t.step).toBe(100);
    expect(t.decimals).toBe(0);
  });

  it('gives the decimals the step needs (nfrac = max(-floor(log10 d), 0))', () => {
    const t = linearTicks(0.012, 0.087, 6);
    expect(t.step).toBeCloseTo(0.02, 15);
    expect(t.decimals).toBe(2);
    expect(t.values.map((v) => formatTick(v, t.decimals))).toEqual(['0.00', '0.02', '0.04', '0.06', '0.08', '0.10']);
  });

  it('prints negative ticks with a true minus sign (U+2212)', () => {
    expect(formatTick(-2, 0)).toBe('\u22122');
  });

  it('inside mode keeps the data range and still shows two ticks on a narrow range', () => {
    const t = linearTicks(-1.6, 1.6, 2, 'inside');
    expect(t.domain).toEqual([-1.6, 1.6]);
    expect(t.values.length).toBeGreaterThanOrEqual(2);
    for (const v of t.values) expect(Math.abs(v)).toBeLessThanOrEqual(1.6);
  });

  // Property: over any finite range, ticks are multiples of a round step, cover the range (loose),
  // are evenly spaced, printable exactly with `decimals`, and not too many.
  test.prop([fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.double({ min: 1e-6, max: 1e6, noNaN: true }), fc.integer({ min: 2, max: 12 })])(
    'loose ticks are round and cover the range',
    (start, span, target) => {
      const t = linearTicks(start, start + span, target);
      expect(isRoundStep(t.step)).toBe(true);
      const first = t.values[0] as number;
      const last = t.values[t.values.length - 1] as number;
      // Covering: 1e-9 of the step allows the rounding of k * step to `decimals` decimals.
      expect(first).toBeLessThanOrEqual(start + 1e-9 * t.step + Math.abs(start) * 1e-12);
      expect(last).toBeGreaterThanOrEqual(start + span - 1e-9 * t.step - Math.abs(start + span) * 1e-12);
      // Heckbert's spacing gives at most about 2.5x the target ticks (5 / 2 between neighbouring nice steps), plus the two ends.
      expect(t.values.length).toBeLessThanOrEqual(Math.ceil(2.5 * target) + 2);
      for (let k = 1; k < t.values.length; k++) {
        expect(Math.abs((t.values[k] as number) - (t.values[k - 1] as number) - t.step)).toBeLessThanOrEqual(
          1e-6 * t.step + 1e-9 * Math.abs(t.values[k] as number),
        );
      }
      for (const v of t.values) expect(Number(formatTick(v, t.decimals).replace('\u2212', '-'))).toBeCloseTo(v, t.decimals);
    },
  );

  test.prop([fc.double({ min: 1e-4, max: 1e4, noNaN: true }), fc.double({ min: 1.01, max: 1e5, noNaN: true })])(
    'log ticks: majors are 1, 2 or 5 x 10^k inside a domain covering the data, at least two of them',
    (lo, ratio) => {
      const t = logTicks(lo, lo * ratio);
      expect(t.domain[0]).toBeLessThanOrEqual(lo * (1 + 1e-12));
      expect(t.domain[1]).toBeGreaterThanOrEqual(lo * ratio * (1 - 1e-12));
      expect(t.major.length).toBeGreaterThanOrEqual(2);
      for (const v of [...t.major, ...t.minor]) {
        const k = Math.floor(Math.log10(v) + 1e-9);
        const m = v / 10 ** k;
        expect(Math.abs(m - Math.round(m))).toBeLessThan(1e-9);
        expect(v).toBeGreaterThanOrEqual(t.domain[0] * (1 - 1e-9));
        expect(v).toBeLessThanOrEqual(t.domain[1] * (1 + 1e-9));
      }
    },
  );

  it('log ticks over 20..515 (loose): decades 10..1000 with 1-2-5 majors, readable labels', () => {
    const t = logTicks(20, 515);
    expect(t.domain).toEqual([10, 1000]);
    expect(t.major).toEqual([10, 20, 50, 100, 200, 500, 1000]);
    expect(t.minor).toContain(30);
    expect(formatLogTick(0.05)).toBe('0.05');
    expect(formatLogTick(500)).toBe('500');
  });
});
