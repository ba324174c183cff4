/**
 * check's sensitivities d ln Q / d ln x of the reference heat rate: against the analytic derivatives of the
 * uniform fin, and against finite differences of the whole check (the case file's values changed by key path,
 * parsed again and solved by a full check, independent of numeric-inputs.ts's scaling).
 */
import { describe, expect, it } from 'vitest';
import { parseCaseObject, setByKeyPath, getByKeyPath } from '../../src/case/index.js';
import { runCheck } from '../../src/compare/check.js';
import type { CheckReport } from '../../src/compare/types.js';

const sensitivityOf = (r: CheckReport, key: string): number => {
  const s = r.sensitivities?.find((x) => x.key === key);
  if (s === undefined) throw new Error(`no sensitivity ${key}`);
  return s.dlnQ_dlnx;
};

describe('uniform fin, adiabatic tip, insulated edges: the derivatives of Q = sqrt(hPkA) theta_b tanh(mL)', () => {
  // Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4 case B:
  // q = M tanh(mL), M = sqrt(hPkA) theta_b, m^2 = hP/(kA); P = 2w, A = wt (edges insulated). Differentiating:
  //   d ln q/d ln h = 1/2 + mL/sinh(2mL),  d ln q/d ln k = d ln q/d ln t = 1/2 - mL/sinh(2mL),
  //   d ln q/d ln L = 2mL/sinh(2mL),       d ln q/d ln w = d ln q/d ln theta_b = 1.
  it.each([0.5, 1, 2.5])('mL = %s', async (mL) => {
    const h = 40;
    const k = 180;
    const t = 0.002;
    const L = mL / Math.sqrt((2 * h) / (k * t));
    const c = parseCaseObject({
      fin: { profile: 'rectangular', length: L, thickness: t, width: 0.05, edges: 'insulated' },
      material: { k },
      convection: { ambient: 20, h, tip: 'adiabatic' },
      base: { temperature: 80 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
    const x = mL / Math.sinh(2 * mL);
    const expected: [string, number][] = [
      ['convection.h', 0.5 + x],
      ['material.k', 0.5 - x],
      ['fin.thickness', 0.5 - x],
      ['fin.length', 2 * x],
      ['fin.width', 1],
      ['base.temperature', 1],
    ];
    // The discrete heat rate on the finest grid (4001 nodes, three-point scheme) differs from the exact one by
    // (m dx)^2/12 < 1e-7 relative and so do its derivatives; the central differences add ~1e-8: 1e-6 holds both.
    for (const [key, value] of expected) expect(Math.abs(sensitivityOf(report, key) - value), key).toBeLessThan(1e-6);
    expect(report.sensitivities?.map((s) => s.key)).toEqual(expected.map(([key]) => key).sort((a, b) => order(a) - order(b)));
  });
});

const ORDER = ['convection.h', 'material.k', 'fin.length', 'fin.thickness', 'fin.width', 'base.temperature'];
const order = (key: string): number => ORDER.indexOf(key);

describe('against finite differences of the whole check', () => {
  // A straight fin with cooled edges, a convective tip with its own h and a contact resistance: the fd-2d
  // reference adds the edges from fd-1d, and every input enters.
  const raw = {
    fin: { profile: 'rectangular', length: 0.03, thickness: 0.0015, width: 0.04, edges: 'cooled' },
    material: { k: 160 },
    convection: { ambient: 25, h: 60, tip: { convective: 90 }, emissivity: 0 },
    base: { temperature: 75, contactResistance: 2e-4 },
  };
  const d = 1e-4;
  const fullCheck = async (variant: unknown): Promise<number> =>
    (await runCheck(parseCaseObject(variant), { tolerance: 0.02, reference: 'auto', sensitivities: false })).report.reference.finestGridHeatRate_W;

  it('the sensitivities equal central differences of the full check to 1e-6 relative', async () => {
    const { report } = await runCheck(parseCaseObject(raw), { tolerance: 0.02, reference: 'auto' });
    expect(report.reference.model).toBe('fd-2d');
    const keys: [string, string][] = [
      ['convection.h', 'convection.h'],
      ['convection.tip.convective', 'convection.tip.convective'],
      ['material.k', 'material.k'],
      ['fin.length', 'fin.length'],
      ['fin.thickness', 'fin.thickness'],
      ['fin.width', 'fin.width'],
      ['base.contactResistance', 'base.contactResistance'],
    ];
    const Q = report.reference.finestGridHeatRate_W;
    for (const [key, path] of keys) {
      const value = getByKeyPath(raw, path) as number;
      const up = await fullCheck(setByKeyPath(raw, path, value * (1 + d)));
      const down = await fullCheck(setByKeyPath(raw, path, value * (1 - d)));
      const fd = (up - down) / (2 * d * Q);
      // Both are central differences with step 1e-4 (truncation ~1e-8 S'''), on the same grids: they differ by
      // round-off (~1e-12 / 1e-4) unless the scaling of numeric-inputs.ts were wrong.
      expect(Math.abs(sensitivityOf(report, key) / fd - 1), key).toBeLessThan(1e-6);
    }
    // Conductances scaled together scale Q: S_h + S_h,tip + S_k - S_Rc = 1 (a dimensional identity at fixed size).
    const sum = sensitivityOf(report, 'convection.h') + sensitivityOf(report, 'convection.tip.convective') + sensitivityOf(report, 'material.k');
    expect(Math.abs(sum - sensitivityOf(report, 'base.contactResistance') - 1)).toBeLessThan(1e-6);
  }, 60_000);
});

describe('a nonlinear fin (power-law h and radiation) against finite differences of the whole check', () => {
  const raw = {
    fin: { profile: 'rectangular', length: 0.05, thickness: 0.002, width: 0.06, edges: 'cooled' },
    material: { k: 150 },
    convection: { ambient: 25, h: { law: 'power', base: 8, exponent: 0.25 }, tip: 'adiabatic', emissivity: 0.8 },
    base: { temperature: 90 },
  };
  const d = 1e-4;
  const fullCheck = async (variant: unknown): Promise<number> =>
    (await runCheck(parseCaseObject(variant), { tolerance: 0.02, reference: '1d', sensitivities: false })).report.reference.finestGridHeatRate_W;

  it('the Newton re-solves (started from the case) equal central differences of full checks to 1e-6 relative', async () => {
    const { report } = await runCheck(parseCaseObject(raw), { tolerance: 0.02, reference: '1d', sample: 'never' });
    const Q = report.reference.finestGridHeatRate_W;
    const keys: [string, string][] = [
      ['convection.h', 'convection.h.base'],
      ['convection.h.exponent', 'convection.h.exponent'],
      ['convection.emissivity', 'convection.emissivity'],
      ['material.k', 'material.k'],
      ['fin.length', 'fin.length'],
    ];
    for (const [key, path] of keys) {
      const value = getByKeyPath(raw, path) as number;
      const fd = ((await fullCheck(setByKeyPath(raw, path, value * (1 + d)))) - (await fullCheck(setByKeyPath(raw, path, value * (1 - d))))) / (2 * d * Q);
      // Newton stops at a residual of 1e-12 relative: over the step 1e-4 that is ~1e-8 of S, well within 1e-6.
      expect(Math.abs(sensitivityOf(report, key) / fd - 1), key).toBeLessThan(1e-6);
    }
    // The base temperature: the full check moves T_b by d times the rise.
    const rise = raw.base.temperature - raw.convection.ambient;
    const at = (f: number) => fullCheck(setByKeyPath(raw, 'base.temperature', raw.convection.ambient + rise * f));
    const fd = ((await at(1 + d)) - (await at(1 - d))) / (2 * d * Q);
    expect(Math.abs(sensitivityOf(report, 'base.temperature') / fd - 1)).toBeLessThan(1e-6);
    // Radiation and h rising with theta: Q grows faster than theta_b.
    expect(sensitivityOf(report, 'base.temperature')).toBeGreaterThan(1);
  }, 60_000);
});
