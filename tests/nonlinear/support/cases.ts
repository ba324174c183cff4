/**
 * Builders of normalised cases for the nonlinear fd-1d tests (SI units, degC), and the uniform fins
 * of the first-integral oracles (computed reference values, nonlinear.py; closed forms of Sen & Trinh 1986,
 * Aziz & Enamul-Huq 1975): a straight fin per metre of width with insulated edges (A = t * 1 m, P = 2 m)
 * and a pin. Inputs are invented; the oracles are dimensionless.
 */
import type { Case, Conductivity, HDistribution, Profile, TipCondition } from '../../../src/case/types.js';

export const AMBIENT_DEGC = 20;
export const KELVIN = 273.15;

export interface NonlinearInputs {
  profile: Profile;
  edges?: 'cooled' | 'insulated';
  k: Conductivity;
  h: HDistribution;
  tip: TipCondition;
  /** Base temperature, degC. */
  base_degC: number;
  ambient_degC?: number;
  emissivity?: number;
  /** Radiating surroundings, degC (default: ambient). */
  surroundings_degC?: number;
  contactResistance?: number;
}

export function nonlinearCase(inputs: NonlinearInputs): Case {
  const ambient = inputs.ambient_degC ?? AMBIENT_DEGC;
  return {
    name: 'nonlinear test case',
    fin: { profile: inputs.profile, edges: inputs.edges ?? 'insulated' },
    material: { name: 'custom', k: inputs.k, source: 'given in the case file' },
    convection: {
      ambient_degC: ambient,
      h: inputs.h,
      tip: inputs.tip,
      emissivity: inputs.emissivity ?? 0,
      surroundings_degC: inputs.surroundings_degC ?? ambient,
    },
    base: { T_degC: inputs.base_degC, contactResistance: inputs.contactResistance ?? 0 },
  };
}

export const constantK = (k: number): Conductivity => ({ kind: 'constant', k });

/** A uniform fin of the §6 oracles: its A (m^2) and P (m), and the profile that has them. */
export interface UniformFin {
  id: string;
  A: number;
  P: number;
  profile: (length: number) => Profile;
}

/** Straight fin 2 mm thick per metre of width, insulated edges: A = 0.002 m^2, P = 2 m. */
export const plateFin: UniformFin = {
  id: 'plate 2 mm x 1 m',
  A: 0.002,
  P: 2,
  profile: (length) => ({ kind: 'rectangular', length, thickness: 0.002, width: 1 }),
};

/** Pin of 5 mm diameter: A = pi D^2/4, P = pi D. */
export const pinFin: UniformFin = {
  id: 'pin 5 mm',
  A: (Math.PI * 0.005 ** 2) / 4,
  P: Math.PI * 0.005,
  profile: (length) => ({ kind: 'pin', length, diameter: 0.005 }),
};

/** Relative difference (a - b) / b. */
export function relative(a: number, b: number): number {
  return (a - b) / b;
}
