/**
 * The ledger row of the reference's own reduction (heat-sink.md, issue 11): fd-3d represents each plate fin as a
 * 2-D conducting sheet (temperature uniform across its thickness) and each pin as a 1-D fin. Where the fins are
 * rectangular plate fins, the row measures the sheet's drift against the same sink with the fins as full 3-D cells
 * (src/fd sheetReductionDrift: a cells study on the default grids against the reference's own study, on each
 * source's Richardson-extrapolated mean rise), on the hottest source as the other rows are; its two GCIs say
 * whether the drift is resolved. Elsewhere the row says why it is not measured. A cells study costs about as much
 * as the reference, so it is made only when its finest grid stays within SHEET_DRIFT_BUDGET unknowns.
 */
import type { HeatSinkCase } from '../case/index.js';
import { sheetReductionDrift, sinkStudyUnknowns, type SinkStudy, type SinkStudyOptions } from '../fd/index.js';
import type { SinkAssumptionRow } from './sink-types.js';

/** Finest-grid unknowns the cells study may have (about 800 B each: 320 MB). */
export const SHEET_DRIFT_BUDGET = 400_000;

const ASSUMPTION = "the reference's fins as conducting sheets (thin fin across the thickness; pins as 1-D fins)";

/** The cells study the row compares with (default grids), for a caller that makes it ahead (sink-check.ts, on its second thread). */
export const SHEET_CELLS_STUDY: SinkStudyOptions = { finRepresentation: 'cells' };

/** Why the row is not measured on this case, or null when it is (a cells study within the budget). */
function notMeasured(c: HeatSinkCase): string | null {
  if (c.fin === null) return 'a bare plate has no fins';
  if (c.array.kind === 'pins')
    return 'not measured: each pin is a 1-D fin (its root spread over the square of equal area), and full 3-D cells are built for rectangular plate fins only';
  if (c.fin.profile.kind !== 'rectangular')
    return `not measured: full 3-D cells are built for rectangular plate fins only, not ${c.fin.profile.kind} ones`;
  const unknowns = sinkStudyUnknowns(c, SHEET_CELLS_STUDY);
  if (unknowns > SHEET_DRIFT_BUDGET)
    return `not measured: the fins as full 3-D cells would need ${unknowns.toLocaleString('en-US')} unknowns on the finest grid (budget ${SHEET_DRIFT_BUDGET.toLocaleString('en-US')})`;
  return null;
}

/** Whether sheetReductionRow makes a cells study for this case (SHEET_CELLS_STUDY). */
export function sheetRowMeasures(c: HeatSinkCase): boolean {
  return notMeasured(c) === null;
}

/** `cells`: the cells study (SHEET_CELLS_STUDY) when the caller has made it already; without it, it is made here. */
export function sheetReductionRow(c: HeatSinkCase, study: SinkStudy, cells?: SinkStudy): SinkAssumptionRow {
  const row = (drift: number | null, method: string): SinkAssumptionRow => ({ assumption: ASSUMPTION, drift, madeBy: [], method });
  if (c.fin === null) return row(null, 'a bare plate has no fins');
  if (study.fins.length === 0) return row(null, 'not measured: the reference reports no fins');
  const why = notMeasured(c);
  if (why !== null) return row(null, why);
  const unknowns = sinkStudyUnknowns(c, SHEET_CELLS_STUDY);
  const drift = sheetReductionDrift(c, {}, study, cells);
  let j = 0;
  study.sources.forEach((s, k) => {
    if (s.meanRise_K > (study.sources[j]?.meanRise_K ?? -Infinity)) j = k;
  });
  const d = drift.sources[j];
  if (d === undefined) return row(null, 'not measured: no source');
  const g = (e: number | null) => (e === null ? 'n/a' : e.toExponential(1));
  const resolved = d.sheetGci !== null && d.cellsGci !== null && Math.abs(d.drift) > Math.max(d.sheetGci, d.cellsGci);
  return row(
    d.drift,
    `fd-3d with the fins as sheets against the same sink with the fins as full 3-D cells (${unknowns.toLocaleString('en-US')} unknowns on its finest grid), on the extrapolated mean rise of ${d.name} (the hottest source); GCIs ${g(d.sheetGci)} (sheets) and ${g(d.cellsGci)} (cells): ${resolved ? 'the drift is larger than both' : 'the drift is within the discretisation error'}`,
  );
}
