/**
 * Banded Cholesky factorisation A = L L^T of a symmetric positive definite 9-point system.
 *
 * With the short (thickness) direction numbered fastest, every coupling lies within w = nodesY + 1 of the
 * diagonal (w = nodesY for a 5-point operator, without diagonal couplings), and so does all the fill-in: L is stored as a dense band, row by row,
 * L(p, q) at band[p * (w + 1) + q - p + w] for p - w <= q <= p.
 * Cost: factor ~ N w^2 / 2 multiply-adds, each solve ~ 2 N w, storage N (w + 1) doubles.
 * Row-oriented (Crout-like) elimination, as in Golub & Van Loan, "Matrix Computations" (4th ed., 2013),
 * Algorithm 4.3.5 (band Cholesky) [from memory]. Factor once, solve as often as needed.
 */
import { SolverError } from '../../errors.js';
import type { BandedFactor } from './banded-factor.js';
import type { Stencil9 } from './stencil9.js';

export interface BandedCholesky extends BandedFactor {
  /** Smallest pivot^2 / A_pp: how much of the diagonal survived the elimination (1e-8 = 8 digits lost). */
  readonly pivotRatio: number;
}

/** Bytes the factor of a grid with these node counts needs (for the automatic solver choice). */
export function bandedCholeskyBytes(nodesX: number, nodesY: number): number {
  return nodesX * nodesY * (nodesY + 3) * 8;
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

/** Failure record filled by finishRow (pivot and unknown of the first non-positive pivot). */
interface PivotFailure {
  pivot: number;
  unknown: number;
}

/** The factor, or the first non-positive pivot (the matrix is then not positive definite). */
export function tryFactorBandedCholesky(a: Stencil9): CholeskyOutcome {
  const failure: PivotFailure = { pivot: Number.NaN, unknown: -1 };
  const ny = a.nodesY;
  const n = a.nodesX * ny;
  const w = hasDiagonalCouplings(a) ? ny + 1 : ny;
  const rowLength = w + 1;
  const band = new Float64Array(n * rowLength);
  const invDiag = new Float64Array(n);
  fillLowerBand(a, band, w);
  let pivotRatio = 1;

  // Rows two at a time (p and s = p + 1) and columns two at a time (q and r = q + 1): each pass over k
  // loads L(p, k), L(s, k), L(q, k), L(r, k) once for four products (2 x 2 register blocking; 1.25x faster
  // than one row with column pairs, 1.7x faster than one dot product at a time, in V8 on 2000 x 20).
  let p = 0;
  for (; p + 1 < n; p += 2) {
    const rowP = p * rowLength - p + w; // band[rowP + q] = L(p, q)
    const rowS = rowP + w; // row p + 1
    const q0P = p > w ? p - w : 0;
    const q0S = p + 1 > w ? p + 1 - w : 0; // row p + 1 starts one column later (or at 0)
    // Row p alone on the columns before row p + 1 starts.
    let q = q0P;
    for (; q < q0S && q < p; q++) {
      const rowQ = q * rowLength - q + w;
      let t = band[rowP + q] as number;
      for (let k = q0P; k < q; k++) t -= (band[rowP + k] as number) * (band[rowQ + k] as number);
      band[rowP + q] = t * (invDiag[q] as number);
    }
    // Both rows, two columns at a time.
    for (; q + 1 < p; q += 2) {
      const rowQ = q * rowLength - q + w;
      const rowR = rowQ + w;
      let pq = 0;
      let pr = 0;
      let sq = 0;
      let sr = 0;
      for (let k = q0P; k < q0S; k++) {
        const x = band[rowP + k] as number;
        pq += x * (band[rowQ + k] as number);
        pr += x * (band[rowR + k] as number);
      }
      for (let k = q0S; k < q; k++) {
        const xp = band[rowP + k] as number;
        const xs = band[rowS + k] as number;
        const yq = band[rowQ + k] as number;
        const yr = band[rowR + k] as number;
        pq += xp * yq;
        pr += xp * yr;
        sq += xs * yq;
        sr += xs * yr;
      }
      const lpq = ((band[rowP + q] as number) - pq) * (invDiag[q] as number);
      const lsq = ((band[rowS + q] as number) - sq) * (invDiag[q] as number);
      band[rowP + q] = lpq;
      band[rowS + q] = lsq;
      const lrq = band[rowR + q] as number; // L(q + 1, q)
      band[rowP + q + 1] = ((band[rowP + q + 1] as number) - pr - lpq * lrq) * (invDiag[q + 1] as number);
      band[rowS + q + 1] = ((band[rowS + q + 1] as number) - sr - lsq * lrq) * (invDiag[q + 1] as number);
    }
    pivotRatio = Math.min(pivotRatio, finishRow(a, band, invDiag, w, p, q, failure));
    if (failure.unknown >= 0) return { ok: false, pivot: failure.pivot, unknown: failure.unknown };
    pivotRatio = Math.min(pivotRatio, finishRow(a, band, invDiag, w, p + 1, q, failure));
    if (failure.unknown >= 0) return { ok: false, pivot: failure.pivot, unknown: failure.unknown };
  }
  if (p < n) pivotRatio = Math.min(pivotRatio, finishRow(a, band, invDiag, w, p, 0, failure));
  if (failure.unknown >= 0) return { ok: false, pivot: failure.pivot, unknown: failure.unknown };

  const factor: BandedCholesky = {
    size: n,
    bandwidth: w,
    pivotRatio,
    solve(rhs: Float64Array, out = new Float64Array(n)): Float64Array {
      if (rhs.length !== n) throw new RangeError(`banded Cholesky: rhs has ${rhs.length} entries, expected ${n}`);
      if (out !== rhs) out.set(rhs);
      triangularSolves(band, invDiag, n, w, out);
      return out;
    },
  };
  return { ok: true, factor };
}

/**
 * Completes row p of L from column qStart (the columns before it are final) and its pivot; returns
 * pivot^2 / A_pp. A non-positive pivot (the matrix is not positive definite) is recorded in `failure`
 * and ends the row.
 */
function finishRow(a: Stencil9, band: Float64Array, invDiag: Float64Array, w: number, p: number, qStart: number, failure: PivotFailure): number {
  const rowLength = w + 1;
  const rowP = p * rowLength - p + w;
  const q0 = p > w ? p - w : 0;
  for (let q = Math.max(qStart, q0); q < p; q++) {
    const rowQ = q * rowLength - q + w;
    let t0 = band[rowP + q] as number;
    let t1 = 0;
    let k = q0;
    for (; k + 1 < q; k += 2) {
      t0 -= (band[rowP + k] as number) * (band[rowQ + k] as number);
      t1 += (band[rowP + k + 1] as number) * (band[rowQ + k + 1] as number);
    }
    if (k < q) t0 -= (band[rowP + k] as number) * (band[rowQ + k] as number);
    band[rowP + q] = (t0 - t1) * (invDiag[q] as number);
  }
  let d = band[rowP + p] as number;
  for (let k = q0; k < p; k++) {
    const l = band[rowP + k] as number;
    d -= l * l;
  }
  if (!(d > 0)) {
    failure.pivot = d;
    failure.unknown = p;
    return Number.NaN;
  }
  const root = Math.sqrt(d);
  band[rowP + p] = root;
  invDiag[p] = 1 / root;
  return d / (a.diag[p] as number);
}

/** y <- L^-T L^-1 y with the band factor. */
function triangularSolves(band: Float64Array, invDiag: Float64Array, n: number, w: number, y: Float64Array): void {
  const rowLength = w + 1;
  for (let p = 0; p < n; p++) {
    const rowP = p * rowLength - p + w;
    const q0 = p > w ? p - w : 0;
    let s0 = y[p] as number;
    let s1 = 0;
    let k = q0;
    for (; k + 1 < p; k += 2) {
      s0 -= (band[rowP + k] as number) * (y[k] as number);
      s1 -= (band[rowP + k + 1] as number) * (y[k + 1] as number);
    }
    if (k < p) s0 -= (band[rowP + k] as number) * (y[k] as number);
    y[p] = (s0 + s1) * (invDiag[p] as number);
  }
  // Backward: x_p = (y_p - sum_{k > p} L(k, p) x_k) / L(p, p); L(k, p) = band[k w + w + p] (stride w, in
  // rows just used, so still in cache: 1.3x faster than updating y column by column).
  for (let p = n - 1; p >= 0; p--) {
    const kEnd = Math.min(n - 1, p + w);
    let s0 = y[p] as number;
    let s1 = 0;
    let k = p + 1;
    let at = (p + 1) * w + w + p;
    for (; k < kEnd; k += 2, at += 2 * w) {
      s0 -= (band[at] as number) * (y[k] as number);
      s1 -= (band[at + w] as number) * (y[k + 1] as number);
    }
    if (k === kEnd) s0 -= (band[at] as number) * (y[k] as number);
    y[p] = (s0 + s1) * (invDiag[p] as number);
  }
}

/** false for a 5-point operator: its band can be one narrower (w = nodesY). */
function hasDiagonalCouplings(a: Stencil9): boolean {
  const { northEast, southEast } = a;
  for (let p = 0; p < northEast.length; p++) if (northEast[p] !== 0 || southEast[p] !== 0) return true;
  return false;
}

/** Copies the lower half of the stencil into the band rows (diagonal included). */
function fillLowerBand(a: Stencil9, band: Float64Array, w: number): void {
  const { nodesX: nx, nodesY: ny, diag, east, north, northEast, southEast } = a;
  const rowLength = w + 1;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const rowP = p * rowLength - p + w;
      band[rowP + p] = diag[p] as number;
      if (j > 0) band[rowP + p - 1] = north[p - 1] as number;
      if (i > 0) {
        band[rowP + p - ny] = east[p - ny] as number;
        if (j > 0 && w > ny) band[rowP + p - ny - 1] = northEast[p - ny - 1] as number;
        if (j + 1 < ny) band[rowP + p - ny + 1] = southEast[p - ny + 1] as number;
      }
    }
  }
}
