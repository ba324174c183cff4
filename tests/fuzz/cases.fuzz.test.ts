/**
 * Counterexamples the fuzz tests found, kept as regression cases (tests/fuzz/cases/*.yaml): each file says
 * in its header what went wrong and which runs showed it (`# argv: ...`); every run must keep the same
 * contract as the random cases (support/judge.ts). A file with `# refusal: KEY` is a bad input: exit 2
 * naming KEY. `# exit: 0` says the case must be solved: a solver failure (exit 3) on it is the bug.
 * `# known: WHY` marks a counterexample not fixed yet: the test then requires that it still fails (so the
 * marker is removed, and the case guards the fix, as soon as it is fixed) and skips it when WHY says it hangs.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../src/case/parse.js';
import { refusalProblems } from './support/contract.js';
import { cleanUp, describeRun, runOn } from './support/drive.js';
import { factsOf } from './support/facts.js';
import { judge } from './support/judge.js';
import { afterAll } from 'vitest';

afterAll(cleanUp);

const folder = join(import.meta.dirname, 'cases');
const files = readdirSync(folder)
  .filter((f) => /\.(ya?ml|json)$/.test(f))
  .sort();

function header(text: string, key: string): string[] {
  return [...text.matchAll(new RegExp(`^# ${key}: (.*)$`, 'gm'))].map((m) => (m[1] ?? '').trim());
}

describe('fuzz counterexamples (tests/fuzz/cases)', () => {
  it('has cases', () => expect(files.length).toBeGreaterThan(0));

  const hangs = (file: string) => /hangs/.test(header(readFileSync(join(folder, file), 'utf8'), 'known')[0] ?? '');
  it.skip.each(files.filter(hangs))('%s (known to hang: skipped)', () => {});
  it.each(files.filter((f) => !hangs(f)))(
    '%s',
    async (file) => {
      const text = readFileSync(join(folder, file), 'utf8');
      const known = header(text, 'known')[0];
      const format = file.endsWith('.json') ? 'json' : 'yaml';
      const refusal = header(text, 'refusal')[0];
      const exit = header(text, 'exit')[0];
      const argvs = header(text, 'argv').map((line) => line.split(/\s+/));
      expect(argvs.length).toBeGreaterThan(0);
      const failures: string[] = [];
      for (const [command = 'check', ...options] of argvs) {
        const run = await runOn(text, format, command, options);
        const problems =
          refusal !== undefined
            ? run.code === 2
              ? refusalProblems(run.stderr, refusal)
              : [`exit ${run.code}, expected 2 naming ${refusal}`]
            : await judge(run, command, options, factsOf(parseCaseText(text, file)));
        if (exit !== undefined && String(run.code) !== exit) problems.push(`exit ${run.code}, expected ${exit}`);
        if (problems.length > 0) failures.push(`${problems.join('\n')}\n${describeRun(run)}`);
      }
      if (known !== undefined) expect(failures.length, `fixed? remove "# known: ${known}" from ${file}`).toBeGreaterThan(0);
      else expect(failures.join('\n\n')).toBe('');
    },
    300_000,
  );
});
