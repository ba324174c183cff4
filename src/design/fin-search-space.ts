/**
 * The space `optimize` searches for one fin (optimize-fin.ts): the varied keys (one, or two for min-material), what
 * is held (profile-area, volume, mass or none) and the key solved to hold it (the length, or the section size when
 * the length varies), the bounds (given, or 1/4 to 4 times the case's value), and the full dimensions of a candidate
 * with the held key solved by Brent's root finder. Every refusal is a usage error naming the input.
 */
import { formatKeyPath, parseKeyPath } from '../case/index.js';
import { brentRoot } from '../analytic/index.js';
import { UsageError } from '../errors.js';
import { caseValue, type FinOptimizer } from './fin-candidates.js';
import { amountOf, type Keep } from './fin-amount.js';
import type { OptimizeRequest } from './fin-optimize-types.js';

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

export interface FinSearchSpace {
  keep: Keep;
  /** The varied keys, normalised; key is the first (the one searched), second the other of min-material. */
  vary: string[];
  key: string;
  second: string | undefined;
  bounds: Map<string, [number, number]>;
  lo: number;
  hi: number;
  /** The key solved to hold the amount, or null. */
  dependent: string | null;
  /** The full set of dimensions for the varied values (the dependent one solved), or null where it has no root. */
  dims: (values: ReadonlyMap<string, number>) => Map<string, number> | null;
}

export function finSearchSpace(request: OptimizeRequest, opt: FinOptimizer): FinSearchSpace {
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

  const [key, second] = vary as [string, string | undefined];
  const [lo, hi] = bounds.get(key) as [number, number];
  return { keep, vary, key, second, bounds, lo, hi, dependent, dims };
}
