/**
 * Cost of a nonlinear fd-2d solve against the linear one on the same grid (not a test: run with
 * `npx tsx bench/nonlinear2d-cost.ts`). Target: nonlinear <= 15x linear. Medians of repeated
 * runs after a warm-up, wall and CPU time of this process (the CPU time excludes waiting for a shared core).
 *
 * Fins (invented inputs): a 60 mm x 3 mm aluminium plate in still air, h = 6.5 (theta/theta_b)^(1/4) with
 * emissivity 0.85 (the enclosure demo), k over temperature 205 -> 190 W/(m K); the linear counterpart has
 * h = 6.5 W/(m^2 K), no radiation, k = 205. Grids: the check study's finest (185 x 33), a longer one
 * (1025 x 33, banded), a fine one (369 x 129, MG-PCG), and the whole three-grid study.
 */
import type { Case } from '../src/case/types.js';
import { solveFin2D } from '../src/fd/two-d/linear-solve.js';
import { studyFin2D } from '../src/fd/two-d/linear-study.js';
import { solveNonlinearFin2D } from '../src/fd/two-d/nonlinear-solve.js';
import { studyNonlinearFin2D } from '../src/fd/two-d/nonlinear-study.js';
import { finCase } from '../tests/support/fin-case.js';

const median = (v: number[]): number => [...v].sort((a, b) => a - b)[v.length >> 1] as number;

function timed(run: () => void): { wall: number; cpu: number } {
  const cpu = process.cpuUsage();
  const start = performance.now();
  run();
  const wall = performance.now() - start;
  const used = process.cpuUsage(cpu);
  return { wall, cpu: (used.user + used.system) / 1000 };
}

const profile = { kind: 'rectangular', length: 0.06, thickness: 0.003, width: 0.15 } as const;
const nonlinear: Case = finCase({
  profile,
  k: { kind: 'table', T_degC: Float64Array.from([20, 100]), k: Float64Array.from([205, 190]) },
  h: { kind: 'power', base: 6.5, exponent: 0.25 },
  tip: { kind: 'convective', h: null },
  base_degC: 75,
  emissivity: 0.85,
});
const linear: Case = finCase({
  profile,
  k: { kind: 'constant', k: 205 },
  h: { kind: 'uniform', h: 6.5 },
  tip: { kind: 'convective', h: null },
  base_degC: 75,
});

function compare(label: string, runLinear: () => void, runNonlinear: () => void, runs: number): void {
  runLinear();
  runNonlinear();
  const a: { wall: number; cpu: number }[] = [];
  const b: { wall: number; cpu: number }[] = [];
  for (let r = 0; r < runs; r++) {
    a.push(timed(runLinear));
    b.push(timed(runNonlinear));
  }
  const wa = median(a.map((t) => t.wall));
  const wb = median(b.map((t) => t.wall));
  const ca = median(a.map((t) => t.cpu));
  const cb = median(b.map((t) => t.cpu));
  console.log(
    `${label.padEnd(22)} linear ${wa.toFixed(1).padStart(7)} ms (CPU ${ca.toFixed(1)}), nonlinear ${wb.toFixed(1).padStart(7)} ms (CPU ${cb.toFixed(1)}): ratio ${(wb / wa).toFixed(1)} (CPU ${(cb / ca).toFixed(1)})`,
  );
}

for (const [nx, ny, runs] of [
  [185, 33, 15],
  [1025, 33, 9],
  [369, 129, 7],
] as const) {
  const r = solveNonlinearFin2D(nonlinear, { nx, ny });
  const steps = `${r.newton.iterations} steps + ${r.newton.coarseGridIterations} on coarser grids, ${r.solver}`;
  compare(
    `${nx} x ${ny}`,
    () => void solveFin2D(linear, { nx, ny }),
    () => void solveNonlinearFin2D(nonlinear, { nx, ny }),
    runs,
  );
  console.log(`${''.padEnd(22)} nonlinear: ${steps}`);
}
compare(
  'study (3 grids)',
  () => void studyFin2D(linear),
  () => void studyNonlinearFin2D(nonlinear),
  9,
);
console.log(`${''.padEnd(22)} Newton steps per grid: ${studyNonlinearFin2D(nonlinear).iterations.join('/')}`);
