import { describe, expect, it } from 'vitest';
import { chooseRowFilter, createRgbaImage, encodePng, pngDataUri } from '../../src/images/raster.js';
import { decodePng } from './helpers.js';

function image(width: number, height: number, colour: (x: number, y: number) => [number, number, number, number]) {
  const img = createRgbaImage(width, height);
  for (let y = 0; y < height; y++) for (let x = 0; x < width; x++) img.data.set(colour(x, y), 4 * (y * width + x));
  return img;
}

describe('embedded PNG rasters', () => {
  // A field varying only along x repeats row after row: "Up" filters it to zeros. One varying only along y is
  // constant along each row: "Sub" filters it to zeros (PNG spec. 9.2 filter definitions).
  const alongX = image(64, 16, (x) => [x * 4, 255 - x * 4, 100, 255]);
  const alongY = image(64, 16, (_, y) => [y * 16, 0, 255 - y * 16, 255]);

  it('picks Up for rows that repeat and Sub for rows that are constant', () => {
    expect(chooseRowFilter(alongX)).toBe(2);
    expect(chooseRowFilter(alongY)).toBe(1);
  });

  it.each([
    ['along x', alongX],
    ['along y', alongY],
  ])('round-trips the pixels exactly (%s)', (_, img) => {
    const decoded = decodePng(encodePng(img));
    expect([decoded.width, decoded.height]).toEqual([img.width, img.height]);
    expect(Buffer.compare(decoded.data, Buffer.from(img.data))).toBe(0);
  });

  it('makes a base64 data URI and rejects an empty image', () => {
    expect(pngDataUri(encodePng(alongX))).toMatch(/^data:image\/png;base64,iVBORw0KGgo/);
    expect(() => createRgbaImage(0, 3)).toThrow(RangeError);
  });
});
