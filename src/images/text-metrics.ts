/**
 * Text widths for layout (legend boxes, label placement, wrapping) without a font engine:
 * horizontal advance widths of DejaVu Sans (the font every chart is rendered with), read from
 * DejaVuSans.ttf (hmtx table, units per em 2048). Kerning is ignored (DejaVu kerns little; the
 * layout keeps a few px of slack). tests/images/text-metrics.test.ts re-reads the font file and
 * checks this table against it.
 */

export const fontFamily = 'DejaVu Sans';
export const unitsPerEm = 2048;
/** hhea ascender and descender of DejaVu Sans, in font units. */
export const fontAscender = 1901;
export const fontDescender = -483;

/** The characters with a tabulated width; ASCII 32..126 then the symbols charts use. */
export const measuredChars =
  ' !"#$%&\'()*+,-./0123456789:;<=>?@ABCDEFGHIJKLMNOPQRSTUVWXYZ[\\]^_`abcdefghijklmnopqrstuvwxyz{|}~' + '°−×Δηεθµμ²³·–—≈≤≥±′″…∞√∑ΣαβγλπρσφωΩ';

/** Advance widths (font units) of `measuredChars`, in the same order. */
export const advanceWidths: readonly number[] = [
  651, 821, 942, 1716, 1303, 1946, 1597, 563, 799, 799, 1024, 1716, 651, 739, 651, 690, 1303, 1303, 1303, 1303, 1303, 1303, 1303, 1303, 1303, 1303, 690,
  690, 1716, 1716, 1716, 1087, 2048, 1401, 1405, 1430, 1577, 1294, 1178, 1587, 1540, 604, 604, 1343, 1141, 1767, 1532, 1612, 1235, 1612, 1423, 1300, 1251,
  1499, 1401, 2025, 1403, 1251, 1403, 799, 690, 799, 1716, 1024, 1024, 1255, 1300, 1126, 1300, 1260, 721, 1300, 1298, 569, 569, 1186, 569, 1995, 1298,
  1253, 1300, 1300, 842, 1067, 803, 1298, 1212, 1675, 1212, 1212, 1075, 1303, 690, 1303, 1716, 1024, 1716, 1716, 1401, 1298, 1107, 1253, 1303, 1303, 821,
  821, 651, 1024, 2048, 1716, 1716, 1716, 1716, 465, 765, 2048, 1706, 1305, 1380, 1294, 1350, 1307, 1212, 1212, 1233, 1300, 1298, 1351, 1715, 1565,
];

/** Width used for a character outside the table: the width of a digit, a middle-of-the-road guess. */
const fallbackAdvance = 1303;

const widthByChar: ReadonlyMap<string, number> = new Map([...measuredChars].map((ch, k) => [ch, advanceWidths[k] ?? fallbackAdvance] as const));

/** Width in px of `text` set in DejaVu Sans at `fontSize` px. */
export function textWidth(text: string, fontSize: number): number {
  let units = 0;
  for (const ch of text) units += widthByChar.get(ch) ?? fallbackAdvance;
  return (units / unitsPerEm) * fontSize;
}

/** Height above the baseline of capital letters and digits (cap height of DejaVu Sans ≈ 0.73 em). */
export function capHeight(fontSize: number): number {
  return 0.73 * fontSize;
}

/**
 * Greedy word wrap to `maxWidth` px. A single word longer than the line is kept whole
 * (it overflows rather than being cut mid-word).
 */
export function wrapText(text: string, fontSize: number, maxWidth: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split('\n')) {
    const words = paragraph.split(/\s+/).filter((w) => w.length > 0);
    let line = '';
    for (const word of words) {
      const candidate = line === '' ? word : `${line} ${word}`;
      if (line !== '' && textWidth(candidate, fontSize) > maxWidth) {
        lines.push(line);
        line = word;
      } else {
        line = candidate;
      }
    }
    if (line !== '') lines.push(line);
  }
  return lines;
}

/**
 * `text` cut to at most `maxWidth` px, ending in "…" when cut. Linear in the length of the text (a
 * 100,000-character case name costs one pass), so a chart title can never run off the canvas.
 */
export function truncateToWidth(text: string, fontSize: number, maxWidth: number): string {
  if (textWidth(text, fontSize) <= maxWidth) return text;
  const room = maxWidth - textWidth('…', fontSize);
  let used = 0;
  let out = '';
  for (const ch of text) {
    const w = ((widthByChar.get(ch) ?? fallbackAdvance) / unitsPerEm) * fontSize;
    if (used + w > room) break;
    used += w;
    out += ch;
  }
  return `${out.trimEnd()}…`;
}

/**
 * `text` on at most `maxLines` lines of at most `maxWidth` px: one line when it fits, else word-wrapped;
 * what still does not fit is cut with "…" at the end of the last line.
 */
export function fitLines(text: string, fontSize: number, maxWidth: number, maxLines = 2): string[] {
  if (textWidth(text, fontSize) <= maxWidth) return [text];
  const wrapped = wrapText(text, fontSize, maxWidth);
  const lines = wrapped.slice(0, maxLines);
  if (wrapped.length > maxLines) lines[maxLines - 1] = `${lines[maxLines - 1] ?? ''} ${wrapped.slice(maxLines).join(' ')}`;
  return lines.map((line) => truncateToWidth(line, fontSize, maxWidth));
}
