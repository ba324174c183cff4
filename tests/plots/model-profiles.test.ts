/**
 * Temperature and heat-flow profiles of every model (src/compare/model-profiles.ts) against the closed
 * forms of the uniform fin. Check values: check case R1 (invented inputs; closed forms of Incropera et al. 2007, Table 3.4, from memory; k = 180,
 * h = 40, t = 2 mm, w = 50 mm, cooled edges, L = 30 mm, theta_b = 60 K): computed reference values
 * (scipy/mpmath script uniform_fin.py), closed forms of Incropera, DeWitt, Bergman & Lavine,
 * Fundamentals of Heat and Mass Transfer, Table 3.4 (table number from memory).
 */
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../src/case/parse.js';
import type { Case } from '../../src/case/types.js';
import type { ModelProfile } from '../../src/compare/model-profiles.js';
import { checkPlotInput } from '../../src/plots/sources.js';
import { positionOfRemainingFlow } from '../../src/plots/flux-chart.js';
import { thinSeries } from '../../src/plots/labels.js';

/** Case R1 with the given tip (ambient 20 degC, base 80 degC: theta_b = 60 K). */
function r1(tip: string, extra = ''): Case {
  return parseCaseText(
    `name: R1
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm, edges: cooled }
material: { k: 180 W/(m*K) }
convection: { ambient: 20 degC, h: 40 W/(m^2*K), tip: ${tip} }
base: { temperature: 80 degC${extra} }
`,
    'r1.yaml',
  );
}

function profileOf(profiles: ModelProfile[], model: string): ModelProfile {
  const p = profiles.find((q) => q.model === model);
  if (!p) throw new Error(`no ${model} profile`);
  return p;
}

/** theta (K) of a profile at the node nearest x (m). */
function thetaAt(p: ModelProfile, x: number): number {
  const xs = p.temperature.x_m;
  let best = 0;
  for (let i = 1; i < xs.length; i++) if (Math.abs((xs[i] as number) - x) < Math.abs((xs[best] as number) - x)) best = i;
  expect(Math.abs((xs[best] as number) - x)).toBeLessThan(1e-12);
  return (p.temperature.values[best] as number) - 20;
}

const last = (a: Float64Array): number => a[a.length - 1] as number;
const L = 0.03;

