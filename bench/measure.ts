/**
 * Shared pieces of the benchmark suite: the result row every area returns, and one way to time a task
 * with tinybench and read its median.
 *
 * Medians, not means: the machine is shared (two cores, other builds and test runs), and a busy
 * neighbour shows up as a long tail that moves the mean but hardly the median.
 */
import { Bench } from 'tinybench';

/**
 * pass/FAIL against a stated target; info: measured without a target; skip: not measured (note says why);
 * error: the code under test threw (note quotes the error).
 */
export type Verdict = 'pass' | 'FAIL' | 'info' | 'skip' | 'error';

export interface BenchRow {
  readonly area: string;
  readonly item: string;
  /** The target as text, e.g. "<= 10 ms"; "-" when there is none. */
  readonly target: string;
  /** The measured value as text (median wall time, with units), or "-" when skipped. */
  readonly measured: string;
  /** Median CPU time of the measuring process per run (see Timing.cpuMedianMs), or "-". */
  readonly cpu: string;
  readonly verdict: Verdict;
  /** Samples, ratios, what was timed, why skipped. */
  readonly note: string;
}

export interface TimingOptions {
  /** Time budget per task, ms (tinybench keeps going until both this and `iterations` are met). */
  readonly time: number;
  /** Minimum number of timed runs. */
  readonly iterations: number;
  /** Untimed runs first (JIT warm-up); default 2; 0 = none. */
  readonly warmupIterations?: number;
}

export interface Timing {
  /** Median latency, ms. */
  readonly medianMs: number;
  readonly minMs: number;
  readonly maxMs: number;
  readonly samples: number;
  /**
   * Median CPU time of this process per run, ms (user + system, process.cpuUsage, 1 us resolution).
   * On a loaded machine the wall time includes the time the process waited for a core; the CPU time
   * does not (it still includes V8's helper threads, e.g. concurrent GC). Null for runs under 0.5 ms,
   * where the 1 us clock of cpuUsage is too coarse.
   */
  readonly cpuMedianMs: number | null;
}

/** Times `fn` with tinybench and returns the median (p50) latency in ms. Throws if the task fails. */
export async function timeTask(name: string, fn: () => unknown, opts: TimingOptions): Promise<Timing> {
  const bench = new Bench({
    time: opts.time,
    iterations: opts.iterations,
    warmup: (opts.warmupIterations ?? 2) > 0,
    warmupIterations: opts.warmupIterations ?? 2,
    warmupTime: 0,
    throws: true,
  });
  const cpuSamples: number[] = [];
  let cpuStart = process.cpuUsage();
  bench.add(name, fn, {
    beforeEach: () => {
      cpuStart = process.cpuUsage();
    },
    afterEach: (mode) => {
      const used = process.cpuUsage(cpuStart);
      if (mode === 'run') cpuSamples.push((used.user + used.system) / 1000);
    },
  });
  await bench.run();
  const task = bench.getTask(name);
  const result = task?.result;
  if (result === undefined) throw new Error(`bench: task ${name} has no result`);
  switch (result.state) {
    case 'completed':
    case 'aborted-with-statistics':
      return {
        medianMs: result.latency.p50,
        minMs: result.latency.min,
        maxMs: result.latency.max,
        samples: result.latency.samplesCount,
        cpuMedianMs: result.latency.p50 >= 0.5 && cpuSamples.length > 0 ? median(cpuSamples) : null,
      };
    case 'errored':
      throw result.error;
    case 'aborted':
    case 'not-started':
    case 'started':
      throw new Error(`bench: task ${name} ended in state ${result.state}`);
    default: {
      const unreachable: never = result;
      throw new Error(`bench: unknown task state ${String(unreachable)}`);
    }
  }
}

export function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : 0.5 * ((sorted[mid - 1] as number) + (sorted[mid] as number));
}

/** A duration in ms with three significant figures and the unit that reads best. */
export function formatMs(ms: number): string {
  if (ms < 0.01) return `${(ms * 1000).toPrecision(3)} us`;
  if (ms < 1000) return `${ms.toPrecision(3)} ms`;
  return `${(ms / 1000).toPrecision(3)} s`;
}

/** pass when value <= limit, else FAIL. */
export function atMost(value: number, limit: number): Verdict {
  return value <= limit ? 'pass' : 'FAIL';
}

/** "n runs, min, max" for the note column. */
export function spread(t: Timing): string {
  return `${t.samples} runs, min ${formatMs(t.minMs)}, max ${formatMs(t.maxMs)}`;
}

/** The CPU column: the median CPU time, or "-" when it was not measured. */
export function cpuText(ms: number | null): string {
  return ms === null ? '-' : formatMs(ms);
}

/** A row for code under test that threw: the first line of the error in the note. */
export function errored(area: string, item: string, target: string, error: unknown): BenchRow {
  const message = error instanceof Error ? error.message : String(error);
  return { area, item, target, measured: '-', cpu: '-', verdict: 'error', note: `error: ${message.split('\n')[0] ?? ''}` };
}

/** A row for something that could not be measured. */
export function skipped(area: string, item: string, target: string, why: string): BenchRow {
  return { area, item, target, measured: '-', cpu: '-', verdict: 'skip', note: why };
}
