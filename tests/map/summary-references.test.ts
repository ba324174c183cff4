/**
 * The map summary says which reference each point used and how many points were not resolved
 * (issue 9, item 4: maps mixed fd-1d and fd-2d references silently across points).
 */
import { describe, expect, it } from 'vitest';
import { summariseMap } from '../../src/map/summary.js';
import type { MapPoint } from '../../src/map/types.js';

function point(index: number, model: 'fd-1d' | 'fd-2d', resolved: boolean): MapPoint {
  return {
    index,
    x: index,
    y: 0,
    biot: 0.01,
    mL: 1,
    reference: { model, heatRate_W: 1, efficiency: 0.9, discretizationError: resolved ? 1e-8 : 0.05, resolved },
    models: [{ model: 'tanh-L', heatRate_W: 1.01, efficiency: 0.91, drift: 0.01, verdict: resolved ? 'ok' : 'unresolved' }],
  };
}

describe('summariseMap', () => {
  it('counts points per reference model, the unresolved ones, and unresolved verdicts per shortcut', () => {
    const points: MapPoint[] = [
      point(0, 'fd-2d', true),
      point(1, 'fd-2d', true),
      point(2, 'fd-1d', true),
      point(3, 'fd-1d', false),
      { index: 4, x: 4, y: 0, error: 'fin.length: got "0 mm"; expected a length > 0' },
    ];
    const s = summariseMap(points, ['tanh-L']);
    expect(s.references).toEqual([
      { model: 'fd-2d', points: 2, unresolved: 0 },
      { model: 'fd-1d', points: 2, unresolved: 1 },
    ]);
    expect(s.unresolvedPoints).toBe(1);
    expect(s.models[0]).toMatchObject({ model: 'tanh-L', ok: 3, marginal: 0, unsafe: 0, unresolved: 1, missing: 0 });
    expect(s.errors).toBe(1);
  });
});
