/**
 * Automatic choice of the 2-D linear solver by grid shape.
 *
 * Banded Cholesky costs ~ N w^2 / 2 multiply-adds and N (w + 1) doubles of storage (w = nodesY + 1):
 * unbeatable on thin grids (few nodes across).
 */
import { bandedCholeskySolver } from './bandedCholesky.js';
import type { Solver2D, System2D } from './stencil9.js';

export const autoSolver2D: Solver2D = (system: System2D) => bandedCholeskySolver(system);
