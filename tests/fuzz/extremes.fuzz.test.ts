/**
 * Property-based fuzz test of extreme magnitudes (support/extremes.ts): one quantity of a valid case at the
 * edge of a double (1e308, 5e-324, 1e-300) or far outside any fin. Each run must refuse it (exit 2 naming a
 * key), solve it (exit 0 with the output contract of check or solve: finite documented numbers, efficiency
 * in range, small energy balance) or fail with advice (exit 3); never exit 70, never print NaN or null where
 * a number is documented (issue 9, items 2 and 3).
 */
import { fc } from '@fast-check/vitest';
import { afterAll, describe, it } from 'vitest';
import { fuzzParameters, timeoutFor } from './support/config.js';
import { checkJsonProblems, documentedRefusal, exitProblems, parseJson, solveJsonProblems } from './support/contract.js';
import { unknownProblems } from './support/known.js';
import { caseText, cleanUp, describeRun, runOn } from './support/drive.js';
import { extremeCase, type ExtremeCase } from './support/extremes.js';
import { commandOptions } from './support/options.js';

afterAll(cleanUp);

type Command = 'check-1d' | 'check-auto' | 'solve' | 'solve2d';

const argvs: Record<Command, [string, string[]]> = {
  'check-1d': ['check', ['--json', '--reference', '1d']],
  'check-auto': ['check', ['--json']],
  solve: ['solve', ['--json']],
  solve2d: ['solve', ['--json', '--model', '2d', '--grid', '21x5']],
};

async function property(e: ExtremeCase, command: Command): Promise<void> {
  const [name, options] = argvs[command];
  const run = await runOn(caseText(e.doc, e.format), e.format, name, options);
  const problems = exitProblems(run, false, await commandOptions(name));
  if (run.code === 0) {
    const parsed = parseJson(run.stdout);
    problems.push(...parsed.problems);
    if (parsed.json !== undefined) {
      problems.push(
        ...(name === 'check'
          ? checkJsonProblems(parsed.json, e.facts, { reference: command === 'check-1d' ? '1d' : 'auto', tolerance: 0.02 })
          : solveJsonProblems(parsed.json, e.facts, { model: command === 'solve' ? 'fd-1d' : 'fd-2d', single: command === 'solve2d' })),
      );
    }
  }
  if (run.code === 2 && documentedRefusal(command === 'solve2d' ? 'solve2d' : 'check', e.facts, run.stderr)) return;
  const unknown = unknownProblems(problems, e.facts);
  if (unknown.length > 0) throw new Error(`${unknown.join('\n')}\n(${e.what})\n${describeRun(run)}`);
}

describe('fuzz: extreme magnitudes', () => {
  const RUNS = 60;
  it(
    'refused naming a key, solved with sane numbers, or a solver failure with advice; never a crash',
    async () => {
      await fc.assert(
        fc.asyncProperty(extremeCase, fc.constantFrom<Command>('check-1d', 'check-1d', 'check-auto', 'solve', 'solve2d'), property),
        fuzzParameters(RUNS, 6),
      );
    },
    timeoutFor(RUNS, 300),
  );
});
