/**
 * Heat map of a 2-D field on a structured, boundary-fitted grid (e.g. a fin's longitudinal
 * section with sloped faces): the field on the grid's true outline, a colour bar, labelled
 * iso-lines, and marked grid edges (e.g. "base" on i = 0 and "tip" on i = ni - 1).
 *
 * Input: node coordinates x, y and values, all in one indexing: node (i, j) at
 * offset + i * strideI + j * strideJ (defaults: offset 0, strideI 1, strideJ ni, i fastest).
 * Coordinates are in the units the axis titles name (e.g. mm).
 *
 * Shape: drawn to scale when that fills a useful part of the plot; a thin shape is stretched
 * across its thickness by a round factor (2, 5, 10, ...) and the y-axis title says so.
 */

import { el, polylinePathData, svgDocument, textEl, fmt } from './svg.js';
import { defaultHeight, defaultWidth, fontSize, gap, ink, stroke } from './theme.js';
import { extent, makeAxis, project, type Axis, type Scale } from './scales.js';
import { drawAxes, xAxisMargin, yAxisMargin } from './axes.js';
import { drawHeader, type Rect } from './layout.js';
import { colourBarAxis, colourBarThickness, colourBarWidth, drawColourBar } from './colorbar.js';
import { getColormap, type ColormapName } from './colormaps.js';
import { contourLayer, fieldImage, type ContourLevel } from './field-layer.js';
import type { GridLayout } from './field-raster.js';
import { formatTick, linearTicks } from './ticks.js';

export interface StructuredGrid {
  ni: number;
  nj: number;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  offset?: number;
  strideI?: number;
  strideJ?: number;
}

export interface EdgeLabels {
  iMin?: string;
  iMax?: string;
  jMin?: string;
  jMax?: string;
}

export interface FieldChartSpec {
  title: string;
  subtitle?: string | readonly string[];
  xLabel: string;
  yLabel: string;
  /** Colour-bar title with unit, e.g. "Temperature (°C)". */
  valueLabel: string;
  /** Appended to iso-line labels, e.g. " °C". */
  valueUnit?: string;
  grid: StructuredGrid;
  values: ArrayLike<number>;
  /** Sequential map; default viridis. */
  colormap?: Extract<ColormapName, 'viridis' | 'cividis'>;
  /** Colour range; default the finite range of the values. */
  valueRange?: [number, number];
  /** Iso-line values; default about 8 round values inside the range. Empty: none. */
  levels?: readonly number[];
  edgeLabels?: EdgeLabels;
  /** y stretch: 'auto' (default), or a fixed factor (1 = true shape). */
  yStretch?: 'auto' | number;
  width?: number;
  height?: number;
  /** Raster pixels per SVG px for the embedded field image (use the PNG's dpi / 96). Default 1. */
  rasterScale?: number;
}

export interface FieldChartResult {
  svg: string;
  plot: Rect;
  x: Scale;
  y: Scale;
  /** y stretch factor actually used (1 = true shape). */
  yStretch: number;
  levels: number[];
  /** Where the colour bar is drawn (px); its bottom is the low end of `valueRange`. */
  colourBar: Rect;
  valueRange: [number, number];
}

export function gridLayout(grid: StructuredGrid): GridLayout {
  const layout = { ni: grid.ni, nj: grid.nj, offset: grid.offset ?? 0, strideI: grid.strideI ?? 1, strideJ: grid.strideJ ?? grid.ni };
  const last = layout.offset + (layout.ni - 1) * layout.strideI + (layout.nj - 1) * layout.strideJ;
  if (layout.ni < 2 || layout.nj < 2) throw new RangeError(`field chart: grid ${layout.ni} x ${layout.nj} needs at least 2 x 2 nodes`);
  if (last >= grid.x.length || last >= grid.y.length) throw new RangeError(`field chart: node (${layout.ni - 1}, ${layout.nj - 1}) at index ${last} is outside the coordinate arrays`);
  return layout;
}

/** Largest of 1, 2, 5, 10, 20, 50, ... not above `limit` (at least 1). */
function roundStretch(limit: number): number {
  let best = 1;
  for (let p = 1; p <= 1e6; p *= 10) for (const m of [1, 2, 5]) if (m * p <= limit) best = m * p;
  return best;
}

function defaultLevels(low: number, high: number): number[] {
  const t = linearTicks(low, high, 9, 'inside');
  const span = high - low;
  // Levels within 1 % of the range of its ends would draw along the hottest/coldest edge only.
  return t.values.filter((v) => v > low + 0.01 * span && v < high - 0.01 * span);
}

