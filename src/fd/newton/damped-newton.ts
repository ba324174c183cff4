/**
 * The damped Newton iteration of every nonlinear fin model (1-D: one-d/newton-system.ts, 2-D:
 * two-d/newton-system.ts). The model supplies its state (its unknowns, residual in W), the Newton correction
 * of a state and the constrained step; this driver owns the iteration:
 *
 * Damping: backtracking line search on ||R||_2 (Armijo condition with c = 1e-4, halving the step;
 * Dennis & Schnabel 1983, Numerical Methods for Unconstrained Optimization and Nonlinear Equations,
 * §6.3 [from memory]); trial states with non-finite values (or, for the model, a negative absolute
 * temperature) are rejected. Near round-off (relative residual <= the model's roundOffRegime) the full
 * step is taken: the line search cannot see a decrease there.
 * Convergence (both): relative residual <= residualTolerance, and the base heat rate changed by at most
 * heatRateTolerance relative in the last step, or the model's round-off floor of the heat rate when that
 * is larger. A linear problem is solved by its first step (its heat rate cannot change beyond round-off),
 * so it stops there. Never throws on non-convergence: `failure` says why it stopped.
 */

/** What the driver reads of a state. */
export interface NewtonState {
  /** The unknowns the steps are taken in (the model's choice: drops, potential drops, ambient variables). */
  readonly unknowns: Float64Array;
  /** ||R||_2 and the model's relative residual. */
  norm: number;
  relative: number;
  /** False when the state has non-finite values or is physically impossible. */
  valid: boolean;
}

/** A model's discrete nonlinear system, as the driver uses it. */
export interface NewtonModel<S extends NewtonState> {
  /** True for a linear problem (one step solves it). */
  readonly linear: boolean;
  /** Relative residual below which only full steps are taken. */
  readonly roundOffRegime: number;
  createState(): S;
  /** An array for the Newton correction, as long as the unknowns (default: a new one). */
  correctionArray?(): Float64Array;
  /** Writes the starting unknowns (from the drops `initial`, constraints applied) into `into`. */
  start(initial: Float64Array, into: Float64Array): void;
  /** Fills a state from its drops: residual, norms, validity. */
  evaluate(s: S): void;
  /** The Newton correction of an evaluated state's unknowns, into `delta` (the model may re-express the state's unknowns first). */
  correction(s: S, delta: Float64Array): void;
  /** Unknowns of the trial state, z + λ δz with the model's constraints, into `into`. */
  step(from: Float64Array, delta: Float64Array, lambda: number, into: Float64Array): void;
  /** Base heat rate of an evaluated state, W (per unit depth in 2-D). */
  heatRate(s: S): number;
  /** Relative round-off floor of that heat rate. */
  heatRateFloor(s: S, heatRate: number): number;
}

export interface DampedNewtonOptions {
  readonly maxIterations: number;
  readonly residualTolerance: number;
  readonly heatRateTolerance: number;
}

export interface DampedNewtonOutcome<S> {
  readonly converged: boolean;
  /** The last iterate. */
  readonly state: S;
  /** Newton steps taken. */
  readonly iterations: number;
  /** Step-length halvings of the line search over all steps. */
  readonly halvings: number;
  /** Relative heat-rate change of the last step. */
  readonly heatRateChange: number;
  /** Why it stopped when it did not converge. */
  readonly failure: string | null;
}

const ARMIJO = 1e-4;
const MAX_HALVINGS = 40;

export function dampedNewton<S extends NewtonState>(model: NewtonModel<S>, initial: Float64Array, opts: DampedNewtonOptions): DampedNewtonOutcome<S> {
  const { maxIterations, residualTolerance, heatRateTolerance } = opts;
  let current = model.createState();
  let trial = model.createState();
  const delta = model.correctionArray?.() ?? new Float64Array(initial.length);
  model.start(initial, current.unknowns);
  model.evaluate(current);
  let heatRate = model.heatRate(current);
  let halvings = 0;
  let change = Infinity;
  const outcome = (converged: boolean, iterations: number, failure: string | null): DampedNewtonOutcome<S> => ({
    converged,
    state: current,
    iterations,
    halvings,
    heatRateChange: change,
    failure,
  });
  if (!current.valid) return outcome(false, 0, 'the starting temperatures give a non-finite residual');
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    model.correction(current, delta);
    let lambda = 1;
    const fullStepOnly = current.relative <= model.roundOffRegime;
    for (;;) {
      model.step(current.unknowns, delta, lambda, trial.unknowns);
      model.evaluate(trial);
      if (trial.valid && (fullStepOnly || trial.norm <= (1 - ARMIJO * lambda) * current.norm)) break;
      if (fullStepOnly && !trial.valid) return outcome(false, iteration, 'the Newton step gave non-finite temperatures');
      halvings++;
      lambda *= 0.5;
      if (lambda < 2 ** -MAX_HALVINGS) {
        return outcome(false, iteration, `the line search could not reduce the residual (stalled at ${current.relative.toExponential(2)})`);
      }
    }
    [current, trial] = [trial, current];
    const previous = heatRate;
    heatRate = model.heatRate(current);
    const difference = Math.abs(heatRate - previous);
    change = difference === 0 ? 0 : difference / Math.abs(heatRate);
    const heatRateLimit = Math.max(heatRateTolerance, model.heatRateFloor(current, heatRate));
    if (current.relative <= residualTolerance && (model.linear || change <= heatRateLimit)) return outcome(true, iteration, null);
  }
  return outcome(
    false,
    maxIterations,
    `no convergence in ${maxIterations} Newton steps (relative residual ${current.relative.toExponential(2)}, heat-rate change ${change.toExponential(2)})`,
  );
}
