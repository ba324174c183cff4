/**
 * solve, plot, report and map on a heat-sink case through the command line (issue 11, outputs): the fd-3d
 * numbers with their GCI and the JSON keys of `solve --json`, the three sink charts, the report's parts and
 * cautions (HTML, Markdown, PDF), a sink map with its CSV columns, and the options a sink refuses (exit 2,
 * naming the option). The sinks are invented.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const sink = `name: small drive sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm], limit: 110 degC }
  - { name: driver, power: 2 W, centre: [32 mm, 10 mm], size: [6 mm, 6 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K), tip: convective }
`;
const bare = `name: bare plate
material: aluminium-6063
array: { count: 0 }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 5 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm] }
convection: { ambient: 30 degC, plate: 40 W/(m^2*K) }
`;

const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-commands-'));
const file = join(dir, 'sink.yaml');
const bareFile = join(dir, 'bare.yaml');
writeFileSync(file, sink);
writeFileSync(bareFile, bare);

describe('solve on a heat sink', () => {
  it('--json: per-source mean and max with their GCIs, heat per fin, plate top mean, sink resistance, energy balance', async () => {
    const r = await cli('solve', file, '--json');
    expect(r.code, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout) as Record<string, unknown> & {
      sources: Record<string, number | string | null>[];
      fins: Record<string, number | null>[];
      unknowns: number[];
    };
    expect(j).toMatchObject({ kind: 'heat-sink', model: 'fd-3d', case: 'small drive sink' });
    expect(j.sources.map((s) => s.name)).toEqual(['chip', 'driver']);
    for (const s of j.sources) {
      expect(Object.keys(s).sort()).toEqual(
        ['maxDiscretizationError', 'maxTemperature_degC', 'meanDiscretizationError', 'meanTemperature_degC', 'name', 'observedOrder', 'power_W'].sort(),
      );
      expect(s.maxTemperature_degC as number).toBeGreaterThan(s.meanTemperature_degC as number);
      expect(s.meanDiscretizationError as number).toBeGreaterThan(0);
      expect(s.meanDiscretizationError as number).toBeLessThan(1e-2);
    }
    expect(j.fins).toHaveLength(4);
    expect(j.fins.map((f) => f.index)).toEqual([0, 1, 2, 3]);
    for (const f of j.fins) expect(f.heatRateDiscretizationError).not.toBeNull();
    // Energy: 17 W in, out through the fins and the plate, to round-off.
    expect(j.totalHeat_W as number).toBeCloseTo(17, 12);
    expect((j.finsHeat_W as number) + (j.plateHeat_W as number)).toBeCloseTo(17, 9);
    expect(j.energyBalance as number).toBeLessThan(1e-10);
    expect(j.plateTopMeanTemperature_degC as number).toBeGreaterThan(30);
    expect(j.sinkResistance_KperW as number).toBeGreaterThan(0);
    expect(j.unknowns).toHaveLength(3);
    expect((j.cautions as string[]).join(' ')).toMatch(/confirm the design by test/);
  }, 120_000);

  it('text: the table names the model, the GCI and the cautions', async () => {
    const r = await cli('solve', file);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toMatch(/^fincheck solve \(heat sink\): small drive sink/);
    for (const word of ['Model fd-3d', 'GCI', 'chip', 'driver', 'sink resistance', 'energy balance', 'hottest root', 'Cautions:'])
      expect(r.stdout).toContain(word);
  }, 120_000);

  it.each([
    ['--model', '2d'],
    ['--nodes', '200'],
  ])('refuses %s %s for a heat sink (exit 2, nothing on stdout)', async (option, value) => {
    const r = await cli('solve', file, option, value);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain(`${option}: a heat sink is solved by fd-3d`);
  });
});

describe('plot on a heat sink', () => {
  it.each([['plate'], ['fin-heat'], ['profile']])(
    '--kind %s writes the chart',
    async (kind) => {
      const out = join(dir, `${kind}.svg`);
      const r = await cli('plot', file, '--kind', kind, '--out', out, '--tolerance', '10%', '--json');
      expect(r.code, r.stderr).toBe(0);
      expect(JSON.parse(r.stdout)).toMatchObject({ kind, reference: 'fd-3d', format: 'svg' });
      const svg = readFileSync(out, 'utf8');
      expect(svg).toContain('small drive sink');
      expect(svg).toMatch(/confirm by test/);
      // The sink's own idealisation in the caution, not a single fin's.
      expect(svg).toContain('idealised sink (isoflux sources, the given h)');
      expect(svg).not.toContain('idealised fin');
    },
    120_000,
  );

  it('refuses a single-fin chart for a sink, a sink chart for a fin, and fin charts for a bare plate', async () => {
    const flux = await cli('plot', file, '--kind', 'flux', '--out', join(dir, 'x.png'));
    expect(flux.code).toBe(2);
    expect(flux.stderr).toMatch(/--kind: .*profile, plate, fin-heat, sensitivity for a heat sink/);
    const fin = join(dir, 'fin.yaml');
    writeFileSync(
      fin,
      'fin: { profile: pin, length: 40 mm, diameter: 3 mm }\nmaterial: brass\nconvection: { ambient: 20, h: 30 }\nbase: { temperature: 80 degC }\n',
    );
    const plate = await cli('plot', fin, '--kind', 'plate', '--out', join(dir, 'y.png'));
    expect(plate.code).toBe(2);
    expect(plate.stderr).toMatch(/--kind: .*plate and fin-heat are heat-sink charts/);
    const bareProfile = await cli('plot', bareFile, '--kind', 'profile', '--out', join(dir, 'z.png'));
    expect(bareProfile.code).toBe(2);
    expect(bareProfile.stderr).toMatch(/--kind profile: a bare plate .* has no fins/);
    for (const f of ['x.png', 'y.png', 'z.png']) expect(existsSync(join(dir, f))).toBe(false);
  }, 120_000);
});

describe('report on a heat sink', () => {
  it('writes HTML, Markdown, PDF and the four charts (the tornado of the sensitivities too), with the inputs, the check table, the ledger and the cautions', async () => {
    const out = join(dir, 'report');
    const r = await cli('report', file, '--out', out, '--tolerance', '10%', '--pdf', '--date', '2026-01-02', '--json');
    expect(r.code, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout) as { images: string[]; pdf: string; worstVerdict: string };
    expect(j.images.map((p) => p.split(/[\\/]/).pop())).toEqual(['plate.png', 'fin-heat.png', 'fin-profile.png', 'sensitivity.png']);
    for (const f of ['report.html', 'report.md', 'report.pdf', 'plate.png', 'fin-heat.png', 'fin-profile.png', 'sensitivity.png'])
      expect(existsSync(join(out, f))).toBe(true);
    const md = readFileSync(join(out, 'report.md'), 'utf8');
    for (const part of [
      '# Heat-sink check: small drive sink',
      'Inputs',
      'Reference model fd-3d',
      'Array shortcuts against fd-3d',
      'overall-efficiency-exact-fin',
      'Drift caused by each assumption alone',
      'conducting sheets',
      'Heat per fin',
      'confirm the design by test',
      'largest uncertainty',
      'codes, standards and licensed engineering practice',
    ]) {
      expect(md).toContain(part);
    }
    expect(readFileSync(join(out, 'report.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
  }, 180_000);

  it('--reference 2d is refused for a sink and nothing is written', async () => {
    const out = join(dir, 'refused');
    const r = await cli('report', file, '--out', out, '--reference', '2d');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--reference 2d: a heat sink's reference is fd-3d/);
    expect(existsSync(out)).toBe(false);
  });
});

describe('map on a heat sink', () => {
  it('sweeps array.count (whole numbers) and plate.thickness, each point an fd-3d check, with the sink columns', async () => {
    const out = join(dir, 'map');
    const r = await cli(
      'map',
      file,
      '--x',
      'array.count=2:3',
      '--y',
      'plate.thickness=3mm:5mm',
      '--steps',
      '2x2',
      '--jobs',
      '1',
      '--tolerance',
      '10%',
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toContain('reference fd-3d');
    expect(r.stdout).toMatch(/spreading-series +drift/);
    const csv = readFileSync(join(out, 'map.csv'), 'utf8').trim().split('\n');
    expect(csv[0]).toMatch(/^i,j,array\.count \[-\],plate\.thickness \[mm\],fd-3d sinkResistance \[K\/W\],/);
    expect(csv[0]).toContain('spreading-series drift [-]');
    expect(csv).toHaveLength(5);
    const json = JSON.parse(readFileSync(join(out, 'map.json'), 'utf8')) as { x: { values: number[] }; points: { reference: { model: string } }[] };
    expect(json.x.values).toEqual([2, 3]);
    for (const p of json.points) expect(p.reference.model).toBe('fd-3d');
    for (const f of ['overview.png', 'map-spreading-series.png']) expect(existsSync(join(out, f))).toBe(true);
  }, 300_000);

  it('refuses more steps than whole numbers in a count range, a single-fin key, and a single-fin model', async () => {
    const steps = await cli('map', file, '--x', 'array.count=2:4', '--y', 'plate.thickness=3mm:5mm', '--steps', '5x2');
    expect(steps.code).toBe(2);
    expect(steps.stderr).toMatch(/--x: array\.count is a whole number: 2:4 holds 3 of them/);
    const key = await cli('map', file, '--x', 'base.temperature=50:80', '--y', 'plate.thickness=3mm:5mm');
    expect(key.code).toBe(2);
    expect(key.stderr).toMatch(/--x: base\.temperature is not a numeric key of a heat-sink case; map one of array\.count/);
    const model = await cli('map', file, '--x', 'array.count=2:3', '--y', 'plate.thickness=3mm:5mm', '--steps', '2', '--models', 'tanh-Lc');
    expect(model.code).toBe(2);
    expect(model.stderr).toMatch(/--models: tanh-Lc is a single-fin model; a heat sink maps overall-efficiency/);
  }, 120_000);
});
