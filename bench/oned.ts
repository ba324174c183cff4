/**
 * 1-D benchmarks: the tridiagonal solve alone at 1e3..1e6 nodes, assembly + solve at 1e6 nodes, and
 * 1e4 repeated solves of 1000 nodes with reused work arrays.
 *
 * The system is the real one: the demo case inverter-plate-fin.yaml (rectangular aluminium fin, convective
 * tip, contact resistance) meshed and assembled by the library (buildMesh1D, assembleFin1D). Timed
 * solvers: conservativeThomasInto (the library default, two-sided row-sum Thomas) and, for comparison
 * with a plain C Thomas solve (8.1 ms at 1e6 nodes on this machine), the classic one-sided thomasInto
 * and the two-sided twoSidedThomasInto. All `...Into` calls write into preallocated arrays.
 */
import { loadCase } from '../src/case/parse.js';
import { assembleFin1D } from '../src/fd/one-d/assemble.js';
import { hAtNodes, hBreakpoints } from '../src/fd/problem/convection.js';
import { conservativeThomasInto } from '../src/fd/linear-algebra/conservative-thomas.js';
import { autoGrading, solveFinProblem1D } from '../src/fd/one-d/linear-solve.js';
import { isLinearFinCase } from '../src/fd/problem/linear-case.js';
import { finProblem1D, type FinProblem1D } from '../src/fd/one-d/problem.js';
import { thomasInto, twoSidedThomasInto, type RowSumSystem } from '../src/fd/linear-algebra/tridiagonal.js';
import { buildMesh1D } from '../src/mesh/grid1d.js';
import type { Mesh1D } from '../src/mesh/types.js';
import { atMost, cpuText, formatMs, spread, timeTask, type BenchRow } from './measure.js';

const AREA = '1-D';
const DEMO_CASE = 'demo/inverter-plate-fin.yaml';

/** Reference figure for this machine: a plain C Thomas solve of 1e6 nodes takes 8.1 ms. */
const C_THOMAS_1E6_MS = 8.1;

function demoProblem(): FinProblem1D {
  const c = loadCase(DEMO_CASE);
  if (!isLinearFinCase(c)) throw new Error(`bench: ${DEMO_CASE} is expected to be a linear case`);
  return finProblem1D(c);
}

function meshOf(problem: FinProblem1D, nodes: number): Mesh1D {
  const geometry = problem.geometry;
  return buildMesh1D(geometry, {
    cells: nodes - 1,
    grading: autoGrading(geometry),
    breakpoints: hBreakpoints(problem.h, geometry.length),
  });
}

function assembled(problem: FinProblem1D, mesh: Mesh1D): { system: RowSumSystem; hNodes: Float64Array } {
  const hNodes = hAtNodes(problem.h, mesh.x, problem.geometry.length);
  const system = assembleFin1D(mesh, problem.conductivity, hNodes, problem.base, problem.tip);
  return { system, hNodes };
}

/** Time budget per size: enough runs for a stable median, small enough for the whole suite in ~3 min. */
function budget(nodes: number): { time: number; iterations: number } {
  return nodes >= 1e6 ? { time: 1000, iterations: 30 } : { time: 400, iterations: 50 };
}

