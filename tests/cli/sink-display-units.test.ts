/**
 * Display units on a heat sink's text outputs (check, solve, map): `--units us`, a `display` key in the case, and a
 * case written in US units show every number converted, with its unit beside it; `--units mm` (the default) is the
 * historical text and `--units si` prints the SI values of the JSON; the JSON never changes. Numbers are compared
 * with the SI JSON times the NIST SP 811 (2008) Appendix B.8 / B.9 factors (tests/sink/support/display-cases.ts).
 * The sinks are invented.
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { displaySystem, parseAnyCaseText, type HeatSinkCase } from '../../src/case/index.js';
import { formatSinkCheck, formatSinkSolve, type SinkCheckReport, type SinkSolveReport } from '../../src/compare/index.js';
import { NIST, expectShown, keyedSinkText, lineWith, numbersIn, riseToDegF, siSinkText, toDegF, usSinkText } from '../sink/support/display-cases.js';
import { cli } from './run.js';

const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-units-'));
const write = (name: string, text: string): string => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
const siFile = write('si.yaml', siSinkText);
const keyedFile = write('keyed.yaml', keyedSinkText);
const usFile = write('us.yaml', usSinkText);
const sinkOf = (text: string, name: string): HeatSinkCase => {
  const any = parseAnyCaseText(text, name);
  if (any.kind !== 'heat-sink') throw new Error(`${name} is not a heat sink`);
  return any.case;
};
const us = displaySystem('us');
const W = (q: number): number => q / NIST.btuPerHour_W;

describe('which units a sink case shows', () => {
  it('a sink written in US units shows US units; a display key sets units one by one; a metric sink mm and SI', () => {
    expect(sinkOf(usSinkText, 'us.yaml').display?.system).toBe('us');
    expect(sinkOf(siSinkText, 'si.yaml').display?.system).toBe('mm');
    const keyed = sinkOf(keyedSinkText, 'keyed.yaml').display;
    expect([keyed?.system, keyed?.length.ascii, keyed?.temperature.ascii, keyed?.temperatureDifference.ascii, keyed?.heat.ascii]).toEqual([
      'custom',
      'mm',
      'degF',
      'degF',
      'BTU/h',
    ]);
  });
});

describe('check on a sink in display units', () => {
  let json: SinkCheckReport;
  let usText = '';
  beforeAll(async () => {
    const j = await cli('check', siFile, '--json');
    expect(j.code, j.stderr).toBe(0);
    json = JSON.parse(j.stdout) as SinkCheckReport;
    const t = await cli('check', siFile, '--units', 'us');
    expect(t.code, t.stderr).toBe(0);
    usText = t.stdout;
  }, 240_000);

  it('--units us prints what the formatter makes of the SI JSON in US units (the JSON is the data, the text its view)', () => {
    expect(usText).toBe(formatSinkCheck(sinkOf(siSinkText, 'si.yaml'), json, us));
  });

  it('the sink and its sources: lengths in in, power in BTU/h, h in BTU/(h*ft^2*degF), the interface resistance in h*ft^2*degF/BTU', () => {
    const chip = lineWith(usText, 'source chip:');
    // 15 W; 10 mm = 0.3937 in; 3e-5 m^2*K/W over 0.1761102; 110 degC = 230 degF.
    const [power, sizeX, , centreX] = numbersIn(chip);
    expectShown(power, W(15), 'chip power');
    expectShown(sizeX, 0.01 / NIST.inch_m, 'chip size');
    expectShown(centreX, 0.02 / NIST.inch_m, 'chip centre');
    expect(chip).toMatch(/BTU\/h over .* in at \(/);
    expectShown(/interface (\S+) h\*ft\^2\*degF\/BTU/.exec(chip)?.[1], 3e-5 / NIST.insulance_m2KperW, 'interface resistance');
    expect(chip).toContain('limit 230 degF');
    const convection = lineWith(usText, 'ambient ');
    expect(convection).toContain('ambient 86 degF');
    expectShown(/h = (\S+) BTU\/\(h\*ft\^2\*degF\)/.exec(convection)?.[1], 40 / NIST.h_W_per_m2K, 'h');
  });

  it('the reference: resistance in degF*h/BTU; per source power, mean and max in degF, the rise and margin in degF (9/5 K, no offset)', () => {
    expectShown(/sink resistance (\S+) degF\*h\/BTU/.exec(usText)?.[1], json.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
    expect(usText).toMatch(/source\s+power \[BTU\/h\]\s+mean \[degF\]\s+max \[degF\]\s+rise \[degF\]/);
    for (const s of json.sources) {
      const cells = numbersIn(lineWith(usText, new RegExp(`^  ${s.name} +\\d`)));
      expectShown(cells[0], W(s.power_W), `${s.name} power`);
      expectShown(cells[1], toDegF(s.meanTemperature_degC), `${s.name} mean`);
      expectShown(cells[2], toDegF(s.maxTemperature_degC), `${s.name} max`);
      expectShown(cells[3], riseToDegF(s.meanRise_K), `${s.name} rise`);
      if (s.margin_K !== null) expectShown(/margin (\S+) degF/.exec(lineWith(usText, `  ${s.name} `))?.[1], riseToDegF(s.margin_K), 'margin');
    }
  });

  it("every shortcut's per-source rise in degF", () => {
    for (const m of json.models) {
      const cells = lineWith(usText, new RegExp(`^  ${m.model} +\\d`)).match(/(\d+\.?\d*) \(/g) ?? [];
      expect(cells).toHaveLength(json.sources.length);
      m.sourceRise_K.forEach((rise, j) => expectShown(cells[j]?.slice(0, -2), riseToDegF(rise), `${m.model} rise ${j}`));
    }
  });

  it('the fins: heat in BTU/h, roots in degF', () => {
    const line = lineWith(usText, 'Fins (fd-3d):');
    const total = json.fins.reduce((s, f) => s + f.heatRate_W, 0);
    expectShown(/carry (\S+) BTU\/h/.exec(line)?.[1], W(total), 'fins total');
    const roots = json.fins.map((f) => f.rootTemperature_degC);
    expectShown(/roots from (\S+) degF/.exec(line)?.[1], toDegF(Math.min(...roots)), 'coolest root');
    expectShown(/to (\S+) degF \(fin/.exec(line)?.[1], toDegF(Math.max(...roots)), 'hottest root');
  });

  it("the uncertainty section: the hottest source's rise and its band in degF, a rise converted by 9/5 without the 32 degF offset", () => {
    const band = json.uncertainty;
    expect(band).toBeDefined();
    const source = json.sources.find((s) => s.name === band?.source);
    const line = lineWith(usText, `${band?.source ?? '?'}'s mean rise`);
    const m = /mean rise (\S+) degF \+\/-\S+ %: (\S+) to (\S+) degF/.exec(line);
    expect(m, line).not.toBeNull();
    expectShown(m?.[1], riseToDegF(source?.meanRise_K ?? NaN), 'rise');
    expectShown(m?.[2], riseToDegF(band?.low_K ?? NaN), 'band low');
    expectShown(m?.[3], riseToDegF(band?.high_K ?? NaN), 'band high');
    // A temperature would have gained 32 degF: a rise must not.
    expect(Math.abs(Number(m?.[1]) - toDegF(source?.meanRise_K ?? NaN))).toBeGreaterThan(31);
    // The same section in K for the default units, the numbers of the JSON.
    const mm = formatSinkCheck(sinkOf(siSinkText, 'si.yaml'), json);
    const k = /mean rise (\S+) K \+\/-\S+ %: (\S+) to (\S+) K/.exec(lineWith(mm, /'s mean rise \S+ K \+\/-/));
    expectShown(k?.[1], source?.meanRise_K ?? NaN, 'rise K');
    expectShown(k?.[2], band?.low_K ?? NaN, 'band low K');
    expectShown(k?.[3], band?.high_K ?? NaN, 'band high K');
  });

  it('no SI unit is left in the numbers of the US text (only in the models’ own descriptions, which the JSON carries)', () => {
    const numeric = usText.split('\n').filter((l) => !/^\s{4}/.test(l) && !/^ {2}(the |uniform |fins as |exposed-plate)/.test(l) && !l.startsWith('  - '));
    expect(numeric.filter((l) => /\d/.test(l)).length).toBeGreaterThan(12);
    for (const l of numeric) expect(l, l).not.toMatch(/\bdegC\b|\[K\]|\bK\/W\b|\d W\b|\[W\]|\d mm\b/);
  });

  it('--units si prints the JSON values themselves: degC, W, K, K/W and lengths in m', () => {
    const si = formatSinkCheck(sinkOf(siSinkText, 'si.yaml'), json, displaySystem('si'));
    const chip = json.sources[0] as SinkCheckReport['sources'][number];
    expect(lineWith(si, /^ {2}chip +\d/)).toContain(`${chip.meanTemperature_degC.toFixed(2)}`);
    expect(si).toContain(`sink resistance ${json.sinkResistance_KperW.toPrecision(4)} K/W`);
    expect(si).toContain('plate 0.04 m x 0.04 m x 0.004 m');
    expect(si).toContain('interface 0.00003 m^2*K/W');
  });
});

describe('solve on a sink in display units', () => {
  let json: SinkSolveReport;
  beforeAll(async () => {
    const j = await cli('solve', siFile, '--json');
    expect(j.code, j.stderr).toBe(0);
    json = JSON.parse(j.stdout) as SinkSolveReport;
  }, 120_000);

  it('--units us: the table, the plate top, the resistance, the heat and every fin in US units; JSON unchanged by --units', async () => {
    const r = await cli('solve', siFile, '--units', 'us');
    expect(r.code, r.stderr).toBe(0);
    const t = r.stdout;
    expect(t).toBe(formatSinkSolve(sinkOf(siSinkText, 'si.yaml'), json, us));
    expect(t).toMatch(/source\s+power \[BTU\/h\]\s+mean \[degF\]\s+GCI\s+max \[degF\]/);
    for (const s of json.sources) {
      const cells = numbersIn(lineWith(t, new RegExp(`^  ${s.name} +\\d`)));
      expectShown(cells[0], W(s.power_W), 'power');
      expectShown(cells[1], toDegF(s.meanTemperature_degC), 'mean');
      expectShown(cells[3], toDegF(s.maxTemperature_degC), 'max');
    }
    expectShown(/plate top, mean\s+(\S+) degF/.exec(t)?.[1], toDegF(json.plateTopMeanTemperature_degC), 'plate top');
    expectShown(/sink resistance\s+(\S+) degF\*h\/BTU/.exec(t)?.[1], json.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
    const heat = /heat\s+(\S+) BTU\/h in; out through the fins (\S+) BTU\/h, the plate (\S+) BTU\/h/.exec(t);
    expectShown(heat?.[1], W(json.totalHeat_W), 'total');
    expectShown(heat?.[2], W(json.finsHeat_W), 'fins');
    expectShown(heat?.[3], W(json.plateHeat_W), 'plate');
    expect(t).toMatch(/fin\s+heat \[BTU\/h\]\s+GCI\s+root \[degF\]/);
    for (const f of json.fins) {
      const cells = numbersIn(lineWith(t, new RegExp(`^ +${f.index} +\\d+\\.\\d+ `)));
      expectShown(cells[1], W(f.heatRate_W), `fin ${f.index} heat`);
      expectShown(cells[3], toDegF(f.rootTemperature_degC), `fin ${f.index} root`);
    }
    expect((await cli('solve', siFile, '--json', '--units', 'us')).stdout).toBe(`${JSON.stringify(json, null, 2)}\n`);
  }, 120_000);

  it('--units si and mm: the SI values themselves, lengths in m or mm; the default is mm', () => {
    const c = sinkOf(siSinkText, 'si.yaml');
    const si = formatSinkSolve(c, json, displaySystem('si'));
    expect(si).toContain(`plate top, mean  ${json.plateTopMeanTemperature_degC.toFixed(2)} degC`);
    expect(si).toContain(`heat             ${json.totalHeat_W.toPrecision(5)} W in`);
    expect(si).toContain('plate 0.04 m x 0.04 m x 0.004 m');
    expect(formatSinkSolve(c, json, displaySystem('mm'))).toBe(formatSinkSolve(c, json));
    expect(formatSinkSolve(c, json)).toContain('plate 40 mm x 40 mm x 4 mm');
  });

  it('a display key in the case: degF and BTU/h without --units (lengths stay mm, the resistance K/W)', async () => {
    const r = await cli('solve', keyedFile);
    expect(r.code, r.stderr).toBe(0);
    // The same sink as si.yaml: the same numbers.
    const chip = numbersIn(lineWith(r.stdout, /^ {2}chip +\d/));
    expectShown(chip[0], W(15), 'power');
    expectShown(chip[1], toDegF(json.sources[0]?.meanTemperature_degC ?? NaN), 'mean');
    expect(r.stdout).toContain('plate 40 mm x 40 mm x 4 mm');
    expect(r.stdout).toContain(`sink resistance  ${json.sinkResistance_KperW.toPrecision(4)} K/W`);
    expect(r.stdout).toMatch(/fin\s+heat \[BTU\/h\]\s+GCI\s+root \[degF\]/);
  }, 120_000);

  it('a sink written in US units shows US units by default; --units si overrides it', async () => {
    const j = await cli('solve', usFile, '--json');
    const usJson = JSON.parse(j.stdout) as SinkSolveReport;
    const r = await cli('solve', usFile);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stdout).toBe(formatSinkSolve(sinkOf(usSinkText, 'us.yaml'), usJson, us));
    expect(r.stdout).toContain('plate 1.6 in x 1.6 in x 0.16 in');
    expect(r.stdout).toContain('interface 0.0002 h*ft^2*degF/BTU, limit 230 degF');
    expectShown(/sink resistance\s+(\S+) degF\*h\/BTU/.exec(r.stdout)?.[1], usJson.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
    // 51 BTU/h in: 14.95 W in the JSON.
    expectShown(usJson.sources[0]?.power_W.toPrecision(7), 51 * NIST.btuPerHour_W, 'power in the JSON');
    expect(formatSinkSolve(sinkOf(usSinkText, 'us.yaml'), usJson, displaySystem('si'))).toContain(`${usJson.totalHeat_W.toPrecision(5)} W in`);
  }, 120_000);
});

describe('map on a sink in display units', () => {
  it("--units us: the axes and the case's resistance and hottest point in US units; map.json stays SI", async () => {
    const out = join(dir, 'map');
    const r = await cli(
      'map',
      siFile,
      '--x',
      'plate.thickness=3mm:5mm',
      '--y',
      'convection.h=30:50',
      '--steps',
      '2x2',
      '--jobs',
      '1',
      '--out',
      out,
      '--units',
      'us',
    );
    expect(r.code, r.stderr).toBe(0);
    const manifest = JSON.parse(readFileSync(join(out, 'map.json'), 'utf8')) as {
      casePoint: { reference: { sinkResistance_KperW: number; maxTemperature_degC: number } };
    };
    const ref = manifest.casePoint.reference;
    const line = lineWith(r.stdout, 'This case (');
    expectShown(/plate\.thickness = (\S+) in/.exec(line)?.[1], 0.004 / NIST.inch_m, 'x');
    expectShown(/convection\.h = (\S+) BTU\/\(h\*ft\^2\*degF\)/.exec(line)?.[1], 40 / NIST.h_W_per_m2K, 'y');
    expectShown(/sink resistance (\S+) degF\*h\/BTU/.exec(line)?.[1], ref.sinkResistance_KperW / NIST.degFHourPerBtu_KperW, 'resistance');
    expectShown(/hottest point (\S+) degF/.exec(line)?.[1], toDegF(ref.maxTemperature_degC), 'hottest point');
    expect(r.stdout).toMatch(/x: plate\.thickness from 0\.11811\d* in to 0\.19685\d* in/);
  }, 240_000);
});
