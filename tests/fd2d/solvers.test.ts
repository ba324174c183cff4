import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { SolverError } from '../../src/errors.js';
import { factorBandedCholesky, tryFactorBandedCholesky } from '../../src/fd/linear-algebra/banded-cholesky.js';
import { factorBanded } from '../../src/fd/linear-algebra/banded-solve.js';
import { factorBandedLdltRowSums } from '../../src/fd/linear-algebra/banded-ldlt.js';
import {
  addCoupling,
  applyDifferenceForm,
  applyStencil9,
  emptyStencil9,
  residual,
  stencilToDense,
  type Stencil9,
} from '../../src/fd/linear-algebra/stencil9.js';
import { randomSpdStencil } from './random.js';

function denseSolve(a: Stencil9, rhs: Float64Array): Float64Array {
  const chol = new CholeskyDecomposition(new Matrix(stencilToDense(a)));
  return Float64Array.from(chol.solve(Matrix.columnVector(Array.from(rhs))).getColumn(0));
}

describe('banded Cholesky (thin direction fastest)', () => {
  it.each([
    [2, 2],
    [7, 3],
    [3, 9],
    [25, 6],
  ])('matches a dense Cholesky solve (ml-matrix) on a random SPD 9-point matrix, %i x %i nodes', (nx, ny) => {
    const a = randomSpdStencil(nx, ny, 17 * nx + ny);
    const rhs = Float64Array.from({ length: nx * ny }, (_, p) => Math.sin(p + 1));
    const x = factorBandedCholesky(a).solve(rhs);
    const ref = denseSolve(a, rhs);
    // Both are backward-stable factorisations of a matrix with condition number < 1e3 here:
    // agreement to 1e-12 relative is round-off.
    const scale = Math.max(...ref.map(Math.abs));
    for (let p = 0; p < x.length; p++) expect(Math.abs((x[p] as number) - (ref[p] as number))).toBeLessThan(1e-12 * scale);
  });

  it.each([
    [2, 2],
    [7, 3],
    [3, 9],
    [25, 6],
  ])('matches a dense Cholesky solve (ml-matrix) on a random SPD 5-point matrix (band one narrower), %i x %i nodes', (nx, ny) => {
    const a = randomSpdStencil(nx, ny, 31 * nx + ny, true);
    const rhs = Float64Array.from({ length: nx * ny }, (_, p) => Math.cos(p + 2));
    const f = factorBandedCholesky(a);
    expect(f.bandwidth).toBe(ny);
    const x = f.solve(rhs);
    const ref = denseSolve(a, rhs);
    // As above: both backward stable, condition number < 1e3, so 1e-12 relative is round-off.
    const scale = Math.max(...ref.map(Math.abs));
    for (let p = 0; p < x.length; p++) expect(Math.abs((x[p] as number) - (ref[p] as number))).toBeLessThan(1e-12 * scale);
  });

  it('factors once and solves many right-hand sides (the factor is not altered by a solve)', () => {
    const a = randomSpdStencil(30, 5, 3);
    const f = factorBandedCholesky(a);
    for (let s = 0; s < 3; s++) {
      const rhs = Float64Array.from({ length: 150 }, (_, p) => Math.cos(p * (s + 1)));
      const x = f.solve(rhs);
      const r = residual({ matrix: a, rhs }, x);
      // Residual at round-off relative to |rhs| ~ 1.
      expect(Math.max(...r.map(Math.abs))).toBeLessThan(1e-12);
    }
  });

  it('reports a matrix that is not positive definite as a solver failure', () => {
    const a = randomSpdStencil(4, 4, 5);
    a.diag[5] = -1;
    expect(() => factorBandedCholesky(a)).toThrow(SolverError);
  });
});

describe('banded Cholesky in blocks of four rows (padded rows, 4 x 2 products, a 4 x 4 diagonal block)', () => {
  // Shapes that reach every path: node counts 1, 2 and 3 past a multiple of four (rows factored one at a time at
  // the end), odd and even bandwidths (a column left over after the pairs), blocks that start before and after
  // the band is full (p0 <= w and p0 > w), a grid with more nodes across than along, a single column.
  const shapes: [number, number, boolean][] = [
    [41, 5, false],
    [13, 7, true],
    [50, 3, false],
    [6, 11, false],
    [1, 9, true],
    [33, 4, true],
  ];

  it.each(shapes)('matches a dense Cholesky solve (ml-matrix) and recovers an exact solution, %i x %i nodes (5-point: %s)', (nx, ny, fivePoint) => {
    const a = randomSpdStencil(nx, ny, 7 * nx + 3 * ny, fivePoint);
    const n = nx * ny;
    // A manufactured exact solution x*, rhs = A x*.
    const exact = Float64Array.from({ length: n }, (_, p) => 1 + 0.5 * Math.sin(0.7 * p));
    const rhs = applyStencil9(a, exact, new Float64Array(n));
    const scale = Math.max(...exact.map(Math.abs));
    const f = factorBandedCholesky(a);
    expect(f.bandwidth).toBe(fivePoint ? ny : ny + 1);
    const x = f.solve(rhs);
    const ref = denseSolve(a, rhs);
    // Both backward stable on a matrix with condition number < 1e3 (randomSpdStencil): 1e-12 relative is round-off,
    // against the dense factorisation and against the exact solution alike.
    for (let p = 0; p < n; p++) {
      expect(Math.abs((x[p] as number) - (ref[p] as number))).toBeLessThan(1e-12 * scale);
      expect(Math.abs((x[p] as number) - (exact[p] as number))).toBeLessThan(1e-12 * scale);
    }
  });

  it('a released factor refuses to solve, and a factor built in its storage gives the same bits as one built fresh', () => {
    const small = randomSpdStencil(17, 5, 3);
    const rhs = Float64Array.from({ length: 85 }, (_, p) => Math.cos(p));
    const fresh = factorBandedCholesky(small).solve(rhs);
    // A larger factor released: its band (full of factor entries) is kept and the next factorisation reuses it.
    const large = factorBandedCholesky(randomSpdStencil(90, 14, 4));
    large.release();
    expect(() => large.solve(new Float64Array(90 * 14))).toThrow(/after release/);
    const reused = factorBandedCholesky(small).solve(rhs);
    for (let p = 0; p < rhs.length; p++) expect(reused[p]).toBe(fresh[p]);
  });

  it('names the first unknown whose pivot is not positive, wherever it falls in a block of four', () => {
    for (let p = 0; p < 10; p++) {
      const a = randomSpdStencil(5, 2, 11);
      a.diag[p] = -1;
      const outcome = tryFactorBandedCholesky(a);
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) {
        expect(outcome.unknown).toBe(p);
        expect(outcome.pivot).toBeLessThan(0);
      }
    }
  });
});

