/**
 * A resolved 1-D refinement study: the fd-1d reference is refined until its estimated discretisation
 * error (GCI) is below a target, within a stated budget of nodes, before anything is judged on it.
 *
 * Why: on a long fin (mL >> 10) the temperature excess decays like exp(-m x) within a few decay lengths
 * 1/m of the base (and, with a prescribed tip temperature, of the tip), m = sqrt(h P / (k A)) (1/m).
 * A uniform grid of L/N cells then puts a handful of nodes, or none, inside that layer: a 300 m copper
 * pin (mL ~ 3500) has cells 3.5 decay lengths long on 4000 cells and a GCI of 14 %.
 *
 * Grid: geometric grading toward the base (x ~ (S^xi - 1)/(S - 1) on the first segment, mesh/grid1d.ts),
 * with stretch S = 1 + m* b (b: length of the graded segment). Then dx/dxi = ln S (x + x0) with
 * x0 = b/(S - 1) = 1/m*: cells grow in proportion to the distance from the base plus one decay length,
 * so on N cells a cell holds about ln(S)/N (m* x + 1) decay lengths: uniform resolution of the layer
 * and a grid that stays nested under doubling. m* is the largest local m over the first ten decay
 * lengths (h and the section vary along the fin). A prescribed tip temperature grades both ends.
 *
 * Procedure: the default study first (it resolves every ordinary fin, and keeps its numbers); when its
 * GCI is above the target, the decay-graded grids (when the decay length is short against the fin:
 * m* L > DECAY_GRADING_ML, else the default grading) are refined by doubling every grid until the GCI
 * is at most the target or the finest grid would exceed the budget. Unresolved is then reported, never
 * hidden. The GCI is Celik et al. (2008), J. Fluids Eng. 130(7), 078001 (refinement.ts).
 */
import type { FinGeometry1D, Grading } from '../../mesh/index.js';
import { hAt, hBreakpoints } from '../problem/convection.js';
import { DEFAULT_STUDY_NODES } from '../one-d/linear-solve.js';
import type { FinProblem } from '../problem/fin-problem.js';
import type { FinStudy1D } from './fin-study.js';
import type { GridSolvers } from './grid-solver.js';
import { linearProblem1D } from './linear-grid-solvers.js';
import type { RefinementStudy } from './refinement.js';
import { studyFinWith } from './study-fin.js';

/** How far the study may refine. */
export interface ResolutionBudget {
  /** Largest node count of the finest grid. */
  readonly maxFinestNodes: number;
}

/**
 * Finest grid at most 256 001 nodes (64 times the default 4001): a linear study of 3 grids there is
 * ~450k node solves (a few ms), a nonlinear one under a second; it resolves mL up to ~1e5 to 0.2 %
 * with decay grading. Common practice, no source: a budget bounds the cost of a check, and past it the
 * honest answer is "unresolved".
 */
export const DEFAULT_RESOLUTION_BUDGET: ResolutionBudget = { maxFinestNodes: 256001 };

/** Above this m* L the decay length is short against the fin and the grid is graded to it. */
export const DECAY_GRADING_ML = 8;

export interface Resolution {
  /** The GCI the study had to reach (a tenth of the check's tolerance). */
  readonly target: number;
  /** True when the GCI of the study is at most the target. */
  readonly resolved: boolean;
  /** Node counts of the study's grids, coarsest first. */
  readonly nodes: readonly number[];
  /** Doublings beyond the default grids (0: the default study). */
  readonly refinements: number;
  /** The grading of the grids, in words. */
  readonly grading: string;
  /** The grading of the grids as data (solve a variant of the fin on the same grid with it). */
  readonly gridGrading: Grading | 'auto';
  /** The budget, in words. */
  readonly budget: string;
}

/** The local fin parameter m(x) = sqrt(h P / (k A)), 1/m; h(x) in W/(m^2*K), k in W/(m*K). */
export function localFinParameter(geometry: FinGeometry1D, conductivity: number, h: (x: number) => number, x: number): number {
  return Math.sqrt((h(x) * geometry.perimeter(x)) / (conductivity * geometry.area(x)));
}

/**
 * m* of the module header: the largest local m over [0, min(L, 10/m(0))] (64 samples), 1/m.
 * Where the base has no section or no h the base value is skipped.
 */
export function baseDecayParameter(geometry: FinGeometry1D, conductivity: number, h: (x: number) => number): number {
  const L = geometry.length;
  const m0 = localFinParameter(geometry, conductivity, h, 0);
  const reach = Number.isFinite(m0) && m0 > 0 ? Math.min(L, 10 / m0) : L;
  let best = Number.isFinite(m0) ? m0 : 0;
  const samples = 64;
  for (let i = 1; i < samples; i++) {
    const m = localFinParameter(geometry, conductivity, h, (reach * i) / samples);
    if (Number.isFinite(m)) best = Math.max(best, m);
  }
  return best;
}

