/** The map layer's public API: what the other layers import. */
export { formatMapSummary } from './format.js';
export { mapJson, mapJsonText } from './json.js';
export { OutputsInterrupted, renderMapFiles } from './outputs.js';
export { MapInterrupted } from './pool.js';
export { progressBar } from './progress.js';
export { prepareMap, runMap } from './run-map.js';
export { StagedFiles } from './staged-files.js';
export type { MapModelId } from './types.js';
export { MANIFEST_NAME, removeFiles, staleFiles } from './manifest.js';
export { runInDisplayUnits } from './display-axis.js';
