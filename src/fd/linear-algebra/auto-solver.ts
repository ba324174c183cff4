/**
 * The 2-D linear solver, chosen by grid shape, prepared once (factor or multigrid hierarchy) and reusable
 * for any right-hand side with the same matrix.
 *
 * Cost models (multiply-adds; N nodes, w = short side + 1):
 *   banded Cholesky   ~ N w^2 / 2 to factor, 2 N w per solve, N (w + 1) doubles of storage;
 *   MG-preconditioned CG ~ CG_WORK_PER_NODE x N in the same units (6-9 iterations on the fin grids of
 *   tests/fd2d), storage ~ 30 N doubles.
 *   fast diagonalisation ~ (short side)^3 to prepare, 2 N x short side per solve, for a matrix that is a Kronecker
 *   sum (tensor-form.ts: rectangular cells, coefficients varying the way the cells do), refined.
 * The banded factor is used while it is the cheaper of the first two and its storage stays below
 * MAX_BANDED_BYTES; the short direction is numbered fastest (the matrix is transposed when the grid has
 * fewer nodes along than across). The automatic choice takes fast diagonalisation first when the matrix allows it
 * and the short side is in SEPARABLE_SHORT_SIDE, and falls back to the shape's choice when its refinement does not
 * reach the target.
 */
import type { BandedFactor } from './banded-factor.js';
import { factorBanded, solveWithRefinement } from './banded-solve.js';
import { refineSolution } from './iterative-refinement.js';
import { buildMultigrid, type Multigrid } from './multigrid.js';
import { solveMgPcg } from './pcg.js';
import { prepareSeparable } from './separable-solve.js';
import { tensorForm } from './tensor-form.js';
import { transposeField, transposeStencil9, type Solver2D, type System2D } from './stencil9.js';

export type SolverMethod = 'banded-cholesky' | 'mg-pcg' | 'separable';

export interface PreparedSolver2D {
  /** The method that solved (read after solve(): fast diagonalisation hands over to the band when its refinement fails). */
  readonly method: SolverMethod;
  /** Solves a system with the matrix given to prepareSolver2D (and its row sums); any right-hand side. */
  solve(system: System2D): Float64Array;
  /** Says no more solves will follow: a banded factor's storage may then serve the next factorisation. */
  release(): void;
}

/**
 * Cost of a full MG-PCG solve per node, in units of one banded multiply-add. First measured with the unblocked
 * factor (~1.7 ns per multiply-add: the two met at 2000 x 30, w^2/2 = 481, and the constant was 500). The blocked
 * factor (banded-cholesky.ts) takes ~0.5 ns per multiply-add plus ~130 ns per node, MG-PCG still ~500-600 ns per
 * node; measured again (CPU time, thin plate fin, load ~1-4): 241 x 33 banded 4.7 ms against MG-PCG 9.2 ms,
 * 2000 x 30 21 ms against 36 ms, 1000 x 40 20 ms against 28 ms, 2000 x 40 40 against 41 ms (even), 2000 x 50 74
 * against 60 ms and 500 x 65 44 against 17 ms (MG ahead). The two now meet near w^2/2 = 900 (w = 42).
 */
const CG_WORK_PER_NODE = 900;
export const MAX_BANDED_BYTES = 256 * 1024 * 1024;

export function chooseSolverMethod(nodesX: number, nodesY: number): SolverMethod {
  const short = Math.min(nodesX, nodesY);
  const n = nodesX * nodesY;
  const w = short + 1;
  const bandedWork = (n * w * w) / 2;
  const bandedBytes = n * (w + 2) * 8;
  return bandedWork <= CG_WORK_PER_NODE * n && bandedBytes <= MAX_BANDED_BYTES ? 'banded-cholesky' : 'mg-pcg';
}

/**
 * Nodes across (the short side) for which the automatic choice tries fast diagonalisation. Below 12 a banded
 * factor is as cheap (w^2 / 2 <= 85 multiply-adds a node against ~2 x 2 x 12 for two separable solves and a
 * residual); above 200 its 2 N x short side a solve exceeds multigrid's ~900 a node.
 */
const SEPARABLE_SHORT_SIDE = { min: 12, max: 200 } as const;
/** Refinement steps allowed to fast diagonalisation before the band takes over (one or two are typical). */
const SEPARABLE_REFINEMENTS = 6;

export function prepareSolver2D(system: System2D, method: SolverMethod | 'auto' = 'auto'): PreparedSolver2D {
  const { nodesX: nx, nodesY: ny } = system.matrix;
  const short = Math.min(nx, ny);
  const trySeparable = method === 'separable' || (method === 'auto' && short >= SEPARABLE_SHORT_SIDE.min && short <= SEPARABLE_SHORT_SIDE.max);
  const chosen = method === 'auto' || method === 'separable' ? chooseSolverMethod(nx, ny) : method;
  if (trySeparable) {
    const separable = prepareSeparableSolver(system, () => prepareByShape(system, chosen));
    if (separable !== null) return separable;
  }
  return prepareByShape(system, chosen);
}

/**
 * Fast diagonalisation when the matrix is a Kronecker sum, else null (grids with at least as many nodes along as
 * across: a fixed base of a grid with more nodes across would have to be set apart by rows, which tensor-form.ts
 * does not do). Each solve is refined against the true matrix; when refinement does not reach the round-off floor,
 * `fallback` is prepared and solves from then on.
 */
function prepareSeparableSolver(system: System2D, fallback: () => PreparedSolver2D): PreparedSolver2D | null {
  if (system.matrix.nodesX < system.matrix.nodesY) return null;
  const form = tensorForm(system);
  if (form === null) return null;
  const solver = prepareSeparable(form, system.matrix);
  let handedOver: PreparedSolver2D | null = null;
  return {
    get method(): SolverMethod {
      return handedOver === null ? 'separable' : handedOver.method;
    },
    solve(s: System2D): Float64Array {
      if (handedOver !== null) return handedOver.solve(s);
      const x = solver.solve(s.rhs);
      if (refineSolution((r, out) => solver.solve(r, out), s, x, SEPARABLE_REFINEMENTS, true)) return x;
      handedOver = fallback();
      return handedOver.solve(s);
    },
    release(): void {
      handedOver?.release();
    },
  };
}

/** The banded factor or multigrid, as chooseSolverMethod decided. */
function prepareByShape(system: System2D, chosen: SolverMethod): PreparedSolver2D {
  const { nodesX: nx, nodesY: ny } = system.matrix;
  switch (chosen) {
    case 'separable':
    case 'banded-cholesky': {
      if (nx >= ny) {
        const factor = factorBanded(system);
        return { method: 'banded-cholesky', solve: (s) => solveWithRefinement(factor, s), release: () => factor.release() };
      }
      // Fewer nodes along than across: factor the transpose (short direction fastest).
      const transposed = transposeSystem(system);
      const factor: BandedFactor = factorBanded(transposed);
      return {
        method: 'banded-cholesky',
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
