/**
 * Nonlinear fd-1d with a power-law h = h_b (θ/θ_b)^n against the first-integral solutions of uniform
 * fins, n = 1/4 (laminar natural convection), 1/3 (turbulent), 2 (nucleate boiling).
 *
 * Sources: closed forms of Sen, A. K. & Trinh, S., 1986, "An exact solution for the rate of heat
 * transfer from a rectangular fin governed by a power law-type temperature dependence", J. Heat
 * Transfer 108, 457-459, and Ünal, H. C., 1985, IJHMT 28, 2279-2284 (both from memory):
 *   infinite fin Q = q / (sqrt(h_b P k A) θ_b) = sqrt(2/(n+2)), θ/θ_b = [1 + n m x / sqrt(2(n+2))]^(-2/n);
 *   adiabatic tip: Q = sqrt(2/(n+2)) sqrt(1 - u_t^(n+2)), mL = sqrt((n+2)/2) ∫_{u_t}^1 du / sqrt(u^(n+2) - u_t^(n+2)).
 * The numbers are computed reference values (mpmath quadrature and root finding, script nonlinear.py,
 * each checked with scipy solve_bvp to <= 1e-10) of these closed forms, printed to 10 significant
 * digits (the infinite-fin Q to 12).
 * The infinite fin is solved as a fin cut at mL = 1 with the `infinite` tip, which continues the fin
 * exactly (the same first integral: Q_tip = sqrt(2 A P ∫_0^θ q k dθ)), so no truncation remainder.
 */
