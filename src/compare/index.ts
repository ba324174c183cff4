/** The compare layer's public API: what the other layers import. */
export { CAUTIONS, CHART_CAUTION } from './cautions.js';
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
