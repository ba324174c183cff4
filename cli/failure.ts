/**
 * What the user reads when a command fails: the exit code (outputs.md: 2 input or usage, 3 solver failure) and the
 * message, every line starting with "fincheck: ". cli/run.ts uses it for the one failure of a command; `check` and
 * `report` with several cases use it for each case that fails while the others go on.
 */
import { GridError, InputError, SolverError, UsageError, type SolverRemedy } from '../src/errors.js';

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

/**
 * The exit code and message of a failure the user can act on (bad input or usage: 2; solver failure: 3), or null
 * for anything else (an internal error). Also used by commands that go on with other cases after one fails.
 */
export function knownFailure(e: unknown, command: string): { code: number; message: string } | null {
  if (e instanceof GridError) return { code: 2, message: `--grid: ${e.reason}` };
  if (e instanceof InputError || e instanceof UsageError) return { code: 2, message: e.message };
  if (e instanceof SolverError) {
    const advice = e.remedy === undefined ? '' : `; ${remedyAdvice(e.remedy, command)}`;
    return { code: 3, message: `solver failure: ${e.message}${advice}` };
  }
  return null;
}

/** Most lines of one error shown (a case can have thousands of issues; the first ones say what to fix). */
const maxErrorLines = 60;
/** Longest error line shown, characters (echoed values are clipped where they are made; this is the backstop). */
const maxLineChars = 2000;

/** Every line starts with "fincheck: "; the message is bounded in lines and in line length. */
export function errorLines(message: string): string {
  const lines = message.split('\n');
  const shown = lines.slice(0, maxErrorLines).map((line) => (line.length > maxLineChars ? `${line.slice(0, maxLineChars)}...` : line));
  if (lines.length > maxErrorLines) shown.push(`... and ${(lines.length - maxErrorLines).toLocaleString('en-US')} more lines`);
  return shown.map((line) => `fincheck: ${line}\n`).join('');
}
