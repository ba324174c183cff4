import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import type { Profile } from '../../src/case/types.js';
import { assembleConduction2D } from '../../src/fd/two-d/assemble.js';
import { buildSystem2D, discretizeBoundaries } from '../../src/fd/two-d/boundary.js';
import { fin2dProblem } from '../../src/fd/two-d/problem.js';
import { heatRates2D } from '../../src/fd/two-d/heat-rate.js';
import { chooseSolverMethod, prepareSolver2D } from '../../src/fd/linear-algebra/auto-solver.js';
import { galerkinAlongX, galerkinAlongY, linearTransfer } from '../../src/fd/linear-algebra/coarsen.js';
import { applyFullStencil, toFullStencil } from '../../src/fd/linear-algebra/full-stencil.js';
import { buildMultigrid } from '../../src/fd/linear-algebra/multigrid.js';
import { solveMgPcg } from '../../src/fd/linear-algebra/pcg.js';
import { stencilToDense } from '../../src/fd/linear-algebra/stencil9.js';
import { buildGrid2D } from '../../src/mesh/grid2d.js';
import { randomSpdStencil } from './random.js';
import { finCase } from '../support/fin-case.js';
import { TEMPERATURES_2D } from './cases.js';

function finSystem(profile: Profile, k: number, h: number, nx: number, ny: number) {
  const problem = fin2dProblem(finCase({ profile: profile, k: k, h: { kind: 'uniform', h }, tip: { kind: 'convective', h: null }, ...TEMPERATURES_2D }));
  const grid = buildGrid2D(problem.section, { nx, ny, baseGrading: 8, faceGrading: 8 });
  const K = assembleConduction2D(grid, k);
  const terms = discretizeBoundaries(grid, problem.conditions);
  return { K, terms, system: buildSystem2D(K, terms) };
}

describe('multigrid-preconditioned CG', () => {
  it.each([
    [9, 9],
    [33, 5],
    [6, 40],
  ])('matches a dense Cholesky solve (ml-matrix) on a random conduction-like matrix, %i x %i', (nx, ny) => {
    const a = randomSpdStencil(nx, ny, nx * 7 + ny);
    const rhs = Float64Array.from({ length: nx * ny }, (_, p) => Math.sin(0.37 * p));
    const { x } = solveMgPcg({ matrix: a, rhs, excess: a.excess });
    const ref = new CholeskyDecomposition(new Matrix(stencilToDense(a))).solve(Matrix.columnVector(Array.from(rhs))).getColumn(0);
    const scale = Math.max(...ref.map(Math.abs));
    // CG stops at a relative residual of 1e-12; with condition numbers < 1e3 the error is < 1e-9 relative,
    // measured below 1e-10.
    ref.forEach((v, p) => expect(Math.abs((x[p] as number) - v)).toBeLessThan(1e-9 * scale));
  });

  it('the V-cycle is a symmetric positive definite operator (required by CG)', () => {
    const { system } = finSystem({ kind: 'trapezoidal', length: 0.02, baseThickness: 0.004, tipThickness: 0.001, width: 1 }, 20, 3000, 65, 17);
    const mg = buildMultigrid(system.matrix);
    const n = system.rhs.length;
    const u = Float64Array.from({ length: n }, (_, p) => Math.sin(1.3 * p) + 0.2);
    const v = Float64Array.from({ length: n }, (_, p) => Math.cos(0.7 * p));
    const mu = new Float64Array(n);
    const mv = new Float64Array(n);
    mg.apply(u, mu);
    mg.apply(v, mv);
    let uMv = 0;
    let vMu = 0;
    let uMu = 0;
    for (let p = 0; p < n; p++) {
      uMv += (u[p] as number) * (mv[p] as number);
      vMu += (v[p] as number) * (mu[p] as number);
      uMu += (u[p] as number) * (mu[p] as number);
    }
    // Symmetric to round-off of sums over ~1e3 terms.
    expect(Math.abs(uMv - vMu)).toBeLessThan(1e-12 * Math.sqrt(Math.abs(uMu) * n));
    expect(uMu).toBeGreaterThan(0);
  });

  it('Galerkin coarse operators of a conduction matrix conserve heat (zero row sums, symmetric)', () => {
    // P interpolates constants exactly, so P^T K P has zero row sums when K has.
    const { K } = finSystem({ kind: 'triangular', length: 0.02, baseThickness: 0.004, width: 1 }, 20, 3000, 33, 9);
    const fine = toFullStencil(K);
    const coarse = galerkinAlongY(galerkinAlongX(fine, linearTransfer(fine.nodesX)), linearTransfer(fine.nodesY));
    const ones = new Float64Array(coarse.nodesX * coarse.nodesY).fill(1);
    const out = new Float64Array(ones.length);
    applyFullStencil(coarse, ones, out);
    const scale = Math.max(...coarse.c[4]);
    // Round-off of sums of ~100 products.
    for (const v of out) expect(Math.abs(v)).toBeLessThan(1e-12 * scale);
    // Symmetry: east of p equals west of its east neighbour.
    const ny = coarse.nodesY;
    for (let p = 0; p + ny < out.length; p++) expect(coarse.c[7][p]).toBeCloseTo(coarse.c[1][p + ny] as number, 9);
  });
});

