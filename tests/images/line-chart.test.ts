import { describe, expect, it } from 'vitest';
import { lineChart, type LineChartSpec } from '../../src/images/line-chart.js';
import { svgToPng } from '../../src/images/render.js';
import { readPngDpi } from '../../src/images/png-dpi.js';
import { project } from '../../src/images/scales.js';
import { okabeItoColours } from '../../src/images/series-styles.js';
import { colourDistance, countPixels, decodePng, hexRgb, isDark, isNotWhite, pixel, svgTexts, wellFormednessError } from './helpers.js';

// Invented demo data (a decaying profile and a flat line); only the drawing is under test.
const n = 31;
const x = Float64Array.from({ length: n }, (_, k) => k); // mm
const reference = x.map((v) => 25 + 60 * Math.exp(-v / 40));
const flat = new Float64Array(n).fill(60);

const spec: LineChartSpec = {
  title: 'Temperature along the fin — case demo',
  subtitle: 'Shortcuts use the mean cross-section.',
  xLabel: 'Distance from base x (mm)',
  panels: [
    {
      yLabel: 'Temperature (°C)',
      series: [
        { label: 'fd-1d (reference)', x, y: reference },
        { label: 'flat 60 °C', x, y: flat, style: 'solid', marker: 'none', note: 'drift +1.0 %' },
      ],
      points: [{ x: 30, y: reference[n - 1] as number, label: 'tip' }],
    },
  ],
};

describe('line chart SVG', () => {
  const chart = lineChart(spec);

  it('is well-formed XML with the title, axis titles, legend entries and notes as text', () => {
    expect(wellFormednessError(chart.svg)).toBeNull();
    const texts = svgTexts(chart.svg);
    for (const t of [
      'Temperature along the fin — case demo',
      'Distance from base x (mm)',
      'Temperature (°C)',
      'fd-1d (reference)',
      'flat 60 °C',
      'drift +1.0 %',
      'tip',
    ]) {
      expect(texts).toContain(t);
    }
    expect(chart.svg).toContain('font-family="DejaVu Sans, sans-serif"');
  });

  it('escapes labels with markup characters and stays well-formed', () => {
    const hostile = lineChart({ ...spec, title: 'a < b & "c"', panels: [{ yLabel: 'y <&>', series: [{ label: '</text>', x, y: flat }] }] });
    expect(wellFormednessError(hostile.svg)).toBeNull();
    expect(svgTexts(hostile.svg)).toContain('</text>');
  });

  it('is the same string for the same input', () => {
    expect(lineChart(spec).svg).toBe(chart.svg);
  });

  it('stacks panels on one x axis and labels x ticks only under the lowest panel', () => {
    const flux = lineChart({
      title: 'Heat flow',
      xLabel: 'x (mm)',
      panels: [
        { yLabel: 'Heat flow along the fin (W)', series: [{ label: 'a', x, y: reference }], includeZero: true },
        { yLabel: 'Heat lost per unit length (W/m)', series: [{ label: 'a', x, y: flat }] },
      ],
    });
    expect(flux.panels).toHaveLength(2);
    const [upper, lower] = flux.panels as [(typeof flux.panels)[0], (typeof flux.panels)[0]];
    expect(upper.x).toEqual(lower.x);
    expect(lower.plot.y).toBeGreaterThan(upper.plot.y + upper.plot.height);
    // includeZero: the heat-flow axis starts at 0 or below.
    expect(upper.y.domain[0]).toBeLessThanOrEqual(0);
    // '5', '15', '25' can only be x tick labels here (the y axes step by 10 or 20, and by 1 around 60): once each.
    const texts = svgTexts(flux.svg);
    for (const label of ['5', '15', '25']) expect(texts.filter((t) => t === label)).toHaveLength(1);
    // Same label in both panels = one legend row.
    expect(svgTexts(flux.svg).filter((t) => t === 'a')).toHaveLength(1);
  });
});

