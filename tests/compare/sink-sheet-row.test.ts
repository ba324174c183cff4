/**
 * The ledger row of the reference's own reduction (compare/sink-sheet-row.ts): where fd-3d makes the fins
 * conducting sheets, the check's ledger states the drift against the same sink with the fins as full 3-D cells,
 * the number sheetReductionDrift gives (tests/sink/limits.test.ts shows that drift on this small sink against the
 * cells and against the pitch-cell scripts); where the reduction cannot be measured the row says why. The sinks
 * are invented.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/index.js';
import { runSinkCheck, SHEET_DRIFT_BUDGET, sheetReductionRow } from '../../src/compare/index.js';
import { sheetReductionDrift, sinkStudyUnknowns, studySink } from '../../src/fd/index.js';
import { plateFin, sinkCase } from '../sink/support/sink-case.js';

beforeAll(async () => {
  await initBessel();
});

// The small sink of tests/sink/limits.test.ts: four 2 mm fins, 20 mm high, on a 30 x 20 x 3 mm plate.
const small = sinkCase({
  plate: [0.03, 0.02, 0.003],
  kPlate: 200,
  fin: plateFin(0.02, 0.002, 0.02),
  array: { kind: 'plates', count: 4, pitch: 0.007 },
  hPlate: 30,
  h: { kind: 'uniform', h: 60 },
  sources: [{ centre: [0.011, 0.009], size: [0.008, 0.008], power: 10 }],
});
const ROW = /fins as conducting sheets/;

describe('the sheet reduction in the check ledger', () => {
  it('states the drift against full 3-D cells, the number sheetReductionDrift gives on the same grids', async () => {
    const report = await runSinkCheck(small, (c) => studySink(c), { tolerance: 0.1 });
    const row = report.assumptions.find((a) => ROW.test(a.assumption));
    expect(row).toBeDefined();
    const direct = sheetReductionDrift(small).sources[0]!;
    // Same studies (default grids, both representations): the same number to round-off.
    expect(row!.drift).toBeCloseTo(direct.drift, 12);
    // Below the two GCIs on this sink (limits.test.ts: measured -2.8e-4, GCIs about 1e-3), and the row says so.
    expect(Math.abs(row!.drift!)).toBeLessThan(2e-3);
    expect(row!.method).toMatch(/full 3-D cells .* GCIs .* \(sheets\) and .* \(cells\)/);
    expect(row!.madeBy).toEqual([]);
  }, 120_000);

  it('is left out of a check that does not ask for it (map points)', async () => {
    const report = await runSinkCheck(small, (c) => studySink(c), { tolerance: 0.1, sheetDrift: false });
    expect(report.assumptions.some((a) => ROW.test(a.assumption))).toBe(false);
  }, 120_000);

  it('says why it is not measured: pins, a tapered profile, a bare plate, a cells grid over the budget', () => {
    const study = studySink(small, { grids: 1 });
    const pins = { ...small, array: { kind: 'pins' as const, rows: 2, columns: 2, pitch: [0.01, 0.008] as const, pattern: 'inline' as const } };
    expect(sheetReductionRow(pins, study)).toMatchObject({ drift: null, method: expect.stringMatching(/each pin is a 1-D fin/) });
    const tapered = {
      ...small,
      fin: { ...small.fin!, profile: { kind: 'trapezoidal' as const, length: 0.02, baseThickness: 0.002, tipThickness: 0.001, width: 0.02 } },
    };
    expect(sheetReductionRow(tapered, study)).toMatchObject({
      drift: null,
      method: expect.stringMatching(/rectangular plate fins only, not trapezoidal/),
    });
    const bare = { ...small, fin: null };
    expect(sheetReductionRow(bare, study)).toMatchObject({ drift: null, method: 'a bare plate has no fins' });
    // A large sink: its cells grid is counted before anything is allocated.
    const large = sinkCase({
      plate: [0.3, 0.2, 0.01],
      kPlate: 200,
      fin: plateFin(0.05, 0.0015, 0.2),
      array: { kind: 'plates', count: 80, pitch: 0.0035 },
      hPlate: 30,
      sources: [{ centre: [0.15, 0.1], size: [0.02, 0.02], power: 100 }],
    });
    expect(sinkStudyUnknowns(large, { finRepresentation: 'cells' })).toBeGreaterThan(SHEET_DRIFT_BUDGET);
    expect(sheetReductionRow(large, study)).toMatchObject({ drift: null, method: expect.stringMatching(/would need .* unknowns/) });
  });
});
