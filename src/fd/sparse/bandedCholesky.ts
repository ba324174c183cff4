/**
 * Banded Cholesky factorisation A = L L^T of a symmetric positive definite 9-point system.
 *
 * With the short (thickness) direction numbered fastest, every coupling lies within w = nodesY + 1 of the
 * diagonal, and so does all the fill-in: L is stored as a dense band, row by row,
 * L(p, q) at band[p * (w + 1) + q - p + w] for p - w <= q <= p.
 * Cost: factor ~ N w^2 / 2 multiply-adds, each solve ~ 2 N w, storage N (w + 1) doubles.
 * Row-oriented (Crout-like) elimination, as in Golub & Van Loan, "Matrix Computations" (4th ed., 2013),
 * Algorithm 4.3.5 (band Cholesky) [from memory]. Factor once, solve as often as needed.
 */
import { SolverError } from '../../errors.js';
import { factorBandedLdltRowSums } from './bandedLdlt.js';
import { coupledRhsNorm1, residual, type Solver2D, type Stencil9, type System2D } from './stencil9.js';

/** A stored factorisation of a banded system: factor once, solve many times. */
export interface BandedFactor {
  readonly size: number;
  readonly bandwidth: number;
  /** Solves A x = rhs with the stored factor; writes into `out` when given (it may be `rhs`). */
  solve(rhs: Float64Array, out?: Float64Array): Float64Array;
}

export interface BandedCholesky extends BandedFactor {
  /** Smallest pivot^2 / A_pp: how much of the diagonal survived the elimination (1e-8 = 8 digits lost). */
  readonly pivotRatio: number;
}

/** Bytes the factor of a grid with these node counts needs (for the automatic solver choice). */
export function bandedCholeskyBytes(nodesX: number, nodesY: number): number {
  return nodesX * nodesY * (nodesY + 3) * 8;
}

export function factorBandedCholesky(a: Stencil9): BandedCholesky {
  const ny = a.nodesY;
  const n = a.nodesX * ny;
  const w = ny + 1;
  const rowLength = w + 1;
  const band = new Float64Array(n * rowLength);
  const invDiag = new Float64Array(n);
  fillLowerBand(a, band, w);
  let pivotRatio = 1;

  for (let p = 0; p < n; p++) {
    const rowP = p * rowLength - p + w; // band[rowP + q] = L(p, q)
    const q0 = p > w ? p - w : 0;
    // L(p, q) = (A(p, q) - sum_k L(p, k) L(q, k)) / L(q, q), two q at a time so that the loads of row p
    // are shared (about 1.4x faster in V8 than one dot product at a time).
    let q = q0;
    for (; q + 1 < p; q += 2) {
      const rowQ = q * rowLength - q + w;
      const rowR = rowQ + w; // row q + 1
      let a0 = 0;
      let a1 = 0;
      let b0 = 0;
      let b1 = 0;
      let k = q0;
      for (; k + 1 < q; k += 2) {
        const x0 = band[rowP + k] as number;
        const x1 = band[rowP + k + 1] as number;
        a0 += x0 * (band[rowQ + k] as number);
        a1 += x1 * (band[rowQ + k + 1] as number);
        b0 += x0 * (band[rowR + k] as number);
        b1 += x1 * (band[rowR + k + 1] as number);
      }
      if (k < q) {
        const x0 = band[rowP + k] as number;
        a0 += x0 * (band[rowQ + k] as number);
        b0 += x0 * (band[rowR + k] as number);
      }
      const lq = ((band[rowP + q] as number) - a0 - a1) * (invDiag[q] as number);
      band[rowP + q] = lq;
      band[rowP + q + 1] = ((band[rowP + q + 1] as number) - b0 - b1 - lq * (band[rowR + q] as number)) * (invDiag[q + 1] as number);
    }
    if (q < p) {
      const rowQ = q * rowLength - q + w;
      let s = band[rowP + q] as number;
      for (let k = q0; k < q; k++) s -= (band[rowP + k] as number) * (band[rowQ + k] as number);
      band[rowP + q] = s * (invDiag[q] as number);
    }
    let d = band[rowP + p] as number;
    for (let k = q0; k < p; k++) {
      const l = band[rowP + k] as number;
      d -= l * l;
    }
    if (!(d > 0)) {
      throw new SolverError(
        `banded Cholesky: the 2-D system is not positive definite (pivot ${d.toExponential(3)} at unknown ${p}); check the boundary conditions`,
      );
    }
    pivotRatio = Math.min(pivotRatio, d / (a.diag[p] as number));
    const root = Math.sqrt(d);
    band[rowP + p] = root;
    invDiag[p] = 1 / root;
  }

  return {
    size: n,
    bandwidth: w,
    pivotRatio,
    solve(rhs: Float64Array, out = new Float64Array(n)): Float64Array {
      if (rhs.length !== n) throw new RangeError(`banded Cholesky: rhs has ${rhs.length} entries, expected ${n}`);
      const y = out;
      if (y !== rhs) y.set(rhs);
      // Forward: L y = b.
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
      // Backward: L^T x = y, column by column so that the band is read row-wise.
      for (let p = n - 1; p >= 0; p--) {
        const rowP = p * rowLength - p + w;
        const q0 = p > w ? p - w : 0;
        const xp = (y[p] as number) * (invDiag[p] as number);
        y[p] = xp;
        for (let k = q0; k < p; k++) y[k] = (y[k] as number) - (band[rowP + k] as number) * xp;
      }
      return y;
    },
  };
}

