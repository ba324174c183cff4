/**
 * The first guess carried to a grid with twice the layers (src/fd/three-d/sink-layer-start.ts): CG started from it
 * reaches the same solution as from zero (both to the solver's relative residual of 1e-10) in fewer iterations, and
 * grids that are not so related get no guess. The sink is invented (tests/sink/support).
 */
import { describe, expect, it } from 'vitest';
import { doubledLayersStart } from '../../src/fd/three-d/sink-layer-start.js';
import { sinkGridSetup } from '../../src/fd/three-d/sink-grid-setup.js';
import { solveSinkSystem } from '../../src/fd/three-d/sink-solve.js';
import { planSinkStudy, solveSinkGrids } from '../../src/fd/three-d/study-sink.js';
import { plateFin, sinkCase } from './support/sink-case.js';

const c = sinkCase({
  plate: [0.03, 0.02, 0.003],
  kPlate: 200,
  fin: plateFin(0.02, 0.002, 0.02),
  array: { kind: 'plates', count: 4, pitch: 0.007 },
  hPlate: 30,
  h: { kind: 'uniform', h: 60 },
  sources: [{ centre: [0.011, 0.009], size: [0.008, 0.008], power: 10 }],
});

describe('a start from the grid with half the layers', () => {
  const coarse = planSinkStudy(c, {});
  const solved = solveSinkGrids(coarse.problem, coarse.specs, null).results;
  const finestCoarse = solved[solved.length - 1]!;
  const doubled = planSinkStudy(c, { plateLayers: 4, finLayers: 8 });

  it('gives the same solution in fewer CG iterations than a start from zero', () => {
    const setup = sinkGridSetup(doubled.problem, doubled.specs[2]!);
    const start = doubledLayersStart(finestCoarse.grid, finestCoarse.theta, setup.grid, setup.system.matrix.n);
    expect(start).not.toBeNull();
    const fromGuess = solveSinkSystem(doubled.problem, setup.system, start!, setup.pre);
    const fromZero = solveSinkSystem(doubled.problem, setup.system, undefined, setup.pre);
    expect(fromGuess.iterations).toBeLessThan(fromZero.iterations);
    // Both to a relative residual of 1e-10: the rises agree far below the GCIs (~1e-3); 1e-8 leaves the conditioning room.
    expect(Math.abs(fromGuess.sourceMeanRise[0]! - fromZero.sourceMeanRise[0]!) / fromZero.sourceMeanRise[0]!).toBeLessThan(1e-8);
  });

  it('is null between grids that are not the same cells with doubled layers', () => {
    const finer = sinkGridSetup(coarse.problem, coarse.specs[1]!);
    // The second-finest grid of the same study: x and y refined too.
    expect(doubledLayersStart(solved[0]!.grid, solved[0]!.theta, finer.grid, finer.system.matrix.n)).toBeNull();
  });
});
