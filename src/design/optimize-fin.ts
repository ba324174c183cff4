/**
 * `optimize` for one fin: the dimensions that give the most heat for the material kept, the least material for a
 * required heat rate, or the size that removes a required heat rate, from the shortcut and from the numerical
 * reference, and what the shortcut's optimum loses against the reference's (design-questions.md).
 *
 * Every candidate is the user's case with the dimensions written in by key path (in m, as if typed into the file),
 * validated again, and checked by the same pipeline as `fincheck check` (runCheck without the ledger): its
 * reference heat rate (a resolved refinement study, fd-1d or fd-2d) and the tanh(mLc)/(mLc) shortcut's row.
 * - The constraint: `profile-area` or `volume` (or `mass`: with one material a constant mass is a constant volume)
 *   is held by solving for the fin's length (or, when the length is what varies, its thickness or diameter) with
 *   Brent's root finder; `none` keeps nothing.
 * - max-heat, one varied key: Brent's minimiser (brent-minimize.ts) on -Q over the bounds, first on fd-1d
 *   (cheap), then, when the reference is fd-2d, on fd-2d inside a bracket of +-25 % around the fd-1d optimum.
 * - required (one key): Brent's root of Q(x) = Q_required on the bounds (Q must change sign on them).
 * - min-material: one key as required (the smallest value that reaches Q when the amount grows with it); two keys:
 *   the outer Brent minimiser over the first key, the second solved at each step so that Q = Q_required, the
 *   amount of material minimised.
 * The shortcut's optimum: the published closed form where one exists for the case (Schmidt 1926 for a rectangular
 * fin at constant profile area; the optimum triangular, parabolic and pin fins; optimum.ts), else the tanh-Lc
 * shortcut optimised the same way as the reference.
 */
import { formatKeyPath, parseKeyPath } from '../case/index.js';
import { brentRoot, initBessel } from '../analytic/index.js';
import { UsageError } from '../errors.js';
import { caseValue, FinOptimizer, shortcutHeat, type Evaluation } from './fin-candidates.js';
import { brentMinimize } from './brent-minimize.js';
import { amountOf, type Keep } from './fin-amount.js';
import { closedFormOptimum } from './closed-form-optimum.js';
import { fmtMm } from './format-mm.js';
import { rootOn } from './root-on.js';

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

/** Points of the chart's curves: a log grid over the bounds (common practice, no source: enough to show the hump). */
const CURVE_POINTS = 25;

/** Which key holds the amount for a profile: the length unless it is varied, then the section size. */
const SIZE_KEYS: Record<string, string> = {
  rectangular: 'fin.thickness',
  trapezoidal: 'fin.baseThickness',
  triangular: 'fin.baseThickness',
  'parabolic-concave': 'fin.baseThickness',
  'parabolic-convex': 'fin.baseThickness',
  pin: 'fin.diameter',
  'conical-pin': 'fin.baseDiameter',
  annular: 'fin.thickness',
};

const VARIABLE = /^fin\.(length|thickness|width|diameter|baseThickness|tipThickness|baseDiameter|tipDiameter|outerRadius)$/;

