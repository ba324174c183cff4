/**
 * Layout of the check's charts as geometry of the SVG (positions in px, no golden images): the flux
 * axis of a positive heat flow does not dip below zero, the heat map's colour bar and axis titles are
 * no taller than the plot, "base" and "tip" read the same way and no iso-line label sits on them, the
 * tip temperature label keeps clear of the lines, and a long case name stays inside the canvas.
 * Cases are invented for the test; nothing here is a reference value.
 */
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadCase, parseCaseText } from '../../src/case/parse.js';
import { fieldChart, lineChart, project, type ChartResult, type FieldChartResult } from '../../src/images/index.js';
import { readableAngle } from '../../src/images/field-chart.js';
import { textWidth } from '../../src/images/text-metrics.js';
import { fontSize } from '../../src/images/theme.js';
import { fluxChartSpec } from '../../src/plots/flux-chart.js';
import { heatmapChartSpec } from '../../src/plots/heatmap-chart.js';
import { LABEL_CLEARANCE_PX } from '../../src/plots/point-labels.js';
import { profileChartSpec, type CheckPlotInput } from '../../src/plots/profile-chart.js';
import { checkPlotInput, fieldStudy } from '../../src/plots/sources.js';

const size = { width: 1200, height: 750 };

interface SvgText {
  text: string;
  x: number;
  y: number;
  rotate: number;
  fontSize: number;
}

