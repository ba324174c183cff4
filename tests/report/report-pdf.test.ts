/**
 * `report --pdf`: an A4 PDF that opens, holds the report's text (cautions, check table, every model, the ledger),
 * draws the charts as vector graphics (their axis titles and legend entries come back as text, which a raster
 * image would not give), embeds its font, and renders. Checked with Debian's poppler-utils (pdfinfo, pdftotext,
 * pdffonts, pdftoppm), which .ci/run installs. The case is the demo's invented inverter fin.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { PNG } from 'pngjs';
import { beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';

const demo = 'demo/inverter-plate-fin.yaml';

function poppler(tool: string, args: string[]): string {
  const r = spawnSync(tool, args, { encoding: 'utf8' });
  if (r.error) throw new Error(`${tool} is needed for this test: install Debian's poppler-utils (.ci/run does)`);
  expect(r.status, r.stderr).toBe(0);
  return r.stdout;
}

describe('report --pdf', () => {
  const out = mkdtempSync(join(tmpdir(), 'fincheck-pdf-'));
  const pdf = join(out, 'report.pdf');
  let stdout = '';
  let text = '';
  beforeAll(async () => {
    const r = await cli('report', demo, '--out', out, '--date', '2025-01-01', '--pdf', '--json');
    expect(r.code, r.stderr).toBe(0);
    stdout = r.stdout;
    text = poppler('pdftotext', ['-layout', pdf, '-']);
  }, 120_000);

  it('is listed with the other files and written beside them', () => {
    expect(JSON.parse(stdout)).toMatchObject({ pdf, html: join(out, 'report.html') });
    expect(existsSync(pdf)).toBe(true);
  });

  it('is A4, carries its title and the report date, and numbers its pages', () => {
    const info = poppler('pdfinfo', [pdf]);
    expect(info).toMatch(/Page size:\s+595\.28 x 841\.89 pts \(A4\)/);
    expect(info).toMatch(/Title:\s+Fin check: Traction-inverter sink, outer fin/);
    expect(info).toMatch(/CreationDate:\s+Wed Jan\s+1 00:00:00 2025/);
    const pages = Number(/Pages:\s+(\d+)/.exec(info)?.[1]);
    expect(pages).toBeGreaterThanOrEqual(3);
    expect(text).toContain(`page ${pages} of ${pages}`);
  });

  it('holds the same content as the HTML: cautions first, the check table with every model, the ledger', async () => {
    const check = JSON.parse((await cli('check', demo, '--json')).stdout) as { models: { model: string }[] };
    const cautionsAt = text.indexOf('Cautions');
    expect(cautionsAt).toBeGreaterThan(-1);
    expect(cautionsAt).toBeLessThan(text.indexOf('Shortcuts against the reference'));
    expect(text).toContain('confirm the design by test');
    expect(check.models.length).toBeGreaterThanOrEqual(5);
    for (const { model } of check.models) expect(text).toMatch(new RegExp(`\\n\\s*${model}\\s+\\d`));
    expect(text).toContain('Where the drift comes from');
    expect(text).toContain('Discretisation error');
  });

  it('draws the charts as vector graphics: their axis titles and legends are text', () => {
    expect(text).toContain('Temperature T (°C)');
    expect(text).toContain('Distance from the base x (mm)');
    expect(text).toContain('fd-2d (reference), mid-plane');
  });

  it('embeds its font (no font needed on the reader machine)', () => {
    const fonts = poppler('pdffonts', [pdf]);
    const rows = fonts
      .split('\n')
      .slice(2)
      .filter((l) => l.trim() !== '');
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) expect(row).toMatch(/DejaVuSans.*\byes\b/);
  });

  it('renders a page with ink on it', () => {
    execFileSync('pdftoppm', ['-r', '40', '-png', '-f', '1', '-l', '1', pdf, join(out, 'page')]);
    const png = PNG.sync.read(readFileSync(join(out, 'page-1.png')));
    let dark = 0;
    for (let i = 0; i < png.data.length; i += 4) if ((png.data[i] ?? 255) < 100) dark++;
    expect(png.width).toBeGreaterThan(300);
    expect(dark).toBeGreaterThan(500);
  });

  it('the same inputs give the same bytes', async () => {
    const again = mkdtempSync(join(tmpdir(), 'fincheck-pdf-'));
    expect((await cli('report', demo, '--out', again, '--date', '2025-01-01', '--pdf')).code).toBe(0);
    expect(readFileSync(join(again, 'report.pdf')).equals(readFileSync(pdf))).toBe(true);
  }, 120_000);
});
