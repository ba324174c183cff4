/**
 * Heat per fin of a heat sink (fd-3d: the heat entering each fin at its root, from the scheme's own
 * conductances), one bar a fin, numbered as in the JSON `fins` array (0-based: plate fins left to right in x,
 * pins row by row); the fins with the hottest and the coolest root highlighted; the uniform-base shortcut's heat
 * per fin (overall-efficiency-exact-fin: every fin at the one base temperature) as a dashed line.
 */
import { arrayInUnit, inUnit } from '../case/index.js';
import { SINK_CHART_CAUTION } from '../compare/index.js';
import type { BarChartSpec } from '../images/index.js';
import { relativeError, sig, unitsOf } from './labels.js';
import type { ChartSize } from './profile-chart.js';
import { hottestAndCoolestFins, type SinkPlotInput } from './sink-input.js';

export function sinkFinHeatChartSpec(input: SinkPlotInput, size: ChartSize): BarChartSpec {
  const { study, case: c } = input;
  const W = unitsOf(c).heat;
  const q = (x: number): string => `${sig(inUnit(W, x))} ${W.pretty}`;
  const heats = study.fins.map((f) => f.heatRate_W);
  const total = heats.reduce((s, q) => s + q, 0);
  const errors = study.errors.finHeat.filter((e): e is number => e !== null);
  const extremes = hottestAndCoolestFins(study);
  const uniformFinHeat = input.prediction?.heatRate_W ?? null;
  return {
    title: `Heat per fin: ${c.name}`,
    subtitle: [
      `fd-3d: ${study.fins.length} fins carry ${sig(inUnit(W, total))} ${W.pretty} of ${q(study.totalHeat_W)}; largest estimated error of a fin's heat ${errors.length > 0 ? relativeError(Math.max(...errors)) : 'not estimated'} (GCI).`,
      extremes === null
        ? ''
        : `Highlighted: fin ${extremes.hottest} (hottest root) and fin ${extremes.coolest} (coolest root). Fins numbered as in the JSON fins array.`,
      SINK_CHART_CAUTION,
    ].filter((s) => s !== ''),
    xLabel: c.array.kind === 'pins' ? 'Pin (row by row)' : 'Fin (left to right in x)',
    yLabel: `Heat rate Q (${W.pretty})`,
    categories: study.fins.map((f) => String(f.index)),
    values: arrayInUnit(W, heats),
    highlight: extremes === null ? [] : [extremes.hottest, extremes.coolest],
    lines:
      uniformFinHeat === null
        ? []
        : [{ value: inUnit(W, uniformFinHeat), label: `overall-efficiency-exact-fin (uniform base): ${q(uniformFinHeat)} each` }],
    width: size.width,
    height: size.height,
  };
}
