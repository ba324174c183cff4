import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import { finHFallingToTip, finHRisingFromBase, type PowerLawHInput } from '../../src/analytic/nonuniform-h.js';
import { uniformFin } from '../../src/analytic/uniform-fin.js';
import { straightConvexParabolicFin } from '../../src/analytic/straight-profiles.js';
import { expectRelClose, tenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

/** A plate fin per metre of width (P = 2, A = t) with hRef chosen to give the requested mL. */
function inputFor(n: number, mL: number): PowerLawHInput {
  const k = 180;
  const A = 0.002;
  const P = 2;
  const L = 0.04;
  const m = mL / L;
  return { hRef: (m * m * k * A) / P, n, k, P, A, L, thetaBase: 50 };
}

// NU1 (h = h_b (1 - x/L)^n) and NU2 (h = h_t (x/L)^n), adiabatic tip: computed reference values
// (mpmath, script nonuniform_h.py, checked with scipy solve_bvp to 1e-10), closed forms derived there
// by separation of variables (Bessel form of y'' = c^2 x^n y); earlier variable-h fin analyses: Han & Lefkowitz
// 1960, ASME paper 60-WA-130 (from memory). Last column: the uniform-h shortcut with
// the mean hbar = h_ref/(n+1), tanh(mbar L)/(mbar L). Tolerance `tenDigits`: 10 digits printed.
const rows: [number, number, number, number, number, number, number][] = [
  // n, mL, NU1 Q, NU1 eta, NU2 Q, NU2 eta, shortcut eta
  [1, 0.5, 0.2439392901, 0.9757571602, 0.2344468622, 0.937787449, 0.9603163417],
  [1, 1, 0.4555445261, 0.9110890522, 0.3963315917, 0.7926631834, 0.8610571716],
  [1, 2, 0.7325766848, 0.7325766848, 0.5018426877, 0.5018426877, 0.6281834549],
  [2, 1, 0.3183662467, 0.9550987402, 0.274911956, 0.8247358679, 0.90194274],
  [2, 2, 0.5643600411, 0.8465400616, 0.3642646963, 0.5463970445, 0.7095391947],
  [0.5, 1, 0.5744190677, 0.8616286015, 0.5166714929, 0.7750072393, 0.8244474437],
  // further rows of the same computation (full output of nonuniform_h.py, out/nonuniform_h.txt)
  [2, 0.5, 0.1647121441, 0.9882728644, 0.1582089898, 0.9492539391, 0.9731179367],
  [0.5, 0.5, 0.3201214382, 0.9603643147, 0.3102593726, 0.9307781178, 0.947914102],
  [0.5, 2, 0.8425063499, 0.6318797624, 0.6454889158, 0.4841166869, 0.5673548913],
];

describe.each(rows)('n = %d, mL = %d', (n, mL, q1, eta1, q2, eta2, etaShortcut) => {
  const input = inputFor(n, mL);
  it('NU1: h falling to zero at the tip', () => {
    const r = finHFallingToTip(input);
    expectRelClose(r.Q, q1, tenDigits, 'NU1 Q');
    expectRelClose(r.efficiency, eta1, tenDigits, 'NU1 eta');
    expectRelClose(r.heatRate, q1 * input.k * input.A * r.m * input.thetaBase, tenDigits, 'NU1 q');
  });
  it('NU2: h rising from zero at the base', () => {
    const r = finHRisingFromBase(input);
    expectRelClose(r.Q, q2, tenDigits, 'NU2 Q');
    expectRelClose(r.efficiency, eta2, tenDigits, 'NU2 eta');
  });
  it('the uniform mean-h shortcut of the table', () => {
    const meanH = input.hRef / (n + 1);
    const shortcut = uniformFin({ h: meanH, k: input.k, P: input.P, A: input.A, L: input.L, thetaBase: input.thetaBase, tip: { kind: 'adiabatic' } });
    expectRelClose(shortcut.efficiency ?? NaN, etaShortcut, tenDigits, 'shortcut');
  });
});

describe('consistency', () => {
  // n = 0 is uniform h for both: q = M tanh(mL) (nonuniform_h.py prints this); Gamma and the series give
  // ~1e-15, allow 1e-13.
  it.each([0.1, 1, 5, 24, 26, 300])('n = 0 reproduces tanh(mL) at mL = %d', (mL) => {
    const input = inputFor(0, mL);
    expectRelClose(finHFallingToTip(input).Q, Math.tanh(mL), 1e-13, 'NU1');
    expectRelClose(finHRisingFromBase(input).Q, Math.tanh(mL), 1e-13, 'NU2');
  });
  // NU1 with n = 1 has nu = 1/3 and z = 2mL/3: its eta at mL equals the convex-parabolic straight fin
  // (Gardner 1945, from memory) at mL/2 -- the NU1 values above (nonuniform_h.py) repeat the convex-parabola
  // values computed by profiles.py (0.9757571602 at 0.25, 0.9110890522 at 0.5, 0.7325766848 at 1).
  // Same ratio function: 1e-14.
  it.each([0.5, 1, 2, 7])('NU1 (n = 1) at mL equals the convex parabola at mL/2, mL = %d', (mL) => {
    const nu1 = finHFallingToTip(inputFor(1, mL)).efficiency;
    const m = mL / 2 / 0.02;
    const convex = straightConvexParabolicFin({ h: (m * m * 200 * 0.002) / 2, k: 200, length: 0.02, baseThickness: 0.002, thetaBase: 1 });
    expectRelClose(nu1, convex.efficiency, 1e-14, 'NU1 vs convex');
  });
  it('finite at mL = 50, 200, 1000 with Q approaching the local infinite-fin value', () => {
    for (const mL of [50, 200, 1000]) {
      for (const n of [0.5, 1, 2]) {
        const r1 = finHFallingToTip(inputFor(n, mL));
        const r2 = finHRisingFromBase(inputFor(n, mL));
        expect(Number.isFinite(r1.heatRate) && Number.isFinite(r2.heatRate)).toBe(true);
        // NU1: the base sees h_b, so Q -> 1 (like an infinite uniform fin) with error O(1/(nu mL)).
        expect(Math.abs(r1.Q - 1)).toBeLessThanOrEqual((n + 2) / mL);
        expect(r2.Q).toBeGreaterThan(0);
        expect(r2.Q).toBeLessThan(r1.Q);
      }
    }
  });
  it('rejects n <= -1', () => {
    expect(() => finHFallingToTip(inputFor(-1, 1))).toThrow(RangeError);
  });
});
