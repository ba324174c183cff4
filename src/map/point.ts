/**
 * One grid point: substitute the two axis values into the raw case, validate it again, run `fincheck check`'s
 * pipeline (runCheck, without the assumption ledger) and keep what the map reports. A point where the case becomes
 * invalid, or where the solver fails, gives its message instead of results; every other error is a bug and is
 * thrown. The same function runs in-process (one job) and in each worker, so both give the same numbers.
 */
import { parseAnyCaseObject, readDocument, type Locate, type ParseOptions } from '../case/index.js';
import { basename, extname } from 'node:path';
import { runCheck, type CheckReport } from '../compare/index.js';
import { InputError, SolverError, UsageError } from '../errors.js';
import { pointFromSinkReport, sinkPointReport } from './sink-point.js';
import { substituteAxis } from './substitute.js';
import type { MapJob, MapModelId, MapPoint, PointModel, PointResult } from './types.js';

export interface PointContext {
  job: MapJob;
  raw: unknown;
  locate: Locate;
  parseOptions: ParseOptions;
}

/** Reads the case text once per thread, as `fincheck check` reads the file (same default name, same positions). */
export function pointContext(job: MapJob): PointContext {
  const document = readDocument(job.caseText, job.fileName);
  const defaultName = basename(job.fileName, extname(job.fileName)) || 'unnamed case';
  return { job, raw: document.raw, locate: document.locate, parseOptions: { defaultName, file: job.fileName } };
}

/** The message of an error the map shows in a cell, or undefined for an error that is a bug. */
function pointMessage(err: unknown): string | undefined {
  if (err instanceof InputError) return err.issues.map((i) => `${i.path}: got ${i.value}; expected ${i.accepted}`).join('; ');
  if (err instanceof SolverError) return `solver failure: ${err.message}`;
  if (err instanceof UsageError) return err.message;
  return undefined;
}

/** The map's numbers of one point from `fincheck check`'s report on its case (the ledger is not needed). */
export function pointFromReport(index: number, x: number, y: number, report: CheckReport, wanted: readonly MapModelId[]): PointResult {
  const { biot, mL } = report;
  const models: PointModel[] = [];
  for (const id of wanted) {
    // Nonlinear fins list each shortcut twice (h and k at the base temperature, and averaged over the
    // fin); the map shows the first, the base-temperature guess, and says so in its notes.
    const m = report.models.find((r) => r.model === id && (r.guess === undefined || r.guess === 'base'));
    if (m) {
      models.push({ model: m.model, heatRate_W: m.heatRate_W, efficiency: m.efficiency, drift: m.drift, verdict: m.verdict });
    }
  }
  const ref = report.reference;
  return {
    index,
    x,
    y,
    biot,
    mL,
    reference: {
      model: ref.model,
      heatRate_W: ref.heatRate_W,
      efficiency: ref.efficiency,
      discretizationError: ref.discretizationError,
      resolved: ref.resolved,
    },
    models,
  };
}

export async function evaluatePoint(context: PointContext, index: number, x: number, y: number): Promise<MapPoint> {
  const { job } = context;
  try {
    const raw = substituteAxis(substituteAxis(context.raw, job.x, x), job.y, y);
    const any = parseAnyCaseObject(raw, context.locate, context.parseOptions);
    if (any.kind === 'heat-sink') return pointFromSinkReport(index, x, y, await sinkPointReport(any.case, job.check.tolerance), job.check.models);
    const { report } = await runCheck(any.case, { tolerance: job.check.tolerance, reference: job.check.reference, ledger: false });
    return pointFromReport(index, x, y, report, job.check.models);
  } catch (err) {
    const error = pointMessage(err);
    if (error === undefined) throw err;
    return { index, x, y, error };
  }
}
