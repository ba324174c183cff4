/**
 * Property-based fuzz test of `fincheck check` on random valid cases of the whole case format
 * (support/cases.ts), through the real CLI in-process. The contract it checks is support/contract.ts:
 * no internal error, exit 0 (1 only with --strict), 2 or 3 with the documented messages, and a JSON
 * document whose documented numbers are finite, whose efficiencies lie in (0, 1] (except where the README
 * says otherwise), whose verdicts come from the documented set, and whose energy balance is small.
 *
 * Counts: `npm test` runs 4 cases from a fixed seed (about 2-4 s each with the 2-D reference and its
 * refinement study on this 2-core machine; 28 took 61 s and 8 took 33 s under load, over the suite's 30 s budget for the fuzz tests);
 * `npm run fuzz` multiplies the count and draws a fresh seed (support/config.ts).
 */
import { fc } from '@fast-check/vitest';
import { afterAll, describe, it } from 'vitest';
import { validCase, type FuzzCase } from './support/cases.js';
import { fuzzParameters, timeoutFor } from './support/config.js';
import { checkJsonProblems, exitProblems, parseJson, textProblems } from './support/contract.js';
import { unknownProblems } from './support/known.js';
import { caseText, cleanUp, describeRun, runOn } from './support/drive.js';
import { commandOptions } from './support/options.js';

afterAll(cleanUp);

interface CheckOptions {
  reference: 'auto' | '1d';
  json: boolean;
  strict: boolean;
  tolerance: { text: string; value: number } | undefined;
}

const checkOptions: fc.Arbitrary<CheckOptions> = fc.record({
  reference: fc.constantFrom('auto' as const, '1d' as const),
  json: fc.oneof({ arbitrary: fc.constant(true), weight: 3 }, { arbitrary: fc.constant(false), weight: 1 }),
  strict: fc.boolean(),
  tolerance: fc.option(fc.constantFrom({ text: '5%', value: 0.05 }, { text: '0.01', value: 0.01 }, { text: '0.5 %', value: 0.005 }), { nil: undefined }),
});

function argvOf(o: CheckOptions): string[] {
  const argv = ['--reference', o.reference];
  if (o.json) argv.push('--json');
  if (o.strict) argv.push('--strict');
  if (o.tolerance) argv.push('--tolerance', o.tolerance.text);
  return argv;
}

const RUNS = 4;

describe('fuzz: fincheck check on random valid cases', () => {
  it(
    'keeps the exit-code, message and JSON contract',
    async () => {
      const options = await commandOptions('check');
      await fc.assert(
        fc.asyncProperty(validCase, checkOptions, async (c: FuzzCase, o: CheckOptions) => {
          const run = await runOn(caseText(c.doc, c.format), c.format, 'check', argvOf(o));
          const problems = exitProblems(run, o.strict, options);
          if (run.code === 0 || run.code === 1) {
            if (o.json) {
              const parsed = parseJson(run.stdout);
              problems.push(...parsed.problems);
              if (parsed.json !== undefined) {
                problems.push(...checkJsonProblems(parsed.json, c.facts, { reference: o.reference, tolerance: o.tolerance?.value ?? 0.02 }));
              }
            } else {
              problems.push(...textProblems(run.stdout));
            }
          }
          // A valid case is refused only where the format documents a refusal; the generator makes none.
          if (run.code === 2) problems.push('a valid case was refused (exit 2)');
          const unknown = unknownProblems(problems, c.facts);
          if (unknown.length > 0) throw new Error(`${unknown.join('\n')}\n${describeRun(run)}`);
        }),
        fuzzParameters(RUNS, 1),
      );
    },
    timeoutFor(RUNS, 1000),
  );
});
