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
import { contourLayer, fieldImage, type ContourLevel, type LabelBox } from './field-layer.js';
import type { GridLayout } from './field-raster.js';
import { formatTick, linearTicks } from './ticks.js';
import { capHeight, fitLines, textWidth } from './text-metrics.js';

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
  /** Screen boxes (px) of the marked edges and their labels ("base", "tip"); iso-line labels keep clear of them. */
  edgeLabelBoxes: LabelBox[];
}

export function gridLayout(grid: StructuredGrid): GridLayout {
  const layout = { ni: grid.ni, nj: grid.nj, offset: grid.offset ?? 0, strideI: grid.strideI ?? 1, strideJ: grid.strideJ ?? grid.ni };
  const last = layout.offset + (layout.ni - 1) * layout.strideI + (layout.nj - 1) * layout.strideJ;
  if (layout.ni < 2 || layout.nj < 2) throw new RangeError(`field chart: grid ${layout.ni} x ${layout.nj} needs at least 2 x 2 nodes`);
  if (last >= grid.x.length || last >= grid.y.length)
    throw new RangeError(`field chart: node (${layout.ni - 1}, ${layout.nj - 1}) at index ${last} is outside the coordinate arrays`);
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
  const xr = extent([spec.grid.x]) ?? [0, 1];
  const yr = extent([spec.grid.y]) ?? [0, 1];
  const dx = xr[1] - xr[0] || 1;
  const dy = yr[1] - yr[0] || 1;
  const top = header.bottom + 8;
  const bottom = height - gap.outer - xAxisMargin(true, true);
  const edgePad = spec.edgeLabels ? 30 : 12;
  const lineStep = fontSize.axisLabel + 4;

  // The plot, sized from the space left by the y-axis titles (`yLines` lines) and the colour bar (title in
  // `barLines` lines). The y title and the bar are as tall as the plot, never taller: a title that does
  // not fit the plot's height goes on two lines (and is cut with "…" only if that is not enough).
  const place = (yLines: number, barLines: number) => {
    const barAxisProbe = colourBarAxis(low, high, top, bottom);
    const right = width - gap.outer - colourBarWidth(barAxisProbe) - (barLines - 1) * lineStep - 24;
    // The left margin depends on the y tick labels, so estimate with a probe axis.
    const probeY = makeAxis('linear', yr[0], yr[1], bottom, top, 5, 'inside');
    const left = gap.outer + yAxisMargin(probeY, true) + (yLines - 1) * lineStep + 6;
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
    const yTitle = stretch === 1 ? spec.yLabel : `${spec.yLabel}, stretched ×${stretch}`;
    return { right, s, stretch, plot, yTitle };
  };
  let geometry = place(1, 1);
  // The stretch note is never the part cut: it gets a line of its own when the title does not fit.
  const yTitleLines = (g: ReturnType<typeof place>): string[] => {
    const lines = fitLines(g.yTitle, fontSize.axisLabel, g.plot.height, 1);
    if (lines[0] === g.yTitle || g.stretch === 1) return fitLines(g.yTitle, fontSize.axisLabel, g.plot.height);
    return [...fitLines(spec.yLabel, fontSize.axisLabel, g.plot.height), `stretched ×${g.stretch}`];
  };
  const barTitleLines = (g: ReturnType<typeof place>): string[] => fitLines(spec.valueLabel, fontSize.axisLabel, g.plot.height);
  const wantY = yTitleLines(geometry).length;
  const wantBar = barTitleLines(geometry).length;
  if (wantY > 1 || wantBar > 1) geometry = place(wantY, wantBar);
  const { right, s, stretch, plot } = geometry;
  const xDomainPad = edgePad / s;
  const yDomainPad = 12 / (s * stretch);
  const xTarget = Math.max(3, Math.min(11, Math.round(plot.width / 100)));
  const yTarget = Math.max(2, Math.min(8, Math.round(plot.height / 60)));
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
  const edges = edgeMarks(layout, sx, sy, spec.edgeLabels ?? {});
  const layers: string[] = [
    fieldImage(layout, sx, sy, spec.values, map, low, high, spec.rasterScale ?? 1),
    outline(layout, sx, sy),
    ...edges.elements,
    // Iso-line labels keep clear of the edge labels ("base", "tip").
    ...contourLayer(layout, sx, sy, spec.values, contours, plot, edges.boxes),
  ];
  body.push(el('g', { 'clip-path': 'url(#field-clip)' }, layers));
  body.push(...drawAxes(plot, xAxis, yAxis, { xLabel: spec.xLabel, grid: false, xTickLabels: true }));
  body.push(yTitle(yTitleLines(geometry), plot, yAxis));

  // The bar spans the plot's height exactly, top to top and bottom to bottom.
  const bar: Rect = { x: right + 24, y: plot.y, width: colourBarThickness, height: plot.height };
  const barAxis = colourBarAxis(low, high, bar.y, bar.y + bar.height);
  body.push(drawColourBar(map, barAxis, bar, barTitleLines(geometry), levels));

  const svg = svgDocument(width, height, body);
  return { svg, plot, x: xAxis.scale, y: yAxis.scale, yStretch: stretch, levels, colourBar: bar, valueRange: [low, high], edgeLabelBoxes: edges.boxes };
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
    d: polylinePathData(
      ring.map((k) => sx[k] as number),
      ring.map((k) => sy[k] as number),
      true,
    ),
    fill: 'none',
    stroke: ink.frame,
    'stroke-width': 1.2,
    'stroke-linejoin': 'round',
  });
}

