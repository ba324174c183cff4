/**
 * The library's heat-sink entry points (src/api/sink.ts): the same numbers as `fincheck check --json` and
 * `fincheck solve --json` on the demo's invented motor-drive sink, typed errors naming the field, and a small
 * invented sink's charts and report.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  checkSink,
  InputError,
  map,
  sinkChartPng,
  sinkChartSvg,
  sinkFromFile,
  sinkFromObject,
  sinkFromText,
  sinkReport,
  solveSink,
  UsageError,
} from '../../src/api/index.js';
import { cli } from '../cli/run.js';

const SINK = 'demo/motor-drive-sink.yaml';

describe('library: heat sinks', () => {
  it('checkSink equals `fincheck check --json`, key by key', async () => {
    const fromApi = await checkSink(sinkFromFile(SINK));
    const fromCli = await cli('check', SINK, '--json');
    expect(fromCli.code).toBe(0);
    expect(JSON.parse(JSON.stringify(fromApi))).toEqual(JSON.parse(fromCli.stdout));
  }, 120_000);

  it('solveSink equals `fincheck solve --json`', async () => {
    const fromApi = solveSink(sinkFromText(readFileSync(SINK, 'utf8'), SINK));
    const fromCli = await cli('solve', SINK, '--json');
    expect(fromCli.code).toBe(0);
    expect(JSON.parse(JSON.stringify(fromApi))).toEqual(JSON.parse(fromCli.stdout));
  }, 120_000);

  it('a sink from an object is the sink from text', () => {
    const text = `name: small sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
`;
    const fromObject = sinkFromObject({
      name: 'small sink',
      fin: { profile: 'rectangular', length: '20 mm', thickness: '1.5 mm' },
      material: 'aluminium-6063',
      array: { count: 4, pitch: '10 mm' },
      plate: { width: '40 mm', length: '40 mm', thickness: '4 mm' },
      sources: [{ name: 'chip', power: '15 W', centre: ['20 mm', '20 mm'], size: ['10 mm', '10 mm'] }],
      convection: { ambient: '30 degC', h: '40 W/(m^2*K)' },
    });
    expect(fromObject).toEqual(sinkFromText(text));
  });

  it('a single-fin case is an InputError that says what a sink case holds', () => {
    const read = () => sinkFromFile('demo/inverter-plate-fin.yaml');
    expect(read).toThrow(InputError);
    expect(read).toThrow(/array/);
  });

  it('a bad source power names its key path, the value and what is accepted', () => {
    try {
      sinkFromObject({
        fin: { profile: 'rectangular', length: '20 mm', thickness: '1.5 mm' },
        material: 'aluminium-6063',
        array: { count: 4, pitch: '10 mm' },
        plate: { width: '40 mm', length: '40 mm', thickness: '4 mm' },
        sources: [{ power: '-3 W', centre: ['20 mm', '20 mm'], size: ['10 mm', '10 mm'] }],
        convection: { ambient: '30 degC', h: '40 W/(m^2*K)' },
      });
      expect.unreachable('the negative power was accepted');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      const issue = (error as InputError).issues.find((i) => i.path.startsWith('sources[0].power'));
      expect(issue?.value).toContain('-3');
    }
  });

  it('a tolerance out of range is a UsageError naming options.tolerance', async () => {
    await expect(checkSink(sinkFromFile(SINK), { tolerance: 2 })).rejects.toThrow(UsageError);
    await expect(checkSink(sinkFromFile(SINK), { tolerance: 2 })).rejects.toThrow(/options\.tolerance/);
  });
});

describe("library: a heat sink's charts and report", () => {
  const small = `name: api sink
fin: { profile: rectangular, length: 15 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 3, pitch: 10 mm }
plate: { width: 30 mm, length: 30 mm, thickness: 3 mm }
sources:
  - { name: chip, power: 8 W, centre: [15 mm, 15 mm], size: [8 mm, 8 mm] }
convection: { ambient: 25 degC, h: 40 W/(m^2*K) }
`;

  it('draws each sink chart as SVG, in the display units asked for', async () => {
    const sink = sinkFromText(small);
    const si = await sinkChartSvg(sink, 'plate', { units: 'si' });
    const us = await sinkChartSvg(sink, 'plate', { units: 'us' });
    expect(si).toMatch(/^<svg|^<\?xml/);
    expect(si).toContain('api sink');
    expect(si).toContain('°C');
    expect(si).not.toContain('°F');
    expect(us).toContain('°F');
    for (const kind of ['fin-heat', 'profile'] as const) expect(await sinkChartSvg(sink, kind)).toContain('idealised sink');
  }, 120_000);

  it('gives PNG bytes of width x dpi/96 pixels', async () => {
    const png = await sinkChartPng(sinkFromText(small), 'fin-heat', { width: 800, height: 500, dpi: 144 });
    // PNG signature, then the IHDR chunk's width and height (big-endian) at bytes 16-23 (ISO/IEC 15948:2004, 11.2.2).
    expect(Array.from(png.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const view = new DataView(png.buffer, png.byteOffset);
    expect([view.getUint32(16), view.getUint32(20)]).toEqual([1200, 750]);
  }, 120_000);

  it('refuses a single-fin chart kind with a UsageError naming the kinds a sink has', async () => {
    const sink = sinkFromText(small);
    // @ts-expect-error: flux is a single fin's chart
    await expect(sinkChartSvg(sink, 'flux')).rejects.toThrow(/kind: got "flux"; expected one of profile, plate, fin-heat, sensitivity/);
  });

  it('maps a sink key against h with the fd-3d reference at every point', async () => {
    const r = await map({ text: small }, { x: 'array.count=2:3', y: 'convection.h=20:60', steps: [2, 2] });
    expect(r.reference).toBe('fd-3d');
    expect(r.models).toEqual(['overall-efficiency', 'overall-efficiency-exact-fin', 'spreading-series']);
    expect(r.points).toHaveLength(4);
  }, 180_000);

  it('builds the report: HTML, Markdown with the figures it names, the How sure section', async () => {
    const r = await sinkReport(sinkFromText(small), { date: '2026-01-01' });
    expect(r.html).toContain('<html');
    expect(r.markdown).toContain('How sure');
    for (const f of r.figures) expect(r.markdown).toContain(f.file);
    expect(r.figures.map((f) => f.file)).toContain('plate.png');
    expect(r.pdf).toBeNull();
  }, 180_000);
});
