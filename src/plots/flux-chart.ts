/**
 * The flux chart of `fincheck plot`: the heat flowing along the fin Q(x) (W) and the heat lost per unit
 * length q'(x) = h P theta (W/m), for every model of the check, on two panels sharing the x axis.
 * Where Q has fallen to a tenth of its base value, 90 % of the heat has left the fin: the length
 * beyond that point carries little, which is where the fin stops working; the chart marks it on the
 * reference (or says how much the tip still passes when it never falls that far).
 */
import type { LineChartSpec, LineSeries } from '../images/index.js';
import type { ModelProfile } from '../compare/index.js';
import { alongAxisTitle, inDisplay, lineLabel, modelStyle, thinSeries, toMillimetres, unitsOf } from './labels.js';
import { checkSubtitle, legendNote, type ChartSize, type CheckPlotInput } from './profile-chart.js';

/** Fraction of the base heat rate still flowing at the marked point. */
export const REMAINING_FRACTION = 0.1;

/** First position (m) where the flow falls to `fraction` of the base flow, by linear interpolation; null if never. */
export function positionOfRemainingFlow(p: ModelProfile, fraction = REMAINING_FRACTION): number | null {
  const { x_m: xs, values: flow } = p.flow;
  const target = fraction * (flow[0] as number);
  for (let i = 1; i < flow.length; i++) {
    const q0 = flow[i - 1] as number;
    const q1 = flow[i] as number;
    if (q1 <= target && q0 > target) {
      const x0 = xs[i - 1] as number;
      const x1 = xs[i] as number;
      return x0 + ((x1 - x0) * (q0 - target)) / (q0 - q1);
    }
  }
  return null;
}

export function fluxChartSpec(input: CheckPlotInput, size: ChartSize): LineChartSpec {
  const { case: c, report, profiles } = input;
  const offset = profiles.baseX_m;
  const u = unitsOf(c);
  const flow: LineSeries[] = [];
  const loss: LineSeries[] = [];
  for (const p of profiles.profiles) {
    const label = lineLabel(c, p.model, report.reference, false);
    const note = legendNote(input, p.model, false);
    const look = modelStyle(p.model, report.reference.model);
    const f = thinSeries(toMillimetres(p.flow.x_m, offset, u), inDisplay(u.heat, p.flow.values));
    const l = thinSeries(toMillimetres(p.loss.x_m, offset, u), inDisplay(u.heatPerLength, p.loss.values));
    flow.push({ label, x: f.x, y: f.y, note, ...look });
    loss.push({ label, x: l.x, y: l.y, note, ...look });
  }
  const subtitle = checkSubtitle(input);
  const reference = profiles.profiles.find((p) => p.model === report.reference.model);
  if (reference) {
    const at = positionOfRemainingFlow(reference);
    const pct = Math.round(100 * (1 - REMAINING_FRACTION));
    if (at !== null) {
      // A vertical line through both panels: beyond it the fin carries less than a tenth of its heat.
      const xMm = (offset + at) * u.length.scale;
      const where = `${c.fin.profile.kind === 'annular' ? 'r' : 'x'} = ${xMm.toFixed(u.length.scale > 100 ? 1 : 3)} ${u.length.pretty}`;
      const label = `${pct} % of Q gone (${reference.model})`;
      const peak = (values: ArrayLike<number>): number => Math.max(0, ...Array.from(values));
      flow.push({
        label,
        x: [xMm, xMm],
        y: [0, peak(inDisplay(u.heat, reference.flow.values))],
        note: where,
        colour: '#555555',
        style: 'dotted',
        marker: 'none',
      });
      loss.push({
        label,
        x: [xMm, xMm],
        y: [0, peak(inDisplay(u.heatPerLength, reference.loss.values))],
        note: where,
        colour: '#555555',
        style: 'dotted',
        marker: 'none',
      });
    } else {
      const tip = reference.flow.values[reference.flow.values.length - 1] as number;
      // Before the caution line, which stays last.
      subtitle.splice(
        subtitle.length - 1,
        0,
        `Less than ${pct} % of Q leaves before the tip: the tip still passes ${((100 * tip) / (reference.flow.values[0] as number)).toFixed(1)} % of Q (${reference.model}).`,
      );
    }
  }
  return {
    title: `Heat flow along the fin: ${c.name}`,
    subtitle,
    xLabel: alongAxisTitle(c),
    panels: [
      { yLabel: `Heat flow Q (${u.heat.pretty})`, series: flow, includeZero: true },
      { yLabel: `Heat lost q′ (${u.heatPerLength.pretty})`, series: loss, includeZero: true },
    ],
    legend: 'below',
    width: size.width,
    height: size.height,
  };
}
