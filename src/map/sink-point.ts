/**
 * A heat-sink map point: `fincheck check`'s sink pipeline (runSinkCheck) on the point's case, with the fd-3d
 * reference on its default three grids and, where their GCI is above a tenth of the tolerance, the cheaper of
 * check's refinements (twice the layers, about 2x the unknowns; compare/sink-resolve.ts), without the ledger's
 * sheet-reduction study and the sensitivities; what the map keeps of it. A point still above has verdicts
 * `unresolved` (crossed on the charts), as in `check`.
 */
import type { HeatSinkCase } from '../case/index.js';
import { resolvedSinkStudy, runSinkCheck, type SinkCheckReport } from '../compare/index.js';
import type { MapModelId, PointModel, PointResult } from './types.js';

export async function sinkPointReport(c: HeatSinkCase, tolerance: number): Promise<SinkCheckReport> {
  return runSinkCheck(c, (s) => resolvedSinkStudy(s, tolerance, 1), { tolerance, sheetDrift: false, sensitivities: false });
}

export function pointFromSinkReport(index: number, x: number, y: number, report: SinkCheckReport, wanted: readonly MapModelId[]): PointResult {
  const total = report.sources.reduce((s, q) => s + q.power_W, 0);
  const models: PointModel[] = [];
  for (const id of wanted) {
    const m = report.models.find((r) => r.model === id);
    if (m) {
      models.push({
        model: m.model,
        heatRate_W: total,
        efficiency: m.overallEfficiency,
        drift: m.drift,
        verdict: m.verdict,
        sinkResistance_KperW: m.sinkResistance_KperW,
        worstSource: m.worstSource,
      });
    }
  }
  const ref = report.reference;
  return {
    index,
    x,
    y,
    biot: null,
    mL: null,
    reference: {
      model: 'fd-3d',
      heatRate_W: total,
      efficiency: report.overallEfficiency,
      discretizationError: ref.discretizationError ?? Number.POSITIVE_INFINITY,
      resolved: ref.resolved,
      sinkResistance_KperW: report.sinkResistance_KperW,
      maxTemperature_degC: Math.max(...report.sources.map((s) => s.maxTemperature_degC)),
    },
    models,
  };
}
