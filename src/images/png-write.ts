/**
 * An RGBA image (8 bits a channel, rows top to bottom) written as a PNG file with one row filter for every row:
 * signature, IHDR, one IDAT (the filtered rows deflated by zlib) and IEND (PNG spec., W3C 2nd ed. 2003, sections 5,
 * 9.2 and 11.2). Byte for byte what pngjs 7 writes for the same image and options (colour type 6, bit depth 8, the
 * given filter type, deflate level 6, its default strategy 3 = Z_RLE and chunk size 32 KiB): the embedded heat-map
 * images of the charts used pngjs, whose per-byte filter loops were most of the time a map spent encoding them.
 */
import { deflateSync } from 'node:zlib';

/** Sub (1: minus the byte 4 to the left) or Up (2: minus the byte above); bytes wrap modulo 256. */
export type RowFilter = 1 | 2;

const SIGNATURE = Buffer.from([137, 80, 78, 71, 13, 10, 26, 10]);

/** Deflate settings of pngjs's writer (lib/packer.js): what keeps the bytes those of the pngjs era. */
const DEFLATE = { chunkSize: 32 * 1024, level: 6, strategy: 3 } as const;

/** CRC-32 of the PNG spec. (section 5.5; the polynomial of ISO 3309, reflected: 0xEDB88320), by a 256-entry table. */
const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

function crc32(bytes: Uint8Array): number {
  let c = 0xffffffff;
  for (let i = 0; i < bytes.length; i++) c = (CRC_TABLE[(c ^ (bytes[i] as number)) & 0xff] as number) ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

function pngChunk(type: string, data: Uint8Array): Buffer {
  const chunk = Buffer.alloc(data.length + 12);
  chunk.writeUInt32BE(data.length, 0);
  chunk.write(type, 4, 'latin1');
  chunk.set(data, 8);
  chunk.writeUInt32BE(crc32(chunk.subarray(4, 8 + data.length)), 8 + data.length);
  return chunk;
}

/** The filtered scanlines: each row's filter type byte, then its filtered bytes. */
function filterRows(data: Uint8Array, width: number, height: number, filter: RowFilter): Buffer {
  const stride = 4 * width;
  const raw = Buffer.alloc((stride + 1) * height);
  for (let y = 0; y < height; y++) {
    const from = y * stride;
    const to = y * (stride + 1) + 1;
    raw[to - 1] = filter;
    if (filter === 1) {
      for (let k = 0; k < 4 && k < stride; k++) raw[to + k] = data[from + k] as number;
      for (let k = 4; k < stride; k++) raw[to + k] = (data[from + k] as number) - (data[from + k - 4] as number);
    } else if (y === 0) {
      for (let k = 0; k < stride; k++) raw[to + k] = data[from + k] as number;
    } else {
      for (let k = 0; k < stride; k++) raw[to + k] = (data[from + k] as number) - (data[from + k - stride] as number);
    }
  }
  return raw;
}

/** PNG bytes of an RGBA image (colour type 6, 8 bits, no interlace) with `filter` on every row. */
export function writePng(image: { width: number; height: number; data: Uint8Array }, filter: RowFilter): Buffer {
  const { width, height, data } = image;
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // colour type: RGBA
  // compression, filter method and interlace: 0
  const idat = deflateSync(filterRows(data, width, height, filter), DEFLATE);
  return Buffer.concat([SIGNATURE, pngChunk('IHDR', header), pngChunk('IDAT', idat), pngChunk('IEND', new Uint8Array(0))]);
}
