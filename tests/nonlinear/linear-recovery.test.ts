/**
 * The nonlinear solver on a linear fin (exponent 0, emissivity 0, constant k) must give the linear
 * solver's numbers: the first Newton step from the base temperature solves the linear solver's own
 * drop system (same mesh, same matrix, the same right-hand side θ_b G_i), and a linear problem stops
 * there. No external source: the reference is src/fd/fin1d.ts itself, checked against the published
 * closed forms in tests/fd1d.
 *
 * Round-off allowance: 32 ε_mach (1 + C_b θ_b / Q). Without a contact resistance the two agree to the
 * last bit except at a convective or infinite tip, where the tip row's right-hand side is summed in a
 * different order (measured <= 2 ε relative). With a contact resistance C_b = A_b / R'', the linear
 * solver forms row 0 as θ_b (G_0 + C_b) - C_b θ_b, which cancels to G_0 θ_b with an absolute error
 * ~ ε C_b θ_b (this solver forms G_0 θ_b directly): measured <= 12 ε (1 + C_b θ_b / Q) over 3000
 * random cases, hence the factor 32.
 * The surface heat rate Σ G_i θ_i + Q_tip adds one more term. Both solvers carry drops d_i = θ_b - θ_i, so a
 * θ_i far below θ_b is known only to ~ε θ_b (absolute), and the sum to ~ε θ_b Σ G_i = ε Q_ideal: relative to Q
 * that is ε / efficiency. A fin of low efficiency (fast-check seed -1581458057: an annular fin with h rising
 * from 0 at its root to 412 W/(m^2 K) at an infinite tip, efficiency 0.006, 11 nodes) differed by 1.5e-14
 * relative, 0.4 ε Q_ideal / Q. Hence 32 ε (1 + C_b θ_b / Q + Q_ideal / Q) for the surface heat rate.
 * A tip held at a temperature takes the heat G_tip θ_f of the last free node, and θ_f is known to ~ε θ_b
 * (absolute) like every node: relative to Q at most ε θ_b / θ_f (Q_tip <= Q). Fast-check seed 987955432 (an
 * annular fin 0.3 mm long behind a contact that takes 97 % of the drop, h rising from 0, tip held at ambient,
 * 4 nodes: θ_f = 0.009 θ_b) differed by 111 ε, where ε θ_b / θ_f = 111 ε; the term 32 ε θ_b / θ_f covers it.
 */