/**
 * Refinement target for |r|_1 relative to the coupled rows' |rhs|_1 (residual in difference form when the
 * system carries its row sums). On very elongated cells the couplings across the fin exceed those along
 * it by (dx/dy)^2, and round-off in the large ones shows in the small heat flows; iterative refinement
 * in working precision with an accurate residual removes it (Skeel 1980, Math. Comp. 35, 817-832 [from
 * memory]). The energy balance of a fin solution was measured at ~40x this relative residual (thin
 * annular fins, cell aspect up to 40: one unrefined solve gave 4.7e-11 and a balance of 1.9e-9), so
 * 1e-12 keeps balances near 4e-11 while typical grids (~3e-13) need no refinement step.
 */
const REFINE_TOLERANCE = 1e-12;
/**
 * A Cholesky factor whose pivots kept at least this fraction of their diagonal has not lost the small
 * heat flows: measured relative residuals <= 2.2e-12 (energy balance ~1e-10) on the fin grids, where the
 * grids that needed refinement had pivot ratios of 4e-4 and below. The residual check is then skipped
 * (it costs about a third of the solve on thin grids).
 */
const HEALTHY_PIVOT_RATIO = 1e-2;
const MAX_REFINEMENTS = 4;

/**
 * Below this pivot ratio ordinary Cholesky has lost more than half the digits of some pivot (couplings of
 * very different sizes): the row-sum-preserving LDL^T is used instead (bandedLdlt.ts).
 */
const CANCELLATION_LIMIT = 1e-8;

/**
 * The factor of a 2-D system: Cholesky, or when it shows cancellation (or fails) and the system carries
 * its exact row sums, the row-sum-preserving LDL^T.
 */
export function factorBanded(system: System2D): BandedFactor {
  try {
    const f = factorBandedCholesky(system.matrix);
    if (f.pivotRatio >= CANCELLATION_LIMIT || system.excess === undefined) return f;
  } catch (e) {
    if (!(e instanceof SolverError) || system.excess === undefined) throw e;
  }
  return factorBandedLdltRowSums(system.matrix, system.excess);
}

/**
 * Solve with a stored factor, then refine while the residual is above round-off: until |r|_1 is below
 * REFINE_TOLERANCE times the right-hand side of the coupled rows (rows of fixed nodes are identities and
 * carry no heat flow), or stops falling by half (its evaluation has reached round-off), at most
 * MAX_REFINEMENTS steps.
 */
export function solveWithRefinement(factor: BandedFactor, system: System2D): Float64Array {
  const x = factor.solve(system.rhs);
  if ('pivotRatio' in factor && (factor as BandedCholesky).pivotRatio >= HEALTHY_PIVOT_RATIO) return x;
  const scale = coupledRhsNorm1(system);
  const r: Float64Array = new Float64Array(x.length);
  residual(system, x, r);
  let size = norm1(r);
  for (let step = 0; step < MAX_REFINEMENTS && size > REFINE_TOLERANCE * scale; step++) {
    const dx = factor.solve(r);
    for (let p = 0; p < x.length; p++) x[p] = (x[p] as number) + (dx[p] as number);
    residual(system, x, r);
    const next = norm1(r);
    if (next > 0.5 * size) break;
    size = next;
  }
  return x;
}

/** One-shot solver: factor, solve, refine if needed. */
export const bandedCholeskySolver: Solver2D = (system: System2D) => solveWithRefinement(factorBanded(system), system);

function norm1(v: Float64Array): number {
  let s = 0;
  for (let p = 0; p < v.length; p++) s += Math.abs(v[p] as number);
  return s;
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
        if (j > 0) band[rowP + p - ny - 1] = northEast[p - ny - 1] as number;
        if (j + 1 < ny) band[rowP + p - ny + 1] = southEast[p - ny + 1] as number;
      }
    }
  }
}
