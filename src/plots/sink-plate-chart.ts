/**
 * The plate of a heat sink seen from above: the fd-3d temperature of the plate's UNDERSIDE (z = 0, the face the
 * sources sit on, so the colours and the sources' labels are the same temperatures), viewed through the plate
 * from above (x to the right, y up, as in the case file). Each source is outlined and labelled with its name,
 * mean and maximum temperature (fd-3d, its interface drop included, as `check` reports them); the fins'
 * footprints on the top face are drawn dashed (pins: the square of equal area the model roots them on);
 * colour bar in the display temperature unit (°C by default; viridis), labelled isotherms; lengths in the display unit. The plate view is the finest grid's cell values sampled on
 * a regular raster (fd/three-d/sink-plate-view.ts): every colour is a value the model computed.
 */
import { SINK_CHART_CAUTION } from '../compare/index.js';
import { arrayInUnit, inUnit } from '../case/index.js';
import { el, fieldChart, fontSize, ink, project, textEl, textWidth, type FieldChartResult, type FieldChartSpec } from '../images/index.js';
import { sinkLayout } from '../mesh/index.js';
import type { ChartSize } from './profile-chart.js';
import { relativeError, unitsOf } from './labels.js';
import type { SinkPlotInput } from './sink-input.js';

export function sinkPlateChartSpec(input: SinkPlotInput, size: ChartSize, rasterScale = 1): FieldChartSpec {
  const { study, case: c } = input;
  const u = unitsOf(c);
  const v = study.plate;
  const n = v.nx * v.ny;
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let j = 0; j < v.ny; j++) {
    for (let i = 0; i < v.nx; i++) {
      x[j * v.nx + i] = inUnit(u.length, v.x[i] ?? Number.NaN);
      y[j * v.nx + i] = inUnit(u.length, v.y[j] ?? Number.NaN);
    }
  }
  const worst = input.report.reference.discretizationError;
  return {
    title: `Plate underside temperature, seen from above: ${c.name}`,
    subtitle: [
      `fd-3d (${input.report.reference.unknowns[0]?.toLocaleString('en-US') ?? '?'} unknowns on the finest grid); the underside, where the sources sit, seen through the plate; source mean rise error ${relativeError(worst ?? Number.NaN)} (GCI).`,
      `Sources outlined with their mean and maximum temperature${c.sources.some((s) => s.contactResistance > 0) ? " (the labels add the interface drop q''·R_c; the colours are the plate's face)" : ''}; fin footprints on the top face dashed${c.array.kind === 'pins' ? ' (pins: the square of equal area)' : ''}.`,
      SINK_CHART_CAUTION,
    ],
    xLabel: `Across the plate x (${u.length.pretty})`,
    yLabel: `Along the plate y (${u.length.pretty})`,
    valueLabel: `Temperature T (${u.temperature.pretty})`,
    valueUnit: ` ${u.temperature.pretty}`,
    grid: { ni: v.nx, nj: v.ny, x, y, strideI: 1, strideJ: v.nx },
    values: arrayInUnit(u.temperature, v.underside_degC),
    colormap: 'viridis',
    yStretch: 1,
    width: size.width,
    height: size.height,
    rasterScale,
  };
}

/** The chart with the fin footprints and the sources (outline and label) drawn over the field. */
export function sinkPlateChart(input: SinkPlotInput, size: ChartSize, rasterScale = 1): FieldChartResult {
  const chart = fieldChart(sinkPlateChartSpec(input, size, rasterScale));
  const layout = sinkLayout(input.case);
  const u = unitsOf(input.case);
  const px = (m: number) => project(chart.x, inUnit(u.length, m));
  const py = (m: number) => project(chart.y, inUnit(u.length, m));
  const T = (t: number): string => `${inUnit(u.temperature, t).toFixed(1)} ${u.temperature.pretty}`;
  const box = (r: { x0: number; x1: number; y0: number; y1: number }) => ({
    x: px(r.x0),
    y: py(r.y1),
    width: px(r.x1) - px(r.x0),
    height: py(r.y0) - py(r.y1),
  });
  const overlay: string[] = [];
  for (const r of layout.fins) {
    overlay.push(
      el('rect', { class: 'fin-footprint', ...box(r), fill: 'none', stroke: ink.halo, 'stroke-width': 1.2, 'stroke-dasharray': '5 4', opacity: 0.9 }),
    );
  }
  layout.sources.forEach((r, k) => {
    const s = input.report.sources[k];
    if (s === undefined) return;
    const b = box(r);
    overlay.push(el('rect', { class: 'source-outline', ...b, fill: 'none', stroke: ink.halo, 'stroke-width': 4 }));
    overlay.push(el('rect', { class: 'source-outline-core', ...b, fill: 'none', stroke: ink.text, 'stroke-width': 2 }));
    const lines = [s.name, `mean ${T(s.meanTemperature_degC)}`, `max ${T(s.maxTemperature_degC)}`];
    const step = fontSize.annotation + 3;
    const wide = Math.max(...lines.map((l) => textWidth(l, fontSize.annotation)));
    // Inside the outline when it fits, else above it (below when there is no room above).
    const inside = b.width >= wide + 8 && b.height >= lines.length * step + 6;
    const above = b.y - chart.plot.y >= lines.length * step + 6;
    const cx = Math.min(Math.max(b.x + b.width / 2, chart.plot.x + wide / 2 + 4), chart.plot.x + chart.plot.width - wide / 2 - 4);
    const first = inside ? b.y + b.height / 2 - ((lines.length - 1) * step) / 2 + 5 : above ? b.y - 6 - (lines.length - 1) * step : b.y + b.height + step;
    overlay.push(
      el(
        'g',
        { class: 'source-label' },
        lines.map((line, j) =>
          textEl(line, {
            x: cx,
            y: first + j * step,
            'font-size': fontSize.annotation,
            'font-weight': j === 0 ? 'bold' : undefined,
            'text-anchor': 'middle',
            fill: ink.text,
            stroke: ink.halo,
            'stroke-width': 4,
            'paint-order': 'stroke',
          }),
        ),
      ),
    );
  });
  const svg = chart.svg.replace(/<\/svg>\s*$/, `${el('g', { class: 'sink-overlay' }, overlay)}</svg>`);
  return { ...chart, svg };
}
