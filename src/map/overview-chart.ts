/**
 * overview.svg/png: where each shortcut holds, all on one chart. For every shortcut the region where
 * |drift| <= tolerance (its verdict `ok`) is outlined and lightly filled in the shortcut's colour (Okabe & Ito
 * colours, distinct dashes), with a legend giving the share of the map where it is ok. Invalid points are grey
 * (as on the per-shortcut maps), the case's own point is marked, axes are in the user's units.
 *
 * Outline: the iso-line s = 0 of s = tolerance - |drift| by marching squares, on the grid padded with a ring of
 * "unsafe" nodes placed on the plot's edges, so every region closes along the edge of the map and can be filled
 * (even-odd rule for holes). Invalid points and points where the shortcut does not apply count as unsafe.
 */
import { CHART_CAUTION } from '../compare/index.js';
import { contourLines, getColormap, makeAxis, project, type Axis, drawAxes, xAxisMargin, yAxisMargin, fieldImage, drawHeader, type Rect, drawLegend, legendSize, type LegendEntry, dashArray, okabeItoColours, type LineStyle, el, polylinePathData, svgDocument, defaultHeight, defaultWidth, gap, ink } from '../images/index.js';
import { caseMarkSvg, casePointMark } from './case-mark.js';
import { axisLabel, percentText } from './model-chart.js';
import type { MapRun } from './run-map.js';
import { isPointError, type MapModelId } from './types.js';

export interface OverviewChart {
  svg: string;
  plot: Rect;
  xAxis: Axis;
  yAxis: Axis;
}

const styles: readonly LineStyle[] = ['solid', 'dashed', 'dotted', 'dashdot', 'longdash', 'dashdotdot'];

/**
 * s = tolerance - |drift| of one model at the grid points; where it has no value, a large negative number, so that
 * the outline passes through the last point with a value (where the grey of the invalid cells begins).
 */
export function safetyMargin(run: MapRun, model: MapModelId): Float64Array {
  const tolerance = run.job.check.tolerance;
  const s = new Float64Array(run.points.length).fill(-1e6);
  for (const p of run.points) {
    if (isPointError(p)) continue;
    const m = p.models.find((r) => r.model === model);
    if (m) s[p.index] = tolerance - Math.abs(m.drift);
  }
  return s;
}

/** The closed outline(s) of {s >= 0} on the grid at screen positions px[i], py[j], as SVG path data. */
export function safeRegionPath(s: Float64Array, px: Float64Array, py: Float64Array): string {
  const nx = px.length;
  const ny = py.length;
  const ni = nx + 2;
  const nj = ny + 2;
  const sx = new Float64Array(ni * nj);
  const sy = new Float64Array(ni * nj);
  const v = new Float64Array(ni * nj).fill(-1e6);
  for (let j = 0; j < nj; j++) {
    const jj = Math.min(Math.max(j - 1, 0), ny - 1);
    for (let i = 0; i < ni; i++) {
      const ii = Math.min(Math.max(i - 1, 0), nx - 1);
      const k = j * ni + i;
      sx[k] = px[ii] as number;
      sy[k] = py[jj] as number;
      if (i > 0 && i <= nx && j > 0 && j <= ny) v[k] = s[jj * nx + ii] as number;
    }
  }
  const lines = contourLines({ ni, nj, offset: 0, strideI: 1, strideJ: ni }, sx, sy, v, 0);
  return lines.map((l) => polylinePathData(l.x, l.y, true)).join('');
}

