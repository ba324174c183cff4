/**
 * The 1-D heat rate alone (linearFinHeatRate1D, what the sensitivities and the uncertainty sample re-solve) is the
 * full solve's heat rate bit for bit: the same mesh, system, solver and base-heat formula, without the rest of the
 * result. Exact equality, not a tolerance: a check's sensitivities and sample must not depend on which path ran.
 * Invented linear fins covering every base and tip condition, uniform and graded grids, nested refinement.
 */
import { describe, expect, test } from 'vitest';
import type { Case } from '../../src/case/index.js';
import { finProblem, gridSolvers, linearFinHeatRate1D, solveFinWith } from '../../src/fd/index.js';
import { finCase } from '../support/fin-case.js';

const fins: [string, Case][] = [
  [
    'plate, cooled edges, contact resistance, convective tip with the local h',
    finCase({
      profile: { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 0.08 },
      k: 209,
      h: { kind: 'uniform', h: 45 },
      tip: { kind: 'convective', h: null },
      edges: 'cooled',
      base_degC: 85,
      ambient_degC: 35,
      contactResistance: 0.5e-4,
    }),
  ],
  [
    'trapezoid, h linear along the fin, fixed tip temperature',
    finCase({
      profile: { kind: 'trapezoidal', length: 0.02, baseThickness: 0.003, tipThickness: 0.001, width: 0.05 },
      k: 200,
      h: { kind: 'linear', base: 80, tip: 30 },
      tip: { kind: 'temperature', T_degC: 40 },
      base_degC: 85,
      ambient_degC: 25,
    }),
  ],
  [
    'concave parabola (graded toward the tip), adiabatic',
    finCase({
      profile: { kind: 'parabolic-concave', length: 0.03, baseThickness: 0.004, width: 0.05 },
      k: 150,
      h: { kind: 'uniform', h: 30 },
      thetaBase: 50,
    }),
  ],
  [
    'annular fin, convective rim',
    finCase({
      profile: { kind: 'annular', innerRadius: 0.01, outerRadius: 0.025, thickness: 0.001 },
      k: 180,
      h: { kind: 'uniform', h: 40 },
      tip: { kind: 'convective', h: null },
      base_degC: 70,
      ambient_degC: 20,
    }),
  ],
  [
    'infinite pin',
    finCase({ profile: { kind: 'pin', length: 0.05, diameter: 0.003 }, k: 380, h: { kind: 'uniform', h: 25 }, tip: { kind: 'infinite' }, thetaBase: 40 }),
  ],
];

describe.each(fins)('%s', (_name, c) => {
  test('equals the full solve on 101 and 1001 nodes, and on a nested grid', async () => {
    const problem = finProblem(c);
    const solvers = await gridSolvers(problem);
    expect(solvers.nonlinear).toBe(false);
    for (const grid of [
      { nodes: 101 },
      { nodes: 1001 },
      { nodes: 251, refine: 4 },
      { nodes: 1001, grading: { kind: 'power', toward: 'tip', exponent: 2 } as const },
    ]) {
      const full = solveFinWith(solvers, problem, { model: '1d', ...grid }).heatRate_W;
      expect(linearFinHeatRate1D(problem, grid)).toBe(full);
    }
  });
});
