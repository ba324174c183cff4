/**
 * The one result of every model of a fin (study-fin.ts): heat rate, efficiency, effectiveness, energy
 * balance, the error estimate of a refinement study, Newton statistics of a nonlinear fin, and the
 * model's own solution (mesh and θ in 1-D; grid, field and lines in 2-D), from which the quantities
 * along the fin are computed (alongFin). Heat rates in W for the whole fin (straight fins: the whole
 * width; annular: the whole ring), temperatures in degC.
 */
import type { Fin1DResult } from '../one-d/linear-solve.js';
import type { NewtonReport } from '../newton/newton-report.js';
import type { FinProblem } from '../problem/fin-problem.js';
import type { Fin2DResult } from '../two-d/linear-solve.js';
import type { Extrapolated2D, Fin2DGridValue } from '../two-d/linear-study.js';
import type { RefinementStudy } from './refinement.js';

/** Newton's method on the grids of a nonlinear fin. */
export interface NewtonStatistics {
  /** Newton steps on each grid, coarsest first (every attempt and continuation stage; a grid started from a coarser one also counts that one's). */
  readonly stepsPerGrid: number[];
  /** The finest (or only) grid: steps, line-search halvings, continuation stages, final relative residual and heat-rate change. */
  readonly finest: NewtonReport;
}

interface FinStudyCommon {
  readonly problem: FinProblem;
  /** Heat entering the fin at its base on the finest (or only) grid, W. */
  readonly heatRate_W: number;
  /** Heat leaving the faces and the tip, W. */
  readonly surfaceHeatRate_W: number;
  /** |Q_base - Q_surfaces| / |Q_base| (2-D: the largest over the grids of a study). */
  readonly energyBalance: number;
  /** Q / Q_ideal (every cooled surface at the base temperature); null where undefined (a cut infinite 2-D fin). */
  readonly efficiency: number | null;
  /** Q over the heat the bare base area would lose at the base temperature. */
  readonly effectiveness: number;
  readonly baseTemperature_degC: number;
  readonly tipTemperature_degC: number;
  /** Refinement study of the heat rate (Celik et al. 2008); null for a single grid. */
  readonly refinement: RefinementStudy | null;
  /** Estimated relative discretisation error of heatRate_W (the GCI); null for a single grid. */
  readonly discretizationError: number | null;
  /** Newton statistics of a nonlinear fin; null for a linear fin (one direct solve per grid). */
  readonly newton: NewtonStatistics | null;
}

export interface FinStudy1D extends FinStudyCommon {
  readonly model: 'fd-1d';
  /** The solution on the finest (or only) grid: mesh, θ, heat rates. */
  readonly finest: Fin1DResult;
  /** Heat rate with every cooled surface at the base temperature (exact from the geometry), W. */
  readonly idealHeatRate_W: number;
}

export interface FinStudy2D extends FinStudyCommon {
  readonly model: 'fd-2d';
  /** The solution on the finest (or only) grid: grid, field, centre line and face lines, heat rates. */
  readonly finest: Fin2DResult;
  /** Every grid, finest first. */
  readonly grids: Fin2DGridValue[];
  /** Refinement study of the efficiency (null for a single grid or a cut infinite fin). */
  readonly efficiencyRefinement: RefinementStudy | null;
  /** Richardson-extrapolated heat rate, W (the finest heat rate for a single grid). */
  readonly extrapolatedHeatRate_W: number;
  /**
   * The extrapolated heat rate, efficiency and temperatures with an error estimate of the extrapolated heat rate
   * itself (a fourth, coarser grid: refinement.ts, extrapolationError); null for a single grid or when the grids
   * support no such estimate (then heatRate_W and discretizationError, the finest grid's, are the best known).
   */
  readonly extrapolated: Extrapolated2D | null;
}

export type FinStudy = FinStudy1D | FinStudy2D;
