/**
 * The one place that turns a command's outcome into an exit code (outputs.md):
 * 0 done; 1 an unsafe shortcut with --strict; 2 bad input or usage; 3 solver failure.
 */
import { Command, CommanderError } from 'commander';
import { InputError, SolverError, UsageError } from '../src/errors.js';
import type { Io } from './io.js';
import { buildProgram } from './program.js';

export async function runCli(argv: string[], io: Io): Promise<number> {
  let exitCode = 0;
  const program: Command = buildProgram(io, (code) => {
    exitCode = Math.max(exitCode, code);
  });
  try {
    await program.parseAsync(argv, { from: 'user' });
    return exitCode;
  } catch (e) {
    return reportError(e, io);
  }
}

function reportError(e: unknown, io: Io): number {
  if (e instanceof CommanderError) {
    // Help and version end with code 0; every other commander error is a usage error.
    if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return 0;
    return 2;
  }
  if (e instanceof InputError || e instanceof UsageError) {
    io.err(errorLines(e.message));
    return 2;
  }
  if (e instanceof SolverError) {
    io.err(errorLines(`solver failure: ${e.message}`));
    return 3;
  }
  const msg = e instanceof Error ? (e.stack ?? e.message) : String(e);
  io.err(errorLines(`internal error (please report): ${msg}`));
  return 70;
}

/** Most lines of one error shown (a case can have thousands of issues; the first ones say what to fix). */
const maxErrorLines = 60;
/** Longest error line shown, characters (echoed values are clipped where they are made; this is the backstop). */
const maxLineChars = 2000;

/** Every line starts with "fincheck: "; the message is bounded in lines and in line length. */
function errorLines(message: string): string {
  const lines = message.split('\n');
  const shown = lines.slice(0, maxErrorLines).map((line) => (line.length > maxLineChars ? `${line.slice(0, maxLineChars)}...` : line));
  if (lines.length > maxErrorLines) shown.push(`... and ${(lines.length - maxErrorLines).toLocaleString('en-US')} more lines`);
  return shown.map((line) => `fincheck: ${line}\n`).join('');
}
