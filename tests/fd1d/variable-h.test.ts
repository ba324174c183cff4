/**
 * fd-1d with a non-uniform convection coefficient against the closed-form oracles NU1 and NU2 of
 * a uniform fin with an adiabatic tip (ν = 1/(n + 2)), derived by separation of variables:
 *   NU1, h = h_b (1 - x/L)^n, m^2 = h_b P/(kA):  q = kAmθ_b I_{1-ν}(2νmL) / I_{-ν}(2νmL);
 *   NU2, h = h_t (x/L)^n,     m^2 = h_t P/(kA):  q = (kAθ_b/L)(νmL)^{2ν} Γ(1-ν)/Γ(1+ν) I_{1-ν}(2νmL) / I_{ν-1}(2νmL);
 * η referred to the mean h = h_ref/(n + 1). Table values: computed reference values (scipy/mpmath
 * script nonuniform_h.py, checked with solve_bvp to 1e-10), closed forms derived there by separation
 * of variables (Bessel form of y'' = c^2 x^n y); earlier variable-h fin work: Han & Lefkowitz 1960,
 * ASME paper 60-WA-130 [from memory]. Only n = 1 is a linear h (the solver's linear kinds); mL = 3 is
 * computed here from the same closed forms with Cephes.
 */
import { beforeAll, describe, expect, test } from 'vitest';
import type { HDistribution } from '../../src/case/types.js';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { expectEfficiency } from './support/efficiency-check.js';
import { besselI, gamma, loadSpecial } from './support/special.js';
import { linearFinCase } from '../support/fin-case.js';

const L = 0.04;
const T = 0.002;
const K = 180;
const THETA_BASE = 60;
/** Per unit width (insulated edges): P/A = 2/t, so h_ref = (mL)^2 k t / (2 L^2). */
const hRefFor = (mL: number): number => (mL * mL * K * T) / (2 * L * L);

beforeAll(loadSpecial);

const finWith = (h: HDistribution) =>
  linearFinCase({
    profile: { kind: 'rectangular', length: L, thickness: T, width: 1 },
    edges: 'insulated',
    k: K,
    h,
    tip: { kind: 'adiabatic' },
    thetaBase: THETA_BASE,
  });

/** Q = q/(kAmθ_b) of NU1 and NU2 for n = 1 (ν = 1/3), from the closed forms in the header. */
function closedFormQ(oracle: 'NU1' | 'NU2', mL: number): number {
  const nu = 1 / 3;
  const z = 2 * nu * mL;
  if (oracle === 'NU1') return besselI(1 - nu, z) / besselI(-nu, z);
  return (Math.pow(nu * mL, 2 * nu) / mL) * (gamma(1 - nu) / gamma(1 + nu)) * (besselI(1 - nu, z) / besselI(nu - 1, z));
}

// NU1/NU2, n = 1: Q and η, computed reference values (script nonuniform_h.py; see the header).
const TABLE = [
  { oracle: 'NU1', mL: 0.5, Q: 0.2439392901, eta: 0.9757571602 },
  { oracle: 'NU1', mL: 1, Q: 0.4555445261, eta: 0.9110890522 },
  { oracle: 'NU1', mL: 2, Q: 0.7325766848, eta: 0.7325766848 },
  { oracle: 'NU2', mL: 0.5, Q: 0.2344468622, eta: 0.937787449 },
  { oracle: 'NU2', mL: 1, Q: 0.3963315917, eta: 0.7926631834 },
  { oracle: 'NU2', mL: 2, Q: 0.5018426877, eta: 0.5018426877 },
] as const;

const hOf = (oracle: 'NU1' | 'NU2', mL: number): HDistribution =>
  oracle === 'NU1' ? { kind: 'linear', base: hRefFor(mL), tip: 0 } : { kind: 'linear', base: 0, tip: hRefFor(mL) };

