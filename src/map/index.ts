/** Public entry of src/map: what the other layers import. */
export type { MapModelId } from './types.js';
export { formatMapSummary } from './format.js';
export { OutputsInterrupted, renderMapFiles } from './outputs.js';
export { MapInterrupted } from './pool.js';
export { progressBar } from './progress.js';
export { prepareMap, runMap } from './run-map.js';
export { MANIFEST_NAME, removeFiles, staleFiles } from './manifest.js';
export { StagedFiles } from './staged-files.js';
