/**
 * fd-1d against the closed forms of the annular fin of uniform thickness (x = r - r1, A = 2πrt,
 * P = 4πr, m^2 = 2h/(kt)).
 *
 * Values: computed reference values (mpmath script profiles.py, checked against scipy solve_bvp to
 * 1e-15) of these closed forms:
 * - adiabatic tip at r2c, η = 2r1/(m(r2c^2 - r1^2)) [K1(mr1)I1(mr2c) - I1(mr1)K1(mr2c)] /
 *   [I0(mr1)K1(mr2c) + K0(mr1)I1(mr2c)]: Gardner, K. A., 1945, Trans. ASME 67, 621-631 [from memory];
 *   Incropera et al. 2007, Table 3.5 [from memory]; Shabany, Heat Transfer: Thermal Management of
 *   Electronics, CRC 2009, eq. 7.53 (with r2c = r2 + t/2);
 * - convective tip on the rim (−k θ'(r2) = h θ(r2)): the exact I0/K0 solution derived in profiles.py
 *   (`annular_convtip`; same Bessel form as Gardner 1945), η referred to 2π(r2^2 - r1^2) + 2π r2 t.
 */
import { describe, expect, test } from 'vitest';
import { fitObservedOrder } from '../../src/fd/study/refinement.js';
import { solveFin1D, studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { expectEfficiency } from './support/efficiency-check.js';
import { linearFinCase } from '../support/fin-case.js';

const INNER_RADIUS = 0.01;
const THICKNESS = 0.001;
const K = 200;

// Annular η, adiabatic tip at r2c (profiles.py; Gardner 1945): rows r2c/r1, columns m(r2c - r1) = 0.25, 0.5, 1, 2, 3.
const COLUMNS = [0.25, 0.5, 1, 2, 3];
const TABLE: { ratio: number; etas: number[] }[] = [
  { ratio: 1.5, etas: [0.9751575958, 0.9085273102, 0.722130839, 0.4302401816, 0.2865969404] },
  { ratio: 2, etas: [0.9713725325, 0.8956359128, 0.6915397721, 0.3933213206, 0.2555327039] },
  { ratio: 3, etas: [0.965259954, 0.8753268674, 0.6463936181, 0.3435053457, 0.215116581] },
  { ratio: 5, etas: [0.9564029757, 0.8469881448, 0.5890918161, 0.2875671875, 0.1719540524] },
];

function annularCase(ratio: number, mLc: number) {
  const outer = ratio * INNER_RADIUS;
  const m = mLc / (outer - INNER_RADIUS);
  const h = (m * m * K * THICKNESS) / 2;
  return linearFinCase({
    edges: 'cooled',
    profile: { kind: 'annular', innerRadius: INNER_RADIUS, outerRadius: outer, thickness: THICKNESS },
    k: K,
    h: { kind: 'uniform', h },
    tip: { kind: 'adiabatic' },
    thetaBase: 70,
  });
}

const ROWS = TABLE.flatMap(({ ratio, etas }) => COLUMNS.map((mLc, j) => ({ ratio, mLc, eta: etas[j] as number })));

describe.each(ROWS)('annular r2c/r1 = $ratio, m(r2c - r1) = $mLc (Gardner 1945; profiles.py)', ({ ratio, mLc, eta }) => {
  test('efficiency', () => expectEfficiency(studyFin1D(annularCase(ratio, mLc)), eta));
});

// Annular fin with a convective rim, invented inputs (h, k, t, r1, r2) -> exact q/θ_b (W/K) and η (profiles.py).
const CONVECTIVE_TIP = [
  { h: 50, k: 200, t: 0.001, r1: 0.01, r2: 0.025, qPerK: 0.1624477838, eta: 0.9401588283 },
  { h: 40, k: 180, t: 0.002, r1: 0.0125, r2: 0.04, qPerK: 0.3457422159, eta: 0.9028151387 },
  { h: 150, k: 400, t: 0.0005, r1: 0.005, r2: 0.015, qPerK: 0.1792628383, eta: 0.9166447175 },
];

describe.each(CONVECTIVE_TIP)('annular, convective rim, h = $h, r2 = $r2 (exact I0/K0 solution; profiles.py)', (row) => {
  const thetaBase = 50;
  const run = studyFin1D(
    linearFinCase({
      edges: 'cooled',
      profile: { kind: 'annular', innerRadius: row.r1, outerRadius: row.r2, thickness: row.t },
      k: row.k,
      h: { kind: 'uniform', h: row.h },
      tip: { kind: 'convective', h: null },
      thetaBase,
    }),
  );
  test('observed order 2 from four grids', () => {
    const cells = [50, 100, 200, 400];
    const fin = linearFinCase({
      edges: 'cooled',
      profile: { kind: 'annular', innerRadius: row.r1, outerRadius: row.r2, thickness: row.t },
      k: row.k,
      h: { kind: 'uniform', h: row.h },
      tip: { kind: 'convective', h: null },
      thetaBase,
    });
    const errors = cells.map((n) => solveFin1D(fin, { nodes: n + 1 }).heatRate / (row.qPerK * thetaBase) - 1);
    // Formal order 2; ±0.1 for a fitted slope in the asymptotic range.
    expect(
      Math.abs(
        fitObservedOrder(
          cells.map((n) => (row.r2 - row.r1) / n),
          errors,
        ).order - 2,
      ),
    ).toBeLessThan(0.1);
  });
  test('heat rate and efficiency', () => {
    // 1e-6: default-grid accuracy target; the extrapolated value within 3e-9 (10-digit table values).
    expect(Math.abs(run.result.heatRate / (row.qPerK * thetaBase) - 1)).toBeLessThan(1e-6);
    expect(Math.abs(run.study.extrapolated / (row.qPerK * thetaBase) - 1)).toBeLessThan(3e-9);
    expectEfficiency(run, row.eta);
  });
});

test('annular: observed order 2 from four grids (r2c/r1 = 3, m(r2c - r1) = 1)', () => {
  const cells = [50, 100, 200, 400];
  const fin = annularCase(3, 1);
  const errors = cells.map((n) => solveFin1D(fin, { nodes: n + 1 }).efficiency / 0.6463936181 - 1);
  // Formal order 2 of the scheme; ±0.1 for a fitted slope in the asymptotic range.
  expect(
    Math.abs(
      fitObservedOrder(
        cells.map((n) => 0.02 / n),
        errors,
      ).order - 2,
    ),
  ).toBeLessThan(0.1);
});
