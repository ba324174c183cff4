/**
 * AssemblyScript (compiled by scripts/build-kernels.mjs): the products of a sink stencil in the difference form
 * (sink-stencil-product.ts) and CG's vector updates (sparse-pcg.ts step and direction), operation for operation
 * as the TypeScript there, so the same bits. Units: conductances W/K, x K, products W.
 *   residual  out = b − A x,  (A x)_p = e_p x_p + sum_q G_pq (x_p − x_q);
 *   multiply  out = A x, returning x · A x summed as the TypeScript sums it.
 * A float64 stencil is described by 18 i32 words at `d` (byte offsets into memory for arrays):
 *   0 nx  1 ny  2 nz  3 n  4 plate  5 fins  6 line  7 gx  8 gy  9 row  10 excess  11 extras  12 extraFrom (i32)
 *   13 extraTo (i32)  14 extraG  15 finOffset (i32 per fin)  16 finRows (i32)  17 finLayers (i32).
 */

import { word, f64At, setF64, i32At, ld } from './memory-access';

/** out = sign (b − A x) on plate plane i, each neighbour bounded (sink-stencil-product.ts edgePlane). */
function edgePlane(d: usize, x: usize, b: usize, sign: f64, out: usize, i: i32): void {
  const nx = word(d, 0);
  const ny = word(d, 1);
  const nz = word(d, 2);
  const n = word(d, 3);
  const line = <usize>word(d, 6);
  const gx = <usize>word(d, 7);
  const gy = <usize>word(d, 8);
  const excess = <usize>word(d, 10);
  const sx = ny * nz;
  const p0 = i * sx;
  const p1 = p0 + sx;
  for (let p = p0; p < p1; p++) {
    const xp = f64At(x, p);
    let v = f64At(b, p) - f64At(excess, p) * xp;
    if (p > 0) v += f64At(line, p - 1) * (f64At(x, p - 1) - xp);
    if (p + 1 < n) v += f64At(line, p) * (f64At(x, p + 1) - xp);
    if (i > 0) v += f64At(gx, p - sx) * (f64At(x, p - sx) - xp);
    if (i + 1 < nx) v += f64At(gx, p) * (f64At(x, p + sx) - xp);
    if (p - nz >= p0) v += f64At(gy, p - nz) * (f64At(x, p - nz) - xp);
    if (p + nz < p1) v += f64At(gy, p) * (f64At(x, p + nz) - xp);
    setF64(out, p, sign * v);
  }
}

/** out = sign (b − A x) on fin f's nodes without the extra couplings (sink-stencil-product.ts residualFin). */
function residualFin(d: usize, x: usize, b: usize, sign: f64, out: usize, f: i32): void {
  const plate = word(d, 4);
  const line = <usize>word(d, 6);
  const row = <usize>word(d, 9);
  const excess = <usize>word(d, 10);
  const L = i32At(<usize>word(d, 17), f);
  const offset = i32At(<usize>word(d, 15), f);
  const rows = i32At(<usize>word(d, 16), f);
  const end = offset + rows * L;
  for (let p = offset + L; p < end - L; p++) {
    const xp = f64At(x, p);
    const q = p - plate;
    setF64(
      out,
      p,
      sign *
        (f64At(b, p) -
          f64At(excess, p) * xp +
          f64At(line, p) * (f64At(x, p + 1) - xp) +
          f64At(line, p - 1) * (f64At(x, p - 1) - xp) +
          f64At(row, q) * (f64At(x, p + L) - xp) +
          f64At(row, q - L) * (f64At(x, p - L) - xp)),
    );
  }
  finEdgeRow(d, x, b, sign, out, offset, L, offset, end);
  if (rows > 1) finEdgeRow(d, x, b, sign, out, end - L, L, offset, end);
}

