/**
 * The tornado chart of a heat sink's sensitivities (`plot --kind sensitivity` on a sink, the sink report's
 * sensitivity.png): d ln rise / d ln x of the hottest source's mean rise above ambient (fd-3d, compare/
 * sink-sensitivity.ts) for every input, with the first-order band. The same chart as a single fin's
 * (sensitivity-chart.ts); only the quantity differs.
 */
import { SINK_CHART_CAUTION, type SinkCheckReport } from '../compare/index.js';
import type { SensitivityChartInput } from './sensitivity-chart.js';

/** A sink's chart input from its check report (null when the check computed no sensitivities). */
export function sinkSensitivityInput(report: SinkCheckReport): SensitivityChartInput | null {
  if (report.sensitivities === undefined) return null;
  const source = report.uncertainty?.source;
  return {
    caseName: report.case,
    quantity: source === undefined ? "hottest source's mean rise" : `mean rise of ${source} (the hottest source)`,
    symbol: 'rise',
    method: `fd-3d reference, ${report.sensitivityMethod ?? ''}`.replace(/, $/, ''),
    sensitivities: report.sensitivities.map((s) => ({ key: s.key, value: s.dlnRise_dlnx, uncertainty: s.uncertainty })),
    band: report.uncertainty ? { relative: report.uncertainty.relative, method: report.uncertainty.method } : null,
    caution: SINK_CHART_CAUTION,
  };
}
