/**
 * The chart of `optimize --out`: the heat rate against the varied dimension along the constraint, the
 * reference's curve (fd-1d) and the shortcut's, with both optima marked at the reference's heat rate (its own
 * model's, fd-2d where that is the reference): what following the shortcut gives, beside the best; the shortcut's
 * own formula value is in its label. A required heat rate is drawn as a line.
 */
import { CHART_CAUTION } from '../compare/index.js';
import type { LineChartSpec } from '../images/index.js';
import type { ChartSize } from './profile-chart.js';
import { sig } from './labels.js';

export interface OptimizeChartInput {
  caseName: string;
  objective: string;
  keep: string;
  /** The varied key and its values, m. */
  key: string;
  x_m: readonly number[];
  reference_W: readonly number[];
  shortcut_W: readonly number[];
  curveNote: string;
  reference: { x_m: number; heatRate_W: number; model: string };
  /** The shortcut's optimum, its own formula's heat rate, and the reference's heat rate there (shortcutAtReference_W). */
  shortcut: { x_m: number; heatRate_W: number; referenceHeatRate_W: number; method: string };
  bounds_m: readonly [number, number];
  requiredHeat_W: number | null;
}

const mm = (x: number): number => x * 1000;

export function optimizeChartSpec(input: OptimizeChartInput, size: ChartSize): LineChartSpec {
  const xs = input.x_m.map(mm);
  const required = input.requiredHeat_W;
  return {
    title: `${input.objective}: heat rate against ${input.key}: ${input.caseName}`,
    subtitle: [
      `keep ${input.keep}; ${input.curveNote}. Reference optimum by ${input.reference.model}; shortcut optimum: ${input.shortcut.method.split(/[:;(]/)[0]?.trim() ?? ''}`,
      CHART_CAUTION,
    ],
    xLabel: `${input.key} (mm)`,
    xScale: 'log',
    xDomain: [mm(input.bounds_m[0]), mm(input.bounds_m[1])],
    panels: [
      {
        yLabel: 'Heat rate Q (W)',
        series: [
          {
            label: 'reference (fd-1d)',
            x: xs,
            y: input.reference_W,
            note: `optimum (dot) ${sig(mm(input.reference.x_m))} mm, ${sig(input.reference.heatRate_W)} W by ${input.reference.model}`,
          },
          {
            label: 'shortcut tanh(mLc)/(mLc)',
            x: xs,
            y: input.shortcut_W,
            note: `optimum (diamond) ${sig(mm(input.shortcut.x_m))} mm: ${sig(input.shortcut.referenceHeatRate_W)} W by ${input.reference.model} (its own formula ${sig(input.shortcut.heatRate_W)} W)`,
          },
          ...(required === null
            ? []
            : [{ label: `required ${sig(required)} W`, x: [xs[0] ?? 0, xs[xs.length - 1] ?? 0], y: [required, required], style: 'dotted' as const }]),
        ],
        points: [
          { x: mm(input.reference.x_m), y: input.reference.heatRate_W, label: 'reference optimum', marker: 'circle' },
          {
            x: mm(input.shortcut.x_m),
            y: input.shortcut.referenceHeatRate_W,
            label: 'shortcut optimum',
            marker: 'diamond',
          },
        ],
      },
    ],
    legend: 'below',
    width: size.width,
    height: size.height,
  };
}
