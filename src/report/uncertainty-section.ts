/**
 * The report's section "How sure": the uncertainty band of the reference heat rate, the sensitivities it comes
 * from, and each model's drift against the band (the same words as `check`'s text); heat in the display units.
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import { fractionWords, type CheckReport } from '../compare/index.js';
import { sig, signedPercent } from '../plots/index.js';
import { prettyUnits } from './case-inputs.js';
import type { Block, Section } from './document.js';

const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;

/** null when the check computed no sensitivities. */
export function uncertaintySection(r: CheckReport, modelName: (m: CheckReport['models'][number]) => string, units: DisplayUnits): Section | null {
  const u = r.uncertainty;
  const sens = r.sensitivities;
  if (u === undefined || sens === undefined) return null;
  const heat = units.heat;
  const uncertain = sens.filter((s) => s.uncertainty > 0);
  const hOnly = uncertain.length === 1 && uncertain[0]?.key === 'convection.h';
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: `With the inputs' stated uncertainties, the reference heat rate ${sig(inUnit(heat, r.reference.heatRate_W), 5)} ${heat.pretty} is known to ±${pct(u.relative)} (one standard uncertainty): ${sig(inUnit(heat, u.low_W), 4)} to ${sig(inUnit(heat, u.high_W), 4)} ${heat.pretty}. ${prettyUnits(u.note)}.`,
    },
    {
      kind: 'table',
      caption: 'Sensitivities of the reference heat rate, d ln Q / d ln x (the % change of Q per % change of the input)',
      columns: [
        { title: 'Input', align: 'left' },
        { title: 'd ln Q / d ln x', align: 'right' },
        { title: 'Uncertainty u', align: 'right' },
        { title: '|S| u', align: 'right' },
      ],
      rows: sens.map((s) => ({
        cells: [
          s.key,
          sig(s.dlnQ_dlnx, 4),
          s.uncertainty > 0 ? pct(s.uncertainty) : '–',
          s.uncertainty > 0 ? pct(Math.abs(s.dlnQ_dlnx * s.uncertainty)) : '–',
        ],
      })),
      notes: [`${prettyUnits(r.sensitivityMethod ?? '')}.`, 'base.temperature stands for the base temperature rise over the fluid.'],
    },
  ];
  if (u.relative > 0) {
    const band = hOnly
      ? `the ±${pct(u.relative)} that the h uncertainty alone gives`
      : `the ±${pct(u.relative)} of the stated uncertainties (h alone ±${pct(u.fromH)})`;
    blocks.push({ kind: 'paragraph', text: 'Each model’s drift against that band:' });
    blocks.push({
      kind: 'list',
      items: r.models.map(
        (m) => `${modelName(m)} (${m.verdict}): drift ${signedPercent(m.drift)} is ${fractionWords(Math.abs(m.drift) / u.relative)} ${band}.`,
      ),
    });
  }
  return { id: 'uncertainty', title: 'How sure: sensitivities and uncertainty', blocks };
}
