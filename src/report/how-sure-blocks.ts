/**
 * The blocks the reports' "How sure" sections share (uncertainty-section.ts for a fin, sink-uncertainty-section.ts for
 * a heat sink): the table of sensitivities d ln y / d ln x with each input's standard uncertainty u and its part of
 * the band |S| u, and each model's drift against the band, in the words of `check`'s text.
 */
import { fractionWords } from '../compare/index.js';
import { sig, signedPercent } from '../plots/index.js';
import type { Block } from './document.js';

export const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;

export interface SensitivityRow {
  key: string;
  /** d ln y / d ln x. */
  s: number;
  /** The input's relative standard uncertainty (0: none stated). */
  uncertainty: number;
}

/** The sensitivities' table; `symbol` names the derivative in the column title ("d ln Q / d ln x"). */
export function sensitivityTable(caption: string, symbol: string, rows: readonly SensitivityRow[], notes: string[]): Block {
  return {
    kind: 'table',
    caption,
    columns: [
      { title: 'Input', align: 'left' },
      { title: symbol, align: 'right' },
      { title: 'Uncertainty u', align: 'right' },
      { title: '|S| u', align: 'right' },
    ],
    rows: rows.map((r) => ({
      cells: [r.key, sig(r.s, 4), r.uncertainty > 0 ? pct(r.uncertainty) : '–', r.uncertainty > 0 ? pct(Math.abs(r.s * r.uncertainty)) : '–'],
    })),
    notes,
  };
}

export interface BandedModel {
  name: string;
  verdict: string;
  drift: number;
}

/**
 * Each model's drift as a fraction of the band (nothing when the band is 0). `hOnly`: h is the only input with a
 * stated uncertainty, so the band is h's alone; else `fromH` says h's part.
 */
export function driftAgainstBand(intro: string, relative: number, fromH: number, hOnly: boolean, models: readonly BandedModel[]): Block[] {
  if (!(relative > 0)) return [];
  const band = hOnly
    ? `the ±${pct(relative)} that the h uncertainty alone gives`
    : `the ±${pct(relative)} of the stated uncertainties (h alone ±${pct(fromH)})`;
  return [
    { kind: 'paragraph', text: intro },
    {
      kind: 'list',
      items: models.map((m) => `${m.name} (${m.verdict}): drift ${signedPercent(m.drift)} is ${fractionWords(Math.abs(m.drift) / relative)} ${band}.`),
    },
  ];
}

/** Whether h is the only input with a stated uncertainty. */
export function hOnlyUncertain(rows: readonly { key: string; uncertainty: number }[]): boolean {
  const uncertain = rows.filter((r) => r.uncertainty > 0);
  return uncertain.length === 1 && uncertain[0]?.key === 'convection.h';
}
