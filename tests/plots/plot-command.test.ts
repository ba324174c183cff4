/**
 * `fincheck plot` driven with real argv in-process: files, sizes, formats, JSON, and the refusals
 * (exit 2, a message naming the option or the profile, nothing written). The demo case is invented data.
 */
import { mkdtempSync, rmSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readPngDpi } from '../../src/images/index.js';
import { cli } from '../cli/run.js';
import { decodePng, svgTexts, wellFormednessError } from '../images/helpers.js';

const demoDir = join(import.meta.dirname, '../../demo');
const demo = join(demoDir, 'inverter-plate-fin.yaml');
let dir: string;

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'fincheck-plot-'));
});

afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

/** A fresh empty folder for one test. */
function folder(name: string): string {
  return mkdtempSync(join(dir, `${name}-`));
}

describe('fincheck plot writes the chart asked for', () => {
  it('profile PNG at the default 1200 x 750, the same bytes on a second run', async () => {
    const out = folder('profile');
    const a = await cli('plot', demo, '--out', join(out, 'a.png'), '--reference', '1d');
    const b = await cli('plot', demo, '--out', join(out, 'b.png'), '--reference', '1d');
    expect(a.code).toBe(0);
    expect(b.code).toBe(0);
    expect(a.stdout).toContain('a.png (PNG 1200 x 750 px, 96 dpi)');
    const bytes = readFileSync(join(out, 'a.png'));
    const img = decodePng(bytes);
    expect([img.width, img.height]).toEqual([1200, 750]);
    expect(bytes.equals(readFileSync(join(out, 'b.png')))).toBe(true);
  });

  it('--width/--height set the size and --dpi scales the raster and records the resolution', async () => {
    const out = folder('size');
    expect((await cli('plot', demo, '--out', join(out, 's.png'), '--width', '800', '--height', '500', '--reference', '1d')).code).toBe(0);
    expect(decodePng(readFileSync(join(out, 's.png')))).toMatchObject({ width: 800, height: 500 });
    expect((await cli('plot', demo, '--out', join(out, 'p.png'), '--dpi', '192', '--reference', '1d')).code).toBe(0);
    const print = readFileSync(join(out, 'p.png'));
    expect(decodePng(print)).toMatchObject({ width: 2400, height: 1500 });
    // pHYs stores pixels per metre as an integer: 192 dpi = 7559.06 px/m -> 7559, read back to 0.01 dpi.
    expect(readPngDpi(print)).toBeCloseTo(192, 1);
  });

  it('an .svg name gives well-formed SVG with the axis titles and the legend', async () => {
    const out = folder('svg');
    const r = await cli('plot', demo, '--out', join(out, 'f.svg'), '--kind', 'flux');
    expect(r.code).toBe(0);
    const svg = readFileSync(join(out, 'f.svg'), 'utf8');
    expect(wellFormednessError(svg)).toBeNull();
    const texts = svgTexts(svg);
    expect(texts).toEqual(
      expect.arrayContaining(['Distance from the base x (mm)', 'Heat flow Q (W)', 'Heat lost q′ (W/m)', 'fd-2d (reference)', 'tanh-L', 'fd-1d']),
    );
  });

  it('--kind heatmap draws the fd-2d field; --json describes the file', async () => {
    const out = folder('heat');
    const r = await cli('plot', join(demoDir, 'motor-housing-tapered-fin.yaml'), '--kind', 'heatmap', '--out', join(out, 'h.png'), '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(doc).toMatchObject({ kind: 'heatmap', format: 'png', width_px: 1200, height_px: 750, dpi: 96, reference: 'fd-2d' });
    expect(decodePng(readFileSync(join(out, 'h.png')))).toMatchObject({ width: 1200, height: 750 });
  });
});

/** A case file written into `d` (invented data). */
function caseFile(d: string, name: string, text: string): string {
  const path = join(d, name);
  writeFileSync(path, text);
  return path;
}

describe('fincheck plot refuses bad requests with exit 2 and writes nothing', () => {
  const refusals: [string, string[], RegExp][] = [
    ['an unknown kind', ['--kind', 'contour'], /--kind: got "contour"; expected profile, flux, heatmap/],
    ['an unknown format', ['--out', 'chart.jpg'], /--out: got ".*chart.jpg"; expected a file name ending in .png or .svg/],
    ['a missing folder', ['--out', 'no-such-folder/chart.png'], /--out: the folder .*no-such-folder does not exist/],
    ['a tiny width', ['--width', '10'], /--width: got "10"/],
    ['a dpi for an SVG', ['--out', 'chart.svg', '--dpi', '300'], /--dpi: applies to PNG output only/],
    ['a raster too large', ['--width', '8000', '--height', '8000', '--dpi', '600'], /Mpx/],
  ];
  it.each(refusals)('%s', async (_what, args, message) => {
    const out = folder('refuse');
    const argv = ['plot', demo, '--out', join(out, 'chart.png'), ...args].map((a) =>
      a === 'chart.jpg' || a === 'chart.svg' || a.startsWith('no-such') ? join(out, a) : a,
    );
    const r = await cli(...argv);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(readdirSync(out)).toEqual([]);
  });

  it('no --out at all', async () => {
    const r = await cli('plot', demo);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--out: a file name ending in .png or .svg is required');
  });

  it('a heat map of a fin the 2-D model does not cover (a nonlinear infinite tip) names the profile and the reason', async () => {
    const out = folder('uncovered');
    const file = caseFile(
      out,
      'natural.yaml',
      'name: natural convection\nfin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }\nmaterial: { k: 200 }\nconvection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: infinite }\nbase: { temperature: 80 degC }\n',
    );
    const r = await cli('plot', file, '--kind', 'heatmap', '--out', join(out, 'h.png'));
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(
      /--kind heatmap: the 2-D model does not cover this rectangular fin: an infinite tip of a nonlinear fin is not modelled in 2-D/,
    );
    expect(readdirSync(out)).toEqual(['natural.yaml']);
  });

  it('--reference 2d on a nonlinear fin outside the 2-D model (infinite tip): the check’s own refusal passes through', async () => {
    const out = folder('nonlinear');
    const file = caseFile(
      out,
      'natural.yaml',
      'name: natural convection\nfin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }\nmaterial: { k: 200 }\nconvection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: infinite }\nbase: { temperature: 80 degC }\n',
    );
    const r = await cli('plot', file, '--out', join(out, 'p.png'), '--reference', '2d');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--reference 2d: an infinite tip of a nonlinear fin is not modelled in 2-D');
    expect(readdirSync(out)).toEqual(['natural.yaml']);
  });
});

describe('nonlinear fins', () => {
  it('profile and flux charts of a power-law h fin (fd-2d Newton reference, fd-1d and the shortcuts at the base h)', async () => {
    const out = folder('nonlinear-ok');
    const file = caseFile(
      out,
      'natural.yaml',
      'name: natural convection\nfin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }\nmaterial: { k: 200 }\nconvection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: convective }\nbase: { temperature: 80 degC }\n',
    );
    const r = await cli('plot', file, '--out', join(out, 'p.svg'), '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as { models: string[]; reference: string };
    expect(doc.reference).toBe('fd-2d');
    expect(doc.models).toEqual(expect.arrayContaining(['fd-1d', 'tanh-L', 'convective-tip']));
    const texts = svgTexts(readFileSync(join(out, 'p.svg'), 'utf8'));
    expect(texts.some((t) => t.includes('h and k at the base temperature'))).toBe(true);
    expect((await cli('plot', file, '--kind', 'flux', '--out', join(out, 'f.png'))).code).toBe(0);
  });
});
