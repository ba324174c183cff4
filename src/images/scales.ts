/**
 * Scales: maps from data values to SVG coordinates (px), linear or logarithmic.
 * A scale is plain data; `project` and `unproject` are the only functions that read it.
 * For a y axis pass range [bottom, top] so that larger values are drawn higher.
 */

import { formatLogTick, formatTick, linearTicks, logTicks, type TickMode } from './ticks.js';

export type ScaleKind = 'linear' | 'log';

export interface Scale {
  kind: ScaleKind;
  /** Data values at the two ends of the axis. */
  domain: readonly [number, number];
  /** Pixel coordinates of the two ends of the axis. */
  range: readonly [number, number];
}

/** An axis ready to draw: its scale and its ticks with their labels. */
export interface Axis {
  scale: Scale;
  ticks: number[];
  labels: string[];
  minorTicks: number[];
}

function toUnit(kind: ScaleKind, value: number): number {
  switch (kind) {
    case 'linear':
      return value;
    case 'log':
      return Math.log10(value);
    default: {
      const unreachable: never = kind;
      throw new Error(`unknown scale kind ${String(unreachable)}`);
    }
  }
}

/** Data value to px. Values outside the domain map outside the range (clip in SVG). */
export function project(scale: Scale, value: number): number {
  const u0 = toUnit(scale.kind, scale.domain[0]);
  const u1 = toUnit(scale.kind, scale.domain[1]);
  const t = (toUnit(scale.kind, value) - u0) / (u1 - u0);
  return scale.range[0] + t * (scale.range[1] - scale.range[0]);
}

/** px to data value (inverse of `project`). */
export function unproject(scale: Scale, px: number): number {
  const t = (px - scale.range[0]) / (scale.range[1] - scale.range[0]);
  const u0 = toUnit(scale.kind, scale.domain[0]);
  const u = u0 + t * (toUnit(scale.kind, scale.domain[1]) - u0);
  return scale.kind === 'log' ? 10 ** u : u;
}

/** Finite data extent of some arrays (and log-valid: > 0 when `positiveOnly`). */
export function extent(arrays: readonly ArrayLike<number>[], positiveOnly = false): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const a of arrays) {
    for (let k = 0; k < a.length; k++) {
      const v = a[k] as number;
      if (!Number.isFinite(v) || (positiveOnly && v <= 0)) continue;
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  return lo <= hi ? [lo, hi] : null;
}

/**
 * An axis over [min, max] drawn from `from` px to `to` px, with round ticks.
 * `mode` "loose" widens the domain to round values (line charts); "inside" keeps the data range (maps, grids).
 */
export function makeAxis(kind: ScaleKind, min: number, max: number, from: number, to: number, targetTicks: number, mode: TickMode): Axis {
  switch (kind) {
    case 'linear': {
      const t = linearTicks(min, max, targetTicks, mode);
      return {
        scale: { kind, domain: t.domain, range: [from, to] },
        ticks: t.values,
        labels: t.values.map((v) => formatTick(v, t.decimals)),
        minorTicks: [],
      };
    }
    case 'log': {
      const t = logTicks(min, max, mode);
      return {
        scale: { kind, domain: t.domain, range: [from, to] },
        ticks: t.major,
        labels: t.major.map(formatLogTick),
        minorTicks: t.minor,
      };
    }
    default: {
      const unreachable: never = kind;
      throw new Error(`unknown scale kind ${String(unreachable)}`);
    }
  }
}
