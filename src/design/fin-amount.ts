/**
 * The amount of material in a fin, for the constraints of `optimize`:
 *   profile area A_p = integral of t(x) dx over the length (straight and annular fins: the section in the plane of
 *     the profile; a pin's: integral of D(x) dx), m^2;
 *   volume V = integral of A_c(x) dx (straight fins: A_p times the width; pins: pi/4 integral of D^2 dx; annular:
 *     the ring), m^3;
 *   mass = density times V: with one material at a fixed density, a constant mass is a constant volume, so `mass`
 *     keeps V (the density never enters an optimum) and says so.
 * Exact for the profiles' shapes (polynomials in x; tabulated profiles are linear between points).
 */
import type { Case, Profile } from '../case/index.js';

export type Keep = 'profile-area' | 'volume' | 'mass' | 'none';

/** The profile area, m^2. */
export function profileArea(p: Profile): number {
  switch (p.kind) {
    case 'rectangular':
      return p.length * p.thickness;
    case 'trapezoidal':
      return (p.length * (p.baseThickness + p.tipThickness)) / 2;
    case 'triangular':
      return (p.length * p.baseThickness) / 2;
    case 'parabolic-concave':
      return (p.length * p.baseThickness) / 3;
    case 'parabolic-convex':
      return (2 * p.length * p.baseThickness) / 3;
    case 'pin':
      return p.length * p.diameter;
    case 'conical-pin':
      return (p.length * (p.baseDiameter + p.tipDiameter)) / 2;
    case 'annular':
      return (p.outerRadius - p.innerRadius) * p.thickness;
    case 'tabulated': {
      let a = 0;
      for (let i = 1; i < p.x.length; i++) a += (((p.x[i] as number) - (p.x[i - 1] as number)) * ((p.size[i] as number) + (p.size[i - 1] as number))) / 2;
      return a;
    }
    default: {
      const never: never = p;
      throw new Error(`profileArea: unknown profile ${JSON.stringify(never)}`);
    }
  }
}

/** The volume, m^3. */
export function finVolume(p: Profile): number {
  switch (p.kind) {
    case 'rectangular':
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return profileArea(p) * p.width;
    case 'pin':
      return (Math.PI / 4) * p.diameter ** 2 * p.length;
    case 'conical-pin':
      // Frustum: pi L (D1^2 + D1 D2 + D2^2) / 12.
      return (Math.PI * p.length * (p.baseDiameter ** 2 + p.baseDiameter * p.tipDiameter + p.tipDiameter ** 2)) / 12;
    case 'annular':
      return Math.PI * (p.outerRadius ** 2 - p.innerRadius ** 2) * p.thickness;
    case 'tabulated': {
      if (p.shape === 'straight') return profileArea(p) * (p.width ?? 0);
      let v = 0;
      // Each piece a frustum between its two diameters.
      for (let i = 1; i < p.x.length; i++) {
        const d0 = p.size[i - 1] as number;
        const d1 = p.size[i] as number;
        v += (Math.PI * ((p.x[i] as number) - (p.x[i - 1] as number)) * (d0 * d0 + d0 * d1 + d1 * d1)) / 12;
      }
      return v;
    }
    default: {
      const never: never = p;
      throw new Error(`finVolume: unknown profile ${JSON.stringify(never)}`);
    }
  }
}

/** The amount a constraint keeps (m^2 for profile-area, m^3 for volume and mass), or null for `none`. */
export function amountOf(c: Case, keep: Keep): number | null {
  switch (keep) {
    case 'profile-area':
      return profileArea(c.fin.profile);
    case 'volume':
    case 'mass':
      return finVolume(c.fin.profile);
    case 'none':
      return null;
    default: {
      const never: never = keep;
      throw new Error(`amountOf: unknown constraint ${String(never)}`);
    }
  }
}
