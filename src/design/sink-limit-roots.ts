/**
 * The searches `optimize` runs on a heat sink's dimension (optimize-sink.ts): a 7-value log bracket around the lowest
 * value, the root of a decreasing excess over a limit by bisection in log space (the shortcut, async), the root near a
 * start by 10 % steps then Brent's method (the reference, synchronous), the limiting source, and the error when a limit
 * is not kept within the bounds.
 */
import { brentRoot } from '../analytic/index.js';
import { UsageError } from '../errors.js';
import { fmtMm } from './format-mm.js';
import type { SinkReferenceValue } from './sink-candidates.js';
import type { OptimizeSinkRequest } from './sink-optimize-types.js';

/** The source whose mean temperature is furthest over (or least under) its limit. */
export function limitingSource(rises: readonly number[], limits: readonly (number | null)[] | null, ambient: number): number {
  let j = 0;
  let worst = Number.NEGATIVE_INFINITY;
  rises.forEach((r, i) => {
    const l = limits?.[i];
    if (l !== null && l !== undefined && ambient + r - l > worst) [j, worst] = [i, ambient + r - l];
  });
  return j;
}

/** A 7-value log grid over [a, b]; the values either side of the lowest. */
export async function logBracket(f: (x: number) => Promise<number>, a: number, b: number, label: string): Promise<[number, number]> {
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
export async function rootOnLog(
  g: (x: number) => Promise<number>,
  a: number,
  b: number,
  labels: OptimizeSinkRequest['labels'],
  key: string,
): Promise<number> {
  const ga = await g(a);
  const gb = await g(b);
  if (!(gb <= 0))
    throw new UsageError(`${labels.temperature}: the limit is not kept with ${key} up to ${fmtMm(b)} by the shortcut; widen ${labels.bounds}`);
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
export function rootNear(
  g: (x: number) => number,
  x0: number,
  a: number,
  b: number,
  relTol: number,
  labels: OptimizeSinkRequest['labels'],
  key: string,
): number {
  let lo = Math.max(a, x0 / 1.1);
  let hi = Math.min(b, x0 * 1.1);
  for (let i = 0; i < 40 && !(g(hi) <= 0); i++) {
    if (hi >= b)
      throw new UsageError(`${labels.temperature}: the limit is not kept with ${key} up to ${fmtMm(b)} by the reference; widen ${labels.bounds}`);
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

export function notReached(
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
