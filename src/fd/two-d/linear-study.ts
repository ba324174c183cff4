/**
 * fd-2d with its discretisation error: the same fin on three or more systematically refined grids,
 * Richardson extrapolation and the Grid Convergence Index (refinement.ts, Celik et al. 2008).
 *
 * Grid family: cells across Cy = c0 * 2^l and cells along Cx = C0 * 2^l (gridFamily2D says how c0 and C0 follow
 * from the fin's Biot number, length, half-thickness and mL): every grid is the same smooth map refined by exactly 2
 * in both directions (representative size sqrt(L b / (Cx Cy)), ratio 2), the grading included.
 * Observed order: the scheme is second order, but the flux has a logarithmic singularity at the base
 * corner, where the fixed base temperature meets the cooled face (incompatible Dirichlet and Robin data);
 * its weight grows with Bi, and so do the default grids' cells across. Measured with the default grading: 1.85-1.99
 * on plate and pin fins (Bi 0.01-2; the extrapolated heat rate within 8.2e-7 of the exact series), 1.92-
 * 1.96 on thick sloped fins (Bi = 1), 1.99-2.02 in the thin limit; on uniform grids 1.6-1.9 (the independent
 * uniform-grid finite-volume check in script fin2d_series.py found 1.7-1.85).
 */
import type { Case } from '../../case/index.js';
import { fin2dProblem, type Fin2DProblem } from './problem.js';
import { DEFAULT_GRADING, solveFin2DProblem, type Fin2DResult } from './linear-solve.js';
import { KELVIN_OFFSET, STEFAN_BOLTZMANN } from '../problem/fin-problem.js';
import type { NonlinearFin2DProblem } from './nonlinear-problem.js';
import { extrapolationError, richardsonGci, type RefinementStudy } from '../study/refinement.js';
import { solveGrids } from '../study/refinement-loop.js';
import type { SolverMethod } from '../linear-algebra/auto-solver.js';
import type { Solver2D } from '../linear-algebra/stencil9.js';

export interface Fin2DStudyOptions {
  /** Number of grids (>= 3, default 3). */
  levels?: number;
  /** Cells across the half-thickness on the coarsest grid (default max(8, ceil(20 Bi^(1/3))), gridFamily2D). */
  coarseCellsAcross?: number;
  /** Target cell aspect ratio, length along / height across, before grading (default 2, less for thick fins: gridFamily2D). */
  aspect?: number;
  /** Grading toward the base and the face (largest/smallest cell); defaults in DEFAULT_GRADING (two-d/linear-solve.ts). */
  baseGrading?: number;
  faceGrading?: number;
  solver?: Solver2D;
  method?: SolverMethod | 'auto';
}

export interface Fin2DGridValue {
  nx: number;
  ny: number;
  /** Representative cell size sqrt(L b / cells), m. */
  size: number;
  heatRate_W: number;
  efficiency: number | null;
  energyBalance: number;
  baseTemperature_degC: number;
  tipTemperature_degC: number;
}

/**
 * The Richardson-extrapolated values of a study (three finest grids) with an error estimate of the extrapolated
 * heat rate itself (one more, coarser grid: refinement.ts, extrapolationError).
 */
export interface Extrapolated2D {
  /** Extrapolated heat rate, W (the study's extrapolatedHeatRate_W). */
  heatRate_W: number;
  /** Estimated relative error of heatRate_W (not the finest grid's GCI). */
  error: number;
  /** Extrapolated efficiency (null for an infinite tip). */
  efficiency: number | null;
  /** Base and tip temperatures, each extrapolated from its own three-grid study where that has a credible order (else the finest grid's), degC. */
  baseTemperature_degC: number;
  tipTemperature_degC: number;
}

export interface Fin2DStudy {
  model: 'fd-2d';
  /** The finest grid's full result (field, lines, heat rates). */
  finest: Fin2DResult;
  /** Every grid, finest first. */
  grids: Fin2DGridValue[];
  /** Study of the base heat rate. */
  heatRate: RefinementStudy;
  /** Study of the efficiency (null for an infinite tip). */
  efficiency: RefinementStudy | null;
  /** Finest-grid heat rate, W, and its estimated relative error (GCI). */
  heatRate_W: number;
  discretizationError: number;
  /** Richardson-extrapolated heat rate, W. */
  extrapolatedHeatRate_W: number;
  /**
   * The extrapolated values with an error estimate of their own, or null when the grids do not support one (no
   * credible order on either triplet, or an estimate no better than the finest grid's GCI): then the finest grid's
   * values and GCI are the study's best.
   */
  extrapolated: Extrapolated2D | null;
  /** Largest energy balance over the grids. */
  energyBalance: number;
}

