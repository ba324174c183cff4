/**
 * Property-based fuzz test of refusals: a random valid case with one thing wrong (support/bad.ts), or a
 * file that is not a case at all, must end in exit 2 with a message that starts "fincheck:" and names the
 * key path (README "Exit codes"; issue 9: "every refusal exit 2 naming the key"), with nothing on stdout.
 * Parsing stops before any solve, so these runs are cheap: 150 cases in `npm test`.
 */
import { fc } from '@fast-check/vitest';
import { afterAll, describe, it } from 'vitest';
import { badCaseFromValid, badFile, type BadCase } from './support/bad.js';
import { fuzzParameters, timeoutFor } from './support/config.js';
import { refusalProblems } from './support/contract.js';
import { validCase } from './support/cases.js';
import { caseText, cleanUp, describeRun, runOn } from './support/drive.js';

afterAll(cleanUp);

async function expectRefusal(b: BadCase, command: string, options: string[]): Promise<void> {
  const run = await runOn(b.text, b.format, command, options);
  const problems: string[] = [];
  if (run.code !== 2) problems.push(`exit ${run.code}, expected 2 for ${b.what}`);
  else problems.push(...refusalProblems(run.stderr, b.path));
  if (run.stdout !== '') problems.push('stdout is not empty');
  if (problems.length > 0) throw new Error(`${problems.join('\n')}\n(${b.what})\n${describeRun(run)}`);
}

const command = fc.constantFrom<[string, string[]]>(
  ['check', ['--json', '--reference', '1d']],
  ['check', []],
  ['solve', ['--json']],
  ['solve', ['--model', '2d', '--grid', '21x5']],
);

describe('fuzz: refusals of bad case files', () => {
  const RUNS = 150;
  it(
    'a valid case with one value, key or relation wrong: exit 2 naming that key',
    async () => {
      await fc.assert(
        fc.asyncProperty(badCaseFromValid, command, async (b, [name, options]) => expectRefusal(b, name, options)),
        fuzzParameters(RUNS, 2),
      );
    },
    timeoutFor(RUNS, 100),
  );

  const FILES = 40;
  it(
    'a file that is not a case: exit 2 naming the file, the top level or the syntax error',
    async () => {
      await fc.assert(
        fc.asyncProperty(badFile, command, async (b, [name, options]) => expectRefusal(b, name, options)),
        fuzzParameters(FILES, 3),
      );
    },
    timeoutFor(FILES, 100),
  );
});

/** Bad option values: exit 2 naming the option (README: "a message on stderr naming the key or option"). */
const badOptions: [string, string[], string][] = [
  ['check', ['--tolerance', '0'], '--tolerance'],
  ['check', ['--tolerance', '150%'], '--tolerance'],
  ['check', ['--tolerance', 'NaN'], '--tolerance'],
  ['check', ['--tolerance', '-2%'], '--tolerance'],
  ['check', ['--reference', '3d'], '--reference'],
  ['check', ['--bogus'], '--bogus'],
  ['solve', ['--nodes', '2'], '--nodes'],
  ['solve', ['--nodes', '1e99'], '--nodes'],
  ['solve', ['--nodes', '3.5'], '--nodes'],
  ['solve', ['--nodes', 'Infinity'], '--nodes'],
  ['solve', ['--model', '3d'], '--model'],
  ['solve', ['--model', '2d', '--grid', '1x1'], '--grid'],
  ['solve', ['--model', '2d', '--grid', '100000x5'], '--grid'],
  ['solve', ['--model', '2d', '--grid', 'axb'], '--grid'],
  ['solve', ['--model', '2d', '--grid', '-5x5'], '--grid'],
  ['plot', ['--kind', 'pie', '--out', 'x.png'], '--kind'],
  ['plot', ['--out', 'x.gif'], '--out'],
  ['plot', ['--out', '/nonexistent-folder/x.png'], '--out'],
  ['plot', ['--dpi', '0', '--out', 'x.png'], '--dpi'],
  ['plot', ['--width', '1e9', '--out', 'x.png'], '--width'],
];

describe('fuzz: refusals of bad options', () => {
  // Every bad option once (a list this short is better enumerated than sampled), each on a random valid case.
  it('exit 2 naming the option, nothing on stdout', async () => {
    const cases = fc.sample(validCase, { numRuns: badOptions.length, seed: fuzzParameters(1, 8).seed ?? 0 });
    const failures: string[] = [];
    for (const [i, [command, options, option]] of badOptions.entries()) {
      const c = cases[i];
      if (c === undefined) continue;
      const run = await runOn(caseText(c.doc, c.format), c.format, command, options);
      const problems: string[] = [];
      if (run.code !== 2) problems.push(`exit ${run.code}, expected 2 for ${options.join(' ')}`);
      else problems.push(...refusalProblems(run.stderr, option));
      if (run.stdout !== '') problems.push('stdout is not empty');
      if (problems.length > 0) failures.push(`${problems.join('\n')}\n${describeRun(run)}`);
    }
    if (failures.length > 0) throw new Error(failures.join('\n\n'));
  }, 120_000);
});
