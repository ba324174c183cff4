/**
 * Sensitivities of the reference heat rate: S_x = d ln Q / d ln x for every numeric input x of the case
 * (src/case numeric-inputs.ts), by central differences of the reference model on its finest grid:
 *   S_x = (Q(x (1 + d)) - Q(x (1 - d))) / (2 d Q(x)),   d = 1e-4 (SENSITIVITY_STEP).
 * Error: the truncation error is d^2 S''' / 6 ~ 1e-8 for the smooth Q(x) of a fin, and round-off ~ eps Q / d
 * ~ 1e-12 (a direct solve) or the Newton tolerance / d ~ 1e-8 (a nonlinear fin): both far below the 1e-6 the
 * tests ask of it. The grid is held fixed (reference-rate.ts), so S is the derivative of the discrete heat
 * rate, which differs from the exact fin's by the discretisation error (the reference's GCI, relative).
 * Perturbed re-solves take every input alike (geometry, nonlinear laws, both models) at 2 solves per input;
 * a linear fin with the fd-2d reference takes the discrete adjoint instead (sensitivitiesFrom with
 * reference-rate.ts adjointReferenceRate: one extra solve for all inputs, exact for the discrete system, the
 * same derivative as the re-solves up to their O(d^2) truncation). One exception, exact: a linear fin's Q is
 * proportional to the base temperature rise (the problem is linear and homogeneous in theta), so S = 1 for
 * base.temperature without a solve.
 * Units: dimensionless.
 */
import { numericInputs, type Case, type NumericInput } from '../case/index.js';
import type { Sensitivity } from './types.js';

/** Relative step of the central differences (module header). */
export const SENSITIVITY_STEP = 1e-4;

/**
 * S_x for every input, with the input's relative uncertainty from `uncertainty` (key -> relative, 0 when absent).
 * `rate(variant)` is the reference heat rate on fixed grids, `nominal` its value for the case itself.
 */
export function sensitivities(
  c: Case,
  rate: (variant: Case) => number,
  nominal: number,
  uncertainty: ReadonlyMap<string, number>,
  linear: boolean,
): Sensitivity[] {
  const d = SENSITIVITY_STEP;
  const derivative = (input: NumericInput): number => (rate(input.scale(1 + d)) - rate(input.scale(1 - d))) / (2 * d);
  return sensitivitiesFrom(c, derivative, nominal, uncertainty, linear, 'central-difference');
}

/**
 * S_x = (dQ/df) / Q for every input from `derivative(input)` = dQ/df at f = 1 (W, f the input's scale factor),
 * computed by `method`; a linear fin's base temperature exactly (module header).
 */
export function sensitivitiesFrom(
  c: Case,
  derivative: (input: NumericInput) => number,
  nominal: number,
  uncertainty: ReadonlyMap<string, number>,
  linear: boolean,
  method: 'central-difference' | 'adjoint',
): Sensitivity[] {
  return numericInputs(c).map((input) => {
    // A linear fin's excess temperature, and so Q, is proportional to the base rise: S = 1 exactly.
    if (linear && input.key === 'base.temperature')
      return { key: input.key, dlnQ_dlnx: 1, method: 'exact' as const, value: input.nominal, uncertainty: uncertainty.get(input.key) ?? 0 };
    return {
      key: input.key,
      dlnQ_dlnx: derivative(input) / nominal,
      method,
      value: input.nominal,
      uncertainty: uncertainty.get(input.key) ?? 0,
    };
  });
}
