/**
 * The result of `fincheck check`: plain data, serialised as the JSON of outputs.md.
 * Heat rates in W (whole fin: whole width, whole ring), drift = (model - reference) / reference.
 */

/** Model ids of the output contract (tables, JSON, images). */
export type ModelId = 'tanh-L' | 'tanh-Lc' | 'tanh-Lc-thin' | 'convective-tip' | 'closed-form' | 'fd-1d' | 'fd-2d';
export type ShortcutId = Exclude<ModelId, 'fd-1d' | 'fd-2d'>;
/**
 * `unresolved`: the reference's estimated discretisation error is above a tenth of the tolerance (after
 * the refinement its budget allows), so the drift is not known well enough to judge: no ok or unsafe.
 */
export type Verdict = 'ok' | 'marginal' | 'unsafe' | 'unresolved';

/** How the reference was resolved before anything was judged on it. */
export interface ReferenceResolution {
  /** The discretisation error (GCI) the reference must reach: tolerance / 10. */
  target: number;
  /** Doublings of the study's grids beyond the default ones. */
  refinements: number;
  /** The grids of the study, coarsest first: node counts (1-D) or "nx" x "ny" (2-D). */
  grids: string[];
  /** The grading of the grids, in words. */
  grading: string;
  /** The refinement budget, in words. */
  budget: string;
}

export interface ReferenceResult {
  model: 'fd-1d' | 'fd-2d';
  heatRate_W: number;
  /** Q / Q_ideal on the reference model's own surface (efficiency-basis.ts); null for an infinite tip (see efficiencyNote). */
  efficiency: number | null;
  /** Why the efficiency is null (infinite tip) or may exceed 1 (prescribed tip temperature); null otherwise. */
  efficiencyNote: string | null;
  /** Q / Q_bare (effectiveness-basis.ts); null where the bare base would exchange no heat (h = 0 at the base, see effectivenessNote). */
  effectiveness: number | null;
  /** Why the effectiveness is null; null otherwise. */
  effectivenessNote: string | null;
  /**
   * Estimated relative discretisation error of heatRate_W: of the Richardson-extrapolated value when heatRateFrom is
   * 'extrapolated' (from a fourth, coarser grid), else the GCI of the finest grid.
   */
  discretizationError: number;
  /** Which value heatRate_W (and tipTemperature_degC) is: the Richardson-extrapolated one of the study, or the finest grid's. */
  heatRateFrom: 'extrapolated' | 'finest-grid';
  /** The finest grid's heat rate, W, and its GCI (Celik et al. 2008), whichever value heatRate_W is. */
  finestGridHeatRate_W: number;
  finestGridDiscretizationError: number;
  energyBalance: number;
  observedOrder: number | null;
  /** Grid of the finest solve: nodes (1-D) or nx, ny (2-D). */
  grid: { nodes: number } | { nx: number; ny: number };
  tipTemperature_degC: number;
  note: string;
  /** True when discretizationError <= tolerance / 10: only then are verdicts given (else `unresolved`). */
  resolved: boolean;
  resolution: ReferenceResolution;
}

/** A reference before its resolution is judged (resolved-reference.ts adds it). */
export type UnjudgedReference = Omit<ReferenceResult, 'resolved' | 'resolution' | 'efficiency' | 'efficiencyNote' | 'effectivenessNote'>;

export interface ModelResult {
  model: ShortcutId | 'fd-1d';
  heatRate_W: number;
  /**
   * Q / Q_ideal of the actual fin (case-format.md definition) with the reference's Q_ideal, so every row is
   * comparable; null for an infinite tip (reference.efficiencyNote says why).
   */
  efficiency: number | null;
  /** Q / Q_bare with the reference's Q_bare; null where it is 0 (reference.effectivenessNote says why). */
  effectiveness: number | null;
  drift: number;
  verdict: Verdict;
  /** The shortcut's own efficiency formula value (e.g. tanh(mLc)/(mLc)), where it has one. */
  formulaEfficiency: number | null;
  /** Fin parameter m and the length the formula used, where it uses them. */
  m_per_m: number | null;
  length_m: number | null;
  /** What the model assumes, in one line. */
  basis: string;
  /** How accurate the number is as a solution of its own model. */
  accuracy: string;
  /** Nonlinear fins: which single h and k the shortcut was given ('base' or 'mean'); absent otherwise. */
  guess?: 'base' | 'mean';
  /** The single h (W/(m^2*K)) and k (W/(m*K)) of that guess. */
  guessValues?: { h_W_per_m2K: number; k_W_per_mK: number; description: string };
  /** |drift| / uncertainty.relative (null when the band is 0); absent when the check computed no uncertainty. */
  driftOverUncertainty?: number | null;
}

