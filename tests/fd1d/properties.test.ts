/**
 * Properties of the fd-1d solution for random valid cases (fast-check): conservation, the discrete
 * maximum principle, monotone temperature, efficiency bounds, and agreement with a dense LU solve of
 * the same assembled system.
 *
 * Why they must hold: the assembly is conservative (interface fluxes cancel in pairs) and its matrix
 * is an M-matrix with non-negative row sums (G_i >= 0 and boundary conductances >= 0), so
 * (i) Q_base = Q_surf up to round-off; (ii) 0 <= θ <= θ_b when the rhs is non-negative and bounded by
 * θ_b times the row sums (discrete maximum principle: Varga, R. S., Matrix Iterative Analysis, 1962,
 * M-matrices have non-negative inverses [from memory]); (iii) the flux K_i(θ_i - θ_{i+1}) equals the
 * heat lost beyond interface i, which is >= 0, so θ does not increase toward a tip that loses heat.
 */
import { fc, test } from '@fast-check/vitest';
import { describe, expect } from 'vitest';
import { assembleFin1D } from '../../src/fd/one-d/assemble.js';
import { hAtNodes, hBreakpoints } from '../../src/fd/problem/convection.js';
import { autoGrading, solveFin1D } from '../../src/fd/one-d/linear-solve.js';
import { finProblem1D } from '../../src/fd/one-d/problem.js';
import { solveTridiagonal } from '../../src/fd/linear-algebra/tridiagonal.js';
import { buildMesh1D } from '../../src/mesh/grid1d.js';
import { finCaseArbitrary } from './support/arbitraries.js';
import { denseSolve } from './support/dense.js';

const nodes = fc.integer({ min: 3, max: 400 });

describe('random cases (fast-check)', () => {
  test.prop([finCaseArbitrary, nodes])('energy balance at round-off', (fin, n) => {
    // Conservative scheme: only the solve's round-off remains (measured <= ~1e-12 at these sizes).
    expect(solveFin1D(fin, { nodes: n }).energyBalance).toBeLessThan(1e-10);
  });

  test.prop([finCaseArbitrary, nodes])('maximum principle: ambient <= T <= base', (fin, n) => {
    const result = solveFin1D(fin, { nodes: n });
    const thetaBase = fin.base.T_degC - fin.convection.ambient_degC;
    // Round-off allowance: 1e-12 of θ_b (values are computed with relative error ~n eps).
    const slack = 1e-12 * thetaBase;
    for (const theta of result.theta) {
      expect(theta).toBeGreaterThanOrEqual(-slack);
      expect(theta).toBeLessThanOrEqual(thetaBase + slack);
    }
    expect(result.heatRate).toBeGreaterThanOrEqual(0);
  });

  test.prop([finCaseArbitrary.filter((c) => c.convection.tip.kind !== 'temperature'), nodes])(
    'a fin that loses heat at its tip: θ non-increasing',
    (fin, n) => {
      const theta = solveFin1D(fin, { nodes: n }).theta;
      const slack = 1e-12 * (theta[0] as number);
      for (let i = 1; i < theta.length; i++) expect(theta[i] as number).toBeLessThanOrEqual((theta[i - 1] as number) + slack);
    },
  );

  // Efficiency <= 1 needs every heat sink inside the ideal reference: true for adiabatic and convective
  // tips; an infinite tip's continuation (a virtual fin beyond L) is not part of the ideal surface.
  test.prop([finCaseArbitrary.filter((c) => c.convection.tip.kind === 'adiabatic' || c.convection.tip.kind === 'convective'), nodes])(
    'adiabatic or convective tip: 0 < efficiency <= 1',
    (fin, n) => {
      const result = solveFin1D(fin, { nodes: n });
      expect(result.efficiency).toBeGreaterThan(0);
      expect(result.efficiency).toBeLessThanOrEqual(1 + 1e-12);
    },
  );

  test.prop([finCaseArbitrary, fc.integer({ min: 3, max: 80 })])('the solver equals a dense LU solve of the same system', (fin, n) => {
    const problem = finProblem1D(fin);
    const mesh = buildMesh1D(problem.geometry, {
      cells: n - 1,
      grading: autoGrading(problem.geometry),
      breakpoints: hBreakpoints(problem.h, problem.geometry.length),
    });
    const hNodes = hAtNodes(problem.h, mesh.x, problem.geometry.length);
    const system = assembleFin1D(mesh, problem.conductivity, hNodes, problem.base, problem.tip);
    const fast = solveTridiagonal(system);
    const dense = denseSolve(system);
    const scale = Math.max(...Array.from(dense, Math.abs));
    // Both solvers are backward stable, but on different data: the row-sum solver keeps G_i exactly,
    // LU sees the stored diagonal (G_i to ~eps K/G). Their difference is bounded by the rounding of the
    // stored matrix, ~eps cond∞(A) max|θ| (first-order perturbation theory: Higham, Accuracy and
    // Stability of Numerical Algorithms, 2002, Thm 7.2 [from memory]); ‖A⁻¹‖∞ = max(A⁻¹1) for an
    // M-matrix. Tolerance: 1e-12 of max|θ| or 8 eps cond∞, whichever is larger (1e-12 in most cases).
    const size = mesh.nodes;
    const ones = solveTridiagonal({ ...system, rhs: new Float64Array(size).fill(1) });
    let normA = 0;
    for (let i = 0; i < size; i++) {
      normA = Math.max(normA, Math.abs(system.diag[i] as number) + Math.abs(system.lower[i] as number) + Math.abs(system.upper[i] as number));
    }
    const condition = Math.max(...Array.from(ones)) * normA;
    const tolerance = Math.max(1e-12, 8 * Number.EPSILON * condition) * scale;
    for (let i = 0; i < fast.length; i++) expect(Math.abs((fast[i] as number) - (dense[i] as number))).toBeLessThan(tolerance);
  });
});
