/**
 * Corrected length: an adiabatic-tip fin of length L_c standing in for a fin of length L with a
 * convective tip (uniform cross-section, constant h and k). Lengths in m, m in 1/m.
 *
 *   Harper-Brown:  L_c = L + A/P      (full perimeter P, cross-section A)
 *                  L_c = L + t/2      (thin plate, w >> t)       L_c = L + D/4   (pin of diameter D)
 *       then q ~ M tanh(m L_c), eta ~ tanh(m L_c)/(m L_c) on the area P L_c (= P L + A).
 *       Harper, D. R. & Brown, W. B., 1922, "Mathematical equations for heat conduction in the fins
 *       of air-cooled engines", NACA Report 158 [from memory].
 *   Exact:         L_c* = L + artanh(beta)/m,  beta = h_tip/(m k) < 1,
 *       because the convective-tip rate M (tanh mL + beta)/(1 + beta tanh mL) = M tanh(mL + artanh beta)
 *       (addition theorem of tanh). L + A/P = L + beta/m is its first-order term; no exact adiabatic
 *       length exists when beta >= 1 (then a fin does not raise q at all).
 */
import { requireNonNegative, requirePositive } from './check.js';
import { finParameter } from './uniform-fin.js';

/** Harper-Brown corrected length L + A/P, m. */
export function correctedLength(L: number, A: number, P: number): number {
  requireNonNegative('correctedLength', 'L', L);
  requirePositive('correctedLength', 'A', A);
  requirePositive('correctedLength', 'P', P);
  return L + A / P;
}

/** Thin-plate form L + t/2 (edges neglected), m. */
export function plateCorrectedLength(L: number, thickness: number): number {
  requireNonNegative('plateCorrectedLength', 'L', L);
  requirePositive('plateCorrectedLength', 'thickness', thickness);
  return L + thickness / 2;
}

/** Pin form L + D/4 (exact A/P for a circle), m. */
export function pinCorrectedLength(L: number, diameter: number): number {
  requireNonNegative('pinCorrectedLength', 'L', L);
  requirePositive('pinCorrectedLength', 'diameter', diameter);
  return L + diameter / 4;
}

export interface CorrectedLengthInput {
  h: number;
  k: number;
  P: number;
  A: number;
  L: number;
  thetaBase: number;
  /** Tip coefficient, W/(m^2 K); defaults to h. */
  hTip?: number;
}

/**
 * Exact corrected length L + artanh(beta)/m (m), with beta = hTip/(m k); null when beta >= 1 (no
 * adiabatic-tip fin reproduces the convective tip then).
 */
export function exactCorrectedLength(input: CorrectedLengthInput): number | null {
  requirePositive('exactCorrectedLength', 'h', input.h);
  requirePositive('exactCorrectedLength', 'k', input.k);
  requireNonNegative('exactCorrectedLength', 'L', input.L);
  const m = finParameter(input.h, input.k, input.P, input.A);
  const beta = (input.hTip ?? input.h) / (m * input.k);
  return beta < 1 ? input.L + Math.atanh(beta) / m : null;
}

export interface CorrectedLengthResult {
  /** The corrected length used, m. */
  correctedLength: number;
  /** tanh(m L_c)/(m L_c). */
  efficiency: number;
  /** M tanh(m L_c), W. */
  heatRate: number;
  /** P L_c, m^2. */
  area: number;
}

/** The Harper-Brown shortcut: adiabatic-tip fin of length L + A/P. */
export function correctedLengthFin(input: CorrectedLengthInput): CorrectedLengthResult {
  const Lc = correctedLength(input.L, input.A, input.P);
  const m = finParameter(input.h, input.k, input.P, input.A);
  const mLc = m * Lc;
  const M = Math.sqrt(input.h * input.P * input.k * input.A) * input.thetaBase;
  return { correctedLength: Lc, efficiency: Math.tanh(mLc) / mLc, heatRate: M * Math.tanh(mLc), area: input.P * Lc };
}
