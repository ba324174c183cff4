/**
 * `fincheck solve --model 2d`: the fd-2d solution of the case (outputs.md): a refinement study by
 * default, or exactly one grid with `--grid NXxNY` (discretizationError null). Centre-line and surface
 * temperatures along the fin instead of a 1-D profile.
 */
import type { Case } from '../case/types.js';
import { solveFin2D, type Fin2DLine, type Fin2DResult } from '../fd/fin2d.js';
import { studyFin2D } from '../fd/fin2dStudy.js';
import type { ProfilePoint } from './solve.js';

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
  /** Mid-plane (straight, annular) or axis (pins), base to tip; x_m is the radius for annular fins. */
  centreline: ProfilePoint[];
  /** The cooled face, base to tip. */
  surface: ProfilePoint[];
}

export function runSolve2D(c: Case, opts: { grid?: { nx: number; ny: number } }): { report: Solve2DReport; result: Fin2DResult } {
  const study = opts.grid ? null : studyFin2D(c);
  const result = study ? study.finest : solveFin2D(c, opts.grid as { nx: number; ny: number });
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
      centreline: line(result.centreline),
      surface: line(result.surface),
    },
  };
}
