/**
 * AssemblyScript (compiled to WebAssembly by scripts/build-kernels.mjs): the line Gauss-Seidel sweeps of
 * sink-stencil-relaxation.ts on data in this module's linear memory, operation for operation as the TypeScript
 * there, so the same bits. Plate columns in z and fin rows along their height are lines; each line's tridiagonal
 * system T_l x_l = b_l + sum_{q not on l} G_lq x_q is solved exactly by the twisted factorisation made in
 * TypeScript (inv), the couplings off the line at their current values. Units: conductances W/K, x K, b W.
 *
 * A level is described by 21 i32 words at `d` (byte offsets into memory for arrays):
 *   0 nx  1 ny  2 nz  3 plate (cells)  4 fins  5 line  6 gx  7 gy  8 row  9 inv  10 w (f64 scratch, the longest
 *   line)  11 extraStart (i32)  12 extraFrom (i32)  13 extraTo (i32)  14 extraG (f64)  15 extraAhead (u8)
 *   16 finStart (i32 per fin: first node)  17 finLine (i32 per fin: first line)  18 finRows (i32)  19 finLayers
 *   (i32)  20 coefficient storage: 1 float32, 0 float64 (line, gx, gy, row, inv).
 * Vectors b, x, r are byte offsets of f64 arrays of the level's size.
 */

import { word, f64At, setF64, i32At, ld } from './memory-access';

/** A coefficient as a double (float32 storage is widened exactly, as a Float32Array read in TypeScript). */
function g<T>(base: usize, q: i32): f64 {
  if (sizeof<T>() == 4) return <f64>load<f32>(base + ((<usize>q) << 2));
  return load<f64>(base + ((<usize>q) << 3));
}

/** Two consecutive coefficients from base[q] as f64x2 (float32 storage widened exactly, as g reads one). */
function g2<T>(base: usize, q: i32): v128 {
  if (sizeof<T>() == 4) return f64x2.promote_low_f32x4(v128.load64_zero(base + ((<usize>q) << 2)));
  return v128.load(base + ((<usize>q) << 3));
}

/** x[p0 .. p0 + len) = T^-1 w (sink-stencil-relaxation.ts solveLine). */
function solveLine<T>(w: usize, x: usize, inv: usize, line: usize, p0: i32, len: i32): void {
  const m = len >> 1;
  let yTop: f64 = 0;
  let gTop: f64 = 0;
  let yBottom: f64 = 0;
  for (let t = 0; t < m; t++) {
    const q = p0 + t;
    yTop = (f64At(w, t) + gTop * yTop) * g<T>(inv, q);
    setF64(w, t, yTop);
    gTop = g<T>(line, q);
    const k = len - 1 - t;
    if (k > m) {
      const qb = p0 + k;
      yBottom = (f64At(w, k) + g<T>(line, qb) * yBottom) * g<T>(inv, qb);
      setF64(w, k, yBottom);
    }
  }
  const pm = p0 + m;
  const xm = (f64At(w, m) + gTop * yTop + g<T>(line, pm) * yBottom) * g<T>(inv, pm);
  setF64(x, pm, xm);
  let xTop = xm;
  let xBottom = xm;
  for (let t = 1; t <= m; t++) {
    const q = pm - t;
    xTop = f64At(w, m - t) + g<T>(line, q) * g<T>(inv, q) * xTop;
    setF64(x, q, xTop);
    if (m + t < len) {
      const qb = pm + t;
      xBottom = f64At(w, m + t) + g<T>(line, qb - 1) * g<T>(inv, qb) * xBottom;
      setF64(x, qb, xBottom);
    }
  }
}

/** w += line l's extra couplings (skipAhead: without those flagged in extraAhead). */
function addExtras(d: usize, w: usize, x: usize, l: i32, p0: i32, skipAhead: bool): void {
  const start = <usize>word(d, 11);
  const from = <usize>word(d, 12);
  const to = <usize>word(d, 13);
  const eg = <usize>word(d, 14);
  const ahead = <usize>word(d, 15);
  const e1 = i32At(start, l + 1);
  for (let e = i32At(start, l); e < e1; e++) {
    if (!skipAhead || load<u8>(ahead + <usize>e) == 0) {
      const k = i32At(from, e) - p0;
      setF64(w, k, f64At(w, k) + f64At(eg, e) * f64At(x, i32At(to, e)));
    }
  }
}

