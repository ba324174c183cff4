/**
 * One denominator for every effectiveness of a check or a solve: ε = Q / Q_bare, with
 * Q_bare = h_b A_b θ_b the heat the bare base area the fin covers would exchange at the base temperature
 * (Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., 2007, Eq. 3.81).
 * A nonlinear fin's h_b is its h and radiation at the base temperature as one equivalent h (linear-surrogate.ts,
 * the base guess). Units: W.
 * Undefined where Q_bare = 0: h = 0 at the base (a linear or tabulated h that starts from 0) and no radiation
 * to make up for it. The formula then gives infinity, which says only that the base had no h, not how good
 * the fin is: null with the reason (the efficiency and the heat rate still describe the fin).
 */
import type { Case } from '../case/index.js';
import { finGeometry } from '../mesh/index.js';
import { baseTemperatureH } from './linear-surrogate.js';

export interface EffectivenessBasis {
  /** Q_bare, W; null where it is 0 (no effectiveness). */
  bareBaseHeatRate: number | null;
  /** Why the effectiveness is null; null when it is a number. */
  note: string | null;
}

export const ZERO_BARE_BASE_NOTE =
  'no effectiveness: h is 0 at the base, so the bare base area would exchange no heat (the denominator h_b A_b theta_b is 0); compare heat rates and the efficiency instead';

/** The basis from the bare base's heat rate (W; 0 or not finite: no effectiveness). */
export function effectivenessBasisOf(bareBaseHeatRate: number): EffectivenessBasis {
  return bareBaseHeatRate !== 0 && Number.isFinite(bareBaseHeatRate)
    ? { bareBaseHeatRate, note: null }
    : { bareBaseHeatRate: null, note: ZERO_BARE_BASE_NOTE };
}

/** The basis of a case: Q_bare = h_b A_b θ_b with h_b the base guess's h at the base. */
export function effectivenessBasis(c: Case): EffectivenessBasis {
  return effectivenessBasisOf(baseTemperatureH(c).atBase * finGeometry(c).baseArea * (c.base.T_degC - c.convection.ambient_degC));
}

/** Q / Q_bare, or null without a denominator. */
export function effectivenessOf(heatRate: number, basis: EffectivenessBasis): number | null {
  return basis.bareBaseHeatRate === null ? null : heatRate / basis.bareBaseHeatRate;
}

/** A model's own effectiveness (the solver's Q / Q_bare), or null where the basis has none. */
export function definedEffectiveness(effectiveness: number, basis: EffectivenessBasis): number | null {
  return basis.bareBaseHeatRate === null ? null : effectiveness;
}
