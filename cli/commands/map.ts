/** `fincheck map CASE --x KEY=FROM:TO --y KEY=FROM:TO`: where each shortcut holds, over two case parameters. */
import type { Command } from 'commander';
import { availableParallelism } from 'node:os';
import { basename, extname, join } from 'node:path';
import { z } from 'zod';
import {
  type MapModelId,
  formatMapSummary,
  OutputsInterrupted,
  renderMapFiles,
  MapInterrupted,
  progressBar,
  prepareMap,
  runMap,
  MANIFEST_NAME,
  removeFiles,
  staleFiles,
  StagedFiles,
  runInDisplayUnits,
} from '../../src/map/index.js';
import { asUsageError } from '../../src/report/index.js';
import { parseAnyCaseText } from '../../src/case/index.js';
import { printWarnings, readCaseInput } from '../case-input.js';
import { Interrupted, interruptExitCode, listenForInterrupt } from '../interrupt.js';
import type { Io, SetExit } from '../io.js';
import { displayUnitsOf, parseOption, referenceOption, toleranceOption, unitsHelp } from '../options.js';

const modelIds = [
  'tanh-L',
  'tanh-Lc',
  'tanh-Lc-thin',
  'convective-tip',
  'closed-form',
  'fd-1d',
  'overall-efficiency',
  'overall-efficiency-exact-fin',
  'spreading-series',
] as const satisfies readonly MapModelId[];

/**
 * Default grid of a heat-sink map: every point is an fd-3d study (about a second on the default grids, on one
 * core), so 7 x 7 = 49 points take about half a minute on two cores, where 41 x 41 would take half an hour.
 */
export const SINK_DEFAULT_STEPS = '7x7';

/** "41x41" (NX x NY) or "41" (both): at least 2 and at most 1000 values per axis. */
const stepsOption = z
  .string()
  .trim()
  .transform((s, ctx): [number, number] => {
    const m = /^(\d+)(?:\s*[x×*]\s*(\d+))?$/i.exec(s);
    const nx = m ? Number(m[1]) : Number.NaN;
    const ny = m ? Number(m[2] ?? m[1]) : Number.NaN;
    if (!(nx >= 2 && ny >= 2 && nx <= 1000 && ny <= 1000)) {
      ctx.addIssue({ code: 'custom', message: 'NXxNY such as 41x41, each from 2 to 1000 (or N for N x N)' });
      return z.NEVER;
    }
    return [nx, ny];
  });

const modelsOption = z
  .string()
  .transform((s) =>
    s
      .split(',')
      .map((m) => m.trim())
      .filter((m) => m !== ''),
  )
  .pipe(z.array(z.enum(modelIds)).min(1));

const jobsOption = z.coerce.number().int().min(1).max(256);
const formatOption = z.enum(['png', 'svg']);

interface MapOptions {
  x: string;
  y: string;
  steps?: string;
  logX?: boolean;
  logY?: boolean;
  models?: string;
  reference: string;
  tolerance: string;
  jobs?: string;
  out?: string;
  format: string;
  json?: boolean;
  units?: string;
}

/** ./fincheck-map-<file name as a slug>. */
function defaultOutDir(file: string): string {
  const slug =
    basename(file, extname(file))
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '') || 'case';
  return join('.', `fincheck-map-${slug}`);
}

