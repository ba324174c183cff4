/**
 * Banded Cholesky factorisation A = L L^T of a symmetric positive definite 9-point system.
 *
 * With the short (thickness) direction numbered fastest, every coupling lies within w = nodesY + 1 of the
 * diagonal (w = nodesY for a 5-point operator, without diagonal couplings), and so does all the fill-in.
 * Crout (left-looking, row by row) elimination, as in Golub & Van Loan, "Matrix Computations" (4th ed.,
 * 2013), Algorithm 4.3.5 (band Cholesky) [from memory]:
 *     L(p, q) = (A(p, q) - sum_{k = p-w}^{q-1} L(p, k) L(q, k)) / L(q, q),   p - w <= q < p,
 *     L(p, p) = sqrt(A(p, p) - sum_{k = p-w}^{p-1} L(p, k)^2).
 * Cost: factor ~ N w^2 / 2 multiply-adds, each solve ~ 2 N w, storage N (w + 1 + PAD) doubles.
 *
 * Storage: L as a dense band, row by row, each row with PAD zero slots in front:
 *     L(p, k) = band[(p + 1) * S + k],  S = w + PAD,  p - w - PAD <= k <= p,
 * so row p fills band[p (S + 1) .. p (S + 1) + S] and the slots for k < p - w stay zero. Four consecutive rows
 * p0..p0+3 can then all be read from column p0 - w on, which lets one pass over k serve a 4 x 2 block of the
 * factor (rows p0..p0+3, columns q and q + 1): it loads six numbers for eight products, where one dot product at
 * a time loads two for one. Measured on the 2000 x 20 grid of the demo fin (CPU time, load ~1-3): 5.0 ms
 * against 7.2 ms with 2 x 2 blocks and unpadded rows. Factor once, solve as often as needed.
 */
import { SolverError } from '../../errors.js';
import type { BandedFactor } from './banded-factor.js';
import type { Stencil9 } from './stencil9.js';

export interface BandedCholesky extends BandedFactor {
  /** Smallest pivot^2 / A_pp: how much of the diagonal survived the elimination (1e-8 = 8 digits lost). */
  readonly pivotRatio: number;
}

/**
 * One band buffer kept from a factor its owner released (BandedFactor.release): the next factorisation that fits in
 * it uses it, zeroed, instead of a new allocation. A new band of the 2000 x 20 grid is 7.7 MB of fresh memory: its
 * page faults, and the garbage collections that external memory of that size sets off (measured in a process
 * solving that grid repeatedly: about one run in four took ~30 ms of CPU instead of 6.5 ms), cost far more than
 * zeroing a kept buffer (~0.2 ms). The largest released buffer up to SPARE_LIMIT_BYTES is kept.
 */
let spare: Float64Array | null = null;
const SPARE_LIMIT_BYTES = 64 * 2 ** 20;

/** A zeroed band of `length` doubles: the kept buffer when it is large enough, else a new one. */
function newBand(length: number): Float64Array {
  const kept = spare;
  if (kept === null || kept.length < length) return new Float64Array(length);
  spare = null;
  const band = kept.subarray(0, length);
  band.fill(0);
  return band;
}

/** Keeps the whole buffer under a band that will not be read again, when it is the largest one offered. */
function keepBand(band: Float64Array): void {
  const whole = new Float64Array(band.buffer);
  if (whole.byteLength <= SPARE_LIMIT_BYTES && (spare === null || whole.length > spare.length)) spare = whole;
}

/** Zero slots in front of each stored row: rows p0 + 1..p0 + 3 of a block of four read from row p0's first column. */
const PAD = 3;

/** Bytes the factor of a grid with these node counts needs (for the automatic solver choice): band and inverse pivots. */
export function bandedCholeskyBytes(nodesX: number, nodesY: number): number {
  return nodesX * nodesY * (nodesY + 1 + PAD + 2) * 8;
}

