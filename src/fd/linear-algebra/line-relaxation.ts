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
import { csrEntry } from './csr.js';

/** Lines: the members of line l are order[start[l]] .. order[start[l + 1] − 1], in the tridiagonal order. */
export interface LineSet {
  readonly order: Int32Array;
  readonly start: Int32Array;
}

export interface LineRelaxation {
  /** One sweep over the lines in order (forward) or in reverse (backward), updating x in place. */
  sweep(b: Float64Array, x: Float64Array, direction: 'forward' | 'backward'): void;
}

export function buildLineRelaxation(a: CsrMatrix, lines: LineSet): LineRelaxation {
  const { order, start } = lines;
  const n = order.length;
  const lower = new Float64Array(n);
  const diag = new Float64Array(n);
  const upper = new Float64Array(n);
  const cp = new Float64Array(n);
  const inv = new Float64Array(n);
  const nLines = start.length - 1;
  let longest = 0;
  for (let l = 0; l < nLines; l++) {
    const q0 = start[l];
    const q1 = start[l + 1];
    longest = Math.max(longest, q1 - q0);
    for (let q = q0; q < q1; q++) {
      const r = order[q];
      diag[q] = csrEntry(a, r, r);
      lower[q] = q > q0 ? csrEntry(a, r, order[q - 1]) : 0;
      upper[q] = q + 1 < q1 ? csrEntry(a, r, order[q + 1]) : 0;
    }
    for (let q = q0; q < q1; q++) {
      const denom = diag[q] - (q > q0 ? lower[q] * cp[q - 1] : 0);
      inv[q] = 1 / denom;
      cp[q] = upper[q] * inv[q];
    }
  }
  const work = new Float64Array(longest);
  const { rowStart, col, val } = a;

  const relaxLine = (l: number, b: Float64Array, x: Float64Array): void => {
    const q0 = start[l];
    const q1 = start[l + 1];
    // Right-hand side with the off-line couplings at their current values (the in-line terms added back).
    for (let q = q0; q < q1; q++) {
      const r = order[q];
      let s = b[r];
      for (let e = rowStart[r]; e < rowStart[r + 1]; e++) s -= val[e] * x[col[e]];
      s += diag[q] * x[r];
      if (q > q0) s += lower[q] * x[order[q - 1]];
      if (q + 1 < q1) s += upper[q] * x[order[q + 1]];
      work[q - q0] = s;
    }
    let prev = 0;
    for (let q = q0; q < q1; q++) {
      prev = (work[q - q0] - (q > q0 ? lower[q] * prev : 0)) * inv[q];
      work[q - q0] = prev;
    }
    let next = 0;
    for (let q = q1 - 1; q >= q0; q--) {
      next = work[q - q0] - (q + 1 < q1 ? cp[q] * next : 0);
      x[order[q]] = next;
    }
  };

  return {
    sweep(b, x, direction) {
      if (direction === 'forward') for (let l = 0; l < nLines; l++) relaxLine(l, b, x);
      else for (let l = nLines - 1; l >= 0; l--) relaxLine(l, b, x);
    },
  };
}
