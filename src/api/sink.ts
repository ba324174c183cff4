/**
 * Heat sinks for the library: read a sink case (from a plain object, YAML or JSON text, or a file), check the
 * array shortcuts against the fd-3d reference, and solve it, with the numbers `fincheck check --json` and
 * `fincheck solve --json` print for the same case. A single-fin case given here is an InputError that says what a
 * sink case holds (read it with caseFromText); other failures as for fins (InputError, UsageError, SolverError).
 * Every result carries the model and accuracy of its numbers; they are estimates of an idealised sink (isoflux
 * sources, the given h), to be confirmed by test (h is usually the largest uncertainty; follow applicable codes,
 * standards and licensed practice).
 */
import { parseHeatSinkObject, parseHeatSinkText, readCaseFile, type CaseWarning, type HeatSinkCase } from '../case/index.js';
import { resolvedSinkReference, runSinkCheck, sinkSolveReport, type SinkCheckReport, type SinkSolveReport } from '../compare/index.js';
import { studySink } from '../fd/index.js';
import { toleranceOf } from './options.js';

/** A heat-sink case from a plain object (the keys of a sink case file, quantities as strings with units). */
export function sinkFromObject(value: unknown, name = 'unnamed sink'): HeatSinkCase {
  return parseHeatSinkObject(value, undefined, { defaultName: name });
}

/** A heat-sink case from YAML or JSON text; `fileName` names it in messages (and is its default name). */
export function sinkFromText(text: string, fileName = 'sink.yaml'): HeatSinkCase {
  return parseHeatSinkText(text, fileName);
}

/** A heat-sink case from a YAML or JSON file (at most the command line's size cap). */
export function sinkFromFile(path: string): HeatSinkCase {
  return parseHeatSinkText(readCaseFile(path), path);
}

export interface SinkCheckCallOptions {
  /** Relative drift accepted as ok, between 0 and 1 (default 0.02). */
  tolerance?: number;
}

export type SinkCheckResult = SinkCheckReport & { warnings: readonly CaseWarning[] };
export type SinkSolveResult = SinkSolveReport & { warnings: readonly CaseWarning[] };

/**
 * The fd-3d reference, resolved to a tenth of the tolerance where the budget of unknowns allows, and every array
 * shortcut's drift on each source's mean rise, with the ledger, the flags, sensitivities and the uncertainty band.
 */
export async function checkSink(c: HeatSinkCase, options: SinkCheckCallOptions = {}): Promise<SinkCheckResult> {
  const tolerance = toleranceOf(options.tolerance);
  const report = await runSinkCheck(c, resolvedSinkReference(tolerance), { tolerance });
  return { ...report, warnings: c.warnings ?? [] };
}

/** fd-3d on its three nested grids: source temperatures, heat per fin, the plate's faces, each with its GCI. */
export function solveSink(c: HeatSinkCase): SinkSolveResult {
  return { ...sinkSolveReport(c, studySink(c)), warnings: c.warnings ?? [] };
}