function finEdgeRow(d: usize, x: usize, b: usize, sign: f64, out: usize, p0: i32, L: i32, offset: i32, end: i32): void {
  const plate = word(d, 4);
  const line = <usize>word(d, 6);
  const row = <usize>word(d, 9);
  const excess = <usize>word(d, 10);
  for (let p = p0; p < p0 + L; p++) {
    const xp = f64At(x, p);
    let v = f64At(b, p) - f64At(excess, p) * xp;
    if (p > p0) v += f64At(line, p - 1) * (f64At(x, p - 1) - xp);
    if (p + 1 < p0 + L) v += f64At(line, p) * (f64At(x, p + 1) - xp);
    if (p - L >= offset) v += f64At(row, p - L - plate) * (f64At(x, p - L) - xp);
    if (p + L < end) v += f64At(row, p - plate) * (f64At(x, p + L) - xp);
    setF64(out, p, sign * v);
  }
}

/** out = b − A x (sink-stencil-product.ts stencilResidual); returns |out|_1 summed in index order. */
export function stencilResidual(d: usize, x: usize, b: usize, out: usize): f64 {
  const nx = word(d, 0);
  const ny = word(d, 1);
  const nz = word(d, 2);
  const line = <usize>word(d, 6);
  const gx = <usize>word(d, 7);
  const gy = <usize>word(d, 8);
  const excess = <usize>word(d, 10);
  const sx = ny * nz;
  const sign: f64 = 1;
  // The interior planes in one flat pass (residualPlanes over all planes: from plane 1 to plane nx − 2).
  for (let p = sx; p < (nx - 1) * sx; p++) {
    const xp = f64At(x, p);
    setF64(
      out,
      p,
      sign *
        (f64At(b, p) -
          f64At(excess, p) * xp +
          f64At(line, p) * (f64At(x, p + 1) - xp) +
          f64At(line, p - 1) * (f64At(x, p - 1) - xp) +
          f64At(gx, p) * (f64At(x, p + sx) - xp) +
          f64At(gx, p - sx) * (f64At(x, p - sx) - xp) +
          f64At(gy, p) * (f64At(x, p + nz) - xp) +
          f64At(gy, p - nz) * (f64At(x, p - nz) - xp)),
    );
  }
  edgePlane(d, x, b, sign, out, 0);
  if (nx > 1) edgePlane(d, x, b, sign, out, nx - 1);
  const fins = word(d, 5);
  for (let f = 0; f < fins; f++) residualFin(d, x, b, sign, out, f);
  const extras = word(d, 11);
  const from_ = <usize>word(d, 12);
  const to_ = <usize>word(d, 13);
  const eg = <usize>word(d, 14);
  for (let e = 0; e < extras; e++) {
    const p = i32At(from_, e);
    setF64(out, p, f64At(out, p) + sign * f64At(eg, e) * (f64At(x, i32At(to_, e)) - f64At(x, p)));
  }
  const n = word(d, 3);
  let norm: f64 = 0;
  for (let p = 0; p < n; p++) norm += Math.abs(f64At(out, p));
  return norm;
}

