/**
 * Searches over an integer (a heat sink's fin count) where every value is a whole refinement study, so the
 * number of values looked at is what counts. Both start from a guess (the shortcut's answer, found by an exhaustive
 * scan of the bounds since the shortcut costs milliseconds a value) and cache every value.
 *
 * integerMinimize: the minimum of f on the integers lo..hi, for an f unimodal on them: from the start, the
 *   descending side (the start's two neighbours), steps doubling that way until f rises or the bound is reached
 *   (a bracket), then golden-section steps on the integers (the bracket shrinks by about 0.618 a step, Kiefer 1953,
 *   "Sequential minimax search for a maximum", Proc. AMS 4(3):502-506, on a lattice) down to three values, and last a
 *   walk to a neighbour while one is lower, so the answer is a local minimum on the integers: f(n - 1) >= f(n) and
 *   f(n + 1) >= f(n) (within the bounds). When the start is already one, three values suffice.
 * integerFewest: the least n in lo..hi with ok(n), for an ok that stays true once true (a sink's hottest rise falls
 *   as fins are added at a constant h): bisection, its first probes the start and the start minus one, so a good
 *   guess ends it in two values; at most 2 + ceil(log2(hi - lo)) values.
 */

export interface IntegerMinimum {
  n: number;
  f: number;
  /** Values of f computed (distinct n). */
  evaluations: number;
}

export async function integerMinimize(f: (n: number) => number | Promise<number>, lo: number, hi: number, start: number): Promise<IntegerMinimum> {
  if (!(Number.isInteger(lo) && Number.isInteger(hi) && lo <= hi)) throw new RangeError(`integerMinimize: bad bounds ${lo}..${hi}`);
  const cache = new Map<number, number>();
  const val = async (n: number): Promise<number> => {
    const known = cache.get(n);
    if (known !== undefined) return known;
    const v = await f(n);
    const w = Number.isNaN(v) ? Number.POSITIVE_INFINITY : v;
    cache.set(n, w);
    return w;
  };
  const clamp = (n: number): number => Math.min(hi, Math.max(lo, Math.round(n)));
  const s = clamp(start);
  const fs = await val(s);
  const left = s > lo ? await val(s - 1) : Number.POSITIVE_INFINITY;
  const right = s < hi ? await val(s + 1) : Number.POSITIVE_INFINITY;
  let best = s;
  if (!(fs <= left && fs <= right)) {
    // Bracket: step doubling in the descending direction.
    const dir = right < left ? 1 : -1;
    let prev = s;
    let cur = s + dir;
    let step = 1;
    let end: number;
    for (;;) {
      step *= 2;
      const next = clamp(cur + dir * step);
      if (next === cur) {
        end = cur;
        break;
      }
      if ((await val(next)) > (await val(cur))) {
        end = next;
        break;
      }
      prev = cur;
      cur = next;
    }
    let a = Math.min(prev, end);
    let c = Math.max(prev, end);
    // Golden section on the integers down to three values.
    while (c - a > 2) {
      let m1 = a + Math.round(0.381966 * (c - a));
      let m2 = a + Math.round(0.618034 * (c - a));
      if (m1 === m2) m2 = m1 + 1;
      if (m1 <= a) m1 = a + 1;
      if (m2 >= c) m2 = c - 1;
      if (m1 >= m2) break;
      if ((await val(m1)) <= (await val(m2))) c = m2;
      else a = m1;
    }
    best = a;
    for (let n = a; n <= c; n++) if ((await val(n)) < (await val(best))) best = n;
  }
  // Walk to a lower neighbour while there is one (a local minimum on the integers).
  for (;;) {
    const here = await val(best);
    const down = best > lo ? await val(best - 1) : Number.POSITIVE_INFINITY;
    const up = best < hi ? await val(best + 1) : Number.POSITIVE_INFINITY;
    if (down < here && down <= up) best -= 1;
    else if (up < here) best += 1;
    else break;
  }
  return { n: best, f: await val(best), evaluations: cache.size };
}

export interface IntegerFewest {
  /** The least n that is ok, or null when hi is not. */
  n: number | null;
  evaluations: number;
}

export async function integerFewest(ok: (n: number) => boolean | Promise<boolean>, lo: number, hi: number, start: number): Promise<IntegerFewest> {
  if (!(Number.isInteger(lo) && Number.isInteger(hi) && lo <= hi)) throw new RangeError(`integerFewest: bad bounds ${lo}..${hi}`);
  const cache = new Map<number, boolean>();
  const test = async (n: number): Promise<boolean> => {
    const known = cache.get(n);
    if (known !== undefined) return known;
    const v = await ok(n);
    cache.set(n, v);
    return v;
  };
  // Invariant: bad < answer <= good (bad = lo - 1 when nothing is known to fail).
  let bad = lo - 1;
  let good = hi + 1;
  const s = Math.min(hi, Math.max(lo, Math.round(start)));
  for (const probe of [s, s - 1]) {
    if (probe < lo || probe > hi || probe <= bad || probe >= good) continue;
    if (await test(probe)) good = probe;
    else bad = probe;
  }
  if (good > hi) {
    if (await test(hi)) good = hi;
    else return { n: null, evaluations: cache.size };
  }
  while (good - bad > 1) {
    const mid = Math.floor((bad + good) / 2);
    if (await test(mid)) good = mid;
    else bad = mid;
  }
  return { n: good <= hi ? good : null, evaluations: cache.size };
}
