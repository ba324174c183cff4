/**
 * Survey: runs many random valid cases through check and solve without stopping at the first failure, and
 * prints each kind of violation with its count and the smallest case file that shows it. Not a test; a tool
 * for finding every failure class at once (the properties stop at the first).
 *
 *   npx tsx tests/fuzz/tools/survey.ts [count] [seed] [commands: check,solve,solve2d]
 *   SURVEY_MODE=extreme ...   (extreme magnitudes, support/extremes.ts, instead of valid cases)
 *   SURVEY_OUT=DIR ...        (where the example case files go; default /tmp/fuzz-survey)
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fc } from '@fast-check/vitest';
import { validCase } from '../support/cases.js';
import { extremeCase } from '../support/extremes.js';
import { checkJsonProblems, documentedRefusal, exitProblems, parseJson, solveJsonProblems } from '../support/contract.js';
import { caseText, cleanUp, runOn, type Run } from '../support/drive.js';
import { commandOptions } from '../support/options.js';

const count = Number(process.argv[2] ?? 100);
const seed = Number(process.argv[3] ?? Date.now() % 1e9);
const commands = (process.argv[4] ?? 'check,solve,solve2d').split(',');
const outDir = process.env['SURVEY_OUT'] ?? '/tmp/fuzz-survey';
mkdirSync(outDir, { recursive: true });

/** A violation's class: its text without numbers and paths. */
function classify(problem: string): string {
  return problem
    .replace(/\/tmp\/\S+/g, 'FILE')
    .replace(/-?\d+(\.\d+)?(e[-+]?\d+)?/gi, 'N')
    .slice(0, 160);
}

const classes = new Map<string, { count: number; example: Run; problem: string }>();
function record(problem: string, run: Run): void {
  const key = classify(problem);
  const seen = classes.get(key);
  if (!seen) classes.set(key, { count: 1, example: run, problem });
  else {
    seen.count += 1;
    if (run.text.length < seen.example.text.length) {
      seen.example = run;
      seen.problem = problem;
    }
  }
}

const mode = process.env['SURVEY_MODE'] ?? 'valid';
const cases: { doc: Record<string, unknown>; format: 'yaml' | 'json'; facts: import('../support/cases.js').CaseFacts; what?: string }[] =
  mode === 'extreme' ? fc.sample(extremeCase, { numRuns: count, seed }) : fc.sample(validCase, { numRuns: count, seed });
const started = Date.now();
const times: Record<string, number[]> = {};
for (const [i, c] of cases.entries()) {
  for (const command of commands) {
    // Which case runs now, so a run that hangs can be found (case files: tools/dump by index).
    writeFileSync(join(outDir, 'running.txt'), `case ${i} ${command}\n${caseText(c.doc, c.format)}`);
    const argv =
      command === 'check'
        ? ['--json', '--reference', i % 2 ? '1d' : 'auto']
        : command === 'solve'
          ? ['--json']
          : ['--json', '--model', '2d', '--grid', '41x9'];
    const t0 = Date.now();
    const run = await runOn(caseText(c.doc, c.format), c.format, command === 'solve2d' ? 'solve' : command, argv);
    (times[command] ??= []).push(Date.now() - t0);
    void 0;
    const problems = exitProblems(run, false, await commandOptions(command === 'solve2d' ? 'solve' : command));
    if (run.code === 2 && !documentedRefusal(command as 'solve2d', c.facts, run.stderr))
      problems.push(`valid case refused: ${run.stderr.split('\n')[0]?.slice(0, 100) ?? ''}`);
    if (run.code === 3) problems.push(`solver failure: ${run.stderr.slice(0, 90)}`);
    if (run.code === 70) problems.push(`internal error: ${run.stderr.split('\n')[0]?.slice(40, 140) ?? ''}`);
    const ms = Date.now() - t0;
    if (ms > 10_000) problems.push(`slow: ${Math.round(ms / 1000)} s`);
    if (run.code === 0) {
      const parsed = parseJson(run.stdout);
      problems.push(...parsed.problems);
      if (parsed.json !== undefined) {
        problems.push(
          ...(command === 'check'
            ? checkJsonProblems(parsed.json, c.facts, { reference: i % 2 ? '1d' : 'auto', tolerance: 0.02 })
            : solveJsonProblems(parsed.json, c.facts, { model: command === 'solve' ? 'fd-1d' : 'fd-2d', single: command === 'solve2d' })),
        );
      }
    }
    for (const p of problems) record(`[${command}] ${p}${c.what ? ` {${c.what.replace(/=.*$/, '')}}` : ''}`, run);
  }
  if ((i + 1) % 20 === 0) console.error(`${i + 1}/${count} cases, ${((Date.now() - started) / 1000).toFixed(0)} s`);
}
cleanUp();

console.log(`seed ${seed}, ${count} cases, ${((Date.now() - started) / 1000).toFixed(1)} s`);
for (const [command, ts] of Object.entries(times)) {
  const sorted = [...ts].sort((a, b) => a - b);
  console.log(
    `${command}: median ${sorted[Math.floor(sorted.length / 2)]} ms, max ${sorted[sorted.length - 1]} ms, total ${(ts.reduce((a, b) => a + b, 0) / 1000).toFixed(1)} s`,
  );
}
let n = 0;
for (const [key, { count: k, example, problem }] of [...classes.entries()].sort((a, b) => b[1].count - a[1].count)) {
  n += 1;
  const file = join(outDir, `class-${String(n).padStart(2, '0')}.${example.argv[1]?.endsWith('.json') ? 'json' : 'yaml'}`);
  writeFileSync(file, example.text);
  console.log(`\n#${n} x${k}: ${key}\n   e.g. ${problem.slice(0, 300)}\n   fincheck ${example.argv[0]} ${file} ${example.argv.slice(2).join(' ')}`);
}
