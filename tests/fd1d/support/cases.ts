/**
 * Builders of normalised cases for the fd-1d tests (SI units, degC). Inputs are the published check
 * cases or invented values; every builder returns a case narrowed to the linear solver's type.
 */
import type { Case, HDistribution, Profile, TipCondition } from '../../../src/case/types.js';
import { isLinearFinCase, type LinearFinCase } from '../../../src/fd/problem/linear-case.js';

export interface CaseInputs {
  profile: Profile;
  k: number;
  h: HDistribution;
  tip: TipCondition;
  /** Base excess temperature θ_b, K (ambient is 20 degC). */
  thetaBase: number;
  edges?: 'cooled' | 'insulated';
  contactResistance?: number;
}

export const AMBIENT_DEGC = 20;

export function linearCase(inputs: CaseInputs): LinearFinCase {
  const c: Case = {
    name: 'test case',
    fin: { profile: inputs.profile, edges: inputs.edges ?? 'cooled' },
    material: { name: 'custom', k: { kind: 'constant', k: inputs.k }, source: 'given in the case file' },
    convection: {
      ambient_degC: AMBIENT_DEGC,
      h: inputs.h,
      tip: inputs.tip,
      emissivity: 0,
      surroundings_degC: AMBIENT_DEGC,
    },
    base: { T_degC: AMBIENT_DEGC + inputs.thetaBase, contactResistance: inputs.contactResistance ?? 0 },
  };
  if (!isLinearFinCase(c)) throw new Error('test case is not linear');
  return c;
}

/** Relative difference (a - b) / b. */
export function relative(a: number, b: number): number {
  return (a - b) / b;
}
