/**
 * The 2-D solver tests' temperatures and plate fins (the cases come from tests/support/fin-case.ts). Plate
 * fins are set up from the dimensionless groups of the exact separation-of-variables series
 * (tests/reference/fin2d_series.py): Bi = h b / k with b the half-thickness, and mL = sqrt(Bi) L / b (the
 * 1-D fin parameter m = sqrt(h / (k b))).
 */
import type { Case, TipCondition } from '../../src/case/index.js';
import { finCase } from '../support/fin-case.js';

export const AMBIENT = 25;
export const BASE = 85;
export const THETA_B = BASE - AMBIENT;
/** The fluid and base temperatures of every 2-D test case, as finCase inputs. */
export const TEMPERATURES_2D = { ambient_degC: AMBIENT, base_degC: BASE } as const;

/** Half-thickness 1 mm, k = 200 W/(m K), width 1 m; h and L from Bi and mL. */
export function plateCase(bi: number, mL: number, tip: 'adiabatic' | 'convective' | 'infinite'): { c: Case; b: number; L: number; h: number; k: number } {
  const b = 1e-3;
  const k = 200;
  const h = (bi * k) / b;
  const L = (mL * b) / Math.sqrt(bi);
  const tipCondition: TipCondition = tip === 'convective' ? { kind: 'convective', h: null } : { kind: tip };
  const c = finCase({
    profile: { kind: 'rectangular', length: L, thickness: 2 * b, width: 1 },
    k,
    h: { kind: 'uniform', h },
    tip: tipCondition,
    ...TEMPERATURES_2D,
  });
  return { c, b, L, h, k };
}
