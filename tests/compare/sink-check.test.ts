/**
 * The heat-sink check (src/compare/sink-check.ts) against hand-built fd-3d reference studies: per-source drifts,
 * the worst source deciding the verdict, no verdict on an unresolved reference, the contract's JSON keys, the ledger
 * measured from the shortcuts' own differences, the flags and the text. The sink is invented; the reference rises
 * are set from the shortcuts' own rises so that each drift is known exactly.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/index.js';
import { parseHeatSinkText, type HeatSinkCase } from '../../src/case/index.js';
import { formatSinkCheck } from '../../src/compare/format-sink-check.js';
import { runSinkCheck, sinkCheckFrom } from '../../src/compare/sink-check.js';
import { sinkShortcuts, type SinkShortcuts } from '../../src/compare/sink-models.js';
import type { SinkStudy } from '../../src/fd/index.js';

const text = `name: invented plate-fin sink
fin: { profile: rectangular, length: 30 mm, thickness: 1.5 mm }
material: { k: 200 }
array: { count: 10, pitch: 8 mm }
plate: { width: 80 mm, length: 60 mm, thickness: 5 mm }
sources:
  - { name: A, power: 30 W, centre: [28 mm, 30 mm], size: [20 mm, 20 mm], contactResistance: 2e-5, limit: 60 degC }
  - { name: B, power: 10 W, centre: [62 mm, 30 mm], size: [10 mm, 10 mm] }
convection: { ambient: 25 degC, h: 40 W/(m^2*K), plate: 20 W/(m^2*K) }
`;

let c: HeatSinkCase;
let shortcuts: SinkShortcuts;

beforeAll(async () => {
  await initBessel();
  c = parseHeatSinkText(text, 'sink.yaml');
  shortcuts = await sinkShortcuts(c);
});

function rise(model: string): number[] {
  const row = shortcuts.models.find((m) => m.model === model);
  if (row === undefined) throw new Error(model);
  return row.sourceRise_K;
}

/** A reference whose mean rises are `rises`, with GCI `gci` on each, fins with the given heat and root rise. */
function study(rises: number[], gci: (number | null)[], fins: { heat: number; rootRise: number }[] = [], topRise = 20): SinkStudy {
  const ambient = 25;
  const total = c.sources.reduce((s, x) => s + x.power, 0);
  return {
    model: 'fd-3d',
    sources: c.sources.map((s, j) => ({
      name: s.name,
      power_W: s.power,
      meanTemperature_degC: ambient + (rises[j] ?? NaN),
      maxTemperature_degC: ambient + 1.1 * (rises[j] ?? NaN),
      meanRise_K: rises[j] ?? NaN,
      refinement: null,
      discretizationError: gci[j] ?? null,
    })),
    fins: fins.map((f, index) => ({ index, heatRate_W: f.heat, rootTemperature_degC: ambient + f.rootRise })),
    totalHeat_W: total,
    finsHeat_W: fins.reduce((s, f) => s + f.heat, 0),
    plateHeat_W: total - fins.reduce((s, f) => s + f.heat, 0),
    energyBalance: 1e-13,
    plateTopMean_degC: ambient + topRise,
    sinkResistance_KperW: (1.1 * Math.max(...rises)) / total,
    unknowns: [800000, 100000, 12500],
    finModel: 'hand-built for a test',
    plate: { nx: 1, ny: 1, x: new Float64Array(1), y: new Float64Array(1), underside_degC: new Float64Array(1), top_degC: new Float64Array(1) },
    errors: { sourceMaxRise: c.sources.map(() => null), plateTopMeanRise: null, finHeat: fins.map(() => null), sinkResistance: null },
    finProfiles: null,
    solver: { method: 'none', iterations: 0, relativeResidual: 0 },
  };
}

