/**
 * Fin geometry for the 1-D model: cross-section A(x) and cooled perimeter P(x) of every profile.
 *
 * Equation served: d/dx(k A(x) dθ/dx) - h(x) P(x) θ = 0, x from the base (m). Units: m, m^2.
 * Thin-fin convention (faces' slope neglected), as in Gardner, K. A., 1945, "Efficiency of extended
 * surface", Trans. ASME 67, 621-631, and the fin tables of Incropera et al., Fundamentals of Heat and
 * Mass Transfer (Table 3.5):
 *   straight fin, thickness t(x), width w: A = w t, P = 2w + 2t (cooled edges) or 2w (insulated edges);
 *   spine (pin), diameter D(x):            A = pi D^2 / 4, P = pi D;
 *   annular, thickness t, r = r1 + x:      A = 2 pi r t, P = 4 pi r (both faces), tip = outer rim.
 * Tapered profiles: size(x) = s_tip + (s_base - s_tip)(1 - x/L)^e with e = 0 (uniform), 1 (trapezoid,
 * triangle, cone), 2 (concave parabola), 1/2 (convex parabola).
 *
 * The integral of g P over [a, b] for a linear g (used for the exact ideal heat rate and the face
 * area) is a 3-point Gauss-Legendre rule, exact for polynomials of degree <= 5. g P is a polynomial of
 * degree <= 3 in x for every profile except the convex parabola, where the substitution
 * x = L(1 - s^2) makes g P dx a polynomial of degree 4 in s.
 */
import type { Case, Edges, Profile, TabulatedProfile } from '../case/index.js';
import { InputError } from '../errors.js';
import type { FinGeometry1D, GeometryFormula } from './types.js';

/** Exponent e of a tapered profile, size ~ (1 - x/L)^e. */
export type TaperExponent = 0 | 0.5 | 1 | 2;

export interface TaperSpec {
  readonly shape: 'straight' | 'pin';
  readonly length: number;
  /** Thickness (straight) or diameter (pin) at the base and at the tip, m. */
  readonly baseSize: number;
  readonly tipSize: number;
  readonly exponent: TaperExponent;
  /** Width of a straight fin, m (ignored for pins). */
  readonly width?: number;
  /** Whether a straight fin's side edges convect (default cooled; ignored for pins). */
  readonly edges?: Edges;
}

const GAUSS_NODE = Math.sqrt(3 / 5);
const GAUSS_WEIGHT_OUTER = 5 / 9;
const GAUSS_WEIGHT_CENTRE = 8 / 9;

/** 3-point Gauss-Legendre rule on [a, b]. */
function gauss3(a: number, b: number, f: (x: number) => number): number {
  const mid = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  return half * (GAUSS_WEIGHT_OUTER * (f(mid - half * GAUSS_NODE) + f(mid + half * GAUSS_NODE)) + GAUSS_WEIGHT_CENTRE * f(mid));
}

/** g linear through (a, gA) and (b, gB). */
function linearThrough(a: number, b: number, gA: number, gB: number): (x: number) => number {
  const slope = (gB - gA) / (b - a);
  return (x) => gA + slope * (x - a);
}

/** Cross-section and perimeter of a straight fin or a spine of given size (thickness or diameter). */
function sectionOf(shape: 'straight' | 'pin', width: number, edges: Edges) {
  if (shape === 'pin') {
    return { area: (s: number) => (Math.PI * s * s) / 4, perimeter: (s: number) => Math.PI * s };
  }
  const edgeFactor = edges === 'cooled' ? 2 : 0;
  return { area: (s: number) => width * s, perimeter: (s: number) => 2 * width + edgeFactor * s };
}

