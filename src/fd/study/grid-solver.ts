/**
 * What solves a fin on one grid of a model (grid-solvers.ts chooses them per fin): the grids and the
 * solution on one grid.
 */
import type { Grading } from '../../mesh/index.js';
import type { Fin1DResult } from '../one-d/linear-solve.js';
import type { NewtonReport } from '../newton/newton-report.js';
import type { FinProblem } from '../problem/fin-problem.js';
import type { Fin2DResult } from '../two-d/linear-solve.js';
import type { NonlinearFin2DProblem } from '../two-d/nonlinear-problem.js';

/** A 1-D grid: nodes, the refinement factor of a nested grid (1 otherwise), and the node distribution ('auto': one-d/linear-solve.ts, autoGrading). */
export interface Grid1D {
  readonly nodes: number;
  readonly refine?: number;
  readonly grading?: Grading | 'auto';
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
  /** The fin on one 2-D grid (problem: two-d/problem/fin-problem.ts, twoDFinProblem), from `previous` when given. */
  twoD(problem: NonlinearFin2DProblem, grid: Grid2D, previous?: GridSolution2D): GridSolution2D;
}
