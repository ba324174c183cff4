/**
 * The width table in text-metrics.ts against the font file itself: the TrueType hmtx table
 * (advance widths) reached through the cmap format-4 subtable (platform 3, encoding 1), as laid
 * out in Apple's TrueType Reference Manual and the OpenType specification (Microsoft), chapters
 * "cmap", "hhea", "hmtx", "head".
 */
import { describe, expect, it } from 'vitest';
import { fontFiles } from '../../src/images/render.js';
import { readFont } from './font-tables.js';
import { advanceWidths, fontAscender, fontDescender, measuredChars, textWidth, unitsPerEm, wrapText } from '../../src/images/text-metrics.js';

describe('text metrics', () => {
  const font = readFont(fontFiles()[0]!);

  it('the tabulated advance widths are those of DejaVuSans.ttf', () => {
    expect(font.unitsPerEm).toBe(unitsPerEm);
    expect([font.ascender, font.descender]).toEqual([fontAscender, fontDescender]);
    const chars = [...measuredChars];
    expect(advanceWidths).toHaveLength(chars.length);
    chars.forEach((ch, k) => {
      expect(font.has(ch)).toBe(true);
      expect([ch, font.width(ch)]).toEqual([ch, advanceWidths[k]]);
    });
  });

  it('measures strings at a font size', () => {
    // Digits are 1303 units wide in DejaVu Sans: "10" at 16 px = 2 * 1303 / 2048 * 16.
    expect(textWidth('10', 16)).toBeCloseTo((2 * 1303 * 16) / 2048, 12);
  });

  it('wraps words to a width without splitting them', () => {
    const lines = wrapText('one two three four five six seven', 16, 80);
    expect(lines.join(' ')).toBe('one two three four five six seven');
    for (const l of lines) if (l.includes(' ')) expect(textWidth(l, 16)).toBeLessThanOrEqual(80);
    expect(lines.length).toBeGreaterThan(1);
  });
});
