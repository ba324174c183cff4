/**
 * Tornado charts: horizontal bars: one bar per labelled category from 0 to its value, largest |value|
 * at the top, positive to the right of a zero line and negative to the left, a note beside each bar's end.
 * Plain data in, SVG text out; the module knows nothing about fins beyond the labels it is given.
 */
import { drawAxes, drawGrid, xAxisMargin, yAxisMargin } from './axes.js';
import { drawHeader } from './layout.js';
import { makeAxis, project, type Axis } from './scales.js';
import { okabeItoColours } from './series-styles.js';
import { el, svgDocument, textEl } from './svg.js';
import { capHeight, textWidth } from './text-metrics.js';
import { defaultHeight, defaultWidth, fontSize, gap, ink, stroke } from './theme.js';

export interface TornadoBar {
  label: string;
  value: number;
  /** Text beside the bar's end, e.g. "+0.83 (h 25 % -> +-21 %)". */
  note?: string;
  /** Drawn in the accent colour (e.g. the inputs with a stated uncertainty). */
  highlight?: boolean;
}

export interface TornadoChartSpec {
  title: string;
  subtitle?: string | readonly string[];
  /** Axis title of the values, with its unit. */
  xLabel: string;
  bars: readonly TornadoBar[];
  /** Legend words of the two colours, e.g. { plain: 'no stated uncertainty', highlight: 'stated uncertainty' }. */
  legend?: { plain: string; highlight: string };
  width?: number;
  height?: number;
}

const PLAIN = okabeItoColours[1] ?? '#0072B2';
const ACCENT = okabeItoColours[2] ?? '#D55E00';

/** The chart as SVG text (bars sorted by |value|, largest on top). */
export function tornadoChart(spec: TornadoChartSpec): { svg: string } {
  const width = spec.width ?? defaultWidth;
  const height = spec.height ?? defaultHeight;
  const header = drawHeader(spec.title, spec.subtitle, width);
  const bars = [...spec.bars].sort((a, b) => Math.abs(b.value) - Math.abs(a.value));
  const n = Math.max(1, bars.length);
  const legendHeight = spec.legend ? fontSize.legend + 2 * gap.legendRow : 0;
  const top = header.bottom + legendHeight;
  const bottom = height - gap.outer - xAxisMargin(true, true);
  // Categories: bar k at y = n - 1 - k (largest at the top).
  const yAxis: Axis = {
    scale: { kind: 'linear', domain: [-0.5, n - 0.5], range: [bottom, top] },
    ticks: bars.map((_, k) => n - 1 - k),
    labels: bars.map((b) => b.label),
    minorTicks: [],
  };
  const left = gap.outer + yAxisMargin(yAxis, false);
  const right = width - gap.outer - 12;
  // Room for the notes: the axis reaches past the longest bar by the widest note.
  const values = bars.map((b) => b.value);
  const low = Math.min(0, ...values);
  const high = Math.max(0, ...values);
  const span = high - low || 1;
  const widestNote = Math.max(0, ...bars.map((b) => textWidth(b.note ?? '', fontSize.annotation)));
  const share = Math.min(0.6, (widestNote + 16) / Math.max(1, right - left));
  const pad = (span * share) / (1 - share);
  const xAxis = makeAxis(
    'linear',
    low < 0 ? low - pad : 0,
    high > 0 ? high + pad : 0,
    left,
    right,
    Math.max(3, Math.round((right - left) / 110)),
    'loose',
  );
  const plot = { x: left, y: top, width: right - left, height: bottom - top };
  const body: string[] = [...header.elements];
  if (spec.legend) {
    const y = header.bottom + fontSize.legend;
    let x = left;
    for (const [colour, words] of [
      [ACCENT, spec.legend.highlight],
      [PLAIN, spec.legend.plain],
    ] as const) {
      body.push(el('rect', { x, y: y - fontSize.legend + 3, width: 18, height: fontSize.legend - 2, fill: colour }));
      body.push(textEl(words, { x: x + 24, y, 'font-size': fontSize.legend, fill: ink.text }));
      x += 24 + textWidth(words, fontSize.legend) + 30;
    }
  }
  body.push(drawGrid(plot, xAxis, { ...yAxis, ticks: [] }));
  const zero = project(xAxis.scale, 0);
  const slot = plot.height / n;
  bars.forEach((b, k) => {
    const yc = project(yAxis.scale, n - 1 - k);
    const end = project(xAxis.scale, b.value);
    const x0 = Math.min(zero, end);
    const h = Math.max(4, slot * 0.62);
    body.push(el('rect', { x: x0, y: yc - h / 2, width: Math.max(1, Math.abs(end - zero)), height: h, fill: b.highlight ? ACCENT : PLAIN }));
    if (b.note) {
      const after = b.value >= 0;
      body.push(
        textEl(b.note, {
          x: end + (after ? 8 : -8),
          y: yc + capHeight(fontSize.annotation) / 2,
          'font-size': fontSize.annotation,
          'text-anchor': after ? 'start' : 'end',
          fill: ink.text,
        }),
      );
    }
  });
  body.push(el('path', { d: `M${zero} ${plot.y}V${plot.y + plot.height}`, stroke: ink.axis, 'stroke-width': stroke.axis, fill: 'none' }));
  body.push(...drawAxes(plot, xAxis, yAxis, { xLabel: spec.xLabel, grid: true, xTickLabels: true }));
  return { svg: svgDocument(width, height, body) };
}
