/**
 * The array shortcuts of a heat sink (src/compare/sink-models.ts) on invented sinks, against exact values:
 * the exact 1-D fin against the uniform fin with a convective tip (Incropera, DeWitt, Bergman & Lavine 2007,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4 case A; from memory), the spreading series of a
 * bare plate against analytic/spreading-series.ts (Muzychka, Culham & Yovanovich 2003), and exact identities
 * between the models.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel, spreadingSeries, uniformFin } from '../../src/analytic/index.js';
import { parseHeatSinkText, type HeatSinkCase } from '../../src/case/index.js';
import { sinkShortcuts, type SinkShortcuts } from '../../src/compare/sink-models.js';

beforeAll(async () => {
  await initBessel();
});

const finned = `name: invented plate-fin sink
fin: { profile: rectangular, length: 30 mm, thickness: 1.5 mm }
material: { k: 200 }
array: { count: 10, pitch: 8 mm }
plate: { width: 80 mm, length: 60 mm, thickness: 5 mm }
sources:
  - { name: A, power: 30 W, centre: [28 mm, 30 mm], size: [20 mm, 20 mm], contactResistance: 2e-5 }
  - { name: B, power: 10 W, centre: [62 mm, 30 mm], size: [10 mm, 10 mm] }
convection: { ambient: 25 degC, h: 40 W/(m^2*K), plate: 20 W/(m^2*K) }
`;

function byModel(r: SinkShortcuts, model: string) {
  const row = r.models.find((m) => m.model === model);
  if (row === undefined) throw new Error(`no ${model}`);
  return row;
}

describe('a plate-fin sink, convective tips', () => {
  let c: HeatSinkCase;
  let r: SinkShortcuts;
  beforeAll(async () => {
    c = parseHeatSinkText(finned, 'sink.yaml');
    r = await sinkShortcuts(c);
  });

  it('the exact 1-D fin is the uniform fin with a convective tip (P = 2w: adiabatic end faces), within the fd-1d error estimate', () => {
    // One fin: w = 60 mm (the plate length), t = 1.5 mm, L = 30 mm, k = 200, h = 40 on the faces and the tip.
    const exact = uniformFin({ h: 40, k: 200, P: 2 * 0.06, A: 0.0015 * 0.06, L: 0.03, thetaBase: 1, tip: { kind: 'convective', hTip: 40 } });
    const conductance = r.exactFin?.conductance_WperK ?? NaN;
    const gci = r.exactFin?.study.discretizationError ?? NaN;
    expect(Math.abs(conductance - exact.heatRate) / exact.heatRate).toBeLessThanOrEqual(Math.max(gci, 1e-9) * 1.5);
  });

  it('overall-efficiency-exact-fin: theta_b = Q / (N G_f + h_plate A_exposed) and the energy it carries', () => {
    const row = byModel(r, 'overall-efficiency-exact-fin');
    const G = 10 * (r.exactFin?.conductance_WperK ?? NaN) + 20 * (0.08 * 0.06 - 10 * 0.0015 * 0.06);
    expect(row.baseRise_K).toBeCloseTo(40 / G, 10);
    // Source rise = theta_b + Q t / (k A_sources) + R'' Q_j / A_j.
    const plateDrop = (40 * 0.005) / (200 * (0.0004 + 0.0001));
    expect(row.sourceRise_K[0]).toBeCloseTo(40 / G + plateDrop + (2e-5 * 30) / 0.0004, 10);
    expect(row.sourceRise_K[1]).toBeCloseTo(40 / G + plateDrop, 10);
  });

  it('the textbook fin efficiency tanh(mLc)/(mLc), Lc = L + t/2, is close to the exact one here (mL ~ 0.5) but not equal', () => {
    const textbook = byModel(r, 'overall-efficiency').finEfficiency ?? NaN;
    const m = Math.sqrt((40 * 2 * 0.06) / (200 * 0.0015 * 0.06));
    const Lc = 0.03 + 0.00075;
    expect(textbook).toBeCloseTo(Math.tanh(m * Lc) / (m * Lc), 12);
    expect(Math.abs(textbook - (r.exactFin?.efficiency ?? NaN))).toBeLessThan(0.01);
  });

  it('the spreading series: the finned face as h_eff = G / (a b), the same plate and sources', () => {
    const G = 10 * (r.exactFin?.conductance_WperK ?? NaN) + 20 * (0.08 * 0.06 - 10 * 0.0015 * 0.06);
    const direct = spreadingSeries({
      plate: { width: 0.08, length: 0.06, thickness: 0.005, conductivity: 200 },
      h: G / (0.08 * 0.06),
      sources: c.sources.map((s) => ({ centre: s.centre, size: s.size, power: s.power, contactResistance: s.contactResistance })),
    });
    expect(byModel(r, 'spreading-series').sourceRise_K).toEqual(direct.sourceRise_K);
    // Spreading makes the big source A hotter than the uniform-base model says; the small source B, far from A,
    // sits on a cooler part of the plate than the one uniform base temperature.
    const spreading = byModel(r, 'spreading-series').sourceRise_K;
    const uniform = byModel(r, 'overall-efficiency-exact-fin').sourceRise_K;
    expect(spreading[0]).toBeGreaterThan(uniform[0] ?? NaN);
    expect(spreading[1]).toBeLessThan(uniform[1] ?? NaN);
  });

  it('the single-h habit (exposed plate at the fins\u2019 h = 40 instead of 20) cools more', () => {
    expect(r.singleH?.h_W_per_m2K).toBeCloseTo(40, 12);
    expect(r.singleH?.sourceRise_K[0]).toBeLessThan(byModel(r, 'overall-efficiency-exact-fin').sourceRise_K[0] ?? NaN);
  });
});

describe('exact identities', () => {
  it('a source covering the whole underside: the spreading series equals the uniform-base exact-fin model (both 1-D)', async () => {
    const text = finned.replace(/sources:[\s\S]*convection:/, 'sources:\n  - { power: 40 W, centre: [40 mm, 30 mm], size: [80 mm, 60 mm] }\nconvection:');
    const r = await sinkShortcuts(parseHeatSinkText(text, 'sink.yaml'));
    const exact = byModel(r, 'overall-efficiency-exact-fin').sourceRise_K[0] ?? NaN;
    // 1e-12: every series term vanishes (sin(m pi) = 0 up to round-off).
    expect(Math.abs((byModel(r, 'spreading-series').sourceRise_K[0] ?? NaN) - exact) / exact).toBeLessThan(1e-12);
  });

  it('a bare plate: both uniform-base models agree and have no fin; the series is the bare plate\u2019s with h_plate', async () => {
    const text = `array: { count: 0 }
plate: { width: 40 mm, length: 40 mm, thickness: 3 mm, material: { k: 170 } }
sources:
  - { power: 10 W, centre: [20 mm, 20 mm], size: [8 mm, 8 mm] }
convection: { ambient: 20 degC, plate: 300 }
`;
    const r = await sinkShortcuts(parseHeatSinkText(text, 'bare.yaml'));
    expect(byModel(r, 'overall-efficiency').sourceRise_K).toEqual(byModel(r, 'overall-efficiency-exact-fin').sourceRise_K);
    expect(byModel(r, 'overall-efficiency').finEfficiency).toBeNull();
    expect(r.exactFin).toBeNull();
    // references.md section 9 check value (centred 8 x 8 mm), within the series' own truncation bound.
    const series = byModel(r, 'spreading-series');
    expect(Math.abs((series.sourceRise_K[0] ?? NaN) - 25.138826398)).toBeLessThanOrEqual(series.relativeError * 25.14 + 1e-6);
  });
});
