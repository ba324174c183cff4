/**
 * What the heat-sink charts are drawn from: the sink check (its fd-3d reference resolved as `check` resolves it,
 * the array shortcuts, the verdicts), the reference study itself (plate view, heat per fin, temperature up each
 * fin) and the uniform-base shortcut's fin (compare/sink-fin-prediction.ts).
 */
import type { HeatSinkCase } from '../case/index.js';
import { resolvedSinkReference, runSinkCheckWith, sinkFinPrediction, type SinkCheckReport, type SinkFinPrediction } from '../compare/index.js';
import type { SinkStudy } from '../fd/index.js';

export const SINK_PLOT_KINDS = ['profile', 'plate', 'fin-heat', 'sensitivity'] as const;
export type SinkPlotKind = (typeof SINK_PLOT_KINDS)[number];

export interface SinkPlotInput {
  case: HeatSinkCase;
  report: SinkCheckReport;
  study: SinkStudy;
  prediction: SinkFinPrediction | null;
}

/** `sensitivities`: also the check's sensitivities and band (fd-3d re-solves, seconds; default false: the charts need none). */
export async function sinkPlotInput(c: HeatSinkCase, tolerance: number, sensitivities = false): Promise<SinkPlotInput> {
  const run = await runSinkCheckWith(c, resolvedSinkReference(tolerance), { tolerance, sensitivities });
  return { case: c, report: run.report, study: run.study, prediction: sinkFinPrediction(c, run.shortcuts) };
}

/** The fins whose roots are hottest and coolest by fd-3d (the first of equals), or null without fins. */
export function hottestAndCoolestFins(study: SinkStudy): { hottest: number; coolest: number } | null {
  if (study.fins.length === 0) return null;
  let hottest = 0;
  let coolest = 0;
  study.fins.forEach((f, k) => {
    if (f.rootTemperature_degC > (study.fins[hottest]?.rootTemperature_degC ?? -Infinity)) hottest = k;
    if (f.rootTemperature_degC < (study.fins[coolest]?.rootTemperature_degC ?? Infinity)) coolest = k;
  });
  return { hottest, coolest };
}
