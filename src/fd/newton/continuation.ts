/**
 * Natural-parameter continuation for the nonlinear fin solvers (1-D and 2-D): when Newton's method fails
 * on the fin as given, solve the fin with its nonlinearity scaled by s (s = 0: the linear fin, s = 1:
 * the fin as given), starting at s = 0 and stepping s up, each stage started from the last converged
 * one. A converged stage doubles the step (at most LARGEST_STEP); a failed one halves it, down to
 * SMALLEST_STEP, where the solve gives up. Dimensionless.
 * Work bound: at most MAX_STAGES stages and WORK_BUDGET Newton steps plus line-search halvings (each one
 * residual evaluation) over every stage, whatever the grid or the clock: without it, a stage sequence that
 * alternates success and failure near SMALLEST_STEP could run ~8000 stages of up to 50 steps of up to 40
 * halvings (a wild k(T) table ran > 10 minutes). The budget is ~20 times the most any continuation in the
 * nonlinear and fuzz test suites used (143, over 18 stages); common practice, no source: a bound a user can
 * wait for, then exit 3 with what to change.
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
export const MAX_STAGES = 64;
export const WORK_BUDGET = 3000;

/**
 * `direct`: the failed Newton solve of the fin as given (its counts are included);
 * `attemptAt(s, from)`: Newton on the fin scaled by s from the iterate `from` (null: the zero drop);
 * `giveUp(attempt, s, budget)`: the error to throw (SolverError with advice) at the last s reached; `budget`
 * says which bound stopped it, in words (null: the step fell below SMALLEST_STEP or s = 0 failed).
 */
export function continueFromLinear<D, A extends NewtonAttempt<D>>(
  direct: A,
  attemptAt: (s: number, from: D | null) => A,
  giveUp: (attempt: A, s: number, budget: string | null) => Error,
): ContinuationResult<A> {
  let total = direct.iterations;
  let halvings = direct.halvings;
  let stages = 0;
  let reached = attemptAt(0, null);
  total += reached.iterations;
  halvings += reached.halvings;
  if (!reached.converged) throw giveUp(direct, 0, null);
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
      if (ds < SMALLEST_STEP) throw giveUp(attempt, s, null);
    }
    if (s < 1 && (stages >= MAX_STAGES || total + halvings >= WORK_BUDGET)) {
      throw giveUp(attempt, s, `continuation stopped at its work bound (${stages} stages, ${total} Newton steps and ${halvings} line-search halvings)`);
    }
  }
  return { outcome: last, totalIterations: total, halvings, stages };
}
