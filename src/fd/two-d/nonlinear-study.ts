/**
 * fd-2d of a nonlinear fin with its discretisation error: the grid family of the linear study
 * (two-d/linear-study.ts, gridFamily2D: three grids refined by exactly 2 in both directions), each grid solved by
 * Newton (two-d/nonlinear-solve.ts) from the previous grid's solution (nested iteration: 2-4 steps on the finer
 * grids), then Richardson extrapolation and the Grid Convergence Index of Celik et al. 2008, J. Fluids Eng.
 * 130(7), 078001 (refinement.ts), exactly as for a linear fin.
 * Grid sizing: the family resolves the decay length 1/m with m from the largest position part of h; a
 * radiating fin adds its radiative tangent coefficient 4 ε σ T^3 at the hotter of the base and the
 * surroundings, so a fin cooled mostly (or only) by radiation gets the cells its decay length needs.
 * A linear case gets the linear study's grids exactly.
 */
import type { Case } from '../../case/index.js';
import { DEFAULT_GRADING } from './linear-solve.js';
import { gridFamily2D, gridValues, sizingProblem, summariseStudy2D, type Fin2DStudy, type Fin2DStudyOptions } from './linear-study.js';
import { solveGrids } from '../study/refinement-loop.js';
import { solveNonlinearFin2DProblem, type NonlinearFin2DResult } from './nonlinear-solve.js';
import type { Newton2DOptions } from './newton-system.js';
import { nonlinearFin2DProblem, type NonlinearFin2DProblem } from './nonlinear-problem.js';

export type NonlinearFin2DStudyOptions = Omit<Fin2DStudyOptions, 'solver' | 'method'> & Newton2DOptions;

export interface NonlinearFin2DStudy extends Fin2DStudy {
  readonly finest: NonlinearFin2DResult;
  /** Newton steps on each grid (every attempt and continuation stage), coarsest first. */
  readonly iterations: number[];
}

export function studyNonlinearFin2D(c: Case, opts: NonlinearFin2DStudyOptions = {}): NonlinearFin2DStudy {
  return studyNonlinearFin2DProblem(nonlinearFin2DProblem(c), opts);
}

export function studyNonlinearFin2DProblem(problem: NonlinearFin2DProblem, opts: NonlinearFin2DStudyOptions = {}): NonlinearFin2DStudy {
  const grids = gridFamily2D(sizingProblem(problem), opts);
  const results = solveGrids(grids, (g, previous: NonlinearFin2DResult | undefined) =>
    solveNonlinearFin2DProblem(
      problem,
      {
        ...opts,
        nx: g.nx,
        ny: g.ny,
        baseGrading: opts.baseGrading ?? DEFAULT_GRADING.base,
        faceGrading: opts.faceGrading ?? DEFAULT_GRADING.face,
      },
      previous,
    ),
  );
  const study = summariseStudy2D(results, gridValues(grids, results));
  return {
    ...study,
    finest: results[results.length - 1] as NonlinearFin2DResult,
    iterations: results.map((r) => r.newton.totalIterations + r.newton.coarseGridIterations),
  };
}
