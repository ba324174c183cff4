/**
 * The equivalent uniform fin a hand calculation uses: the profile's mean cross-section A and mean
 * perimeter P over the length, the area-weighted mean h = (integral of h P dx) / (integral of P dx),
 * the conductivity, the base excess and the tip coefficient (outputs.md, "For a non-uniform profile").
 *
 * Units: m, m^2, W/(m^2*K), W/(m*K), K.
 */
import type { Case } from '../case/index.js';
import { hAt, idealConvectiveConductance, type LinearFinCase } from '../fd/index.js';
import type { FinGeometry1D } from '../mesh/index.js';

export interface EquivalentUniformFin {
  family: FinGeometry1D['shape'];
  length: number;
  /** Mean cross-section and perimeter over the length. */
  A: number;
  P: number;
  /** Thin-fin perimeter habit: 2 w (straight), pi D (pin), 4 pi r (annular: both faces). */
  Pthin: number;
  /** Mean thickness (straight, annular) or diameter (pin) giving the mean area. */
  size: number;
  h: number;
  /** Coefficient on the tip face (the local h at the tip, or the tip's own). */
  hTip: number;
  k: number;
  thetaBase: number;
  /** Base area A(0) and the h there (effectiveness and the contact resistance in series). */
  baseArea: number;
  hBase: number;
  /** Contact resistance of the whole base, K/W (0 when none). */
  contactResistance: number;
}

/** Simpson's rule with 2000 panels: the mean of a smooth profile to ~1e-12 (a hand-calc quantity). */
function meanOver(f: (x: number) => number, L: number): number {
  const n = 2000;
  const dx = L / n;
  let s = f(0) + f(L);
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(i * dx);
  return (s * dx) / 3 / L;
}

/** Mean sections already computed, by geometry (read-only; finGeometry gives a case's fin one geometry object). */
const meanAreas = new WeakMap<FinGeometry1D, number>();

/** The mean section of the fin, m^2: meanOver(A), once per geometry (a map's column of points shares one). */
function meanArea(geometry: FinGeometry1D): number {
  let A = meanAreas.get(geometry);
  if (A === undefined) {
    A = meanOver(geometry.area, geometry.length);
    meanAreas.set(geometry, A);
  }
  return A;
}

export function equivalentUniformFin(c: LinearFinCase, geometry: FinGeometry1D): EquivalentUniformFin {
  const L = geometry.length;
  const A = meanArea(geometry);
  const P = geometry.faceArea / L;
  const h = idealConvectiveConductance(geometry, c.convection.h) / geometry.faceArea;
  const tip = c.convection.tip;
  const hTip = tip.kind === 'convective' ? (tip.h ?? hAt(c.convection.h, L, L)) : 0;
  const size = meanSize(c, A);
  return {
    family: geometry.shape,
    length: L,
    A,
    P,
    Pthin: thinPerimeter(c, geometry, size),
    size,
    h,
    hTip,
    k: c.material.k.k,
    thetaBase: c.base.T_degC - c.convection.ambient_degC,
    baseArea: geometry.baseArea,
    hBase: hAt(c.convection.h, 0, L),
    contactResistance: c.base.contactResistance > 0 ? c.base.contactResistance / geometry.baseArea : 0,
  };
}

function widthOf(c: Case): number {
  const p = c.fin.profile;
  switch (p.kind) {
    case 'rectangular':
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return p.width;
    case 'tabulated':
      return p.width ?? 0;
    case 'pin':
    case 'conical-pin':
    case 'annular':
      return 0;
    default: {
      const never: never = p;
      return never;
    }
  }
}

/** Mean thickness (straight: A / w; annular: t) or the diameter whose circle has the mean area (pins). */
function meanSize(c: Case, meanArea: number): number {
  const p = c.fin.profile;
  if (p.kind === 'annular') return p.thickness;
  if (p.kind === 'pin' || p.kind === 'conical-pin' || (p.kind === 'tabulated' && p.shape === 'pin')) {
    return Math.sqrt((4 * meanArea) / Math.PI);
  }
  return meanArea / widthOf(c);
}

function thinPerimeter(c: Case, geometry: FinGeometry1D, size: number): number {
  switch (geometry.shape) {
    case 'straight':
      return 2 * widthOf(c);
    case 'pin':
      return Math.PI * size;
    case 'annular':
      return geometry.faceArea / geometry.length;
    default: {
      const never: never = geometry.shape;
      return never;
    }
  }
}
