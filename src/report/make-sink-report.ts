/**
 * Everything `fincheck report` writes for a heat sink, computed in memory: the sink check (its fd-3d reference, the
 * array shortcuts, the sensitivities and band), its charts as PNG (the plate, heat per fin, the fin profiles, the
 * tornado of the sensitivities; a bare plate: no fin charts), and the HTML, Markdown and (when asked) PDF documents,
 * in the case's display units (`c.display`). Nothing touches the disk here (write-files.ts does, all or nothing).
 */
import { defaultDisplayUnits, type HeatSinkCase } from '../case/index.js';
import { svgsToPngs } from '../images/index.js';
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
export const SINK_FIGURE_FILES: Record<SinkPlotKind, string> = {
  plate: 'plate.png',
  'fin-heat': 'fin-heat.png',
  profile: 'fin-profile.png',
  sensitivity: 'sensitivity.png',
};

const TITLES: Record<SinkPlotKind, string> = {
  plate: 'Plate underside temperature seen from above',
  'fin-heat': 'Heat per fin',
  profile: 'Temperature up the hottest and the coolest fin',
  sensitivity: "Sensitivities of the hottest source's rise",
};

function caption(kind: SinkPlotKind, input: SinkPlotInput): string {
  const gci = relativeError(input.report.reference.discretizationError ?? Number.NaN);
  const u = input.case.display ?? defaultDisplayUnits;
  const [T, W] = [u.temperature.pretty, u.heat.pretty];
  switch (kind) {
    case 'plate':
      return `Temperature T (${T}) of the plate's underside (z = 0, where the sources sit), seen from above through the plate, from fd-3d's finest grid (each colour a cell value; source mean rises known to ${gci}, GCI). Sources outlined and labelled with their mean and maximum temperature (interface drop included); fin footprints on the top face dashed; isotherms labelled in ${T}.`;
    case 'fin-heat':
      return `Heat entering each fin at its root (${W}, fd-3d), fins numbered as in the JSON fins array; the hottest and the coolest root highlighted; the dashed line is overall-efficiency-exact-fin's heat per fin (every fin at its one uniform base temperature).`;
    case 'profile':
      return `Temperature (${T}) up the fin with the hottest root and the fin with the coolest root (fd-3d: each fin's mean over its section), against the exact 1-D fin at overall-efficiency-exact-fin's uniform base temperature: the gap at the root is the uniform-base assumption.`;
    case 'sensitivity':
      return `Sensitivities d ln rise / d ln x of the mean rise of ${input.report.uncertainty?.source ?? 'the hottest source'} (fd-3d) to every input, largest at the top; inputs with a stated uncertainty in orange, with the part of the band each gives (|S| u, one standard uncertainty). ${input.report.sensitivityMethod ?? ''}.`;
    default: {
      const never: never = kind;
      return never;
    }
  }
}

export async function makeSinkReport(c: HeatSinkCase, opts: SinkReportOptions): Promise<SinkReportContent> {
  const input = await sinkPlotInput(c, opts.tolerance, true);
  const kinds = (['plate', 'fin-heat', 'profile', 'sensitivity'] as const).filter(
    (k) => sinkPlotAvailability({ case: c }, k).ok && (k !== 'sensitivity' || input.report.sensitivities !== undefined),
  );
  const svgs = kinds.map((kind) => {
    opts.checkpoint?.();
    return sinkPlotSvg(kind, input, REPORT_CHART, opts.dpi / 96);
  });
  // Two at a time on libuv's thread pool, as make-report.ts does.
  const pngs = await svgsToPngs(svgs, { dpi: opts.dpi, ...(opts.checkpoint ? { checkpoint: opts.checkpoint } : {}) });
  const figures: SinkReportFigure[] = kinds.map((kind, k) => ({
    kind,
    file: SINK_FIGURE_FILES[kind],
    title: TITLES[kind],
    caption: caption(kind, input),
    svg: svgs[k] as string,
    png: pngs[k] as Buffer,
    width_px: REPORT_CHART.width,
    height_px: REPORT_CHART.height,
  }));
  const document = buildSinkReport({ input, caseFile: opts.caseFile, figures, version: opts.version, date: opts.date });
  opts.checkpoint?.();
  const pdf = opts.pdf === true ? await reportPdf(document, { date: opts.date, figureSvgs: new Map(figures.map((f) => [f.file, f.svg])) }) : null;
  return { input, figures, document, html: reportHtml(document), markdown: reportMarkdown(document), pdf };
}
