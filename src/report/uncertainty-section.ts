/**
 * The report's section "How sure": the uncertainty band of the reference heat rate, the sensitivities it comes
 * from, and each model's drift against the band (the same words as `check`'s text); heat in the display units.
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import type { CheckReport } from '../compare/index.js';
import { sig } from '../plots/index.js';
import { prettyUnits } from './case-inputs.js';
import type { Block, Section } from './document.js';
import { driftAgainstBand, hOnlyUncertain, pct, sensitivityTable } from './how-sure-blocks.js';

/** null when the check computed no sensitivities. */
export function uncertaintySection(r: CheckReport, modelName: (m: CheckReport['models'][number]) => string, units: DisplayUnits): Section | null {
  const u = r.uncertainty;
  const sens = r.sensitivities;
  if (u === undefined || sens === undefined) return null;
  const heat = units.heat;
  const blocks: Block[] = [
    {
      kind: 'paragraph',
      text: `With the inputs' stated uncertainties, the reference heat rate ${sig(inUnit(heat, r.reference.heatRate_W), 5)} ${heat.pretty} is known to ±${pct(u.relative)} (one standard uncertainty): ${sig(inUnit(heat, u.low_W), 4)} to ${sig(inUnit(heat, u.high_W), 4)} ${heat.pretty}. ${prettyUnits(u.note)}.`,
    },
    sensitivityTable(
      'Sensitivities of the reference heat rate, d ln Q / d ln x (the % change of Q per % change of the input)',
      'd ln Q / d ln x',
      sens.map((s) => ({ key: s.key, s: s.dlnQ_dlnx, uncertainty: s.uncertainty })),
      [`${prettyUnits(r.sensitivityMethod ?? '')}.`, 'base.temperature stands for the base temperature rise over the fluid.'],
    ),
    ...driftAgainstBand(
      'Each model’s drift against that band:',
      u.relative,
      u.fromH,
      hOnlyUncertain(sens),
      r.models.map((m) => ({ name: modelName(m), verdict: m.verdict, drift: m.drift })),
    ),
  ];
  return { id: 'uncertainty', title: 'How sure: sensitivities and uncertainty', blocks };
}
