import { describe, expect, it } from 'vitest';
import { uniformFin, uniformFinExcess, uniformFinExcessProfile, type UniformFinInput, type UniformTip } from '../../src/analytic/uniform-fin.js';
import { expectRelClose, tenDigits } from './close.js';

// Check cases R1, R2, P1, P2 (invented inputs) with computed reference values (mpmath, checked with
// scipy solve_bvp; scripts uniform_fin.py / make_tables2.py), closed forms of Incropera, DeWitt, Bergman &
// Lavine 2007, Fundamentals of Heat and Mass Transfer, Table 3.4 (table number from memory); efficiency after
// Harper & Brown 1922 and effectiveness after Gardner 1945 (from memory).
// Tolerance `tenDigits` (1e-9 relative): the values are printed to 10 significant digits.
const D = 0.005;
const geometry = {
  R1: { h: 40, k: 180, P: 2 * (0.05 + 0.002), A: 0.05 * 0.002, L: 0.03, thetaBase: 60 },
  R2: { h: 40, k: 237, P: 2, A: 0.001, L: 0.025, thetaBase: 50 },
  P1: { h: 100, k: 398, P: Math.PI * D, A: (Math.PI * D * D) / 4, L: 0.05, thetaBase: 75 },
  P2: { h: 25, k: 15, P: Math.PI * D, A: (Math.PI * D * D) / 4, L: 0.1, thetaBase: 80 },
};
type CaseName = keyof typeof geometry;

interface Row {
  name: CaseName;
  m: number;
  tip: UniformTip;
  q: number;
  eta: number | null;
  eps: number;
  thetaL: number;
  thetaHalf: number;
}
const rows: Row[] = [
  {
    name: 'R1',
    m: 15.202339,
    tip: { kind: 'convective' },
    q: 7.203722261,
    eta: 0.9321586777,
    eps: 30.01550942,
    thetaL: 53.92214373,
    thetaHalf: 55.51150752,
  },
  {
    name: 'R1',
    m: 15.202339,
    tip: { kind: 'adiabatic' },
    q: 7.008672878,
    eta: 0.9359872967,
    eps: 29.20280366,
    thetaL: 54.25861334,
    thetaHalf: 55.67546103,
  },
  { name: 'R1', m: 15.202339, tip: { kind: 'temperature', thetaTip: 15 }, q: 29.76665185, eta: null, eps: 124.027716, thetaL: 15, thetaHalf: 36.5456875 },
  { name: 'R1', m: 15.202339, tip: { kind: 'infinite' }, q: 16.41852612, eta: null, eps: 68.41052551, thetaL: 0, thetaHalf: 47.7657797 },
  {
    name: 'R2',
    m: 18.37260849,
    tip: { kind: 'convective' },
    q: 95.13901802,
    eta: 0.9327354708,
    eps: 47.56950901,
    thetaL: 44.97526494,
    thetaHalf: 46.26226446,
  },
  {
    name: 'R2',
    m: 18.37260849,
    tip: { kind: 'adiabatic' },
    q: 93.51441335,
    eta: 0.9351441335,
    eps: 46.75720668,
    thetaL: 45.15272635,
    thetaHalf: 46.34870556,
  },
  {
    name: 'R2',
    m: 18.37260849,
    tip: { kind: 'temperature', thetaTip: 12.5 },
    q: 392.44008,
    eta: null,
    eps: 196.22004,
    thetaL: 12.5,
    thetaHalf: 30.44362688,
  },
  { name: 'R2', m: 18.37260849, tip: { kind: 'infinite' }, q: 217.7154106, eta: null, eps: 108.8577053, thetaL: 0, thetaHalf: 39.74028463 },
  {
    name: 'P1',
    m: 14.1776241,
    tip: { kind: 'convective' },
    q: 5.160099582,
    eta: 0.8546397193,
    eps: 35.04022849,
    thetaL: 58.79597767,
    thetaHalf: 62.90512197,
  },
  {
    name: 'P1',
    m: 14.1776241,
    tip: { kind: 'adiabatic' },
    q: 5.068618059,
    eta: 0.8604753266,
    eps: 34.41901307,
    thetaL: 59.43156169,
    thetaHalf: 63.20394628,
  },
  {
    name: 'P1',
    m: 14.1776241,
    tip: { kind: 'temperature', thetaTip: 18.75 },
    q: 10.92403778,
    eta: null,
    eps: 74.18089009,
    thetaL: 18.75,
    thetaHalf: 44.07722331,
  },
  { name: 'P1', m: 14.1776241, tip: { kind: 'infinite' }, q: 8.309553397, eta: null, eps: 56.42694392, thetaL: 0, thetaHalf: 52.61743407 },
  {
    name: 'P2',
    m: 36.51483717,
    tip: { kind: 'convective' },
    q: 0.8593034424,
    eta: 0.2701479318,
    eps: 21.88198248,
    thetaL: 3.968717608,
    thetaHalf: 13.18501452,
  },
  {
    name: 'P2',
    m: 36.51483717,
    tip: { kind: 'adiabatic' },
    q: 0.8592023919,
    eta: 0.2734926156,
    eps: 21.87940925,
    thetaL: 4.149620101,
    thetaHalf: 13.21342036,
  },
  {
    name: 'P2',
    m: 36.51483717,
    tip: { kind: 'temperature', thetaTip: 20 },
    q: 0.8503485131,
    eta: null,
    eps: 21.65394707,
    thetaL: 20,
    thetaHalf: 15.70229354,
  },
  { name: 'P2', m: 36.51483717, tip: { kind: 'infinite' }, q: 0.8603605814, eta: null, eps: 21.9089023, thetaL: 0, thetaHalf: 12.88784703 },
];

