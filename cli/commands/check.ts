/**
 * `fincheck check CASE...`: the reference solution against every applicable shortcut. One case prints its full
 * check; several (or a folder, or a glob) print one comparison table, `--json` an array of the single-case
 * documents (each with its file), `--csv FILE` the table.
 *
 * Several cases: a case that cannot be checked (bad input: exit 2; solver failure: exit 3) is reported on stderr
 * naming its file and key path, and the others still run, so a comparison of variants shows every variant that
 * works; the exit code is the worst of the cases'. Nothing is written to --csv when any case failed.
 */
import type { Command } from 'commander';
import { parseAnyCaseText, type CaseWarning, type DisplayUnits } from '../../src/case/index.js';
import { UsageError } from '../../src/errors.js';
import {
  comparisonCsv,
  comparisonTable,
  formatCheck,
  formatComparison,
  formatSinkCheck,
  resolvedSinkReference,
  runCheck,
  runSinkCheck,
  type CaseOutcome,
} from '../../src/compare/index.js';
import { printWarnings, readCaseInput } from '../case-input.js';
import { caseList } from '../case-list.js';
import { errorLines, knownFailure } from '../failure.js';
import type { Io, SetExit } from '../io.js';
import { requireReference } from '../model-coverage.js';
import { displayUnitsOf, parseOption, referenceOption, sampleOption, toleranceOption, unitsHelp } from '../options.js';

interface CheckCliOptions {
  tolerance: string;
  reference: string;
  json?: boolean;
  strict?: boolean;
  units?: string;
  csv?: string;
  sample: string;
}

interface Settings {
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  strict: boolean;
  sample: 'auto' | 'always' | 'never';
}

/** One case checked: its outcome, the text and JSON document of `check CASE`, and its exit code (0 or 1). */
interface Checked {
  outcome: CaseOutcome;
  /** The units the case asks to be shown in (its display key, or what its inputs suggest). */
  display: DisplayUnits | undefined;
  /** The text of `check CASE` in units `u`. */
  format: (u: DisplayUnits) => string;
  json: Record<string, unknown>;
  exit: number;
}

async function checkOne(file: string, io: Io, settings: Settings, showWarnings: (warnings: readonly CaseWarning[]) => void): Promise<Checked> {
  const { text, fileName } = await readCaseInput(file, io);
  const any = parseAnyCaseText(text, fileName);
  showWarnings(any.case.warnings ?? []);
  if (any.kind === 'heat-sink') {
    // A heat sink: the fd-3d reference (resolved to a tenth of the tolerance where the budget allows) and the array shortcuts.
    if (settings.reference !== 'auto')
      throw new UsageError(
        `--reference ${settings.reference}: a heat sink's reference is fd-3d (the plate in 3-D, every fin conducting); leave --reference at auto`,
      );
    const sink = any.case;
    const report = await runSinkCheck(sink, resolvedSinkReference(settings.tolerance), {
      tolerance: settings.tolerance,
      sample: settings.sample,
    });
    const exit = settings.strict && report.models.some((m) => m.verdict === 'unsafe') ? 1 : 0;
    const format = (u: DisplayUnits): string => formatSinkCheck(sink, report, u);
    return { outcome: { file, kind: 'heat-sink', report }, display: sink.display, format, json: { ...report, warnings: sink.warnings ?? [] }, exit };
  }
  const c = any.case;
  requireReference(c, settings.reference);
  const { report } = await runCheck(c, { tolerance: settings.tolerance, reference: settings.reference, sample: settings.sample });
  const exit = settings.strict && report.models.some((m) => m.verdict === 'unsafe') ? 1 : 0;
  const format = (u: DisplayUnits): string => formatCheck(c, report, u);
  return { outcome: { file, kind: 'fin', report }, display: c.display, format, json: { ...report, warnings: c.warnings ?? [] }, exit };
}

