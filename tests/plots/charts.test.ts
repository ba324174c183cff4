/**
 * The three charts of a check as pictures: PNGs decoded with pngjs (size, plot not blank, axis text,
 * the reference line where its numbers put it, same bytes for the same input) and SVG well-formedness
 * with its axis titles and legend entries. Data: the invented demo case demo/inverter-plate-fin.yaml
 * (its numbers are not reference values here: the tests compare the picture with the data drawn).
 */
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/parse.js';
import { colormapRgb, fieldChart, getColormap, lineChart, project, svgToPng, type ChartResult, type FieldChartResult } from '../../src/images/index.js';
import { fluxChartSpec, positionOfRemainingFlow } from '../../src/plots/flux-chart.js';
import { heatmapChartSpec, mirroredField } from '../../src/plots/heatmap-chart.js';
import { profileChartSpec, type CheckPlotInput } from '../../src/plots/profile-chart.js';
import { checkPlotInput, fieldStudy } from '../../src/plots/sources.js';
import type { FinStudy2D as Fin2DStudy } from '../../src/fd/index.js';
import { colourDistance, countPixels, decodePng, isDark, isNotWhite, pixel, svgTexts, wellFormednessError, type Decoded } from '../images/helpers.js';

const demo = join(import.meta.dirname, '../../demo/inverter-plate-fin.yaml');
const size = { width: 1200, height: 750 };

let input: CheckPlotInput;
let field: Fin2DStudy;
beforeAll(async () => {
  const c = loadCase(demo);
  input = await checkPlotInput(c, { tolerance: 0.02, reference: '1d', ledger: false });
  field = await fieldStudy(c);
});

/** Linear interpolation of a node series at x. */
function interpolate(xs: Float64Array, ys: Float64Array, x: number): number {
  let k = 1;
  while (k < xs.length - 1 && (xs[k] as number) < x) k++;
  const x0 = xs[k - 1] as number;
  const x1 = xs[k] as number;
  return (ys[k - 1] as number) + (((ys[k] as number) - (ys[k - 1] as number)) * (x - x0)) / (x1 - x0);
}

/** Dark pixels in column px within dy of row py. */
function darkNear(img: Decoded, px: number, py: number, dy: number): number {
  return countPixels(img, Math.round(px), py - dy, Math.round(px) + 1, py + dy + 1, isDark);
}

function expectAxisText(img: Decoded, plot: { x: number; y: number; width: number; height: number }): void {
  // Tick labels: dark glyph pixels in the band under the x axis and left of the y axis (16 px text).
  expect(countPixels(img, plot.x, plot.y + plot.height + 8, plot.x + plot.width, plot.y + plot.height + 30, isDark)).toBeGreaterThan(150);
  expect(countPixels(img, plot.x - 60, plot.y, plot.x - 8, plot.y + plot.height, isDark)).toBeGreaterThan(100);
}

describe('profile chart: temperature along the fin', () => {
  let chart: ChartResult;
  let png: Buffer;
  let img: Decoded;
  beforeAll(async () => {
    chart = lineChart(profileChartSpec(input, size));
    png = await svgToPng(chart.svg);
    img = decodePng(png);
  });

  it('is 1200 x 750 with a plot that is not blank and tick labels on both axes', () => {
    expect([img.width, img.height]).toEqual([1200, 750]);
    const plot = chart.panels[0]?.plot ?? { x: 0, y: 0, width: 0, height: 0 };
    // Lines, markers and the legend cover well over 2 % of the plot (a blank plot has only grid lines).
    expect(
      countPixels(
        img,
        plot.x + 2,
        plot.y + 2,
        plot.x + plot.width - 2,
        plot.y + plot.height - 2,
        (c) => isNotWhite(c) && colourDistance(c, [228, 228, 228]) > 20,
      ),
    ).toBeGreaterThan(0.02 * plot.width * plot.height);
    expectAxisText(img, plot);
  });

  it('draws the reference (fd-1d, solid black) where its temperatures put it, and nowhere else', () => {
    const g = chart.panels[0];
    const ref = input.profiles.profiles.find((p) => p.model === 'fd-1d');
    expect(g && ref).toBeTruthy();
    if (!g || !ref) return;
    for (const f of [0.15, 0.3, 0.45, 0.6]) {
      const x = f * 0.04;
      const px = project(g.x, x * 1000);
      const py = project(g.y, interpolate(ref.temperature.x_m, ref.temperature.values, x));
      // A 3.2 px black line: dark pixels within 3 px of the row its temperature gives.
      expect(darkNear(img, px, Math.round(py), 3)).toBeGreaterThan(0);
      // Control: 60 px below it (about 1 K lower) the column holds no dark pixel: only coloured lines.
      expect(darkNear(img, px, Math.round(py + 60), 3)).toBe(0);
    }
  });

  it('marks the tip temperature', () => {
    const g = chart.panels[0];
    const ref = input.profiles.profiles.find((p) => p.model === 'fd-1d');
    if (!g || !ref) throw new Error('no panel');
    const [r, gg, b] = pixel(img, project(g.x, 40), project(g.y, ref.tipTemperature_degC));
    expect(Math.max(r, gg, b)).toBeLessThan(80);
    expect(svgTexts(chart.svg)).toContain(`tip ${ref.tipTemperature_degC.toFixed(2)} °C (fd-1d)`);
  });

  it('gives the same bytes for the same input', async () => {
    const again = await svgToPng(lineChart(profileChartSpec(input, size)).svg);
    expect(again.equals(png)).toBe(true);
  });

  it('is well-formed SVG with the axis titles and a legend entry (label and drift) per model', () => {
    expect(wellFormednessError(chart.svg)).toBeNull();
    const texts = svgTexts(chart.svg);
    expect(texts).toEqual(expect.arrayContaining(['Distance from the base x (mm)', 'Temperature T (°C)', 'fd-1d (reference)']));
    expect(texts.some((t) => t.startsWith('Temperature along the fin: Traction-inverter sink'))).toBe(true);
    for (const m of input.report.models) {
      expect(texts).toContain(m.model);
      expect(texts.some((t) => t.includes('drift') && t.endsWith(`(${m.verdict})`))).toBe(true);
    }
  });
});

