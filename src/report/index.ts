/** Public entry of src/report: what the other layers import. */
export { reportDate } from './report-date.js';
export { writeFilesAtomically } from './write-files.js';
export type { OutputFile } from './write-files.js';
export { makeReport, REPORT_FILES } from './make-report.js';
export { asUsageError } from './write-files.js';
