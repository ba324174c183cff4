/**
 * One report comparing several cases (`fincheck report a.yaml b.yaml ...`): the cases side by side (reference,
 * Q or a sink's hottest source and resistance, efficiency), every shortcut's drift and verdict side by side, the
 * single fins' reference temperature profiles overlaid on one chart, and each case's reference and its accuracy.
 * Heat sinks get their rows in the tables. Plain data (document.ts) rendered by the same HTML, Markdown and PDF
 * writers as a single-case report; numbers in the display units given.
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import { CAUTIONS, comparisonTable, signedPercentText, type CaseOutcome, type SinkCheckReport } from '../compare/index.js';
import { svgToPng } from '../images/index.js';
import { overlaidProfilesSvg, relativeError, sig, type CheckPlotInput } from '../plots/index.js';
import type { Block, ReportDocument, Section, TableRow, Tone } from './document.js';
import type { ReportFigure } from './figures.js';
import { reportHtml } from './html.js';
import { REPORT_CHART } from './make-report.js';
import { reportMarkdown } from './markdown.js';
import { reportPdf } from './pdf.js';

/** A case checked for the comparison: a single fin with its profiles, or a heat sink's check. */
export type ComparedCase = { file: string; kind: 'fin'; check: CheckPlotInput } | { file: string; kind: 'heat-sink'; report: SinkCheckReport };

export interface ComparisonReportOptions {
  tolerance: number;
  units: DisplayUnits;
  version: string;
  date: string;
  /** PNG resolution of the figure (96 = 1200 x 750 px). */
  dpi: number;
  pdf?: boolean;
  /** Called before the slow steps; may throw to stop (an interrupt). */
  checkpoint?: () => void;
}

export interface ComparisonReportContent {
  document: ReportDocument;
  figures: ReportFigure[];
  html: string;
  markdown: string;
  pdf: Buffer | null;
}

/** File name of the overlaid profiles beside the Markdown report. */
export const COMPARISON_FIGURE = 'profiles.png';

function outcomeOf(c: ComparedCase): CaseOutcome {
  return c.kind === 'fin' ? { file: c.file, kind: 'fin', report: c.check.report } : { file: c.file, kind: 'heat-sink', report: c.report };
}

function nameOf(c: ComparedCase): string {
  return c.kind === 'fin' ? c.check.report.case : c.report.case;
}

const toneOf: Record<string, Tone> = { ok: 'ok', marginal: 'marginal', unsafe: 'unsafe', unresolved: 'warning' };

function worstTone(verdicts: readonly string[]): Tone {
  for (const v of ['unresolved', 'unsafe', 'marginal'] as const) if (verdicts.includes(v)) return toneOf[v] as Tone;
  return 'ok';
}

function sideBySide(cases: readonly ComparedCase[], u: DisplayUnits, tolerance: number): Block[] {
  const table = comparisonTable(cases.map(outcomeOf));
  const shown = (x: number | null, f: (v: number) => string): string => (x === null ? '–' : f(x));
  const rows: TableRow[] = table.rows.map((row) => ({
    cells: [
      row.case ?? row.file,
      row.file,
      row.reference ?? '–',
      shown(row.heatRate_W, (q) => sig(inUnit(u.heat, q), 5)),
      shown(row.hottestSourceMean_degC, (t) => inUnit(u.temperature, t).toFixed(2)),
      shown(row.sinkResistance_KperW, (r) => sig(inUnit(u.resistance, r), 4)),
      shown(row.efficiency, (e) => e.toFixed(4)),
    ],
    tone: worstTone(Object.values(row.models).map((m) => m.verdict)),
  }));
  const verdictRows: TableRow[] = table.columns.map((id) => ({
    cells: [id, ...table.rows.map((row) => (row.models[id] ? `${signedPercentText(row.models[id].drift)} ${row.models[id].verdict}` : '–'))],
    tone: worstTone(table.rows.map((row) => row.models[id]?.verdict ?? 'ok')),
  }));
  return [
    {
      kind: 'table',
      caption: 'The cases side by side',
      columns: [
        { title: 'Case', align: 'left' },
        { title: 'File', align: 'left' },
        { title: 'Reference', align: 'left' },
        { title: `Q (${u.heat.pretty})`, align: 'right' },
        { title: `Hottest source, mean (${u.temperature.pretty})`, align: 'right' },
        { title: `Sink resistance (${u.resistance.pretty})`, align: 'right' },
        { title: 'Efficiency (–)', align: 'right' },
      ],
      rows,
      notes: [
        'Q: the reference heat rate of a single fin. A heat sink: its hottest source’s mean temperature and its resistance (hottest point over the total power), by fd-3d.',
        'Efficiency: the fin efficiency of a single fin; the realised overall efficiency of a heat sink.',
      ],
    },
    {
      kind: 'table',
      caption: `Verdicts side by side (tolerance ±${(100 * tolerance).toFixed(1)} %)`,
      columns: [{ title: 'Model', align: 'left' }, ...table.rows.map((row) => ({ title: row.case ?? row.file, align: 'right' as const }))],
      rows: verdictRows,
      notes: [
        'Drift = (model − reference) / reference: of the heat rate for a single fin, of the worst source’s mean rise for a heat sink. – : the model does not apply to that case.',
      ],
    },
  ];
}

