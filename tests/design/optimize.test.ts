/**
 * `optimize` for one fin: Brent's minimiser, the published optimum fins recovered by the numerical reference, the
 * reference optimum's stationarity, the required-heat answer against the closed form, and the refusals.
 * Sources: Schmidt, E., 1926, "Die Wärmeübertragung durch Rippen", Z. VDI 70 (sinh 2mL = 6 mL for a rectangular fin
 * of given profile area); the optimum triangular fin (1/r − r = 2/(3 mL), r = I1(2mL)/I0(2mL)) as derived in
 * tests/reference/optimum.py, which printed the check values below (h = 40, k = 180, A_p = 6e-5 m^2); the common
 * quotes 1.419 and 1.309 in Kraus, Aziz & Welty 2001 [from memory]. The uniform fin with an adiabatic tip,
 * Q = sqrt(hPkA) θ_b tanh(mL): Incropera, DeWitt, Bergman & Lavine 2007, Table 3.4. Cases are invented.
 */
import { describe, expect, it } from 'vitest';
import { brentMinimize, optimizeFin, type OptimizeRequest } from '../../src/design/index.js';
import { cli } from '../cli/run.js';
import { writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const labels = { vary: '--vary', keep: '--keep', bounds: '--bounds', heat: '--heat' };

function fin(profile: string): string {
  return `name: optimum check
fin: { ${profile}, width: 100 mm, edges: insulated }
material: { k: 180 W/(m*K) }
convection: { ambient: 25 degC, h: 40 W/(m^2*K), tip: adiabatic }
base: { temperature: 85 degC }
`;
}

function request(caseText: string, over: Partial<OptimizeRequest>): OptimizeRequest {
  return {
    caseText,
    fileName: 'optimum.yaml',
    vary: ['fin.thickness'],
    keep: 'profile-area',
    objective: { kind: 'max-heat' },
    bounds: new Map(),
    reference: '1d',
    tolerance: 0.02,
    labels,
    ...over,
  };
}

describe('Brent minimiser (Brent 1973, ch. 5)', () => {
  it('finds an interior minimum to its tolerance in fewer steps than golden section', async () => {
    const r = await brentMinimize((x) => (x - 2) ** 2 + Math.cos(3 * (x - 2)) / 50, 0, 5, { relTol: 1e-8 });
    // d/dx: 2(x-2) - (3/50) sin(3(x-2)) = 0 at x = 2 (and only there on [0, 5]: 2 > 9/50).
    expect(Math.abs(r.x - 2)).toBeLessThan(1e-7);
    // Golden section alone needs ln(5/1e-8)/ln(1/0.618) ~ 42 steps; parabolic steps converge faster on a smooth f.
    expect(r.evaluations).toBeLessThan(25);
  });

  it('ends at the bound where the minimum lies outside', async () => {
    const r = await brentMinimize((x) => x, 1, 3, { relTol: 1e-6 });
    expect(r.x).toBeGreaterThanOrEqual(1);
    expect(r.x - 1).toBeLessThan(1e-5);
  });
});

describe('optimum fins at a given profile area (h = 40, k = 180, A_p = 6e-5 m^2, adiabatic tip)', () => {
  it("rectangular: the fd-1d optimum is Schmidt's, mL = 1.41922319002", async () => {
    const r = await optimizeFin(request(fin('profile: rectangular, length: 60 mm, thickness: 1 mm'), {}));
    // optimum.py: L_opt = 0.0647855856 m, t_opt = 0.0009261319388 m, q' = 3.248125127 W/(m K) per unit width.
    expect(r.reference.values['fin.thickness']).toBeCloseTo(0.0009261319388, 8);
    expect(r.reference.values['fin.length']).toBeCloseTo(0.0647855856, 6);
    // 1e-8: the fd-1d study's own error (GCI ~2e-8) bounds the heat rate.
    expect(Math.abs(r.reference.heatRate_W / (3.248125127 * 0.1 * 60) - 1)).toBeLessThan(1e-7);
    expect(r.shortcut.values['fin.thickness']).toBeCloseTo(0.0009261319388, 12);
    expect(r.shortcut.method).toMatch(/Schmidt/);
    expect(Math.abs(r.loss)).toBeLessThan(1e-7);
    expect(r.reference.amount).toBeCloseTo(6e-5, 15);
  });

  it('triangular: mL = 1.30940206276, L_opt = 0.07735765008 m, t_b = 0.001551236366 m', async () => {
    const r = await optimizeFin(request(fin('profile: triangular, length: 60 mm, baseThickness: 2 mm'), { vary: ['fin.baseThickness'] }));
    expect(r.reference.values['fin.baseThickness']).toBeCloseTo(0.001551236366, 7);
    expect(r.reference.values['fin.length']).toBeCloseTo(0.07735765008, 5);
    expect(Math.abs(r.reference.heatRate_W / (3.673862171 * 0.1 * 60) - 1)).toBeLessThan(1e-6);
  });

  // Optimum mL of the other published profiles at a fixed amount of material (1-D, adiabatic tip), m from the base
  // thickness (straight fins, m^2 = 2h/(k t_b)) or the diameter (pin, m^2 = 4h/(kD)): tests/reference/optimum.py
  // (shared references sheet, section 5): concave parabolic sqrt(2) exactly (stationarity gives 1 + 4z^2 =
  // (1 + z^2)^2; Schmidt's least-material profile, Jany & Bejan 1988, IJHMT 31(8), 1635), convex parabolic
  // 1.35395663795, pin at fixed volume 0.919296357325 (sinh 2z = (10/3) z). Brent stops at 1e-4 relative in the
  // varied size and mL goes as its -3/2 power along the constraint: 3e-4 relative holds.
  it.each([
    ['parabolic-concave', 'profile: parabolic-concave, length: 60 mm, baseThickness: 2 mm', 'fin.baseThickness', 'profile-area', Math.SQRT2],
    ['parabolic-convex', 'profile: parabolic-convex, length: 60 mm, baseThickness: 2 mm', 'fin.baseThickness', 'profile-area', 1.35395663795],
  ] as const)(
    '%s: the fd-1d optimum has the published mL',
    async (_name, profile, key, keep, mL) => {
      const r = await optimizeFin(request(fin(profile), { vary: [key], keep }));
      const t = r.reference.values[key] as number;
      const L = r.reference.values['fin.length'] as number;
      expect(Math.abs((Math.sqrt((2 * 40) / (180 * t)) * L) / mL - 1)).toBeLessThan(3e-4);
    },
    60_000,
  );

  it('pin at a given volume: the fd-1d optimum has mL = 0.919296357325', async () => {
    const text = `name: optimum pin
fin: { profile: pin, length: 40 mm, diameter: 3 mm }
material: { k: 180 W/(m*K) }
convection: { ambient: 25 degC, h: 40 W/(m^2*K), tip: adiabatic }
base: { temperature: 85 degC }
`;
    const r = await optimizeFin(request(text, { vary: ['fin.diameter'], keep: 'volume' }));
    const D = r.reference.values['fin.diameter'] as number;
    const L = r.reference.values['fin.length'] as number;
    expect(Math.abs((Math.sqrt((4 * 40) / (180 * D)) * L) / 0.919296357325 - 1)).toBeLessThan(3e-4);
    expect(r.shortcut.method).toMatch(/pin/i);
  }, 60_000);

  it('the reference optimum is stationary: 1 % either side gives less heat', async () => {
    const text = fin('profile: rectangular, length: 40 mm, thickness: 2 mm');
    const r = await optimizeFin(request(text.replace('tip: adiabatic', 'tip: convective'), {}));
    const t = r.reference.values['fin.thickness'] as number;
    for (const f of [0.99, 1.01]) {
      const side = await optimizeFin(
        request(text.replace('tip: adiabatic', 'tip: convective'), { bounds: new Map([['fin.thickness', [t * f * 0.999999, t * f * 1.000001]]]) }),
      );
      expect(side.reference.heatRate_W).toBeLessThan(r.reference.heatRate_W);
    }
    // A convective tip moves the optimum away from Schmidt's (his closed form assumes an adiabatic tip): the loss is small but real.
    expect(r.loss).toBeGreaterThan(0);
    expect(r.loss).toBeLessThan(0.01);
  }, 120_000);
});

describe('the length that removes a required heat rate', () => {
  it('matches the closed form L = atanh(Q / M) / m of the uniform fin with an adiabatic tip', async () => {
    const text = fin('profile: rectangular, length: 40 mm, thickness: 2 mm');
    const r = await optimizeFin(request(text, { vary: ['fin.length'], keep: 'none', objective: { kind: 'required', heat_W: 10 } }));
    const h = 40;
    const k = 180;
    const t = 0.002;
    const w = 0.1;
    const m = Math.sqrt((h * 2 * w) / (k * t * w));
    const M = Math.sqrt(h * 2 * w * k * t * w) * 60;
    const exact = Math.atanh(10 / M) / m;
    // The root is bisected to 1e-5 relative on the length.
    expect(Math.abs((r.reference.values['fin.length'] as number) / exact - 1)).toBeLessThan(2e-5);
    expect(Math.abs((r.shortcut.values['fin.length'] as number) / exact - 1)).toBeLessThan(2e-5);
  }, 60_000);
});

describe('optimize on the command line: refusals name the option', () => {
  const dir = mkdtempSync(join(tmpdir(), 'fincheck-optimize-'));
  const file = join(dir, 'fin.yaml');
  writeFileSync(file, fin('profile: rectangular, length: 40 mm, thickness: 2 mm'));

  it.each([
    [['--vary', 'fin.thickness', '--keep', 'none'], /^fincheck: --keep: max-heat needs a constraint/],
    [['--vary', 'material.k'], /^fincheck: --vary: material\.k is not a dimension of the fin/],
    [['--vary', 'fin.length', '--for', 'required'], /^fincheck: --heat: --for required needs the required heat rate/],
    [
      ['--vary', 'fin.length', '--for', 'required', '--heat', '500W'],
      /^fincheck: --heat: 500 W is not reached with fin\.length from 10 mm to 160 mm \(at most [0-9.]+ W there\)/,
    ],
    [['--vary', 'fin.length', '--for', 'required', '--heat', '5W', '--temperature', '80degC'], /^fincheck: --temperature: /],
    [['--vary', 'fin.thickness', '--bounds', 'fin.thickness=3mm:1mm'], /^fincheck: --bounds: fin\.thickness: got 3mm:1mm; expected 0 < FROM < TO/],
  ])(
    '%j exits 2',
    async (args, message) => {
      const r = await cli('optimize', file, '--reference', '1d', ...args);
      expect(r.code).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stdout).toBe('');
    },
    60_000,
  );

  it('--json prints the contract keys', async () => {
    const r = await cli('optimize', file, '--vary', 'fin.thickness', '--reference', '1d', '--json');
    expect(r.code, r.stderr).toBe(0);
    const json = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const key of ['objective', 'keep', 'vary', 'shortcut', 'reference', 'shortcutAtReference_W', 'loss']) expect(json).toHaveProperty(key);
    expect(json).toMatchObject({ objective: 'max-heat', keep: 'profile-area', vary: ['fin.thickness'], reference: { model: 'fd-1d' } });
  }, 60_000);
});