describe.each(rows)('$name, tip $tip.kind', (row) => {
  const input: UniformFinInput = { ...geometry[row.name], tip: row.tip };
  const result = uniformFin(input);
  it('m, heat rate, efficiency, effectiveness', () => {
    expectRelClose(result.m, row.m, tenDigits, 'm');
    expectRelClose(result.heatRate, row.q, tenDigits, 'q');
    expectRelClose(result.effectiveness, row.eps, tenDigits, 'effectiveness');
    if (row.eta === null) expect(result.efficiency).toBeNull();
    else expectRelClose(result.efficiency ?? NaN, row.eta, tenDigits, 'efficiency');
  });
  it('temperature excess at the tip and at mid-length', () => {
    const L = input.L;
    if (row.thetaL === 0) {
      // Infinite fin: theta = thetaBase e^{-mx} vanishes only at infinity; check it at a large x.
      expect(uniformFinExcess(input, 1e3)).toBe(0);
    } else {
      expectRelClose(uniformFinExcess(input, L), row.thetaL, tenDigits, 'theta(L)');
    }
    expectRelClose(uniformFinExcess(input, L / 2), row.thetaHalf, tenDigits, 'theta(L/2)');
    expect(uniformFinExcess(input, 0)).toBeCloseTo(input.thetaBase, 12);
  });
  // Energy balance of the closed form: q = h P int_0^L theta dx (+ tip loss), integrated here by
  // composite Simpson on 2000 panels (error ~ (mL)^4/2000^4 ~ 1e-12 relative for mL < 4); 1e-9.
  it('heat rate equals the convective loss along the fin plus the tip loss (Simpson check)', () => {
    if (row.tip.kind === 'infinite') return;
    const n = 2000;
    const xs = Float64Array.from({ length: n + 1 }, (_, i) => (input.L * i) / n);
    const theta = uniformFinExcessProfile(input, xs);
    let sum = 0;
    for (let i = 0; i <= n; i++) sum += (i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2) * (theta[i] ?? NaN);
    const faceLoss = (input.h * input.P * sum * input.L) / (3 * n);
    let tipLoss = 0;
    if (row.tip.kind === 'convective') tipLoss = input.h * input.A * (theta[n] ?? NaN);
    if (row.tip.kind === 'temperature') {
      // Heat conducted out through the tip, -k A theta'(L), by the closed form with the roles of base and
      // tip swapped: q_tip = -(heat entering from the tip side) = M (thetaL cosh mL - thetaB)/(thetaB sinh mL).
      const swapped = uniformFin({ ...input, thetaBase: row.tip.thetaTip, tip: { kind: 'temperature', thetaTip: input.thetaBase } });
      tipLoss = -swapped.heatRate;
    }
    expectRelClose(result.heatRate, faceLoss + tipLoss, 1e-9, 'energy balance');
  });
});

describe('tip-case relations', () => {
  const base = { ...geometry.R1 };
  // The convective tip with hTip = 0 is the adiabatic tip; at hTip = m k (beta = 1) the finite fin
  // carries exactly M, like an infinite fin (beta = 1 makes (tanh + 1)/(1 + tanh) = 1). Round-off: 1e-14.
  it('hTip = 0 gives the adiabatic tip; beta = 1 gives the infinite-fin rate', () => {
    const adiabatic = uniformFin({ ...base, tip: { kind: 'adiabatic' } });
    expectRelClose(uniformFin({ ...base, tip: { kind: 'convective', hTip: 0 } }).heatRate, adiabatic.heatRate, 1e-14, 'hTip=0');
    const hTip = adiabatic.m * base.k;
    expectRelClose(uniformFin({ ...base, tip: { kind: 'convective', hTip } }).heatRate, adiabatic.M, 1e-14, 'beta=1');
  });
  it('no overflow at mL = 50, 200, 1000: every tip tends to the infinite-fin heat rate M', () => {
    for (const mL of [50, 200, 1000]) {
      const m = uniformFin({ ...base, tip: { kind: 'adiabatic' } }).m;
      const L = mL / m;
      for (const tip of [{ kind: 'convective' }, { kind: 'adiabatic' }, { kind: 'temperature', thetaTip: 15 }] as UniformTip[]) {
        const r = uniformFin({ ...base, L, tip });
        // Differences from M are ~ e^{-2 mL} < 4e-44: equal to round-off.
        expectRelClose(r.heatRate, r.M, 1e-14, `${tip.kind} mL=${mL}`);
        const mid = uniformFinExcess({ ...base, L, tip }, L / 2);
        expect(Number.isFinite(mid) && mid >= 0).toBe(true);
        expect(Number.isFinite(uniformFinExcess({ ...base, L, tip }, L))).toBe(true);
      }
    }
  });
  it('rejects non-physical inputs', () => {
    expect(() => uniformFin({ ...base, k: 0, tip: { kind: 'adiabatic' } })).toThrow(RangeError);
    expect(() => uniformFinExcess({ ...base, tip: { kind: 'adiabatic' } }, base.L * 1.01)).toThrow(RangeError);
  });
});