/** A Cholesky factor, or the pivot that showed the matrix is not positive definite. */
export type CholeskyOutcome =
  { readonly ok: true; readonly factor: BandedCholesky } | { readonly ok: false; readonly pivot: number; readonly unknown: number };

/** The factor; a SolverError when the matrix is not positive definite. */
export function factorBandedCholesky(a: Stencil9): BandedCholesky {
  const outcome = tryFactorBandedCholesky(a);
  if (!outcome.ok) throw notPositiveDefinite(outcome);
  return outcome.factor;
}

/** The SolverError of a failed factorisation. */
export function notPositiveDefinite(failure: { readonly pivot: number; readonly unknown: number }): SolverError {
  return new SolverError(
    `banded Cholesky: the 2-D system is not positive definite (pivot ${failure.pivot.toExponential(3)} at unknown ${failure.unknown})`,
    'another-2d-grid',
  );
}

/** The band being factored: storage, inverse pivots, and the smallest pivot ratio so far. */
interface Work {
  readonly a: Stencil9;
  readonly band: Float64Array;
  readonly invDiag: Float64Array;
  readonly w: number;
  /** Row stride minus one: L(p, k) = band[(p + 1) * s + k]. */
  readonly s: number;
  pivotRatio: number;
  /** The first non-positive pivot and its unknown (-1 while every pivot was positive). */
  failedPivot: number;
  failedUnknown: number;
}

/** The factor, or the first non-positive pivot (the matrix is then not positive definite). */
export function tryFactorBandedCholesky(a: Stencil9): CholeskyOutcome {
  const ny = a.nodesY;
  const n = a.nodesX * ny;
  const w = hasDiagonalCouplings(a) ? ny + 1 : ny;
  const s = w + PAD;
  const work: Work = {
    a,
    band: newBand(n * (s + 1)),
    invDiag: new Float64Array(n),
    w,
    s,
    pivotRatio: 1,
    failedPivot: Number.NaN,
    failedUnknown: -1,
  };
  fillLowerBand(a, work.band, s, w);
  let p0 = 0;
  for (; p0 + 3 < n && work.failedUnknown < 0; p0 += 4) factorFourRows(work, p0);
  for (; p0 < n && work.failedUnknown < 0; p0++) factorRow(work, p0);
  if (work.failedUnknown >= 0) {
    keepBand(work.band);
    return { ok: false, pivot: work.failedPivot, unknown: work.failedUnknown };
  }

  const { band, invDiag, pivotRatio } = work;
  let released = false;
  const factor: BandedCholesky = {
    size: n,
    bandwidth: w,
    pivotRatio,
    solve(rhs: Float64Array, out = new Float64Array(n)): Float64Array {
      if (released) throw new Error('banded Cholesky: solve after release');
      if (rhs.length !== n) throw new RangeError(`banded Cholesky: rhs has ${rhs.length} entries, expected ${n}`);
      if (out !== rhs) out.set(rhs);
      forwardSolve(band, invDiag, n, w, s, out);
      backwardSolve(band, invDiag, n, w, s, out);
      return out;
    },
    release(): void {
      if (released) return;
      released = true;
      keepBand(band);
    },
  };
  return { ok: true, factor };
}

/**
 * Rows p0..p0+3 of L: the columns left of the block two at a time (4 x 2 register blocks), then the 4 x 4
 * diagonal block (its products over the columns left of it in one pass, then a 4 x 4 Cholesky).
 */
