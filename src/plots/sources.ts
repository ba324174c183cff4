/**
 * What the charts are drawn from: the check (reference, shortcuts, their profiles) for `profile` and
 * `flux`, and the fd-2d refinement study for `heatmap` (nonlinear fins: the Newton study of
 * nonlinear2d-study.ts on the same grid family). Each is computed only when a chart needs it.
 */
import type { Case } from '../case/types.js';
import { runCheck, type CheckOptions } from '../compare/check.js';
import { modelProfiles } from '../compare/model-profiles.js';
import { UsageError } from '../errors.js';
import { fin2dProblem } from '../fd/two-d/problem.js';
import { studyFin2DProblem, type Fin2DStudy } from '../fd/two-d/linear-study.js';
import { isLinearFinCase } from '../fd/problem/linear-case.js';
import { nonlinearFin2DProblem } from '../fd/two-d/nonlinear-problem.js';
import { studyNonlinearFin2DProblem } from '../fd/two-d/nonlinear-study.js';
import type { CheckPlotInput } from './profile-chart.js';

export const PLOT_KINDS = ['profile', 'flux', 'heatmap'] as const;
export type PlotKind = (typeof PLOT_KINDS)[number];

export type HeatmapAvailability = { ok: true } | { ok: false; reason: string };

/**
 * Whether the 2-D model covers this case, without solving it. The reason names the profile and
 * what the 2-D model lacks (e.g. an infinite tip on a tapered fin, or on any nonlinear fin).
 */
export function heatmapAvailability(c: Case): HeatmapAvailability {
  try {
    if (isLinearFinCase(c)) fin2dProblem(c);
    else nonlinearFin2DProblem(c);
    return { ok: true };
  } catch (e) {
    if (e instanceof UsageError || e instanceof RangeError) {
      return { ok: false, reason: `the 2-D model does not cover this ${c.fin.profile.kind} fin: ${e.message.replace(/^fd-2d: /, '').replace(/; use the 1-D model$/, '')}` };
    }
    throw e;
  }
}

/** The fd-2d study behind a heat map; a UsageError naming the profile where the 2-D model does not apply. */
export function fieldStudy(c: Case): Fin2DStudy {
  const available = heatmapAvailability(c);
  if (!available.ok) throw new UsageError(`--kind heatmap: ${available.reason}`);
  return isLinearFinCase(c) ? studyFin2DProblem(fin2dProblem(c)) : studyNonlinearFin2DProblem(nonlinearFin2DProblem(c));
}

/** The check and every model's profile (throws the check's UsageError, e.g. --reference 2d where the 2-D model does not apply). */
export async function checkPlotInput(c: Case, opts: CheckOptions): Promise<CheckPlotInput> {
  const { report, oneD, twoD } = await runCheck(c, opts);
  return { case: c, report, profiles: modelProfiles(c, report, oneD, twoD), oneD, twoD };
}
