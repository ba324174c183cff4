/**
 * Temperature up each fin of a sink, from the finest grid's solution (for the chart of the hottest and the
 * coolest fin against the shortcut's 1-D fin):
 *   T_f(0)   = ambient + the fin's mean root (junction) rise, the area mean over its footprint (sink-solve.ts);
 *   T_f(c_l) = ambient + the mean over the fin's section of its layer-l unknowns at the layer centre c_l,
 *              weighted by each unknown's share of the section: a sheet row by dy_j, a 3-D fin cell by dx_i dy_j,
 *              a pin's single node by 1.
 * The node layout is the assembly's (fin-sheet-assembly.ts, fin-cell-assembly.ts): fins after the plate's
 * nx ny nz cells, in order; a plate fin as a sheet row by row (ns layers a row), a pin one column of ns layers,
 * a plate fin as cells ((i − i0) ny + j) ns + l. Heights in m from the plate top; values are model values (no
 * extrapolation to the tip).
 */
import type { FinRepresentation } from './sink-system.js';
import type { SinkGridResult } from './sink-solve.js';
import type { SinkFinProfiles } from './sink-study-types.js';

export function sinkFinProfiles(
  result: SinkGridResult,
  finKind: 'plates' | 'pins' | 'bare',
  representation: FinRepresentation,
  ambient_degC: number,
): SinkFinProfiles | null {
  const { grid, theta } = result;
  const { nx, ny, nz, ns, x, y, s } = grid;
  if (finKind === 'bare' || ns === 0 || grid.fins.length === 0) return null;
  const height_m = new Float64Array(ns + 1);
  for (let l = 0; l < ns; l++) height_m[l + 1] = 0.5 * (s[l] + s[l + 1]);
  const cells = representation === 'cells' && finKind === 'plates';
  let next = nx * ny * nz;
  const temperature_degC = grid.fins.map((b, f) => {
    const T = new Float64Array(ns + 1);
    T[0] = ambient_degC + result.finRootRise[f];
    const sum = new Float64Array(ns);
    let weight = 0;
    const add = (first: number, w: number) => {
      for (let l = 0; l < ns; l++) sum[l] += w * theta[first + l];
      weight += w;
    };
    if (finKind === 'pins') {
      add(next, 1);
      next += ns;
    } else if (cells) {
      for (let i = b.i0; i < b.i1; i++) for (let j = b.j0; j < b.j1; j++) add(next + ((i - b.i0) * ny + j) * ns, (x[i + 1] - x[i]) * (y[j + 1] - y[j]));
      next += (b.i1 - b.i0) * (b.j1 - b.j0) * ns;
    } else {
      for (let j = b.j0; j < b.j1; j++) add(next + (j - b.j0) * ns, y[j + 1] - y[j]);
      next += (b.j1 - b.j0) * ns;
    }
    for (let l = 0; l < ns; l++) T[l + 1] = ambient_degC + sum[l] / weight;
    return T;
  });
  return { height_m, temperature_degC };
}