/** d ln Q / d ln x of the reference heat rate for one input x (sensitivities.ts). */
export interface Sensitivity {
  /** Key path of the input in the case file. */
  key: string;
  dlnQ_dlnx: number;
  /** How it was computed: the discrete adjoint (a linear fin with the fd-2d reference) or central differences of the reference on its finest grid; sensitivityMethod says more. */
  method: 'adjoint' | 'central-difference' | 'exact';
  /** Nominal value of the input, SI (base.temperature: its rise over the fluid, K). */
  value: number;
  /** Relative standard uncertainty of the input (the case's `uncertainty`, default h 25 %); 0 when not stated. */
  uncertainty: number;
}

/** The uncertainty band of the reference heat rate (uncertainty-band.ts). */
export interface UncertaintyBand {
  /** `first-order`, or `latin-hypercube` where the sample disagrees with first order (the sample's band is then given). */
  method: 'first-order' | 'latin-hypercube';
  /** Relative standard uncertainty of the heat rate (one standard deviation over Q). */
  relative: number;
  /** Q (1 -+ relative), or the sample's 15.9 and 84.1 percentiles, W. */
  low_W: number;
  high_W: number;
  /** The first-order value: sqrt(sum (dlnQ/dlnx u_x)^2). */
  firstOrder: number;
  /** What h's uncertainty alone gives, first order. */
  fromH: number;
  sample: UncertaintySample | null;
  /** How the band was computed, in words (and why no sample was drawn, when none was). */
  note: string;
}

export interface UncertaintySample {
  method: 'latin-hypercube';
  n: number;
  seed: number;
  /** Standard deviation of the sampled heat rates over the nominal heat rate on the sample's grid. */
  relative: number;
  /** Standard error of `relative` from the sample size, sqrt(1 / (2 (n - 1))) relative (normal theory). */
  samplingError: number;
  /** True when |relative - firstOrder| is at most twice samplingError. */
  agrees: boolean;
  /** The grid the sample was solved on. */
  grid: string;
  low_W: number;
  high_W: number;
}

export interface NotApplicable {
  model: ShortcutId;
  reason: string;
}

export interface AssumptionRow {
  assumption: string;
  /** Drift of the heat rate caused by this assumption alone: (Q_with - Q_without) / Q_without. */
  drift: number;
  /** Which models make this assumption. */
  madeBy: ModelId[];
  /** How the drift was measured. */
  method: string;
}

export type Severity = 'info' | 'warning' | 'error';

export interface Flag {
  flag: string;
  severity: Severity;
  value: number;
  message: string;
}

export interface CheckReport {
  case: string;
  tolerance: number;
  /** Biot number h_b (t/2)/k across the thickness at the base (pins h_b (D/2)/k); nonlinear fins: h and k at the base temperature. */
  biot: number | null;
  /** mL of the equivalent uniform fin the shortcuts use (nonlinear fins: the base-temperature guess). */
  mL: number | null;
  /** Why biot or mL is null (a negative single h: surroundings hotter than the fin); null otherwise. */
  dimensionlessNote: string | null;
  reference: ReferenceResult;
  models: ModelResult[];
  notApplicable: NotApplicable[];
  assumptions: AssumptionRow[];
  flags: Flag[];
  cautions: string[];
  /** d ln Q / d ln x of the reference for every numeric input; absent when not computed (maps). */
  sensitivities?: Sensitivity[];
  /** How the sensitivities were computed (central differences on the reference's finest grid). */
  sensitivityMethod?: string;
  uncertainty?: UncertaintyBand;
}

/** The verdict of a drift against a reference; `unresolved` whenever the reference is not resolved. */
export function verdictOf(drift: number, tolerance: number, referenceResolved = true): Verdict {
  if (!referenceResolved) return 'unresolved';
  const a = Math.abs(drift);
  if (a <= tolerance) return 'ok';
  if (a <= 2 * tolerance) return 'marginal';
  return 'unsafe';
}
