/** Drives the CLI in-process with real argv and captured output. */
import { bufferIo } from '../../cli/io.js';
import { runCli } from '../../cli/run.js';

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

export async function cli(...argv: string[]): Promise<CliRun> {
  return cliWithStdin('', ...argv);
}

/** The same with `stdin` as standard input (for a case given as `-`). */
export async function cliWithStdin(stdin: string, ...argv: string[]): Promise<CliRun> {
  const io = bufferIo(stdin);
  const code = await runCli(argv, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}