export function fieldChart(spec: FieldChartSpec): FieldChartResult {
  const width = spec.width ?? defaultWidth;
  const height = spec.height ?? defaultHeight;
  const layout = gridLayout(spec.grid);
  const range = spec.valueRange ?? extent([spec.values]) ?? [0, 1];
  const [low, high] = range[0] === range[1] ? [range[0] - 0.5, range[1] + 0.5] : range;
  const map = getColormap(spec.colormap ?? 'viridis');
  const levels = spec.levels ? [...spec.levels] : defaultLevels(low, high);
  const levelDecimals = linearTicks(low, high, 9, 'inside').decimals;

  const header = drawHeader(spec.title, spec.subtitle, width);
  const barAxisProbe = colourBarAxis(low, high, header.bottom, height - 100);
  const right = width - gap.outer - colourBarWidth(barAxisProbe) - 24;
  const xr = extent([spec.grid.x]) ?? [0, 1];
  const yr = extent([spec.grid.y]) ?? [0, 1];
  const dx = xr[1] - xr[0] || 1;
  const dy = yr[1] - yr[0] || 1;

  // Available rectangle; the left margin depends on the y tick labels, so estimate with a probe axis.
  const top = header.bottom + 8;
  const bottom = height - gap.outer - xAxisMargin(true, true);
  const probeY = makeAxis('linear', yr[0], yr[1], bottom, top, 5, 'inside');
  const left = gap.outer + yAxisMargin(probeY, true) + 6;
  const edgePad = spec.edgeLabels ? 30 : 12;
  const availW = right - left - 2 * edgePad;
  const availH = bottom - top - 2 * 12;
  const pxPerX = availW / dx;
  const trueH = dy * pxPerX;
  let stretch: number;
  if (typeof spec.yStretch === 'number') stretch = spec.yStretch;
  else stretch = trueH >= 0.35 * availH ? 1 : roundStretch(availH / trueH);
  // Fit both directions: x px/unit = s, y px/unit = s * stretch.
  const s = Math.min(pxPerX, availH / (dy * stretch));
  const plotW = dx * s + 2 * edgePad;
  const plotH = dy * s * stretch + 24;
  const plot: Rect = { x: left + (right - left - plotW) / 2, y: top + (bottom - top - plotH) / 2, width: plotW, height: plotH };
  const xDomainPad = edgePad / s;
  const yDomainPad = 12 / (s * stretch);
  const xTarget = Math.max(3, Math.min(11, Math.round(plotW / 100)));
  const yTarget = Math.max(2, Math.min(8, Math.round(plotH / 60)));
  const xAxis: Axis = makeAxis('linear', xr[0] - xDomainPad, xr[1] + xDomainPad, plot.x, plot.x + plot.width, xTarget, 'inside');
  const yAxis: Axis = makeAxis('linear', yr[0] - yDomainPad, yr[1] + yDomainPad, plot.y + plot.height, plot.y, yTarget, 'inside');

  // Node positions in px.
  const n = Math.max(spec.grid.x.length, spec.grid.y.length);
  const sx = new Float64Array(n);
  const sy = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    sx[k] = project(xAxis.scale, spec.grid.x[k] as number);
    sy[k] = project(yAxis.scale, spec.grid.y[k] as number);
  }

  const body: string[] = [...header.elements];
  body.push(el('defs', {}, el('clipPath', { id: 'field-clip' }, el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height }))));
  const contours: ContourLevel[] = levels.map((v) => ({ value: v, label: `${formatTick(v, levelDecimals)}${spec.valueUnit ?? ''}` }));
  const layers: string[] = [
    fieldImage(layout, sx, sy, spec.values, map, low, high, spec.rasterScale ?? 1),
    outline(layout, sx, sy),
    ...edgeMarks(layout, sx, sy, spec.edgeLabels ?? {}),
    ...contourLayer(layout, sx, sy, spec.values, contours, plot),
  ];
  body.push(el('g', { 'clip-path': 'url(#field-clip)' }, layers));
  const yTitle = stretch === 1 ? spec.yLabel : `${spec.yLabel}, stretched ×${stretch}`;
  body.push(...drawAxes(plot, xAxis, yAxis, { xLabel: spec.xLabel, yLabel: yTitle, grid: false, xTickLabels: true }));

  // The bar spans at least 60 % of the available height, centred on the plot.
  const barHeight = Math.min(bottom - top, Math.max(plot.height, 0.6 * (bottom - top)));
  const barY = Math.min(Math.max(plot.y + (plot.height - barHeight) / 2, top), bottom - barHeight);
  const bar: Rect = { x: right + 24, y: barY, width: colourBarThickness, height: barHeight };
  const barAxis = colourBarAxis(low, high, bar.y, bar.y + bar.height);
  body.push(drawColourBar(map, barAxis, bar, spec.valueLabel, levels));

  const svg = svgDocument(width, height, body);
  return { svg, plot, x: xAxis.scale, y: yAxis.scale, yStretch: stretch, levels, colourBar: bar, valueRange: [low, high] };
}

