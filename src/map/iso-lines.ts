/**
 * Iso-lines of the Biot number and of mL drawn over a map, where they help: only when the quantity changes across
 * the map (by more than 10 %) and only at round values inside its range (at most four per quantity). They tie the
 * user's axes to the two numbers of the textbook's charts: the 1-D error grows with Bi (references §4c), the
 * shortcuts' tip and length errors with mL.
 *
 * The lines are found by marching squares (src/images contourLines) on the grid in screen px, drawn thin, grey and
 * dashed under a label "Bi = 0.1", and clipped to the plot. Input fields are given at the grid points
 * (index = j * nx + i), NaN where a point has no result.
 */
import { contourLines, placeLineLabel, project, type Scale } from '../images/index.js';
import { type Rect, el, fmt, polylinePathData, textEl, textWidth } from '../images/index.js';

export interface IsoField {
  /** Label prefix, e.g. "Bi" or "mL". */
  name: string;
  values: ArrayLike<number>;
  /** Round values the lines may be drawn at. */
  candidates: readonly number[];
  dash: string;
}

export const biotCandidates: readonly number[] = [1e-4, 2e-4, 5e-4, 1e-3, 2e-3, 5e-3, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5];
export const mLCandidates: readonly number[] = [0.1, 0.2, 0.5, 1, 1.5, 2, 3, 4, 5, 10];

/** The candidates inside the field's range, at most `most`, spread over it; none when the field hardly changes. */
export function isoLevels(values: ArrayLike<number>, candidates: readonly number[], most = 4): number[] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = 0; k < values.length; k++) {
    const v = values[k] as number;
    if (!Number.isFinite(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (!(lo > 0) || !(hi > 1.1 * lo)) return [];
  const inside = candidates.filter((c) => c > lo && c < hi);
  if (inside.length <= most) return inside;
  const picked: number[] = [];
  for (let k = 0; k < most; k++) picked.push(inside[Math.round((k * (inside.length - 1)) / (most - 1))] as number);
  return [...new Set(picked)];
}

function levelText(name: string, level: number): string {
  return `${name} = ${Number(level.toPrecision(3))}`;
}

/** SVG for the iso-lines of `fields` over a plot whose axes are `xScale` and `yScale`. */
export function isoLinesSvg(
  plot: Rect,
  xScale: Scale,
  yScale: Scale,
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  fields: readonly IsoField[],
  clipId = 'iso-clip',
): string {
  const nx = xs.length;
  const ny = ys.length;
  const layout = { ni: nx, nj: ny, offset: 0, strideI: 1, strideJ: nx };
  const sx = new Float64Array(nx * ny);
  const sy = new Float64Array(nx * ny);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      sx[j * nx + i] = project(xScale, xs[i] as number);
      sy[j * nx + i] = project(yScale, ys[j] as number);
    }
  }
  const size = 13;
  const parts: string[] = [];
  for (const field of fields) {
    const levels = isoLevels(field.values, field.candidates);
    levels.forEach((level, n) => {
      const lines = contourLines(layout, sx, sy, field.values, level);
      const d = lines.map((p) => polylinePathData(p.x, p.y, p.closed)).join('');
      if (d === '') return;
      parts.push(el('path', { d, fill: 'none', stroke: '#4d4d4d', 'stroke-width': 1.1, 'stroke-dasharray': field.dash }));
      const text = levelText(field.name, level);
      const longest = [...lines].sort((a, b) => b.x.length - a.x.length)[0];
      const anchor = longest ? placeLineLabel(longest, textWidth(text, size) + 4, 0.8 - 0.15 * n) : null;
      if (!anchor) return;
      const attrs = {
        x: anchor.x,
        y: anchor.y - 4,
        'font-size': size,
        'text-anchor': 'middle',
        transform: anchor.angle === 0 ? undefined : `rotate(${fmt(anchor.angle)} ${fmt(anchor.x)} ${fmt(anchor.y)})`,
      };
      parts.push(textEl(text, { ...attrs, fill: 'none', stroke: '#ffffff', 'stroke-width': 3, 'stroke-linejoin': 'round' }));
      parts.push(textEl(text, { ...attrs, fill: '#333333' }));
    });
  }
  if (parts.length === 0) return '';
  const clip = el('clipPath', { id: clipId }, el('rect', { x: plot.x, y: plot.y, width: plot.width, height: plot.height }));
  return el('defs', {}, clip) + el('g', { 'clip-path': `url(#${clipId})` }, parts);
}

/** Inserts SVG elements just before the closing tag of a whole SVG document (drawn on top of everything). */
export function appendToSvg(svg: string, elements: string): string {
  if (elements === '') return svg;
  const end = svg.lastIndexOf('</svg>');
  if (end < 0) throw new Error('appendToSvg: not an SVG document');
  return `${svg.slice(0, end)}${elements}${svg.slice(end)}`;
}
