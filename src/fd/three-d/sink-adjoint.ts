/**
 * Sensitivities of one source's mean rise on one fd-3d grid by the adjoint of the discrete system, for linear
 * sinks (constant h forms and k). On the grid, sink-system.ts assembles A(p) theta = b(p) (theta: excess
 * temperatures, K; A: conductances, W/K; b: heat, W) and sink-solve.ts takes the source's mean rise as
 *   J(p, theta) = sum_c w_c theta_c + J_0(p),   w_c = A_c / sum A_c over the source's underside cells,
 * (J_0: the half-cell and contact drops q'' dz/(2 k_p) + q'' R_c). With the residual R(p, theta) = b − A theta,
 *   dJ/dp = dJ/dp|_theta + lambda^T dR/dp|_theta,   A^T lambda = A lambda = dJ/dtheta = w
 * (A is symmetric; Giles & Pierce 2000, "An introduction to the adjoint approach to design", Flow, Turbulence
 * and Combustion 65:393-415). The partial derivatives at fixed theta are central differences of the assembly and
 * of J between the case with the input scaled by (1 + d) and by (1 − d), on the same grid topology (the geometry's
 * cells move with a dimension): no solve, and for entries linear in the input (h, k, powers) exact to round-off;
 * for dimensions the truncation is O(d^2), as it is for re-solves. All the inputs then cost one adjoint solve
 * (CG with the case's own preconditioner) instead of two solves each.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { buildSinkGrid, type SinkGrid } from '../../mesh/index.js';
import { csrResidual } from '../linear-algebra/csr.js';
import { sparsePcg } from '../linear-algebra/sparse-pcg.js';
import { sinkMultigrid } from '../linear-algebra/sink-multigrid.js';
import { assembleSink } from './sink-system.js';
import { sinkProblem } from './sink-problem.js';
import { isNonlinearSink, RESIDUAL_TARGET, sinkQuantities } from './sink-solve.js';
import type { SinkGridSpec } from './sink-study-types.js';

const MAX_ITERATIONS = 400;

export interface SinkGridAdjoint {
  /** The source's mean rise on this grid, K. */
  rise: number;
  unknowns: number;
  /** CG iterations of the case's solve and of the adjoint solve. */
  iterations: number;
  /**
   * d rise / d ln x, K, from the case with one input scaled by (1 + step) and by (1 − step); null when either
   * variant's grid differs in shape from the case's (a segment gained or lost a cell), where only re-solves can tell.
   */
  dRise_dlnx(plus: HeatSinkCase, minus: HeatSinkCase, step: number): number | null;
}

/** null for a nonlinear sink (power-law h or k(T)): its Newton system is not differentiated here. */
export function sinkGridAdjoint(c: HeatSinkCase, spec: SinkGridSpec, source: number): SinkGridAdjoint | null {
  const problem = sinkProblem(c);
  if (isNonlinearSink(problem)) return null;
  const gridOf = (variant: HeatSinkCase) =>
    buildSinkGrid(sinkProblem(variant).layout, { cellSize: spec.cellSize, plateLayers: spec.plateLayers, finLayers: spec.finLayers, refine: spec.refine });
  const grid = gridOf(c);
  const system = assembleSink(problem, grid, spec.finRepresentation);
  const n = system.matrix.n;
  const pre = sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold, system.stencil, 'float32');
  const solved = sparsePcg(system.matrix, system.rhs, pre, RESIDUAL_TARGET, MAX_ITERATIONS);
  const theta = solved.x;
  const rise = sinkQuantities(problem, system, theta, pre.method, 0, 0).sourceMeanRise[source] as number;

  // w = dJ/dtheta: the area weights of the source's cells (underside layer).
  const w = new Float64Array(n);
  const block = grid.sources[source];
  if (block === undefined) throw new RangeError(`sinkGridAdjoint: no source ${source} on the grid`);
  let total = 0;
  for (let i = block.i0; i < block.i1; i++) {
    for (let j = block.j0; j < block.j1; j++) {
      const a = (grid.x[i + 1] - grid.x[i]) * (grid.y[j + 1] - grid.y[j]);
      w[(i * grid.ny + j) * grid.nz] = a;
      total += a;
    }
  }
  for (let k = 0; k < n; k++) w[k] /= total;
  const adjoint = sparsePcg(system.matrix, w, pre, RESIDUAL_TARGET, MAX_ITERATIONS);
  const lambda = adjoint.x;

  const sameShape = (g: SinkGrid) => g.nx === grid.nx && g.ny === grid.ny && g.nz === grid.nz && g.ns === grid.ns && g.fins.length === grid.fins.length;
  const residualPlus = new Float64Array(n);
  const residualMinus = new Float64Array(n);
  return {
    rise,
    unknowns: n,
    iterations: solved.report.iterations + adjoint.report.iterations,
    dRise_dlnx(plus, minus, step) {
      const variants = [plus, minus].map((v) => {
        const p = sinkProblem(v);
        const g = gridOf(v);
        if (!sameShape(g)) return null;
        const s = assembleSink(p, g, spec.finRepresentation);
        return s.matrix.n === n ? { p, s } : null;
      });
      const [up, down] = variants;
      if (up === null || up === undefined || down === null || down === undefined) return null;
      csrResidual(up.s.matrix, theta, up.s.rhs, residualPlus);
      csrResidual(down.s.matrix, theta, down.s.rhs, residualMinus);
      let dot = 0;
      for (let k = 0; k < n; k++) dot += lambda[k] * (residualPlus[k] - residualMinus[k]);
      const jPlus = sinkQuantities(up.p, up.s, theta, '', 0, 0).sourceMeanRise[source] as number;
      const jMinus = sinkQuantities(down.p, down.s, theta, '', 0, 0).sourceMeanRise[source] as number;
      return (jPlus - jMinus + dot) / (2 * step);
    },
  };
}