describe('drift per source and the worst source decides', () => {
  it('drifts of +1 % on A and -3 % on B give the spreading series a marginal verdict decided by B (tolerance 2 %)', () => {
    const s = rise('spreading-series');
    const reference = study([(s[0] ?? NaN) / 1.01, (s[1] ?? NaN) / 0.97], [1e-4, 1e-4]);
    const r = sinkCheckFrom(c, reference, shortcuts, { tolerance: 0.02 });
    const row = r.models.find((m) => m.model === 'spreading-series');
    expect(row?.sourceDrift[0]).toBeCloseTo(0.01, 12);
    expect(row?.sourceDrift[1]).toBeCloseTo(-0.03, 12);
    expect(row?.drift).toBeCloseTo(-0.03, 12);
    expect(row?.worstSource).toBe('B');
    expect(row?.verdict).toBe('marginal');
    expect(r.reference.resolved).toBe(true);
  });

  it.each([
    [0.019, 'ok'],
    [0.039, 'marginal'],
    [0.041, 'unsafe'],
  ])('a worst drift of %d is %s', (d, verdict) => {
    const x = rise('overall-efficiency-exact-fin');
    const r = sinkCheckFrom(c, study([(x[0] ?? NaN) / (1 + d), x[1] ?? NaN], [1e-3, 1e-3]), shortcuts, { tolerance: 0.02 });
    expect(r.models.find((m) => m.model === 'overall-efficiency-exact-fin')?.verdict).toBe(verdict);
  });
});

describe('no verdict on an unresolved reference', () => {
  it.each([
    ['a GCI above a tenth of the tolerance on one source', [1e-4, 0.0021]],
    ['no error estimate (a single grid)', [1e-4, null]],
  ] as [string, (number | null)[]][])('%s', (_what, gci) => {
    const r = sinkCheckFrom(c, study(rise('spreading-series'), gci), shortcuts, { tolerance: 0.02 });
    expect(r.reference.resolved).toBe(false);
    expect(r.models.every((m) => m.verdict === 'unresolved')).toBe(true);
    expect(r.flags.some((f) => f.flag === 'unresolved-reference')).toBe(true);
    expect(r.reference.note).toMatch(/NOT RESOLVED/);
  });

  it('a model whose own error estimate is above a tenth of the tolerance (a truncated series) gets no verdict either', () => {
    const loose = { ...shortcuts, models: shortcuts.models.map((m) => (m.model === 'spreading-series' ? { ...m, relativeError: 0.0021 } : m)) };
    const r = sinkCheckFrom(c, study(rise('overall-efficiency-exact-fin'), [1e-4, 1e-4]), loose, { tolerance: 0.02 });
    expect(r.models.find((m) => m.model === 'spreading-series')?.verdict).toBe('unresolved');
    expect(r.models.find((m) => m.model === 'overall-efficiency-exact-fin')?.verdict).toBe('ok');
  });

  it('resolved at exactly a tenth of the tolerance', () => {
    const r = sinkCheckFrom(c, study(rise('spreading-series'), [0.002, 0.002]), shortcuts, { tolerance: 0.02 });
    expect(r.reference.resolved).toBe(true);
  });
});

describe('the contract\u2019s JSON keys', () => {
  it('sources, sinkResistance_KperW, overallEfficiency (realised), fins, models[].sourceRise_K', () => {
    const fins = Array.from({ length: 10 }, (_, i) => ({ heat: 3 + 0.1 * i, rootRise: 18 + i * 0.1 }));
    const r = JSON.parse(JSON.stringify(sinkCheckFrom(c, study([30, 25], [1e-4, 1e-4], fins), shortcuts, { tolerance: 0.02 }))) as Record<string, unknown>;
    expect(r.kind).toBe('heat-sink');
    expect(r.sources).toEqual([
      expect.objectContaining({ name: 'A', power_W: 30, meanTemperature_degC: 55, maxTemperature_degC: 58, limit_degC: 60, margin_K: 2 }),
      expect.objectContaining({ name: 'B', power_W: 10, meanTemperature_degC: 50, maxTemperature_degC: 52.5, limit_degC: null, margin_K: null }),
    ]);
    expect(r.sinkResistance_KperW).toBeCloseTo(33 / 40, 12);
    expect((r.fins as unknown[])[3]).toEqual({ index: 3, heatRate_W: 3.3, rootTemperature_degC: 25 + 18.3 });
    for (const m of r.models as Record<string, unknown>[]) expect((m.sourceRise_K as number[]).length).toBe(2);
    // Realised: Q / (G_ideal * theta_top), G_ideal = N G_f / eta_f + h_plate A_exposed.
    const exact = shortcuts.exactFin;
    const ideal = 10 * ((exact?.conductance_WperK ?? NaN) / (exact?.efficiency ?? NaN)) + 20 * (0.08 * 0.06 - 10 * 0.0015 * 0.06);
    expect(r.overallEfficiency).toBeCloseTo(40 / (ideal * 20), 12);
  });
});