export function registerCheck(program: Command, io: Io, setExit: SetExit): Command {
  return program
    .command('check')
    .argument('<case...>', 'case files (YAML or JSON), folders of cases or globs; - reads one case from standard input')
    .description('solve the fin and show how far each textbook shortcut drifts from the solution, and why')
    .option('--tolerance <t>', 'drift accepted as ok, e.g. 2% or 0.02', '2%')
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--json', 'print one JSON document instead of the table (several cases: an array of them; keys: README, "JSON output")')
    .option('--strict', 'exit with code 1 when any shortcut is unsafe')
    .option(
      '--sample <when>',
      'confirm the uncertainty band by a Latin-hypercube sample: auto (nonlinear fins or sinks, bands over 20 %, within a work budget), always or never',
      'auto',
    )
    .option('--units <system>', unitsHelp)
    .option('--csv <file>', 'also write the comparison table as CSV (units in the header; not written when a case fails)')
    .addHelpText(
      'after',
      `
Examples:
  fincheck check demo/inverter-plate-fin.yaml
  fincheck check demo/polymer-fin-liquid-cooled.yaml --tolerance 5% --json
  fincheck check my-fin.yaml --strict        # exit 1 when a shortcut is unsafe
  fincheck check - < my-fin.yaml             # the case from standard input
  fincheck check demo/inverter-plate-fin.yaml --units us     # in, degF, BTU/h on screen
  fincheck check a.yaml b.yaml c.yaml        # one comparison table (also a folder, or 'variants/*.yaml')
  fincheck check variants/ --csv variants.csv

Several cases: a case that cannot be checked is reported (exit 2, naming its file and key) and the
others still run; the exit code is the worst of the cases'; --csv is not written when a case fails.`,
    )
    .action(async (args: string[], o: CheckCliOptions) => {
      const settings: Settings = {
        tolerance: parseOption('--tolerance', toleranceOption, o.tolerance),
        reference: parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d'),
        strict: o.strict === true,
        sample: parseOption('--sample', sampleOption, o.sample, 'auto, always or never'),
      };
      // Checked before any case is read, so a bad --units is one usage error, not one per case.
      displayUnitsOf(o.units, undefined);
      if (o.csv !== undefined && o.csv.trim() === '') throw new UsageError('--csv: a file name for the table is required');
      const list = caseList(args);
      if (!list.several) {
        const one = await checkOne(list.files[0] as string, io, settings, (w) => printWarnings(w, io));
        const units = displayUnitsOf(o.units, one.display);
        if (o.csv !== undefined) await writeCsv(o.csv, comparisonCsv(comparisonTable([one.outcome]), units));
        io.out(o.json ? `${JSON.stringify(one.json, null, 2)}\n` : one.format(units));
        if (one.exit > 0) setExit(one.exit);
        return;
      }
      await checkSeveral(list.files, o, settings, io, setExit);
    });
}

async function checkSeveral(files: readonly string[], o: CheckCliOptions, settings: Settings, io: Io, setExit: SetExit): Promise<void> {
  const checked: (Checked | null)[] = [];
  const outcomes: CaseOutcome[] = [];
  const documents: Record<string, unknown>[] = [];
  let failed = 0;
  for (const file of files) {
    const warn = (warnings: readonly CaseWarning[]): void => {
      for (const w of warnings) io.err(`fincheck: warning: ${file}: ${w.path}: ${w.message}\n`);
    };
    try {
      const one = await checkOne(file, io, settings, warn);
      checked.push(one);
      outcomes.push(one.outcome);
      documents.push({ file, ...one.json });
      if (one.exit > 0) setExit(one.exit);
    } catch (e) {
      // The others still run: the failure is this case's, reported with its file (an internal error stops everything).
      const known = knownFailure(e, 'check');
      if (known === null) throw e;
      const message = known.message.startsWith(file) ? known.message : `${file}: ${known.message}`;
      io.err(errorLines(message));
      setExit(known.code);
      failed++;
      checked.push(null);
      outcomes.push({ file, kind: 'failed', exitCode: known.code, message });
      documents.push({ file, error: { exitCode: known.code, message } });
    }
  }
  // One set of units for the whole table: --units, else the first checked case's.
  const first = checked.find((c) => c !== null)?.display;
  const units = displayUnitsOf(o.units, first);
  const table = comparisonTable(outcomes);
  io.out(o.json ? `${JSON.stringify(documents, null, 2)}\n` : formatComparison(table, settings.tolerance, units));
  if (o.csv !== undefined) {
    if (failed > 0) io.err(`fincheck: ${o.csv} not written: ${failed} of ${files.length} cases could not be checked\n`);
    else await writeCsv(o.csv, comparisonCsv(table, units));
  }
}

/**
 * Writes the --csv table. The report layer (its writer stages files atomically) is imported only then: its chunk
 * carries the charts and the PNG encoder (190 kB), which a plain check does not need.
 */
async function writeCsv(path: string, bytes: string): Promise<void> {
  const { writeFilesAtomically } = await import('../../src/report/index.js');
  writeFilesAtomically([{ path, bytes }]);
}
