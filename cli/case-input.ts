/**
 * The CASE argument of every command that reads one: a file name, or `-` for standard input (read with the same
 * size cap as a file). Warnings about the case (src/case: implausible dimensions, a shortened name) go to stderr
 * here, once, whatever the output format; commands with --json also put them in their document.
 */
import { parseAnyCaseText, parseCaseText, readCaseFile, readCaseStream, type AnyCase, type Case, type CaseWarning } from '../src/case/index.js';
import type { Io } from './io.js';

/** How standard input is named in messages ("stdin:5:14: fin.thickness: ...") and as the default case name. */
export const STDIN_FILE_NAME = 'stdin';

export interface CaseInput {
  text: string;
  /** The file name as given, or `stdin`. */
  fileName: string;
}

/** The case text of `file` (`-`: standard input). */
export async function readCaseInput(file: string, io: Io): Promise<CaseInput> {
  if (file === '-') return { text: await readCaseStream(io.stdin(), 'standard input'), fileName: STDIN_FILE_NAME };
  return { text: readCaseFile(file), fileName: file };
}

/** Reads and parses the case of `file`, printing its warnings on stderr. */
export async function loadCaseInput(file: string, io: Io): Promise<Case> {
  const { text, fileName } = await readCaseInput(file, io);
  const c = parseCaseText(text, fileName);
  printWarnings(c.warnings ?? [], io);
  return c;
}

/** Reads and parses a case of either kind (a single fin or a heat sink), printing its warnings on stderr. */
export async function loadAnyCaseInput(file: string, io: Io): Promise<AnyCase> {
  const { text, fileName } = await readCaseInput(file, io);
  const any = parseAnyCaseText(text, fileName);
  printWarnings(any.case.warnings ?? [], io);
  return any;
}

/** One line a warning on stderr: `fincheck: warning: fin.length: 40 m ...`. */
export function printWarnings(warnings: readonly CaseWarning[], io: Io): void {
  for (const w of warnings) io.err(`fincheck: warning: ${w.path}: ${w.message}\n`);
}
