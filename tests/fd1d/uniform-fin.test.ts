/**
 * fd-1d against the closed forms of the uniform fin, all four tips.
 *
 * Reference values: check cases R1, R2, P1, P2 (invented inputs), computed reference values (mpmath
 * script uniform_fin.py, checked with scipy solve_bvp), closed forms of Incropera, DeWitt, Bergman &
 * Lavine 2007, Fundamentals of Heat and Mass Transfer (6th/7th ed.), Table 3.4 [from memory for the table
 * number]: A convective tip, B adiabatic, C prescribed tip temperature, D infinite. Fin efficiency:
 * Harper & Brown 1922; fin effectiveness: Gardner 1945.
 */
import { describe, expect, test } from 'vitest';
import type { Profile, TipCondition } from '../../src/case/types.js';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { AMBIENT_DEGC, linearFinCase, relative } from '../support/fin-case.js';

interface UniformCase {
  id: string;
  profile: Profile;
  edges: 'cooled' | 'insulated';
  k: number;
  h: number;
  thetaBase: number;
  /** Fin parameter m = sqrt(hP/(kA)), 1/m (computed by uniform_fin.py). */
  m: number;
  /** Heat rate q (W; W per metre of width for R2), η_f, ε_f, θ(L), θ(L/2) for tips A, B, C, D. */
  rows: Record<'A' | 'B' | 'C' | 'D', { q: number; eta: number | null; eps: number; thetaTip: number; thetaMid: number }>;
}

// Check-case inputs (invented): R1 aluminium plate fin (cooled edges, P = 2(w + t)); R2 per metre of width
// (P = 2 m: insulated edges); P1 copper pin; P2 stainless pin. Tip C: θ_L = θ_b / 4.
const CASES: UniformCase[] = [
  {
    id: 'R1',
    profile: { kind: 'rectangular', length: 0.03, thickness: 0.002, width: 0.05 },
    edges: 'cooled',
    k: 180,
    h: 40,
    thetaBase: 60,
    m: 15.202339,
    rows: {
      A: { q: 7.203722261, eta: 0.9321586777, eps: 30.01550942, thetaTip: 53.92214373, thetaMid: 55.51150752 },
      B: { q: 7.008672878, eta: 0.9359872967, eps: 29.20280366, thetaTip: 54.25861334, thetaMid: 55.67546103 },
      C: { q: 29.76665185, eta: null, eps: 124.027716, thetaTip: 15, thetaMid: 36.5456875 },
      D: { q: 16.41852612, eta: null, eps: 68.41052551, thetaTip: 0, thetaMid: 47.7657797 },
    },
  },
  {
    id: 'R2',
    profile: { kind: 'rectangular', length: 0.025, thickness: 0.001, width: 1 },
    edges: 'insulated',
    k: 237,
    h: 40,
    thetaBase: 50,
    m: 18.37260849,
    rows: {
      A: { q: 95.13901802, eta: 0.9327354708, eps: 47.56950901, thetaTip: 44.97526494, thetaMid: 46.26226446 },
      B: { q: 93.51441335, eta: 0.9351441335, eps: 46.75720668, thetaTip: 45.15272635, thetaMid: 46.34870556 },
      C: { q: 392.44008, eta: null, eps: 196.22004, thetaTip: 12.5, thetaMid: 30.44362688 },
      D: { q: 217.7154106, eta: null, eps: 108.8577053, thetaTip: 0, thetaMid: 39.74028463 },
    },
  },
  {
    id: 'P1',
    profile: { kind: 'pin', length: 0.05, diameter: 0.005 },
    edges: 'cooled',
    k: 398,
    h: 100,
    thetaBase: 75,
    m: 14.1776241,
    rows: {
      A: { q: 5.160099582, eta: 0.8546397193, eps: 35.04022849, thetaTip: 58.79597767, thetaMid: 62.90512197 },
      B: { q: 5.068618059, eta: 0.8604753266, eps: 34.41901307, thetaTip: 59.43156169, thetaMid: 63.20394628 },
      C: { q: 10.92403778, eta: null, eps: 74.18089009, thetaTip: 18.75, thetaMid: 44.07722331 },
      D: { q: 8.309553397, eta: null, eps: 56.42694392, thetaTip: 0, thetaMid: 52.61743407 },
    },
  },
  {
    id: 'P2',
    profile: { kind: 'pin', length: 0.1, diameter: 0.005 },
    edges: 'cooled',
    k: 15,
    h: 25,
    thetaBase: 80,
    m: 36.51483717,
    rows: {
      A: { q: 0.8593034424, eta: 0.2701479318, eps: 21.88198248, thetaTip: 3.968717608, thetaMid: 13.18501452 },
      B: { q: 0.8592023919, eta: 0.2734926156, eps: 21.87940925, thetaTip: 4.149620101, thetaMid: 13.21342036 },
      C: { q: 0.8503485131, eta: null, eps: 21.65394707, thetaTip: 20, thetaMid: 15.70229354 },
      D: { q: 0.8603605814, eta: null, eps: 21.9089023, thetaTip: 0, thetaMid: 12.88784703 },
    },
  },
];