describe('flux chart: heat flow and heat lost per unit length', () => {
  let chart: ChartResult;
  let img: Decoded;
  beforeAll(async () => {
    chart = lineChart(fluxChartSpec(input, size));
    img = decodePng(await svgToPng(chart.svg));
  });

  it('has two panels, tick labels, and the reference heat flow Q(x) where it belongs', () => {
    expect(chart.panels).toHaveLength(2);
    const top = chart.panels[0];
    const ref = input.profiles.profiles.find((p) => p.model === 'fd-1d');
    if (!top || !ref) throw new Error('missing panel or reference');
    expectAxisText(img, chart.panels[1]?.plot ?? top.plot);
    // Other models' 11 px markers are drawn over the nearly coincident lines and can hide the reference
    // in one column: look 8 px either side (the line moves < 0.2 px over that span), and at least 8 of
    // ten stations must show it.
    let found = 0;
    for (let k = 1; k <= 10; k++) {
      const x = (k / 11) * 0.04;
      const px = project(top.x, x * 1000);
      const py = Math.round(project(top.y, interpolate(ref.flow.x_m, ref.flow.values, x)));
      if (countPixels(img, px - 8, py - 3, px + 9, py + 4, isDark) > 0) found++;
    }
    expect(found).toBeGreaterThanOrEqual(8);
  });

  it('draws the dotted line where 90 % of the reference heat has left, through both panels', () => {
    const ref = input.profiles.profiles.find((p) => p.model === 'fd-1d');
    const at = ref ? positionOfRemainingFlow(ref) : null;
    expect(at).not.toBeNull();
    const top = chart.panels[0];
    if (!top || at === null) return;
    const px = project(top.x, at * 1000);
    // Dotted grey (#555555, "dark"): dashes 2.5 px long every 7.5 px, so a 100 px stretch holds several.
    const hits = countPixels(img, Math.round(px) - 1, top.plot.y + top.plot.height - 100, Math.round(px) + 2, top.plot.y + top.plot.height - 2, isDark);
    expect(hits).toBeGreaterThan(10);
    expect(svgTexts(chart.svg)).toContain('90 % of Q gone (fd-1d)');
  });
});

describe('heat map: the fd-2d field on the true section', () => {
  let chart: FieldChartResult;
  let img: Decoded;
  beforeAll(async () => {
    chart = fieldChart(heatmapChartSpec(loadCase(demo), field, size));
    img = decodePng(await svgToPng(chart.svg));
  });

  it('colours the section by its temperatures (viridis), hot at the base and cool at the tip', () => {
    const mirrored = mirroredField(field);
    const viridis = getColormap('viridis');
    const [low, high] = chart.valueRange;
    const mid = (mirrored.nj - 1) / 2;
    for (const i of [Math.round(0.1 * mirrored.ni), Math.round(0.5 * mirrored.ni), Math.round(0.95 * mirrored.ni)]) {
      const q = i * mirrored.nj + mid;
      const T = mirrored.T_degC[q] as number;
      const rgb = pixel(img, project(chart.x, mirrored.x_mm[q] as number), project(chart.y, mirrored.y_mm[q] as number) - 4);
      // 12 of 255: the field varies little over the 4 px offset from the mid-plane; interpolation and LUT rounding.
      expect(colourDistance(rgb, colormapRgb(viridis, (T - low) / (high - low)))).toBeLessThanOrEqual(12);
    }
    expect(high).toBeCloseTo(Math.max(...mirrored.T_degC), 6);
  });

  it('labels the base, the tip, the colour bar in °C and the isotherms', () => {
    expect(wellFormednessError(chart.svg)).toBeNull();
    const texts = svgTexts(chart.svg);
    expect(texts).toEqual(expect.arrayContaining(['base', 'tip', 'Temperature T (°C)', 'Distance from the base x (mm)']));
    expect(texts.filter((t) => /^\d+(\.\d+)? °C$/.test(t)).length).toBeGreaterThanOrEqual(3);
    expectAxisText(img, chart.plot);
  });
});
