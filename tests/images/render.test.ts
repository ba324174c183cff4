import { describe, expect, it } from 'vitest';
import { createRequire } from 'node:module';
import { chartBytes, fontFiles, svgToPng } from '../../src/images/render.js';
import { crc32, pixelsPerMetre, readPngDpi, setPngDpi } from '../../src/images/png-dpi.js';
import { countPixels, decodePng, isDark } from './helpers.js';

const textSvg =
  '<svg xmlns="http://www.w3.org/2000/svg" width="200" height="60" viewBox="0 0 200 60" font-family="DejaVu Sans">' +
  '<rect width="200" height="60" fill="#fff"/><text x="10" y="40" font-size="30" fill="#000">Tip 53 °C</text></svg>';

describe('CRC-32 and the pHYs chunk', () => {
  it('CRC-32 matches the standard check values', () => {
    // "123456789" -> 0xCBF43926: the CRC-32 check value in R. N. Williams (1993), "A painless guide to CRC
    // error detection algorithms", CRC catalogue; "IEND" -> 0xAE426082, the CRC that ends every PNG file (PNG spec. 11.2.5).
    expect(crc32(Buffer.from('123456789', 'latin1'))).toBe(0xcbf43926);
    expect(crc32(Buffer.from('IEND', 'latin1'))).toBe(0xae426082);
  });

  it('records the dpi once, replacing an existing pHYs, and the PNG still decodes', async () => {
    const png = await svgToPng(textSvg);
    const twice = setPngDpi(setPngDpi(png, 300), 150);
    expect(twice.toString('latin1').split('pHYs').length - 1).toBe(1);
    expect(readPngDpi(twice)).toBeCloseTo(150, 1); // 5906 px/m -> 150.012 dpi (PNG stores integer px/m)
    expect(pixelsPerMetre(96)).toBe(3780);
    expect(decodePng(twice).width).toBe(200);
  });
});

describe('svgToPng', () => {
  it('finds the DejaVu font files from the installed package', () => {
    const files = fontFiles();
    expect(files.map((f) => f.split('/').pop())).toEqual(['DejaVuSans.ttf', 'DejaVuSans-Bold.ttf']);
  });

  it('draws text (resvg with no font file draws none: the control below shows the difference)', async () => {
    const withFont = decodePng(await svgToPng(textSvg));
    const dark = countPixels(withFont, 0, 0, 200, 60, isDark);
    // "Tip 53 °C" at 30 px: eight glyphs of 30-80 dark pixels each.
    expect(dark).toBeGreaterThan(300);
    const { Resvg } = createRequire(import.meta.url)('@resvg/resvg-js') as typeof import('@resvg/resvg-js');
    const noFont = decodePng(new Resvg(textSvg, { font: { loadSystemFonts: false } }).render().asPng());
    expect(countPixels(noFont, 0, 0, 200, 60, isDark)).toBe(0);
  });

  it('rejects a bad dpi or width', async () => {
    await expect(svgToPng(textSvg, { dpi: 0 })).rejects.toThrow(RangeError);
    await expect(svgToPng(textSvg, { width: 10.5 })).rejects.toThrow(RangeError);
  });

  it('chartBytes writes SVG as UTF-8 text and PNG as a PNG', async () => {
    expect((await chartBytes(textSvg, 'svg')).toString('utf8')).toBe(textSvg);
    const png = await chartBytes(textSvg, 'png');
    expect(png.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))).toBe(true);
  });
});
