/**
 * The guard rails bite: fincheck's eslint.config.js, run on the fixture tree in fixtures/, reports an import
 * cycle (type-only), a layer reached around its entry (from src/ and from cli/) and flag names in src/, and
 * nothing on the lines that keep the rules; prettier with the project's settings rejects unformatted code.
 * `npm test` runs the same lint and `prettier --check` on the whole repository, so a violation fails it.
 */
import { ESLint } from 'eslint';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import * as prettier from 'prettier';
import { beforeAll, describe, expect, it } from 'vitest';

const here = path.dirname(fileURLToPath(import.meta.url));
const repository = path.resolve(here, '../..');
const fixtures = path.join(here, 'fixtures');

type Finding = { file: string; line: number; rule: string | null; severity: number };

describe('lint rules on the fixture tree', () => {
  let findings: Finding[] = [];
  beforeAll(async () => {
    const eslint = new ESLint({ cwd: fixtures, overrideConfigFile: path.join(repository, 'eslint.config.js') });
    const results = await eslint.lintFiles(['src/**/*.ts', 'cli/**/*.ts']);
    findings = results.flatMap((r) =>
      r.messages.map((m) => ({ file: path.relative(fixtures, r.filePath).split(path.sep).join('/'), line: m.line, rule: m.ruleId, severity: m.severity })),
    );
  });
  const errorsIn = (file: string, rule: string) => findings.filter((f) => f.file === file && f.rule === rule && f.severity === 2).map((f) => f.line);

  it('reports a type-only import cycle on both sides', () => {
    expect(errorsIn('src/gamma/first.ts', 'fincheck/no-import-cycle')).toEqual([2]);
    expect(errorsIn('src/gamma/second.ts', 'fincheck/no-import-cycle')).toEqual([2]);
  });

  it('reports a layer reached around its entry, and not one reached through it or a module of the same layer', () => {
    expect(errorsIn('src/beta/around-entry.ts', 'fincheck/layer-entry')).toEqual([2]);
    expect(errorsIn('cli/command.ts', 'fincheck/layer-entry')).toEqual([2]);
  });

  it('reports flag names in strings and template text under src/, not look-alikes', () => {
    expect(errorsIn('src/delta/message.ts', 'no-restricted-syntax')).toEqual([3, 4]);
  });

  it('reports nothing else', () => {
    expect(findings).toHaveLength(6);
  });
});

describe('prettier with the project settings', () => {
  it('accepts formatted code and rejects the same code unformatted', async () => {
    const file = path.join(repository, 'src', 'example.ts');
    const options = { ...(await prettier.resolveConfig(file)), filepath: file };
    expect(options.printWidth).toBe(155);
    const formatted = 'export const limits = { low: 1, high: 2 };\n';
    expect(await prettier.check(formatted, options)).toBe(true);
    expect(await prettier.check('export const limits = {low:1,high:2}\n', options)).toBe(false);
    expect(await prettier.check('export const limits = { low: 1, high: 2 }\n', options)).toBe(false);
  });
});
