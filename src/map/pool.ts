/**
 * Solving every grid point: in this thread (one job) or on N worker threads (node:worker_threads), batches of
 * neighbouring points dealt out as workers become free (schedule.ts). Results come back in any order and are
 * stored by index. An abort signal (Ctrl-C) stops the run: workers are terminated at once and the promise rejects
 * with MapInterrupted. The in-process path yields to the event loop every few milliseconds so that the signal
 * handler gets to run.
 */
import type { Worker } from 'node:worker_threads';
import type { BatchMessage, PointTask, WorkerMessage } from './messages.js';
import { evaluatePoint, pointContext } from './point.js';
import { serpentineSchedule, type Schedule } from './schedule.js';
import type { MapJob, MapPoint } from './types.js';
import { startMapWorker } from './worker-start.js';

export class MapInterrupted extends Error {
  override name = 'MapInterrupted';
  constructor(readonly done: number) {
    super(`interrupted after ${done} points`);
  }
}

export interface SolvePointsOptions {
  /** Worker threads; 1 solves in this thread. */
  jobs: number;
  signal?: AbortSignal;
  /** Called after each point with the number of points done so far. */
  onPoint?: (done: number, point: MapPoint) => void;
}

function batchTasks(schedule: Schedule, b: number, xs: Float64Array, ys: Float64Array): PointTask[] {
  const nx = xs.length;
  const tasks: PointTask[] = [];
  for (let k = schedule.starts[b] as number; k < (schedule.starts[b + 1] as number); k++) {
    const index = schedule.order[k] as number;
    tasks.push({ index, x: xs[index % nx] as number, y: ys[Math.floor(index / nx)] as number });
  }
  return tasks;
}

/**
 * Whether to walk the map column by column: for a fin whose x axis changes its shape (a key under `fin`) and whose y
 * axis does not, so that consecutive points share one geometry (schedule.ts).
 */
export function walkAlongY(job: MapJob): boolean {
  return job.kind === 'fin' && job.x.path[0] === 'fin' && job.y.path[0] !== 'fin';
}

/** Every point of the nx * ny grid, stored x fastest (index = j * nx + i). */
export async function solvePoints(job: MapJob, xs: Float64Array, ys: Float64Array, options: SolvePointsOptions): Promise<MapPoint[]> {
  const jobs = Math.max(1, Math.floor(options.jobs));
  const schedule = serpentineSchedule(xs.length, ys.length, jobs, walkAlongY(job));
  const batches = schedule.starts.length - 1;
  return jobs === 1 || batches === 1
    ? solveInProcess(job, xs, ys, schedule, options)
    : solveOnWorkers(job, xs, ys, schedule, Math.min(jobs, batches), options);
}

async function solveInProcess(job: MapJob, xs: Float64Array, ys: Float64Array, schedule: Schedule, options: SolvePointsOptions): Promise<MapPoint[]> {
  const context = pointContext(job);
  const points: MapPoint[] = new Array<MapPoint>(xs.length * ys.length);
  let done = 0;
  let lastYield = performance.now();
  for (let b = 0; b < schedule.starts.length - 1; b++) {
    for (const task of batchTasks(schedule, b, xs, ys)) {
      if (options.signal?.aborted) throw new MapInterrupted(done);
      const point = await evaluatePoint(context, task.index, task.x, task.y);
      points[task.index] = point;
      options.onPoint?.(++done, point);
      if (performance.now() - lastYield > 20) {
        await new Promise((resolve) => setImmediate(resolve));
        lastYield = performance.now();
      }
    }
  }
  if (options.signal?.aborted) throw new MapInterrupted(done);
  return points;
}

function solveOnWorkers(
  job: MapJob,
  xs: Float64Array,
  ys: Float64Array,
  schedule: Schedule,
  workerCount: number,
  options: SolvePointsOptions,
): Promise<MapPoint[]> {
  const total = xs.length * ys.length;
  const batches = schedule.starts.length - 1;
  const points: MapPoint[] = new Array<MapPoint>(total);
  return new Promise<MapPoint[]>((resolve, reject) => {
    const workers: Worker[] = [];
    /** Workers stopped on purpose (no batch left): their exit is not a failure. */
    const retired = new Set<Worker>();
    let nextBatch = 0;
    let done = 0;
    let finished = false;
    const stopAll = (): void => {
      for (const w of workers) void w.terminate();
    };
    const fail = (err: unknown): void => {
      if (finished) return;
      finished = true;
      options.signal?.removeEventListener('abort', onAbort);
      stopAll();
      reject(err instanceof Error ? err : new Error(String(err)));
    };
    const onAbort = (): void => fail(new MapInterrupted(done));
    if (options.signal?.aborted) {
      reject(new MapInterrupted(0));
      return;
    }
    options.signal?.addEventListener('abort', onAbort, { once: true });
    const feed = (worker: Worker): void => {
      if (nextBatch >= batches) {
        retired.add(worker);
        void worker.terminate();
        return;
      }
      worker.postMessage({ type: 'batch', tasks: batchTasks(schedule, nextBatch++, xs, ys) } satisfies BatchMessage);
    };
    for (let w = 0; w < workerCount; w++) {
      const worker = startMapWorker(job);
      workers.push(worker);
      worker.on('message', (message: WorkerMessage) => {
        if (finished) return;
        switch (message.type) {
          case 'point':
            points[message.point.index] = message.point;
            options.onPoint?.(++done, message.point);
            if (done === total) {
              finished = true;
              options.signal?.removeEventListener('abort', onAbort);
              stopAll();
              resolve(points);
            }
            break;
          case 'batch-done':
            feed(worker);
            break;
          default: {
            const unreachable: never = message;
            fail(new Error(`map worker: unknown message ${JSON.stringify(unreachable)}`));
          }
        }
      });
      worker.on('error', (err) => fail(new Error(`map worker failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}`)));
      worker.on('exit', (code) => {
        if (!finished && !retired.has(worker) && code !== 0) fail(new Error(`map worker exited with code ${code} before the map was done`));
      });
      feed(worker);
    }
  });
}
