/**
 * Temperature up the hottest and the coolest fin of a heat sink (by fd-3d root temperature) against the shortcut:
 * the exact 1-D fin at the one uniform base temperature of overall-efficiency-exact-fin (compare/
 * sink-fin-prediction.ts), which is every fin's profile in that model. fd-3d's lines are each fin's mean over its
 * section at the layer centres of the finest grid, its root (junction) temperature at height 0. The gap between
 * the shortcut and the fd-3d lines at the root is the uniform-base assumption; the slopes are the fins.
 */
import { arrayInUnit, inUnit } from '../case/index.js';
import { SINK_CHART_CAUTION } from '../compare/index.js';
import type { LineChartSpec, LineSeries } from '../images/index.js';
import { relativeError, sig, unitsOf } from './labels.js';
import type { ChartSize } from './profile-chart.js';
import { hottestAndCoolestFins, type SinkPlotInput } from './sink-input.js';

export function sinkFinProfileChartSpec(input: SinkPlotInput, size: ChartSize): LineChartSpec {
  const { study, case: c, prediction } = input;
  const profiles = study.finProfiles;
  const extremes = hottestAndCoolestFins(study);
  if (profiles === null || extremes === null) throw new Error('sinkFinProfileChartSpec: a bare plate has no fins to draw');
  const u = unitsOf(c);
  const mm = (h: Float64Array) => arrayInUnit(u.length, h);
  const T = (t: number): string => `${inUnit(u.temperature, t).toFixed(1)} ${u.temperature.pretty}`;
  const Q = (q: number): string => `${sig(inUnit(u.heat, q))} ${u.heat.pretty}`;
  const fin = (k: number, words: string): LineSeries => {
    const f = study.fins[k];
    return {
      label: `fd-3d, fin ${k} (${words})`,
      x: mm(profiles.height_m),
      y: arrayInUnit(u.temperature, profiles.temperature_degC[k] ?? new Float64Array(0)),
      note: f === undefined ? '' : `Q ${Q(f.heatRate_W)}, root ${T(f.rootTemperature_degC)}`,
    };
  };
  const series: LineSeries[] = [fin(extremes.hottest, 'hottest root')];
  if (extremes.coolest !== extremes.hottest) series.push(fin(extremes.coolest, 'coolest root'));
  if (prediction !== null) {
    series.push({
      label: 'overall-efficiency-exact-fin: 1-D fin at the uniform base',
      x: mm(prediction.height_m),
      y: arrayInUnit(u.temperature, prediction.temperature_degC),
      note: `Q ${Q(prediction.heatRate_W)}, base ${T(prediction.baseTemperature_degC)}`,
    });
  }
  const errors = study.errors.finHeat.filter((e): e is number => e !== null);
  return {
    title: `Temperature up the hottest and the coolest fin: ${c.name}`,
    subtitle: [
      `fd-3d: each fin's mean over its section (finest grid; fin heat error up to ${errors.length > 0 ? relativeError(Math.max(...errors)) : 'not estimated'}, GCI); fins numbered as in the JSON fins array.`,
      'The shortcut puts every fin on one uniform base temperature: its gap to fd-3d at the root is the uniform-base assumption.',
      SINK_CHART_CAUTION,
    ],
    xLabel: `Height above the plate (${u.length.pretty})`,
    panels: [{ yLabel: `Temperature T (${u.temperature.pretty})`, series }],
    width: size.width,
    height: size.height,
  };
}
