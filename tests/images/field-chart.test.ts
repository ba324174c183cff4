import { describe, expect, it } from 'vitest';
import { fieldChart, type FieldChartSpec } from '../../src/images/field-chart.js';
import { svgToPng } from '../../src/images/render.js';
import { colormapRgb, getColormap } from '../../src/images/colormaps.js';
import { project } from '../../src/images/scales.js';
import { colourDistance, decodePng, isDark, isNotWhite, pixel, svgTexts, wellFormednessError } from './helpers.js';

// Invented test field: T = x (a linear field, so iso-line positions are known exactly: T = c on x = c)
// on a trapezoid section 30 mm long, half-thickness 1.5 mm at the base and 0.5 mm at the tip.
const ni = 121,
  nj = 13;
const halfThickness = (x: number): number => 1.5 - x / 30;
const gx = new Float64Array(ni * nj),
  gy = new Float64Array(ni * nj);
for (let j = 0; j < nj; j++)
  for (let i = 0; i < ni; i++) {
    const x = (30 * i) / (ni - 1);
    gx[i + j * ni] = x;
    gy[i + j * ni] = (-1 + (2 * j) / (nj - 1)) * halfThickness(x);
  }
const spec: FieldChartSpec = {
  title: 'Temperature field — case demo',
  xLabel: 'x (mm)',
  yLabel: 'y (mm)',
  valueLabel: 'Temperature (°C)',
  valueUnit: ' °C',
  grid: { ni, nj, x: gx, y: gy },
  values: gx,
  valueRange: [0, 30],
  levels: [10, 20],
  edgeLabels: { iMin: 'base', iMax: 'tip' },
};
const viridis = getColormap('viridis');

describe('field chart', async () => {
  const chart = fieldChart(spec);
  const png = await svgToPng(chart.svg);
  const img = decodePng(png);

  it('is well-formed SVG naming the edges, the colour bar, the isotherms and the stretch', () => {
    expect(wellFormednessError(chart.svg)).toBeNull();
    const texts = svgTexts(chart.svg);
    expect(texts).toEqual(expect.arrayContaining(['base', 'tip', 'Temperature (°C)', '10 °C', '20 °C']));
    // A 30 x 3 mm section drawn to scale would be a sliver: it is stretched by a round factor and the axis says so.
    expect([2, 5, 10, 20, 50]).toContain(chart.yStretch);
    expect(texts).toContain(`y (mm), stretched ×${chart.yStretch}`);
    expect([img.width, img.height]).toEqual([1200, 750]);
  });

  it('colours a point by the colour map at its value', () => {
    const rgb = pixel(img, project(chart.x, 5), project(chart.y, 0));
    // 3 of 255: the raster pixels line up with the output pixels (no resampling); 1024-entry LUT rounding only.
    expect(colourDistance(rgb, colormapRgb(viridis, 5 / 30))).toBeLessThanOrEqual(3);
  });

  it('draws the T = 20 isotherm on x = 20 across the thickness', () => {
    const expected = project(chart.x, 20);
    let hits = 0;
    for (const eta of [-0.8, -0.6, -0.4, -0.2, 0, 0.2, 0.4, 0.6, 0.8]) {
      const row = Math.floor(project(chart.y, eta * halfThickness(20)));
      const cols: number[] = [];
      for (let c = Math.floor(expected - 6); c <= expected + 6; c++) if (isDark(pixel(img, c, row))) cols.push(c);
      const centre = cols.length ? cols.reduce((s, c) => s + c, 0) / cols.length + 0.5 : Number.NaN;
      // 1 px: a 1.3 px antialiased line; its centre is found to a fraction of a pixel.
      if (Math.abs(centre - expected) < 1) hits++;
    }
    // The label "20 °C" (with its white halo) may cover the line over a couple of these rows.
    expect(hits).toBeGreaterThanOrEqual(6);
  });

  it('draws the sloped faces where they are: white just outside, coloured just inside', () => {
    for (const x of [5, 15, 25]) {
      const px = project(chart.x, x);
      const face = project(chart.y, halfThickness(x));
      expect(isNotWhite(pixel(img, px, face - 5))).toBe(false);
      expect(colourDistance(pixel(img, px, face + 5), colormapRgb(viridis, x / 30))).toBeLessThanOrEqual(3);
    }
  });

  it('draws the colour bar from the low end (bottom) to the high end (top)', () => {
    const bar = chart.colourBar;
    for (const t of [0.1, 0.5, 0.9]) {
      const rgb = pixel(img, bar.x + bar.width / 2, bar.y + (1 - t) * bar.height);
      // 6 of 255: the 256-px gradient image is resampled (smoothly) to the bar's height.
      expect(colourDistance(rgb, colormapRgb(viridis, t))).toBeLessThanOrEqual(6);
    }
  });

  it('gives the same bytes for the same input, and renders sharp at 2x for print', async () => {
    expect((await svgToPng(fieldChart(spec).svg)).equals(png)).toBe(true);
    const print = decodePng(await svgToPng(fieldChart({ ...spec, rasterScale: 2 }).svg, { dpi: 192 }));
    expect([print.width, print.height]).toEqual([2400, 1500]);
    const rgb = pixel(print, 2 * project(chart.x, 5), 2 * project(chart.y, 0));
    expect(colourDistance(rgb, colormapRgb(viridis, 5 / 30))).toBeLessThanOrEqual(3);
  });

  it('draws the true shape when asked (yStretch 1) and rejects a grid that does not fit its arrays', () => {
    expect(fieldChart({ ...spec, yStretch: 1 }).yStretch).toBe(1);
    expect(() => fieldChart({ ...spec, grid: { ni, nj: nj + 1, x: gx, y: gy } })).toThrow(RangeError);
  });
});
