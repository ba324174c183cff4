/** The design-note report for the library: the same HTML and Markdown as `fincheck report`, with the PNG figures. */
import type { Case } from '../case/index.js';
import { makeReport, reportDate } from '../report/index.js';
import { VERSION } from '../version.js';
import { numberOf, referenceOf, toleranceOf, withUnitsOf, type ReferenceChoice, type UnitsChoice } from './options.js';

export interface ReportCallOptions {
  tolerance?: number;
  reference?: ReferenceChoice;
  /** PNG resolution of the figures (default 96). */
  dpi?: number;
  /** The case file's name as the report shows it (default: the case's name). */
  caseFile?: string;
  /** The date printed on the report (default: today, YYYY-MM-DD). */
  date?: string;
  /** Also lay it out as an A4 PDF (vector charts, font embedded). */
  pdf?: boolean;
  /** Display units (default: the case's own, mm and SI unless it says otherwise). */
  units?: UnitsChoice;
}

export interface ReportResult {
  html: string;
  markdown: string;
  /** The figures the Markdown refers to by file name (the HTML has them inline). */
  figures: { file: string; png: Uint8Array }[];
  /** The A4 PDF when asked for, else null. */
  pdf: Uint8Array | null;
}

export async function report(given: Case, options: ReportCallOptions = {}): Promise<ReportResult> {
  const c = withUnitsOf(given, options.units);
  const content = await makeReport(c, {
    tolerance: toleranceOf(options.tolerance),
    reference: referenceOf(options.reference),
    dpi: numberOf('dpi', options.dpi, 48, 1200, 96),
    caseFile: options.caseFile ?? c.name,
    version: VERSION,
    date: reportDate(options.date, undefined, new Date(), 'options.date'),
    pdf: options.pdf === true,
  });
  return { html: content.html, markdown: content.markdown, figures: content.figures.map((f) => ({ file: f.file, png: f.png })), pdf: content.pdf };
}
