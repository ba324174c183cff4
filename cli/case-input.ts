/**
 * The CASE argument of every command that reads one: a file name, or `-` for standard input (read with the same
 * size cap as a file). Warnings about the case (src/case: implausible dimensions, a shortened name) go to stderr
 * here, once, whatever the output format; commands with --json also put them in their document.
 */
import { parseAnyCaseText, parseCaseText, readCaseFile, readCaseStream, type AnyCase, type Case, type CaseWarning } from '../src/case/index.js';
import type { InterruptListener } from './interrupt.js';
import type { Io } from './io.js';

/** How standard input is named in messages ("stdin:5:14: fin.thickness: ...") and as the default case name. */
export const STDIN_FILE_NAME = 'stdin';

export interface CaseInput {
  text: string;
  /** The file name as given, or `stdin`. */
  fileName: string;
}

/**
 * The case text of `file` (`-`: standard input). With `interrupt`, a signal while standard input is awaited stops the
 * wait at once (Interrupted; standard input is released), so Ctrl-C works at a terminal that has sent nothing yet.
 */
export async function readCaseInput(file: string, io: Io, interrupt?: InterruptListener): Promise<CaseInput> {
  if (file === '-') {
    const chunks = interrupt ? untilInterrupted(io.stdin(), interrupt) : io.stdin();
    return { text: await readCaseStream(chunks, 'standard input'), fileName: STDIN_FILE_NAME };
  }
  return { text: readCaseFile(file), fileName: file };
}

function isDestroyable(x: object): x is { destroy: () => void } {
  return 'destroy' in x && typeof x.destroy === 'function';
}

/** The chunks of `source` until a signal is recorded: then the source is closed and Interrupted thrown. */
async function* untilInterrupted<T>(source: AsyncIterable<T>, interrupt: InterruptListener): AsyncGenerator<T> {
  const it = source[Symbol.asyncIterator]();
  const aborted = new Promise<'aborted'>((resolve) => {
    if (interrupt.signal.aborted) resolve('aborted');
    else interrupt.signal.addEventListener('abort', () => resolve('aborted'), { once: true });
  });
  let finished = false;
  try {
    for (;;) {
      const r = await Promise.race([it.next(), aborted]);
      if (r === 'aborted') {
        interrupt.check();
        return;
      }
      if (r.done === true) {
        finished = true;
        return;
      }
      yield r.value;
    }
  } finally {
    // Stopped early (a signal, or the reader gave up on a too-large input): close the source. A stream is destroyed
    // outright: its iterator's return() would wait for the pending read, which at a silent terminal never ends.
    if (!finished) {
      if (isDestroyable(source)) source.destroy();
      else it.return?.().catch(() => undefined);
    }
  }
}

/** Reads and parses the case of `file`, printing its warnings on stderr. */
export async function loadCaseInput(file: string, io: Io): Promise<Case> {
  const { text, fileName } = await readCaseInput(file, io);
  const c = parseCaseText(text, fileName);
  printWarnings(c.warnings ?? [], io);
  return c;
}

/** Reads and parses a case of either kind (a single fin or a heat sink), printing its warnings on stderr. */
export async function loadAnyCaseInput(file: string, io: Io, interrupt?: InterruptListener): Promise<AnyCase> {
  const { text, fileName } = await readCaseInput(file, io, interrupt);
  const any = parseAnyCaseText(text, fileName);
  printWarnings(any.case.warnings ?? [], io);
  return any;
}

/** One line a warning on stderr: `fincheck: warning: fin.length: 40 m ...`. */
export function printWarnings(warnings: readonly CaseWarning[], io: Io): void {
  for (const w of warnings) io.err(`fincheck: warning: ${w.path}: ${w.message}\n`);
}
