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
import { sinkStudyUnknowns, studySink, type SinkStudy, type SinkStudyOptions } from '../fd/index.js';
import { resolutionTarget } from './resolved-reference.js';

/** Finest-grid unknowns a refined study may reach. */
export const SINK_REFINEMENT_BUDGET = 1_200_000;

function worstGci(study: SinkStudy): number {
  const errors = study.sources.map((s) => s.discretizationError ?? Number.POSITIVE_INFINITY);
  return Math.max(...errors);
}

/** `refinements`: how many of the further studies may be tried (2: both; a map point takes 1, the cheaper). */
export function resolvedSinkStudy(c: HeatSinkCase, tolerance: number, refinements = 2): SinkStudy {
  const target = resolutionTarget(tolerance);
  let best = studySink(c);
  if (worstGci(best) <= target) return best;
  const side = Math.min(c.plate.width, c.plate.length);
  const candidates: SinkStudyOptions[] = [
    { plateLayers: 4, finLayers: 8 },
    { cellSize: side / 32, plateLayers: 4, finLayers: 8 },
  ];
  for (const options of candidates.slice(0, refinements)) {
    if (sinkStudyUnknowns(c, options) > SINK_REFINEMENT_BUDGET) break;
    const study = studySink(c, options);
    if (worstGci(study) <= worstGci(best)) best = study;
    if (worstGci(best) <= target) break;
  }
  return best;
}