export function studyFin2D(c: Case, opts: Fin2DStudyOptions = {}): Fin2DStudy {
  return studyFin2DProblem(fin2dProblem(c), opts);
}

export function studyFin2DProblem(problem: Fin2DProblem, opts: Fin2DStudyOptions = {}): Fin2DStudy {
  const grids = gridFamily2D(problem, opts);
  const results = solveGrids(grids, (g) =>
    solveFin2DProblem(problem, {
      nx: g.nx,
      ny: g.ny,
      baseGrading: opts.baseGrading ?? DEFAULT_GRADING.base,
      faceGrading: opts.faceGrading ?? DEFAULT_GRADING.face,
      ...(opts.solver ? { solver: opts.solver } : {}),
      ...(opts.method ? { method: opts.method } : {}),
    }),
  );
  return summariseStudy2D(results, gridValues(grids, results));
}

/** The grid values (nodes, size, heat rate, efficiency, energy balance) of solved grids, coarsest first. */
export function gridValues(grids: readonly { nx: number; ny: number; size: number }[], results: readonly Fin2DResult[]): Fin2DGridValue[] {
  return results.map((r, k) => {
    const g = grids[k] as { nx: number; ny: number; size: number };
    return {
      nx: g.nx,
      ny: g.ny,
      size: g.size,
      heatRate_W: r.heatRate_W,
      efficiency: r.efficiency,
      energyBalance: r.energyBalance,
      baseTemperature_degC: r.baseTemperature_degC,
      tipTemperature_degC: r.tipTemperature_degC,
    };
  });
}

/**
 * The study of solved grids: `results` and their `values` (nx, ny, size, heat rate...) coarsest first
 * (`values` is reversed in place, finest first). Richardson extrapolation and GCI of the heat rate and
 * the efficiency on the three finest grids; with a fourth grid, the error of the extrapolated values.
 */
export function summariseStudy2D(results: Fin2DResult[], values: Fin2DGridValue[]): Fin2DStudy {
  values.reverse();
  const finest = results[results.length - 1] as Fin2DResult;
  const heatRate = richardsonGci(values.map((v) => ({ size: v.size, value: v.heatRate_W })));
  const efficiency = finest.efficiency === null ? null : richardsonGci(values.map((v) => ({ size: v.size, value: v.efficiency as number })));
  return {
    ...studyOf(finest, values, heatRate, efficiency),
    extrapolated: values.length < 4 ? null : extrapolated2D(values, heatRate, efficiency),
  };
}

/** The extrapolated values of a study of four or more grids (finest first), or null (Fin2DStudy.extrapolated). */
function extrapolated2D(values: readonly Fin2DGridValue[], heatRate: RefinementStudy, efficiency: RefinementStudy | null): Extrapolated2D | null {
  const coarser = richardsonGci(values.slice(1).map((v) => ({ size: v.size, value: v.heatRate_W })));
  const error = extrapolationError(heatRate, coarser);
  if (error === null) return null;
  const temperature = (of: (v: Fin2DGridValue) => number): number => {
    const s = richardsonGci(values.map((v) => ({ size: v.size, value: of(v) })));
    return s.observedOrder !== null && s.orderUsed === s.observedOrder ? s.extrapolated : of(values[0] as Fin2DGridValue);
  };
  return {
    heatRate_W: heatRate.extrapolated,
    error,
    efficiency: efficiency === null ? null : efficiency.extrapolated,
    baseTemperature_degC: temperature((v) => v.baseTemperature_degC),
    tipTemperature_degC: temperature((v) => v.tipTemperature_degC),
  };
}

function studyOf(
  finest: Fin2DResult,
  values: Fin2DGridValue[],
  heatRate: RefinementStudy,
  efficiency: RefinementStudy | null,
): Omit<Fin2DStudy, 'extrapolated'> {
  return {
    model: 'fd-2d',
    finest,
    grids: values,
    heatRate,
    efficiency,
    heatRate_W: finest.heatRate_W,
    discretizationError: heatRate.gci,
    extrapolatedHeatRate_W: heatRate.extrapolated,
    energyBalance: Math.max(...values.map((v) => v.energyBalance)),
  };
}

