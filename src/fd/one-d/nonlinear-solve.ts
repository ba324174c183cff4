/**
 * The nonlinear 1-D fin model (fd-1d with temperature-dependent h, radiation and k(T)): mesh, Newton
 * solve, post-process; and its grid refinement study.
 *
 * Equation (θ = T - T_amb in K, x from the base in m, absolute T in K = degC + 273.15):
 *   d/dx(k(T) A(x) dT/dx) = P(x) [h_x(x) |θ/θ_b|^n θ + ε σ (T^4 - T_s^4)]
 * - h = base (θ/θ_b)^n of the case format (n = 1/4 laminar and 1/3 turbulent natural convection, about
 *   2 nucleate boiling), or an h independent of temperature (uniform, linear, tabulated along x);
 * - grey radiation from the faces, and from the tip when the tip is convective, to surroundings at T_s.
 *   View factor: the fin sees only the surroundings (a black enclosure at T_s): no exchange with the
 *   base wall or neighbouring fins, no self-irradiation;
 * - k(T) from a table, linear between points and constant beyond its ends.
 * Units: k W/(m K), h W/(m^2 K), lengths m, heat rates W (straight fins: the whole width).
 *
 * Discrete form: the linear solver's conservative vertex-centred finite volumes (the same mesh,
 * conductances and lumping; one-d/assemble.ts), with
 * - conduction through the Kirchhoff potential U = ∫_{T_amb}^{T} k dT / k_ref: F_i = K_i (U_i - U_{i+1}).
 *   Chosen over face conductivities from the mean of the two nodal temperatures because it is the
 *   exact face flux of the two nodal temperatures for a uniform section (∫ k dT over the face is
 *   the interval's mean conductivity, not k at the mean temperature), stays a single flux per face
 *   (conservative: the energy balance holds to round-off), keeps the scheme second order, and makes
 *   the conduction operator linear in U, so the Newton matrix is the linear fin matrix scaled by
 *   columns (one-d/newton-system.ts). For k linear in T (the fin of Aziz & Enamul-Huq 1975, J. Heat
 *   Transfer 97 [from memory]) the heat rate converges at order 2 to the first-integral solution.
 * - face losses lumped at the nodes over each control volume, as in the linear scheme
 *   (problem/surface-law.ts); boundary conditions in one-d/newton-boundary.ts (exact continuation for the
 *   infinite tip).
 * Solve: Newton's method with a tridiagonal Jacobian (row-sum Thomas solve), backtracking line search,
 * continuation in the nonlinearity when needed (one-d/newton-solve.ts); converged when the relative
 * residual <= 1e-12 and the heat-rate change <= 1e-12 (or its round-off floor on very fine grids).
 * A fine grid starts from the linear interpolation of the solution on a grid 8 times coarser
 * (nested iteration), which cuts the Newton steps on the fine grid to about three.
 * For a linear case (n = 0, ε = 0, constant k) the first Newton step from the base temperature is
 * the linear solver's own drop system, so the result is the linear solver's to round-off (bit for
 * bit with an adiabatic or fixed-temperature tip and no contact resistance).
 * A case that does not converge raises SolverError (exit code 3) saying what to change; never a
 * silent answer.
 *
 * Efficiency (one-d/newton-heat-rate.ts): Q / Q_ideal, Q_ideal = the heat of the same fin with every cooled
 * surface (the tip too when convective) at the base temperature, with the h and the radiation the base
 * temperature gives there. Effectiveness: Q / (heat of the bare base area at the base temperature,
 * convection and radiation). Refinement study: Celik et al. 2008 (refinement.ts).
 */
import type { Case } from '../../case/index.js';
import { buildMesh1D, type Grading, type Mesh1D } from '../../mesh/index.js';
import { autoGrading, studyGrids, type Fin1DResult } from './linear-solve.js';
import { hBreakpoints } from '../problem/convection.js';
import { createNewtonWorkspace, leading, type NewtonOptions, type NewtonWorkspace } from './newton-system.js';
import { isLinearProblem, finProblem, type FinProblem } from '../problem/fin-problem.js';
import { nonlinearEffectiveness, nonlinearHeatRates, nonlinearIdealHeatRate } from './newton-heat-rate.js';
import { solveNonlinearOnMesh, type MeshSolve } from './newton-solve.js';
import type { NewtonReport } from '../newton/newton-report.js';
import { richardsonGci, type RefinementStudy } from '../study/refinement.js';
import { solveGrids } from '../study/refinement-loop.js';

export interface NonlinearFin1DOptions extends NewtonOptions {
  /** Number of nodes (cells + 1); more when breakpoints need at least one cell per segment. */
  readonly nodes: number;
  /** Node distribution; 'auto' (default) as the linear solver (one-d/linear-solve.ts, autoGrading). */
  readonly grading?: Grading | 'auto';
  /** Start a fine grid from a coarser grid's solution (default true). */
  readonly nested?: boolean;
}

