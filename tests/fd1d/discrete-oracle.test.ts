/**
 * An exact discrete oracle (computed reference values, script gci.py; derived by us, no published
 * source): the three-point scheme θ_{i-1} - (2 + (mL/N)^2) θ_i + θ_{i+1} = 0, θ_0 = θ_b, adiabatic tip
 * by a ghost node, base heat from the half-cell balance Q_h = [(θ_0 - θ_1) N + (mL)^2 θ_0/(2N)]/(mL)
 * = q/(sqrt(hPkA) θ_b). Its exact solution is θ_i/θ_b = cosh(μ(N - i))/cosh(μN), cosh μ = 1 + (mL/N)^2/2
 * (the linear recurrence with constant coefficients; e.g. Richtmyer & Morton, Difference Methods for
 * Initial-Value Problems, 1967 [from memory]).
 *
 * For a uniform fin with an adiabatic tip on a uniform grid, the vertex-centred finite-volume
 * assembly is exactly this scheme (G_i = hPΔx, half cells at both ends), so the solver must reproduce
 * it to round-off: 1e-12 (errors of ~N operations of 1e-16 on O(1) values, N <= 1e5).
 */
import { describe, expect, test } from 'vitest';
import { solveFin1D } from '../../src/fd/one-d/linear-solve.js';
import { thomas } from '../../src/fd/linear-algebra/tridiagonal.js';
import { linearFinCase } from '../support/fin-case.js';

const L = 0.05;
const T = 0.003;
const K = 200;
const THETA_BASE = 30;

function uniformFin(mL: number) {
  const h = (mL * mL * K * T) / (2 * L * L); // per unit width: m^2 = 2h/(kt)
  return {
    fin: linearFinCase({
      profile: { kind: 'rectangular', length: L, thickness: T, width: 1 },
      edges: 'insulated',
      k: K,
      h: { kind: 'uniform', h },
      tip: { kind: 'adiabatic' },
      thetaBase: THETA_BASE,
    }),
    scale: Math.sqrt(h * 2 * K * T) * THETA_BASE, // sqrt(hPkA) θ_b per metre of width
  };
}

/** Exact discrete θ_i/θ_b, written to avoid cancellation: sinh(μ/2) = mL/(2N). */
function exactDiscrete(mL: number, N: number): { theta: Float64Array; Qh: number } {
  const mu = 2 * Math.asinh(mL / (2 * N));
  const theta = new Float64Array(N + 1);
  for (let i = 0; i <= N; i++) theta[i] = Math.cosh(mu * (N - i)) / Math.cosh(mu * N);
  // θ_0 - θ_1 = [cosh(μN) - cosh(μ(N-1))]/cosh(μN) = 2 sinh(μ(2N-1)/2) sinh(μ/2)/cosh(μN)
  const drop = (2 * Math.sinh((mu * (2 * N - 1)) / 2) * Math.sinh(mu / 2)) / Math.cosh(mu * N);
  return { theta, Qh: (drop * N + (mL * mL) / (2 * N)) / mL };
}

// Q_h for N = 10, 20, 40: computed reference values (gci.py).
const TABLE = [
  { mL: 0.5, Qh: [0.462220583231, 0.462143018406, 0.462123622838] },
  { mL: 1, Qh: [0.762370487823, 0.761788364791, 0.761642716041] },
  { mL: 2, Qh: [0.968599353622, 0.965172932052, 0.964314069301] },
  { mL: 4, Qh: [1.01908313982, 1.00430451304, 1.00057544269] },
];
const ROWS = TABLE.flatMap(({ mL, Qh }) => [10, 20, 40].map((N, j) => ({ mL, N, Qh: Qh[j] as number })));

describe.each(ROWS)('mL = $mL, N = $N (exact discrete oracle; computed reference value, gci.py)', ({ mL, N, Qh }) => {
  const { fin, scale } = uniformFin(mL);
  const result = solveFin1D(fin, { nodes: N + 1 });
  test('base heat rate equals the tabulated Q_h', () => {
    // The table gives 12 significant digits: 1e-11 relative covers its rounding (5e-13) with margin.
    expect(Math.abs(result.heatRate / scale / Qh - 1)).toBeLessThan(1e-11);
  });
  test('heat rate and every nodal temperature equal the exact discrete solution to round-off', () => {
    const exact = exactDiscrete(mL, N);
    expect(Math.abs(result.heatRate / scale / exact.Qh - 1)).toBeLessThan(1e-12);
    for (let i = 0; i <= N; i++) {
      expect(Math.abs((result.theta[i] as number) / THETA_BASE - (exact.theta[i] as number))).toBeLessThan(1e-12);
    }
  });
});

describe('large grids: the row-sum solver keeps the exact discrete heat rate', () => {
  // At N = 1e5 the convective conductance G_i is 1e-10 of the diagonal: a float diagonal keeps it to
  // ~1e-6 only. The default row-sum solver carries G_i exactly and stays at round-off (1e-10 here:
  // ~eps K/Y from storing θ, where K/Y ~ N/(mL)); the plain Thomas sweep (measured 1.4e-6) does not.
  const N = 100_000;
  const mL = 1;
  const { fin, scale } = uniformFin(mL);
  const exact = exactDiscrete(mL, N).Qh;
  test('default solver within 1e-10, plain Thomas off by more than 1e-8', () => {
    expect(Math.abs(solveFin1D(fin, { nodes: N + 1 }).heatRate / scale / exact - 1)).toBeLessThan(1e-10);
    expect(Math.abs(solveFin1D(fin, { nodes: N + 1, solver: thomas }).heatRate / scale / exact - 1)).toBeGreaterThan(1e-8);
  });
});
