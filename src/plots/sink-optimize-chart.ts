/**
 * The chart of `optimize --out` for a heat sink (the sink's form of optimize-chart.ts): the hottest source's mean
 * temperature against the varied dimension (the fin count, or the fin thickness in the display length unit), the
 * reference's curve (fd-3d on the search study) and the shortcut's, both optima marked at the reference's value on
 * the confirm study (what following the shortcut gives, beside the best); a required temperature is drawn as a line.
 */
import { SINK_CHART_CAUTION } from '../compare/index.js';
import type { LineChartSpec } from '../images/index.js';
import type { ChartSize } from './profile-chart.js';
import { sig } from './labels.js';

export interface SinkOptimizeChartInput {
  caseName: string;
  objective: string;
  keep: string;
  key: string;
  /** The varied key's values: counts, or m. */
  x: readonly number[];
  /** Hottest source's mean temperature, degC, from the reference (search study) and the shortcut. */
  reference_degC: readonly number[];
  shortcut_degC: readonly number[];
  curveNote: string;
  reference: { x: number; temperature_degC: number; model: string };
  /** The shortcut's optimum: its own temperature, and the reference's there. */
  shortcut: { x: number; temperature_degC: number; referenceTemperature_degC: number; model: string };
  bounds: readonly [number, number];
  requiredTemperature_degC: number | null;
  /** Display units: the length unit for a thickness (scale from m, label) and the temperature unit (scale, offset, label). */
  units: { lengthScale: number; length: string; temperatureScale: number; temperatureOffset: number; temperature: string };
}

export function sinkOptimizeChartSpec(input: SinkOptimizeChartInput, size: ChartSize): LineChartSpec {
  const count = input.key === 'array.count';
  const u = input.units;
  const xs = (v: number): number => (count ? v : v * u.lengthScale);
  const ts = (t: number): number => t * u.temperatureScale + u.temperatureOffset;
  const x = input.x.map(xs);
  const required = input.requiredTemperature_degC;
  const xText = (v: number): string => (count ? `${v} fins` : `${sig(xs(v))} ${u.length}`);
  return {
    title: `${input.objective}: hottest source temperature against ${input.key}`,
    subtitle: [
      `${input.caseName}: keep ${input.keep}; ${input.curveNote}. Reference optimum by ${input.reference.model}; shortcut ${input.shortcut.model}`,
      SINK_CHART_CAUTION,
    ],
    xLabel: count ? `${input.key} (fins on the fixed plate)` : `${input.key} (${u.length})`,
    xScale: count ? 'linear' : 'log',
    xDomain: [xs(input.bounds[0]), xs(input.bounds[1])],
    panels: [
      {
        yLabel: `Hottest source mean temperature (${u.temperature})`,
        series: [
          {
            label: `reference (${input.reference.model}, search study)`,
            x,
            y: input.reference_degC.map(ts),
            note: `optimum (dot) ${xText(input.reference.x)}, ${sig(ts(input.reference.temperature_degC))} ${u.temperature}`,
          },
          {
            label: `shortcut ${input.shortcut.model}`,
            x,
            y: input.shortcut_degC.map(ts),
            note: `optimum (diamond) ${xText(input.shortcut.x)}: ${sig(ts(input.shortcut.referenceTemperature_degC))} ${u.temperature} by ${input.reference.model} (its own ${sig(ts(input.shortcut.temperature_degC))})`,
          },
          ...(required === null
            ? []
            : [
                {
                  label: `required ${sig(ts(required))} ${u.temperature}`,
                  x: [x[0] ?? 0, x[x.length - 1] ?? 0],
                  y: [ts(required), ts(required)],
                  style: 'dotted' as const,
                },
              ]),
        ],
        points: [
          { x: xs(input.reference.x), y: ts(input.reference.temperature_degC), label: 'reference optimum', marker: 'circle' },
          { x: xs(input.shortcut.x), y: ts(input.shortcut.referenceTemperature_degC), label: 'shortcut optimum', marker: 'diamond' },
        ],
      },
    ],
    legend: 'below',
    width: size.width,
    height: size.height,
  };
}
