/**
 * The banded direct solve of a 2-D system: the chooser above the two band factorisations (Cholesky,
 * banded-cholesky.ts; the row-sum-preserving LDL^T, banded-ldlt.ts) and iterative refinement of the
 * solution. Units are the caller's (for the fin: W/K, K and W per unit depth).
 */
import { notPositiveDefinite, tryFactorBandedCholesky, type BandedCholesky } from './banded-cholesky.js';
import type { BandedFactor } from './banded-factor.js';
import { factorBandedLdltRowSums } from './banded-ldlt.js';
import { refineSolution } from './iterative-refinement.js';
import type { Solver2D, System2D } from './stencil9.js';

/**
 * A Cholesky factor whose pivots kept at least this fraction of their diagonal has not lost the small
 * heat flows: measured relative residuals <= 2.2e-12 (energy balance ~1e-10) on the fin grids, where the
 * grids that needed refinement had pivot ratios of 4e-4 and below. The residual check is then skipped
 * (it costs about a third of the solve on thin grids).
 */
const HEALTHY_PIVOT_RATIO = 1e-2;

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
 * Solve with a stored factor, then refine while the residual is above round-off (iterative-refinement.ts); a
 * Cholesky factor with healthy pivots is taken as it is.
 */
export function solveWithRefinement(factor: BandedFactor, system: System2D): Float64Array {
  const x = factor.solve(system.rhs);
  if ('pivotRatio' in factor && (factor as BandedCholesky).pivotRatio >= HEALTHY_PIVOT_RATIO) return x;
  refineSolution((r, out) => factor.solve(r, out), system, x);
  return x;
}

/** One-shot solver: factor, solve, refine if needed. */
export const bandedCholeskySolver: Solver2D = (system: System2D) => {
  const factor = factorBanded(system);
  const x = solveWithRefinement(factor, system);
  factor.release();
  return x;
};
