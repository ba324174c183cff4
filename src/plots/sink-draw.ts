/** One heat-sink chart of a kind as SVG text (sink-input.ts says what each is drawn from). */
import { barChart, lineChart, tornadoChart } from '../images/index.js';
import type { ChartSize } from './profile-chart.js';
import { sinkFinHeatChartSpec } from './sink-fin-heat-chart.js';
import { sinkFinProfileChartSpec } from './sink-fin-profile-chart.js';
import type { SinkPlotInput, SinkPlotKind } from './sink-input.js';
import { sinkPlateChart } from './sink-plate-chart.js';
import { sensitivityChartSpec } from './sensitivity-chart.js';
import { sinkSensitivityInput } from './sink-sensitivity-chart.js';

/** Whether a kind can be drawn for this sink (a bare plate has no fins), and why not. */
export function sinkPlotAvailability(input: { case: { fin: unknown | null } }, kind: SinkPlotKind): { ok: true } | { ok: false; reason: string } {
  if (kind !== 'plate' && kind !== 'sensitivity' && input.case.fin === null)
    return { ok: false, reason: 'a bare plate (array.count: 0) has no fins to draw' };
  return { ok: true };
}

/** SVG of one chart. `rasterScale` (PNG dpi / 96) sharpens the plate's embedded raster. */
export function sinkPlotSvg(kind: SinkPlotKind, input: SinkPlotInput, size: ChartSize, rasterScale = 1): string {
  switch (kind) {
    case 'plate':
      return sinkPlateChart(input, size, rasterScale).svg;
    case 'fin-heat':
      return barChart(sinkFinHeatChartSpec(input, size)).svg;
    case 'profile':
      return lineChart(sinkFinProfileChartSpec(input, size)).svg;
    case 'sensitivity': {
      const chart = sinkSensitivityInput(input.report);
      if (chart === null) throw new Error('sinkPlotSvg: the sensitivity chart needs the check computed with its sensitivities');
      return tornadoChart(sensitivityChartSpec(chart, size)).svg;
    }
    default: {
      const never: never = kind;
      throw new Error(`sinkPlotSvg: unknown kind ${String(never)}`);
    }
  }
}
