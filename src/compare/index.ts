/** Public entry of src/compare: what the other layers import. */
export { signedPercentText } from './percent-text.js';
export { CAUTIONS, CHART_CAUTION } from './cautions.js';
export { runCheck } from './check.js';
export type { CheckOptions } from './check.js';
export type { CheckReport, NotApplicable, ModelId, ShortcutId, Verdict, ReferenceResult, Flag, ModelResult } from './types.js';
export { modelProfiles } from './model-profiles.js';
export type { ModelProfile, ModelProfiles } from './model-profiles.js';
export { describeH, describeTip, describeCase } from './describe-case.js';
export { formatCheck } from './format-check.js';
export { runSolve } from './solve.js';
export type { SolveReport } from './solve.js';
export { runSolve2D } from './solve2d.js';
export type { Solve2DReport } from './solve2d.js';
export { pointPosition } from './solve.js';
export { solve2dUnsupported } from './solve2d.js';