/** Straight fin or spine whose size follows s_tip + (s_base - s_tip)(1 - x/L)^e. */
export function taperedGeometry(spec: TaperSpec): FinGeometry1D {
  const { length: L, baseSize, exponent } = spec;
  const tipSize = exponent === 0 ? baseSize : spec.tipSize;
  const section = sectionOf(spec.shape, spec.width ?? 0, spec.edges ?? 'cooled');
  const drop = baseSize - tipSize;
  const taper = (x: number): number => {
    const s = Math.max(0, 1 - x / L);
    switch (exponent) {
      case 0:
        return 1;
      case 0.5:
        return Math.sqrt(s);
      case 1:
        return s;
      case 2:
        return s * s;
      default: {
        const never: never = exponent;
        throw new Error(`unknown taper exponent ${String(never)}`);
      }
    }
  };
  const size = (x: number): number => tipSize + drop * taper(x);
  const perimeter = (x: number): number => section.perimeter(size(x));
  const perimeterIntegral = (a: number, b: number, gA: number, gB: number): number => {
    if (b <= a) return 0;
    const g = linearThrough(a, b, gA, gB);
    if (exponent !== 0.5) return gauss3(a, b, (x) => g(x) * perimeter(x));
    // x = L(1 - s^2), dx = -2 L s ds: the integrand is a polynomial in s.
    const sA = Math.sqrt(Math.max(0, 1 - a / L));
    const sB = Math.sqrt(Math.max(0, 1 - b / L));
    return gauss3(sB, sA, (s) => {
      const x = L * (1 - s * s);
      return g(x) * section.perimeter(tipSize + drop * s) * 2 * L * s;
    });
  };
  const formula: GeometryFormula = {
    kind: 'tapered',
    shape: spec.shape,
    length: L,
    tipSize,
    drop,
    exponent,
    width: spec.width ?? 0,
    edgeFactor: (spec.edges ?? 'cooled') === 'cooled' ? 2 : 0,
  };
  return {
    shape: spec.shape,
    length: L,
    formula,
    area: (x) => section.area(size(x)),
    perimeter,
    size,
    baseArea: section.area(baseSize),
    tipArea: section.area(tipSize),
    faceArea: perimeterIntegral(0, L, 1, 1),
    breakpoints: new Float64Array([0, L]),
    tipTaperExponent: tipSize === 0 ? exponent : 0,
    perimeterIntegral,
  };
}

/** Annular fin of uniform thickness t between r1 and r2; x = r - r1. */
export function annularGeometry(innerRadius: number, outerRadius: number, thickness: number): FinGeometry1D {
  const L = outerRadius - innerRadius;
  const perimeter = (x: number): number => 4 * Math.PI * (innerRadius + x);
  const perimeterIntegral = (a: number, b: number, gA: number, gB: number): number => {
    if (b <= a) return 0;
    const g = linearThrough(a, b, gA, gB);
    return gauss3(a, b, (x) => g(x) * perimeter(x));
  };
  return {
    shape: 'annular',
    length: L,
    formula: { kind: 'annular', innerRadius, thickness },
    area: (x) => 2 * Math.PI * (innerRadius + x) * thickness,
    perimeter,
    size: () => thickness,
    baseArea: 2 * Math.PI * innerRadius * thickness,
    tipArea: 2 * Math.PI * outerRadius * thickness,
    faceArea: perimeterIntegral(0, L, 1, 1),
    breakpoints: new Float64Array([0, L]),
    tipTaperExponent: 0,
    perimeterIntegral,
  };
}

/**
 * Sizes of a tapered formula at the points xs into out: tipSize + drop taper(x), as taperedGeometry's size(x) computes
 * it. Plain loops without calls: the mesh builder's points are thousands, evaluated once per mesh, and a loop that
 * calls each geometry's own closures runs slowly until V8 optimises it, then deoptimises at the next geometry's
 * closure ("wrong call target"): 4000-cell meshes took 7-34 ms each in a check (measured), about 1 ms once optimised.
 */
