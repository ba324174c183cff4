/**
 * `optimize` for a heat sink (design-questions.md, issue 12: "fin count and thickness at a fixed plate, the classic
 * spacing question"). The plate (width, length, thickness, sources) stays as given; what varies is one of
 *   array.count    the number of plate fins (an integer; the pitch follows as plate.width / count),
 *   fin.thickness  the plate fins' thickness (rectangular profile; the gap follows as pitch - thickness).
 * The objective is the hottest source's mean temperature rise above ambient (K), the quantity `check` judges a sink
 * on (heat-sink.md); the sink carries the sources' given power whatever its dimensions, so "the most heat" becomes
 * "the lowest hottest-source temperature":
 *   max-heat   minimise the hottest source's mean rise over the bounds;
 *   required   the fewest fins (or thinnest fins) that keep every source's mean temperature at or below a limit (one
 *              temperature for all, or each source's own `limit`), with the answer's sensitivity to h.
 * Kept: none (the fixed plate; count or thickness free), or volume / mass (the fins' material held, one material so
 * mass is volume): varying the count, the thickness follows (count x thickness fixed); varying the thickness, the
 * fins' length follows (thickness x length fixed, the sink's form of Schmidt's constant profile area).
 *
 * Models: the shortcut is the uniform-base array shortcut (compare/sink-models.ts; `overall-efficiency` by default,
 * or `overall-efficiency-exact-fin`); the reference is fd-3d. The shortcut costs milliseconds a value and is searched
 * exhaustively (count) or by Brent (thickness, brent-minimize.ts / brentRoot); the reference costs a refinement study
 * a value, so it is searched on a coarser study ('search', sink-candidates.ts) started from the shortcut's answer
 * (count: integer-search.ts; thickness: Brent inside a bracket around the shortcut's optimum), and the answer is then
 * confirmed on the default study ('confirm', check's first study): count: the optimum and its two neighbours (walking on if a
 * neighbour is lower there); thickness: Brent again within +-5 % of the search optimum to 1 %.
 * Sensitivity of a required answer to h: count (an integer): the answer again at h x 0.75 and x 1.25 on the search
 * study (the exact integer answers; 25 % is the default standard uncertainty of h); thickness: by the implicit
 * function theorem, d ln t / d ln h = -(d ln r / d ln h) / (d ln r / d ln t), r the limiting source's rise, both by
 * central differences (relative step 1e-2) on the search study: four studies.
 */
import { brentRoot, initBessel } from '../analytic/index.js';
import { sinkNumericInputs, type HeatSinkCase } from '../case/index.js';
import { CAUTIONS, sinkCautions } from '../compare/index.js';
import { UsageError } from '../errors.js';
import { brentMinimize } from './brent-minimize.js';
import { integerFewest, integerMinimize } from './integer-search.js';
import {
  SEARCH_CELLS_PER_SIDE,
  SEARCH_STUDY,
  SinkOptimizer,
  type SinkReferenceValue,
  type SinkShortcutModel,
  type SinkStudyKind,
} from './sink-candidates.js';

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

const KEYS = ['array.count', 'fin.thickness'] as const;
type SinkKey = (typeof KEYS)[number];
/** Values of the chart's curve for a thickness (log grid), and the most counts drawn one by one. */
const CURVE_POINTS = 15;
const CURVE_COUNTS = 40;
/** The least gap a default thickness bound leaves, as a share of the pitch (common practice, no source). */
const LEAST_GAP = 0.1;
const H_FACTORS = [0.75, 1.25] as const;
const FD_STEP = 1e-2;

const mm = (x: number): string => `${Number((x * 1000).toPrecision(4))} mm`;

