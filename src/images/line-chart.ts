/**
 * Line charts: one or more panels stacked on a shared x axis, each with its own y axis and any
 * number of series, a legend (series label + note such as the drift of a model), point
 * annotations (e.g. the tip temperature), a title and a subtitle for cautions and model notes.
 *
 * Series are plain arrays (x[k], y[k]); a non-finite value leaves a gap. The same label in two
 * panels is the same series: one legend row, one look. Series are styled by order of first
 * appearance: the first (the reference) solid black without markers, the others with an
 * Okabe-Ito colour, a dash pattern and a marker shape each (see series-styles.ts).
 */

import { el, polylinePathData, svgDocument, textEl } from './svg.js';
import { defaultHeight, defaultWidth, fontSize, gap, ink, stroke } from './theme.js';
import { extent, makeAxis, project, type Axis, type Scale, type ScaleKind } from './scales.js';
import { drawAxes, drawGrid, xAxisMargin, yAxisMargin } from './axes.js';
import { drawHeader, type Rect } from './layout.js';
import { chooseLegendPlace, drawLegend, legendColumnsFor, legendSize, type LegendEntry } from './legend.js';
import { markerElement, type MarkerShape } from './markers.js';
import { dashArray, defaultSeriesStyle, type LineStyle, type ResolvedStyle } from './series-styles.js';
import { pointAtLength, polylineLength } from './contour.js';
import { textWidth } from './text-metrics.js';

export interface LineSeries {
  label: string;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  style?: LineStyle;
  colour?: string;
  marker?: MarkerShape;
  /** Right-aligned legend note, e.g. "drift −3.1 %". */
  note?: string;
}

export interface PointAnnotation {
  x: number;
  y: number;
  /** Text beside the marker, e.g. "tip 53.9 °C". */
  label?: string;
  marker?: MarkerShape;
  colour?: string;
}

export interface LinePanel {
  /** Axis title with its unit, e.g. "Temperature (°C)". */
  yLabel: string;
  series: LineSeries[];
  points?: PointAnnotation[];
  yScale?: ScaleKind;
  /** Fixed y range; default: the data range widened to round ticks. */
  yDomain?: [number, number];
  /** Widen the y range to include 0 (for quantities whose size matters, like heat flow). */
  includeZero?: boolean;
}

export type LegendPlacement = 'auto' | 'inside' | 'below' | 'none';

export interface LineChartSpec {
  title: string;
  subtitle?: string | readonly string[];
  /** Axis title with its unit, e.g. "Distance from base x (mm)". */
  xLabel: string;
  xScale?: ScaleKind;
  xDomain?: [number, number];
  panels: LinePanel[];
  /** Canvas size in px (CSS px at 96 dpi). Default 1200 x 750. */
  width?: number;
  height?: number;
  /** Default 'auto': inside in a free corner, else below the plot. */
  legend?: LegendPlacement;
  /** Markers drawn along each marked series. Default 7. */
  markersPerSeries?: number;
}

export interface PanelGeometry {
  plot: Rect;
  x: Scale;
  y: Scale;
}

export interface ChartResult {
  svg: string;
  panels: PanelGeometry[];
}

const panelGap = 22;

interface StyledSeries {
  series: LineSeries;
  look: ResolvedStyle;
  index: number;
}

function resolveStyles(panels: readonly LinePanel[]): { byLabel: Map<string, { look: ResolvedStyle; index: number }>; entries: LegendEntry[] } {
  const byLabel = new Map<string, { look: ResolvedStyle; index: number }>();
  const entries: LegendEntry[] = [];
  for (const panel of panels) {
    for (const s of panel.series) {
      if (byLabel.has(s.label)) continue;
      const index = byLabel.size;
      const base = defaultSeriesStyle(index);
      const look: ResolvedStyle = {
        colour: s.colour ?? base.colour,
        style: s.style ?? base.style,
        marker: s.marker ?? base.marker,
        markerFilled: base.markerFilled,
      };
      byLabel.set(s.label, { look, index });
      entries.push({
        label: s.label,
        ...(s.note !== undefined ? { note: s.note } : {}),
        colour: look.colour,
        dash: dashArray(look.style),
        lineWidth: index === 0 ? stroke.reference : stroke.series,
        marker: look.marker,
        markerFilled: look.markerFilled,
        sample: 'line',
      });
    }
  }
  return { byLabel, entries };
}

