/**
 * Helpers for the nonlinear fd-2d tests (the cases come from tests/support/fin-case.ts). The plate fins are
 * per metre of width with insulated side edges (A = t x 1 m, P = 2 m), the fin of the first-integral oracles (tests/reference/nonlinear.py).
 * Inputs are invented; the oracles are dimensionless.
 */
import type { Conductivity, Profile } from '../../src/case/index.js';
import { AMBIENT_DEGC } from '../support/fin-case.js';

export const KELVIN = 273.15;

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
