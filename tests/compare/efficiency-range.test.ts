/**
 * Efficiency on one surface (issue 9, item 6): every row of a check divides by the same Q_ideal, that of
 * the surface the reference model has (case-format.md, "Efficiency"). Documented range (efficiency-basis.ts):
 * 0 < efficiency <= 1 for a fin cooled by its faces and tip; null with a reason for an infinite tip (the
 * infinite fin has no finite surface; a 20 mm fin used to show 5.11 = 1/(mL)); a prescribed tip
 * temperature may exceed 1 and says why. Stubby tapered fins used to show up to 52.7 (2-D heat over the
 * thin-fin surface). The bound Q <= Q_ideal is the maximum principle: no part of a cooled fin is hotter
 * than its base (Incropera et al. 2007, Fundamentals of Heat and Mass Transfer, 6th ed., §3.6.4, the
 * definition of fin efficiency, eq. 3.86).
 */
import { describe, expect, it } from 'vitest';
import { parseCaseObject } from '../../src/case/parse.js';
import { runCheck } from '../../src/compare/check.js';
import type { CheckReport } from '../../src/compare/types.js';

const profiles: [string, Record<string, unknown>][] = [
  ['rectangular', { profile: 'rectangular', length: '30 mm', thickness: '2 mm', width: '50 mm' }],
  ['trapezoidal', { profile: 'trapezoidal', length: '30 mm', baseThickness: '4 mm', tipThickness: '1 mm', width: '50 mm' }],
  ['triangular', { profile: 'triangular', length: '30 mm', baseThickness: '4 mm', width: '50 mm' }],
  ['parabolic-concave', { profile: 'parabolic-concave', length: '30 mm', baseThickness: '4 mm', width: '50 mm' }],
  ['parabolic-convex', { profile: 'parabolic-convex', length: '30 mm', baseThickness: '4 mm', width: '50 mm' }],
  ['pin', { profile: 'pin', length: '30 mm', diameter: '3 mm' }],
  ['conical-pin', { profile: 'conical-pin', length: '30 mm', baseDiameter: '4 mm', tipDiameter: '1 mm' }],
  ['annular', { profile: 'annular', innerRadius: '10 mm', outerRadius: '25 mm', thickness: '1 mm' }],
  // Stubby: far thicker than long, the sloped faces much larger than 2 w L.
  ['stubby triangle', { profile: 'triangular', length: '2 mm', baseThickness: '40 mm', width: '50 mm' }],
  ['stubby trapezoid', { profile: 'trapezoidal', length: '3 mm', baseThickness: '40 mm', tipThickness: '10 mm', width: '50 mm' }],
];
const uniform = new Set(['rectangular', 'pin']);
const tips = ['adiabatic', 'convective', { temperature: '70 degC' }, 'infinite'] as const;

function caseOf(fin: Record<string, unknown>, tip: (typeof tips)[number]): ReturnType<typeof parseCaseObject> {
  return parseCaseObject({ name: 'efficiency', fin, material: { k: 200 }, convection: { ambient: 25, h: 40, tip }, base: { temperature: 85 } });
}

/** The definitions agree: every row's efficiency is its Q over the reference's Q_ideal. */
function expectOneSurface(report: CheckReport): void {
  const ref = report.reference;
  if (ref.efficiency === null) {
    for (const m of report.models) expect(m.efficiency).toBeNull();
    return;
  }
  const ideal = ref.heatRate_W / ref.efficiency;
  // Same denominator to round-off (1e-12: two divisions).
  for (const m of report.models) expect(Math.abs((m.efficiency as number) * ideal - m.heatRate_W)).toBeLessThan(1e-12 * Math.abs(m.heatRate_W) + 1e-300);
}

