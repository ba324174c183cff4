/**
 * The grid solvers of a fin chosen without waiting (grid-solvers.ts chooses the same, loading Newton's
 * modules on demand): for synchronous callers such as `solve`, which the library offers as a plain
 * function. Loads Newton's modules with this module.
 */
import { isLinearProblem, type FinProblem } from '../problem/fin-problem.js';
import type { GridSolvers } from './grid-solver.js';
import { linearGridSolvers } from './linear-grid-solvers.js';
import { newtonGridSolvers } from './newton-grid-solvers.js';

/** The linear grid solvers for a linear fin, Newton's otherwise (as gridSolvers, synchronously). */
export function gridSolversNow(problem: FinProblem): GridSolvers {
  return isLinearProblem(problem) ? linearGridSolvers : newtonGridSolvers;
}
