/**
 * Marching squares (Lorensen & Cline 1987, 2-D form). Reference positions come from closed forms:
 * for a field linear in the node coordinates, linear interpolation along each cell edge is exact,
 * so the iso-line of f = x at level c lies exactly on x = c, whatever the grid's shape.
 */
import { describe, expect, it } from 'vitest';
import { contourLines, placeLineLabel, polylineLength } from '../../src/images/contour.js';

function grid(ni: number, nj: number, map: (i: number, j: number) => [number, number]) {
  const x = new Float64Array(ni * nj);
  const y = new Float64Array(ni * nj);
  for (let j = 0; j < nj; j++) for (let i = 0; i < ni; i++) [x[i + j * ni], y[i + j * ni]] = map(i, j);
  return { layout: { ni, nj, offset: 0, strideI: 1, strideJ: ni }, x, y };
}

describe('marching squares on structured grids', () => {
  it.each([0.3, 2.5, 4.75])('f = x on a uniform grid: the level-%d line is x = level from bottom to top', (level) => {
    const g = grid(11, 6, (i, j) => [i * 0.5, j * 0.4]);
    const lines = contourLines(g.layout, g.x, g.y, g.x, level);
    expect(lines).toHaveLength(1);
    const line = lines[0]!;
    expect(line.closed).toBe(false);
    expect(line.x.length).toBe(6); // one crossing per horizontal grid line
    // 1e-12: exact up to rounding, since the interpolation is exact for a linear field.
    for (const v of line.x) expect(Math.abs(v - level)).toBeLessThan(1e-12);
    const ys = [...line.y].sort((a, b) => a - b);
    expect(ys[0]).toBeCloseTo(0, 12);
    expect(ys[ys.length - 1]).toBeCloseTo(2.0, 12);
  });

  it('f = x on a sheared, tapered (trapezoid) grid: still exactly x = level, spanning the local thickness', () => {
    // Boundary-fitted grid of a trapezoid: x = i h, y = eta * halfThickness(x) with a shear in x.
    const ni = 41,
      nj = 9;
    const g = grid(ni, nj, (i, j) => {
      const eta = -1 + (2 * j) / (nj - 1);
      const x = (i / (ni - 1)) * 30 + 0.4 * eta * (i / (ni - 1));
      return [x, eta * (1.5 - i / (ni - 1))];
    });
    const level = 12.3;
    const lines = contourLines(g.layout, g.x, g.y, g.x, level);
    expect(lines).toHaveLength(1);
    for (const v of lines[0]!.x) expect(Math.abs(v - level)).toBeLessThan(1e-12);
  });

  it('f = r² on a fine grid gives one closed circle of radius sqrt(level)', () => {
    const n = 81;
    const g = grid(n, n, (i, j) => [-2 + (4 * i) / (n - 1), -2 + (4 * j) / (n - 1)]);
    const f = g.x.map((x, k) => x * x + (g.y[k] as number) ** 2);
    const lines = contourLines(g.layout, g.x, g.y, f, 1);
    expect(lines).toHaveLength(1);
    expect(lines[0]!.closed).toBe(true);
    // Linear interpolation of r² along an edge of length h = 0.05 errs by at most h² |f''| / (8 |f'|) = h² / (8 r) ≈ 3.1e-4 in r.
    for (let k = 0; k < lines[0]!.x.length; k++) {
      expect(Math.abs(Math.hypot(lines[0]!.x[k]!, lines[0]!.y[k]!) - 1)).toBeLessThan(3.2e-4);
    }
    // Perimeter: a polygon inscribed in (or hugging) the unit circle; 2 pi within 0.1 %.
    expect(polylineLength(lines[0]!)).toBeCloseTo(2 * Math.PI, 2);
  });

  it('resolves a saddle by the cell-centre mean (Lorensen & Cline ambiguity)', () => {
    const g = grid(2, 2, (i, j) => [i, j]);
    // Corners (0,0) and (1,1) high: centre mean 0.5.
    const high = new Float64Array([1, 0, 0, 1]);
    // Level 0.4 < mean: the high corners are joined through the centre, lines cut off the two low corners.
    const joined = contourLines(g.layout, g.x, g.y, high, 0.4);
    expect(joined).toHaveLength(2);
    // Crossings sit 0.4 from the corner they cut off (t = 0.6 or 0.4 along unit edges); the other corners are >= 0.6 away.
    const cutsLowCorner = (line: { x: Float64Array; y: Float64Array }): boolean =>
      line.x.every((x, k) => Math.hypot(x - 1, line.y[k]! - 0) < 0.5) || line.x.every((x, k) => Math.hypot(x - 0, line.y[k]! - 1) < 0.5);
    expect(joined.every(cutsLowCorner)).toBe(true);
    // Level 0.6 > mean: the high corners are separated, lines cut them off.
    const separated = contourLines(g.layout, g.x, g.y, high, 0.6);
    expect(separated).toHaveLength(2);
    const nearHigh = (line: { x: Float64Array; y: Float64Array }): boolean =>
      line.x.every((x, k) => Math.hypot(x, line.y[k]!) < 0.5) || line.x.every((x, k) => Math.hypot(x - 1, line.y[k]! - 1) < 0.5);
    expect(separated.every(nearHigh)).toBe(true);
  });

  it('skips cells with a NaN node, and follows strides (a transposed layout gives the same lines)', () => {
    const ni = 6,
      nj = 5;
    const g = grid(ni, nj, (i, j) => [i, j]);
    const f = Float64Array.from(g.x);
    f[2 + 2 * ni] = Number.NaN;
    const lines = contourLines(g.layout, g.x, g.y, f, 2.5);
    // The NaN node removes the 4 cells around it; the x = 2.5 line crosses two of them, so it splits in two pieces.
    expect(lines).toHaveLength(2);
    const total = lines.reduce((s, l) => s + polylineLength(l), 0);
    expect(total).toBeCloseTo(2, 12);

    // Same field stored j-fastest (strideI = nj, strideJ = 1).
    const xT = new Float64Array(ni * nj),
      yT = new Float64Array(ni * nj);
    for (let j = 0; j < nj; j++)
      for (let i = 0; i < ni; i++) {
        xT[i * nj + j] = i;
        yT[i * nj + j] = j;
      }
    const t = contourLines({ ni, nj, offset: 0, strideI: nj, strideJ: 1 }, xT, yT, xT, 3.25);
    expect(t).toHaveLength(1);
    for (const v of t[0]!.x) expect(v).toBeCloseTo(3.25, 12);
  });

  it('places a label mid-line, rotated along it, never upside down', () => {
    const horizontal = { x: new Float64Array([0, 100, 200]), y: new Float64Array([50, 50, 50]), closed: false };
    const a = placeLineLabel(horizontal, 40)!;
    expect([a.x, a.y, a.angle]).toEqual([100, 50, 0]);
    const leftwards = { x: new Float64Array([200, 0]), y: new Float64Array([0, 200]), closed: false };
    const b = placeLineLabel(leftwards, 40)!;
    expect(b.angle).toBeCloseTo(-45, 12); // the chord points at 135 degrees; turned by 180 to read left to right
    expect(placeLineLabel({ x: new Float64Array([0, 30]), y: new Float64Array([0, 0]), closed: false }, 40)).toBeNull();
  });
});
