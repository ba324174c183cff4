/**
 * The 1-D fin model `fd-1d`: mesh, assemble, constrain, solve, post-process; and its grid
 * refinement study.
 *
 * Equation: d/dx(k A(x) dθ/dx) - h(x) P(x) θ = 0, θ = T - T_amb (K), x from the base (m), with the
 * case's base and tip conditions (boundary.ts). Discrete form: conservative vertex-centred finite
 * volumes (one-d/assemble.ts), second order in the cell size, solved for the drop θ_b - θ
 * (drop-system.ts) by a tridiagonal direct solver (row-sum Thomas by default).
 * Heat rates in W for the whole fin (straight fins: the whole width; annular: the whole ring).
 * Refinement study: three or more nested grids of ratio 2, Richardson extrapolation and the GCI of
 * Celik et al. 2008, J. Fluids Eng. 130(7), 078001 (refinement.ts).
 */
import { buildMesh1D, type FinGeometry1D, type Grading, type Mesh1D } from '../../mesh/index.js';
import { assembleFin1D, interfaceConductances, type AssemblyParts } from './assemble.js';
import { hAtNodes, hBreakpoints } from '../problem/convection.js';
import { baseHeatRate } from './boundary.js';
import { dropSystem } from './drop-system.js';
import { finEffectiveness, finHeatRates, idealHeatRate } from './heat-rate.js';
import type { LinearFinCase } from '../problem/linear-case.js';
import { finProblem1D, type FinProblem1D } from './problem.js';
import { richardsonGci, type RefinementStudy } from '../study/refinement.js';
import { solveGrids } from '../study/refinement-loop.js';
import { conservativeThomasInto } from '../linear-algebra/conservative-thomas.js';
import { createTridiagonalSystem, type RowSumSystem, type TridiagonalSolver } from '../linear-algebra/tridiagonal-system.js';

export interface Fin1DOptions {
  /** Number of nodes (cells + 1); more when breakpoints need at least one cell per segment. */
  readonly nodes: number;
  readonly solver?: TridiagonalSolver;
  /** Node distribution; 'auto' (default) grades toward a sharp tip (see autoGrading). */
  readonly grading?: Grading | 'auto';
}

export interface Fin1DResult {
  readonly model: 'fd-1d';
  readonly mesh: Mesh1D;
  /** Excess temperature θ = T - T_amb at the nodes, K. */
  readonly theta: Float64Array;
  /** Heat entering the fin at its base, W. */
  readonly heatRate: number;
  /** Heat leaving the faces and the tip, W (equals heatRate to round-off). */
  readonly surfaceHeatRate: number;
  /** |heatRate - surfaceHeatRate| / |heatRate|. */
  readonly energyBalance: number;
  /** Heat rate with every cooled surface at the base temperature (exact, not from the grid), W. */
  readonly idealHeatRate: number;
  /** heatRate / idealHeatRate. */
  readonly efficiency: number;
  /** heatRate / (h(0) A_b θ_b). */
  readonly effectiveness: number;
  /** Temperature of the tip node, degC. */
  readonly tipTemperature_degC: number;
}

export interface Fin1DStudyOptions {
  /** Node counts of the grids (>= 3); default DEFAULT_STUDY_NODES. */
  readonly nodes?: readonly number[];
  readonly solver?: TridiagonalSolver;
  readonly grading?: Grading | 'auto';
}

export interface Fin1DStudy {
  /** The solution on the finest grid. */
  readonly result: Fin1DResult;
  /** Refinement study of the base heat rate (relative GCI = estimated discretisation error). */
  readonly study: RefinementStudy;
}

/**
 * Default grids of the study: 1000, 2000, 4000 cells (ratio 2). The finest grid's heat-rate error of
 * a smooth fin is ~8e-9 (mL)^2 / (N/4000)^2 (measured on the uniform fin: 1.0e-7 at mL = 3.65 with
 * 4000 cells), so it stays <= 1e-6 (the acceptance level) up to mL ~ 11, and the GCI reports it; the
 * extrapolated value is ~1e-10. The study is 7000 node solves (under 1 ms), which keeps a 41 x 41
 * map of checks within its time budget (8000 finest cells doubled the map's cost for no visible gain).
 */
export const DEFAULT_STUDY_NODES: readonly number[] = [1001, 2001, 4001];

