/**
 * Memory of one 3-D sink solve, estimated from its unknowns before anything is allocated:
 * BYTES_PER_UNKNOWN covers the CSR matrix (~8 entries a row, 12 bytes each) and its assembly lists, the line
 * factors, the multigrid levels (Galerkin operators up to ~36 entries a row on the first coarse level, 1/4 to 1/8
 * of the unknowns), the prolongations, the CG vectors and the heat terms. Measured: see bench/run.ts (the 1e6
 * unknowns row prints the peak resident set beside this estimate: 536 to 749 MB measured against 781 MB estimated at 1.02e6 unknowns, Node itself included).
 */
import { ModelNotApplicableError } from '../../errors.js';

export const BYTES_PER_UNKNOWN = 800;
/**
 * A nonlinear sink's Newton solve keeps the Jacobian's values beside the matrix (~7 entries a row) and eight more
 * vectors. Measured at 4.46e5 unknowns (20-fin bench sink, power-law h): 346 MB peak against 307 MB linear, i.e.
 * ~90 bytes an unknown more.
 */
export const NEWTON_BYTES_PER_UNKNOWN = 150;
/** Default limit of one solve, bytes (1 GiB). */
export const DEFAULT_MEMORY_LIMIT = 2 ** 30;

export function sinkMemoryEstimate(unknowns: number, nonlinear = false): number {
  return unknowns * (BYTES_PER_UNKNOWN + (nonlinear ? NEWTON_BYTES_PER_UNKNOWN : 0));
}

/** Throws when a grid would need more than `limit` bytes. */
export function checkSinkMemory(unknowns: number, limit: number, nonlinear = false): void {
  const need = sinkMemoryEstimate(unknowns, nonlinear);
  if (need > limit) {
    const mb = (b: number) => `${Math.round(b / 2 ** 20)} MB`;
    throw new ModelNotApplicableError(
      'fd-3d',
      `the finest 3-D grid has ${unknowns} unknowns and would need about ${mb(need)}, above the limit of ${mb(limit)}: use larger cells or fewer grids`,
    );
  }
}
