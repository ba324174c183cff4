/**
 * A tiny SVG writer: elements as strings, every attribute value and text node escaped,
 * every number written with a fixed precision so the same input always gives the same bytes.
 *
 * Coordinates are SVG user units (CSS px at 96 dpi); two decimals (1/100 px) are far below
 * what any rasterisation can show.
 */

export type AttrValue = string | number | undefined;
export type Attrs = Readonly<Record<string, AttrValue>>;

const xmlEscapes: Readonly<Record<string, string>> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&apos;',
};

/** Escapes text for use in an XML text node or a double-quoted attribute. */
export function escapeXml(text: string): string {
  // Control characters other than tab, LF, CR are not allowed in XML 1.0 at all: drop them.
  // eslint-disable-next-line no-control-regex
  const clean = text.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F]/g, '');
  return clean.replace(/[&<>"']/g, (c) => xmlEscapes[c] ?? c);
}

/** A number with at most `decimals` decimals, no exponent, no "-0". Non-finite numbers are a bug upstream. */
export function fmt(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) throw new RangeError(`svg: cannot write non-finite number ${value}`);
  const p = 10 ** decimals;
  const r = Math.round(value * p) / p;
  if (r === 0) return '0';
  if (Math.abs(r) >= 1e21) throw new RangeError(`svg: number ${value} out of range`);
  return r.toFixed(decimals).replace(/\.?0+$/, '');
}

function attrString(attrs: Attrs): string {
  let s = '';
  for (const [name, value] of Object.entries(attrs)) {
    if (value === undefined) continue;
    const text = typeof value === 'number' ? fmt(value) : escapeXml(value);
    s += ` ${name}="${text}"`;
  }
  return s;
}

/** One element. `children` are already-built element strings; use `textNode` for text. */
export function el(tag: string, attrs: Attrs, children?: string | readonly string[]): string {
  const inner = children === undefined ? '' : typeof children === 'string' ? children : children.join('');
  if (inner === '') return `<${tag}${attrString(attrs)}/>`;
  return `<${tag}${attrString(attrs)}>${inner}</${tag}>`;
}

/** A text element; the string is escaped. */
export function textEl(content: string, attrs: Attrs): string {
  return `<text${attrString(attrs)}>${escapeXml(content)}</text>`;
}

/** A whole SVG document of the given size in user units (px). */
export function svgDocument(width: number, height: number, body: readonly string[], background = '#ffffff'): string {
  // xlink:href on images (declared here) is read by SVG 1.1 tools as well as browsers; the generic
  // sans-serif fallback only matters to viewers without DejaVu Sans (our PNGs always have it).
  const head =
    `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" ` +
    `width="${fmt(width)}" height="${fmt(height)}" viewBox="0 0 ${fmt(width)} ${fmt(height)}" ` +
    `font-family="DejaVu Sans, sans-serif">`;
  const bg = el('rect', { x: 0, y: 0, width, height, fill: background });
  return `${head}${bg}${body.join('')}</svg>\n`;
}

/**
 * Path data through points (xs[k], ys[k]); a non-finite point breaks the line (a gap),
 * so missing values never draw a spurious segment.
 */
export function polylinePathData(xs: ArrayLike<number>, ys: ArrayLike<number>, closed = false): string {
  const parts: string[] = [];
  let penDown = false;
  const n = Math.min(xs.length, ys.length);
  for (let k = 0; k < n; k++) {
    const x = xs[k] as number;
    const y = ys[k] as number;
    if (!Number.isFinite(x) || !Number.isFinite(y)) {
      penDown = false;
      continue;
    }
    parts.push(`${penDown ? 'L' : 'M'}${fmt(x)} ${fmt(y)}`);
    penDown = true;
  }
  if (closed && parts.length > 0) parts.push('Z');
  return parts.join('');
}
