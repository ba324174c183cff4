/**
 * Axes around a plot rectangle: frame, outward ticks, tick labels, light grid lines, axis titles.
 */

import { el, fmt, textEl } from './svg.js';
import { fontSize, gap, ink, stroke } from './theme.js';
import { project, type Axis } from './scales.js';
import { capHeight, textWidth } from './text-metrics.js';
import type { Rect } from './layout.js';

export interface AxesOptions {
  xLabel?: string;
  yLabel?: string;
  /** Draw grid lines at the major ticks. */
  grid: boolean;
  /** Print the x tick labels (off for the upper panels of a stack sharing one x axis). */
  xTickLabels: boolean;
}

/** Width (px) taken left of the plot by the y tick labels and the y axis title. */
export function yAxisMargin(axis: Axis, withTitle: boolean): number {
  const widest = Math.max(0, ...axis.labels.map((l) => textWidth(l, fontSize.tick)));
  return gap.tickLength + gap.tickLabel + widest + (withTitle ? gap.axisLabel + fontSize.axisLabel : 0);
}

/** Height (px) taken below the plot by the x tick labels and the x axis title. */
export function xAxisMargin(withTickLabels: boolean, withTitle: boolean): number {
  return gap.tickLength + (withTickLabels ? gap.tickLabel + fontSize.tick : 0) + (withTitle ? gap.axisLabel + fontSize.axisLabel : 0);
}

function tickPath(parts: string[]): string {
  return parts.join('');
}

/** Grid lines, to be drawn under the data. */
export function drawGrid(plot: Rect, xAxis: Axis, yAxis: Axis): string {
  const parts: string[] = [];
  for (const v of xAxis.ticks) {
    const x = project(xAxis.scale, v);
    if (x > plot.x + 0.5 && x < plot.x + plot.width - 0.5) parts.push(`M${fmt(x)} ${fmt(plot.y)}V${fmt(plot.y + plot.height)}`);
  }
  for (const v of yAxis.ticks) {
    const y = project(yAxis.scale, v);
    if (y > plot.y + 0.5 && y < plot.y + plot.height - 0.5) parts.push(`M${fmt(plot.x)} ${fmt(y)}H${fmt(plot.x + plot.width)}`);
  }
  if (parts.length === 0) return '';
  return el('path', { d: parts.join(''), stroke: ink.grid, 'stroke-width': stroke.grid, fill: 'none' });
}

/** Frame, ticks, tick labels and axis titles, drawn over the data. */
export function drawAxes(plot: Rect, xAxis: Axis, yAxis: Axis, options: AxesOptions): string[] {
  const out: string[] = [];
  const bottom = plot.y + plot.height;
  const ticks: string[] = [];
  const minor: string[] = [];
  const inX = (x: number): boolean => x >= plot.x - 0.5 && x <= plot.x + plot.width + 0.5;
  const inY = (y: number): boolean => y >= plot.y - 0.5 && y <= bottom + 0.5;

  xAxis.ticks.forEach((v, k) => {
    const x = project(xAxis.scale, v);
    if (!inX(x)) return;
    ticks.push(`M${fmt(x)} ${fmt(bottom)}v${gap.tickLength}`);
    if (options.xTickLabels) {
      out.push(
        textEl(xAxis.labels[k] ?? '', {
          x,
          y: bottom + gap.tickLength + gap.tickLabel + capHeight(fontSize.tick),
          'font-size': fontSize.tick,
          'text-anchor': 'middle',
          fill: ink.text,
        }),
      );
    }
  });
  for (const v of xAxis.minorTicks) {
    const x = project(xAxis.scale, v);
    if (inX(x)) minor.push(`M${fmt(x)} ${fmt(bottom)}v${gap.tickLength / 2}`);
  }
  yAxis.ticks.forEach((v, k) => {
    const y = project(yAxis.scale, v);
    if (!inY(y)) return;
    ticks.push(`M${fmt(plot.x)} ${fmt(y)}h${-gap.tickLength}`);
    out.push(
      textEl(yAxis.labels[k] ?? '', {
        x: plot.x - gap.tickLength - gap.tickLabel,
        y: y + capHeight(fontSize.tick) / 2,
        'font-size': fontSize.tick,
        'text-anchor': 'end',
        fill: ink.text,
      }),
    );
  });
  for (const v of yAxis.minorTicks) {
    const y = project(yAxis.scale, v);
    if (inY(y)) minor.push(`M${fmt(plot.x)} ${fmt(y)}h${-gap.tickLength / 2}`);
  }
  out.push(el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height, fill: 'none', stroke: ink.frame, 'stroke-width': stroke.axis }));
  out.push(el('path', { d: tickPath(ticks), stroke: ink.axis, 'stroke-width': stroke.axis, fill: 'none' }));
  if (minor.length > 0) out.push(el('path', { d: tickPath(minor), stroke: ink.axis, 'stroke-width': 1, fill: 'none' }));

  if (options.xLabel) {
    const y = bottom + xAxisMargin(options.xTickLabels, true) - 4;
    out.push(textEl(options.xLabel, { x: plot.x + plot.width / 2, y, 'font-size': fontSize.axisLabel, 'text-anchor': 'middle', fill: ink.text }));
  }
  if (options.yLabel) {
    const widest = Math.max(0, ...yAxis.labels.map((l) => textWidth(l, fontSize.tick)));
    const x = plot.x - gap.tickLength - gap.tickLabel - widest - gap.axisLabel - 4;
    const y = plot.y + plot.height / 2;
    out.push(
      textEl(options.yLabel, {
        x,
        y,
        'font-size': fontSize.axisLabel,
        'text-anchor': 'middle',
        fill: ink.text,
        transform: `rotate(-90 ${fmt(x)} ${fmt(y)})`,
      }),
    );
  }
  return out;
}
