/** The compare layer's public API: what the other layers import. */
export { CAUTIONS, CHART_CAUTION, SINK_CHART_CAUTION } from './cautions.js';
export { sinkCautions } from './sink-flags.js';
export { runCheck } from './check.js';
export { describeCase, describeH, describeTip } from './describe-case.js';
export { formatCheck } from './format-check.js';
export { modelProfiles } from './model-profiles.js';
export { pointPosition, runSolve } from './solve.js';
export { runSolve2D } from './solve2d.js';
export type { CheckOptions } from './check.js';
export type { ModelProfile, ModelProfiles } from './model-profiles.js';
export type { SolveReport } from './solve.js';
export type { Solve2DReport } from './solve2d.js';
export type { CheckReport, Flag, ModelId, ModelResult, NotApplicable, ReferenceResult, ShortcutId, Verdict } from './types.js';
export { signedPercentText } from './percent-text.js';
export {
  runSinkCheck,
  runSinkCheckWith,
  type SinkCheckRun,
  sinkCheckFrom,
  judgeSinkReference,
  type SinkCheckOptions,
  type SinkReferenceSource,
} from './sink-check.js';
export { sinkShortcuts, SINK_SHORTCUT_IDS, type SinkShortcutId, type SinkShortcutResult, type SinkShortcuts } from './sink-models.js';
export { formatSinkCheck, describeSink } from './format-sink-check.js';
export { formatSinkSolve } from './format-sink-solve.js';
export { sinkFinPrediction, type SinkFinPrediction } from './sink-fin-prediction.js';
export { sinkSolveReport, type SinkSolveFin, type SinkSolveReport, type SinkSolveSource } from './sink-solve.js';
export { resolvedSinkReference, resolvedSinkStudy, resolveSinkStudyOn, SINK_REFINEMENT_BUDGET, type SinkStudyAhead } from './sink-resolve.js';
export { sheetReductionRow, SHEET_DRIFT_BUDGET } from './sink-sheet-row.js';
export type { SinkAssumptionRow, SinkCheckReport, SinkFinReport, SinkModelRow, SinkReferenceResult, SinkSourceReport } from './sink-types.js';
export { fractionWords, uncertaintyLines, type UncertaintyText } from './format-uncertainty.js';
export type { Sensitivity, UncertaintyBand, UncertaintySample } from './types.js';
export {
  comparisonCsv,
  comparisonTable,
  formatComparison,
  type CaseOutcome,
  type ComparisonCell,
  type ComparisonRow,
  type ComparisonTable,
} from './compare-cases.js';
