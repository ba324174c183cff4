/**
 * Counts over a finished map: per shortcut, how many points are ok, marginal and unsafe and the range of the
 * drift; and the points without results, grouped by what went wrong (the value given is left out of the grouping,
 * so "fin.tipThickness: got "3 mm"; expected ... (2 mm)" and "... got "4 mm"; expected ... (3 mm)" count as one kind
 * of problem).
 */
import { isPointError, type MapModelId, type MapPoint } from './types.js';

export interface ModelCounts {
  model: MapModelId;
  ok: number;
  marginal: number;
  unsafe: number;
  /** Points where the reference was not resolved, so no verdict was given. */
  unresolved: number;
  /** Points where the shortcut does not apply. */
  missing: number;
  minDrift: number;
  maxDrift: number;
}

export interface ErrorGroup {
  /** The first message of the group, as given. */
  example: string;
  count: number;
}

export interface MapSummary {
  points: number;
  solved: number;
  errors: number;
  errorGroups: ErrorGroup[];
  models: ModelCounts[];
  /**
   * Points per reference model (an automatic reference keeps fd-1d where the 2-D model does not cover the case,
   * or where its study is not resolved); `unresolved`: of those, points whose reference is not resolved.
   */
  references: { model: string; points: number; unresolved: number }[];
  /** Solved points whose reference is not resolved (their verdicts are `unresolved`). */
  unresolvedPoints: number;
}

/** The message without the values in it (the value given, the numbers in what is accepted). */
function groupKey(message: string): string {
  return message.replace(/got [^;]*;/g, 'got …;').replace(/[-+]?\d+(?:\.\d+)?(?:e[-+]?\d+)?/gi, '#');
}

export function summariseMap(points: readonly MapPoint[], models: readonly MapModelId[]): MapSummary {
  const counts: ModelCounts[] = models.map((model) => ({
    model,
    ok: 0,
    marginal: 0,
    unsafe: 0,
    unresolved: 0,
    missing: 0,
    minDrift: Infinity,
    maxDrift: -Infinity,
  }));
  const groups = new Map<string, ErrorGroup>();
  let errors = 0;
  const references = new Map<string, { points: number; unresolved: number }>();
  let unresolvedPoints = 0;
  for (const p of points) {
    if (isPointError(p)) {
      errors++;
      const key = groupKey(p.error);
      const g = groups.get(key);
      if (g) g.count++;
      else groups.set(key, { example: p.error, count: 1 });
      continue;
    }
    const r = references.get(p.reference.model) ?? { points: 0, unresolved: 0 };
    r.points++;
    if (!p.reference.resolved) {
      r.unresolved++;
      unresolvedPoints++;
    }
    references.set(p.reference.model, r);
    for (const c of counts) {
      const m = p.models.find((r) => r.model === c.model);
      if (!m) {
        c.missing++;
        continue;
      }
      c[m.verdict]++;
      c.minDrift = Math.min(c.minDrift, m.drift);
      c.maxDrift = Math.max(c.maxDrift, m.drift);
    }
  }
  return {
    points: points.length,
    solved: points.length - errors,
    errors,
    errorGroups: [...groups.values()].sort((a, b) => b.count - a.count),
    models: counts,
    references: [...references].map(([model, n]) => ({ model, points: n.points, unresolved: n.unresolved })),
    unresolvedPoints,
  };
}
