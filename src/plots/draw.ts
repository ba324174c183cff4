/** One chart of a kind as SVG text, from the sources it needs (sources.ts). */
import type { FinStudy2D } from '../fd/index.js';
import { fieldChart, lineChart, tornadoChart } from '../images/index.js';
import { finSensitivityInput, sensitivityChartSpec } from './sensitivity-chart.js';
import { fluxChartSpec } from './flux-chart.js';
import { heatmapChartSpec } from './heatmap-chart.js';
import { profileChartSpec, type ChartSize, type CheckPlotInput } from './profile-chart.js';
import type { PlotKind } from './sources.js';
import type { Case } from '../case/index.js';

export interface PlotSources {
  case: Case;
  check: CheckPlotInput | null;
  field: FinStudy2D | null;
}

/** SVG of one chart. `rasterScale` (PNG dpi / 96) sharpens the heat map's embedded raster. */
export function plotSvg(kind: PlotKind, sources: PlotSources, size: ChartSize, rasterScale = 1): string {
  switch (kind) {
    case 'profile':
      return lineChart(profileChartSpec(need(sources.check, kind), size)).svg;
    case 'flux':
      return lineChart(fluxChartSpec(need(sources.check, kind), size)).svg;
    case 'sensitivity': {
      const input = finSensitivityInput(need(sources.check, kind).report);
      return tornadoChart(sensitivityChartSpec(need(input, kind), size)).svg;
    }
    case 'heatmap':
      return fieldChart(heatmapChartSpec(sources.case, need(sources.field ?? sources.check?.twoD ?? null, kind), size, rasterScale)).svg;
    default: {
      const never: never = kind;
      throw new Error(`plotSvg: unknown kind ${String(never)}`);
    }
  }
}

function need<T>(value: T | null, kind: PlotKind): T {
  if (value === null) throw new Error(`plotSvg: the ${kind} chart needs data that was not computed`);
  return value;
}
