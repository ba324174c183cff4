/**
 * 2-D benchmarks: grid solves of the fd-2d system (9-point, symmetric positive definite) with the library's
 * automatic solver, against a general banded LU written in bench/generalBandLu.ts and timed in the same run.
 *
 *  - 2000 x 20 thin-fin grid (demo case): target <= 7 ms (issue 14; was 15 ms), in this process; with the factor and one
 *    substitution pair timed apart, and the whole fd-2d solve and refinement study for context;
 *  - 10000 x 50: target <= 0.6 s, in a child process (bench/twod-child.ts) so that its peak memory is its own;
 *  - 1000 x 1000 (a block as thick as long): target <= 1 s and <= 1 GB; needs an iterative solver (the
 *    multigrid-preconditioned CG): autoSolver2D when its exported chooser picks one, else an MG/PCG solver
 *    found in src/fd/sparse/, else skipped with a note.
 * "Solve" = what the library calls: autoSolver2D(system) (factor, substitutions, iterative refinement).
 * Ratios are baseline median / library median, both medians of wall time in this run.
 */
import { spawnSync } from 'node:child_process';
import { solveFin2DProblem } from '../src/fd/two-d/linear-solve.js';
import { studyFin2DProblem } from '../src/fd/two-d/linear-study.js';
import { autoSolver2D, prepareSolver2D } from '../src/fd/linear-algebra/auto-solver.js';
import { bandedCholeskySolver } from '../src/fd/linear-algebra/banded-solve.js';
import { bandedCholeskyBytes, factorBandedCholesky } from '../src/fd/linear-algebra/banded-cholesky.js';
import type { ChildReport } from './twod-child.js';
import { bandLuBytes, generalBandLuSolve, relativeDifference, stencilToCsr } from './generalBandLu.js';
import { atMost, cpuText, errored, formatMs, skipped, spread, timeTask, type BenchRow } from './measure.js';
import { autoSolverChoice, benchProblem2D, benchSystem2D, findIterativeSolver, relativeResidual, type BenchCase2D } from './twodSystems.js';

const AREA = '2-D';
const BASELINE = 'general band LU (no symmetry, natural order; bench/generalBandLu.ts)';

function gigabytes(bytes: number): string {
  return `${(bytes / 2 ** 30).toFixed(1)} GB`;
}

function runChild(
  kind: BenchCase2D,
  nx: number,
  ny: number,
  solver: 'auto' | 'banded' | 'baseline' | 'iterative',
  runs: number,
  warmup: number,
): ChildReport {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'bench/twod-child.ts', kind, String(nx), String(ny), solver, String(runs), String(warmup)], {
    encoding: 'utf8',
    timeout: 240_000,
    maxBuffer: 1 << 20,
  });
  if (r.error) throw r.error;
  if (r.status !== 0 || r.signal !== null) {
    const reason = r.stderr.split('\n').find((l) => /Error\b.*:/.test(l)) ?? (r.signal !== null ? `killed by ${r.signal}` : 'no error message');
    throw new Error(`child ${kind} ${nx}x${ny} ${solver} exited with ${r.status ?? r.signal}: ${reason.trim()}`);
  }
  const line = r.stdout.trim().split('\n').pop() ?? '';
  return JSON.parse(line) as ChildReport;
}

/** Baseline over library: median wall-time ratio, and the CPU-time ratio when both have one. */
function ratioText(baseline: { medianMs: number; cpuMedianMs: number | null }, library: { medianMs: number; cpuMedianMs: number | null }): string {
  const cpu =
    baseline.cpuMedianMs !== null && library.cpuMedianMs !== null ? `, ${(baseline.cpuMedianMs / library.cpuMedianMs).toFixed(2)}x by CPU time` : '';
  return `baseline/library ${(baseline.medianMs / library.medianMs).toFixed(2)}x by wall time${cpu}`;
}

function childNote(c: ChildReport): string {
  return (
    `${c.samples} runs, min ${formatMs(c.minMs)}, max ${formatMs(c.maxMs)}; child process peak RSS ${c.peakRssMB.toFixed(0)} MB ` +
    `(${c.setupRssMB.toFixed(0)} MB before the first solve: Node, tsx, case, grid, system); residual ${c.relativeResidual.toExponential(1)}`
  );
}

export async function benchTwoD(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  rows.push(...(await guarded('2000x20 thin-fin grid solve', '<= 7 ms', thinGrid)));
  rows.push(...(await largeThinGrid()));
  rows.push(...(await guarded('1000x1000 grid solve', '<= 1 s', squareGrid)));
  return rows;
}

/** Runs a group of measurements; if the code under test throws, one error row says so. */
async function guarded(item: string, target: string, group: () => Promise<BenchRow[]>): Promise<BenchRow[]> {
  try {
    return await group();
  } catch (error) {
    return [errored(AREA, item, target, error)];
  }
}

/** "autoSolver2D (banded-cholesky)" when the chooser is exported, else "autoSolver2D". */
async function autoLabel(nx: number, ny: number): Promise<string> {
  const choice = await autoSolverChoice(nx, ny);
  return choice === null ? 'autoSolver2D' : `autoSolver2D (chose ${choice})`;
}

