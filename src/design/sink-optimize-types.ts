/** What `optimize` asks of a heat sink and what it answers (optimize-sink.ts; the JSON of `optimize --json`). */
import type { SinkShortcutModel } from './sink-candidates.js';

export type SinkObjective = { kind: 'max-heat' } | { kind: 'required'; temperature_degC: number | null };
export type SinkKeep = 'none' | 'volume' | 'mass';

export interface OptimizeSinkRequest {
  caseText: string;
  fileName: string;
  /** One key: array.count or fin.thickness. */
  vary: readonly string[];
  keep: SinkKeep | 'default';
  objective: SinkObjective;
  /** Bounds of the varied key (a count, or m). */
  bounds: ReadonlyMap<string, readonly [number, number]>;
  tolerance: number;
  /** How the caller names its inputs in messages. */
  labels: { vary: string; keep: string; bounds: string; temperature: string; out?: string };
  curve?: boolean;
  /** The shortcut optimised (default overall-efficiency). */
  shortcutModel?: SinkShortcutModel;
}

export interface SinkOptimumPoint {
  /** Every dimension that changed (a count, or m), by key path. */
  values: Record<string, number>;
  /** The hottest source's mean rise above ambient, K (the objective), and its mean temperature, degC. */
  hottestRise_K: number;
  hottestTemperature_degC: number;
  hottestSource: string;
  /** Every source's mean rise, K. */
  sourceRise_K: number[];
  /** The fins' volume (count x profile area x plate length), m^3. */
  amount: number;
}

export interface SinkCurve {
  key: string;
  /** Values of the varied key (counts, or m). */
  x: number[];
  /** The hottest source's mean rise, K: the reference on the search study, and the shortcut; NaN where invalid. */
  reference_K: number[];
  shortcut_K: number[];
  model: 'fd-3d';
  note: string;
}

export interface OptimizeSinkResult {
  kind: 'heat-sink';
  case: string;
  objective: SinkObjective['kind'];
  /** What is minimised or limited. */
  quantity: string;
  /** The required temperature for every source (degC), or null when each source's own limit is used (or max-heat). */
  requiredTemperature_degC: number | null;
  /** The limit on each limited source's mean temperature, degC (required; null for max-heat). */
  limits: { source: string; limit_degC: number }[] | null;
  /** The sources' names, in the case's order (every per-source array follows it). */
  sourceNames: string[];
  keep: SinkKeep;
  vary: string[];
  dependent: string | null;
  bounds: Record<string, [number, number]>;
  shortcut: SinkOptimumPoint & { model: SinkShortcutModel; method: string };
  reference: SinkOptimumPoint & {
    model: 'fd-3d';
    discretizationError: number | null;
    resolved: boolean;
    /** fd-3d refinement studies solved (search + confirm). */
    evaluations: number;
    search: { studies: number; grid: string; discretizationError: number | null; values: Record<string, number> };
    confirm: { studies: number; grid: string };
    /** The objective at the answer's neighbours on the confirm study (count +-1; thickness +-2 %). */
    neighbours: { values: Record<string, number>; hottestRise_K: number }[];
    /** The largest temperature over each source at the answer, degC (the limit is applied to the means). */
    sourceMax_degC: number[];
  };
  /** The reference's hottest rise at the shortcut's dimensions, K (confirm study). */
  shortcutAtReference_K: number;
  /** max-heat: shortcutAtReference_K / reference.hottestRise_K - 1; required: the shortcut's fin volume over the reference's, minus 1. */
  loss: number;
  /** required: whether the shortcut's answer keeps every limit in the reference (confirm study). */
  shortcutKeepsLimit: boolean | null;
  /** required: how the answer moves with h. */
  hSensitivity: { method: string; dlnAnswer_dlnh: number | null; atLowH: number | null; atHighH: number | null } | null;
  notes: string[];
  cautions: string[];
  curve?: SinkCurve;
}
