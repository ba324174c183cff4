/**
 * The text of the uncertainty section of `check` (single fin and heat sink): the band, the sensitivities
 * and, for every model row, how its drift compares with the band ("drift -1.8 % is a tenth of the +-17 %
 * that the h uncertainty alone gives").
 */
import { signedPercentText } from './percent-text.js';

/** What the section needs, shared by fins (heat rate) and sinks (the hottest source's rise). */
export interface UncertaintyText {
  /** "heat rate 12.44 W" or "hottest source rise 41.2 K". */
  quantity: string;
  /** Unit of the band's ends. */
  unit: string;
  relative: number;
  low: number;
  high: number;
  /** What h's uncertainty alone gives (first order). */
  fromH: number;
  /** True when h is the only input with an uncertainty. */
  hOnly: boolean;
  note: string;
  /** "d ln Q / d ln x". */
  derivative: string;
  sensitivityMethod: string;
  sensitivities: readonly { key: string; value: number; uncertainty: number }[];
  rows: readonly { label: string; verdict: string; drift: number }[];
}

const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;
const sig = (x: number): string => Number(x.toPrecision(4)).toString();

const FRACTIONS: [number, string][] = [
  [2, 'half'],
  [3, 'a third'],
  [4, 'a quarter'],
  [5, 'a fifth'],
  [6, 'a sixth'],
  [7, 'a seventh'],
  [8, 'an eighth'],
  [9, 'a ninth'],
  [10, 'a tenth'],
  [12, 'a twelfth'],
  [15, 'a fifteenth'],
  [20, 'a twentieth'],
];

/** "a tenth of", "about the same as", "3.2 times": |drift| against the band's half-width. */
export function fractionWords(ratio: number): string {
  if (ratio >= 1.25) return `${Number(ratio.toPrecision(2))} times`;
  if (ratio >= 0.8) return 'about the same as';
  if (ratio < 1 / 25) return ratio < 1e-3 ? 'negligible against' : 'under a twentieth of';
  let best = FRACTIONS[0] as [number, string];
  for (const f of FRACTIONS) if (Math.abs(Math.log(ratio * f[0])) < Math.abs(Math.log(ratio * best[0]))) best = f;
  const about = Math.abs(ratio * best[0] - 1) > 0.15 ? 'about ' : '';
  return best[0] === 2 ? `${about}half` : `${about}${best[1]} of`;
}

export function uncertaintyLines(t: UncertaintyText): string[] {
  const out: string[] = [];
  out.push('How sure: the inputs\u2019 uncertainty (one standard uncertainty each side):');
  out.push(`  ${t.quantity} +/-${pct(t.relative)}: ${sig(t.low)} to ${sig(t.high)} ${t.unit}`);
  out.push(`  (${t.note})`);
  out.push(`  sensitivities ${t.derivative}, ${t.sensitivityMethod}:`);
  const w = Math.max(...t.sensitivities.map((s) => s.key.length)) + 2;
  for (const s of t.sensitivities) {
    const band = s.uncertainty > 0 ? `   x ${pct(s.uncertainty)} = ${pct(Math.abs(s.value * s.uncertainty))}` : '';
    out.push(`    ${s.key.padEnd(w)}${(s.value >= 0 ? '+' : '') + s.value.toFixed(4)}${band}`);
  }
  if (t.relative > 0 && t.rows.length > 0) {
    const band = t.hOnly
      ? `the +/-${pct(t.relative)} that the h uncertainty alone gives`
      : `the +/-${pct(t.relative)} of the stated uncertainties (h alone +/-${pct(t.fromH)})`;
    out.push('  drift against that band:');
    for (const r of t.rows)
      out.push(`    ${r.label} (${r.verdict}): drift ${signedPercentText(r.drift)} is ${fractionWords(Math.abs(r.drift) / t.relative)} ${band}`);
  }
  out.push('');
  return out;
}
