import { describe, expect, it } from 'vitest';
import type { Case, Profile, TipCondition } from '../../src/case/types.js';
import { UsageError } from '../../src/errors.js';
import { solveFin2D } from '../../src/fd/two-d/linear-solve.js';
import { fin2dUnsupported } from '../../src/fd/two-d/problem.js';
import { fieldViews } from '../../src/fd/two-d/field-views.js';
import { studyFin2D } from '../../src/fd/two-d/linear-study.js';
import { BASE, THETA_B, TEMPERATURES_2D } from './cases.js';
import { finCase } from '../support/fin-case.js';

// Check case R2 (invented inputs; Incropera et al. 2007, Table 3.4, from memory): unit-width aluminium plate, k = 237, h = 40, t = 1 mm, L = 25 mm.
// Computed reference values (scipy/mpmath script uniform_fin.py) of the 1-D closed forms of Incropera,
// DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, Table 3.4 [from memory]; per unit
// theta_b: q/theta_b in W/(m K). Bi = h (t/2)/k = 8.4e-5, so the 2-D heat rate lies below the 1-D one by
// about Bi/6 to Bi/3 (small-Bi expansion of the exact 2-D series): 1.4e-5 to 2.8e-5.
const R2 = { k: 237, h: 40, t: 0.001, L: 0.025, thetaB: 50 };
const r2Case = (tip: TipCondition, contactResistance = 0) =>
  finCase({
    profile: { kind: 'rectangular', length: R2.L, thickness: R2.t, width: 1 },
    k: R2.k,
    h: { kind: 'uniform', h: R2.h },
    tip: tip,
    contactResistance: contactResistance,
    ...TEMPERATURES_2D,
  });

describe('tip and base conditions on a thin plate (case R2), against the exact 1-D fin', () => {
  it.each([
    ['convective', { kind: 'convective', h: null }, 95.13901802 / 50],
    ['adiabatic', { kind: 'adiabatic' }, 93.51441335 / 50],
    ['infinite', { kind: 'infinite' }, 217.7154106 / 50],
  ] as [string, TipCondition, number][])('%s tip', (_, tip, qPerK) => {
    const s = studyFin2D(r2Case(tip));
    const dev = s.extrapolatedHeatRate_W / (qPerK * THETA_B) - 1;
    const bi = (R2.h * R2.t) / 2 / R2.k;
    // Below the 1-D value by 0 to Bi/2 (the 2-D drop is Bi/6 to Bi/3; extrapolation error ~1e-8 here).
    expect(dev).toBeLessThan(0);
    expect(-dev).toBeLessThan(bi / 2);
    expect(s.energyBalance).toBeLessThan(1e-9);
  });

  it('fixed tip temperature (tip excess = theta_b / 4)', () => {
    // Table 3.4 case C with theta_L = theta_b / 4: q = 392.4400800 W/m at theta_b = 50 K.
    const tip: TipCondition = { kind: 'temperature', T_degC: 25 + THETA_B / 4 };
    const s = studyFin2D(r2Case(tip));
    const dev = s.extrapolatedHeatRate_W / ((392.44008 / 50) * THETA_B) - 1;
    // Conduction to the cold tip dominates; the thickness effect is again of order Bi = 8e-5.
    expect(Math.abs(dev)).toBeLessThan(1e-4);
    // The heat leaving through the fixed tip is part of the surface heat rate.
    expect(s.energyBalance).toBeLessThan(1e-9);
    expect(s.finest.tipTemperature_degC).toBeCloseTo(25 + THETA_B / 4, 12);
  });

  it('contact resistance at the base: in series with the fin in the thin limit', () => {
    // A contact resistance R'' over the base area A_b adds R''/A_b in series with the fin's resistance
    // theta_b/q_fin (series thermal resistances, Incropera et al. 2007, section 3.1 and the contact-resistance
    // factor of section 3.6 [from memory]). Exact in 1-D; in 2-D the base flux is uniform to O(Bi).
    const rc = 2e-4;
    const s = studyFin2D(r2Case({ kind: 'adiabatic' }, rc));
    const finResistance = 1 / (93.51441335 / 50);
    const expected = THETA_B / (rc / (R2.t * 1) + finResistance);
    expect(Math.abs(s.extrapolatedHeatRate_W / expected - 1)).toBeLessThan(1e-4);
    expect(s.energyBalance).toBeLessThan(1e-9);
    // The fin's base is then below the base temperature.
    expect(s.finest.centreline.T_degC[0]).toBeLessThan(BASE);
  });

  it('h falling linearly from h_b at the base to 0 at the tip (thin plate, adiabatic tip)', () => {
    // NU1 (h falling linearly to the tip; separation of variables, nonuniform_h.py), n = 1, mL = 1 (m^2 = h_b P/(kA)): q/(k A m theta_b) = 0.4555445261.
    // Computed reference value (scipy script nonuniform_h.py), closed form by the Bessel form of
    // y'' = c^2 x^n y (variable-h fins: Han & Lefkowitz 1960 [from memory]). Bi = 1e-4 at the base.
    const b = 1e-4;
    const k = 200;
    const hb = (1e-4 * k) / b;
    const m = Math.sqrt(hb / (k * b));
    const L = 1 / m;
    const c = finCase({
      profile: { kind: 'rectangular', length: L, thickness: 2 * b, width: 1 },
      k: k,
      h: { kind: 'linear', base: hb, tip: 0 },
      tip: { kind: 'adiabatic' },
      ...TEMPERATURES_2D,
    });
    const s = studyFin2D(c);
    const exact = 0.4555445261 * k * (2 * b) * m * THETA_B;
    // 1e-4: the 2-D drop of order Bi = 1e-4 times a fraction; extrapolation error ~1e-8.
    expect(Math.abs(s.extrapolatedHeatRate_W / exact - 1)).toBeLessThan(1e-4);
    expect(s.energyBalance).toBeLessThan(1e-9);
  });
});

