/**
 * The textbook heat-sink shortcut: one uniform base temperature on a finned plate, the plate itself a 1-D
 * conductor under the sources.
 *
 *     A_t   = N A_f + A_exposed                                    (m^2)
 *     G     = N G_f + h_plate A_exposed                            (W/K), G_f = h eta_f A_f per fin
 *     eta_o = G / (h A_t) = 1 - (N A_f / A_t)(1 - eta_f)           (the second form when h_plate = h)
 *     theta_b = Q_total / G                                        (K, the base's rise above ambient)
 *     dT_plate = Q_total t / (k A_sources)                         (K, 1-D conduction under the sources' total area)
 *     rise_j = theta_b + dT_plate + R''_j Q_j / A_j                (K, with source j's interface resistance)
 *
 * Units: W, K, m, W/(m^2*K), W/(m*K), m^2*K/W. Source: Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of
 * Heat and Mass Transfer (6th ed.), section 3.6.5 "Overall surface efficiency" (from memory; equation numbers not
 * checked); the fin efficiency tanh(mLc)/(mLc) with Lc the corrected length (Harper & Brown 1922, NACA Report 158;
 * from memory). With h_plate = h and G_f = h eta_f A_f this is finArray (array.ts) without contact resistance.
 */
import { requireNonNegative, requirePositive } from './check.js';

/** The fin efficiency of a uniform fin with an adiabatic tip at length Lc: tanh(mLc)/(mLc) (1 at mLc = 0). */
export function tanhEfficiency(mLc: number): number {
  requireNonNegative('tanhEfficiency', 'mLc', mLc);
  return mLc < 1e-8 ? 1 - (mLc * mLc) / 3 : Math.tanh(mLc) / mLc;
}

export interface UniformBaseSource {
  /** W. */
  power: number;
  /** Footprint area, m^2. */
  area: number;
  /** Interface resistance per unit of source area, m^2*K/W. */
  contactResistance: number;
}

export interface UniformBaseInput {
  sources: readonly UniformBaseSource[];
  finCount: number;
  /** Heat of one fin per kelvin of root excess, W/K (h eta_f A_f). */
  finConductance: number;
  /** Surface of one fin that eta_f refers to, m^2 (for eta_o). */
  finArea: number;
  /** The h on the fins, W/(m^2*K) (for eta_o). */
  hFin: number;
  /** Exposed plate top between fins, m^2. */
  exposedArea: number;
  /** h on the exposed plate top, W/(m^2*K). */
  hPlate: number;
  /** m. */
  plateThickness: number;
  /** W/(m*K). */
  plateConductivity: number;
}

export interface UniformBaseResult {
  /** Rise of the one base temperature above ambient, K. */
  baseRise_K: number;
  /** 1-D drop through the plate under the sources' total area, K. */
  plateDrop_K: number;
  /** Each source's interface drop, K. */
  contactDrop_K: number[];
  /** Each source's mean rise above ambient, K. */
  sourceRise_K: number[];
  /** G = N G_f + h_plate A_exposed, W/K. */
  conductance_WperK: number;
  /** eta_o = G / (h_fin A_t). */
  overallEfficiency: number;
  /** A_t = N A_f + A_exposed, m^2. */
  totalArea: number;
}

export function uniformBaseSink(input: UniformBaseInput): UniformBaseResult {
  const where = 'uniformBaseSink';
  if (!(Number.isInteger(input.finCount) && input.finCount >= 0)) throw new RangeError(`${where}: finCount must be an integer >= 0`);
  requireNonNegative(where, 'finConductance', input.finConductance);
  requireNonNegative(where, 'finArea', input.finArea);
  requireNonNegative(where, 'exposedArea', input.exposedArea);
  requireNonNegative(where, 'hPlate', input.hPlate);
  requirePositive(where, 'plateThickness', input.plateThickness);
  requirePositive(where, 'plateConductivity', input.plateConductivity);
  if (input.sources.length === 0) throw new RangeError(`${where}: at least one source is needed`);
  const conductance = input.finCount * input.finConductance + input.hPlate * input.exposedArea;
  requirePositive(where, 'total conductance N G_f + h_plate A_exposed', conductance);
  const totalPower = input.sources.reduce((sum, s) => sum + s.power, 0);
  const sourceArea = input.sources.reduce((sum, s) => sum + s.area, 0);
  requirePositive(where, 'total source area', sourceArea);
  const baseRise = totalPower / conductance;
  const plateDrop = (totalPower * input.plateThickness) / (input.plateConductivity * sourceArea);
  const contactDrop = input.sources.map((s) => (s.contactResistance * s.power) / s.area);
  const totalArea = input.finCount * input.finArea + input.exposedArea;
  const hRef = input.finCount > 0 ? input.hFin : input.hPlate;
  return {
    baseRise_K: baseRise,
    plateDrop_K: plateDrop,
    contactDrop_K: contactDrop,
    sourceRise_K: contactDrop.map((d) => baseRise + plateDrop + d),
    conductance_WperK: conductance,
    overallEfficiency: hRef > 0 && totalArea > 0 ? conductance / (hRef * totalArea) : 1,
    totalArea,
  };
}
