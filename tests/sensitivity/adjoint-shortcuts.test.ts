/**
 * The shortcuts that make the fd-2d reference's sensitivities cheaper (issue 14) give the same numbers, bit for bit,
 * as the computations they replace: a constant's boundary integral (lumpedConstant) against the general one, the
 * base heat rate alone (baseHeatRate2D) against the full balance (heatRates2D), the residual at chosen rows
 * (residualAt) against the whole residual, the adjoint derivative of
 * inputs that change boundary terms only (its residual taken at the boundary rows) against the adjoint formula with
 * the whole residual (Giles & Pierce 2000, eq. 2.3, discrete form; two-d/adjoint.ts), and the study's kept solver
 * (two-d/kept-solver.ts) against a solver prepared afresh. Exact equality (toBe) is the claim each shortcut makes:
 * the same operations on the same numbers, the left-out terms being exact zeros.
 */
import { describe, expect, it } from 'vitest';
import { numericInputs, type Case } from '../../src/case/index.js';
import { finProblem } from '../../src/fd/index.js';
import { prepareSolver2D } from '../../src/fd/linear-algebra/auto-solver.js';
import { residual, residualAt, type System2D } from '../../src/fd/linear-algebra/stencil9.js';
import { assembleSection2D, heatRateGradient, sectionAdjoint, type SectionAssembly } from '../../src/fd/two-d/adjoint.js';
import { baseHeatRate2D, heatRates2D } from '../../src/fd/two-d/heat-rate.js';
import { lumpedConstant, lumpedIntegral } from '../../src/fd/two-d/boundary.js';
import { boundaryNodes } from '../../src/mesh/index.js';
import { keptSolver2D } from '../../src/fd/two-d/kept-solver.js';
import { solveFin2DProblem } from '../../src/fd/two-d/linear-solve.js';
import { twoDFinProblem } from '../../src/fd/two-d/nonlinear-problem.js';
import { finCase } from '../support/fin-case.js';

const D = 1e-4;

/** Invented linear fins: every base kind (fixed, contact) and tip kind (convective, adiabatic, fixed). */
const fins: [string, Case][] = [
  [
    'plate, contact resistance, convective tip with its own h',
    finCase({
      profile: { kind: 'rectangular', length: 0.03, thickness: 0.0015, width: 0.04 },
      k: 160,
      h: { kind: 'uniform', h: 60 },
      tip: { kind: 'convective', h: 90 },
      base_degC: 75,
      ambient_degC: 25,
      contactResistance: 2e-4,
    }),
  ],
  [
    'plate, fixed base, convective tip (local h)',
    finCase({
      profile: { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 0.08 },
      k: 209,
      h: { kind: 'uniform', h: 45 },
      tip: { kind: 'convective', h: null },
      base_degC: 85,
      ambient_degC: 35,
    }),
  ],
  [
    'trapezoid, h varying along the fin, fixed tip temperature',
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
    'thick pin, adiabatic tip',
    finCase({ profile: { kind: 'pin', length: 0.004, diameter: 0.004 }, k: 20, h: { kind: 'uniform', h: 5000 }, base_degC: 90, ambient_degC: 20 }),
  ],
];

/** A field that is no solution: every node different, so that no term of a sum vanishes by accident. */
function anyField(n: number): Float64Array {
  return Float64Array.from({ length: n }, (_, p) => 30 + 20 * Math.sin(p * 0.37) + p * 1e-3);
}

function section(c: Case, nx: number, ny: number): SectionAssembly & { k: number } {
  return assembleSection2D(twoDFinProblem(finProblem(c)).linear, nx, ny);
}

