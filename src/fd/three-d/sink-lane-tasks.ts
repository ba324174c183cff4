/**
 * The fd-3d work a heat-sink check hands to its two lanes (sink-lanes.ts: this thread and a worker thread), as
 * data so that either lane runs it: a whole study, some grids of a study, or the slopes of one source's rise on a
 * grid (sink-rise-slopes.ts). Each lane holds the case and the grids it was asked to keep set up and solved, so
 * that the slopes on a study's second-finest grid start from the study's own system, multigrid and solution.
 */
import type { HeatSinkCase } from '../../case/index.js';
import type { SinkGrid } from '../../mesh/index.js';
import { doubledLayersStart } from './sink-layer-start.js';
import { sameSinkGrid, type SolvedSinkGrid } from './sink-grid-setup.js';
import { sinkRiseSlopes, type SinkRiseSlopes, type SinkRiseVariants } from './sink-rise-slopes.js';
import type { SinkGridResult } from './sink-solve.js';
import type { SinkGridSpec, SinkStudy } from './sink-study-types.js';
import { planSinkStudy, solveSinkGrids, sinkStudyOfPlan, type SinkStudyOptions } from './study-sink.js';

export type SinkLaneTask =
  /** studySink(c, options); `keep`: keep its second-finest grid set up and solved, and its finest grid's solution. */
  | { kind: 'study'; options: SinkStudyOptions; keep: boolean }
  /**
   * The grids [from, to) of the study with `options` (coarsest first), solved in order; `keep`: an index into them;
   * `startFrom`: the finest grid of a study this lane solved with `keep`, whose solution starts the first grid
   * when that grid has twice its layers (sink-layer-start.ts).
   */
  | { kind: 'grids'; options: SinkStudyOptions; from: number; to: number; keep: number | null; startFrom: SinkGridSpec | null }
  /** sinkRiseSlopes on `spec`, from the kept grid when this lane holds it. */
  | { kind: 'slopes'; spec: SinkGridSpec; source: number; variants: SinkRiseVariants[]; step: number };

export interface SinkLaneResults {
  study: SinkStudy;
  grids: SinkGridResult[];
  slopes: SinkRiseSlopes;
}

export type SinkLaneTaskOf<K extends SinkLaneTask['kind']> = Extract<SinkLaneTask, { kind: K }>;

/** A task's result and the grid it left kept (null: none). */
export interface SinkLaneOutcome<K extends SinkLaneTask['kind']> {
  result: SinkLaneResults[K];
  kept: SinkGridSpec | null;
}

export class SinkLaneState {
  private readonly kept: SolvedSinkGrid[] = [];
  private readonly solutions: { spec: SinkGridSpec; grid: SinkGrid; theta: Float64Array }[] = [];

  constructor(private readonly c: HeatSinkCase) {}

  run<K extends SinkLaneTask['kind']>(task: SinkLaneTaskOf<K>): SinkLaneOutcome<K> {
    return this.runAny(task) as SinkLaneOutcome<K>;
  }

  private runAny(task: SinkLaneTask): SinkLaneOutcome<SinkLaneTask['kind']> {
    switch (task.kind) {
      case 'study': {
        const plan = planSinkStudy(this.c, task.options);
        const keep = task.keep && plan.specs.length >= 2 ? plan.specs.length - 2 : null;
        const { results, kept } = solveSinkGrids(plan.problem, plan.specs, keep);
        const finest = results[results.length - 1];
        const spec = plan.specs[plan.specs.length - 1];
        if (task.keep && finest !== undefined && spec !== undefined) this.solutions.push({ spec, grid: finest.grid, theta: finest.theta });
        return { result: sinkStudyOfPlan(plan, results), kept: this.keep(kept) };
      }
      case 'grids': {
        const plan = planSinkStudy(this.c, task.options);
        const from = task.startFrom;
        const solved = from === null ? undefined : this.solutions.find((k) => sameSinkGrid(k.spec, from));
        const first =
          solved === undefined ? undefined : (grid: SinkGrid, unknowns: number) => doubledLayersStart(solved.grid, solved.theta, grid, unknowns);
        const { results, kept } = solveSinkGrids(plan.problem, plan.specs.slice(task.from, task.to), task.keep, first);
        return { result: results, kept: this.keep(kept) };
      }
      case 'slopes': {
        const solved = this.kept.find((k) => sameSinkGrid(k.spec, task.spec));
        return { result: sinkRiseSlopes(this.c, task.spec, task.source, task.variants, task.step, solved), kept: null };
      }
      default: {
        const never: never = task;
        throw new Error(`unknown sink lane task ${JSON.stringify(never)}`);
      }
    }
  }

  private keep(solved: SolvedSinkGrid | null): SinkGridSpec | null {
    if (solved === null) return null;
    this.kept.push(solved);
    return solved.spec;
  }
}
