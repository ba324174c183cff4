/**
 * `fincheck optimize SINK.yaml`: the heat-sink half of the optimize command (the fin count or the fin thickness at a
 * fixed plate; src/design optimize-sink.ts). The options are those of `optimize`; this file maps them for a sink,
 * refuses what a sink does not take (naming the option, the value and what is accepted), writes the chart and
 * prints the text or the JSON.
 */
import { chartBytes, lineChart } from '../../src/images/index.js';
import { sinkOptimizeChartSpec } from '../../src/plots/index.js';
import { writeFilesAtomically } from '../../src/report/index.js';
import { inUnit, parseQuantity, type DisplayUnits } from '../../src/case/index.js';
import { optimizeSink, type OptimizeSinkResult, type SinkKeep } from '../../src/design/index.js';
import { UsageError } from '../../src/errors.js';
import type { Io } from '../io.js';

export interface SinkOptimizeOptions {
  vary: string;
  keep?: string;
  for: string;
  heat?: string;
  temperature?: string;
  reference: string;
  json?: boolean;
}

/** The text of `optimize` for a sink, in the display units `u` (the JSON stays SI). */
export function formatSinkOptimize(r: OptimizeSinkResult, u: DisplayUnits): string {
  const count = r.vary[0] === 'array.count';
  const len = (x: number): string => `${Number(inUnit(u.length, x).toPrecision(4))} ${u.length.ascii}`;
  const value = (k: string, v: number): string => (k === 'array.count' ? `${v}` : len(v));
  const dims = (values: Record<string, number>): string =>
    Object.entries(values)
      .map(([k, v]) => `${k} = ${value(k, v)}`)
      .join(', ');
  const temp = (t: number): string => `${inUnit(u.temperature, t).toFixed(2)} ${u.temperature.ascii}`;
  const rise = (k: number): string => `${inUnit(u.temperatureDifference, k).toFixed(2)} ${u.temperatureDifference.ascii}`;
  const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;
  const lines = [`fincheck optimize (heat sink): ${r.case}`];
  const limitWords =
    r.requiredTemperature_degC !== null
      ? `every source's mean temperature at or below ${temp(r.requiredTemperature_degC)}`
      : `each source's own limit (${(r.limits ?? []).map((l) => `${l.source} ${temp(l.limit_degC)}`).join(', ')})`;
  lines.push(
    `  goal: ${
      r.objective === 'max-heat'
        ? `the lowest hottest-source temperature (the sink carries its sources' power, so the most heat is the coolest source), varying ${r.vary[0]}`
        : `the ${count ? 'fewest fins' : 'thinnest fins'} that keep ${limitWords}`
    }`,
  );
  lines.push(`  keep: ${r.keep}${r.dependent === null ? ' (the plate fixed)' : ` (${r.dependent} follows)`}`);
  lines.push(
    `  bounds: ${Object.entries(r.bounds)
      .map(([k, [a, b]]) => `${k} ${value(k, a)} to ${value(k, b)}`)
      .join('; ')}`,
    '',
  );
  const err = r.reference.discretizationError === null ? 'not estimated' : `${r.reference.discretizationError.toExponential(1)} (GCI)`;
  lines.push(
    `Reference fd-3d (${r.reference.evaluations} refinement studies: ${r.reference.search.studies} on the search study, ${r.reference.confirm.studies} on the default study)`,
  );
  lines.push(`  answer      ${dims(r.reference.values)}`);
  lines.push(
    `  hottest     ${r.reference.hottestSource}: mean ${temp(r.reference.hottestTemperature_degC)}, rise ${rise(r.reference.hottestRise_K)}  (fd-3d default study, discretisation error ${err}${r.reference.resolved ? '' : ', NOT resolved'})`,
  );
  lines.push(
    `  search      ${dims(r.reference.search.values)} on ${r.reference.search.grid} (GCI ${r.reference.search.discretizationError?.toExponential(1) ?? 'not estimated'})`,
  );
  if (r.objective === 'required') {
    const over = (r.limits ?? []).filter((l) => {
      const j = r.sourceNames.indexOf(l.source);
      return (r.reference.sourceMax_degC[j] ?? Number.NEGATIVE_INFINITY) > l.limit_degC;
    });
    lines.push(
      `  largest     ${r.sourceNames.map((n, j) => `${n} ${temp(r.reference.sourceMax_degC[j] ?? Number.NaN)}`).join(', ')} (the largest over each source; the limit is on the mean)${over.length > 0 ? `: ABOVE the limit of ${over.map((l) => l.source).join(', ')}` : ''}`,
    );
  }
  // Neighbours differ from the answer by little near a smooth optimum: more digits (the same study, so its error is shared).
  const fine = (k: number): string => `${Number(inUnit(u.temperatureDifference, k).toPrecision(6))} ${u.temperatureDifference.ascii}`;
  for (const n of r.reference.neighbours)
    lines.push(`  neighbour   ${dims(n.values)}: rise ${fine(n.hottestRise_K)} against ${fine(r.reference.hottestRise_K)} (fd-3d default study)`);
  lines.push(`Shortcut ${r.shortcut.model}`);
  lines.push(`  answer      ${dims(r.shortcut.values)}`);
  lines.push(
    `  hottest     ${r.shortcut.hottestSource}: mean ${temp(r.shortcut.hottestTemperature_degC)}  (the shortcut's own value: closed form, exact for its own assumptions)`,
  );
  lines.push(`  method      ${r.shortcut.method}`);
  lines.push('');
  lines.push(`The reference at the shortcut's answer: hottest rise ${rise(r.shortcutAtReference_K)} (fd-3d default study, error ${err})`);
  if (r.objective === 'max-heat') {
    const tiny = r.reference.discretizationError !== null && Math.abs(r.loss) < 2 * r.reference.discretizationError;
    lines.push(
      `loss of following the shortcut: the hottest rise ${(100 * r.loss).toFixed(3)} % above the reference optimum's${tiny ? ' (below the reference error: no measurable loss)' : ''}`,
    );
  } else {
    lines.push(`the shortcut asks for ${(100 * Math.abs(r.loss)).toFixed(1)} % ${r.loss >= 0 ? 'more' : 'less'} fin material than the reference`);
    lines.push(`the shortcut's answer ${r.shortcutKeepsLimit === true ? 'keeps' : 'does NOT keep'} the limit in the reference (fd-3d)`);
  }
  if (r.hSensitivity !== null) {
    const s = r.hSensitivity;
    const at =
      s.atLowH !== null || s.atHighH !== null
        ? `; fewest fins at h x 0.75: ${s.atLowH ?? 'none within the bounds'}, at h x 1.25: ${s.atHighH ?? 'none'}`
        : '';
    const d =
      s.dlnAnswer_dlnh === null
        ? ''
        : `d ln answer / d ln h = ${s.dlnAnswer_dlnh.toFixed(3)} (a 25 % error in h moves the answer about ${pct(Math.abs(0.25 * s.dlnAnswer_dlnh))})`;
    lines.push(`sensitivity to h: ${d}${at}`);
    lines.push(`  method: ${s.method}`);
  }
  for (const n of r.notes) lines.push(`note: ${n}`);
  lines.push('', ...r.cautions.map((x) => `caution: ${x}`));
  return `${lines.join('\n')}\n`;
}

/** Runs optimize on a sink: options checked, the search, the chart, the output. */
export async function optimizeSinkCommand(
  text: string,
  fileName: string,
  o: SinkOptimizeOptions,
  settings: { tolerance: number; bounds: Map<string, [number, number]>; out: { path: string; format: 'png' | 'svg' } | null; units: DisplayUnits },
  io: Io,
): Promise<void> {
  if (o.for !== 'max-heat' && o.for !== 'required')
    throw new UsageError(
      `--for: got ${o.for}; a heat sink takes max-heat (the lowest hottest-source temperature) or required (with --temperature or a source limit)`,
    );
  if (o.heat !== undefined)
    throw new UsageError(
      `--heat: got ${o.heat}; a heat sink carries its sources' given power: ask for a source temperature with --for required --temperature T`,
    );
  if (o.reference !== 'auto') throw new UsageError(`--reference: got ${o.reference}; a heat sink's reference is fd-3d: leave --reference at auto`);
  if (o.keep !== undefined && !['none', 'volume', 'mass'].includes(o.keep))
    throw new UsageError(
      `--keep: got ${o.keep}; a heat sink takes none (the plate fixed, the count or thickness free), volume or mass (the fins' material held)`,
    );
  let temperature: number | null = null;
  if (o.temperature !== undefined) {
    if (o.for !== 'required') throw new UsageError('--temperature: a required temperature goes with --for required');
    const q = parseQuantity(o.temperature.trim(), 'temperature');
    if (!q.ok || !Number.isFinite(q.value))
      throw new UsageError(`--temperature: got ${JSON.stringify(o.temperature)}; expected a temperature such as 110 degC`);
    temperature = q.value;
  }
  const result = await optimizeSink({
    caseText: text,
    fileName,
    vary: o.vary.split(',').map((k) => k.trim()),
    keep: (o.keep as SinkKeep | undefined) ?? 'default',
    objective: o.for === 'max-heat' ? { kind: 'max-heat' } : { kind: 'required', temperature_degC: temperature },
    bounds: settings.bounds,
    tolerance: settings.tolerance,
    labels: { vary: '--vary', keep: '--keep', bounds: '--bounds', temperature: '--temperature', out: '--out' },
    curve: settings.out !== null,
  });
  const out = settings.out;
  if (out !== null && result.curve !== undefined) {
    const c = result.curve;
    const u = settings.units;
    const ambient = result.reference.hottestTemperature_degC - result.reference.hottestRise_K;
    const at = (p: { values: Record<string, number> }): number => p.values[c.key] ?? Number.NaN;
    const svg = lineChart(
      sinkOptimizeChartSpec(
        {
          caseName: result.case,
          objective: result.objective,
          keep: result.keep,
          key: c.key,
          x: c.x,
          reference_degC: c.reference_K.map((k) => ambient + k),
          shortcut_degC: c.shortcut_K.map((k) => ambient + k),
          curveNote: c.note,
          reference: { x: at(result.reference), temperature_degC: result.reference.hottestTemperature_degC, model: result.reference.model },
          shortcut: {
            x: at(result.shortcut),
            temperature_degC: result.shortcut.hottestTemperature_degC,
            referenceTemperature_degC: ambient + result.shortcutAtReference_K,
            model: result.shortcut.model,
          },
          bounds: result.bounds[c.key] ?? [c.x[0] ?? 0, c.x[c.x.length - 1] ?? 1],
          requiredTemperature_degC: result.requiredTemperature_degC,
          units: {
            lengthScale: u.length.scale,
            length: u.length.pretty,
            temperatureScale: u.temperature.scale,
            temperatureOffset: u.temperature.offset,
            temperature: u.temperature.pretty,
          },
        },
        { width: 1200, height: 750 },
      ),
    ).svg;
    writeFilesAtomically([{ path: out.path, bytes: await chartBytes(svg, out.format, { dpi: 96 }) }]);
  }
  if (o.json === true) {
    io.out(`${JSON.stringify(out === null ? result : { ...result, chartFile: out.path }, null, 2)}\n`);
    return;
  }
  io.out(formatSinkOptimize(result, settings.units));
  if (out !== null) io.out(`wrote ${out.path}: the hottest source's temperature against ${result.vary[0] ?? ''}, both curves and both optima\n`);
}
