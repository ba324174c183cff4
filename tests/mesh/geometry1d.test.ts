/**
 * 1-D fin geometry: A(x), P(x), size(x), base and tip areas, face area and the exact perimeter
 * integral, for every profile of the case format.
 *
 * Expected values are the thin-fin geometry of the case-format contract (faces' slope neglected; the
 * convention of Gardner, K. A., 1945, Trans. ASME 67, 621-631, and Incropera et al. 2007, Table 3.5 [both
 * from memory]) integrated exactly by hand (calculus): e.g. ∫_0^L (1 - x/L)^(1/2) dx = 2L/3,
 * ∫_0^L x (1 - x/L)^(1/2) dx = 4L^2/15. Tolerances: 1e-14 relative (a few roundings of O(1) terms;
 * the 3-point Gauss rule is exact for these polynomial integrands).
 */
import { describe, expect, test } from 'vitest';
import type { Case, Profile } from '../../src/case/types.js';
import { InputError } from '../../src/errors.js';
import { areaInto, finGeometry, perimeterInto, taperedGeometry } from '../../src/mesh/geometry1d.js';

const close = (actual: number, expected: number, tolerance = 1e-14) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance * Math.max(Math.abs(expected), 1e-300));

function caseWith(profile: Profile, edges: 'cooled' | 'insulated' = 'cooled'): Case {
  return {
    name: 'geometry',
    fin: { profile, edges },
    material: { name: 'custom', k: { kind: 'constant', k: 200 }, source: 'test' },
    convection: { ambient_degC: 20, h: { kind: 'uniform', h: 10 }, tip: { kind: 'adiabatic' }, emissivity: 0, surroundings_degC: 20 },
    base: { T_degC: 80, contactResistance: 0 },
  };
}

const L = 0.04;
const W = 0.06;
const TB = 0.003;

interface Expected {
  name: string;
  profile: Profile;
  edges?: 'cooled' | 'insulated';
  size: (x: number) => number;
  area: (x: number) => number;
  perimeter: (x: number) => number;
  faceArea: number;
  /** ∫_0^L x P(x) dx. */
  firstMoment: number;
  tipTaperExponent: number;
}

const straight = (t: (x: number) => number, cooled = true) => ({
  size: t,
  area: (x: number) => W * t(x),
  perimeter: (x: number) => 2 * W + (cooled ? 2 * t(x) : 0),
});

