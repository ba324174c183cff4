/** Public API of the 1-D mesh layer: fin geometry from a case, node sets and the vertex-centred mesh. */
export type { FinGeometry1D, FinShape1D, Grading, GradingEnd, Grid1DSpec, Mesh1D } from './types.js';
export type { TaperExponent, TaperSpec } from './geometry1d.js';
export { finGeometry, geometryOfProfile, taperedGeometry, annularGeometry, tabulatedGeometry } from './geometry1d.js';
export { buildMesh1D, gridNodes, mergeBreakpoints, allocateCells } from './grid1d.js';
export { sectionOf } from './grid2d-section.js';
export { radiusAt, boundaryNodes, buildGrid2D } from './grid2d.js';
export type { Grid2D, BoundaryName } from './grid2d.js';
export type { Section2D } from './grid2d-section.js';
export { sinkLayout, rootSize, isPinProfile, finLength } from './sink-layout.js';
export type { SinkLayout, Rectangle } from './sink-layout.js';
export { buildSinkGrid, sinkGridCells } from './sink-grid.js';
export type { SinkGrid, SinkGridSpec, CellBlock } from './sink-grid.js';
