/**
 * Which model covers which fin, asked before solving (no try/catch as a question): fd-1d covers every
 * fin of the problem type; fd-2d covers every fin but these two (an infinite fin has no tip section to
 * grid, so the 2-D model cuts it and closes the cut with its slowest 2-D mode, two-d/problem.ts):
 * - an infinite tip on a fin that is not uniform (rectangular or pin with a uniform h): the closing mode
 *   is exact only for a uniform fin;
 * - an infinite tip on a nonlinear fin: a nonlinear fin has no such mode.
 */
import { ModelNotApplicableError } from '../../errors.js';
import { isLinearProblem, type FinProblem } from './fin-problem.js';

/** The models of the fin: 1-D along the fin, 2-D across its thickness. */
export type FinModel = '1d' | '2d';

/** Whether a model covers a fin, and why not when it does not (in the problem's words). */
export type ModelCoverage = { readonly ok: true } | { readonly ok: false; readonly reason: string };

export function modelApplies(problem: FinProblem, model: FinModel): ModelCoverage {
  if (model === '1d') return { ok: true };
  if (problem.tip.kind === 'infinite') {
    if (!isLinearProblem(problem)) {
      return { ok: false, reason: 'an infinite tip of a nonlinear fin is not modelled in 2-D (the cut fin is closed by a linear mode)' };
    }
    const kind = problem.profile.kind;
    if ((kind !== 'rectangular' && kind !== 'pin') || problem.h.kind !== 'uniform') {
      return { ok: false, reason: 'an infinite tip needs a uniform fin (rectangular or pin) with a uniform h' };
    }
  }
  return { ok: true };
}

/** The model id of the output contract. */
export function modelId(model: FinModel): 'fd-1d' | 'fd-2d' {
  return model === '1d' ? 'fd-1d' : 'fd-2d';
}

/** Throws ModelNotApplicableError (the reason in the problem's words) unless the model covers the fin. */
export function requireModel(problem: FinProblem, model: FinModel): void {
  const coverage = modelApplies(problem, model);
  if (!coverage.ok) throw new ModelNotApplicableError(modelId(model), coverage.reason);
}

/** What makes a fin nonlinear, in words (null for a linear fin): what the linear solvers do not model. */
export function nonlinearity(problem: FinProblem): string | null {
  if (problem.conductivity.kind !== 'constant') return 'temperature-dependent conductivity';
  if (problem.exponent !== 0) return 'the power-law h (theta-dependent)';
  if (problem.radiation.emissivity > 0) return 'radiation from the faces';
  return null;
}
