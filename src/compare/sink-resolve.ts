/**
 * The fd-3d reference of a sink check, resolved before it judges (as resolved-reference.ts does for one fin): the
 * default three-grid study (coarsest cells min(width, length)/16, 2 plate layers, 4 fin layers); when its largest
 * per-source GCI is above a tenth of the tolerance, further studies in order of cost, each only if its finest
 * grid stays within the budget of unknowns (the fd-3d memory estimate, about 800 B an unknown, keeps it under
 * 1 GB), until one is resolved:
 *   1. the same cells with twice the layers in the plate and up the fins (about 2x the unknowns);
 *   2. cells half as large with twice the layers (about 8x).
 * The first is there because the through-thickness and along-fin resolution often decides the error: on the
 * 20-fin bench sink (bench/cases) the default study's GCI is 2.9e-3, twice the layers 1.9e-3 (225,280 unknowns)
 * and half the cells 1.7e-3 (450,560 unknowns); against a 2e-3 target the first suffices at half the cost.
 * A study that is still not resolved: the one with the smallest GCI is returned, and the check gives `unresolved`.
 */
import type { HeatSinkCase } from '../case/index.js';
import {
  planSinkStudy,
  sinkStudyOfPlan,
  sinkStudyUnknowns,
  studySink,
  type SinkGridSpec,
  type SinkLane,
  type SinkLanes,
  type SinkStudy,
  type SinkStudyOptions,
} from '../fd/index.js';
import { resolutionTarget } from './resolved-reference.js';

/** Finest-grid unknowns a refined study may reach. */
export const SINK_REFINEMENT_BUDGET = 1_200_000;

function worstGci(study: SinkStudy): number {
  const errors = study.sources.map((s) => s.discretizationError ?? Number.POSITIVE_INFINITY);
  return Math.max(...errors);
}

function candidates(c: HeatSinkCase, refinements: number): SinkStudyOptions[] {
  const side = Math.min(c.plate.width, c.plate.length);
  const all: SinkStudyOptions[] = [
    { plateLayers: 4, finLayers: 8 },
    { cellSize: side / 32, plateLayers: 4, finLayers: 8 },
  ];
  return all.slice(0, refinements);
}

/** `refinements`: how many of the further studies may be tried (2: both; a map point takes 1, the cheaper). */
export function resolvedSinkStudy(c: HeatSinkCase, tolerance: number, refinements = 2): SinkStudy {
  const target = resolutionTarget(tolerance);
  let best = studySink(c);
  if (worstGci(best) <= target) return best;
  for (const options of candidates(c, refinements)) {
    if (sinkStudyUnknowns(c, options) > SINK_REFINEMENT_BUDGET) break;
    const study = studySink(c, options);
    if (worstGci(study) <= worstGci(best)) best = study;
    if (worstGci(best) <= target) break;
  }
  return best;
}

/**
 * Told, while a further study is being solved, which of its grids is kept where and the best study so far: the
 * check queues its sensitivities on that grid behind it (they are used when that study is the one returned).
 */
export type SinkStudyAhead = (kept: { spec: SinkGridSpec; lane: SinkLane }, provisional: SinkStudy) => void;

/**
 * resolvedSinkStudy on a check's two lanes (src/fd sink-lanes.ts), the same studies and the same choice: the
 * default study here, keeping its second-finest grid for the sensitivities; a further study with its finest grid
 * here and its two coarser grids on the other lane when that lane is a free thread of its own, else here before the
 * finest (on the 20-fin bench sink the other lane is then still solving the sheet row's cells study, and the
 * coarser grids and the sensitivities here finish before it would), keeping its second-finest grid where they ran. The finest grid then starts CG from the default study's finest solution
 * where it has twice its layers (src/fd sink-layer-start.ts), else from zero, instead of from the coarser solution
 * (the same solution to the solver's tolerance).
 */
export async function resolveSinkStudyOn(
  lanes: SinkLanes,
  c: HeatSinkCase,
  tolerance: number,
  refinements = 2,
  ahead?: SinkStudyAhead,
): Promise<SinkStudy> {
  const target = resolutionTarget(tolerance);
  const first = await lanes.run('here', { kind: 'study', options: {}, keep: true });
  let best = first;
  if (worstGci(best) <= target) return best;
  for (const options of candidates(c, refinements)) {
    if (sinkStudyUnknowns(c, options) > SINK_REFINEMENT_BUDGET) break;
    const plan = planSinkStudy(c, options);
    const n = plan.specs.length;
    const keep = n >= 2 ? n - 2 : null;
    // The coarser grids beside the finest when the other lane is free; else here, before it (the other lane is busy
    // with the check's other work, e.g. the sheet row's cells study, and this one would wait for it).
    const apart = lanes.apartAndFree();
    const coarser = lanes.run(apart ? 'there' : 'here', { kind: 'grids', options, from: 0, to: n - 1, keep, startFrom: null });
    const kept = keep === null ? undefined : plan.specs[keep];
    // Only a free lane of its own takes sensitivities ahead (here they would wait until this study is chosen).
    if (ahead !== undefined && kept !== undefined && apart) ahead({ spec: kept, lane: 'there' }, best);
    const finest = lanes.run('here', { kind: 'grids', options, from: n - 1, to: n, keep: null, startFrom: first.finestGrid ?? null });
    const [coarse, fine] = await Promise.all([coarser, finest]);
    const study = sinkStudyOfPlan(plan, [...coarse, ...fine]);
    if (worstGci(study) <= worstGci(best)) best = study;
    if (worstGci(best) <= target) break;
  }
  return best;
}

/** The check's reference (sink-check.ts SinkReferenceSource): resolveSinkStudyOn on the check's lanes. */
export function resolvedSinkReference(
  tolerance: number,
  refinements = 2,
): (c: HeatSinkCase, lanes: SinkLanes, ahead: SinkStudyAhead) => Promise<SinkStudy> {
  return (c, lanes, ahead) => resolveSinkStudyOn(lanes, c, tolerance, refinements, ahead);
}
