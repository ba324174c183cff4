/**
 * The characters of the chart fonts' subset (src/images/fonts/DejaVuSans-subset.ttf and DejaVuSans-Bold-subset.ttf):
 * DejaVu Sans and DejaVu Sans Bold (the `dejavu-fonts-ttf` package) cut to these characters by
 * scripts/subset-fonts.py (fontTools' subsetter), with every layout feature kept (kerning) and the TrueType hinting
 * dropped (resvg does not hint), so a chart draws the same pixels with either font (tests/images/chart-font-subset.test.ts).
 *
 * Why: resvg reads the whole font file again for every glyph it draws (its font database holds file paths, not the
 * bytes): about 4000 reads of the 757 kB DejaVuSans.ttf for the charts of one 41 x 41 map, most of that command's
 * system time. The subsets are 63 kB. A chart with a character outside them (a case name in another script) is drawn
 * with the full fonts, as before (render.ts).
 *
 * License: the DejaVu fonts' (src/images/fonts/LICENSE-DejaVu.txt): a modified font must not be named "Bitstream"
 * or "Vera"; the subsets keep the family names DejaVu Sans and DejaVu Sans Bold.
 */

/** Inclusive ranges of code points, as given to the subsetter (scripts/subset-fonts.py, keep the two equal). */
export const CHART_FONT_RANGES: readonly (readonly [number, number])[] = [
  [0x0020, 0x007e], // Basic Latin
  [0x00a0, 0x00ff], // Latin-1 (degree, plus-minus, micro, superscript 2 and 3, middle dot, multiplication sign)
  [0x0391, 0x03c9], // Greek capitals and small letters (eta, theta, Delta...)
  [0x2010, 0x2027], // dashes, quotation marks, bullet, ellipsis
  [0x2030, 0x203a], // per mille, primes
  [0x2070, 0x209f], // superscripts and subscripts
  [0x2190, 0x2199], // arrows
  [0x2200, 0x22ff], // mathematical operators (minus, <=, >=, approximately, square root, infinity)
];

/** Whether every character of `text` other than tabs and line ends lies in CHART_FONT_RANGES. */
export function inChartFontSubset(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c >= 0x20 && c <= 0x7e) continue;
    if (c === 0x09 || c === 0x0a || c === 0x0d) continue;
    if (!CHART_FONT_RANGES.some(([lo, hi]) => c >= lo && c <= hi)) return false;
  }
  return true;
}