/** Every filled <text> of an SVG with its position, font size and rotation (halo copies skipped). */
function texts(svg: string): SvgText[] {
  const out: SvgText[] = [];
  const re = /<text([^>]*)>([^<]*)<\/text>/g;
  for (let m = re.exec(svg); m; m = re.exec(svg)) {
    const attrs = m[1] ?? '';
    if (/fill="none"/.test(attrs)) continue;
    const num = (name: string): number => Number(new RegExp(` ${name}="([^"]*)"`).exec(attrs)?.[1] ?? NaN);
    const rotate = Number(/rotate\(([-\d.]+)/.exec(attrs)?.[1] ?? 0);
    out.push({ text: (m[2] ?? '').replace(/&amp;/g, '&'), x: num('x'), y: num('y'), rotate, fontSize: num('font-size') });
  }
  return out;
}

const annularAdiabatic = parseCaseText(
  `name: disc fin, insulated rim
fin: { profile: annular, innerRadius: 10 mm, outerRadius: 80 mm, thickness: 3 mm }
material: { k: 167 W/(m*K) }
convection: { ambient: 25 degC, h: 20 W/(m^2*K), tip: adiabatic }
base: { temperature: 85 degC }
`,
  'annular.yaml',
);

describe('flux chart of an annular fin with an insulated rim', () => {
  let input: CheckPlotInput;
  let chart: ChartResult;
  beforeAll(async () => {
    input = await checkPlotInput(annularAdiabatic, { tolerance: 0.02, reference: '2d', ledger: false });
    chart = lineChart(fluxChartSpec(input, size));
  });

  it('the fd-2d heat flow is never negative and is exactly 0 at the adiabatic rim', () => {
    const p = input.profiles.profiles.find((q) => q.model === 'fd-2d');
    expect(p).toBeDefined();
    const flow = Array.from(p?.flow.values ?? []);
    // Before the fix Q(x) was summed down from the base and left -4e-4 W (the quadrature's mismatch) at the rim.
    expect(Math.min(...flow)).toBeGreaterThanOrEqual(0);
    expect(flow[flow.length - 1]).toBe(input.twoD?.finest.tipHeatRate_W);
    // Q(0) is the solver's face + tip loss: the base heat rate to its energy balance (1e-10 checked in tests/fd2d; 1e-8 here).
    expect(Math.abs((flow[0] as number) / (p?.heatRate_W ?? NaN) - 1)).toBeLessThan(1e-8);
  });

  it('both y axes start at zero for a positive heat flow and loss (was -200 W)', () => {
    for (const panel of chart.panels) expect(panel.y.domain[0]).toBe(0);
  });
});

describe('heat map of a short pin (true shape, a plot much lower than the canvas)', () => {
  let chart: FieldChartResult;
  beforeAll(async () => {
    const c = parseCaseText(
      `name: short pin
fin: { profile: pin, length: 10 mm, diameter: 3 mm }
material: { k: 390 W/(m*K) }
convection: { ambient: 30 degC, h: 35 W/(m^2*K), tip: convective }
base: { temperature: 70 degC }
`,
      'pin.yaml',
    );
    chart = fieldChart(heatmapChartSpec(c, await fieldStudy(c), size));
  });

  it('the colour bar spans exactly the plot height (it was 60 % of the canvas, taller than the plot)', () => {
    expect(chart.plot.height).toBeLessThan(0.6 * 750 - 100);
    expect(chart.colourBar.y).toBeCloseTo(chart.plot.y, 9);
    expect(chart.colourBar.height).toBeCloseTo(chart.plot.height, 9);
  });

  it('"base" and "tip" are turned the same way, and no iso-line label overlaps them or the edge lines', () => {
    const all = texts(chart.svg);
    const base = all.find((t) => t.text === 'base');
    const tip = all.find((t) => t.text === 'tip');
    expect(base?.rotate).toBe(-90);
    expect(tip?.rotate).toBe(-90);
    const boxes = chart.edgeLabelBoxes;
    expect(boxes.length).toBe(4);
    const labels = all.filter((t) => t.text.endsWith('°C') && t.fontSize === fontSize.annotation);
    expect(labels.length).toBeGreaterThan(2);
    for (const l of labels) {
      // Iso-lines of a pin are near vertical here, so their labels are horizontal.
      expect(l.rotate).toBe(0);
      const w = textWidth(l.text, l.fontSize) / 2;
      const box = { x0: l.x - w, x1: l.x + w, y0: l.y - 0.75 * l.fontSize, y1: l.y + 0.25 * l.fontSize };
      for (const b of boxes) expect(box.x0 < b.x1 && b.x0 < box.x1 && box.y0 < b.y1 && b.y0 < box.y1).toBe(false);
    }
  });
});

describe('heat map titles on a small canvas', () => {
  it('the rotated y title and colour bar title are no taller than the plot; the stretch note is kept', async () => {
    const c = parseCaseText(
      `name: long pin
fin: { profile: pin, length: 60 mm, diameter: 3 mm }
material: { k: 390 W/(m*K) }
convection: { ambient: 30 degC, h: 35 W/(m^2*K), tip: convective }
base: { temperature: 70 degC }
`,
      'pin.yaml',
    );
    const chart = fieldChart(heatmapChartSpec(c, await fieldStudy(c), { width: 900, height: 420 }));
    const rotated = texts(chart.svg).filter((t) => Math.abs(t.rotate) === 90 && t.fontSize === fontSize.axisLabel);
    expect(rotated.length).toBeGreaterThanOrEqual(2);
    for (const t of rotated) expect(textWidth(t.text, t.fontSize)).toBeLessThanOrEqual(chart.plot.height + 1e-9);
    expect(chart.yStretch).toBeGreaterThan(1);
    expect(rotated.map((t) => t.text)).toContain(`stretched ×${chart.yStretch}`);
  });

  it('readableAngle turns text to read left to right, and vertical text bottom to top', () => {
    expect(readableAngle(90)).toBe(-90);
    expect(readableAngle(-90)).toBe(-90);
    expect(readableAngle(270)).toBe(-90);
    expect(readableAngle(170)).toBeCloseTo(-10, 12);
    expect(readableAngle(-135)).toBeCloseTo(45, 12);
    expect(readableAngle(30)).toBe(30);
  });
});

describe('profile chart labels', () => {
  let input: CheckPlotInput;
  beforeAll(async () => {
    // The invented demo fin whose tip label sat on the tanh-L line and markers before labels kept a clearance.
    const c = loadCase(join(import.meta.dirname, '../../demo/inverter-plate-fin.yaml'));
    input = await checkPlotInput(c, { tolerance: 0.02, reference: '2d', ledger: false });
  });

  it('the tip label keeps its clearance from every drawn line', () => {
    const spec = profileChartSpec(input, size);
    const chart = lineChart(spec);
    const g = chart.panels[0];
    expect(g).toBeDefined();
    if (!g) return;
    const tip = texts(chart.svg).find((t) => t.text.startsWith('tip '));
    expect(tip).toBeDefined();
    if (!tip) return;
    const w = textWidth(tip.text, tip.fontSize);
    // The line chart anchors point labels at their end ("text-anchor: end") or start; take the box either way.
    const anchorEnd = new RegExp(`text-anchor="end"[^>]*>${tip.text.replace(/[()]/g, '\\$&')}<`).test(chart.svg);
    const x0 = anchorEnd ? tip.x - w : tip.x;
    const box = { x0, x1: x0 + w, y0: tip.y - 0.75 * tip.fontSize, y1: tip.y + 0.2 * tip.fontSize };
    let nearest = Infinity;
    for (const s of spec.panels[0]?.series ?? []) {
      for (let i = 0; i + 1 < s.x.length; i++) {
        // Sample each segment finely in screen space.
        const ax = project(g.x, s.x[i] as number),
          ay = project(g.y, s.y[i] as number);
        const bx = project(g.x, s.x[i + 1] as number),
          by = project(g.y, s.y[i + 1] as number);
        for (let t = 0; t <= 1; t += 0.1) {
          const px = ax + t * (bx - ax),
            py = ay + t * (by - ay);
          const dx = Math.max(box.x0 - px, 0, px - box.x1);
          const dy = Math.max(box.y0 - py, 0, py - box.y1);
          nearest = Math.min(nearest, Math.hypot(dx, dy));
        }
      }
    }
    // Markers (11 px) sit on the lines: the label's box must stay a marker's half size plus 4 px of white
    // paper from every line's centre (before the clearance it was 8.3 px: 2.8 px from a tanh-L marker).
    expect(LABEL_CLEARANCE_PX).toBeGreaterThanOrEqual(11 / 2 + 1);
    expect(nearest).toBeGreaterThanOrEqual(11 / 2 + 4);
  });

  it('a 10,000-character case name is cut with … inside the canvas', () => {
    const long = { ...input, case: { ...input.case, name: 'x'.repeat(10_000) } };
    const chart = lineChart(profileChartSpec(long, size));
    const title = texts(chart.svg).find((t) => t.fontSize === fontSize.title);
    expect(title?.text.endsWith('…')).toBe(true);
    // Bold glyphs run up to about 8 % wider than the regular widths measured here.
    expect(1.08 * textWidth(title?.text ?? '', fontSize.title)).toBeLessThanOrEqual(size.width - 2 * 18);
  });
});
