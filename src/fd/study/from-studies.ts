/**
 * The one result (fin-study.ts) of a study run by a model's own study function (compare's resolved 1-D
 * reference refines the grids of studyFin1D/studyNonlinearFin1D until its GCI is below a target, and
 * the 2-D reference keeps the 2-D study): the same fields as studyFin gives, read from that study.
 */
import type { NewtonReport } from '../newton/newton-report.js';
import type { Fin1DResult } from '../one-d/linear-solve.js';
import type { FinProblem } from '../problem/fin-problem.js';
import type { Fin2DResult } from '../two-d/linear-solve.js';
import type { Fin2DStudy } from '../two-d/linear-study.js';
import type { FinStudy1D, FinStudy2D, NewtonStatistics } from './fin-study.js';
import type { RefinementStudy } from './refinement.js';

function newtonOf(finest: { readonly newton?: NewtonReport }, iterations: readonly number[] | undefined): NewtonStatistics | null {
  return finest.newton === undefined ? null : { stepsPerGrid: [...(iterations ?? [])], finest: finest.newton };
}

/** The fields of a FinStudy1D that its finest grid's solution gives (the study's own and the resolved one's). */
export function finStudy1DFields(
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

/** A 1-D study ({ result, study }, with Newton's step counts for a nonlinear fin) as a FinStudy1D. */
export function finStudy1DFrom(
  problem: FinProblem,
  s: { readonly result: Fin1DResult & { readonly newton?: NewtonReport }; readonly study: RefinementStudy; readonly iterations?: readonly number[] },
): FinStudy1D {
  return {
    ...finStudy1DFields(problem, s.result),
    refinement: s.study,
    discretizationError: s.study.gci,
    newton: newtonOf(s.result, s.iterations),
  };
}

/** A 2-D study (with Newton's step counts for a nonlinear fin) as a FinStudy2D. */
export function finStudy2DFrom(
  problem: FinProblem,
  s: Fin2DStudy & { readonly finest: Fin2DResult & { readonly newton?: NewtonReport }; readonly iterations?: readonly number[] },
): FinStudy2D {
  const finest = s.finest;
  return {
    model: 'fd-2d',
    problem,
    finest,
    heatRate_W: s.heatRate_W,
    surfaceHeatRate_W: finest.surfaceHeatRate_W,
    energyBalance: s.energyBalance,
    efficiency: finest.efficiency,
    effectiveness: finest.effectiveness,
    baseTemperature_degC: finest.baseTemperature_degC,
    tipTemperature_degC: finest.tipTemperature_degC,
    refinement: s.heatRate,
    discretizationError: s.discretizationError,
    newton: newtonOf(finest, s.iterations),
    grids: s.grids,
    efficiencyRefinement: s.efficiency,
    extrapolatedHeatRate_W: s.extrapolatedHeatRate_W,
  };
}
