/**
 * The drawing of a scalar field given at the nodes of a structured grid whose node positions are
 * already in SVG px: the colour raster (field-raster.ts, embedded as a PNG), the iso-lines at
 * given levels (contour.ts) and their labels, placed along the lines without overlapping.
 */

import { el, fmt, polylinePathData, textEl } from './svg.js';
import { fontSize, ink, stroke } from './theme.js';
import { rasterizeStructuredField, type GridLayout } from './field-raster.js';
import { rgbaToDataUri } from './raster.js';
import { contourLines, placeLineLabel } from './contour.js';
import { colormapLut, type Colormap } from './colormaps.js';
import { textWidth } from './text-metrics.js';
import type { Rect } from './layout.js';

export interface ContourLevel {
  value: number;
  /** Text of the label on the line; no label when undefined. */
  label?: string;
  colour?: string;
  /** SVG dash array, e.g. "8 5". */
  dash?: string;
  width?: number;
}

/** An <image> with the field's colours over the bounding box of the grid. `pixelScale` = raster px per SVG px. */
export function fieldImage(
  layout: GridLayout,
  sx: Float64Array,
  sy: Float64Array,
  values: ArrayLike<number>,
  map: Colormap,
  low: number,
  high: number,
  pixelScale: number,
): string {
  let x0 = Infinity,
    x1 = -Infinity,
    y0 = Infinity,
    y1 = -Infinity;
  for (let k = 0; k < sx.length; k++) {
    const x = sx[k] as number,
      y = sy[k] as number;
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    x0 = Math.min(x0, x);
    x1 = Math.max(x1, x);
    y0 = Math.min(y0, y);
    y1 = Math.max(y1, y);
  }
  if (!(x1 > x0) || !(y1 > y0)) return '';
  const left = Math.floor(x0),
    top = Math.floor(y0);
  const w = Math.max(1, Math.ceil((Math.ceil(x1) - left) * pixelScale));
  const h = Math.max(1, Math.ceil((Math.ceil(y1) - top) * pixelScale));
  const px = new Float64Array(sx.length);
  const py = new Float64Array(sy.length);
  for (let k = 0; k < sx.length; k++) {
    px[k] = ((sx[k] as number) - left) * pixelScale;
    py[k] = ((sy[k] as number) - top) * pixelScale;
  }
  const image = rasterizeStructuredField(layout, px, py, values, w, h, { lut: colormapLut(map), low, high });
  return el('image', { x: left, y: top, width: w / pixelScale, height: h / pixelScale, preserveAspectRatio: 'none', 'xlink:href': rgbaToDataUri(image) });
}

/** A screen rectangle already taken by a label. */
export interface LabelBox {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

const overlaps = (a: LabelBox, b: LabelBox): boolean => a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;

/**
 * Iso-lines and their labels: labels kept inside `plot`, never on top of each other or of the
 * `avoid` boxes, and the lines are cut where a label sits (an SVG mask with id `maskId`).
 */
export function contourLayer(
  layout: GridLayout,
  sx: Float64Array,
  sy: Float64Array,
  values: ArrayLike<number>,
  levels: readonly ContourLevel[],
  plot: Rect,
  avoid: readonly LabelBox[] = [],
  maskId = 'contour-label-gaps',
): string[] {
  const lines: string[] = [];
  const labels: string[] = [];
  const gaps: string[] = [];
  const taken: LabelBox[] = [...avoid];
  const size = fontSize.annotation;
  levels.forEach((level, index) => {
    const polylines = contourLines(layout, sx, sy, values, level.value);
    const d = polylines.map((p) => polylinePathData(p.x, p.y, p.closed)).join('');
    if (d === '') return;
    lines.push(
      el('path', {
        d,
        fill: 'none',
        stroke: level.colour ?? '#000000',
        'stroke-width': level.width ?? stroke.contour,
        'stroke-dasharray': level.dash,
        'stroke-linejoin': 'round',
      }),
    );
    if (level.label === undefined) return;
    const labelWidth = textWidth(level.label, size) + 6;
    // Longest pieces first, at most two labels per level; try positions along the line, staggered by level.
    const pieces = [...polylines].sort((a, b) => b.x.length - a.x.length).slice(0, 2);
    const fractions = [0.5, 0.3, 0.7, 0.15, 0.85].map((f) => ((f + index * 0.11) % 0.8) + 0.1);
    for (const piece of pieces) {
      for (const f of fractions) {
        const anchor = placeLineLabel(piece, labelWidth, f);
        if (!anchor) break;
        // Near-vertical lines get horizontal labels (easier to read); others follow the line.
        const angle = Math.abs(anchor.angle) > 50 ? 0 : anchor.angle;
        const halfW = angle === 0 ? labelWidth / 2 : (labelWidth / 2) * Math.abs(Math.cos((angle * Math.PI) / 180)) + size / 2;
        const halfH = angle === 0 ? size * 0.6 : (labelWidth / 2) * Math.abs(Math.sin((angle * Math.PI) / 180)) + size * 0.6;
        const box = { x0: anchor.x - halfW, y0: anchor.y - halfH, x1: anchor.x + halfW, y1: anchor.y + halfH };
        const inside = box.x0 >= plot.x && box.x1 <= plot.x + plot.width && box.y0 >= plot.y && box.y1 <= plot.y + plot.height;
        if (!inside || taken.some((b) => overlaps(b, box))) continue;
        taken.push(box);
        const attrs = {
          x: anchor.x,
          y: anchor.y + size * 0.36,
          'font-size': size,
          'text-anchor': 'middle',
          transform: angle === 0 ? undefined : `rotate(${fmt(angle)} ${fmt(anchor.x)} ${fmt(anchor.y)})`,
        };
        gaps.push(
          el('rect', {
            x: anchor.x - labelWidth / 2,
            y: anchor.y - size * 0.55,
            width: labelWidth,
            height: size * 1.1,
            fill: '#000000',
            transform: attrs.transform,
          }),
        );
        labels.push(textEl(level.label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
        labels.push(textEl(level.label, { ...attrs, fill: ink.text }));
        break;
      }
    }
  });
  if (gaps.length === 0) return [...lines, ...labels];
  const mask = el('mask', { id: maskId, maskUnits: 'userSpaceOnUse', x: plot.x, y: plot.y, width: plot.width, height: plot.height }, [
    el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height, fill: '#ffffff' }),
    ...gaps,
  ]);
  return [el('defs', {}, mask), el('g', { mask: `url(#${maskId})` }, lines), ...labels];
}
