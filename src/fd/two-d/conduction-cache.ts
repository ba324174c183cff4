/**
 * The conduction operator of a grid, kept while the grid is: K depends only on the nodes (and the section kind they
 * carry) and on k (assemble.ts), not on h, the base or the tip, and the 2-D grids are cached by section
 * (src/mesh/grid2d.ts), so the fins of a map column that differ only in h, and a study's repeated solves, meet the
 * same grid and k again. Keyed by the grid's node array (the cache hands out the same one), one k per grid; a
 * WeakMap, so an operator goes when its grid does. Safe because nothing writes into K (buildSystem2D copies it).
 * Units: W/K per unit depth, as assembleConduction2D.
 */
import type { Grid2D } from '../../mesh/index.js';
import type { Stencil9 } from '../linear-algebra/stencil9.js';
import { assembleConduction2D } from './assemble.js';

const operators = new WeakMap<Float64Array, { readonly k: number; readonly y: Float64Array; readonly K: Stencil9 }>();

/** assembleConduction2D(grid, k), or the operator already assembled for these nodes and this k. */
export function conductionOperator(grid: Grid2D, k: number): Stencil9 {
  const kept = operators.get(grid.x);
  if (kept !== undefined && kept.k === k && kept.y === grid.y) return kept.K;
  const K = assembleConduction2D(grid, k);
  operators.set(grid.x, { k, y: grid.y, K });
  return K;
}
