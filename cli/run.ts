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
  if (e instanceof GridError) {
    io.err(`fincheck: --grid: ${e.reason}\n`);
    return 2;
  }
  if (e instanceof InputError || e instanceof UsageError) {
    io.err(`fincheck: ${e.message}\n`);
    return 2;
  }
  if (e instanceof SolverError) {
    io.err(`fincheck: solver failure: ${e.message}${remedyOptions(e.remedies)}\n`);
    return 3;
  }
  const msg = e instanceof Error ? (e.stack ?? e.message) : String(e);
  io.err(`fincheck: internal error (please report): ${msg}\n`);
  return 70;
}

/** The command-line options behind a solver failure's remedies (the library words them as physics). */
const REMEDY_OPTIONS: Record<SolverRemedy, string> = {
  'change-grid': '--nodes N (1-D) or --grid NXxNY (2-D) for the grid',
  'use-1d-model': '--reference 1d (check, plot, report, map) or --model 1d (solve) for the 1-D model',
};

function remedyOptions(remedies: readonly SolverRemedy[]): string {
  return remedies.length === 0 ? '' : ` Options: ${remedies.map((r) => REMEDY_OPTIONS[r]).join('; ')}.`;
}
