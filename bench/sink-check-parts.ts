/**
 * Standalone timings (`npx tsx bench/sink-check-parts.ts`): where `fincheck check` of the 20-fin sink
 * (bench/cases/twenty-fin-sink.yaml) spends its CPU, grid by grid: assembly, multigrid setup, CG, per study.
 */
import { readFileSync } from 'node:fs';
import { parseHeatSinkText } from '../src/case/index.js';
import { initBessel } from '../src/analytic/index.js';
import { assembleSink } from '../src/fd/three-d/sink-system.js';
import { sinkProblem } from '../src/fd/three-d/sink-problem.js';
import { buildSinkGrid } from '../src/mesh/index.js';
import { sinkMultigrid } from '../src/fd/linear-algebra/sink-multigrid.js';
import { sparsePcg } from '../src/fd/linear-algebra/sparse-pcg.js';
import { nestedProlongate, type SinkLevelGrid } from '../src/fd/linear-algebra/aggregation.js';
import type { FinRepresentation } from '../src/fd/three-d/sink-system.js';

const cpu = (): number => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

async function main(): Promise<void> {
  await initBessel();
  const c = parseHeatSinkText(readFileSync('bench/cases/twenty-fin-sink.yaml', 'utf8'), 'twenty-fin-sink.yaml');
  const problem = sinkProblem(c);
  const side = Math.min(c.plate.width, c.plate.length);
  const studies: [string, number, number, number, FinRepresentation][] = [
    ['default', side / 16, 2, 4, 'sheet'],
    ['2x layers', side / 16, 4, 8, 'sheet'],
    ['cells', side / 16, 2, 4, 'cells'],
  ];
  for (const [name, cellSize, plateLayers, finLayers, rep] of studies) {
    let previous: { level: SinkLevelGrid; theta: Float64Array } | null = null;
    let total = 0;
    for (const refine of [1, 2, 4]) {
      const t0 = cpu();
      const grid = buildSinkGrid(problem.layout, { cellSize, plateLayers, finLayers, refine });
      const system = assembleSink(problem, grid, rep);
      const t1 = cpu();
      const pre = sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold);
      const t2 = cpu();
      const x0 =
        (previous === null || system.fold !== null ? null : nestedProlongate(previous.level, system.levelGrid, previous.theta)) ??
        new Float64Array(system.matrix.n);
      const t3 = cpu();
      const { x, report } = sparsePcg(system.matrix, system.rhs, pre, 1e-10, 400, x0);
      const t4 = cpu();
      previous = { level: system.levelGrid, theta: x };
      total += t4 - t0;
      console.log(
        `${name.padEnd(10)} r${refine} n=${String(system.matrix.n).padStart(7)} assemble ${(t1 - t0).toFixed(0).padStart(5)} mg ${(t2 - t1).toFixed(0).padStart(5)} prolong ${(t3 - t2).toFixed(0).padStart(4)} cg ${(t4 - t3).toFixed(0).padStart(5)} ms (${report.iterations} it) fold=${system.fold !== null}`,
      );
    }
    console.log(`${name} total ${total.toFixed(0)} ms`);
  }
}

await main();
