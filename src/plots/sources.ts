/**
 * What the charts are drawn from: the check (reference, shortcuts, their profiles) for `profile` and
 * `flux`, and the fd-2d refinement study for `heatmap` (the one study, studyFin: Newton's method on the
 * same grid family for a nonlinear fin). Each is computed only when a chart needs it.
 */
import type { Case } from '../case/index.js';
import { runCheck, type CheckOptions, modelProfiles } from '../compare/index.js';
import { finProblem, modelApplies, studyFin, type FinStudy2D } from '../fd/index.js';
import type { CheckPlotInput } from './profile-chart.js';

export const PLOT_KINDS = ['profile', 'flux', 'heatmap', 'sensitivity'] as const;
export type PlotKind = (typeof PLOT_KINDS)[number];

export type HeatmapAvailability = { ok: true } | { ok: false; reason: string };

/**
 * Whether the 2-D model covers this case, without solving it. The reason names the profile and
 * what the 2-D model lacks (e.g. an infinite tip on a tapered fin, or on any nonlinear fin).
 */
export function heatmapAvailability(c: Case): HeatmapAvailability {
  const coverage = modelApplies(finProblem(c), '2d');
  return coverage.ok ? { ok: true } : { ok: false, reason: `the 2-D model does not cover this ${c.fin.profile.kind} fin: ${coverage.reason}` };
}

/**
 * The fd-2d study behind a heat map. Ask heatmapAvailability first: a fin the 2-D model does not cover
 * throws ModelNotApplicableError.
 */
export async function fieldStudy(c: Case): Promise<FinStudy2D> {
  return (await studyFin(finProblem(c), { model: '2d' })) as FinStudy2D;
}

/** The check and every model's profile (a '2d' reference the 2-D model does not cover throws the check's ModelNotApplicableError). */
export async function checkPlotInput(c: Case, opts: CheckOptions): Promise<CheckPlotInput> {
  const { report, oneD, twoD } = await runCheck(c, opts);
  return { case: c, report, profiles: modelProfiles(c, report, oneD, twoD), oneD, twoD };
}
