/**
 * `check` with several cases: files, a folder, a quoted glob; the comparison table, --json array, --csv (written
 * atomically, not at all when a case is bad); one bad case among several (exit 2 naming its file and key, the
 * others still checked); the worst exit code; a heat sink's row. All cases are invented.
 */
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseList, expandGlob } from '../../cli/case-list.js';
import { cli, cliWithStdin } from './run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-several-'));
function file(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

mkdirSync(join(tmp, 'variants'));
const base = file(
  'variants/a-base.yaml',
  `name: plate 2 mm
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 }
base: { temperature: 80 degC }
`,
);
const thin = file('variants/b-thin.yaml', 'extends: a-base.yaml\nname: plate 1 mm\nfin: { thickness: 1 mm }\n');
const long = file('variants/c-long.json', '{ "extends": "a-base.yaml", "name": "plate long", "fin": { "length": "60 mm" } }\n');
file('variants/notes.txt', 'not a case\n');
const bad = file('bad.yaml', 'extends: variants/a-base.yaml\nname: bad\nfin: { thickness: 0 mm }\n');
const sink = file(
  'sink.yaml',
  `name: small sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 30 mm, thickness: 4 mm }
sources: [{ power: 10 W, centre: [20 mm, 15 mm], size: [10 mm, 10 mm] }]
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
`,
);

describe('the case list', () => {
  it('a folder gives its yaml, yml and json cases sorted; a quoted glob is expanded here', () => {
    expect(caseList([join(tmp, 'variants')]).files).toEqual([base, thin, long]);
    expect(caseList([join(tmp, 'variants', '*.yaml')])).toEqual({ files: [base, thin], several: true });
    expect(expandGlob(join(tmp, '**', 'b-*.y?ml'))).toEqual([thin]);
    expect(caseList([base])).toEqual({ files: [base], several: false });
  });

  it('a glob matching nothing and an empty folder are exit 2 naming them', async () => {
    const r = await cli('check', join(tmp, 'nothing-*.yaml'));
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('nothing-*.yaml: got a pattern that matches no file');
    mkdirSync(join(tmp, 'empty'));
    const e = await cli('check', join(tmp, 'empty'));
    expect(e.code).toBe(2);
    expect(e.stderr).toContain('got a folder with no case files');
  });
});

describe('check with several cases', () => {
  it('prints one table: a row per case, Q with its unit, a column per model with drift and verdict', async () => {
    const r = await cli('check', join(tmp, 'variants'), '--reference', '1d');
    expect(r.code).toBe(0);
    const lines = r.stdout.split('\n');
    expect(lines[0]).toContain('3 cases');
    expect(lines[1]).toMatch(/case\s+reference\s+Q \[W\]\s+efficiency \[-\]\s+tanh-L\s+tanh-Lc/);
    expect(r.stdout).toMatch(/plate 2 mm\s+fd-1d\s+7\.2037\s+0\.\d{4}\s+[-+]\d\.\d\d % (ok|marginal|unsafe)/);
    expect(r.stdout).toContain('plate 1 mm');
    expect(r.stdout).toContain('plate long');
  });

  it('--json prints the single-case documents in an array, each with its file, equal to check CASE --json', async () => {
    const r = await cli('check', base, thin, '--reference', '1d', '--json');
    const many = JSON.parse(r.stdout) as Record<string, unknown>[];
    const one = JSON.parse((await cli('check', thin, '--reference', '1d', '--json')).stdout) as Record<string, unknown>;
    expect(many).toHaveLength(2);
    expect(many[1]).toEqual({ file: thin, ...one });
  });

  it('one bad case: exit 2 naming its file and key, the others still checked, nothing written to --csv', async () => {
    const csv = join(tmp, 'bad-run.csv');
    const r = await cli('check', base, bad, thin, '--reference', '1d', '--csv', csv);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`${bad}:3:19: fin.thickness: got 0 mm`);
    expect(r.stderr).toContain('not written: 1 of 3 cases could not be checked');
    expect(r.stdout).toContain('plate 2 mm');
    expect(r.stdout).toContain('plate 1 mm');
    expect(r.stdout).toMatch(/bad\.yaml\s+not checked/);
    expect(existsSync(csv)).toBe(false);
  });

  it('the exit code is the worst of the cases (--strict: 1 for an unsafe shortcut, 2 for a bad case above it)', async () => {
    const wide = file('wide.yaml', 'extends: variants/a-base.yaml\nname: thick\nfin: { thickness: 8 mm, length: 10 mm }\nmaterial: { k: 15 }\n');
    const strict = await cli('check', base, wide, '--reference', '1d', '--strict');
    expect(strict.stdout).toContain('unsafe');
    expect(strict.code).toBe(1);
    expect((await cli('check', wide, bad, '--reference', '1d', '--strict')).code).toBe(2);
  });

  it('--csv writes the table with units in the header, and in US units with --units us', async () => {
    const csv = join(tmp, 'table.csv');
    const r = await cli('check', base, thin, '--reference', '1d', '--csv', csv);
    expect(r.code).toBe(0);
    const [header, first] = readFileSync(csv, 'utf8').split('\n');
    expect(header).toMatch(
      /^file,case,kind,reference,Q \[W\],hottest source mean \[degC\],sink resistance \[K\/W\],efficiency \[-\],tanh-L drift \[-\],tanh-L verdict/,
    );
    expect(first).toMatch(new RegExp(`^${base.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')},plate 2 mm,fin,fd-1d,7\\.2037`));
    const us = join(tmp, 'table-us.csv');
    await cli('check', base, thin, '--reference', '1d', '--csv', us, '--units', 'us');
    const usLines = readFileSync(us, 'utf8').split('\n');
    expect(usLines[0]).toContain('Q [BTU/h]');
    // 7.2037 W = 24.58 BTU/h (1 BTU_IT/h = 0.2930711 W, NIST SP 811 (2008) Appendix B.8).
    expect(Number(usLines[1]?.split(',')[4])).toBeCloseTo(7.2037 / 0.2930711, 2);
  });

  it('a heat sink gets its row: hottest source mean temperature and sink resistance, the array shortcuts as columns', async () => {
    const table = await cli('check', base, sink);
    expect(table.code).toBe(0);
    expect(table.stdout).toMatch(/hottest source mean \[degC\]\s+sink resistance \[K\/W\]/);
    expect(table.stdout).toMatch(/small sink\s+fd-3d\s+-\s+\d+\.\d\d\s+\d/);
    expect(table.stdout).toContain('spreading-series');
  });

  it('standard input can be one of the cases, once', async () => {
    const text = readFileSync(base, 'utf8');
    const r = await cliWithStdin(text, 'check', '-', thin, '--reference', '1d', '--json');
    expect(r.code).toBe(0);
    expect((JSON.parse(r.stdout) as { file: string }[]).map((d) => d.file)).toEqual(['-', thin]);
    const twice = await cli('check', '-', '-');
    expect(twice.code).toBe(2);
    expect(twice.stderr).toContain('standard input can be read once');
  });

  it('one case prints exactly what it printed before (no table)', async () => {
    const r = await cli('check', base, '--reference', '1d');
    expect(r.stdout.startsWith('fincheck check: plate 2 mm\n  rectangular fin, length 30 mm, thickness 2 mm, width 50 mm, cooled edges\n')).toBe(true);
    expect(r.stdout).toContain('Reference (fd-1d): heat rate 7.2037 W');
  });
});

