/**
 * Plain-text rendering of a heat-sink check for the terminal: the sink, the fd-3d reference per source, the array
 * shortcuts' rises and drifts per source with their verdicts, the ledger, the flags and the cautions. Every number
 * names its model and how accurate it is.
 */
import { uncertaintyLines } from './format-uncertainty.js';
import { defaultDisplayUnits, inUnit, type DisplayUnit, type DisplayUnits, type HeatSinkCase } from '../case/index.js';
import { describeH, describeProfile, describeTip } from './describe-case.js';
import { signedPercentText } from './percent-text.js';
import type { SinkCheckReport } from './sink-types.js';
import type { Flag } from './types.js';

const pct = signedPercentText;
const sig = (x: number, n = 4): string =>
  !Number.isFinite(x) ? 'n/a' : Math.abs(x) >= 1e5 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(n - 1) : x.toPrecision(n);
/** An input value as the case gave it (SI units: the number itself; others: converted, 6 significant figures). */
const asGiven = (unit: DisplayUnit, si: number): string =>
  unit.scale === 1 && unit.offset === 0 ? String(si) : String(Number(inUnit(unit, si).toPrecision(6)));
const pad = (s: string, n: number): string => (s.length >= n ? s : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number): string => (s.length >= n ? s : ' '.repeat(n - s.length) + s);
const MARK: Record<Flag['severity'], string> = { error: 'x', warning: '!', info: 'i' };

/** The unit of an interface resistance (per unit area) beside each display unit of h: its inverse. */
const CONTACT_UNITS: Record<string, string> = { 'W/(m^2*K)': 'm^2*K/W', 'BTU/(h*ft^2*degF)': 'h*ft^2*degF/BTU' };

/**
 * A source's interface resistance (m^2*K/W in SI) in the inverse of the display unit of h: m^2*K/W, or h*ft^2*degF/BTU
 * (NIST SP 811, 2008, Appendix B.8: 1 degF*h*ft^2/Btu_IT = 0.1761102 m^2*K/W, the inverse of the h factor).
 */
export function contactResistanceText(u: DisplayUnits, si: number): string {
  const unit = CONTACT_UNITS[u.h.ascii];
  if (u.h.scale === 1 || unit === undefined) return `${si} m^2*K/W`;
  return `${Number((si / u.h.scale).toPrecision(6))} ${unit}`;
}

/** The sink in a few lines: fins, plate, sources, convection. */
export function describeSink(c: HeatSinkCase, u: DisplayUnits = defaultDisplayUnits): string[] {
  const lines: string[] = [];
  const mm = (x: number): string => `${Number(inUnit(u.length, x).toPrecision(4))} ${u.length.ascii}`;
  const T = (t: number): string => `${asGiven(u.temperature, t)} ${u.temperature.ascii}`;
  const H = (h: number): string => `${asGiven(u.h, h)} ${u.h.ascii}`;
  const a = c.array;
  if (c.fin === null) lines.push('bare plate (no fins)');
  else {
    const layout =
      a.kind === 'plates'
        ? `${a.count} plate fins at ${mm(a.pitch)} pitch`
        : `${a.rows} x ${a.columns} pins (${a.pattern}) at ${mm(a.pitch[0])} x ${mm(a.pitch[1])} pitch`;
    lines.push(`${layout}: ${describeProfile(c.fin.profile, u)}, ${c.fin.material.name}`);
  }
  lines.push(`plate ${mm(c.plate.width)} x ${mm(c.plate.length)} x ${mm(c.plate.thickness)}, ${c.plate.material.name}`);
  for (const s of c.sources) {
    const extra = [
      s.contactResistance > 0 ? `interface ${contactResistanceText(u, s.contactResistance)}` : '',
      s.limit_degC !== null ? `limit ${T(s.limit_degC)}` : '',
    ].filter((t) => t !== '');
    lines.push(
      `source ${s.name}: ${sig(inUnit(u.heat, s.power))} ${u.heat.ascii} over ${mm(s.size[0])} x ${mm(s.size[1])} at (${mm(s.centre[0])}, ${mm(s.centre[1])})${extra.length > 0 ? `, ${extra.join(', ')}` : ''}`,
    );
  }
  const h = c.convection.h;
  const finH = h.kind === 'power' ? `${describeH(h, u, 'theta_root')}, theta_root the fins' mean root rise` : describeH(h, u);
  const fins = c.fin === null ? '' : `fins: ${finH}, ${describeTip(c.convection.tip, u)}; `;
  const underside = c.convection.underside === null ? 'adiabatic' : H(c.convection.underside);
  lines.push(`ambient ${T(c.convection.ambient_degC)}; ${fins}exposed plate ${H(c.convection.plate)}; underside ${underside}`);
  return lines;
}

