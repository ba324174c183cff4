/**
 * The grid solvers of a linear fin (n = 0, ε = 0, constant k): one direct solve per grid, 1-D
 * (one-d/linear-solve.ts: row-sum Thomas) or 2-D (two-d/linear-solve.ts: banded Cholesky or MG-PCG by grid
 * shape). The default grading of each model.
 */
import { finHeatRate1D, solveFinProblem1D } from '../one-d/linear-solve.js';
import type { FinProblem1D } from '../one-d/problem.js';
import type { FinProblem } from '../problem/fin-problem.js';
import { DEFAULT_GRADING, solveFin2DProblem } from '../two-d/linear-solve.js';
import type { Grid1D, GridSolvers } from './grid-solver.js';

/** The linear 1-D problem of a linear fin (constant k, h independent of temperature, no radiation). */
export function linearProblem1D(problem: FinProblem): FinProblem1D {
  const k = problem.conductivity;
  if (k.kind !== 'constant' || problem.exponent !== 0 || problem.radiation.emissivity !== 0) {
    throw new Error('linearProblem1D: the fin is not linear (use the Newton grid solvers)');
  }
  return { geometry: problem.geometry, conductivity: k.k, h: problem.h, base: problem.base, tip: problem.tip, ambient_degC: problem.ambient_degC };
}

export const linearGridSolvers: GridSolvers = {
  nonlinear: false,
  oneD: (problem, grid) => solveFinProblem1D(linearProblem1D(problem), { nodes: grid.nodes, refine: grid.refine ?? 1, grading: grid.grading ?? 'auto' }),
  twoD: (problem, grid) =>
    solveFin2DProblem(problem.linear, { nx: grid.nx, ny: grid.ny, baseGrading: DEFAULT_GRADING.base, faceGrading: DEFAULT_GRADING.face }),
};

/**
 * The heat rate of a linear fin on one 1-D grid, W: linearGridSolvers.oneD's heatRate (the same number, bit for bit)
 * without the rest of its result (one-d/linear-solve.ts finHeatRate1D), for the variants of sensitivities and samples.
 */
export function linearFinHeatRate1D(problem: FinProblem, grid: Grid1D): number {
  return finHeatRate1D(linearProblem1D(problem), { nodes: grid.nodes, refine: grid.refine ?? 1, grading: grid.grading ?? 'auto' });
}
