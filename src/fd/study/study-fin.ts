/**
 * The one study of a fin: `studyFin(problem, { model })` solves the fin with the model asked for (1-D
 * along the fin, 2-D across its thickness) on the grids of a refinement study and returns one result
 * (fin-study.ts); `solveFin(problem, grid)` solves it on one grid (no error estimate).
 *
 * run(): grids of the model -> solve each grid (grid-solvers.ts: the linear direct solve for a linear fin,
 * Newton's method for a nonlinear one, from the previous grid's solution) -> Richardson extrapolation and
 * GCI of the heat rate (refinement.ts; Celik et al. 2008, J. Fluids Eng. 130(7), 078001) -> one result.
 * Grids: 1-D, the nested node counts of DEFAULT_STUDY_NODES with grading toward a sharp tip
 * (one-d/linear-solve.ts, autoGrading); 2-D, three grids refined by 2 in both directions (and one coarser grid
 * for the error of the extrapolated values, refinement.ts extrapolationError), sized by the
 * fin's decay length (two-d/linear-study.ts, gridFamily2D; a radiating fin adds its radiative coefficient,
 * two-d/nonlinear-study.ts, sizingProblem).
 * The model must cover the fin (problem/model-applies.ts): ask modelApplies first; a model that does not
 * cover it throws ModelNotApplicableError with the reason.
 */
import type { Grading } from '../../mesh/index.js';
import { DEFAULT_STUDY_NODES, studyGrids } from '../one-d/linear-solve.js';
import { alongFin1D } from '../one-d/along-fin.js';
import type { FinProblem } from '../problem/fin-problem.js';
import { requireModel, type FinModel } from '../problem/model-applies.js';
import { alongFin2D } from '../two-d/along-fin.js';
import { gridFamily2D, gridValues, summariseStudy2D, type Fin2DStudyOptions } from '../two-d/linear-study.js';
import { twoDFinProblem } from '../two-d/nonlinear-problem.js';
import { grid2dIssue } from '../two-d/linear-solve.js';
import { sizingProblem } from '../two-d/linear-study.js';
import type { AlongFin } from './along-fin.js';
import type { FinStudy, FinStudy1D, FinStudy2D, NewtonStatistics } from './fin-study.js';
import type { Fin1DResult } from '../one-d/linear-solve.js';
import { gridSolvers, type Grid1D, type Grid2D, type GridSolution1D, type GridSolution2D, type GridSolvers } from './grid-solvers.js';
import { richardsonGci } from './refinement.js';
import { solveGrids } from './refinement-loop.js';

export interface FinStudyOptions {
  readonly model: FinModel;
  /** 1-D: node counts of the grids (>= 3; default DEFAULT_STUDY_NODES). */
  readonly nodes?: readonly number[];
  /** 1-D: the node distribution of every grid (default 'auto': one-d/linear-solve.ts, autoGrading). */
  readonly grading?: Grading | 'auto';
  /** 2-D: the grid family (number of grids, coarsest cells across, aspect; two-d/linear-study.ts). */
  readonly family?: Pick<Fin2DStudyOptions, 'levels' | 'coarseCellsAcross' | 'aspect'>;
}

/** One grid of a model. */
export type FinGrid = ({ readonly model: '1d' } & Grid1D) | ({ readonly model: '2d' } & Grid2D);

/** The refinement study of a fin with a model (loads Newton's method only for a nonlinear fin). */
export async function studyFin(problem: FinProblem, opts: FinStudyOptions): Promise<FinStudy> {
  return studyFinWith(await gridSolvers(problem), problem, opts);
}

/** The fin on one grid of a model (discretizationError null). */
export async function solveFin(problem: FinProblem, grid: FinGrid): Promise<FinStudy> {
  return solveFinWith(await gridSolvers(problem), problem, grid);
}

/** studyFin with grid solvers already loaded (gridSolvers(problem)), for many fins of one kind. */
export function studyFinWith(solvers: GridSolvers, problem: FinProblem, opts: FinStudyOptions): FinStudy {
  requireModel(problem, opts.model);
  if (opts.model === '1d') {
    const grading = opts.grading ?? 'auto';
    const grids = studyGrids(opts.nodes ?? DEFAULT_STUDY_NODES, 'studyFin').map((g) => ({ ...g, grading }));
    const results = solveGrids(grids, (g: Grid1D, previous: GridSolution1D | undefined) => solvers.oneD(problem, g, previous));
    const refinement = richardsonGci(results.map((r) => ({ size: r.mesh.cellSize, value: r.heatRate })));
    return study1D(problem, results, refinement);
  }
  const twoD = twoDFinProblem(problem);
  const grids = gridFamily2D(sizingProblem(twoD), opts.family ?? {});
  const results = solveGrids(grids, (g: Grid2D, previous: GridSolution2D | undefined) => solvers.twoD(twoD, g, previous));
  const summary = summariseStudy2D(results, gridValues(grids, results));
  const finest = summary.finest as GridSolution2D;
  return {
    ...common2D(problem, finest, results),
    refinement: summary.heatRate,
    discretizationError: summary.discretizationError,
    energyBalance: summary.energyBalance,
    grids: summary.grids,
    efficiencyRefinement: summary.efficiency,
    extrapolatedHeatRate_W: summary.extrapolatedHeatRate_W,
    extrapolated: summary.extrapolated,
  };
}