function factorFourRows(work: Work, p0: number): void {
  const { band, invDiag, w, s } = work;
  const r0 = (p0 + 1) * s; // band[r0 + k] = L(p0, k)
  const r1 = r0 + s;
  const r2 = r1 + s;
  const r3 = r2 + s;
  const k0 = p0 > w ? p0 - w : 0;
  // Row p0 + r starts at column p0 + r - w: before it, its slots hold zeros, so the first r products of the
  // block are zero for that row and are left out (k0 + 3 <= q is when all three are in the sum).
  const padded = p0 > w;
  let q = k0;
  for (; q + 1 < p0; q += 2) {
    const rq = (q + 1) * s;
    const rr = rq + s;
    let a00 = 0;
    let a01 = 0;
    let a10 = 0;
    let a11 = 0;
    let a20 = 0;
    let a21 = 0;
    let a30 = 0;
    let a31 = 0;
    let k = k0;
    if (padded && q >= k0 + 3) {
      // k0: row p0 only; k0 + 1: rows p0, p0 + 1; k0 + 2: rows p0..p0 + 2.
      let x = band[rq + k];
      let y = band[rr + k];
      let l0 = band[r0 + k];
      a00 = l0 * x;
      a01 = l0 * y;
      k++;
      x = band[rq + k];
      y = band[rr + k];
      l0 = band[r0 + k];
      let l1 = band[r1 + k];
      a00 += l0 * x;
      a01 += l0 * y;
      a10 = l1 * x;
      a11 = l1 * y;
      k++;
      x = band[rq + k];
      y = band[rr + k];
      l0 = band[r0 + k];
      l1 = band[r1 + k];
      const l2 = band[r2 + k];
      a00 += l0 * x;
      a01 += l0 * y;
      a10 += l1 * x;
      a11 += l1 * y;
      a20 = l2 * x;
      a21 = l2 * y;
      k++;
    }
    for (; k < q; k++) {
      const x = band[rq + k];
      const y = band[rr + k];
      const l0 = band[r0 + k];
      const l1 = band[r1 + k];
      const l2 = band[r2 + k];
      const l3 = band[r3 + k];
      a00 += l0 * x;
      a01 += l0 * y;
      a10 += l1 * x;
      a11 += l1 * y;
      a20 += l2 * x;
      a21 += l2 * y;
      a30 += l3 * x;
      a31 += l3 * y;
    }
    // Column q, then column q + 1 (which also needs the term k = q: L(q + 1, q)).
    const iq = invDiag[q];
    const ir = invDiag[q + 1];
    const lrq = band[rr + q];
    const b0 = (band[r0 + q] - a00) * iq;
    const b1 = (band[r1 + q] - a10) * iq;
    const b2 = (band[r2 + q] - a20) * iq;
    const b3 = (band[r3 + q] - a30) * iq;
    band[r0 + q] = b0;
    band[r1 + q] = b1;
    band[r2 + q] = b2;
    band[r3 + q] = b3;
    band[r0 + q + 1] = (band[r0 + q + 1] - a01 - b0 * lrq) * ir;
    band[r1 + q + 1] = (band[r1 + q + 1] - a11 - b1 * lrq) * ir;
    band[r2 + q + 1] = (band[r2 + q + 1] - a21 - b2 * lrq) * ir;
    band[r3 + q + 1] = (band[r3 + q + 1] - a31 - b3 * lrq) * ir;
  }
  if (q < p0) {
    // One column left (an odd count).
    const rq = (q + 1) * s;
    let a0 = 0;
    let a1 = 0;
    let a2 = 0;
    let a3 = 0;
    for (let k = k0; k < q; k++) {
      const x = band[rq + k];
      a0 += band[r0 + k] * x;
      a1 += band[r1 + k] * x;
      a2 += band[r2 + k] * x;
      a3 += band[r3 + k] * x;
    }
    const iq = invDiag[q];
    band[r0 + q] = (band[r0 + q] - a0) * iq;
    band[r1 + q] = (band[r1 + q] - a1) * iq;
    band[r2 + q] = (band[r2 + q] - a2) * iq;
    band[r3 + q] = (band[r3 + q] - a3) * iq;
  }
  // The diagonal block: sums over the columns left of it, then Cholesky of the 4 x 4 remainder.
  let s00 = 0;
  let s10 = 0;
  let s11 = 0;
  let s20 = 0;
  let s21 = 0;
  let s22 = 0;
  let s30 = 0;
  let s31 = 0;
  let s32 = 0;
  let s33 = 0;
  for (let k = k0; k < p0; k++) {
    const l0 = band[r0 + k];
    const l1 = band[r1 + k];
    const l2 = band[r2 + k];
    const l3 = band[r3 + k];
    s00 += l0 * l0;
    s10 += l1 * l0;
    s11 += l1 * l1;
    s20 += l2 * l0;
    s21 += l2 * l1;
    s22 += l2 * l2;
    s30 += l3 * l0;
    s31 += l3 * l1;
    s32 += l3 * l2;
    s33 += l3 * l3;
  }
  const i0 = pivot(work, p0, band[r0 + p0] - s00);
  if (i0 === 0) return;
  const m10 = (band[r1 + p0] - s10) * i0;
  const m20 = (band[r2 + p0] - s20) * i0;
  const m30 = (band[r3 + p0] - s30) * i0;
  band[r1 + p0] = m10;
  band[r2 + p0] = m20;
  band[r3 + p0] = m30;
  const i1 = pivot(work, p0 + 1, band[r1 + p0 + 1] - s11 - m10 * m10);
  if (i1 === 0) return;
  const m21 = (band[r2 + p0 + 1] - s21 - m20 * m10) * i1;
  const m31 = (band[r3 + p0 + 1] - s31 - m30 * m10) * i1;
  band[r2 + p0 + 1] = m21;
  band[r3 + p0 + 1] = m31;
  const i2 = pivot(work, p0 + 2, band[r2 + p0 + 2] - s22 - m20 * m20 - m21 * m21);
  if (i2 === 0) return;
  const m32 = (band[r3 + p0 + 2] - s32 - m30 * m20 - m31 * m21) * i2;
  band[r3 + p0 + 2] = m32;
  pivot(work, p0 + 3, band[r3 + p0 + 3] - s33 - m30 * m30 - m31 * m31 - m32 * m32);
}

