import { describe, expect, it } from 'vitest';
import { assembleConduction2D } from '../../src/fd/two-d/assemble.js';
import { applyStencil9 } from '../../src/fd/linear-algebra/stencil9.js';
import { buildGrid2D } from '../../src/mesh/grid2d.js';
import { sectionOf } from '../../src/mesh/grid2d-section.js';

describe('2-D conduction operator', () => {
  it('on a uniform rectangular grid is the 5-point vertex-centred finite-volume scheme', () => {
    // The classical scheme (e.g. Patankar 1980, Numerical Heat Transfer and Fluid Flow, ch. 4 [from memory]):
    // interior couplings -k dy/dx along x and -k dx/dy across, no diagonal couplings.
    const section = sectionOf({ kind: 'rectangular', length: 0.04, thickness: 0.004, width: 1 });
    const grid = buildGrid2D(section, { nx: 9, ny: 5 });
    const k = 200;
    const K = assembleConduction2D(grid, k);
    const dx = 0.04 / 8;
    const dy = 0.002 / 4;
    const p = 4 * 5 + 2; // interior node (4, 2)
    // Sums of a few products of exact binary fractions: agreement to 1e-12 relative.
    expect(K.east[p]).toBeCloseTo((-k * dy) / dx, 9);
    expect(K.north[p]).toBeCloseTo((-k * dx) / dy, 6);
    expect(Math.abs(K.northEast[p] as number)).toBeLessThan(1e-9);
    expect(Math.abs(K.southEast[p] as number)).toBeLessThan(1e-9);
    expect(K.diag[p]).toBeCloseTo(2 * k * (dy / dx + dx / dy), 6);
  });

  it.each([
    ['trapezoidal', sectionOf({ kind: 'trapezoidal', length: 0.02, baseThickness: 0.006, tipThickness: 0.002, width: 1 })],
    ['triangular (collapsed tip)', sectionOf({ kind: 'triangular', length: 0.02, baseThickness: 0.006, width: 1 })],
    ['conical pin', sectionOf({ kind: 'conical-pin', length: 0.02, baseDiameter: 0.006, tipDiameter: 0.002 })],
    ['annular', sectionOf({ kind: 'annular', innerRadius: 0.01, outerRadius: 0.03, thickness: 0.002 })],
  ])('is conservative and positive semi-definite on a %s section', (_, section) => {
    const grid = buildGrid2D(section, { nx: 11, ny: 6, baseGrading: 3, faceGrading: 2 });
    const K = assembleConduction2D(grid, 50);
    const n = grid.nodesX * grid.nodesY;
    const ones = new Float64Array(n).fill(1);
    const Kx = applyStencil9(K, ones, new Float64Array(n));
    const scale = Math.max(...K.diag.map(Math.abs));
    // Zero row sums (a uniform field conducts no heat): round-off of ~10 additions per row.
    for (const v of Kx) expect(Math.abs(v)).toBeLessThan(1e-12 * scale);
    // A linear field theta = x + 2y conducts a constant flux: K theta vanishes at interior nodes of
    // planar sections (linear exactness of the scheme); energy theta^T K theta >= 0 everywhere.
    const theta = Float64Array.from({ length: n }, (_, p) => (grid.x[p] as number) + 2 * (grid.y[p] as number));
    const Kt = applyStencil9(K, theta, new Float64Array(n));
    let energy = 0;
    for (let p = 0; p < n; p++) energy += (theta[p] as number) * (Kt[p] as number);
    expect(energy).toBeGreaterThan(0);
    if (grid.section === 'planar') {
      for (let i = 1; i + 1 < grid.nodesX - (grid.collapsedTip ? 1 : 0); i++) {
        // |theta| <= 0.03 m: round-off of ~20 terms of size scale * 0.03.
        for (let j = 1; j + 1 < grid.nodesY; j++) expect(Math.abs(Kt[i * grid.nodesY + j] as number)).toBeLessThan(1e-13 * scale);
      }
    }
  });
});
