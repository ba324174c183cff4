/**
 * `fincheck report CASE --out DIR`: the check as one self-contained HTML file (images inline, A4 print
 * styles) and a Markdown file with the PNG charts beside it. Options are validated before anything is
 * computed; the files are written all together or not at all, and Ctrl-C or SIGTERM before they are written
 * leaves nothing (exit 130 or 143).
 */
import { existsSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { type Case, cleanFreeText } from '../../src/case/index.js';
import type { CheckReport } from '../../src/compare/index.js';
import { UsageError } from '../../src/errors.js';
import { makeReport, REPORT_FILES, reportDate, writeFilesAtomically, type OutputFile } from '../../src/report/index.js';
import { VERSION } from '../../src/version.js';
import { loadCaseInput } from '../case-input.js';
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
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
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
  fincheck report my-fin.yaml --out out/my-fin --tolerance 5% --dpi 200
  SOURCE_DATE_EPOCH=1735689600 fincheck report my-fin.yaml --out out/   # same input, same bytes`,
    )
    .action(async (file: string, o: ReportCliOptions) => {
      const outDir = parseOutDir(o.out);
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      const dpi = parseOption('--dpi', dpiOption, o.dpi, 'a resolution from 48 to 1200 dots per inch');
      const date = reportDate(o.date, process.env.SOURCE_DATE_EPOCH, new Date(), '--date');
      displayUnitsOf(o.units, undefined);
      const c = withDisplayUnits(await loadCaseInput(file, io), o.units);
      // Ctrl-C or SIGTERM while the report is computed: nothing is written (the write itself, synchronous, is never cut).
      const interrupt = listenForInterrupt();
      let written: WrittenReport;
      try {
        written = await writeReport({
          case: c,
          caseFile: file === '-' ? 'stdin' : cleanFreeText(file, 200).text,
          outDir,
          tolerance,
          reference,
          dpi,
          date,
          pdf: o.pdf === true,
          beforeWrite: interrupt.check,
        });
      } catch (err) {
        if (!(err instanceof Interrupted)) throw err;
        io.err(`fincheck: interrupted (${err.by}); no report files were written\n`);
        setExit(interruptExitCode(err.by));
        return;
      } finally {
        interrupt.dispose();
      }
      if (o.json) {
        const { html, markdown, pdf, images, heatmapUnavailable, worstVerdict } = written;
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
      if (written.heatmapUnavailable) io.out(`  no temperature field: ${written.heatmapUnavailable}\n`);
    });
}
