/** `check` for the library: the report that `fincheck check --json` prints, as an object. */
import type { Case, CaseWarning } from '../case/index.js';
import { runCheck, type CheckReport } from '../compare/index.js';
import { referenceOf, toleranceOf, type ReferenceChoice } from './options.js';

export interface CheckCallOptions {
  /** Relative drift accepted as ok, between 0 and 1 (default 0.02). */
  tolerance?: number;
  /** Reference model: 'auto' (2-D where the fin allows, default), '1d' or '2d'. */
  reference?: ReferenceChoice;
}

export type CheckResult = CheckReport & { warnings: readonly CaseWarning[] };

/**
 * Solves the fin with the reference model and reports how far each applicable shortcut drifts from it.
 * Throws ModelNotApplicableError for reference '2d' on a fin the 2-D model does not cover, SolverError when a solve fails.
 */
export async function check(c: Case, options: CheckCallOptions = {}): Promise<CheckResult> {
  const { report } = await runCheck(c, { tolerance: toleranceOf(options.tolerance), reference: referenceOf(options.reference) });
  return { ...report, warnings: c.warnings ?? [] };
}