/** Indices of the nodes along one grid edge. */
function edgeNodes(layout: GridLayout, edge: keyof EdgeLabels): number[] {
  const { ni, nj, offset, strideI, strideJ } = layout;
  const out: number[] = [];
  switch (edge) {
    case 'iMin':
      for (let j = 0; j < nj; j++) out.push(offset + j * strideJ);
      break;
    case 'iMax':
      for (let j = 0; j < nj; j++) out.push(offset + (ni - 1) * strideI + j * strideJ);
      break;
    case 'jMin':
      for (let i = 0; i < ni; i++) out.push(offset + i * strideI);
      break;
    case 'jMax':
      for (let i = 0; i < ni; i++) out.push(offset + i * strideI + (nj - 1) * strideJ);
      break;
    default: {
      const unreachable: never = edge;
      throw new Error(`unknown edge ${String(unreachable)}`);
    }
  }
  return out;
}

/** The grid's outline (crisp, antialiased edge over the raster). */
function outline(layout: GridLayout, sx: Float64Array, sy: Float64Array): string {
  const ring = [
    ...edgeNodes(layout, 'jMin'),
    ...edgeNodes(layout, 'iMax'),
    ...edgeNodes(layout, 'jMax').reverse(),
    ...edgeNodes(layout, 'iMin').reverse(),
  ];
  return el('path', {
    d: polylinePathData(ring.map((k) => sx[k] as number), ring.map((k) => sy[k] as number), true),
    fill: 'none',
    stroke: ink.frame,
    'stroke-width': 1.2,
    'stroke-linejoin': 'round',
  });
}

/** Thick line along each labelled edge and its label outside the shape, set along the edge. */
function edgeMarks(layout: GridLayout, sx: Float64Array, sy: Float64Array, labels: EdgeLabels): string[] {
  const out: string[] = [];
  let cx = 0, cy = 0, count = 0;
  for (let k = 0; k < sx.length; k++) {
    if (Number.isFinite(sx[k]) && Number.isFinite(sy[k])) { cx += sx[k] as number; cy += sy[k] as number; count++; }
  }
  cx /= Math.max(1, count);
  cy /= Math.max(1, count);
  for (const edge of ['iMin', 'iMax', 'jMin', 'jMax'] as const) {
    const label = labels[edge];
    if (label === undefined) continue;
    const nodes = edgeNodes(layout, edge);
    const xs = nodes.map((k) => sx[k] as number);
    const ys = nodes.map((k) => sy[k] as number);
    out.push(el('path', { d: polylinePathData(xs, ys), fill: 'none', stroke: '#000000', 'stroke-width': stroke.edge, 'stroke-linecap': 'square' }));
    const mid = Math.floor(nodes.length / 2);
    const mx = (xs[0] as number + (xs[xs.length - 1] as number)) / 2;
    const my = (ys[0] as number + (ys[ys.length - 1] as number)) / 2;
    const ex = (xs[xs.length - 1] as number) - (xs[0] as number);
    const ey = (ys[ys.length - 1] as number) - (ys[0] as number);
    const len = Math.hypot(ex, ey) || 1;
    // Outward normal: the one pointing away from the shape's centroid.
    let nx = -ey / len, ny = ex / len;
    const px = (xs[mid] as number) ?? mx, py = (ys[mid] as number) ?? my;
    if (nx * (px - cx) + ny * (py - cy) < 0) { nx = -nx; ny = -ny; }
    // Baseline 7 px outside the edge, text rotated along the edge with its top facing outward.
    const lx = px + nx * 7, ly = py + ny * 7;
    const along = (Math.atan2(ey, ex) * 180) / Math.PI;
    const upDot = (deg: number): number => Math.sin((deg * Math.PI) / 180) * nx - Math.cos((deg * Math.PI) / 180) * ny;
    let angle = upDot(along) >= upDot(along + 180) ? along : along + 180;
    if (angle > 180) angle -= 360;
    const attrs = {
      x: lx,
      y: ly,
      'font-size': fontSize.annotation,
      'font-weight': 'bold',
      'text-anchor': 'middle',
      transform: Math.abs(angle) < 1e-9 ? undefined : `rotate(${fmt(angle)} ${fmt(lx)} ${fmt(ly)})`,
    };
    out.push(textEl(label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
    out.push(textEl(label, { ...attrs, fill: ink.text }));
  }
  return out;
}
