/**
 * `fincheck map` as a library: check everything that can be known before the run (the case, both axes, the
 * reference and the shortcuts asked for, on the case's own point), then solve every grid point (pool.ts) and
 * return plain data. Files and text are written by the caller (outputs.ts, format.ts).
 */
import { bareLengthUnit, dimensionWarning, parseAnyCaseText, parseQuantity, readDocument, type CaseWarning, type HeatSinkCase } from '../case/index.js';
import { rawAxisValue } from './substitute.js';
import { runCheck, SINK_SHORTCUT_IDS, type NotApplicable } from '../compare/index.js';
import { UsageError } from '../errors.js';
import { finProblem, modelApplies } from '../fd/index.js';
import { parseMapAxis } from './axis.js';
import { solvePoints } from './pool.js';
import { pointFromReport } from './point.js';
import { pointFromSinkReport, sinkPointReport } from './sink-point.js';
import { summariseMap, type MapSummary } from './summary.js';
import type { MapAxis, MapJob, MapModelId, MapPoint, PointCheckOptions, PointResult } from './types.js';

export interface MapLabels {
  x: string;
  y: string;
  models: string;
  reference: string;
}

/** The parts of a map request in words. */
export const DEFAULT_LABELS: MapLabels = { x: 'x axis', y: 'y axis', models: 'models', reference: 'reference model' };

export interface MapRequest {
  caseText: string;
  fileName: string;
  /** KEY=FROM:TO of each axis. */
  x: string;
  y: string;
  logX: boolean;
  logY: boolean;
  steps: readonly [number, number];
  tolerance: number;
  reference: PointCheckOptions['reference'];
  /** Models to map; undefined maps every shortcut that applies to the case (and fd-1d beside a 2-D reference). */
  models?: readonly MapModelId[];
  /** How the caller names the request's parts in messages (the command line: its options); default DEFAULT_LABELS. */
  labels?: MapLabels;
}

/** A map ready to run: checked axes, the job every point runs, and the case's own point. */
export interface PreparedMap {
  caseName: string;
  x: MapAxis;
  y: MapAxis;
  job: MapJob;
  /** The case as given (its own x, y), checked with the same options; index -1. */
  casePoint: PointResult;
  notApplicable: NotApplicable[];
  /** The case's warnings (src/case) and those of an axis sweeping implausible lengths (a bare 20:300 is metres). */
  warnings: CaseWarning[];
}

export interface MapRun extends PreparedMap {
  points: MapPoint[];
  summary: MapSummary;
}

/** Every check that does not need the grid; throws InputError or UsageError (exit 2). */
export async function prepareMap(request: MapRequest): Promise<PreparedMap> {
  const any = parseAnyCaseText(request.caseText, request.fileName);
  const { raw } = readDocument(request.caseText, request.fileName);
  const labels = request.labels ?? DEFAULT_LABELS;
  const x = parseMapAxis({ option: labels.x, text: request.x, steps: request.steps[0], log: request.logX }, raw, any.case);
  const y = parseMapAxis({ option: labels.y, text: request.y, steps: request.steps[1], log: request.logY }, raw, any.case);
  if (x.key === y.key) throw new UsageError(`${labels.x} and ${labels.y} both sweep ${x.key}; give two different keys`);
  if (any.kind === 'heat-sink') return prepareSinkMap(request, any.case, raw, x, y, labels);
  const c = any.case;
  if (request.reference === '2d') {
    const coverage = modelApplies(finProblem(c), '2d');
    if (!coverage.ok) throw new UsageError(`${labels.reference} 2d: ${coverage.reason}; use ${labels.reference} 1d or auto`);
  }

  const { report } = await runCheck(c, { tolerance: request.tolerance, reference: request.reference, ledger: false });
  // Unique ids: a nonlinear fin lists each shortcut once per single-h guess; the map shows the base-temperature guess.
  const applicable: MapModelId[] = [...new Set(report.models.map((m) => m.model))];
  for (const id of request.models ?? []) {
    if (applicable.includes(id)) continue;
    const reason =
      id === 'fd-1d'
        ? `it is the reference here; fd-1d is compared with fd-2d where the case allows 2-D (${labels.reference} auto or 2d)`
        : (report.notApplicable.find((n) => n.model === id)?.reason ?? 'not evaluated for this case');
    throw new UsageError(`${labels.models}: ${id} does not apply to this case (${reason}); these do: ${applicable.join(', ')}`);
  }
  const models = request.models ? [...new Set(request.models)] : applicable;
  const guess = report.models.some((m) => m.guess !== undefined) ? 'base' : null;
  const check: PointCheckOptions = { tolerance: request.tolerance, reference: request.reference, models, guess };
  const job: MapJob = {
    kind: 'fin',
    caseText: request.caseText,
    fileName: request.fileName,
    x: { path: x.path, unit: x.unit },
    y: { path: y.path, unit: y.unit },
    check,
  };
  const casePoint = pointFromReport(-1, x.caseValue ?? Number.NaN, y.caseValue ?? Number.NaN, report, models);
  const bareUnitChosen = bareLengthUnit(raw) !== 'm';
  const warnings = [...(c.warnings ?? []), ...axisWarnings(x, labels.x, bareUnitChosen), ...axisWarnings(y, labels.y, bareUnitChosen)];
  return { caseName: c.name, x, y, job, casePoint, notApplicable: report.notApplicable, warnings };
}

