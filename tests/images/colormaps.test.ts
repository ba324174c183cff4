import { describe, expect, it } from 'vitest';
import { colormapHex, colormapLut, colormapRgb, colormapUnitRgb, getColormap, type ColormapName } from '../../src/images/colormaps.js';
import { cividisTable, viridisTable } from '../../src/images/colormap-tables.js';

/** CIE 1976 L* of an sRGB colour (components 0..1): sRGB transfer per IEC 61966-2-1 (1999), Y with Rec. 709 weights. */
function lightness([r, g, b]: readonly number[]): number {
  const lin = (c: number): number => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4);
  const y = 0.2126 * lin(r ?? 0) + 0.7152 * lin(g ?? 0) + 0.0722 * lin(b ?? 0);
  const f = y > (6 / 29) ** 3 ? Math.cbrt(y) : y / (3 * (6 / 29) ** 2) + 4 / 29;
  return 116 * f - 16;
}

describe('published colour-map tables', () => {
  // Endpoints as published: viridis, van der Walt & Smith (2015), matplotlib _viridis_data rows 0 and 255
  // (#440154 and #fde725, the 8-bit values commonly quoted for viridis); cividis, Nuñez, Anderton & Renslow (2018),
  // matplotlib _cividis_data rows 0 and 255 (the hex strings here are just their 8-bit rounding).
  it.each<[ColormapName, number[], number[], string, string]>([
    ['viridis', [0.267004, 0.004874, 0.329415], [0.993248, 0.906157, 0.143936], '#440154', '#fde725'],
    ['cividis', [0.0, 0.135112, 0.304751], [0.995737, 0.909344, 0.217772], '#00224e', '#fee838'],
  ])('%s endpoints equal the published values', (name, low, high, lowHex, highHex) => {
    const map = getColormap(name);
    // Exact: the anchors are the table itself; t = 0 and 1 hit table rows 0 and 255 with weight 1.
    expect(colormapUnitRgb(map, 0)).toEqual(low);
    expect(colormapUnitRgb(map, 1)).toEqual(high);
    expect(colormapHex(map, 0)).toBe(lowHex);
    expect(colormapHex(map, 1)).toBe(highHex);
  });

  it('each sequential table has 256 entries (the published length)', () => {
    expect(viridisTable.length).toBe(256 * 3);
    expect(cividisTable.length).toBe(256 * 3);
  });

  // Transcription guard: both maps were designed with lightness increasing monotonically from the low end
  // (van der Walt & Smith 2015; Nuñez et al. 2018; from memory, figure numbers not checked).
  // A mistyped digit would break this or the smoothness.
  it.each<ColormapName>(['viridis', 'cividis'])('%s: L* rises monotonically and smoothly', (name) => {
    const table = name === 'viridis' ? viridisTable : cividisTable;
    let previous = -Infinity;
    for (let k = 0; k < 256; k++) {
      const rgb = table.slice(3 * k, 3 * k + 3);
      const l = lightness(rgb);
      expect(l).toBeGreaterThan(previous);
      // Over 256 steps L* climbs ~15 -> ~92, i.e. ~0.3 per step; 1.0 would flag a wrong digit in the first decimal.
      if (k > 0) expect(l - previous).toBeLessThan(1.0);
      previous = l;
    }
  });

  // ColorBrewer (Brewer 2003) 11-class diverging schemes: ends and the neutral middle class #f7f7f7.
  it.each<[ColormapName, string, string]>([
    ['rdbu', '#67001f', '#053061'],
    ['puor', '#7f3b08', '#2d004b'],
  ])('%s: ends and centre are the ColorBrewer classes', (name, low, high) => {
    const map = getColormap(name);
    expect(colormapHex(map, 0)).toBe(low);
    expect(colormapHex(map, 1)).toBe(high);
    expect(colormapHex(map, 0.5)).toBe('#f7f7f7');
    expect(map.kind).toBe('diverging');
  });

  it('diverging maps are lightest at the centre and darken towards both ends', () => {
    for (const name of ['rdbu', 'puor'] as const) {
      const map = getColormap(name);
      const l = [0, 0.25, 0.5, 0.75, 1].map((t) => lightness(colormapUnitRgb(map, t)));
      expect(l[0]).toBeLessThan(l[1] as number);
      expect(l[1]).toBeLessThan(l[2] as number);
      expect(l[3]).toBeLessThan(l[2] as number);
      expect(l[4]).toBeLessThan(l[3] as number);
    }
  });

  it('reversing swaps the ends', () => {
    const forward = getColormap('rdbu');
    const reversed = getColormap('rdbu', true);
    expect(colormapRgb(reversed, 0)).toEqual(colormapRgb(forward, 1));
    expect(colormapRgb(reversed, 0.3)).toEqual(colormapRgb(forward, 0.7));
  });

  it('clamps t outside [0, 1] and the lookup table matches the direct colours', () => {
    const map = getColormap('viridis');
    expect(colormapRgb(map, -3)).toEqual(colormapRgb(map, 0));
    expect(colormapRgb(map, 7)).toEqual(colormapRgb(map, 1));
    const lut = colormapLut(map, 5);
    expect([...lut.slice(6, 9)]).toEqual(colormapRgb(map, 0.5));
  });
});
