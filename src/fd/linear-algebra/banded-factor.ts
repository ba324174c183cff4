/**
 * A stored factorisation of a banded system (banded-cholesky.ts, banded-ldlt.ts): factor once, solve
 * many times.
 */
export interface BandedFactor {
  readonly size: number;
  readonly bandwidth: number;
  /** Solves A x = rhs with the stored factor; writes into `out` when given (it may be `rhs`). */
  solve(rhs: Float64Array, out?: Float64Array): Float64Array;
  /** Says the factor will not be used again: its storage may serve the next factorisation. solve() then throws. */
  release(): void;
}
