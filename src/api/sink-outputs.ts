/**
 * A heat sink's charts and report for the library, as `fincheck plot` and `fincheck report` draw them for a sink:
 * `plate` (the underside seen from above, sources labelled), `fin-heat` (heat per fin), `profile` (up the hottest
 * and the coolest fin against the uniform-base shortcut) and `sensitivity` (the tornado of the hottest source's
 * rise); an SVG string or PNG bytes, and the report as HTML, Markdown, PNG figures and an optional A4 PDF.
 * Display units as for fins (default: the case's own).
 */
import type { HeatSinkCase } from '../case/index.js';
import { UsageError } from '../errors.js';
import { chartBytes } from '../images/index.js';
import { SINK_PLOT_KINDS, sinkPlotAvailability, sinkPlotInput, sinkPlotSvg, type SinkPlotKind } from '../plots/index.js';
import { makeSinkReport, reportDate } from '../report/index.js';
import { VERSION } from '../version.js';
import { numberOf, toleranceOf, wholeNumberOf, withUnitsOf, type UnitsChoice } from './options.js';
import type { ReportResult } from './report.js';

export interface SinkChartCallOptions {
  /** Layout size in px at 96 dpi (default 1200 x 750). */
  width?: number;
  height?: number;
  tolerance?: number;
  /** Display units of the axes, labels and colour bar (default: the case's own). */
  units?: UnitsChoice;
}

export interface SinkReportCallOptions {
  tolerance?: number;
  /** PNG resolution of the figures (default 96). */
  dpi?: number;
  /** The case file's name as the report shows it (default: the case's name). */
  caseFile?: string;
  /** The date printed on the report (default: today, YYYY-MM-DD). */
  date?: string;
  /** Also lay it out as an A4 PDF (vector charts, font embedded). */
  pdf?: boolean;
  units?: UnitsChoice;
}

/** The sink chart as an SVG document. */
export async function sinkChartSvg(c: HeatSinkCase, kind: SinkPlotKind, options: SinkChartCallOptions = {}): Promise<string> {
  const size = sizeOf(kind, options);
  return drawn(c, kind, size, 1, options);
}

/** The sink chart as PNG bytes with `dpi` (default 96: width x height pixels; 300 for print). */
export async function sinkChartPng(c: HeatSinkCase, kind: SinkPlotKind, options: SinkChartCallOptions & { dpi?: number } = {}): Promise<Uint8Array> {
  const size = sizeOf(kind, options);
  const dpi = numberOf('dpi', options.dpi, 48, 1200, 96);
  const svg = await drawn(c, kind, size, dpi / 96, options);
  return new Uint8Array(await chartBytes(svg, 'png', { dpi }));
}

/** The design-note report of a sink: what `fincheck report SINK` writes, as strings and bytes (nothing written). */
export async function sinkReport(given: HeatSinkCase, options: SinkReportCallOptions = {}): Promise<ReportResult> {
  const c = withUnitsOf(given, options.units);
  const content = await makeSinkReport(c, {
    tolerance: toleranceOf(options.tolerance),
    dpi: numberOf('dpi', options.dpi, 48, 1200, 96),
    caseFile: options.caseFile ?? c.name,
    version: VERSION,
    date: reportDate(options.date, undefined, new Date(), 'options.date'),
    pdf: options.pdf === true,
  });
  return {
    html: content.html,
    markdown: content.markdown,
    figures: content.figures.map((f) => ({ file: f.file, png: f.png })),
    pdf: content.pdf === null ? null : new Uint8Array(content.pdf),
  };
}

function sizeOf(kind: unknown, options: SinkChartCallOptions): { width: number; height: number } {
  if (!(SINK_PLOT_KINDS as readonly unknown[]).includes(kind))
    throw new UsageError(`kind: got ${JSON.stringify(kind)}; expected one of ${SINK_PLOT_KINDS.join(', ')} for a heat sink`);
  return { width: wholeNumberOf('width', options.width, 400, 8000) ?? 1200, height: wholeNumberOf('height', options.height, 300, 8000) ?? 750 };
}

async function drawn(given: HeatSinkCase, kind: SinkPlotKind, size: { width: number; height: number }, scale: number, options: SinkChartCallOptions) {
  const c = withUnitsOf(given, options.units);
  const available = sinkPlotAvailability({ case: c }, kind);
  if (!available.ok) throw new UsageError(`kind ${kind}: ${available.reason}`);
  const input = await sinkPlotInput(c, toleranceOf(options.tolerance), kind === 'sensitivity');
  return sinkPlotSvg(kind, input, size, scale);
}
