/**
 * The profile chart of `fincheck plot`: the temperature along the fin for every model of the check on one
 * chart. The reference is the solid black line; each shortcut has its own colour, dash pattern and
 * marker (images/series-styles.ts), its heat rate, drift and verdict in the legend; the reference's tip
 * temperature is marked. Axes in mm and °C.
 */
import { CHART_CAUTION, type ModelProfiles, type CheckReport } from '../compare/index.js';
import { inUnit, type Case } from '../case/index.js';
import type { FinStudy1D, FinStudy2D } from '../fd/index.js';
import type { LineChartSpec, LineSeries, PointAnnotation } from '../images/index.js';
import { withPointLabels, type PointLabel } from './point-labels.js';
import {
  alongAxisTitle,
  faceLabel,
  inDisplay,
  isPin,
  lineLabel,
  modelStyle,
  referenceWords,
  sig,
  signedPercent,
  thinSeries,
  toMillimetres,
  unitsOf,
} from './labels.js';

export interface ChartSize {
  /** Canvas in CSS px (96 per inch). */
  width: number;
  height: number;
}

export interface CheckPlotInput {
  case: Case;
  report: CheckReport;
  profiles: ModelProfiles;
  /** The fd-1d refinement study behind the check. */
  oneD: FinStudy1D;
  /** The fd-2d study when it is the check's reference (the heat map reuses it). */
  twoD: FinStudy2D | null;
}

/** Legend note of a model: its heat rate, and for a shortcut its drift and verdict. */
export function legendNote(input: CheckPlotInput, model: string, withHeatRate = true): string {
  const { report } = input;
  const heat = unitsOf(input.case).heat;
  const q = (w: number): string => `Q ${sig(inUnit(heat, w))} ${heat.pretty}`;
  if (model === report.reference.model) return withHeatRate ? q(report.reference.heatRate_W) : 'reference';
  // Nonlinear fins list each shortcut twice (two guesses of h and k); the lines show the base guess.
  const row = report.models.find((m) => m.model === model && (m.guess === undefined || m.guess === 'base'));
  if (!row) return '';
  const drift = `drift ${signedPercent(row.drift)} (${row.verdict})`;
  return withHeatRate ? `${q(row.heatRate_W)}, ${drift}` : drift;
}

/** Subtitle lines shared by the profile and flux charts. */
export function checkSubtitle(input: CheckPlotInput): string[] {
  const { report, profiles } = input;
  // At most four lines (the chart header's limit): reference; shortcuts and what is not drawn; one remark;
  // the caution (last, so it is never the line cut).
  const omitted = profiles.omitted.length > 0 ? ` Not drawn (no temperature profile): ${profiles.omitted.map((o) => o.model).join(', ')}.` : '';
  const lines = [
    `Reference: ${referenceWords(report.reference)}; verdicts at a tolerance of ±${(100 * report.tolerance).toFixed(1)} %.`,
    `Shortcuts on the equivalent uniform fin; drift = (Q − Q_ref)/Q_ref.${omitted}`,
  ];
  if (profiles.note !== null) lines.push(profiles.note);
  else if (report.reference.model === 'fd-2d' && !isPin(input.case) && input.case.fin.profile.kind !== 'annular' && input.case.fin.edges === 'cooled') {
    lines.push("fd-2d lines: the section with insulated side edges; the reference Q adds the edges' cooling from fd-1d.");
  }
  lines.push(CHART_CAUTION);
  return lines;
}

export function profileChartSpec(input: CheckPlotInput, size: ChartSize): LineChartSpec {
  const { case: c, report, profiles } = input;
  const u = unitsOf(c);
  const T = u.temperature;
  const series: LineSeries[] = [];
  for (const p of profiles.profiles) {
    const line = thinSeries(toMillimetres(p.temperature.x_m, profiles.baseX_m, u), inDisplay(T, p.temperature.values));
    series.push({
      label: lineLabel(c, p.model, report.reference),
      x: line.x,
      y: line.y,
      note: legendNote(input, p.model),
      ...modelStyle(p.model, report.reference.model),
    });
    if (p.faceTemperature) {
      // The face of the 2-D solution: grey long dashes, so the mid-plane-to-face drop reads as a band.
      const face = thinSeries(toMillimetres(p.faceTemperature.x_m, profiles.baseX_m, u), inDisplay(T, p.faceTemperature.values));
      series.push({ label: faceLabel(p.model), x: face.x, y: face.y, colour: '#555555', style: 'longdash', marker: 'none' });
    }
  }
  const points: PointAnnotation[] = [];
  const labels: PointLabel[] = [];
  const reference = profiles.profiles.find((p) => p.model === report.reference.model);
  if (reference) {
    const tipX = (profiles.baseX_m + profiles.length_m) * u.length.scale;
    const tipT = inUnit(T, reference.tipTemperature_degC);
    points.push({ x: tipX, y: tipT, marker: 'circle' });
    const tipWords = c.fin.profile.kind === 'annular' ? 'rim (r2)' : 'tip';
    labels.push({ panel: 0, x: tipX, y: tipT, text: `${tipWords} ${tipT.toFixed(2)} ${T.pretty} (${reference.model})` });
    if (c.base.contactResistance > 0) {
      const baseX = profiles.baseX_m * u.length.scale;
      const baseT = inUnit(T, reference.temperature.values[0] as number);
      points.push({ x: baseX, y: baseT, marker: 'square' });
      labels.push({
        panel: 0,
        x: baseX,
        y: baseT,
        text: `fin base ${baseT.toFixed(2)} ${T.pretty} (wall ${T.scale === 1 && T.offset === 0 ? c.base.T_degC : Number(inUnit(T, c.base.T_degC).toPrecision(6))} ${T.pretty} behind the contact resistance)`,
      });
    }
  }
  const spec: LineChartSpec = {
    title: `Temperature along the fin: ${c.name}`,
    subtitle: checkSubtitle(input),
    xLabel: alongAxisTitle(c),
    panels: [{ yLabel: `Temperature T (${T.pretty})`, series, points }],
    width: size.width,
    height: size.height,
  };
  return withPointLabels(spec, labels);
}
