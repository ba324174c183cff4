/**
 * Several cases on one chart (the comparison report): each single fin's reference temperature profile against the
 * distance from its base, in the display units, one style per case (images/series-styles.ts: colour, dash and marker
 * differ, so the lines stay apart in grey print). Each legend entry names the case, its reference model and Q.
 */
import { CHART_CAUTION } from '../compare/index.js';
import { inUnit, type DisplayUnits } from '../case/index.js';
import { defaultSeriesStyle, lineChart, type LineSeries } from '../images/index.js';
import { inDisplay, relativeError, sig, thinSeries, toMillimetres } from './labels.js';
import type { ChartSize, CheckPlotInput } from './profile-chart.js';

export interface OverlaidCase {
  /** The case's name as the comparison shows it. */
  name: string;
  check: CheckPlotInput;
}

/** The chart as SVG; cases without a reference profile are left out (and named in the subtitle). */
export function overlaidProfilesSvg(cases: readonly OverlaidCase[], u: DisplayUnits, size: ChartSize): string {
  const series: LineSeries[] = [];
  const missing: string[] = [];
  cases.forEach(({ name, check }, k) => {
    const reference = check.report.reference;
    const profile = check.profiles.profiles.find((p) => p.model === reference.model);
    if (profile === undefined) {
      missing.push(name);
      return;
    }
    const line = thinSeries(toMillimetres(profile.temperature.x_m, 0, u), inDisplay(u.temperature, profile.temperature.values));
    const look = defaultSeriesStyle(k);
    series.push({
      label: name,
      x: line.x,
      y: line.y,
      note: `${reference.model}, Q ${sig(inUnit(u.heat, reference.heatRate_W))} ${u.heat.pretty} (error ${relativeError(reference.discretizationError)})`,
      colour: look.colour,
      style: look.style,
      marker: look.marker,
    });
  });
  const subtitle = [
    'Each fin on its reference model (fd-2d: mid-plane or axis), from its base; Q and its estimated discretisation error (GCI) in the legend.',
    ...(missing.length > 0 ? [`Not drawn (no reference profile): ${missing.join(', ')}.`] : []),
    CHART_CAUTION,
  ];
  return lineChart({
    title: `Temperature along the fin: ${cases.length} fins compared`,
    subtitle,
    xLabel: cases.some((c) => c.check.case.fin.profile.kind === 'annular')
      ? `Distance from the base (${u.length.pretty}; annular fins: r − r1)`
      : `Distance from the base x (${u.length.pretty})`,
    panels: [{ yLabel: `Temperature T (${u.temperature.pretty})`, series }],
    width: size.width,
    height: size.height,
  }).svg;
}
