/**
 * The drift of the sheet reduction (each rectangular plate fin a thin conducting sheet, temperature uniform
 * across its thickness) against the same sink with its fins as full 3-D cells on the plate grid:
 *   drift_s = (rise_sheet − rise_cells) / rise_cells
 * on each source's Richardson-extrapolated mean rise (both from three-grid studies), with both GCIs so that a
 * caller can tell a drift from discretisation error. For a ledger row and the tests; costs two studies.
 */
import type { HeatSinkCase } from '../../case/index.js';
import type { SinkStudy } from './sink-study-types.js';
import { studySink, type SinkStudyOptions } from './study-sink.js';

export interface SheetReductionDrift {
  /** Per source: relative drift of the extrapolated mean rise, and the two studies' GCIs. */
  sources: { name: string; drift: number; sheetGci: number | null; cellsGci: number | null }[];
}

/**
 * `sheet`: a sheet study already made (e.g. a check's reference, perhaps on finer grids); its extrapolated rises
 * are compared with a cells study on `options`' grids. Without it both studies are made on the same grids.
 * `cellsStudy`: that cells study when it was made already (studySink(c, { ...options, finRepresentation: 'cells' })).
 */
export function sheetReductionDrift(
  c: HeatSinkCase,
  options: Omit<SinkStudyOptions, 'finRepresentation'> = {},
  sheetStudy?: SinkStudy,
  cellsStudy?: SinkStudy,
): SheetReductionDrift {
  const sheet = sheetStudy ?? studySink(c, { ...options, finRepresentation: 'sheet' });
  const cells = cellsStudy ?? studySink(c, { ...options, finRepresentation: 'cells' });
  return {
    sources: sheet.sources.map((s, k) => {
      const other = cells.sources[k];
      const a = s.refinement?.extrapolated ?? s.meanRise_K;
      const b = other.refinement?.extrapolated ?? other.meanRise_K;
      return { name: s.name, drift: (a - b) / b, sheetGci: s.discretizationError, cellsGci: other.discretizationError };
    }),
  };
}
