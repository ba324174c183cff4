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

/**
 * The rasteriser tests only the pixels of each row that its per-row bounds leave (field-raster.ts); the reference here
 * tests every pixel of each triangle's bounding box with the same inside test, as the rasteriser did before. Both must
 * fill the same pixels with the same colours: on skewed, thin and pixel-aligned cells, whose edges and vertices fall on
 * pixel centres, and on a grid whose cells are far smaller than a pixel.
 */
function boundingBoxReference(
  layout: { ni: number; nj: number; offset: number; strideI: number; strideJ: number },
  px: Float64Array,
  py: Float64Array,
  values: Float64Array,
  width: number,
  height: number,
): Uint8Array {
  const data = new Uint8Array(4 * width * height);
  const fill = (a: number, b: number, c: number): void => {
    const [ax, ay, bx, by, cx, cy] = [px[a], py[a], px[b], py[b], px[c], py[c]] as number[] as [number, number, number, number, number, number];
    const area = (bx - ax) * (cy - ay) - (cx - ax) * (by - ay);
    if (area === 0 || !Number.isFinite(area)) return;
    const x0 = Math.max(0, Math.floor(Math.min(ax, bx, cx) - 0.5));
    const x1 = Math.min(width - 1, Math.ceil(Math.max(ax, bx, cx) - 0.5));
    const y0 = Math.max(0, Math.floor(Math.min(ay, by, cy) - 0.5));
    const y1 = Math.min(height - 1, Math.ceil(Math.max(ay, by, cy) - 0.5));
    const inv = 1 / area;
    for (let y = y0; y <= y1; y++) {
      const sy = y + 0.5;
      for (let x = x0; x <= x1; x++) {
        const sx = x + 0.5;
        const wa = ((bx - sx) * (cy - sy) - (cx - sx) * (by - sy)) * inv;
        const wb = ((cx - sx) * (ay - sy) - (ax - sx) * (cy - sy)) * inv;
        const wc = 1 - wa - wb;
        if (wa < -1e-9 || wb < -1e-9 || wc < -1e-9) continue;
        const v = wa * (values[a] as number) + wb * (values[b] as number) + wc * (values[c] as number);
        const k = Math.min(255, Math.max(0, Math.round(v * 255)));
        const o = 4 * (y * width + x);
        data[o] = grey[3 * k] as number;
        data[o + 1] = grey[3 * k + 1] as number;
        data[o + 2] = grey[3 * k + 2] as number;
        data[o + 3] = 255;
      }
    }
  };
  for (let j = 0; j + 1 < layout.nj; j++) {
    for (let i = 0; i + 1 < layout.ni; i++) {
      const n00 = layout.offset + i * layout.strideI + j * layout.strideJ;
      fill(n00, n00 + layout.strideI, n00 + layout.strideI + layout.strideJ);
      fill(n00, n00 + layout.strideI + layout.strideJ, n00 + layout.strideJ);
    }
  }
  return data;
}

describe('per-row bounds of the rasteriser', () => {
  /** A deterministic pseudo-random number in [0, 1) (a linear congruential generator; Numerical Recipes' constants). */
  function random(seed: number): () => number {
    let s = seed >>> 0;
    return () => {
      s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
      return s / 4294967296;
    };
  }

  const grids: [string, number, number, (i: number, j: number, r: () => number) => [number, number]][] = [
    ['pixel-aligned 41 x 41 over 963 x 565 px', 41, 41, (i, j) => [0.5 + (962 * i) / 40, 0.5 + (564 * j) / 40]],
    ['integer corners 9 x 7', 9, 7, (i, j) => [10 * i, 10 * j]],
    ['skewed and jittered 15 x 12', 15, 12, (i, j, r) => [20 + 13 * i + 5 * j + 3 * r(), 15 + 9 * j + 0.5 * i + 3 * r()]],
    ['thin cells 200 x 3', 200, 3, (i, j, r) => [2 + 1.3 * i + 0.01 * r(), 40 + 0.3 * j + 1e-3 * r()]],
    ['cells smaller than a pixel 60 x 60', 60, 60, (i, j) => [100 + 0.07 * i, 100 + 0.05 * j + 0.01 * i]],
  ];
  it.each(grids)('%s: the same pixels as testing every pixel of each bounding box', (_name, ni, nj, at) => {
    const r = random(ni * 1000 + nj);
    const px = new Float64Array(ni * nj);
    const py = new Float64Array(ni * nj);
    const values = new Float64Array(ni * nj);
    for (let j = 0; j < nj; j++)
      for (let i = 0; i < ni; i++) {
        const [x, y] = at(i, j, r);
        px[i + j * ni] = x;
        py[i + j * ni] = y;
        values[i + j * ni] = r();
      }
    const layout = { ni, nj, offset: 0, strideI: 1, strideJ: ni };
    const [width, height] = [1000, 600];
    const image = rasterizeStructuredField(layout, px, py, values, width, height, { lut: grey, low: 0, high: 1 });
    const reference = boundingBoxReference(layout, px, py, values, width, height);
    let filled = 0;
    for (let o = 3; o < reference.length; o += 4) if (reference[o] === 255) filled++;
    expect(filled).toBeGreaterThan(0);
    expect(Buffer.compare(Buffer.from(image.data), Buffer.from(reference))).toBe(0);
  });
});
