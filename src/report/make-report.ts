/**
 * Everything `fincheck report` writes, computed in memory: the check with every model's profile, the
 * fd-2d field (the check's own study when fd-2d is its reference), three PNG charts, and the HTML and
 * Markdown documents. Nothing touches the disk here (write-files.ts does, all or nothing).
 */
import type { Case } from '../case/index.js';
import type { CheckOptions } from '../compare/index.js';
import type { FinStudy2D } from '../fd/index.js';
import { svgsToPngs } from '../images/index.js';
import { plotSvg, type ChartSize, type CheckPlotInput, checkPlotInput, fieldStudy, heatmapAvailability, type PlotKind } from '../plots/index.js';
import { buildReport } from './build-report.js';
import type { ReportDocument } from './document.js';
import { FIGURE_FILES, type ReportFigure } from './figures.js';
import { reportHtml } from './html.js';
import { reportMarkdown } from './markdown.js';
import { reportPdf } from './pdf.js';

/** File names in the output folder. */
export const REPORT_FILES = { html: 'report.html', markdown: 'report.md', pdf: 'report.pdf' } as const;

/** Chart size in the report: the default canvas, which fills the A4 text width at about 170 dpi. */
export const REPORT_CHART: ChartSize = { width: 1200, height: 750 };

export interface ReportOptions extends CheckOptions {
  caseFile: string;
  version: string;
  date: string;
  /** PNG resolution (96 = 1200 x 750 px). */
  dpi: number;
  /** Called between the charts (the slow part); may throw to stop the report early (an interrupt). */
  checkpoint?: () => void;
  /** Also lay the report out as an A4 PDF (pdf.ts). */
  pdf?: boolean;
}

export interface ReportContent {
  check: CheckPlotInput;
  figures: ReportFigure[];
  heatmapUnavailable: string | null;
  document: ReportDocument;
  html: string;
  markdown: string;
  /** The A4 PDF when asked for (ReportOptions.pdf), else null. */
  pdf: Buffer | null;
}

async function field(c: Case, check: CheckPlotInput): Promise<{ study: FinStudy2D | null; unavailable: string | null }> {
  if (check.twoD) return { study: check.twoD, unavailable: null };
  const available = heatmapAvailability(c);
  return available.ok ? { study: await fieldStudy(c), unavailable: null } : { study: null, unavailable: available.reason };
}

export async function makeReport(c: Case, opts: ReportOptions): Promise<ReportContent> {
  const check = await checkPlotInput(c, { tolerance: opts.tolerance, reference: opts.reference });
  const { study, unavailable } = await field(c, check);
  const kinds: PlotKind[] = [...(study ? (['profile', 'flux', 'heatmap'] as const) : (['profile', 'flux'] as const))];
  if (check.report.sensitivities !== undefined) kinds.push('sensitivity');
  const scale = opts.dpi / 96;
  const svgs = kinds.map((kind) => {
    opts.checkpoint?.();
    return plotSvg(kind, { case: c, check, field: study }, REPORT_CHART, scale);
  });
  // Two at a time on libuv's thread pool (both cores); the interrupt is checked before each render starts.
  const pngs = await svgsToPngs(svgs, { dpi: opts.dpi, ...(opts.checkpoint ? { checkpoint: opts.checkpoint } : {}) });
  const figures: ReportFigure[] = kinds.map((kind, k) => ({
    kind,
    file: FIGURE_FILES[kind],
    svg: svgs[k] as string,
    png: pngs[k] as Buffer,
    width_px: REPORT_CHART.width,
    height_px: REPORT_CHART.height,
  }));
  const document = buildReport({
    check,
    field: study,
    caseFile: opts.caseFile,
    figures,
    heatmapUnavailable: unavailable,
    version: opts.version,
    date: opts.date,
  });
  opts.checkpoint?.();
  const pdf = opts.pdf === true ? await reportPdf(document, { date: opts.date, figureSvgs: new Map(figures.map((f) => [f.file, f.svg])) }) : null;
  return { check, figures, heatmapUnavailable: unavailable, document, html: reportHtml(document), markdown: reportMarkdown(document), pdf };
}
