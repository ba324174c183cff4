/**
 * fd-2d: the fin solved across its thickness on one grid.
 *
 * Pipeline (one function per stage): case -> 2-D problem (two-d/problem.ts) -> grid (mesh/grid2d.ts) ->
 * conduction operator (two-d/assemble.ts) -> boundary terms and system (two-d/boundary.ts) -> solve
 * (any Solver2D; automatic choice by default) -> heat rates and lines (two-d/heat-rate.ts, here).
 * Temperatures: the field is the excess theta = T - T_inf (K) at the grid nodes, flat, with the grid's
 * shape and strides (ndarray style, shared with the grid, never copied). Heat rates in W for the whole
 * fin (width x section for straight fins, 2 pi x section for pins and annular fins).
 */
import type { Case } from '../../case/index.js';
import { GridError } from '../../errors.js';
import { buildGrid2D, type Grid2D } from '../../mesh/index.js';
import { assembleConduction2D } from './assemble.js';
import { buildSystem2D, discretizeBoundaries, lumpedIntegral } from './boundary.js';
import { hAt } from '../problem/convection.js';
import { fin2dProblem, type Fin2DProblem } from './problem.js';
import { heatRates2D } from './heat-rate.js';
import { prepareSolver2D, type SolverMethod } from '../linear-algebra/auto-solver.js';
import type { Solver2D } from '../linear-algebra/stencil9.js';

/**
 * Grading ratios used by default: cells 8x smaller at the base than at the tip, and at the face than on
 * the mid-plane. Chosen by measurement against the plate-fin 2-D series (computed reference values,
 * script fin2d_series.py; Bi 0.01-2, mL 0.5-4): the worst extrapolated error fell from 2.5e-5
 * (ratios 4) and 1.2e-4 (one direction only) to 1.2e-5, and the observed order rose from 1.76-1.98 to
 * 1.85-1.99, for the same node counts.
 */
export const DEFAULT_GRADING = { base: 8, face: 8 } as const;

export interface Fin2DOptions {
  /** Grid nodes along the fin (>= 2). */
  nx: number;
  /** Grid nodes across the half-thickness (or radius) (>= 2). */
  ny: number;
  /** Linear solver; default: `method`. */
  solver?: Solver2D;
  /** Built-in solver when `solver` is not given: chosen by grid shape by default ('auto'). */
  method?: SolverMethod | 'auto';
  /** Largest/smallest cell length along the fin, smallest at the base (default DEFAULT_GRADING.base; 1 = uniform). */
  baseGrading?: number;
  /** Largest/smallest cell height across, smallest at the face (default DEFAULT_GRADING.face; 1 = uniform). */
  faceGrading?: number;
}

export interface Fin2DLine {
  /** Position along the fin, m (annular: radius). */
  x_m: Float64Array;
  /** Position across the fin, m (half-thickness coordinate or radius). */
  y_m: Float64Array;
  T_degC: Float64Array;
}

export interface Fin2DResult {
  model: 'fd-2d';
  grid: Grid2D;
  /** Excess temperature theta = T - T_inf (K) at the nodes: index i * grid.stride[0] + j * grid.stride[1]. */
  field: Float64Array;
  ambient_degC: number;
  /** Heat entering the fin at its base, W (whole fin). */
  heatRate_W: number;
  /** Heat leaving through the faces and tip, W (faceHeatRate_W + tipHeatRate_W). */
  surfaceHeatRate_W: number;
  /** Heat leaving through the cooled faces, W. */
  faceHeatRate_W: number;
  /** Heat leaving through the tip, W (negative when a fixed tip temperature feeds heat in). */
  tipHeatRate_W: number;
  /** |Q_base - Q_surfaces| / Q_base. */
  energyBalance: number;
  /** Q / (heat rate with every cooled surface at the base temperature, same h); null for an infinite tip. */
  efficiency: number | null;
  /** Q / (h at the base x base area x theta_base). */
  effectiveness: number;
  baseTemperature_degC: number;
  /**
   * At the centre of the tip (x = end of the section, on the mid-plane or axis), degC. An infinite fin
   * reports its limit, the ambient temperature (its field ends at the cut, see two-d/problem.ts).
   */
  tipTemperature_degC: number;
  /** Mid-plane (straight, annular) or axis (pins), from base to tip. */
  centreline: Fin2DLine;
  /** The cooled face, from base to tip. */
  surface: Fin2DLine;
  /** h (t/2)/k (straight, annular) or h (D/2)/k (pins) at the base. */
  biot: number;
  /** True when an infinite fin was cut and closed by its exact slowest mode (see two-d/problem.ts). */
  truncatedInfinite: boolean;
  /** The linear solver that ran ('custom' when the caller passed one). */
  solver: SolverMethod | 'custom';
}

