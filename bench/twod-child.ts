/**
 * One large 2-D solve in a process of its own, so that its peak memory can be read from the kernel
 * (process.resourceUsage().maxRSS: the largest resident set the process ever had) without the rest of
 * the suite in it. Started by twod.ts as
 *   node --import tsx bench/twod-child.ts <thin|block> <nx> <ny> <auto|banded|baseline|iterative> <runs> [warm-up runs, 1]
 * and prints one JSON line (ChildReport). The system is built before timing; each timed run is the
 * whole solve (factor or iterate, then solve), as the library calls it.
 */
import { prepareSolver2D } from '../src/fd/linear-algebra/auto-solver.js';
import { bandedCholeskySolver } from '../src/fd/linear-algebra/banded-solve.js';
import { generalBandLuSolve, stencilToCsr } from './generalBandLu.js';
import { timeTask } from './measure.js';
import { benchProblem2D, benchSystem2D, findIterativeSolver, relativeResidual, type BenchCase2D } from './twodSystems.js';

export interface ChildReport {
  readonly solver: string;
  readonly medianMs: number;
  readonly minMs: number;
  readonly maxMs: number;
  readonly samples: number;
  readonly cpuMedianMs: number | null;
  /** Peak resident set of the whole child process, MB (Node + tsx + system + solver). */
  readonly peakRssMB: number;
  /** Resident set once the system was built, before the first solve, MB. */
  readonly setupRssMB: number;
  /** V8 heap used + array buffers (typed arrays) after the last solve, MB. */
  readonly heapAndBuffersMB: number;
  readonly relativeResidual: number;
  /** Baseline only: lower/upper bandwidth in the natural order. */
  readonly bandwidths?: readonly [number, number];
}

const MB = 1024 * 1024;

async function main(): Promise<void> {
  const [kindArg, nxArg, nyArg, solverArg, runsArg, warmupArg] = process.argv.slice(2);
  if (kindArg !== 'thin' && kindArg !== 'block') throw new Error(`twod-child: case must be thin or block, got ${kindArg}`);
  const kind: BenchCase2D = kindArg;
  const nx = Number(nxArg);
  const ny = Number(nyArg);
  const runs = Number(runsArg ?? 3);
  const warmupIterations = Number(warmupArg ?? 1);
  const system = benchSystem2D(benchProblem2D(kind), nx, ny);
  const setupRssMB = process.memoryUsage().rss / MB;

  let name: string;
  let solve: () => Float64Array;
  let bandwidths: readonly [number, number] | undefined;
  switch (solverArg) {
    case 'auto':
      name = 'autoSolver2D';
      solve = () => {
        const prepared = prepareSolver2D(system);
        const x = prepared.solve(system);
        prepared.release();
        name = `autoSolver2D (ran ${prepared.method})`;
        return x;
      };
      break;
    case 'banded':
      name = 'bandedCholeskySolver';
      solve = () => bandedCholeskySolver(system);
      break;
    case 'baseline': {
      name = 'general band LU (natural order)';
      const csr = stencilToCsr(system.matrix);
      solve = () => {
        const { x, lu } = generalBandLuSolve(csr, system.rhs, 'natural');
        bandwidths = [lu.lowerBandwidth, lu.upperBandwidth];
        return x;
      };
      break;
    }
    case 'iterative': {
      const found = await findIterativeSolver();
      if (found === null) throw new Error('twod-child: no multigrid/PCG solver export in src/fd/sparse');
      name = found.name;
      solve = () => found.solve(system);
      break;
    }
    default:
      throw new Error(`twod-child: solver must be auto, banded, baseline or iterative, got ${solverArg}`);
  }

  let x: Float64Array = new Float64Array(0);
  const t = await timeTask(
    name,
    () => {
      x = solve();
    },
    { time: 0, iterations: runs, warmupIterations },
  );
  const memory = process.memoryUsage();
  const report: ChildReport = {
    solver: name,
    medianMs: t.medianMs,
    minMs: t.minMs,
    maxMs: t.maxMs,
    samples: t.samples,
    cpuMedianMs: t.cpuMedianMs,
    peakRssMB: (process.resourceUsage().maxRSS * 1024) / MB,
    setupRssMB,
    heapAndBuffersMB: (memory.heapUsed + memory.arrayBuffers) / MB,
    relativeResidual: relativeResidual(system, x),
    ...(bandwidths ? { bandwidths } : {}),
  };
  process.stdout.write(`${JSON.stringify(report)}\n`);
}

await main();
