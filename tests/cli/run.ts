/** Drives the CLI in-process with real argv and captured output. */
import { bufferIo } from '../../cli/io.js';
import { runCli } from '../../cli/run.js';

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

export async function cli(...argv: string[]): Promise<CliRun> {
  const io = bufferIo();
  const code = await runCli(argv, io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}
