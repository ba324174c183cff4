/** What `optimize` asks of one fin and what it answers (optimize-fin.ts; the JSON of `optimize --json`). */
import type { Keep } from './fin-amount.js';

export type Objective = { kind: 'max-heat' } | { kind: 'min-material'; heat_W: number } | { kind: 'required'; heat_W: number };

export interface OptimizeRequest {
  caseText: string;
  fileName: string;
  /** Key paths of the dimensions to vary (fin.thickness, fin.length, fin.diameter, ...): one, or two for min-material. */
  vary: readonly string[];
  /** What stays fixed; 'default': profile-area for max-heat (volume for a pin), none for the other goals. */
  keep: Keep | 'default';
  objective: Objective;
  /** Bounds per varied key, m; default 1/4 to 4 times the case's value. */
  bounds: ReadonlyMap<string, readonly [number, number]>;
  reference: 'auto' | '1d' | '2d';
  tolerance: number;
  /** How the caller names its inputs in messages (the command line: its options). */
  labels: { vary: string; keep: string; bounds: string; heat: string; out?: string };
  /** Also compute the heat rate along the constraint over the bounds, for a chart (one varied key). */
  curve?: boolean;
}

/** Heat rate against the varied dimension along the constraint (the chart of `optimize --out`). */
export interface OptimizeCurve {
  key: string;
  /** Values of the varied key, m (a log grid over the bounds). */
  x_m: number[];
  /** The reference's heat rate (fd-1d: one resolved study a value), W; NaN where the case is invalid. */
  reference_W: number[];
  /** The tanh(mLc)/(mLc) shortcut's, W. */
  shortcut_W: number[];
  model: 'fd-1d';
  note: string;
}

export interface OptimumPoint {
  /** Every dimension that changed, SI (m), by key path. */
  values: Record<string, number>;
  heatRate_W: number;
  /** The amount of material the constraint keeps or the objective minimises (m^2 or m^3), null for keep none. */
  amount: number | null;
}

export interface OptimizeResult {
  case: string;
  objective: Objective['kind'];
  requiredHeat_W: number | null;
  keep: Keep;
  vary: string[];
  /** The key solved for to hold the constraint, or null. */
  dependent: string | null;
  bounds: Record<string, [number, number]>;
  shortcut: OptimumPoint & { method: string };
  reference: OptimumPoint & { model: string; discretizationError: number | null; resolved: boolean; evaluations: number };
  /** The reference's heat rate at the shortcut's dimensions, W. */
  shortcutAtReference_W: number;
  /** 1 − shortcutAtReference_W / reference.heatRate_W (max-heat); for required heat, the shortcut's dimension over the reference's minus 1. */
  loss: number;
  notes: string[];
  cautions: string[];
  /** Only when asked (request.curve). */
  curve?: OptimizeCurve;
}
