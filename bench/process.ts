/**
 * Whole-process benchmarks: wall time of `node dist/fincheck.js check <demo case>` as a user sees it
 * (Node start-up, module loading, case parsing, the fd-1d refinement study, the shortcuts, printing),
 * each run a fresh child process (spawnSync), timed by tinybench around the spawn.
 *
 * `--reference 2d` is measured when the CLI accepts it; while it exits with an error the row says
 * "not wired yet" and quotes the CLI's message.
 */
import { spawnSync } from 'node:child_process';
import { atMost, formatMs, skipped, timeTask, type BenchRow } from './measure.js';

const AREA = 'process';
const CLI = 'dist/fincheck.js';
const DEMO_CASE = 'demo/inverter-plate-fin.yaml';
const RUNS = 10;

interface CliRun {
  status: number | null;
  stderr: string;
}

function runCli(args: readonly string[]): CliRun {
  const r = spawnSync(process.execPath, [CLI, ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  if (r.error) throw r.error;
  return { status: r.status, stderr: r.stderr };
}

async function timeCli(label: string, args: readonly string[], target: string, limitMs: number): Promise<BenchRow> {
  const t = await timeTask(
    label,
    () => {
      const r = runCli(args);
      if (r.status !== 0) throw new Error(`fincheck ${args.join(' ')} exited with ${r.status}: ${r.stderr.trim()}`);
    },
    // One untimed run first: the file cache and the resvg/cephes binaries on disk, as for a user's second run.
    { time: 0, iterations: RUNS, warmupIterations: 1 },
  );
  return {
    area: AREA,
    item: label,
    target,
    measured: formatMs(t.medianMs),
    verdict: atMost(t.medianMs, limitMs),
    // CPU time here is the parent's (spawn bookkeeping), not the child's: leave it out.
    note: `${t.samples} child processes (spawnSync), min ${formatMs(t.minMs)}, max ${formatMs(t.maxMs)}`,
  };
}

export async function benchProcess(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const check = ['check', DEMO_CASE];
  const first = runCli(check);
  if (first.status !== 0) {
    rows.push(skipped(AREA, `fincheck check ${DEMO_CASE}`, '<= 0.5 s', `exit ${first.status}: ${first.stderr.trim()}`));
  } else {
    rows.push(await timeCli(`fincheck check ${DEMO_CASE} (whole process)`, check, '<= 0.5 s', 500));
  }

  const check2d = ['check', DEMO_CASE, '--reference', '2d'];
  const probe = runCli(check2d);
  const item2d = `fincheck check ${DEMO_CASE} --reference 2d (incl. refinement study)`;
  if (probe.status !== 0) {
    const message = probe.stderr.trim().split('\n')[0] ?? '';
    rows.push(skipped(AREA, item2d, '<= 1.5 s', `not wired yet: exit ${probe.status}, "${message}"`));
  } else {
    rows.push(await timeCli(item2d, check2d, '<= 1.5 s', 1500));
  }
  return rows;
}
