/**
 * The start of a finer grid's CG in a refinement study (src/fd/three-d/study-sink.ts): the coarser solution prolonged
 * by aggregation.ts nestedProlongate, without forming the prolongation, gives the vector that forming it
 * (nestedProlongation) and applying it (prolongAddWith on a zero vector) gives, bit for bit, on plate fins and pins
 * of the small invented sinks of tests/sink/support; grids that are not nested give null both ways.
 */
import { describe, expect, it } from 'vitest';
import { nestedProlongate, nestedProlongation, prolongAddWith } from '../../src/fd/linear-algebra/aggregation.js';
import { buildSinkGrid } from '../../src/mesh/index.js';
import { assembleSink } from '../../src/fd/three-d/sink-system.js';
import { sinkProblem } from '../../src/fd/three-d/sink-problem.js';
import { smallSink } from './support/sink-case.js';

describe('the coarser solution prolonged without forming the prolongation', () => {
  it.each(['plates', 'pins'] as const)('gives the formed prolongation applied, bit for bit (%s)', (kind) => {
    const problem = sinkProblem(smallSink(kind));
    const level = (refine: number, plateLayers = 2) =>
      assembleSink(problem, buildSinkGrid(problem.layout, { cellSize: 0.002, plateLayers, finLayers: 3, refine }), 'sheet').levelGrid;
    for (const [coarse, fine] of [
      [level(1), level(2)],
      [level(2), level(4)],
    ]) {
      const n = coarse!.nx * coarse!.ny * coarse!.nz + coarse!.fins.reduce((s, f) => s + f.rows * f.layers, 0);
      // A coarse vector with no structure the prolongation could hide behind.
      const e = Float64Array.from({ length: n }, (_, k) => Math.sin(1.7 * k + 0.3) * (1 + k / 7));
      const p = nestedProlongation(coarse!, fine!);
      expect(p).not.toBeNull();
      const formed = new Float64Array(p!.rowStart.length - 1);
      prolongAddWith(p!, e, formed);
      const direct = nestedProlongate(coarse!, fine!, e);
      expect(direct).not.toBeNull();
      expect(direct!.length).toBe(formed.length);
      for (let k = 0; k < formed.length; k++) expect(Object.is(direct![k], formed[k]), `entry ${k}`).toBe(true);
    }
    // Twice the layers but the same cells in x and y: not nested by halving every cell.
    expect(nestedProlongation(level(1), level(1, 4))).toBeNull();
    expect(nestedProlongate(level(1), level(1, 4), new Float64Array(1))).toBeNull();
  });
});