describe('A x in difference form (what CG and the refinement residuals use)', () => {
  it.each([
    [9, 5, true],
    [9, 5, false],
    [30, 12, true],
    [4, 3, true],
  ])('equals the dense product on a random %i x %i matrix (5-point: %s), and returns x . A x', (nx, ny, fivePoint) => {
    const a = randomSpdStencil(nx, ny, 13 * nx + ny, fivePoint);
    const n = nx * ny;
    const x = Float64Array.from({ length: n }, (_, p) => 3 + Math.sin(1.3 * p));
    const out = new Float64Array(n);
    const energy = applyDifferenceForm(a, a.excess, x, out);
    const dense = stencilToDense(a);
    let xAx = 0;
    for (let p = 0; p < n; p++) {
      let ax = 0;
      let size = 0;
      for (let q = 0; q < n; q++) {
        ax += ((dense[p] as number[])[q] as number) * (x[q] as number);
        size += Math.abs(((dense[p] as number[])[q] as number) * (x[q] as number));
      }
      xAx += ax * (x[p] as number);
      // Two summation orders of the same row: they differ by round-off in the terms' sizes (~1e-15 each).
      expect(Math.abs((out[p] as number) - ax)).toBeLessThan(1e-13 * size);
    }
    expect(Math.abs(energy - xAx)).toBeLessThan(1e-12 * Math.abs(xAx));
  });
});

describe('banded LDL^T carrying the row sums (for couplings of very different sizes)', () => {
  it.each([
    [2, 2],
    [9, 4],
    [20, 7],
  ])('matches a dense Cholesky solve (ml-matrix) on a random conduction-like matrix, %i x %i nodes', (nx, ny) => {
    const a = randomSpdStencil(nx, ny, 31 * nx + ny);
    const rhs = Float64Array.from({ length: nx * ny }, (_, p) => Math.cos(3 * p));
    const x = factorBandedLdltRowSums(a, a.excess).solve(rhs);
    const ref = denseSolve(a, rhs);
    // Well-conditioned (< 1e3): round-off agreement.
    const scale = Math.max(...ref.map(Math.abs));
    for (let p = 0; p < x.length; p++) expect(Math.abs((x[p] as number) - (ref[p] as number))).toBeLessThan(1e-11 * scale);
  });

  it('solves a chain of huge couplings that plain Cholesky cannot (a collapsing column)', () => {
    // One column of 30 nodes joined by conductances 1e17, node 0 tied to theta = 0 by conductance 1,
    // 1 W injected at the top node. Exact: theta_j = 1 + j * 1e-17 (series conductances). In the
    // diagonal 2e17 + 1 the tie to ground is below the last bit.
    const ny = 30;
    const a = emptyStencil9(1, ny);
    const excess = new Float64Array(ny);
    for (let j = 0; j + 1 < ny; j++) {
      addCoupling(a, 0, j, 0, 1, -1e17);
      addCoupling(a, 0, j, 0, 0, 1e17);
      addCoupling(a, 0, j + 1, 0, 0, 1e17);
    }
    addCoupling(a, 0, 0, 0, 0, 1);
    excess[0] = 1;
    const rhs = new Float64Array(ny);
    rhs[ny - 1] = 1;
    // Plain Cholesky loses the conductance to ground to round-off: it fails or returns nonsense.
    let plainError: number;
    try {
      const xc = factorBandedCholesky(a).solve(rhs);
      plainError = Math.abs((xc[0] as number) - 1);
    } catch {
      plainError = Infinity;
    }
    expect(plainError).toBeGreaterThan(1e-3);
    const x = factorBanded({ matrix: a, rhs, excess }).solve(rhs);
    // Each pivot keeps full relative accuracy: theta_0 = 1 to round-off.
    for (let j = 0; j < ny; j++) expect(Math.abs((x[j] as number) - 1)).toBeLessThan(1e-14);
  });
});