export async function benchOneD(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const problem = demoProblem();

  for (const nodes of [1e3, 1e4, 1e5, 1e6]) {
    const mesh = meshOf(problem, nodes);
    const { system } = assembled(problem, mesh);
    const n = mesh.nodes;
    const solution = new Float64Array(n);
    const work = new Float64Array(n);
    const t = await timeTask(`solve ${n}`, () => conservativeThomasInto(system, solution, work), budget(nodes));
    const big = nodes === 1e6;
    rows.push({
      area: AREA,
      item: `tridiagonal solve alone, ${n} nodes (default row-sum Thomas)`,
      target: big ? '<= 10 ms' : '-',
      measured: formatMs(t.medianMs),
      cpu: cpuText(t.cpuMedianMs),
      verdict: big ? atMost(t.medianMs, 10) : 'info',
      note: `${spread(t)}; ${((t.medianMs * 1e6) / n).toFixed(1)} ns/node${big ? `; ${(t.medianMs / C_THOMAS_1E6_MS).toFixed(2)}x the C Thomas (8.1 ms)` : ''}`,
    });
    if (big) {
      for (const [label, solve] of [
        ['classic one-sided Thomas (thomasInto)', thomasInto],
        ['two-sided Thomas (twoSidedThomasInto)', twoSidedThomasInto],
      ] as const) {
        const s = await timeTask(label, () => solve(system, solution, work), budget(nodes));
        rows.push({
          area: AREA,
          item: `tridiagonal solve alone, ${n} nodes, ${label} (alternative, for comparison)`,
          target: '-',
          measured: formatMs(s.medianMs),
          cpu: cpuText(s.cpuMedianMs),
          verdict: 'info',
          note: `${spread(s)}; ${(s.medianMs / C_THOMAS_1E6_MS).toFixed(2)}x the C Thomas (8.1 ms)`,
        });
      }
      // Assembly (h at nodes, conductances, boundary rows) into the same arrays, then the solve; mesh reused.
      const hNodes = new Float64Array(n);
      const a = await timeTask(
        'assemble+solve 1e6',
        () => {
          hAtNodes(problem.h, mesh.x, problem.geometry.length, hNodes);
          assembleFin1D(mesh, problem.conductivity, hNodes, problem.base, problem.tip, system);
          return conservativeThomasInto(system, solution, work);
        },
        { time: 2000, iterations: 15 },
      );
      rows.push({
        area: AREA,
        item: `assemble + solve, ${n} nodes (mesh reused, arrays reused)`,
        target: '-',
        measured: formatMs(a.medianMs),
        cpu: cpuText(a.cpuMedianMs),
        verdict: 'info',
        note: spread(a),
      });
      const e = await timeTask('solveFinProblem1D 1e6', () => solveFinProblem1D(problem, { nodes: n }), {
        time: 1000,
        iterations: 5,
      });
      rows.push({
        area: AREA,
        item: `solveFinProblem1D end to end, ${n} nodes (mesh, assembly, solve, heat rates; allocates)`,
        target: '-',
        measured: formatMs(e.medianMs),
        cpu: cpuText(e.cpuMedianMs),
        verdict: 'info',
        note: spread(e),
      });
    }
  }

  rows.push(...(await repeatedSmallSolves(problem)));
  return rows;
}

/** 1e4 solves of one 1000-node system with the same solution/work arrays (one timed run = all 1e4 solves). */
async function repeatedSmallSolves(problem: FinProblem1D): Promise<BenchRow[]> {
  const repeats = 10_000;
  const mesh = meshOf(problem, 1000);
  const { system, hNodes } = assembled(problem, mesh);
  const n = mesh.nodes;
  const solution = new Float64Array(n);
  const work = new Float64Array(n);
  const solveOnly = await timeTask(
    '1e4 x 1000 solves',
    () => {
      for (let r = 0; r < repeats; r++) conservativeThomasInto(system, solution, work);
    },
    { time: 1500, iterations: 10 },
  );
  const withAssembly = await timeTask(
    '1e4 x 1000 assemble+solve',
    () => {
      for (let r = 0; r < repeats; r++) {
        assembleFin1D(mesh, problem.conductivity, hNodes, problem.base, problem.tip, system);
        conservativeThomasInto(system, solution, work);
      }
    },
    { time: 1500, iterations: 5 },
  );
  return [
    {
      area: AREA,
      item: `${repeats} solves of ${n} nodes (conservativeThomasInto, arrays reused), total`,
      target: '<= 100 ms',
      measured: formatMs(solveOnly.medianMs),
      cpu: cpuText(solveOnly.cpuMedianMs),
      verdict: atMost(solveOnly.medianMs, 100),
      note: spread(solveOnly),
    },
    {
      area: AREA,
      item: `${repeats} x (assemble into + solve) of ${n} nodes, total`,
      target: '-',
      measured: formatMs(withAssembly.medianMs),
      cpu: cpuText(withAssembly.cpuMedianMs),
      verdict: 'info',
      note: `${spread(withAssembly)}; what a nonlinear (Picard/Newton) loop pays per iteration x 1e4`,
    },
  ];
}
