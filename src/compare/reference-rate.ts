/**
 * The reference heat rate of a variant of the case (one input changed) on fixed grids of the reference model:
 * the functions that sensitivities (central differences) and the uncertainty sample evaluate.
 *
 * fd-1d: one solve on the given node count and grading (the finest grid of the resolved study, or its
 * coarsest for the sample). fd-2d: one solve of the section on the given nx x ny grid, plus the side edges'
 * heat from fd-1d on the 1-D grid, Q_1D(edges cooled) - Q_1D(edges insulated), exactly as the reference adds
 * it (reference2d.ts). Keeping the grids fixed makes the discrete heat rate a smooth function of every input
 * (node positions move continuously with the dimensions), so its central differences converge like the step
 * squared. A nonlinear fin's Newton solves start from the case's own solution on the same grid (solved once,
 * on the first call), which the variants differ from by the perturbation only. Units: W.
 */
import type { Case } from '../case/index.js';
import {
  finProblem,
  finSectionAdjoint,
  finSectionHeatRate,
  linearFinHeatRate1D,
  solveFinWith,
  type FinGrid,
  type FinProblem,
  type FinStudy,
  type Fin2DResult,
  type GridSolvers,
} from '../fd/index.js';
import type { Grading } from '../mesh/index.js';
import { isStraight } from './reference2d.js';

export type ReferenceGrid =
  | { model: 'fd-1d'; nodes: number; grading: Grading | 'auto' }
  | { model: 'fd-2d'; nx: number; ny: number; edges: { nodes: number; grading: Grading | 'auto' } };

/** The grid in words, for notes. */
export function referenceGridText(grid: ReferenceGrid): string {
  return grid.model === 'fd-1d' ? `fd-1d on ${grid.nodes} nodes` : `fd-2d on ${grid.nx} x ${grid.ny} nodes`;
}

/** Q(variant) of the reference model on `grid`, W; `c` is the case the variants are made from (their Newton start). */
export function referenceRate(solvers: GridSolvers, grid: ReferenceGrid, c: Case): (variant: Case) => number {
  const starts = new Map<string, FinStudy>();
  // The variant's fin problem serves its section and its cooled-edge 1-D solve alike (one case, one problem).
  let last: { variant: Case; problem: FinProblem } | null = null;
  const problemOf = (variant: Case): FinProblem => {
    if (last === null || last.variant !== variant) last = { variant, problem: finProblem(variant) };
    return last.problem;
  };
  const solve = (variant: Case, g: FinGrid, id: string): number => {
    // A linear fin: its heat rate alone (the sample's hundreds of variants need no more).
    if (!solvers.nonlinear && g.model === '2d') return finSectionHeatRate(problemOf(variant), g.nx, g.ny);
    if (!solvers.nonlinear && g.model === '1d') return linearFinHeatRate1D(problemOf(variant), g);
    let start = starts.get(id);
    if (solvers.nonlinear && start === undefined) {
      start = solveFinWith(solvers, finProblem(variant === c ? c : withEdges(c, variant)), g);
      starts.set(id, start);
    }
    return solveFinWith(solvers, finProblem(variant), g, start).heatRate_W;
  };
  const oneD = (variant: Case, id: string, nodes: number, grading: Grading | 'auto'): number => solve(variant, { model: '1d', nodes, grading }, id);
  if (grid.model === 'fd-1d') return (variant) => oneD(variant, '1d', grid.nodes, grid.grading);
  return (variant) => {
    const section = solve(variant, { model: '2d', nx: grid.nx, ny: grid.ny }, '2d');
    if (!(variant.fin.edges === 'cooled' && isStraight(variant))) return section;
    const insulated = withInsulatedEdges(variant);
    return (
      section + oneD(variant, '1d cooled', grid.edges.nodes, grid.edges.grading) - oneD(insulated, '1d insulated', grid.edges.nodes, grid.edges.grading)
    );
  };
}

/**
 * The case with insulated side edges, its fin made once per fin (a sample's variants of h share their fin): the 1-D
 * geometry is cached by fin object (mesh finGeometry), so the same fin object spares a key built from the profile.
 */
const insulatedFins = new WeakMap<Case['fin'], Case['fin']>();
function withInsulatedEdges(variant: Case): Case {
  let fin = insulatedFins.get(variant.fin);
  if (fin === undefined) {
    fin = { ...variant.fin, edges: 'insulated' };
    insulatedFins.set(variant.fin, fin);
  }
  return { ...variant, fin };
}

/** The case with the variant's edges (the Newton start of the insulated-edge solve has insulated edges too). */
function withEdges(c: Case, variant: Case): Case {
  return { ...c, fin: { ...c.fin, edges: variant.fin.edges } };
}

/**
 * The fd-2d reference of a LINEAR fin on its nx x ny grid with the derivatives of its heat rate: the section by
 * the discrete adjoint (src/fd two-d/adjoint.ts: one extra solve for every input together, exact for the discrete
 * system), the side edges' fd-1d correction by central differences of its two small 1-D solves. `solved` is
 * the section's solution on that grid (the study's finest), so the nominal section needs no solve.
 * derivative(input, d) = dQ/df at f = 1, W, from the case with that input times 1 +- d.
 */
export function adjointReferenceRate(
  grid: Extract<ReferenceGrid, { model: 'fd-2d' }>,
  c: Case,
  solved: Fin2DResult,
): { nominal: number; derivative(scale: (f: number) => Case, d: number): number } {
  const section = finSectionAdjoint(finProblem(c), grid.nx, grid.ny, solved);
  const edges = (variant: Case): number => {
    if (!(variant.fin.edges === 'cooled' && isStraight(variant))) return 0;
    const insulated = withInsulatedEdges(variant);
    // A linear fin (the adjoint's): the heat rate alone, as solveFinWith would give it.
    const oneD = (v: Case): number => linearFinHeatRate1D(finProblem(v), { nodes: grid.edges.nodes, grading: grid.edges.grading });
    return oneD(variant) - oneD(insulated);
  };
  return {
    nominal: section.heatRate_W + edges(c),
    derivative: (scale, d) => {
      const up = scale(1 + d);
      const down = scale(1 - d);
      return section.derivative(finProblem(up), finProblem(down), d) + (edges(up) - edges(down)) / (2 * d);
    },
  };
}
