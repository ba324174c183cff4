/**
 * Spines (pin fins) of circular section and variable radius, adiabatic tip: efficiency closed forms of
 * the 1-D equation d/dx(k pi r^2 dtheta/dx) = 2 pi r h theta (slope of the surface neglected).
 *
 * Conventions: m^2 = 4h/(k D_b) = 2h/(k R_b) from the BASE diameter D_b (m); L length (m); eta is
 * referred to 2 pi int_0^L r dx, i.e. pi D_b L (cylinder), pi D_b L/2 (cone), pi D_b L (1+tau)/2
 * (truncated cone), pi D_b L/3 (concave parabolic), 2 pi D_b L/3 (convex parabolic); q = eta h area
 * thetaBase (W). x_tip is the distance from the tip.
 *
 *   cylinder                          eta = tanh(mL)/(mL)
 *   cone (sharp tip)                  eta = 2 I2(2mL) / (mL I1(2mL))
 *   truncated cone, tau = D_tip/D_b, u_b = 2mL/(1-tau), u_a = 2mL sqrt(tau)/(1-tau):
 *       eta = 2 R / (mL (1 + tau)),  R = [I2(u_b)K2(u_a) - I2(u_a)K2(u_b)] / [I1(u_b)K2(u_a) + I2(u_a)K1(u_b)]
 *   concave parabolic r ~ x_tip^2     eta = 2 / (sqrt(1 + (4/9)(mL)^2) + 1)
 *   convex parabolic  r ~ x_tip^(1/2) eta = 3 I1(4mL/3) / (2 mL I0(4mL/3))
 *
 * Sources: Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer (6th ed.), Table 3.5 (cylinder, cone, concave
 * parabolic spine) [from memory]; Kraus, Aziz & Welty, Extended Surface Heat Transfer, Wiley 2001 (convex
 * parabolic spine) [from memory]; the truncated cone is derived with xi^{-1/2} I1, K1 of 2m sqrt(xi_b xi)
 * (xi from the virtual apex), and reduces to the cone (tau -> 0) and the cylinder (tau -> 1).
 * Evaluation: ratios of I's by continued fractions, scaled I, K with e^{-2(u_b - u_a)} for the truncated
 * cone, so nothing overflows.
 */
import { I1e, I2e, K1e, K2e } from './bessel.js';
import { besselIRatio } from './bessel-ratio.js';
import { requireFinite, requirePositive } from './check.js';
import type { ProfileFinResult } from './profile-result.js';

export interface SpineInput {
  /** W/(m^2 K). */
  h: number;
  /** W/(m K). */
  k: number;
  /** m. */
  length: number;
  /** Diameter at the base, m. */
  baseDiameter: number;
  /** Base excess temperature, K. */
  thetaBase: number;
}

/** areaFactor: (2 pi int r dx) / (pi D_b L). */
function spineResult(where: string, input: SpineInput, areaFactor: number, efficiencyOf: (mL: number) => number): ProfileFinResult {
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'length', input.length);
  requirePositive(where, 'baseDiameter', input.baseDiameter);
  requireFinite(where, 'thetaBase', input.thetaBase);
  const m = Math.sqrt((4 * input.h) / (input.k * input.baseDiameter));
  const mL = m * input.length;
  const efficiency = efficiencyOf(mL);
  const area = areaFactor * Math.PI * input.baseDiameter * input.length;
  return { efficiency, heatRate: efficiency * input.h * area * input.thetaBase, area, m, mL };
}

/** Cylindrical pin, adiabatic tip (use corrected-length.ts for a convective tip). */
export function cylindricalPinFin(input: SpineInput): ProfileFinResult {
  return spineResult('cylindricalPinFin', input, 1, (mL) => Math.tanh(mL) / mL);
}

/** Full cone with a sharp tip. */
export function conicalSpine(input: SpineInput): ProfileFinResult {
  return spineResult('conicalSpine', input, 1 / 2, (mL) => (2 * besselIRatio(2, 2 * mL)) / mL);
}

/** Truncated cone, tipDiameter/baseDiameter = tau in [0, 1], adiabatic tip. */
export function truncatedConicalSpine(input: SpineInput & { tipDiameter: number }): ProfileFinResult {
  const where = 'truncatedConicalSpine';
  requirePositive(where, 'baseDiameter', input.baseDiameter);
  const tau = input.tipDiameter / input.baseDiameter;
  if (!(tau >= 0 && tau <= 1)) throw new RangeError(`${where}: tipDiameter must be in [0, baseDiameter], got ratio ${tau}`);
  return spineResult(where, input, (1 + tau) / 2, (mL) => truncatedConeEfficiency(mL, tau));
}

function truncatedConeEfficiency(mL: number, tau: number): number {
  if (tau === 1) return Math.tanh(mL) / mL;
  const ub = (2 * mL) / (1 - tau);
  const ua = (2 * mL * Math.sqrt(tau)) / (1 - tau);
  const decay = Math.exp((-4 * mL) / (1 + Math.sqrt(tau))); // e^{-2(u_b - u_a)}
  // Scaled forms, numerator and denominator divided by K2e(u_a) e^{u_b - u_a}; s = I2e(u_a)/K2e(u_a).
  const s = ua === 0 ? 0 : I2e(ua) / K2e(ua);
  const ratio = (I2e(ub) - s * K2e(ub) * decay) / (I1e(ub) + s * K1e(ub) * decay);
  return (2 * ratio) / (mL * (1 + tau));
}

/** Concave parabolic spine, radius R_b (x_tip/L)^2. */
export function concaveParabolicSpine(input: SpineInput): ProfileFinResult {
  return spineResult('concaveParabolicSpine', input, 1 / 3, (mL) => 2 / (Math.sqrt(1 + (4 / 9) * mL * mL) + 1));
}

/** Convex parabolic spine, radius R_b (x_tip/L)^(1/2). */
export function convexParabolicSpine(input: SpineInput): ProfileFinResult {
  return spineResult('convexParabolicSpine', input, 2 / 3, (mL) => (3 * besselIRatio(1, (4 * mL) / 3)) / (2 * mL));
}