export async function optimizeSink(request: OptimizeSinkRequest): Promise<OptimizeSinkResult> {
  await initBessel();
  const { labels } = request;
  const shortcutModel = request.shortcutModel ?? 'overall-efficiency';
  const opt = new SinkOptimizer({ caseText: request.caseText, fileName: request.fileName, shortcutModel });
  const c0 = opt.base;
  if (request.vary.length !== 1)
    throw new UsageError(
      `${labels.vary}: a heat sink varies one key, array.count or fin.thickness (got ${request.vary.length}: ${request.vary.join(', ')})`,
    );
  const key = (request.vary[0] ?? '').trim() as SinkKey;
  if (!KEYS.includes(key)) throw new UsageError(`${labels.vary}: ${key} cannot be varied for a heat sink; vary array.count or fin.thickness`);
  if (c0.array.kind !== 'plates' || c0.fin === null)
    throw new UsageError(`${labels.vary}: ${key} needs plate fins (array.count >= 1); this sink has ${c0.fin === null ? 'no fins' : 'pins (array.pins)'}`);
  const profile = c0.fin.profile;
  if (profile.kind !== 'rectangular')
    throw new UsageError(`${labels.vary}: ${key} is varied for rectangular plate fins only; this sink's fins are ${profile.kind}`);
  const keep: SinkKeep = request.keep === 'default' ? 'none' : request.keep;
  const count0 = c0.array.count;
  const t0 = profile.thickness;
  const L0 = profile.length;
  const W = c0.plate.width;
  const dependent = keep === 'none' ? null : key === 'array.count' ? 'fin.thickness' : 'fin.length';

  // ---- the dimensions of a candidate ----
  const dims = (x: number): Map<string, number> => {
    const d = new Map<string, number>([[key, x]]);
    if (dependent === 'fin.thickness') d.set(dependent, (count0 * t0) / x);
    if (dependent === 'fin.length') d.set(dependent, (t0 * L0) / x);
    return d;
  };
  const countOf = (d: ReadonlyMap<string, number>): number => d.get('array.count') ?? count0;
  const thicknessOf = (d: ReadonlyMap<string, number>): number => d.get('fin.thickness') ?? t0;
  const lengthOf = (d: ReadonlyMap<string, number>): number => d.get('fin.length') ?? L0;
  const amountOf = (d: ReadonlyMap<string, number>): number => countOf(d) * thicknessOf(d) * lengthOf(d) * c0.plate.length;
  const gapOf = (d: ReadonlyMap<string, number>): number => W / countOf(d) - thicknessOf(d);

  // ---- bounds ----
  const given = request.bounds.get(key);
  for (const k of request.bounds.keys()) if (k.trim() !== key) throw new UsageError(`${labels.bounds}: ${k} is not the varied key (${key})`);
  let lo: number;
  let hi: number;
  if (key === 'array.count') {
    // gap > 0: count < W / t (with keep volume t = N0 t0 / N, so the gap is (W - N0 t0) / N: any count).
    const most = dependent === 'fin.thickness' ? Number.POSITIVE_INFINITY : Math.ceil(W / t0) - 1;
    if (given) {
      const [a, b] = given;
      if (!(Number.isInteger(a) && Number.isInteger(b) && a >= 1 && b > a))
        throw new UsageError(`${labels.bounds}: array.count=${a}:${b}: expected whole numbers 1 <= FROM < TO`);
      if (b > most)
        throw new UsageError(
          `${labels.bounds}: array.count=${a}:${b}: ${b} fins of ${mm(t0)} do not fit a plate ${mm(W)} wide with a gap (at most ${most}); lower TO`,
        );
      [lo, hi] = [a, b];
    } else {
      lo = Math.max(1, Math.floor(count0 / 4));
      hi = Math.max(lo + 1, Math.min(4 * count0, most));
    }
  } else {
    const pitch = W / count0;
    if (given) {
      const [a, b] = given;
      if (!(a > 0 && b > a)) throw new UsageError(`${labels.bounds}: fin.thickness: expected 0 < FROM < TO`);
      if (b >= pitch)
        throw new UsageError(
          `${labels.bounds}: fin.thickness=${mm(a)}:${mm(b)}: ${mm(b)} leaves no gap at a pitch of ${mm(pitch)}; keep TO below the pitch`,
        );
      [lo, hi] = [a, b];
    } else {
      lo = t0 / 4;
      hi = Math.min(4 * t0, (1 - LEAST_GAP) * pitch);
    }
  }

  // ---- the objective and the limits ----
  const ambient = c0.convection.ambient_degC;
  let limits: (number | null)[] | null = null;
  if (request.objective.kind === 'required') {
    const T = request.objective.temperature_degC;
    limits = T === null ? c0.sources.map((s) => s.limit_degC) : c0.sources.map(() => T);
    if (limits.every((l) => l === null))
      throw new UsageError(`${labels.temperature}: required needs a temperature (e.g. 110 degC) or a limit on a source (sources[i].limit) in the case`);
    limits.forEach((l, j) => {
      if (l !== null && !(l > ambient))
        throw new UsageError(`${labels.temperature}: ${l} degC for ${c0.sources[j]?.name ?? `sources[${j}]`} is not above the ambient ${ambient} degC`);
    });
  }
  /** How far the sources' mean temperatures are over their limits (K; <= 0: kept). */
  const excess = (rises: readonly number[]): number => {
    let worst = Number.NEGATIVE_INFINITY;
    rises.forEach((r, j) => {
      const l = limits?.[j];
      if (l !== null && l !== undefined) worst = Math.max(worst, ambient + r - l);
    });
    return worst;
  };
  const ref = (x: number, kind: SinkStudyKind): SinkReferenceValue | null => opt.reference(dims(x), kind);
  const refRise = (x: number, kind: SinkStudyKind): number => ref(x, kind)?.hottestRise_K ?? Number.NaN;
  const shortRise = async (x: number): Promise<number> => (await opt.shortcut(dims(x)))?.hottestRise_K ?? Number.NaN;
  const notes: string[] = [];

  let refX: number;
  let shortX: number;
  let searchX: number;
  let method: string;
  let hSensitivity: OptimizeSinkResult['hSensitivity'] = null;
  const isCount = key === 'array.count';

  if (request.objective.kind === 'max-heat') {
    if (isCount) {
      let best = lo;
      let bestRise = Number.POSITIVE_INFINITY;
      for (let n = lo; n <= hi; n++) {
        const r = await shortRise(n);
        if (r < bestRise) [best, bestRise] = [n, r];
      }
      if (!Number.isFinite(bestRise)) throw new UsageError(`${labels.bounds}: array.count: the sink is invalid for every count from ${lo} to ${hi}`);
      shortX = best;
      method = `${shortcutModel}, every count from ${lo} to ${hi} (an exhaustive scan)`;
      searchX = (await integerMinimize((n) => refRise(n, 'search'), lo, hi, shortX)).n;
      refX = (await integerMinimize((n) => refRise(n, 'confirm'), lo, hi, searchX)).n;
    } else {
      const fs = async (x: number) => {
        const r = await shortRise(x);
        return Number.isNaN(r) ? Number.POSITIVE_INFINITY : r;
      };
      const [as, bs] = await logBracket(fs, lo, hi, `${labels.bounds}: fin.thickness`);
      shortX = (await brentMinimize(fs, as, bs, { relTol: 1e-4 })).x;
      method = `${shortcutModel}, minimised by Brent's method over the bounds`;
      const fr = (kind: SinkStudyKind) => (x: number) => {
        const r = refRise(x, kind);
        return Number.isNaN(r) ? Number.POSITIVE_INFINITY : r;
      };
      // Start from the shortcut's optimum: a bracket of +-30 % if the middle is lowest, else the whole bounds.
      const [a0, b0] = [Math.max(lo, shortX / 1.3), Math.min(hi, shortX * 1.3)];
      const f = fr('search');
      const inside = f(shortX) <= f(a0) && f(shortX) <= f(b0);
      const [ar, br] = inside ? [a0, b0] : await logBracket(async (x) => f(x), lo, hi, `${labels.bounds}: fin.thickness`);
      searchX = (await brentMinimize(f, ar, br, { relTol: 1e-3 })).x;
      refX = (await brentMinimize(fr('confirm'), Math.max(lo, searchX / 1.05), Math.min(hi, searchX * 1.05), { relTol: 1e-2 })).x;
      notes.push(
        `the reference's optimum was searched on the search study (Brent to 0.1 %), then again on the default study within +-5 % of it (Brent to 1 %: near the optimum the rise changes by about (dt/t)^2/2, 5e-5 over 1 %, below the default study's GCI)`,
      );
    }
    const atBound = (x: number): boolean => x <= lo * (1 + 1e-3) || x >= hi * (1 - 1e-3);
    const which = [atBound(refX) ? 'reference' : null, atBound(shortX) ? 'shortcut' : null].filter((w) => w !== null);
    if (which.length > 0)
      notes.push(
        `the ${which.join(' and the ')} optimum lies at a bound of ${key}: with one h for every ${isCount ? 'count' : 'thickness'}, ${isCount ? 'each fin added' : 'a thicker fin'} lowers the rise up to the bound; the classic interior optimum spacing comes from h falling as the gaps narrow, which a constant h does not model (widen ${labels.bounds}, or state h for the spacing you choose and ask for the fewest fins that keep a required temperature)`,
      );
  } else {
    if (isCount) {
      let fewest: number | null = null;
      for (let n = lo; n <= hi && fewest === null; n++) {
        const s = await opt.shortcut(dims(n));
        if (s !== null && excess(s.sourceRise_K) <= 0) fewest = n;
      }
      const okAt = (kind: SinkStudyKind, variant?: Variant) => (n: number) => {
        const r = opt.reference(dims(n), kind, variant);
        return r !== null && excess(r.sourceRise_K) <= 0;
      };
      const search = await integerFewest(okAt('search'), lo, hi, fewest ?? hi);
      if (search.n === null) throw notReached(labels, key, lo, hi, ref(hi, 'search'), excess);
      searchX = search.n;
      const confirm = await integerFewest(okAt('confirm'), lo, hi, searchX);
      if (confirm.n === null) throw notReached(labels, key, lo, hi, ref(hi, 'confirm'), excess);
      refX = confirm.n;
      shortX = fewest ?? hi;
      if (fewest === null) notes.push(`the shortcut keeps the limit with no count up to ${hi}: its point is shown at ${hi}`);
      method = `${shortcutModel}, every count from ${lo} up (an exhaustive scan) until the limit is kept`;
      const answers = [];
      for (const factor of H_FACTORS) {
        const variant = hVariant(factor);
        answers.push((await integerFewest(okAt('search', variant), lo, hi, searchX)).n);
      }
      const [low, high] = answers as [number | null, number | null];
      hSensitivity = {
        method: `the fewest fins again with h x ${H_FACTORS[0]} and x ${H_FACTORS[1]} (every h of the case scaled; the search study), the exact integer answers; dlnAnswer_dlnh is their secant, ln(n(1.25 h) / n(0.75 h)) / ln(1.25 / 0.75)`,
        atLowH: low,
        atHighH: high,
        dlnAnswer_dlnh: low !== null && high !== null ? Math.log(high / low) / Math.log(H_FACTORS[1] / H_FACTORS[0]) : null,
      };
    } else {
      const gs = async (x: number) => {
        const s = await opt.shortcut(dims(x));
        return s === null ? Number.NaN : excess(s.sourceRise_K);
      };
      shortX = await rootOnLog(gs, lo, hi, labels, key);
      method = `${shortcutModel}, the thinnest fin that keeps the limit (a root by bisection in log space)`;
      const gr = (kind: SinkStudyKind) => (x: number) => {
        const r = ref(x, kind);
        return r === null ? Number.NaN : excess(r.sourceRise_K);
      };
      searchX = rootNear(gr('search'), shortX, lo, hi, 1e-3, labels, key);
      refX = rootNear(gr('confirm'), searchX, lo, hi, 5e-3, labels, key);
      // d ln t / d ln h = -(d ln r/d ln h) / (d ln r/d ln t) for the limiting source, on the search study.
      const at = ref(refX, 'search');
      const j = limitingSource(at?.sourceRise_K ?? [], limits, ambient);
      const rise = (x: number, variant?: Variant): number => opt.reference(dims(x), 'search', variant)?.sourceRise_K[j] ?? Number.NaN;
      const dLnH =
        (Math.log(rise(refX, hVariant(1 + FD_STEP))) - Math.log(rise(refX, hVariant(1 - FD_STEP)))) / (Math.log(1 + FD_STEP) - Math.log(1 - FD_STEP));
      const dLnT = (Math.log(rise(refX * (1 + FD_STEP))) - Math.log(rise(refX * (1 - FD_STEP)))) / (Math.log(1 + FD_STEP) - Math.log(1 - FD_STEP));
      hSensitivity = {
        method: `implicit function theorem at the answer: d ln t / d ln h = -(d ln r / d ln h) / (d ln r / d ln t), r the mean rise of ${c0.sources[j]?.name ?? `source ${j}`}, both by central differences (relative step ${FD_STEP}) on the search study${dependent === null ? '' : ` (${dependent} following)`}`,
        dlnAnswer_dlnh: -dLnH / dLnT,
        atLowH: null,
        atHighH: null,
      };
    }
    notes.push(
      "the limit is applied to each source's mean temperature (what the shortcuts predict); the reference's largest temperature over each source is sourceMax_degC",
    );
  }

  // ---- the points, their neighbours, the loss ----
  const pointOf = (x: number, rises: readonly number[]): SinkOptimumPoint => {
    const d = dims(x);
    let h = 0;
    rises.forEach((r, j) => {
      if (r > (rises[h] as number)) h = j;
    });
    const hottestRise_K = rises[h] as number;
    return {
      values: Object.fromEntries(d),
      hottestRise_K,
      hottestTemperature_degC: ambient + hottestRise_K,
      hottestSource: c0.sources[h]?.name ?? `source ${h}`,
      sourceRise_K: [...rises],
      amount: amountOf(d),
    };
  };
  const refValue = ref(refX, 'confirm');
  const shortAtRef = ref(shortX, 'confirm');
  const shortOwn = await opt.shortcut(dims(shortX));
  if (refValue === null || shortAtRef === null || shortOwn === null)
    throw new UsageError(`${labels.vary}: the answer makes the sink invalid; narrow ${labels.bounds}`);
  const step = (x: number, s: number): number => (isCount ? x + s : x * (1 + 0.02 * s));
  const neighbours = [-1, 1]
    .map((s) => step(refX, s))
    .filter((x) => x >= lo && x <= hi)
    .map((x) => ({ x, r: ref(x, 'confirm') }))
    .filter((v): v is { x: number; r: SinkReferenceValue } => v.r !== null)
    .map(({ x, r }) => ({ values: Object.fromEntries(dims(x)), hottestRise_K: r.hottestRise_K }));
  const refPoint = pointOf(refX, refValue.sourceRise_K);
  const shortPoint = pointOf(shortX, shortOwn.sourceRise_K);
  const loss = request.objective.kind === 'max-heat' ? shortAtRef.hottestRise_K / refValue.hottestRise_K - 1 : shortPoint.amount / refPoint.amount - 1;
  const searchValue = ref(searchX, 'search');
  const target = request.tolerance / 10;
  const resolved = refValue.discretizationError !== null && refValue.discretizationError <= target;
  if (!resolved)
    notes.push(
      `the reference at the answer is not resolved on the default study (its GCI ${refValue.discretizationError?.toExponential(1) ?? 'unknown'} is above ${target.toExponential(1)}, a tenth of the tolerance; check the answer's sink to refine it): treat the answer as indicative; the comparison of neighbours shares most of that error`,
    );
  if (keep === 'mass') notes.push('mass: one material at a fixed density, so a constant mass is a constant volume');
  if (isCount && c0.array.pitch !== W / count0)
    notes.push(`the case's array.pitch (${mm(c0.array.pitch)}) is dropped while the count varies: the pitch is plate.width / count`);
  if (request.objective.kind === 'required')
    notes.push("loss = the shortcut's fin volume over the reference's, minus 1 (positive: the shortcut asks for more material)");
  else
    notes.push(
      "loss = the reference's hottest rise at the shortcut's optimum over the reference optimum's, minus 1 (positive: the shortcut's choice runs hotter)",
    );
  if (Math.min(...[refX, shortX].map((x) => gapOf(dims(x)))) < 0.2 * thicknessOf(dims(refX)))
    notes.push('the gap between fins is under a fifth of their thickness at an answer: air hardly flows there, and the constant h overstates the cooling');

  // ---- the curve ----
  let curve: SinkCurve | undefined;
  if (request.curve === true) {
    const x = isCount
      ? hi - lo + 1 <= CURVE_COUNTS
        ? Array.from({ length: hi - lo + 1 }, (_, i) => lo + i)
        : [...new Set(Array.from({ length: CURVE_COUNTS }, (_, i) => Math.round(lo + ((hi - lo) * i) / (CURVE_COUNTS - 1))))]
      : Array.from({ length: CURVE_POINTS }, (_, i) => lo * (hi / lo) ** (i / (CURVE_POINTS - 1)));
    const reference_K: number[] = [];
    const shortcut_K: number[] = [];
    for (const v of x) {
      reference_K.push(refRise(v, 'search'));
      shortcut_K.push(await shortRise(v));
    }
    curve = {
      key,
      x,
      reference_K,
      shortcut_K,
      model: 'fd-3d',
      note: `${isCount ? 'every count' : `${CURVE_POINTS} thicknesses on a log grid`} over the bounds${dependent === null ? '' : `, ${dependent} following to keep the ${keep}`}; the reference curve is fd-3d on the search study, the optima on the default study`,
    };
  }

  const gridText = `coarsest cells min(width, length)/${SEARCH_CELLS_PER_SIDE}, ${SEARCH_STUDY.plateLayers} plate layer, ${SEARCH_STUDY.finLayers} fin layers, three grids (ratio 2)`;
  return {
    kind: 'heat-sink',
    case: c0.name,
    objective: request.objective.kind,
    quantity:
      "the hottest source's mean temperature rise above ambient, K (the sink carries the sources' given power: max-heat is the lowest hottest-source temperature)",
    requiredTemperature_degC: request.objective.kind === 'required' ? request.objective.temperature_degC : null,
    limits: limits === null ? null : limits.flatMap((l, j) => (l === null ? [] : [{ source: c0.sources[j]?.name ?? `sources[${j}]`, limit_degC: l }])),
    sourceNames: c0.sources.map((s, j) => s.name ?? `sources[${j}]`),
    keep,
    vary: [key],
    dependent,
    bounds: { [key]: [lo, hi] },
    shortcut: { ...shortPoint, model: shortcutModel, method },
    reference: {
      ...refPoint,
      model: 'fd-3d',
      discretizationError: refValue.discretizationError,
      resolved,
      evaluations: opt.studies.search + opt.studies.confirm,
      search: {
        studies: opt.studies.search,
        grid: gridText,
        discretizationError: searchValue?.discretizationError ?? null,
        values: Object.fromEntries(dims(searchX)),
      },
      confirm: {
        studies: opt.studies.confirm,
        grid: 'the default study: coarsest cells min(width, length)/16, 2 plate layers, 4 fin layers, three grids (ratio 2)',
      },
      neighbours,
      sourceMax_degC: refValue.sourceMax_degC,
    },
    shortcutAtReference_K: shortAtRef.hottestRise_K,
    loss,
    shortcutKeepsLimit: request.objective.kind === 'required' ? excess(shortAtRef.sourceRise_K) <= 0 : null,
    hSensitivity,
    notes,
    cautions: [
      ...sinkCautions(CAUTIONS),
      'Every count and thickness is solved with the case\u2019s h: a real sink\u2019s h changes with the gap between fins (it falls as the channels narrow), so state h for the spacing you choose and confirm it by test.',
    ],
    ...(curve === undefined ? {} : { curve }),
  };
}

