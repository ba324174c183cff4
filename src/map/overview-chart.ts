/**
 * overview.svg/png: where each shortcut holds, as small multiples: one small panel per shortcut, all on the same
 * axes, in the order of the maps. In each panel the region where |drift| <= tolerance (its verdict `ok`) is filled
 * light green and outlined, and the panel's title gives the share of the map where it is ok. One panel per shortcut, because regions drawn over each other on one chart turned muddy where the
 * translucent fills overlapped and hid each other where outlines coincided (two shortcuts that agree). Invalid
 * points are grey (as on the per-shortcut maps), points without a verdict (reference not resolved) crossed and never
 * inside a region, the case's own point is marked in every panel, and the axis titles
 * (words and units, axis-title.ts) are shared.
 *
 * Outline: the iso-line s = 0 of s = tolerance - |drift| by marching squares, on the grid padded with a ring of
 * "unsafe" nodes placed on the plot's edges, so every region closes along the edge of the map and can be filled
 * (even-odd rule for holes). Invalid points and points where the shortcut does not apply count as unsafe.
 */
import { CHART_CAUTION } from '../compare/index.js';
import { contourLines, getColormap, makeAxis, project, type Axis } from '../images/index.js';
import {
  drawAxes,
  xAxisMargin,
  yAxisMargin,
  fieldImage,
  drawHeader,
  type Rect,
  el,
  fmt,
  polylinePathData,
  svgDocument,
  textEl,
  truncateToWidth,
  defaultHeight,
  defaultWidth,
  fontSize,
  gap,
  ink,
} from '../images/index.js';
import { caseMarkSvg, casePointMark } from './case-mark.js';
import { unresolvedMarksSvg, unresolvedNote, unresolvedPoints } from './unresolved-marks.js';
import { axisLabel, percentText } from './model-chart.js';
import type { MapRun } from './run-map.js';
import { isPointError, type MapModelId } from './types.js';

export interface OverviewPanel {
  model: MapModelId;
  plot: Rect;
  xAxis: Axis;
  yAxis: Axis;
}

export interface OverviewChart {
  svg: string;
  /** One panel per shortcut, in the order of the models. */
  panels: OverviewPanel[];
  /** The first panel's plot and axes. */
  plot: Rect;
  xAxis: Axis;
  yAxis: Axis;
}

/**
 * The fill of the ok region: Okabe & Ito's bluish green, light. One tint in every panel (each panel is one
 * shortcut), not the red or blue of the drift maps (which mean a drift below or above the reference), and never
 * the grey of invalid points.
 */
const OK_FILL = '#009e73';
const OK_FILL_OPACITY = 0.2;

/** Columns of the panel grid for n panels on a landscape canvas: 1-3 in a row, 4 as 2 x 2, then 3 (4 from 7 on). */
export function overviewColumns(n: number): number {
  if (n <= 3) return Math.max(1, n);
  if (n === 4) return 2;
  return n <= 6 ? 3 : 4;
}

/**
 * s = tolerance - |drift| of one model at the grid points; where it has no value or no verdict (reference not
 * resolved), a large negative number, so that the outline passes through the last point with a verdict (where the
 * grey of the invalid cells begins) and an unresolved point is never shown as ok.
 */