/**
 * Why the grids of a study of the fin cannot be used (in the problem's words), or null when they can: the
 * 1-D grids always can; the finest 2-D grid of the family may hold more nodes than fit in memory (a fin
 * hundreds of decay lengths long). Ask before studying: studyFin throws GridError otherwise. The model must
 * cover the fin (modelApplies).
 */
export function studyGridIssue(problem: FinProblem, opts: FinStudyOptions): string | null {
  if (opts.model === '1d') return null;
  const twoD = twoDFinProblem(problem);
  const grids = gridFamily2D(sizingProblem(twoD), opts.family ?? {});
  const finest = grids[grids.length - 1] as Grid2D;
  const issue = grid2dIssue(twoD.linear.section, finest.nx, finest.ny);
  return issue === null ? null : `the finest grid of the 2-D study: ${issue}`;
}

/**
 * solveFin with grid solvers already loaded. `start`: a solution of a nearby fin (the same model; e.g. the
 * fin before one input was changed) that Newton's method starts from, interpolated onto this grid; a linear
 * fin ignores it.
 */
export function solveFinWith(solvers: GridSolvers, problem: FinProblem, grid: FinGrid, start?: FinStudy): FinStudy {
  requireModel(problem, grid.model);
  if (grid.model === '1d') return study1D(problem, [solvers.oneD(problem, grid, start?.model === 'fd-1d' ? start.finest : undefined)], null);
  const r = solvers.twoD(twoDFinProblem(problem), grid, start?.model === 'fd-2d' ? start.finest : undefined);
  return {
    ...common2D(problem, r, [r]),
    refinement: null,
    discretizationError: null,
    energyBalance: r.energyBalance,
    grids: [
      {
        nx: grid.nx,
        ny: grid.ny,
        size: Number.NaN,
        heatRate_W: r.heatRate_W,
        efficiency: r.efficiency,
        energyBalance: r.energyBalance,
        baseTemperature_degC: r.baseTemperature_degC,
        tipTemperature_degC: r.tipTemperature_degC,
      },
    ],
    efficiencyRefinement: null,
    extrapolatedHeatRate_W: r.heatRate_W,
    extrapolated: null,
  };
}

/** Heat flow, loss and temperatures along the fin, from the model's own discrete quantities. */
export function alongFin(study: FinStudy): AlongFin {
  return study.model === 'fd-1d'
    ? alongFin1D(study.problem, study.finest.mesh, study.finest.theta, study.finest.heatRate)
    : alongFin2D(study.problem, study.finest);
}

function newtonOf(results: readonly { readonly newton?: NewtonStatistics['finest'] }[]): NewtonStatistics | null {
  const finest = results[results.length - 1]?.newton;
  if (finest === undefined) return null;
  return { stepsPerGrid: results.map((r) => (r.newton ? r.newton.totalIterations + r.newton.coarseGridIterations : 0)), finest };
}

function study1D(problem: FinProblem, results: GridSolution1D[], refinement: ReturnType<typeof richardsonGci> | null): FinStudy1D {
  const finest = results[results.length - 1] as GridSolution1D;
  return {
    ...finStudy1DFields(problem, finest),
    refinement,
    discretizationError: refinement === null ? null : refinement.gci,
    newton: newtonOf(results),
  };
}

function common2D(
  problem: FinProblem,
  finest: GridSolution2D,
  results: GridSolution2D[],
): Omit<
  FinStudy2D,
  'refinement' | 'discretizationError' | 'energyBalance' | 'grids' | 'efficiencyRefinement' | 'extrapolatedHeatRate_W' | 'extrapolated'
> {
  return {
    model: 'fd-2d',
    problem,
    finest,
    heatRate_W: finest.heatRate_W,
    surfaceHeatRate_W: finest.surfaceHeatRate_W,
    efficiency: finest.efficiency,
    effectiveness: finest.effectiveness,
    baseTemperature_degC: finest.baseTemperature_degC,
    tipTemperature_degC: finest.tipTemperature_degC,
    newton: newtonOf(results),
  };
}

/** The fields of a FinStudy1D that its finest grid's solution gives. */
function finStudy1DFields(
  problem: FinProblem,
  finest: Fin1DResult,
): Pick<
  FinStudy1D,
  | 'model'
  | 'problem'
  | 'finest'
  | 'heatRate_W'
  | 'surfaceHeatRate_W'
  | 'energyBalance'
  | 'idealHeatRate_W'
  | 'efficiency'
  | 'effectiveness'
  | 'baseTemperature_degC'
  | 'tipTemperature_degC'
> {
  return {
    model: 'fd-1d',
    problem,
    finest,
    heatRate_W: finest.heatRate,
    surfaceHeatRate_W: finest.surfaceHeatRate,
    energyBalance: finest.energyBalance,
    idealHeatRate_W: finest.idealHeatRate,
    efficiency: finest.efficiency,
    effectiveness: finest.effectiveness,
    baseTemperature_degC: (finest.theta[0] as number) + problem.ambient_degC,
    tipTemperature_degC: finest.tipTemperature_degC,
  };
}
