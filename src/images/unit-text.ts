/**
 * Units as a reader expects them on a chart: the case file's ASCII spelling ("W/(m^2*K)", "degC") set with
 * superscripts, a middle dot for products and degree signs ("W/(m²·K)", "°C"). Only the spelling changes; an
 * unknown unit passes through with the same substitutions, so nothing is ever lost.
 */

const superscripts: Readonly<Record<string, string>> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
};

/** "W/(m^2*K)" -> "W/(m²·K)", "m^2*K/W" -> "m²·K/W", "degC" -> "°C", "um" -> "µm"; "" stays "". */
export function prettyUnit(unit: string): string {
  return unit
    .replace(/\^(-?\d+)/g, (_m, power: string) => [...power].map((ch) => superscripts[ch] ?? ch).join(''))
    .replace(/\s*\*\s*/g, '·')
    .replace(/\bdeg([CF])\b/g, '°$1')
    .replace(/\bdeg\b/g, '°')
    .replace(/\bum\b/g, 'µm');
}
