/**
 * The preconditioner of the 3-D sink systems: a symmetric multigrid V(1,1) cycle on a hierarchy of
 *   level 0   the sink as assembled;
 *   (fold)    fins as full 3-D cells only: each fin's cells across its thickness summed onto one sheet node
 *             (weight 1), giving the layout of the sheet representation;
 *   level l+1 the plate's cells and the fins' nodes coarsened by pairs in the strongly coupled directions
 *             (semi-coarsening, aggregation.ts), down to at most COARSEST unknowns,
 * with linear transfers P and P^T, the fold's Galerkin operator (galerkin-csr.ts) and below it the merged
 * operators of sink-coarse-operator.ts (the re-discretisation's conductances, the fine sparsity), one forward sweep of line Gauss-Seidel before
 * the coarse correction and one backward sweep after it on every level (line-relaxation.ts: the plate's z
 * columns and the fins' lines along their height; a thin plate couples far more strongly across its thickness
 * than along it), and a dense Cholesky solve on the coarsest level. Backward after forward, restriction the
 * transpose of prolongation and symmetric positive definite coarse operators make the cycle symmetric positive
 * definite, as CG needs (Tatebe 1993, "The multigrid preconditioned
 * conjugate gradient method", NASA CP-3224 [from memory]).
 */
import { coarsenSinkLevel, levelLines, levelUnknowns, prolongAddWith, restrictWith, type SinkLevelGrid } from './aggregation.js';
import { csrResidual, type CsrMatrix } from './csr.js';
import { denseCholesky, type DenseFactor } from './dense-cholesky.js';
import { galerkinCsr } from './galerkin-csr.js';
import { sinkCoarseOperator } from './sink-coarse-operator.js';
import type { Prolongation } from './prolongation.js';
import { buildLineRelaxation, type LineRelaxation, type LineSet } from './line-relaxation.js';

export interface Preconditioner {
  /** z = M^-1 r (r unchanged). */
  apply(r: Float64Array, z: Float64Array): void;
  /** A line describing the method, for reports. */
  readonly method: string;
  /** Unknowns per level, finest first. */
  readonly levels: number[];
  /** Matrix entries per level, finest first (their sum over the first is the operator complexity). */
  readonly entries?: number[];
}

/** Unknowns of the coarsest level, solved by dense Cholesky (~n^3/3 = 2e7 flops at 400). */
const COARSEST = 400;

interface Level {
  a: CsrMatrix;
  relax: LineRelaxation;
  p: Prolongation | null;
  r: Float64Array;
  x: Float64Array;
  b: Float64Array;
}

/**
 * `grid` describes the unknowns of the sheet layout (aggregation.ts); `fold`, when given, maps the assembled
 * unknowns onto it first (fins as cells).
 */
export function sinkMultigrid(a: CsrMatrix, lines: LineSet, grid: SinkLevelGrid, fold: Prolongation | null = null): Preconditioner {
  const levels: Level[] = [];
  const push = (m: CsrMatrix, l: LineSet) => {
    const level: Level = { a: m, relax: buildLineRelaxation(m, l), p: null, r: new Float64Array(m.n), x: new Float64Array(m.n), b: new Float64Array(m.n) };
    levels.push(level);
    return level;
  };
  let current = push(a, lines);
  if (fold !== null) {
    current.p = fold;
    current = push(galerkinCsr(a, fold), levelLines(grid));
  }
  if (current.a.n !== levelUnknowns(grid)) throw new Error('sinkMultigrid: the level grid does not describe the system');
  let g = grid;
  while (current.a.n > COARSEST) {
    const step = coarsenSinkLevel(g);
    if (step.p.coarse === current.a.n) break;
    current.p = step.p;
    current = push(sinkCoarseOperator(current.a, g, step), levelLines(step.coarse));
    g = step.coarse;
  }
  const direct: DenseFactor = denseCholesky(current.a);

  const cycle = (l: number, b: Float64Array, x: Float64Array): void => {
    const level = levels[l];
    if (l === levels.length - 1) {
      direct.solve(b, x);
      return;
    }
    const next = levels[l + 1];
    const p = level.p as Prolongation;
    x.fill(0);
    level.relax.sweep(b, x, 'forward');
    csrResidual(level.a, x, b, level.r);
    restrictWith(p, level.r, next.b);
    cycle(l + 1, next.b, next.x);
    prolongAddWith(p, next.x, x);
    level.relax.sweep(b, x, 'backward');
  };
  return {
    method: `CG preconditioned by a multigrid V(1,1) cycle (z-line Gauss-Seidel, semi-coarsening of plate and fins with linear transfers, ${levels.length} levels)`,
    levels: levels.map((l) => l.a.n),
    entries: levels.map((l) => l.a.col.length),
    apply(r, z) {
      cycle(0, r, z);
    },
  };
}
