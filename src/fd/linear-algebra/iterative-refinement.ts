/**
 * Iterative refinement of a 2-D solution: x <- x + S(r), r = rhs - A x evaluated accurately (in difference form
 * when the system carries its row sums, stencil9.ts), S any approximate or exact solver of A. Each step multiplies
 * the error by (I - S A); in working precision with an accurate residual it removes the round-off of the factor
 * or of the approximation (Skeel 1980, Math. Comp. 35, 817-832 [from memory]). Units are the caller's.
 */
import { coupledRhsNorm1, residual, type System2D } from './stencil9.js';
import { norm1 } from './vector-ops.js';

/**
 * Refinement target for |r|_1 relative to the coupled rows' |rhs|_1 (residual in difference form when the
 * system carries its row sums). On very elongated cells the couplings across the fin exceed those along
 * it by (dx/dy)^2, and round-off in the large ones shows in the small heat flows; refinement with an
 * accurate residual removes it. The energy balance of a fin solution was measured at ~40x this relative residual
 * (thin annular fins, cell aspect up to 40: one unrefined solve gave 4.7e-11 and a balance of 1.9e-9), so
 * 1e-12 keeps balances near 4e-11 while typical grids (~3e-13) need no refinement step.
 */
export const REFINE_TOLERANCE = 1e-12;
export const MAX_REFINEMENTS = 4;
/**
 * The fraction of roundOffFloor at which refinement may stop early: the residual of a refined banded Cholesky
 * solution stalled at 0.2 of it (demo fin, 205 x 33 grid), so a residual below 0.25 of it is where that one ends.
 */
const FLOOR_FRACTION = 0.25;

/**
 * Refines x in place until |r|_1 <= REFINE_TOLERANCE times the right-hand side of the coupled rows (rows of fixed
 * nodes are identities and carry no heat flow), or |r|_1 stops falling by half (its evaluation has reached
 * round-off), at most `maxSteps` steps. `toFloor` replaces the first target by FLOOR_FRACTION of the round-off floor
 * of x (roundOffFloor), for an approximate solver whose first answer may meet 1e-12 of a large right-hand side (a
 * Newton correction's) and still be short of what a direct factor gives. Returns whether the result is as accurate
 * as the residual can tell: the target reached, or |r|_1 within that floor.
 */
export function refineSolution(
  solve: (rhs: Float64Array, out: Float64Array) => Float64Array,
  system: System2D,
  x: Float64Array,
  maxSteps: number = MAX_REFINEMENTS,
  toFloor = false,
): boolean {
  const target = REFINE_TOLERANCE * coupledRhsNorm1(system);
  const r = new Float64Array(x.length);
  residual(system, x, r);
  let size = norm1(r);
  const enough = (): boolean => (toFloor ? size <= FLOOR_FRACTION * roundOffFloor(system, x) : size <= target);
  if (enough()) return true;
  const dx = new Float64Array(x.length);
  for (let step = 0; step < maxSteps; step++) {
    solve(r, dx);
    for (let p = 0; p < x.length; p++) x[p] = (x[p] as number) + (dx[p] as number);
    residual(system, x, r);
    const next = norm1(r);
    const stalled = next > 0.5 * size;
    size = Math.min(size, next);
    if (stalled || enough()) break;
  }
  return size <= target || size <= roundOffFloor(system, x);
}

/**
 * eps sum_p A_pp |x_p|: the part of |r|_1 that rounding x to doubles alone leaves (each x_p is known to eps |x_p|,
 * and the couplings of row p turn that into heat flows of up to A_pp eps |x_p|). Measured on the demo fin's 205 x
 * 33 grid: the residual of a refined banded Cholesky solution stalls at 0.2 times this.
 */
export function roundOffFloor(system: System2D, x: Float64Array): number {
  const diag = system.matrix.diag;
  let s = 0;
  for (let p = 0; p < x.length; p++) s += Math.abs((diag[p] as number) * (x[p] as number));
  return Number.EPSILON * s;
}