/** prepareMap of a heat sink: the array shortcuts against fd-3d on the default study at every point (sink-point.ts). */
async function prepareSinkMap(request: MapRequest, c: HeatSinkCase, raw: unknown, x: MapAxis, y: MapAxis, labels: MapLabels): Promise<PreparedMap> {
  if (request.reference !== 'auto')
    throw new UsageError(`${labels.reference} ${request.reference}: a heat sink's reference is fd-3d; leave ${labels.reference} at auto`);
  const report = await sinkPointReport(c, request.tolerance);
  const applicable: MapModelId[] = [...SINK_SHORTCUT_IDS];
  for (const id of request.models ?? []) {
    if (!applicable.includes(id)) throw new UsageError(`${labels.models}: ${id} is a single-fin model; a heat sink maps ${applicable.join(', ')}`);
  }
  const models = request.models ? [...new Set(request.models)] : applicable;
  const check: PointCheckOptions = { tolerance: request.tolerance, reference: 'auto', models, guess: null };
  const job: MapJob = {
    kind: 'heat-sink',
    caseText: request.caseText,
    fileName: request.fileName,
    x: { path: x.path, unit: x.unit },
    y: { path: y.path, unit: y.unit },
    check,
  };
  const casePoint = pointFromSinkReport(-1, x.caseValue ?? Number.NaN, y.caseValue ?? Number.NaN, report, models);
  const bareUnitChosen = bareLengthUnit(raw) !== 'm';
  const warnings = [...(c.warnings ?? []), ...axisWarnings(x, labels.x, bareUnitChosen), ...axisWarnings(y, labels.y, bareUnitChosen)];
  return { caseName: c.name, x, y, job, casePoint, notApplicable: [], warnings };
}

/** A warning when a length axis reaches a value implausible for a fin (its largest end is checked). */
function axisWarnings(axis: MapAxis, option: string, bareUnitChosen: boolean): CaseWarning[] {
  if (axis.kind !== 'length') return [];
  const top = Math.max(...axis.values);
  const si = parseQuantity(rawAxisValue(axis, top), 'length');
  if (!si.ok) return [];
  const warning = dimensionWarning(axis.path, si.value, axis.unit === '' ? top : `${top} ${axis.unit}`, bareUnitChosen);
  return warning ? [{ ...warning, path: `${option} ${warning.path}` }] : [];
}

export interface RunOptions {
  jobs: number;
  signal?: AbortSignal;
  onPoint?: (done: number, point: MapPoint) => void;
}

/** Solves every grid point. Rejects with MapInterrupted when the signal aborts. */
export async function runMap(prepared: PreparedMap, options: RunOptions): Promise<MapRun> {
  const points = await solvePoints(prepared.job, prepared.x.values, prepared.y.values, options);
  return { ...prepared, points, summary: summariseMap(points, prepared.job.check.models) };
}
