/**
 * A heat sink on one given fd-3d grid (no refinement study), optionally started from another solution on a grid
 * of the same shape: what perturbed re-solves need (check's sensitivities: the sink with one input changed by a
 * relative 1e-4 differs from the case by that much, so CG started from the case's solution needs a fraction of
 * the iterations from zero). A nonlinear sink (power-law h, k(T)) is solved as the study solves it: the linear
 * system, then Newton in the Kirchhoff potential (sink-solve.ts). Returns each source's mean rise (K) and the linear
 * solution to start the next variant's linear solve from.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { sinkGridSetup } from './sink-grid-setup.js';
import { sinkProblem } from './sink-problem.js';
import { solveSinkSystemWithLinear } from './sink-solve.js';
import type { SinkGridSpec } from './sink-study-types.js';

export interface SinkGridSolution {
  sourceMeanRise: number[];
  theta: Float64Array;
  iterations: number;
}

export function solveSinkOnGrid(c: HeatSinkCase, spec: SinkGridSpec, start?: Float64Array): SinkGridSolution {
  const problem = sinkProblem(c);
  const { system, pre } = sinkGridSetup(problem, spec);
  // A copy: the caller's start is shared by every variant's re-solve, and CG overwrites its start.
  const x0 = start !== undefined && start.length === system.matrix.n ? Float64Array.from(start) : undefined;
  const { result, linear } = solveSinkSystemWithLinear(problem, system, x0, pre);
  return { sourceMeanRise: result.sourceMeanRise, theta: linear, iterations: result.iterations };
}
