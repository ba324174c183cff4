/**
 * A heat sink's charts and report in display units, and the report's "How sure" section: the plate, heat-per-fin,
 * fin-profile and sensitivity charts and the HTML, Markdown and PDF report show `--units us`, a `display` key and a
 * case written in US units with the numbers converted and the unit beside each; the default (mm) stays as it was.
 * The report's uncertainty section and its tornado chart hold the numbers of `check --json` (the sensitivities
 * dlnRise_dlnx, the band of the hottest source's rise: a rise shown in degF is 9/5 of the kelvin value, no offset).
 * Numbers are compared with the SI values times the NIST SP 811 (2008) Appendix B.8 / B.9 factors
 * (tests/sink/support/display-cases.ts). The sinks are invented.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { displaySystem, parseAnyCaseText, type DisplayUnits, type HeatSinkCase } from '../../src/case/index.js';
import type { SinkCheckReport } from '../../src/compare/index.js';
import { barChart, lineChart } from '../../src/images/index.js';
import {
  sensitivityChartSpec,
  sinkFinHeatChartSpec,
  sinkFinProfileChartSpec,
  sinkPlateChart,
  sinkPlateChartSpec,
  sinkPlotInput,
  sinkPlotSvg,
  sinkSensitivityInput,
  type SinkPlotInput,
} from '../../src/plots/index.js';
import { makeSinkReport } from '../../src/report/index.js';
import { reportMarkdown } from '../../src/report/markdown.js';
import { buildSinkReport } from '../../src/report/sink-report.js';
import { cli } from '../cli/run.js';
import { svgTexts } from '../images/helpers.js';
import { NIST, expectShown, keyedSinkText, lineWith, riseToDegF, siSinkText, toDegF, usSinkText } from '../sink/support/display-cases.js';

const size = { width: 1200, height: 750 };
const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-report-units-'));
const write = (name: string, text: string): string => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
const siFile = write('si.yaml', siSinkText);
const usFile = write('us.yaml', usSinkText);
const sinkOf = (text: string, name: string): HeatSinkCase => {
  const any = parseAnyCaseText(text, name);
  if (any.kind !== 'heat-sink') throw new Error(`${name} is not a heat sink`);
  return any.case;
};
const us = displaySystem('us');
const W = (q: number): number => q / NIST.btuPerHour_W;
const inches = (m: number): number => m / NIST.inch_m;
/** The cells of the Markdown table row whose first cell is `first`. */
const row = (md: string, first: string): string[] =>
  lineWith(md, `| ${first} |`)
    .split('|')
    .slice(1, -1)
    .map((c) => c.trim());

let input: SinkPlotInput;
let json: SinkCheckReport;
/** The same input shown in other units (the charts and the report read the case's display units). */
const shownIn = (u: DisplayUnits): SinkPlotInput => ({ ...input, case: { ...input.case, display: u } });

beforeAll(async () => {
  input = await sinkPlotInput(sinkOf(siSinkText, 'si.yaml'), 0.02, true);
  const r = await cli('check', siFile, '--json');
  expect(r.code, r.stderr).toBe(0);
  json = JSON.parse(r.stdout) as SinkCheckReport;
}, 240_000);

