/**
 * One run judged against the whole contract (support/contract.ts), whatever the command: the exit code and
 * message rules, then the JSON rules of check or solve when --json was given, the text rules otherwise.
 */
import type { CaseFacts } from './cases.js';
import { checkJsonProblems, documentedRefusal, exitProblems, parseJson, solveJsonProblems, textProblems } from './contract.js';
import type { Run } from './drive.js';
import { commandOptions } from './options.js';

function optionValue(argv: readonly string[], name: string): string | undefined {
  const i = argv.indexOf(name);
  return i >= 0 ? argv[i + 1] : undefined;
}

/** Violations of one run of `command` with `options` on a valid case with `facts`. */
export async function judge(run: Run, command: string, options: readonly string[], facts: CaseFacts): Promise<string[]> {
  const strict = options.includes('--strict');
  const problems = exitProblems(run, strict, await commandOptions(command));
  const model = optionValue(options, '--model') ?? '1d';
  const kind = command === 'solve' && model === '2d' ? 'solve2d' : (command as 'check' | 'solve' | 'plot');
  if (run.code === 2 && !documentedRefusal(kind, facts, run.stderr)) problems.push('a valid case was refused (exit 2)');
  if ((run.code === 0 || run.code === 1) && (command === 'check' || command === 'solve')) {
    if (!options.includes('--json')) return [...problems, ...textProblems(run.stdout)];
    const parsed = parseJson(run.stdout);
    problems.push(...parsed.problems);
    if (parsed.json === undefined) return problems;
    if (command === 'check') {
      const reference = optionValue(options, '--reference') === '1d' ? '1d' : 'auto';
      const toleranceText = optionValue(options, '--tolerance');
      const tolerance =
        toleranceText === undefined ? 0.02 : toleranceText.endsWith('%') ? Number(toleranceText.slice(0, -1)) / 100 : Number(toleranceText);
      problems.push(...checkJsonProblems(parsed.json, facts, { reference, tolerance }));
    } else {
      const single = options.includes('--nodes') || options.includes('--grid');
      problems.push(...solveJsonProblems(parsed.json, facts, { model: model === '2d' ? 'fd-2d' : 'fd-1d', single }));
    }
  }
  return problems;
}
