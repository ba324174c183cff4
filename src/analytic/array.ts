/**
 * Overall surface efficiency of a finned surface: N identical fins on a base, same h everywhere.
 *
 *     A_t = N A_f + A_unfinned                    (m^2)
 *     eta_o = 1 - (N A_f / A_t) (1 - eta_f)
 *     q_total = eta_o h A_t thetaBase             (W)
 *
 * With a contact resistance R''_tc (m^2 K/W) between each fin and the base (over the fin's base area
 * A_b, m^2):
 *
 *     eta_o(c) = 1 - (N A_f / A_t) (1 - eta_f / C1),   C1 = 1 + eta_f h A_f R''_tc / A_b,
 *
 * which is the fin resistance 1/(eta_f h A_f) in series with R''_tc/A_b.
 * Source: Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer (6th ed.),
 * section 3.6.5 "Overall surface efficiency" [from memory; equation numbers not checked].
 */
import { requireNonNegative, requirePositive } from './check.js';

export interface FinArrayInput {
  finCount: number;
  /** Surface of one fin, m^2 (the area its efficiency refers to). */
  finArea: number;
  /** Efficiency of one fin (0..1]. */
  finEfficiency: number;
  /** Exposed base between the fins, m^2. */
  unfinnedArea: number;
  /** W/(m^2 K). */
  h: number;
  /** Base excess temperature, K. */
  thetaBase: number;
  /** Contact resistance per unit area under each fin, m^2 K/W (0 or absent: perfect contact). */
  contactResistance?: number;
  /** Base area of one fin (its cross-section at the base), m^2; needed when contactResistance > 0. */
  finBaseArea?: number;
}

export interface FinArrayResult {
  /** Overall surface efficiency eta_o. */
  overallEfficiency: number;
  /** A_t = N A_f + A_unfinned, m^2. */
  totalArea: number;
  /** eta_o h A_t thetaBase, W. */
  heatRate: number;
  /** C1 (1 without contact resistance). */
  contactFactor: number;
}

export function finArray(input: FinArrayInput): FinArrayResult {
  const where = 'finArray';
  if (!(Number.isInteger(input.finCount) && input.finCount >= 0)) throw new RangeError(`${where}: finCount must be an integer >= 0`);
  requirePositive(where, 'finArea', input.finArea);
  requirePositive(where, 'finEfficiency', input.finEfficiency);
  requireNonNegative(where, 'unfinnedArea', input.unfinnedArea);
  requirePositive(where, 'h', input.h);
  const resistance = input.contactResistance ?? 0;
  requireNonNegative(where, 'contactResistance', resistance);
  let contactFactor = 1;
  if (resistance > 0) {
    if (input.finBaseArea === undefined) throw new RangeError(`${where}: finBaseArea is needed with a contact resistance`);
    requirePositive(where, 'finBaseArea', input.finBaseArea);
    contactFactor = 1 + (input.finEfficiency * input.h * input.finArea * resistance) / input.finBaseArea;
  }
  const finnedArea = input.finCount * input.finArea;
  const totalArea = finnedArea + input.unfinnedArea;
  requirePositive(where, 'total area', totalArea);
  const overallEfficiency = 1 - (finnedArea / totalArea) * (1 - input.finEfficiency / contactFactor);
  return { overallEfficiency, totalArea, heatRate: overallEfficiency * input.h * totalArea * input.thetaBase, contactFactor };
}