describe('symmetry', () => {
  it('a plate held at the base temperature at both ends is mirror-symmetric about its middle', () => {
    // Physical symmetry of the problem; on a uniform grid the scheme must keep it to round-off.
    const c = finCase({
      profile: { kind: 'rectangular', length: 0.01, thickness: 0.004, width: 1 },
      k: 20,
      h: { kind: 'uniform', h: 2000 },
      tip: { kind: 'temperature', T_degC: BASE },
      ...TEMPERATURES_2D,
    });
    const r = solveFin2D(c, { nx: 41, ny: 9, baseGrading: 1, faceGrading: 1 });
    const { nodesX: nx, nodesY: ny } = r.grid;
    for (let i = 0; i < nx; i++) {
      for (let j = 0; j < ny; j++) {
        // Round-off of a direct solve with condition number ~1e4.
        expect(Math.abs((r.field[i * ny + j] as number) - (r.field[(nx - 1 - i) * ny + j] as number))).toBeLessThan(1e-11 * THETA_B);
      }
    }
    // Half the heat enters at the base, half through the (equally hot) tip: the faces lose twice the
    // base's heat rate (the tip's "leaving" heat is minus the base's).
    expect(r.faceHeatRate_W / r.heatRate_W).toBeCloseTo(2, 10);
    expect(r.tipHeatRate_W / r.heatRate_W).toBeCloseTo(-1, 10);
  });
});

const profiles: [string, Profile][] = [
  ['rectangular', { kind: 'rectangular', length: 0.01, thickness: 0.004, width: 0.1 }],
  ['trapezoidal', { kind: 'trapezoidal', length: 0.01, baseThickness: 0.006, tipThickness: 0.002, width: 0.1 }],
  ['triangular', { kind: 'triangular', length: 0.01, baseThickness: 0.006, width: 0.1 }],
  ['parabolic-concave', { kind: 'parabolic-concave', length: 0.01, baseThickness: 0.006, width: 0.1 }],
  ['parabolic-convex', { kind: 'parabolic-convex', length: 0.01, baseThickness: 0.006, width: 0.1 }],
  ['pin', { kind: 'pin', length: 0.01, diameter: 0.004 }],
  ['conical-pin', { kind: 'conical-pin', length: 0.01, baseDiameter: 0.006, tipDiameter: 0 }],
  ['annular', { kind: 'annular', innerRadius: 0.01, outerRadius: 0.02, thickness: 0.004 }],
  ['tabulated', { kind: 'tabulated', shape: 'straight', x: Float64Array.of(0, 0.004, 0.01), size: Float64Array.of(0.006, 0.003, 0.002), width: 0.1 }],
];

