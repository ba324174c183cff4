/**
 * The overview as small multiples (one panel per shortcut, same axes, panels apart) and the map axes in words
 * and printed units instead of key paths and ASCII units. Inputs are invented.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { prettyUnit } from '../../src/images/unit-text.js';
import { axisTitle, keyTitle } from '../../src/map/axis-title.js';
import { overviewChart, overviewColumns, type OverviewChart } from '../../src/map/overview-chart.js';
import { modelChart } from '../../src/map/model-chart.js';
import type { MapRun } from '../../src/map/run-map.js';
import { caseFile, mapInProcess } from './support.js';

const text = `name: plate fin for the overview
fin: { profile: rectangular, length: 50 mm, thickness: 4 mm, width: 100 mm, edges: insulated }
material: { k: 200 W/(m*K) }
convection: { ambient: 20 degC, h: 100 W/(m^2*K), tip: convective }
base: { temperature: 80 degC }
`;

describe('units and titles for print', () => {
  it('sets superscripts, middle dots and degree signs', () => {
    expect(prettyUnit('W/(m^2*K)')).toBe('W/(m²·K)');
    expect(prettyUnit('m^2*K/W')).toBe('m²·K/W');
    expect(prettyUnit('W/(m*K)')).toBe('W/(m·K)');
    expect(prettyUnit('degC')).toBe('°C');
    expect(prettyUnit('mm')).toBe('mm');
    expect(prettyUnit('')).toBe('');
  });

  it('names known key paths in words and keeps an unknown one as it is', () => {
    expect(axisTitle({ key: 'convection.h', displayUnit: 'W/(m^2*K)' })).toBe('Heat transfer coefficient h (W/(m²·K))');
    expect(axisTitle({ key: 'fin.thickness', displayUnit: 'mm' })).toBe('Fin thickness t (mm)');
    expect(axisTitle({ key: 'convection.emissivity', displayUnit: '' })).toBe('Emissivity ε');
    expect(keyTitle('fin.points[2][1]')).toBe('fin.points[2][1]');
    expect(axisTitle({ key: 'fin.points[2][1]', displayUnit: 'mm' })).toBe('fin.points[2][1] (mm)');
  });
});

describe('overview and map charts of a 1-D map', () => {
  let run: MapRun;
  let overview: OverviewChart;
  beforeAll(async () => {
    const file = caseFile('overview-panels.yaml', text);
    run = await mapInProcess(file, {
      x: 'fin.thickness=1:6 mm',
      y: 'convection.h=20:400 W/(m^2*K)',
      logX: false,
      logY: true,
      steps: [9, 7],
      reference: '1d',
    });
    overview = overviewChart(run);
  });

  it('draws one panel per shortcut, none overlapping another, all on the same axis ranges', () => {
    const models = run.job.check.models;
    expect(models.length).toBeGreaterThan(2);
    expect(overview.panels.map((p) => p.model)).toEqual(models);
    for (const [a, p] of overview.panels.entries()) {
      expect(p.xAxis.scale.domain).toEqual(overview.panels[0]?.xAxis.scale.domain);
      expect(p.yAxis.scale.domain).toEqual(overview.panels[0]?.yAxis.scale.domain);
      expect(p.plot.width).toBeCloseTo(overview.panels[0]?.plot.width ?? NaN, 9);
      expect(p.plot.x + p.plot.width).toBeLessThanOrEqual(1200);
      expect(p.plot.y + p.plot.height).toBeLessThanOrEqual(750);
      for (const q of overview.panels.slice(a + 1)) {
        const apart =
          p.plot.x + p.plot.width < q.plot.x ||
          q.plot.x + q.plot.width < p.plot.x ||
          p.plot.y + p.plot.height < q.plot.y ||
          q.plot.y + q.plot.height < p.plot.y;
        expect(apart).toBe(true);
      }
    }
    expect(overviewColumns(5)).toBe(3);
    expect(overviewColumns(2)).toBe(2);
  });

  it('draws each ok region once (no translucent fills on top of each other) and labels each panel', () => {
    const fills = overview.svg.match(/fill-opacity="0\.2"/g) ?? [];
    expect(fills.length).toBeLessThanOrEqual(run.job.check.models.length);
    for (const m of run.job.check.models) expect(overview.svg).toContain(`>${m}: ok on `);
  });

  it('puts words and printed units on the axes, not key paths and ASCII units', () => {
    for (const svg of [overview.svg, modelChart(run, 'tanh-L').svg]) {
      expect(svg).toContain('Heat transfer coefficient h (W/(m²·K))');
      expect(svg).toContain('Fin thickness t (mm)');
      expect(svg).not.toContain('convection.h (');
      expect(svg).not.toContain('m^2');
    }
  });
});