describe('line chart PNG', async () => {
  const chart = lineChart(spec);
  const bytes = await svgToPng(chart.svg);
  const img = decodePng(bytes);
  const g = chart.panels[0]!;

  it('is 1200 x 750 by default', () => {
    expect([img.width, img.height]).toEqual([1200, 750]);
  });

  it('has data drawn inside the plot area', () => {
    const drawn = countPixels(img, g.plot.x + 3, g.plot.y + 3, g.plot.x + g.plot.width - 3, g.plot.y + g.plot.height - 3, isNotWhite);
    // Two lines ~1100 px long and 2.5-3 px wide, plus grid lines: well over 3000 pixels; a blank plot has ~0.
    expect(drawn).toBeGreaterThan(3000);
  });

  it('has tick-label text under the x axis and left of the y axis, and none in an empty margin', () => {
    const bottom = g.plot.y + g.plot.height;
    const xLabels = countPixels(img, g.plot.x - 10, bottom + 12, g.plot.x + g.plot.width + 10, bottom + 34, isDark);
    const yLabels = countPixels(img, g.plot.x - 60, g.plot.y, g.plot.x - 10, bottom, isDark);
    // 7 x labels of 1-2 digits and ~6 y labels of 2 digits at 16 px: each glyph leaves 20+ dark pixels.
    expect(xLabels).toBeGreaterThan(150);
    expect(yLabels).toBeGreaterThan(150);
    expect(countPixels(img, 0, 0, 15, 15, isDark)).toBe(0);
  });

  it('draws the y = 60 series on the pixel row its value maps to', () => {
    const expectedRow = project(g.y, 60); // px coordinate of the line's centre
    const colour = hexRgb(okabeItoColours[1]!);
    for (const fraction of [0.2, 0.5, 0.8]) {
      const col = Math.round(g.plot.x + fraction * g.plot.width);
      const rows: number[] = [];
      for (let r = Math.floor(g.plot.y); r < g.plot.y + g.plot.height; r++) {
        // 60 of 255: antialiased edge pixels of a 2.5 px line blend with white; the core stays close to the colour.
        if (colourDistance(pixel(img, col, r), colour) < 60) rows.push(r);
      }
      expect(rows.length).toBeGreaterThan(0);
      const centre = rows.reduce((s, r) => s + r, 0) / rows.length + 0.5; // row r covers [r, r + 1)
      // 1 px: the line is 2.5 px wide and antialiased, so its centre is found to about half a pixel.
      expect(Math.abs(centre - expectedRow)).toBeLessThan(1);
    }
  });

  it('gives the same bytes for the same input', async () => {
    const again = await svgToPng(lineChart(spec).svg);
    expect(again.equals(bytes)).toBe(true);
  });

  it('honours width/height and scales by dpi / 96, recording the dpi', async () => {
    const small = decodePng(await svgToPng(lineChart({ ...spec, width: 800, height: 500 }).svg));
    expect([small.width, small.height]).toEqual([800, 500]);
    const print = await svgToPng(chart.svg, { dpi: 192 });
    const big = decodePng(print);
    expect([big.width, big.height]).toEqual([2400, 1500]);
    // pHYs stores whole pixels per metre: 192 dpi -> 7559 px/m -> 191.9986 dpi.
    expect(readPngDpi(print)).toBeCloseTo(192, 2);
    const fixed = decodePng(await svgToPng(chart.svg, { width: 600 }));
    expect([fixed.width, fixed.height]).toEqual([600, 375]);
  });
});

describe('legend placement', () => {
  /** The legend box: the only rect drawn with fill-opacity 0.92. */
  function legendRect(svg: string): { x: number; y: number; width: number; height: number } {
    const m = /<rect x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)" fill="#ffffff" fill-opacity="0.92"/.exec(svg);
    if (!m) throw new Error('no legend box');
    return { x: Number(m[1]), y: Number(m[2]), width: Number(m[3]), height: Number(m[4]) };
  }

  it('goes inside, in a corner the data leave free', () => {
    const chart = lineChart(spec);
    const box = legendRect(chart.svg);
    const g = chart.panels[0]!;
    expect(box.y).toBeGreaterThanOrEqual(g.plot.y);
    expect(box.y + box.height).toBeLessThanOrEqual(g.plot.y + g.plot.height);
    // No data point of either series falls inside the box.
    for (const s of spec.panels[0]!.series) {
      for (let k = 0; k < s.x.length; k++) {
        const px = project(g.x, s.x[k]!),
          py = project(g.y, s.y[k]!);
        const inside = px > box.x && px < box.x + box.width && py > box.y && py < box.y + box.height;
        expect(inside).toBe(false);
      }
    }
  });

  it('moves below the plot when lines cross every corner', () => {
    // Horizontal lines at the bottom, middle and top of the range cover all six candidate places.
    const levels = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
    const crowded = lineChart({
      title: 'crowded',
      xLabel: 'x',
      panels: [{ yLabel: 'y', yDomain: [0, 10], series: levels.map((v) => ({ label: `y = ${v}`, x: [0, 30], y: [v, v] })) }],
    });
    const g = crowded.panels[0]!;
    expect(legendRect(crowded.svg).y).toBeGreaterThan(g.plot.y + g.plot.height);
  });
});
