/** The plots layer's public API: what the other layers import. */
export { plotSvg } from './draw.js';
export { REMAINING_FRACTION } from './flux-chart.js';
export { alongAxisLabel, referenceWords, relativeError, sig, signedPercent, unitsOf } from './labels.js';
export { PLOT_KINDS, checkPlotInput, fieldStudy, heatmapAvailability } from './sources.js';
export type { PlotSources } from './draw.js';
export type { ChartSize, CheckPlotInput } from './profile-chart.js';
export type { PlotKind } from './sources.js';
export { finSensitivityInput, sensitivityChartSpec, type SensitivityChartInput } from './sensitivity-chart.js';
export { overlaidProfilesSvg, type OverlaidCase } from './overlay-chart.js';
export { SINK_PLOT_KINDS, hottestAndCoolestFins, sinkPlotInput } from './sink-input.js';
export type { SinkPlotInput, SinkPlotKind } from './sink-input.js';
export { sinkPlotAvailability, sinkPlotSvg } from './sink-draw.js';
export { sinkSensitivityInput } from './sink-sensitivity-chart.js';
export { sinkPlateChart, sinkPlateChartSpec } from './sink-plate-chart.js';
export { sinkFinHeatChartSpec } from './sink-fin-heat-chart.js';
export { sinkFinProfileChartSpec } from './sink-fin-profile-chart.js';
export { optimizeChartSpec, type OptimizeChartInput } from './optimize-chart.js';
