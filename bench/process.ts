/**
 * Whole-process benchmarks: wall time of `node dist/fincheck.js check <demo case>` as a user sees it
 * (Node start-up, module loading, case parsing, the fd-1d refinement study, the shortcuts, printing),
 * each run a fresh child process (spawnSync), timed by tinybench around the spawn.
 *
 * `--reference 2d` is measured when the CLI accepts it; while it exits with an error the row says
 * "not wired yet" and quotes the CLI's message.
 */
import { spawnSync } from 'node:child_process';
import { atMost, cpuText, formatMs, median, skipped, timeTask, type BenchRow } from './measure.js';

const AREA = 'process';
const CLI = 'dist/fincheck.js';
const DEMO_CASE = 'demo/inverter-plate-fin.yaml';
const RUNS = 10;

/**
 * Loaded before the CLI with --import: at exit the child writes its own CPU time (user + system, us) to
 * stderr, so that the table can show it beside the wall time (a module from a data: URL, well under 1 ms).
 */
const CPU_REPORTER = 'data:text/javascript,process.on("exit",()=>{const u=process.cpuUsage();process.stderr.write("\\nbench-cpu-us "+(u.user+u.system)+"\\n")})';

interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
  /** The child's CPU time, ms (null when it did not report). */
  cpuMs: number | null;
}

function runCli(args: readonly string[]): CliRun {
  const r = spawnSync(process.execPath, ['--import', CPU_REPORTER, CLI, ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
  if (r.error) throw r.error;
  const match = /\nbench-cpu-us (\d+)\n/.exec(r.stderr);
  return {
    status: r.status,
    stdout: r.stdout,
    stderr: r.stderr.replace(/\nbench-cpu-us \d+\n/, ''),
    cpuMs: match ? Number(match[1]) / 1000 : null,
  };
}

/** "reference fd-1d" from the check report's "Reference (fd-1d): ..." line, when there is one. */
function referenceModel(stdout: string): string {
  const match = /Reference \((fd-[^)]+)\)/.exec(stdout);
  return match ? `; reference model used: ${match[1]}` : '';
}

async function timeCli(label: string, args: readonly string[], target: string, limitMs: number, probe: CliRun): Promise<BenchRow> {
  const cpu: number[] = [];
  const t = await timeTask(
    label,
    () => {
      const r = runCli(args);
      if (r.status !== 0) throw new Error(`fincheck ${args.join(' ')} exited with ${r.status}: ${r.stderr.trim()}`);
      if (r.cpuMs !== null) cpu.push(r.cpuMs);
    },
    // One untimed run first: the file cache and the resvg/cephes binaries on disk, as for a user's second run.
    { time: 0, iterations: RUNS, warmupIterations: 1 },
  );
  // The warm-up run's CPU time is the first entry: leave it out.
  const childCpu = cpu.length > 1 ? median(cpu.slice(1)) : null;
  return {
    area: AREA,
    item: label,
    target,
    measured: formatMs(t.medianMs),
    cpu: cpuText(childCpu),
    verdict: atMost(t.medianMs, limitMs),
    note: `${t.samples} child processes (spawnSync), min ${formatMs(t.minMs)}, max ${formatMs(t.maxMs)}; CPU = the child's own (user + system)${referenceModel(probe.stdout)}`,
  };
}

export async function benchProcess(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const check = ['check', DEMO_CASE];
  const first = runCli(check);
  if (first.status !== 0) {
    rows.push(skipped(AREA, `fincheck check ${DEMO_CASE}`, '<= 0.5 s', `exit ${first.status}: ${first.stderr.trim()}`));
  } else {
    rows.push(await timeCli(`fincheck check ${DEMO_CASE} (whole process)`, check, '<= 0.5 s', 500, first));
  }

  const check2d = ['check', DEMO_CASE, '--reference', '2d'];
  const probe = runCli(check2d);
  const item2d = `fincheck check ${DEMO_CASE} --reference 2d (incl. refinement study)`;
  if (probe.status !== 0) {
    const message = probe.stderr.trim().split('\n')[0] ?? '';
    rows.push(skipped(AREA, item2d, '<= 1.5 s', `not wired yet: exit ${probe.status}, "${message}"`));
  } else {
    rows.push(await timeCli(item2d, check2d, '<= 1.5 s', 1500, probe));
  }
  return rows;
}
