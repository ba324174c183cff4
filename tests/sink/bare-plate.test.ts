/**
 * fd-3d on a bare plate (array.count 0) against the spreading series for isoflux rectangular sources on a plate
 * with a uniform h on the opposite face and adiabatic edges: Muzychka, Culham & Yovanovich (2003), "Thermal
 * spreading resistance of eccentric heat sources on rectangular flux channels", J. Electron. Packag.
 * 125(2):178-185 (cos series in x and y, superposed for several sources). The values were computed with that
 * series by tests/reference/spreading_series.py (2500 x 2500 terms; truncation below 2e-7 K).
 * Plate a = b = 40 mm, t = 3 mm, k = 170 W/(m K), h = 300 W/(m^2 K), Q = 10 W (invented data).
 */
import { describe, expect, it } from 'vitest';
import { fitObservedOrder, studySink } from '../../src/fd/index.js';
import { sinkCase, type SourceInputs } from './support/sink-case.js';

const plate = [0.04, 0.04, 0.003] as const;
const bare = (sources: SourceInputs[]) => sinkCase({ plate, kPlate: 170, hPlate: 300, sources });

describe.each([
  // name, centre, size, mean rise over the source (K), Muzychka et al. 2003 series via spreading_series.py
  ['centred square 8 x 8 mm', [0.02, 0.02], [0.008, 0.008], 25.138826],
  ['near a corner, 8 x 12 mm at (8, 10) mm', [0.008, 0.01], [0.008, 0.012], 27.632964],
  ['strip 4 x 40 mm across the plate', [0.02, 0.02], [0.004, 0.04], 22.512852],
] as const)('bare plate, %s (Muzychka, Culham & Yovanovich 2003)', (_name, centre, size, series) => {
  const study = studySink(bare([{ centre, size, power: 10 }]));
  const source = study.sources[0]!;
  const refinement = source.refinement!;

  it('the Richardson-extrapolated mean rise is within 1e-3 of the series', () => {
    // 1e-3: the contract's tolerance for the bare plate; measured 1.4e-5 to 4.1e-5.
    expect(Math.abs(refinement.extrapolated - series) / series).toBeLessThan(1e-3);
  });

  it("the finest grid's GCI bounds its actual error", () => {
    const actual = Math.abs(source.meanRise_K - series) / series;
    expect(source.discretizationError!).toBeGreaterThan(actual);
  });

  it('converges with an observed order near 2 (the flux jump at the source edges lowers it a little)', () => {
    // Errors against the series on the three grids. The isoflux edge on the boundary makes the temperature
    // gradient singular (logarithmically) along the source's edges; measured orders 1.71 to 1.77.
    const errors = refinement.values.map((v) => v - series);
    const { order } = fitObservedOrder(refinement.sizes, errors);
    expect(order).toBeGreaterThan(1.5);
    expect(order).toBeLessThan(2.2);
  });

  it('balances energy to round-off and puts all the heat out through the top', () => {
    // 1e-9: the contract's energy balance; the CG residual target is 1e-10 relative.
    expect(study.energyBalance).toBeLessThan(1e-9);
    expect(study.plateHeat_W).toBeCloseTo(10, 8);
    expect(study.finsHeat_W).toBe(0);
    expect(study.fins).toEqual([]);
  });
});

describe('several sources on a bare plate', () => {
  const a: SourceInputs = { centre: [0.012, 0.014], size: [0.008, 0.008], power: 10 };
  const b: SourceInputs = { centre: [0.028, 0.026], size: [0.006, 0.01], power: 6 };

  it('match the superposed series (Muzychka, Culham & Yovanovich 2003)', () => {
    // tests/reference/spreading_series.py with both sources: 37.866368005 K over A, 35.025526130 K over B.
    const study = studySink(bare([a, b]));
    const [ra, rb] = study.sources.map((s) => s.refinement!.extrapolated) as [number, number];
    expect(Math.abs(ra - 37.866368005) / 37.866368005).toBeLessThan(1e-3);
    expect(Math.abs(rb - 35.02552613) / 35.02552613).toBeLessThan(1e-3);
  });

  it('superpose exactly on one grid (the model is linear)', () => {
    // A source of zero power keeps the grid lines of the other case, so the three solves share one grid and
    // the rises must add to the solver's precision (relative residual 1e-10; 1e-8 leaves room).
    const one = { grids: 1 };
    const both = studySink(bare([a, b]), one);
    const onlyA = studySink(bare([a, { ...b, power: 0 }]), one);
    const onlyB = studySink(bare([{ ...a, power: 0 }, b]), one);
    for (let s = 0; s < 2; s++) {
      const sum = onlyA.sources[s]!.meanRise_K + onlyB.sources[s]!.meanRise_K;
      expect(Math.abs(both.sources[s]!.meanRise_K - sum) / sum).toBeLessThan(1e-8);
    }
  });
});

describe('special cases with a closed form of their own', () => {
  it('a strip across the whole plate matches the strip series (Yovanovich, Muzychka & Culham 1999)', () => {
    // The strip special case (d = b: the field depends on x and z only), a single series summed to 2e6 terms by
    // tests/reference/strip_spreading.py: 22.512852434 K, independent of the double series above (which gives
    // 22.512852). 1e-3: the contract's tolerance for the bare plate.
    const strip = studySink(bare([{ centre: [0.02, 0.02], size: [0.004, 0.04], power: 10 }])).sources[0]!.refinement!.extrapolated;
    expect(Math.abs(strip - 22.512852434) / 22.512852434).toBeLessThan(1e-3);
  });

  it('a source over the whole underside is 1-D: theta = Q (t/k + 1/h) / (a b) on every grid', () => {
    // The series' A0 term alone (Muzychka, Culham & Yovanovich 2003: every other coefficient vanishes when the
    // source covers the plate). The cell-centred scheme is exact for a field linear in z (the half cell in
    // series with h at the top), so every grid gives it to the solver's precision (relative residual 1e-10).
    const [a, b, t] = plate;
    const exact = (10 * (t / 170 + 1 / 300)) / (a * b);
    const study = studySink(bare([{ centre: [a / 2, b / 2], size: [a, b], power: 10 }]));
    for (const v of study.sources[0]!.refinement!.values) expect(Math.abs(v - exact) / exact).toBeLessThan(1e-9);
    expect(Math.abs(study.sources[0]!.maxTemperature_degC - 20 - exact) / exact).toBeLessThan(1e-9);
  });
});
