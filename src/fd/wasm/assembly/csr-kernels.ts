/**
 * AssemblyScript (compiled by scripts/build-kernels.mjs): the CSR kernels of the 3-D sink solver where its finest
 * level is a general sparse matrix (fins as full 3-D cells): csr.ts csrMultiply and csrResidual, and the line
 * Gauss-Seidel sweep of line-relaxation.ts, operation for operation as the TypeScript there, so the same bits.
 * Units: conductances W/K, x K, products W.
 * A matrix is described by 5 i32 words at `d`: 0 n  1 rowStart (i32)  2 col (i32)  3 val (f64)  4 excess (f64; 0: none,
 * the rows then hold the plain products). With `excess` the difference form (A x)_p = e_p x_p + sum_{q != p} A_pq
 * (x_q − x_p), the diagonal stored first in each row.
 * A line relaxation by 10 words at `r`: 0 lines  1 order (i32)  2 start (i32)  3 offStart (i32)  4 offCol (i32)
 * 5 offVal (f64)  6 lower (f64)  7 inv (f64)  8 cp (f64)  9 work (f64); the line systems factored by the Thomas
 * algorithm in TypeScript (inv, cp), the couplings off the line packed per member (offStart, offCol, offVal).
 */

import { word, f64At, setF64, i32At } from './memory-access';

/** out = A x (csr.ts csrMultiply). */
export function csrMultiply(d: usize, x: usize, out: usize): void {
  const n = word(d, 0);
  const rowStart = <usize>word(d, 1);
  const col = <usize>word(d, 2);
  const val = <usize>word(d, 3);
  const excess = <usize>word(d, 4);
  if (excess != 0) {
    for (let r = 0; r < n; r++) {
      const xr = f64At(x, r);
      let s = f64At(excess, r) * xr;
      const e1 = i32At(rowStart, r + 1);
      for (let e = i32At(rowStart, r) + 1; e < e1; e++) s += f64At(val, e) * (f64At(x, i32At(col, e)) - xr);
      setF64(out, r, s);
    }
    return;
  }
  for (let r = 0; r < n; r++) {
    let s: f64 = 0;
    const e1 = i32At(rowStart, r + 1);
    for (let e = i32At(rowStart, r); e < e1; e++) s += f64At(val, e) * f64At(x, i32At(col, e));
    setF64(out, r, s);
  }
}

/** out = b − A x; returns |out|_1 (csr.ts csrResidual). */
export function csrResidual(d: usize, x: usize, b: usize, out: usize): f64 {
  const n = word(d, 0);
  const rowStart = <usize>word(d, 1);
  const col = <usize>word(d, 2);
  const val = <usize>word(d, 3);
  const excess = <usize>word(d, 4);
  let norm: f64 = 0;
  if (excess != 0) {
    for (let r = 0; r < n; r++) {
      const xr = f64At(x, r);
      let s = f64At(b, r) - f64At(excess, r) * xr;
      const e1 = i32At(rowStart, r + 1);
      for (let e = i32At(rowStart, r) + 1; e < e1; e++) s -= f64At(val, e) * (f64At(x, i32At(col, e)) - xr);
      setF64(out, r, s);
      norm += Math.abs(s);
    }
    return norm;
  }
  for (let r = 0; r < n; r++) {
    let s = f64At(b, r);
    const e1 = i32At(rowStart, r + 1);
    for (let e = i32At(rowStart, r); e < e1; e++) s -= f64At(val, e) * f64At(x, i32At(col, e));
    setF64(out, r, s);
    norm += Math.abs(s);
  }
  return norm;
}

/** Line l solved with the couplings off it at x's current values (line-relaxation.ts relaxLine). */
function relaxLine(rd: usize, l: i32, b: usize, x: usize): void {
  const order = <usize>word(rd, 1);
  const start = <usize>word(rd, 2);
  const offStart = <usize>word(rd, 3);
  const offCol = <usize>word(rd, 4);
  const offVal = <usize>word(rd, 5);
  const lower = <usize>word(rd, 6);
  const inv = <usize>word(rd, 7);
  const cp = <usize>word(rd, 8);
  const work = <usize>word(rd, 9);
  const q0 = i32At(start, l);
  const q1 = i32At(start, l + 1);
  let prev: f64 = 0;
  for (let q = q0; q < q1; q++) {
    let s = f64At(b, i32At(order, q));
    const e1 = i32At(offStart, q + 1);
    for (let e = i32At(offStart, q); e < e1; e++) s -= f64At(offVal, e) * f64At(x, i32At(offCol, e));
    prev = (s - f64At(lower, q) * prev) * f64At(inv, q);
    setF64(work, q - q0, prev);
  }
  let next: f64 = 0;
  for (let q = q1 - 1; q >= q0; q--) {
    next = f64At(work, q - q0) - f64At(cp, q) * next;
    setF64(x, i32At(order, q), next);
  }
}

/** One sweep over the lines, forward (forward != 0) or backward. */
export function csrLineSweep(rd: usize, b: usize, x: usize, forward: i32): void {
  const lines = word(rd, 0);
  if (forward != 0) for (let l = 0; l < lines; l++) relaxLine(rd, l, b, x);
  else for (let l = lines - 1; l >= 0; l--) relaxLine(rd, l, b, x);
}
