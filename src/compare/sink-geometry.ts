/**
 * Areas of a heat sink the array shortcuts need: fin count, the footprint of one fin's root on the plate, the
 * exposed plate top between fins, and each source's footprint. Lengths m, areas m^2.
 */
import type { ArrayFinProfile, HeatSinkCase } from '../case/index.js';

/** Number of fins on the plate (plate fins: count; pins: rows x columns). */
export function finCount(c: HeatSinkCase): number {
  if (c.fin === null) return 0;
  return c.array.kind === 'plates' ? c.array.count : c.array.rows * c.array.columns;
}

/** Root thickness (plate fin) or root diameter (pin), m. */
export function rootSize(profile: ArrayFinProfile): number {
  switch (profile.kind) {
    case 'rectangular':
      return profile.thickness;
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return profile.baseThickness;
    case 'pin':
      return profile.diameter;
    case 'conical-pin':
      return profile.baseDiameter;
    case 'tabulated':
      return profile.size[0] ?? 0;
    default: {
      const never: never = profile;
      return never;
    }
  }
}

/** Whether the fin is a pin (else a plate fin running the plate's length). */
export function isPin(profile: ArrayFinProfile): boolean {
  return profile.kind === 'pin' || profile.kind === 'conical-pin' || (profile.kind === 'tabulated' && profile.shape === 'pin');
}

/** Area of one fin's root on the plate top, m^2 (plate fin: root thickness x plate length; pin: pi D^2 / 4). */
export function rootFootprint(c: HeatSinkCase): number {
  if (c.fin === null) return 0;
  const size = rootSize(c.fin.profile);
  return isPin(c.fin.profile) ? (Math.PI * size * size) / 4 : size * c.plate.length;
}

/** The plate top not covered by fin roots, m^2. */
export function exposedPlateArea(c: HeatSinkCase): number {
  return c.plate.width * c.plate.length - finCount(c) * rootFootprint(c);
}

export function sourceArea(s: HeatSinkCase['sources'][number]): number {
  return s.size[0] * s.size[1];
}

export function totalPower(c: HeatSinkCase): number {
  return c.sources.reduce((sum, s) => sum + s.power, 0);
}
