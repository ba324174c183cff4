/**
 * The 2-D linear solver, chosen by grid shape, prepared once (factor or multigrid hierarchy) and reusable
 * for any right-hand side with the same matrix.
 *
 * Cost models (multiply-adds; N nodes, w = short side + 1):
 *   banded Cholesky   ~ N w^2 / 2 to factor, 2 N w per solve, N (w + 1) doubles of storage;
 *   MG-preconditioned CG ~ CG_WORK_PER_NODE x N in the same units (6-9 iterations on the fin grids of
 *   tests/fd2d), storage ~ 30 N doubles.
 * The banded factor is used while it is the cheaper of the two and its storage stays below
 * MAX_BANDED_BYTES; the short direction is numbered fastest (the matrix is transposed when the grid has
 * fewer nodes along than across).
 */
import type { BandedFactor } from './banded-factor.js';
import { factorBanded, solveWithRefinement } from './banded-solve.js';
import { buildMultigrid, type Multigrid } from './multigrid.js';
import { solveMgPcg } from './pcg.js';
import { transposeField, transposeStencil9, type Solver2D, type System2D } from './stencil9.js';

export type SolverMethod = 'banded-cholesky' | 'mg-pcg';

export interface PreparedSolver2D {
  readonly method: SolverMethod;
  /** Solves a system with the matrix given to prepareSolver2D (and its row sums); any right-hand side. */
  solve(system: System2D): Float64Array;
  /** Says no more solves will follow: a banded factor's storage may then serve the next factorisation. */
  release(): void;
}

/**
 * Cost of a full MG-PCG solve per node, in units of one banded multiply-add. Measured on thin plate-fin
 * grids (CPU time, same machine): MG-PCG ~0.9 us per node, the banded factor ~1.7 ns per multiply-add;
 * the two met at 2000 x 30 nodes (w^2/2 = 481): 50 ms each. Banded wins below (2000 x 20: 20 ms against
 * 94 ms), MG above (2000 x 50: 86 ms against 194 ms; 500 x 80: 32 ms against 181 ms).
 */
const CG_WORK_PER_NODE = 500;
export const MAX_BANDED_BYTES = 256 * 1024 * 1024;

export function chooseSolverMethod(nodesX: number, nodesY: number): SolverMethod {
  const short = Math.min(nodesX, nodesY);
  const n = nodesX * nodesY;
  const w = short + 1;
  const bandedWork = (n * w * w) / 2;
  const bandedBytes = n * (w + 2) * 8;
  return bandedWork <= CG_WORK_PER_NODE * n && bandedBytes <= MAX_BANDED_BYTES ? 'banded-cholesky' : 'mg-pcg';
}

export function prepareSolver2D(system: System2D, method: SolverMethod | 'auto' = 'auto'): PreparedSolver2D {
  const { nodesX: nx, nodesY: ny } = system.matrix;
  const chosen = method === 'auto' ? chooseSolverMethod(nx, ny) : method;
  switch (chosen) {
    case 'banded-cholesky': {
      if (nx >= ny) {
        const factor = factorBanded(system);
        return { method: chosen, solve: (s) => solveWithRefinement(factor, s), release: () => factor.release() };
      }
      // Fewer nodes along than across: factor the transpose (short direction fastest).
      const transposed = transposeSystem(system);
      const factor: BandedFactor = factorBanded(transposed);
      return {
        method: chosen,
        solve: (s) => transposeField(solveWithRefinement(factor, transposeSystem(s, transposed.matrix)), ny, nx),
        release: () => factor.release(),
      };
    }
    case 'mg-pcg': {
      const mg: Multigrid = buildMultigrid(system.matrix);
      return { method: chosen, solve: (s) => solveMgPcg(s, {}, mg).x, release: () => undefined };
    }
    default: {
      const never: never = chosen;
      throw new Error(`prepareSolver2D: unknown method ${String(never)}`);
    }
  }
}

/** The default solver: automatic choice, prepared and used once. */
export const autoSolver2D: Solver2D = (system: System2D) => {
  const prepared = prepareSolver2D(system);
  const x = prepared.solve(system);
  prepared.release();
  return x;
};

function transposeSystem(s: System2D, matrix = transposeStencil9(s.matrix)): System2D {
  const { nodesX: nx, nodesY: ny } = s.matrix;
  const rhs = transposeField(s.rhs, nx, ny);
  return s.excess === undefined ? { matrix, rhs } : { matrix, rhs, excess: transposeField(s.excess, nx, ny) };
}
