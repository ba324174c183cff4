/**
 * The one place that turns a command's outcome into an exit code (outputs.md):
 * 0 done; 1 an unsafe shortcut with --strict; 2 bad input or usage; 3 solver failure.
 */
import { Command, CommanderError } from 'commander';
import { GridError, InputError, SolverError, UsageError, type SolverRemedy } from '../src/errors.js';
import type { Io } from './io.js';
import { buildProgram } from './program.js';

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

/** What to change after a solver failure, with the option the command has (src/ names no option). */
function remedyAdvice(remedy: SolverRemedy, command: string): string {
  switch (remedy) {
    case 'another-2d-grid':
      return command === 'solve'
        ? 'solve on another grid (--grid NXxNY, e.g. fewer nodes across) or with the 1-D model (--model 1d)'
        : 'use the 1-D reference (--reference 1d)';
    default: {
      const never: never = remedy;
      throw new Error(`remedyAdvice: unknown remedy ${String(never)}`);
    }
  }
}

function reportError(e: unknown, io: Io, command: string): number {
  if (e instanceof CommanderError) {
    // Help and version end with code 0; every other commander error is a usage error.
    if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return 0;
    return 2;
  }
  if (e instanceof GridError) {
    io.err(errorLines(`--grid: ${e.reason}`));
    return 2;
  }
  if (e instanceof InputError || e instanceof UsageError) {
    io.err(errorLines(e.message));
    return 2;
  }
  if (e instanceof SolverError) {
    const advice = e.remedy === undefined ? '' : `; ${remedyAdvice(e.remedy, command)}`;
    io.err(errorLines(`solver failure: ${e.message}${advice}`));
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
