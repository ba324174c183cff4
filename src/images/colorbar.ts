/**
 * A vertical colour bar: the colour map as a stretched 1 x 256 PNG, ticks and labels on its
 * right, its title (with unit) rotated along its right side, and the contour levels drawn across it.
 */

import { el, fmt, textEl } from './svg.js';
import { fontSize, gap, ink, stroke } from './theme.js';
import { colormapRgb, type Colormap } from './colormaps.js';
import { createRgbaImage, rgbaToDataUri } from './raster.js';
import { makeAxis, project, type Axis } from './scales.js';
import { capHeight, textWidth } from './text-metrics.js';
import type { Rect } from './layout.js';

export const colourBarThickness = 24;

/** The bar's axis from `low` (bottom) to `high` (top) over the bar's pixel span. */
export function colourBarAxis(low: number, high: number, top: number, bottom: number): Axis {
  const target = Math.max(3, Math.min(9, Math.round((bottom - top) / 70)));
  return makeAxis('linear', low, high, bottom, top, target, 'inside');
}

/** Width (px) of bar + ticks + labels + title. */
export function colourBarWidth(axis: Axis): number {
  const widest = Math.max(0, ...axis.labels.map((l) => textWidth(l, fontSize.tick)));
  return colourBarThickness + gap.tickLength + gap.tickLabel + widest + gap.axisLabel + fontSize.axisLabel + 4;
}

/** 1 x 256 gradient image, top = high end. */
function gradientUri(map: Colormap): string {
  const n = 256;
  const image = createRgbaImage(1, n);
  for (let k = 0; k < n; k++) {
    const [r, g, b] = colormapRgb(map, 1 - k / (n - 1));
    image.data.set([r, g, b, 255], 4 * k);
  }
  return rgbaToDataUri(image);
}

export function drawColourBar(map: Colormap, axis: Axis, bar: Rect, title: string | readonly string[], levels: readonly number[]): string {
  const out: string[] = [];
  out.push(
    el('image', {
      x: bar.x,
      y: bar.y,
      width: bar.width,
      height: bar.height,
      preserveAspectRatio: 'none',
      'xlink:href': gradientUri(map),
    }),
  );
  const levelPath = levels
    .map((v) => project(axis.scale, v))
    .filter((y) => y >= bar.y && y <= bar.y + bar.height)
    .map((y) => `M${fmt(bar.x)} ${fmt(y)}h${fmt(bar.width)}`)
    .join('');
  if (levelPath) out.push(el('path', { d: levelPath, stroke: '#000000', 'stroke-width': stroke.contour, fill: 'none' }));
  out.push(el('rect', { x: bar.x, y: bar.y, width: bar.width, height: bar.height, fill: 'none', stroke: ink.frame, 'stroke-width': stroke.axis }));
  const right = bar.x + bar.width;
  const ticks: string[] = [];
  axis.ticks.forEach((v, k) => {
    const y = project(axis.scale, v);
    ticks.push(`M${fmt(right)} ${fmt(y)}h${gap.tickLength}`);
    out.push(
      textEl(axis.labels[k] ?? '', {
        x: right + gap.tickLength + gap.tickLabel,
        y: y + capHeight(fontSize.tick) / 2,
        'font-size': fontSize.tick,
        fill: ink.text,
      }),
    );
  });
  out.push(el('path', { d: ticks.join(''), stroke: ink.axis, 'stroke-width': stroke.axis, fill: 'none' }));
  const widest = Math.max(0, ...axis.labels.map((l) => textWidth(l, fontSize.tick)));
  // One or two lines (the caller fits them to the bar's height), turned clockwise: the first line outermost.
  const lines = typeof title === 'string' ? [title] : title;
  const ty = bar.y + bar.height / 2;
  lines.forEach((line, k) => {
    const tx =
      right + gap.tickLength + gap.tickLabel + widest + gap.axisLabel + capHeight(fontSize.axisLabel) + (lines.length - 1 - k) * (fontSize.axisLabel + 4);
    out.push(
      textEl(line, {
        x: tx,
        y: ty,
        'font-size': fontSize.axisLabel,
        'text-anchor': 'middle',
        fill: ink.text,
        transform: `rotate(90 ${fmt(tx)} ${fmt(ty)})`,
      }),
    );
  });
  return el('g', {}, out);
}