describe('the sink charts in display units', () => {
  it("the plate: axes in in, colour bar and isotherms in °F, each source's mean and max in °F; --units mm as before", () => {
    const spec = sinkPlateChartSpec(shownIn(us), size);
    expect([spec.xLabel, spec.yLabel, spec.valueLabel, spec.valueUnit]).toEqual([
      'Across the plate x (in)',
      'Along the plate y (in)',
      'Temperature T (°F)',
      ' °F',
    ]);
    const plate = input.study.plate;
    const k = plate.nx + 1;
    expectShown(String(spec.values[k]), toDegF(plate.underside_degC[k] ?? NaN), 'a plate value');
    expectShown(String(spec.grid.x[1]), inches(plate.x[1] ?? NaN), 'x');
    const texts = svgTexts(sinkPlateChart(shownIn(us), size).svg);
    for (const s of input.report.sources) {
      expect(texts).toContain(`mean ${toDegF(s.meanTemperature_degC).toFixed(1)} °F`);
      expect(texts).toContain(`max ${toDegF(s.maxTemperature_degC).toFixed(1)} °F`);
    }
    const mm = sinkPlateChartSpec(input, size);
    expect([mm.xLabel, mm.valueLabel]).toEqual(['Across the plate x (mm)', 'Temperature T (°C)']);
    expect(Array.from(mm.values)).toEqual(Array.from(plate.underside_degC));
    expect(sinkPlateChartSpec(shownIn(displaySystem('si')), size).xLabel).toBe('Across the plate x (m)');
  });

  it('heat per fin: bars and the uniform-base line in BTU/h; a display key (mm, °F, BTU/h) likewise', () => {
    const spec = sinkFinHeatChartSpec(shownIn(us), size);
    expect(spec.yLabel).toBe('Heat rate Q (BTU/h)');
    input.study.fins.forEach((f, k) => expectShown(String(spec.values[k]), W(f.heatRate_W), `fin ${k}`));
    expectShown(String(spec.lines?.[0]?.value), W(input.prediction?.heatRate_W ?? NaN), 'uniform-base line');
    expect(spec.lines?.[0]?.label).toMatch(/BTU\/h each$/);
    const keyed = sinkOf(keyedSinkText, 'keyed.yaml').display as DisplayUnits;
    expect(sinkFinHeatChartSpec(shownIn(keyed), size).yLabel).toBe('Heat rate Q (BTU/h)');
    expect(sinkFinHeatChartSpec(input, size).yLabel).toBe('Heat rate Q (W)');
    expect(svgTexts(barChart(spec).svg)).toContain('Heat rate Q (BTU/h)');
  });

  it('the fin profiles: height in in, temperatures in °F, the legend notes in BTU/h and °F', () => {
    const spec = sinkFinProfileChartSpec(shownIn(us), size);
    expect(spec.xLabel).toBe('Height above the plate (in)');
    expect(spec.panels[0]?.yLabel).toBe('Temperature T (°F)');
    const first = spec.panels[0]?.series[0];
    const profiles = input.study.finProfiles;
    const hottest = input.study.fins.reduce((a, f) => (f.rootTemperature_degC > a.rootTemperature_degC ? f : a));
    expectShown(String(first?.x[2]), inches(profiles?.height_m[2] ?? NaN), 'height');
    expectShown(String(first?.y[2]), toDegF(profiles?.temperature_degC[hottest.index]?.[2] ?? NaN), 'temperature');
    expect(first?.note).toBe(`Q ${Number(W(hottest.heatRate_W).toPrecision(4))} BTU/h, root ${toDegF(hottest.rootTemperature_degC).toFixed(1)} °F`);
    expect(svgTexts(lineChart(spec).svg)).toContain('Height above the plate (in)');
    const keyed = sinkFinProfileChartSpec(shownIn(sinkOf(keyedSinkText, 'keyed.yaml').display as DisplayUnits), size);
    expect([keyed.xLabel, keyed.panels[0]?.yLabel]).toEqual(['Height above the plate (mm)', 'Temperature T (°F)']);
  });

  it("the tornado chart: one bar per input, d ln rise / d ln x of check --json's sensitivities", () => {
    const chart = sinkSensitivityInput(input.report);
    expect(chart).not.toBeNull();
    const spec = sensitivityChartSpec(chart as NonNullable<typeof chart>, size);
    expect(spec.xLabel).toBe('d ln rise / d ln x');
    expect(spec.bars.map((b) => [b.label, b.value])).toEqual(json.sensitivities?.map((s) => [s.key, s.dlnRise_dlnx]));
    expect(spec.bars.filter((b) => b.highlight).map((b) => b.label)).toEqual(['convection.h']);
    const texts = svgTexts(sinkPlotSvg('sensitivity', input, size));
    for (const s of json.sensitivities ?? []) expect(texts).toContain(s.key);
  });
});

describe('plot on a sink through the command line', () => {
  it('--units us on the plate; a case written in US units draws its fin heat in BTU/h without --units; --kind sensitivity', async () => {
    const plate = join(dir, 'plate.svg');
    const r = await cli('plot', siFile, '--kind', 'plate', '--units', 'us', '--out', plate);
    expect(r.code, r.stderr).toBe(0);
    expect(svgTexts(readFileSync(plate, 'utf8'))).toEqual(expect.arrayContaining(['Across the plate x (in)', 'Temperature T (°F)']));
    const heat = join(dir, 'fin-heat.svg');
    const u = await cli('plot', usFile, '--kind', 'fin-heat', '--out', heat);
    expect(u.code, u.stderr).toBe(0);
    expect(svgTexts(readFileSync(heat, 'utf8'))).toContain('Heat rate Q (BTU/h)');
    const tornado = join(dir, 'sensitivity.svg');
    const t = await cli('plot', siFile, '--kind', 'sensitivity', '--out', tornado, '--json');
    expect(t.code, t.stderr).toBe(0);
    expect(JSON.parse(t.stdout)).toMatchObject({ kind: 'sensitivity', reference: 'fd-3d' });
    expect(svgTexts(readFileSync(tornado, 'utf8'))).toEqual(expect.arrayContaining(['d ln rise / d ln x', 'convection.h', 'fin.length']));
  }, 240_000);
});

