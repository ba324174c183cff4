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
import { initBessel } from '../analytic/index.js';
import { CAUTIONS, sinkCautions } from '../compare/index.js';
import { UsageError } from '../errors.js';
import { fmtMm } from './format-mm.js';
import { SEARCH_CELLS_PER_SIDE, SEARCH_STUDY, SinkOptimizer, type SinkReferenceValue, type SinkStudyKind } from './sink-candidates.js';
import { maxHeatAnswer, requiredAnswer, type SinkEvaluators } from './sink-optimum-search.js';
import type { OptimizeSinkRequest, OptimizeSinkResult, SinkCurve, SinkOptimumPoint } from './sink-optimize-types.js';
import { sinkSearchSpace } from './sink-search-space.js';

export type { OptimizeSinkRequest, OptimizeSinkResult, SinkCurve, SinkKeep, SinkObjective, SinkOptimumPoint } from './sink-optimize-types.js';

/** Values of the chart's curve for a thickness (log grid), and the most counts drawn one by one. */
const CURVE_POINTS = 15;
const CURVE_COUNTS = 40;

export async function optimizeSink(request: OptimizeSinkRequest): Promise<OptimizeSinkResult> {
  await initBessel();
  const { labels } = request;
  const shortcutModel = request.shortcutModel ?? 'overall-efficiency';
  const opt = new SinkOptimizer({ caseText: request.caseText, fileName: request.fileName, shortcutModel });
  const c0 = opt.base;
  const space = sinkSearchSpace(request, c0);
  const { key, isCount, keep, dependent, lo, hi, count0, dims, amountOf, gapOf, thicknessOf, ambient, limits, excess } = space;
  const W = space.width;
  const ref = (x: number, kind: SinkStudyKind): SinkReferenceValue | null => opt.reference(dims(x), kind);
  const refRise = (x: number, kind: SinkStudyKind): number => ref(x, kind)?.hottestRise_K ?? Number.NaN;
  const shortRise = async (x: number): Promise<number> => (await opt.shortcut(dims(x)))?.hottestRise_K ?? Number.NaN;
  const ev: SinkEvaluators = { opt, ref, refRise, shortRise };
  const answer =
    request.objective.kind === 'max-heat'
      ? await maxHeatAnswer(space, ev, labels, shortcutModel)
      : await requiredAnswer(space, ev, labels, shortcutModel, c0);
  const { refX, shortX, searchX, method, hSensitivity } = answer;
  const notes = [...answer.notes];

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
  if (isCount && c0.array.kind === 'plates' && c0.array.pitch !== W / count0)
    notes.push(`the case's array.pitch (${fmtMm(c0.array.pitch)}) is dropped while the count varies: the pitch is plate.width / count`);
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
