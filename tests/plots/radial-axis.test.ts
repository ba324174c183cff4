/**
 * Annular fins are drawn against the radius r, with r1 (tube) and r2 (rim) marked, on every chart.
 * The case is invented (a 0.5 mm aluminium disc fin on a 6.2 mm tube); only labels are checked here.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Case } from '../../src/case/types.js';
import { lineChart } from '../../src/images/index.js';
import { fluxChartSpec } from '../../src/plots/flux-chart.js';
import { heatmapChartSpec } from '../../src/plots/heatmap-chart.js';
import { profileChartSpec, type CheckPlotInput } from '../../src/plots/profile-chart.js';
import { checkPlotInput, fieldStudy } from '../../src/plots/sources.js';
import { TEMPERATURES_2D } from '../fd2d/cases.js';
import { finCase } from '../support/fin-case.js';
import { svgTexts } from '../images/helpers.js';

const size = { width: 1200, height: 750 };
const annular: Case = finCase({
  profile: { kind: 'annular', innerRadius: 3.1e-3, outerRadius: 5.6e-3, thickness: 5e-4 },
  k: 209,
  h: { kind: 'uniform', h: 45 },
  tip: { kind: 'adiabatic' },
  ...TEMPERATURES_2D,
});
const straight: Case = finCase({
  profile: { kind: 'rectangular', length: 0.03, thickness: 0.002, width: 0.05 },
  k: 180,
  h: { kind: 'uniform', h: 40 },
  tip: { kind: 'adiabatic' },
  ...TEMPERATURES_2D,
});
const RADIUS_AXIS = 'Radius r (mm): r1 = 3.1 at the tube, r2 = 5.6 at the rim';

let input: CheckPlotInput;
beforeAll(async () => {
  input = await checkPlotInput(annular, { tolerance: 0.02, reference: '2d', ledger: false });
});

describe('charts of an annular fin use the radius, r1 and r2 marked', () => {
  it('profile chart: radius axis from r1 to r2, the rim marked as r2', () => {
    const spec = profileChartSpec(input, size);
    expect(spec.xLabel).toBe(RADIUS_AXIS);
    const texts = svgTexts(lineChart(spec).svg);
    expect(texts).toContain(RADIUS_AXIS);
    expect(texts.some((t) => /^rim \(r2\) \d+\.\d\d °C \(fd-2d\)$/.test(t))).toBe(true);
    // The lines run over the radius (mm), not the distance from the tube.
    const ref = spec.panels[0]?.series[0];
    expect(ref?.x[0]).toBeCloseTo(3.1, 9);
    expect(ref?.x[(ref?.x.length ?? 1) - 1]).toBeCloseTo(5.6, 9);
  });

  it('flux chart: the same radius axis', () => {
    expect(fluxChartSpec(input, size).xLabel).toBe(RADIUS_AXIS);
  });

  it('heat map: radius axis, the base edge is r1 (tube) and the tip edge r2 (rim)', async () => {
    const spec = heatmapChartSpec(annular, await fieldStudy(annular), size);
    expect(spec.xLabel).toBe(RADIUS_AXIS);
    expect(spec.edgeLabels).toEqual({ iMin: 'r1 (tube)', iMax: 'r2 (rim)' });
  });

  it('a straight fin keeps the distance from the base x and its tip', async () => {
    const s = await checkPlotInput(straight, { tolerance: 0.02, reference: '1d', ledger: false });
    expect(profileChartSpec(s, size).xLabel).toBe('Distance from the base x (mm)');
    expect(heatmapChartSpec(straight, await fieldStudy(straight), size).edgeLabels).toEqual({ iMin: 'base', iMax: 'tip' });
  });
});