describe('the ledger, from the shortcuts\u2019 own differences', () => {
  it('fin-efficiency shortcut, uniform base, finned face as uniform h, 1-D fins and exposed-plate h', () => {
    const G = shortcuts.exactFin?.conductance_WperK ?? NaN;
    // fd-3d fins that carry 5 % more than the 1-D fin at their root rise.
    const fins = Array.from({ length: 10 }, (_, i) => ({ heat: 1.05 * G * (15 + i), rootRise: 15 + i }));
    const reference = [32, 20];
    const r = sinkCheckFrom(c, study(reference, [1e-4, 1e-4], fins), shortcuts, { tolerance: 0.02 });
    const row = (name: string) => r.assumptions.find((a) => a.assumption.startsWith(name))?.drift ?? NaN;
    const at = (model: string) => rise(model)[0] ?? NaN;
    expect(row('the fin-efficiency shortcut')).toBeCloseTo((at('overall-efficiency') - at('overall-efficiency-exact-fin')) / 32, 12);
    expect(row('uniform base temperature')).toBeCloseTo((at('overall-efficiency-exact-fin') - at('spreading-series')) / 32, 12);
    expect(row('the finned face as a uniform h')).toBeCloseTo((at('spreading-series') - 32) / 32, 12);
    expect(row('fins as 1-D fins')).toBeCloseTo(1 / 1.05 - 1, 12);
    expect(row('exposed-plate h')).toBeLessThan(0);
  });
});

describe('flags', () => {
  it('a source over its limit, with the margin; idle fins; spreading that dominates', () => {
    const fins = Array.from({ length: 10 }, (_, i) => ({ heat: i < 3 ? 0.2 : 4, rootRise: 20 }));
    // A: mean rise 40 K -> max 69 degC, 9 K over its 60 degC limit; plate top 10 K above ambient: spreading share high.
    const r = sinkCheckFrom(c, study([40, 22], [1e-4, 1e-4], fins, 10), shortcuts, { tolerance: 0.02 });
    const over = r.flags.find((f) => f.flag === 'over-limit');
    expect(over?.severity).toBe('error');
    expect(over?.value).toBeCloseTo(-9, 12);
    expect(over?.message).toMatch(/A: fd-3d maximum 69\.0 degC is 9\.00 K above its limit 60 degC/);
    const idle = r.flags.find((f) => f.flag === 'idle-fins');
    expect(idle?.value).toBe(3);
    expect(idle?.severity).toBe('warning');
    const spreading = r.flags.find((f) => f.flag === 'spreading-dominates');
    // (40 - 2e-5 * 30 / 4e-4 - 10) / 40 = (40 - 1.5 - 10) / 40.
    expect(spreading?.value).toBeCloseTo(28.5 / 40, 12);
    expect(spreading?.severity).toBe('warning');
  });

  it('no flags for a well-behaved sink within its limit (control)', () => {
    const fins = Array.from({ length: 10 }, () => ({ heat: 3, rootRise: 20 }));
    const r = sinkCheckFrom(c, study([22, 21], [1e-4, 1e-4], fins, 20), shortcuts, { tolerance: 0.02 });
    expect(r.flags).toEqual([]);
    expect(r.cautions.length).toBeGreaterThan(4);
  });
});

describe('runSinkCheck and the text', () => {
  it('takes the reference as a function of the case, and the text names every model, source and verdict', async () => {
    const s = rise('spreading-series');
    const r = await runSinkCheck(c, () => study([(s[0] ?? NaN) / 1.01, s[1] ?? NaN], [1e-4, 1e-4]), { tolerance: 0.02 });
    const out = formatSinkCheck(c, r);
    for (const word of [
      'fd-3d',
      'overall-efficiency',
      'overall-efficiency-exact-fin',
      'spreading-series',
      'A [K]',
      'B [K]',
      'GCI',
      'Cautions:',
      'confirm',
    ]) {
      expect(out).toContain(word);
    }
    expect(out).toMatch(/spreading-series .*\+1\.00 %.*ok/);
    expect(out).toMatch(/series of \d+ x \d+ terms: truncation at most/);
    expect(out).toMatch(/fd-1d fin study: estimated error/);
  });
});
