/**
 * `fincheck optimize CASE`: the best dimensions of a fin from the shortcut and from the numerical reference, and what
 * the shortcut's optimum loses (design-questions.md).
 */
import type { Command } from 'commander';
import { z } from 'zod';
import { chartBytes, lineChart } from '../../src/images/index.js';
import { optimizeChartSpec } from '../../src/plots/index.js';
import { writeFilesAtomically } from '../../src/report/index.js';
import { parseOutFile } from './plot.js';
import { defaultDisplayUnits, inUnit, parseAnyCaseText, parseQuantity, type DisplayUnits } from '../../src/case/index.js';
import { optimizeFin, type Keep, type Objective, type OptimizeResult } from '../../src/design/index.js';
import { UsageError } from '../../src/errors.js';
import { readCaseInput } from '../case-input.js';
import { optimizeSinkCommand } from './optimize-sink.js';
import type { Io } from '../io.js';
import { displayUnitsOf, parseOption, referenceOption, toleranceOption, unitsHelp } from '../options.js';

const keepOption = z.enum(['profile-area', 'volume', 'mass', 'none']);
const forOption = z.enum(['max-heat', 'min-material', 'required']);

interface OptimizeCliOptions {
  vary?: string;
  keep?: string;
  for: string;
  heat?: string;
  temperature?: string;
  bounds: string[];
  reference: string;
  tolerance: string;
  json?: boolean;
  out?: string;
  units?: string;
}

/** "12 W", "12W", "0.5 kW", "12": a heat rate in W. */
function parseHeat(text: string): number {
  const m = /^\s*([0-9]*\.?[0-9]+(?:e[-+]?[0-9]+)?)\s*(W|kW|mW)?\s*$/i.exec(text);
  const scale = m?.[2] === undefined ? 1 : { w: 1, kw: 1e3, mw: 1e-3 }[m[2].toLowerCase()];
  const q = m && scale !== undefined ? Number(m[1]) * scale : Number.NaN;
  if (!(q > 0 && Number.isFinite(q))) throw new UsageError(`--heat: got ${JSON.stringify(text)}; expected a heat rate above 0 such as 12 W`);
  return q;
}

/** KEY=FROM:TO with lengths ("fin.thickness=0.5mm:4mm"; bare numbers are metres). */
function parseBounds(list: readonly string[]): Map<string, [number, number]> {
  const bounds = new Map<string, [number, number]>();
  for (const text of list) {
    const m = /^([^=]+)=([^:]+):(.+)$/.exec(text.trim());
    if (!m) throw new UsageError(`--bounds: got ${JSON.stringify(text)}; expected KEY=FROM:TO such as fin.thickness=0.5mm:4mm`);
    if ((m[1] as string).trim() === 'array.count') {
      // A heat sink's fin count: whole numbers.
      const [from, to] = [m[2] as string, m[3] as string].map((e) => (/^\s*[0-9]+\s*$/.test(e) ? Number(e) : Number.NaN)) as [number, number];
      if (!(from >= 1 && to > from))
        throw new UsageError(`--bounds: array.count: got ${m[2]}:${m[3]}; expected whole numbers 1 <= FROM < TO such as array.count=4:30`);
      bounds.set('array.count', [from, to]);
      continue;
    }
    const ends = [m[2] as string, m[3] as string].map((e) => parseQuantity(e.trim(), 'length'));
    const [from, to] = ends;
    if (!from?.ok || !to?.ok) {
      const problem = [from, to].find((e) => e && !e.ok);
      throw new UsageError(`--bounds: ${m[1]}: ${problem && !problem.ok ? problem.problem : 'a length is needed'}`);
    }
    if (!(from.value > 0 && to.value > from.value)) throw new UsageError(`--bounds: ${m[1]}: got ${m[2]}:${m[3]}; expected 0 < FROM < TO`);
    bounds.set((m[1] as string).trim(), [from.value, to.value]);
  }
  return bounds;
}

