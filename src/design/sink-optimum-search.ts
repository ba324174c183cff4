/**
 * The answer `optimize` finds for a heat sink (optimize-sink.ts), on the shortcut and on the fd-3d reference:
 *   max-heat   the lowest hottest-source rise: count, the shortcut by an exhaustive scan and the reference by an
 *              integer search from it (integer-search.ts), then confirmed on the default study; thickness, Brent's
 *              method on the shortcut, then on the reference's search study from a bracket around the shortcut's
 *              optimum, then on the default study within +-5 %;
 *   required   the fewest (or thinnest) fins that keep every limit: count, an exhaustive scan of the shortcut and
 *              integer searches of the reference, with the answer again at h x 0.75 and x 1.25; thickness, a root of
 *              the excess over the limit (bisection on the shortcut, Brent on the reference) and d ln t / d ln h by
 *              the implicit function theorem from central differences (relative step 1e-2).
 */
import { sinkNumericInputs, type HeatSinkCase } from '../case/index.js';
import { UsageError } from '../errors.js';
import { brentMinimize } from './brent-minimize.js';
import { integerFewest, integerMinimize } from './integer-search.js';
import type { SinkOptimizer, SinkReferenceValue, SinkShortcutModel, SinkStudyKind } from './sink-candidates.js';
import { limitingSource, logBracket, notReached, rootNear, rootOnLog } from './sink-limit-roots.js';
import type { OptimizeSinkRequest, OptimizeSinkResult } from './sink-optimize-types.js';
import type { SinkSearchSpace } from './sink-search-space.js';

const H_FACTORS = [0.75, 1.25] as const;
const FD_STEP = 1e-2;

/** The values a search asks for at a value x of the varied key. */
export interface SinkEvaluators {
  opt: SinkOptimizer;
  ref: (x: number, kind: SinkStudyKind) => SinkReferenceValue | null;
  refRise: (x: number, kind: SinkStudyKind) => number;
  shortRise: (x: number) => Promise<number>;
}

/** The answer on the reference (default study), on its search study, and on the shortcut. */
export interface SinkAnswer {
  refX: number;
  searchX: number;
  shortX: number;
  method: string;
  hSensitivity: OptimizeSinkResult['hSensitivity'];
  notes: string[];
}

export async function maxHeatAnswer(
  space: SinkSearchSpace,
  ev: SinkEvaluators,
  labels: OptimizeSinkRequest['labels'],
  shortcutModel: SinkShortcutModel,
): Promise<SinkAnswer> {
  const { key, isCount, lo, hi } = space;
  const { refRise, shortRise } = ev;
  const notes: string[] = [];
  let refX: number;
  let shortX: number;
  let searchX: number;
  let method: string;
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
  return { refX, searchX, shortX, method, hSensitivity: null, notes };
}

export async function requiredAnswer(
  space: SinkSearchSpace,
  ev: SinkEvaluators,
  labels: OptimizeSinkRequest['labels'],
  shortcutModel: SinkShortcutModel,
  c0: HeatSinkCase,
): Promise<SinkAnswer> {
  const { key, isCount, lo, hi, dims, excess, limits, ambient, dependent } = space;
  const { opt, ref } = ev;
  const notes: string[] = [];
  let refX: number;
  let shortX: number;
  let searchX: number;
  let method: string;
  let hSensitivity: OptimizeSinkResult['hSensitivity'];
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
  return { refX, searchX, shortX, method, hSensitivity, notes };
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
