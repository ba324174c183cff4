/**
 * The fd-3d reference of a sink check, resolved before it judges (as resolved-reference.ts does for one fin): the
 * default three-grid study (coarsest cells min(width, length)/16), and, when its largest per-source GCI is above a
 * tenth of the tolerance, one more study on cells half as large, if its finest grid stays within the budget of
 * unknowns (the fd-3d memory estimate, about 800 B an unknown, keeps it under 1 GB). A study that is still not
 * resolved is returned as it is: the check then gives the verdict `unresolved`.
 */
import type { HeatSinkCase } from '../case/index.js';
import { studySink, type SinkStudy } from '../fd/index.js';
import { resolutionTarget } from './resolved-reference.js';

/** Finest-grid unknowns the refined study may reach. */
export const SINK_REFINEMENT_BUDGET = 1_200_000;

function worstGci(study: SinkStudy): number {
  const errors = study.sources.map((s) => s.discretizationError ?? Number.POSITIVE_INFINITY);
  return Math.max(...errors);
}

export function resolvedSinkStudy(c: HeatSinkCase, tolerance: number): SinkStudy {
  const first = studySink(c);
  if (worstGci(first) <= resolutionTarget(tolerance)) return first;
  const finest = first.unknowns[0] ?? Number.POSITIVE_INFINITY;
  // Halving the cells multiplies the unknowns by about 8 (4 in plan, 2 through the thickness and up the fins).
  if (8 * finest > SINK_REFINEMENT_BUDGET) return first;
  const refined = studySink(c, { cellSize: Math.min(c.plate.width, c.plate.length) / 32, plateLayers: 4, finLayers: 8 });
  return worstGci(refined) <= worstGci(first) ? refined : first;
}
