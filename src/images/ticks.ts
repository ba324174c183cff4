/**
 * Round tick values for axes and colour bars.
 *
 * Linear axes: P. S. Heckbert (1990), "Nice numbers for graph labels", in Graphics Gems
 * (A. Glassner, ed.), Academic Press, pp. 61-63. nicenum(x, round) picks 1, 2, 5 or 10 times a
 * power of ten; the tick spacing is nicenum(nicenum(range, false) / (nTicks - 1), true) and the
 * number of decimals shown is max(-floor(log10(spacing)), 0).
 * "loose" labelling (Heckbert's) widens the domain to the enclosing multiples of the spacing;
 * "inside" keeps the data range as the domain and lists the multiples that fall inside it.
 *
 * Log axes: majors at powers of ten; when the range spans fewer than three decades also at
 * 2 and 5 times each power (and when under one decade, at every integer multiple), so that at
 * least two labelled ticks show. Minors at the integer multiples 2..9 of each decade.
 */

export type TickMode = 'loose' | 'inside';

export interface LinearTicks {
  /** Tick values, ascending, rounded to `decimals`. */
  values: number[];
  /** Spacing between ticks (1, 2 or 5 times a power of ten). */
  step: number;
  /** Decimals needed to print every tick exactly (Heckbert's nfrac). */
  decimals: number;
  /** Axis domain: the enclosing tick values ("loose") or the data range ("inside"). */
  domain: [number, number];
}

export interface LogTicks {
  /** Labelled ticks inside the domain, ascending. */
  major: number[];
  /** Unlabelled ticks inside the domain, ascending. */
  minor: number[];
  /** Axis domain: powers of ten enclosing the data ("loose") or the data range ("inside"). */
  domain: [number, number];
}

/** Heckbert's nicenum: a "nice" number near x (x > 0); rounded when `round`, otherwise the ceiling. */
export function niceNumber(x: number, round: boolean): number {
  const exponent = Math.floor(Math.log10(x));
  const power = 10 ** exponent;
  const fraction = x / power;
  let nice: number;
  if (round) nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * power;
}

/** Rounds to `decimals` decimals, removing the binary noise of k * step. */
function roundTo(value: number, decimals: number): number {
  const p = 10 ** decimals;
  const r = Math.round(value * p) / p;
  return r === 0 ? 0 : r;
}

/** A degenerate or reversed range made into a usable one. */
function widenRange(min: number, max: number): [number, number] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) throw new RangeError(`ticks: range [${min}, ${max}] is not finite`);
  const lo = Math.min(min, max);
  const hi = Math.max(min, max);
  if (hi - lo > Math.abs(hi) * 1e-12) return [lo, hi];
  const pad = lo === 0 ? 1 : Math.abs(lo) * 0.05;
  return [lo - pad, hi + pad];
}

/**
 * Linear ticks over [min, max] with about `targetCount` ticks (Heckbert 1990). In "inside" mode a
 * range that holds fewer than two multiples of the spacing is retried with more, finer ticks, so an
 * axis always shows at least two labels.
 */
export function linearTicks(min: number, max: number, targetCount = 6, mode: TickMode = 'loose'): LinearTicks {
  let ticks = heckbertTicks(min, max, targetCount, mode);
  for (let count = Math.max(2, Math.round(targetCount)) + 1; ticks.values.length < 2 && count <= 40; count++) {
    ticks = heckbertTicks(min, max, count, mode);
  }
  return ticks;
}

function heckbertTicks(min: number, max: number, targetCount: number, mode: TickMode): LinearTicks {
  const [lo, hi] = widenRange(min, max);
  const count = Math.max(2, Math.round(targetCount));
  const range = niceNumber(hi - lo, false);
  const step = niceNumber(range / (count - 1), true);
  const decimals = Math.max(-Math.floor(Math.log10(step)), 0);
  // Tolerance of 1e-9 steps so that a data end lying on a multiple of step (up to rounding) counts as on it.
  const eps = 1e-9;
  const first = mode === 'loose' ? Math.floor(lo / step + eps) : Math.ceil(lo / step - eps);
  const last = mode === 'loose' ? Math.ceil(hi / step - eps) : Math.floor(hi / step + eps);
  const values: number[] = [];
  for (let k = first; k <= last; k++) values.push(roundTo(k * step, decimals));
  const domain: [number, number] = mode === 'loose' ? [roundTo(first * step, decimals), roundTo(last * step, decimals)] : [lo, hi];
  return { values, step, decimals, domain };
}

/** Log ticks over [min, max], both > 0. */
export function logTicks(min: number, max: number, mode: TickMode = 'loose'): LogTicks {
  if (!(min > 0) || !(max > 0)) throw new RangeError(`ticks: a log axis needs positive limits, got [${min}, ${max}]`);
  const [low, hi] = widenRange(min, max);
  const lo = low <= 0 ? min * 0.95 : low;
  const eps = 1e-9;
  const firstDecade = Math.floor(Math.log10(lo) + eps);
  const lastDecade = Math.ceil(Math.log10(hi) - eps);
  const domain: [number, number] = mode === 'loose' ? [10 ** firstDecade, 10 ** lastDecade] : [lo, hi];
  const decades = Math.log10(domain[1] / domain[0]);
  const majorMultiples = decades >= 3 ? [1] : decades >= 1 ? [1, 2, 5] : [1, 2, 3, 4, 5, 6, 7, 8, 9];
  const inside = (v: number): boolean => v >= domain[0] * (1 - eps) && v <= domain[1] * (1 + eps);
  const major: number[] = [];
  const minor: number[] = [];
  for (let d = firstDecade; d <= lastDecade; d++) {
    for (let k = 1; k <= 9; k++) {
      // k * 10^d written through toPrecision to avoid 3 * 0.1 = 0.30000000000000004.
      const value = Number((k * 10 ** d).toPrecision(12));
      if (!inside(value)) continue;
      if (majorMultiples.includes(k)) major.push(value);
      else minor.push(value);
    }
  }
  return { major, minor, domain };
}

/** A tick label: fixed decimals, a true minus sign (U+2212) for negatives. */
export function formatTick(value: number, decimals: number): string {
  const text = roundTo(value, decimals).toFixed(decimals);
  return text.startsWith('-') ? `\u2212${text.slice(1)}` : text;
}

/** A label for a log-axis tick: as many decimals as the value needs (0.05, 2, 500). */
export function formatLogTick(value: number): string {
  const decimals = Math.max(0, -Math.floor(Math.log10(value) + 1e-9));
  return formatTick(value, decimals);
}
