/**
 * The 2-D field of an fd-2d result as ndarray views, for the image module: excess temperature
 * theta = T - T_inf (K) and the node coordinates x, y (m), each of shape [nodesX, nodesY] with strides
 * [nodesY, 1]. The views share the result's arrays (no copies): do not write through them.
 */
import ndarray from 'ndarray';
import type { NdArray } from 'ndarray';
import type { Fin2DResult } from './linear-solve.js';

export interface Fin2DFieldViews {
  /** Excess temperature, K. */
  theta: NdArray<Float64Array>;
  /** Along the fin (annular: radius), m. */
  x: NdArray<Float64Array>;
  /** Across the fin (pins: radius), m. */
  y: NdArray<Float64Array>;
}

export function fieldViews(result: Fin2DResult): Fin2DFieldViews {
  const { grid, field } = result;
  const shape = [grid.shape[0], grid.shape[1]];
  const stride = [grid.stride[0], grid.stride[1]];
  return {
    theta: ndarray(field, shape, stride, 0),
    x: ndarray(grid.x, shape, stride, 0),
    y: ndarray(grid.y, shape, stride, 0),
  };
}
