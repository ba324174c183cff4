/**
 * Baseline for the 2-D benchmarks: a straightforward general sparse direct solver, written here only to
 * have something to compare the library's banded Cholesky with in the same run. It uses nothing that the
 * library's solver knows: not the symmetry, not the grid, not the positive definiteness.
 *
 *  1. input: the matrix in compressed sparse row form (CSR), both triangles, exact zeros dropped;
 *  2. ordering: the unknowns as given, i.e. the grid's natural numbering (thin direction fastest, as the
 *     library stores them), or reverse Cuthill-McKee on the sparsity graph (Cuthill & McKee 1969, "Reducing
 *     the bandwidth of sparse symmetric matrices", Proc. 24th ACM National Conference; the reversal of
 *     George 1971; the pseudo-peripheral start node of Gibbs, Poole & Stockmeyer 1976, SIAM J. Numer.
 *     Anal. 13(2)) [all from memory], the general-purpose way to make a sparse matrix banded. On these
 *     grids both give the same bandwidth (nodesY + 1); the natural order fills in less inside the band
 *     and is about twice as fast, so it is the baseline the table quotes;
 *  3. factorisation: Gaussian elimination A = L U on the band of the reordered matrix (lower bandwidth bl,
 *     upper bu, both stored in full; cost ~ N bl bu multiply-adds, storage N (bl + bu + 1) doubles), row
 *     oriented, without pivoting. A general code (LAPACK dgbtrf) pivots by rows, which widens the upper band
 *     to bl + bu; the fin matrices are M-matrices, diagonally dominant, so no pivot is ever small and leaving
 *     pivoting out only makes the baseline faster;
 *  4. forward and back substitution.
 * Not used: the natural numbering with x (along the fin) fastest, the other obvious general choice: its
 * bandwidth is nodesX + 1 (2001 on a 2000 x 20 grid: 1.3 GB of band and ~1.6e11 multiply-adds), which
 * cannot run here at all.
 */
import { couplingOf, type Stencil9 } from '../src/fd/linear-algebra/stencil9.js';

export interface Csr {
  readonly size: number;
  /** Row p's entries are at rowStart[p] .. rowStart[p + 1] - 1. */
  readonly rowStart: Int32Array;
  readonly column: Int32Array;
  readonly value: Float64Array;
}

/** The full matrix of a 9-point stencil as CSR (columns sorted, exact zeros dropped). */
export function stencilToCsr(a: Stencil9): Csr {
  const { nodesX: nx, nodesY: ny } = a;
  const n = nx * ny;
  const rowStart = new Int32Array(n + 1);
  const column = new Int32Array(9 * n);
  const value = new Float64Array(9 * n);
  let k = 0;
  for (let p = 0; p < n; p++) {
    rowStart[p] = k;
    const i = Math.floor(p / ny);
    const j = p - i * ny;
    // Neighbour offsets in increasing column order (q = p + di * ny + dj).
    for (const di of [-1, 0, 1]) {
      for (const dj of [-1, 0, 1]) {
        const v = couplingOf(a, i, j, di, dj);
        if (v === 0) continue;
        column[k] = p + di * ny + dj;
        value[k] = v;
        k++;
      }
    }
  }
  rowStart[n] = k;
  return { size: n, rowStart, column: column.slice(0, k), value: value.slice(0, k) };
}

/** Breadth-first levels from `start`; returns the visit order and the last level's first index in it. */
function breadthFirst(
  m: Csr,
  start: number,
  degree: Int32Array,
  mark: Int32Array,
  stamp: number,
  order: Int32Array,
  from: number,
): { end: number; lastLevel: number; depth: number } {
  let head = from;
  let tail = from;
  order[tail++] = start;
  mark[start] = stamp;
  let levelStart = from;
  let depth = 0;
  while (head < tail) {
    const levelEnd = tail;
    levelStart = head;
    for (; head < levelEnd; head++) {
      const p = order[head] as number;
      const first = tail;
      for (let e = m.rowStart[p] as number; e < (m.rowStart[p + 1] as number); e++) {
        const q = m.column[e] as number;
        if (mark[q] === stamp) continue;
        mark[q] = stamp;
        order[tail++] = q;
      }
      // Cuthill-McKee: the new neighbours in increasing degree (insertion sort: at most 8 of them).
      for (let a = first + 1; a < tail; a++) {
        const q = order[a] as number;
        const dq = degree[q] as number;
        let b = a - 1;
        for (; b >= first && (degree[order[b] as number] as number) > dq; b--) order[b + 1] = order[b] as number;
        order[b + 1] = q;
      }
    }
    if (tail > levelEnd) depth++;
  }
  return { end: tail, lastLevel: levelStart, depth };
}

/** Reverse Cuthill-McKee: perm[newIndex] = oldIndex. */
export function reverseCuthillMcKee(m: Csr): Int32Array {
  const n = m.size;
  const degree = new Int32Array(n);
  for (let p = 0; p < n; p++) degree[p] = (m.rowStart[p + 1] as number) - (m.rowStart[p] as number);
  const placed = new Uint8Array(n);
  const mark = new Int32Array(n).fill(-1);
  const order = new Int32Array(n);
  const scratch = new Int32Array(n);
  let stamp = 0;
  let filled = 0;
  for (let seed = 0; seed < n; seed++) {
    if (placed[seed]) continue;
    // Pseudo-peripheral node: from the seed, jump to a smallest-degree node of the last level while the depth grows.
    let start = seed;
    let depth = -1;
    for (let tries = 0; tries < 10; tries++) {
      const bfs = breadthFirst(m, start, degree, mark, stamp++, scratch, 0);
      if (bfs.depth <= depth) break;
      depth = bfs.depth;
      let best = scratch[bfs.lastLevel] as number;
      for (let t = bfs.lastLevel; t < bfs.end; t++) if ((degree[scratch[t] as number] as number) < (degree[best] as number)) best = scratch[t] as number;
      start = best;
    }
    const bfs = breadthFirst(m, start, degree, mark, stamp++, order, filled);
    for (let t = filled; t < bfs.end; t++) placed[order[t] as number] = 1;
    filled = bfs.end;
  }
  return order.reverse();
}

