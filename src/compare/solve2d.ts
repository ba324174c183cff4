/**
 * The fd-2d solution of the case (the 2-D mode of `fincheck solve`): a refinement study by default, or
 * exactly one grid of NX x NY nodes given by the caller (discretizationError null). Centre-line and surface
 * temperatures along the fin instead of a 1-D profile. The heat rate is the whole fin's, as check's fd-2d
 * reference: the section's, plus the cooled side edges' heat from fd-1d (sideEdgeCorrection).
 * The one study (studyFin, solveFin): a linear fin takes one direct solve per grid, a nonlinear one
 * (power-law h, grey radiation, k over temperature) Newton's method on the same grids; the report then
 * carries the Newton step counts. The 2-D model must cover the fin: ask modelApplies(problem, '2d') first
 * (ModelNotApplicableError otherwise).
 */
import type { Case } from '../case/index.js';
import {
  finProblem,
  gridSolversNow,
  solveFinWith,
  studyFinWith,
  type Fin2DLine,
  type FinStudy1D,
  type FinStudy2D,
  type GridSolvers,
  type NewtonStatistics,
} from '../fd/index.js';
import { isStraight, sideEdgeCorrection, type SideEdgeCorrection } from './reference2d.js';
import { isRadial, type ProfilePoint } from './solve.js';
import { efficiencyBasis, TWO_D_SURFACE } from './efficiency-basis.js';
import { definedEffectiveness, effectivenessBasis } from './effectiveness-basis.js';

/** Newton's method on the grids of a nonlinear fin: steps per grid, coarsest first, and the finest (or only) grid's report. */
export type Solve2DNewton = NewtonStatistics;

export interface Solve2DReport {
  case: string;
  model: 'fd-2d';
  grid: { nx: number; ny: number };
  /**
   * Heat rate of the whole fin, W: the 2-D section times the width (pins, annular fins: the whole
   * axisymmetric fin), plus the side edges' cooling measured by fd-1d when the case cools a straight fin's
   * edges: the number `check` reports for its fd-2d reference.
   */
  heatRate_W: number;
  /** The 2-D section times the width, side edges insulated (= heatRate_W unless edgesHeatRate_W != 0), W. */
  sectionHeatRate_W: number;
  /** heatRate_W - sectionHeatRate_W: the cooled side edges (fd-1d ratio, see reference2d.ts); 0 otherwise, W. */
  edgesHeatRate_W: number;
  /**
   * Whole fin (as heatRate_W): Q / Q with every cooled surface at the base temperature; null for an infinite
   * tip or a surface that would both lose and gain heat at the base temperature (see efficiencyNote).
   */
  efficiency: number | null;
  /** Why the efficiency is null or may exceed 1; null otherwise (efficiency-basis.ts). */
  efficiencyNote: string | null;
  /** Q / Q_bare; null where h is 0 at the base (see effectivenessNote). */
  effectiveness: number | null;
  /** Why the effectiveness is null; null otherwise (effectiveness-basis.ts). */
  effectivenessNote: string | null;
  baseTemperature_degC: number;
  tipTemperature_degC: number;
  energyBalance: number;
  /**
   * Estimated relative error of heatRate_W: of the Richardson-extrapolated value when heatRateFrom is 'extrapolated',
   * else the finest grid's GCI; null for one grid.
   */
  discretizationError: number | null;
  /** Which value heatRate_W (and the base and tip temperatures) is: the study's Richardson-extrapolated one, or the finest grid's. */
  heatRateFrom: 'extrapolated' | 'finest-grid';
  /** The finest grid's whole-fin heat rate, W, and its GCI (null for one grid), whichever value heatRate_W is. */
  finestGridHeatRate_W: number;
  finestGridDiscretizationError: number | null;
  observedOrder: number | null;
  /** Nonlinear fins only (null for a linear fin). */
  newton: Solve2DNewton | null;
  /** Mid-plane (straight, annular) or axis (pins), base to tip; annular fins give the radius r_m instead of x_m. */
  centreline: ProfilePoint[];
  /** The cooled face, base to tip. */
  surface: ProfilePoint[];
}