describe('fd-2d shortcuts: the same numbers, bit for bit', () => {
  it.each(fins)('%s: baseHeatRate2D is heatRates2D(...).base', (_, c) => {
    const a = section(c, 21, 7);
    const theta = anyField(a.system.rhs.length);
    expect(baseHeatRate2D(a.K, a.terms, theta)).toBe(heatRates2D(a.K, a.terms, theta).base);
  });

  it.each(fins)('%s: lumpedConstant is lumpedIntegral of that constant on every boundary', (_, c) => {
    const { grid } = section(c, 21, 7);
    for (const name of ['base', 'face', 'tip', 'symmetry'] as const) {
      const nodes = boundaryNodes(grid, name);
      const general = lumpedIntegral(grid, nodes, () => 37.5);
      const constant = lumpedConstant(grid, nodes, 37.5);
      for (let e = 0; e < nodes.length; e++) expect(constant[e], `${name} node ${e}`).toBe(general[e]);
    }
  });

  it.each(fins)('%s: residualAt is the residual at those rows', (_, c) => {
    const { system } = section(c, 21, 7);
    const x = anyField(system.rhs.length);
    const whole = residual(system, x);
    // Every row, interior ones included (the difference form's shortcut for them leaves out exact zeros only).
    const rows = Int32Array.from({ length: whole.length }, (_, p) => p);
    const some = residualAt(system, x, rows);
    for (let p = 0; p < whole.length; p++) expect(some[p], `row ${p}`).toBe(whole[p]);
  });

  it.each(fins)('%s: every input, the adjoint derivative is the whole-residual formula', (_, c) => {
    const nx = 31;
    const ny = 7;
    const problem = twoDFinProblem(finProblem(c)).linear;
    const adjoint = sectionAdjoint(problem, nx, ny);
    // The formula with the whole residual (as before the boundary-row shortcut), on the same theta and lambda.
    const nominal = assembleSection2D(problem, nx, ny);
    const theta = solveFin2DProblem(problem, { nx, ny }).field;
    const adjointSystem: System2D = { ...nominal.system, rhs: heatRateGradient(nominal) };
    const lambda = prepareSolver2D(adjointSystem, 'auto').solve(adjointSystem);
    const full = (plus: Case, minus: Case): number => {
      const up = assembleSection2D(twoDFinProblem(finProblem(plus)).linear, nx, ny, nominal);
      const down = assembleSection2D(twoDFinProblem(finProblem(minus)).linear, nx, ny, nominal);
      const rate = (a: SectionAssembly): number => a.grid.depth * heatRates2D(a.K, a.terms, theta).base;
      const explicit = rate(up) - rate(down);
      const rUp = residual(up.system, theta);
      const rDown = residual(down.system, theta);
      let implicit = 0;
      for (let p = 0; p < theta.length; p++) implicit += (lambda[p] as number) * ((rUp[p] as number) - (rDown[p] as number));
      return (explicit + implicit) / (2 * D);
    };
    for (const input of numericInputs(c)) {
      const plus = input.scale(1 + D);
      const minus = input.scale(1 - D);
      const lean = adjoint.derivative(twoDFinProblem(finProblem(plus)).linear, twoDFinProblem(finProblem(minus)).linear, D);
      expect(lean, input.key).toBe(full(plus, minus));
    }
  });

  it('the kept solver of a study grid solves a new right-hand side as a solver prepared afresh', () => {
    // A rectangular fin on 41 x 13 nodes: fast diagonalisation (13 >= 12 across), the solver that is kept.
    const [, c] = fins[1] as [string, Case];
    const problem = twoDFinProblem(finProblem(c)).linear;
    const solved = solveFin2DProblem(problem, { nx: 41, ny: 13 });
    expect(solved.solver).toBe('separable');
    const a = assembleSection2D(problem, 41, 13);
    const system: System2D = { ...a.system, rhs: heatRateGradient(a) };
    const kept = keptSolver2D(system);
    expect(kept.method).toBe('separable');
    expect(keptSolver2D(system)).toBe(kept);
    const fresh = prepareSolver2D(system, 'auto').solve(system);
    const again = kept.solve(system);
    for (let p = 0; p < fresh.length; p++) expect(again[p], `node ${p}`).toBe(fresh[p]);
    // Another matrix (another h) is not served by it.
    const other = section({ ...c, convection: { ...c.convection, h: { kind: 'uniform', h: 90 } } }, 41, 13);
    expect(keptSolver2D(other.system)).not.toBe(kept);
  });
});
