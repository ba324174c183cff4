/**
 * Straight fins of variable thickness, adiabatic tip: efficiency closed forms (1-D fin equation
 * d/dx(k t(x) dtheta/dx) = 2 h theta per unit width, slope of the faces neglected).
 *
 * Conventions: per unit width P = 2, m^2 = 2h/(k t_b) with t_b the BASE thickness (m), L the length (m);
 * eta is referred to the area 2 L per unit width (2 L w for a width w), and q = eta h (2 L w) thetaBase
 * (W, or W/m without a width). x_tip is the distance from the tip.
 *
 *   rectangular                        eta = tanh(mL)/(mL)
 *   triangular                         eta = I1(2mL) / (mL I0(2mL))
 *   concave parabolic t ~ x_tip^2      eta = 2 / (sqrt(4 (mL)^2 + 1) + 1)
 *   convex parabolic  t ~ x_tip^(1/2)  eta = I_{2/3}(4mL/3) / (mL I_{-1/3}(4mL/3))
 *   Gardner general   t ~ x_tip^((1-2nu)/(1-nu)), nu < 1:
 *                                      eta = I_{1-nu}(z) / (mL I_{-nu}(z)),  z = 2(1-nu) mL
 *     (nu = 1/2 rectangular, 0 triangular, 1/3 convex parabolic, nu -> -infinity concave parabolic)
 *   trapezoidal, tau = t_tip/t_b in [0, 1], u_b = 2mL/(1-tau), u_a = 2mL sqrt(tau)/(1-tau):
 *     eta = (1/mL) [I1(u_b)K1(u_a) - I1(u_a)K1(u_b)] / [I0(u_b)K1(u_a) + I1(u_a)K0(u_b)]
 *
 * Sources: Gardner, K. A., 1945, "Efficiency of extended surface", Trans. ASME 67, 621-631 (triangular,
 * parabolic and the general form) [from memory]; Harper & Brown 1922 (rectangular) [from memory];
 * Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer (6th ed.), Table 3.5 [from memory]; triangular also
 * Shabany, Heat Transfer: Thermal Management of Electronics, CRC 2009, eq. 7.52; trapezoidal as in Kraus,
 * Aziz & Welty, Extended Surface Heat Transfer, Wiley 2001 [from memory].
 * Evaluation: every ratio of I's is a continued fraction (bessel-ratio.ts) and the trapezoid uses the
 * exponentially scaled I, K with the factor e^{-2(u_b - u_a)}, u_b - u_a = 2mL/(1 + sqrt(tau)), so no
 * formula overflows at any mL.
 */
import { I0e, I1e, K0e, K1e } from './bessel.js';
import { besselIRatio } from './bessel-ratio.js';
import { requireFinite, requirePositive } from './check.js';
import type { ProfileFinResult } from './profile-result.js';

export interface StraightFinInput {
  /** W/(m^2 K). */
  h: number;
  /** W/(m K). */
  k: number;
  /** Base-to-tip length, m. */
  length: number;
  /** Thickness at the base, m. */
  baseThickness: number;
  /** Base excess temperature, K. */
  thetaBase: number;
  /** Width, m; absent: results per metre of width. */
  width?: number;
}

function straightResult(where: string, input: StraightFinInput, efficiencyOf: (mL: number) => number): ProfileFinResult {
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'length', input.length);
  requirePositive(where, 'baseThickness', input.baseThickness);
  requireFinite(where, 'thetaBase', input.thetaBase);
  const width = input.width ?? 1;
  requirePositive(where, 'width', width);
  const m = Math.sqrt((2 * input.h) / (input.k * input.baseThickness));
  const mL = m * input.length;
  const efficiency = efficiencyOf(mL);
  const area = 2 * input.length * width;
  return { efficiency, heatRate: efficiency * input.h * area * input.thetaBase, area, m, mL };
}

/** Rectangular profile (uniform thickness), adiabatic tip. */
export function straightRectangularFin(input: StraightFinInput): ProfileFinResult {
  return straightResult('straightRectangularFin', input, (mL) => Math.tanh(mL) / mL);
}

/** Triangular profile (thickness linear to zero at the tip). */
export function straightTriangularFin(input: StraightFinInput): ProfileFinResult {
  return straightResult('straightTriangularFin', input, (mL) => besselIRatio(1, 2 * mL) / mL);
}

/** Concave parabolic profile, half-thickness (t_b/2)(x_tip/L)^2. */
export function straightConcaveParabolicFin(input: StraightFinInput): ProfileFinResult {
  return straightResult('straightConcaveParabolicFin', input, (mL) => 2 / (Math.sqrt(4 * mL * mL + 1) + 1));
}

/** Convex parabolic profile, half-thickness (t_b/2)(x_tip/L)^(1/2). */
export function straightConvexParabolicFin(input: StraightFinInput): ProfileFinResult {
  return straightResult('straightConvexParabolicFin', input, (mL) => besselIRatio(2 / 3, (4 * mL) / 3) / mL);
}

/** Gardner's general straight fin, thickness ~ x_tip^((1-2nu)/(1-nu)), nu < 1. */
export function gardnerStraightFin(input: StraightFinInput & { nu: number }): ProfileFinResult {
  const { nu } = input;
  if (!(nu < 1) || !Number.isFinite(nu)) throw new RangeError(`gardnerStraightFin: nu must be finite and < 1, got ${nu}`);
  return straightResult('gardnerStraightFin', input, (mL) => besselIRatio(1 - nu, 2 * (1 - nu) * mL) / mL);
}

/** Trapezoidal profile, tipThickness/baseThickness = tau in [0, 1], adiabatic tip. */
export function straightTrapezoidalFin(input: StraightFinInput & { tipThickness: number }): ProfileFinResult {
  const where = 'straightTrapezoidalFin';
  requirePositive(where, 'baseThickness', input.baseThickness);
  const tau = input.tipThickness / input.baseThickness;
  if (!(tau >= 0 && tau <= 1)) throw new RangeError(`${where}: tipThickness must be in [0, baseThickness], got ratio ${tau}`);
  return straightResult(where, input, (mL) => trapezoidEfficiency(mL, tau));
}

/** eta of the trapezoid in scaled form; tau = 1 is the rectangle (the formula's limit). */
function trapezoidEfficiency(mL: number, tau: number): number {
  if (tau === 1) return Math.tanh(mL) / mL;
  const ub = (2 * mL) / (1 - tau);
  const ua = (2 * mL * Math.sqrt(tau)) / (1 - tau);
  const decay = Math.exp((-4 * mL) / (1 + Math.sqrt(tau))); // e^{-2(u_b - u_a)}
  // With I(u) = Ie(u) e^u and K(u) = Ke(u) e^-u, numerator and denominator both divided by
  // K1e(u_a) e^{u_b - u_a}; s = I1e(u_a)/K1e(u_a) (0 for the sharp tip tau = 0).
  const s = ua === 0 ? 0 : I1e(ua) / K1e(ua);
  const numerator = I1e(ub) - s * K1e(ub) * decay;
  const denominator = I0e(ub) + s * K0e(ub) * decay;
  return numerator / (mL * denominator);
}