/** The method the automatic choice ran on this system (fast diagonalisation hands over to the band when it must). */
function ranMethod(system: Parameters<typeof prepareSolver2D>[0]): string {
  const prepared = prepareSolver2D(system);
  prepared.solve(system);
  prepared.release();
  return prepared.method;
}

/** 2000 x 20, in this process. */
async function thinGrid(): Promise<BenchRow[]> {
  const nx = 2000;
  const ny = 20;
  const problem = benchProblem2D('thin');
  const system = benchSystem2D(problem, nx, ny);
  const opts = { time: 800, iterations: 15 };
  const auto = await timeTask('2d auto 2000x20', () => autoSolver2D(system), opts);
  const banded = await timeTask('2d banded 2000x20', () => bandedCholeskySolver(system), opts);
  const factor = await timeTask('2d factor 2000x20', () => factorBandedCholesky(system.matrix), opts);
  const factored = factorBandedCholesky(system.matrix);
  const out = new Float64Array(system.rhs.length);
  const substitution = await timeTask('2d substitutions 2000x20', () => factored.solve(system.rhs, out), opts);
  const csr = stencilToCsr(system.matrix);
  const baseline = await timeTask('2d baseline 2000x20', () => generalBandLuSolve(csr, system.rhs, 'natural'), opts);
  const rcm = await timeTask('2d baseline rcm 2000x20', () => generalBandLuSolve(csr, system.rhs, 'rcm'), { time: 800, iterations: 10 });
  const x = autoSolver2D(system);
  const { x: y, lu } = generalBandLuSolve(csr, system.rhs, 'natural');
  const { lu: luRcm } = generalBandLuSolve(csr, system.rhs, 'rcm');
  const ratio = ratioText(baseline, auto);
  const whole = await timeTask('fd-2d 2000x20 end to end', () => solveFin2DProblem(problem, { nx, ny }), { time: 800, iterations: 10 });
  const study = await timeTask('fd-2d study demo', () => studyFin2DProblem(problem), { time: 800, iterations: 5, warmupIterations: 1 });
  const grids = studyFin2DProblem(problem)
    .grids.map((g) => `${g.nx}x${g.ny}`)
    .join(', ');
  return [
    {
      area: AREA,
      item: `${nx}x${ny} thin-fin grid solve, autoSolver2D (ran ${ranMethod(system)}), demo case`,
      target: '<= 7 ms',
      measured: formatMs(auto.medianMs),
      cpu: cpuText(auto.cpuMedianMs),
      verdict: atMost(auto.medianMs, 7),
      note: `${spread(auto)}; residual ${relativeResidual(system, x).toExponential(1)}; ${ratio}`,
    },
    {
      area: AREA,
      item: `${nx}x${ny} thin-fin grid solve, bandedCholeskySolver (the direct solve of grids that are not Kronecker sums)`,
      target: '-',
      measured: formatMs(banded.medianMs),
      cpu: cpuText(banded.cpuMedianMs),
      verdict: 'info',
      note:
        `${spread(banded)}; factor alone ${formatMs(factor.medianMs)} (CPU ${cpuText(factor.cpuMedianMs)}), ` +
        `one forward+back substitution ${formatMs(substitution.medianMs)}; the rest is the band's setup, residuals and refinement`,
    },
    {
      area: AREA,
      item: `${nx}x${ny} baseline: ${BASELINE}`,
      target: '-',
      measured: formatMs(baseline.medianMs),
      cpu: cpuText(baseline.cpuMedianMs),
      verdict: 'info',
      note:
        `${spread(baseline)}; ${ratio}; bandwidths ${lu.lowerBandwidth}/${lu.upperBandwidth}; ` +
        `same system: max difference from the library's solution ${relativeDifference(y, x).toExponential(1)} (relative); ` +
        `with reverse Cuthill-McKee order (bandwidths ${luRcm.lowerBandwidth}/${luRcm.upperBandwidth}) ${formatMs(rcm.medianMs)}; ` +
        `x-fastest natural order: bandwidth ${nx + 1}, ${gigabytes(bandLuBytes(nx * ny, nx, nx))} of band, not run`,
    },
    {
      area: AREA,
      item: `${nx}x${ny} fd-2d end to end (grid, assembly, solve, heat rates)`,
      target: '-',
      measured: formatMs(whole.medianMs),
      cpu: cpuText(whole.cpuMedianMs),
      verdict: 'info',
      note: spread(whole),
    },
    {
      area: AREA,
      item: `fd-2d refinement study of the demo case in-process (grids ${grids})`,
      target: '-',
      measured: formatMs(study.medianMs),
      cpu: cpuText(study.cpuMedianMs),
      verdict: 'info',
      note: `${spread(study)}; repeated runs meet the cached grids and conduction operators, as a check's own repeated solves do; the numerical part of check --reference 2d (the <= 1.5 s target adds Node start-up and the 1-D work)`,
    },
  ];
}