/** `u`: the units numbers are shown in (the JSON output stays SI). */
export function formatOptimize(r: OptimizeResult, u: DisplayUnits = defaultDisplayUnits): string {
  const mm = (x: number): string => `${Number(inUnit(u.length, x).toPrecision(5))} ${u.length.ascii}`;
  const heat = (q: number): string => `${inUnit(u.heat, q).toPrecision(6)} ${u.heat.ascii}`;
  const required = r.requiredHeat_W === null ? '' : u.heat.scale === 1 ? `${r.requiredHeat_W} W` : heat(r.requiredHeat_W);
  const lines = [`fincheck optimize: ${r.case}`];
  const goal =
    r.objective === 'max-heat'
      ? `the most heat for the ${r.keep} kept (${r.dependent} follows ${r.vary.join(', ')})`
      : r.objective === 'required'
        ? `${r.vary.join(', ')} that removes ${required}`
        : `the least material that removes ${required} (varying ${r.vary.join(', ')})`;
  lines.push(`  goal: ${goal}`);
  lines.push(
    `  bounds: ${Object.entries(r.bounds)
      .map(([k, [a, b]]) => `${k} ${mm(a)} to ${mm(b)}`)
      .join('; ')}`,
    '',
  );
  const dims = (values: Record<string, number>) =>
    Object.entries(values)
      .map(([k, v]) => `${k} = ${mm(v)}`)
      .join(', ');
  const err = r.reference.discretizationError === null ? 'not estimated' : `${r.reference.discretizationError.toExponential(1)} (GCI)`;
  lines.push(`Reference ${r.reference.model} (${r.reference.evaluations} refinement studies)`);
  lines.push(`  optimum     ${dims(r.reference.values)}`);
  lines.push(`  heat rate   ${heat(r.reference.heatRate_W)}  (discretisation error ${err}${r.reference.resolved ? '' : ', NOT resolved'})`);
  lines.push('Shortcut');
  lines.push(`  optimum     ${dims(r.shortcut.values)}`);
  lines.push(`  heat rate   ${heat(r.shortcut.heatRate_W)}  (the shortcut's own value)`);
  lines.push(`  method      ${r.shortcut.method}`);
  lines.push('');
  lines.push(`The reference at the shortcut's dimensions: ${heat(r.shortcutAtReference_W)}`);
  const tiny = r.reference.discretizationError !== null && Math.abs(r.loss) < 2 * r.reference.discretizationError;
  const lossWords =
    r.objective === 'max-heat'
      ? `loss of following the shortcut: ${(100 * (tiny ? Math.abs(r.loss) : r.loss)).toFixed(3)} % of the reference optimum's heat${tiny ? ' (below the reference error: no measurable loss)' : ''}`
      : `the shortcut asks for ${(100 * r.loss).toFixed(2)} % ${r.loss >= 0 ? 'more' : 'less'} material than the reference`;
  lines.push(lossWords);
  for (const n of r.notes) lines.push(`note: ${n}`);
  lines.push('', ...r.cautions.map((x) => `caution: ${x}`));
  return `${lines.join('\n')}\n`;
}

