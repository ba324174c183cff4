/**
 * Test helpers for images: PNG decoding (pngjs), pixel queries, and a minimal XML
 * well-formedness check (XML 1.0, W3C 2008, section 2.1 "Well-Formed XML Documents": one root
 * element, properly nested start/end tags, quoted attribute values without '<', no duplicate
 * attributes, '&' only in entity or character references).
 */

import { PNG } from 'pngjs';

export interface Decoded {
  width: number;
  height: number;
  data: Buffer;
}

export function decodePng(bytes: Buffer): Decoded {
  const png = PNG.sync.read(bytes);
  return { width: png.width, height: png.height, data: png.data };
}

export function pixel(img: Decoded, x: number, y: number): [number, number, number, number] {
  const o = 4 * (Math.round(y) * img.width + Math.round(x));
  return [img.data[o] ?? 0, img.data[o + 1] ?? 0, img.data[o + 2] ?? 0, img.data[o + 3] ?? 0];
}

/** Pixels in [x0, x1) x [y0, y1) whose colour satisfies `test`. */
export function countPixels(img: Decoded, x0: number, y0: number, x1: number, y1: number, test: (rgb: readonly number[]) => boolean): number {
  let n = 0;
  for (let y = Math.max(0, Math.floor(y0)); y < Math.min(img.height, Math.ceil(y1)); y++) {
    for (let x = Math.max(0, Math.floor(x0)); x < Math.min(img.width, Math.ceil(x1)); x++) {
      const [r, g, b] = pixel(img, x, y);
      if (test([r, g, b])) n++;
    }
  }
  return n;
}

/** Dark enough to be text or a line (each channel below 110 of 255). */
export const isDark = ([r = 0, g = 0, b = 0]: readonly number[]): boolean => r < 110 && g < 110 && b < 110;
export const isNotWhite = ([r = 0, g = 0, b = 0]: readonly number[]): boolean => r < 245 || g < 245 || b < 245;

/** Colour distance (max channel difference). */
export function colourDistance(a: readonly number[], b: readonly number[]): number {
  return Math.max(Math.abs((a[0] ?? 0) - (b[0] ?? 0)), Math.abs((a[1] ?? 0) - (b[1] ?? 0)), Math.abs((a[2] ?? 0) - (b[2] ?? 0)));
}

export function hexRgb(hex: string): [number, number, number] {
  return [parseInt(hex.slice(1, 3), 16), parseInt(hex.slice(3, 5), 16), parseInt(hex.slice(5, 7), 16)];
}

/** Returns null when `xml` is well-formed, else a description of the first problem. */
export function wellFormednessError(xml: string): string | null {
  const name = /^[A-Za-z_:][-A-Za-z0-9_:.]*$/;
  const badAmp = /&(?!(?:amp|lt|gt|quot|apos|#[0-9]+|#x[0-9a-fA-F]+);)/;
  const stack: string[] = [];
  let roots = 0;
  let k = 0;
  while (k < xml.length) {
    const lt = xml.indexOf('<', k);
    const text = xml.slice(k, lt < 0 ? xml.length : lt);
    if (badAmp.test(text)) return `bad '&' in text near ${JSON.stringify(text.slice(0, 40))}`;
    if (stack.length === 0 && text.trim() !== '') return `text outside the root element: ${JSON.stringify(text.slice(0, 40))}`;
    if (lt < 0) break;
    if (xml.startsWith('<?', lt)) {
      const end = xml.indexOf('?>', lt);
      if (end < 0) return 'unterminated processing instruction';
      k = end + 2;
      continue;
    }
    if (xml.startsWith('<!--', lt)) {
      const end = xml.indexOf('-->', lt);
      if (end < 0) return 'unterminated comment';
      k = end + 3;
      continue;
    }
    const gt = xml.indexOf('>', lt);
    if (gt < 0) return 'unterminated tag';
    const tag = xml.slice(lt + 1, gt);
    if (tag.startsWith('/')) {
      const closing = tag.slice(1).trim();
      const open = stack.pop();
      if (open !== closing) return `</${closing}> closes <${open ?? 'nothing'}>`;
      k = gt + 1;
      continue;
    }
    const selfClosing = tag.endsWith('/');
    const body = selfClosing ? tag.slice(0, -1) : tag;
    const m = /^([^\s]+)([\s\S]*)$/.exec(body);
    if (!m || !name.test(m[1] ?? '')) return `bad tag name in <${tag.slice(0, 30)}>`;
    let rest = m[2] ?? '';
    const seen = new Set<string>();
    const attr = /^\s+([A-Za-z_:][-A-Za-z0-9_:.]*)\s*=\s*"([^"<]*)"/;
    for (;;) {
      const a = attr.exec(rest);
      if (!a) break;
      if (seen.has(a[1] ?? '')) return `duplicate attribute ${a[1]} in <${m[1]}>`;
      seen.add(a[1] ?? '');
      if (badAmp.test(a[2] ?? '')) return `bad '&' in attribute ${a[1]}`;
      rest = rest.slice(a[0].length);
    }
    if (rest.trim() !== '') return `unparsable attributes in <${m[1]}>: ${JSON.stringify(rest.slice(0, 40))}`;
    if (stack.length === 0) roots++;
    if (roots > 1) return 'more than one root element';
    if (!selfClosing) stack.push(m[1] ?? '');
    k = gt + 1;
  }
  if (stack.length > 0) return `unclosed <${stack[stack.length - 1]}>`;
  return roots === 1 ? null : 'no root element';
}

/** All text-node contents of an SVG, entities decoded (enough for &amp; &lt; &gt; &quot; &apos;). */
export function svgTexts(svg: string): string[] {
  const out: string[] = [];
  const re = /<text[^>]*>([^<]*)<\/text>/g;
  for (let m = re.exec(svg); m; m = re.exec(svg)) {
    out.push(
      (m[1] ?? '')
        .replace(/&lt;/g, '<')
        .replace(/&gt;/g, '>')
        .replace(/&quot;/g, '"')
        .replace(/&apos;/g, "'")
        .replace(/&amp;/g, '&'),
    );
  }
  return out;
}
