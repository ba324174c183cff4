import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { SolverError } from '../../src/errors.js';
import { factorBandedCholesky } from '../../src/fd/sparse/bandedCholesky.js';
import { residual, stencilToDense, type Stencil9 } from '../../src/fd/sparse/stencil9.js';
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
