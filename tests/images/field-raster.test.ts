import { describe, expect, it } from 'vitest';
import { rasterizeStructuredField } from '../../src/images/field-raster.js';

/** Greyscale LUT: entry k = (k, k, k), so the drawn value can be read back from the red channel. */
const grey = new Uint8Array(256 * 3).map((_, k) => Math.floor(k / 3));

function gridOver(ni: number, nj: number, x0: number, x1: number, y0: number, y1: number) {
  const px = new Float64Array(ni * nj),
    py = new Float64Array(ni * nj);
  for (let j = 0; j < nj; j++)
    for (let i = 0; i < ni; i++) {
      px[i + j * ni] = x0 + ((x1 - x0) * i) / (ni - 1);
      py[i + j * ni] = y0 + ((y1 - y0) * j) / (nj - 1);
    }
  return { layout: { ni, nj, offset: 0, strideI: 1, strideJ: ni }, px, py };
}

describe('structured-grid rasterisation', () => {
  it.each([
    [2, 2],
    [5, 3],
    [41, 11],
  ])('a %d x %d grid over [10,30] x [10,20] fills exactly its 200 pixel centres, no gaps', (ni, nj) => {
    const g = gridOver(ni, nj, 10, 30, 10, 20);
    const values = new Float64Array(ni * nj).fill(1);
    const img = rasterizeStructuredField(g.layout, g.px, g.py, values, 40, 30, { lut: grey, low: 0, high: 2 });
    let filled = 0;
    for (let y = 0; y < 30; y++)
      for (let x = 0; x < 40; x++) {
        const inside = x >= 10 && x < 30 && y >= 10 && y < 20;
        const alpha = img.data[4 * (y * 40 + x) + 3];
        expect([x, y, alpha]).toEqual([x, y, inside ? 255 : 0]);
        if (inside) filled++;
      }
    expect(filled).toBe(200);
  });

  it('interpolates a linear field exactly (to the lookup-table step)', () => {
    const g = gridOver(7, 4, 0, 255, 0, 10);
    const values = g.px.map((x) => x); // value = pixel x coordinate
    const img = rasterizeStructuredField(g.layout, g.px, g.py, values, 255, 10, { lut: grey, low: 0, high: 255 });
    for (const x of [0, 17, 100, 254]) {
      // Pixel centre x + 0.5 -> LUT index round(x + 0.5); one LUT step of tolerance for the rounding.
      expect(Math.abs((img.data[4 * (5 * 255 + x)] as number) - (x + 0.5))).toBeLessThanOrEqual(1);
    }
  });

  it('leaves cells with a NaN node transparent', () => {
    const g = gridOver(3, 2, 0, 20, 0, 10);
    const values = new Float64Array([1, 1, Number.NaN, 1, 1, 1]);
    const img = rasterizeStructuredField(g.layout, g.px, g.py, values, 20, 10, { lut: grey, low: 0, high: 2 });
    expect(img.data[4 * (5 * 20 + 5) + 3]).toBe(255); // left cell
    expect(img.data[4 * (5 * 20 + 15) + 3]).toBe(0); // right cell touches the NaN node
  });
});
