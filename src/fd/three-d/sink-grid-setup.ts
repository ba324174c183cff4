/**
 * One fd-3d grid made ready to solve: the grid of a spec (src/mesh buildSinkGrid), its assembled system
 * (sink-system.ts: A theta = b, conductances in W/K, heat in W) and the multigrid preconditioner of A
 * (linear-algebra/sink-multigrid.ts). A single-grid solve (sink-grid-solve.ts), the adjoint (sink-adjoint.ts) and
 * a study's grids (study-sink.ts) all start from it. A grid kept with its solution (SolvedSinkGrid) lets the
 * check's sensitivities on a study's second-finest grid start from the study's own setup and solution instead of
 * assembling and solving that grid again.
 */
import { buildSinkGrid, type SinkGrid } from '../../mesh/index.js';
import { sinkMultigrid, type Preconditioner } from '../linear-algebra/sink-multigrid.js';
import { assembleSink, type SinkSystem } from './sink-system.js';
import type { SinkProblem } from './sink-problem.js';
import type { SinkGridSpec } from './sink-study-types.js';

export interface SinkGridSetup {
  grid: SinkGrid;
  system: SinkSystem;
  pre: Preconditioner;
}

/** A set-up grid and its solution (excess temperatures, K; the linear solve of A theta = b). */
export interface SolvedSinkGrid {
  spec: SinkGridSpec;
  setup: SinkGridSetup;
  theta: Float64Array;
  iterations: number;
}

export function sinkGridOf(problem: SinkProblem, spec: SinkGridSpec): SinkGrid {
  return buildSinkGrid(problem.layout, { cellSize: spec.cellSize, plateLayers: spec.plateLayers, finLayers: spec.finLayers, refine: spec.refine });
}

/** `grid`: the spec's grid when the caller has built it already. */
export function sinkGridSetup(problem: SinkProblem, spec: SinkGridSpec, grid: SinkGrid = sinkGridOf(problem, spec)): SinkGridSetup {
  const system = assembleSink(problem, grid, spec.finRepresentation);
  return { grid, system, pre: sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold, system.stencil, 'float32') };
}

/** Whether two specs describe the same grid. */
export function sameSinkGrid(a: SinkGridSpec, b: SinkGridSpec): boolean {
  return (
    a.cellSize === b.cellSize &&
    a.plateLayers === b.plateLayers &&
    a.finLayers === b.finLayers &&
    a.refine === b.refine &&
    a.finRepresentation === b.finRepresentation
  );
}
