/**
 * The one builder of normalised cases (SI units, temperatures in degC) for the tests and benchmarks: a fin is
 * its profile, conductivity, surface law, tip and base; everything a test does not name takes a plain
 * default (side edges insulated, ambient 20 degC, adiabatic tip, no radiation, no contact resistance).
 * The inputs are invented unless the test names a source beside them.
 */
import type { Case, Conductivity, HDistribution, Profile, TipCondition } from '../../src/case/index.js';
import { isLinearFinCase, type LinearFinCase } from '../../src/fd/index.js';

/** Ambient (fluid) temperature of every test case that does not set its own, degC. */
export const AMBIENT_DEGC = 20;

export interface FinInputs {
  readonly profile: Profile;
  /** Thermal conductivity: a constant in W/(m K), or a law over temperature. */
  readonly k: number | Conductivity;
  readonly h: HDistribution;
  /** Default: adiabatic. */
  readonly tip?: TipCondition;
  /** Straight fins: whether the two thin side edges convect. Default: insulated (per metre of width). */
  readonly edges?: 'cooled' | 'insulated';
  /** Default: AMBIENT_DEGC. */
  readonly ambient_degC?: number;
  /** Base temperature, degC; or give thetaBase instead. */
  readonly base_degC?: number;
  /** Base excess temperature over the ambient, K; or give base_degC instead. */
  readonly thetaBase?: number;
  /** Surface emissivity. Default: 0 (no radiation). */
  readonly emissivity?: number;
  /** Radiating surroundings, degC. Default: the ambient. */
  readonly surroundings_degC?: number;
  /** Base contact resistance, m^2 K/W. Default: 0. */
  readonly contactResistance?: number;
}

export const constantK = (k: number): Conductivity => ({ kind: 'constant', k });

export function finCase(inputs: FinInputs): Case {
  const ambient = inputs.ambient_degC ?? AMBIENT_DEGC;
  if ((inputs.base_degC === undefined) === (inputs.thetaBase === undefined)) throw new Error('test case: give base_degC or thetaBase');
  const base_degC = inputs.base_degC ?? ambient + (inputs.thetaBase as number);
  return {
    name: 'test fin',
    fin: { profile: inputs.profile, edges: inputs.edges ?? 'insulated' },
    material: { name: 'custom', k: typeof inputs.k === 'number' ? constantK(inputs.k) : inputs.k, source: 'given in the case file' },
    convection: {
      ambient_degC: ambient,
      h: inputs.h,
      tip: inputs.tip ?? { kind: 'adiabatic' },
      emissivity: inputs.emissivity ?? 0,
      surroundings_degC: inputs.surroundings_degC ?? ambient,
    },
    base: { T_degC: base_degC, contactResistance: inputs.contactResistance ?? 0 },
  };
}

/** finCase narrowed to the linear solver's type (throws when the inputs make a nonlinear fin). */
export function linearFinCase(inputs: FinInputs): LinearFinCase {
  const c = finCase(inputs);
  if (!isLinearFinCase(c)) throw new Error('test case is not linear');
  return c;
}

/** Relative difference (a - b) / b. */
export function relative(a: number, b: number): number {
  return (a - b) / b;
}
