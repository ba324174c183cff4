/**
 * A power-law h with a negative exponent near -1 (h = h_b (θ/θ_b)^n, -1 < n < 0): the face flux
 * h θ = h_b θ_b (θ/θ_b)^(n+1) is nearly a step at the fluid temperature, and the fin reaches the fluid
 * temperature at a finite distance and stays there (a dead zone). On a uniform fin the first integral gives
 * θ/θ_b = (1 - x/x*)^(-2/n), x* = sqrt(2 (n + 2)) / (-n m), m = sqrt(h_b P / (k A)), and the heat rate of the
 * infinite fin Q = sqrt(2/(n+2)) sqrt(h_b P k A) θ_b once L > x* (Sen & Trinh 1986, J. Heat Transfer 108,
 * 457-459; src/analytic/nonlinear.ts). Fuzz finding (tests/fuzz/cases/power-law-near-minus-one-*.yaml): the
 * energy balance was 1e-4..1e-2 because θ = θ_b - d cannot hold a θ below ε θ_b, whose loss ε^(n+1) G θ_b is
 * still large; the solver now takes such nodes in u = |θ/θ_b|^(n+1) (src/fd/one-d/newton-system.ts).
 * Checks: energy balance to round-off, θ >= 0, θ = 0 beyond x* (to the underflow), and the published Q.
 */
import { describe, expect, test } from 'vitest';
import { powerLawHInfiniteQ } from '../../src/analytic/nonlinear.js';
import { solveNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { solveNonlinearFin2D } from '../../src/fd/two-d/nonlinear-solve.js';
import { parseCaseObject } from '../../src/case/parse.js';
import { plateFin } from './support/cases.js';
import { AMBIENT_DEGC, constantK, finCase, relative } from '../support/fin-case.js';

const h = 10;
const k = 200;
const thetaB = 60;
const m = Math.sqrt((h * plateFin.P) / (k * plateFin.A));

describe.each([-0.5, -0.9, -0.95, -0.99])('uniform plate fin, n = %s, mL = 5', (n) => {
  const extinction = Math.sqrt(2 * (n + 2)) / (-n * m);
  const c = finCase({
    profile: plateFin.profile(5 / m),
    k: constantK(k),
    h: { kind: 'power', base: h, exponent: n },
    tip: { kind: 'adiabatic' },
    base_degC: AMBIENT_DEGC + thetaB,
  });
  const r = solveNonlinearFin1D(c, { nodes: 2001 });

  test('energy balance to round-off, 0 <= θ <= θ_b, θ = 0 beyond x*', () => {
    // The scheme is conservative: heat in minus heat out is the sum of converged residuals (1e-12 of the row
    // scales); measured 2e-16 .. 2.2e-15 over these exponents.
    expect(r.energyBalance).toBeLessThan(1e-12);
    r.theta.forEach((t, i) => {
      expect(t).toBeGreaterThanOrEqual(0);
      expect(t).toBeLessThanOrEqual(thetaB);
      // Past 1.2 x* the exact θ is 0; the discrete one decays like θ_{i+1} ~ θ_i^(1/(n+1)) and underflows.
      if ((r.mesh.x[i] as number) > 1.2 * extinction) expect(t).toBeLessThan(1e-300);
    });
  });

  test('heat rate of Sen & Trinh (1986)', () => {
    const exact = powerLawHInfiniteQ(n) * Math.sqrt(h * plateFin.P * k * plateFin.A) * thetaB;
    // 2001 nodes over mL = 5, x* ~ 1.4-2.4 / m: ~600-1000 cells hold the solution; second order, and
    // θ ~ (1 - x/x*)^(-2/n) is C^2 at x* for n > -1. Measured 1.1e-7 .. 4.6e-7; 5e-6 is 10 times the largest.
    expect(Math.abs(relative(r.heatRate, exact))).toBeLessThan(5e-6);
  });
});

describe('2-D section, n = -0.95 (the fuzz case)', () => {
  test('energy balance to round-off on the default section grid', () => {
    const c = parseCaseObject({
      name: 'exponent near -1',
      fin: { profile: 'triangular', length: '17.4 mm', baseThickness: '0.9 mm', width: '5 mm', edges: 'insulated' },
      material: { k: 0.19 },
      convection: { ambient: '-40 degC', h: { law: 'power', base: 1, exponent: -0.95 }, tip: 'adiabatic' },
      base: { temperature: '48.5 degC' },
    });
    const r = solveNonlinearFin2D(c, { nx: 94, ny: 9 });
    // Measured 3e-16 (it was 4e-3 before the ambient variable); 1e-12 as in 1-D.
    expect(r.energyBalance).toBeLessThan(1e-12);
  });
});
