/**
 * AssemblyScript (compiled by scripts/build-kernels.mjs): the one-direction passes of the sink multigrid's linear
 * transfers (sink-transfer.ts restrictAxis and prolongAxis), operation for operation as the TypeScript there, so the
 * same bits. One direction of n fine and nc coarse cells: fine index i takes weight w_i of its own coarse cell own_i
 * and 1 − w_i of the neighbouring one other_i (cell-centred linear interpolation, weights 3/4 and 1/4, 1 at an edge);
 * the vectors are shaped [outer][n or nc][inner]. Pointers are byte offsets into memory: own and other i32, w and
 * the vectors f64. P^T is formed as a gather by coarse cell (restrictGather: the sums of restrictAxis's scatter, in
 * its order), P by prolongAxis.
 */

import { f64At, setF64, i32At, ld } from './memory-access';

/** dst (+)= P src along the direction: src [outer][nc][inner] from so, dst [outer][n][inner] from d0; add != 0: +=. */
export function prolongAxis(
  n: i32,
  nc: i32,
  own: usize,
  other: usize,
  w: usize,
  outer: i32,
  inner: i32,
  src: usize,
  so: i32,
  dst: usize,
  d0: i32,
  add: i32,
): void {
  for (let o = 0; o < outer; o++) {
    for (let i = 0; i < n; i++) {
      const d = d0 + (o * n + i) * inner;
      const a = so + (o * nc + i32At(own, i)) * inner;
      const wi = f64At(w, i);
      const b = so + (o * nc + i32At(other, i)) * inner;
      const wo = 1 - wi;
      // Pairs of the inner index in f64x2 lanes (each lane the scalar expression), the odd one last.
      const w1 = f64x2.splat(wi);
      const w2 = f64x2.splat(wo);
      let m = 0;
      if (add != 0) {
        for (; m + 1 < inner; m += 2)
          v128.store(dst + ((<usize>(d + m)) << 3), f64x2.add(ld(dst, d + m), f64x2.add(f64x2.mul(w1, ld(src, a + m)), f64x2.mul(w2, ld(src, b + m)))));
        for (; m < inner; m++) setF64(dst, d + m, f64At(dst, d + m) + (wi * f64At(src, a + m) + wo * f64At(src, b + m)));
      } else {
        for (; m + 1 < inner; m += 2) v128.store(dst + ((<usize>(d + m)) << 3), f64x2.add(f64x2.mul(w1, ld(src, a + m)), f64x2.mul(w2, ld(src, b + m))));
        for (; m < inner; m++) setF64(dst, d + m, wi * f64At(src, a + m) + wo * f64At(src, b + m));
      }
    }
  }
}

/**
 * dst[d0 ..] = P^T src along the direction as a gather: coarse cell c is the sum over its contributors k, fine
 * cells fine_k in ascending order with weights w_k (start_c .. start_{c+1} − 1), of w_k src: the products and the
 * order of the sums of restrictAxis (which adds each fine cell's shares as it meets them, in ascending order, from
 * 0), so the same bits, with each coarse row written once instead of read and written per contributor.
 */
export function restrictGather(
  n: i32,
  nc: i32,
  start: usize,
  fine: usize,
  weight: usize,
  outer: i32,
  inner: i32,
  src: usize,
  so: i32,
  dst: usize,
  d0: i32,
): void {
  for (let o = 0; o < outer; o++) {
    for (let c = 0; c < nc; c++) {
      const a = d0 + (o * nc + c) * inner;
      for (let m = 0; m < inner; m++) setF64(dst, a + m, 0);
      const k1 = i32At(start, c + 1);
      for (let k = i32At(start, c); k < k1; k++) {
        const s = so + (o * n + i32At(fine, k)) * inner;
        const wk = f64At(weight, k);
        const w2 = f64x2.splat(wk);
        let m = 0;
        for (; m + 1 < inner; m += 2) v128.store(dst + ((<usize>(a + m)) << 3), f64x2.add(ld(dst, a + m), f64x2.mul(w2, ld(src, s + m))));
        for (; m < inner; m++) setF64(dst, a + m, f64At(dst, a + m) + wk * f64At(src, s + m));
      }
    }
  }
}