export function registerMap(program: Command, io: Io, setExit: SetExit): Command {
  return program
    .command('map')
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
    .description('map where each textbook shortcut holds as two case parameters vary (drift, verdict, Bi at every point); heat sinks too')
    .requiredOption('--x <KEY=FROM:TO>', 'case key swept along x with its range, e.g. fin.thickness=1mm:5mm (a heat sink: array.count=4:16)')
    .requiredOption('--y <KEY=FROM:TO>', 'case key swept along y, e.g. "convection.h=10:1000 W/(m^2*K)"')
    .option(
      '--steps <NXxNY>',
      `grid points along x and y: NXxNY, or N for N x N (9 is 9x9); default 41x41, a heat sink ${SINK_DEFAULT_STEPS} (an fd-3d study a point)`,
    )
    .option('--log-x', 'space the x values geometrically and draw a log axis')
    .option('--log-y', 'space the y values geometrically and draw a log axis')
    .option(
      '--models <ids>',
      `models to map, comma-separated (${modelIds.join(', ')}); default every shortcut that applies, and fd-1d beside a 2-D reference`,
    )
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--tolerance <t>', 'drift accepted as ok, e.g. 2% or 0.02', '2%')
    .option('--jobs <n>', 'worker threads (default: all cores with the 2-D reference, in this process with the 1-D one; 1 runs in this process)')
    .option('--out <dir>', 'folder for map.csv, map.json and the images (default ./fincheck-map-<case>)')
    .option('--format <png|svg>', 'image format', 'png')
    .option('--json', 'print the map as one JSON document (the content of map.json) instead of the summary')
    .option('--units <system>', `${unitsHelp}; here the charts' axes and the summary (map.csv and map.json keep the units of --x and --y)`)
    .addHelpText(
      'after',
      `
KEY is a key path of the case file; FROM and TO take units like the case file (a bare number is SI,
a bare temperature degC; a unit on one end applies to both: 1:3 mm). Points where the case becomes
invalid (a tip thicker than the base, say) are marked in the outputs and counted in the summary.
Files are written under temporary names and renamed when all are complete; Ctrl-C or SIGTERM leaves
none (exit 130 or 143). A re-run into the same folder removes the files an earlier map wrote there
and this one does not (map.json lists them); other files in the folder are never touched.

Examples:
  fincheck map demo/inverter-plate-fin.yaml --x fin.thickness=0.5:5mm --y convection.h=10:500 --log-y
  fincheck map my-fin.yaml --x fin.length=10mm:80mm --y material.k=15:400 --steps 21x21 --models tanh-Lc,convective-tip
  fincheck map my-fin.yaml --x fin.thickness=1mm:4mm --y convection.h=20:2000 --log-y --json > map.json
  fincheck map demo/motor-drive-sink.yaml --x "sources[0].size[0]=6mm:24mm" --y plate.thickness=2mm:8mm   # a heat sink, 7x7 points`,
    )
    .action(async (file: string, o: MapOptions) => {
      const givenSteps = o.steps === undefined ? undefined : parseOption('--steps', stepsOption, o.steps);
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      const models =
        o.models === undefined ? undefined : parseOption('--models', modelsOption, o.models, `a comma-separated list of ${modelIds.join(', ')}`);
      const askedJobs = o.jobs === undefined ? undefined : parseOption('--jobs', jobsOption, o.jobs, 'a whole number of threads from 1 to 256');
      const format = parseOption('--format', formatOption, o.format, 'png or svg');
      const outDir = o.out ?? defaultOutDir(file);
      const units = o.units === undefined ? null : displayUnitsOf(o.units, undefined);

      // prepareMap parses and validates the text (InputError with positions, as check reports them).
      const { text: caseText, fileName } = await readCaseInput(file, io);
      const parsed = parseAnyCaseText(caseText, fileName);
      const sink = parsed.kind === 'heat-sink';
      const steps = givenSteps ?? parseOption('--steps', stepsOption, sink ? SINK_DEFAULT_STEPS : '41x41');
      const prepared = await prepareMap({
        caseText,
        fileName,
        x: o.x,
        y: o.y,
        logX: o.logX === true,
        logY: o.logY === true,
        steps,
        tolerance,
        reference,
        ...(models ? { models } : {}),
        labels: { x: '--x', y: '--y', models: '--models', reference: '--reference' },
      });
      printWarnings(prepared.warnings, io);

      // Default: all cores for 2-D references; in this process for a 1-D reference, whose points take
      // about a millisecond each, so that starting and warming up workers (module load, JIT) costs more
      // than they save (41x41, 2 cores: 1.95 s in-process, 2.2 s on two workers).
      const jobs = askedJobs ?? (prepared.casePoint.reference.model === 'fd-1d' ? 1 : availableParallelism());
      if (sink && givenSteps === undefined)
        io.err(`fincheck: a heat-sink map solves an fd-3d study at every point: ${SINK_DEFAULT_STEPS} points by default (--steps sets more)\n`);
      const interrupt = listenForInterrupt();
      const total = steps[0] * steps[1];
      const progress = progressBar((t) => io.err(t), io.errIsTTY, total);
      const staged = new StagedFiles(outDir);
      let done = 0;
      try {
        const run = await runMap(prepared, {
          jobs,
          signal: interrupt.signal,
          onPoint: (n) => {
            done = n;
            progress.update(n);
          },
        });
        progress.finish();
        // --units shows the axes in display units; without it, in the units --x and --y were written in.
        const shown = units === null ? run : runInDisplayUnits(run, units);
        const files = await renderMapFiles(run, format, () => interrupt.signal.aborted, shown);
        interrupt.check();
        // Staging, committing and pruning are synchronous: a signal that arrives meanwhile waits until they end.
        // Files an earlier map listed in this folder's map.json and this one does not write go (never others).
        const stale = staleFiles(
          outDir,
          files.map((f) => f.name),
        );
        for (const f of files) staged.stage(f.name, f.data);
        const written = staged.commit();
        removeFiles(outDir, stale);
        const json = files.find((f) => f.name === MANIFEST_NAME)?.data;
        io.out(o.json && typeof json === 'string' ? json : formatMapSummary(shown, written, displayUnitsOf(o.units, parsed.case.display)));
      } catch (err) {
        progress.finish();
        staged.discard();
        const by = interrupt.received();
        if (by !== null && (err instanceof MapInterrupted || err instanceof OutputsInterrupted || err instanceof Interrupted)) {
          io.err(`fincheck: interrupted after ${done} of ${total} points; no files were written\n`);
          setExit(interruptExitCode(by));
          return;
        }
        throw asUsageError(err);
      } finally {
        interrupt.dispose();
      }
    });
}
