/**
 * The grid solvers of a nonlinear fin (power-law h, radiation, k(T)): Newton's method with continuation,
 * 1-D (one-d/nonlinear-solve.ts) and 2-D (two-d/nonlinear-solve.ts), each grid started from the previous
 * grid's solution. A linear fin handed to them (a variant of a nonlinear fin with its nonlinearity
 * removed, as the assumption ledger makes) takes the linear direct solve.
 */
import { solveNonlinearProblem1D } from '../one-d/nonlinear-solve.js';
import { isLinearProblem } from '../problem/fin-problem.js';
import { DEFAULT_GRADING } from '../two-d/linear-solve.js';
import { solveNonlinearFin2DProblem } from '../two-d/nonlinear-solve.js';
import type { GridSolvers } from './grid-solver.js';
import { linearGridSolvers } from './linear-grid-solvers.js';

export const newtonGridSolvers: GridSolvers = {
  nonlinear: true,
  oneD: (problem, grid, previous) =>
    isLinearProblem(problem)
      ? linearGridSolvers.oneD(problem, grid)
      : solveNonlinearProblem1D(problem, { nodes: grid.nodes, refine: grid.refine ?? 1, grading: grid.grading ?? 'auto' }, previous),
  twoD: (problem, grid, previous) =>
    isLinearProblem(problem.physics)
      ? linearGridSolvers.twoD(problem, grid)
      : solveNonlinearFin2DProblem(problem, { nx: grid.nx, ny: grid.ny, baseGrading: DEFAULT_GRADING.base, faceGrading: DEFAULT_GRADING.face }, previous),
};