/** One row of L on its own (the rows left over after the blocks of four). */
function factorRow(work: Work, p: number): void {
  const { band, invDiag, w, s } = work;
  const rp = (p + 1) * s;
  const k0 = p > w ? p - w : 0;
  for (let q = k0; q < p; q++) {
    const rq = (q + 1) * s;
    let t = band[rp + q];
    for (let k = k0; k < q; k++) t -= band[rp + k] * band[rq + k];
    band[rp + q] = t * invDiag[q];
  }
  let d = band[rp + p];
  for (let k = k0; k < p; k++) d -= band[rp + k] * band[rp + k];
  pivot(work, p, d);
}

/**
 * Stores L(p, p) = sqrt(d) and its inverse, and returns the inverse; a non-positive d (the matrix is not positive
 * definite) is recorded in `work` and gives 0.
 */
function pivot(work: Work, p: number, d: number): number {
  if (!(d > 0)) {
    work.failedPivot = d;
    work.failedUnknown = p;
    return 0;
  }
  const root = Math.sqrt(d);
  const inverse = 1 / root;
  work.band[(p + 1) * work.s + p] = root;
  work.invDiag[p] = inverse;
  const ratio = d / work.a.diag[p];
  if (ratio < work.pivotRatio) work.pivotRatio = ratio;
  return inverse;
}

