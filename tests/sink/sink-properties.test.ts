/**
 * Properties every fd-3d solution must have, whatever the sink: symmetry of symmetric sinks, energy balance to
 * round-off with the heat split between fins and plate as the scheme's own fluxes say, the contact resistance as
 * an exact shift, temperatures above the ambient, the refusals in the problem's words. Sinks are invented.
 */
import { describe, expect, it } from 'vitest';
import type { ArrayFinProfile, FinArray, HDistribution, TipCondition } from '../../src/case/index.js';
import { ModelNotApplicableError } from '../../src/errors.js';
import { studySink } from '../../src/fd/index.js';
import { plateFin, sinkCase, type SinkInputs } from './support/sink-case.js';

const one = { grids: 1 };

describe('a symmetric sink gives symmetric results', () => {
  // Six plate fins centred on a 50 mm plate, two equal sources mirrored about x = 25 mm and centred in y.
  const c = sinkCase({
    plate: [0.05, 0.04, 0.004],
    kPlate: 180,
    fin: plateFin(0.02, 0.0015, 0.04),
    array: { kind: 'plates', count: 6, pitch: 0.008 },
    hPlate: 25,
    h: { kind: 'uniform', h: 40 },
    sources: [
      { centre: [0.015, 0.02], size: [0.012, 0.016], power: 15 },
      { centre: [0.035, 0.02], size: [0.012, 0.016], power: 15 },
    ],
  });
  const study = studySink(c, one);

  it('mirrored sources have equal rises and mirrored fins equal heat', () => {
    // 1e-9: the solve's relative residual is 1e-10; the grid is mirror-symmetric up to round-off in its coordinates.
    const [a, b] = study.sources as [(typeof study.sources)[0], (typeof study.sources)[0]];
    expect(Math.abs(a.meanRise_K - b.meanRise_K) / a.meanRise_K).toBeLessThan(1e-9);
    expect(Math.abs(a.maxTemperature_degC - b.maxTemperature_degC) / a.meanRise_K).toBeLessThan(1e-9);
    const heats = study.fins.map((f) => f.heatRate_W);
    for (let k = 0; k < 3; k++) expect(Math.abs(heats[k]! - heats[5 - k]!) / heats[k]!).toBeLessThan(1e-9);
  });

  it('the plate view is symmetric about both mid-planes', () => {
    const { nx, ny, top_degC } = study.plate;
    let worst = 0;
    for (let j = 0; j < ny; j++) {
      for (let i = 0; i < nx; i++) {
        worst = Math.max(worst, Math.abs(top_degC[j * nx + i]! - top_degC[j * nx + nx - 1 - i]!));
        worst = Math.max(worst, Math.abs(top_degC[j * nx + i]! - top_degC[(ny - 1 - j) * nx + i]!));
      }
    }
    expect(worst).toBeLessThan(1e-8);
  });
});

const base: SinkInputs = {
  plate: [0.04, 0.03, 0.004],
  kPlate: 200,
  kFin: 180,
  hPlate: 20,
  h: { kind: 'uniform', h: 35 },
  sources: [
    { centre: [0.014, 0.012], size: [0.01, 0.008], power: 12, contactResistance: 3e-5 },
    { centre: [0.028, 0.02], size: [0.008, 0.008], power: 7 },
  ],
};
const pins = (pattern: 'inline' | 'staggered'): FinArray => ({ kind: 'pins', rows: 4, columns: 5, pitch: [0.007, 0.006], pattern });
const plates: FinArray = { kind: 'plates', count: 5, pitch: 0.007 };
const pin: ArrayFinProfile = { kind: 'pin', length: 0.02, diameter: 0.003 };
const trapezoid: ArrayFinProfile = { kind: 'trapezoidal', length: 0.02, baseThickness: 0.002, tipThickness: 0.001, width: 0.03 };
const linearH: HDistribution = { kind: 'linear', base: 50, tip: 25 };
const pointsH: HDistribution = { kind: 'points', x: Float64Array.of(0, 0.007, 0.02), h: Float64Array.of(60, 30, 45) };
const cone: ArrayFinProfile = { kind: 'conical-pin', length: 0.02, baseDiameter: 0.003, tipDiameter: 0.0012 };
const convectiveTip: TipCondition = { kind: 'convective', h: null };

