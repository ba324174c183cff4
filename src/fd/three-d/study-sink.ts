/**
 * The fd-3d study of a heat sink: the same sink solved on nested grids (ratio 2: every cell halved in x, y, z and
 * along the fins), the Celik et al. (2008) three-grid estimate (study/refinement.ts: richardsonGci) on every
 * source's mean rise, and the finest grid's fields and heat rates as the SinkStudy (sink-study-types.ts).
 * Grids are solved coarsest first, each finer one of a linear sink started from the coarser solution prolonged
 * (aggregation.ts nestedProlongation); the memory of the finest is checked before any is solved.
 *
 * Default grids: coarsest cell size min(width, length)/16 in x and y (every fin, gap and source at least one
 * cell: footprint and source edges are grid lines), 2 plate layers, 4 fin layers; the finest of three grids then
 * has 4x as many cells in every direction.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { buildSinkGrid, type SinkGrid } from '../../mesh/index.js';
import { richardsonGci } from '../study/refinement.js';
import { assembleSink, sinkUnknowns, type FinRepresentation } from './sink-system.js';
import { checkSinkMemory, DEFAULT_MEMORY_LIMIT } from './sink-memory.js';
import { sinkFinProfiles } from './sink-fin-profiles.js';
import { sinkPlateView } from './sink-plate-view.js';
import { sinkProblem, type SinkProblem } from './sink-problem.js';
import { isNonlinearSink, solveSinkSystem, type SinkGridResult } from './sink-solve.js';
import { nestedProlongation, prolongAddWith, type SinkLevelGrid } from '../linear-algebra/aggregation.js';
import type { SinkStudy } from './sink-study-types.js';

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
  const problem = sinkProblem(c);
  const grids = options.grids ?? DEFAULT_GRIDS;
  if (!Number.isInteger(grids) || grids < 1) throw new RangeError(`studySink: grids must be a positive integer, got ${grids}`);
  const cellSize = options.cellSize ?? Math.min(c.plate.width, c.plate.length) / CELLS_PER_SIDE;
  const representation = options.finRepresentation ?? 'sheet';
  const spec = (refine: number) => ({ cellSize, plateLayers: options.plateLayers ?? PLATE_LAYERS, finLayers: options.finLayers ?? FIN_LAYERS, refine });
  const refines = Array.from({ length: grids }, (_, g) => 2 ** g);
  const meshes: SinkGrid[] = refines.map((r) => buildSinkGrid(problem.layout, spec(r)));
  const finest = meshes[meshes.length - 1];
  checkSinkMemory(
    sinkUnknowns(finest, representation, problem.layout.finKind),
    options.memoryLimit_bytes ?? DEFAULT_MEMORY_LIMIT,
    isNonlinearSink(problem),
  );
  // Coarsest first; a linear sink's finer grids start from the coarser solution prolonged (the grids are nested).
  const results: SinkGridResult[] = [];
  let previous: { level: SinkLevelGrid; theta: Float64Array } | null = null;
  for (const grid of meshes) {
    const system = assembleSink(problem, grid, representation);
    const p = previous === null || system.fold !== null || isNonlinearSink(problem) ? null : nestedProlongation(previous.level, system.levelGrid);
    let start: Float64Array | undefined;
    if (p !== null && previous !== null) {
      start = new Float64Array(system.matrix.n);
      prolongAddWith(p, previous.theta, start);
    }
    const result = solveSinkSystem(problem, system, start);
    results.unshift(result);
    previous = { level: system.levelGrid, theta: result.theta };
  }
  const sizes = refines.map((r) => cellSize / r).reverse();
  const last = refines[refines.length - 1] as number;
  return { ...sinkStudyFrom(problem, results, sizes, representation), finestGrid: { ...spec(last), finRepresentation: representation } };
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
