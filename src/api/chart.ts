/**
 * The charts for the library, as `fincheck plot` draws them: `profile` (temperature along the fin, every model),
 * `flux` (heat flow along the fin and heat lost per unit length) and `heatmap` (the fd-2d field on the section).
 * An SVG string, or PNG bytes at the asked resolution.
 */
import type { Case } from '../case/index.js';
import { UsageError } from '../errors.js';
import { chartBytes } from '../images/index.js';
import { checkPlotInput, fieldStudy, heatmapAvailability, PLOT_KINDS, plotSvg, type PlotKind, type PlotSources } from '../plots/index.js';
import { numberOf, referenceOf, toleranceOf, wholeNumberOf, withUnitsOf, type ReferenceChoice, type UnitsChoice } from './options.js';

export interface ChartCallOptions {
  /** Layout size in px at 96 dpi (default 1200 x 750). */
  width?: number;
  height?: number;
  tolerance?: number;
  reference?: ReferenceChoice;
  /** Display units of the axes, labels and legend (default: the case's own, mm and SI unless it says otherwise). */
  units?: UnitsChoice;
}

/** The chart as an SVG document. */
export async function chartSvg(c: Case, kind: PlotKind, options: ChartCallOptions = {}): Promise<string> {
  if (!(PLOT_KINDS as readonly string[]).includes(kind))
    throw new UsageError(`kind: got ${JSON.stringify(kind)}; expected one of ${PLOT_KINDS.join(', ')}`);
  const width = wholeNumberOf('width', options.width, 400, 8000) ?? 1200;
  const height = wholeNumberOf('height', options.height, 300, 8000) ?? 750;
  return drawn(c, kind, { width, height }, 1, options);
}

/** The chart as PNG bytes with `dpi` (default 96: width x height pixels; 300 for print). */
export async function chartPng(c: Case, kind: PlotKind, options: ChartCallOptions & { dpi?: number } = {}): Promise<Uint8Array> {
  if (!(PLOT_KINDS as readonly string[]).includes(kind))
    throw new UsageError(`kind: got ${JSON.stringify(kind)}; expected one of ${PLOT_KINDS.join(', ')}`);
  const width = wholeNumberOf('width', options.width, 400, 8000) ?? 1200;
  const height = wholeNumberOf('height', options.height, 300, 8000) ?? 750;
  const dpi = numberOf('dpi', options.dpi, 48, 1200, 96);
  const svg = await drawn(c, kind, { width, height }, dpi / 96, options);
  return new Uint8Array(await chartBytes(svg, 'png', { dpi }));
}

async function drawn(given: Case, kind: PlotKind, size: { width: number; height: number }, scale: number, options: ChartCallOptions): Promise<string> {
  const c = withUnitsOf(given, options.units);
  const tolerance = toleranceOf(options.tolerance);
  const reference = referenceOf(options.reference);
  let sources: PlotSources;
  if (kind === 'heatmap') {
    const available = heatmapAvailability(c);
    if (!available.ok) throw new UsageError(`kind heatmap: ${available.reason}`);
    sources = { case: c, check: null, field: await fieldStudy(c) };
  } else sources = { case: c, check: await checkPlotInput(c, { tolerance, reference, ledger: false }), field: null };
  return plotSvg(kind, sources, size, scale);
}
