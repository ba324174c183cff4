/**
 * A heat sink on one given fd-3d grid (no refinement study), optionally started from another solution on a grid
 * of the same shape: what perturbed re-solves need (check's sensitivities: the sink with one input changed by a
 * relative 1e-4 differs from the case by that much, so CG started from the case's solution needs a fraction of
 * the iterations from zero). Returns each source's mean rise (K) and the solution to start the next from.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { buildSinkGrid } from '../../mesh/index.js';
import { sparsePcg } from '../linear-algebra/sparse-pcg.js';
import { sinkMultigrid } from '../linear-algebra/sink-multigrid.js';
import { assembleSink } from './sink-system.js';
import { sinkProblem } from './sink-problem.js';
import { RESIDUAL_TARGET, sinkQuantities } from './sink-solve.js';
import type { SinkGridSpec } from './sink-study-types.js';

export interface SinkGridSolution {
  sourceMeanRise: number[];
  theta: Float64Array;
  iterations: number;
}

const MAX_ITERATIONS = 400;

export function solveSinkOnGrid(c: HeatSinkCase, spec: SinkGridSpec, start?: Float64Array): SinkGridSolution {
  const problem = sinkProblem(c);
  const grid = buildSinkGrid(problem.layout, { cellSize: spec.cellSize, plateLayers: spec.plateLayers, finLayers: spec.finLayers, refine: spec.refine });
  const system = assembleSink(problem, grid, spec.finRepresentation);
  const pre = sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold, system.stencil, 'float32');
  const x0 = start !== undefined && start.length === system.matrix.n ? Float64Array.from(start) : new Float64Array(system.matrix.n);
  const { x: theta, report } = sparsePcg(system.matrix, system.rhs, pre, RESIDUAL_TARGET, MAX_ITERATIONS, x0);
  const q = sinkQuantities(problem, system, theta, pre.method, report.iterations, report.relativeResidual);
  return { sourceMeanRise: q.sourceMeanRise, theta, iterations: report.iterations };
}
