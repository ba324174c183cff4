/**
 * The chart fonts' subsets (src/images/chart-font-subset.ts) against the full DejaVu fonts they are cut from: every
 * character of CHART_FONT_RANGES that a full font has is in its subset with the same advance width (the fonts' hmtx and
 * cmap tables, font-tables.ts), and resvg draws all of them with the subsets exactly as with the full fonts (the same
 * PNG bytes: the same outlines and kerning). A chart with a character outside the subsets gets the full fonts.
 */
import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { CHART_FONT_RANGES, inChartFontSubset } from '../../src/images/chart-font-subset.js';
import { fontFiles, fontFilesFor, subsetFontFiles, svgToPng } from '../../src/images/render.js';
import { fontFamily } from '../../src/images/text-metrics.js';
import { readFont } from './font-tables.js';
import { countPixels, decodePng, isDark } from './helpers.js';

const { Resvg } = createRequire(import.meta.url)('@resvg/resvg-js') as typeof import('@resvg/resvg-js');

function covered(): string[] {
  const chars: string[] = [];
  for (const [lo, hi] of CHART_FONT_RANGES) for (let c = lo; c <= hi; c++) chars.push(String.fromCharCode(c));
  return chars;
}

const escapeXml = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');

describe('chart font subsets', () => {
  const full = fontFiles();
  const subsets = subsetFontFiles();

  it('lie beside the renderer (src/images/fonts)', () => {
    expect(subsets?.map((f) => f.split('/').pop())).toEqual(['DejaVuSans-subset.ttf', 'DejaVuSans-Bold-subset.ttf']);
  });

  it('hold every listed character of the full fonts, with its advance width', () => {
    for (let k = 0; k < 2; k++) {
      const whole = readFont(full[k] as string);
      const cut = readFont((subsets as string[])[k] as string);
      const present = covered().filter((ch) => whole.has(ch));
      // DejaVu Sans has most of these ranges (about 500 characters); a subset missing one would fail below.
      expect(present.length).toBeGreaterThan(400);
      for (const ch of present) {
        expect([ch, cut.has(ch)]).toEqual([ch, true]);
        expect([ch, cut.width(ch)]).toEqual([ch, whole.width(ch)]);
      }
    }
  });

  it('draw those characters, regular and bold, as the full fonts do, pixel for pixel', () => {
    const present = covered().filter((ch) => readFont(full[0] as string).has(ch));
    const lines: string[] = [];
    for (let i = 0; i < present.length; i += 40) lines.push(present.slice(i, i + 40).join(''));
    const text = lines
      .map((line, i) => `<text x="4" y="${20 + 22 * i}" font-size="16"${i % 2 === 1 ? ' font-weight="bold"' : ''}>${escapeXml(line)}</text>`)
      .join('');
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="700" height="${30 + 22 * lines.length}" font-family="${fontFamily}"><rect width="100%" height="100%" fill="#fff"/>${text}</svg>`;
    const render = (files: string[]): Buffer =>
      new Resvg(svg, { font: { loadSystemFonts: false, fontFiles: files, defaultFontFamily: fontFamily }, logLevel: 'off' }).render().asPng();
    const withSubsets = render(subsets as string[]);
    expect(withSubsets.equals(render(full))).toBe(true);
    // And text was drawn: hundreds of glyphs of dozens of dark pixels each.
    expect(countPixels(decodePng(withSubsets), 0, 0, 700, 30 + 22 * lines.length, isDark)).toBeGreaterThan(5000);
  });

  it('serve a chart whose characters they hold; the full fonts serve any other', async () => {
    expect(fontFilesFor('<text>Tip 53 \u00b0C, \u03b7 = 0.82 \u00b1 2 %</text>')).toEqual(subsets);
    const cyrillic =
      '<svg xmlns="http://www.w3.org/2000/svg" width="80" height="60" font-family="DejaVu Sans"><text x="10" y="45" font-size="40">\u0416</text></svg>';
    expect(fontFilesFor(cyrillic)).toEqual(full);
    // The character outside the subsets is drawn (resvg draws nothing for a glyph no font has).
    expect(countPixels(decodePng(await svgToPng(cyrillic)), 0, 0, 80, 60, isDark)).toBeGreaterThan(100);
  });

  it('inChartFontSubset: tabs and line ends pass; a character outside the ranges or beyond the BMP does not', () => {
    expect(inChartFontSubset('a\tb\r\nc \u2264 \u221e')).toBe(true);
    expect(inChartFontSubset('\u0416')).toBe(false);
    expect(inChartFontSubset('\u{1f525}')).toBe(false);
    expect(inChartFontSubset('\u0001')).toBe(false);
  });
});
