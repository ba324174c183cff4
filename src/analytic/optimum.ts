/**
 * Optimum fin dimensions for a fixed amount of material (1-D, constant h and k, adiabatic tip).
 * zeta = mL with m from the base thickness (straight, m^2 = 2h/(k t_b)) or diameter (pin, m^2 = 4h/(k D)).
 * Heat rate per unit width q' (W/m) or per pin q (W); profile area A_p (m^2), volume V (m^3).
 *
 *   rectangular, A_p = L t:        q' ~ zeta^{-1/3} tanh zeta          ->  sinh(2 zeta) = 6 zeta
 *       L = (zeta^2 k A_p / (2h))^{1/3}          (Schmidt, E., 1926, "Die Waermeuebertragung durch Rippen",
 *                                                  Z. VDI 70, 885-889 and 947-951)
 *   triangular, A_p = L t_b / 2:   q' ~ zeta^{-1/3} r,  r = I1(2 zeta)/I0(2 zeta)  ->  1/r - r = 2/(3 zeta)
 *       L = (zeta^2 k A_p / h)^{1/3}
 *   concave parabolic, A_p = L t_b / 3: q' ~ zeta^{-4/3} (s - 1), s = sqrt(1 + 4 zeta^2)  ->  (s - 1) s = 3 zeta^2
 *       (root zeta = sqrt 2 exactly, eta = 1/2; Schmidt's least-material profile)
 *       L = (3 zeta^2 k A_p / (2h))^{1/3}
 *   convex parabolic, A_p = (2/3) L t_b: q' ~ zeta^{-1/3} R, R = I_{2/3}/I_{-1/3}(4 zeta/3)  ->  1/R - R = 1/(2 zeta)
 *       L = (3 zeta^2 k A_p / (4h))^{1/3}
 *   cylindrical pin, V = pi D^2 L / 4:  q ~ zeta^{-3/5} tanh zeta  ->  sinh(2 zeta) = (10/3) zeta
 *       L = (zeta^2 k sqrt(V/pi) / (2h))^{2/5},  D = sqrt(4 V / (pi L))
 * Each stationarity condition d ln q / d zeta = 0 is derived from the efficiency closed forms with
 * I_nu' = I_{nu-1} - (nu/x) I_nu (A&S 9.6.26) and solved by Brent's method on a bracket.
 * The rectangular and pin results are quoted as about 1.419 / 0.627 and 0.919 by Kraus, Aziz & Welty
 * 2001 [from memory]; the variational justification of the parabola: Jany & Bejan 1988, IJHMT 31(8), 1635.
 */
import { besselIRatio } from './bessel-ratio.js';
import { requireFinite, requirePositive } from './check.js';
import { brentRoot } from './roots.js';

export interface OptimumStraightInput {
  h: number;
  k: number;
  /** Profile (cross-section) area L * mean thickness, m^2. */
  profileArea: number;
  thetaBase: number;
}

export interface OptimumPinInput {
  h: number;
  k: number;
  /** Pin volume, m^3. */
  volume: number;
  thetaBase: number;
}

export interface OptimumResult {
  /** Optimum zeta = mL. */
  mL: number;
  efficiency: number;
  /** Optimum length, m. */
  length: number;
  /** Base thickness (straight fins) or diameter (pin), m. */
  thickness: number;
  /** Maximum heat rate, W/m (straight, per unit width) or W (pin). */
  heatRate: number;
}

const bracket: [number, number] = [0.3, 5];

function checkStraight(where: string, input: OptimumStraightInput): void {
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'profileArea', input.profileArea);
  requireFinite(where, 'thetaBase', input.thetaBase);
}

/** Straight-fin result from zeta: L = (lengthFactor zeta^2 k A_p / h)^{1/3}, t_b = A_p / (meanOverBase L). */
function straightResult(input: OptimumStraightInput, zeta: number, efficiency: number, lengthFactor: number, meanOverBase: number): OptimumResult {
  const length = Math.cbrt((lengthFactor * zeta * zeta * input.k * input.profileArea) / input.h);
  const thickness = input.profileArea / (meanOverBase * length);
  return { mL: zeta, efficiency, length, thickness, heatRate: efficiency * input.h * 2 * length * input.thetaBase };
}

/** Rectangular straight fin of given profile area (Schmidt 1926). */
export function optimumRectangularFin(input: OptimumStraightInput): OptimumResult {
  checkStraight('optimumRectangularFin', input);
  const zeta = brentRoot((z) => Math.sinh(2 * z) - 6 * z, ...bracket);
  return straightResult(input, zeta, Math.tanh(zeta) / zeta, 1 / 2, 1);
}

/** Triangular straight fin of given profile area. */
export function optimumTriangularFin(input: OptimumStraightInput): OptimumResult {
  checkStraight('optimumTriangularFin', input);
  const zeta = brentRoot(
    (z) => {
      const r = besselIRatio(1, 2 * z);
      return 1 / r - r - 2 / (3 * z);
    },
    ...bracket,
  );
  return straightResult(input, zeta, besselIRatio(1, 2 * zeta) / zeta, 1, 1 / 2);
}

/** Concave parabolic straight fin of given profile area (zeta = sqrt 2, eta = 1/2). */
export function optimumConcaveParabolicFin(input: OptimumStraightInput): OptimumResult {
  checkStraight('optimumConcaveParabolicFin', input);
  const zeta = brentRoot(
    (z) => {
      const s = Math.sqrt(1 + 4 * z * z);
      return (s - 1) * s - 3 * z * z;
    },
    ...bracket,
  );
  return straightResult(input, zeta, 2 / (Math.sqrt(1 + 4 * zeta * zeta) + 1), 3 / 2, 1 / 3);
}

/** Convex parabolic straight fin of given profile area. */
export function optimumConvexParabolicFin(input: OptimumStraightInput): OptimumResult {
  checkStraight('optimumConvexParabolicFin', input);
  const zeta = brentRoot(
    (z) => {
      const R = besselIRatio(2 / 3, (4 * z) / 3);
      return 1 / R - R - 1 / (2 * z);
    },
    ...bracket,
  );
  return straightResult(input, zeta, besselIRatio(2 / 3, (4 * zeta) / 3) / zeta, 3 / 4, 2 / 3);
}

/** Cylindrical pin of given volume. */
export function optimumPinFin(input: OptimumPinInput): OptimumResult {
  const where = 'optimumPinFin';
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'volume', input.volume);
  requireFinite(where, 'thetaBase', input.thetaBase);
  const zeta = brentRoot((z) => Math.sinh(2 * z) - (10 / 3) * z, ...bracket);
  const length = Math.pow((zeta * zeta * input.k * Math.sqrt(input.volume / Math.PI)) / (2 * input.h), 2 / 5);
  const diameter = Math.sqrt((4 * input.volume) / (Math.PI * length));
  const efficiency = Math.tanh(zeta) / zeta;
  return { mL: zeta, efficiency, length, thickness: diameter, heatRate: efficiency * input.h * Math.PI * diameter * length * input.thetaBase };
}
