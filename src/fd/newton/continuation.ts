/**
 * Natural-parameter continuation for the nonlinear fin solvers (1-D and 2-D): when Newton's method fails
 * on the fin as given, solve the fin with its nonlinearity scaled by s (s = 0: the linear fin, s = 1:
 * the fin as given), starting at s = 0 and stepping s up, each stage started from the last converged
 * one. A converged stage doubles the step (at most LARGEST_STEP); a failed one halves it, down to
 * SMALLEST_STEP, where the solve gives up. Dimensionless.
 */

/** What a Newton solve reports, as far as continuation needs it. */
export interface NewtonAttempt<D> {
  readonly converged: boolean;
  readonly iterations: number;
  readonly halvings: number;
  /** The iterate to start the next stage from. */
  readonly drop: D;
}

export interface ContinuationResult<A> {
  /** The converged solve of the fin as given (s = 1). */
  readonly outcome: A;
  /** Newton steps over every stage, including the failed direct attempt and the s = 0 stage. */
  readonly totalIterations: number;
  readonly halvings: number;
  /** Stages after s = 0. */
  readonly stages: number;
}

const FIRST_STEP = 0.25;
const LARGEST_STEP = 0.5;
const SMALLEST_STEP = 2 ** -12;

/**
 * `direct`: the failed Newton solve of the fin as given (its counts are included);
 * `attemptAt(s, from)`: Newton on the fin scaled by s from the iterate `from` (null: the zero drop);
 * `giveUp(attempt, s)`: the error to throw (SolverError with advice) at the last s reached.
 */
export function continueFromLinear<D, A extends NewtonAttempt<D>>(
  direct: A,
  attemptAt: (s: number, from: D | null) => A,
  giveUp: (attempt: A, s: number) => Error,
): ContinuationResult<A> {
  let total = direct.iterations;
  let halvings = direct.halvings;
  let stages = 0;
  let reached = attemptAt(0, null);
  total += reached.iterations;
  if (!reached.converged) throw giveUp(direct, 0);
  let s = 0;
  let ds = FIRST_STEP;
  let last = reached;
  while (s < 1) {
    const target = Math.min(1, s + ds);
    const attempt = attemptAt(target, reached.drop);
    stages++;
    total += attempt.iterations;
    halvings += attempt.halvings;
    last = attempt;
    if (attempt.converged) {
      s = target;
      reached = attempt;
      ds = Math.min(2 * ds, LARGEST_STEP);
    } else {
      ds *= 0.5;
      if (ds < SMALLEST_STEP) throw giveUp(attempt, s);
    }
  }
  return { outcome: last, totalIterations: total, halvings, stages };
}
