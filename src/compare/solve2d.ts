/**
 * `fincheck solve` with the 2-D model: the fd-2d solution of the case: a refinement study by default, or exactly
 * one grid given by its node counts (discretizationError null). Centre-line and surface temperatures along the
 * fin instead of a 1-D profile.
 * The one study solves it (studyFin): nonlinear fins (power-law h, grey radiation, k over temperature) by
 * Newton's method on the same grids; the report then carries the Newton step counts.
 */
import type { Case } from '../case/index.js';
import { finProblem, solveFin, studyFin, type Fin2DLine, type FinStudy2D, type NewtonStatistics } from '../fd/index.js';
import type { ProfilePoint } from './solve.js';

/** Newton's method on the grids of a nonlinear fin (stepsPerGrid coarsest first; finest: the finest or only grid). */
export type Solve2DNewton = NewtonStatistics;

export interface Solve2DReport {
  case: string;
  model: 'fd-2d';
  grid: { nx: number; ny: number };
  heatRate_W: number;
  efficiency: number | null;
  effectiveness: number;
  baseTemperature_degC: number;
  tipTemperature_degC: number;
  energyBalance: number;
  discretizationError: number | null;
  observedOrder: number | null;
  /** Nonlinear fins only (null for a linear fin). */
  newton: Solve2DNewton | null;
  /** Mid-plane (straight, annular) or axis (pins), base to tip; x_m is the radius for annular fins. */
  centreline: ProfilePoint[];
  /** The cooled face, base to tip. */
  surface: ProfilePoint[];
}

/**
 * The fd-2d study of a case (or one grid). The 2-D model must cover the fin: ask modelApplies first
 * (ModelNotApplicableError otherwise).
 */
export async function runSolve2D(c: Case, opts: { grid?: { nx: number; ny: number } }): Promise<{ report: Solve2DReport; study: FinStudy2D }> {
  const problem = finProblem(c);
  const study = (opts.grid ? await solveFin(problem, { model: '2d', ...opts.grid }) : await studyFin(problem, { model: '2d' })) as FinStudy2D;
  const result = study.finest;
  const newton = study.newton;
  const line = (l: Fin2DLine): ProfilePoint[] => Array.from(l.x_m, (x, i) => ({ x_m: x, T_degC: l.T_degC[i] as number }));
  return {
    study,
    report: {
      case: c.name,
      model: 'fd-2d',
      grid: { nx: result.grid.nodesX, ny: result.grid.nodesY },
      heatRate_W: result.heatRate_W,
      efficiency: result.efficiency,
      effectiveness: result.effectiveness,
      baseTemperature_degC: result.baseTemperature_degC,
      tipTemperature_degC: result.tipTemperature_degC,
      energyBalance: result.energyBalance,
      discretizationError: study.discretizationError,
      observedOrder: study.refinement === null ? null : study.refinement.observedOrder,
      newton,
      centreline: line(result.centreline),
      surface: line(result.surface),
    },
  };
}