/**
 * Grid that keeps the heat rate second order on every profile (observed on the closed-form profiles
 * of Gardner 1945 / Incropera Table 3.5 at mL = 0.25, 1 and 3 with 125..4000 cells):
 * - blunt tips, triangles and cones (size ~ (L - x)^1): θ is analytic at the tip (I0/I1 of
 *   2 m sqrt(L(L - x))), so a uniform grid is already order 2.00;
 * - concave parabola (size ~ (L - x)^2): θ ~ (L - x)^α near the tip with α(α + 1) = (mL)^2 for a
 *   straight fin (α(α + 3) = (mL)^2 for a spine), small at small mL; the tip cells then contribute an
 *   error ~ Δx^(1 + 2α): the straight fin shows order 1.12 at mL = 0.25 on a uniform grid (the spine
 *   2.00). Power-law grading toward the tip with exponent 3 (last cell ~ Δx^3) restores order 2.00
 *   (exponent 2 gives 1.91-1.96);
 * - convex parabola (size ~ (L - x)^(1/2)): P has a square root at the tip in a spine (and in the
 *   cooled edges of a straight fin), which Simpson's rule integrates to O(Δx^1.5) in the last cell:
 *   order 1.5 on a uniform grid; power-law grading with exponent 2 restores order 2.00.
 * Geometric grading with a fixed stretch does not help (the last cell still scales with Δx).
 */
export function autoGrading(geometry: FinGeometry1D): Grading {
  switch (geometry.tipTaperExponent) {
    case 2:
      return { kind: 'power', toward: 'tip', exponent: 3 };
    case 0.5:
      return { kind: 'power', toward: 'tip', exponent: 2 };
    default:
      return { kind: 'uniform' };
  }
}

function resolveGrading(geometry: FinGeometry1D, grading: Grading | 'auto' | undefined): Grading {
  return grading === undefined || grading === 'auto' ? autoGrading(geometry) : grading;
}

interface Scratch1D {
  hNodes: Float64Array;
  system: RowSumSystem;
  rhs: Float64Array;
  solution: Float64Array;
  factor: Float64Array;
  /** G_i of the last assembly. */
  convective: Float64Array;
  /** K_i of `conductanceMesh` at `conductanceK`: a map walking h at one geometry reuses them at every point. */
  conductance: Float64Array;
  conductanceMesh: Mesh1D | null;
  conductanceK: number;
}

/**
 * Working arrays of the last few grid sizes. A check solves three grids and a map solves thousands of
 * checks: allocating ten arrays per solve made the garbage collector a tenth of a map's time. Safe
 * because a solve is synchronous and nothing it returns points into these arrays.
 */
const scratch = new Map<number, Scratch1D>();

function scratchFor(n: number): Scratch1D {
  let s = scratch.get(n);
  if (s === undefined) {
    if (scratch.size >= 8) scratch.clear();
    s = {
      hNodes: new Float64Array(n),
      system: createTridiagonalSystem(n),
      rhs: new Float64Array(n),
      solution: new Float64Array(n),
      factor: new Float64Array(n),
      convective: new Float64Array(n),
      conductance: new Float64Array(n),
      conductanceMesh: null,
      conductanceK: Number.NaN,
    };
    scratch.set(n, s);
  }
  return s;
}

/** The assembly's working arrays for `mesh` at conductivity k, the interface conductances computed only when they changed. */
function assemblyParts(work: Scratch1D, mesh: Mesh1D, conductivity: number): AssemblyParts {
  if (work.conductanceMesh !== mesh || work.conductanceK !== conductivity) {
    interfaceConductances(mesh, conductivity, work.conductance);
    work.conductanceMesh = mesh;
    work.conductanceK = conductivity;
  }
  return { convective: work.convective, conductance: work.conductance };
}

/** Solves a 1-D fin problem on a given mesh (default solver: the row-sum two-sided Thomas, scratch arrays). */
export function solveOnMesh1D(problem: FinProblem1D, mesh: Mesh1D, solver?: TridiagonalSolver): Fin1DResult {
  const { geometry, conductivity, h, base, tip } = problem;
  // The working arrays are scratch (reused by the next solve of the same size); only theta is returned.
  const work = scratchFor(mesh.nodes);
  const hNodes = hAtNodes(h, mesh.x, geometry.length, work.hNodes);
  const parts = assemblyParts(work, mesh, conductivity);
  const system = assembleFin1D(mesh, conductivity, hNodes, base, tip, work.system, parts);
  // Solve for the drop below the base excess, δ = θ_b - θ (accurate base conduction: drop-system.ts).
  const drops = dropSystem(system, base.theta, work.rhs);
  const drop = solver ? solver(drops) : conservativeThomasInto(drops, work.solution, work.factor);
  const field = { reference: base.theta, drop };
  const theta = new Float64Array(mesh.nodes);
  for (let i = 0; i < mesh.nodes; i++) theta[i] = base.theta - (field.drop[i] as number);
  const rates = finHeatRates(mesh, conductivity, hNodes, base, tip, field, parts.convective);
  const ideal = idealHeatRate(geometry, h, tip, base.theta);
  return {
    model: 'fd-1d',
    mesh,
    theta,
    heatRate: rates.heatRate,
    surfaceHeatRate: rates.surfaceHeatRate,
    energyBalance: rates.energyBalance,
    idealHeatRate: ideal,
    efficiency: rates.heatRate / ideal,
    effectiveness: finEffectiveness(rates.heatRate, geometry, h, base.theta),
    tipTemperature_degC: (theta[mesh.nodes - 1] as number) + problem.ambient_degC,
  };
}