const CASES: Expected[] = [
  {
    name: 'rectangular, cooled edges',
    profile: { kind: 'rectangular', length: L, thickness: TB, width: W },
    ...straight(() => TB),
    faceArea: (2 * W + 2 * TB) * L,
    firstMoment: ((2 * W + 2 * TB) * L * L) / 2,
    tipTaperExponent: 0,
  },
  {
    name: 'rectangular, insulated edges',
    profile: { kind: 'rectangular', length: L, thickness: TB, width: W },
    edges: 'insulated',
    ...straight(() => TB, false),
    faceArea: 2 * W * L,
    firstMoment: W * L * L,
    tipTaperExponent: 0,
  },
  {
    name: 'pin',
    profile: { kind: 'pin', length: L, diameter: 0.005 },
    size: () => 0.005,
    area: () => (Math.PI * 0.005 ** 2) / 4,
    perimeter: () => Math.PI * 0.005,
    faceArea: Math.PI * 0.005 * L,
    firstMoment: (Math.PI * 0.005 * L * L) / 2,
    tipTaperExponent: 0,
  },
  {
    name: 'trapezoidal',
    profile: { kind: 'trapezoidal', length: L, baseThickness: TB, tipThickness: TB / 3, width: W },
    ...straight((x) => TB + ((TB / 3 - TB) * x) / L),
    faceArea: 2 * W * L + (TB + TB / 3) * L,
    // ∫ x (2W + 2t) = W L^2 + 2 (TB L^2/2 + (TB/3 - TB) L^2/3)
    firstMoment: W * L * L + 2 * ((TB * L * L) / 2 + ((TB / 3 - TB) * L * L) / 3),
    tipTaperExponent: 0,
  },
  {
    name: 'triangular',
    profile: { kind: 'triangular', length: L, baseThickness: TB, width: W },
    ...straight((x) => TB * (1 - x / L)),
    faceArea: 2 * W * L + TB * L,
    firstMoment: W * L * L + (2 * TB * L * L) / 6,
    tipTaperExponent: 1,
  },
  {
    name: 'parabolic-concave',
    profile: { kind: 'parabolic-concave', length: L, baseThickness: TB, width: W },
    ...straight((x) => TB * (1 - x / L) ** 2),
    faceArea: 2 * W * L + (2 * TB * L) / 3,
    // ∫_0^L x (1 - x/L)^2 dx = L^2/12
    firstMoment: W * L * L + (2 * TB * L * L) / 12,
    tipTaperExponent: 2,
  },
  {
    name: 'parabolic-convex',
    profile: { kind: 'parabolic-convex', length: L, baseThickness: TB, width: W },
    ...straight((x) => TB * Math.sqrt(1 - x / L)),
    faceArea: 2 * W * L + (4 * TB * L) / 3,
    firstMoment: W * L * L + (2 * TB * 4 * L * L) / 15,
    tipTaperExponent: 0.5,
  },
  {
    name: 'conical pin (truncated)',
    profile: { kind: 'conical-pin', length: L, baseDiameter: 0.006, tipDiameter: 0.002 },
    size: (x) => 0.006 - (0.004 * x) / L,
    area: (x) => (Math.PI * (0.006 - (0.004 * x) / L) ** 2) / 4,
    perimeter: (x) => Math.PI * (0.006 - (0.004 * x) / L),
    faceArea: (Math.PI * (0.006 + 0.002) * L) / 2,
    firstMoment: Math.PI * ((0.006 * L * L) / 2 - (0.004 * L * L) / 3),
    tipTaperExponent: 0,
  },
  {
    name: 'conical pin (sharp)',
    profile: { kind: 'conical-pin', length: L, baseDiameter: 0.006, tipDiameter: 0 },
    size: (x) => 0.006 * (1 - x / L),
    area: (x) => (Math.PI * (0.006 * (1 - x / L)) ** 2) / 4,
    perimeter: (x) => Math.PI * 0.006 * (1 - x / L),
    faceArea: (Math.PI * 0.006 * L) / 2,
    firstMoment: (Math.PI * 0.006 * L * L) / 6,
    tipTaperExponent: 1,
  },
  {
    name: 'annular',
    profile: { kind: 'annular', innerRadius: 0.01, outerRadius: 0.03, thickness: 0.001 },
    size: () => 0.001,
    area: (x) => 2 * Math.PI * (0.01 + x) * 0.001,
    perimeter: (x) => 4 * Math.PI * (0.01 + x),
    faceArea: 2 * Math.PI * (0.03 ** 2 - 0.01 ** 2),
    // ∫_0^{0.02} x 4π(0.01 + x) dx = 4π (0.01 · 0.02^2/2 + 0.02^3/3)
    firstMoment: 4 * Math.PI * ((0.01 * 0.02 ** 2) / 2 + 0.02 ** 3 / 3),
    tipTaperExponent: 0,
  },
];

describe.each(CASES)('$name', (c) => {
  const geometry = finGeometry(caseWith(c.profile, c.edges));
  const length = geometry.length;
  test('A(x), P(x), size(x) at five positions', () => {
    for (const f of [0, 0.2, 0.5, 0.77, 1]) {
      const x = f * length;
      close(geometry.size(x), c.size(x));
      close(geometry.area(x), c.area(x));
      close(geometry.perimeter(x), c.perimeter(x));
    }
  });
  test('areaInto and perimeterInto equal A(x) and P(x) bit for bit (the mesh builder batch-evaluates them)', () => {
    // Exact equality, not a tolerance: the batch forms repeat the scalar functions' arithmetic, so meshes (and every
    // number a check prints) stay the same whichever form is used. 101 points, the ends included, one beyond L.
    const xs = Float64Array.from({ length: 102 }, (_, k) => (k / 100) * length);
    const area = new Float64Array(xs.length);
    const perimeter = new Float64Array(xs.length);
    areaInto(geometry, xs, area);
    perimeterInto(geometry, xs, perimeter);
    expect(geometry.formula).toBeDefined();
    for (let k = 0; k < xs.length; k++) {
      expect(area[k]).toBe(geometry.area(xs[k] as number));
      expect(perimeter[k]).toBe(geometry.perimeter(xs[k] as number));
    }
    // In place (the builder evaluates A over the centres' own array).
    const inPlace = xs.slice();
    areaInto(geometry, inPlace, inPlace);
    expect(Array.from(inPlace)).toEqual(Array.from(area));
  });
  test('base, tip and face areas; taper exponent', () => {
    close(geometry.baseArea, c.area(0));
    close(geometry.tipArea, c.area(length));
    close(geometry.faceArea, c.faceArea);
    expect(geometry.tipTaperExponent).toBe(c.tipTaperExponent);
    expect(Array.from(geometry.breakpoints)).toEqual([0, length]);
  });
  test('perimeter integral is exact for a linear weight', () => {
    // g(x) = x over [0, L]: the first moment of P.
    close(geometry.perimeterIntegral(0, length, 0, length), c.firstMoment);
    // Additivity over a split at an arbitrary point (exactness on sub-intervals, 1e-14).
    const cut = 0.37 * length;
    const g = (x: number) => 3 + 2 * (x / length);
    const whole = geometry.perimeterIntegral(0, length, g(0), g(length));
    const parts = geometry.perimeterIntegral(0, cut, g(0), g(cut)) + geometry.perimeterIntegral(cut, length, g(cut), g(length));
    close(parts, whole);
    close(whole, 3 * c.faceArea + (2 / length) * c.firstMoment);
  });
});

