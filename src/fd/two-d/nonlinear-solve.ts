/**
 * fd-2d for nonlinear fins (power-law h, grey radiation, k over temperature): the fin solved across its
 * thickness by Newton's method on one grid.
 *
 * Equation (two-d/problem/fin-problem.ts): div(k(T) r grad T) = 0 in the section, -k dT/dn = h_x |θ/θ_b|^n θ
 * + ε σ (T^4 - T_s^4) on the cooled faces (and a convective tip), θ = T - T_amb in K, T absolute in K;
 * k W/(m K), h W/(m^2 K), heat rates in W for the whole fin (width x section for straight fins, 2 pi x
 * section for pins and annular fins). Straight fins have insulated side edges (as the linear fd-2d).
 * Discrete form: the linear scheme on the same boundary-fitted grid (two-d/assemble.ts, median-dual finite
 * volumes) applied to the Kirchhoff potential, boundary losses lumped per boundary node
 * (two-d/newton-setup.ts). Solve: Newton with the symmetrised Jacobian and a line search
 * (two-d/newton-system.ts), converged to a relative residual <= 1e-10 and a heat-rate change <= 1e-10;
 * when Newton alone fails, natural-parameter continuation in the nonlinearity (exponent s n, emissivity
 * s ε, k_ref + s (k - k_ref), s from 0 to 1; Allgower, E. L. & Georg, K., 1990, Numerical Continuation
 * Methods, Springer, ch. 1 [from memory]) as in 1-D (one-d/newton-solve.ts); a failure is a SolverError
 * (exit code 3) that says what to change.
 * Start: a grid with an even number of cells both ways and more than NESTED_MIN_NODES nodes starts from
 * the solution on the grid with half the cells (nested iteration, recursively); otherwise from the base
 * temperature everywhere. A linear case (n = 0, ε = 0, constant k) is solved by the first step from the
 * base temperature, which is the linear solver's system: the result is fd-2d's (two-d/linear-solve.ts) to round-off.
 */
import { continueFromLinear } from '../newton/continuation.js';
import type { Case } from '../../case/index.js';
import { SolverError } from '../../errors.js';
import { buildGrid2D, type Grid2D } from '../../mesh/index.js';
import { checkGrid2D, DEFAULT_GRADING, gridLine, type Fin2DResult } from './linear-solve.js';
import type { NewtonReport } from '../newton/newton-report.js';
import { isLinearProblem, scaleNonlinearity } from '../problem/fin-problem.js';
import { baseCoefficient, effectiveness2D, idealHeatRate2D } from './newton-heat-rate.js';
import { newtonSolve2D, type Newton2DOptions, type Newton2DOutcome } from './newton-system.js';
import { nonlinearFin2DProblem, type NonlinearFin2DProblem } from './nonlinear-problem.js';
import { gridOperators2D, newton2DSetup, type GridOperators2D, type Newton2DSetup } from './newton-setup.js';

export interface NonlinearFin2DOptions extends Newton2DOptions {
  /** Grid nodes along the fin and across the half-thickness (or radius), >= 2 each. */
  readonly nx: number;
  readonly ny: number;
  /** Grading toward the base and the face (largest/smallest cell); defaults DEFAULT_GRADING (two-d/linear-solve.ts). */
  readonly baseGrading?: number;
  readonly faceGrading?: number;
  /** Start from the grid with half the cells when possible (default true). */
  readonly nested?: boolean;
}

export interface NonlinearFin2DResult extends Fin2DResult {
  readonly newton: NewtonReport;
}

/** Grids with more nodes than this start from the grid with half the cells (when the counts allow). */
const NESTED_MIN_NODES = 2000;

export function solveNonlinearFin2D(c: Case, opts: NonlinearFin2DOptions): NonlinearFin2DResult {
  return solveNonlinearFin2DProblem(nonlinearFin2DProblem(c), opts);
}

/**
 * Solves on an nx x ny grid, from `start` (a solution of the same problem on a coarser grid of the same
 * family, interpolated) or, with `nested`, from the grid with half the cells.
 */
