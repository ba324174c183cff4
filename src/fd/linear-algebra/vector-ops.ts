/**
 * Plain vector reductions shared by the sparse solvers: the inner product a · b = sum_k a_k b_k and the 1-norm
 * |v|_1 = sum_k |v_k|, summed in index order (so every caller gets the same bits for the same vectors).
 */

export function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let k = 0; k < a.length; k++) s += a[k] * b[k];
  return s;
}

export function norm1(v: Float64Array): number {
  let s = 0;
  for (let k = 0; k < v.length; k++) s += Math.abs(v[k]);
  return s;
}
