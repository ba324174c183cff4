/**
 * Timing of the tridiagonal solvers and of the fd-1d study (not a test: run with
 * `npx tsx bench/tridiagonal-solvers.ts`). Prints medians of repeated runs: wall time and CPU
 * time of this process (the CPU time excludes waiting when other processes share the cores).
 *
 * Systems: the assembled fin system (check case R1, invented inputs: k = 180, h = 40, t = 2 mm,
 * w = 50 mm, L = 30 mm; drop form) with 1e6 nodes,
 * and 1e4 solves of a 1000-node system, into preallocated arrays (the `...Into` variants).
 */
import { assembleFin1D } from '../src/fd/one-d/assemble.js';
import { conservativeThomasInto } from '../src/fd/linear-algebra/conservative-thomas.js';
import { dropSystem } from '../src/fd/one-d/drop-system.js';
import { studyFin1D } from '../src/fd/one-d/linear-solve.js';
import { thomasInto, twoSidedThomasInto, type RowSumSystem, type TridiagonalSystem } from '../src/fd/linear-algebra/tridiagonal.js';
import { taperedGeometry } from '../src/mesh/geometry1d.js';
import { buildMesh1D } from '../src/mesh/grid1d.js';
import { linearFinCase } from '../tests/support/fin-case.js';

const geometry = taperedGeometry({ shape: 'straight', length: 0.03, baseSize: 0.002, tipSize: 0.002, exponent: 0, width: 0.05 });

function finSystem(nodes: number): RowSumSystem {
  const mesh = buildMesh1D(geometry, { cells: nodes - 1 });
  const h = new Float64Array(mesh.nodes).fill(40);
  return dropSystem(assembleFin1D(mesh, 180, h, { kind: 'temperature', theta: 60 }, { kind: 'convective', h: 'local' }), 60);
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[values.length >> 1] as number;

/** Wall and CPU milliseconds of one call. */
function timed(run: () => void): { wall: number; cpu: number } {
  const cpu = process.cpuUsage();
  const start = performance.now();
  run();
  const wall = performance.now() - start;
  const used = process.cpuUsage(cpu);
  return { wall, cpu: (used.user + used.system) / 1000 };
}

const report = (runs: { wall: number; cpu: number }[], digits: number) =>
  `median ${median(runs.map((r) => r.wall)).toFixed(digits)} ms (CPU ${median(runs.map((r) => r.cpu)).toFixed(digits)} ms, ` +
  `fastest ${Math.min(...runs.map((r) => r.wall)).toFixed(digits)} ms)`;

type Into = (system: TridiagonalSystem, solution: Float64Array, work: Float64Array) => Float64Array;
const SOLVERS: [string, Into][] = [
  ['thomasInto (one-sided)', thomasInto],
  ['twoSidedThomasInto', twoSidedThomasInto],
  ['conservativeThomasInto (default, row sums)', conservativeThomasInto],
];

const big = finSystem(1_000_000);
const small = finSystem(1000);
const solution = new Float64Array(1_000_000);
const work = new Float64Array(1_000_000);
const smallSolution = new Float64Array(1000);
const smallWork = new Float64Array(1000);

for (const [name, solve] of SOLVERS) {
  for (let warm = 0; warm < 5; warm++) solve(big, solution, work);
  const singles = Array.from({ length: 31 }, () => timed(() => solve(big, solution, work)));
  const batches = Array.from({ length: 7 }, () =>
    timed(() => {
      for (let k = 0; k < 10_000; k++) solve(small, smallSolution, smallWork);
    }),
  );
  console.log(`${name.padEnd(44)} 1e6 nodes: ${report(singles, 2)} | 1e4 x 1000 nodes: ${report(batches, 1)}`);
}

const fin = linearFinCase({
  edges: 'cooled',
  profile: { kind: 'rectangular', length: 0.03, thickness: 0.002, width: 0.05 },
  k: 180,
  h: { kind: 'uniform', h: 40 },
  tip: { kind: 'convective', h: null },
  thetaBase: 60,
});
for (let warm = 0; warm < 20; warm++) studyFin1D(fin);
const studies = Array.from({ length: 51 }, () => timed(() => studyFin1D(fin)));
console.log(`studyFin1D (default grids 2001/4001/8001 nodes): ${report(studies, 2)}`);