export type { NewtonReport } from '../newton/newton-report.js';

export interface NonlinearFin1DResult extends Fin1DResult {
  readonly newton: NewtonReport;
}

export interface NonlinearFin1DStudyOptions extends NewtonOptions {
  /** Node counts of the grids (>= 3); default DEFAULT_STUDY_NODES (as the linear study). */
  readonly nodes?: readonly number[];
  readonly grading?: Grading | 'auto';
}

export interface NonlinearFin1DStudy {
  /** The solution on the finest grid. */
  readonly result: NonlinearFin1DResult;
  /** Refinement study of the base heat rate (relative GCI = estimated discretisation error). */
  readonly study: RefinementStudy;
  /** Newton steps on each grid, coarsest first. */
  readonly iterations: number[];
}

/** Grids with more cells than this start from a grid NESTED_RATIO times coarser. */
const NESTED_MIN_CELLS = 64;
const NESTED_RATIO = 8;

function meshOf(problem: FinProblem, cells: number, refine: number, grading: Grading | 'auto' | undefined): Mesh1D {
  const geometry = problem.geometry;
  return buildMesh1D(geometry, {
    cells: Math.max(1, Math.round(cells)),
    grading: grading === undefined || grading === 'auto' ? autoGrading(geometry) : grading,
    breakpoints: hBreakpoints(problem.h, geometry.length),
    refine,
  });
}

/** A nodal field of a coarse mesh interpolated linearly onto the nodes of a fine mesh (same fin), into `out` when given. */
export function interpolateOnto(coarse: Mesh1D, valuesCoarse: Float64Array, fine: Mesh1D, out: Float64Array = new Float64Array(fine.nodes)): Float64Array {
  let j = 0;
  const last = coarse.nodes - 1;
  for (let i = 0; i < fine.nodes; i++) {
    const x = fine.x[i] as number;
    while (j < last - 1 && (coarse.x[j + 1] as number) < x) j++;
    const x0 = coarse.x[j] as number;
    const x1 = coarse.x[j + 1] as number;
    const t = Math.min(1, Math.max(0, (x - x0) / (x1 - x0)));
    out[i] = (valuesCoarse[j] as number) + t * ((valuesCoarse[j + 1] as number) - (valuesCoarse[j] as number));
  }
  return out;
}

/** Drops d = θ_b - θ (K) on `fine` of the excess temperatures θ on `coarse`, interpolated linearly (interpolateOnto), into `out`. */
function dropsOnto(problem: FinProblem, coarse: Mesh1D, thetaCoarse: Float64Array, fine: Mesh1D, out: Float64Array): Float64Array {
  const reference = problem.base.theta;
  const drops = interpolateOnto(coarse, thetaCoarse, fine, out);
  for (let i = 0; i < drops.length; i++) drops[i] = reference - (drops[i] as number);
  return drops;
}

/** The result of a solve; its θ is a copy (the solve's arrays may be a workspace's). */
function finish(problem: FinProblem, solved: MeshSolve, coarseGridIterations: number): NonlinearFin1DResult {
  const { setup, drop } = solved;
  const theta = solved.theta.slice();
  const mesh = setup.mesh;
  const rates = nonlinearHeatRates(setup, drop, theta, solved.evaluated);
  const ideal = nonlinearIdealHeatRate(problem, setup);
  return {
    model: 'fd-1d',
    mesh,
    theta,
    heatRate: rates.heatRate,
    surfaceHeatRate: rates.surfaceHeatRate,
    energyBalance: rates.energyBalance,
    idealHeatRate: ideal,
    efficiency: rates.heatRate / ideal,
    effectiveness: nonlinearEffectiveness(rates.heatRate, problem, setup),
    tipTemperature_degC: (theta[mesh.nodes - 1] as number) + problem.ambient_degC,
    newton: {
      iterations: solved.iterations,
      totalIterations: solved.totalIterations,
      coarseGridIterations,
      halvings: solved.halvings,
      continuationStages: solved.continuationStages,
      residual: solved.residual,
      heatRateChange: solved.heatRateChange,
    },
  };
}

/**
 * Solves a nonlinear problem with `nodes` nodes (`refine`: nested refinement factor), from `start`
 * (a solution on a coarser mesh of the same fin) or, with `nested`, from a grid 8 times coarser.
 */
export function solveNonlinearProblem1D(
  problem: FinProblem,
  opts: NonlinearFin1DOptions & { readonly refine?: number },
  start?: Fin1DResult,
): NonlinearFin1DResult {
  const cells = Math.max(1, Math.round(opts.nodes) - 1);
  const mesh = meshOf(problem, cells, opts.refine ?? 1, opts.grading);
  // One workspace for this grid and its nested starting grids (the finest is the largest).
  const from = start === undefined ? undefined : { mesh: start.mesh, theta: start.theta };
  const nested = solveNested(problem, opts, cells * (opts.refine ?? 1), mesh, workspaceFor(mesh.nodes), from);
  return finish(problem, nested.solved, nested.coarseGridIterations);
}

