/**
 * The legend: one row per series, a line sample (with its dash pattern and marker), the label,
 * and a right-aligned note column (e.g. the drift of that model). Placement: inside the plot in
 * the corner where it covers the fewest data points, or outside when no corner is free.
 */

import { el, fmt, textEl } from './svg.js';
import { fontSize, gap, ink } from './theme.js';
import { capHeight, textWidth } from './text-metrics.js';
import { markerElement, type MarkerShape } from './markers.js';
import type { Rect } from './layout.js';

export interface LegendEntry {
  label: string;
  note?: string;
  colour: string;
  dash?: string;
  lineWidth: number;
  marker: MarkerShape;
  markerFilled: boolean;
  /** 'line' draws a line sample; 'marker' only the marker (annotated points). */
  sample: 'line' | 'marker';
}

const sampleWidth = 46;
const noteGap = 18;

/** Width of one legend entry (sample + label + note columns), the same for every entry. */
function entryWidth(entries: readonly LegendEntry[]): number {
  const labelWidth = Math.max(0, ...entries.map((e) => textWidth(e.label, fontSize.legend)));
  const noteWidth = Math.max(0, ...entries.map((e) => (e.note ? textWidth(e.note, fontSize.legend) : 0)));
  return sampleWidth + 10 + labelWidth + (noteWidth > 0 ? noteGap + noteWidth : 0);
}

const columnGap = 28;

/** Size of the legend box laid out in `columns` columns (entries fill rows left to right). */
export function legendSize(entries: readonly LegendEntry[], columns = 1): { width: number; height: number } {
  const cols = Math.max(1, Math.min(columns, entries.length));
  const rows = Math.ceil(entries.length / cols);
  const width = 2 * gap.legendPad + cols * entryWidth(entries) + (cols - 1) * columnGap;
  const height = 2 * gap.legendPad + rows * fontSize.legend + (rows - 1) * gap.legendRow;
  return { width, height };
}

/** Most columns whose legend fits in `maxWidth` px (at least 1). */
export function legendColumnsFor(entries: readonly LegendEntry[], maxWidth: number): number {
  let columns = 1;
  while (columns < entries.length && legendSize(entries, columns + 1).width <= maxWidth) columns++;
  return columns;
}

/** Draws the legend box with its top-left corner at (x, y). */
export function drawLegend(entries: readonly LegendEntry[], x: number, y: number, columns = 1): string {
  const cols = Math.max(1, Math.min(columns, entries.length));
  const { width, height } = legendSize(entries, cols);
  const cellWidth = entryWidth(entries);
  const out: string[] = [el('rect', { x, y, width, height, fill: '#ffffff', 'fill-opacity': 0.92, stroke: '#999999', 'stroke-width': 1, rx: 3 })];
  entries.forEach((e, k) => {
    const row = Math.floor(k / cols);
    const col = k % cols;
    const rowTop = y + gap.legendPad + row * (fontSize.legend + gap.legendRow);
    const mid = rowTop + fontSize.legend / 2;
    const sx = x + gap.legendPad + col * (cellWidth + columnGap);
    if (e.sample === 'line') {
      out.push(
        el('path', {
          d: `M${fmt(sx)} ${fmt(mid)}h${sampleWidth}`,
          stroke: e.colour,
          'stroke-width': e.lineWidth,
          'stroke-dasharray': e.dash,
          'stroke-linecap': e.dash === undefined ? 'butt' : 'round',
          fill: 'none',
        }),
      );
    }
    out.push(markerElement(e.marker, sx + sampleWidth / 2, mid, 11, e.colour, e.markerFilled));
    const baseline = mid + capHeight(fontSize.legend) / 2;
    out.push(textEl(e.label, { x: sx + sampleWidth + 10, y: baseline, 'font-size': fontSize.legend, fill: ink.text }));
    if (e.note) {
      out.push(textEl(e.note, { x: sx + cellWidth, y: baseline, 'font-size': fontSize.legend, 'text-anchor': 'end', fill: ink.text }));
    }
  });
  return el('g', {}, out);
}

/**
 * Top-left corner of the legend inside `plot`, at the candidate place covering the fewest of the
 * given screen points (ties: top-right, top-left, bottom-right, bottom-left, then mid-height),
 * with the number of points covered.
 */
export function chooseLegendPlace(
  plot: Rect,
  size: { width: number; height: number },
  points: { x: ArrayLike<number>; y: ArrayLike<number> }[],
): { x: number; y: number; covered: number } {
  const m = 10;
  const left = plot.x + m;
  const right = plot.x + plot.width - m - size.width;
  const top = plot.y + m;
  const bottom = plot.y + plot.height - m - size.height;
  const middle = plot.y + (plot.height - size.height) / 2;
  const candidates: [number, number][] = [
    [right, top],
    [left, top],
    [right, bottom],
    [left, bottom],
    [right, middle],
    [left, middle],
  ];
  let best = { x: right, y: top, covered: Infinity };
  for (const [cx, cy] of candidates) {
    let covered = 0;
    // Points within 6 px of the box count as covered: a line that close would touch the frame.
    const x0 = cx - 6,
      x1 = cx + size.width + 6,
      y0 = cy - 6,
      y1 = cy + size.height + 6;
    for (const p of points) {
      for (let k = 0; k < p.x.length; k++) {
        const px = p.x[k] as number;
        const py = p.y[k] as number;
        if (px >= x0 && px <= x1 && py >= y0 && py <= y1) covered++;
      }
    }
    if (covered < best.covered) best = { x: cx, y: cy, covered };
  }
  return best;
}
