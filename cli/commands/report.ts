/**
 * `fincheck report CASE --out DIR`: the check as one self-contained HTML file (images inline, A4 print
 * styles) and a Markdown file with the PNG charts beside it. Options are validated before anything is
 * computed; the files are written all together or not at all, and Ctrl-C or SIGTERM before they are written
 * leaves nothing (exit 130 or 143).
 */
import { existsSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { type Case, cleanFreeText, parseAnyCaseText, type DisplayUnits, type HeatSinkCase } from '../../src/case/index.js';
import { resolvedSinkStudy, runSinkCheck, type CheckReport, type SinkCheckReport } from '../../src/compare/index.js';
import { UsageError } from '../../src/errors.js';
import {
  makeComparisonReport,
  makeReport,
  makeSinkReport,
  REPORT_FILES,
  reportDate,
  writeFilesAtomically,
  type ComparedCase,
  type OutputFile,
} from '../../src/report/index.js';
import { checkPlotInput } from '../../src/plots/index.js';
import { VERSION } from '../../src/version.js';
import { loadAnyCaseInput, readCaseInput } from '../case-input.js';
import { caseList } from '../case-list.js';
import { errorLines, knownFailure } from '../failure.js';
import type { Io, SetExit } from '../io.js';
import { requireReference } from '../model-coverage.js';
import { Interrupted, interruptExitCode, listenForInterrupt } from '../interrupt.js';
import { displayUnitsOf, parseOption, referenceOption, toleranceOption, unitsHelp, withDisplayUnits } from '../options.js';
import { dpiOption } from './plot.js';

export interface ReportRequest {
  /** The case, read and parsed by the caller. */
  case: Case;
  /** Its file name as given (`stdin` for standard input), shown in the report. */
  caseFile: string;
  outDir: string;
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  dpi: number;
  date: string;
  /** Also write report.pdf (A4, vector charts). */
  pdf?: boolean;
  /** Asked between the charts and before anything is written: throws (Interrupted) to stop with nothing on disk. */
  beforeWrite?: () => void;
}

/** --out DIR: a folder (created when missing), not an existing file. */
export function parseOutDir(value: string | undefined): string {
  if (value === undefined || value.trim() === '') throw new UsageError('--out: a folder for the report files is required');
  const dir = resolve(value);
  if (existsSync(dir) && !statSync(dir).isDirectory()) throw new UsageError(`--out: ${value} is a file; give a folder`);
  return dir;
}

export interface WrittenReport {
  case: Case;
  check: CheckReport;
  html: string;
  markdown: string;
  /** report.pdf when asked for, else null. */
  pdf: string | null;
  images: string[];
  heatmapUnavailable: string | null;
  worstVerdict: 'ok' | 'marginal' | 'unsafe' | 'unresolved';
}

/** Computes the report and writes it into `outDir` (also what `fincheck demo` uses). */
export async function writeReport(request: ReportRequest): Promise<WrittenReport> {
  const c = request.case;
  requireReference(c, request.reference);
  const content = await makeReport(c, {
    tolerance: request.tolerance,
    reference: request.reference,
    dpi: request.dpi,
    caseFile: request.caseFile,
    version: VERSION,
    date: request.date,
    pdf: request.pdf === true,
    ...(request.beforeWrite ? { checkpoint: request.beforeWrite } : {}),
  });
  const html = join(request.outDir, REPORT_FILES.html);
  const markdown = join(request.outDir, REPORT_FILES.markdown);
  const images = content.figures.map((f) => join(request.outDir, f.file));
  const files: OutputFile[] = [
    ...content.figures.map((f, k) => ({ path: images[k] as string, bytes: f.png })),
    { path: markdown, bytes: content.markdown },
    { path: html, bytes: content.html },
  ];
  const pdf = content.pdf === null ? null : join(request.outDir, REPORT_FILES.pdf);
  if (pdf !== null && content.pdf !== null) files.push({ path: pdf, bytes: content.pdf });
  request.beforeWrite?.();
  writeFilesAtomically(files, [request.outDir]);
  const verdicts = content.check.report.models.map((m) => m.verdict);
  const worstVerdict = verdicts.includes('unresolved')
    ? 'unresolved'
    : verdicts.includes('unsafe')
      ? 'unsafe'
      : verdicts.includes('marginal')
        ? 'marginal'
        : 'ok';
  return { case: c, check: content.check.report, html, markdown, pdf, images, heatmapUnavailable: content.heatmapUnavailable, worstVerdict };
}

export interface SinkReportRequest extends Omit<ReportRequest, 'case' | 'reference'> {
  case: HeatSinkCase;
}

export interface WrittenSinkReport {
  case: HeatSinkCase;
  check: SinkCheckReport;
  html: string;
  markdown: string;
  pdf: string | null;
  images: string[];
  worstVerdict: 'ok' | 'marginal' | 'unsafe' | 'unresolved';
}

/** The report of a heat sink, computed and written into `outDir` (also what `fincheck demo` uses). */
export async function writeSinkReport(request: SinkReportRequest): Promise<WrittenSinkReport> {
  const c = request.case;
  const content = await makeSinkReport(c, {
    tolerance: request.tolerance,
    dpi: request.dpi,
    caseFile: request.caseFile,
    version: VERSION,
    date: request.date,
    pdf: request.pdf === true,
    ...(request.beforeWrite ? { checkpoint: request.beforeWrite } : {}),
  });
  const html = join(request.outDir, REPORT_FILES.html);
  const markdown = join(request.outDir, REPORT_FILES.markdown);
  const images = content.figures.map((f) => join(request.outDir, f.file));
  const files: OutputFile[] = [
    ...content.figures.map((f, k) => ({ path: images[k] as string, bytes: f.png })),
    { path: markdown, bytes: content.markdown },
    { path: html, bytes: content.html },
  ];
  const pdf = content.pdf === null ? null : join(request.outDir, REPORT_FILES.pdf);
  if (pdf !== null && content.pdf !== null) files.push({ path: pdf, bytes: content.pdf });
  request.beforeWrite?.();
  writeFilesAtomically(files, [request.outDir]);
  return { case: c, check: content.input.report, html, markdown, pdf, images, worstVerdict: worstOf(content.input.report.models.map((m) => m.verdict)) };
}

function worstOf(verdicts: readonly ('ok' | 'marginal' | 'unsafe' | 'unresolved')[]): 'ok' | 'marginal' | 'unsafe' | 'unresolved' {
  return verdicts.includes('unresolved') ? 'unresolved' : verdicts.includes('unsafe') ? 'unsafe' : verdicts.includes('marginal') ? 'marginal' : 'ok';
}

interface ReportCliOptions {
  out?: string;
  tolerance: string;
  reference: string;
  dpi: string;
  date?: string;
  pdf?: boolean;
  json?: boolean;
  units?: string;
}

export function registerReport(program: Command, io: Io, setExit: SetExit): Command {
  return program
    .command('report')
    .argument('<case...>', 'case file (YAML or JSON), - for standard input; several files, a folder or a glob: one report comparing them')
    .description('write the check as a self-contained HTML report (prints to A4) and a Markdown report with PNG charts')
    .option('--out <dir>', 'folder for report.html, report.md and the PNG charts (created if missing)')
    .option('--tolerance <t>', 'drift accepted as ok, e.g. 2% or 0.02', '2%')
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--dpi <dpi>', 'resolution of the PNG charts (96: 1200 x 750 px)', '96')
    .option('--date <yyyy-mm-dd>', 'date printed in the report (default: SOURCE_DATE_EPOCH when set, else today)')
    .option('--pdf', 'also write report.pdf: the same report on A4 pages, charts as vector graphics, font embedded')
    .option('--json', 'print one JSON document listing the files written')
    .option('--units <system>', unitsHelp)
    .addHelpText(
      'after',
      `
Examples:
  fincheck report demo/inverter-plate-fin.yaml --out report/
  fincheck report demo/led-pin-fin.yaml --out report/ --pdf       # and report.pdf for the design note
  fincheck report demo/motor-drive-sink.yaml --out sink-report/   # a heat sink: fd-3d, three sink charts
  fincheck report my-fin.yaml --out out/my-fin --tolerance 5% --dpi 200
  SOURCE_DATE_EPOCH=1735689600 fincheck report my-fin.yaml --out out/   # same input, same bytes
  fincheck report a.yaml b.yaml c.yaml --out compare/ --units us        # one report comparing the cases

Several cases: one report with the cases side by side, the verdicts side by side and the single fins'
temperature profiles overlaid; heat sinks get their rows in the tables. Every case is read first: when
one is bad (exit 2) or cannot be solved (exit 3), each problem is reported and no file is written.`,
    )
    .action(async (args: string[], o: ReportCliOptions) => {
      const outDir = parseOutDir(o.out);
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      const dpi = parseOption('--dpi', dpiOption, o.dpi, 'a resolution from 48 to 1200 dots per inch');
      const date = reportDate(o.date, process.env.SOURCE_DATE_EPOCH, new Date(), '--date');
      displayUnitsOf(o.units, undefined);
      const list = caseList(args);
      if (list.several) {
        await reportSeveral(list.files, { outDir, tolerance, reference, dpi, date, o }, io, setExit);
        return;
      }
      const file = list.files[0] as string;
      // Ctrl-C or SIGTERM from here on: nothing is written (the write itself, synchronous, is never cut); a wait on
      // standard input ends at once.
      const interrupt = listenForInterrupt();
      let written: WrittenReport | WrittenSinkReport;
      try {
        const any = await loadAnyCaseInput(file, io, interrupt);
        if (any.kind === 'heat-sink' && reference !== 'auto')
          throw new UsageError(
            `--reference ${reference}: a heat sink's reference is fd-3d (the plate in 3-D, every fin conducting); leave --reference at auto`,
          );
        const common = {
          caseFile: file === '-' ? 'stdin' : cleanFreeText(file, 200).text,
          outDir,
          tolerance,
          dpi,
          date,
          pdf: o.pdf === true,
          beforeWrite: interrupt.check,
        };
        written =
          any.kind === 'heat-sink'
            ? await writeSinkReport({ ...common, case: withDisplayUnits(any.case, o.units) })
            : await writeReport({ ...common, case: withDisplayUnits(any.case, o.units), reference });
      } catch (err) {
        if (!(err instanceof Interrupted)) throw err;
        io.err(`fincheck: interrupted (${err.by}); no report files were written\n`);
        setExit(interruptExitCode(err.by));
        return;
      } finally {
        interrupt.dispose();
      }
      const heatmapUnavailable = 'heatmapUnavailable' in written ? written.heatmapUnavailable : null;
      if (o.json) {
        const { html, markdown, pdf, images, worstVerdict } = written;
        io.out(
          `${JSON.stringify({ case: written.case.name, file, date, html, markdown, ...(pdf === null ? {} : { pdf }), images, heatmapUnavailable, worstVerdict }, null, 2)}\n`,
        );
        return;
      }
      io.out(`wrote the report of ${file} (${date}):\n`);
      io.out(`  ${written.html}   (self-contained HTML, prints to A4)\n`);
      io.out(`  ${written.markdown}   (Markdown; the PNG charts beside it)\n`);
      if (written.pdf !== null) io.out(`  ${written.pdf}   (A4 PDF, vector charts)\n`);
      for (const image of written.images) io.out(`  ${image}\n`);
      if (heatmapUnavailable) io.out(`  no temperature field: ${heatmapUnavailable}\n`);
    });
}

interface SeveralSettings {
  outDir: string;
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  dpi: number;
  date: string;
  o: ReportCliOptions;
}

/**
 * One report comparing several cases. Every case is read and checked before anything is written; a case that
 * fails is reported with its file (and key path) and the others still run, so one run shows every problem; the
 * report is then not written (a comparison missing a variant would mislead).
 */
async function reportSeveral(files: readonly string[], s: SeveralSettings, io: Io, setExit: SetExit): Promise<void> {
  const cases: ComparedCase[] = [];
  let display: DisplayUnits | undefined;
  let failed = 0;
  const interrupt = listenForInterrupt();
  try {
    for (const file of files) {
      try {
        const { text, fileName } = await readCaseInput(file, io, interrupt);
        const any = parseAnyCaseText(text, fileName);
        for (const w of any.case.warnings ?? []) io.err(`fincheck: warning: ${file}: ${w.path}: ${w.message}\n`);
        display ??= any.case.display;
        if (any.kind === 'heat-sink') {
          if (s.reference !== 'auto') throw new UsageError(`--reference ${s.reference}: a heat sink's reference is fd-3d; leave --reference at auto`);
          const report = await runSinkCheck(any.case, (sink) => resolvedSinkStudy(sink, s.tolerance), { tolerance: s.tolerance });
          cases.push({ file, kind: 'heat-sink', report });
        } else {
          requireReference(any.case, s.reference);
          cases.push({ file, kind: 'fin', check: await checkPlotInput(any.case, { tolerance: s.tolerance, reference: s.reference }) });
        }
        interrupt.check();
      } catch (e) {
        if (e instanceof Interrupted) throw e;
        const known = knownFailure(e, 'report');
        if (known === null) throw e;
        io.err(errorLines(known.message.startsWith(file) ? known.message : `${file}: ${known.message}`));
        setExit(known.code);
        failed++;
      }
    }
    if (failed > 0) {
      io.err(`fincheck: no report written: ${failed} of ${files.length} cases could not be checked\n`);
      return;
    }
    const units = displayUnitsOf(s.o.units, display);
    const content = await makeComparisonReport(cases, {
      tolerance: s.tolerance,
      units,
      version: VERSION,
      date: s.date,
      dpi: s.dpi,
      pdf: s.o.pdf === true,
      checkpoint: interrupt.check,
    });
    const path = (name: string): string => join(s.outDir, name);
    const out: OutputFile[] = [
      ...content.figures.map((f) => ({ path: path(f.file), bytes: f.png })),
      { path: path(REPORT_FILES.markdown), bytes: content.markdown },
      { path: path(REPORT_FILES.html), bytes: content.html },
      ...(content.pdf === null ? [] : [{ path: path(REPORT_FILES.pdf), bytes: content.pdf }]),
    ];
    interrupt.check();
    writeFilesAtomically(out, [s.outDir]);
    if (s.o.json) {
      const written = {
        cases: cases.map((c) => ({ file: c.file, case: c.kind === 'fin' ? c.check.report.case : c.report.case })),
        date: s.date,
        html: path(REPORT_FILES.html),
        markdown: path(REPORT_FILES.markdown),
        ...(content.pdf === null ? {} : { pdf: path(REPORT_FILES.pdf) }),
        images: content.figures.map((f) => path(f.file)),
      };
      io.out(`${JSON.stringify(written, null, 2)}\n`);
      return;
    }
    io.out(`wrote the report comparing ${cases.length} cases (${s.date}):\n`);
    for (const f of out) io.out(`  ${f.path}\n`);
  } catch (err) {
    if (!(err instanceof Interrupted)) throw err;
    io.err(`fincheck: interrupted (${err.by}); no report files were written\n`);
    setExit(interruptExitCode(err.by));
  } finally {
    interrupt.dispose();
  }
}