function taperedSizesInto(f: Extract<GeometryFormula, { kind: 'tapered' }>, xs: Float64Array, out: Float64Array): void {
  const { length: L, tipSize, drop } = f;
  const n = xs.length;
  switch (f.exponent) {
    case 0:
      for (let k = 0; k < n; k++) out[k] = tipSize + drop * 1;
      return;
    case 0.5:
      for (let k = 0; k < n; k++) out[k] = tipSize + drop * Math.sqrt(Math.max(0, 1 - xs[k] / L));
      return;
    case 1:
      for (let k = 0; k < n; k++) out[k] = tipSize + drop * Math.max(0, 1 - xs[k] / L);
      return;
    case 2:
      for (let k = 0; k < n; k++) {
        const s = Math.max(0, 1 - xs[k] / L);
        out[k] = tipSize + drop * (s * s);
      }
      return;
    default: {
      const never: never = f.exponent;
      throw new Error(`unknown taper exponent ${String(never)}`);
    }
  }
}

/** A(x) at every point of xs into out (m^2), bit for bit the geometry's `area`. */
export function areaInto(geometry: FinGeometry1D, xs: Float64Array, out: Float64Array): void {
  const f = geometry.formula;
  const n = xs.length;
  if (f === undefined) {
    for (let k = 0; k < n; k++) out[k] = geometry.area(xs[k]);
  } else if (f.kind === 'annular') {
    for (let k = 0; k < n; k++) out[k] = 2 * Math.PI * (f.innerRadius + xs[k]) * f.thickness;
  } else {
    taperedSizesInto(f, xs, out);
    if (f.shape === 'pin') {
      for (let k = 0; k < n; k++) out[k] = (Math.PI * out[k] * out[k]) / 4;
    } else {
      for (let k = 0; k < n; k++) out[k] = f.width * out[k];
    }
  }
}

/** P(x) at every point of xs into out (m), bit for bit the geometry's `perimeter`. */
export function perimeterInto(geometry: FinGeometry1D, xs: Float64Array, out: Float64Array): void {
  const f = geometry.formula;
  const n = xs.length;
  if (f === undefined) {
    for (let k = 0; k < n; k++) out[k] = geometry.perimeter(xs[k]);
  } else if (f.kind === 'annular') {
    for (let k = 0; k < n; k++) out[k] = 4 * Math.PI * (f.innerRadius + xs[k]);
  } else {
    taperedSizesInto(f, xs, out);
    if (f.shape === 'pin') {
      for (let k = 0; k < n; k++) out[k] = Math.PI * out[k];
    } else {
      for (let k = 0; k < n; k++) out[k] = 2 * f.width + f.edgeFactor * out[k];
    }
  }
}

