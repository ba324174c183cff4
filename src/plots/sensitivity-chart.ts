/**
 * The tornado chart of a check's sensitivities: one bar per input, d ln Q / d ln x of the reference heat rate
 * (for a heat sink, d ln rise / d ln x of the hottest source's mean rise), largest at the top; the inputs with
 * a stated uncertainty in the accent colour, with the share of the band each gives (|S| u).
 */
import { CHART_CAUTION, type CheckReport } from '../compare/index.js';
import type { TornadoChartSpec } from '../images/index.js';
import type { ChartSize } from './profile-chart.js';
import { sig } from './labels.js';

/** What the chart needs: a fin's or a sink's sensitivities and band. */
export interface SensitivityChartInput {
  caseName: string;
  /** "heat rate" or "hottest source's mean rise". */
  quantity: string;
  /** The one-line caution the chart carries (CHART_CAUTION for a fin). */
  caution?: string;
  /** "Q" or "rise". */
  symbol: string;
  method: string;
  sensitivities: readonly { key: string; value: number; uncertainty: number }[];
  /** Relative standard uncertainty of the quantity and how it was found. */
  band: { relative: number; method: string } | null;
}

const pct = (x: number): string => `${Number((100 * x).toPrecision(2))} %`;

export function sensitivityChartSpec(input: SensitivityChartInput, size: ChartSize): TornadoChartSpec {
  const band = input.band === null ? '' : `; band +/-${pct(input.band.relative)} (${input.band.method}, one standard uncertainty)`;
  return {
    title: `Sensitivities of the ${input.quantity}: ${input.caseName}`,
    subtitle: [
      `d ln ${input.symbol} / d ln x: the % change of the ${input.quantity} per % change of each input; ${input.method}${band}`,
      input.caution ?? CHART_CAUTION,
    ],
    xLabel: `d ln ${input.symbol} / d ln x`,
    bars: input.sensitivities.map((s) => ({
      label: s.key,
      value: s.value,
      note: s.uncertainty > 0 ? `${sig(s.value, 3)}  (u ${pct(s.uncertainty)} \u2192 \u00b1${pct(Math.abs(s.value * s.uncertainty))})` : sig(s.value, 3),
      highlight: s.uncertainty > 0,
    })),
    legend: { highlight: 'stated uncertainty (u: one standard uncertainty)', plain: 'no stated uncertainty' },
    width: size.width,
    height: size.height,
  };
}

/** A single fin's chart input from its check report (null when the check computed no sensitivities). */
export function finSensitivityInput(report: CheckReport): SensitivityChartInput | null {
  if (report.sensitivities === undefined) return null;
  return {
    caseName: report.case,
    quantity: 'heat rate',
    symbol: 'Q',
    method: `${report.reference.model} reference, ${report.sensitivityMethod ?? ''}`.replace(/, $/, ''),
    sensitivities: report.sensitivities.map((s) => ({ key: s.key, value: s.dlnQ_dlnx, uncertainty: s.uncertainty })),
    band: report.uncertainty ? { relative: report.uncertainty.relative, method: report.uncertainty.method } : null,
  };
}
