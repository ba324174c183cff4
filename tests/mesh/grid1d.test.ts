/**
 * 1-D node sets and the vertex-centred mesh: grading maps, nodes on breakpoints, nested refinement,
 * interface areas and control-volume surfaces.
 *
 * Expected values are the definitions of grid1d.ts evaluated by hand (power-law and geometric maps)
 * and exact integrals (calculus) of the thin-fin geometry. Simpson's rule is exact for cubics
 * (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 25.4.5 [from memory for the
 * number]), so for P at most quadratic and h linear the CV weights reproduce ∫ h P dx to round-off.
 */
import { describe, expect, test } from 'vitest';
import { taperedGeometry, tabulatedGeometry, annularGeometry } from '../../src/mesh/geometry1d.js';
import { allocateCells, buildMesh1D, gridNodes, mergeBreakpoints } from '../../src/mesh/grid1d.js';
import type { FinGeometry1D, Mesh1D } from '../../src/mesh/types.js';

const L = 0.05;
const plate = taperedGeometry({ shape: 'straight', length: L, baseSize: 0.002, tipSize: 0.002, exponent: 0, width: 0.04 });
const trapezoid = taperedGeometry({ shape: 'straight', length: L, baseSize: 0.004, tipSize: 0.001, exponent: 1, width: 0.04 });
const concave = taperedGeometry({ shape: 'straight', length: L, baseSize: 0.004, tipSize: 0, exponent: 2, width: 0.04 });
const convex = taperedGeometry({ shape: 'straight', length: L, baseSize: 0.004, tipSize: 0, exponent: 0.5, width: 0.04 });
const cone = taperedGeometry({ shape: 'pin', length: L, baseSize: 0.006, tipSize: 0, exponent: 1 });
const ring = annularGeometry(0.01, 0.035, 0.001);
const drawn = tabulatedGeometry(
  { kind: 'tabulated', shape: 'straight', x: new Float64Array([0, 0.012, 0.03, L]), size: new Float64Array([0.004, 0.0035, 0.002, 0.0008]), width: 0.04 },
  'cooled',
);

const cellSizes = (x: Float64Array) => Array.from(x.subarray(1), (v, i) => v - (x[i] as number));

describe('node sets', () => {
  test('uniform: x_i = i L / N', () => {
    const { x, cellSize } = gridNodes(plate, { cells: 8 });
    expect(x.length).toBe(9);
    x.forEach((v, i) => expect(v).toBeCloseTo((i * L) / 8, 15));
    expect(cellSize).toBe(L / 8);
  });
  test('power law toward the tip: last cell L N^-p, first cell L (1 - (1 - 1/N)^p)', () => {
    const N = 10;
    const p = 3;
    const sizes = cellSizes(gridNodes(concave, { cells: N, grading: { kind: 'power', toward: 'tip', exponent: p } }).x);
    expect(sizes[N - 1]).toBeCloseTo(L * Math.pow(1 / N, p), 15);
    expect(sizes[0]).toBeCloseTo(L * (1 - Math.pow(1 - 1 / N, p)), 15);
    for (let i = 1; i < N; i++) expect(sizes[i] as number).toBeLessThan(sizes[i - 1] as number);
  });
  test('power law toward the base and toward both ends', () => {
    const base = cellSizes(gridNodes(plate, { cells: 10, grading: { kind: 'power', toward: 'base', exponent: 2 } }).x);
    expect(base[0]).toBeCloseTo(L / 100, 15);
    const both = cellSizes(gridNodes(plate, { cells: 10, grading: { kind: 'power', toward: 'both', exponent: 2 } }).x);
    // xi^2 / (xi^2 + (1 - xi)^2) is symmetric: first and last cells equal, smallest at the ends.
    expect(both[0]).toBeCloseTo(both[9] as number, 15);
    expect(both[0]).toBeCloseTo(L * (0.01 / (0.01 + 0.81)), 15);
    expect(Math.min(...both)).toBe(both[0]);
  });
  test('geometric toward the base: last/first cell = stretch^((N-1)/N)', () => {
    const N = 12;
    const sizes = cellSizes(gridNodes(plate, { cells: N, grading: { kind: 'geometric', toward: 'base', stretch: 20 } }).x);
    expect((sizes[N - 1] as number) / (sizes[0] as number)).toBeCloseTo(Math.pow(20, (N - 1) / N), 10);
    const tip = cellSizes(gridNodes(plate, { cells: N, grading: { kind: 'geometric', toward: 'tip', stretch: 20 } }).x);
    expect((tip[0] as number) / (tip[N - 1] as number)).toBeCloseTo(Math.pow(20, (N - 1) / N), 10);
  });
  test.each([
    { kind: 'uniform' },
    { kind: 'power', toward: 'tip', exponent: 3 },
    { kind: 'power', toward: 'both', exponent: 2 },
    { kind: 'geometric', toward: 'both', stretch: 15 },
  ] as const)('refinement by 2 is nested (every other fine node is a coarse node): %o', (grading) => {
    const coarse = gridNodes(drawn, { cells: 13, grading }).x;
    const fine = gridNodes(drawn, { cells: 13, grading, refine: 2 }).x;
    expect(fine.length).toBe(2 * (coarse.length - 1) + 1);
    coarse.forEach((v, i) => expect(fine[2 * i]).toBe(v));
  });
  test('nodes on every breakpoint of the profile and of the spec', () => {
    const { x } = gridNodes(drawn, { cells: 40, breakpoints: [0.02, 0.045] });
    for (const b of [0, 0.012, 0.02, 0.03, 0.045, L]) expect(Array.from(x)).toContain(b);
    expect(x.length).toBe(41);
  });
  test('breakpoints closer than 1 % of the nominal cell are merged', () => {
    const merged = mergeBreakpoints(L, 1e-5, [0.02, 0.020005, 1e-6, L - 1e-6]);
    expect(Array.from(merged)).toEqual([0, 0.02, L]);
  });
  test('cells shared in proportion to length, at least one per segment', () => {
    const counts = allocateCells(new Float64Array([0, 0.001, 0.03, 0.05]), 50);
    expect(Array.from(counts)).toEqual([1, 29, 20]);
    expect(Array.from(allocateCells(new Float64Array([0, 0.025, 0.05]), 1))).toEqual([1, 1]);
  });
});