/** The columns of plate plane i (sink-stencil-relaxation.ts plane); returns b · x over its lines when withDot. */
function plane<T>(d: usize, i: i32, b: usize, x: usize, ahead: bool, forward: bool, withDot: bool): f64 {
  const nx = word(d, 0);
  const ny = word(d, 1);
  const nz = word(d, 2);
  const line = <usize>word(d, 5);
  const gx = <usize>word(d, 6);
  const gy = <usize>word(d, 7);
  const inv = <usize>word(d, 9);
  const w = <usize>word(d, 10);
  const start = <usize>word(d, 11);
  const sx = ny * nz;
  const interior = i > 0 && i + 1 < nx;
  let dot: f64 = 0;
  for (let t = 0; t < ny; t++) {
    const j = forward ? t : ny - 1 - t;
    const p0 = (i * ny + j) * nz;
    if (interior) {
      // Two members at a time (f64x2 lanes, each the scalar sum in the same order), the odd one last.
      const pairs = nz >> 1;
      if (ahead) {
        for (let h = 0; h < pairs; h++) {
          const q = p0 + 2 * h;
          let v = f64x2.add(ld(b, q), f64x2.mul(g2<T>(gx, q - sx), ld(x, q - sx)));
          v = f64x2.add(v, f64x2.mul(g2<T>(gx, q), ld(x, q + sx)));
          v = f64x2.add(v, f64x2.mul(g2<T>(gy, q - nz), ld(x, q - nz)));
          v = f64x2.add(v, f64x2.mul(g2<T>(gy, q), ld(x, q + nz)));
          v128.store(w + ((<usize>(2 * h)) << 3), v);
        }
        for (let k = 2 * pairs, q = p0 + 2 * pairs; k < nz; k++, q++)
          setF64(
            w,
            k,
            f64At(b, q) +
              g<T>(gx, q - sx) * f64At(x, q - sx) +
              g<T>(gx, q) * f64At(x, q + sx) +
              g<T>(gy, q - nz) * f64At(x, q - nz) +
              g<T>(gy, q) * f64At(x, q + nz),
          );
      } else {
        for (let h = 0; h < pairs; h++) {
          const q = p0 + 2 * h;
          let v = f64x2.add(ld(b, q), f64x2.mul(g2<T>(gx, q - sx), ld(x, q - sx)));
          v = f64x2.add(v, f64x2.mul(g2<T>(gy, q - nz), ld(x, q - nz)));
          v128.store(w + ((<usize>(2 * h)) << 3), v);
        }
        for (let k = 2 * pairs, q = p0 + 2 * pairs; k < nz; k++, q++)
          setF64(w, k, f64At(b, q) + g<T>(gx, q - sx) * f64At(x, q - sx) + g<T>(gy, q - nz) * f64At(x, q - nz));
      }
    } else {
      const west = i > 0;
      const south = j > 0;
      const east = ahead && i + 1 < nx;
      const north = ahead && j + 1 < ny;
      for (let k = 0, q = p0; k < nz; k++, q++) {
        let v = f64At(b, q);
        if (west) v += g<T>(gx, q - sx) * f64At(x, q - sx);
        if (south) v += g<T>(gy, q - nz) * f64At(x, q - nz);
        if (east) v += g<T>(gx, q) * f64At(x, q + sx);
        if (north) v += g<T>(gy, q) * f64At(x, q + nz);
        setF64(w, k, v);
      }
    }
    const l = i * ny + j;
    if (i32At(start, l) < i32At(start, l + 1)) addExtras(d, w, x, l, p0, !ahead);
    solveLine<T>(w, x, inv, line, p0, nz);
    if (withDot) {
      let s: f64 = 0;
      for (let q = p0; q < p0 + nz; q++) s += f64At(b, q) * f64At(x, q);
      dot += s;
    }
  }
  return dot;
}

/** The rows of fin f (sink-stencil-relaxation.ts fin); returns b · x over its lines when withDot. */
function fin<T>(d: usize, f: i32, b: usize, x: usize, ahead: bool, forward: bool, withDot: bool): f64 {
  const plate = word(d, 3);
  const line = <usize>word(d, 5);
  const row = <usize>word(d, 8);
  const inv = <usize>word(d, 9);
  const w = <usize>word(d, 10);
  const start = <usize>word(d, 11);
  const first = i32At(<usize>word(d, 16), f);
  const firstLine = i32At(<usize>word(d, 17), f);
  const rows = i32At(<usize>word(d, 18), f);
  const layers = i32At(<usize>word(d, 19), f);
  let dot: f64 = 0;
  for (let t = 0; t < rows; t++) {
    const r = forward ? t : rows - 1 - t;
    const p0 = first + r * layers;
    const below = r > 0;
    const above = ahead && r + 1 < rows;
    for (let k = 0, q = p0; k < layers; k++, q++) {
      let v = f64At(b, q);
      if (below) v += g<T>(row, q - layers - plate) * f64At(x, q - layers);
      if (above) v += g<T>(row, q - plate) * f64At(x, q + layers);
      setF64(w, k, v);
    }
    const l = firstLine + r;
    if (i32At(start, l) < i32At(start, l + 1)) addExtras(d, w, x, l, p0, !ahead);
    solveLine<T>(w, x, inv, line, p0, layers);
    if (withDot) {
      let s: f64 = 0;
      for (let q = p0; q < p0 + layers; q++) s += f64At(b, q) * f64At(x, q);
      dot += s;
    }
  }
  return dot;
}

