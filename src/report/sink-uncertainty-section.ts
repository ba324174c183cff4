/**
 * The sink report's section "How sure": the first-order band of the hottest source's mean rise (fd-3d), the
 * sensitivities d ln rise / d ln x it comes from, each array shortcut's drift against the band (the same words as
 * the sink `check` text), and the cautions. The rise and its band are temperature differences, shown in the display
 * unit of a difference (K, or °F for a °F display: 9/5 of the kelvin value, no offset).
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import { fractionWords, type SinkCheckReport } from '../compare/index.js';
import { sig, signedPercent } from '../plots/index.js';
import { prettyUnits } from './case-inputs.js';
import type { Block, Section } from './document.js';

const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;

/** null when the check computed no sensitivities. `figure`: the tornado chart's name in the report ("Figure 4"), if drawn. */
export function sinkUncertaintySection(r: SinkCheckReport, u: DisplayUnits, figure: string | null): Section | null {
  const band = r.uncertainty;
  const sens = r.sensitivities;
  if (band === undefined || sens === undefined) return null;
  const dT = u.temperatureDifference;
  const rise = (k: number, digits: number): string => `${sig(inUnit(dT, k), digits)} ${dT.pretty}`;
  const source = r.sources.find((s) => s.name === band.source);
  const uncertain = sens.filter((s) => s.uncertainty > 0);
  const hOnly = uncertain.length === 1 && uncertain[0]?.key === 'convection.h';
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: `With the inputs' stated uncertainties, the mean rise of ${band.source} (the hottest source) above ambient, ${source === undefined ? '?' : rise(source.meanRise_K, 4)} by fd-3d, is known to ±${pct(band.relative)} (one standard uncertainty): ${rise(band.low_K, 4)} to ${rise(band.high_K, 4)}. ${prettyUnits(band.note)}.`,
    },
    {
      kind: 'table',
      caption: `Sensitivities of ${band.source}'s mean rise, d ln rise / d ln x (the % change of the rise per % change of the input)${figure === null ? '' : `; ${figure} draws them`}`,
      columns: [
        { title: 'Input', align: 'left' },
        { title: 'd ln rise / d ln x', align: 'right' },
        { title: 'Uncertainty u', align: 'right' },
        { title: '|S| u', align: 'right' },
      ],
      rows: sens.map((s) => ({
        cells: [
          s.key,
          sig(s.dlnRise_dlnx, 4),
          s.uncertainty > 0 ? pct(s.uncertainty) : '–',
          s.uncertainty > 0 ? pct(Math.abs(s.dlnRise_dlnx * s.uncertainty)) : '–',
        ],
      })),
      notes: [
        `${prettyUnits(r.sensitivityMethod ?? '')}.`,
        "A source's power has a sensitivity equal to the share of the rise it causes (the rise is linear in the powers).",
      ],
    },
  ];
  if (band.relative > 0) {
    const words = hOnly
      ? `the ±${pct(band.relative)} that the h uncertainty alone gives`
      : `the ±${pct(band.relative)} of the stated uncertainties (h alone ±${pct(band.fromH)})`;
    blocks.push({ kind: 'paragraph', text: 'Each array shortcut’s worst drift against that band:' });
    blocks.push({
      kind: 'list',
      items: r.models.map(
        (m) => `${m.model} (${m.verdict}): drift ${signedPercent(m.drift)} is ${fractionWords(Math.abs(m.drift) / band.relative)} ${words}.`,
      ),
    });
  }
  blocks.push({
    kind: 'paragraph',
    text: 'These are estimates of the stated model, to be confirmed by test: the band holds only the uncertainties the note above lists, and h is usually the largest uncertainty; follow the applicable codes, standards and licensed practice.',
  });
  return { id: 'uncertainty', title: 'How sure: sensitivities and uncertainty', blocks };
}
