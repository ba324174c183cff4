/**
 * The fd-3d study of a heat sink: the same sink solved on nested grids (ratio 2: every cell halved in x, y, z and
 * along the fins), the Celik et al. (2008) three-grid estimate (study/refinement.ts: richardsonGci) on every
 * source's mean rise, and the finest grid's fields and heat rates as the SinkStudy (sink-study-types.ts).
 * Grids are solved coarsest first, each finer one of a linear sink started from the coarser solution prolonged
 * (aggregation.ts nestedProlongate); the memory of the finest is checked before any is solved.
 *
 * Default grids: coarsest cell size min(width, length)/16 in x and y (every fin, gap and source at least one
 * cell: footprint and source edges are grid lines), 2 plate layers, 4 fin layers; the finest of three grids then
 * has 4x as many cells in every direction.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { buildSinkGrid, type SinkGrid } from '../../mesh/index.js';
import { richardsonGci } from '../study/refinement.js';
import { sinkUnknowns, type FinRepresentation } from './sink-system.js';
import { checkSinkMemory, DEFAULT_MEMORY_LIMIT } from './sink-memory.js';
import { sinkFinProfiles } from './sink-fin-profiles.js';
import { sinkPlateView } from './sink-plate-view.js';
import { sinkProblem, type SinkProblem } from './sink-problem.js';
import { isNonlinearSink, solveSinkSystem, type SinkGridResult } from './sink-solve.js';
import { nestedProlongate, type SinkLevelGrid } from '../linear-algebra/aggregation.js';
import type { SinkGridSpec, SinkStudy } from './sink-study-types.js';
import { sinkGridOf, sinkGridSetup, type SolvedSinkGrid } from './sink-grid-setup.js';

export interface SinkStudyOptions {
  /** Grids of the study, refinement ratio 2 (default 3; 1 gives a single grid without an error estimate). */
  grids?: number;
  /** Cell size in x and y on the coarsest grid, m (default min(width, length)/16). */
  cellSize?: number;
  /** Plate layers on the coarsest grid (default 2). */
  plateLayers?: number;
  /** Fin layers along the height on the coarsest grid (default 4). */
  finLayers?: number;
  /** 'sheet' (default): each plate fin a conducting sheet, each pin a 1-D fin; 'cells': rectangular plate fins as 3-D cells. */
  finRepresentation?: FinRepresentation;
  /** Largest memory one solve may take, bytes (default 1 GiB). */
  memoryLimit_bytes?: number;
}

const DEFAULT_GRIDS = 3;
const CELLS_PER_SIDE = 16;
const PLATE_LAYERS = 2;
const FIN_LAYERS = 4;

export function studySink(c: HeatSinkCase, options: SinkStudyOptions = {}): SinkStudy {
  const plan = planSinkStudy(c, options);
  return sinkStudyOfPlan(plan, solveSinkGrids(plan.problem, plan.specs, null).results);
}

/** The study and its second-finest grid kept set up and solved (null for a single grid), for the check's sensitivities. */
export function studySinkKeeping(c: HeatSinkCase, options: SinkStudyOptions = {}): { study: SinkStudy; kept: SolvedSinkGrid | null } {
  const plan = planSinkStudy(c, options);
  const { results, kept } = solveSinkGrids(plan.problem, plan.specs, plan.specs.length >= 2 ? plan.specs.length - 2 : null);
  return { study: sinkStudyOfPlan(plan, results), kept };
}

/** A study's grids (coarsest first), checked against the memory limit before anything is solved. */
export interface SinkStudyPlan {
  problem: SinkProblem;
  specs: SinkGridSpec[];
}

export function planSinkStudy(c: HeatSinkCase, options: SinkStudyOptions = {}): SinkStudyPlan {
  const problem = sinkProblem(c);
  const grids = options.grids ?? DEFAULT_GRIDS;
  if (!Number.isInteger(grids) || grids < 1) throw new RangeError(`studySink: grids must be a positive integer, got ${grids}`);
  const cellSize = options.cellSize ?? Math.min(c.plate.width, c.plate.length) / CELLS_PER_SIDE;
  const finRepresentation = options.finRepresentation ?? 'sheet';
  const specs: SinkGridSpec[] = Array.from({ length: grids }, (_, g) => ({
    cellSize,
    plateLayers: options.plateLayers ?? PLATE_LAYERS,
    finLayers: options.finLayers ?? FIN_LAYERS,
    refine: 2 ** g,
    finRepresentation,
  }));
  const finest = sinkGridOf(problem, specs[specs.length - 1] as SinkGridSpec);
  checkSinkMemory(
    sinkUnknowns(finest, finRepresentation, problem.layout.finKind),
    options.memoryLimit_bytes ?? DEFAULT_MEMORY_LIMIT,
    isNonlinearSink(problem),
  );
  return { problem, specs };
}

/**
 * Solves the grids `specs` (nested, coarsest first) in order; a linear sink's finer grids start from the coarser
 * solution prolonged. `keep`: the index of a grid to keep set up with its solution (null: none). `first`: a first
 * guess for the first grid of a linear sink (null: none, CG starts from zero). Results coarsest first.
 */
