import { describe, expect, it } from 'vitest';
import { mapChart, type MapChartSpec } from '../../src/images/map-chart.js';
import { svgToPng } from '../../src/images/render.js';
import { colormapRgb, getColormap } from '../../src/images/colormaps.js';
import { project } from '../../src/images/scales.js';
import { colourDistance, decodePng, hexRgb, isDark, pixel, svgTexts, wellFormednessError } from './helpers.js';

// Invented test map: value = x - 3 (so the 0 and ±1 contours are the vertical lines x = 3, 3 ± 1),
// x linear 1..5, y logarithmic 10..1000; the top-left point has no result (NaN).
const nx = 9,
  ny = 9;
const xs = Float64Array.from({ length: nx }, (_, i) => 1 + (4 * i) / (nx - 1));
const ys = Float64Array.from({ length: ny }, (_, j) => 10 * 100 ** (j / (ny - 1)));
const values = new Float64Array(nx * ny);
for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) values[j * nx + i] = (xs[i] as number) - 3;
values[(ny - 1) * nx] = Number.NaN;

const spec: MapChartSpec = {
  title: 'Drift map — demo',
  xLabel: 't (mm)',
  yLabel: 'h (W/(m²·K))',
  valueLabel: 'Drift (%)',
  x: xs,
  y: ys,
  values,
  yScale: 'log',
  levels: [
    { value: -1, label: '−1 %', dash: '8 5' },
    { value: 1, label: '+1 %' },
  ],
  points: [{ x: 4.5, y: 20, label: 'this case' }],
  invalidNote: 'Grey: no result.',
};
const map = getColormap('rdbu', true); // the default: blue for negative, red for positive

describe('map chart', async () => {
  const chart = mapChart(spec);
  const img = decodePng(await svgToPng(chart.svg));

  it('is well-formed SVG with the tolerance labels, the point label and the note', () => {
    expect(wellFormednessError(chart.svg)).toBeNull();
    expect(svgTexts(chart.svg)).toEqual(expect.arrayContaining(['−1 %', '+1 %', 'this case', 'Grey: no result.', 'Drift (%)']));
  });

  it('centres the diverging colours on zero: symmetric range, neutral colour at value 0', () => {
    expect([chart.low, chart.high]).toEqual([-2, 2]);
    const neutral = pixel(img, project(chart.x, 3) + 2, project(chart.y, 100));
    // 3 of 255: LUT rounding; ColorBrewer's middle class is #f7f7f7.
    expect(colourDistance(neutral, hexRgb('#f7f7f7'))).toBeLessThanOrEqual(3);
    const cold = pixel(img, project(chart.x, 1.2), project(chart.y, 100));
    expect(colourDistance(cold, colormapRgb(map, (1.2 - 3 + 2) / 4))).toBeLessThanOrEqual(3);
    expect(colourDistance(cold, hexRgb('#053061'))).toBeLessThan(colourDistance(cold, hexRgb('#67001f')));
  });

  it('puts y = 100 half-way up a 10..1000 log axis', () => {
    // log10(100) is the midpoint of log10(10) and log10(1000).
    expect(project(chart.y, 100)).toBeCloseTo(chart.plot.y + chart.plot.height / 2, 9);
  });

  it('draws the +1 contour on x = 4', () => {
    const expected = project(chart.x, 4);
    let hits = 0;
    for (const y of [15, 30, 60, 120, 250, 500, 800]) {
      const row = Math.floor(project(chart.y, y));
      const cols: number[] = [];
      for (let c = Math.floor(expected - 6); c <= expected + 6; c++) if (isDark(pixel(img, c, row))) cols.push(c);
      const centre = cols.length ? cols.reduce((s, c) => s + c, 0) / cols.length + 0.5 : Number.NaN;
      // 1 px: a 2 px antialiased line.
      if (Math.abs(centre - expected) < 1) hits++;
    }
    expect(hits).toBeGreaterThanOrEqual(5); // the label may hide the line at one or two rows
  });

  it('shows points without a result in grey', () => {
    const rgb = pixel(img, chart.plot.x + 5, chart.plot.y + 5);
    expect(colourDistance(rgb, hexRgb('#d9d9d9'))).toBeLessThanOrEqual(2);
  });

  it('rejects axes that are not ascending, log axes through zero, and a wrong number of values', () => {
    expect(() => mapChart({ ...spec, x: Float64Array.from(xs).reverse() })).toThrow(RangeError);
    expect(() => mapChart({ ...spec, y: Float64Array.from(ys, (v, j) => (j === 0 ? 0 : v)) })).toThrow(RangeError);
    expect(() => mapChart({ ...spec, values: values.subarray(1) })).toThrow(RangeError);
  });
});
