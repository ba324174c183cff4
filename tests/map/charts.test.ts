/**
 * The map images: the PNG decodes, the tolerance contour is drawn where the map's data cross the tolerance, and
 * the case's own point is marked where the case sits on the axes (computed here from the plot rectangle and the
 * axis ends, linear or logarithmic). The overview outlines the same boundary. Inputs are invented.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { svgToPng } from '../../src/images/index.js';
import { modelChart } from '../../src/map/model-chart.js';
import { overviewChart } from '../../src/map/overview-chart.js';
import type { MapRun } from '../../src/map/run-map.js';
import { isPointError } from '../../src/map/types.js';
import { caseFile, darkestNear, decodePng, mapInProcess, rgbAt, type Image } from './support.js';

const text = `name: plate fin for images
fin: { profile: rectangular, length: 50 mm, thickness: 4 mm, width: 100 mm, edges: insulated }
material: { k: 200 W/(m*K) }
convection: { ambient: 20 degC, h: 100 W/(m^2*K), tip: convective }
base: { temperature: 80 degC }
`;

/** Screen x of a data value on an axis from `first` to `last` drawn over [from, to] px. */
function screen(value: number, first: number, last: number, from: number, to: number, log: boolean): number {
  const t = log ? Math.log(value / first) / Math.log(last / first) : (value - first) / (last - first);
  return from + t * (to - from);
}

/** Where, along each row, the drift of tanh-L crosses `level` (screen px, linear along the cell edge). */
function crossings(run: MapRun, level: number, sx: (v: number) => number, sy: (v: number) => number): [number, number][] {
  const nx = run.x.values.length;
  const out: [number, number][] = [];
  for (let j = 0; j < run.y.values.length; j++) {
    for (let i = 0; i + 1 < nx; i++) {
      const a = run.points[j * nx + i];
      const b = run.points[j * nx + i + 1];
      if (!a || !b || isPointError(a) || isPointError(b)) continue;
      const da = a.models.find((m) => m.model === 'tanh-L')?.drift ?? Number.NaN;
      const db = b.models.find((m) => m.model === 'tanh-L')?.drift ?? Number.NaN;
      if ((da - level) * (db - level) > 0 || da === db) continue;
      const t = (level - da) / (db - da);
      const xa = sx(run.x.values[i] as number);
      const xb = sx(run.x.values[i + 1] as number);
      out.push([xa + t * (xb - xa), sy(run.y.values[j] as number)]);
    }
  }
  return out;
}

/** Share of the points with a dark pixel (a black line, max channel < 60) within 2 px. */
function darkShare(img: Image, points: readonly [number, number][]): number {
  return points.filter(([x, y]) => darkestNear(img, x, y, 2) < 60).length / points.length;
}

describe.each([
  { name: 'linear axes', logX: false },
  { name: 'log x axis', logX: true },
])('per-shortcut map PNG ($name)', ({ logX }) => {
  let run: MapRun;
  let img: Image;
  let chart: ReturnType<typeof modelChart>['chart'];
  beforeAll(async () => {
    const file = caseFile(`charts-${logX}.yaml`, text);
    run = await mapInProcess(file, { x: 'fin.length=30:130 mm', y: 'fin.thickness=2:12 mm', logX, logY: false, steps: [21, 11], reference: '1d' });
    const made = modelChart(run, 'tanh-L');
    chart = made.chart;
    img = decodePng(await svgToPng(made.svg));
  });

  const sx = (v: number): number => screen(v, 30, 130, chart.plot.x, chart.plot.x + chart.plot.width, logX);
  const sy = (v: number): number => screen(v, 2, 12, chart.plot.y + chart.plot.height, chart.plot.y, false);

  it('decodes at the chart size', () => {
    expect([img.width, img.height]).toEqual([1200, 750]);
  });

  it('marks the case (L = 50 mm, t = 4 mm) where it sits: white centre, black ring', () => {
    const x = sx(50);
    const y = sy(4);
    // The mark is a black disc 14 px across with a white disc 6 px across on top (map-chart.ts); the centre pixel is
    // white and a pixel 5 px off centre is black, to within anti-aliasing.
    expect(Math.min(...rgbAt(img, x, y))).toBeGreaterThan(230);
    for (const [dx, dy] of [
      [5, 0],
      [-5, 0],
      [0, 5],
      [0, -5],
    ] as const)
      expect(Math.max(...rgbAt(img, x + dx, y + dy))).toBeLessThan(60);
  });

  it('draws the -2 % tolerance contour where the data cross it, and no line where they cross an undrawn level', () => {
    const drawn = crossings(run, -0.02, sx, sy);
    expect(drawn.length).toBeGreaterThan(5);
    // Labels cut short gaps into the line (one or two rows may fall in one): most rows, not all.
    expect(darkShare(img, drawn)).toBeGreaterThanOrEqual(0.8);
    // Control: at -1 % no contour is drawn, so the same probe finds (almost) no dark pixel there.
    const undrawn = crossings(run, -0.01, sx, sy);
    expect(undrawn.length).toBeGreaterThan(5);
    expect(darkShare(img, undrawn)).toBeLessThanOrEqual(0.2);
  });
});

describe('overview PNG', () => {
  it('decodes and outlines the region where tanh-L is ok along the same -2 % crossing', async () => {
    const file = caseFile('charts-overview.yaml', text);
    const run = await mapInProcess(file, {
      x: 'fin.length=30:130 mm',
      y: 'fin.thickness=2:12 mm',
      logX: false,
      logY: false,
      steps: [21, 11],
      reference: '1d',
    });
    const overview = overviewChart(run);
    const img = decodePng(await svgToPng(overview.svg));
    expect([img.width, img.height]).toEqual([1200, 750]);
    const { plot } = overview;
    const sx = (v: number): number => screen(v, 30, 130, plot.x, plot.x + plot.width, false);
    const sy = (v: number): number => screen(v, 2, 12, plot.y + plot.height, plot.y, false);
    // tanh-L is the first model: black, solid (Okabe & Ito order).
    expect(run.job.check.models[0]).toBe('tanh-L');
    const edge = crossings(run, -0.02, sx, sy);
    expect(edge.length).toBeGreaterThan(5);
    expect(darkShare(img, edge)).toBeGreaterThanOrEqual(0.9);
    expect(Math.min(...rgbAt(img, sx(50), sy(4)))).toBeGreaterThan(230);
  });
});
