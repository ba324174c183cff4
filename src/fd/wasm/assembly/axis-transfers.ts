/**
 * AssemblyScript (compiled by scripts/build-kernels.mjs): the one-direction passes of the sink multigrid's linear
 * transfers (sink-transfer.ts restrictAxis and prolongAxis), operation for operation as the TypeScript there, so the
 * same bits. One direction of n fine and nc coarse cells: fine index i takes weight w_i of its own coarse cell own_i
 * and 1 − w_i of the neighbouring one other_i (cell-centred linear interpolation, weights 3/4 and 1/4, 1 at an edge);
 * the vectors are shaped [outer][n or nc][inner]. Pointers are byte offsets into memory: own and other i32, w and
 * the vectors f64.
 */

function f64At(base: usize, q: i32): f64 {
  return load<f64>(base + ((<usize>q) << 3));
}

function setF64(base: usize, q: i32, v: f64): void {
  store<f64>(base + ((<usize>q) << 3), v);
}

function i32At(base: usize, q: i32): i32 {
  return load<i32>(base + ((<usize>q) << 2));
}

/** dst[d0 ..] = P^T src along the direction: src [outer][n][inner] from so, dst [outer][nc][inner] from d0. */
export function restrictAxis(n: i32, nc: i32, own: usize, other: usize, w: usize, outer: i32, inner: i32, src: usize, so: i32, dst: usize, d0: i32): void {
  const total = outer * nc * inner;
  for (let q = d0; q < d0 + total; q++) setF64(dst, q, 0);
  for (let o = 0; o < outer; o++) {
    for (let i = 0; i < n; i++) {
      const s = so + (o * n + i) * inner;
      const a = d0 + (o * nc + i32At(own, i)) * inner;
      const wi = f64At(w, i);
      if (wi == 1) {
        for (let m = 0; m < inner; m++) setF64(dst, a + m, f64At(dst, a + m) + f64At(src, s + m));
        continue;
      }
      const b = d0 + (o * nc + i32At(other, i)) * inner;
      const wo = 1 - wi;
      for (let m = 0; m < inner; m++) {
        const v = f64At(src, s + m);
        setF64(dst, a + m, f64At(dst, a + m) + wi * v);
        setF64(dst, b + m, f64At(dst, b + m) + wo * v);
      }
    }
  }
}

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
      if (add != 0) for (let m = 0; m < inner; m++) setF64(dst, d + m, f64At(dst, d + m) + (wi * f64At(src, a + m) + wo * f64At(src, b + m)));
      else for (let m = 0; m < inner; m++) setF64(dst, d + m, wi * f64At(src, a + m) + wo * f64At(src, b + m));
    }
  }
}