function forwardT<T>(d: usize, b: usize, x: usize, fromZero: bool): void {
  const nx = word(d, 0);
  const fins = word(d, 4);
  for (let i = 0; i < nx; i++) plane<T>(d, i, b, x, !fromZero, true, false);
  for (let f = 0; f < fins; f++) fin<T>(d, f, b, x, !fromZero, true, false);
}

function backwardT<T>(d: usize, b: usize, x: usize, withDot: bool): f64 {
  const nx = word(d, 0);
  let dot: f64 = 0;
  for (let f = word(d, 4) - 1; f >= 0; f--) dot += fin<T>(d, f, b, x, true, false, withDot);
  for (let i = nx - 1; i >= 0; i--) dot += plane<T>(d, i, b, x, true, false, withDot);
  return dot;
}

/** r = the couplings of plate plane at p0 to its successors in y and (east) in x. */
function aheadPlane<T>(d: usize, r: usize, x: usize, p0: i32, east: bool): void {
  const ny = word(d, 1);
  const nz = word(d, 2);
  const gx = <usize>word(d, 6);
  const gy = <usize>word(d, 7);
  const sx = ny * nz;
  const inner = (ny - 1) * nz;
  if (east) {
    // Pairs in f64x2 lanes (each the scalar expression), the odd one last.
    let q = p0;
    for (; q + 1 < p0 + inner; q += 2)
      v128.store(r + ((<usize>q) << 3), f64x2.add(f64x2.mul(g2<T>(gx, q), ld(x, q + sx)), f64x2.mul(g2<T>(gy, q), ld(x, q + nz))));
    for (; q < p0 + inner; q++) setF64(r, q, g<T>(gx, q) * f64At(x, q + sx) + g<T>(gy, q) * f64At(x, q + nz));
    for (let q = p0 + inner; q < p0 + sx; q++) setF64(r, q, g<T>(gx, q) * f64At(x, q + sx));
  } else {
    for (let q = p0; q < p0 + inner; q++) setF64(r, q, g<T>(gy, q) * f64At(x, q + nz));
    for (let q = p0 + inner; q < p0 + sx; q++) setF64(r, q, 0);
  }
}

function forwardResidualT<T>(d: usize, b: usize, x: usize, r: usize): void {
  const nx = word(d, 0);
  const ny = word(d, 1);
  const nz = word(d, 2);
  const plate = word(d, 3);
  const fins = word(d, 4);
  const row = <usize>word(d, 8);
  for (let i = 0; i < nx; i++) {
    plane<T>(d, i, b, x, false, true, false);
    if (i > 0) aheadPlane<T>(d, r, x, (i - 1) * ny * nz, true);
  }
  aheadPlane<T>(d, r, x, (nx - 1) * ny * nz, false);
  for (let f = 0; f < fins; f++) {
    fin<T>(d, f, b, x, false, true, false);
    const p0 = i32At(<usize>word(d, 16), f);
    const layers = i32At(<usize>word(d, 19), f);
    const count = i32At(<usize>word(d, 18), f) * layers;
    const last = p0 + count - layers;
    for (let q = p0; q < last; q++) setF64(r, q, g<T>(row, q - plate) * f64At(x, q + layers));
    for (let q = last; q < p0 + count; q++) setF64(r, q, 0);
  }
  const from = <usize>word(d, 12);
  const to = <usize>word(d, 13);
  const eg = <usize>word(d, 14);
  const ahead = <usize>word(d, 15);
  const extras = i32At(<usize>word(d, 11), lineCount(d));
  for (let e = 0; e < extras; e++) {
    if (load<u8>(ahead + <usize>e) == 1) {
      const p = i32At(from, e);
      setF64(r, p, f64At(r, p) + f64At(eg, e) * f64At(x, i32At(to, e)));
    }
  }
}

/** Lines of the level: plate columns plus every fin's rows. */
function lineCount(d: usize): i32 {
  let lines = word(d, 0) * word(d, 1);
  const fins = word(d, 4);
  for (let f = 0; f < fins; f++) lines += i32At(<usize>word(d, 18), f);
  return lines;
}

/** One sweep forward (fromZero: x's values on entry are not read). */
export function sweepForward(d: usize, b: usize, x: usize, fromZero: i32): void {
  if (word(d, 20) == 1) forwardT<f32>(d, b, x, fromZero != 0);
  else forwardT<f64>(d, b, x, fromZero != 0);
}

/** One sweep backward; returns b · x of the result when withDot (0 otherwise). */
export function sweepBackward(d: usize, b: usize, x: usize, withDot: i32): f64 {
  if (word(d, 20) == 1) return backwardT<f32>(d, b, x, withDot != 0);
  return backwardT<f64>(d, b, x, withDot != 0);
}

/** A forward sweep from x = 0, then r = b − A x (Gauss-Seidel's residual, the couplings to later lines). */
export function forwardResidual(d: usize, b: usize, x: usize, r: usize): void {
  if (word(d, 20) == 1) forwardResidualT<f32>(d, b, x, r);
  else forwardResidualT<f64>(d, b, x, r);
}
