/**
 * A map point whose reference is not resolved gets no verdict (outputs.md): its charts must not read as one. The
 * per-shortcut map crosses it and says so under the chart; the overview crosses it in every panel and never
 * counts it inside an ok region, even where its drift is within the tolerance. Inputs are invented; the run's
 * resolution flags are set here (a resolved map has none), so the charts' handling is tested on its own.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { modelChart } from '../../src/map/model-chart.js';
import { overviewChart, safetyMargin } from '../../src/map/overview-chart.js';
import type { MapRun } from '../../src/map/run-map.js';
import { isPointError } from '../../src/map/types.js';
import { caseFile, mapInProcess } from './support.js';

const text = `name: plate fin, unresolved marks
fin: { profile: rectangular, length: 30 mm, thickness: 3 mm, width: 50 mm, edges: insulated }
material: { k: 200 W/(m*K) }
convection: { ambient: 20 degC, h: 40 W/(m^2*K), tip: adiabatic }
base: { temperature: 80 degC }
`;

/** Occurrences of the dark cross's stroke (one per crossed point and panel). */
function crosses(svg: string): number {
  return svg.split('stroke="#222222"').length - 1;
}

describe('map charts: points without a verdict', () => {
  let run: MapRun;
  let okIndex: number;
  beforeAll(async () => {
    run = await mapInProcess(caseFile('unresolved-marks.yaml', text), {
      x: 'fin.thickness=2mm:4mm',
      y: 'convection.h=20:60',
      logX: false,
      logY: false,
      steps: [3, 2],
      reference: '1d',
    });
    // The exact closed form of an adiabatic-tip plate fin drifts ~0 from fd-1d: every point is ok for it.
    const p = run.points.find((q) => !isPointError(q));
    if (!p || isPointError(p)) throw new Error('no solved point');
    okIndex = p.index;
    p.reference.resolved = false;
  });

  it('the overview never shows an unresolved point inside an ok region', () => {
    const s = safetyMargin(run, 'closed-form');
    expect(s[okIndex]).toBe(-1e6);
    const resolved = run.points.filter((p) => !isPointError(p) && p.index !== okIndex);
    for (const p of resolved) expect(s[p.index]).toBeGreaterThan(0);
  });

  it('the per-shortcut map crosses the point and says what the cross means', () => {
    const { svg } = modelChart(run, 'closed-form');
    expect(crosses(svg)).toBe(1);
    expect(svg).toContain('×: 1 point where the reference is not resolved (no verdict there)');
  });

  it('the overview crosses it in every panel and says so in its subtitle', () => {
    const { svg } = overviewChart(run);
    expect(crosses(svg)).toBe(run.job.check.models.length);
    // The subtitle wraps: the words may sit on two lines.
    expect(svg.replace(/<\/text><text[^>]*>/g, ' ')).toContain('×: 1 point where the reference is not resolved (no verdict there)');
  });

  it('a fully resolved map draws no cross and no note', () => {
    const p = run.points[okIndex];
    if (!p || isPointError(p)) throw new Error('no point');
    p.reference.resolved = true;
    expect(crosses(modelChart(run, 'closed-form').svg)).toBe(0);
    expect(overviewChart(run).svg).not.toContain('not resolved');
    p.reference.resolved = false;
  });
});
