/**
 * Records the print resolution in a PNG by inserting (or replacing) its pHYs chunk, so word
 * processors place a 300-dpi chart at its intended physical size.
 *
 * PNG specification (W3C Recommendation, Portable Network Graphics, 2nd ed., 2003), sections
 * 5.3 (chunk layout: length, type, data, CRC-32 over type and data) and 11.3.5.3 (pHYs: pixels per
 * unit x and y as 4-byte integers, unit 1 = metre). The chunk must come before the first IDAT.
 * CRC-32: ISO 3309 / ITU-T V.42 polynomial 0xEDB88320 (reflected), as the specification's annex D.
 */

const crcTable: Uint32Array = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

export function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (let k = 0; k < bytes.length; k++) c = (crcTable[(c ^ (bytes[k] as number)) & 0xff] as number) ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

const signatureLength = 8;
const inchesPerMetre = 1 / 0.0254;

/** Pixels per metre for a dpi, rounded as PNG stores it (an integer). */
export function pixelsPerMetre(dpi: number): number {
  return Math.round(dpi * inchesPerMetre);
}

/** A copy of `png` whose pHYs chunk says `dpi` (replacing any existing pHYs). */
export function setPngDpi(png: Buffer, dpi: number): Buffer {
  const ppm = pixelsPerMetre(dpi);
  const chunk = Buffer.alloc(12 + 9);
  chunk.writeUInt32BE(9, 0);
  chunk.write('pHYs', 4, 'latin1');
  chunk.writeUInt32BE(ppm, 8);
  chunk.writeUInt32BE(ppm, 12);
  chunk.writeUInt8(1, 16);
  chunk.writeUInt32BE(crc32(chunk.subarray(4, 17)), 17);

  const parts: Buffer[] = [png.subarray(0, signatureLength)];
  let offset = signatureLength;
  let inserted = false;
  while (offset + 8 <= png.length) {
    const length = png.readUInt32BE(offset);
    const type = png.toString('latin1', offset + 4, offset + 8);
    const end = offset + 12 + length;
    if (type === 'pHYs') {
      offset = end;
      continue;
    }
    if (!inserted && type === 'IDAT') {
      parts.push(chunk);
      inserted = true;
    }
    parts.push(png.subarray(offset, end));
    offset = end;
  }
  if (!inserted) throw new Error('png-dpi: no IDAT chunk found: not a PNG image');
  return Buffer.concat(parts);
}

/** The dpi recorded in a PNG's pHYs chunk (unit metre), or null. */
export function readPngDpi(png: Buffer): number | null {
  let offset = signatureLength;
  while (offset + 8 <= png.length) {
    const length = png.readUInt32BE(offset);
    const type = png.toString('latin1', offset + 4, offset + 8);
    if (type === 'pHYs' && png.readUInt8(offset + 16) === 1) return png.readUInt32BE(offset + 8) / inchesPerMetre;
    if (type === 'IDAT') return null;
    offset += 12 + length;
  }
  return null;
}
