/**
 * `fincheck report` driven with real argv in-process: the files, what the HTML and Markdown say (case
 * inputs with units, check table, ledger, flags, cautions first, plots, discretisation error, version,
 * date), the same bytes for the same input and date, and the refusals (exit 2, nothing written).
 * The demo case is invented data; nothing here checks its numbers against a published value.
 */
import { existsSync, mkdtempSync, rmSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { CAUTIONS } from '../../src/compare/cautions.js';
import { VERSION } from '../../src/version.js';
import { cli } from '../cli/run.js';
import { decodePng } from '../images/helpers.js';

const demo = join(import.meta.dirname, '../../demo/inverter-plate-fin.yaml');
let root: string;
let out: string;
let html: string;
let markdown: string;
let stdout: string;

beforeAll(async () => {
  root = mkdtempSync(join(tmpdir(), 'fincheck-report-'));
  out = join(root, 'first');
  const r = await cli('report', demo, '--out', out, '--date', '2025-01-01');
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  stdout = r.stdout;
  html = readFileSync(join(out, 'report.html'), 'utf8');
  markdown = readFileSync(join(out, 'report.md'), 'utf8');
});

afterAll(() => {
  rmSync(root, { recursive: true, force: true });
});

/** expect(haystack).toContain(needle) without printing a 600 kB report when it fails. */
function has(haystack: string, needle: string): void {
  if (!haystack.includes(needle)) expect.fail(`missing ${JSON.stringify(needle)}`);
}

afterEach(() => {
  vi.unstubAllEnvs();
});

describe('fincheck report writes an HTML and a Markdown report with the charts beside them', () => {
  it('lists the files it wrote; every chart is a 1200 x 750 PNG', () => {
    for (const f of ['report.html', 'report.md', 'profile.png', 'flux.png', 'heatmap.png']) {
      expect(stdout).toContain(join(out, f));
      expect(existsSync(join(out, f))).toBe(true);
    }
    for (const f of ['profile.png', 'flux.png', 'heatmap.png']) expect(decodePng(readFileSync(join(out, f)))).toMatchObject({ width: 1200, height: 750 });
  });

  it('HTML is self-contained: the three PNGs inline (the same bytes as the files), no scripts, no outside links', () => {
    const images = [...html.matchAll(/<img src="data:image\/png;base64,([A-Za-z0-9+/=]+)"/g)].map((m) => Buffer.from(m[1] ?? '', 'base64'));
    expect(images).toHaveLength(3);
    ['profile.png', 'flux.png', 'heatmap.png'].forEach((f, k) => expect(images[k]?.equals(readFileSync(join(out, f)))).toBe(true));
    expect(/<script|<link|src="http|url\(http/i.test(html)).toBe(false);
    has(html, '@page { size: A4;');
    has(html, '@media print');
  });

  it('states the version, the date, the case inputs with units, and the cautions before any result', () => {
    has(html, `fincheck ${VERSION} · 2025-01-01 · case file inverter-plate-fin.yaml`);
    for (const text of [
      'Traction-inverter sink, outer fin',
      '40 mm',
      '2 mm',
      '80 mm',
      'h = 45 W/(m²·K) uniform',
      '85 °C',
      '35 °C',
      '5.00e-5 m²·K/W',
      '209 W/(m·K)',
    ]) {
      has(html, text);
    }
    const cautions = html.indexOf('Cautions');
    expect(cautions).toBeGreaterThan(0);
    expect(cautions).toBeLessThan(html.indexOf('id="summary"'));
    for (const c of CAUTIONS) has(html, c);
  });

  it('has the check table, the ledger, the flags, the plots and the discretisation error, with units and error estimates', () => {
    for (const heading of ['Shortcuts against the reference', 'Where the drift comes from', 'Flags', 'Plots', 'Discretisation error']) {
      has(html, `<h2>${heading}</h2>`);
    }
    for (const model of ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d']) has(html, `<td class="text">${model}</td>`);
    has(html, '<caption>Reference model fd-2d</caption>');
    has(html, '<th class="num" scope="col">Q (W)</th>');
    has(html, 'Estimated discretisation error of Q');
    has(html, 'one-dimensional conduction');
    expect(/Figure 1\. Temperature T \(°C\)/.test(html)).toBe(true);
    expect(/fd-2d on \d+ × \d+ nodes, Q = [0-9.]+ W/.test(html)).toBe(true);
  });

  it('Markdown says the same with the PNGs linked beside it', () => {
    has(markdown, `fincheck ${VERSION} · 2025-01-01`);
    for (const f of ['profile.png', 'flux.png', 'heatmap.png'])
      expect(new RegExp(`!\\[[^\\]]+\\]\\(${f.replace('.', '\\.')}\\)`).test(markdown)).toBe(true);
    has(markdown, '| Model | Q (W) | Efficiency (–) | Drift of Q | Verdict |');
    has(markdown, '> **Cautions**');
    for (const c of CAUTIONS) has(markdown, c.replace(/[\\`*_[\]<>|#]/g, '\\$&'));
  });

  it('the same input and date give the same bytes; SOURCE_DATE_EPOCH fixes the date as --date does', async () => {
    vi.stubEnv('SOURCE_DATE_EPOCH', '1735689600'); // 2025-01-01T00:00:00Z
    const again = join(root, 'again');
    expect((await cli('report', demo, '--out', again)).code).toBe(0);
    for (const f of ['report.html', 'report.md', 'profile.png', 'flux.png', 'heatmap.png']) {
      expect(readFileSync(join(again, f)).equals(readFileSync(join(out, f)))).toBe(true);
    }
  });
});

describe('fincheck report refuses bad requests with exit 2 and writes nothing', () => {
  it('an impossible date', async () => {
    const dir = join(root, 'bad-date');
    const r = await cli('report', demo, '--out', dir, '--date', '2025-02-30');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--date: got "2025-02-30"; expected a calendar date YYYY-MM-DD');
    expect(existsSync(dir)).toBe(false);
  });

  it('--out naming a file', async () => {
    const file = join(root, 'a-file');
    writeFileSync(file, 'x');
    const r = await cli('report', demo, '--out', file);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('is a file; give a folder');
    expect(readFileSync(file, 'utf8')).toBe('x');
  });

  it('a check that refuses (2-D reference for a nonlinear fin with an infinite tip): its message, and no folder', async () => {
    const caseFile = join(root, 'natural.yaml');
    writeFileSync(
      caseFile,
      'name: natural\nfin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }\nmaterial: { k: 200 }\nconvection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: infinite }\nbase: { temperature: 80 degC }\n',
    );
    const dir = join(root, 'nonlinear');
    const r = await cli('report', caseFile, '--out', dir, '--reference', '2d');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--reference 2d');
    expect(existsSync(dir)).toBe(false);
  });
});

describe('fincheck demo (npm start)', () => {
  it('prints the check, then writes the charts and the report into the folder it names', async () => {
    const dir = join(root, 'demo-output');
    const r = await cli('demo', '--out', dir);
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('fincheck check: Traction-inverter sink, outer fin');
    expect(r.stdout).toContain('Charts and report of this check');
    for (const f of ['report.html', 'report.md', 'profile.png', 'flux.png', 'heatmap.png']) expect(existsSync(join(dir, f))).toBe(true);
    expect(r.stdout.indexOf('Cautions:')).toBeLessThan(r.stdout.indexOf('report.html'));
    // The heat-sink demo next to it: its check printed, its report and three charts in heat-sink/.
    expect(r.stdout).toContain('fincheck check (heat sink): Motor-drive module on an extruded sink');
    for (const f of ['report.html', 'report.md', 'plate.png', 'fin-heat.png', 'fin-profile.png']) expect(existsSync(join(dir, 'heat-sink', f))).toBe(true);
  }, 180_000);
});
