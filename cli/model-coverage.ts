/**
 * Asks the fd layer whether the 2-D model covers a fin before a command runs, and words a refusal with
 * the command's own options (the library below states the reason in the problem's words).
 */
import type { Case } from '../src/case/index.js';
import { UsageError } from '../src/errors.js';
import { finProblem, modelApplies } from '../src/fd/index.js';

/** `--reference 2d` on a fin the 2-D model does not cover: a usage error saying why. */
export function requireReference(c: Case, reference: 'auto' | '1d' | '2d'): void {
  if (reference !== '2d') return;
  const coverage = modelApplies(finProblem(c), '2d');
  if (!coverage.ok) throw new UsageError(`--reference 2d: ${coverage.reason}; use --reference 1d or auto`);
}

/** `solve --model 2d` on a fin the 2-D model does not cover. */
export function requireModel2D(c: Case): void {
  const coverage = modelApplies(finProblem(c), '2d');
  if (!coverage.ok) throw new UsageError(`--model 2d: ${coverage.reason}; \`fincheck check\` solves this fin with fd-1d`);
}
