/**
 * Solving for the temperature drop below the base instead of the temperature itself.
 *
 * Equation: for A θ = b with row sums s = A·1, the drop δ = θ_ref - θ solves A δ = θ_ref s - b
 * (units: K). The fin's right-hand side then is θ_ref G_i >= 0 in every row (and θ_ref - θ_fixed in a
 * fixed-temperature row), so an M-matrix solver keeps δ to componentwise relative accuracy.
 *
 * Why: the base heat rate K_0 (θ_0 - θ_1) needs the small difference of two nearly equal
 * temperatures when the fin is short or conductive (mL << 1). Stored as θ, that difference carries
 * an absolute error eps θ_b, i.e. a relative error ~ eps N / (mL)^2 (measured 7e-9 for mL = 0.003 on
 * 3 nodes); stored as δ (δ_0 = 0 for a fixed base temperature) it is δ_1 itself, exact to ~N eps.
 * Source of the idea: shifting the unknown by a known solution of the homogeneous part (here the
 * constant θ_ref, up to the convective row sums) is the usual cure for cancellation, cf. Higham, N. J.,
 * Accuracy and Stability of Numerical Algorithms (2nd ed., 2002), §1.7 [from memory for the section].
 */
import type { RowSumSystem } from '../linear-algebra/tridiagonal-system.js';

/** The system for δ = reference - x, sharing lower, diag, upper and rowSum with `system`. */
export function dropSystem(system: RowSumSystem, reference: number, rhs?: Float64Array): RowSumSystem {
  const n = system.diag.length;
  const shifted = rhs ?? new Float64Array(n);
  for (let i = 0; i < n; i++) shifted[i] = reference * (system.rowSum[i] as number) - (system.rhs[i] as number);
  return { lower: system.lower, diag: system.diag, upper: system.upper, rowSum: system.rowSum, rhs: shifted };
}