/** `u`: the units numbers are shown in (the JSON output stays SI). */
export function formatSinkCheck(c: HeatSinkCase, r: SinkCheckReport, u: DisplayUnits = defaultDisplayUnits): string {
  const out: string[] = [];
  const [W, T, dT] = [u.heat.ascii, u.temperature.ascii, u.temperatureDifference.ascii];
  const heat = (q: number): string => sig(inUnit(u.heat, q));
  const temp = (t: number): string => inUnit(u.temperature, t).toFixed(2);
  const rise = (d: number, n?: number): string => sig(inUnit(u.temperatureDifference, d), n);
  out.push(`fincheck check (heat sink): ${r.case}`);
  for (const line of describeSink(c, u)) out.push(`  ${line}`);
  out.push('');

  const ref = r.reference;
  const grid = ref.unknowns[0] === undefined ? '' : `; finest grid ${ref.unknowns[0].toLocaleString('en-US')} unknowns`;
  out.push(
    `Reference (fd-3d): sink resistance ${sig(inUnit(u.resistance, r.sinkResistance_KperW))} ${u.resistance.ascii} (hottest point), realised overall efficiency ${sig(r.overallEfficiency)}`,
  );
  out.push(`  energy balance ${ref.energyBalance.toExponential(1)}${grid}`);
  out.push(`  ${ref.note}`);
  const nameWidth = Math.max(10, ...r.sources.map((s) => s.name.length + 2));
  // Each column two wider than its header (11, 13, 12, 10 in W, degC and K).
  const heads = [`power [${W}]`, `mean [${T}]`, `max [${T}]`, `rise [${dT}]`] as const;
  const widths = heads.map((h) => h.length + 2) as [number, number, number, number];
  const sourceHead = `  ${pad('source', nameWidth)}${lpad(heads[0], widths[0])}${lpad(heads[1], widths[1])}${lpad(heads[2], widths[2])}${lpad(heads[3], widths[3])}${lpad('GCI', 10)}  limit`;
  out.push(sourceHead);
  out.push(`  ${'-'.repeat(sourceHead.length - 2)}`);
  for (const s of r.sources) {
    const limit =
      s.limit_degC === null || s.margin_K === null ? '-' : `${asGiven(u.temperature, s.limit_degC)} ${T} (margin ${rise(s.margin_K, 3)} ${dT})`;
    out.push(
      `  ${pad(s.name, nameWidth)}${lpad(heat(s.power_W), widths[0])}${lpad(temp(s.meanTemperature_degC), widths[1])}${lpad(temp(s.maxTemperature_degC), widths[2])}${lpad(rise(s.meanRise_K), widths[3])}${lpad(s.discretizationError === null ? 'n/a' : s.discretizationError.toExponential(1), 10)}  ${limit}`,
    );
  }
  out.push('');

  out.push(`Array shortcuts against fd-3d, on each source's mean rise (tolerance +/-${(100 * r.tolerance).toFixed(1)} %; the worst source decides):`);
  const modelWidth = Math.max(30, ...r.models.map((m) => m.model.length + 2));
  const cells = r.sources.map((s) => Math.max(18, s.name.length + 2));
  const head = `  ${pad('model', modelWidth)}${r.sources.map((s, j) => lpad(`${s.name} [${dT}]`, cells[j] ?? 18)).join('')}${lpad('worst drift', 13)}  verdict`;
  out.push(head);
  out.push(`  ${'-'.repeat(head.length - 2)}`);
  for (const m of r.models) {
    const perSource = m.sourceRise_K.map((r_, j) => lpad(`${rise(r_)} (${pct(m.sourceDrift[j] ?? NaN)})`, cells[j] ?? 18)).join('');
    out.push(`  ${pad(m.model, modelWidth)}${perSource}${lpad(pct(m.drift), 13)}  ${m.verdict}`);
  }
  for (const m of r.models) {
    const eta = m.finEfficiency === null ? '' : `eta_f ${m.finEfficiency.toFixed(4)}, `;
    out.push(`    ${pad(m.model, modelWidth - 2)} ${m.basis}`);
    out.push(`    ${' '.repeat(modelWidth - 2)} ${eta}eta_o ${m.overallEfficiency.toFixed(4)}; ${m.accuracy}`);
  }
  out.push('  (the shortcuts predict mean rises only; fd-3d also gives the hottest point above)');
  out.push('');

  out.push('What each assumption costs (one at a time):');
  const aw = Math.max(20, ...r.assumptions.map((a) => a.assumption.length + 2));
  for (const a of r.assumptions) out.push(`  ${pad(a.assumption, aw)}${lpad(a.drift === null ? 'n/a' : pct(a.drift), 10)}  ${a.method}`);
  out.push('');

  if (r.fins.length > 0) {
    const heats = r.fins.map((f) => f.heatRate_W);
    const hottest = r.fins.reduce((best, f) => (f.rootTemperature_degC > best.rootTemperature_degC ? f : best));
    const coolest = r.fins.reduce((best, f) => (f.rootTemperature_degC < best.rootTemperature_degC ? f : best));
    out.push(
      `Fins (fd-3d): ${r.fins.length} fins carry ${heat(heats.reduce((s, q) => s + q, 0))} ${W}, from ${heat(Math.min(...heats))} to ${heat(Math.max(...heats))} ${W} each; roots from ${temp(coolest.rootTemperature_degC)} ${T} (fin ${coolest.index}) to ${temp(hottest.rootTemperature_degC)} ${T} (fin ${hottest.index})`,
    );
    out.push('');
  }

  out.push(...sinkUncertaintyLines(r, u));
  if (r.flags.length > 0) {
    out.push('Flags:');
    for (const f of r.flags) out.push(`  [${MARK[f.severity]}] ${f.flag}: ${f.message}`);
    out.push('');
  }
  out.push('Cautions:');
  for (const caution of r.cautions) out.push(`  - ${caution}`);
  return `${out.join('\n')}\n`;
}

