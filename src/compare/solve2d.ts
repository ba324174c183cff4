/**
 * The fd-2d solution of the case (the 2-D mode of `fincheck solve`): a refinement study by default, or
 * exactly one grid of NX x NY nodes given by the caller (discretizationError null). Centre-line and surface
 * temperatures along the fin instead of a 1-D profile. The heat rate is the whole fin's, as check's fd-2d
 * reference: the section's, plus the cooled side edges' heat from fd-1d (sideEdgeCorrection).
 * Nonlinear fins (power-law h, grey radiation, k over temperature) are solved by Newton's method on the
 * same grids (nonlinear2d.ts, nonlinear2d-study.ts); the report then carries the Newton step counts.
 * Where the 2-D model does not apply (fin2dUnsupported, nonlinear2dUnsupported) the UsageError names why.
 */
import type { Case } from '../case/index.js';
import { UsageError } from '../errors.js';
import {
  solveFin2D,
  type Fin2DLine,
  type Fin2DResult,
  solveFin1D,
  studyFin1D,
  studyFin2D,
  type Fin2DStudy,
  isLinearFinCase,
  fin2dUnsupported,
  type NewtonReport,
  solveNonlinearFin2D,
  type NonlinearFin2DResult,
  type LinearFinCase,
  nonlinear2dUnsupported,
  studyNonlinearFin2D,
  solveNonlinearFin1D,
  studyNonlinearFin1D,
} from '../fd/index.js';
import { isStraight, sideEdgeCorrection, type SideEdgeCorrection } from './reference2d.js';
import { isRadial, type ProfilePoint } from './solve.js';

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
  /** Whole fin (as heatRate_W): Q / Q with every cooled surface at the base temperature. */
  efficiency: number | null;
  effectiveness: number;
  baseTemperature_degC: number;
  tipTemperature_degC: number;
  energyBalance: number;
  discretizationError: number | null;
  observedOrder: number | null;
  /** Nonlinear fins only (null for a linear fin). */
  newton: Solve2DNewton | null;
  /** Mid-plane (straight, annular) or axis (pins), base to tip; annular fins give the radius r_m instead of x_m. */
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
  if (unsupported !== null) throw new UsageError(`fd-2d: ${unsupported}; the 1-D model solves this fin`);
  if (grid) {
    const result: NonlinearFin2DResult = solveNonlinearFin2D(c, grid);
    const steps = result.newton.totalIterations + result.newton.coarseGridIterations;
    return { study: null, result, newton: { stepsPerGrid: [steps], finest: result.newton } };
  }
  const study = studyNonlinearFin2D(c);
  return { study, result: study.finest, newton: { stepsPerGrid: study.iterations, finest: study.finest.newton } };
}

/**
 * The side edges' correction exactly as check computes it (same fd-1d study, same grid), or null when the
 * fin has no cooled side edges. `edgesIdealHeatRate_W` is the edges' share of Q_ideal (fd-1d with the edges
 * cooled minus insulated), so the efficiency has check's basis: the 2-D section's surface plus the edges.
 */
function edgeCorrection(c: Case): { edges: SideEdgeCorrection; edgesIdealHeatRate_W: number } | null {
  if (c.fin.edges !== 'cooled' || !isStraight(c)) return null;
  const insulated = { ...c, fin: { ...c.fin, edges: 'insulated' as const } };
  if (isLinearFinCase(c)) {
    const oneD = studyFin1D(c);
    const edges = sideEdgeCorrection<LinearFinCase>(c, oneD, (variant, nodes) => solveFin1D(variant, { nodes }).heatRate);
    const ideal = (v: LinearFinCase): number => solveFin1D(v, { nodes: 3 }).idealHeatRate;
    return { edges, edgesIdealHeatRate_W: oneD.result.idealHeatRate - ideal(insulated as LinearFinCase) };
  }
  const oneD = studyNonlinearFin1D(c);
  const edges = sideEdgeCorrection(c, oneD, (variant, nodes) => solveNonlinearFin1D(variant, { nodes }).heatRate);
  return { edges, edgesIdealHeatRate_W: oneD.result.idealHeatRate - solveNonlinearFin1D(insulated, { nodes: 3 }).idealHeatRate };
}

/** Why the 2-D model cannot solve this case (linear or nonlinear), or null when it can. */
export function solve2dUnsupported(c: Case): string | null {
  return isLinearFinCase(c) ? fin2dUnsupported(c) : nonlinear2dUnsupported(c);
}

export function runSolve2D(c: Case, opts: { grid?: { nx: number; ny: number } }): { report: Solve2DReport; result: Fin2DResult } {
  const { study, result, newton } = isLinearFinCase(c) ? solveLinear(c, opts.grid) : solveNonlinear(c, opts.grid);
  const radial = isRadial(c);
  // Annular fins: the 2-D grid's x is the radius already (from r1 to r2).
  const line = (l: Fin2DLine): ProfilePoint[] =>
    Array.from(l.x_m, (x, i) => (radial ? { r_m: x, T_degC: l.T_degC[i] as number } : { x_m: x, T_degC: l.T_degC[i] as number }));
  const correction = edgeCorrection(c);
  const heatRate = result.heatRate_W + (correction ? correction.edges.edgeHeatRate_W : 0);
  const factor = heatRate / result.heatRate_W;
  const sectionIdeal = result.efficiency === null ? null : result.heatRate_W / result.efficiency;
  const errors2D = study ? study.discretizationError : null;
  return {
    result,
    report: {
      case: c.name,
      model: 'fd-2d',
      grid: { nx: result.grid.nodesX, ny: result.grid.nodesY },
      heatRate_W: heatRate,
      sectionHeatRate_W: result.heatRate_W,
      edgesHeatRate_W: heatRate - result.heatRate_W,
      efficiency: sectionIdeal === null ? null : heatRate / (sectionIdeal + (correction ? correction.edgesIdealHeatRate_W : 0)),
      effectiveness: result.effectiveness * factor,
      baseTemperature_degC: result.baseTemperature_degC,
      tipTemperature_degC: result.tipTemperature_degC,
      energyBalance: result.energyBalance,
      discretizationError: errors2D === null ? null : errors2D + (correction ? correction.edges.discretizationError : 0),
      observedOrder: study ? study.heatRate.observedOrder : null,
      newton,
      centreline: line(result.centreline),
      surface: line(result.surface),
    },
  };
}
