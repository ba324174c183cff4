/**
 * A heat sink's sensitivities d ln rise / d ln x (fd-3d: adjoint, re-solves): identities the linear problem must
 * satisfy exactly, the adjoint against re-solves, and the uncertainty key of a sink case. The sinks are invented.
 */
import { describe, expect, it } from 'vitest';
import { parseHeatSinkText, sinkNumericInputs, type HeatSinkCase } from '../../src/case/index.js';
import { SINK_SENSITIVITY_STEP, sinkSensitivity } from '../../src/compare/sink-sensitivity.js';
import { solveSinkOnGrid, studySink } from '../../src/fd/index.js';
import { InputError } from '../../src/errors.js';
import { sinkCase } from '../sink/support/sink-case.js';

const twoSources = sinkCase({
  plate: [0.04, 0.05, 0.004],
  kPlate: 180,
  fin: { kind: 'rectangular', length: 0.015, thickness: 0.0015, width: 0.05 },
  array: { kind: 'plates', count: 3, pitch: 0.012 },
  sources: [
    { centre: [0.015, 0.02], size: [0.01, 0.01], power: 10, contactResistance: 2e-5 },
    { centre: [0.028, 0.035], size: [0.008, 0.008], power: 6 },
  ],
  hPlate: 30,
  hUnderside: 5,
});

describe('sink sensitivities', () => {
  // Coarse grids keep the test fast; the identities hold on any grid.
  const study = studySink(twoSources, { cellSize: 0.004, plateLayers: 1, finLayers: 2 });
  const result = sinkSensitivity(twoSources, study)!;
  const S = (key: string): number => result.sensitivities.find((s) => s.key === key)!.dlnRise_dlnx;

  it('lists the inputs of the case', () => {
    expect(result.sensitivities.map((s) => s.key)).toEqual([
      'convection.h',
      'convection.plate',
      'convection.underside',
      'material.k',
      'plate.thickness',
      'fin.length',
      'fin.thickness',
      'sources[0].power',
      'sources[0].contactResistance',
      'sources[1].power',
    ]);
  });

  it('the rise is linear in the powers: their S add up to 1', () => {
    // CG to 1e-10 relative residual over a step of 1e-3: ~1e-7 each; 1e-5 leaves margin.
    expect(Math.abs(S('sources[0].power') + S('sources[1].power') - 1)).toBeLessThan(1e-5);
    expect(S('sources[1].power')).toBeGreaterThan(0);
  });

  it('every conductance scaled by lambda divides the rise by lambda: S_h + S_k - S_Rc = -1', () => {
    // A dimensional identity at fixed geometry (h, k and 1/R_c are all conductances); convection.h scales every h.
    expect(Math.abs(S('convection.h') + S('material.k') - S('sources[0].contactResistance') + 1)).toBeLessThan(1e-5);
  });

  it('first order: sqrt(sum (S u)^2) with the default h 25 %', () => {
    expect(result.uncertainty.relative).toBeCloseTo(Math.abs(S('convection.h')) * 0.25, 12);
    expect(result.uncertainty.sample).toBeNull();
  });
});

describe('the uncertainty key of a sink case', () => {
  const text = (uncertainty: string) => `fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
uncertainty: ${uncertainty}
`;
  it('takes the sink inputs, relative or absolute', () => {
    const c = parseHeatSinkText(text('{ "sources[0].power": 1.5 W, plate.thickness: 5 % }'), 'sink.yaml');
    expect(c.uncertainty).toEqual([
      { key: 'convection.h', relative: 0.25, given: 'default' },
      { key: 'sources[0].power', relative: expect.closeTo(0.1, 12), given: '1.5 W' },
      { key: 'plate.thickness', relative: 0.05, given: '5 %' },
    ]);
  });
  it('names the key of an input the sink does not have', () => {
    expect(() => parseHeatSinkText(text('{ fin.width: 5 % }'), 'sink.yaml')).toThrow(InputError);
    expect(() => parseHeatSinkText(text('{ fin.width: 5 % }'), 'sink.yaml')).toThrow(/uncertainty\.fin\.width.*sources\[0\]\.power/s);
  });
});

describe('sink sensitivities by the adjoint', () => {
  // The same sink and grids as above; re-solves of the full system are the check (issue 12: 1e-6 relative).
  const study = studySink(twoSources, { cellSize: 0.004, plateLayers: 1, finLayers: 2 });
  const result = sinkSensitivity(twoSources, study)!;
  const spec = { ...study.finestGrid!, refine: Math.max(1, study.finestGrid!.refine / 2) };
  const hottest = study.sources[0]!.meanRise_K >= study.sources[1]!.meanRise_K ? 0 : 1;
  const d = SINK_SENSITIVITY_STEP;
  const rise = (c: HeatSinkCase) => solveSinkOnGrid(c, spec).sourceMeanRise[hottest]!;
  const rise0 = rise(twoSources);

  it('is used for every input of this linear sink, and says so', () => {
    expect(result.sensitivities.every((s) => s.method === 'adjoint')).toBe(true);
    expect(result.sensitivityMethod).toMatch(/^adjoint of fd-3d/);
  });

  it.each(sinkNumericInputs(twoSources).map((input) => [input.key, input] as const))(
    '%s equals central differences of re-solves to 1e-6',
    (key, input) => {
      const resolved = (rise(input.scale(1 + d)) - rise(input.scale(1 - d))) / (2 * d * rise0);
      const adjoint = result.sensitivities.find((s) => s.key === key)!.dlnRise_dlnx;
      // Both carry the step's O(d^2) truncation alike; the re-solves' CG residual (1e-10) over the step adds ~1e-7.
      expect(Math.abs(adjoint - resolved)).toBeLessThan(1e-6 * Math.max(1, Math.abs(resolved)));
    },
  );
});
