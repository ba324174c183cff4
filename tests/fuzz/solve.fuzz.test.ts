/**
 * Property-based fuzz test of `fincheck solve` (1-D with its refinement study or on --nodes N, and
 * --model 2d on a coarse --grid) on random valid cases (support/cases.ts): no internal error, the
 * documented exit codes and messages, and a JSON document with finite documented numbers, efficiency in
 * (0, 1] (README exceptions aside), a small energy balance, and temperatures between the ambient, base, tip
 * and surroundings temperatures (maximum principle: the face flux increases with the local temperature).
 * 2-D refusals are allowed only where the README documents them (an infinite tip: support/contract.ts).
 */
import { fc } from '@fast-check/vitest';
import { afterAll, describe, it } from 'vitest';
import { validCase, type FuzzCase } from './support/cases.js';
import { fuzzParameters, timeoutFor } from './support/config.js';
import { documentedRefusal, exitProblems, parseJson, solveJsonProblems, textProblems } from './support/contract.js';
import { unknownProblems } from './support/known.js';
import { caseText, cleanUp, describeRun, runOn } from './support/drive.js';
import { commandOptions } from './support/options.js';

afterAll(cleanUp);

interface SolveOptions {
  model: '1d' | '2d';
  /** --nodes N (1-D) or --grid NXxNY (2-D); undefined: the refinement study (1-D only here: 2-D studies are check's). */
  grid: string | undefined;
  json: boolean;
}

const oneD: fc.Arbitrary<SolveOptions> = fc.record({
  model: fc.constant('1d' as const),
  grid: fc.option(fc.integer({ min: 3, max: 3000 }).map(String), { nil: undefined }),
  json: fc.oneof({ arbitrary: fc.constant(true), weight: 3 }, { arbitrary: fc.constant(false), weight: 1 }),
});
const twoD: fc.Arbitrary<SolveOptions> = fc.record({
  model: fc.constant('2d' as const),
  grid: fc.tuple(fc.integer({ min: 3, max: 61 }), fc.integer({ min: 3, max: 11 })).map(([nx, ny]) => `${nx}x${ny}`),
  json: fc.oneof({ arbitrary: fc.constant(true), weight: 3 }, { arbitrary: fc.constant(false), weight: 1 }),
});

function argvOf(o: SolveOptions): string[] {
  const argv = ['--model', o.model];
  if (o.grid !== undefined) argv.push(o.model === '1d' ? '--nodes' : '--grid', o.grid);
  if (o.json) argv.push('--json');
  return argv;
}

async function property(c: FuzzCase, o: SolveOptions): Promise<void> {
  const run = await runOn(caseText(c.doc, c.format), c.format, 'solve', argvOf(o));
  const problems = exitProblems(run, false, await commandOptions('solve'));
  if (run.code === 0) {
    if (o.json) {
      const parsed = parseJson(run.stdout);
      problems.push(...parsed.problems);
      if (parsed.json !== undefined) {
        problems.push(...solveJsonProblems(parsed.json, c.facts, { model: o.model === '1d' ? 'fd-1d' : 'fd-2d', single: o.grid !== undefined }));
      }
    } else problems.push(...textProblems(run.stdout));
  }
  if (run.code === 2 && !documentedRefusal(o.model === '2d' ? 'solve2d' : 'solve', c.facts, run.stderr))
    problems.push('a valid case was refused (exit 2)');
  const unknown = unknownProblems(problems, c.facts);
  if (unknown.length > 0) throw new Error(`${unknown.join('\n')}\n${describeRun(run)}`);
}

describe('fuzz: fincheck solve on random valid cases', () => {
  const RUNS_1D = 30;
  it(
    '1-D (refinement study or --nodes): exit codes, messages and the JSON contract',
    async () => {
      await fc.assert(fc.asyncProperty(validCase, oneD, property), fuzzParameters(RUNS_1D, 4));
    },
    timeoutFor(RUNS_1D, 200),
  );

  const RUNS_2D = 30;
  it(
    '--model 2d on a coarse --grid: exit codes, messages and the JSON contract',
    async () => {
      await fc.assert(fc.asyncProperty(validCase, twoD, property), fuzzParameters(RUNS_2D, 5));
    },
    timeoutFor(RUNS_2D, 200),
  );
});