/** G_i summed over the mesh for h linear from hA (base) to hB (tip). */
function totalConductance(mesh: Mesh1D, hA: number, hB: number): number {
  const h = mesh.x.map((x) => hA + ((hB - hA) * x) / mesh.length);
  let sum = 0;
  for (let i = 0; i < mesh.nodes; i++) {
    sum += (mesh.surfaceWeightSelf[i] as number) * (h[i] as number);
    if (i > 0) sum += (mesh.surfaceWeightPrev[i] as number) * (h[i - 1] as number);
    if (i < mesh.nodes - 1) sum += (mesh.surfaceWeightNext[i] as number) * (h[i + 1] as number);
  }
  return sum;
}

describe.each([
  ['plate', plate],
  ['trapezoid (P linear)', trapezoid],
  ['concave parabola (P quadratic)', concave],
  ['cone', cone],
  ['annular', ring],
  ['tabulated', drawn],
] as [string, FinGeometry1D][])('mesh of a %s', (_name, geometry) => {
  const mesh = buildMesh1D(geometry, { cells: 37, grading: { kind: 'power', toward: 'tip', exponent: 2 } });
  test('cell lengths add up to L; interface areas are A at the cell midpoints', () => {
    expect(mesh.dx.reduce((a, b) => a + b, 0)).toBeCloseTo(geometry.length, 15);
    for (let i = 0; i < mesh.nodes - 1; i++) {
      expect(mesh.interfaceArea[i]).toBe(geometry.area(((mesh.x[i] as number) + (mesh.x[i + 1] as number)) / 2));
    }
    expect(mesh.baseArea).toBe(geometry.baseArea);
    expect(mesh.tipArea).toBe(geometry.tipArea);
    expect(mesh.tipPerimeter).toBe(geometry.perimeter(geometry.length));
  });
  test('CV surfaces add up to the face area and the weights integrate a linear h exactly (1e-13)', () => {
    // Simpson exact for P (<= quadratic) times linear h; sums of ~40 positive terms: 1e-13.
    const total = mesh.cvSurface.reduce((a, b) => a + b, 0);
    expect(Math.abs(total / geometry.faceArea - 1)).toBeLessThan(1e-13);
    const exact = geometry.perimeterIntegral(0, geometry.length, 80, 15);
    expect(Math.abs(totalConductance(mesh, 80, 15) / exact - 1)).toBeLessThan(1e-13);
  });
});

test('convex parabola with cooled edges: P has a square root, Simpson converges at order 1.5', () => {
  // The edge term 2t(x) ~ sqrt(L - x) is not a polynomial; the CV surfaces then miss the face area by
  // O(Δx^1.5) in the last cell (measured, the reason for the graded default grid of that profile).
  const error = (cells: number) => {
    const mesh = buildMesh1D(convex, { cells });
    return Math.abs(mesh.cvSurface.reduce((a, b) => a + b, 0) / convex.faceArea - 1);
  };
  const order = Math.log2(error(400) / error(800));
  expect(Math.abs(order - 1.5)).toBeLessThan(0.05);
  expect(error(400)).toBeLessThan(1e-5);
});
