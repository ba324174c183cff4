/**
 * fd-1d against the closed-form efficiencies of straight fins of variable profile (adiabatic tip,
 * per unit width: insulated edges, P = 2w, m^2 = 2h/(k t_b), η referred to 2wL).
 *
 * Values: computed reference values (mpmath script profiles.py, each checked against an independent
 * finite-volume solution) of the closed forms of Gardner, K. A., 1945,
 * "Efficiency of extended surface", Trans. ASME 67, 621-631 [from memory], as tabulated in Incropera
 * et al., Fundamentals of Heat and Mass Transfer, Table 3.5 [from memory]:
 *   rectangular tanh(mL)/(mL); triangular I1(2mL)/(mL I0(2mL)) (also Shabany, Heat Transfer: Thermal
 *   Management of Electronics, CRC 2009, eq. 7.52); concave parabolic
 *   2/(sqrt(4(mL)^2 + 1) + 1); convex parabolic I_{2/3}(4mL/3)/(mL I_{-1/3}(4mL/3)); trapezoidal
 *   (closed form with I0, I1, K0, K1; Kraus, Aziz & Welty 2001, Extended Surface Heat Transfer [from memory]).
 */
import { describe, expect, test } from 'vitest';
import type { Profile } from '../../src/case/types.js';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { expectEfficiency } from './support/efficiency-check.js';
import { linearFinCase } from '../support/fin-case.js';

const L = 0.05;
const BASE_THICKNESS = 0.004;
const WIDTH = 0.1;
const K = 200;
const M_L = [0.25, 0.5, 1, 1.5, 2, 3];

/** h giving the fin parameter mL with m^2 = 2h/(k t_b). */
const hFor = (mL: number): number => (mL * mL * K * BASE_THICKNESS) / (2 * L * L);

type StraightKind = 'rectangular' | 'triangular' | 'parabolic-concave' | 'parabolic-convex';

function profileOf(kind: StraightKind): Profile {
  switch (kind) {
    case 'rectangular':
      return { kind, length: L, thickness: BASE_THICKNESS, width: WIDTH };
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return { kind, length: L, baseThickness: BASE_THICKNESS, width: WIDTH };
  }
}

// Straight-fin η, computed reference values (profiles.py; Gardner 1945 closed forms), columns mL = 0.25, 0.5, 1, 1.5, 2, 3.
const TABLE: Record<StraightKind, number[]> = {
  rectangular: [0.9796746496, 0.9242343145, 0.761594156, 0.6034321691, 0.48201379, 0.3316849179],
  triangular: [0.9699984503, 0.8927799318, 0.697774658, 0.539990196, 0.4317613055, 0.3041197681],
  'parabolic-concave': [0.94427191, 0.8284271247, 0.6180339887, 0.4805061467, 0.3903882032, 0.2823756961],
  'parabolic-convex': [0.9757571602, 0.9110890522, 0.7325766848, 0.5724748432, 0.4563660411, 0.3171423177],
};

const finFor = (profile: Profile, mL: number) =>
  linearFinCase({ profile, edges: 'insulated', k: K, h: { kind: 'uniform', h: hFor(mL) }, tip: { kind: 'adiabatic' }, thetaBase: 50 });

const ROWS = (Object.keys(TABLE) as StraightKind[]).flatMap((kind) => M_L.map((mL, j) => ({ kind, mL, eta: (TABLE[kind] as number[])[j] as number })));

describe.each(ROWS)('$kind, mL = $mL (Gardner 1945 closed form; profiles.py)', ({ kind, mL, eta }) => {
  test('efficiency', () => expectEfficiency(studyFin1D(finFor(profileOf(kind), mL)), eta));
});

// Trapezoidal η (profiles.py; closed form as in Kraus, Aziz & Welty 2001), adiabatic tip, τ = t_tip / t_b,
// columns mL = 0.5, 1, 2.
const TRAPEZOID: { tau: number; etas: [number, number, number] }[] = [
  { tau: 0.25, etas: [0.905795408, 0.721468559, 0.4469203561] },
  { tau: 0.5, etas: [0.9136914315, 0.737799079, 0.4598840083] },
  { tau: 0.75, etas: [0.9195561416, 0.7507612219, 0.4714667011] },
];
const TRAPEZOID_ROWS = TRAPEZOID.flatMap(({ tau, etas }) => [0.5, 1, 2].map((mL, j) => ({ tau, mL, eta: etas[j] as number })));

describe.each(TRAPEZOID_ROWS)('trapezoidal τ = $tau, mL = $mL (Kraus, Aziz & Welty 2001; profiles.py)', ({ tau, mL, eta }) => {
  test('efficiency', () => {
    const profile: Profile = { kind: 'trapezoidal', length: L, baseThickness: BASE_THICKNESS, tipThickness: tau * BASE_THICKNESS, width: WIDTH };
    expectEfficiency(studyFin1D(finFor(profile, mL)), eta);
  });
});

/** Least-squares order of the efficiency error over 100..800 cells. */
function fittedOrder(profile: Profile, mL: number, eta: number, grading?: 'uniform'): number {
  const cells = [100, 200, 400, 800];
  const errors = cells.map(
    (n) => solveFin1D(finFor(profile, mL), { nodes: n + 1, ...(grading ? { grading: { kind: grading } } : {}) }).efficiency / eta - 1,
  );
  return fitObservedOrder(
    cells.map((n) => L / n),
    errors,
  ).order;
}

describe('observed order of the heat rate (default grading)', () => {
  // Order 2 +- 0.1 from four grids; mL = 0.25 is the hardest case for the concave parabola (see below).
  test.each([
    ['rectangular', 1],
    ['triangular', 1],
    ['triangular', 0.25],
    ['parabolic-concave', 0.25],
    ['parabolic-concave', 2],
    ['parabolic-convex', 0.25],
    ['parabolic-convex', 1],
  ] as const)('%s, mL = %d', (kind, mL) => {
    const eta = (TABLE[kind] as number[])[M_L.indexOf(mL)] as number;
    expect(Math.abs(fittedOrder(profileOf(kind), mL, eta) - 2)).toBeLessThan(0.1);
  });
  test('trapezoidal τ = 0.5, mL = 1', () => {
    const profile: Profile = { kind: 'trapezoidal', length: L, baseThickness: BASE_THICKNESS, tipThickness: BASE_THICKNESS / 2, width: WIDTH };
    expect(Math.abs(fittedOrder(profile, 1, 0.737799079) - 2)).toBeLessThan(0.1);
  });
});

describe('why the concave parabola is graded', () => {
  // Near the sharp tip of t ~ (1 - x/L)^2, θ ~ (L - x)^α with α(α + 1) = (mL)^2 (Frobenius exponent of
  // (s^2 θ')' = (mL)^2 θ); the tip cells then contribute an error ~ Δx^(1 + 2α). At mL = 0.25,
  // α = 0.0590 and a uniform grid converges at order 1 + 2α = 1.118: this test pins that behaviour
  // (±0.05: the fitted slope of a single-power error), which the default power-law grading removes.
  test('uniform grid: order 1 + 2α at mL = 0.25', () => {
    const mL = 0.25;
    const alpha = (-1 + Math.sqrt(1 + 4 * mL * mL)) / 2;
    const order = fittedOrder(profileOf('parabolic-concave'), mL, (TABLE['parabolic-concave'] as number[])[0] as number, 'uniform');
    expect(Math.abs(order - (1 + 2 * alpha))).toBeLessThan(0.05);
  });
});
