/**
 * Normalised cases (SI, degC) for the nonlinear fd-2d tests. The plate fins are per metre of width with
 * insulated side edges (A = t x 1 m, P = 2 m), the fin of the reference sheet's section 6 oracles.
 * Inputs are invented; the oracles are dimensionless.
 */
import type { Case, Conductivity, HDistribution, Profile, TipCondition } from '../../src/case/types.js';

export const AMBIENT_DEGC = 20;
export const KELVIN = 273.15;

export interface Inputs {
  profile: Profile;
  k: Conductivity;
  h: HDistribution;
  tip?: TipCondition;
  /** Base temperature, degC. */
  base_degC: number;
  emissivity?: number;
  /** Radiating surroundings, degC (default: ambient). */
  surroundings_degC?: number;
  contactResistance?: number;
}

export function finCase(inputs: Inputs): Case {
  return {
    name: 'nonlinear 2-D test case',
    fin: { profile: inputs.profile, edges: 'insulated' },
    material: { name: 'custom', k: inputs.k, source: 'given in the case file' },
    convection: {
      ambient_degC: AMBIENT_DEGC,
      h: inputs.h,
      tip: inputs.tip ?? { kind: 'adiabatic' },
      emissivity: inputs.emissivity ?? 0,
      surroundings_degC: inputs.surroundings_degC ?? AMBIENT_DEGC,
    },
    base: { T_degC: inputs.base_degC, contactResistance: inputs.contactResistance ?? 0 },
  };
}

export const constantK = (k: number): Conductivity => ({ kind: 'constant', k });

/** k linear in θ from k0 at the fluid temperature to k0 (1 + B) at the base: k = k0 (1 + β θ), β = B/θ_b. */
export function linearK(k0: number, B: number, thetaBase: number): Conductivity {
  return { kind: 'table', T_degC: Float64Array.from([AMBIENT_DEGC, AMBIENT_DEGC + thetaBase]), k: Float64Array.from([k0, k0 * (1 + B)]) };
}

/** Rectangular plate of half-thickness b (m) and length L (m), 1 m wide. */
export const plate = (length: number, halfThickness: number): Profile => ({ kind: 'rectangular', length, thickness: 2 * halfThickness, width: 1 });

/** Least-squares slope of log|y| against log x. */
export function logSlope(x: number[], y: number[]): number {
  const lx = x.map(Math.log);
  const ly = y.map((v) => Math.log(Math.abs(v)));
  const mx = lx.reduce((a, b) => a + b, 0) / lx.length;
  const my = ly.reduce((a, b) => a + b, 0) / ly.length;
  let sxy = 0;
  let sxx = 0;
  lx.forEach((v, i) => {
    sxy += (v - mx) * ((ly[i] as number) - my);
    sxx += (v - mx) ** 2;
  });
  return sxy / sxx;
}