/**
 * The grids of a study, coarsest first: nodes (nx, ny) and representative size. Cells across double
 * from `coarseCellsAcross`; cells along keep the cells near the base about `aspect` times longer than
 * high, and resolve the decay length 1/m (8 coarse cells per unit of mL, m from the base section).
 * Below the `levels` grids one more grid with half the coarsest grid's cells each way (rounded up) gives the
 * error estimate of the extrapolated values (summariseStudy2D; a quarter of the coarsest grid's work).
 *
 * Default cells across: max(8, ceil(20 Bi^(1/3))), Bi = h b / k at the base, and the aspect 2 / min(that / 8, 2).
 * The base corner's log flux singularity (fixed base meeting the cooled face) has a weight that grows with Bi,
 * and it, not the smooth part, sets the error left in the extrapolated heat rate. Chosen by measurement against
 * the exact 2-D series of the plate and pin fins (tests/fd2d/plate.test.ts, axisymmetric.test.ts; Bi 0.01-2, mL
 * 0.5-4 and infinite): with 8 across everywhere the extrapolated value's true error reached 1.1e-5 at Bi >= 0.5;
 * with this rule it is at most 8.2e-7 on every case (issue 14's 1e-6), while thin fins (Bi < 0.07) keep the
 * 8 cells across and their cost. Stronger geometric or power grading toward the corner did not help (measured:
 * ratios 16 and 32, or a power map s^1.5-s^2 under the geometric one, all worse than ratio 8 at equal nodes).
 */
export function gridFamily2D(problem: Fin2DProblem, opts: Fin2DStudyOptions = {}): { nx: number; ny: number; size: number }[] {
  const levels = opts.levels ?? 3;
  if (!Number.isInteger(levels) || levels < 3) throw new RangeError(`studyFin2D: levels must be an integer >= 3 (got ${levels})`);
  const { section, k } = problem;
  const b = section.halfSize(0);
  const L = section.length;
  const hMax = maxCoefficient(problem);
  const biot = (hMax * b) / k;
  const across0 = opts.coarseCellsAcross ?? Math.max(8, Math.ceil(20 * Math.cbrt(biot)));
  const aspect = opts.aspect ?? 2 / Math.min(across0 / 8, 2);
  // 1-D fin parameter of the base section: m^2 = h P/(k A) = h/(k b) (planar, annular), 2h/(k R) (pins).
  const m = Math.sqrt(((section.kind === 'pin' ? 2 : 1) * hMax) / (k * b));
  // Long thin fins: once 1/m is resolved (32 coarse cells per unit of mL + 32), longer cells cost little
  // accuracy, because the thickness effects they blur are weighted by Bi << 1.
  const byAspect = Math.min(Math.ceil((across0 * L) / (aspect * b)), Math.ceil(32 * (1 + m * L)));
  const along0 = Math.max(2, section.breakpoints.length - 1, byAspect, Math.ceil(8 * m * L));
  const checkX = Math.max(section.breakpoints.length - 1, Math.ceil(along0 / 2));
  const checkY = Math.ceil(across0 / 2);
  const out: { nx: number; ny: number; size: number }[] = [{ nx: checkX + 1, ny: checkY + 1, size: Math.sqrt((L * b) / (checkX * checkY)) }];
  for (let l = 0; l < levels; l++) {
    const cx = along0 * 2 ** l;
    const cy = across0 * 2 ** l;
    out.push({ nx: cx + 1, ny: cy + 1, size: Math.sqrt((L * b) / (cx * cy)) });
  }
  return out;
}

/** Largest h on the faces, W/(m^2*K) (sizes the grids). */
export function maxCoefficient(problem: Fin2DProblem): number {
  const h = problem.h;
  switch (h.kind) {
    case 'uniform':
      return h.h;
    case 'linear':
      return Math.max(h.base, h.tip);
    case 'points':
      return Math.max(...h.h);
    default: {
      const never: never = h;
      throw new Error(`maxCoefficient: ${JSON.stringify(never)}`);
    }
  }
}

/**
 * Grid sizing of a fin with laws on top of its linear problem (problem/fin-problem.ts): the family resolves
 * the decay length 1/m with m from the largest position part of h; a radiating fin adds its radiative
 * tangent coefficient 4 ε σ T^3 at the hotter of the base and the surroundings, so a fin cooled mostly (or
 * only) by radiation gets the cells its decay length needs. A linear fin gets its own problem's grids.
 */
export function sizingProblem(problem: NonlinearFin2DProblem): NonlinearFin2DProblem['linear'] {
  const { linear, physics } = problem;
  const emissivity = physics.radiation.emissivity;
  if (emissivity === 0) return linear;
  const hottest = Math.max(linear.thetaBase + linear.ambient_degC + KELVIN_OFFSET, physics.radiation.surroundings_K);
  const radiative = 4 * emissivity * STEFAN_BOLTZMANN * hottest ** 3;
  return { ...linear, h: { kind: 'uniform', h: maxCoefficient(linear) + radiative } };
}
