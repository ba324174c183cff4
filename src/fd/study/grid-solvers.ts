/**
 * What solves a fin on one grid of a model, chosen once per fin: the linear direct solves for a linear fin
 * (one tridiagonal solve in 1-D, one banded or MG-PCG solve in 2-D: a linear fin never pays for Newton), or
 * Newton's method for a nonlinear fin (the nonlinear modules load only then: gridSolvers imports them on
 * demand). Either way the same refinement-study loop and the same result (study-fin.ts).
 */
import { isLinearProblem, type FinProblem } from '../problem/fin-problem.js';
import type { GridSolvers } from './grid-solver.js';
import { linearGridSolvers } from './linear-grid-solvers.js';

export type { Grid1D, Grid2D, GridSolution1D, GridSolution2D, GridSolvers } from './grid-solver.js';

/** The grid solvers a fin needs: the linear ones for a linear fin, Newton's (loaded on demand) otherwise. */
export async function gridSolvers(problem: FinProblem): Promise<GridSolvers> {
  if (isLinearProblem(problem)) return linearGridSolvers;
  const { newtonGridSolvers } = await import('./newton-grid-solvers.js');
  return newtonGridSolvers;
}
