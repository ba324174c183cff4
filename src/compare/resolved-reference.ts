/**
 * A verdict is never given on an unresolved reference. The reference is resolved when its estimated
 * discretisation error (GCI, Celik et al. 2008, J. Fluids Eng. 130(7), 078001) is at most a tenth of the
 * tolerance: the drift is then known to within a tenth of the band it is judged against, so an `ok` at
 * 0.9 tolerance cannot be an `marginal` in truth by more than the last tenth (common practice, no source:
 * the usual advice is a numerical error an order of magnitude below the quantity one judges).
 *
 * fd-1d: the study is refined first (fd/study/resolve-study1d.ts, resolveFinStudy1D: grading to the decay length 1/m, doubling
 * within a budget). fd-2d: the study's own grids; where they do not reach the target the check falls back
 * to a resolved fd-1d reference (an automatic reference) or gives `unresolved` verdicts (a 2-D reference asked for).
 */
import type { FinStudy2D, Resolution } from '../fd/index.js';
import { efficiencyOf, type EfficiencyBasis } from './efficiency-basis.js';
import type { EffectivenessBasis } from './effectiveness-basis.js';
import type { ReferenceResolution, ReferenceResult, UnjudgedReference } from './types.js';

/** The share of the tolerance the reference's discretisation error may use. */
export const RESOLUTION_SHARE = 0.1;

export function resolutionTarget(tolerance: number): number {
  return RESOLUTION_SHARE * tolerance;
}

export function resolution1D(r: Resolution): ReferenceResolution {
  return { target: r.target, refinements: r.refinements, grids: r.nodes.map((n) => `${n}`), grading: r.grading, budget: r.budget };
}

export function resolution2D(study: FinStudy2D, target: number): ReferenceResolution {
  return {
    target,
    refinements: 0,
    grids: study.grids.map((g) => `${g.nx}x${g.ny}`).reverse(),
    grading: 'the 2-D study grids',
    budget: 'the fd-2d study grids (not refined further; an unresolved fd-2d study hands the reference to fd-1d under an automatic reference)',
  };
}

/**
 * The reference with its resolution (resolved when its GCI is at most the target; a NaN GCI is not), its
 * efficiency on the check's one surface (efficiency-basis.ts) and why its effectiveness is null, if it is
 * (effectiveness-basis.ts).
 */
export function judgedReference(
  ref: UnjudgedReference,
  resolution: ReferenceResolution,
  basis: EfficiencyBasis,
  effectiveness: EffectivenessBasis,
): ReferenceResult {
  const resolved = ref.discretizationError <= resolution.target;
  const words = resolved
    ? ''
    : `; NOT RESOLVED: estimated error ${ref.discretizationError.toExponential(1)} > ${resolution.target.toExponential(1)} (a tenth of the tolerance) after ${resolution.refinements} refinements (${resolution.budget}): verdicts are 'unresolved'`;
  return {
    ...ref,
    efficiency: efficiencyOf(ref.heatRate_W, basis),
    efficiencyNote: basis.note,
    effectivenessNote: effectiveness.note,
    note: `${ref.note}${words}`,
    resolved,
    resolution,
  };
}

/**
 * The fd-2d reference when it is resolved; under an automatic reference an unresolved 2-D study hands the
 * reference to fd-1d (the note says so), with a 2-D reference asked for it stays and its verdicts are unresolved.
 */
export function choose2DReference<T extends { reference: UnjudgedReference; study: FinStudy2D }>(
  twoD: T | null,
  required: boolean,
  target: number,
): { twoD: T | null; fallback: string } {
  if (twoD === null || required || twoD.reference.discretizationError <= target) return { twoD, fallback: '' };
  return {
    twoD: null,
    fallback: `; fd-2d was not resolved (estimated error ${twoD.reference.discretizationError.toExponential(1)} > ${target.toExponential(1)}), so fd-1d is the reference`,
  };
}
