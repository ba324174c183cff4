/**
 * The readable summary `fincheck map` prints: the axes, the reference, per shortcut the share of the map where it
 * is ok / marginal / unsafe and its drift range, the case's own point, the points without results grouped by
 * cause, and the files written. Drifts carry their sign as `check` prints them (percent-text.ts).
 */
import { defaultDisplayUnits, inUnit, type DisplayUnits } from '../case/index.js';
import { signedPercentText } from '../compare/index.js';
import { isPointError } from './types.js';
import type { MapRun } from './run-map.js';
import type { MapAxis } from './types.js';

/** A fraction in %, without a minus sign on a value that rounds to zero. */
function pct(fraction: number): string {
  const text = (100 * fraction).toFixed(Math.abs(fraction) < 0.1 ? 2 : 1);
  return `${/^-0\.0*$/.test(text) ? text.slice(1) : text} %`;
}

function value(v: number, axis: MapAxis): string {
  const text = `${Number(v.toPrecision(6))}`;
  return axis.displayUnit === '' ? text : `${text} ${axis.displayUnit}`;
}

function axisLine(name: string, axis: MapAxis): string {
  const first = axis.values[0] as number;
  const last = axis.values[axis.values.length - 1] as number;
  return `  ${name}: ${axis.key} from ${value(first, axis)} to ${value(last, axis)}, ${axis.values.length} values${axis.log ? ' (log spacing)' : ''}`;
}

function pad(text: string, width: number): string {
  return text.length >= width ? `${text} ` : text + ' '.repeat(width - text.length);
}

/** `u`: the units of a heat sink's resistance and temperature on the case's line (the axes carry their own units). */
export function formatMapSummary(run: MapRun, files: readonly string[], u: DisplayUnits = defaultDisplayUnits): string {
  const { summary } = run;
  const tolerance = run.job.check.tolerance;
  const lines: string[] = [];
  lines.push(`Map of ${run.caseName}`);
  lines.push(axisLine('x', run.x), axisLine('y', run.y));
  const references =
    summary.references.length > 1 ? summary.references.map((r) => `${r.model} at ${r.points} points`).join(', ') : run.casePoint.reference.model;
  const unresolved =
    summary.unresolvedPoints > 0
      ? `  reference NOT RESOLVED at ${summary.unresolvedPoints} points (discretisation error above a tenth of the tolerance): their verdicts are 'unresolved'`
      : '';
  lines.push(
    `  reference ${references}; tolerance ${pct(tolerance)} (ok), ${pct(2 * tolerance)} (marginal); ` +
      `${summary.points} points, ${summary.solved} solved${summary.errors > 0 ? `, ${summary.errors} invalid` : ''}`,
  );
  if (unresolved) lines.push(unresolved);
  if (run.job.check.guess === 'base') {
    lines.push('  nonlinear fin: the shortcuts use h and k at the base temperature (check also shows the fin-averaged guess)');
  }
  lines.push('');
  const w = run.job.kind === 'heat-sink' ? 30 : 16;
  lines.push(
    `${pad('shortcut', w)}${pad('ok', 10)}${pad('marginal', 10)}${pad('unsafe', 10)}drift over the map${run.job.kind === 'heat-sink' ? " (worst source's mean rise)" : ''}`,
  );
  for (const m of summary.models) {
    const share = (n: number): string => pct(n / summary.points);
    const range = Number.isFinite(m.minDrift) ? `${signedPercentText(m.minDrift)} .. ${signedPercentText(m.maxDrift)}` : 'no value';
    lines.push(`${pad(m.model, w)}${pad(share(m.ok), 10)}${pad(share(m.marginal), 10)}${pad(share(m.unsafe), 10)}${range}`);
  }
  const own = run.casePoint;
  if (own.models.length > 0) {
    lines.push('');
    const where = `${run.x.key} = ${value(own.x, run.x)}, ${run.y.key} = ${value(own.y, run.y)}`;
    const at = Number.isFinite(own.x) && Number.isFinite(own.y) ? where : 'not on the map';
    if (run.job.kind === 'heat-sink') {
      const r = own.reference;
      lines.push(
        `This case (${at}): fd-3d sink resistance ${r.sinkResistance_KperW === undefined ? 'n/a' : inUnit(u.resistance, r.sinkResistance_KperW).toPrecision(4)} ${u.resistance.ascii}, hottest point ${r.maxTemperature_degC === undefined ? 'n/a' : inUnit(u.temperature, r.maxTemperature_degC).toFixed(1)} ${u.temperature.ascii}`,
      );
      for (const m of own.models)
        lines.push(`  ${pad(m.model, 30)}drift ${pad(signedPercentText(m.drift), 10)}${pad(m.verdict, 11)}(worst source: ${m.worstSource ?? 'n/a'})`);
    } else {
      lines.push(
        `This case (${at}): Bi = ${own.biot === null ? 'n/a' : own.biot.toPrecision(3)}, mL = ${own.mL === null ? 'n/a' : own.mL.toPrecision(3)}`,
      );
      for (const m of own.models) lines.push(`  ${pad(m.model, 16)}drift ${pad(signedPercentText(m.drift), 10)}${m.verdict}`);
    }
  }
  if (summary.errors > 0) {
    lines.push('');
    lines.push(`${summary.errors} points have no result (grey on the maps, "error" in map.csv):`);
    for (const g of summary.errorGroups.slice(0, 5)) lines.push(`  ${g.count} x ${g.example}`);
    if (summary.errorGroups.length > 5) lines.push(`  ... and ${summary.errorGroups.length - 5} other kinds of problem`);
  }
  let worstError = 0;
  for (const p of run.points) if (!isPointError(p)) worstError = Math.max(worstError, p.reference.discretizationError);
  lines.push('');
  lines.push(
    run.job.kind === 'heat-sink'
      ? `Reference accuracy: fd-3d on its default three grids at every point (not refined further); estimated error of a source's mean rise (GCI) at most ${worstError.toExponential(1)} (relative) over the map.`
      : `Reference accuracy: estimated discretisation error of Q (GCI) at most ${worstError.toExponential(1)} (relative) over the map.`,
  );
  lines.push('Cautions: estimates of the stated model, to be confirmed by test; h is usually the largest uncertainty;');
  lines.push('  follow the applicable codes, standards and licensed practice (overheated electronics fail, hot surfaces burn).');
  if (files.length > 0) {
    lines.push('');
    lines.push('Files:');
    for (const f of files) lines.push(`  ${f}`);
  }
  return `${lines.join('\n')}\n`;
}
