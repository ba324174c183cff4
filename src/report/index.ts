/** The report layer's public API: what the other layers import. */
export { REPORT_FILES, makeReport } from './make-report.js';
export { reportDate } from './report-date.js';
export { asUsageError, writeFilesAtomically } from './write-files.js';
export type { OutputFile } from './write-files.js';
export {
  COMPARISON_FIGURE,
  makeComparisonReport,
  type ComparedCase,
  type ComparisonReportContent,
  type ComparisonReportOptions,
} from './compare-report.js';
export { makeSinkReport, SINK_FIGURE_FILES } from './make-sink-report.js';
export type { SinkReportContent, SinkReportOptions } from './make-sink-report.js';
