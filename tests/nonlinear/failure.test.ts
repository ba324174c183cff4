/**
 * What the nonlinear fd-1d does when Newton's method alone is not enough: continuation in the
 * nonlinearity (Allgower & Georg 1990, Numerical Continuation Methods [from memory]) and, when that
 * fails too, a SolverError (exit code 3 of the output contract) whose message says what to change.
 * Step limits are forced small here to reach these paths on ordinary cases; the inputs are invented.
 */
import { describe, expect, test } from 'vitest';
import { SolverError } from '../../src/errors.js';
import { powerLawHInfiniteQ } from '../../src/analytic/nonlinear.js';
import { solveNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { plateFin } from './support/cases.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

// Boiling-like law n = 2 on a long plate fin (mL ~ 14): from the whole fin at the base temperature,
// plain Newton needs 10 steps on this grid.
const boiling = finCase({
  profile: plateFin.profile(2),
  k: constantK(200),
  h: { kind: 'power', base: 10, exponent: 2 },
  tip: { kind: 'adiabatic' },
  base_degC: AMBIENT_DEGC + 60,
});

function solverError(run: () => unknown): SolverError {
  try {
    run();
  } catch (error) {
    if (error instanceof SolverError) return error;
    throw error;
  }
  throw new Error('expected a SolverError');
}

describe('continuation', () => {
  test('with at most 6 Newton steps per attempt, continuation reaches the same solution', () => {
    const free = solveNonlinearFin1D(boiling, { nodes: 2001, nested: false });
    expect(free.newton.iterations).toBeGreaterThan(6);
    expect(free.newton.continuationStages).toBe(0);
    const capped = solveNonlinearFin1D(boiling, { nodes: 2001, nested: false, maxIterations: 6 });
    expect(capped.newton.continuationStages).toBeGreaterThan(0);
    // Both converged to a heat-rate change <= 1e-12: they agree to a few 1e-12.
    expect(Math.abs(relative(capped.heatRate, free.heatRate))).toBeLessThan(1e-11);
    expect(capped.newton.residual).toBeLessThanOrEqual(1e-12);
  });
});

describe('solver failure: SolverError saying what to change', () => {
  test('power law, radiation and k(T) at one Newton step per attempt', () => {
    const c = finCase({
      profile: plateFin.profile(0.3),
      k: { kind: 'table', T_degC: Float64Array.from([0, 200]), k: Float64Array.from([210, 170]) },
      h: { kind: 'power', base: 10, exponent: 2 },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + 60,
      emissivity: 0.9,
    });
    const error = solverError(() => solveNonlinearFin1D(c, { nodes: 201, nested: false, maxIterations: 1 }));
    expect(error.exitCode).toBe(3);
    expect(error.message).toMatch(/did not converge on 201 nodes/);
    expect(error.message).toMatch(/relative residual \d\.\d\de[-+]\d+/);
    expect(error.message).toMatch(/lower the exponent of the power-law h \(now 2\)/);
    expect(error.message).toMatch(/give a smaller emissivity \(now 0\.9\)/);
    expect(error.message).toMatch(/smoother conductivity table \(k runs from 170 to 210 W\/\(m\*K\)\)/);
  });

  test('negative exponent on a fin that reaches the fluid temperature: the converged answer is the exact one', () => {
    // n = -1/2: the exact solution reaches θ = 0 at mL = sqrt(2 (n + 2)) / (-n) = 3.46 and stays at the
    // ambient beyond it, so this fin (mL = 14) carries the infinite fin's Q = sqrt(2/(n+2)) sqrt(h_b P k A)
    // θ_b (Sen & Trinh 1986, J. Heat Transfer 108, 457-459; src/analytic/nonlinear.ts). This test used to
    // expect a SolverError: Newton stalled at the round-off floor of the nodes next to the ambient (slope
    // ~ θ^n unbounded) and a converged solve was called a failure (issue 9, items 2 and 11).
    const c = finCase({
      profile: plateFin.profile(2),
      k: constantK(200),
      h: { kind: 'power', base: 10, exponent: -0.5 },
      tip: { kind: 'adiabatic' },
      base_degC: AMBIENT_DEGC + 60,
    });
    const r = solveNonlinearFin1D(c, { nodes: 401 });
    const exact = powerLawHInfiniteQ(-0.5) * Math.sqrt(10 * plateFin.P * 200 * plateFin.A) * 60;
    // 401 nodes over mL = 14: ~29 nodes per decay length; the error is second order in the cell size
    // (2e-3 allows the 1/3 of the nodes that hold the solution, ~1.5e-3 measured).
    expect(Math.abs(relative(r.heatRate, exact))).toBeLessThan(2e-3);
    // Beyond mL_max θ was below the round-off of θ = θ_b - d (ε θ_b), where the loss ~ θ^(1/2) is still
    // ~ G θ_b sqrt(ε) = 1.5e-8 G θ_b per node: the balance closed only to 4.6e-8. Nodes near the ambient are
    // now solved for u = (θ/θ_b)^(1/2) (src/fd/one-d/newton-system.ts): 2.9e-16 measured, round-off.
    expect(r.energyBalance).toBeLessThan(1e-12);
  });
});
