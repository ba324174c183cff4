/**
 * Two lanes for the fd-3d work of one heat-sink check: this thread ('here') and one worker thread ('there'),
 * so that independent studies of the check (the reference's, the sheet reduction's cells study, the grids of a
 * finer study) use both cores of the machine. A task (sink-lane-tasks.ts) runs on the lane it is given to; the
 * lanes remember which one keeps which grid, so that later work on that grid goes where its setup is. Tasks given
 * to 'there' run in the order given. 'here' runs a task at once (this thread is busy meanwhile; the worker's
 * results wait in its queue).
 *
 * The worker is the bundled dist/sink-worker.js (scripts/build.mjs), started beside the module that runs this
 * one. Without it (the TypeScript sources under tests), on a single core or a busy machine (coreFree below), or when
 * the worker fails or cannot take a task, 'there' runs on this thread: the same code gives the same numbers either way, and a task that failed on
 * the worker is run again here, so that its error reaches the caller with its own type.
 */
import { existsSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { HeatSinkCase } from '../../case/index.js';
import { sameSinkGrid } from './sink-grid-setup.js';
import { SinkLaneState, type SinkLaneOutcome, type SinkLaneTask, type SinkLaneTaskOf, type SinkLaneResults } from './sink-lane-tasks.js';
import type { SinkGridSpec } from './sink-study-types.js';

export type SinkLane = 'here' | 'there';

export interface SinkLanes {
  run<K extends SinkLaneTask['kind']>(lane: SinkLane, task: SinkLaneTaskOf<K>): Promise<SinkLaneResults[K]>;
  /** The lane that keeps this grid set up and solved; 'here' when none does. */
  holder(spec: SinkGridSpec): SinkLane;
  /**
   * Whether 'there' is a thread of its own (running, or allowed to start) with no task pending: a task given to it
   * now starts at once, beside this thread. False when 'there' runs on this thread.
   */
  apartAndFree(): boolean;
  /** Stops the worker (pending tasks on it are dropped). */
  close(): Promise<void>;
}

/** A request to the worker and its answer (sink-lane-worker.ts). */
export interface SinkLaneRequest {
  id: number;
  task: SinkLaneTask;
}
export type SinkLaneReply = { id: number; ok: true; outcome: SinkLaneOutcome<SinkLaneTask['kind']> } | { id: number; ok: false };

type Outcome = SinkLaneOutcome<SinkLaneTask['kind']>;

interface Pending {
  task: SinkLaneTask;
  resolve(outcome: Outcome): void;
  reject(error: unknown): void;
}

export interface SinkLanesOptions {
  /** 'auto' (default): a worker thread when a core is free (coreFree); 'never': both lanes here; 'always': a worker whenever one starts. */
  parallel?: 'auto' | 'never' | 'always';
  /** The worker's entry (default dist/sink-worker.js beside this module). */
  worker?: URL;
}

export function startSinkLanes(c: HeatSinkCase, options: SinkLanesOptions = {}): SinkLanes {
  const here = new SinkLaneState(c);
  const kept: { spec: SinkGridSpec; lane: SinkLane }[] = [];
  const pending = new Map<number, Pending>();
  let nextId = 0;
  // Started with the first task given to 'there' (a check that gives none, e.g. a map point, starts no thread).
  const parallel = options.parallel ?? 'auto';
  let allowed = parallel === 'always' || (parallel === 'auto' && coreFree());
  let worker: Worker | null = null;

  const record = (outcome: Outcome, lane: SinkLane): Outcome => {
    if (outcome.kept !== null) kept.push({ spec: outcome.kept, lane });
    return outcome;
  };
  const runHere = (task: SinkLaneTask): Outcome => record(here.run(task), 'here');
  /** Runs a task of the worker's here instead; its error (a domain error with its own type) goes to its caller. */
  const settleHere = (p: Pending): void => {
    let outcome: Outcome;
    try {
      outcome = runHere(p.task);
    } catch (error) {
      p.reject(error);
      return;
    }
    p.resolve(outcome);
  };
  // Once the worker has failed or stopped, its pending tasks run here, in their order.
  const fallBack = (): void => {
    worker = null;
    const tasks = [...pending.values()];
    pending.clear();
    tasks.forEach(settleHere);
  };
  const theWorker = (): Worker | null => {
    if (worker !== null || !allowed) return worker;
    allowed = false;
    const w = startWorker(c, options.worker ?? new URL('./sink-worker.js', import.meta.url));
    if (w === null) return null;
    w.on('message', (reply: SinkLaneReply) => {
      const p = pending.get(reply.id);
      if (p === undefined) return;
      pending.delete(reply.id);
      if (reply.ok) p.resolve(record(reply.outcome, 'there'));
      else settleHere(p);
    });
    w.on('error', fallBack);
    w.on('exit', () => {
      if (worker !== null) fallBack();
    });
    worker = w;
    return w;
  };

  const runThere = (task: SinkLaneTask): Promise<Outcome> =>
    new Promise<Outcome>((resolve, reject) => {
      const p: Pending = { task, resolve, reject };
      const w = theWorker();
      if (w === null) {
        settleHere(p);
        return;
      }
      const id = nextId++;
      pending.set(id, p);
      try {
        w.postMessage({ id, task } satisfies SinkLaneRequest);
      } catch {
        // A task the structured clone cannot copy runs here.
        pending.delete(id);
        settleHere(p);
      }
    });

  return {
    async run<K extends SinkLaneTask['kind']>(lane: SinkLane, task: SinkLaneTaskOf<K>): Promise<SinkLaneResults[K]> {
      const outcome = lane === 'here' ? runHere(task) : await runThere(task);
      return outcome.result as SinkLaneResults[K];
    },
    holder(spec) {
      return kept.find((k) => sameSinkGrid(k.spec, spec))?.lane ?? 'here';
    },
    apartAndFree() {
      return (worker !== null || allowed) && pending.size === 0;
    },
    async close() {
      const w = worker;
      worker = null;
      allowed = false;
      pending.clear();
      if (w !== null) await w.terminate();
    },
  };
}

/**
 * Whether a second thread can be expected to run beside this one: two cores or more and a 1-minute load average
 * below their number. On a busy machine (this one's scheduler shares the cores between sessions, not threads) a
 * second thread gains no time and costs its own start and compilation (0.8 s more CPU on the bench sink at load 8-10).
 */
function coreFree(): boolean {
  const cores = availableParallelism();
  return cores >= 2 && (loadavg()[0] ?? 0) < cores;
}

function startWorker(c: HeatSinkCase, entry: URL): Worker | null {
  if (entry.protocol !== 'file:' || !existsSync(fileURLToPath(entry))) return null;
  return new Worker(entry, { workerData: c });
}
