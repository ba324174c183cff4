/** Public entry of src/plots: what the other layers import. */
export { relativeError, sig, signedPercent, alongAxisLabel, referenceWords } from './labels.js';
export type { CheckPlotInput, ChartSize } from './profile-chart.js';
export { checkPlotInput, fieldStudy, heatmapAvailability, PLOT_KINDS } from './sources.js';
export type { PlotKind } from './sources.js';
export { REMAINING_FRACTION } from './flux-chart.js';
export { plotSvg } from './draw.js';
export type { PlotSources } from './draw.js';
