/**
 * `map` for the library: sweeps two case keys over a grid and checks every point, as `fincheck map` does,
 * returning the document `fincheck map --json` prints (no files written). Progress is reported per point; an
 * AbortSignal stops the run (the promise rejects with MapInterrupted).
 */
import { readCaseFile } from '../case/index.js';
import { mapJson, prepareMap, runMap, type MapModelId } from '../map/index.js';
import { referenceOf, toleranceOf, wholeNumberOf, type ReferenceChoice } from './options.js';

export interface MapCallOptions {
  /** `KEY=FROM:TO` of each axis, e.g. `fin.thickness=1mm:4mm`, `convection.h=20:400`. */
  x: string;
  y: string;
  /** Values along each axis (default 9 x 9). */
  steps?: [number, number];
  /** Logarithmic spacing along an axis. */
  logX?: boolean;
  logY?: boolean;
  tolerance?: number;
  reference?: ReferenceChoice;
  /** Shortcuts to map (default: every one that applies). */
  models?: MapModelId[];
  /** Worker threads (default 1: this thread). */
  jobs?: number;
  /** Called after each point with the number of points done and the total. */
  onProgress?: (done: number, total: number) => void;
  signal?: AbortSignal;
}

export type MapResult = ReturnType<typeof mapJson>;

/** The case as text (YAML or JSON; `fileName` names it in messages), or a file to read. */
export type MapSource = { text: string; fileName?: string } | { file: string };

export async function map(source: MapSource, options: MapCallOptions): Promise<MapResult> {
  const { text, fileName } =
    'file' in source ? { text: readCaseFile(source.file), fileName: source.file } : { text: source.text, fileName: source.fileName ?? 'case.yaml' };
  const nx = wholeNumberOf('steps[0]', options.steps?.[0], 2, 1000) ?? 9;
  const ny = wholeNumberOf('steps[1]', options.steps?.[1], 2, 1000) ?? 9;
  const jobs = wholeNumberOf('jobs', options.jobs, 1, 256) ?? 1;
  const prepared = await prepareMap({
    caseText: text,
    fileName,
    x: options.x,
    y: options.y,
    logX: options.logX === true,
    logY: options.logY === true,
    steps: [nx, ny],
    tolerance: toleranceOf(options.tolerance),
    reference: referenceOf(options.reference),
    ...(options.models ? { models: options.models } : {}),
    labels: { x: 'options.x', y: 'options.y', models: 'options.models', reference: 'options.reference' },
  });
  const total = nx * ny;
  const run = await runMap(prepared, {
    jobs,
    ...(options.signal ? { signal: options.signal } : {}),
    ...(options.onProgress ? { onPoint: (done: number) => options.onProgress?.(done, total) } : {}),
  });
  return mapJson(run);
}
