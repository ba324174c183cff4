/**
 * What solves a fin on one grid of a model, chosen once per fin: the linear direct solves for a linear fin
 * (one tridiagonal solve in 1-D, one banded or MG-PCG solve in 2-D: a linear fin never pays for Newton), or
 * Newton's method for a nonlinear fin (the nonlinear modules load only then: gridSolvers imports them on
 * demand). Either way the same refinement-study loop and the same result (study-fin.ts).
 */
import type { Fin1DResult } from '../one-d/linear-solve.js';
import type { NewtonReport } from '../newton/newton-report.js';
import { isLinearProblem, type FinProblem } from '../problem/fin-problem.js';
import type { Fin2DResult } from '../two-d/linear-solve.js';
import type { NonlinearFin2DProblem } from '../two-d/nonlinear-problem.js';
import { linearGridSolvers } from './linear-grid-solvers.js';

/** A 1-D grid: nodes, and the refinement factor of a nested grid (1 otherwise). */
export interface Grid1D {
  readonly nodes: number;
  readonly refine?: number;
}

/** A 2-D grid: nodes along the fin and across the half-thickness (or radius). */
export interface Grid2D {
  readonly nx: number;
  readonly ny: number;
}

/** A solution on one grid, with Newton's report when Newton's method solved it. */
export type GridSolution1D = Fin1DResult & { readonly newton?: NewtonReport };
export type GridSolution2D = Fin2DResult & { readonly newton?: NewtonReport };

export interface GridSolvers {
  /** True when these solvers take nonlinear fins (Newton); the linear ones take linear fins only. */
  readonly nonlinear: boolean;
  /** The fin on one 1-D grid, from `previous` (a coarser grid's solution of the same fin) when given. */
  oneD(problem: FinProblem, grid: Grid1D, previous?: GridSolution1D): GridSolution1D;
  /** The fin on one 2-D grid (problem: two-d/nonlinear-problem.ts, twoDFinProblem), from `previous` when given. */
  twoD(problem: NonlinearFin2DProblem, grid: Grid2D, previous?: GridSolution2D): GridSolution2D;
}

/** The grid solvers a fin needs: the linear ones for a linear fin, Newton's (loaded on demand) otherwise. */
export async function gridSolvers(problem: FinProblem): Promise<GridSolvers> {
  if (isLinearProblem(problem)) return linearGridSolvers;
  const { newtonGridSolvers } = await import('./newton-grid-solvers.js');
  return newtonGridSolvers;
}