/** kAmθ_b for the fin of parameter mL: the scale of Q. */
const scaleFor = (mL: number): number => K * T * (mL / L) * THETA_BASE;

describe.each(TABLE)('$oracle, n = 1, mL = $mL (computed reference value, nonuniform_h.py)', ({ oracle, mL, Q, eta }) => {
  test('heat rate and efficiency', () => {
    const run = studyFin1D(finWith(hOf(oracle, mL)));
    expect(Math.abs(run.result.heatRate / (Q * scaleFor(mL)) - 1)).toBeLessThan(1e-6); // default-grid target
    expectEfficiency(run, eta);
  });
  test('the inline closed form reproduces the table (checks the oracle used at mL = 3)', () => {
    // 10 significant digits in the table: 1e-9 relative.
    expect(Math.abs(closedFormQ(oracle, mL) / Q - 1)).toBeLessThan(1e-9);
  });
});

describe.each(['NU1', 'NU2'] as const)('%s, n = 1, mL = 3 (closed form computed with Cephes)', (oracle) => {
  test('heat rate, GCI bound and order 2', () => {
    const exact = closedFormQ(oracle, 3) * scaleFor(3);
    const run = studyFin1D(finWith(hOf(oracle, 3)));
    const error = Math.abs(run.result.heatRate / exact - 1);
    expect(error).toBeLessThan(1e-6); // default-grid target
    expect(error).toBeLessThanOrEqual(run.study.gci); // the GCI bounds the true error
    expect(Math.abs(run.study.extrapolated / exact - 1)).toBeLessThan(1e-9); // O(h^3) remainder + Cephes round-off
    const cells = [50, 100, 200, 400];
    const errors = cells.map((n) => solveFin1D(finWith(hOf(oracle, 3)), { nodes: n + 1 }).heatRate / exact - 1);
    expect(
      Math.abs(
        fitObservedOrder(
          cells.map((n) => L / n),
          errors,
        ).order - 2,
      ),
    ).toBeLessThan(0.1); // formal order 2
  });
});

describe('piecewise-linear h (points)', () => {
  test('the NU1 line given as points with an extra interior point gives the same solution', () => {
    const hb = hRefFor(1);
    const asPoints: HDistribution = {
      kind: 'points',
      x: new Float64Array([0, 0.3 * L, L]),
      h: new Float64Array([hb, 0.7 * hb, 0]),
    };
    const linear = solveFin1D(finWith(hOf('NU1', 1)), { nodes: 401 });
    const points = solveFin1D(finWith(asPoints), { nodes: 401 });
    // The extra breakpoint at 0.3 L is a node; both grids then carry the same linear h and differ only
    // by the node placement: the same O(Δx^2) discretisation, 1e-6 of (1e-5 of) Q apart.
    expect(points.mesh.x).toContain(0.3 * L);
    expect(Math.abs(points.heatRate / linear.heatRate - 1)).toBeLessThan(1e-6);
    expect(Math.abs(points.heatRate / (0.4555445261 * scaleFor(1)) - 1)).toBeLessThan(1e-5);
  });

  test('a kinked h converges at order 2 when nodes sit on the kinks', () => {
    // h rises from 20 to 120 W/(m^2 K) over the first third, then falls to 10: no closed form, so
    // the order is measured from differences of successive grids (self-convergence, ratio 2).
    const kinked: HDistribution = { kind: 'points', x: new Float64Array([0, L / 3, L]), h: new Float64Array([20, 120, 10]) };
    const cells = [30, 60, 120, 240, 480];
    const q = cells.map((n) => solveFin1D(finWith(kinked), { nodes: n + 1 }).heatRate);
    const differences = q.slice(1).map((v, i) => v - (q[i] as number));
    const order = fitObservedOrder(
      cells.slice(1).map((n) => L / n),
      differences,
    ).order;
    expect(Math.abs(order - 2)).toBeLessThan(0.1); // formal order 2; ±0.1 for a fitted slope
  });
});
