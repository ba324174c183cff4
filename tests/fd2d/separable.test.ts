/**
 * Fast diagonalisation of Kronecker-sum systems (src/fd/linear-algebra/tensor-form.ts, separable-solve.ts,
 * tridiagonal-eigen.ts) against the banded Cholesky solve of the same system, on the fin systems the 2-D model
 * assembles.
 */
import { describe, expect, it } from 'vitest';
import type { Case } from '../../src/case/index.js';
import { prepareSolver2D } from '../../src/fd/linear-algebra/auto-solver.js';
import { tensorForm } from '../../src/fd/linear-algebra/tensor-form.js';
import { prepareSeparable } from '../../src/fd/linear-algebra/separable-solve.js';
import { tridiagonalEigen } from '../../src/fd/linear-algebra/tridiagonal-eigen.js';
import { residual, type System2D } from '../../src/fd/linear-algebra/stencil9.js';
import { assembleConduction2D } from '../../src/fd/two-d/assemble.js';
import { buildSystem2D, discretizeBoundaries } from '../../src/fd/two-d/boundary.js';
import { solveFin2D } from '../../src/fd/two-d/linear-solve.js';
import { fin2dProblem } from '../../src/fd/two-d/problem.js';
import { buildGrid2D } from '../../src/mesh/grid2d.js';
import { finCase } from '../support/fin-case.js';
import { TEMPERATURES_2D } from './cases.js';

function systemOf(c: Case, nx: number, ny: number): System2D {
  const problem = fin2dProblem(c);
  const grid = buildGrid2D(problem.section, { nx, ny, baseGrading: 8, faceGrading: 8 });
  return buildSystem2D(assembleConduction2D(grid, problem.k), discretizeBoundaries(grid, problem.conditions));
}

const plate = (over: Partial<Parameters<typeof finCase>[0]> = {}): Case =>
  finCase({
    profile: { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 0.08 },
    k: 200,
    h: { kind: 'uniform', h: 45 },
    tip: { kind: 'convective', h: null },
    ...TEMPERATURES_2D,
    ...over,
  });

describe('symmetric tridiagonal eigenproblem (implicit QL)', () => {
  it.each([1, 2, 5, 33, 64])('tridiag(-1, 2, -1) of order %i: the closed-form eigenvalues, orthonormal eigenvectors', (n) => {
    // Eigenvalues 2 - 2 cos(k pi / (n + 1)), k = 1..n: the second-difference matrix (G. Strang, "Computational
    // Science and Engineering", Wellesley-Cambridge 2007, section 1.5).
    const { values, vectors } = tridiagonalEigen(new Float64Array(n).fill(2), new Float64Array(Math.max(0, n - 1)).fill(-1));
    for (let k = 0; k < n; k++) expect(values[k]).toBeCloseTo(2 - 2 * Math.cos(((k + 1) * Math.PI) / (n + 1)), 13);
    // Orthonormal columns and T w = lambda w, to round-off of a 4-norm matrix (1e-13 leaves ~100 eps for n = 64).
    for (let a = 0; a < n; a++) {
      for (let b = 0; b < n; b++) {
        let dot = 0;
        for (let j = 0; j < n; j++) dot += (vectors[j * n + a] as number) * (vectors[j * n + b] as number);
        expect(Math.abs(dot - (a === b ? 1 : 0))).toBeLessThan(1e-13);
      }
      for (let j = 0; j < n; j++) {
        const w = (i: number): number => (i < 0 || i >= n ? 0 : (vectors[i * n + a] as number));
        expect(Math.abs(2 * w(j) - w(j - 1) - w(j + 1) - (values[a] as number) * w(j))).toBeLessThan(1e-13);
      }
    }
  });

  it('entries of very different sizes (a graded thin-fin operator): eigenpairs to round-off of the largest', () => {
    const n = 20;
    const diag = Float64Array.from({ length: n }, (_, j) => 10 ** (j / 3) * 2 + (j === n - 1 ? 1e-6 : 0));
    const off = Float64Array.from({ length: n - 1 }, (_, j) => -(10 ** ((j + 0.5) / 3)));
    const { values, vectors } = tridiagonalEigen(diag, off);
    const norm = Math.max(...values.map(Math.abs));
    for (let a = 0; a < n; a++) {
      for (let j = 0; j < n; j++) {
        const w = (i: number): number => (i < 0 || i >= n ? 0 : (vectors[i * n + a] as number));
        const tw = (diag[j] as number) * w(j) + (j > 0 ? (off[j - 1] as number) * w(j - 1) : 0) + (j + 1 < n ? (off[j] as number) * w(j + 1) : 0);
        // Backward stable: |T w - lambda w| ~ eps ||T|| (1e-13 ||T|| is ~500 eps).
        expect(Math.abs(tw - (values[a] as number) * w(j))).toBeLessThan(1e-13 * norm);
      }
    }
    for (let k = 1; k < n; k++) expect(values[k] as number).toBeGreaterThanOrEqual(values[k - 1] as number);
  });
});

