/** The design layer's public API (design-questions.md): optimum dimensions of a fin against the reference. */
export { optimizeFin, type Objective, type OptimizeCurve, type OptimizeRequest, type OptimizeResult, type OptimumPoint } from './optimize-fin.js';
export { amountOf, finVolume, profileArea, type Keep } from './fin-amount.js';
export { brentMinimize, type MinimizeOptions, type MinimizeResult } from './brent-minimize.js';
export {
  optimizeSink,
  type OptimizeSinkRequest,
  type OptimizeSinkResult,
  type SinkCurve,
  type SinkKeep,
  type SinkObjective,
  type SinkOptimumPoint,
} from './optimize-sink.js';
export type { SinkShortcutModel } from './sink-candidates.js';
