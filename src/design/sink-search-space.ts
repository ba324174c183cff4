/**
 * The space `optimize` searches for a heat sink (optimize-sink.ts): the varied key (array.count or fin.thickness of
 * rectangular plate fins), what follows it to keep the fins' volume (count x thickness, or thickness x length, fixed),
 * the bounds (given, or a default range that leaves a gap between fins), and, for `required`, each source's limit with
 * the excess of the sources' mean temperatures over them. Every refusal is a usage error naming the input.
 */
import type { HeatSinkCase } from '../case/index.js';
import { UsageError } from '../errors.js';
import { fmtMm } from './format-mm.js';
import type { OptimizeSinkRequest, SinkKeep } from './sink-optimize-types.js';

export const SINK_KEYS = ['array.count', 'fin.thickness'] as const;
export type SinkKey = (typeof SINK_KEYS)[number];
/** The least gap a default thickness bound leaves, as a share of the pitch (common practice, no source). */
const LEAST_GAP = 0.1;

export interface SinkSearchSpace {
  key: SinkKey;
  isCount: boolean;
  keep: SinkKeep;
  /** The key that follows the varied one to keep the volume, or null. */
  dependent: 'fin.thickness' | 'fin.length' | null;
  lo: number;
  hi: number;
  /** The case's count and plate width (m). */
  count0: number;
  width: number;
  /** Every dimension that changes at a value x of the varied key (a count, or m), by key path. */
  dims: (x: number) => Map<string, number>;
  /** The fins' volume, m^3, and the gap between fins, m, of a candidate's dimensions. */
  amountOf: (d: ReadonlyMap<string, number>) => number;
  gapOf: (d: ReadonlyMap<string, number>) => number;
  thicknessOf: (d: ReadonlyMap<string, number>) => number;
  ambient: number;
  /** required: each source's limit, degC (null: none); max-heat: null. */
  limits: (number | null)[] | null;
  /** How far the sources' mean temperatures are over their limits (K; <= 0: kept). */
  excess: (rises: readonly number[]) => number;
}

export function sinkSearchSpace(request: OptimizeSinkRequest, c0: HeatSinkCase): SinkSearchSpace {
  const { labels } = request;
  if (request.vary.length !== 1)
    throw new UsageError(
      `${labels.vary}: a heat sink varies one key, array.count or fin.thickness (got ${request.vary.length}: ${request.vary.join(', ')})`,
    );
  const key = (request.vary[0] ?? '').trim() as SinkKey;
  if (!SINK_KEYS.includes(key)) throw new UsageError(`${labels.vary}: ${key} cannot be varied for a heat sink; vary array.count or fin.thickness`);
  if (c0.array.kind !== 'plates' || c0.fin === null)
    throw new UsageError(`${labels.vary}: ${key} needs plate fins (array.count >= 1); this sink has ${c0.fin === null ? 'no fins' : 'pins (array.pins)'}`);
  const profile = c0.fin.profile;
  if (profile.kind !== 'rectangular')
    throw new UsageError(`${labels.vary}: ${key} is varied for rectangular plate fins only; this sink's fins are ${profile.kind}`);
  const keep: SinkKeep = request.keep === 'default' ? 'none' : request.keep;
  const count0 = c0.array.count;
  const t0 = profile.thickness;
  const L0 = profile.length;
  const W = c0.plate.width;
  const dependent = keep === 'none' ? null : key === 'array.count' ? 'fin.thickness' : 'fin.length';

  const dims = (x: number): Map<string, number> => {
    const d = new Map<string, number>([[key, x]]);
    if (dependent === 'fin.thickness') d.set(dependent, (count0 * t0) / x);
    if (dependent === 'fin.length') d.set(dependent, (t0 * L0) / x);
    return d;
  };
  const countOf = (d: ReadonlyMap<string, number>): number => d.get('array.count') ?? count0;
  const thicknessOf = (d: ReadonlyMap<string, number>): number => d.get('fin.thickness') ?? t0;
  const lengthOf = (d: ReadonlyMap<string, number>): number => d.get('fin.length') ?? L0;
  const amountOf = (d: ReadonlyMap<string, number>): number => countOf(d) * thicknessOf(d) * lengthOf(d) * c0.plate.length;
  const gapOf = (d: ReadonlyMap<string, number>): number => W / countOf(d) - thicknessOf(d);

  // ---- bounds ----
  const given = request.bounds.get(key);
  for (const k of request.bounds.keys()) if (k.trim() !== key) throw new UsageError(`${labels.bounds}: ${k} is not the varied key (${key})`);
  let lo: number;
  let hi: number;
  if (key === 'array.count') {
    // gap > 0: count < W / t (with keep volume t = N0 t0 / N, so the gap is (W - N0 t0) / N: any count).
    const most = dependent === 'fin.thickness' ? Number.POSITIVE_INFINITY : Math.ceil(W / t0) - 1;
    if (given) {
      const [a, b] = given;
      if (!(Number.isInteger(a) && Number.isInteger(b) && a >= 1 && b > a))
        throw new UsageError(`${labels.bounds}: array.count=${a}:${b}: expected whole numbers 1 <= FROM < TO`);
      if (b > most)
        throw new UsageError(
          `${labels.bounds}: array.count=${a}:${b}: ${b} fins of ${fmtMm(t0)} do not fit a plate ${fmtMm(W)} wide with a gap (at most ${most}); lower TO`,
        );
      [lo, hi] = [a, b];
    } else {
      lo = Math.max(1, Math.floor(count0 / 4));
      hi = Math.max(lo + 1, Math.min(4 * count0, most));
    }
  } else {
    const pitch = W / count0;
    if (given) {
      const [a, b] = given;
      if (!(a > 0 && b > a)) throw new UsageError(`${labels.bounds}: fin.thickness: expected 0 < FROM < TO`);
      if (b >= pitch)
        throw new UsageError(
          `${labels.bounds}: fin.thickness=${fmtMm(a)}:${fmtMm(b)}: ${fmtMm(b)} leaves no gap at a pitch of ${fmtMm(pitch)}; keep TO below the pitch`,
        );
      [lo, hi] = [a, b];
    } else {
      lo = t0 / 4;
      hi = Math.min(4 * t0, (1 - LEAST_GAP) * pitch);
    }
  }

  // ---- the limits ----
  const ambient = c0.convection.ambient_degC;
  let limits: (number | null)[] | null = null;
  if (request.objective.kind === 'required') {
    const T = request.objective.temperature_degC;
    limits = T === null ? c0.sources.map((s) => s.limit_degC) : c0.sources.map(() => T);
    if (limits.every((l) => l === null))
      throw new UsageError(`${labels.temperature}: required needs a temperature (e.g. 110 degC) or a limit on a source (sources[i].limit) in the case`);
    limits.forEach((l, j) => {
      if (l !== null && !(l > ambient))
        throw new UsageError(`${labels.temperature}: ${l} degC for ${c0.sources[j]?.name ?? `sources[${j}]`} is not above the ambient ${ambient} degC`);
    });
  }
  const excess = (rises: readonly number[]): number => {
    let worst = Number.NEGATIVE_INFINITY;
    rises.forEach((r, j) => {
      const l = limits?.[j];
      if (l !== null && l !== undefined) worst = Math.max(worst, ambient + r - l);
    });
    return worst;
  };
  return { key, isCount: key === 'array.count', keep, dependent, lo, hi, count0, width: W, dims, amountOf, gapOf, thicknessOf, ambient, limits, excess };
}