describe.each([
  ['rectangular plate fins', { fin: plateFin(0.02, 0.0015, 0.03), array: plates }],
  ['trapezoidal plate fins, linear h, convective tip', { fin: trapezoid, array: plates, h: linearH, tip: convectiveTip }],
  ['inline pins, cooled underside', { fin: pin, array: pins('inline'), hUnderside: 8 }],
  ['staggered pins, tip at a prescribed temperature', { fin: pin, array: pins('staggered'), tip: { kind: 'temperature', T_degC: 30 } as TipCondition }],
  ['rectangular plate fins as 3-D cells', { fin: plateFin(0.02, 0.0015, 0.03), array: plates, cells: true }],
  ['conical pins, h by points along the height', { fin: cone, array: pins('inline'), h: pointsH }],
] as const)('%s', (_name, variant) => {
  const { cells, ...rest } = { cells: false, ...variant };
  const study = studySink(sinkCase({ ...base, ...rest }), { ...one, finRepresentation: cells ? 'cells' : 'sheet' });

  it('balances energy to round-off', () => {
    // 1e-9: the contract's energy balance (CG residual target 1e-10 relative).
    expect(study.energyBalance).toBeLessThan(1e-9);
    expect(study.totalHeat_W).toBe(19);
  });

  it('the heat entering the fins at their roots is the heat they lose', () => {
    // Two sums of the same conservative scheme: equal to the solve's residual (1e-10 x the heat).
    const roots = study.fins.reduce((s, f) => s + f.heatRate_W, 0);
    expect(Math.abs(roots - study.finsHeat_W) / study.totalHeat_W).toBeLessThan(1e-9);
    expect(study.fins.length).toBe(20 + (rest.array.kind === 'plates' ? -15 : 0));
  });

  it('sources are hotter than the plate top, and a maximum is above its mean', () => {
    for (const s of study.sources) {
      expect(s.maxTemperature_degC).toBeGreaterThanOrEqual(s.meanTemperature_degC);
      expect(s.meanTemperature_degC).toBeGreaterThan(study.plateTopMean_degC);
    }
    expect(study.sinkResistance_KperW).toBeCloseTo((Math.max(...study.sources.map((s) => s.maxTemperature_degC)) - 20) / 19, 12);
  });
});

describe('the contact resistance', () => {
  it('adds exactly q" R_c to its source and changes nothing else', () => {
    // The plate sees the source's flux either way, so on one grid the rise moves by q" R_c to round-off.
    const inputs = { ...base, fin: plateFin(0.02, 0.0015, 0.03), array: plates };
    const without = studySink(sinkCase({ ...inputs, sources: inputs.sources.map((s) => ({ ...s, contactResistance: 0 })) }), one);
    const withRc = studySink(sinkCase(inputs), one);
    const flux = 12 / (0.01 * 0.008);
    expect(withRc.sources[0]!.meanRise_K - without.sources[0]!.meanRise_K).toBeCloseTo(flux * 3e-5, 9);
    expect(withRc.sources[1]!.meanRise_K).toBeCloseTo(without.sources[1]!.meanRise_K, 12);
    expect(withRc.fins[2]!.heatRate_W).toBeCloseTo(without.fins[2]!.heatRate_W, 12);
  });
});

describe('what fd-3d refuses, in the problem words', () => {
  const inputs = { ...base, fin: plateFin(0.02, 0.0015, 0.03), array: plates };
  it.each([['an infinite tip', { tip: { kind: 'infinite' } as TipCondition }, /infinite fin tip/]])('%s', (_name, change, reason) => {
    expect(() => studySink(sinkCase({ ...inputs, ...change }))).toThrow(ModelNotApplicableError);
    expect(() => studySink(sinkCase({ ...inputs, ...change }))).toThrow(reason);
  });

  it('a k(T) table when plate and fins are of different materials (one Kirchhoff potential serves one law)', () => {
    const c = sinkCase(inputs);
    const table = { kind: 'table' as const, T_degC: Float64Array.of(0, 100), k: Float64Array.of(200, 190) };
    expect(() => studySink({ ...c, plate: { ...c.plate, material: { ...c.plate.material, k: table } } })).toThrow(/k\(T\) table/);
  });

  it('a grid above the memory limit, before allocating it', () => {
    expect(() => studySink(sinkCase(inputs), { memoryLimit_bytes: 1e6 })).toThrow(/unknowns and would need about/);
  });

  it('fins that do not fit on the plate', () => {
    expect(() => studySink(sinkCase({ ...inputs, array: { kind: 'plates', count: 8, pitch: 0.007 } }))).toThrow(/do not fit/);
  });
});

describe('order of accuracy with fins', () => {
  it('is observed between 1 and 2: the fin roots lower it from the bare plate', () => {
    // The symmetric six-fin sink above on three grids. Measured 1.60 for both sources (bare plates: 1.71-1.77).
    // Where a fin meets the plate the temperature is not smooth: with fins as 3-D cells the plate's top and the
    // fin's faces form re-entrant corners (gradient ~ r^(-1/3)); with sheets the fin's root is an isothermal strip
    // whose edges meet the convecting plate top (gradient ~ r^(-1/2)). The 2-D pitch-cell script
    // (tests/reference/sink_pitch_cell.py) shows the two alone: orders 1.35 and 1.02.
    const c = sinkCase({
      plate: [0.05, 0.04, 0.004],
      kPlate: 180,
      fin: plateFin(0.02, 0.0015, 0.04),
      array: { kind: 'plates', count: 6, pitch: 0.008 },
      hPlate: 25,
      h: { kind: 'uniform', h: 40 },
      sources: [
        { centre: [0.015, 0.02], size: [0.012, 0.016], power: 15 },
        { centre: [0.035, 0.02], size: [0.012, 0.016], power: 15 },
      ],
    });
    for (const s of studySink(c).sources) {
      expect(s.refinement!.observedOrder!).toBeGreaterThan(1);
      expect(s.refinement!.observedOrder!).toBeLessThan(2.1);
    }
  });
});
