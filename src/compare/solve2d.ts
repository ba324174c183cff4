/**
 * `fincheck solve --model 2d`: the fd-2d solution of the case: a refinement study by default, or exactly
 * one grid with `--grid NXxNY` (discretizationError null). Centre-line and surface temperatures along the
 * fin instead of a 1-D profile.
 * Nonlinear fins (power-law h, grey radiation, k over temperature) are solved by Newton's method on the
 * same grids (nonlinear2d.ts, nonlinear2d-study.ts); the report then carries the Newton step counts.
 * Where the 2-D model does not apply (fin2dUnsupported, nonlinear2dUnsupported) the UsageError names why.
 */
import type { Case } from '../case/types.js';
import { UsageError } from '../errors.js';
import { solveFin2D, type Fin2DLine, type Fin2DResult } from '../fd/two-d/linear-solve.js';
import { studyFin2D, type Fin2DStudy } from '../fd/two-d/linear-study.js';
import { isLinearFinCase } from '../fd/problem/linear-case.js';
import type { NewtonReport } from '../fd/one-d/nonlinear-solve.js';
import { solveNonlinearFin2D, type NonlinearFin2DResult } from '../fd/two-d/nonlinear-solve.js';
import { nonlinear2dUnsupported } from '../fd/two-d/nonlinear-problem.js';
import { studyNonlinearFin2D } from '../fd/two-d/nonlinear-study.js';
import type { ProfilePoint } from './solve.js';

/** Newton's method on the grids of a nonlinear fin. */
export interface Solve2DNewton {
  /** Newton steps spent on each grid, coarsest first (every attempt and continuation stage; a single grid also counts the coarser grids it started from). */
  stepsPerGrid: number[];
  /** The finest (or only) grid: steps, line-search halvings, continuation stages, final relative residual and heat-rate change. */
  finest: NewtonReport;
}

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

interface Solved2D {
  study: Fin2DStudy | null;
  result: Fin2DResult;
  newton: Solve2DNewton | null;
}

function solveLinear(c: Case, grid: { nx: number; ny: number } | undefined): Solved2D {
  const study = grid ? null : studyFin2D(c);
  const result = study ? study.finest : solveFin2D(c, grid as { nx: number; ny: number });
  return { study, result, newton: null };
}

function solveNonlinear(c: Case, grid: { nx: number; ny: number } | undefined): Solved2D {
  const unsupported = nonlinear2dUnsupported(c);
  if (unsupported !== null) throw new UsageError(`--model 2d: ${unsupported}; \`fincheck check\` solves this fin with fd-1d`);
  if (grid) {
    const result: NonlinearFin2DResult = solveNonlinearFin2D(c, grid);
    const steps = result.newton.totalIterations + result.newton.coarseGridIterations;
    return { study: null, result, newton: { stepsPerGrid: [steps], finest: result.newton } };
  }
  const study = studyNonlinearFin2D(c);
  return { study, result: study.finest, newton: { stepsPerGrid: study.iterations, finest: study.finest.newton } };
}

export function runSolve2D(c: Case, opts: { grid?: { nx: number; ny: number } }): { report: Solve2DReport; result: Fin2DResult } {
  const { study, result, newton } = isLinearFinCase(c) ? solveLinear(c, opts.grid) : solveNonlinear(c, opts.grid);
  const line = (l: Fin2DLine): ProfilePoint[] => Array.from(l.x_m, (x, i) => ({ x_m: x, T_degC: l.T_degC[i] as number }));
  return {
    result,
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
      discretizationError: study ? study.discretizationError : null,
      observedOrder: study ? study.heatRate.observedOrder : null,
      newton,
      centreline: line(result.centreline),
      surface: line(result.surface),
    },
  };
}
