/**
 * The 2-D section of a fin: which half-plane the 2-D solver meshes, for every profile of the contract.
 *
 * - Straight fins (rectangular, trapezoidal, triangular, parabolic, tabulated straight): the longitudinal
 *   section, x along the fin from the base (m), y across from the mid-plane (symmetry) to the face at
 *   y = t(x)/2. Planar, per metre of width; the whole fin is `depth` = 2 x width times that (two halves,
 *   insulated edges).
 * - Pins and conical pins: axisymmetric (x along the axis, y = r from the axis to the surface r = D(x)/2),
 *   per radian; `depth` = 2 pi.
 * - Annular fins: axisymmetric (x = r from the tube radius r1 to r2, y = z from the mid-plane to the face
 *   z = t/2), per radian; `depth` = 2 x 2 pi (two halves).
 * Lengths in m. `halfSize(s)` is the half-thickness (straight, annular) or the radius (pins) at the
 * distance s from the base, exactly as the case defines the profile; the grid puts its face nodes on it.
 */
import type { Profile } from '../case/index.js';

export type SectionKind = 'planar' | 'pin' | 'annular';

export interface Section2D {
  kind: SectionKind;
  /** Distance from the base to the tip along the fin, m (annular: r2 - r1). */
  length: number;
  /** x coordinate of the base: 0, or the inner radius r1 for annular fins (there x is the radius). */
  baseX: number;
  /** Half-thickness or radius (m) at distance s (m) from the base, 0 <= s <= length. */
  halfSize: (s: number) => number;
  /** Distances from the base where the profile has a kink; includes 0 and length. Grid lines go there. */
  breakpoints: number[];
  /** The profile ends in a point (zero thickness at the tip): the last grid column collapses. */
  sharpTip: boolean;
  /**
   * Exponent q >= 1 of the clustering toward the tip, s = L (1 - (1 - u)^q) for uniform u: 1 = none.
   * Used where the profile ends in a power law and so does the temperature (parabolic profiles).
   */
  tipClustering: number;
  /** Multiplier from the meshed section to the whole fin: 2 x width (planar: both halves), 2 pi (pins),
   *  2 x 2 pi (annular: both halves). */
  depth: number;
  /**
   * Identifies the section's shape exactly (the profile with its dimensions but not the width, which only sets
   * `depth`; sectionOf), so that grids of equal sections are built once (grid2d.ts buildGrid2D); absent: never cached.
   */
  key?: string;
}

/**
 * Tip clustering exponents (see tipClustering). Near the tip of a parabolic fin the 1-D temperature is a
 * power of the distance to the tip (concave: theta ~ xi^((sqrt(1 + 4 (mL)^2) - 1)/2), convex: terms in
 * xi^(2/3)), which a uniform grid resolves only to order ~1.4-1.8. With xi ~ (1 - u)^3 the powers become
 * smooth enough in u: measured order 2.00 for both (thin-limit tests), against 1.81 and erratic without.
 */
export const TIP_CLUSTERING = { concave: 3, convex: 3 } as const;

export function sectionOf(profile: Profile): Section2D {
  // The width only sets the depth (a planar section is per unit width): left out, so widths share their grids.
  const key = JSON.stringify(profile, (k, v: unknown) => (k === 'width' ? undefined : v instanceof Float64Array ? Array.from(v) : v));
  return { ...sectionOfProfile(profile), key };
}

function sectionOfProfile(profile: Profile): Section2D {
  const twoPi = 2 * Math.PI;
  switch (profile.kind) {
    case 'rectangular': {
      const b = profile.thickness / 2;
      return straight(profile.length, () => b, profile.width, false);
    }
    case 'trapezoidal': {
      const { length: L, baseThickness: tb, tipThickness: tt } = profile;
      return straight(L, (s) => (tb + ((tt - tb) * s) / L) / 2, profile.width, tt === 0);
    }
    case 'triangular': {
      const { length: L, baseThickness: tb } = profile;
      return straight(L, (s) => (tb / 2) * Math.max(0, 1 - s / L), profile.width, true);
    }
    case 'parabolic-concave': {
      const { length: L, baseThickness: tb } = profile;
      return { ...straight(L, (s) => (tb / 2) * Math.max(0, 1 - s / L) ** 2, profile.width, true), tipClustering: TIP_CLUSTERING.concave };
    }
    case 'parabolic-convex': {
      const { length: L, baseThickness: tb } = profile;
      return { ...straight(L, (s) => (tb / 2) * Math.sqrt(Math.max(0, 1 - s / L)), profile.width, true), tipClustering: TIP_CLUSTERING.convex };
    }
    case 'pin': {
      const r = profile.diameter / 2;
      return {
        kind: 'pin',
        length: profile.length,
        baseX: 0,
        halfSize: () => r,
        breakpoints: [0, profile.length],
        sharpTip: false,
        tipClustering: 1,
        depth: twoPi,
      };
    }
    case 'conical-pin': {
      const { length: L, baseDiameter: db, tipDiameter: dt } = profile;
      const halfSize = (s: number): number => (db + ((dt - db) * s) / L) / 2;
      return { kind: 'pin', length: L, baseX: 0, halfSize, breakpoints: [0, L], sharpTip: dt === 0, tipClustering: 1, depth: twoPi };
    }
    case 'annular': {
      const { innerRadius: r1, outerRadius: r2, thickness: t } = profile;
      return {
        kind: 'annular',
        length: r2 - r1,
        baseX: r1,
        halfSize: () => t / 2,
        breakpoints: [0, r2 - r1],
        sharpTip: false,
        tipClustering: 1,
        depth: 2 * twoPi,
      };
    }
    case 'tabulated': {
      const { x, size } = profile;
      const n = x.length;
      const L = x[n - 1];
      const halfSize = (s: number): number => interpolate(x, size, s) / 2;
      const breakpoints = Array.from(x);
      const sharpTip = size[n - 1] === 0;
      for (let k = 0; k < n - 1; k++) {
        if (!(size[k] > 0)) throw new RangeError(`sectionOf: tabulated size must be > 0 before the tip (point ${k})`);
      }
      if (profile.shape === 'pin') return { kind: 'pin', length: L, baseX: 0, halfSize, breakpoints, sharpTip, tipClustering: 1, depth: twoPi };
      if (profile.width === undefined) throw new RangeError('sectionOf: a tabulated straight fin needs a width');
      return { kind: 'planar', length: L, baseX: 0, halfSize, breakpoints, sharpTip, tipClustering: 1, depth: 2 * profile.width };
    }
    default: {
      const never: never = profile;
      throw new Error(`sectionOf: unknown profile ${JSON.stringify(never)}`);
    }
  }
}

function straight(length: number, halfSize: (s: number) => number, width: number, sharpTip: boolean): Section2D {
  return { kind: 'planar', length, baseX: 0, halfSize, breakpoints: [0, length], sharpTip, tipClustering: 1, depth: 2 * width };
}

/** Piecewise-linear interpolation in a strictly increasing table (clamped at the ends). */
function interpolate(xs: Float64Array, ys: Float64Array, s: number): number {
  const n = xs.length;
  if (s <= xs[0]) return ys[0];
  if (s >= xs[n - 1]) return ys[n - 1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= s) lo = mid;
    else hi = mid;
  }
  const x0 = xs[lo];
  const x1 = xs[hi];
  const y0 = ys[lo];
  const y1 = ys[hi];
  return y0 + ((y1 - y0) * (s - x0)) / (x1 - x0);
}