describe('shortcut profiles on the uniform fin R1 (Incropera et al. 2007, Table 3.4; computed reference values, uniform_fin.py)', () => {
  // The values are quoted to 10 significant digits; the closed forms here are evaluated in double
  // precision, so 1e-9 relative covers the quoting.
  const rel = 1e-9;

  it('tanh-L is the adiabatic-tip fin: theta(L), theta(L/2) and q of tip B', async () => {
    const { profiles } = await checkPlotInput(r1('convective'), { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'tanh-L');
    expect(thetaAt(p, L)).toBeCloseTo(54.25861334, 7);
    expect(thetaAt(p, L / 2)).toBeCloseTo(55.67546103, 7);
    expect(Math.abs((p.flow.values[0] as number) / 7.008672878 - 1)).toBeLessThan(rel);
    // Adiabatic tip: nothing flows out of it (Table 3.4 tip B, theta'(L) = 0).
    expect(Math.abs(last(p.flow.values))).toBeLessThan(1e-12);
  });

  it('convective-tip is tip A: theta(L), theta(L/2), q, and the tip loss h A theta(L)', async () => {
    const { profiles } = await checkPlotInput(r1('convective'), { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'convective-tip');
    expect(thetaAt(p, L)).toBeCloseTo(53.92214373, 7);
    expect(thetaAt(p, L / 2)).toBeCloseTo(55.51150752, 7);
    expect(Math.abs((p.flow.values[0] as number) / 7.203722261 - 1)).toBeLessThan(rel);
    // Tip A boundary condition: -k A theta'(L) = h A theta(L), A = 1e-4 m^2.
    expect(Math.abs(last(p.flow.values) / (40 * 1e-4 * 53.92214373) - 1)).toBeLessThan(rel);
    // q' = h P theta with P = 2 (w + t) = 0.104 m.
    expect(Math.abs((p.loss.values[0] as number) / (40 * 0.104 * 60) - 1)).toBeLessThan(1e-12);
  });

  it('closed-form with a prescribed tip (tip C, theta_L = 15 K): q and theta(L/2)', async () => {
    const { profiles } = await checkPlotInput(r1('{ temperature: 35 degC }'), { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'closed-form');
    expect(thetaAt(p, L / 2)).toBeCloseTo(36.5456875, 7);
    expect(thetaAt(p, L)).toBeCloseTo(15, 10);
    expect(Math.abs((p.flow.values[0] as number) / 29.76665185 - 1)).toBeLessThan(rel);
    // The tip flow -k A theta'(L) has no tabulated value: the fd-1d flux through the last cell is an
    // independent second-order estimate (8000 cells: error ~ (mL)^2/(12 N^2) ~ 1e-9 of q).
    const fd = profileOf(profiles.profiles, 'fd-1d');
    expect(Math.abs(last(p.flow.values) - last(fd.flow.values)) / 29.77).toBeLessThan(1e-6);
  });

  it('closed-form of an infinite fin (tip D): q = M and theta(L/2)', async () => {
    const { profiles } = await checkPlotInput(r1('infinite'), { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'closed-form');
    expect(thetaAt(p, L / 2)).toBeCloseTo(47.7657797, 7);
    expect(Math.abs((p.flow.values[0] as number) / 16.41852612 - 1)).toBeLessThan(rel);
  });
});

describe('fd-1d profile of R1 against tip A (Incropera et al. 2007, Table 3.4; computed reference values)', () => {
  it('temperatures, base heat rate and tip flow', async () => {
    const { profiles } = await checkPlotInput(r1('convective'), { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'fd-1d');
    // Second-order scheme on 8000 cells at mL = 0.46: error ~ theta (mL)^2/(12 N^2) ~ 3e-8 K; 1e-6 K is a
    // safe bound that a first-order slip (~1e-4 K) would break.
    expect(Math.abs(thetaAt(p, L) - 53.92214373)).toBeLessThan(1e-6);
    expect(Math.abs(thetaAt(p, L / 2) - 55.51150752)).toBeLessThan(1e-6);
    // Heat rates: the same error order relative to q.
    expect(Math.abs((p.flow.values[0] as number) / 7.203722261 - 1)).toBeLessThan(1e-7);
    expect(Math.abs(last(p.flow.values) / (40 * 1e-4 * 53.92214373) - 1)).toBeLessThan(1e-6);
    // Q(x) never rises along a fin that only loses heat.
    for (let i = 1; i < p.flow.values.length; i++) expect(p.flow.values[i] as number).toBeLessThanOrEqual(p.flow.values[i - 1] as number);
  });
});

describe('contact resistance in series: each line starts where its own heat rate puts the fin base', () => {
  it('every shortcut line carries the heat rate of the check table, and theta0 = theta_b - Q R', async () => {
    const c = r1('convective', ', contactResistance: 2e-4 m^2*K/W');
    const { report, profiles } = await checkPlotInput(c, { tolerance: 0.02, reference: '1d', ledger: false });
    for (const p of profiles.profiles) {
      if (p.model === 'fd-1d') continue;
      const row = report.models.find((m) => m.model === p.model);
      // Consistency of the chart with the table (both from the same closed form): round-off only.
      expect(Math.abs((p.flow.values[0] as number) / (row?.heatRate_W ?? NaN) - 1)).toBeLessThan(1e-12);
      // R = R'' / A_b = 2e-4 / 1e-4 = 2 K/W.
      expect(Math.abs((p.temperature.values[0] as number) - 20 - (60 - 2 * (row?.heatRate_W ?? NaN)))).toBeLessThan(1e-9);
    }
  });
});

describe('fd-2d profile (face losses summed along the face)', () => {
  it('the heat flow left at the tip equals the 2-D solver’s own tip heat rate', async () => {
    const c = parseCaseText(
      `name: tapered
fin: { profile: trapezoidal, length: 35 mm, baseThickness: 5 mm, tipThickness: 1.5 mm, width: 120 mm }
material: { k: 96 W/(m*K) }
convection: { ambient: 40 degC, h: { base: 60, tip: 25 }, tip: convective }
base: { temperature: 110 degC }
`,
      'tapered.yaml',
    );
    const input = await checkPlotInput(c, { tolerance: 0.02, reference: '2d', ledger: false });
    const p = profileOf(input.profiles.profiles, 'fd-2d');
    const finest = input.twoD?.finest;
    expect(finest).toBeDefined();
    // The trapezoidal sum along the sloped face is second order, as the solver's face conductances are:
    // on the study's finest grid they differ by O(h^2) (measured 5e-7 of Q on the demo cases); 1e-5 of Q.
    expect(Math.abs(last(p.flow.values) - (finest?.tipHeatRate_W ?? NaN)) / p.heatRate_W).toBeLessThan(1e-5);
    expect(p.faceTemperature).not.toBeNull();
    // The face is cooled: never hotter than the mid-plane at the same station (maximum principle).
    const mid = p.temperature.values;
    const face = p.faceTemperature?.values ?? new Float64Array();
    for (let i = 0; i < mid.length; i++) expect(face[i] as number).toBeLessThanOrEqual((mid[i] as number) + 1e-9);
  });
});

describe('fd-1d profile of a nonlinear fin (power-law h)', () => {
  it("q' from the drop of Q across each control volume equals the local law h(theta) P theta", async () => {
    const natural = parseCaseText(
      `name: natural
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm, edges: cooled }
material: { k: 180 W/(m*K) }
convection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: convective }
base: { temperature: 80 degC }
`,
      'natural.yaml',
    );
    const { profiles } = await checkPlotInput(natural, { tolerance: 0.02, reference: '1d', ledger: false });
    const p = profileOf(profiles.profiles, 'fd-1d');
    // The fin equation's loss term (h = 12 (theta/60)^0.25 W/(m^2 K), P = 2 (w + t) = 0.104 m), evaluated
    // at interior nodes; the CV balance gives it to second order in the cell (4000 cells: ~4e-8), so 1e-6.
    const n = p.temperature.values.length;
    for (const i of [0.0125, 0.25, 0.5, 0.75, 0.9875].map((f) => Math.round(f * (n - 1)))) {
      const theta = (p.temperature.values[i] as number) - 20;
      const law = 12 * (theta / 60) ** 0.25 * 0.104 * theta;
      expect(Math.abs((p.loss.values[i] as number) / law - 1)).toBeLessThan(1e-6);
    }
    expect(profiles.note).toContain('base temperature');
  });
});

describe('helpers', () => {
  it('positionOfRemainingFlow interpolates where a tenth of the flow is left', () => {
    const x = Float64Array.from({ length: 11 }, (_, i) => i / 10);
    const flow = x.map((v) => 10 * (1 - v));
    const p = { flow: { x_m: x, values: flow } } as unknown as ModelProfile;
    expect(positionOfRemainingFlow(p)).toBeCloseTo(0.9, 12);
    const never = { flow: { x_m: x, values: x.map((v) => 10 - v) } } as unknown as ModelProfile;
    expect(positionOfRemainingFlow(never)).toBeNull();
  });

  it('thinSeries keeps the ends and at most about maxPoints points', () => {
    const x = Float64Array.from({ length: 8001 }, (_, i) => i);
    const t = thinSeries(x, x, 600);
    expect(t.x[0]).toBe(0);
    expect(t.x[t.x.length - 1]).toBe(8000);
    expect(t.x.length).toBeLessThanOrEqual(601);
    expect(t.x.length).toBeGreaterThan(500);
  });
});