describe('tabulated profiles', () => {
  const x = new Float64Array([0, 0.01, 0.025, 0.04]);
  const t = new Float64Array([0.004, 0.003, 0.002, 0.0005]);
  test('straight: linear between points, breakpoints on the points, face area by trapezoids', () => {
    const geometry = finGeometry(caseWith({ kind: 'tabulated', shape: 'straight', x, size: t, width: W }));
    expect(Array.from(geometry.breakpoints)).toEqual(Array.from(x));
    close(geometry.size(0.0175), 0.0025);
    close(geometry.area(0.0175), W * 0.0025);
    close(geometry.perimeter(0.0175), 2 * W + 2 * 0.0025);
    let edges = 0;
    for (let i = 0; i < 3; i++) edges += (((t[i] as number) + (t[i + 1] as number)) / 2) * ((x[i + 1] as number) - (x[i] as number));
    close(geometry.faceArea, 2 * W * 0.04 + 2 * edges);
    close(geometry.tipArea, W * 0.0005);
    expect(geometry.tipTaperExponent).toBe(0);
  });
  test('pin ending in a point: P = πD, A = πD^2/4, sharp-tip exponent 1', () => {
    const d = new Float64Array([0.006, 0.005, 0.003, 0]);
    const geometry = finGeometry(caseWith({ kind: 'tabulated', shape: 'pin', x, size: d }));
    close(geometry.area(0.0325), (Math.PI * 0.0015 ** 2) / 4);
    let face = 0;
    for (let i = 0; i < 3; i++) face += Math.PI * (((d[i] as number) + (d[i + 1] as number)) / 2) * ((x[i + 1] as number) - (x[i] as number));
    close(geometry.faceArea, face);
    expect(geometry.tipArea).toBe(0);
    expect(geometry.tipTaperExponent).toBe(1);
  });
  test('a tabulated profile has no formula: areaInto and perimeterInto call A(x) and P(x) point by point', () => {
    const geometry = finGeometry(caseWith({ kind: 'tabulated', shape: 'straight', x, size: t, width: W }));
    expect(geometry.formula).toBeUndefined();
    const xs = new Float64Array([0, 0.005, 0.0175, 0.04]);
    const area = new Float64Array(4);
    const perimeter = new Float64Array(4);
    areaInto(geometry, xs, area);
    perimeterInto(geometry, xs, perimeter);
    for (let k = 0; k < 4; k++) {
      expect(area[k]).toBe(geometry.area(xs[k] as number));
      expect(perimeter[k]).toBe(geometry.perimeter(xs[k] as number));
    }
  });
  test('a straight tabulated fin without a width is an input error naming fin.width', () => {
    expect(() => finGeometry(caseWith({ kind: 'tabulated', shape: 'straight', x, size: t }))).toThrow(InputError);
    expect(() => finGeometry(caseWith({ kind: 'tabulated', shape: 'straight', x, size: t }))).toThrow(/fin\.width/);
  });
});

describe('tapered spines outside the case format (parabolic spines)', () => {
  test('convex parabolic spine: D = D_b (1 - x/L)^(1/2), face area π D_b (2L/3)', () => {
    const geometry = taperedGeometry({ shape: 'pin', length: L, baseSize: 0.006, tipSize: 0, exponent: 0.5 });
    close(geometry.faceArea, (Math.PI * 0.006 * 2 * L) / 3);
    close(geometry.area(L / 2), (Math.PI * 0.006 ** 2 * 0.5) / 4);
  });
  test('concave parabolic spine: face area π D_b L/3', () => {
    const geometry = taperedGeometry({ shape: 'pin', length: L, baseSize: 0.006, tipSize: 0, exponent: 2 });
    close(geometry.faceArea, (Math.PI * 0.006 * L) / 3);
    expect(geometry.tipTaperExponent).toBe(2);
  });
});
