/**
 * The answer `optimize` finds for one fin (optimize-fin.ts), on the reference and on the shortcut:
 *   max-heat      Brent's minimiser on -Q over the bounds, first on fd-1d (cheap), then, when the reference is fd-2d,
 *                 on fd-2d within +-25 % of the fd-1d optimum; the shortcut's optimum from the published closed form
 *                 where one covers the case (closed-form-optimum.ts), else the tanh(mLc)/(mLc) shortcut maximised;
 *   required      Brent's root of Q(x) = Q_required on the bounds (root-on.ts);
 *   min-material  one key as required; two keys: Brent's minimiser of the material over the first key, the second
 *                 solved at each step so that Q = Q_required (fd-1d), the answer then checked with the reference.
 * Every candidate is a log-grid bracket (7 values) before Brent, so the search starts on the right hump.
 */
import { UsageError } from '../errors.js';
import { brentMinimize } from './brent-minimize.js';
import { closedFormOptimum } from './closed-form-optimum.js';
import { shortcutHeat, type Evaluation, type FinOptimizer } from './fin-candidates.js';
import { amountOf } from './fin-amount.js';
import type { OptimizeRequest } from './fin-optimize-types.js';
import type { FinSearchSpace } from './fin-search-space.js';
import { fmtMm } from './format-mm.js';
import { rootOn } from './root-on.js';

export interface FinEvaluators {
  /** One candidate's check: the varied values plus the dependent dimension; null where the case is invalid. */
  check: (values: ReadonlyMap<string, number>, reference: 'auto' | '1d' | '2d') => Promise<{ d: Map<string, number>; e: Evaluation } | null>;
  /** The reference's and the shortcut's heat rate at a value of the first key, W (NaN where invalid). */
  referenceHeat: (x: number, reference: 'auto' | '1d' | '2d') => Promise<number>;
  shortcutHeatAt: (x: number) => Promise<number>;
}

export function finEvaluators(space: FinSearchSpace, opt: FinOptimizer): FinEvaluators {
  const { dims, key } = space;
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
  return { check, referenceHeat, shortcutHeatAt };
}

export interface FinAnswer {
  refX: number;
  shortX: number;
  method: string;
  /** min-material with two keys: the second key at each answer. */
  secondValues: { reference: number; shortcut: number } | null;
  /** The shortcut's own heat at its optimum when the published solution gives it. */
  shortHeatOwn: number | null;
  notes: string[];
}

/** The answer for the request's objective; `finalModel` is the reference's model at the case's own dimensions. */
export async function finAnswer(
  request: OptimizeRequest,
  space: FinSearchSpace,
  ev: FinEvaluators,
  opt: FinOptimizer,
  finalModel: string,
): Promise<FinAnswer> {
  const { labels } = request;
  const { key, second, lo, hi, bounds, keep, dependent } = space;
  const { check, referenceHeat, shortcutHeatAt } = ev;
  const c0 = opt.base;
  const notes: string[] = [];
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

  return { refX, shortX, method, secondValues, shortHeatOwn, notes };
}