import { fc, test } from '@fast-check/vitest';
import { describe, expect } from 'vitest';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { isLinearFinCase } from '../../src/fd/problem/linear-case.js';
import { finGeometry } from '../../src/mesh/geometry1d.js';
import { solveNonlinearFin1D, studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import type { Case } from '../../src/case/types.js';
import { finCaseArbitrary } from '../fd1d/support/arbitraries.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

function allowance(c: Case, heatRate: number): number {
  const thetaBase = c.base.T_degC - c.convection.ambient_degC;
  const contact = c.base.contactResistance > 0 ? finGeometry(c).baseArea / c.base.contactResistance : 0;
  return 32 * Number.EPSILON * (1 + (contact * thetaBase) / Math.abs(heatRate));
}

/** The surface heat rate's allowance: that of the base heat rate plus 32 ε Q_ideal / Q, and 32 ε θ_b / θ_f at a held tip (header). */
function surfaceAllowance(c: Case, heatRate: number, idealHeatRate: number, theta: Float64Array): number {
  const thetaBase = Math.abs(c.base.T_degC - c.convection.ambient_degC);
  const lastFree = Math.abs(theta[theta.length - 2] ?? thetaBase);
  const heldTip = c.convection.tip.kind === 'temperature' && lastFree > 0 ? thetaBase / lastFree : 0;
  return allowance(c, heatRate) + 32 * Number.EPSILON * (Math.abs(idealHeatRate / heatRate) + heldTip);
}

/** Equal, or both the same non-finite value (effectiveness is +Infinity when h(0) = 0). */
function expectSameFigure(a: number, b: number, tolerance: number): void {
  if (!Number.isFinite(a) || !Number.isFinite(b)) expect(Object.is(a, b)).toBe(true);
  else expect(Math.abs(relative(b, a))).toBeLessThanOrEqual(tolerance);
}

describe('linear fins through the nonlinear solver (fast-check: every profile, h kind, tip, contact)', () => {
  test.prop([finCaseArbitrary, fc.integer({ min: 3, max: 800 })])('same heat rates, temperatures and figures of merit', (fin, nodes) => {
    const linear = solveFin1D(fin, { nodes });
    const nonlinear = solveNonlinearFin1D(fin, { nodes });
    const tolerance = allowance(fin, linear.heatRate);
    expect(nonlinear.mesh.nodes).toBe(linear.mesh.nodes);
    expect(Math.abs(relative(nonlinear.heatRate, linear.heatRate))).toBeLessThanOrEqual(tolerance);
    expect(Math.abs(relative(nonlinear.surfaceHeatRate, linear.surfaceHeatRate))).toBeLessThanOrEqual(
      surfaceAllowance(fin, linear.heatRate, linear.idealHeatRate, linear.theta),
    );
    const thetaBase = fin.base.T_degC - fin.convection.ambient_degC;
    for (let i = 0; i < linear.theta.length; i++) {
      expect(Math.abs((nonlinear.theta[i] as number) - (linear.theta[i] as number))).toBeLessThanOrEqual(tolerance * thetaBase);
    }
    expectSameFigure(linear.efficiency, nonlinear.efficiency, tolerance);
    expectSameFigure(linear.effectiveness, nonlinear.effectiveness, tolerance);
    expect(nonlinear.idealHeatRate).toBe(linear.idealHeatRate);
    // One Newton step solves a linear problem; no coarse-grid start, no line search, no continuation.
    expect(nonlinear.newton.iterations).toBe(1);
    expect(nonlinear.newton.coarseGridIterations).toBe(0);
    expect(nonlinear.newton.halvings).toBe(0);
  });
});

describe('a power law with exponent 0 is the uniform-h fin', () => {
  const shared = {
    profile: { kind: 'trapezoidal' as const, length: 0.03, baseThickness: 0.003, tipThickness: 0.001, width: 0.05 },
    edges: 'cooled' as const,
    k: constantK(180),
    tip: { kind: 'convective' as const, h: null },
    base_degC: AMBIENT_DEGC + 60,
  };
  const power = finCase({ ...shared, h: { kind: 'power', base: 40, exponent: 0 } });
  const uniform = finCase({ ...shared, h: { kind: 'uniform', h: 40 } });
  if (!isLinearFinCase(uniform)) throw new Error('uniform case should be linear');

  test('study: same heat rate, GCI, extrapolation and order as the linear study', () => {
    const linear = studyFin1D(uniform);
    const nonlinear = studyNonlinearFin1D(power);
    // No contact resistance: the allowance is 32 ε (see the header).
    expect(Math.abs(relative(nonlinear.result.heatRate, linear.result.heatRate))).toBeLessThanOrEqual(32 * Number.EPSILON);
    expect(nonlinear.study.values.length).toBe(linear.study.values.length);
    nonlinear.study.values.forEach((value, i) => {
      expect(Math.abs(relative(value, linear.study.values[i] as number))).toBeLessThanOrEqual(32 * Number.EPSILON);
    });
    // The GCI and the order are differences of nearly equal heat rates (relative differences ~1e-7):
    // round-off of 1e-15 in each heat rate moves them by ~1e-8 relative.
    expect(Math.abs(relative(nonlinear.study.gci, linear.study.gci))).toBeLessThan(1e-6);
    expect(Math.abs(relative(nonlinear.study.extrapolated, linear.study.extrapolated))).toBeLessThanOrEqual(32 * Number.EPSILON);
    expect(Math.abs((nonlinear.study.observedOrder as number) - (linear.study.observedOrder as number))).toBeLessThan(1e-6);
    expect(nonlinear.iterations).toEqual([1, 1, 1]);
  });
});
