/**
 * A tridiagonal system as plain typed arrays, and the type of a direct solver (tridiagonal.ts,
 * conservative-thomas.ts). Row i (0 <= i < n): lower[i] x[i-1] + diag[i] x[i] + upper[i] x[i+1] = rhs[i];
 * lower[0] and upper[n-1] are never read. Units are the caller's (for the fin: W/K, K and W).
 */
export interface TridiagonalSystem {
  readonly lower: Float64Array;
  readonly diag: Float64Array;
  readonly upper: Float64Array;
  readonly rhs: Float64Array;
  /**
   * Optional row sums diag[i] + lower[i] + upper[i] (lower[0] and upper[n-1] taken as 0), formed
   * from their parts before rounding. In a diagonally dominant M-matrix the diagonal in floating
   * point has lost most digits of this small sum; the row-sum solvers use it instead.
   */
  readonly rowSum?: Float64Array;
}

/** A system that carries its row sums, as the fin assembly returns. */
export type RowSumSystem = Required<TridiagonalSystem>;

/** A direct solver: returns x with A x = rhs (a new array). */
export type TridiagonalSolver = (system: TridiagonalSystem) => Float64Array;

/** A zeroed system of n rows (with row sums). */
export function createTridiagonalSystem(n: number): RowSumSystem {
  return {
    lower: new Float64Array(n),
    diag: new Float64Array(n),
    upper: new Float64Array(n),
    rhs: new Float64Array(n),
    rowSum: new Float64Array(n),
  };
}
