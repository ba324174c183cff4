/**
 * Maps over two parameters (e.g. thickness x convection coefficient): a scalar given at the points
 * of a regular axis grid (linear or log axes), shaded with a colour map (by default a diverging
 * one centred on zero, for signed quantities such as drift), contour lines at given levels with
 * labels (e.g. the ± tolerance), marked points, and a colour bar.
 *
 * Input: axis values x (nx, ascending) and y (ny, ascending), values[j * nx + i] at (x[i], y[j]);
 * NaN marks a point without a result (drawn as a grey background, no contour through it).
 * Shading between points is linear in the screen position (so on log axes, linear in log x),
 * consistent with the contour lines.
 */

import { el, svgDocument, textEl } from './svg.js';
import { defaultHeight, defaultWidth, fontSize, gap, ink } from './theme.js';
import { makeAxis, project, type Scale, type ScaleKind } from './scales.js';
import { drawAxes, xAxisMargin, yAxisMargin } from './axes.js';
import { drawHeader, type Rect } from './layout.js';
import { colourBarAxis, colourBarThickness, colourBarWidth, drawColourBar } from './colorbar.js';
import { getColormap, type ColormapName } from './colormaps.js';
import { contourLayer, fieldImage, type ContourLevel, type LabelBox } from './field-layer.js';
import { markerElement, type MarkerShape } from './markers.js';
import { capHeight, textWidth } from './text-metrics.js';

export interface MapLevel {
  value: number;
  label?: string;
  colour?: string;
  /** SVG dash array, e.g. "8 5"; solid when omitted. */
  dash?: string;
}

export interface MapPoint {
  x: number;
  y: number;
  label?: string;
  marker?: MarkerShape;
}

export interface MapChartSpec {
  title: string;
  subtitle?: string | readonly string[];
  xLabel: string;
  yLabel: string;
  /** Colour-bar title with unit, e.g. "Drift of tanh-Lc (%)". */
  valueLabel: string;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  values: ArrayLike<number>;
  xScale?: ScaleKind;
  yScale?: ScaleKind;
  /** Default 'rdbu' reversed (negative blue, positive red). */
  colormap?: ColormapName;
  reversed?: boolean;
  /**
   * Colour range. Diverging maps: symmetric [-limit, +limit] around zero, default the largest |value|.
   * Sequential maps: [min, max] of the values.
   */
  limit?: number;
  levels?: readonly MapLevel[];
  points?: readonly MapPoint[];
  /** Text shown under the plot when some points have no value, e.g. "grey: invalid case". */
  invalidNote?: string;
  width?: number;
  height?: number;
  /** Raster pixels per SVG px (the PNG's dpi / 96). Default 1. */
  rasterScale?: number;
}

export interface MapChartResult {
  svg: string;
  plot: Rect;
  x: Scale;
  y: Scale;
  /** Colour range used. */
  low: number;
  high: number;
  /** Where the colour bar is drawn (px). */
  colourBar: Rect;
}

function checkAxis(name: string, values: ArrayLike<number>, kind: ScaleKind): void {
  if (values.length < 2) throw new RangeError(`map chart: ${name} needs at least 2 values`);
  for (let k = 0; k < values.length; k++) {
    const v = values[k] as number;
    if (!Number.isFinite(v) || (kind === 'log' && v <= 0)) throw new RangeError(`map chart: ${name}[${k}] = ${v} is not valid on a ${kind} axis`);
    if (k > 0 && !(v > (values[k - 1] as number))) throw new RangeError(`map chart: ${name} must be strictly ascending (at index ${k})`);
  }
}