function yAxisFor(panel: LinePanel, top: number, bottom: number): Axis {
  const kind = panel.yScale ?? 'linear';
  const arrays: ArrayLike<number>[] = panel.series.map((s) => s.y);
  if (panel.points) arrays.push(panel.points.map((p) => p.y));
  let range = panel.yDomain ?? extent(arrays, kind === 'log') ?? [kind === 'log' ? 1 : 0, kind === 'log' ? 10 : 1];
  if (panel.includeZero && kind === 'linear' && !panel.yDomain) range = [Math.min(0, range[0]), Math.max(0, range[1])];
  const target = Math.max(3, Math.min(9, Math.round((bottom - top) / 70)));
  return makeAxis(kind, range[0], range[1], bottom, top, target, panel.yDomain ? 'inside' : 'loose');
}

/** Screen points along a polyline every <= 8 px, for legend placement. */
function densify(xs: readonly number[], ys: readonly number[]): { x: number[]; y: number[] } {
  const x: number[] = [];
  const y: number[] = [];
  for (let k = 0; k < xs.length; k++) {
    const x1 = xs[k] as number,
      y1 = ys[k] as number;
    if (!Number.isFinite(x1) || !Number.isFinite(y1)) continue;
    if (k > 0 && Number.isFinite(xs[k - 1]) && Number.isFinite(ys[k - 1])) {
      const x0 = xs[k - 1] as number,
        y0 = ys[k - 1] as number;
      const steps = Math.min(500, Math.ceil(Math.hypot(x1 - x0, y1 - y0) / 8));
      for (let s = 1; s < steps; s++) {
        x.push(x0 + ((x1 - x0) * s) / steps);
        y.push(y0 + ((y1 - y0) * s) / steps);
      }
    }
    x.push(x1);
    y.push(y1);
  }
  return { x, y };
}

function seriesMarkers(sx: number[], sy: number[], look: ResolvedStyle, index: number, count: number): string[] {
  if (look.marker === 'none' || count <= 0) return [];
  const finiteX: number[] = [];
  const finiteY: number[] = [];
  sx.forEach((x, k) => {
    const y = sy[k] as number;
    if (Number.isFinite(x) && Number.isFinite(y)) {
      finiteX.push(x);
      finiteY.push(y);
    }
  });
  if (finiteX.length < 2) return finiteX.map((x, k) => markerElement(look.marker, x, finiteY[k] as number, 11, look.colour, look.markerFilled));
  const line = { x: new Float64Array(finiteX), y: new Float64Array(finiteY), closed: false };
  const length = polylineLength(line);
  // Stagger markers of different series so they do not sit on top of each other where lines coincide.
  const phase = (index * 0.37) % 1;
  const out: string[] = [];
  for (let k = 0; k < count; k++) {
    const [x, y] = pointAtLength(line, ((k + phase) / count) * length);
    out.push(markerElement(look.marker, x, y, 11, look.colour, look.markerFilled));
  }
  return out;
}

