/**
 * fincheck as a library (`import { caseFromText, check } from 'fincheck'`): read a case, check the shortcuts
 * against the numerical reference, solve one model, sweep a map, draw the charts, build the report; heat sinks
 * through sinkFromText / sinkFromObject / sinkFromFile, checkSink and solveSink (sink.ts), sinkChartSvg /
 * sinkChartPng and sinkReport (sink-outputs.ts). The same validation and numbers as the command line; failures
 * are typed errors:
 * - InputError: the case is invalid (`issues`: key path, value, what is accepted, line and column);
 * - UsageError: an option is invalid (the message names `options.<name>`); ModelNotApplicableError (a UsageError):
 *   a model asked of a fin it does not cover, with the reason;
 * - SolverError: a solve failed (what to change in `remedy`); MapInterrupted: a map stopped by its AbortSignal.
 * Every result carries the model and accuracy of its numbers; they are estimates of an idealised fin or sink, to be
 * confirmed by test (h is usually the largest uncertainty; follow applicable codes, standards and licensed practice).
 */
export { caseFromFile, caseFromObject, caseFromText } from './read-case.js';
export { check, type CheckCallOptions, type CheckResult } from './check.js';
export { solve, type SolveCallOptions, type Warned } from './solve.js';
export { map, type MapCallOptions, type MapResult, type MapSource } from './map.js';
export { chartPng, chartSvg, type ChartCallOptions } from './chart.js';
export { report, type ReportCallOptions, type ReportResult } from './report.js';
export {
  checkSink,
  sinkFromFile,
  sinkFromObject,
  sinkFromText,
  solveSink,
  type SinkCheckCallOptions,
  type SinkCheckResult,
  type SinkSolveResult,
} from './sink.js';
export { sinkChartPng, sinkChartSvg, sinkReport, type SinkChartCallOptions, type SinkReportCallOptions } from './sink-outputs.js';
export type { ReferenceChoice, UnitsChoice } from './options.js';
export { outputJsonSchema as outputSchema, OUTPUT_SCHEMA_NAMES, type OutputSchemaName } from '../outputs/index.js';
export { GridError, InputError, ModelNotApplicableError, SolverError, UsageError, type InputIssue, type SolverRemedy } from '../errors.js';
export { MapInterrupted, type MapModelId } from '../map/index.js';
export type { Case, CaseWarning, HeatSinkCase } from '../case/index.js';
export type {
  CheckReport,
  ModelResult,
  ReferenceResult,
  Verdict,
  SolveReport,
  Solve2DReport,
  SinkCheckReport,
  SinkSolveReport,
} from '../compare/index.js';
export type { PlotKind, SinkPlotKind } from '../plots/index.js';
export { VERSION } from '../version.js';
