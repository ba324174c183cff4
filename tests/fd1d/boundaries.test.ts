/**
 * fd-1d base and tip conditions that the uniform-fin table does not cover: a contact resistance at
 * the base and a tip with its own convection coefficient.
 *
 * Closed forms (uniform fin, M = sqrt(hPkA), m = sqrt(hP/(kA))):
 * - contact resistance R'' in series with the fin (thermal-resistance network; fin resistance
 *   1/(M tanh mL) for the adiabatic tip, contact resistance R''/A_b: Incropera et al., Fundamentals of
 *   Heat and Mass Transfer, §3.1.4 and §3.6.4 [from memory for the sections]):
 *   q = θ_b / (R''/A_b + 1/(M tanh mL));
 * - convective tip with coefficient h_tip: Incropera et al. 2007, Table 3.4 case A [from memory for the
 *   table number], with β = h_tip/(mk): q = M θ_b (sinh mL + β cosh mL)/(cosh mL + β sinh mL).
 */
import { describe, expect, test } from 'vitest';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { baseBoundary, tipBoundary } from '../../src/fd/one-d/boundary.js';
import { AMBIENT_DEGC, linearFinCase } from '../support/fin-case.js';

// Check case R1 (invented inputs; aluminium plate, cooled edges): k = 180, h = 40, t = 2 mm, w = 50 mm, L = 30 mm.
const K = 180;
const H = 40;
const THICKNESS = 0.002;
const WIDTH = 0.05;
const LENGTH = 0.03;
const THETA_BASE = 60;
const AREA = WIDTH * THICKNESS;
const PERIMETER = 2 * (WIDTH + THICKNESS);
const m = Math.sqrt((H * PERIMETER) / (K * AREA));
const M = Math.sqrt(H * PERIMETER * K * AREA);
const profile = { kind: 'rectangular', length: LENGTH, thickness: THICKNESS, width: WIDTH } as const;

describe.each([1e-4, 1.5e-4, 1e-3])("contact resistance R'' = %d m^2 K/W (series network)", (resistance) => {
  const run = studyFin1D(
    linearFinCase({
      edges: 'cooled',
      profile,
      k: K,
      h: { kind: 'uniform', h: H },
      tip: { kind: 'adiabatic' },
      thetaBase: THETA_BASE,
      contactResistance: resistance,
    }),
  );
  const exact = THETA_BASE / (resistance / AREA + 1 / (M * Math.tanh(m * LENGTH)));
  test('heat rate and temperatures', () => {
    // 1e-6 default-grid target; the GCI bounds the true error; energy balance at round-off.
    const error = Math.abs(run.result.heatRate / exact - 1);
    expect(error).toBeLessThan(1e-6);
    expect(error).toBeLessThanOrEqual(run.study.gci);
    expect(run.result.energyBalance).toBeLessThan(1e-10);
    // The fin root sits below the wall by q R''/A_b (Fourier across the contact), to the same 1e-6.
    const rootExcess = THETA_BASE - (exact * resistance) / AREA;
    expect(Math.abs((run.result.theta[0] as number) / rootExcess - 1)).toBeLessThan(1e-6);
    // Efficiency stays referred to the wall temperature: η = q / (h P L θ_b) (definitions of the contract).
    expect(Math.abs(run.result.efficiency / (exact / (H * PERIMETER * LENGTH * THETA_BASE)) - 1)).toBeLessThan(1e-6);
  });
  test('observed order 2 from four grids', () => {
    const fin = linearFinCase({
      edges: 'cooled',
      profile,
      k: K,
      h: { kind: 'uniform', h: H },
      tip: { kind: 'adiabatic' },
      thetaBase: THETA_BASE,
      contactResistance: resistance,
    });
    const cells = [50, 100, 200, 400];
    const errors = cells.map((n) => solveFin1D(fin, { nodes: n + 1 }).heatRate / exact - 1);
    // Formal order 2; ±0.1 for a fitted slope in the asymptotic range.
    expect(
      Math.abs(
        fitObservedOrder(
          cells.map((n) => LENGTH / n),
          errors,
        ).order - 2,
      ),
    ).toBeLessThan(0.1);
  });
});

describe.each([0, 10, 120, 400])('convective tip with its own coefficient h_tip = %d W/(m^2 K) (Table 3.4 case A)', (hTip) => {
  const run = studyFin1D(
    linearFinCase({ edges: 'cooled', profile, k: K, h: { kind: 'uniform', h: H }, tip: { kind: 'convective', h: hTip }, thetaBase: THETA_BASE }),
  );
  const beta = hTip / (m * K);
  const mL = m * LENGTH;
  const exact = (M * THETA_BASE * (Math.sinh(mL) + beta * Math.cosh(mL))) / (Math.cosh(mL) + beta * Math.sinh(mL));
  test('heat rate and efficiency', () => {
    const error = Math.abs(run.result.heatRate / exact - 1);
    expect(error).toBeLessThan(1e-6); // default-grid target
    expect(error).toBeLessThanOrEqual(run.study.gci);
    // Ideal heat rate counts the tip at its own coefficient: h P L + h_tip A (contract's efficiency).
    expect(run.result.idealHeatRate).toBeCloseTo((H * PERIMETER * LENGTH + hTip * AREA) * THETA_BASE, 12);
  });
});

describe('boundary conditions built from a case', () => {
  const base = { profile, edges: 'cooled' as const, k: K, h: { kind: 'uniform', h: H } as const, thetaBase: THETA_BASE };
  test('base: temperature without a contact resistance, contact with one', () => {
    expect(baseBoundary(linearFinCase({ ...base, tip: { kind: 'adiabatic' } }))).toEqual({ kind: 'temperature', theta: THETA_BASE });
    expect(baseBoundary(linearFinCase({ ...base, tip: { kind: 'adiabatic' }, contactResistance: 2e-4 }))).toEqual({
      kind: 'contact',
      theta: THETA_BASE,
      resistance: 2e-4,
    });
  });
  test('tip: the four kinds, temperatures as excess over ambient', () => {
    expect(tipBoundary(linearFinCase({ ...base, tip: { kind: 'convective', h: null } }))).toEqual({ kind: 'convective', h: 'local' });
    expect(tipBoundary(linearFinCase({ ...base, tip: { kind: 'convective', h: 55 } }))).toEqual({ kind: 'convective', h: 55 });
    expect(tipBoundary(linearFinCase({ ...base, tip: { kind: 'temperature', T_degC: AMBIENT_DEGC + 7 } }))).toEqual({ kind: 'temperature', theta: 7 });
    expect(tipBoundary(linearFinCase({ ...base, tip: { kind: 'infinite' } }))).toEqual({ kind: 'infinite' });
    expect(tipBoundary(linearFinCase({ ...base, tip: { kind: 'adiabatic' } }))).toEqual({ kind: 'adiabatic' });
  });
});