/** Index j of the segment [xs[j], xs[j+1]] holding x (clamped to the first and last segments). */
function segmentIndex(xs: Float64Array, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Profile given by points, linear between them (thickness of a straight fin or diameter of a pin). */
export function tabulatedGeometry(profile: TabulatedProfile, edges: Edges): FinGeometry1D {
  const xs = profile.x;
  const sizes = profile.size;
  const last = xs.length - 1;
  if (profile.shape === 'straight' && profile.width === undefined) {
    throw new InputError([{ path: 'fin.width', value: 'missing', accepted: 'a width > 0 for a tabulated straight fin' }]);
  }
  const section = sectionOf(profile.shape, profile.width ?? 0, edges);
  const L = xs[last];
  const size = (x: number): number => {
    const j = segmentIndex(xs, x);
    const x0 = xs[j];
    const x1 = xs[j + 1];
    const s0 = sizes[j];
    const s1 = sizes[j + 1];
    const f = Math.min(1, Math.max(0, (x - x0) / (x1 - x0)));
    return s0 + (s1 - s0) * f;
  };
  const perimeter = (x: number): number => section.perimeter(size(x));
  const perimeterIntegral = (a: number, b: number, gA: number, gB: number): number => {
    if (b <= a) return 0;
    const g = linearThrough(a, b, gA, gB);
    let sum = 0;
    let left = a;
    for (let j = segmentIndex(xs, a); j < last && left < b; j++) {
      const right = Math.min(b, xs[j + 1]);
      if (right > left) sum += gauss3(left, right, (x) => g(x) * perimeter(x));
      left = right;
    }
    return sum;
  };
  const tipSize = sizes[last];
  return {
    shape: profile.shape,
    length: L,
    area: (x) => section.area(size(x)),
    perimeter,
    size,
    baseArea: section.area(sizes[0]),
    tipArea: section.area(tipSize),
    faceArea: perimeterIntegral(0, L, 1, 1),
    breakpoints: Float64Array.from(xs),
    tipTaperExponent: tipSize === 0 ? 1 : 0,
    perimeterIntegral,
  };
}

/**
 * Geometries already made, by the case's `fin` object (read-only data, as the whole case) and by their key: a check
 * asks for its fin's geometry several times (the problem, the shortcuts, each variant of h or k, which shares `fin`),
 * and the points of a map column are cases of one fin: they share one geometry object, and with it what is kept
 * by geometry (the mesh cache, the equivalent fin's mean section). 128 keys, as the mesh cache.
 */
const geometriesOfFin = new WeakMap<Case['fin'], FinGeometry1D>();
const geometriesByKey = new Map<string, FinGeometry1D>();
const GEOMETRY_CACHE_SIZE = 128;

/** The 1-D geometry of a case's fin, for every profile of the case-file contract. */
export function finGeometry(c: Case): FinGeometry1D {
  const ofFin = geometriesOfFin.get(c.fin);
  if (ofFin !== undefined) return ofFin;
  const key = geometryKey(c);
  let geometry = geometriesByKey.get(key);
  if (geometry === undefined) {
    geometry = { ...profileGeometry(c), key };
    if (geometriesByKey.size >= GEOMETRY_CACHE_SIZE) geometriesByKey.delete(geometriesByKey.keys().next().value as string);
    geometriesByKey.set(key, geometry);
  }
  geometriesOfFin.set(c.fin, geometry);
  return geometry;
}

/** Identifies a case's A(x) and P(x): the profile with its dimensions (typed arrays as lists) and the edges. */
function geometryKey(c: Case): string {
  return JSON.stringify([c.fin.profile, c.fin.edges], (_k, v: unknown) => (v instanceof Float64Array ? Array.from(v) : v));
}

function profileGeometry(c: Case): FinGeometry1D {
  return geometryOfProfile(c.fin.profile, c.fin.edges);
}

/** The 1-D geometry of a profile with given side edges (the heat-sink model builds its fins from it). */
export function geometryOfProfile(p: Profile, edges: Edges): FinGeometry1D {
  const straight = (length: number, baseSize: number, tipSize: number, exponent: TaperExponent, width: number) =>
    taperedGeometry({ shape: 'straight', length, baseSize, tipSize, exponent, width, edges });
  switch (p.kind) {
    case 'rectangular':
      return straight(p.length, p.thickness, p.thickness, 0, p.width);
    case 'pin':
      return taperedGeometry({ shape: 'pin', length: p.length, baseSize: p.diameter, tipSize: p.diameter, exponent: 0 });
    case 'trapezoidal':
      return straight(p.length, p.baseThickness, p.tipThickness, 1, p.width);
    case 'triangular':
      return straight(p.length, p.baseThickness, 0, 1, p.width);
    case 'parabolic-concave':
      return straight(p.length, p.baseThickness, 0, 2, p.width);
    case 'parabolic-convex':
      return straight(p.length, p.baseThickness, 0, 0.5, p.width);
    case 'conical-pin':
      return taperedGeometry({ shape: 'pin', length: p.length, baseSize: p.baseDiameter, tipSize: p.tipDiameter, exponent: 1 });
    case 'annular':
      return annularGeometry(p.innerRadius, p.outerRadius, p.thickness);
    case 'tabulated':
      return tabulatedGeometry(p, edges);
    default: {
      const never: never = p;
      throw new Error(`unknown profile ${JSON.stringify(never)}`);
    }
  }
}
