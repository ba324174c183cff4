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
import { buildGrid2D, type Grid2D, type Section2D } from '../../mesh/index.js';
import { conductionOperator } from './conduction-cache.js';
import { buildSystem2D, discretizeBoundaries, lumpedConstant } from './boundary.js';
import { hAt } from '../problem/convection.js';
import { fin2dProblem, type Fin2DProblem } from './problem.js';
import { heatRates2D } from './heat-rate.js';
import { prepareSolver2D, type SolverMethod } from '../linear-algebra/auto-solver.js';
import type { Solver2D, System2D } from '../linear-algebra/stencil9.js';
import { doneWith, keptSolver2D } from './kept-solver.js';

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
  const K = conductionOperator(grid, problem.k);
  const terms = discretizeBoundaries(grid, problem.conditions);
  const system = buildSystem2D(K, terms);
  // Solve for the departure from the fin's lumped level (see lumpedLevel), then add the level back.
  const level = lumpedLevel(system);
  const shifted = shiftSystem(system, level);
  let method: SolverMethod | 'custom' = 'custom';
  let field: Float64Array;
  if (opts.solver !== undefined) field = opts.solver(shifted);
  else if ((opts.method ?? 'auto') === 'auto') {
    // The automatic choice, kept for a following system with this matrix (kept-solver.ts: the adjoint's).
    const prepared = keptSolver2D(shifted);
    field = prepared.solve(shifted);
    method = prepared.method;
    doneWith(prepared, shifted);
  } else {
    const prepared = prepareSolver2D(shifted, opts.method ?? 'auto');
    field = prepared.solve(shifted);
    method = prepared.method;
    prepared.release();
  }
  for (let p = 0; p < field.length; p++) field[p] = (field[p] as number) + level;
  const rates = heatRates2D(K, terms, field);
  const depth = grid.depth;
  const heatRate = rates.base * depth;
  const { thetaBase, ambient_degC } = problem;

  // Efficiency: every cooled surface (faces, and the tip when convective) at the base temperature.
  let ideal = 0;
  for (const side of [terms.face, terms.tip]) {
    if (side.kind === 'convective') for (const g of side.conductance) ideal += g * thetaBase;
  }
  const efficiency = problem.truncatedInfinite ? null : rates.base / ideal;
  const baseArea = sum(lumpedConstant(grid, terms.base.nodes, 1));
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

/**
 * Why a grid of nx x ny nodes cannot mesh this section, or null when it can: whole numbers >= 2 of nodes,
 * one node along per profile point, and no more than fit in memory. In the problem's words; the command
 * that took the grid from an option adds the option's name.
 */
export function grid2dIssue(section: Section2D, nx: number, ny: number): string | null {
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 2 || ny < 2) {
    return `nodes along and across must be whole numbers >= 2 (got ${nx} x ${ny})`;
  }
  const segments = section.breakpoints.length - 1;
  if (nx - 1 < segments) return `the profile has ${segments + 1} points, so it needs at least ${segments + 1} nodes along (got ${nx})`;
  if (nx * ny > MAX_NODES_2D) return `${nx} x ${ny} = ${nx * ny} nodes is more than the ${MAX_NODES_2D} that fit in about 1 GB`;
  return null;
}

/** A GridError unless the grid can mesh the problem's section (grid2dIssue). */
export function checkGrid2D(problem: Fin2DProblem, nx: number, ny: number): void {
  const issue = grid2dIssue(problem.section, nx, ny);
  if (issue !== null) throw new GridError(issue);
}

/**
 * The excess temperature at which a fin without a fixed-temperature boundary (a base behind a contact
 * resistance, a tip not fixed) floats with unlimited conduction: sum rhs / sum of the row sums, K; 0 when
 * some node is fixed (the field is then anchored there). The solvers work on theta - level: a solution is
 * only known to its own round-off, eps |x|, and each conductance turns that into a heat-flow error of
 * eps |x| times itself. Where the conductances inside the fin dwarf those to the body and the fluid (a thin
 * copper annular fin, t = 0.05 mm, behind 1e-3 m^2 K/W: 16 of 384 such cases failed, multigrid CG stalling
 * at 1.2e-7 relative) that floor, eps |theta|, was above the accuracy target; the departure from the
 * level is ~1000 times smaller there, and so is the floor. Exact: A 1 = the row sums.
 */
export function lumpedLevel(system: System2D): number {
  const { rhs, excess } = system;
  if (excess === undefined || hasFixedRows(system)) return 0;
  let pull = 0;
  let conductance = 0;
  for (let p = 0; p < rhs.length; p++) {
    pull += rhs[p] as number;
    conductance += excess[p] as number;
  }
  return conductance > 0 ? pull / conductance : 0;
}

/** The system for theta - level: same matrix, rhs - level x row sums (A 1 = row sums). */
export function shiftSystem(system: System2D, level: number): System2D {
  const { excess } = system;
  if (excess === undefined || level === 0) return system;
  // A plain loop: Float64Array.from with a map function calls it through the iterator protocol (~25x slower in V8).
  const rhs = new Float64Array(system.rhs.length);
  for (let p = 0; p < rhs.length; p++) rhs[p] = (system.rhs[p] as number) - level * (excess[p] as number);
  return { ...system, rhs };
}

/** Whether some row is the identity of a fixed node (no couplings at all, buildSystem2D). */
function hasFixedRows(system: System2D): boolean {
  const { matrix: a } = system;
  const { nodesX: nx, nodesY: ny } = a;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const coupled =
        a.east[p] !== 0 ||
        a.north[p] !== 0 ||
        a.northEast[p] !== 0 ||
        a.southEast[p] !== 0 ||
        (i > 0 && (a.east[p - ny] !== 0 || (j > 0 && a.northEast[p - ny - 1] !== 0) || (j + 1 < ny && a.southEast[p - ny + 1] !== 0))) ||
        (j > 0 && a.north[p - 1] !== 0);
      if (!coupled) return true;
    }
  }
  return false;
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