export async function optimizeFin(request: OptimizeRequest): Promise<OptimizeResult> {
  await initBessel();
  const opt = new FinOptimizer(request);
  const c0 = opt.base;
  const { labels } = request;
  const pin = c0.fin.profile.kind === 'pin' || c0.fin.profile.kind === 'conical-pin';
  const keep: Keep = request.keep !== 'default' ? request.keep : request.objective.kind === 'max-heat' ? (pin ? 'volume' : 'profile-area') : 'none';
  if (request.vary.length === 0 || request.vary.length > 2)
    throw new UsageError(`${labels.vary}: give one key, or two for min-material (got ${request.vary.length})`);
  if (request.vary.length === 2 && request.objective.kind !== 'min-material') {
    throw new UsageError(
      `${labels.vary}: two keys are taken for min-material only (the least material for a required heat); vary one key for ${request.objective.kind}`,
    );
  }
  if (request.curve === true && request.vary.length !== 1)
    throw new UsageError(`${labels.out ?? 'curve'}: the chart shows one varied key; vary one key to draw it`);
  const vary = request.vary.map((k) => formatKeyPath(parseKeyPath(k)));
  for (const key of vary) {
    if (!VARIABLE.test(key))
      throw new UsageError(
        `${labels.vary}: ${key} is not a dimension of the fin; vary one of fin.length, fin.thickness, fin.diameter, fin.baseThickness, fin.tipThickness, fin.baseDiameter, fin.tipDiameter, fin.width, fin.outerRadius`,
      );
    if (caseValue(c0, key) === undefined) throw new UsageError(`${labels.vary}: this ${c0.fin.profile.kind} fin has no ${key}`);
  }
  if (keep !== 'none' && request.objective.kind !== 'max-heat') {
    throw new UsageError(
      `${labels.keep}: ${keep} is for max-heat (the most heat from a fixed amount of material); ${request.objective.kind} varies the amount, use none`,
    );
  }
  if (keep === 'none' && request.objective.kind === 'max-heat') {
    throw new UsageError(`${labels.keep}: max-heat needs a constraint (profile-area, volume or mass): with none, the heat only grows with the dimensions`);
  }
  const lengthKey = c0.fin.profile.kind === 'annular' ? 'fin.outerRadius' : 'fin.length';
  const sizeKey = SIZE_KEYS[c0.fin.profile.kind];
  const dependent = keep === 'none' ? null : vary.includes(lengthKey) ? (sizeKey ?? null) : lengthKey;
  if (keep !== 'none' && (dependent === null || vary.includes(dependent))) {
    throw new UsageError(
      `${labels.keep}: cannot hold the ${keep} of a ${c0.fin.profile.kind} fin while varying ${vary.join(', ')}; vary fin.length or the thickness`,
    );
  }

  const bounds = new Map<string, [number, number]>();
  for (const key of vary) {
    const own = caseValue(c0, key) as number;
    const given = request.bounds.get(key);
    if (given && !(given[0] > 0 && given[1] > given[0])) throw new UsageError(`${labels.bounds}: ${key}: expected 0 < FROM < TO`);
    bounds.set(key, given ? [given[0], given[1]] : [own / 4, own * 4]);
  }
  for (const key of request.bounds.keys())
    if (!vary.includes(formatKeyPath(parseKeyPath(key))))
      throw new UsageError(`${labels.bounds}: ${key} is not among the varied keys (${vary.join(', ')})`);

  const target = amountOf(c0, keep);
  /** The full set of dimensions for the varied values: the dependent one solved to keep the amount. */
  const dims = (values: ReadonlyMap<string, number>): Map<string, number> | null => {
    const all = new Map(values);
    if (dependent === null || target === null) return all;
    const own = caseValue(c0, dependent) as number;
    const amount = (v: number): number => {
      const c = opt.caseWith(new Map([...all, [dependent, v]]));
      return c === null ? Number.NaN : (amountOf(c, keep) as number) - target;
    };
    let lo = own / 2;
    let hi = own * 2;
    for (let i = 0; i < 40 && !(amount(lo) < 0); i++) lo /= 2;
    for (let i = 0; i < 40 && !(amount(hi) > 0); i++) hi *= 2;
    if (!(amount(lo) < 0 && amount(hi) > 0)) return null;
    all.set(dependent, brentRoot(amount, lo, hi, { xTolerance: own * 1e-12 }));
    return all;
  };

  const notes: string[] = [];
  const [key, second] = vary as [string, string | undefined];
  const [lo, hi] = bounds.get(key) as [number, number];

  /** One candidate's check: the varied values plus the dependent dimension; null where the case is invalid. */
  const check = async (
    values: ReadonlyMap<string, number>,
    reference: 'auto' | '1d' | '2d',
  ): Promise<{ d: Map<string, number>; e: Evaluation } | null> => {
    const d = dims(values);
    if (d === null) return null;
    const e = await opt.evaluate(d, reference);
    return e === null ? null : { d, e };
  };
  const referenceHeat = async (x: number, reference: 'auto' | '1d' | '2d'): Promise<number> => {
    const r = await check(new Map([[key, x]]), reference);
    return r === null ? Number.NaN : r.e.report.reference.heatRate_W;
  };
  const shortcutHeatAt = async (x: number): Promise<number> => {
    const r = await check(new Map([[key, x]]), '1d');
    return r === null ? Number.NaN : shortcutHeat(r.e.report);
  };
  /** Which model the reference is at the case's own dimensions under the choice asked (auto: fd-2d where it covers the fin). */
  const own = await opt.evaluate(new Map(), request.reference);
  if (own === null) throw new Error('optimizeFin: the case itself did not parse twice');
  const finalModel = own.report.reference.model;

  // Bracket on a log grid first (7 values), so Brent starts on the right hump and an invalid end is known.
  const bracketed = async (f: (x: number) => Promise<number>, a: number, b: number): Promise<[number, number]> => {
    const xs = Array.from({ length: 7 }, (_, i) => a * (b / a) ** (i / 6));
    const fs: number[] = [];
    for (const x of xs) fs.push(await f(x));
    let best = -1;
    fs.forEach((v, i) => {
      if (!Number.isNaN(v) && (best < 0 || v < (fs[best] as number))) best = i;
    });
    if (best < 0) throw new UsageError(`${labels.bounds}: ${key}: the case is invalid over the whole range ${a}..${b} m`);
    return [xs[Math.max(0, best - 1)] as number, xs[Math.min(xs.length - 1, best + 1)] as number];
  };
  const penalised = (f: (x: number) => Promise<number>) => async (x: number) => {
    const v = await f(x);
    return Number.isNaN(v) ? Number.POSITIVE_INFINITY : v;
  };

  let refX: number;
  let shortX: number;
  let method: string;
  let secondValues: { reference: number; shortcut: number } | null = null;
  /** The shortcut's own heat at its optimum when the published solution gives it. */
  let shortHeatOwn: number | null = null;

  switch (request.objective.kind) {
    case 'max-heat': {
      // Reference: fd-1d first, then the final model inside +-25 % of the fd-1d optimum.
      const f1 = penalised(async (x) => -(await referenceHeat(x, '1d')));
      const [a1, b1] = await bracketed(f1, lo, hi);
      const x1 = (await brentMinimize(f1, a1, b1, { relTol: 1e-4 })).x;
      if (finalModel === 'fd-1d') refX = x1;
      else {
        const f2 = penalised(async (x) => -(await referenceHeat(x, request.reference)));
        refX = (await brentMinimize(f2, Math.max(lo, x1 / 1.25), Math.min(hi, x1 * 1.25), { relTol: 1e-3 })).x;
        notes.push(`${finalModel}'s optimum searched within ±25 % of fd-1d's (${fmtMm(x1)}); each value a full refinement study`);
      }
      const closed = closedFormOptimum(c0, key, keep, dependent);
      if (closed !== null) {
        shortX = closed.value;
        shortHeatOwn = closed.heatRate_W;
        method = closed.method;
      } else {
        const fs = penalised(async (x) => -(await shortcutHeatAt(x)));
        const [as, bs] = await bracketed(fs, lo, hi);
        shortX = (await brentMinimize(fs, as, bs, { relTol: 1e-4 })).x;
        method = 'the tanh(mLc)/(mLc) shortcut on the equivalent uniform fin, maximised numerically (no published optimum covers this case)';
      }
      break;
    }
    case 'required': {
      if (second !== undefined) throw new UsageError(`${labels.vary}: required takes one key`);
      const q = request.objective.heat_W;
      refX = await rootOn(async (x) => (await referenceHeat(x, request.reference)) - q, lo, hi, key, q, labels);
      shortX = await rootOn(async (x) => (await shortcutHeatAt(x)) - q, lo, hi, key, q, labels);
      method = 'the tanh(mLc)/(mLc) shortcut on the equivalent uniform fin, solved for the required heat rate';
      break;
    }
    case 'min-material': {
      const q = request.objective.heat_W;
      if (second === undefined) {
        refX = await rootOn(async (x) => (await referenceHeat(x, request.reference)) - q, lo, hi, key, q, labels);
        shortX = await rootOn(async (x) => (await shortcutHeatAt(x)) - q, lo, hi, key, q, labels);
      } else {
        const [lo2, hi2] = bounds.get(second) as [number, number];
        // For each value of the first key, the second key that gives Q; then the least material over the first.
        const solveSecond = async (x: number, heat: (v: Map<string, number>) => Promise<number>): Promise<number> =>
          rootOn(
            async (y) =>
              (await heat(
                new Map([
                  [key, x],
                  [second, y],
                ]),
              )) - q,
            lo2,
            hi2,
            second,
            q,
            labels,
          ).catch(() => Number.NaN);
        const refHeat2 = async (v: Map<string, number>) => {
          const r = await check(v, '1d');
          return r === null ? Number.NaN : r.e.report.reference.heatRate_W;
        };
        const shortHeat2 = async (v: Map<string, number>) => {
          const r = await check(v, '1d');
          return r === null ? Number.NaN : shortcutHeat(r.e.report);
        };
        const material = (heat: (v: Map<string, number>) => Promise<number>) =>
          penalised(async (x) => {
            const y = await solveSecond(x, heat);
            if (Number.isNaN(y)) return Number.NaN;
            const c = opt.caseWith(
              new Map([
                [key, x],
                [second, y],
              ]),
            );
            return c === null ? Number.NaN : (amountOf(c, 'volume') as number);
          });
        const fr = material(refHeat2);
        const [ar, br] = await bracketed(fr, lo, hi);
        refX = (await brentMinimize(fr, ar, br, { relTol: 1e-3 })).x;
        const fsh = material(shortHeat2);
        const [ash, bsh] = await bracketed(fsh, lo, hi);
        shortX = (await brentMinimize(fsh, ash, bsh, { relTol: 1e-3 })).x;
        secondValues = { reference: await solveSecond(refX, refHeat2), shortcut: await solveSecond(shortX, shortHeat2) };
        notes.push(
          'two keys: the least-material search uses fd-1d for each candidate (each needs a root solve); the answer is then checked with the reference model',
        );
      }
      method = 'the tanh(mLc)/(mLc) shortcut on the equivalent uniform fin, solved for the required heat rate';
      break;
    }
    default: {
      const never: never = request.objective;
      throw new Error(`optimizeFin: unknown objective ${JSON.stringify(never)}`);
    }
  }

  const pointAt = async (x: number, y: number | null, reference: 'auto' | '1d' | '2d') => {
    const values = new Map([[key, x]]);
    if (second !== undefined && y !== null) values.set(second, y);
    const r = await check(values, reference);
    if (r === null) throw new UsageError(`${labels.vary}: the optimum (${fmtMm(x)}) makes the case invalid; narrow ${labels.bounds}`);
    return r;
  };
  let curve: OptimizeCurve | undefined;
  if (request.curve === true) {
    const x_m = Array.from({ length: CURVE_POINTS }, (_, i) => lo * (hi / lo) ** (i / (CURVE_POINTS - 1)));
    const reference_W: number[] = [];
    const shortcut_W: number[] = [];
    for (const x of x_m) {
      reference_W.push(await referenceHeat(x, '1d'));
      shortcut_W.push(await shortcutHeatAt(x));
    }
    const along = dependent === null ? '' : `, ${dependent} solved to keep the ${keep}`;
    curve = {
      key,
      x_m,
      reference_W,
      shortcut_W,
      model: 'fd-1d',
      note: `${CURVE_POINTS} values of ${key} on a log grid over the bounds${along}; the curves are fd-1d (a resolved study each) and the tanh(mLc)/(mLc) shortcut`,
    };
  }
  const refPoint = await pointAt(refX, secondValues?.reference ?? null, request.reference);
  const shortPoint = await pointAt(shortX, secondValues?.shortcut ?? null, request.reference);
  const shortOwn = await pointAt(shortX, secondValues?.shortcut ?? null, '1d');
  const ref = refPoint.e.report.reference;
  const shortcutAtReference_W = shortPoint.e.report.reference.heatRate_W;
  const amount = (d: Map<string, number>) => {
    const c = opt.caseWith(d);
    return c === null ? null : keep === 'none' ? (amountOf(c, 'volume') as number) : amountOf(c, keep);
  };
  const loss =
    request.objective.kind === 'max-heat'
      ? 1 - shortcutAtReference_W / ref.heatRate_W
      : ((amount(shortPoint.d) ?? Number.NaN) - (amount(refPoint.d) ?? Number.NaN)) / (amount(refPoint.d) ?? Number.NaN);
  if (!ref.resolved)
    notes.push(
      `the reference at the optimum is not resolved (its discretisation error ${ref.discretizationError?.toExponential(1)} is above a tenth of the tolerance): treat the optimum as indicative`,
    );
  if (request.objective.kind !== 'max-heat')
    notes.push("loss = the shortcut's amount of material over the reference's, minus 1 (positive: the shortcut asks for more material)");
  if (keep === 'mass') notes.push('mass: one material at a fixed density, so a constant mass is a constant volume');
  for (const [k, [a, b]] of bounds) {
    for (const [name, x] of [
      ['reference', refX],
      ['shortcut', shortX],
    ] as const) {
      if (k === key && (x < a * 1.001 || x > b / 1.001))
        notes.push(`the ${name} optimum lies at a bound of ${k} (${fmtMm(a)} to ${fmtMm(b)}): widen ${labels.bounds}`);
    }
  }

  return {
    case: c0.name,
    objective: request.objective.kind,
    requiredHeat_W: request.objective.kind === 'max-heat' ? null : request.objective.heat_W,
    keep: keep,
    vary,
    dependent,
    bounds: Object.fromEntries([...bounds].map(([k, v]) => [k, [v[0], v[1]]])),
    shortcut: {
      values: Object.fromEntries(shortPoint.d),
      heatRate_W: shortHeatOwn ?? shortcutHeat(shortOwn.e.report),
      amount: amount(shortPoint.d),
      method,
    },
    reference: {
      values: Object.fromEntries(refPoint.d),
      heatRate_W: ref.heatRate_W,
      amount: amount(refPoint.d),
      model: ref.model,
      discretizationError: ref.discretizationError,
      resolved: ref.resolved,
      evaluations: opt.evaluations,
    },
    shortcutAtReference_W,
    loss,
    notes,
    cautions: [...refPoint.e.report.cautions],
    ...(curve === undefined ? {} : { curve }),
  };
}