export interface BandLu {
  readonly size: number;
  readonly lowerBandwidth: number;
  readonly upperBandwidth: number;
  solve(rhs: Float64Array): Float64Array;
}

/** Band LU (no pivoting) of the matrix reordered by perm (perm[newIndex] = oldIndex). */
export function factorBandLu(m: Csr, perm: Int32Array): BandLu {
  const n = m.size;
  const inverse = new Int32Array(n);
  for (let t = 0; t < n; t++) inverse[perm[t] as number] = t;
  let bl = 0;
  let bu = 0;
  for (let p = 0; p < n; p++) {
    const i = inverse[p] as number;
    for (let e = m.rowStart[p] as number; e < (m.rowStart[p + 1] as number); e++) {
      const j = inverse[m.column[e] as number] as number;
      if (i - j > bl) bl = i - j;
      if (j - i > bu) bu = j - i;
    }
  }
  const width = bl + bu + 1;
  const band = new Float64Array(n * width); // A(i, j) at band[i * width + j - i + bl]
  for (let p = 0; p < n; p++) {
    const i = inverse[p] as number;
    for (let e = m.rowStart[p] as number; e < (m.rowStart[p + 1] as number); e++) {
      const j = inverse[m.column[e] as number] as number;
      band[i * width + j - i + bl] = m.value[e] as number;
    }
  }
  for (let k = 0; k < n; k++) {
    const rowK = k * width - k + bl; // band[rowK + j] = A(k, j)
    const pivot = band[rowK + k] as number;
    if (pivot === 0) throw new Error(`band LU: zero pivot at row ${k}`);
    const inv = 1 / pivot;
    const lastRow = Math.min(n - 1, k + bl);
    const lastCol = Math.min(n - 1, k + bu);
    const from = rowK + k + 1; // A(k, k + 1) .. A(k, lastCol): band[from .. to - 1]
    const to = rowK + lastCol + 1;
    for (let i = k + 1; i <= lastRow; i++) {
      const rowI = i * width - i + bl;
      const lik = (band[rowI + k] as number) * inv;
      band[rowI + k] = lik;
      if (lik === 0) continue;
      const shift = rowI - rowK; // A(i, j) = band[rowK + j + shift]
      for (let a = from; a < to; a++) band[a + shift] = (band[a + shift] as number) - lik * (band[a] as number);
    }
  }
  return {
    size: n,
    lowerBandwidth: bl,
    upperBandwidth: bu,
    solve(rhs: Float64Array): Float64Array {
      const y = new Float64Array(n);
      for (let t = 0; t < n; t++) y[t] = rhs[perm[t] as number] as number;
      for (let i = 0; i < n; i++) {
        const rowI = i * width - i + bl;
        let s = y[i] as number;
        for (let j = Math.max(0, i - bl); j < i; j++) s -= (band[rowI + j] as number) * (y[j] as number);
        y[i] = s;
      }
      for (let i = n - 1; i >= 0; i--) {
        const rowI = i * width - i + bl;
        let s = y[i] as number;
        const lastCol = Math.min(n - 1, i + bu);
        for (let j = i + 1; j <= lastCol; j++) s -= (band[rowI + j] as number) * (y[j] as number);
        y[i] = s / (band[rowI + i] as number);
      }
      const x = new Float64Array(n);
      for (let t = 0; t < n; t++) x[perm[t] as number] = y[t] as number;
      return x;
    },
  };
}

/** How the baseline numbers the unknowns: as given (the grid's order) or reverse Cuthill-McKee. */
export type BaselineOrdering = 'natural' | 'rcm';

/** The whole baseline on a CSR matrix: ordering, factorisation, one solve. */
export function generalBandLuSolve(m: Csr, rhs: Float64Array, ordering: BaselineOrdering): { x: Float64Array; lu: BandLu } {
  let perm: Int32Array;
  switch (ordering) {
    case 'natural':
      perm = Int32Array.from({ length: m.size }, (_, p) => p);
      break;
    case 'rcm':
      perm = reverseCuthillMcKee(m);
      break;
    default: {
      const unreachable: never = ordering;
      throw new Error(`unknown ordering ${String(unreachable)}`);
    }
  }
  const lu = factorBandLu(m, perm);
  return { x: lu.solve(rhs), lu };
}

/** Bytes of the band the baseline stores, for a reordered matrix with these bandwidths. */
export function bandLuBytes(size: number, lowerBandwidth: number, upperBandwidth: number): number {
  return size * (lowerBandwidth + upperBandwidth + 1) * 8;
}

/** Max-norm relative difference of two solutions (to show the baseline solved the same system). */
export function relativeDifference(x: Float64Array, y: Float64Array): number {
  let diff = 0;
  let scale = 0;
  for (let p = 0; p < x.length; p++) {
    diff = Math.max(diff, Math.abs((x[p] as number) - (y[p] as number)));
    scale = Math.max(scale, Math.abs(y[p] as number));
  }
  return diff / scale;
}