export function solveFin2D(c: Case, opts: Fin2DOptions): Fin2DResult {
  return solveFin2DProblem(fin2dProblem(c), opts);
}

/**
 * Largest grid accepted: ~500 bytes per node were measured (1000 x 1000 nodes: ~500 MB resident with the
 * multigrid hierarchy), so 2e6 nodes stay near the 1 GB budget.
 */
export const MAX_NODES_2D = 2_000_000;

export function solveFin2DProblem(problem: Fin2DProblem, opts: Fin2DOptions): Fin2DResult {
  const { nx, ny } = opts;
  checkGrid2D(problem, nx, ny);
  const grid = buildGrid2D(problem.section, {
    nx: opts.nx,
    ny: opts.ny,
    baseGrading: opts.baseGrading ?? DEFAULT_GRADING.base,
    faceGrading: opts.faceGrading ?? DEFAULT_GRADING.face,
  });
  const K = assembleConduction2D(grid, problem.k);
  const terms = discretizeBoundaries(grid, problem.conditions);
  const system = buildSystem2D(K, terms);
  let method: SolverMethod | 'custom' = 'custom';
  let field: Float64Array;
  if (opts.solver !== undefined) field = opts.solver(system);
  else {
    const prepared = prepareSolver2D(system, opts.method ?? 'auto');
    method = prepared.method;
    field = prepared.solve(system);
  }
  const rates = heatRates2D(K, terms, field);
  const depth = grid.depth;
  const heatRate = rates.base * depth;
  const { thetaBase, ambient_degC } = problem;

  // Efficiency: every cooled surface (faces, and the tip when convective) at the base temperature.
  let ideal = 0;
  for (const side of [terms.face, terms.tip]) {
    if (side.kind === 'convective') for (const g of side.conductance) ideal += g * thetaBase;
  }
  const efficiency = problem.truncatedInfinite ? null : (rates.base / ideal);
  const baseArea = sum(lumpedIntegral(grid, terms.base.nodes, () => 1));
  const hBase = hAt(problem.h, 0, problem.section.length);
  const effectiveness = rates.base / (hBase * baseArea * thetaBase);

  const line = (j: number): Fin2DLine => gridLine(grid, field, ambient_degC, j);
  return {
    model: 'fd-2d',
    grid,
    field,
    ambient_degC,
    heatRate_W: heatRate,
    surfaceHeatRate_W: rates.surfaces * depth,
    faceHeatRate_W: rates.face * depth,
    tipHeatRate_W: rates.tip * depth,
    energyBalance: rates.energyBalance,
    efficiency,
    effectiveness,
    baseTemperature_degC: thetaBase + ambient_degC,
    tipTemperature_degC: problem.truncatedInfinite ? ambient_degC : (field[(nx - 1) * ny] as number) + ambient_degC,
    centreline: line(0),
    surface: line(ny - 1),
    biot: (hBase * problem.section.halfSize(0)) / problem.k,
    truncatedInfinite: problem.truncatedInfinite,
    solver: method,
  };
}

/** A GridError unless the grid has whole numbers >= 2 of nodes, one per profile point, and fits in memory. */
export function checkGrid2D(problem: Fin2DProblem, nx: number, ny: number): void {
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 2 || ny < 2) {
    throw new GridError(`nodes along and across must be whole numbers >= 2 (got ${nx} x ${ny})`);
  }
  const segments = problem.section.breakpoints.length - 1;
  if (nx - 1 < segments) {
    throw new GridError(`the profile has ${segments + 1} points, so it needs at least ${segments + 1} nodes along (got ${nx})`);
  }
  if (nx * ny > MAX_NODES_2D) {
    throw new GridError(`${nx} x ${ny} = ${nx * ny} nodes is more than the ${MAX_NODES_2D} that fit in about 1 GB`);
  }
}

/** The nodes j (0: mid-plane or axis, ny - 1: the face) of every column, base to tip, in degC. */
export function gridLine(grid: Grid2D, field: Float64Array, ambient_degC: number, j: number): Fin2DLine {
  const { nodesX: nx, nodesY: ny } = grid;
  const x_m = new Float64Array(nx);
  const y_m = new Float64Array(nx);
  const T_degC = new Float64Array(nx);
  for (let i = 0; i < nx; i++) {
    const p = i * ny + j;
    x_m[i] = grid.x[p] as number;
    y_m[i] = grid.y[p] as number;
    T_degC[i] = (field[p] as number) + ambient_degC;
  }
  return { x_m, y_m, T_degC };
}

function sum(a: Float64Array): number {
  let s = 0;
  for (const v of a) s += v;
  return s;
}
