/**
 * Plain data of `fincheck map`: the two axes, the options every point is checked with, and one result per grid
 * point. Points are stored x fastest: index = j * nx + i (outputs.md). Axis values are in the user's unit;
 * heat rates in W; drift = (shortcut - reference) / reference on the heat rate, as `fincheck check` reports it.
 */
import type { KeyPath, QuantityKind } from '../case/index.js';
import type { ModelId, ShortcutId, SinkShortcutId, Verdict } from '../compare/index.js';

/**
 * What a map can show the drift of: a fin's shortcuts, and the 1-D model when fd-2d is the reference; a heat sink's
 * array shortcuts (their drift: the worst source's, on its mean rise, as `check` judges them).
 */
export type MapModelId = ShortcutId | 'fd-1d' | SinkShortcutId;

/** One axis of the map: a case key swept from `from` to `to` in the user's unit. */
export interface MapAxis {
  /** The key path as the user wrote it, normalised (`fin.thickness`). */
  key: string;
  path: KeyPath;
  kind: QuantityKind;
  /** The unit the values are in, as written by the user ('' for a bare number: SI, see `displayUnit`). */
  unit: string;
  /** The unit shown in headers and labels: `unit`, or the SI unit a bare number is read in. */
  displayUnit: string;
  log: boolean;
  /** Grid values in the user's unit, ascending. */
  values: Float64Array;
  /** The case's own value in the user's unit, or null when the key is absent and has no default. */
  caseValue: number | null;
}

/** What a worker needs to substitute one axis value into the raw case (structured-clone safe). */
export interface AxisSubstitution {
  path: KeyPath;
  /** '' writes the bare number (SI), else the string "<value> <unit>". */
  unit: string;
}

/** The options of `fincheck check` every point runs with. */
export interface PointCheckOptions {
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  /** Models to report, in this order. */
  models: readonly MapModelId[];
  /** Nonlinear fins: the shortcuts shown use h and k at the base temperature ('base'); null for linear fins. */
  guess: 'base' | null;
}

/** Everything a point needs besides its two values: the case text (re-read in each worker) and the axes. */
export interface MapJob {
  /** 'fin' (a single-fin case, runCheck) or 'heat-sink' (runSinkCheck on the default fd-3d study). */
  kind: 'fin' | 'heat-sink';
  caseText: string;
  fileName: string;
  x: AxisSubstitution;
  y: AxisSubstitution;
  check: PointCheckOptions;
}

export interface PointModel {
  model: MapModelId;
  /** A fin: the model's heat rate. A heat sink: the total power (every array shortcut carries all of it). */
  heatRate_W: number;
  /** null for an infinite tip (no finite surface; check's reference.efficiencyNote). */
  efficiency: number | null;
  drift: number;
  verdict: Verdict;
  /** A heat sink: the model's sink resistance (largest predicted mean rise over the total power), K/W. */
  sinkResistance_KperW?: number;
  /** A heat sink: the source whose drift decides (the worst). */
  worstSource?: string;
}

export interface PointReference {
  model: Extract<ModelId, 'fd-1d' | 'fd-2d'> | 'fd-3d';
  /** A fin: the reference's heat rate. A heat sink: the total power of its sources. */
  heatRate_W: number;
  /** null for an infinite tip (no finite surface; check's reference.efficiencyNote). */
  efficiency: number | null;
  discretizationError: number;
  /** True when discretizationError <= tolerance / 10; else the point's verdicts are `unresolved`. */
  resolved: boolean;
  /** A heat sink: fd-3d's sink resistance (hottest point over the total power), K/W, and its hottest source temperature, degC. */
  sinkResistance_KperW?: number;
  maxTemperature_degC?: number;
}

/** A grid point where the check ran. */
export interface PointResult {
  index: number;
  x: number;
  y: number;
  /** Biot number across the thickness at the base, h (t/2)/k (pins h (D/2)/k); null where check gives none (a negative single h). */
  biot: number | null;
  /** m L of the equivalent uniform fin (mean section, mean h), as `check` computes it; null as biot. */
  mL: number | null;
  reference: PointReference;
  /** The requested models that apply at this point. */
  models: PointModel[];
}

/** A grid point where the substituted case is invalid or the solver failed: the message instead of results. */
export interface PointError {
  index: number;
  x: number;
  y: number;
  error: string;
}

export type MapPoint = PointResult | PointError;

export function isPointError(p: MapPoint): p is PointError {
  return 'error' in p;
}
