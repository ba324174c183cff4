/**
 * Timings of the 2-D solver (not a test: run `npx tsx bench/twod-timings.ts`). Medians of several runs,
 * after a warm-up. Grids: nodes along x nodes across. The shared machine is noisy: run it when idle.
 *   2000x20    thin plate fin (L/b = 40), banded Cholesky (the automatic choice)
 *   10000x50   thin plate fin, automatic choice, and both methods
 *   1000x1000  thick plate fin (L/b = 10), MG-PCG
 *   study      studyFin2D on a typical air-cooled aluminium fin (3 grids)
 */
import type { Case } from '../src/case/types.js';
import { assembleConduction2D } from '../src/fd/two-d/assemble.js';
import { buildSystem2D, discretizeBoundaries } from '../src/fd/two-d/boundary.js';
import { fin2dProblem } from '../src/fd/two-d/problem.js';
import { studyFin2D } from '../src/fd/two-d/linear-study.js';
import { prepareSolver2D, type SolverMethod } from '../src/fd/linear-algebra/auto-solver.js';
import { buildGrid2D } from '../src/mesh/grid2d.js';
import { finCase } from '../tests/support/fin-case.js';
import { TEMPERATURES_2D } from '../tests/fd2d/cases.js';

const median = (v: number[]): number => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)] as number;

function systemFor(c: Case, nx: number, ny: number) {
  const problem = fin2dProblem(c);
  const grid = buildGrid2D(problem.section, { nx, ny, baseGrading: 8, faceGrading: 8 });
  const K = assembleConduction2D(grid, problem.k);
  return buildSystem2D(K, discretizeBoundaries(grid, problem.conditions));
}

function time(label: string, c: Case, nx: number, ny: number, method: SolverMethod | 'auto', runs: number): void {
  const system = systemFor(c, nx, ny);
  const setup: number[] = [];
  const solve: number[] = [];
  let chosen = '';
  let rss = 0;
  for (let r = 0; r < runs + 1; r++) {
    const t0 = performance.now();
    const s = prepareSolver2D(system, method);
    const t1 = performance.now();
    s.solve(system);
    const t2 = performance.now();
    chosen = s.method;
    rss = Math.max(rss, process.memoryUsage().rss);
    if (r > 0) {
      setup.push(t1 - t0);
      solve.push(t2 - t1);
    }
  }
  const total = median(setup.map((v, i) => v + (solve[i] as number)));
  console.log(
    `${label.padEnd(28)} ${chosen.padEnd(16)} setup ${median(setup).toFixed(1)} ms  solve ${median(solve).toFixed(1)} ms  total ${total.toFixed(1)} ms  rss ${(rss / 2 ** 20).toFixed(0)} MB`,
  );
}

const thin = finCase({
  profile: { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 0.08 },
  k: 205,
  h: { kind: 'uniform', h: 40 },
  tip: { kind: 'convective', h: null },
  ...TEMPERATURES_2D,
});
const thick = finCase({
  profile: { kind: 'rectangular', length: 0.02, thickness: 0.004, width: 0.08 },
  k: 20,
  h: { kind: 'uniform', h: 2000 },
  tip: { kind: 'convective', h: null },
  ...TEMPERATURES_2D,
});

const which = process.argv[2] ?? 'all';
if (which === 'all' || which === 'small') time('2000x20 thin', thin, 2000, 20, 'auto', 9);
if (which === 'all' || which === 'medium') {
  time('10000x50 thin (auto)', thin, 10000, 50, 'auto', 3);
  time('10000x50 thin', thin, 10000, 50, 'banded-cholesky', 3);
  time('10000x50 thin', thin, 10000, 50, 'mg-pcg', 3);
}
if (which === 'all' || which === 'large') time('1000x1000 thick', thick, 1000, 1000, 'auto', 3);
if (which === 'all' || which === 'study') {
  const runs: number[] = [];
  let last = studyFin2D(thin);
  for (let r = 0; r < 5; r++) {
    const t0 = performance.now();
    last = studyFin2D(thin);
    runs.push(performance.now() - t0);
  }
  console.log(
    `study, typical thin fin       grids ${last.grids.map((g) => `${g.nx}x${g.ny}`).join(' ')}  ${median(runs).toFixed(1)} ms  ` +
      `Q = ${last.extrapolatedHeatRate_W.toFixed(6)} W  GCI ${last.discretizationError.toExponential(1)}  p ${last.heatRate.observedOrder?.toFixed(2)}`,
  );
}