export function registerOptimize(program: Command, io: Io): Command {
  return program
    .command('optimize')
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
    .description('find the best fin dimensions from the shortcut and from the numerical reference, and what the shortcut loses')
    .option(
      '--vary <keys>',
      'dimension(s) to vary: fin.thickness, fin.length, fin.diameter, ... (two, comma-separated, for min-material); a heat sink: array.count or fin.thickness',
    )
    .option(
      '--keep <amount>',
      'what stays fixed: profile-area, volume, mass (same material: the volume) or none (default: profile-area for max-heat, volume for a pin; none for the other goals; a heat sink: none, volume or mass, default none)',
    )
    .option(
      '--for <goal>',
      "max-heat (with a kept amount), min-material or required (with --heat); a heat sink: max-heat (the lowest hottest-source temperature) or required (with --temperature or the sources' limits)",
      'max-heat',
    )
    .option('--heat <Q>', 'the required heat rate, e.g. 12 W')
    .option('--temperature <T>', "a heat sink's required source temperature, e.g. 110 degC (default: each source's limit; not for a single fin)")
    .option(
      '--bounds <KEY=FROM:TO>',
      'range of a varied key, e.g. fin.thickness=0.5mm:4mm or array.count=4:30 (default 1/4 to 4 times the case value, fins that fit with a gap)',
      (v: string, all: string[]) => [...all, v],
      [],
    )
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--tolerance <t>', 'tolerance of the reference studies (resolved to a tenth of it), e.g. 2%', '2%')
    .option('--json', 'print one JSON document')
    .option('--out <file>', 'also draw the heat rate against the varied key along the constraint, both curves and both optima: .png or .svg')
    .option('--units <system>', unitsHelp)
    .addHelpText(
      'after',
      `
Examples:
  fincheck optimize demo/inverter-plate-fin.yaml --vary fin.thickness --keep profile-area --for max-heat
  fincheck optimize demo/led-pin-fin.yaml --vary fin.diameter --keep volume --bounds fin.diameter=1mm:8mm
  fincheck optimize my-fin.yaml --vary fin.length --for required --heat 12W
  fincheck optimize my-fin.yaml --vary fin.thickness,fin.length --keep none --for min-material --heat 12W
  fincheck optimize demo/inverter-plate-fin.yaml --vary fin.thickness --out optimum.png
  fincheck optimize demo/motor-drive-sink.yaml --vary array.count --for required --temperature 95degC
  fincheck optimize demo/motor-drive-sink.yaml --vary fin.thickness --keep volume --out sink-optimum.png`,
    )
    .action(async (file: string, o: OptimizeCliOptions) => {
      if (o.vary === undefined || o.vary.trim() === '') throw new UsageError('--vary: a dimension to vary is required, e.g. --vary fin.thickness');
      const goal = parseOption('--for', forOption, o.for, 'max-heat, min-material or required');
      const keepGiven = o.keep === undefined ? undefined : (parseOption('--keep', keepOption, o.keep, 'profile-area, volume, mass or none') as Keep);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const bounds = parseBounds(o.bounds);
      const out = o.out === undefined ? null : parseOutFile(o.out);
      displayUnitsOf(o.units, undefined);
      const { text, fileName } = await readCaseInput(file, io);
      const any = parseAnyCaseText(text, fileName);
      if (any.kind === 'heat-sink') {
        const units = displayUnitsOf(o.units, any.case.display);
        await optimizeSinkCommand(text, fileName, { ...o, vary: o.vary }, { tolerance, bounds, out, units }, io);
        return;
      }
      if (o.temperature !== undefined)
        throw new UsageError(
          '--temperature: a required temperature is a heat-sink goal (a source temperature); a single fin has its base temperature given',
        );
      if (goal !== 'max-heat' && o.heat === undefined) throw new UsageError(`--heat: --for ${goal} needs the required heat rate, e.g. --heat 12W`);
      if (goal === 'max-heat' && o.heat !== undefined)
        throw new UsageError('--heat: --for max-heat takes no required heat rate (use --for required or min-material)');
      const objective: Objective = goal === 'max-heat' ? { kind: 'max-heat' } : { kind: goal, heat_W: parseHeat(o.heat as string) };
      const result = await optimizeFin({
        caseText: text,
        fileName,
        vary: o.vary.split(',').map((k) => k.trim()),
        keep: keepGiven ?? 'default',
        objective,
        bounds,
        reference,
        tolerance,
        labels: { vary: '--vary', keep: '--keep', bounds: '--bounds', heat: '--heat', out: '--out' },
        curve: out !== null,
      });
      if (out !== null && result.curve !== undefined) {
        const c = result.curve;
        const at = (p: { values: Record<string, number> }): number => p.values[c.key] ?? Number.NaN;
        const svg = lineChart(
          optimizeChartSpec(
            {
              caseName: result.case,
              objective: result.objective,
              keep: result.keep,
              key: c.key,
              x_m: c.x_m,
              reference_W: c.reference_W,
              shortcut_W: c.shortcut_W,
              curveNote: c.note,
              reference: { x_m: at(result.reference), heatRate_W: result.reference.heatRate_W, model: result.reference.model },
              shortcut: {
                x_m: at(result.shortcut),
                heatRate_W: result.shortcut.heatRate_W,
                referenceHeatRate_W: result.shortcutAtReference_W,
                method: result.shortcut.method,
              },
              bounds_m: result.bounds[c.key] ?? [c.x_m[0] ?? 0, c.x_m[c.x_m.length - 1] ?? 1],
              requiredHeat_W: result.requiredHeat_W,
            },
            { width: 1200, height: 750 },
          ),
        ).svg;
        writeFilesAtomically([{ path: out.path, bytes: await chartBytes(svg, out.format, { dpi: 96 }) }]);
      }
      if (o.json) {
        io.out(`${JSON.stringify(out === null ? result : { ...result, chartFile: out.path }, null, 2)}\n`);
        return;
      }
      io.out(formatOptimize(result, displayUnitsOf(o.units, parseAnyCaseText(text, fileName).case.display)));
      if (out !== null) io.out(`wrote ${out.path}: heat rate against ${result.vary[0] ?? ''} along the constraint, both curves and both optima\n`);
    });
}
