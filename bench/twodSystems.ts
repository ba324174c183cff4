/**
 * The 2-D systems the benchmarks solve, built by the library's own pipeline (case -> 2-D problem -> grid
 * with the default grading -> conduction operator -> boundary terms -> system), and the discovery of
 * 2-D solvers that may not exist yet in this checkout (multigrid-preconditioned CG is being written).
 *
 * Cases:
 *  - thin: the demo case inverter-plate-fin.yaml (aluminium plate fin 40 mm long, 2 mm thick, h = 45
 *    W/(m^2*K), convective tip): the thin-fin grids 2000 x 20 and 10000 x 50;
 *  - block: an invented square half-section (20 mm long, 40 mm thick, h = 500 W/(m^2*K)) for the
 *    1000 x 1000 grid, where nodes across are as many as along and a band solver no longer fits.
 */
import { readdirSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { loadCase, parseCaseText } from '../src/case/parse.js';
import type { Case } from '../src/case/types.js';
import { assembleConduction2D } from '../src/fd/two-d/assemble.js';
import { buildSystem2D, discretizeBoundaries } from '../src/fd/two-d/boundary.js';
import { DEFAULT_GRADING } from '../src/fd/two-d/linear-solve.js';
import { fin2dProblem, type Fin2DProblem } from '../src/fd/two-d/problem.js';
import { residual, type Solver2D, type System2D } from '../src/fd/linear-algebra/stencil9.js';
import { buildGrid2D } from '../src/mesh/grid2d.js';

export type BenchCase2D = 'thin' | 'block';

const BLOCK_CASE = `# Invented for the benchmark: a fin as thick as it is long.
name: bench block
fin:
  profile: rectangular
  length: 20 mm
  thickness: 40 mm
  width: 100 mm
  edges: insulated
material: aluminium-6063
convection:
  ambient: 25 degC
  h: 500 W/(m^2*K)
  tip: convective
base:
  temperature: 85 degC
`;

export function benchCase2D(kind: BenchCase2D): Case {
  switch (kind) {
    case 'thin':
      return loadCase('demo/inverter-plate-fin.yaml');
    case 'block':
      return parseCaseText(BLOCK_CASE, 'bench-block.yaml');
    default: {
      const unreachable: never = kind;
      throw new Error(`unknown bench case ${String(unreachable)}`);
    }
  }
}

export function benchProblem2D(kind: BenchCase2D): Fin2DProblem {
  return fin2dProblem(benchCase2D(kind));
}

/** The assembled system on an nx x ny grid with the library's default grading. */
export function benchSystem2D(problem: Fin2DProblem, nx: number, ny: number): System2D {
  const grid = buildGrid2D(problem.section, { nx, ny, baseGrading: DEFAULT_GRADING.base, faceGrading: DEFAULT_GRADING.face });
  const K = assembleConduction2D(grid, problem.k);
  return buildSystem2D(K, discretizeBoundaries(grid, problem.conditions));
}

/** |rhs - A x|_inf / |rhs|_inf. */
export function relativeResidual(system: System2D, x: Float64Array): number {
  const r = residual(system, x);
  let top = 0;
  let bottom = 0;
  for (let p = 0; p < r.length; p++) {
    top = Math.max(top, Math.abs(r[p] as number));
    bottom = Math.max(bottom, Math.abs(system.rhs[p] as number));
  }
  return top / bottom;
}

export interface FoundSolver {
  /** "file.ts: exportName". */
  readonly name: string;
  readonly solve: Solver2D;
}

const ITERATIVE_NAME = /multigrid|mgpcg|mg_?cg|pcg|conjugate/i;

/**
 * Looks through src/fd/sparse/ for an exported 2-D solver whose name says it is multigrid or
 * (preconditioned) conjugate gradients, e.g. `multigridPcgSolver`. Returns null when there is none
 * (the solver is still being written), so that the benchmark can say so instead of failing to compile.
 */
export async function findIterativeSolver(): Promise<FoundSolver | null> {
  const folder = new URL('../src/fd/linear-algebra/', import.meta.url);
  const files = readdirSync(folder).filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts'));
  for (const file of files) {
    let mod: Record<string, unknown>;
    try {
      mod = (await import(pathToFileURL(`${folder.pathname}${file}`).href)) as Record<string, unknown>;
    } catch {
      continue; // mid-edit elsewhere: not ours to judge
    }
    for (const [exportName, value] of Object.entries(mod)) {
      if (typeof value !== 'function' || !ITERATIVE_NAME.test(exportName) || !/solver/i.test(exportName)) continue;
      if (value.length !== 1) continue; // a Solver2D takes exactly the system
      return { name: `${file}: ${exportName}`, solve: value as Solver2D };
    }
  }
  return null;
}

/**
 * The method autoSolver2D picks for a grid, when autoSolver.ts exports its chooser
 * (`chooseSolverMethod(nodesX, nodesY)`); null while it does not.
 */
export async function autoSolverChoice(nodesX: number, nodesY: number): Promise<string | null> {
  const mod = (await import('../src/fd/linear-algebra/auto-solver.js')) as Record<string, unknown>;
  const choose = mod['chooseSolverMethod'];
  if (typeof choose !== 'function') return null;
  const method: unknown = choose(nodesX, nodesY);
  return typeof method === 'string' ? method : null;
}