/** out = A x (sink-stencil-product.ts stencilMultiply); returns x · A x. */
export function stencilMultiply(d: usize, x: usize, out: usize): f64 {
  const nx = word(d, 0);
  const ny = word(d, 1);
  const nz = word(d, 2);
  const line = <usize>word(d, 6);
  const gx = <usize>word(d, 7);
  const gy = <usize>word(d, 8);
  const excess = <usize>word(d, 10);
  const sx = ny * nz;
  let dot: f64 = 0;
  const last = (nx - 1 > 1 ? nx - 1 : 1) * sx;
  // Two cells at a time (f64x2 lanes, each the scalar sum in the same order; x . A x added lane by lane in index
  // order), the odd one last.
  let p = sx;
  for (; p + 1 < last; p += 2) {
    const xp = ld(x, p);
    let v = f64x2.mul(ld(excess, p), xp);
    v = f64x2.add(v, f64x2.mul(ld(line, p), f64x2.sub(xp, ld(x, p + 1))));
    v = f64x2.add(v, f64x2.mul(ld(line, p - 1), f64x2.sub(xp, ld(x, p - 1))));
    v = f64x2.add(v, f64x2.mul(ld(gx, p), f64x2.sub(xp, ld(x, p + sx))));
    v = f64x2.add(v, f64x2.mul(ld(gx, p - sx), f64x2.sub(xp, ld(x, p - sx))));
    v = f64x2.add(v, f64x2.mul(ld(gy, p), f64x2.sub(xp, ld(x, p + nz))));
    v = f64x2.add(v, f64x2.mul(ld(gy, p - nz), f64x2.sub(xp, ld(x, p - nz))));
    v128.store(out + ((<usize>p) << 3), v);
    const d = f64x2.mul(xp, v);
    dot += f64x2.extract_lane(d, 0);
    dot += f64x2.extract_lane(d, 1);
  }
  for (; p < last; p++) {
    const xp = f64At(x, p);
    const v =
      f64At(excess, p) * xp +
      f64At(line, p) * (xp - f64At(x, p + 1)) +
      f64At(line, p - 1) * (xp - f64At(x, p - 1)) +
      f64At(gx, p) * (xp - f64At(x, p + sx)) +
      f64At(gx, p - sx) * (xp - f64At(x, p - sx)) +
      f64At(gy, p) * (xp - f64At(x, p + nz)) +
      f64At(gy, p - nz) * (xp - f64At(x, p - nz));
    setF64(out, p, v);
    dot += xp * v;
  }
  // The edge planes and the fins through the residual's form with out zeroed as b (sign −1).
  let p0 = 0;
  let p1 = sx;
  for (let p = p0; p < p1; p++) setF64(out, p, 0);
  edgePlane(d, x, out, -1, out, 0);
  for (let p = p0; p < p1; p++) dot += f64At(x, p) * f64At(out, p);
  if (nx > 1) {
    p0 = (nx - 1) * sx;
    p1 = nx * sx;
    for (let p = p0; p < p1; p++) setF64(out, p, 0);
    edgePlane(d, x, out, -1, out, nx - 1);
    for (let p = p0; p < p1; p++) dot += f64At(x, p) * f64At(out, p);
  }
  const fins = word(d, 5);
  for (let f = 0; f < fins; f++) {
    p0 = i32At(<usize>word(d, 15), f);
    p1 = p0 + i32At(<usize>word(d, 16), f) * i32At(<usize>word(d, 17), f);
    for (let p = p0; p < p1; p++) setF64(out, p, 0);
    residualFin(d, x, out, -1, out, f);
    for (let p = p0; p < p1; p++) dot += f64At(x, p) * f64At(out, p);
  }
  const extras = word(d, 11);
  const from_ = <usize>word(d, 12);
  const to_ = <usize>word(d, 13);
  const eg = <usize>word(d, 14);
  for (let e = 0; e < extras; e++) {
    const p = i32At(from_, e);
    const dd = f64At(eg, e) * (f64At(x, p) - f64At(x, i32At(to_, e)));
    setF64(out, p, f64At(out, p) + dd);
    dot += f64At(x, p) * dd;
  }
  return dot;
}

/** x += alpha p, r −= alpha q over n entries; returns |r|_1 (sparse-pcg.ts step), pairs in f64x2 lanes. */
export function cgStep(n: i32, alpha: f64, p: usize, q: usize, x: usize, r: usize): f64 {
  let size: f64 = 0;
  const a = f64x2.splat(alpha);
  let k = 0;
  for (; k + 1 < n; k += 2) {
    v128.store(x + ((<usize>k) << 3), f64x2.add(ld(x, k), f64x2.mul(a, ld(p, k))));
    const rk = f64x2.sub(ld(r, k), f64x2.mul(a, ld(q, k)));
    v128.store(r + ((<usize>k) << 3), rk);
    size += Math.abs(f64x2.extract_lane(rk, 0));
    size += Math.abs(f64x2.extract_lane(rk, 1));
  }
  for (; k < n; k++) {
    setF64(x, k, f64At(x, k) + alpha * f64At(p, k));
    const rk = f64At(r, k) - alpha * f64At(q, k);
    setF64(r, k, rk);
    size += Math.abs(rk);
  }
  return size;
}

/** p = z + beta p over n entries (sparse-pcg.ts direction). */
export function cgDirection(n: i32, beta: f64, z: usize, p: usize): void {
  const b = f64x2.splat(beta);
  let k = 0;
  for (; k + 1 < n; k += 2) v128.store(p + ((<usize>k) << 3), f64x2.add(ld(z, k), f64x2.mul(b, ld(p, k))));
  for (; k < n; k++) setF64(p, k, f64At(z, k) + beta * f64At(p, k));
}
