/**
 * The discrete adjoint of the fd-2d section (src/fd/two-d/adjoint.ts) against central differences of re-solves on
 * the same grid (issue 12: 1e-6 relative), the exact gradient of the heat-rate functional, and the closed-form
 * derivatives of the uniform fin through check.
 */
import { describe, expect, it } from 'vitest';
import { numericInputs, parseCaseObject, type Case } from '../../src/case/index.js';
import { runCheck } from '../../src/compare/check.js';
import type { CheckReport } from '../../src/compare/types.js';
import { finProblem } from '../../src/fd/index.js';
import { assembleSection2D, finSectionAdjoint, finSectionHeatRate, heatRateGradient, sectionHeatRate } from '../../src/fd/two-d/adjoint.js';
import { solveFin2DProblem } from '../../src/fd/two-d/linear-solve.js';
import { twoDFinProblem } from '../../src/fd/two-d/nonlinear-problem.js';
import { finCase } from '../support/fin-case.js';

const D = 1e-4;

/** Invented linear fins covering every base and tip condition the 2-D model takes, thin and thick. */
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
    'thick pin (Bi = 0.5), adiabatic tip',
    finCase({ profile: { kind: 'pin', length: 0.004, diameter: 0.004 }, k: 20, h: { kind: 'uniform', h: 5000 }, base_degC: 90, ambient_degC: 20 }),
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
    'infinite plate fin (Bi = 0.2, slowest-mode closure)',
    finCase({
      profile: { kind: 'rectangular', length: 0.05, thickness: 0.002, width: 0.03 },
      k: 50,
      h: { kind: 'uniform', h: 10000 },
      tip: { kind: 'infinite' },
      base_degC: 60,
      ambient_degC: 20,
    }),
  ],
];

describe('fd-2d section adjoint', () => {
  it.each(fins)('%s: the gradient of Q is exact (Q affine in theta)', (_, c) => {
    const a = assembleSection2D(twoDFinProblem(finProblem(c)).linear, 21, 7);
    const g = heatRateGradient(a);
    const n = g.length;
    const zero = new Float64Array(n);
    // Any field: Q(theta) - Q(0) = g . theta exactly for an affine Q (up to round-off of the sums, 1e-12).
    const theta = Float64Array.from({ length: n }, (_, p) => 30 + 20 * Math.sin(p * 0.37) + p * 1e-3);
    let dot = 0;
    for (let p = 0; p < n; p++) dot += (g[p] as number) * (theta[p] as number);
    const change = sectionHeatRate(a, theta) - sectionHeatRate(a, zero);
    expect(Math.abs(dot / change - 1)).toBeLessThan(1e-10);
  });

  it.each(fins)('%s: every input, adjoint = central differences of re-solves on the same grid to 1e-6', (_, c) => {
    const nx = 41;
    const ny = 9;
    const section = (v: Case): number => solveFin2DProblem(twoDFinProblem(finProblem(v)).linear, { nx, ny }).heatRate_W;
    const adjoint = finSectionAdjoint(finProblem(c), nx, ny);
    const Q = section(c);
    expect(Math.abs(adjoint.heatRate_W / Q - 1)).toBeLessThan(1e-12);
    // The sample's lean heat rate is the full solve's: same system, level shift and solver.
    expect(finSectionHeatRate(finProblem(c), nx, ny)).toBe(Q);
    const inputs = numericInputs(c);
    expect(inputs.length).toBeGreaterThanOrEqual(5);
    for (const input of inputs) {
      const byAdjoint = adjoint.derivative(finProblem(input.scale(1 + D)), finProblem(input.scale(1 - D)), D) / Q;
      // Re-solves: central differences at steps 4e-3 and 2e-3 combined by Richardson (truncation O(d^4) ~ 1e-10 S^(5));
      // the re-solved Q carries ~1e-11 of round-off (measured on the annular fin), ~5e-9 of S over these steps; with
      // one step of 1e-4 it reached 2e-7 of S there, the re-solves then being the less precise of the two (the
      // adjoint moved by 2e-10 of S between steps 1e-3 and 1e-5).
      const central = (d: number): number => (section(input.scale(1 + d)) - section(input.scale(1 - d))) / (2 * d * Q);
      const reSolved = (4 * central(2e-3) - central(4e-3)) / 3;
      // The adjoint's own truncation (assembly differences of the sizes at d = 1e-4) is ~1e-8 S'''; issue 12 asks
      // 1e-6. Relative to max(|S|, 0.01): an S near 0 (a fixed-temperature tip makes Q nearly independent of some
      // inputs) is compared in absolute terms.
      expect(Math.abs(byAdjoint - reSolved) / Math.max(Math.abs(reSolved), 0.01), input.key).toBeLessThan(1e-6);
    }
  });
});

describe('check with the fd-2d reference: the adjoint against the closed-form derivatives of the uniform fin', () => {
  const sensitivityOf = (r: CheckReport, key: string): number => {
    const s = r.sensitivities?.find((x) => x.key === key);
    if (s === undefined) throw new Error(`no sensitivity ${key}`);
    return s.dlnQ_dlnx;
  };
  // Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4 case B:
  // q_f = sqrt(hPkA_c) theta_b tanh(mL), m^2 = hP/(kA_c), P = 2w, A_c = wt (edges insulated). With
  // d ln tanh(u)/d ln u = 2u/sinh(2u) and d ln(mL)/d ln h = 1/2:
  //   d ln q/d ln h = 1/2 + mL/sinh(2mL),  d ln q/d ln k = d ln q/d ln t = 1/2 - mL/sinh(2mL),
  //   d ln q/d ln L = 2mL/sinh(2mL),       d ln q/d ln w = 1.
  it.each([0.5, 1, 2.5])(
    'mL = %s, Bi = 1e-5',
    async (mL) => {
      const h = 20;
      const k = 200;
      const t = 2e-4; // Bi = h (t/2)/k = 1e-5: the 2-D effects on S are O(Bi)
      const L = mL / Math.sqrt((2 * h) / (k * t));
      const c = parseCaseObject({
        fin: { profile: 'rectangular', length: L, thickness: t, width: 0.05, edges: 'insulated' },
        material: { k },
        convection: { ambient: 20, h, tip: 'adiabatic' },
        base: { temperature: 80 },
      });
      const { report } = await runCheck(c, { tolerance: 0.02, reference: '2d', sample: 'never' });
      expect(report.sensitivities?.find((s) => s.key === 'convection.h')?.method).toBe('adjoint');
      expect(report.sensitivityMethod).toMatch(/^adjoint, exact for the discrete system/);
      const x = mL / Math.sinh(2 * mL);
      const expected: [string, number][] = [
        ['convection.h', 0.5 + x],
        ['material.k', 0.5 - x],
        ['fin.thickness', 0.5 - x],
        ['fin.length', 2 * x],
        ['fin.width', 1],
        ['base.temperature', 1],
      ];
      // The adjoint gives the exact derivative of the finest grid's heat rate, whose error (the study's GCI, below
      // 1e-5 here) and the O(Bi) = 1e-5 of the 2-D model bound the difference from the 1-D closed form: 2e-5 holds both
      // (measured 3e-7 to 4.8e-6, largest for the thickness, which the 2-D model resolves across).
      expect(report.reference.discretizationError).toBeLessThan(1e-5);
      for (const [key, value] of expected) expect(Math.abs(sensitivityOf(report, key) - value), key).toBeLessThan(2e-5);
    },
    60_000,
  );
});