describe.each([
  ['thin plate (x couplings dominate)', { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 1 }, 200, 40, 801, 21],
  ['thick plate (y couplings dominate)', { kind: 'rectangular', length: 0.02, thickness: 0.004, width: 1 }, 20, 3000, 101, 65],
  ['stubby plate (fewer nodes along than across)', { kind: 'rectangular', length: 0.002, thickness: 0.008, width: 1 }, 20, 5000, 17, 129],
  ['triangular (collapsed tip)', { kind: 'triangular', length: 0.02, baseThickness: 0.004, width: 1 }, 20, 3000, 201, 33],
  ['conical pin', { kind: 'conical-pin', length: 0.02, baseDiameter: 0.004, tipDiameter: 0.001 }, 20, 3000, 129, 33],
  ['annular', { kind: 'annular', innerRadius: 0.01, outerRadius: 0.03, thickness: 0.002 }, 50, 500, 201, 17],
] as [string, Profile, number, number, number, number][])('both solvers on a %s', (_, profile, k, h, nx, ny) => {
  it('agree on the heat rate, keep the energy balance and converge in few iterations', () => {
    const { K, terms, system } = finSystem(profile, k, h, nx, ny);
    const direct = prepareSolver2D(system, 'banded-cholesky').solve(system);
    const mg = buildMultigrid(system.matrix);
    const { x, report } = solveMgPcg(system, {}, mg);
    const qd = heatRates2D(K, terms, direct);
    const qm = heatRates2D(K, terms, x);
    // CG stops at a relative residual of 1e-12 and the heat rate follows at up to ~30x that (measured
    // 1.2e-10 on the thin plate); 1e-9 is still four orders below the discretisation error (~1e-5).
    expect(Math.abs(qm.base / qd.base - 1)).toBeLessThan(1e-9);
    expect(qm.energyBalance).toBeLessThan(1e-9);
    expect(qd.energyBalance).toBeLessThan(1e-9);
    // 6-9 iterations measured on these shapes (zebra line relaxation): a guard against losing the multigrid efficiency.
    expect(report.iterations).toBeLessThanOrEqual(14);
  });
});

describe('automatic solver choice', () => {
  it('takes the banded factor on thin grids and multigrid on wide ones', () => {
    expect(chooseSolverMethod(2000, 20)).toBe('banded-cholesky');
    expect(chooseSolverMethod(20, 2000)).toBe('banded-cholesky'); // transposed: short direction fastest
    expect(chooseSolverMethod(1000, 1000)).toBe('mg-pcg');
    expect(chooseSolverMethod(10000, 50)).toBe('mg-pcg');
  });
});
