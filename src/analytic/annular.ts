/**
 * Annular (circumferential) fin of constant thickness t on a tube of radius r1, outer radius r2
 * (all m): 1-D radial fin equation (1/r) d/dr(r dtheta/dr) = m^2 theta, m^2 = 2h/(k t).
 *
 *   Adiabatic rim at r2 (a = m r1, b = m r2):
 *     eta = (2 r1 / (m (r2^2 - r1^2))) [K1(a) I1(b) - I1(a) K1(b)] / [I0(a) K1(b) + K0(a) I1(b)]
 *     area 2 pi (r2^2 - r1^2), q = eta h area thetaBase.
 *     Gardner, K. A., 1945, Trans. ASME 67, 621-631 [from memory]; Incropera et al. 2007, Table 3.5
 *     [from memory]; Shabany, Heat Transfer: Thermal Management of Electronics, CRC 2009, eq. 7.53.
 *   Corrected radius: the same with r2c = r2 + t/2 and area 2 pi (r2c^2 - r1^2) (Shabany 2009, eq. 7.53).
 *   Exact convective rim (-k theta'(r2) = h_tip theta(r2), B = h_tip/(m k)):
 *     theta ~ (K1(b) - B K0(b)) I0(mr) + (I1(b) + B I0(b)) K0(mr),
 *     q = -2 pi r1 t k theta'(r1) thetaBase/theta(r1); eta on 2 pi (r2^2 - r1^2) + 2 pi r2 t.
 *     (derived from the general solution, A&S 1964 eqs. 9.6.27; checked against scipy in profiles.py)
 *   Schmidt's approximation: eta = tanh(m r1 phi)/(m r1 phi), phi = (r2/r1 - 1)(1 + 0.35 ln(r2/r1))
 *     (Schmidt, T. E., 1949, "Heat transfer calculations for extended surfaces", Refrigerating
 *     Engineering 57, 351-357 [from memory]); r2 here is whatever outer radius is passed (use r2c for a
 *     convective rim).
 * Evaluation in scaled form: with I(u) = Ie(u) e^u, K(u) = Ke(u) e^-u every exponential reduces to
 * e^{-2(b - a)} <= 1, so no overflow at large m r.
 */
import { I0e, I1e, K0e, K1e } from './bessel.js';
import { requireFinite, requirePositive } from './check.js';
import type { ProfileFinResult } from './profile-result.js';

export interface AnnularFinInput {
  /** W/(m^2 K). */
  h: number;
  /** W/(m K). */
  k: number;
  /** Tube (fin root) radius r1, m. */
  innerRadius: number;
  /** Fin outer radius r2, m. */
  outerRadius: number;
  /** Fin thickness t, m. */
  thickness: number;
  /** Base excess temperature, K. */
  thetaBase: number;
}

function checkAnnular(where: string, input: AnnularFinInput): number {
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'innerRadius', input.innerRadius);
  requirePositive(where, 'thickness', input.thickness);
  requireFinite(where, 'thetaBase', input.thetaBase);
  if (!(input.outerRadius > input.innerRadius)) throw new RangeError(`${where}: outerRadius must exceed innerRadius`);
  return Math.sqrt((2 * input.h) / (input.k * input.thickness));
}

/** Outer radius corrected for a convective rim, r2 + t/2, m. */
export function correctedOuterRadius(outerRadius: number, thickness: number): number {
  return outerRadius + thickness / 2;
}

/** Exact 1-D annular fin with an adiabatic rim at outerRadius. */
export function annularFin(input: AnnularFinInput): ProfileFinResult {
  const m = checkAnnular('annularFin', input);
  const r1 = input.innerRadius;
  const r2 = input.outerRadius;
  const a = m * r1;
  const b = m * r2;
  const decay = Math.exp(-2 * (b - a));
  // Numerator and denominator multiplied by e^{a - b}.
  const numerator = K1e(a) * I1e(b) - I1e(a) * K1e(b) * decay;
  const denominator = I0e(a) * K1e(b) * decay + K0e(a) * I1e(b);
  const efficiency = ((2 * r1) / (m * (r2 * r2 - r1 * r1))) * (numerator / denominator);
  const area = 2 * Math.PI * (r2 * r2 - r1 * r1);
  return { efficiency, heatRate: efficiency * input.h * area * input.thetaBase, area, m, mL: m * (r2 - r1) };
}

/** The corrected-radius shortcut for a convective rim: adiabatic rim at r2 + t/2. */
export function annularFinCorrected(input: AnnularFinInput): ProfileFinResult {
  return annularFin({ ...input, outerRadius: correctedOuterRadius(input.outerRadius, input.thickness) });
}

/** Exact 1-D annular fin with a convective rim (coefficient hTip, default h) of area 2 pi r2 t. */
export function annularFinConvectiveTip(input: AnnularFinInput & { hTip?: number }): ProfileFinResult {
  const m = checkAnnular('annularFinConvectiveTip', input);
  const hTip = input.hTip ?? input.h;
  const r1 = input.innerRadius;
  const r2 = input.outerRadius;
  const a = m * r1;
  const b = m * r2;
  const B = hTip / (m * input.k);
  const decay = Math.exp(-2 * (b - a));
  // theta ~ alpha e^{-b} I0(mr) + gamma e^{b} K0(mr) with alpha = K1e(b) - B K0e(b), gamma = I1e(b) + B I0e(b)
  // (no division by alpha, which vanishes or turns negative when B >= ~1); at r1 both theta and
  // -theta'/m carry the factor e^{b - a}, which cancels.
  const alpha = K1e(b) - B * K0e(b);
  const gamma = I1e(b) + B * I0e(b);
  const minusSlopeOverTheta = (m * (gamma * K1e(a) - alpha * I1e(a) * decay)) / (gamma * K0e(a) + alpha * I0e(a) * decay);
  const heatRate = 2 * Math.PI * r1 * input.thickness * input.k * minusSlopeOverTheta * input.thetaBase;
  const area = 2 * Math.PI * (r2 * r2 - r1 * r1) + 2 * Math.PI * r2 * input.thickness;
  return { efficiency: heatRate / (input.h * area * input.thetaBase), heatRate, area, m, mL: m * (r2 - r1) };
}

/** Schmidt's approximation, with the outer radius as passed (adiabatic rim there). */
export function annularFinSchmidt(input: AnnularFinInput): ProfileFinResult {
  const m = checkAnnular('annularFinSchmidt', input);
  const r1 = input.innerRadius;
  const r2 = input.outerRadius;
  const ratio = r2 / r1;
  const phi = (ratio - 1) * (1 + 0.35 * Math.log(ratio));
  const x = m * r1 * phi;
  const efficiency = Math.tanh(x) / x;
  const area = 2 * Math.PI * (r2 * r2 - r1 * r1);
  return { efficiency, heatRate: efficiency * input.h * area * input.thetaBase, area, m, mL: m * (r2 - r1) };
}