/** The decay grading of the module header, or null when the decay length is not short against the fin. */
export type DecayGrading = Extract<Grading, { kind: 'geometric' }>;

export function decayGrading(geometry: FinGeometry1D, m: number, bothEnds: boolean, extraBreakpoints: ArrayLike<number> = []): DecayGrading | null {
  const L = geometry.length;
  if (!(m * L > DECAY_GRADING_ML)) return null;
  // The graded segment runs from the base to the first breakpoint (geometry or h); both ends of a
  // single segment share it (half each).
  let first = L;
  for (const list of [geometry.breakpoints, extraBreakpoints]) {
    for (let i = 0; i < list.length; i++) {
      const x = list[i] as number;
      if (x > 0 && x < first) first = x;
    }
  }
  const graded = bothEnds && first === L ? L / 2 : first;
  const stretch = 1 + m * graded;
  return stretch > 1 + 1e-9 ? { kind: 'geometric', toward: bothEnds ? 'both' : 'base', stretch } : null;
}

/** A study of the 1-D model on given grids. */
export type Study1DRunner<S extends { readonly study: RefinementStudy }> = (nodes: readonly number[], grading: Grading | 'auto') => S;

/**
 * Runs `run` on the default grids, then (when its GCI is above `target`) on `grading` with doubled
 * grids until the GCI is at most `target` or the budget is spent. Returns the last study and how it
 * was resolved.
 */
export function resolveStudy1D<S extends { readonly study: RefinementStudy }>(
  run: Study1DRunner<S>,
  grading: DecayGrading | null,
  target: number,
  budget: ResolutionBudget = DEFAULT_RESOLUTION_BUDGET,
): { study: S; resolution: Resolution } {
  const budgetWords = `finest grid at most ${budget.maxFinestNodes} nodes`;
  let nodes = [...DEFAULT_STUDY_NODES];
  let study = run(nodes, 'auto');
  const words = (g: DecayGrading | null): string =>
    g === null
      ? 'default grading'
      : `graded to the decay length 1/m at the ${g.toward === 'both' ? 'base and tip' : 'base'} (geometric, stretch ${g.stretch.toPrecision(3)})`;
  if (study.study.gci <= target) {
    return { study, resolution: { target, resolved: true, nodes, refinements: 0, grading: 'default grading', gridGrading: 'auto', budget: budgetWords } };
  }
  const chosen: Grading | 'auto' = grading ?? 'auto';
  let refinements = 0;
  if (grading !== null) study = run(nodes, chosen);
  while (study.study.gci > target) {
    const next = nodes.map((n) => 2 * (n - 1) + 1);
    if ((next[next.length - 1] as number) > budget.maxFinestNodes) break;
    nodes = next;
    refinements++;
    study = run(nodes, chosen);
  }
  return {
    study,
    resolution: { target, resolved: study.study.gci <= target, nodes, refinements, grading: words(grading), gridGrading: chosen, budget: budgetWords },
  };
}

/**
 * The resolved refinement study of a fin with the 1-D model (studyFinWith: the direct solve per grid of a
 * linear fin, Newton's method for a nonlinear one). `decayFrom` is the linear fin whose h and k set the
 * decay length near the base: the fin itself when it is linear, else a linear surrogate of it (h and k at
 * the base temperature, radiation as an equivalent h).
 */
export function resolveFinStudy1D(
  solvers: GridSolvers,
  problem: FinProblem,
  decayFrom: FinProblem,
  target: number,
  budget: ResolutionBudget = DEFAULT_RESOLUTION_BUDGET,
): { study: FinStudy1D; resolution: Resolution } {
  const run = (nodes: readonly number[], grading: Grading | 'auto'): { study: RefinementStudy; fin: FinStudy1D } => {
    const fin = studyFinWith(solvers, problem, { model: '1d', nodes, grading }) as FinStudy1D;
    return { study: fin.refinement as RefinementStudy, fin };
  };
  const { study, resolution } = resolveStudy1D(run, decayGradingOf(decayFrom), target, budget);
  return { study: study.fin, resolution };
}

/** The decay grading of a linear fin (constant k, h independent of temperature, no radiation), or null. */
export function decayGradingOf(fin: FinProblem): DecayGrading | null {
  const problem = linearProblem1D(fin);
  const L = problem.geometry.length;
  const m = baseDecayParameter(problem.geometry, problem.conductivity, (x) => hAt(problem.h, x, L));
  return decayGrading(problem.geometry, m, problem.tip.kind === 'temperature', hBreakpoints(problem.h, L));
}