export function mapChart(spec: MapChartSpec): MapChartResult {
  const width = spec.width ?? defaultWidth;
  const height = spec.height ?? defaultHeight;
  const xKind = spec.xScale ?? 'linear';
  const yKind = spec.yScale ?? 'linear';
  checkAxis('x', spec.x, xKind);
  checkAxis('y', spec.y, yKind);
  const nx = spec.x.length;
  const ny = spec.y.length;
  if (spec.values.length !== nx * ny) throw new RangeError(`map chart: ${spec.values.length} values for a ${nx} x ${ny} grid`);

  const name = spec.colormap ?? 'rdbu';
  const map = getColormap(name, spec.reversed ?? name === 'rdbu');
  let maxAbs = 0,
    lo = Infinity,
    hi = -Infinity;
  for (let k = 0; k < spec.values.length; k++) {
    const v = spec.values[k] as number;
    if (!Number.isFinite(v)) continue;
    maxAbs = Math.max(maxAbs, Math.abs(v));
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  let low: number, high: number;
  if (map.kind === 'diverging') {
    const limit = spec.limit ?? (maxAbs > 0 ? maxAbs : 1);
    [low, high] = [-limit, limit];
  } else {
    [low, high] = lo < hi ? [lo, hi] : [lo - 0.5, lo + 0.5];
  }

  const header = drawHeader(spec.title, spec.subtitle, width);
  const top = header.bottom + 8;
  const noteSpace = spec.invalidNote ? fontSize.annotation + 10 : 0;
  const bottom = height - gap.outer - xAxisMargin(true, true) - noteSpace;
  const barProbe = colourBarAxis(low, high, top, bottom);
  const right = width - gap.outer - colourBarWidth(barProbe) - 24;
  const x0 = spec.x[0] as number,
    x1 = spec.x[nx - 1] as number;
  const y0 = spec.y[0] as number,
    y1 = spec.y[ny - 1] as number;
  const yProbe = makeAxis(yKind, y0, y1, bottom, top, 6, 'inside');
  const left = gap.outer + yAxisMargin(yProbe, true) + 6;
  const plot: Rect = { x: left, y: top, width: right - left, height: bottom - top };
  const xTarget = Math.max(3, Math.min(11, Math.round(plot.width / 100)));
  const yTarget = Math.max(3, Math.min(9, Math.round(plot.height / 70)));
  const xAxis = makeAxis(xKind, x0, x1, plot.x, plot.x + plot.width, xTarget, 'inside');
  const yAxis = makeAxis(yKind, y0, y1, plot.y + plot.height, plot.y, yTarget, 'inside');

  const layout = { ni: nx, nj: ny, offset: 0, strideI: 1, strideJ: nx };
  const sx = new Float64Array(nx * ny);
  const sy = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    const py = project(yAxis.scale, spec.y[j] as number);
    for (let i = 0; i < nx; i++) {
      sx[j * nx + i] = project(xAxis.scale, spec.x[i] as number);
      sy[j * nx + i] = py;
    }
  }

  const body: string[] = [...header.elements];
  body.push(el('defs', {}, el('clipPath', { id: 'map-clip' }, el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height }))));
  const levels: ContourLevel[] = (spec.levels ?? []).map((l) => ({
    value: l.value,
    ...(l.label !== undefined ? { label: l.label } : {}),
    ...(l.colour !== undefined ? { colour: l.colour } : {}),
    ...(l.dash !== undefined ? { dash: l.dash } : {}),
    width: 2,
  }));
  const pointMarks: string[] = [];
  const pointBoxes: LabelBox[] = [];
  for (const p of spec.points ?? []) {
    const px = project(xAxis.scale, p.x);
    const py = project(yAxis.scale, p.y);
    if (!Number.isFinite(px) || !Number.isFinite(py)) continue;
    pointMarks.push(markerElement(p.marker ?? 'circle', px, py, 14, '#000000', true));
    pointMarks.push(markerElement(p.marker ?? 'circle', px, py, 6, '#ffffff', true));
    pointBoxes.push({ x0: px - 9, y0: py - 9, x1: px + 9, y1: py + 9 });
    if (p.label) {
      const attrs = { x: px + 12, y: py - 10, 'font-size': fontSize.annotation, 'font-weight': 'bold' };
      pointMarks.push(textEl(p.label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
      pointMarks.push(textEl(p.label, { ...attrs, fill: ink.text }));
      // Bold text is about 1.1 times as wide as the regular widths tabulated.
      pointBoxes.push({ x0: px + 10, y0: py - 12 - fontSize.annotation, x1: px + 14 + 1.1 * textWidth(p.label, fontSize.annotation), y1: py - 6 });
    }
  }
  const layers: string[] = [
    el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height, fill: ink.invalid }),
    fieldImage(layout, sx, sy, spec.values, map, low, high, spec.rasterScale ?? 1),
    ...contourLayer(layout, sx, sy, spec.values, levels, plot, pointBoxes),
    ...pointMarks,
  ];
  body.push(el('g', { 'clip-path': 'url(#map-clip)' }, layers));
  body.push(...drawAxes(plot, xAxis, yAxis, { xLabel: spec.xLabel, yLabel: spec.yLabel, grid: false, xTickLabels: true }));
  if (spec.invalidNote) {
    body.push(
      textEl(spec.invalidNote, {
        x: plot.x,
        y: height - gap.outer - capHeight(fontSize.annotation) + fontSize.annotation,
        'font-size': fontSize.annotation,
        fill: ink.muted,
      }),
    );
  }
  const bar: Rect = { x: right + 24, y: plot.y, width: colourBarThickness, height: plot.height };
  body.push(
    drawColourBar(
      map,
      colourBarAxis(low, high, bar.y, bar.y + bar.height),
      bar,
      spec.valueLabel,
      levels.map((l) => l.value),
    ),
  );
  return { svg: svgDocument(width, height, body), plot, x: xAxis.scale, y: yAxis.scale, low, high, colourBar: bar };
}
