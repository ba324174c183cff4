/**
 * Normalised cases for the 2-D solver tests (SI, degC). Plate fins are set up from the dimensionless
 * groups of the exact separation-of-variables series (fin2d_series.py): Bi = h b / k with b the half-thickness, and
 * mL = sqrt(Bi) L / b (the 1-D fin parameter m = sqrt(h / (k b))).
 */
import type { Case, HDistribution, Profile, TipCondition } from '../../src/case/types.js';

export const AMBIENT = 25;
export const BASE = 85;
export const THETA_B = BASE - AMBIENT;

export function finCase(profile: Profile, k: number, h: HDistribution, tip: TipCondition, contactResistance = 0): Case {
  return {
    name: 'test fin',
    fin: { profile, edges: 'insulated' },
    material: { name: 'custom', k: { kind: 'constant', k }, source: 'given in the case file' },
    convection: { ambient_degC: AMBIENT, h, tip, emissivity: 0, surroundings_degC: AMBIENT },
    base: { T_degC: BASE, contactResistance },
  };
}

/** Half-thickness 1 mm, k = 200 W/(m K), width 1 m; h and L from Bi and mL. */
export function plateCase(bi: number, mL: number, tip: 'adiabatic' | 'convective' | 'infinite'): { c: Case; b: number; L: number; h: number; k: number } {
  const b = 1e-3;
  const k = 200;
  const h = (bi * k) / b;
  const L = (mL * b) / Math.sqrt(bi);
  const tipCondition: TipCondition = tip === 'convective' ? { kind: 'convective', h: null } : { kind: tip };
  const c = finCase({ kind: 'rectangular', length: L, thickness: 2 * b, width: 1 }, k, { kind: 'uniform', h }, tipCondition);
  return { c, b, L, h, k };
}
