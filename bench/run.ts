/**
 * `npm run bench`: the performance targets of fincheck, measured and printed as one table of medians.
 *
 * Areas (one file each, each returns rows): oned.ts (tridiagonal solves), twod.ts (2-D grid solves
 * against a general banded LU), images.ts (PNG charts), process.ts (whole `fincheck check` runs).
 * sink.ts (fd-3d heat-sink solve and study), uncertainty.ts (check's sensitivities and sample), optimize-sink.ts (optimize on
 * the demo sink, one whole process), nonlinear.ts (Newton vs linear cost), process.ts also `report` and `map` as whole processes; `map2d`
 * (the 41x41 map with the 2-D reference, about a minute) runs only when named.
 * Run a subset by name: `npm run bench -- 1d images`. Nothing is written to disk: the table is printed.
 * Standalone timings with more detail, outside the table (`npx tsx bench/NAME.ts`): tridiagonal-solvers.ts,
 * twod-timings.ts, nonlinear2d-cost.ts, sink-check-parts.ts (the sink check's studies grid by grid).
 *
 * The machine is shared (2 cores, other developers' builds and tests): the load average is printed
 * before and after, wall-time medians are the measured values, and the notes carry min/max and the
 * CPU time of this process per run, which a busy neighbour inflates much less than the wall time.
 */
import { cpus, loadavg } from 'node:os';
import { benchImages } from './images.js';
import { errored, type BenchRow } from './measure.js';
import { benchOneD } from './oned.js';
import { benchCommands, benchMap2D, benchProcess } from './process.js';
import { benchNonlinear } from './nonlinear.js';
import { benchTwoD } from './twod.js';
import { benchSink } from './sink.js';
import { benchUncertainty } from './uncertainty.js';
import { benchOptimizeSink } from './optimize-sink.js';

const AREAS: Record<string, () => Promise<BenchRow[]>> = {
  '1d': benchOneD,
  '2d': benchTwoD,
  images: benchImages,
  process: benchProcess,
  nonlinear: benchNonlinear,
  commands: benchCommands,
  map2d: benchMap2D,
  sink: benchSink,
  uncertainty: benchUncertainty,
  optimize: benchOptimizeSink,
};

/** Areas run when none is named: all but the minute-long 2-D map. */
const DEFAULT_AREAS = ['1d', '2d', 'images', 'process', 'nonlinear', 'commands', 'sink', 'uncertainty', 'optimize'];

function loadText(): string {
  return loadavg()
    .map((l) => l.toFixed(2))
    .join(' / ');
}

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

function printTable(rows: readonly BenchRow[]): void {
  const header = { n: '#', area: 'area', item: 'item', target: 'target', measured: 'median', verdict: 'verdict', cpu: 'CPU median' };
  const lines = rows.map((r, k) => ({
    n: String(k + 1),
    area: r.area,
    item: r.item,
    target: r.target,
    measured: r.measured,
    verdict: r.verdict,
    cpu: r.cpu,
  }));
  const keys = ['n', 'area', 'item', 'target', 'measured', 'verdict', 'cpu'] as const;
  const widths = keys.map((key) => Math.max(header[key].length, ...lines.map((l) => l[key].length)));
  const format = (l: Record<(typeof keys)[number], string>) =>
    keys
      .map((key, c) => pad(l[key], widths[c] as number))
      .join('  ')
      .trimEnd();
  console.log(format(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const l of lines) console.log(format(l));
  console.log('\nNotes:');
  rows.forEach((r, k) => console.log(`  ${k + 1}. ${r.note}`));
}

async function main(): Promise<void> {
  const asked = process.argv.slice(2);
  const unknown = asked.filter((a) => !(a in AREAS));
  if (unknown.length > 0) throw new Error(`bench: unknown area(s) ${unknown.join(', ')}; choose from ${Object.keys(AREAS).join(', ')}`);
  const names = asked.length > 0 ? asked : DEFAULT_AREAS;
  const cpu = cpus()[0]?.model ?? 'unknown CPU';
  console.log(`fincheck bench: Node ${process.version}, ${cpus().length} x ${cpu}`);
  console.log(`load average (1/5/15 min) at start: ${loadText()}`);
  const started = performance.now();
  const rows: BenchRow[] = [];
  for (const name of names) {
    const run = AREAS[name];
    if (run === undefined) continue;
    const t0 = performance.now();
    process.stderr.write(`bench: ${name}...`);
    try {
      rows.push(...(await run()));
    } catch (error) {
      rows.push(errored(name, `the ${name} area stopped`, '-', error));
    }
    process.stderr.write(` ${((performance.now() - t0) / 1000).toFixed(1)} s\n`);
  }
  console.log(`load average at end: ${loadText()}; suite took ${((performance.now() - started) / 1000).toFixed(0)} s\n`);
  printTable(rows);
  const failed = rows.filter((r) => r.verdict === 'FAIL').length;
  const skippedRows = rows.filter((r) => r.verdict === 'skip').length;
  const errors = rows.filter((r) => r.verdict === 'error').length;
  console.log(
    `\n${rows.length} rows: ${failed} FAIL, ${errors} error, ${skippedRows} skipped. Verdicts judge the median wall time; the CPU median ` +
      '(time on a core, waiting for one left out) shows how much of a miss is the load of a shared machine.',
  );
}

await main();
