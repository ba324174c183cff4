/**
 * Temperature up the hottest and the coolest fin of a heat sink (by fd-3d root temperature) against the shortcut:
 * the exact 1-D fin at the one uniform base temperature of overall-efficiency-exact-fin (compare/
 * sink-fin-prediction.ts), which is every fin's profile in that model. fd-3d's lines are each fin's mean over its
 * section at the layer centres of the finest grid, its root (junction) temperature at height 0. The gap between
 * the shortcut and the fd-3d lines at the root is the uniform-base assumption; the slopes are the fins.
 */
import { CHART_CAUTION } from '../compare/index.js';
import type { LineChartSpec, LineSeries } from '../images/index.js';
import { relativeError, sig } from './labels.js';
import type { ChartSize } from './profile-chart.js';
import { hottestAndCoolestFins, type SinkPlotInput } from './sink-input.js';

export function sinkFinProfileChartSpec(input: SinkPlotInput, size: ChartSize): LineChartSpec {
  const { study, case: c, prediction } = input;
  const profiles = study.finProfiles;
  const extremes = hottestAndCoolestFins(study);
  if (profiles === null || extremes === null) throw new Error('sinkFinProfileChartSpec: a bare plate has no fins to draw');
  const mm = (h: Float64Array) => Float64Array.from(h, (v) => 1000 * v);
  const fin = (k: number, words: string): LineSeries => {
    const f = study.fins[k];
    return {
      label: `fd-3d, fin ${k} (${words})`,
      x: mm(profiles.height_m),
      y: profiles.temperature_degC[k] ?? new Float64Array(0),
      note: f === undefined ? '' : `Q ${sig(f.heatRate_W)} W, root ${f.rootTemperature_degC.toFixed(1)} °C`,
    };
  };
  const series: LineSeries[] = [fin(extremes.hottest, 'hottest root')];
  if (extremes.coolest !== extremes.hottest) series.push(fin(extremes.coolest, 'coolest root'));
  if (prediction !== null) {
    series.push({
      label: 'overall-efficiency-exact-fin: 1-D fin at the uniform base',
      x: mm(prediction.height_m),
      y: prediction.temperature_degC,
      note: `Q ${sig(prediction.heatRate_W)} W, base ${prediction.baseTemperature_degC.toFixed(1)} °C`,
    });
  }
  const errors = study.errors.finHeat.filter((e): e is number => e !== null);
  return {
    title: `Temperature up the hottest and the coolest fin: ${c.name}`,
    subtitle: [
      `fd-3d: each fin's mean over its section (finest grid; fin heat error up to ${errors.length > 0 ? relativeError(Math.max(...errors)) : 'not estimated'}, GCI); fins numbered as in the JSON fins array.`,
      'The shortcut puts every fin on one uniform base temperature: its gap to fd-3d at the root is the uniform-base assumption.',
      CHART_CAUTION,
    ],
    xLabel: 'Height above the plate (mm)',
    panels: [{ yLabel: 'Temperature T (°C)', series }],
    width: size.width,
    height: size.height,
  };
}