/** The y-axis title, rotated, one or two lines centred on the plot's height, left of the tick labels. */
function yTitle(lines: readonly string[], plot: Rect, yAxis: Axis): string {
  const widest = Math.max(0, ...yAxis.labels.map((l) => textWidth(l, fontSize.tick)));
  const lineStep = fontSize.axisLabel + 4;
  // The last line sits where a one-line title would; earlier lines further left.
  const lastX = plot.x - gap.tickLength - gap.tickLabel - widest - gap.axisLabel - 4;
  const y = plot.y + plot.height / 2;
  return el(
    'g',
    {},
    lines.map((line, k) => {
      const x = lastX - (lines.length - 1 - k) * lineStep;
      return textEl(line, {
        x,
        y,
        'font-size': fontSize.axisLabel,
        'text-anchor': 'middle',
        fill: ink.text,
        transform: `rotate(-90 ${fmt(x)} ${fmt(y)})`,
      });
    }),
  );
}

/**
 * Thick line along each labelled edge and its label outside the shape, set along the edge. Every label
 * reads the same way (left to right, or bottom to top on a vertical edge, like the y-axis title), so
 * "base" and "tip" are not turned against each other; the label sits 7 px outside its edge whichever way
 * its glyphs face. Returns the drawing and each label's screen box.
 */
function edgeMarks(layout: GridLayout, sx: Float64Array, sy: Float64Array, labels: EdgeLabels): { elements: string[]; boxes: LabelBox[] } {
  const out: string[] = [];
  const boxes: LabelBox[] = [];
  let cx = 0,
    cy = 0,
    count = 0;
  for (let k = 0; k < sx.length; k++) {
    if (Number.isFinite(sx[k]) && Number.isFinite(sy[k])) {
      cx += sx[k] as number;
      cy += sy[k] as number;
      count++;
    }
  }
  cx /= Math.max(1, count);
  cy /= Math.max(1, count);
  const size = fontSize.annotation;
  for (const edge of ['iMin', 'iMax', 'jMin', 'jMax'] as const) {
    const label = labels[edge];
    if (label === undefined) continue;
    const nodes = edgeNodes(layout, edge);
    const xs = nodes.map((k) => sx[k] as number);
    const ys = nodes.map((k) => sy[k] as number);
    out.push(el('path', { d: polylinePathData(xs, ys), fill: 'none', stroke: '#000000', 'stroke-width': stroke.edge, 'stroke-linecap': 'square' }));
    // The thick edge line itself is kept clear too (its bounding box: thin for the straight base and tip).
    const pad = stroke.edge;
    boxes.push({ x0: Math.min(...xs) - pad, x1: Math.max(...xs) + pad, y0: Math.min(...ys) - pad, y1: Math.max(...ys) + pad });
    const mid = Math.floor(nodes.length / 2);
    const ex = (xs[xs.length - 1] as number) - (xs[0] as number);
    const ey = (ys[ys.length - 1] as number) - (ys[0] as number);
    const len = Math.hypot(ex, ey) || 1;
    // Outward normal: the one pointing away from the shape's centroid.
    let nx = -ey / len,
      ny = ex / len;
    const px = xs[mid] as number,
      py = ys[mid] as number;
    if (nx * (px - cx) + ny * (py - cy) < 0) {
      nx = -nx;
      ny = -ny;
    }
    const angle = readableAngle((Math.atan2(ey, ex) * 180) / Math.PI);
    const rad = (angle * Math.PI) / 180;
    // The text's "up" on screen (SVG y points down) and its reading direction.
    const upX = Math.sin(rad),
      upY = -Math.cos(rad);
    const alongX = Math.cos(rad),
      alongY = Math.sin(rad);
    // Glyphs rise cap height above the baseline: facing out, the baseline is 7 px out; facing in, 7 px + cap height.
    const facingOut = upX * nx + upY * ny >= 0;
    const offset = facingOut ? 7 : 7 + capHeight(size);
    const lx = px + nx * offset,
      ly = py + ny * offset;
    const attrs = {
      x: lx,
      y: ly,
      'font-size': size,
      'font-weight': 'bold',
      'text-anchor': 'middle',
      transform: Math.abs(angle) < 1e-9 ? undefined : `rotate(${fmt(angle)} ${fmt(lx)} ${fmt(ly)})`,
    };
    out.push(textEl(label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
    out.push(textEl(label, { ...attrs, fill: ink.text }));
    // Screen box of the rotated text (bold runs about 10 % wider than the regular widths; 2 px of halo).
    const half = (1.1 * textWidth(label, size)) / 2 + 2;
    const corners = [-half, half].flatMap((a) =>
      [-capHeight(size) - 2, 0.25 * size + 2].map((u) => [lx + a * alongX - u * upX, ly + a * alongY - u * upY] as const),
    );
    boxes.push({
      x0: Math.min(...corners.map((c) => c[0])),
      x1: Math.max(...corners.map((c) => c[0])),
      y0: Math.min(...corners.map((c) => c[1])),
      y1: Math.max(...corners.map((c) => c[1])),
    });
  }
  return { elements: out, boxes };
}

/** An angle (degrees) turned by 180 if needed so text set along it reads left to right, or bottom to top when vertical. */
export function readableAngle(degrees: number): number {
  let a = ((degrees % 360) + 360) % 360; // [0, 360)
  if (a > 180) a -= 360; // (-180, 180]
  if (a > 90 + 1e-9) a -= 180;
  else if (a <= -90 - 1e-9) a += 180;
  // Vertical: bottom to top (-90), like the y-axis title.
  if (Math.abs(a - 90) < 1e-9) a = -90;
  return a;
}