describe.each(profiles)('maximum principle and energy balance: %s', (_, profile) => {
  it.each([
    ['adiabatic', { kind: 'adiabatic' }],
    ['convective', { kind: 'convective', h: null }],
  ] as [string, TipCondition][])('%s tip, Bi ~ 1 at the base', (_, tip) => {
    // Strong cooling (h b/k ~ 1) makes the field truly 2-D. With the base at theta_b and the fluid at 0,
    // the exact field lies in [0, theta_b] and falls along the mid-plane and toward the face (heat flows
    // out). On sloped faces the matrix is not an M-matrix (slanted cells give a few small positive
    // couplings, up to ~1 % of the largest), so the discrete maximum principle is not guaranteed a priori:
    // this checks that it holds on these grids. Tolerances: round-off.
    const c = finCase({ profile: profile, k: 20, h: { kind: 'uniform', h: 10000 }, tip: tip, ...TEMPERATURES_2D });
    const r = solveFin2D(c, { nx: 41, ny: 13 });
    for (const v of r.field) {
      expect(v).toBeGreaterThanOrEqual(0);
      expect(v).toBeLessThanOrEqual(THETA_B * (1 + 1e-14));
    }
    const centre = r.centreline.T_degC;
    const face = r.surface.T_degC;
    for (let i = 1; i < centre.length; i++) expect(centre[i] as number).toBeLessThanOrEqual((centre[i - 1] as number) + 1e-12);
    for (let i = 1; i < centre.length; i++) expect(face[i] as number).toBeLessThanOrEqual((centre[i] as number) + 1e-12);
    expect(r.energyBalance).toBeLessThan(1e-9);
    expect(r.efficiency as number).toBeGreaterThan(0);
    expect(r.efficiency as number).toBeLessThan(1);
  });
});

describe('the 2-D field for images', () => {
  it('is exposed as ndarray views sharing the result arrays', () => {
    const c = finCase({
      profile: { kind: 'trapezoidal', length: 0.02, baseThickness: 0.004, tipThickness: 0.002, width: 0.1 },
      k: 50,
      h: { kind: 'uniform', h: 500 },
      tip: { kind: 'adiabatic' },
      ...TEMPERATURES_2D,
    });
    const r = solveFin2D(c, { nx: 21, ny: 7 });
    const v = fieldViews(r);
    expect(v.theta.shape).toEqual([21, 7]);
    expect(v.theta.data).toBe(r.field); // no copy
    // Node (i, j) = (20, 6): the tip corner on the face, at x = L, y = t_tip/2.
    expect(v.x.get(20, 6)).toBeCloseTo(0.02, 15);
    expect(v.y.get(20, 6)).toBeCloseTo(0.001, 15);
    expect(v.theta.get(20, 0) + 25).toBeCloseTo(r.tipTemperature_degC, 12);
    expect(v.theta.get(0, 3)).toBeCloseTo(THETA_B, 12); // base: fixed temperature
  });
});

describe('what the 2-D model does not solve', () => {
  const base = finCase({
    profile: { kind: 'rectangular', length: 0.02, thickness: 0.002, width: 0.05 },
    k: 200,
    h: { kind: 'uniform', h: 50 },
    tip: { kind: 'adiabatic' },
    ...TEMPERATURES_2D,
  });
  it.each([
    [
      'temperature-dependent k',
      { ...base, material: { name: 'custom', k: { kind: 'table', T_degC: Float64Array.of(20, 200), k: Float64Array.of(200, 190) }, source: 'test' } },
    ],
    ['power-law h', { ...base, convection: { ...base.convection, h: { kind: 'power', base: 10, exponent: 0.25 } } }],
    ['radiation', { ...base, convection: { ...base.convection, emissivity: 0.9 } }],
    [
      'infinite tip on a tapered fin',
      {
        ...base,
        fin: { ...base.fin, profile: { kind: 'triangular', length: 0.02, baseThickness: 0.002, width: 0.05 } },
        convection: { ...base.convection, tip: { kind: 'infinite' } },
      },
    ],
  ] as [string, Case][])('%s: says why, and solveFin2D refuses with a usage error', (_, c) => {
    expect(fin2dUnsupported(c)).toMatch(/2-D|infinite/);
    expect(() => solveFin2D(c, { nx: 11, ny: 5 })).toThrow(UsageError);
  });

  it('a supported case reports the solver that ran', () => {
    expect(fin2dUnsupported(base)).toBeNull();
    expect(solveFin2D(base, { nx: 101, ny: 9 }).solver).toBe('banded-cholesky');
    expect(solveFin2D(base, { nx: 101, ny: 9, method: 'mg-pcg' }).solver).toBe('mg-pcg');
  });
});

describe('grid requests', () => {
  const c = finCase({
    profile: { kind: 'rectangular', length: 0.02, thickness: 0.002, width: 0.05 },
    k: 200,
    h: { kind: 'uniform', h: 50 },
    tip: { kind: 'adiabatic' },
    ...TEMPERATURES_2D,
  });
  it.each([
    [1, 5],
    [10, 1.5],
    [3000, 1000],
  ])('%s x %s nodes is refused as a usage error', (nx, ny) => {
    expect(() => solveFin2D(c, { nx, ny })).toThrow(UsageError);
  });

  it('the smallest grid (2 x 2 nodes) still conserves heat', () => {
    const r = solveFin2D(c, { nx: 2, ny: 2 });
    expect(r.energyBalance).toBeLessThan(1e-12);
    expect(r.heatRate_W).toBeGreaterThan(0);
  });
});