describe('the demo variants (README)', () => {
  it('check demo/inverter-plate-fin.yaml demo/variants/ compares the demo fin and its two variants', async () => {
    const r = await cli('check', 'demo/inverter-plate-fin.yaml', 'demo/variants/', '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('3 cases');
    expect(r.stdout).toContain('Inverter fin, 1.5 mm');
    expect(r.stdout).toContain('Inverter fin, 60 mm long');
  });
});

describe('report with several cases', () => {
  it('writes one report comparing them: the cases and verdicts side by side, the profiles overlaid', async () => {
    const out = join(tmp, 'compare-report');
    const r = await cli('report', base, thin, '--reference', '1d', '--out', out, '--date', '2026-01-01');
    expect(r.code).toBe(0);
    const md = readFileSync(join(out, 'report.md'), 'utf8');
    expect(md).toContain('# Fin check: 2 cases compared');
    expect(md).toMatch(/\| plate 2 mm \| .*a-base\.yaml \| fd-1d \| 7\.2037 \|/);
    expect(md).toContain('| Model | plate 2 mm | plate 1 mm |');
    expect(md).toContain('profiles.png');
    expect(existsSync(join(out, 'profiles.png'))).toBe(true);
    expect(readFileSync(join(out, 'report.html'), 'utf8')).toContain('Verdicts side by side');
  });

  it('a bad case: exit 2 naming it, and no report written', async () => {
    const out = join(tmp, 'compare-bad');
    const r = await cli('report', base, bad, '--reference', '1d', '--out', out);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain(`${bad}:3:19: fin.thickness`);
    expect(r.stderr).toContain('no report written: 1 of 2 cases could not be checked');
    expect(existsSync(out)).toBe(false);
  });
});
