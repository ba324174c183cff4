/**
 * The single-fin report's "How sure" section in the display units: the reference heat rate and its band in
 * BTU/h under `units: 'us'` (1 W = 3.412141633 BTU/h, the International Table BTU: NIST SP 811 (2008),
 * Appendix B.8), in W under SI; the demo's invented inverter fin.
 */
import { describe, expect, it } from 'vitest';
import { caseFromFile, check, report } from '../../src/api/index.js';

const DEMO = 'demo/inverter-plate-fin.yaml';
const BTU_PER_H_PER_W = 3.412141633;

const howSure = (markdown: string): string => {
  const at = markdown.indexOf('How sure: sensitivities and uncertainty');
  expect(at).toBeGreaterThan(0);
  return markdown.slice(at, at + 600);
};

describe('the report of one fin: How sure in the display units', () => {
  it('states the heat rate and its band in BTU/h under us, in W under si', async () => {
    const c = caseFromFile(DEMO);
    const r = await check(c);
    const band = r.uncertainty!;
    const us = howSure((await report(c, { units: 'us', date: '2026-01-01' })).markdown);
    const si = howSure((await report(c, { units: 'si', date: '2026-01-01' })).markdown);
    // "the reference heat rate Q UNIT is known to ...: LOW to HIGH UNIT" (Q to 5 significant digits, the ends to 4).
    const numbers = (text: string, unit: string): number[] => {
      const u = unit.replace('/', '\\/');
      const m = new RegExp(`heat rate ([-\\d.]+) ${u} is known to .*?: ([-\\d.]+) to ([-\\d.]+) ${u}`).exec(text);
      expect(m, `no heat rate and band in ${unit}`).not.toBeNull();
      return [Number(m![1]), Number(m![2]), Number(m![3])];
    };
    const inUs = numbers(us, 'BTU/h');
    const inSi = numbers(si, 'W');
    [r.reference.heatRate_W, band.low_W, band.high_W].forEach((w, k) => {
      expect(inSi[k]!).toBeCloseTo(w, 2);
      expect(Math.abs(inUs[k]! - w * BTU_PER_H_PER_W) / (w * BTU_PER_H_PER_W)).toBeLessThan(1e-3);
    });
  }, 60_000);
});
