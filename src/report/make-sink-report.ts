/**
 * Everything `fincheck report` writes for a heat sink, computed in memory: the sink check (its fd-3d reference, the
 * array shortcuts), its three charts as PNG (a bare plate: the plate only), and the HTML, Markdown and (when asked)
 * PDF documents. Nothing touches the disk here (write-files.ts does, all or nothing).
 */
import type { HeatSinkCase } from '../case/index.js';
import { svgToPng } from '../images/index.js';
import { relativeError, sinkPlotAvailability, sinkPlotInput, sinkPlotSvg, type SinkPlotInput, type SinkPlotKind } from '../plots/index.js';
import type { ReportDocument } from './document.js';
import { reportHtml } from './html.js';
import { REPORT_CHART } from './make-report.js';
import { reportMarkdown } from './markdown.js';
import { reportPdf } from './pdf.js';
import { buildSinkReport, type SinkReportFigure } from './sink-report.js';

export interface SinkReportOptions {
  tolerance: number;
  caseFile: string;
  version: string;
  date: string;
  dpi: number;
  checkpoint?: () => void;
  pdf?: boolean;
}

export interface SinkReportContent {
  input: SinkPlotInput;
  figures: SinkReportFigure[];
  document: ReportDocument;
  html: string;
  markdown: string;
  pdf: Buffer | null;
}

/** File name of each sink chart beside the reports. */
export const SINK_FIGURE_FILES: Record<SinkPlotKind, string> = { plate: 'plate.png', 'fin-heat': 'fin-heat.png', profile: 'fin-profile.png' };

const TITLES: Record<SinkPlotKind, string> = {
  plate: 'Plate underside temperature seen from above',
  'fin-heat': 'Heat per fin',
  profile: 'Temperature up the hottest and the coolest fin',
};

function caption(kind: SinkPlotKind, input: SinkPlotInput): string {
  const gci = relativeError(input.report.reference.discretizationError ?? Number.NaN);
  switch (kind) {
    case 'plate':
      return `Temperature T (°C) of the plate's underside (z = 0, where the sources sit), seen from above through the plate, from fd-3d's finest grid (each colour a cell value; source mean rises known to ${gci}, GCI). Sources outlined and labelled with their mean and maximum temperature (interface drop included); fin footprints on the top face dashed; isotherms labelled in °C.`;
    case 'fin-heat':
      return "Heat entering each fin at its root (W, fd-3d), fins numbered as in the JSON fins array; the hottest and the coolest root highlighted; the dashed line is overall-efficiency-exact-fin's heat per fin (every fin at its one uniform base temperature).";
    case 'profile':
      return "Temperature (°C) up the fin with the hottest root and the fin with the coolest root (fd-3d: each fin's mean over its section), against the exact 1-D fin at overall-efficiency-exact-fin's uniform base temperature: the gap at the root is the uniform-base assumption.";
    default: {
      const never: never = kind;
      return never;
    }
  }
}

export async function makeSinkReport(c: HeatSinkCase, opts: SinkReportOptions): Promise<SinkReportContent> {
  const input = await sinkPlotInput(c, opts.tolerance);
  const kinds = (['plate', 'fin-heat', 'profile'] as const).filter((k) => sinkPlotAvailability({ case: c }, k).ok);
  const figures: SinkReportFigure[] = [];
  for (const kind of kinds) {
    opts.checkpoint?.();
    const svg = sinkPlotSvg(kind, input, REPORT_CHART, opts.dpi / 96);
    figures.push({
      kind,
      file: SINK_FIGURE_FILES[kind],
      title: TITLES[kind],
      caption: caption(kind, input),
      svg,
      png: await svgToPng(svg, { dpi: opts.dpi }),
      width_px: REPORT_CHART.width,
      height_px: REPORT_CHART.height,
    });
  }
  const document = buildSinkReport({ input, caseFile: opts.caseFile, figures, version: opts.version, date: opts.date });
  opts.checkpoint?.();
  const pdf = opts.pdf === true ? await reportPdf(document, { date: opts.date, figureSvgs: new Map(figures.map((f) => [f.file, f.svg])) }) : null;
  return { input, figures, document, html: reportHtml(document), markdown: reportMarkdown(document), pdf };
}