export function solveNonlinearFin2DProblem(problem: NonlinearFin2DProblem, opts: NonlinearFin2DOptions, start?: Fin2DResult): NonlinearFin2DResult {
  const { nx, ny } = opts;
  checkGrid2D(problem.linear, nx, ny);
  const grid = buildGrid2D(problem.linear.section, {
    nx,
    ny,
    baseGrading: opts.baseGrading ?? DEFAULT_GRADING.base,
    faceGrading: opts.faceGrading ?? DEFAULT_GRADING.face,
  });
  const ops = gridOperators2D(problem, grid);
  const setup = newton2DSetup(problem, problem.physics, ops);
  let initial: Float64Array = new Float64Array(nx * ny);
  let coarseGridIterations = 0;
  const segments = problem.linear.section.breakpoints.length - 1;
  if (!setup.linear && start !== undefined) {
    initial = dropsOf(setup, interpolateField(start.grid, start.field, grid));
  } else if (
    !setup.linear &&
    (opts.nested ?? true) &&
    nx * ny > NESTED_MIN_NODES &&
    (nx - 1) % 2 === 0 &&
    (ny - 1) % 2 === 0 &&
    (nx - 1) / 2 >= segments
  ) {
    const coarse = solveNonlinearFin2DProblem(problem, { ...opts, nx: (nx - 1) / 2 + 1, ny: (ny - 1) / 2 + 1 });
    initial = dropsOf(setup, interpolateField(coarse.grid, coarse.field, grid));
    coarseGridIterations = coarse.newton.totalIterations + coarse.newton.coarseGridIterations;
  }
  const solved = solveOnGrid(problem, ops, setup, initial, opts);
  return finish(problem, setup, solved, coarseGridIterations);
}

/** Drops θ_b - θ of an excess-temperature field, K. */
function dropsOf(setup: Newton2DSetup, theta: Float64Array): Float64Array {
  const reference = setup.thetaBase;
  return theta.map((t) => reference - t);
}

/**
 * A nodal field of a coarse grid on the nodes of a finer grid of the same section, bilinear in the grid
 * indices (exact at coincident nodes; the grids of a family share their smooth maps, two-d/linear-study.ts).
 */
export function interpolateField(coarse: Grid2D, values: Float64Array, fine: Grid2D): Float64Array {
  const { nodesX: cx, nodesY: cy } = coarse;
  const { nodesX: fx, nodesY: fy } = fine;
  const out = new Float64Array(fx * fy);
  for (let I = 0; I < fx; I++) {
    const s = (I * (cx - 1)) / (fx - 1);
    const i = Math.min(cx - 2, Math.floor(s));
    const a = s - i;
    for (let J = 0; J < fy; J++) {
      const t = (J * (cy - 1)) / (fy - 1);
      const j = Math.min(cy - 2, Math.floor(t));
      const b = t - j;
      const p = i * cy + j;
      const v00 = values[p] as number;
      const v01 = values[p + 1] as number;
      const v10 = values[p + cy] as number;
      const v11 = values[p + cy + 1] as number;
      out[I * fy + J] = (1 - a) * ((1 - b) * v00 + b * v01) + a * ((1 - b) * v10 + b * v11);
    }
  }
  return out;
}

interface GridSolve {
  readonly outcome: Newton2DOutcome;
  readonly totalIterations: number;
  readonly halvings: number;
  readonly continuationStages: number;
}

/** Newton on the problem, then continuation from the linear fin when Newton alone fails (header). */
function solveOnGrid(problem: NonlinearFin2DProblem, ops: GridOperators2D, setup: Newton2DSetup, initial: Float64Array, opts: Newton2DOptions): GridSolve {
  const direct = newtonSolve2D(setup, initial, opts);
  if (direct.converged) return { outcome: direct, totalIterations: direct.iterations, halvings: direct.halvings, continuationStages: 0 };
  if (setup.linear) throw failure(problem, ops.grid, direct, 0);
  const kRef = setup.kirchhoff.kRef;
  const stage = (s: number): Newton2DSetup => (s === 1 ? setup : newton2DSetup(problem, scaleNonlinearity(problem.physics, s, kRef), ops));
  const c = continueFromLinear<Float64Array, Newton2DOutcome>(
    direct,
    (target, from) => newtonSolve2D(stage(target), from ?? new Float64Array(initial.length), opts),
    (attempt, reached, budget) => failure(problem, ops.grid, attempt, reached, budget),
  );
  return { outcome: c.outcome, totalIterations: c.totalIterations, halvings: c.halvings, continuationStages: c.stages };
}

