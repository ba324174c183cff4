/**
 * The one place that turns a command's outcome into an exit code (outputs.md):
 * 0 done; 1 an unsafe shortcut with --strict; 2 bad input or usage; 3 solver failure.
 */
import { Command, CommanderError } from 'commander';
import type { Io } from './io.js';
import { buildProgram } from './program.js';
import { errorLines, knownFailure } from './failure.js';

export async function runCli(argv: string[], io: Io): Promise<number> {
  let exitCode = 0;
  const program: Command = await buildProgram(
    io,
    (code) => {
      exitCode = Math.max(exitCode, code);
    },
    argv,
  );
  let command = '';
  program.hook('preAction', (_, action) => {
    command = action.name();
  });
  try {
    await program.parseAsync(argv, { from: 'user' });
    return exitCode;
  } catch (e) {
    return reportError(e, io, command);
  }
}

function reportError(e: unknown, io: Io, command: string): number {
  if (e instanceof CommanderError) {
    // Help and version end with code 0; every other commander error is a usage error.
    if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return 0;
    return 2;
  }
  const known = knownFailure(e, command);
  if (known !== null) {
    io.err(errorLines(known.message));
    return known.code;
  }
  const msg = e instanceof Error ? (e.stack ?? e.message) : String(e);
  io.err(errorLines(`internal error (please report): ${msg}`));
  return 70;
}