export function overviewChart(run: MapRun): OverviewChart {
  const width = defaultWidth;
  const height = defaultHeight;
  const models = run.job.check.models;
  const tolerance = run.job.check.tolerance;
  const nx = run.x.values.length;
  const ny = run.y.values.length;
  const entries: LegendEntry[] = models.map((model, k) => {
    const counts = run.summary.models.find((m) => m.model === model);
    const share = counts ? counts.ok / run.summary.points : 0;
    const dash = dashArray(styles[k % styles.length] as LineStyle);
    return {
      label: model,
      note: `ok on ${Math.round(100 * share)} %`,
      colour: okabeItoColours[k % okabeItoColours.length] as string,
      ...(dash !== undefined ? { dash } : {}),
      lineWidth: 2.5,
      marker: 'none',
      markerFilled: false,
      sample: 'line',
    };
  });
  const legend = legendSize(entries, 1);

  const invalid = run.summary.errors;
  const header = drawHeader(
    `Where each shortcut holds: ${run.caseName}`,
    [
      `outlined and shaded: |drift| <= ${percentText(tolerance)} against ${run.casePoint.reference.model} (verdict ok); darker where more shortcuts hold` +
        (invalid > 0 ? `; grey: ${invalid} points where the case is invalid` : ''),
      CHART_CAUTION,
    ],
    width,
  );
  const top = header.bottom + 8;
  const bottom = height - gap.outer - xAxisMargin(true, true);
  const right = width - gap.outer - legend.width - 16;
  const xFirst = run.x.values[0] as number, xLast = run.x.values[nx - 1] as number;
  const yFirst = run.y.values[0] as number, yLast = run.y.values[ny - 1] as number;
  const yKind = run.y.log ? 'log' : 'linear';
  const xKind = run.x.log ? 'log' : 'linear';
  const yProbe = makeAxis(yKind, yFirst, yLast, bottom, top, 6, 'inside');
  const left = gap.outer + yAxisMargin(yProbe, true) + 6;
  const plot: Rect = { x: left, y: top, width: right - left, height: bottom - top };
  const xAxis = makeAxis(xKind, xFirst, xLast, plot.x, plot.x + plot.width, Math.max(3, Math.min(11, Math.round(plot.width / 100))), 'inside');
  const yAxis = makeAxis(yKind, yFirst, yLast, plot.y + plot.height, plot.y, Math.max(3, Math.min(9, Math.round(plot.height / 70))), 'inside');

  const px = Float64Array.from(run.x.values, (v) => project(xAxis.scale, v));
  const py = Float64Array.from(run.y.values, (v) => project(yAxis.scale, v));
  const sx = new Float64Array(nx * ny);
  const sy = new Float64Array(nx * ny);
  const validity = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      sx[j * nx + i] = px[i] as number;
      sy[j * nx + i] = py[j] as number;
    }
  }
  for (const p of run.points) validity[p.index] = isPointError(p) ? Number.NaN : 0;

  const layers: string[] = [
    el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height, fill: ink.invalid }),
    fieldImage({ ni: nx, nj: ny, offset: 0, strideI: 1, strideJ: nx }, sx, sy, validity, getColormap('rdbu'), -1, 1, 1),
  ];
  models.forEach((model, k) => {
    const d = safeRegionPath(safetyMargin(run, model), px, py);
    if (d === '') return;
    const entry = entries[k] as LegendEntry;
    layers.push(el('path', { d, fill: entry.colour, 'fill-opacity': 0.07, 'fill-rule': 'evenodd', stroke: 'none' }));
    layers.push(el('path', { d, fill: 'none', stroke: entry.colour, 'stroke-width': 2.5, 'stroke-dasharray': entry.dash, 'stroke-linejoin': 'round' }));
  });
  layers.push(caseMarkSvg(casePointMark(run), xAxis.scale, yAxis.scale));
  const body: string[] = [
    ...header.elements,
    el('defs', {}, el('clipPath', { id: 'overview-clip' }, el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height }))),
    el('g', { 'clip-path': 'url(#overview-clip)' }, layers),
    ...drawAxes(plot, xAxis, yAxis, { xLabel: axisLabel(run.x), yLabel: axisLabel(run.y), grid: false, xTickLabels: true }),
    drawLegend(entries, right + 16, plot.y, 1),
  ];
  return { svg: svgDocument(width, height, body), plot, xAxis, yAxis };
}