function expectRange(report: CheckReport, tip: (typeof tips)[number]): void {
  const ref = report.reference;
  if (tip === 'infinite') {
    expect(ref.efficiency).toBeNull();
    expect(ref.efficiencyNote).toMatch(/infinite tip/);
    return;
  }
  const values = [ref.efficiency, ...report.models.map((m) => m.efficiency)];
  if (typeof tip === 'object') {
    // A tip held at 70 degC (base 85, ambient 25) feeds heat into a long fin; the note says Q/Q_ideal may exceed 1.
    expect(ref.efficiencyNote).toMatch(/can exceed 1/);
    for (const v of values) expect(Number.isFinite(v)).toBe(true);
    return;
  }
  // The reference (and fd-1d, the same surface) within (0, 1]: room for the discretisation error (GCI <= 1e-5 here).
  expect(ref.efficiency).toBeGreaterThan(0);
  expect(ref.efficiency as number).toBeLessThanOrEqual(1 + 1e-5);
  for (const m of report.models) {
    expect(m.efficiency).toBeGreaterThan(0);
    // A shortcut whose equivalent fin has more surface than this one (a stubby tapered fin with a sharp tip)
    // may exceed 1, and the note names it; otherwise <= 1.
    if ((m.efficiency as number) > 1 + 1e-5) expect(ref.efficiencyNote).toContain(m.model);
    if (m.model === 'fd-1d') expect(m.efficiency as number).toBeLessThanOrEqual(1 + 1e-5);
  }
  const over = report.models.some((m) => (m.efficiency as number) > 1);
  if (!over) expect(ref.efficiencyNote).toBeNull();
}

describe.each(profiles)('%s', (name, fin) => {
  for (const tip of tips) {
    if (tip === 'infinite' && !uniform.has(name)) continue;
    it(`${JSON.stringify(tip)} tip: efficiency in its documented range, one surface for every row (fd-1d reference)`, async () => {
      const { report } = await runCheck(caseOf(fin, tip), { tolerance: 0.02, reference: '1d', ledger: false });
      expectRange(report, tip);
      expectOneSurface(report);
    });
  }
});

describe('fd-2d reference: the true sloped faces are the surface of every row', () => {
  it.each([
    ['stubby triangle', profiles[8]![1]],
    ['stubby trapezoid', profiles[9]![1]],
    ['rectangular', profiles[0]![1]],
    ['pin', profiles[5]![1]],
  ] as const)('%s, convective tip', async (_name, fin) => {
    const { report } = await runCheck(caseOf(fin, 'convective'), { tolerance: 0.02, reference: '2d', ledger: false });
    expect(report.reference.model).toBe('fd-2d');
    expectRange(report, 'convective');
    expectOneSurface(report);
  });

  it('infinite tip on a 20 mm fin: no efficiency (null, n/a) with the reason, instead of 1/(mL) = 5.11', async () => {
    const c = parseCaseObject({
      name: 'infinite 20 mm',
      fin: { profile: 'rectangular', length: '20 mm', thickness: '2 mm', width: '50 mm' },
      material: { k: 200 },
      convection: { ambient: 25, h: 40, tip: 'infinite' },
      base: { temperature: 85 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: 'auto', ledger: false });
    expectRange(report, 'infinite');
    expectOneSurface(report);
  });
});

describe('formulaEfficiency: the shortcut formula’s own value, null only where the formula has none', () => {
  // Fuzz finding: a 2 mm brass pin with a prescribed tip temperature had formulaEfficiency null on the
  // closed-form row. Documented (README "check"): the textbook solution for a prescribed tip temperature
  // gives the heat rate and the temperature but no efficiency, as heat also crosses the tip (Incropera et al.
  // 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4, case C). Every other row has one.
  it('a 2 mm brass pin with its tip held at 70 degC: null on the prescribed-tip closed form only', async () => {
    const c = parseCaseObject({
      name: 'brass pin, tip held',
      fin: { profile: 'pin', length: '30 mm', diameter: '2 mm' },
      material: 'brass',
      convection: { ambient: 25, h: 40, tip: { temperature: '70 degC' } },
      base: { temperature: 85 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d', ledger: false });
    const shortcuts = report.models.filter((m) => !m.model.startsWith('fd-'));
    expect(shortcuts.map((m) => m.model)).toContain('closed-form');
    for (const m of shortcuts) {
      if (m.model === 'closed-form') expect(m.formulaEfficiency).toBeNull();
      else expect(Number.isFinite(m.formulaEfficiency)).toBe(true);
    }
  });
});