type Variant = { tag: string; apply: (c: HeatSinkCase) => HeatSinkCase };

/** Every h of the case (fins, plate, underside) scaled by `factor` (sink-numeric-inputs.ts: convection.h). */
function hVariant(factor: number): Variant {
  return {
    tag: `h*${factor}`,
    apply: (c) => {
      const input = sinkNumericInputs(c).find((i) => i.key === 'convection.h');
      if (input === undefined) throw new Error('optimizeSink: the sink has no convection.h input');
      return input.scale(factor);
    },
  };
}

function limitingSource(rises: readonly number[], limits: readonly (number | null)[] | null, ambient: number): number {
  let j = 0;
  let worst = Number.NEGATIVE_INFINITY;
  rises.forEach((r, i) => {
    const l = limits?.[i];
    if (l !== null && l !== undefined && ambient + r - l > worst) [j, worst] = [i, ambient + r - l];
  });
  return j;
}

/** A 7-value log grid over [a, b]; the values either side of the lowest. */
async function logBracket(f: (x: number) => Promise<number>, a: number, b: number, label: string): Promise<[number, number]> {
  const xs = Array.from({ length: 7 }, (_, i) => a * (b / a) ** (i / 6));
  const fs: number[] = [];
  for (const x of xs) fs.push(await f(x));
  let best = -1;
  fs.forEach((v, i) => {
    if (Number.isFinite(v) && (best < 0 || v < (fs[best] as number))) best = i;
  });
  if (best < 0) throw new UsageError(`${label}: the sink is invalid over the whole range`);
  return [xs[Math.max(0, best - 1)] as number, xs[Math.min(xs.length - 1, best + 1)] as number];
}

