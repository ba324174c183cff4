/** Where a command reads and writes. Commands never touch process.stdin, process.stdout or process.exit directly. */
export interface Io {
  out(text: string): void;
  err(text: string): void;
  /** True when stderr is a terminal (progress bars only then). */
  errIsTTY: boolean;
  /** Standard input, for a case given as `-`. */
  stdin(): AsyncIterable<Uint8Array | string>;
}

/** A command reports a non-zero outcome (e.g. exit 1 for --strict) through this; errors are thrown. */
export type SetExit = (code: number) => void;

export function processIo(): Io {
  return {
    out: (t) => void process.stdout.write(t),
    err: (t) => void process.stderr.write(t),
    errIsTTY: Boolean(process.stderr.isTTY),
    stdin: () => process.stdin,
  };
}

/** Collects output in memory (and serves `stdinText` as standard input): for tests and for commands that must write nothing on failure. */
export function bufferIo(stdinText = ''): Io & { stdout: () => string; stderr: () => string } {
  let o = '';
  let e = '';
  return {
    out: (t) => void (o += t),
    err: (t) => void (e += t),
    errIsTTY: false,
    stdin: async function* () {
      yield stdinText;
    },
    stdout: () => o,
    stderr: () => e,
  };
}
