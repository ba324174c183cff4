/** How Newton's method went on one grid (1-D and 2-D). */
export interface NewtonReport {
  /** Newton steps on this grid (the last continuation stage, if any). */
  readonly iterations: number;
  /** Newton steps on this grid over every attempt and stage. */
  readonly totalIterations: number;
  /** Newton steps spent on the coarser grids that started this one. */
  readonly coarseGridIterations: number;
  /** Step-length halvings of the line search. */
  readonly halvings: number;
  /** Continuation stages (0: plain Newton converged). */
  readonly continuationStages: number;
  /** Final relative residual and relative heat-rate change of the last step. */
  readonly residual: number;
  readonly heatRateChange: number;
}
