/** `solve` for the library: the temperature profile and heat rate of one model, as `fincheck solve --json` prints them. */
import type { Case, CaseWarning } from '../case/index.js';
import { runSolve, runSolve2D, type Solve2DReport, type SolveReport } from '../compare/index.js';
import { ModelNotApplicableError, UsageError } from '../errors.js';
import { finProblem, modelApplies } from '../fd/index.js';
import { wholeNumberOf } from './options.js';

export type SolveCallOptions =
  /** fd-1d: a refinement study, or one grid of `nodes` nodes. */
  | { model?: '1d'; nodes?: number }
  /** fd-2d: a refinement study, or one grid of nx x ny nodes (along x across). */
  | { model: '2d'; grid?: { nx: number; ny: number } };

/** The report with the case's warnings, as `fincheck solve --json` prints it. */
export type Warned<T> = T & { warnings: readonly CaseWarning[] };

export function solve(c: Case, options?: { model?: '1d'; nodes?: number }): Warned<SolveReport>;
export function solve(c: Case, options: { model: '2d'; grid?: { nx: number; ny: number } }): Warned<Solve2DReport>;
export function solve(c: Case, options: SolveCallOptions = {}): Warned<SolveReport> | Warned<Solve2DReport> {
  const warnings = c.warnings ?? [];
  const model: unknown = options.model;
  if (model !== undefined && model !== '1d' && model !== '2d') throw new UsageError(`options.model: got ${JSON.stringify(model)}; expected '1d' or '2d'`);
  if (options.model === '2d') {
    const coverage = modelApplies(finProblem(c), '2d');
    if (!coverage.ok) throw new ModelNotApplicableError('fd-2d', coverage.reason);
    const grid = options.grid;
    if (grid === undefined) return { ...runSolve2D(c, {}).report, warnings };
    const nx = wholeNumberOf('grid.nx', grid.nx, 2, 20000) as number;
    const ny = wholeNumberOf('grid.ny', grid.ny, 2, 20000) as number;
    return { ...runSolve2D(c, { grid: { nx, ny } }).report, warnings };
  }
  const nodes = wholeNumberOf('nodes', options.nodes, 3, 10_000_000);
  return { ...runSolve(c, nodes === undefined ? {} : { nodes }).report, warnings };
}
