/**
 * Bar chart: one bar per category (e.g. heat per fin, fins numbered), a value axis from 0, optional horizontal
 * reference lines (e.g. a shortcut's value for every bar) with a label each, a title and a subtitle.
 * Categories are labelled under their bars; when there are more than fit, every k-th label is printed (the
 * first and the last always).
 */

import { el, fmt, svgDocument, textEl } from './svg.js';
import { defaultHeight, defaultWidth, fontSize, gap, ink, stroke } from './theme.js';
import { makeAxis, project, type Axis, type Scale } from './scales.js';
import { drawAxes, drawGrid, xAxisMargin, yAxisMargin } from './axes.js';
import { drawHeader, type Rect } from './layout.js';
import { dashArray, okabeItoColours } from './series-styles.js';
import { capHeight, textWidth } from './text-metrics.js';

export interface BarReferenceLine {
  value: number;
  label: string;
}

export interface BarChartSpec {
  title: string;
  subtitle?: string | readonly string[];
  xLabel: string;
  yLabel: string;
  /** One label per bar, in order. */
  categories: readonly string[];
  values: ArrayLike<number>;
  /** Bars to draw in the highlight colour (e.g. the hottest and the coolest fin). */
  highlight?: readonly number[];
  lines?: readonly BarReferenceLine[];
  width?: number;
  height?: number;
}

export interface BarChartResult {
  svg: string;
  plot: Rect;
  y: Scale;
  /** Screen rectangle of each bar, in the order of the categories. */
  bars: Rect[];
  /** The categories whose labels were printed. */
  labelled: number[];
}

const BAR_FILL = '#56B4E9';
const HIGHLIGHT_FILL = '#E69F00';

export function barChart(spec: BarChartSpec): BarChartResult {
  const n = spec.categories.length;
  if (n === 0 || spec.values.length !== n)
    throw new RangeError(`barChart: ${n} categories and ${spec.values.length} values; need the same number, at least 1`);
  const width = spec.width ?? defaultWidth;
  const height = spec.height ?? defaultHeight;
  const header = drawHeader(spec.title, spec.subtitle, width);
  const values = Array.from({ length: n }, (_, k) => spec.values[k] as number);
  const lineValues = (spec.lines ?? []).map((l) => l.value);
  const finite = [...values, ...lineValues].filter(Number.isFinite);
  const high = Math.max(0, ...finite);
  const low = Math.min(0, ...finite);
  const top = header.bottom + 6;
  const bottom = height - gap.outer - xAxisMargin(true, true);
  const yAxis: Axis = makeAxis('linear', low, high > low ? high : low + 1, bottom, top, Math.max(3, Math.round((bottom - top) / 70)), 'loose');
  const left = gap.outer + yAxisMargin(yAxis, true);
  const right = width - gap.outer;
  const plot: Rect = { x: left, y: top, width: right - left, height: bottom - top };
  const slot = plot.width / n;
  const barWidth = Math.max(1, 0.7 * slot);
  const zero = project(yAxis.scale, 0);
  const highlighted = new Set(spec.highlight ?? []);
  const bars: Rect[] = values.map((v, k) => {
    const y = Number.isFinite(v) ? project(yAxis.scale, v) : zero;
    return { x: plot.x + (k + 0.5) * slot - barWidth / 2, y: Math.min(y, zero), width: barWidth, height: Math.abs(zero - y) };
  });

  // Labels under the bars: every k-th so that they do not touch, always the first and the last.
  const widest = Math.max(...spec.categories.map((c) => textWidth(c, fontSize.tick)));
  const every = Math.max(1, Math.ceil((widest + 8) / slot));
  const labelled = spec.categories.map((_, k) => k).filter((k) => k % every === 0 || k === n - 1);
  if (labelled.length >= 2 && (labelled[labelled.length - 1] as number) - (labelled[labelled.length - 2] as number) < every)
    labelled.splice(labelled.length - 2, 1);

  const body: string[] = [...header.elements];
  const xAxis: Axis = { scale: { kind: 'linear', domain: [0, n], range: [plot.x, plot.x + plot.width] }, ticks: [], labels: [], minorTicks: [] };
  body.push(drawGrid(plot, xAxis, yAxis));
  body.push(
    el(
      'g',
      { class: 'bars' },
      bars.map((b, k) =>
        el('rect', {
          x: b.x,
          y: b.y,
          width: b.width,
          height: b.height,
          fill: highlighted.has(k) ? HIGHLIGHT_FILL : BAR_FILL,
          stroke: ink.frame,
          'stroke-width': 1,
        }),
      ),
    ),
  );
  const tickY = plot.y + plot.height + gap.tickLength + gap.tickLabel + capHeight(fontSize.tick);
  for (const k of labelled) {
    const x = plot.x + (k + 0.5) * slot;
    body.push(el('path', { d: `M${fmt(x)} ${fmt(plot.y + plot.height)}v${gap.tickLength}`, stroke: ink.axis, 'stroke-width': stroke.axis }));
    body.push(textEl(spec.categories[k] ?? '', { x, y: tickY, 'font-size': fontSize.tick, 'text-anchor': 'middle', fill: ink.text }));
  }
  (spec.lines ?? []).forEach((line, k) => {
    if (!Number.isFinite(line.value)) return;
    const y = project(yAxis.scale, line.value);
    const colour = okabeItoColours[(k + 2) % okabeItoColours.length] ?? ink.text;
    body.push(
      el('path', {
        d: `M${fmt(plot.x)} ${fmt(y)}H${fmt(plot.x + plot.width)}`,
        stroke: colour,
        'stroke-width': stroke.series,
        'stroke-dasharray': dashArray('dashed'),
        fill: 'none',
      }),
    );
    body.push(
      textEl(line.label, {
        x: plot.x + plot.width - 8,
        y: y - 8,
        'font-size': fontSize.annotation,
        'text-anchor': 'end',
        fill: colour,
        stroke: ink.halo,
        'stroke-width': 4,
        'paint-order': 'stroke',
      }),
    );
  });
  body.push(...drawAxes(plot, { ...xAxis, ticks: [] }, yAxis, { xLabel: spec.xLabel, yLabel: spec.yLabel, grid: false, xTickLabels: true }));
  return { svg: svgDocument(width, height, body), plot, y: yAxis.scale, bars, labelled };
}
