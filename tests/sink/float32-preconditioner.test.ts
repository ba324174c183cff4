/**
 * The multigrid preconditioner with float32 smoother coefficients (sink-stencil-relaxation.ts, precision
 * 'float32', the one solveSinkSystem uses) against the float64 one, on invented sinks (pins and plate fins as
 * sheets) refined until the hierarchy has several stencil levels:
 *   - a float32 sweep differs from the float64 sweep, by no more than float32 rounding allows;
 *   - CG preconditioned by either reaches the same residual target (1e-10) in about the same number of
 *     iterations, and the two solutions agree to 1e-9.
 * Tolerances: float32 rounding is 6e-8 relative per coefficient (eps/2 = 2^-24); a line solve amplifies it by at
 * most the line's condition number, below 1e2 on these grids (diagonally dominant lines), hence 1e-5 for one
 * sweep. The solutions: both have |b − A x|_1 / |b|_1 ≤ 1e-10 against the same float64 A, so they differ by at most
 * about cond(A) × 1e-10 relative; these systems' condition numbers are ~1e2-1e3 (tests/sink/solver.test.ts), hence 1e-9
 * when compared against the largest value (a bound, not a measured value). Iterations: a preconditioner perturbed
 * at 1e-7 changes CG's convergence rate negligibly; one iteration of slack for where the residual crosses the target.
 */
import { describe, expect, it } from 'vitest';
import { buildSinkGrid } from '../../src/mesh/index.js';
import { sinkMultigrid } from '../../src/fd/linear-algebra/sink-multigrid.js';
import { stencilRelaxation } from '../../src/fd/linear-algebra/sink-stencil-relaxation.js';
import { sparsePcg } from '../../src/fd/linear-algebra/sparse-pcg.js';
import { assembleSink } from '../../src/fd/three-d/sink-system.js';
import { RESIDUAL_TARGET } from '../../src/fd/three-d/sink-solve.js';
import { sinkProblem } from '../../src/fd/three-d/sink-problem.js';
import { smallSink } from './support/sink-case.js';

const sink = smallSink;

/** max |u − v| / max |v|. */
function relativeDifference(u: Float64Array, v: Float64Array): number {
  let worst = 0;
  let scale = 0;
  for (let k = 0; k < v.length; k++) {
    worst = Math.max(worst, Math.abs(u[k]! - v[k]!));
    scale = Math.max(scale, Math.abs(v[k]!));
  }
  return worst / scale;
}

describe.each(['pins', 'plates'] as const)('%s, float32 smoother coefficients', (kind) => {
  const problem = sinkProblem(sink(kind));
  const grid = buildSinkGrid(problem.layout, { cellSize: 0.002, plateLayers: 2, finLayers: 4, refine: 4 });
  const system = assembleSink(problem, grid, 'sheet');
  const a = system.matrix;

  it('sweeps within float32 rounding of the float64 sweep', () => {
    expect(system.stencil).not.toBeNull();
    const u = new Float64Array(a.n);
    const v = new Float64Array(a.n);
    stencilRelaxation(system.stencil!, 'float64').sweep(system.rhs, u, 'forward', true);
    stencilRelaxation(system.stencil!, 'float32').sweep(system.rhs, v, 'forward', true);
    const d = relativeDifference(v, u);
    expect(d).toBeGreaterThan(0);
    expect(d).toBeLessThan(1e-5);
  });

  it('CG reaches the same target and the same solution as with float64', () => {
    const solve = (precision: 'float64' | 'float32') => {
      const pre = sinkMultigrid(a, system.lines, system.levelGrid, system.fold, system.stencil, precision);
      expect(pre.levels.length).toBeGreaterThan(3);
      return sparsePcg(a, system.rhs, pre, RESIDUAL_TARGET, 400);
    };
    const f64 = solve('float64');
    const f32 = solve('float32');
    expect(f32.report.relativeResidual).toBeLessThanOrEqual(RESIDUAL_TARGET);
    expect(f64.report.relativeResidual).toBeLessThanOrEqual(RESIDUAL_TARGET);
    expect(Math.abs(f32.report.iterations - f64.report.iterations)).toBeLessThanOrEqual(1);
    expect(relativeDifference(f32.x, f64.x)).toBeLessThan(1e-9);
  });
});
