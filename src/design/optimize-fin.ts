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
import { initBessel } from '../analytic/index.js';
import { UsageError } from '../errors.js';
import { FinOptimizer, shortcutHeat } from './fin-candidates.js';
import { amountOf } from './fin-amount.js';
import { finAnswer, finEvaluators } from './fin-optimum-search.js';
import type { OptimizeCurve, OptimizeRequest, OptimizeResult } from './fin-optimize-types.js';
import { finSearchSpace } from './fin-search-space.js';
import { fmtMm } from './format-mm.js';

export type { Objective, OptimizeCurve, OptimizeRequest, OptimizeResult, OptimumPoint } from './fin-optimize-types.js';

/** Points of the chart's curves: a log grid over the bounds (common practice, no source: enough to show the hump). */
const CURVE_POINTS = 25;

export async function optimizeFin(request: OptimizeRequest): Promise<OptimizeResult> {
  await initBessel();
  const opt = new FinOptimizer(request);
  const c0 = opt.base;
  const { labels } = request;
  const space = finSearchSpace(request, opt);
  const { keep, vary, key, second, bounds, lo, hi, dependent } = space;
  const ev = finEvaluators(space, opt);
  const { check, referenceHeat, shortcutHeatAt } = ev;
  /** Which model the reference is at the case's own dimensions under the choice asked (auto: fd-2d where it covers the fin). */
  const own = await opt.evaluate(new Map(), request.reference);
  if (own === null) throw new Error('optimizeFin: the case itself did not parse twice');
  const finalModel = own.report.reference.model;
  const answer = await finAnswer(request, space, ev, opt, finalModel);
  const { refX, shortX, method, secondValues, shortHeatOwn } = answer;
  const notes = [...answer.notes];

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
