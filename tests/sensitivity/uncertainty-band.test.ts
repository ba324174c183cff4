/**
 * The uncertainty band of check: first order against a Latin-hypercube sample, and the sample itself
 * (strata, truncation, seed).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel, normalCdf } from '../../src/analytic/index.js';
import { parseCaseObject } from '../../src/case/index.js';
import { runCheck } from '../../src/compare/check.js';
import { latinHypercubeNormal } from '../../src/compare/latin-hypercube.js';

beforeAll(async () => {
  await initBessel();
});

describe('Latin-hypercube sample of truncated normals', () => {
  it('puts one point in each of n equal-probability strata of every variable, within the bounds, the same for the same seed', () => {
    const n = 50;
    const bounds = [
      { lower: Number.NEGATIVE_INFINITY, upper: Number.POSITIVE_INFINITY },
      { lower: -1, upper: 2 },
    ];
    const points = latinHypercubeNormal(n, bounds, 7);
    bounds.forEach(({ lower, upper }, j) => {
      const strata = points.map((p) => {
        const z = p[j] as number;
        expect(z).toBeGreaterThanOrEqual(lower);
        expect(z).toBeLessThanOrEqual(upper);
        const pl = normalCdf(lower);
        return Math.floor(((normalCdf(z) - pl) / (normalCdf(upper) - pl)) * n);
      });
      expect([...strata].sort((a, b) => a - b)).toEqual(Array.from({ length: n }, (_, i) => i));
    });
    expect(latinHypercubeNormal(n, bounds, 7)).toEqual(points);
    expect(latinHypercubeNormal(n, bounds, 8)).not.toEqual(points);
  });
});

describe('first order against the sample', () => {
  it('a linear fin with a small band (h 5 %, k 3 %, thickness 0.02 mm): the sample agrees within its sampling error', async () => {
    const c = parseCaseObject({
      fin: { profile: 'rectangular', length: '30 mm', thickness: '1.5 mm', width: '40 mm' },
      material: { k: 180 },
      convection: { ambient: 25, h: 50 },
      base: { temperature: 80 },
      uncertainty: { 'convection.h': '5 %', 'material.k': '3 %', 'fin.thickness': '0.02 mm' },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d', sample: 'always' });
    const u = report.uncertainty!;
    expect(u.sample).not.toBeNull();
    const s = u.sample!;
    expect(s.n).toBe(200);
    expect(s.seed).toBe(1);
    // First order is exact to O(u^2) ~ 0.25 % of itself here; the sample's standard error is about 5 % of it
    // (1/sqrt(2 * 199)): twice the standard error is the acceptance (a 95 % interval).
    expect(Math.abs(s.relative - u.firstOrder)).toBeLessThan(2 * s.samplingError);
    expect(s.agrees).toBe(true);
    expect(u.method).toBe('first-order');
    // The first-order band: sqrt(sum (S u)^2) with the thickness's 0.02 mm over 1.5 mm.
    const S = (key: string) => report.sensitivities!.find((x) => x.key === key)!.dlnQ_dlnx;
    const expected = Math.hypot(S('convection.h') * 0.05, S('material.k') * 0.03, S('fin.thickness') * (0.02 / 1.5));
    expect(Math.abs(u.firstOrder / expected - 1)).toBeLessThan(1e-12);
    expect(u.low_W).toBeCloseTo(report.reference.heatRate_W * (1 - u.relative), 12);
    // Each row's drift over the band.
    for (const m of report.models) expect(m.driftOverUncertainty).toBeCloseTo(Math.abs(m.drift) / u.relative, 12);
  }, 30_000);

  it.each([
    ['10 mm', true],
    ['300 mm', false],
  ])(
    'length %s: the default uncertainty is h alone at 25 per cent; a linear fin is sampled only when its band is over 20 per cent (%s)',
    async (length, sampled) => {
      const c = parseCaseObject({
        fin: { profile: 'rectangular', length, thickness: '3 mm', width: '40 mm' },
        material: 'copper-pure',
        convection: { ambient: 25, h: 20 },
        base: { temperature: 80 },
      });
      const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
      const u = report.uncertainty!;
      expect(report.sensitivities!.filter((s) => s.uncertainty > 0).map((s) => [s.key, s.uncertainty])).toEqual([['convection.h', 0.25]]);
      // A short copper fin has S_h close to 1 (band near 25 %, sampled); a long one S_h near 1/2 (band near 12 %, not).
      expect(u.fromH > 0.2).toBe(sampled);
      expect(u.sample !== null).toBe(sampled);
    },
    30_000,
  );

  it('a wide band on a nonlinear response: the sample sees the curvature first order misses', async () => {
    // Q ~ sqrt(h) for a long fin: with h uncertain by 90 % (a normal truncated at 1 % of nominal), sqrt(h) spreads
    // by 0.355 (scipy, 2e6 draws of truncnorm) where first order says 0.45: a gap of twice the sampling error
    // (0.022 each) and more.
    const c = parseCaseObject({
      fin: { profile: 'pin', length: '200 mm', diameter: '3 mm' },
      material: { k: 200 },
      convection: { ambient: 25, h: 40, tip: 'adiabatic' },
      base: { temperature: 80 },
      uncertainty: { 'convection.h': '90 %' },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d', sample: 'always' });
    const u = report.uncertainty!;
    // S_h = 1/2 + mL/sinh(2mL) (Incropera et al. 2007, Table 3.4 case B differentiated), m^2 = 4h/(kD).
    const mL = Math.sqrt((4 * 40) / (200 * 0.003)) * 0.2;
    // The discrete S_h differs from the exact one by the grid's error, < 1e-6 (sensitivities.test.ts).
    expect(Math.abs(u.firstOrder - 0.9 * (0.5 + mL / Math.sinh(2 * mL)))).toBeLessThan(1e-5);
    expect(u.sample!.agrees).toBe(false);
    expect(u.method).toBe('latin-hypercube');
    expect(u.relative).toBe(u.sample!.relative);
    expect(u.sample!.relative).toBeLessThan(u.firstOrder - 2 * u.sample!.samplingError);
  }, 30_000);
});
