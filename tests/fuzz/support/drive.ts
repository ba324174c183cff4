/**
 * Runs the real CLI in-process (tests/cli/run.ts: real argv, captured stdout and stderr) on a case written
 * to a temporary file, and describes a run for failure messages so a counterexample can be replayed by hand.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { stringify } from 'yaml';
import { cli, type CliRun } from '../../cli/run.js';

let dir: string | undefined;
let counter = 0;

/** The fuzz tests' temporary folder (one per test file; removed by `cleanUp`). */
export function scratchDir(): string {
  dir ??= mkdtempSync(join(tmpdir(), 'fincheck-fuzz-'));
  return dir;
}

export function cleanUp(): void {
  if (dir !== undefined) rmSync(dir, { recursive: true, force: true });
  dir = undefined;
}

/** The case as file text: YAML through the yaml package, JSON through JSON.stringify. */
export function caseText(doc: unknown, format: 'yaml' | 'json'): string {
  return format === 'yaml' ? stringify(doc) : JSON.stringify(doc, null, 1);
}

/** Writes `text` to a fresh file in the scratch folder and returns its path. */
export function writeCase(text: string, format: 'yaml' | 'json'): string {
  counter += 1;
  const path = join(scratchDir(), `case-${counter}.${format === 'yaml' ? 'yaml' : 'json'}`);
  writeFileSync(path, text);
  return path;
}

export interface Run extends CliRun {
  argv: string[];
  text: string;
}

/** Runs `fincheck <command> <case file> ...options` on `text`. */
export async function runOn(text: string, format: 'yaml' | 'json', command: string, options: string[]): Promise<Run> {
  const path = writeCase(text, format);
  const argv = [command, path, ...options];
  const run = await cli(...argv);
  return { ...run, argv, text };
}

/** A run as a failure message: argv, the case text, the exit code and the start of each stream. */
export function describeRun(run: Run): string {
  const head = (s: string, n: number) => (s.length > n ? `${s.slice(0, n)}... (${s.length} chars)` : s);
  return [
    `fincheck ${run.argv.join(' ')}`,
    '--- case file ---',
    run.text.trimEnd(),
    `--- exit ${run.code}; stderr ---`,
    head(run.stderr, 1500),
    '--- stdout ---',
    head(run.stdout, 1500),
  ].join('\n');
}