/** What makes the problem nonlinear, as advice on what to change. */
function advice(problem: NonlinearFin2DProblem): string {
  const { physics } = problem;
  const items: string[] = [];
  if (physics.exponent > 0) items.push(`lower the exponent of the power-law h (now ${physics.exponent})`);
  if (physics.exponent < 0)
    items.push(
      `use an exponent closer to 0 or a shorter fin (now ${physics.exponent}: h = base (θ/θ_b)^n is infinite where the fin reaches the fluid temperature)`,
    );
  if (physics.radiation.emissivity !== 0) items.push(`give a smaller emissivity (now ${physics.radiation.emissivity})`);
  const k = physics.conductivity;
  if (k.kind === 'table') items.push(`give a smoother conductivity table (k runs from ${Math.min(...k.k)} to ${Math.max(...k.k)} W/(m*K))`);
  if (items.length === 0) return 'this case is linear and should never fail to converge: please report it, with the case file';
  items.push('or change the grid, or use the 1-D model');
  return items.join(', ');
}

function failure(problem: NonlinearFin2DProblem, grid: Grid2D, outcome: Newton2DOutcome, reached: number, budget: string | null = null): SolverError {
  const progress =
    (reached > 0 ? `; continuation from the linear fin reached ${(100 * reached).toFixed(1)} % of the nonlinearity` : '') +
    (budget === null ? '' : `; ${budget}`);
  const reason = outcome.failure ?? 'unknown reason';
  const steps = reason.startsWith('no convergence')
    ? ''
    : ` after ${outcome.iterations} Newton steps (relative residual ${outcome.residual.toExponential(2)})`;
  return new SolverError(
    `fd-2d (nonlinear fin) did not converge on ${grid.nodesX} x ${grid.nodesY} nodes: ${reason}${steps}${progress}. To get a solution: ${advice(problem)}.`,
    isLinearProblem(problem.physics) ? undefined : 'another-2d-grid',
  );
}

function finish(problem: NonlinearFin2DProblem, setup: Newton2DSetup, solved: GridSolve, coarseGridIterations: number): NonlinearFin2DResult {
  const { outcome } = solved;
  const { grid } = setup.ops;
  const { nodesX: nx, nodesY: ny, depth } = grid;
  const field = outcome.theta;
  const rates = outcome.rates;
  const { ambient_degC, section, truncatedInfinite } = problem.linear;
  const ideal = idealHeatRate2D(problem, setup);
  return {
    model: 'fd-2d',
    grid,
    field,
    ambient_degC,
    heatRate_W: rates.base * depth,
    surfaceHeatRate_W: rates.surfaces * depth,
    faceHeatRate_W: rates.face * depth,
    tipHeatRate_W: rates.tip * depth,
    energyBalance: rates.energyBalance,
    efficiency: ideal === null ? null : rates.base / ideal,
    effectiveness: effectiveness2D(problem, setup, rates.base),
    baseTemperature_degC: setup.thetaBase + ambient_degC,
    tipTemperature_degC: truncatedInfinite ? ambient_degC : (field[(nx - 1) * ny] as number) + ambient_degC,
    centreline: gridLine(grid, field, ambient_degC, 0),
    surface: gridLine(grid, field, ambient_degC, ny - 1),
    biot: (baseCoefficient(problem, setup) * section.halfSize(0)) / problem.linear.k,
    truncatedInfinite,
    solver: outcome.method,
    newton: {
      iterations: outcome.iterations,
      totalIterations: solved.totalIterations,
      coarseGridIterations,
      halvings: solved.halvings,
      continuationStages: solved.continuationStages,
      residual: outcome.residual,
      heatRateChange: outcome.heatRateChange,
    },
  };
}
