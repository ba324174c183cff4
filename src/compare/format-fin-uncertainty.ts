/** The uncertainty section of a single fin's check text (format-uncertainty.ts), from its report. */
import { defaultDisplayUnits, inUnit, type DisplayUnits } from '../case/index.js';
import { uncertaintyLines } from './format-uncertainty.js';
import type { CheckReport, ModelResult } from './types.js';

/** No lines when the check computed no sensitivities. Heat rates in the display units `d` (the JSON stays SI). */
export function fincheckUncertaintyLines(r: CheckReport, label: (m: ModelResult) => string, d: DisplayUnits = defaultDisplayUnits): string[] {
  const u = r.uncertainty;
  if (u === undefined || r.sensitivities === undefined) return [];
  const uncertain = r.sensitivities.filter((s) => s.uncertainty > 0);
  return uncertaintyLines({
    quantity: `reference heat rate ${Number(inUnit(d.heat, r.reference.heatRate_W).toPrecision(5))} ${d.heat.ascii}`,
    unit: d.heat.ascii,
    relative: u.relative,
    low: inUnit(d.heat, u.low_W),
    high: inUnit(d.heat, u.high_W),
    fromH: u.fromH,
    hOnly: uncertain.length === 1 && uncertain[0]?.key === 'convection.h',
    note: u.note,
    derivative: 'd ln Q / d ln x',
    sensitivityMethod: r.sensitivityMethod ?? '',
    sensitivities: r.sensitivities.map((s) => ({ key: s.key, value: s.dlnQ_dlnx, uncertainty: s.uncertainty })),
    rows: r.models.map((m) => ({ label: label(m), verdict: m.verdict, drift: m.drift })),
  });
}
