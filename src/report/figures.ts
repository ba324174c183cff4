/** The report's figures: the PNG of each chart with a caption naming its models, units and errors. */
import type { FinStudy2D } from '../fd/index.js';
import { inUnit, type DisplayUnits } from '../case/index.js';
import { alongAxisLabel, unitsOf, referenceWords, relativeError, sig, type CheckPlotInput, type PlotKind, REMAINING_FRACTION } from '../plots/index.js';
import type { Block, Section } from './document.js';

export interface ReportFigure {
  kind: PlotKind;
  /** File name beside the Markdown report, e.g. profile.png. */
  file: string;
  /** The chart as drawn (the PDF embeds it as vector graphics). */
  svg: string;
  png: Buffer;
  width_px: number;
  height_px: number;
}

/** File name of each chart beside the reports. */
export const FIGURE_FILES: Record<PlotKind, string> = { profile: 'profile.png', flux: 'flux.png', heatmap: 'heatmap.png', sensitivity: 'sensitivity.png' };

function twoDWords(study: FinStudy2D, u: DisplayUnits): string {
  const g = study.finest.grid;
  return `fd-2d on ${g.nodesX} × ${g.nodesY} nodes, Q = ${sig(inUnit(u.heat, study.heatRate_W), 5)} ${u.heat.pretty}${g.section === 'planar' ? ' (section with insulated side edges)' : ''}, estimated discretisation error of Q ${relativeError(study.discretizationError ?? Number.NaN)} (GCI, ${study.grids.length} grids)`;
}

function caption(kind: PlotKind, check: CheckPlotInput, field: FinStudy2D | null): string {
  const ref = check.report.reference;
  const u = unitsOf(check.case);
  const [L, T, W] = [u.length.pretty, u.temperature.pretty, u.heat.pretty];
  const along = alongAxisLabel(check.case).replace(/ \([^()]*\)$/, '');
  const omitted = check.profiles.omitted.map((o) => ` ${o.model} is not drawn: ${o.reason}.`).join('');
  switch (kind) {
    case 'profile':
      return `Temperature T (${T}) against ${along.toLowerCase()} (${L}) for every model. Reference ${referenceWords(ref)}.${ref.model === 'fd-2d' ? ' fd-2d is drawn on its mid-plane (solid black) and its cooled face (grey long dashes).' : ''} The shortcuts are closed forms on the equivalent uniform fin, exact for their own assumptions; the legend gives each model's Q (${W}), drift and verdict.${omitted}`;
    case 'flux':
      return `Heat flowing along the fin Q (${W}, top) and heat lost per unit length q′ = h P θ (${u.heatPerLength.pretty}, bottom) against ${along.toLowerCase()} (${L}). The dotted line marks where ${Math.round(100 * (1 - REMAINING_FRACTION))} % of the reference's heat has left the fin: beyond it the fin carries little. fd-1d's Q(x) is the scheme's own interface flux; fd-2d's is its base heat rate minus the face losses summed along the face.${omitted}`;
    case 'heatmap':
      return `Temperature T (${T}) in the fin's section, both halves, on its true outline (a thin section is stretched across its thickness by the factor the axis states); isotherms labelled in ${T}.${field ? ` ${twoDWords(field, u)}.` : ''}`;
    case 'sensitivity':
      return `Sensitivities d ln Q / d ln x of the reference heat rate (${ref.model}) to every input, largest at the top; inputs with a stated uncertainty in orange, with the part of the band each gives (|S| u, one standard uncertainty). ${check.report.sensitivityMethod ?? ''}.`;
    default: {
      const never: never = kind;
      return never;
    }
  }
}

const TITLES: Record<PlotKind, string> = {
  profile: 'Temperature along the fin',
  flux: 'Heat flow along the fin and heat lost per unit length',
  heatmap: 'Temperature field in the fin section (fd-2d)',
  sensitivity: 'Sensitivities of the heat rate',
};

export function figureSection(
  check: CheckPlotInput,
  field: FinStudy2D | null,
  figures: readonly ReportFigure[],
  heatmapUnavailable: string | null,
): Section {
  const blocks: Block[] = [];
  figures.forEach((f, k) => {
    blocks.push({
      kind: 'figure',
      file: f.file,
      alt: `${TITLES[f.kind]}: ${check.case.name}`,
      caption: `Figure ${k + 1}. ${caption(f.kind, check, field)}`,
      png: f.png,
      width_px: f.width_px,
      height_px: f.height_px,
    });
  });
  if (heatmapUnavailable !== null) blocks.push({ kind: 'paragraph', text: `No temperature field is shown: ${heatmapUnavailable}.` });
  return { id: 'plots', title: 'Plots', blocks };
}