/** The mesh of `problem` with `nodes` nodes (nested refinement with `refine`): what solveFinProblem1D solves on. */
function meshFor(problem: FinProblem1D, opts: Fin1DOptions & { readonly refine?: number }): Mesh1D {
  const geometry = problem.geometry;
  return buildMesh1D(geometry, {
    cells: Math.max(1, Math.round(opts.nodes) - 1),
    grading: resolveGrading(geometry, opts.grading),
    breakpoints: hBreakpoints(problem.h, geometry.length),
    refine: opts.refine ?? 1,
  });
}

/** Meshes and solves a 1-D fin problem with `nodes` nodes (nested refinement with `refine`). */
export function solveFinProblem1D(problem: FinProblem1D, opts: Fin1DOptions & { readonly refine?: number }): Fin1DResult {
  return solveOnMesh1D(problem, meshFor(problem, opts), opts.solver);
}

/**
 * The base heat rate alone of solveFinProblem1D (the same mesh, system, solver and formula, so the same number bit
 * for bit), W: without the temperatures, the surface balance, the ideal heat rate and the effectiveness that a result
 * carries. The sensitivities and the uncertainty sample re-solve dozens to hundreds of variants for this one number.
 */
export function finHeatRate1D(problem: FinProblem1D, opts: Fin1DOptions & { readonly refine?: number }): number {
  const mesh = meshFor(problem, opts);
  const { geometry, conductivity, h, base, tip } = problem;
  const work = scratchFor(mesh.nodes);
  const hNodes = hAtNodes(h, mesh.x, geometry.length, work.hNodes);
  const system = assembleFin1D(mesh, conductivity, hNodes, base, tip, work.system, assemblyParts(work, mesh, conductivity));
  const drops = dropSystem(system, base.theta, work.rhs);
  const drop = opts.solver ? opts.solver(drops) : conservativeThomasInto(drops, work.solution, work.factor);
  return baseHeatRate(base, mesh, conductivity, hNodes, { reference: base.theta, drop });
}

/** The fd-1d solution of a linear case on one grid of `nodes` nodes. */
export function solveFin1D(c: LinearFinCase, opts: Fin1DOptions): Fin1DResult {
  return solveFinProblem1D(finProblem1D(c), opts);
}

/**
 * The grids of a refinement study, coarsest first: node counts (>= 3 grids; default DEFAULT_STUDY_NODES),
 * each given as the coarsest grid refined by an integer factor where the cell counts allow (nested
 * grids share nodes), else as its own node count.
 */
export function studyGrids(nodeCounts: readonly number[] | undefined, where: string): { nodes: number; refine: number }[] {
  const nodes = [...(nodeCounts ?? DEFAULT_STUDY_NODES)].map((n) => Math.max(2, Math.round(n))).sort((a, b) => a - b);
  if (nodes.length < 3) throw new RangeError(`${where}: needs at least 3 grids, got ${nodes.length}`);
  const coarsestCells = (nodes[0] as number) - 1;
  return nodes.map((n) => {
    const cells = n - 1;
    const nested = cells % coarsestCells === 0;
    return { nodes: nested ? coarsestCells + 1 : n, refine: nested ? cells / coarsestCells : 1 };
  });
}

/**
 * Refinement study of a 1-D fin problem: solves on every grid of `nodes` (nested when the cell
 * counts are integer multiples of the coarsest) and estimates the discretisation error of the
 * finest heat rate.
 */
export function studyFinProblem1D(problem: FinProblem1D, opts: Fin1DStudyOptions = {}): Fin1DStudy {
  const results = solveGrids(studyGrids(opts.nodes, 'studyFin1D'), (g) =>
    solveFinProblem1D(problem, { ...g, grading: opts.grading ?? 'auto', ...(opts.solver ? { solver: opts.solver } : {}) }),
  );
  const study = richardsonGci(results.map((r) => ({ size: r.mesh.cellSize, value: r.heatRate })));
  return { result: results[results.length - 1] as Fin1DResult, study };
}

/** Refinement study of a linear case (default grids DEFAULT_STUDY_NODES). */
export function studyFin1D(c: LinearFinCase, opts: Fin1DStudyOptions = {}): Fin1DStudy {
  return studyFinProblem1D(finProblem1D(c), opts);
}
