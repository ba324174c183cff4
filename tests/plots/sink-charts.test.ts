/**
 * The heat-sink charts (plots/sink-*.ts) checked for content, not pixels: the plate seen from above names every
 * source with the mean and maximum temperatures the check reports and outlines it where the case puts it, draws
 * every fin footprint and a colour bar in °C; the heat-per-fin bars are numbered as the JSON `fins` array and as
 * tall as the heats; the temperature up the hottest and the coolest fin falls from root to tip (a convecting fin
 * fed from its root, ambient below it: the maximum principle), as does the shortcut's 1-D fin, whose root sits at
 * the uniform base temperature. The sinks are invented (this is a drawing test: the numbers come from the model).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { barChart, lineChart, project, svgToPng } from '../../src/images/index.js';
import { sinkLayout } from '../../src/mesh/index.js';
import {
  sinkFinHeatChartSpec,
  sinkFinProfileChartSpec,
  sinkPlateChart,
  sinkPlotAvailability,
  sinkPlotInput,
  type SinkPlotInput,
} from '../../src/plots/index.js';
import { decodePng, svgTexts, wellFormednessError } from '../images/helpers.js';
import { plateFin, sinkCase } from '../sink/support/sink-case.js';

const size = { width: 1200, height: 750 };

const sink = {
  ...sinkCase({
    plate: [0.04, 0.04, 0.004],
    kPlate: 200,
    fin: plateFin(0.02, 0.0015, 0.04),
    array: { kind: 'plates', count: 4, pitch: 0.01 },
    hPlate: 30,
    h: { kind: 'uniform', h: 40 },
    tip: { kind: 'convective', h: null },
    sources: [
      { name: 'chip', centre: [0.013, 0.02], size: [0.01, 0.01], power: 12, contactResistance: 2e-5 },
      { name: 'driver', centre: [0.03, 0.012], size: [0.006, 0.008], power: 4 },
    ],
  }),
  name: 'invented chart sink',
};

let input: SinkPlotInput;
beforeAll(async () => {
  input = await sinkPlotInput(sink, 0.1);
}, 120_000);

describe('the plate seen from above', () => {
  it('names every source with its mean and maximum temperature as the check reports them', () => {
    const chart = sinkPlateChart(input, size);
    expect(wellFormednessError(chart.svg)).toBeNull();
    const texts = svgTexts(chart.svg);
    for (const s of input.report.sources) {
      expect(texts).toContain(s.name);
      expect(texts).toContain(`mean ${s.meanTemperature_degC.toFixed(1)} °C`);
      expect(texts).toContain(`max ${s.maxTemperature_degC.toFixed(1)} °C`);
    }
    expect(texts.join(' ')).toMatch(/Temperature T \(°C\)/);
    expect(texts.join(' ')).toMatch(/underside/);
  });

  it('outlines each source where the case puts it and draws every fin footprint', () => {
    const chart = sinkPlateChart(input, size);
    const layout = sinkLayout(sink);
    const outlines = [...chart.svg.matchAll(/<rect class="source-outline-core" x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)"/g)];
    expect(outlines).toHaveLength(2);
    layout.sources.forEach((r, k) => {
      const m = outlines[k]!;
      // Two decimals in the SVG: 0.01 px.
      expect(Number(m[1])).toBeCloseTo(project(chart.x, 1000 * r.x0), 1);
      expect(Number(m[1]) + Number(m[3])).toBeCloseTo(project(chart.x, 1000 * r.x1), 1);
      expect(Number(m[2])).toBeCloseTo(project(chart.y, 1000 * r.y1), 1);
    });
    expect(chart.svg.match(/class="fin-footprint"/g)).toHaveLength(4);
  });

  it('colours the field with the model values: the hottest raster value is at most the hottest source maximum', () => {
    const chart = sinkPlateChart(input, size);
    const hottest = Math.max(...input.report.sources.map((s) => s.maxTemperature_degC));
    expect(chart.valueRange[1]).toBeLessThanOrEqual(hottest + 1e-9);
    expect(chart.valueRange[0]).toBeGreaterThan(sink.convection.ambient_degC);
  });

  it('renders to a PNG of the asked size', async () => {
    const img = decodePng(await svgToPng(sinkPlateChart(input, size).svg));
    expect([img.width, img.height]).toEqual([1200, 750]);
  });
});

describe('heat per fin', () => {
  it('one bar a fin, numbered as the JSON fins array, as tall as its heat', () => {
    const spec = sinkFinHeatChartSpec(input, size);
    expect(spec.categories).toEqual(input.report.fins.map((f) => String(f.index)));
    const chart = barChart(spec);
    expect(wellFormednessError(chart.svg)).toBeNull();
    expect(chart.bars).toHaveLength(4);
    const zero = project(chart.y, 0);
    input.report.fins.forEach((f, k) => {
      const bar = chart.bars[k]!;
      expect(bar.y).toBeCloseTo(project(chart.y, f.heatRate_W), 6);
      expect(bar.y + bar.height).toBeCloseTo(zero, 6);
    });
    const texts = svgTexts(chart.svg);
    for (const f of input.report.fins) expect(texts).toContain(String(f.index));
    expect(texts.join(' ')).toMatch(/overall-efficiency-exact-fin \(uniform base\)/);
  });
});

describe('temperature up the hottest and the coolest fin', () => {
  it('both fd-3d fins and the shortcut fall from root to tip; the hottest starts at its root temperature', () => {
    const spec = sinkFinProfileChartSpec(input, size);
    const series = spec.panels[0]!.series;
    expect(series.map((s) => s.label)).toEqual([
      expect.stringMatching(/^fd-3d, fin \d \(hottest root\)$/),
      expect.stringMatching(/^fd-3d, fin \d \(coolest root\)$/),
      'overall-efficiency-exact-fin: 1-D fin at the uniform base',
    ]);
    for (const s of series) {
      for (let k = 1; k < s.y.length; k++) expect(s.y[k] as number).toBeLessThan(s.y[k - 1] as number);
      expect(s.y[s.y.length - 1] as number).toBeGreaterThan(sink.convection.ambient_degC);
    }
    const hottest = Math.max(...input.report.fins.map((f) => f.rootTemperature_degC));
    expect(series[0]!.y[0]).toBeCloseTo(hottest, 9);
    expect(series[1]!.y[0] as number).toBeLessThan(hottest);
    expect(series[2]!.y[0]).toBeCloseTo(input.prediction!.baseTemperature_degC, 9);
    const svg = lineChart(spec).svg;
    expect(wellFormednessError(svg)).toBeNull();
    expect(svgTexts(svg).join(' ')).toMatch(/Height above the plate \(mm\)/);
  });

  it('the shortcut fin carries the heat overall-efficiency-exact-fin gives each fin (its base rise times the 1-D conductance)', () => {
    const model = input.report.models.find((m) => m.model === 'overall-efficiency-exact-fin')!;
    const base = input.prediction!.baseTemperature_degC - sink.convection.ambient_degC;
    // uniformBaseSink: the source rises are the base rise plus 1-D plate and interface drops, so the base is below every rise.
    expect(base).toBeLessThan(Math.min(...model.sourceRise_K));
    expect(input.prediction!.heatRate_W).toBeGreaterThan(0);
  });

  it('a bare plate has no fin charts, only the plate', () => {
    const bare = sinkCase({ plate: [0.04, 0.04, 0.004], kPlate: 200, hPlate: 30, sources: [{ centre: [0.02, 0.02], size: [0.01, 0.01], power: 5 }] });
    expect(sinkPlotAvailability({ case: bare }, 'plate')).toEqual({ ok: true });
    expect(sinkPlotAvailability({ case: bare }, 'profile')).toMatchObject({ ok: false, reason: expect.stringMatching(/bare plate/) });
    expect(sinkPlotAvailability({ case: bare }, 'fin-heat')).toMatchObject({ ok: false });
  });
});