function drawAnnotations(points: readonly PointAnnotation[], panel: PanelGeometry): string[] {
  const out: string[] = [];
  const placed: { x: number; y: number; label: string; anchorX: number; anchorY: number }[] = [];
  for (const p of points) {
    const x = project(panel.x, p.x);
    const y = project(panel.y, p.y);
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    out.push(markerElement(p.marker ?? 'circle', x, y, 12, p.colour ?? ink.text, true));
    if (p.label) placed.push({ x: x - 10, y: y - 12, label: p.label, anchorX: x, anchorY: y });
  }
  // Labels sit up-left of their point; labels closer than one line apart are pushed apart vertically.
  placed.sort((a, b) => a.y - b.y);
  for (let k = 1; k < placed.length; k++) {
    const prev = placed[k - 1];
    const cur = placed[k];
    if (prev && cur && cur.y - prev.y < fontSize.annotation + 4) cur.y = prev.y + fontSize.annotation + 4;
  }
  for (const p of placed) {
    const width = textWidth(p.label, fontSize.annotation);
    const left = p.x - width >= panel.plot.x + 4;
    const attrs = {
      x: left ? p.x : p.anchorX + 10,
      y: p.y,
      'font-size': fontSize.annotation,
      'text-anchor': left ? 'end' : 'start',
    };
    out.push(textEl(p.label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
    out.push(textEl(p.label, { ...attrs, fill: ink.text }));
  }
  return out;
}

/** Builds the chart; returns the SVG and, per panel, its plot rectangle and scales (px). */
export function lineChart(spec: LineChartSpec): ChartResult {
  if (spec.panels.length === 0) throw new RangeError('lineChart: at least one panel is needed');
  const width = spec.width ?? defaultWidth;
  const height = spec.height ?? defaultHeight;
  const header = drawHeader(spec.title, spec.subtitle, width);
  const { byLabel, entries } = resolveStyles(spec.panels);
  const legendMode = spec.legend ?? 'auto';
  const legendBox = legendSize(entries);
  // Below the plot the legend spreads over as many columns as the canvas width allows.
  const belowColumns = legendColumnsFor(entries, width - 2 * gap.outer);
  const belowBox = legendSize(entries, belowColumns);
  const xKind = spec.xScale ?? 'linear';

  const layout = (legendBelow: boolean): { panels: PanelGeometry[]; axes: { x: Axis; y: Axis }[] } => {
    const bottomReserve = xAxisMargin(true, true) + (legendBelow ? belowBox.height + 14 : 0) + gap.outer;
    const top = header.bottom;
    const n = spec.panels.length;
    const panelHeight = (height - top - bottomReserve - (n - 1) * panelGap) / n;
    const yAxes = spec.panels.map((p, k) => {
      const t = top + k * (panelHeight + panelGap);
      return yAxisFor(p, t, t + panelHeight);
    });
    const left = gap.outer + Math.max(...yAxes.map((a) => yAxisMargin(a, true)));
    const right = width - gap.outer - 12;
    const xValues: ArrayLike<number>[] = spec.panels.flatMap((p) => [...p.series.map((s) => s.x), (p.points ?? []).map((q) => q.x)]);
    const xr = spec.xDomain ?? extent(xValues, xKind === 'log') ?? [xKind === 'log' ? 1 : 0, xKind === 'log' ? 10 : 1];
    const xTarget = Math.max(3, Math.min(11, Math.round((right - left) / 110)));
    const xAxis = makeAxis(xKind, xr[0], xr[1], left, right, xTarget, spec.xDomain ? 'inside' : 'loose');
    const panels = yAxes.map((yAxis, k) => ({
      plot: { x: left, y: top + k * (panelHeight + panelGap), width: right - left, height: panelHeight },
      x: xAxis.scale,
      y: yAxis.scale,
    }));
    return { panels, axes: yAxes.map((y) => ({ x: xAxis, y })) };
  };

  const screenSeries = (geometry: PanelGeometry, s: LineSeries): { sx: number[]; sy: number[] } => {
    const n = Math.min(s.x.length, s.y.length);
    const sx: number[] = [];
    const sy: number[] = [];
    for (let k = 0; k < n; k++) {
      const xv = s.x[k] as number;
      const yv = s.y[k] as number;
      const ok = Number.isFinite(xv) && Number.isFinite(yv) && (xKind !== 'log' || xv > 0) && (geometry.y.kind !== 'log' || yv > 0);
      sx.push(ok ? project(geometry.x, xv) : NaN);
      sy.push(ok ? project(geometry.y, yv) : NaN);
    }
    return { sx, sy };
  };

  // Legend: inside the first panel with a free corner; otherwise below the plot (auto) or in the best corner (inside).
  let legendAt: { x: number; y: number } | null = null;
  let legendBelow = legendMode === 'below';
  let geometry = layout(legendBelow);
  if (legendMode === 'auto' || legendMode === 'inside') {
    let fallback: { x: number; y: number; covered: number } | null = null;
    for (const [k, g] of geometry.panels.entries()) {
      const panel = spec.panels[k] as LinePanel;
      const pts = panel.series.map((s) => {
        const { sx, sy } = screenSeries(g, s);
        return densify(sx, sy);
      });
      // An annotation's label extends about 60 px left of and 12 px above its point.
      const annotated = (panel.points ?? []).map((p) => {
        const px = project(g.x, p.x);
        const py = project(g.y, p.y);
        return { x: [px, px - 30, px - 60], y: [py, py - 12, py - 12] };
      });
      const place = chooseLegendPlace(g.plot, legendBox, [...pts, ...annotated]);
      if (place.covered === 0) {
        legendAt = place;
        break;
      }
      if (!fallback || place.covered < fallback.covered) fallback = place;
    }
    if (!legendAt && legendMode === 'inside') legendAt = fallback;
    if (!legendAt) {
      legendBelow = true;
      geometry = layout(true);
    }
  }

  const body: string[] = [...header.elements];
  const defs: string[] = [];
  geometry.panels.forEach((g, k) => {
    const panel = spec.panels[k] as LinePanel;
    const axes = geometry.axes[k] as { x: Axis; y: Axis };
    const clipId = `plot-clip-${k}`;
    defs.push(el('clipPath', { id: clipId }, el('rect', { x: g.plot.x, y: g.plot.y, width: g.plot.width, height: g.plot.height })));
    body.push(drawGrid(g.plot, axes.x, axes.y));
    const lines: string[] = [];
    const marks: string[] = [];
    // Draw the reference last so it stays visible on top of shortcuts that coincide with it.
    const styled: StyledSeries[] = panel.series.map((s) => {
      const found = byLabel.get(s.label) as { look: ResolvedStyle; index: number };
      return { series: s, look: found.look, index: found.index };
    });
    styled.sort((a, b) => b.index - a.index);
    for (const { series, look, index } of styled) {
      const { sx, sy } = screenSeries(g, series);
      lines.push(
        el('path', {
          d: polylinePathData(sx, sy),
          fill: 'none',
          stroke: look.colour,
          'stroke-width': index === 0 ? stroke.reference : stroke.series,
          'stroke-dasharray': dashArray(look.style),
          'stroke-linecap': look.style === 'solid' ? 'butt' : 'round',
          'stroke-linejoin': 'round',
        }),
      );
      marks.push(...seriesMarkers(sx, sy, look, index, spec.markersPerSeries ?? 7));
    }
    body.push(el('g', { 'clip-path': `url(#${clipId})` }, [...lines, ...marks]));
    body.push(...drawAnnotations(panel.points ?? [], g));
    const last = k === geometry.panels.length - 1;
    body.push(...drawAxes(g.plot, axes.x, axes.y, { yLabel: panel.yLabel, ...(last ? { xLabel: spec.xLabel } : {}), grid: true, xTickLabels: last }));
  });

  if (legendMode !== 'none' && entries.length > 0) {
    if (legendAt) body.push(drawLegend(entries, legendAt.x, legendAt.y));
    else if (legendBelow) {
      const lastPlot = (geometry.panels[geometry.panels.length - 1] as PanelGeometry).plot;
      const y = lastPlot.y + lastPlot.height + xAxisMargin(true, true) + 10;
      const x = Math.max(gap.outer, Math.min(lastPlot.x + (lastPlot.width - belowBox.width) / 2, width - gap.outer - belowBox.width));
      body.push(drawLegend(entries, x, y, belowColumns));
    }
  }
  const svg = svgDocument(width, height, [el('defs', {}, defs), ...body]);
  return { svg, panels: geometry.panels };
}