/** 10000 x 50, each solver in a child process of its own. */
async function largeThinGrid(): Promise<BenchRow[]> {
  const nx = 10000;
  const ny = 50;
  const target = '<= 0.6 s';
  const choice = await autoSolverChoice(nx, ny);
  const candidates: { solver: 'auto' | 'banded'; item: string }[] = [
    { solver: 'auto', item: `${nx}x${ny} thin-fin grid solve, ${await autoLabel(nx, ny)}` },
  ];
  // While the automatic choice is not the band, the banded Cholesky is measured too (the thin-grid solver).
  if (choice !== null && choice !== 'banded-cholesky')
    candidates.push({
      solver: 'banded',
      item: `${nx}x${ny} thin-fin grid solve, bandedCholeskySolver (for comparison: grids that are not Kronecker sums)`,
    });
  const measured: { item: string; report: ChildReport }[] = [];
  const rows: BenchRow[] = [];
  for (const { solver, item } of candidates) {
    try {
      measured.push({ item, report: runChild('thin', nx, ny, solver, 2, 1) });
    } catch (error) {
      rows.push(errored(AREA, item, target, error));
    }
  }
  let baseline: ChildReport | null = null;
  try {
    // ~1.3e9 multiply-adds: one run without warm-up (a run this long is JIT-compiled within its first rows).
    baseline = runChild('thin', nx, ny, 'baseline', 1, 0);
  } catch (error) {
    rows.push(errored(AREA, `${nx}x${ny} baseline: ${BASELINE}`, '-', error));
  }
  for (const { item, report } of measured) {
    const ratio = baseline === null ? '' : `; ${ratioText(baseline, report)}`;
    // The target is the automatic choice's (what a check runs); the band, when it is not the choice, is shown beside it.
    const judged = item === candidates[0]?.item;
    rows.push({
      area: AREA,
      item: item.replace(/autoSolver2D \(chose [^)]*\)/, report.solver),
      target: judged ? target : '-',
      measured: formatMs(report.medianMs),
      cpu: cpuText(report.cpuMedianMs),
      verdict: judged ? atMost(report.medianMs, 600) : 'info',
      note: `${childNote(report)}; a banded Cholesky factor takes ${(bandedCholeskyBytes(nx, ny) / 2 ** 20).toFixed(0)} MB${ratio}`,
    });
  }
  if (baseline !== null) {
    const bands = baseline.bandwidths ? `; bandwidths ${baseline.bandwidths[0]}/${baseline.bandwidths[1]}` : '';
    rows.push({
      area: AREA,
      item: `${nx}x${ny} baseline: ${BASELINE}`,
      target: '-',
      measured: formatMs(baseline.medianMs),
      cpu: cpuText(baseline.cpuMedianMs),
      verdict: 'info',
      note: `${childNote(baseline)}${bands}`,
    });
  }
  return rows;
}

/**
 * 1000 x 1000: with autoSolver2D when it picks a method other than the band (its chooser is exported),
 * else with the multigrid/PCG solver found in src/fd/sparse/, else skipped; the band solvers cannot fit.
 */
async function squareGrid(): Promise<BenchRow[]> {
  const n = 1000;
  const item = `${n}x${n} grid solve (block case)`;
  const memoryItem = `${n}x${n} grid solve, peak memory (process RSS)`;
  const cholesky = gigabytes(bandedCholeskyBytes(n, n));
  const lu = gigabytes(bandLuBytes(n * n, n + 1, n + 1));
  const bandNote = `banded Cholesky would need ${cholesky} for its factor, the baseline band LU ${lu}: neither is run`;
  const choice = await autoSolverChoice(n, n);
  const found = await findIterativeSolver();
  let solver: 'auto' | 'iterative';
  let label: string;
  if (choice !== null && choice !== 'banded-cholesky') {
    solver = 'auto';
    label = `autoSolver2D (chose ${choice})`;
  } else if (found !== null) {
    solver = 'iterative';
    label = found.name;
  } else {
    const why = `no multigrid/PCG solver exported from src/fd/sparse/ yet; ${bandNote}`;
    return [skipped(AREA, item, '<= 1 s', why), skipped(AREA, memoryItem, '<= 1 GB', why)];
  }
  // Seconds a run: three runs without warm-up (the median leaves out the one that paid for the JIT).
  const r = runChild('block', n, n, solver, 3, 0);
  return [
    {
      area: AREA,
      item: `${item}, ${label}`,
      target: '<= 1 s',
      measured: formatMs(r.medianMs),
      cpu: cpuText(r.cpuMedianMs),
      verdict: atMost(r.medianMs, 1000),
      note: `${childNote(r)}; ${bandNote}`,
    },
    {
      area: AREA,
      item: memoryItem,
      target: '<= 1 GB',
      measured: `${r.peakRssMB.toFixed(0)} MB`,
      cpu: '-',
      verdict: atMost(r.peakRssMB, 1024),
      note: `peak RSS of the child process (maxRSS), of which ${r.setupRssMB.toFixed(0)} MB before the first solve; V8 heap + typed arrays after the solves ${r.heapAndBuffersMB.toFixed(0)} MB`,
    },
  ];
}