/**
 * The side edges' correction exactly as check computes it (same fd-1d study, same grid), or null when the
 * fin has no cooled side edges. Its `edgesIdealHeatRate_W` is the edges' share of Q_ideal, so the
 * efficiency has check's basis: the 2-D section's surface plus the edges.
 */
function edgeCorrection(c: Case, solvers: GridSolvers): SideEdgeCorrection | null {
  if (c.fin.edges !== 'cooled' || !isStraight(c)) return null;
  const oneD = studyFinWith(solvers, finProblem(c), { model: '1d' }) as FinStudy1D;
  return sideEdgeCorrection(c, oneD, (variant, nodes) => solveFinWith(solvers, finProblem(variant), { model: '1d', nodes }) as FinStudy1D);
}

export function runSolve2D(c: Case, opts: { grid?: { nx: number; ny: number } }): { report: Solve2DReport; study: FinStudy2D } {
  const problem = finProblem(c);
  const solvers = gridSolversNow(problem);
  const study = (
    opts.grid ? solveFinWith(solvers, problem, { model: '2d', ...opts.grid }) : studyFinWith(solvers, problem, { model: '2d' })
  ) as FinStudy2D;
  const result = study.finest;
  const radial = isRadial(c);
  // Annular fins: the 2-D grid's x is the radius already (from r1 to r2).
  const line = (l: Fin2DLine): ProfilePoint[] =>
    Array.from(l.x_m, (x, i) => (radial ? { r_m: x, T_degC: l.T_degC[i] as number } : { x_m: x, T_degC: l.T_degC[i] as number }));
  const correction = edgeCorrection(c, solvers);
  const edges = correction ? correction.edgeHeatRate_W : 0;
  // check's reference value (reference2d.ts): extrapolated where the study gives it an error estimate of its own.
  const extrapolated = study.extrapolated;
  const section = extrapolated === null ? result.heatRate_W : extrapolated.heatRate_W;
  const heatRate = section + edges;
  const factor = heatRate / result.heatRate_W;
  const sectionIdeal = result.efficiency === null ? null : result.heatRate_W / result.efficiency;
  // The whole fin's Q_ideal: the section's surface plus the cooled side edges' (check's basis).
  const efficiency = efficiencyBasis(c, sectionIdeal === null ? null : sectionIdeal + (correction ? correction.edgesIdealHeatRate_W : 0), TWO_D_SURFACE);
  const ideal = efficiency.idealHeatRate;
  const errors2D = study.discretizationError;
  return {
    study,
    report: {
      case: c.name,
      model: 'fd-2d',
      grid: { nx: result.grid.nodesX, ny: result.grid.nodesY },
      heatRate_W: heatRate,
      sectionHeatRate_W: section,
      edgesHeatRate_W: edges,
      efficiency: ideal === null ? null : heatRate / ideal,
      efficiencyNote: efficiency.note,
      effectiveness: definedEffectiveness(result.effectiveness * factor, effectivenessBasis(c)),
      effectivenessNote: effectivenessBasis(c).note,
      baseTemperature_degC: extrapolated === null ? result.baseTemperature_degC : extrapolated.baseTemperature_degC,
      tipTemperature_degC: extrapolated === null ? result.tipTemperature_degC : extrapolated.tipTemperature_degC,
      energyBalance: result.energyBalance,
      discretizationError:
        errors2D === null ? null : (extrapolated === null ? errors2D : extrapolated.error) + (correction ? correction.discretizationError : 0),
      heatRateFrom: extrapolated === null ? 'finest-grid' : 'extrapolated',
      finestGridHeatRate_W: result.heatRate_W + edges,
      finestGridDiscretizationError: errors2D === null ? null : errors2D + (correction ? correction.discretizationError : 0),
      observedOrder: study.refinement === null ? null : study.refinement.observedOrder,
      newton: study.newton,
      centreline: line(result.centreline),
      surface: line(result.surface),
    },
  };
}