describe('the sink report', () => {
  it('computes the same check as check --json (the numbers the report shows)', () => {
    const { warnings: _warnings, ...fromCheck } = json as SinkCheckReport & { warnings?: unknown };
    expect(JSON.parse(JSON.stringify(input.report))).toEqual(fromCheck);
  });

  it('has a "How sure" section after the check: the band of the hottest rise in K, the sensitivities of check --json, the drifts and the cautions', () => {
    const md = reportMarkdown(buildSinkReport({ input, caseFile: 'si.yaml', figures: [], version: 'test', date: '2026-01-01' }));
    const at = md.indexOf('## How sure: sensitivities and uncertainty');
    expect(at).toBeGreaterThan(md.indexOf('## Array shortcuts against the reference'));
    expect(at).toBeLessThan(md.indexOf('## Where the drift comes from'));
    const band = json.uncertainty as NonNullable<SinkCheckReport['uncertainty']>;
    const source = json.sources.find((s) => s.name === band.source);
    const m = /above ambient, (\S+) K by fd-3d, is known to ±(\S+) % \(one standard uncertainty\): (\S+) K to (\S+) K\./.exec(md);
    expect(m).not.toBeNull();
    expectShown(m?.[1], source?.meanRise_K ?? NaN, 'rise');
    expectShown(m?.[2], 100 * band.relative, 'band %');
    expectShown(m?.[3], band.low_K, 'low');
    expectShown(m?.[4], band.high_K, 'high');
    for (const s of json.sensitivities ?? []) {
      const cells = row(md, s.key.replace(/[[\]]/g, '\\$&'));
      expectShown(cells[1], s.dlnRise_dlnx, s.key);
    }
    for (const model of json.models)
      expect(md).toMatch(new RegExp(`- ${model.model} \\(${model.verdict}\\): drift \\S+ % is .* the ±\\S+ % that the h uncertainty alone gives`));
    expect(md).toMatch(/to be confirmed by test.*h is usually the largest uncertainty/);
  });

  it('a display key (mm, °F, BTU/h) and --units si: the section and the tables in those units', () => {
    const keyed = sinkOf(keyedSinkText, 'keyed.yaml').display as DisplayUnits;
    const md = reportMarkdown(buildSinkReport({ input: shownIn(keyed), caseFile: 'keyed.yaml', figures: [], version: 'test', date: '2026-01-01' }));
    const chip = json.sources[0] as SinkCheckReport['sources'][number];
    const cells = row(md, 'chip');
    expect(lineWith(md, '| Source | Power')).toContain('| Source | Power (BTU/h) | Mean (°F) | Max (°F) | Mean rise (°F) |');
    expectShown(cells[1], W(chip.power_W), 'power');
    expectShown(cells[2], toDegF(chip.meanTemperature_degC), 'mean');
    expectShown(cells[4], riseToDegF(chip.meanRise_K), 'rise');
    expect(md).toContain('plate 40 mm x 40 mm x 4 mm');
    expect(md).toMatch(/Sink resistance \| \S+ K\/W/);
    const si = reportMarkdown(
      buildSinkReport({ input: shownIn(displaySystem('si')), caseFile: 'si.yaml', figures: [], version: 'test', date: '2026-01-01' }),
    );
    expect(si).toContain('plate 0.04 m x 0.04 m x 0.004 m');
    expect(si).toContain('Cell size in x and y on the coarsest plan (m)');
    expect(row(si, 'chip')[2]).toBe(chip.meanTemperature_degC.toFixed(2));
  });

  describe('report --units us --pdf', () => {
    const out = join(dir, 'report-us');
    let md = '';
    let html = '';
    let pdfText = '';
    beforeAll(async () => {
      const r = await cli('report', siFile, '--units', 'us', '--pdf', '--out', out, '--date', '2026-01-01', '--json');
      expect(r.code, r.stderr).toBe(0);
      expect((JSON.parse(r.stdout) as { images: string[] }).images).toContain(join(out, 'sensitivity.png'));
      md = readFileSync(join(out, 'report.md'), 'utf8');
      html = readFileSync(join(out, 'report.html'), 'utf8');
      const p = spawnSync('pdftotext', ['-layout', join(out, 'report.pdf'), '-'], { encoding: 'utf8' });
      if (p.error) throw new Error("pdftotext is needed for this test: install Debian's poppler-utils (.ci/run does)");
      pdfText = p.stdout;
    }, 240_000);

    it('Markdown: sources, resistance, fins and the discretisation study in US units against the SI JSON', () => {
      expect(existsSync(join(out, 'sensitivity.png'))).toBe(true);
      for (const s of json.sources) {
        const cells = row(md, s.name);
        expectShown(cells[1], W(s.power_W), `${s.name} power`);
        expectShown(cells[2], toDegF(s.meanTemperature_degC), `${s.name} mean`);
        expectShown(cells[3], toDegF(s.maxTemperature_degC), `${s.name} max`);
        expectShown(cells[4], riseToDegF(s.meanRise_K), `${s.name} rise`);
      }
      expectShown(/Sink resistance \| (\S+) °F·h\/BTU/.exec(md)?.[1], json.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
      expectShown(/hottest point (\S+) °F on/.exec(md)?.[1], toDegF(Math.max(...json.sources.map((s) => s.maxTemperature_degC))), 'hottest point');
      for (const f of json.fins) {
        const cells = row(md, String(f.index));
        expectShown(cells[1], W(f.heatRate_W), `fin ${f.index}`);
        expectShown(cells[3], toDegF(f.rootTemperature_degC), `root ${f.index}`);
      }
      expect(md).toContain('| Mean rise (°F) |');
      expect(md).toContain('Cell size in x and y on the coarsest plan (in)');
      expectShown(/interface (\S+) h·ft²·°F\/BTU/.exec(md)?.[1], 3e-5 / NIST.insulance_m2KperW, 'interface resistance');
    });

    it('the How sure section in °F rises (9/5 K, no offset) with Figure 4, the tornado chart, beside it', () => {
      const band = json.uncertainty as NonNullable<SinkCheckReport['uncertainty']>;
      const source = json.sources.find((s) => s.name === band.source);
      const m = /above ambient, (\S+) °F by fd-3d, is known to ±\S+ % \(one standard uncertainty\): (\S+) °F to (\S+) °F\./.exec(md);
      expect(m).not.toBeNull();
      expectShown(m?.[1], riseToDegF(source?.meanRise_K ?? NaN), 'rise');
      expectShown(m?.[2], riseToDegF(band.low_K), 'low');
      expectShown(m?.[3], riseToDegF(band.high_K), 'high');
      expect(md).toContain('Figure 4 draws them');
      expect(md).toContain('![Sensitivities of the hottest source');
      expect(md).toMatch(/\*Figure 4\. Sensitivities d ln rise \/ d ln x/);
    });

    it('HTML and PDF say the same: the section, the units, the tornado drawn as vector text', () => {
      for (const text of [html, pdfText]) {
        expect(text).toContain('How sure: sensitivities and uncertainty');
        expect(text).toContain('Mean rise (°F)');
        expect(text).toContain('BTU/h');
        expect(text).toMatch(/h is usually the largest\s+uncertainty/);
      }
      const hS = json.sensitivities?.find((s) => s.key === 'convection.h');
      expect(pdfText).toContain(String(Number(hS?.dlnRise_dlnx.toPrecision(4))).replace('-', '\u2212'));
      expect(pdfText).toContain('d ln rise / d ln x');
      expect(html).toContain('<img');
    });
  });

  it('a case written in US units: the report shows in, °F and BTU/h without --units', async () => {
    const content = await makeSinkReport(sinkOf(usSinkText, 'us.yaml'), {
      tolerance: 0.02,
      caseFile: 'us.yaml',
      version: 'test',
      date: '2026-01-01',
      dpi: 48,
    });
    const r = content.input.report;
    const md = content.markdown;
    expect(md).toContain('plate 1.6 in x 1.6 in x 0.16 in');
    const chip = row(md, 'chip');
    expect(chip[1]).toBe('51.00');
    expectShown(chip[2], toDegF(r.sources[0]?.meanTemperature_degC ?? NaN), 'mean');
    expectShown(/Sink resistance \| (\S+) °F·h\/BTU/.exec(md)?.[1], r.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
    expect(md).toMatch(/above ambient, \S+ °F by fd-3d/);
    expect(content.figures.map((f) => f.kind)).toEqual(['plate', 'fin-heat', 'profile', 'sensitivity']);
  }, 240_000);
});