export function safetyMargin(run: MapRun, model: MapModelId): Float64Array {
  const tolerance = run.job.check.tolerance;
  const s = new Float64Array(run.points.length).fill(-1e6);
  for (const p of run.points) {
    if (isPointError(p) || !p.reference.resolved) continue;
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
  const invalid = run.summary.errors;
  const unresolved = unresolvedPoints(run);
  const header = drawHeader(
    `Where each shortcut holds: ${run.caseName}`,
    [
      `green, outlined: |drift| ≤ ${percentText(tolerance)} against ${run.casePoint.reference.model} (verdict ok); white: marginal or unsafe; one panel per shortcut, same axes` +
        (invalid > 0 ? `; grey: ${invalid} points where the case is invalid` : '') +
        (unresolved.length > 0 ? `; ${unresolvedNote(unresolved.length)}` : ''),
      CHART_CAUTION,
    ],
    width,
  );

  const cols = overviewColumns(models.length);
  const rows = Math.max(1, Math.ceil(models.length / cols));
  const yKind = run.y.log ? 'log' : 'linear';
  const xKind = run.x.log ? 'log' : 'linear';
  const xFirst = run.x.values[0] as number,
    xLast = run.x.values[nx - 1] as number;
  const yFirst = run.y.values[0] as number,
    yLast = run.y.values[ny - 1] as number;
  const titleBand = fontSize.legend + 10;
  // Shared titles: the y title left of the grid, the x title under it.
  const top = header.bottom + 4;
  const bottom = height - gap.outer - (fontSize.axisLabel + gap.axisLabel);
  const left = gap.outer + fontSize.axisLabel + gap.axisLabel;
  const right = width - gap.outer - 8;
  const cellH = (bottom - top) / rows;
  const cellW = (right - left) / cols;
  const panelH = cellH - titleBand - xAxisMargin(true, false) - 6;
  const yProbe = makeAxis(yKind, yFirst, yLast, panelH, 0, Math.max(2, Math.min(6, Math.round(panelH / 55))), 'inside');
  const yMargin = yAxisMargin(yProbe, false) + 4;
  const panelW = cellW - yMargin - 14;

  const px0 = (x0: number): Axis => makeAxis(xKind, xFirst, xLast, x0, x0 + panelW, Math.max(2, Math.min(6, Math.round(panelW / 90))), 'inside');
  const body: string[] = [...header.elements];
  const defs: string[] = [];
  const panels: OverviewPanel[] = [];
  const marks = casePointMark(run);
  models.forEach((model, k) => {
    const row = Math.floor(k / cols);
    const col = k % cols;
    const plot: Rect = { x: left + col * cellW + yMargin, y: top + row * cellH + titleBand, width: panelW, height: panelH };
    const xAxis = px0(plot.x);
    const yAxis = makeAxis(yKind, yFirst, yLast, plot.y + plot.height, plot.y, Math.max(2, Math.min(6, Math.round(panelH / 55))), 'inside');
    panels.push({ model, plot, xAxis, yAxis });
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
    const clipId = `overview-clip-${k}`;
    defs.push(el('clipPath', { id: clipId }, el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height })));
    const layers: string[] = [
      el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height, fill: ink.invalid }),
      fieldImage({ ni: nx, nj: ny, offset: 0, strideI: 1, strideJ: nx }, sx, sy, validity, getColormap('rdbu'), -1, 1, 1),
    ];
    const d = safeRegionPath(safetyMargin(run, model), px, py);
    if (d !== '') {
      layers.push(el('path', { d, fill: OK_FILL, 'fill-opacity': OK_FILL_OPACITY, 'fill-rule': 'evenodd', stroke: 'none' }));
      layers.push(el('path', { d, fill: 'none', stroke: '#000000', 'stroke-width': 2, 'stroke-linejoin': 'round' }));
    }
    // "this case" written once, in the first panel; the others show the mark alone.
    layers.push(unresolvedMarksSvg(unresolved, xAxis.scale, yAxis.scale));
    layers.push(caseMarkSvg(k === 0 ? marks : marks.map(({ x, y }) => ({ x, y })), xAxis.scale, yAxis.scale));
    body.push(el('g', { 'clip-path': `url(#${clipId})` }, layers));
    // x tick labels where no panel sits below.
    const below = k + cols < models.length;
    body.push(...drawAxes(plot, xAxis, yAxis, { grid: false, xTickLabels: !below }));
    const counts = run.summary.models.find((m) => m.model === model);
    const share = counts ? counts.ok / run.summary.points : 0;
    const title = truncateToWidth(`${model}: ok on ${Math.round(100 * share)} %`, fontSize.legend * 1.08, plot.width);
    body.push(textEl(title, { x: plot.x, y: plot.y - 8, 'font-size': fontSize.legend, 'font-weight': 'bold', fill: ink.text }));
  });

  // Shared axis titles, centred on the grid of panels.
  const gridLeft = left + yMargin;
  const gridRight = left + (cols - 1) * cellW + yMargin + panelW;
  const xTitleY = height - gap.outer - 2;
  body.push(
    textEl(axisLabel(run.x), { x: (gridLeft + gridRight) / 2, y: xTitleY, 'font-size': fontSize.axisLabel, 'text-anchor': 'middle', fill: ink.text }),
  );
  const yTitleX = gap.outer + fontSize.axisLabel - 4;
  const yTitleY = (top + bottom) / 2;
  body.push(
    textEl(truncateToWidth(axisLabel(run.y), fontSize.axisLabel, bottom - top), {
      x: yTitleX,
      y: yTitleY,
      'font-size': fontSize.axisLabel,
      'text-anchor': 'middle',
      fill: ink.text,
      transform: `rotate(-90 ${fmt(yTitleX)} ${fmt(yTitleY)})`,
    }),
  );
  const first = panels[0];
  if (!first) throw new RangeError('overview chart: a map has at least one shortcut');
  return { svg: svgDocument(width, height, [el('defs', {}, defs), ...body]), panels, plot: first.plot, xAxis: first.xAxis, yAxis: first.yAxis };
}