function referenceFacts(cases: readonly ComparedCase[], u: DisplayUnits): Block[] {
  return cases.map((c): Block => {
    if (c.kind === 'fin') {
      const ref = c.check.report.reference;
      return {
        kind: 'facts',
        caption: `${nameOf(c)} (${c.file})`,
        items: [
          ['Reference', `${ref.model}, Q = ${sig(inUnit(u.heat, ref.heatRate_W), 6)} ${u.heat.pretty}`],
          [
            'Estimated discretisation error of Q',
            `${relativeError(ref.discretizationError)} relative (GCI)${ref.resolved ? '' : ': not resolved, no verdicts'}`,
          ],
          ['How it was solved', ref.note],
        ],
      };
    }
    const ref = c.report.reference;
    return {
      kind: 'facts',
      caption: `${nameOf(c)} (${c.file})`,
      items: [
        ['Reference', `fd-3d, sink resistance ${sig(inUnit(u.resistance, c.report.sinkResistance_KperW), 4)} ${u.resistance.pretty}`],
        [
          'Estimated discretisation error',
          `${ref.discretizationError === null ? 'not estimated' : relativeError(ref.discretizationError)} of the sources’ rises (GCI)${ref.resolved ? '' : ': not resolved, no verdicts'}`,
        ],
        ['How it was solved', ref.note],
      ],
    };
  });
}

export async function makeComparisonReport(cases: readonly ComparedCase[], opts: ComparisonReportOptions): Promise<ComparisonReportContent> {
  const u = opts.units;
  const fins = cases.flatMap((c) => (c.kind === 'fin' ? [{ name: nameOf(c), check: c.check }] : []));
  const figures: ReportFigure[] = [];
  if (fins.length > 0) {
    opts.checkpoint?.();
    const svg = overlaidProfilesSvg(fins, u, REPORT_CHART);
    figures.push({
      kind: 'profile',
      file: COMPARISON_FIGURE,
      svg,
      png: await svgToPng(svg, { dpi: opts.dpi }),
      width_px: REPORT_CHART.width,
      height_px: REPORT_CHART.height,
    });
  }
  const figureBlocks: Block[] = figures.map((f) => ({
    kind: 'figure',
    file: f.file,
    alt: `Temperature along the fin of ${fins.length} cases`,
    caption: `Figure 1. Temperature T (${u.temperature.pretty}) against the distance from the base (${u.length.pretty}) of every single fin compared, each on its own reference model; the legend gives the model, Q (${u.heat.pretty}) and its estimated discretisation error.${cases.length > fins.length ? ' Heat sinks have no profile along one fin: their rows are in the tables.' : ''}`,
    png: f.png,
    width_px: f.width_px,
    height_px: f.height_px,
  }));
  const sections: Section[] = [
    { id: 'compare', title: 'The cases compared', blocks: sideBySide(cases, u, opts.tolerance) },
    ...(figureBlocks.length > 0 ? [{ id: 'figures', title: 'Temperature profiles', blocks: figureBlocks }] : []),
    { id: 'references', title: 'Each case’s reference', blocks: referenceFacts(cases, u) },
  ];
  const document: ReportDocument = {
    title: `Fin check: ${cases.length} cases compared`,
    byline: `fincheck ${opts.version} · ${opts.date} · ${cases.map((c) => c.file.split(/[\\/]/).pop() ?? c.file).join(', ')}`,
    front: [{ kind: 'callout', title: 'Cautions', items: [...CAUTIONS], tone: 'warning' }],
    sections,
    footer: `Generated by fincheck ${opts.version} on ${opts.date}. Engineering estimates of idealised fins: confirm the design by test; run each case alone (fincheck report CASE) for its ledger, flags and charts.`,
  };
  opts.checkpoint?.();
  const pdf = opts.pdf === true ? await reportPdf(document, { date: opts.date, figureSvgs: new Map(figures.map((f) => [f.file, f.svg])) }) : null;
  return { document, figures, html: reportHtml(document), markdown: reportMarkdown(document), pdf };
}