function tipOf(tip: 'A' | 'B' | 'C' | 'D', thetaBase: number): TipCondition {
  switch (tip) {
    case 'A':
      return { kind: 'convective', h: null };
    case 'B':
      return { kind: 'adiabatic' };
    case 'C':
      return { kind: 'temperature', T_degC: AMBIENT_DEGC + thetaBase / 4 };
    case 'D':
      return { kind: 'infinite' };
  }
}

const ROWS = CASES.flatMap((c) => (['A', 'B', 'C', 'D'] as const).map((tip) => ({ c, tip, name: `${c.id} tip ${tip}` })));

describe.each(ROWS)('$name (Incropera et al. 2007, Table 3.4 closed forms; computed reference values, uniform_fin.py)', ({ c, tip }) => {
  const expected = c.rows[tip];
  const fin = linearFinCase({
    profile: c.profile,
    edges: c.edges,
    k: c.k,
    h: { kind: 'uniform', h: c.h },
    tip: tipOf(tip, c.thetaBase),
    thetaBase: c.thetaBase,
  });
  const { result, study } = studyFin1D(fin);

  test('heat rate on the default study grids', () => {
    // 1e-6: the acceptance level of fd-1d on the default grids (DEFAULT_STUDY_NODES); the finest grid
    // (4000 cells) is second order with an error ~8e-9 (mL)^2 <= 1.1e-7 for mL <= 3.7 (P2).
    expect(Math.abs(relative(result.heatRate, expected.q))).toBeLessThan(1e-6);
    // The GCI (Celik et al. 2008) must bound the true error of the finest grid, up to the rounding
    // of the table's 10 significant digits (half a unit in the last digit).
    const tableRounding = (0.5 * Math.pow(10, Math.floor(Math.log10(expected.q)) - 9)) / expected.q;
    expect(Math.abs(relative(result.heatRate, expected.q))).toBeLessThanOrEqual(study.gci + tableRounding);
    // Richardson extrapolation removes the h^2 term: left with the table's 10 significant digits
    // (5e-10 relative) plus the h^3 remainder; 2e-9 leaves room for both.
    expect(Math.abs(relative(study.extrapolated, expected.q))).toBeLessThan(2e-9);
    expect(study.observedOrder).not.toBeNull();
    // Asymptotic range: observed order within 0.1 of the formal order 2 (common practice, no source; the acceptance band of the project).
    expect(Math.abs((study.observedOrder as number) - 2)).toBeLessThan(0.1);
  });

  test('temperatures, efficiency and effectiveness', () => {
    const n = result.mesh.nodes;
    const mid = (n - 1) / 2;
    // Tip D: the tabulated θ(L) = 0 is the far end of the infinite fin; the truncated fin with the exact
    // continuation has θ(L) = θ_b exp(-mL) (Table 3.4 case D, θ/θ_b = exp(-mx)).
    const thetaTip = tip === 'D' ? c.thetaBase * Math.exp(-c.m * result.mesh.length) : expected.thetaTip;
    expect(result.mesh.x[mid]).toBeCloseTo((result.mesh.length as number) / 2, 15);
    // Nodal temperatures share the heat rate's second-order error; 1e-6 of θ_b is ample at 8000 cells.
    expect(Math.abs((result.theta[n - 1] as number) - thetaTip)).toBeLessThan(1e-6 * c.thetaBase);
    expect(Math.abs((result.theta[mid] as number) - expected.thetaMid)).toBeLessThan(1e-6 * c.thetaBase);
    expect(result.tipTemperature_degC).toBeCloseTo(AMBIENT_DEGC + thetaTip, 4);
    // η and ε are q divided by exact areas: same 1e-6 relative as q.
    if (expected.eta !== null) expect(Math.abs(relative(result.efficiency, expected.eta))).toBeLessThan(1e-6);
    expect(Math.abs(relative(result.effectiveness, expected.eps))).toBeLessThan(1e-6);
    // Conservative scheme: base heat = surface heat to round-off.
    expect(result.energyBalance).toBeLessThan(1e-10);
  });

  test('observed order 2 from four grids (least squares on log-log)', () => {
    const cells = [50, 100, 200, 400];
    const errors = cells.map((n) => relative(solveFin1D(fin, { nodes: n + 1 }).heatRate, expected.q));
    const { order } = fitObservedOrder(
      cells.map((n) => 1 / n),
      errors,
    );
    // Formal order 2; 0.1 is the usual allowance for a fitted slope in the asymptotic range.
    expect(Math.abs(order - 2)).toBeLessThan(0.1);
  });
});
