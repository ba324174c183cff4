/**
 * A minimal TrueType reader for tests: the advance width of a character, from the hmtx table reached through the cmap
 * format-4 subtable (platform 3, encoding 1), as laid out in Apple's TrueType Reference Manual and the OpenType
 * specification (Microsoft), chapters "cmap", "hhea", "hmtx", "head".
 */
import { readFileSync } from 'node:fs';

export function readFont(path: string) {
  const buf = readFileSync(path);
  const tables = new Map<string, number>();
  for (let i = 0; i < buf.readUInt16BE(4); i++) tables.set(buf.toString('latin1', 12 + 16 * i, 16 + 16 * i), buf.readUInt32BE(20 + 16 * i));
  const at = (tag: string): number => tables.get(tag) ?? Number.NaN;
  const numHMetrics = buf.readUInt16BE(at('hhea') + 34);
  const cmap = at('cmap');
  let sub = -1;
  for (let i = 0; i < buf.readUInt16BE(cmap + 2); i++) {
    if (buf.readUInt16BE(cmap + 4 + 8 * i) === 3 && buf.readUInt16BE(cmap + 6 + 8 * i) === 1) sub = cmap + buf.readUInt32BE(cmap + 8 + 8 * i);
  }
  const segX2 = buf.readUInt16BE(sub + 6);
  const endO = sub + 14,
    startO = endO + segX2 + 2,
    deltaO = startO + segX2,
    rangeO = deltaO + segX2;
  const glyph = (cp: number): number => {
    for (let s = 0; s < segX2 / 2; s++) {
      if (cp > buf.readUInt16BE(endO + 2 * s)) continue;
      const start = buf.readUInt16BE(startO + 2 * s);
      if (cp < start) return 0;
      const delta = buf.readInt16BE(deltaO + 2 * s);
      const ro = buf.readUInt16BE(rangeO + 2 * s);
      if (ro === 0) return (cp + delta) & 0xffff;
      const g = buf.readUInt16BE(rangeO + 2 * s + ro + 2 * (cp - start));
      return g === 0 ? 0 : (g + delta) & 0xffff;
    }
    return 0;
  };
  const advance = (g: number): number => buf.readUInt16BE(at('hmtx') + 4 * Math.min(g, numHMetrics - 1));
  return {
    unitsPerEm: buf.readUInt16BE(at('head') + 18),
    ascender: buf.readInt16BE(at('hhea') + 4),
    descender: buf.readInt16BE(at('hhea') + 6),
    width: (ch: string): number => advance(glyph(ch.codePointAt(0) ?? 0)),
    has: (ch: string): boolean => glyph(ch.codePointAt(0) ?? 0) !== 0,
  };
}
