/**
 * The one place that turns a command's outcome into an exit code (outputs.md):
 * 0 done; 1 an unsafe shortcut with --strict; 2 bad input or usage; 3 solver failure.
 */
import { Command, CommanderError } from 'commander';
import { InputError, SolverError, UsageError, type SolverRemedy } from '../src/errors.js';
import type { Io } from './io.js';
import { buildProgram } from './program.js';

export async function runCli(argv: string[], io: Io): Promise<number> {
  let exitCode = 0;
  const program: Command = buildProgram(io, (code) => {
    exitCode = Math.max(exitCode, code);
  });
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
  if (e instanceof InputError || e instanceof UsageError) {
    io.err(`fincheck: ${e.message}\n`);
    return 2;
  }
  if (e instanceof SolverError) {
    const advice = e.remedy === undefined ? '' : `; ${remedyAdvice(e.remedy, command)}`;
    io.err(`fincheck: solver failure: ${e.message}${advice}\n`);
    return 3;
  }
  const msg = e instanceof Error ? (e.stack ?? e.message) : String(e);
  io.err(`fincheck: internal error (please report): ${msg}\n`);
  return 70;
}
