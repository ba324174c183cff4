/**
 * The library entry (src/api, package.json exports '.'): the same numbers as the command line, typed errors that
 * name the field or option, a map with progress and cancellation, charts as SVG or PNG, the report. Cases are the
 * demo's invented scenarios and small invented fins.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  caseFromFile,
  caseFromObject,
  caseFromText,
  chartPng,
  chartSvg,
  check,
  InputError,
  map,
  MapInterrupted,
  ModelNotApplicableError,
  report,
  solve,
  UsageError,
} from '../../src/api/index.js';
import { cli } from '../cli/run.js';

const DEMO = 'demo/inverter-plate-fin.yaml';

const pinText = `name: api pin
fin: { profile: pin, length: 30 mm, diameter: 3 mm }
material: aluminium-6063
convection: { ambient: 25 degC, h: 40 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
`;

describe('library: check and solve give the command line numbers', () => {
  it('check on a file equals `fincheck check --json`, key by key', async () => {
    const fromApi = await check(caseFromFile(DEMO));
    const fromCli = await cli('check', DEMO, '--json');
    expect(fromCli.code).toBe(0);
    expect(JSON.parse(JSON.stringify(fromApi))).toEqual(JSON.parse(fromCli.stdout));
  });

  it('a case from text, from an object and from a file is the same case', () => {
    const fromText = caseFromText(readFileSync(DEMO, 'utf8'), DEMO);
    const fromFile = caseFromFile(DEMO);
    expect(fromText).toEqual(fromFile);
    const fromObject = caseFromObject({
      name: 'api pin',
      fin: { profile: 'pin', length: '30 mm', diameter: '3 mm' },
      material: 'aluminium-6063',
      convection: { ambient: '25 degC', h: '40 W/(m^2*K)', tip: 'convective' },
      base: { temperature: '85 degC' },
    });
    expect(fromObject).toEqual(caseFromText(pinText));
  });

  it('solve 1d and 2d equal `fincheck solve --json`', async () => {
    const c = caseFromFile(DEMO);
    const one = await cli('solve', DEMO, '--json', '--nodes', '201');
    expect(JSON.parse(JSON.stringify(solve(c, { nodes: 201 })))).toEqual(JSON.parse(one.stdout));
    const two = await cli('solve', DEMO, '--json', '--model', '2d', '--grid', '60x8');
    expect(JSON.parse(JSON.stringify(solve(c, { model: '2d', grid: { nx: 60, ny: 8 } })))).toEqual(JSON.parse(two.stdout));
  });
});

describe('library: typed errors', () => {
  it('an invalid case is an InputError with the key path, the value and what is accepted', () => {
    const bad = pinText.replace('diameter: 3 mm', 'diameter: -3 mm');
    let caught: unknown;
    try {
      caseFromText(bad, 'bad.yaml');
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(InputError);
    const issue = (caught as InputError).issues[0];
    expect(issue).toMatchObject({ path: 'fin.diameter', value: '-3 mm', line: 2 });
    expect(issue?.accepted).toMatch(/> 0|positive/);
  });

  it('an invalid option is a UsageError naming options.<name>', async () => {
    const c = caseFromText(pinText);
    await expect(check(c, { tolerance: 2 })).rejects.toThrow(UsageError);
    await expect(check(c, { tolerance: 2 })).rejects.toThrow(/^options\.tolerance: got 2; expected a number between 0 and 1/);
    await expect(check(c, { reference: '3d' as never })).rejects.toThrow(/^options\.reference: got "3d"/);
    expect(() => solve(c, { nodes: 2 })).toThrow(/^options\.nodes: got 2; expected a whole number from 3/);
    expect(() => solve(c, { model: '3d' } as never)).toThrow(/^options\.model: got "3d"/);
  });

  it('a model the fin does not cover is a ModelNotApplicableError with the reason', () => {
    const infinite = caseFromText(
      pinText.replace('h: 40 W/(m^2*K), tip: convective', 'h: { law: power, base: 40 W/(m^2*K), exponent: 0.25 }, tip: infinite'),
    );
    let caught: unknown;
    try {
      solve(infinite, { model: '2d' });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ModelNotApplicableError);
    expect(caught).toBeInstanceOf(UsageError);
    expect((caught as ModelNotApplicableError).reason.length).toBeGreaterThan(10);
  });
});

describe('library: map, charts, report', () => {
  const source = { text: pinText, fileName: 'api-pin.yaml' };
  const sweep = { x: 'fin.diameter=2mm:4mm', y: 'convection.h=20:60', steps: [3, 2] as [number, number], reference: '1d' as const };

  it('map reports progress for every point and returns the map JSON', async () => {
    const seen: [number, number][] = [];
    const result = await map(source, { ...sweep, onProgress: (done, total) => seen.push([done, total]) });
    expect(seen.map(([d]) => d)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(seen.every(([, t]) => t === 6)).toBe(true);
    expect(result.points).toHaveLength(6);
    expect(result.x.key).toBe('fin.diameter');
    for (const p of result.points) {
      expect('reference' in p ? p.reference?.model : p).toBe('fd-1d');
      expect('models' in p ? (p.models?.length ?? 0) : 0).toBeGreaterThan(0);
    }
  });

  it('an aborted signal stops the map with MapInterrupted', async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(map(source, { ...sweep, signal: controller.signal })).rejects.toBeInstanceOf(MapInterrupted);
  });

  it('an axis key that is not in the case names options.x', async () => {
    await expect(map(source, { ...sweep, x: 'fin.nothing=1:2' })).rejects.toThrow(/options\.x/);
  });

  it('charts: an SVG document, and PNG bytes of width x dpi/96 pixels', async () => {
    const c = caseFromText(pinText);
    const svg = await chartSvg(c, 'profile', { reference: '1d', width: 800, height: 500 });
    expect(svg).toMatch(/^<svg [^>]*width="800" height="500"/);
    const png = await chartPng(c, 'flux', { reference: '1d', width: 800, height: 500, dpi: 192 });
    expect(Array.from(png.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const view = new DataView(png.buffer, png.byteOffset, png.byteLength);
    expect([view.getUint32(16), view.getUint32(20)]).toEqual([1600, 1000]);
    await expect(chartSvg(c, 'bars' as never)).rejects.toThrow(/^kind: got "bars"; expected one of profile, flux, heatmap/);
  });

  it('report: HTML with the figures inline, Markdown that refers to the figure files returned', async () => {
    const c = caseFromText(pinText);
    const r = await report(c, { reference: '1d', date: '2026-01-15' });
    expect(r.html).toContain('api pin');
    expect(r.markdown).toContain('2026-01-15');
    expect(r.figures.length).toBeGreaterThanOrEqual(2);
    expect(r.html).toContain('data:image/png;base64,');
    for (const f of r.figures) {
      expect(r.markdown).toContain(f.file);
      expect(f.png[1]).toBe(80);
    }
    await expect(report(c, { date: '2026-02-30' })).rejects.toThrow(/^options\.date: got "2026-02-30"/);
  });
});