/**
 * Workspaces of the last few finest-grid sizes, as the linear solver keeps its scratch (linear-solve.ts): a study
 * solves three grids, a map or an uncertainty sample thousands of fins, and a workspace is 30 arrays (allocating
 * and zeroing them anew took about a third of a 4001-node solve). Safe because a solve is synchronous and nothing
 * it returns points into them (finish copies θ out). Kept: up to KEPT_SIZES sizes of up to KEPT_NODES nodes
 * (at most ~8 MB); a larger grid gets a workspace of its own.
 */
const workspaces = new Map<number, NewtonWorkspace>();
const KEPT_SIZES = 4;
const KEPT_NODES = 8193;

function workspaceFor(nodes: number): NewtonWorkspace {
  if (nodes > KEPT_NODES) return createNewtonWorkspace(nodes);
  let workspace = workspaces.get(nodes);
  if (workspace === undefined) {
    if (workspaces.size >= KEPT_SIZES) workspaces.clear();
    workspace = createNewtonWorkspace(nodes);
    workspaces.set(nodes, workspace);
  }
  return workspace;
}

interface NestedSolve {
  readonly solved: MeshSolve;
  /** Newton steps on the coarser starting grids. */
  readonly coarseGridIterations: number;
}

/**
 * Solves on `mesh` (`cells` cells asked for) from `start` (a solution on a coarser mesh of the same fin) or, with
 * `nested`, from the solve on a grid NESTED_RATIO times coarser (itself nested), in `workspace`.
 */
function solveNested(
  problem: FinProblem,
  opts: NonlinearFin1DOptions,
  cells: number,
  mesh: Mesh1D,
  given: NewtonWorkspace,
  start?: { readonly mesh: Mesh1D; readonly theta: Float64Array },
): NestedSolve {
  const workspace = mesh.nodes <= given.capacity ? given : createNewtonWorkspace(mesh.nodes);
  let initial: Float64Array | undefined;
  let coarseGridIterations = 0;
  const linear = isLinearProblem(problem);
  if (start !== undefined && !linear) {
    initial = dropsOnto(problem, start.mesh, start.theta, mesh, leading(workspace.start, mesh.nodes));
  } else if ((opts.nested ?? true) && !linear && cells > NESTED_MIN_CELLS) {
    const coarseCells = Math.ceil(cells / NESTED_RATIO);
    const coarse = solveNested(problem, opts, coarseCells, meshOf(problem, coarseCells, 1, opts.grading), workspace);
    // Read before this grid's solve overwrites the workspace.
    initial = dropsOnto(problem, coarse.solved.setup.mesh, coarse.solved.theta, mesh, leading(workspace.start, mesh.nodes));
    coarseGridIterations = coarse.solved.totalIterations + coarse.coarseGridIterations;
  }
  return { solved: solveNonlinearOnMesh(problem, mesh, opts, initial, workspace), coarseGridIterations };
}

/** The fd-1d solution of any case (linear or not) on one grid of `nodes` nodes. */
export function solveNonlinearFin1D(c: Case, opts: NonlinearFin1DOptions): NonlinearFin1DResult {
  return solveNonlinearProblem1D(finProblem(c), opts);
}

/**
 * Refinement study of a nonlinear problem: solves on every grid of `nodes` (nested when the cell
 * counts are integer multiples of the coarsest; each grid starts from the previous grid's solution)
 * and estimates the discretisation error of the finest heat rate.
 */
export function studyNonlinearProblem1D(problem: FinProblem, opts: NonlinearFin1DStudyOptions = {}): NonlinearFin1DStudy {
  // Each grid starts from the previous (coarser) grid's solution.
  const results = solveGrids(studyGrids(opts.nodes, 'studyNonlinearFin1D'), (g, previous: NonlinearFin1DResult | undefined) =>
    solveNonlinearProblem1D(problem, { ...opts, ...g, grading: opts.grading ?? 'auto' }, previous),
  );
  const study = richardsonGci(results.map((r) => ({ size: r.mesh.cellSize, value: r.heatRate })));
  return {
    result: results[results.length - 1] as NonlinearFin1DResult,
    study,
    iterations: results.map((r) => r.newton.totalIterations + r.newton.coarseGridIterations),
  };
}

/** Refinement study of any case (default grids DEFAULT_STUDY_NODES, as the linear study). */
export function studyNonlinearFin1D(c: Case, opts: NonlinearFin1DStudyOptions = {}): NonlinearFin1DStudy {
  return studyNonlinearProblem1D(finProblem(c), opts);
}