/** The root of a decreasing excess g on [a, b] (log-space bisection to 1e-5), or a usage error. */
async function rootOnLog(g: (x: number) => Promise<number>, a: number, b: number, labels: OptimizeSinkRequest['labels'], key: string): Promise<number> {
  const ga = await g(a);
  const gb = await g(b);
  if (!(gb <= 0)) throw new UsageError(`${labels.temperature}: the limit is not kept with ${key} up to ${mm(b)} by the shortcut; widen ${labels.bounds}`);
  if (ga <= 0) return a;
  let [lo, hi] = [a, b];
  while (hi - lo > 1e-5 * hi) {
    const mid = Math.sqrt(lo * hi);
    if ((await g(mid)) <= 0) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** The root of g near x0 (g > 0 below it): bracketed by steps of 10 % from x0, then Brent's root to relTol. */
function rootNear(g: (x: number) => number, x0: number, a: number, b: number, relTol: number, labels: OptimizeSinkRequest['labels'], key: string): number {
  let lo = Math.max(a, x0 / 1.1);
  let hi = Math.min(b, x0 * 1.1);
  for (let i = 0; i < 40 && !(g(hi) <= 0); i++) {
    if (hi >= b) throw new UsageError(`${labels.temperature}: the limit is not kept with ${key} up to ${mm(b)} by the reference; widen ${labels.bounds}`);
    lo = hi;
    hi = Math.min(b, hi * 1.1);
  }
  for (let i = 0; i < 40 && g(lo) <= 0; i++) {
    if (lo <= a) return a;
    hi = lo;
    lo = Math.max(a, lo / 1.1);
  }
  const x = brentRoot(g, lo, hi, { xTolerance: relTol * lo });
  // The answer keeps the limit: Brent may end on either side of the root, within its tolerance.
  return g(x) <= 0 ? x : Math.min(b, x * (1 + relTol));
}

function notReached(
  labels: OptimizeSinkRequest['labels'],
  key: string,
  lo: number,
  hi: number,
  at: SinkReferenceValue | null,
  excess: (r: readonly number[]) => number,
): UsageError {
  const over = at === null ? 'the sink is invalid there' : `still ${excess(at.sourceRise_K).toPrecision(3)} K over`;
  return new UsageError(
    `${labels.temperature}: the limit is not kept with ${key} up to ${hi} (from ${lo}; at ${hi}: ${over}); widen ${labels.bounds} or raise the limit`,
  );
}
