/**
 * One fd-3d run in a process of its own, so that its peak memory is its own (process.resourceUsage().maxRSS).
 * Started by sink.ts as `node --import tsx bench/sink-child.ts <solve|study> <runs>`:
 *   solve  one grid of the 20-fin sink (bench/sink-cases.ts) refined to ~1e6 unknowns: assembly timed apart,
 *          then the solve (multigrid setup + preconditioned CG), as solveSinkSystem runs it;
 *   study  studySink on the 20-fin sink with its default three grids (assembly, solves, GCI, plate view).
 * Prints one JSON line (SinkChildReport).
 */
import { studySink } from '../src/fd/index.js';
import { assembleSink } from '../src/fd/three-d/sink-system.js';
import { solveSinkSystem } from '../src/fd/three-d/sink-solve.js';
import { sinkProblem } from '../src/fd/three-d/sink-problem.js';
import { sinkMemoryEstimate } from '../src/fd/three-d/sink-memory.js';
import { buildSinkGrid } from '../src/mesh/index.js';
import { median } from './measure.js';
import { twentyFinSink } from './sink-cases.js';

export interface SinkChildReport {
  readonly medianMs: number;
  readonly minMs: number;
  readonly maxMs: number;
  readonly samples: number;
  readonly cpuMedianMs: number;
  readonly assembleMs: number | null;
  readonly peakRssMB: number;
  readonly estimateMB: number;
  readonly unknowns: number;
  readonly iterations: number;
  readonly relativeResidual: number;
  readonly energyBalance: number;
}

const MB = 1024 * 1024;

function main(): void {
  const [mode, runsArg] = process.argv.slice(2);
  const runs = Number(runsArg ?? 1);
  const c = twentyFinSink();
  const wall: number[] = [];
  const cpu: number[] = [];
  let assembleMs: number | null = null;
  let unknowns = 0;
  let iterations = 0;
  let relativeResidual = 0;
  let energyBalance = 0;
  for (let k = 0; k < runs; k++) {
    if (mode === 'solve') {
      const problem = sinkProblem(c);
      const grid = buildSinkGrid(problem.layout, { cellSize: 0.004, plateLayers: 2, finLayers: 4, refine: 8 });
      const a0 = performance.now();
      const system = assembleSink(problem, grid, 'sheet');
      assembleMs = performance.now() - a0;
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      const r = solveSinkSystem(problem, system);
      wall.push(performance.now() - t0);
      const used = process.cpuUsage(c0);
      cpu.push((used.user + used.system) / 1000);
      unknowns = r.unknowns;
      iterations = r.iterations;
      relativeResidual = r.relativeResidual;
      energyBalance = r.energyBalance;
    } else if (mode === 'study') {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      const s = studySink(c);
      wall.push(performance.now() - t0);
      const used = process.cpuUsage(c0);
      cpu.push((used.user + used.system) / 1000);
      unknowns = s.unknowns[0] ?? 0;
      iterations = s.solver.iterations;
      relativeResidual = s.solver.relativeResidual;
      energyBalance = s.energyBalance;
    } else throw new Error(`sink-child: mode must be solve or study, got ${mode}`);
  }
  const report: SinkChildReport = {
    medianMs: median(wall),
    minMs: Math.min(...wall),
    maxMs: Math.max(...wall),
    samples: wall.length,
    cpuMedianMs: median(cpu),
    assembleMs,
    peakRssMB: process.resourceUsage().maxRSS / 1024,
    estimateMB: sinkMemoryEstimate(unknowns) / MB,
    unknowns,
    iterations,
    relativeResidual,
    energyBalance,
  };
  console.log(JSON.stringify(report));
}

main();
