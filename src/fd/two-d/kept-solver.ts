/**
 * The automatic 2-D solver of the last linear section solved, kept for the next system with the same matrix and row
 * sums (any right-hand side): the discrete adjoint of a linear fin (adjoint.ts) solves the matrix that the study's
 * finest grid has just solved (A^T = A), and preparing fast diagonalisation again (the Kronecker factors, the
 * eigen-decomposition across, the pivots along) was about a tenth of a check's 2-D work. Handing back the same
 * prepared solver gives the same solution, bit for bit, as preparing it again (the preparation reads only the matrix
 * and its row sums, both compared entry by entry here). One slot, and only a fast-diagonalisation solver (its storage
 * is a few node arrays); a banded factor is released at once as before, so that its band serves the next
 * factorisation (banded-cholesky.ts). Units are the system's (W/K, K, W per unit depth).
 */
import { prepareSolver2D, type PreparedSolver2D } from '../linear-algebra/auto-solver.js';
import type { Stencil9, System2D } from '../linear-algebra/stencil9.js';

let kept: { matrix: Stencil9; excess: Float64Array | undefined; prepared: PreparedSolver2D } | null = null;

function same(a: Float64Array, b: Float64Array): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  for (let p = 0; p < a.length; p++) if (a[p] !== b[p]) return false;
  return true;
}

function sameSystem(a: Stencil9, aExcess: Float64Array | undefined, system: System2D): boolean {
  const b = system.matrix;
  if (a.nodesX !== b.nodesX || a.nodesY !== b.nodesY) return false;
  if ((aExcess === undefined) !== (system.excess === undefined)) return false;
  if (aExcess !== undefined && !same(aExcess, system.excess as Float64Array)) return false;
  return same(a.diag, b.diag) && same(a.east, b.east) && same(a.north, b.north) && same(a.northEast, b.northEast) && same(a.southEast, b.southEast);
}

/** prepareSolver2D(system, 'auto'), or the kept solver when it was prepared for the same matrix and row sums. */
export function keptSolver2D(system: System2D): PreparedSolver2D {
  if (kept !== null && kept.prepared.method === 'separable' && sameSystem(kept.matrix, kept.excess, system)) return kept.prepared;
  return prepareSolver2D(system, 'auto');
}

/**
 * Done with `prepared` (from keptSolver2D, for `system`): a fast-diagonalisation solver is kept for the next system
 * with the same matrix (the one kept before it is dropped), any other released.
 */
export function doneWith(prepared: PreparedSolver2D, system: System2D): void {
  if (prepared.method === 'separable') {
    if (kept !== null && kept.prepared !== prepared) kept.prepared.release();
    kept = { matrix: system.matrix, excess: system.excess, prepared };
  } else {
    prepared.release();
  }
}