/** y <- L^-1 y: four rows at a time (one load of y[k] for four products), then the 4 x 4 triangle. */
function forwardSolve(band: Float64Array, invDiag: Float64Array, n: number, w: number, s: number, y: Float64Array): void {
  let p0 = 0;
  for (; p0 + 3 < n; p0 += 4) {
    const r0 = (p0 + 1) * s;
    const r1 = r0 + s;
    const r2 = r1 + s;
    const r3 = r2 + s;
    const k0 = p0 > w ? p0 - w : 0;
    let t0 = y[p0];
    let t1 = y[p0 + 1];
    let t2 = y[p0 + 2];
    let t3 = y[p0 + 3];
    for (let k = k0; k < p0; k++) {
      const v = y[k];
      t0 -= band[r0 + k] * v;
      t1 -= band[r1 + k] * v;
      t2 -= band[r2 + k] * v;
      t3 -= band[r3 + k] * v;
    }
    const y0 = t0 * invDiag[p0];
    const y1 = (t1 - band[r1 + p0] * y0) * invDiag[p0 + 1];
    const y2 = (t2 - band[r2 + p0] * y0 - band[r2 + p0 + 1] * y1) * invDiag[p0 + 2];
    y[p0] = y0;
    y[p0 + 1] = y1;
    y[p0 + 2] = y2;
    y[p0 + 3] = (t3 - band[r3 + p0] * y0 - band[r3 + p0 + 1] * y1 - band[r3 + p0 + 2] * y2) * invDiag[p0 + 3];
  }
  for (; p0 < n; p0++) {
    const r = (p0 + 1) * s;
    let t = y[p0];
    for (let k = p0 > w ? p0 - w : 0; k < p0; k++) t -= band[r + k] * y[k];
    y[p0] = t * invDiag[p0];
  }
}

/**
 * y <- L^-T y, four rows of L at a time from the last: x_p..x_{p-3} from the 4 x 4 triangle, then the four rows'
 * contributions subtracted from the entries left of them (contiguous rows of L; one load and store of y[k] for
 * four products).
 */
function backwardSolve(band: Float64Array, invDiag: Float64Array, n: number, w: number, s: number, y: Float64Array): void {
  let p = n - 1;
  for (; p >= 3; p -= 4) {
    const r0 = (p + 1) * s; // row p
    const r1 = r0 - s; // row p - 1
    const r2 = r1 - s;
    const r3 = r2 - s;
    const x0 = y[p] * invDiag[p];
    const x1 = (y[p - 1] - band[r0 + p - 1] * x0) * invDiag[p - 1];
    const x2 = (y[p - 2] - band[r0 + p - 2] * x0 - band[r1 + p - 2] * x1) * invDiag[p - 2];
    const x3 = (y[p - 3] - band[r0 + p - 3] * x0 - band[r1 + p - 3] * x1 - band[r2 + p - 3] * x2) * invDiag[p - 3];
    y[p] = x0;
    y[p - 1] = x1;
    y[p - 2] = x2;
    y[p - 3] = x3;
    // Row p - 3 starts at p - 3 - w; the three rows below it read their zero pads there.
    for (let k = p - 3 > w ? p - 3 - w : 0; k < p - 3; k++) {
      y[k] = y[k] - band[r0 + k] * x0 - band[r1 + k] * x1 - band[r2 + k] * x2 - band[r3 + k] * x3;
    }
  }
  for (; p >= 0; p--) {
    const r = (p + 1) * s;
    const x = y[p] * invDiag[p];
    y[p] = x;
    for (let k = p > w ? p - w : 0; k < p; k++) y[k] = y[k] - band[r + k] * x;
  }
}

/** false for a 5-point operator: its band can be one narrower (w = nodesY). */
function hasDiagonalCouplings(a: Stencil9): boolean {
  const { northEast, southEast } = a;
  for (let p = 0; p < northEast.length; p++) if (northEast[p] !== 0 || southEast[p] !== 0) return true;
  return false;
}

/** Copies the lower half of the stencil into the band rows (diagonal included): A(p, k) at band[(p + 1) s + k]. */
function fillLowerBand(a: Stencil9, band: Float64Array, s: number, w: number): void {
  const { nodesX: nx, nodesY: ny, diag, east, north, northEast, southEast } = a;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const row = (p + 1) * s;
      band[row + p] = diag[p];
      if (j > 0) band[row + p - 1] = north[p - 1];
      if (i > 0) {
        band[row + p - ny] = east[p - ny];
        if (j > 0 && w > ny) band[row + p - ny - 1] = northEast[p - ny - 1];
        if (j + 1 < ny) band[row + p - ny + 1] = southEast[p - ny + 1];
      }
    }
  }
}