export function solveSinkGrids(
  problem: SinkProblem,
  specs: SinkGridSpec[],
  keep: number | null,
  first?: (grid: SinkGrid, unknowns: number) => Float64Array | null,
): { results: SinkGridResult[]; kept: SolvedSinkGrid | null } {
  const results: SinkGridResult[] = [];
  let kept: SolvedSinkGrid | null = null;
  let previous: { level: SinkLevelGrid; theta: Float64Array } | null = null;
  specs.forEach((spec, g) => {
    const setup = sinkGridSetup(problem, spec);
    const { system } = setup;
    const prolonged =
      previous === null || system.fold !== null || isNonlinearSink(problem) ? null : nestedProlongate(previous.level, system.levelGrid, previous.theta);
    let start: Float64Array | undefined;
    if (prolonged !== null) start = prolonged;
    else if (g === 0 && first !== undefined && !isNonlinearSink(problem)) start = first(setup.grid, system.matrix.n) ?? undefined;
    const result = solveSinkSystem(problem, system, start, setup.pre);
    results.push(result);
    if (g === keep) kept = { spec, setup, theta: result.theta, iterations: result.iterations };
    previous = { level: system.levelGrid, theta: result.theta };
  });
  return { results, kept };
}

/** The SinkStudy of a plan from its grids' results (coarsest first). */
export function sinkStudyOfPlan(plan: SinkStudyPlan, results: SinkGridResult[]): SinkStudy {
  const finest = plan.specs[plan.specs.length - 1] as SinkGridSpec;
  const sizes = plan.specs.map((s) => s.cellSize / s.refine).reverse();
  return { ...sinkStudyFrom(plan.problem, [...results].reverse(), sizes, finest.finRepresentation), finestGrid: finest };
}

/** Unknowns of the finest grid a study with these options would solve (nothing is allocated). */
export function sinkStudyUnknowns(c: HeatSinkCase, options: SinkStudyOptions = {}): number {
  const problem = sinkProblem(c);
  const grids = options.grids ?? DEFAULT_GRIDS;
  const cellSize = options.cellSize ?? Math.min(c.plate.width, c.plate.length) / CELLS_PER_SIDE;
  const finest = buildSinkGrid(problem.layout, {
    cellSize,
    plateLayers: options.plateLayers ?? PLATE_LAYERS,
    finLayers: options.finLayers ?? FIN_LAYERS,
    refine: 2 ** (grids - 1),
  });
  return sinkUnknowns(finest, options.finRepresentation ?? 'sheet', problem.layout.finKind);
}

/** The SinkStudy of grid results given finest first, with their representative cell sizes. */
export function sinkStudyFrom(problem: SinkProblem, results: SinkGridResult[], sizes: number[], representation: FinRepresentation): SinkStudy {
  const fine = results[0];
  const ambient = problem.ambient_degC;
  const sources = problem.sources.map((s, k) => {
    const refinement = results.length >= 3 ? richardsonGci(results.map((r, g) => ({ size: sizes[g], value: r.sourceMeanRise[k] }))) : null;
    return {
      name: s.name,
      power_W: s.power,
      meanTemperature_degC: ambient + fine.sourceMeanRise[k],
      maxTemperature_degC: ambient + fine.sourceMaxRise[k],
      meanRise_K: fine.sourceMeanRise[k],
      refinement,
      discretizationError: refinement === null ? null : refinement.gci,
    };
  });
  const maxRise = Math.max(...fine.sourceMaxRise);
  // The GCI of every other reported quantity (relative, on rises above ambient and on heat), null below three grids.
  const gci = (value: (r: SinkGridResult) => number): number | null =>
    results.length >= 3 ? richardsonGci(results.map((r, g) => ({ size: sizes[g], value: value(r) }))).gci : null;
  return {
    model: 'fd-3d',
    sources,
    fins: fine.finHeat.map((q, f) => ({ index: f, heatRate_W: q, rootTemperature_degC: ambient + fine.finRootRise[f] })),
    totalHeat_W: fine.totalHeat,
    finsHeat_W: fine.finsHeat,
    plateHeat_W: fine.plateHeat,
    energyBalance: Math.max(...results.map((r) => r.energyBalance)),
    plateTopMean_degC: ambient + fine.topMeanRise,
    sinkResistance_KperW: maxRise / fine.totalHeat,
    unknowns: results.map((r) => r.unknowns),
    finModel: finModelText(problem, representation),
    plate: sinkPlateView(fine, ambient),
    errors: {
      sourceMaxRise: problem.sources.map((_, k) => gci((r) => r.sourceMaxRise[k])),
      plateTopMeanRise: gci((r) => r.topMeanRise),
      finHeat: fine.finHeat.map((_, f) => gci((r) => r.finHeat[f])),
      sinkResistance: gci((r) => Math.max(...r.sourceMaxRise) / r.totalHeat),
    },
    finProfiles: sinkFinProfiles(fine, problem.layout.finKind, representation, ambient),
    solver: { method: fine.method, iterations: fine.iterations, relativeResidual: fine.relativeResidual },
  };
}

function finModelText(problem: SinkProblem, representation: FinRepresentation): string {
  switch (problem.layout.finKind) {
    case 'bare':
      return 'bare plate (no fins)';
    case 'pins':
      return 'each pin a 1-D fin along its height, its root spread over the square footprint of equal area';
    case 'plates':
      return representation === 'cells'
        ? 'each plate fin as 3-D cells on the plate grid'
        : 'each plate fin a 2-D conducting sheet along the plate and its height (thin fin across the thickness), coupled to the plate';
    default: {
      const never: never = problem.layout.finKind;
      throw new Error(`unknown fin kind ${String(never)}`);
    }
  }
}
