/**
 * The result of checking a heat sink (heat-sink.md, "What `check` reports for a heat sink"): plain data, the JSON
 * of `check --json` for a heat-sink case. Quantity judged: each source's mean temperature rise above ambient, K;
 * drift = (rise_model - rise_ref) / rise_ref; the worst source decides the verdict. Temperatures degC, heat W.
 */
import type { SinkShortcutId } from './sink-models.js';
import type { Flag, Verdict } from './types.js';

/** d ln rise / d ln x of the hottest source's mean rise for one input (sink-sensitivity.ts). */
export interface SinkSensitivity {
  key: string;
  dlnRise_dlnx: number;
  method: 'adjoint' | 'central-difference';
  value: number;
  uncertainty: number;
}

export interface SinkUncertaintyBand {
  method: 'first-order';
  /** Relative standard uncertainty of the hottest source's mean rise. */
  relative: number;
  /** The rise (1 -+ relative), K. */
  low_K: number;
  high_K: number;
  firstOrder: number;
  fromH: number;
  sample: null;
  /** Which source, and how the band was found. */
  source: string;
  note: string;
}

export interface SinkReferenceResult {
  model: 'fd-3d';
  /** Mean rise of each source, K (the reference's finest grid). */
  sourceRise_K: number[];
  /** Estimated relative discretisation error (GCI) of each source's mean rise; null for a single grid. */
  sourceDiscretizationError: (number | null)[];
  /** The largest of them (null when any is unknown). */
  discretizationError: number | null;
  /** |Q_in - Q_out| / Q_in. */
  energyBalance: number;
  /** True when every source's GCI is at most tolerance / 10: only then are verdicts given. */
  resolved: boolean;
  /** The GCI the reference must reach (tolerance / 10). */
  target: number;
  /** Unknowns of each grid of the study, finest first. */
  unknowns: number[];
  /** How the reference represents the fins. */
  finModel: string;
  note: string;
}

export interface SinkSourceReport {
  name: string;
  power_W: number;
  /** fd-3d, over the source's footprint, its interface drop included. */
  meanTemperature_degC: number;
  maxTemperature_degC: number;
  meanRise_K: number;
  discretizationError: number | null;
  /** `sources[i].limit`, or null. */
  limit_degC: number | null;
  /** limit - maxTemperature, K (negative: over the limit); null without a limit. */
  margin_K: number | null;
}

export interface SinkFinReport {
  index: number;
  heatRate_W: number;
  rootTemperature_degC: number;
}

export interface SinkModelRow {
  model: SinkShortcutId;
  /** Each source's predicted mean rise, K. */
  sourceRise_K: number[];
  /** Each source's drift against the reference. */
  sourceDrift: number[];
  /** The drift of the worst source (largest |drift|), signed: what the verdict is judged on. */
  drift: number;
  /** Name of that source. */
  worstSource: string;
  verdict: Verdict;
  /** Largest predicted mean rise over the total power, K/W. */
  sinkResistance_KperW: number;
  /** The model's overall surface efficiency. */
  overallEfficiency: number;
  /** The model's fin efficiency (null for a bare plate). */
  finEfficiency: number | null;
  basis: string;
  /** How accurate the number is as a solution of its own model. */
  accuracy: string;
  /** |drift| / uncertainty.relative (null when the band is 0); absent when no uncertainty was computed. */
  driftOverUncertainty?: number | null;
}

export interface SinkAssumptionRow {
  assumption: string;
  /** Drift caused by this assumption alone (see method); null where it cannot be measured (a bare plate has no fins). */
  drift: number | null;
  madeBy: SinkShortcutId[];
  method: string;
}

export interface SinkCheckReport {
  case: string;
  kind: 'heat-sink';
  tolerance: number;
  reference: SinkReferenceResult;
  sources: SinkSourceReport[];
  /** fd-3d: (T_source,max - T_ambient) / Q_total, K/W. */
  sinkResistance_KperW: number;
  /** Realised by fd-3d: Q / (G_ideal (T_plate,top mean - T_ambient)), G_ideal = h A_t with every surface's own h. */
  overallEfficiency: number;
  fins: SinkFinReport[];
  models: SinkModelRow[];
  assumptions: SinkAssumptionRow[];
  flags: Flag[];
  cautions: string[];
  /** d ln rise / d ln x of the hottest source's mean rise for every numeric input (sink-sensitivity.ts); absent when not computed. */
  sensitivities?: SinkSensitivity[];
  sensitivityMethod?: string;
  uncertainty?: SinkUncertaintyBand;
}
