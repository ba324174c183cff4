/**
 * map-<model>.svg/png: one shortcut's drift over the map, in %, on a diverging colour map centred on zero (ColorBrewer
 * RdBu: blue below, red above the reference), the +/- tolerance contours drawn and labelled, the case's own point
 * marked, invalid points grey, points without a verdict (reference not resolved) crossed, axes in the user's units (log where asked), and iso-lines of Bi and mL where they
 * help (iso-lines.ts), under the case's mark.
 *
 * Colour range: +/- the largest |drift| on the map, but at least twice and at most five times the tolerance, so the
 * tolerance band always reads as the pale middle of the map and a few wild points do not wash it out (the colour
 * saturates beyond the range; the colour bar shows the range).
 */
import { CHART_CAUTION } from '../compare/index.js';
import { mapChart, type MapChartResult } from '../images/index.js';
import { axisTitle } from './axis-title.js';
import { caseMarkSvg, casePointMark } from './case-mark.js';
import { appendToSvg, biotCandidates, isoLinesSvg, mLCandidates } from './iso-lines.js';
import type { MapRun } from './run-map.js';
import { isPointError, type MapAxis, type MapModelId } from './types.js';
import { unresolvedMarksSvg, unresolvedNote, unresolvedPoints } from './unresolved-marks.js';

/** The axis title of a map chart: words and a unit set for print (axis-title.ts). */
export function axisLabel(axis: MapAxis): string {
  return axisTitle(axis);
}

export function percentText(fraction: number): string {
  return `${Number((fraction * 100).toPrecision(3))} %`;
}

/** Bi and mL at the grid points (NaN where a point has no result). */
export function dimensionlessFields(run: MapRun): { biot: Float64Array; mL: Float64Array } {
  const biot = new Float64Array(run.points.length).fill(Number.NaN);
  const mL = new Float64Array(run.points.length).fill(Number.NaN);
  for (const p of run.points) {
    if (isPointError(p)) continue;
    biot[p.index] = p.biot ?? Number.NaN;
    mL[p.index] = p.mL ?? Number.NaN;
  }
  return { biot, mL };
}

export interface ModelChart {
  svg: string;
  chart: MapChartResult;
  /** Drift in % at the grid points (NaN: invalid point or shortcut not applicable). */
  driftPercent: Float64Array;
}

export function modelChart(run: MapRun, model: MapModelId): ModelChart {
  const tolerance = run.job.check.tolerance;
  const driftPercent = new Float64Array(run.points.length).fill(Number.NaN);
  let maxAbs = 0;
  for (const p of run.points) {
    if (isPointError(p)) continue;
    const m = p.models.find((r) => r.model === model);
    if (!m) continue;
    driftPercent[p.index] = 100 * m.drift;
    maxAbs = Math.max(maxAbs, Math.abs(100 * m.drift));
  }
  const tolPercent = 100 * tolerance;
  const limit = Math.min(Math.max(maxAbs, 2 * tolPercent), 5 * tolPercent);
  const invalid = run.summary.errors;
  const reference = run.casePoint.reference.model;
  const counts = run.summary.models.find((m) => m.model === model);
  const everywhere = counts !== undefined && counts.ok === run.summary.solved - counts.missing;
  const band = everywhere
    ? `within ±${percentText(tolerance)} at every valid point (no tolerance contour)`
    : `contours: the tolerance, ok within ±${percentText(tolerance)}`;
  const marks = casePointMark(run);
  const unresolved = unresolvedPoints(run);
  const notes = [
    invalid > 0 ? `grey: ${invalid} of ${run.summary.points} points where the case is invalid (see map.csv)` : '',
    unresolvedNote(unresolved.length),
  ];
  const note = notes.filter((n) => n !== '').join('; ');
  const chart = mapChart({
    title: `Drift of ${model} from ${reference}: ${run.caseName}`,
    subtitle: [
      `drift = (${model} − ${reference}) / ${reference} ${run.job.kind === 'heat-sink' ? "on each source's mean rise, the worst source's shown" : 'on the heat rate'}; ${band}`,
      CHART_CAUTION,
    ],
    xLabel: axisLabel(run.x),
    yLabel: axisLabel(run.y),
    valueLabel: `Drift of ${model} (%)`,
    x: run.x.values,
    y: run.y.values,
    values: driftPercent,
    xScale: run.x.log ? 'log' : 'linear',
    yScale: run.y.log ? 'log' : 'linear',
    limit,
    levels: [
      { value: tolPercent, label: `+${percentText(tolerance)}`, colour: '#000000' },
      { value: -tolPercent, label: `−${percentText(tolerance)}`, colour: '#000000', dash: '8 5' },
    ],
    points: marks,
    ...(note !== '' ? { invalidNote: note } : {}),
  });
  const { biot, mL } = dimensionlessFields(run);
  const iso = isoLinesSvg(chart.plot, chart.x, chart.y, run.x.values, run.y.values, [
    { name: 'Bi', values: biot, candidates: biotCandidates, dash: '2 4' },
    { name: 'mL', values: mL, candidates: mLCandidates, dash: '7 4' },
  ]);
  // The crosses over the iso-lines, and the mark again on top (the iso-lines may run through it).
  const crosses = unresolvedMarksSvg(unresolved, chart.x, chart.y);
  const onTop = iso === '' && crosses === '' ? '' : crosses + caseMarkSvg(marks, chart.x, chart.y);
  return { svg: appendToSvg(chart.svg, iso + onTop), chart, driftPercent };
}
