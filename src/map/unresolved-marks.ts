/**
 * Points of a map whose reference is not resolved (its discretisation error above a tenth of the tolerance, so
 * the check gives no verdict there): a small cross at each, drawn over the drift colours and the ok regions, and
 * a note that says what the crosses mean. A drift drawn without the cross would read as a verdict.
 */
import { el, markerPathData, project, type MapPoint as ChartPoint, type Scale } from '../images/index.js';
import type { MapRun } from './run-map.js';
import { isPointError } from './types.js';

/** The solved points whose reference is not resolved, at their axis values. */
export function unresolvedPoints(run: MapRun): ChartPoint[] {
  const points: ChartPoint[] = [];
  for (const p of run.points) if (!isPointError(p) && !p.reference.resolved) points.push({ x: p.x, y: p.y });
  return points;
}

/** The crosses: dark on a white halo, so they read on the darkest and the palest colours of the map. */
export function unresolvedMarksSvg(points: readonly ChartPoint[], xScale: Scale, yScale: Scale): string {
  const parts: string[] = [];
  for (const p of points) {
    const cx = project(xScale, p.x);
    const cy = project(yScale, p.y);
    const d = markerPathData('cross', cx, cy, 12);
    parts.push(
      el('path', { d, fill: 'none', stroke: '#ffffff', 'stroke-width': 4.5 }),
      el('path', { d, fill: 'none', stroke: '#222222', 'stroke-width': 2.2 }),
    );
  }
  return parts.join('');
}

/** The note under a chart, or '' when every point is resolved. */
export function unresolvedNote(count: number): string {
  return count === 0 ? '' : `×: ${count} ${count === 1 ? 'point' : 'points'} where the reference is not resolved (no verdict there)`;
}