describe('Kronecker-sum form of an assembled fin system', () => {
  it('rectangular fins on graded rectangular cells are Kronecker sums (convective or fixed tip, contact base)', () => {
    expect(tensorForm(systemOf(plate(), 41, 9))).not.toBeNull();
    expect(tensorForm(systemOf(plate({ contactResistance: 1e-4 }), 41, 9))).not.toBeNull();
    const fixedTip = tensorForm(systemOf(plate({ tip: { kind: 'temperature', T_degC: 30 } }), 41, 9));
    // The fixed base and tip columns are identity rows, set apart from the block.
    expect(fixedTip).not.toBeNull();
    expect([fixedTip?.first, fixedTip?.last]).toEqual([1, 39]);
  });

  it('h varying along the fin, or a sloped face, is not', () => {
    expect(tensorForm(systemOf(plate({ h: { kind: 'linear', base: 80, tip: 30 } }), 41, 9))).toBeNull();
    const trapezoid = plate({ profile: { kind: 'trapezoidal', length: 0.04, baseThickness: 0.003, tipThickness: 0.001, width: 0.08 } });
    expect(tensorForm(systemOf(trapezoid, 41, 9))).toBeNull();
  });
});

describe('fast diagonalisation against the banded Cholesky solve', () => {
  it.each([
    ['convective tip, 205 x 33', plate(), 205, 33],
    [
      'contact base, thin and long',
      plate({ contactResistance: 0.5e-4, profile: { kind: 'rectangular', length: 0.08, thickness: 0.001, width: 0.08 } }),
      401,
      17,
    ],
    ['fixed tip, 101 x 17', plate({ tip: { kind: 'temperature', T_degC: 30 } }), 101, 17],
  ] as [string, Case, number, number][])('%s: the same field and heat rate', (_name, c, nx, ny) => {
    const banded = solveFin2D(c, { nx, ny, method: 'banded-cholesky' });
    const fast = solveFin2D(c, { nx, ny });
    expect(banded.solver).toBe('banded-cholesky');
    expect(fast.solver).toBe('separable');
    // Both are refined to the round-off floor of the field (eps sum A_pp |x_p|); measured <= 1e-13 relative in the
    // heat rate and 1e-15 of theta_b in the field; 1e-11 leaves room for other grids and still catches a wrong
    // factor (a mis-fitted row sum moves the heat rate by its own relative size, > 1e-10 by SEPARABLE_TOLERANCE).
    expect(Math.abs(fast.heatRate_W / banded.heatRate_W - 1)).toBeLessThan(1e-11);
    expect(Math.abs(fast.energyBalance)).toBeLessThan(1e-9);
    let worst = 0;
    for (let p = 0; p < fast.field.length; p++) worst = Math.max(worst, Math.abs((fast.field[p] as number) - (banded.field[p] as number)));
    expect(worst).toBeLessThan(1e-11 * 60);
  });

  it('one unrefined solve already solves the system to a relative residual below 1e-8', () => {
    const system = systemOf(plate(), 205, 33);
    const form = tensorForm(system);
    if (form === null) throw new Error('not a Kronecker sum');
    const x = prepareSeparable(form, system.matrix).solve(system.rhs);
    const r = residual(system, x);
    let size = 0;
    let scale = 0;
    for (let p = 0; p < r.length; p++) {
      size += Math.abs(r[p] as number);
      scale += Math.abs(system.rhs[p] as number);
    }
    expect(size / scale).toBeLessThan(1e-8);
  });

  it('asked for explicitly on a system that is not a Kronecker sum, the band solves it and says so', () => {
    const system = systemOf(plate({ h: { kind: 'linear', base: 80, tip: 30 } }), 41, 13);
    const prepared = prepareSolver2D(system, 'separable');
    prepared.solve(system);
    expect(prepared.method).toBe('banded-cholesky');
  });
});
