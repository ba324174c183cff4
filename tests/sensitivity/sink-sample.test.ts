/**
 * The Latin-hypercube confirmation of a heat sink's uncertainty band (src/compare/sink-sample.ts). Method:
 * propagation of distributions by sampling, JCGM 101:2008 ("Evaluation of measurement data - Supplement 1 to the
 * GUM - Propagation of distributions using a Monte Carlo method"), with a Latin-hypercube design (McKay, Beckman &
 * Conover 1979, Technometrics 21(2):239-245). For a sink whose rise is linear in its inputs over a small band
 * (h 5 %, where the rise's curvature in h, ~ 1/h, changes the spread by ~u^2 = 0.25 % of itself), the sample's
 * relative standard deviation must agree with first order (JCGM 100:2008 eq. 10) within its sampling error,
 * sqrt(1 / (2 (n - 1))) relative (normal theory). The sinks are invented.
 */
import { describe, expect, it } from 'vitest';
import { sinkSensitivity } from '../../src/compare/sink-sensitivity.js';
import { studySink } from '../../src/fd/index.js';
import { sinkCase } from '../sink/support/sink-case.js';

const sink = sinkCase({
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
// Coarse grids keep the test fast (200 solves of the coarsest grid); the agreement holds on any grid.
const options = { cellSize: 0.004, plateLayers: 1, finLayers: 2 };

describe('the sink uncertainty sample', () => {
  it('a linear sink with a small band: the sample agrees with first order within sampling error', () => {
    const small = { ...sink, uncertainty: [{ key: 'convection.h', relative: 0.05, given: '5 %' }] };
    const r = sinkSensitivity(small, studySink(small, options), { when: 'always', n: 200, seed: 1 })!;
    const u = r.uncertainty;
    const sample = u.sample!;
    expect(sample.n).toBe(200);
    expect(sample.samplingError).toBeCloseTo(sample.relative / Math.sqrt(2 * 199), 12);
    // Within twice the sampling error (about 95 % for a normal estimate): the criterion `agrees` states.
    expect(Math.abs(sample.relative - u.firstOrder)).toBeLessThanOrEqual(2 * sample.samplingError);
    expect(sample.agrees).toBe(true);
    expect(u.method).toBe('first-order');
    expect(u.relative).toBe(u.firstOrder);
    // The sample's band straddles the rise; the rise ~ 1/h makes it lean up a little, never past first order x 1.2.
    const rise = u.low_K / (1 - u.firstOrder);
    expect(sample.low_K).toBeLessThan(rise);
    expect(sample.high_K).toBeGreaterThan(rise);
    expect(u.note).toMatch(/confirmed by a Latin-hypercube sample of 200 \(seed 1, fd-3d on the study's coarsest grid/);
  }, 60_000);

  it('the same seed gives the same sample', () => {
    const small = { ...sink, uncertainty: [{ key: 'convection.h', relative: 0.05, given: '5 %' }] };
    const study = studySink(small, options);
    const a = sinkSensitivity(small, study, { when: 'always', n: 20, seed: 7 })!;
    const b = sinkSensitivity(small, study, { when: 'always', n: 20, seed: 7 })!;
    expect(a.uncertainty.sample).toEqual(b.uncertainty.sample);
  }, 30_000);

  it('auto draws it for a band over 20 % within the budget; never does not', () => {
    // Default h 25 % on this sink: |S_h| 0.93, a first-order band of 23 %.
    const study = studySink(sink, options);
    const auto = sinkSensitivity(sink, study, { when: 'auto', n: 50, seed: 1 })!;
    expect(auto.uncertainty.firstOrder).toBeGreaterThan(0.2);
    expect(auto.uncertainty.sample).not.toBeNull();
    // rise ~ 1/h: over +-25 % its spread exceeds first order (Jensen), so the two may disagree; the band then says so.
    if (!auto.uncertainty.sample!.agrees) expect(auto.uncertainty.method).toBe('latin-hypercube');
    const never = sinkSensitivity(sink, study, { when: 'never', n: 50, seed: 1 })!;
    expect(never.uncertainty.sample).toBeNull();
    expect(never.uncertainty.note).toMatch(/no sample drawn \(switched off\)/);
  }, 60_000);
});
