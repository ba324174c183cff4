/**
 * The plate seen from above for charts: the finest grid's underside and top face temperatures sampled on a
 * regular raster (the value of the grid cell that holds each raster point: no interpolation, so a plotted
 * value is always one the model computed). The longer side gets RASTER points, the other in proportion.
 */
import type { SinkPlateView } from './sink-study-types.js';
import type { SinkGridResult } from './sink-solve.js';

const RASTER = 160;

export function sinkPlateView(result: SinkGridResult, ambient_degC: number): SinkPlateView {
  const { x, y, nx, ny } = result.grid;
  const width = x[nx] - x[0];
  const length = y[ny] - y[0];
  const scale = RASTER / Math.max(width, length);
  const vx = Math.max(2, Math.round(width * scale));
  const vy = Math.max(2, Math.round(length * scale));
  const xs = new Float64Array(vx);
  const ys = new Float64Array(vy);
  for (let i = 0; i < vx; i++) xs[i] = x[0] + ((i + 0.5) * width) / vx;
  for (let j = 0; j < vy; j++) ys[j] = y[0] + ((j + 0.5) * length) / vy;
  const cellOf = (edges: Float64Array, v: number) => {
    let lo = 0;
    let hi = edges.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (edges[mid] <= v) lo = mid;
      else hi = mid;
    }
    return lo;
  };
  const ix = Int32Array.from(xs, (v) => cellOf(x, v));
  const iy = Int32Array.from(ys, (v) => cellOf(y, v));
  const underside = new Float64Array(vx * vy);
  const top = new Float64Array(vx * vy);
  for (let j = 0; j < vy; j++) {
    for (let i = 0; i < vx; i++) {
      const c = ix[i] * ny + iy[j];
      underside[j * vx + i] = ambient_degC + result.undersideRise[c];
      top[j * vx + i] = ambient_degC + result.topRise[c];
    }
  }
  return { nx: vx, ny: vy, x: xs, y: ys, underside_degC: underside, top_degC: top };
}
