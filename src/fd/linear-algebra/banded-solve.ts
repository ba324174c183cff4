/**
 * The banded direct solve of a 2-D system: the chooser above the two band factorisations (Cholesky,
 * banded-cholesky.ts; the row-sum-preserving LDL^T, banded-ldlt.ts) and iterative refinement of the
 * solution. Units are the caller's (for the fin: W/K, K and W per unit depth).
 */
import { notPositiveDefinite, tryFactorBandedCholesky, type BandedCholesky } from './banded-cholesky.js';
import type { BandedFactor } from './banded-factor.js';
import { factorBandedLdltRowSums } from './banded-ldlt.js';
import { coupledRhsNorm1, residual, type Solver2D, type System2D } from './stencil9.js';

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
 * very different sizes): the row-sum-preserving LDL^T is used instead (banded-ldlt.ts).
 */
const CANCELLATION_LIMIT = 1e-8;

/**
 * The factor of a 2-D system: Cholesky, or when it shows cancellation (or fails) and the system carries
 * its exact row sums, the row-sum-preserving LDL^T.
 */
export function factorBanded(system: System2D): BandedFactor {
  const cholesky = tryFactorBandedCholesky(system.matrix);
  if (system.excess === undefined) {
    if (!cholesky.ok) throw notPositiveDefinite(cholesky);
    return cholesky.factor;
  }
  if (cholesky.ok && cholesky.factor.pivotRatio >= CANCELLATION_LIMIT) return cholesky.factor;
  if (cholesky.ok) cholesky.factor.release();
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
export const bandedCholeskySolver: Solver2D = (system: System2D) => {
  const factor = factorBanded(system);
  const x = solveWithRefinement(factor, system);
  factor.release();
  return x;
};

function norm1(v: Float64Array): number {
  let s = 0;
  for (let p = 0; p < v.length; p++) s += Math.abs(v[p] as number);
  return s;
}
