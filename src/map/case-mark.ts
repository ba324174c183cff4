/**
 * The case's own point on a map: a black disc with a white centre and the label "this case", drawn the way the
 * map chart of src/images draws its marked points, so that it can be drawn again on top of overlays (iso-lines)
 * and on the overview chart.
 */
import { project, type MapPoint as ChartPoint, type Scale } from '../images/index.js';
import { markerElement, textEl, fontSize, ink } from '../images/index.js';
import type { MapRun } from './run-map.js';
import type { MapAxis } from './types.js';

/** The case's own point, when it lies on the map. */
export function casePointMark(run: MapRun): ChartPoint[] {
  const { x, y } = run.casePoint;
  const on = (v: number, axis: MapAxis): boolean =>
    Number.isFinite(v) && v >= (axis.values[0] as number) && v <= (axis.values[axis.values.length - 1] as number);
  return on(x, run.x) && on(y, run.y) ? [{ x, y, label: 'this case' }] : [];
}

/** SVG of the marks at their positions on the two scales. */
export function caseMarkSvg(points: readonly ChartPoint[], xScale: Scale, yScale: Scale): string {
  const parts: string[] = [];
  for (const p of points) {
    const cx = project(xScale, p.x);
    const cy = project(yScale, p.y);
    parts.push(markerElement('circle', cx, cy, 14, '#000000', true), markerElement('circle', cx, cy, 6, '#ffffff', true));
    if (!p.label) continue;
    const attrs = { x: cx + 12, y: cy - 10, 'font-size': fontSize.annotation, 'font-weight': 'bold' };
    parts.push(textEl(p.label, { ...attrs, fill: 'none', stroke: ink.halo, 'stroke-width': 3, 'stroke-linejoin': 'round' }));
    parts.push(textEl(p.label, { ...attrs, fill: ink.text }));
  }
  return parts.join('');
}
