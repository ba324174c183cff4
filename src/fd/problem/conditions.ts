/**
 * Base and tip conditions of a fin as data (the problem's words; each model discretises them in one
 * place: one-d/boundary.ts, two-d/boundary.ts). θ = T - T_amb in K; h in W/(m^2 K); R'' in m^2 K/W.
 */
import type { Case } from '../../case/index.js';

export type BaseBoundary =
  /** Fixed base excess temperature θ_b, K. */
  | { readonly kind: 'temperature'; readonly theta: number }
  /** Wall at θ_b (K) behind a contact resistance per unit base area, m^2 K/W (> 0). */
  | { readonly kind: 'contact'; readonly theta: number; readonly resistance: number };

export type TipBoundary =
  | { readonly kind: 'adiabatic' }
  /** Tip coefficient in W/(m^2 K), or 'local' for the face coefficient at the tip. */
  | { readonly kind: 'convective'; readonly h: number | 'local' }
  /** Fixed tip excess temperature θ_L, K. */
  | { readonly kind: 'temperature'; readonly theta: number }
  | { readonly kind: 'infinite' };

/** The base condition of a case: contact when a contact resistance is given, else temperature. */
export function baseBoundary(c: Case): BaseBoundary {
  const theta = c.base.T_degC - c.convection.ambient_degC;
  return c.base.contactResistance > 0 ? { kind: 'contact', theta, resistance: c.base.contactResistance } : { kind: 'temperature', theta };
}

/** The tip condition of a case. */
export function tipBoundary(c: Case): TipBoundary {
  const tip = c.convection.tip;
  switch (tip.kind) {
    case 'adiabatic':
      return { kind: 'adiabatic' };
    case 'convective':
      return { kind: 'convective', h: tip.h ?? 'local' };
    case 'temperature':
      return { kind: 'temperature', theta: tip.T_degC - c.convection.ambient_degC };
    case 'infinite':
      return { kind: 'infinite' };
    default: {
      const never: never = tip;
      throw new Error(`unknown tip condition ${JSON.stringify(never)}`);
    }
  }
}
