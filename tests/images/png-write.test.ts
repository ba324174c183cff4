/**
 * writePng (src/images/png-write.ts) against the reference PNG writer it replaced, pngjs 7 (PNG.sync.write with
 * colour type 6, deflate level 6 and a fixed filter type): the same bytes for every image and both filters, so the
 * charts that embed these images keep their bytes; and pngjs reads back the same pixels. The chunk CRC is also checked
 * on its own: every PNG file ends with the IEND chunk, length 0, CRC-32 of "IEND" = 0xAE426082 (PNG spec., W3C 2nd
 * ed. 2003, section 5.5 defines the CRC; the value is the last four bytes of any PNG file).
 */
import { describe, expect, it } from 'vitest';
import { PNG } from 'pngjs';
import { writePng, type RowFilter } from '../../src/images/png-write.js';
import { decodePng } from './helpers.js';

function pngjsBytes(width: number, height: number, data: Uint8Array, filterType: RowFilter): Buffer {
  const png = new PNG({ width, height, colorType: 6, inputHasAlpha: true });
  png.data = Buffer.from(data.buffer, data.byteOffset, data.byteLength);
  return PNG.sync.write(png, { colorType: 6, deflateLevel: 6, filterType });
}

/** A deterministic pseudo-random byte stream (a linear congruential generator; Numerical Recipes' constants). */
function bytes(n: number, seed: number): Uint8Array {
  const out = new Uint8Array(n);
  let s = seed >>> 0;
  for (let i = 0; i < n; i++) {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    out[i] = s >>> 24;
  }
  return out;
}

/** A smooth field with a transparent corner, as the heat maps are. */
function shaded(width: number, height: number): Uint8Array {
  const out = new Uint8Array(4 * width * height);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const o = 4 * (y * width + x);
      if (x + y < 5) continue;
      out[o] = (x * 7) & 255;
      out[o + 1] = (y * 3) & 255;
      out[o + 2] = ((x + y) * 5) & 255;
      out[o + 3] = 255;
    }
  }
  return out;
}

const images: [string, number, number, Uint8Array][] = [
  ['1 x 1', 1, 1, bytes(4, 1)],
  ['one column', 1, 37, bytes(4 * 37, 2)],
  ['one row', 53, 1, bytes(4 * 53, 3)],
  ['random 61 x 47', 61, 47, bytes(4 * 61 * 47, 4)],
  ['shaded 400 x 300', 400, 300, shaded(400, 300)],
  ['transparent 20 x 10', 20, 10, new Uint8Array(4 * 20 * 10)],
];

describe('writePng', () => {
  for (const [name, width, height, data] of images) {
    for (const filter of [1, 2] as const) {
      it(`${name}, filter ${filter}: the bytes pngjs writes, and the pixels read back`, () => {
        const ours = writePng({ width, height, data }, filter);
        expect(Buffer.compare(ours, pngjsBytes(width, height, data, filter))).toBe(0);
        const back = decodePng(ours);
        expect([back.width, back.height]).toEqual([width, height]);
        expect(Buffer.compare(back.data, Buffer.from(data))).toBe(0);
      });
    }
  }

  it('chunk CRCs are CRC-32: the IEND chunk ends with the CRC of "IEND", 0xAE426082', () => {
    const png = writePng({ width: 1, height: 1, data: new Uint8Array(4) }, 1);
    expect(png.subarray(png.length - 12).toString('hex')).toBe('0000000049454e44ae426082');
  });
});
