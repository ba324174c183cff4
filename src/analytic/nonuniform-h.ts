/**
 * Uniform fin (constant A, P, k) with a convection coefficient that varies as a power of position,
 * adiabatic tip; closed forms used to verify the variable-h numerical solver.
 *
 *     k A theta'' = P h(x) theta,  theta(0) = thetaBase,  theta'(L) = 0,  x from the base (m)
 *
 *   NU1  h = h_b (1 - x/L)^n   (largest at the base, zero at the tip), m^2 = h_b P/(k A):
 *        q = k A m thetaBase * I_{1-nu}(2 nu mL) / I_{-nu}(2 nu mL)
 *   NU2  h = h_t (x/L)^n       (zero at the base, largest at the tip), m^2 = h_t P/(k A):
 *        q = (k A thetaBase / L) (nu mL)^{2 nu} [Gamma(1-nu)/Gamma(1+nu)] I_{1-nu}(2 nu mL) / I_{nu-1}(2 nu mL)
 *   with nu = 1/(n+2), n > -1. Efficiency on the mean coefficient hbar = h_ref/(n+1):
 *        eta = q / (hbar P L thetaBase);  Q = q/(k A m thetaBase) is the dimensionless rate.
 *
 * Derivation: separation of variables with the Bessel form of y'' = c^2 x^n y (Watson's transformation,
 * y = sqrt(x) Z_nu(2 nu c x^{1/(2 nu)}); Abramowitz & Stegun 1964, eq. 9.1.52 and 9.6.1); checked there
 * with scipy solve_bvp to 1e-10. Earlier variable-h fin analyses: Han & Lefkowitz 1960 (ASME paper
 * 60-WA-130) and Chen & Zyskowski 1963 (ASME paper 63-HT-12) [from memory].
 * Units: h W/(m^2 K), k W/(m K), P m, A m^2, L m, theta K, q W.
 * Evaluation: I_{1-nu}/I_{-nu} by continued fraction, I_{1-nu}/I_{nu-1} by bessel-real-order.ts; both finite
 * for every mL.
 */
import { besselIRatio } from './bessel-ratio.js';
import { besselIReflectionRatio } from './bessel-real-order.js';
import { requireFinite, requirePositive } from './check.js';
import { gammaFunction } from './gamma.js';

export interface PowerLawHInput {
  /** h_b (NU1, at the base) or h_t (NU2, at the tip), W/(m^2 K). */
  hRef: number;
  /** Exponent n > -1 of the position power law. */
  n: number;
  k: number;
  P: number;
  A: number;
  L: number;
  thetaBase: number;
}

export interface PowerLawHResult {
  /** Heat through the base, W. */
  heatRate: number;
  /** q / (k A m thetaBase). */
  Q: number;
  /** q / (hbar P L thetaBase). */
  efficiency: number;
  /** hbar = hRef/(n+1), W/(m^2 K). */
  meanH: number;
  /** m = sqrt(hRef P/(k A)), 1/m. */
  m: number;
  mL: number;
}

function prepare(where: string, input: PowerLawHInput): { m: number; mL: number; nu: number } {
  requirePositive(where, 'hRef', input.hRef);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'P', input.P);
  requirePositive(where, 'A', input.A);
  requirePositive(where, 'L', input.L);
  requireFinite(where, 'thetaBase', input.thetaBase);
  if (!(input.n > -1) || !Number.isFinite(input.n)) throw new RangeError(`${where}: n must be finite and > -1, got ${input.n}`);
  const m = Math.sqrt((input.hRef * input.P) / (input.k * input.A));
  return { m, mL: m * input.L, nu: 1 / (input.n + 2) };
}

function finish(input: PowerLawHInput, m: number, mL: number, heatRate: number): PowerLawHResult {
  const meanH = input.hRef / (input.n + 1);
  return {
    heatRate,
    Q: heatRate / (input.k * input.A * m * input.thetaBase),
    efficiency: heatRate / (meanH * input.P * input.L * input.thetaBase),
    meanH,
    m,
    mL,
  };
}

/** NU1: h = hRef (1 - x/L)^n. */
export function finHFallingToTip(input: PowerLawHInput): PowerLawHResult {
  const { m, mL, nu } = prepare('finHFallingToTip', input);
  const heatRate = input.k * input.A * m * input.thetaBase * besselIRatio(1 - nu, 2 * nu * mL);
  return finish(input, m, mL, heatRate);
}

/** NU2: h = hRef (x/L)^n. */
export function finHRisingFromBase(input: PowerLawHInput): PowerLawHResult {
  const { m, mL, nu } = prepare('finHRisingFromBase', input);
  const gammaRatio = gammaFunction(1 - nu) / gammaFunction(1 + nu);
  const heatRate =
    ((input.k * input.A * input.thetaBase) / input.L) * Math.pow(nu * mL, 2 * nu) * gammaRatio * besselIReflectionRatio(1 - nu, 2 * nu * mL);
  return finish(input, m, mL, heatRate);
}