/**
 * The uncertainty section of a sink's check (format-uncertainty.ts); none when it was not computed. The rise and its
 * band are temperature differences: shown in `d.temperatureDifference` (K, or degF for a degF display: 9/5 K, no offset).
 */
function sinkUncertaintyLines(r: SinkCheckReport, d: DisplayUnits): string[] {
  const u = r.uncertainty;
  if (u === undefined || r.sensitivities === undefined) return [];
  const uncertain = r.sensitivities.filter((s) => s.uncertainty > 0);
  const source = r.sources.find((s) => s.name === u.source);
  const dT = d.temperatureDifference;
  return uncertaintyLines({
    quantity: `${u.source}'s mean rise ${source ? Number(inUnit(dT, source.meanRise_K).toPrecision(4)) : '?'} ${dT.ascii}`,
    unit: dT.ascii,
    relative: u.relative,
    low: inUnit(dT, u.low_K),
    high: inUnit(dT, u.high_K),
    fromH: u.fromH,
    hOnly: uncertain.length === 1 && uncertain[0]?.key === 'convection.h',
    note: u.note,
    derivative: 'd ln rise / d ln x',
    sensitivityMethod: r.sensitivityMethod ?? '',
    sensitivities: r.sensitivities.map((s) => ({ key: s.key, value: s.dlnRise_dlnx, uncertainty: s.uncertainty })),
    rows: r.models.map((m) => ({ label: m.model, verdict: m.verdict, drift: m.drift })),
  });
}
