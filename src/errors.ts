/**
 * Errors that reach the user. Each carries the exit code of the output contract:
 * 2 bad input or usage, 3 solver failure. The CLI prints `message` on stderr and exits from one place.
 */

/** One problem in the input: the key path, the value given and what is accepted. */
export interface InputIssue {
  /** Key path in the case file, e.g. `fin.thickness` or `convection.h.points[2][0]`. */
  path: string;
  /** The value as given (stringified for display). */
  value: string;
  /** What is accepted, in words, e.g. `a length > 0 such as "2 mm"`. */
  accepted: string;
  /** 1-based line and column in the file, where the format allows. */
  line?: number;
  column?: number;
}

export class InputError extends Error {
  readonly exitCode = 2;
  constructor(
    readonly issues: InputIssue[],
    readonly file?: string,
  ) {
    super(formatIssues(issues, file));
    this.name = 'InputError';
  }
}

export class UsageError extends Error {
  readonly exitCode = 2;
  override name = 'UsageError';
}

/**
 * What the user can change after a solver failure, in the problem's words; the CLI turns it into the
 * option of the command that ran ('another-2d-grid': the 2-D system of this grid could not be solved).
 */
export type SolverRemedy = 'another-2d-grid';

export class SolverError extends Error {
  readonly exitCode = 3;
  override name = 'SolverError';
  constructor(
    message: string,
    readonly remedy?: SolverRemedy,
  ) {
    super(message);
  }
}

/**
 * A model asked of a fin it does not cover (e.g. fd-2d on a nonlinear fin with an infinite tip).
 * `reason` says why in the problem's words; ask first with modelApplies (src/fd) to avoid it.
 */
export class ModelNotApplicableError extends UsageError {
  override name = 'ModelNotApplicableError';
  constructor(
    readonly model: 'fd-1d' | 'fd-2d' | 'fd-3d',
    readonly reason: string,
  ) {
    super(`${model}: ${reason}`);
  }
}

/** A grid the model cannot use (too few or too many nodes); `reason` in the problem's words. */
export class GridError extends UsageError {
  override name = 'GridError';
  constructor(readonly reason: string) {
    super(`2-D grid: ${reason}`);
  }
}

export function formatIssues(issues: InputIssue[], file?: string): string {
  const lines = issues.map((i) => {
    const where = i.line !== undefined ? `${file ?? 'case'}:${i.line}${i.column !== undefined ? `:${i.column}` : ''}: ` : file ? `${file}: ` : '';
    return `${where}${i.path}: got ${i.value}; expected ${i.accepted}`;
  });
  return lines.join('\n');
}
