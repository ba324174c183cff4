/**
 * The sink report's section "How sure": the first-order band of the hottest source's mean rise (fd-3d), the
 * sensitivities d ln rise / d ln x it comes from, each array shortcut's drift against the band (the same words as
 * the sink `check` text), and the cautions. The rise and its band are temperature differences, shown in the display
 * unit of a difference (K, or °F for a °F display: 9/5 of the kelvin value, no offset).
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import type { SinkCheckReport } from '../compare/index.js';
import { sig } from '../plots/index.js';
import { prettyUnits } from './case-inputs.js';
import type { Block, Section } from './document.js';
import { driftAgainstBand, hOnlyUncertain, pct, sensitivityTable } from './how-sure-blocks.js';

/** null when the check computed no sensitivities. `figure`: the tornado chart's name in the report ("Figure 4"), if drawn. */
export function sinkUncertaintySection(r: SinkCheckReport, u: DisplayUnits, figure: string | null): Section | null {
  const band = r.uncertainty;
  const sens = r.sensitivities;
  if (band === undefined || sens === undefined) return null;
  const dT = u.temperatureDifference;
  const rise = (k: number, digits: number): string => `${sig(inUnit(dT, k), digits)} ${dT.pretty}`;
  const source = r.sources.find((s) => s.name === band.source);
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: `With the inputs' stated uncertainties, the mean rise of ${band.source} (the hottest source) above ambient, ${source === undefined ? '?' : rise(source.meanRise_K, 4)} by fd-3d, is known to ±${pct(band.relative)} (one standard uncertainty): ${rise(band.low_K, 4)} to ${rise(band.high_K, 4)}. ${prettyUnits(band.note)}.`,
    },
    sensitivityTable(
      `Sensitivities of ${band.source}'s mean rise, d ln rise / d ln x (the % change of the rise per % change of the input)${figure === null ? '' : `; ${figure} draws them`}`,
      'd ln rise / d ln x',
      sens.map((s) => ({ key: s.key, s: s.dlnRise_dlnx, uncertainty: s.uncertainty })),
      [
        `${prettyUnits(r.sensitivityMethod ?? '')}.`,
        "A source's power has a sensitivity equal to the share of the rise it causes (the rise is linear in the powers).",
      ],
    ),
    ...driftAgainstBand(
      'Each array shortcut’s worst drift against that band:',
      band.relative,
      band.fromH,
      hOnlyUncertain(sens),
      r.models.map((m) => ({ name: m.model, verdict: m.verdict, drift: m.drift })),
    ),
    {
      kind: 'paragraph',
      text: 'These are estimates of the stated model, to be confirmed by test: the band holds only the uncertainties the note above lists, and h is usually the largest uncertainty; follow the applicable codes, standards and licensed practice.',
    },
  ];
  return { id: 'uncertainty', title: 'How sure: sensitivities and uncertainty', blocks };
}
