/**
 * Block (line) Gauss-Seidel on a sparse symmetric matrix: the unknowns are partitioned into lines whose
 * consecutive members are coupled (the plate's columns in z, each fin's nodes along its height); each
 * relaxation step solves one line's tridiagonal system exactly with the couplings to unknowns off the line
 * taken at their current values:
 *   T_l x_l = b_l − sum_{s not on the line} A_{l s} x_s.
 * A forward sweep followed by a backward sweep is symmetric block Gauss-Seidel: a symmetric positive definite
 * operator for an SPD matrix, usable inside a CG preconditioner (Saad, "Iterative Methods for Sparse Linear
 * Systems", 2nd ed. 2003, sections 4.1 and 9.2 [from memory]). Thin plates couple far more strongly across
 * their thickness than along it, and z-line relaxation removes that anisotropy.
 * The line systems are factored once (Thomas algorithm without pivoting: the lines' matrices are
 * diagonally dominant M-matrices).
 */
import type { CsrMatrix } from './csr.js';
import { MemoryPlan, type KernelMemory } from '../wasm/kernel-memory.js';

/** Lines: the members of line l are order[start[l]] .. order[start[l + 1] − 1], in the tridiagonal order. */
export interface LineSet {
  readonly order: Int32Array;
  readonly start: Int32Array;
}

export interface LineRelaxation {
  /** One sweep over the lines in order (forward) or in reverse (backward), updating x in place. */
  sweep(b: Float64Array, x: Float64Array, direction: 'forward' | 'backward'): void;
}

/** Words of a relaxation's descriptor (src/fd/wasm/assembly/csr-kernels.ts). */
const DESCRIPTOR_WORDS = 10;

/** The bytes buildLineRelaxation(a, lines, memory) takes from `memory` (at most: every off-diagonal entry off the lines). */
export function lineRelaxationBytes(a: CsrMatrix, lines: LineSet): number {
  const n = lines.order.length;
  const off = Math.max(16, a.col.length);
  let longest = 0;
  for (let l = 0; l + 1 < lines.start.length; l++) longest = Math.max(longest, lines.start[l + 1] - lines.start[l]);
  return new MemoryPlan()
    .add(n, 4)
    .add(lines.start.length, 4)
    .add(n + 1, 4)
    .add(off, 4)
    .add(off, 8)
    .add(n, 8)
    .add(n, 8)
    .add(n, 8)
    .add(longest, 8)
    .add(DESCRIPTOR_WORDS, 4).bytes;
}

/**
 * `memory`, when given (planned with lineRelaxationBytes), receives a copy of the factored lines: a sweep whose
 * vectors are views into it runs as WebAssembly (csr-kernels.ts csrLineSweep, the same operations in the same
 * order as relaxLine below, so the same bits).
 */
export function buildLineRelaxation(a: CsrMatrix, lines: LineSet, memory: KernelMemory | null = null): LineRelaxation {
  const { order, start } = lines;
  const n = order.length;
  const lower = new Float64Array(n);
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const cp = new Float64Array(n);
  const inv = new Float64Array(n);
  const nLines = start.length - 1;
  let longest = 0;
  // One pass over each member's row: its diagonal and its couplings to the previous and next members (the line's
  // tridiagonal matrix), every other coupling packed in line order for the relaxation to read in one pass.
  const { rowStart, col, val } = a;
  const offStart = new Int32Array(n + 1);
  let packedCol = new Int32Array(Math.max(16, col.length - n));
  let packedVal = new Float64Array(packedCol.length);
  let f = 0;
  for (let l = 0; l < nLines; l++) {
    const q0 = start[l];
    const q1 = start[l + 1];
    longest = Math.max(longest, q1 - q0);
    for (let q = q0; q < q1; q++) {
      const r = order[q];
      const prev = q > q0 ? order[q - 1] : -1;
      const next = q + 1 < q1 ? order[q + 1] : -1;
      let d = 0;
      let lo = 0;
      let up = 0;
      for (let e = rowStart[r]; e < rowStart[r + 1]; e++) {
        const c = col[e];
        if (c === r) d += val[e];
        else if (c === prev) lo += val[e];
        else if (c === next) up += val[e];
        else {
          if (f === packedCol.length) {
            const c2 = new Int32Array(2 * f);
            const v2 = new Float64Array(2 * f);
            c2.set(packedCol);
            v2.set(packedVal);
            packedCol = c2;
            packedVal = v2;
          }
          packedCol[f] = c;
          packedVal[f++] = val[e];
        }
      }
      diag[q] = d;
      lower[q] = lo;
      upper[q] = up;
      offStart[q + 1] = f;
    }
    for (let q = q0; q < q1; q++) {
      const denom = diag[q] - (q > q0 ? lower[q] * cp[q - 1] : 0);
      inv[q] = 1 / denom;
      cp[q] = upper[q] * inv[q];
    }
  }
  const offCol = packedCol;
  const offVal = packedVal;
  const work = new Float64Array(longest);

  const relaxLine = (l: number, b: Float64Array, x: Float64Array): void => {
    const q0 = start[l];
    const q1 = start[l + 1];
    // Forward elimination with the right-hand side b − (couplings off the line) x (lower[q0] = 0, cp[q1 − 1] = 0:
    // no coupling outside the line's ends).
    let prev = 0;
    for (let q = q0; q < q1; q++) {
      let s = b[order[q]];
      for (let e = offStart[q]; e < offStart[q + 1]; e++) s -= offVal[e] * x[offCol[e]];
      prev = (s - lower[q] * prev) * inv[q];
      work[q - q0] = prev;
    }
    let next = 0;
    for (let q = q1 - 1; q >= q0; q--) {
      next = work[q - q0] - cp[q] * next;
      x[order[q]] = next;
    }
  };

  const kernel = memory !== null ? copyLines(memory, { order, start, offStart, offCol, offVal, lower, inv, cp, longest, used: f }) : 0;

  return {
    sweep(b, x, direction) {
      if (memory !== null && memory.holds(b) && memory.holds(x)) {
        memory.kernels.csrLineSweep(kernel, b.byteOffset, x.byteOffset, direction === 'forward' ? 1 : 0);
        return;
      }
      if (direction === 'forward') for (let l = 0; l < nLines; l++) relaxLine(l, b, x);
      else for (let l = nLines - 1; l >= 0; l--) relaxLine(l, b, x);
    },
  };
}

interface FactoredLines {
  order: Int32Array;
  start: Int32Array;
  offStart: Int32Array;
  offCol: Int32Array;
  offVal: Float64Array;
  lower: Float64Array;
  inv: Float64Array;
  cp: Float64Array;
  longest: number;
  /** Packed off-line entries in use. */
  used: number;
}

/** The factored lines copied into `memory`; returns the byte offset of their descriptor. */
function copyLines(memory: KernelMemory, t: FactoredLines): number {
  const i32 = (v: Int32Array): number => memory.copyI32(v);
  const f64 = (v: Float64Array): number => memory.copyF64(v);
  const d = memory.i32(DESCRIPTOR_WORDS);
  d.set([
    t.start.length - 1,
    i32(t.order),
    i32(t.start),
    i32(t.offStart),
    i32(t.offCol.subarray(0, t.used)),
    f64(t.offVal.subarray(0, t.used)),
    f64(t.lower),
    f64(t.inv),
    f64(t.cp),
    memory.f64(t.longest).byteOffset,
  ]);
  return d.byteOffset;
}