import { describe, expect, test } from 'vitest';
import { studyNonlinearFin1D, solveNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { pinFin, plateFin, type UniformFin } from './support/cases.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

const THETA_B = 60;
/** Both fins have m^2 = h_b P / (k A) = 50 1/m^2. */
const FINS: { fin: UniformFin; k: number; hBase: number }[] = [
  { fin: plateFin, k: 200, hBase: 10 },
  { fin: pinFin, k: 400, hBase: 25 },
];
const M = Math.sqrt(50);

function powerLawCase(fin: UniformFin, k: number, hBase: number, n: number, mL: number, tip: 'adiabatic' | 'infinite') {
  return finCase({
    profile: fin.profile(mL / M),
    k: constantK(k),
    h: { kind: 'power', base: hBase, exponent: n },
    tip: { kind: tip },
    base_degC: AMBIENT_DEGC + THETA_B,
  });
}

/** Computed reference values (nonlinear.py): n, mL, u_t, Q, η = Q/mL. */
const TABLE: [number, number, number, number, number][] = [
  [0.25, 0.5, 0.88927927, 0.4541608241, 0.9083216481],
  [0.25, 1, 0.6678978468, 0.7283030125, 0.7283030125],
  [0.25, 2, 0.3235397197, 0.9048279056, 0.4524139528],
  [1 / 3, 0.5, 0.8900645036, 0.4516161635, 0.9032323271],
  [1 / 3, 1, 0.6738139906, 0.7183075317, 0.7183075317],
  [1 / 3, 2, 0.3402665684, 0.8876142651, 0.4438071326],
  [2, 0.5, 0.902973855, 0.4093807294, 0.8187614588],
  [2, 1, 0.7516220094, 0.5834585319, 0.5834585319],
  [2, 2, 0.541053183, 0.6761302179, 0.338065109],
];

const ROWS = FINS.flatMap(({ fin, k, hBase }) =>
  TABLE.map(([n, mL, tipRatio, Q, eta]) => ({ fin, k, hBase, n, mL, tipRatio, Q, eta, name: `${fin.id}, n = ${n.toFixed(3)}, mL = ${mL}` })),
);

describe.each(ROWS)('power-law h, adiabatic tip: $name (Sen & Trinh 1986; nonlinear.py)', ({ fin, k, hBase, n, mL, tipRatio, Q, eta }) => {
  const c = powerLawCase(fin, k, hBase, n, mL, 'adiabatic');
  const { result, study, iterations } = studyNonlinearFin1D(c);
  const scale = Math.sqrt(hBase * fin.P * k * fin.A) * THETA_B;

  test('heat rate, its error estimate and the extrapolated value', () => {
    const error = Math.abs(relative(result.heatRate, Q * scale));
    // 1e-6: the accuracy target of the default study grids (4000 cells, second order; measured <= 4e-8).
    expect(error).toBeLessThan(1e-6);
    // The GCI (Celik et al. 2008) must bound the true error, up to the table's rounding (5e-10).
    expect(error).toBeLessThanOrEqual(study.gci + 5e-10);
    // Richardson extrapolation leaves the table's 10 digits (<= 5e-10 relative) and an O(h^3)
    // remainder far below it; 2e-9 allows both.
    expect(Math.abs(relative(study.extrapolated, Q * scale))).toBeLessThan(2e-9);
    // Asymptotic range: observed order within 0.1 of the formal 2 (common practice, no source).
    expect(Math.abs((study.observedOrder as number) - 2)).toBeLessThan(0.1);
  });

  test('efficiency, tip temperature, energy balance, Newton steps', () => {
    // η = q / (h_b P L θ_b): Q_ideal has every face at θ_b, where h = h_b. Same 1e-6 as the heat rate.
    expect(Math.abs(relative(result.efficiency, eta))).toBeLessThan(1e-6);
    // Nodal temperatures share the second-order error: 1e-6 of θ_b is ample at 4000 cells.
    const tipTheta = result.tipTemperature_degC - AMBIENT_DEGC;
    expect(Math.abs(tipTheta / THETA_B - tipRatio)).toBeLessThan(1e-6);
    // Conservative scheme: base heat = surface heat to round-off (measured <= 1e-14).
    expect(result.energyBalance).toBeLessThan(1e-12);
    // Each grid starts from the previous one's solution (error O(h^2)), so quadratic convergence needs
    // at most 3 steps plus the one that confirms the heat rate; the coarsest grid starts from its own
    // coarser grids. Both convergence criteria were met.
    expect(iterations[2]).toBeLessThanOrEqual(4);
    expect(result.newton.residual).toBeLessThanOrEqual(1e-12);
    expect(result.newton.heatRateChange).toBeLessThanOrEqual(1e-12);
    expect(result.newton.continuationStages).toBe(0);
  });
});

/** Q = sqrt(2/(n+2)) printed to 12 digits (nonlinear.py). */
const INFINITE: [number, number][] = [
  [0.25, 0.942809041582],
  [1 / 3, 0.925820099773],
  [2, 0.707106781187],
];
const INFINITE_ROWS = FINS.flatMap(({ fin, k, hBase }) => INFINITE.map(([n, Q]) => ({ fin, k, hBase, n, Q, name: `${fin.id}, n = ${n.toFixed(3)}` })));

describe.each(INFINITE_ROWS)('power-law h, infinite fin: $name (Sen & Trinh 1986; nonlinear.py)', ({ fin, k, hBase, n, Q }) => {
  test('fin cut at mL = 1 with the exact continuation: heat rate and effectiveness', () => {
    const { result, study } = studyNonlinearFin1D(powerLawCase(fin, k, hBase, n, 1, 'infinite'));
    const q = Q * Math.sqrt(hBase * fin.P * k * fin.A) * THETA_B;
    const error = Math.abs(relative(result.heatRate, q));
    // 1e-6 target; measured <= 2e-9 (only [0, L] is discretised).
    expect(error).toBeLessThan(1e-6);
    expect(error).toBeLessThanOrEqual(study.gci + 5e-12);
    // 12-digit reference (5e-12) plus the extrapolation remainder: 1e-10.
    expect(Math.abs(relative(study.extrapolated, q))).toBeLessThan(1e-10);
    // Effectiveness q / (h_b A θ_b) = Q sqrt(k P / (h_b A)) (the bare base at the base temperature).
    expect(Math.abs(relative(result.effectiveness, Q * Math.sqrt((k * fin.P) / (hBase * fin.A))))).toBeLessThan(1e-6);
    expect(result.energyBalance).toBeLessThan(1e-12);
  });
});

describe('power-law h, infinite fin profile, n = 1/4 (Sen & Trinh 1986 closed-form profile; nonlinear.py)', () => {
  test('θ/θ_b = 0.4101363273 at mx = 1 and 0.0245725306 at mx = 5', () => {
    // Cut at mL = 5 with the infinite tip; 4000 uniform cells put a node at mx = 1 (node 800).
    const result = solveNonlinearFin1D(powerLawCase(plateFin, 200, 10, 0.25, 5, 'infinite'), { nodes: 4001 });
    expect(result.mesh.x[800]).toBeCloseTo(1 / M, 14);
    // Second-order nodal error at mL = 5 on 4000 cells ~ 1e-7 θ_b; 1e-6 θ_b leaves room.
    expect(Math.abs((result.theta[800] as number) / THETA_B - 0.4101363273)).toBeLessThan(1e-6);
    expect(Math.abs((result.theta[4000] as number) / THETA_B - 0.0245725306)).toBeLessThan(1e-6);
  });
});
