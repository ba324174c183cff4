/**
 * `extends:` (a case that inherits another and gives the keys that change): the deep merge, single fins and heat
 * sinks, files, standard input and the library, and the errors (cycle, missing file, a broken base, a units clash),
 * each exit 2 naming the chain of files. All cases are invented.
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseFromFile, caseFromText, InputError } from '../../src/api/index.js';
import { caseJsonSchema, deepMerge, heatSinkJsonSchema, loadAnyCase, loadCase, resolveExtends } from '../../src/case/index.js';
import { cli, cliWithStdin } from '../cli/run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-extends-'));
function file(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

file(
  'base.yaml',
  `name: base plate
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: { base: 40, tip: 20 } }
base: { temperature: 80 degC }
`,
);
mkdirSync(join(tmp, 'variants'));
const thick = file('variants/thick.yaml', 'extends: ../base.yaml\nfin: { thickness: 3 mm }\n');

describe('deepMerge', () => {
  it('merges mappings key by key; lists and values replace', () => {
    const merged = deepMerge({ a: { b: 1, c: [1, 2, 3] }, d: 'x' }, { a: { c: [9] }, d: { e: 1 } });
    expect(merged).toEqual({ a: { b: 1, c: [9] }, d: { e: 1 } });
  });
});

describe('extends in a single-fin case', () => {
  it('inherits every key but the name, relative to the file', () => {
    const c = loadCase(thick);
    expect(c.name).toBe('thick'); // the name is not inherited: the file name names the variant
    expect(c.fin.profile).toEqual({ kind: 'rectangular', length: 0.03, thickness: 0.003, width: 0.05 });
    expect(c.convection.h).toEqual({ kind: 'linear', base: 40, tip: 20 });
  });

  it('a changed value inside a mapping keeps its siblings (h.tip changes, h.base stays)', () => {
    const f = file('tip-h.yaml', 'extends: base.yaml\nname: tip h\nconvection: { h: { tip: 30 } }\n');
    expect(loadCase(f).convection.h).toEqual({ kind: 'linear', base: 40, tip: 30 });
  });

  it('chains of bases merge from the deepest up', () => {
    const f = file('chain.yaml', 'extends: variants/thick.yaml\nbase: { temperature: 90 degC }\n');
    const c = loadCase(f);
    expect(c.base.T_degC).toBe(90);
    expect(c.fin.profile.kind === 'rectangular' && c.fin.profile.thickness).toBe(0.003);
  });

  it('the library reads it through caseFromFile and caseFromText (relative to the text file name)', () => {
    expect(caseFromFile(thick).fin.profile).toEqual(loadCase(thick).fin.profile);
    const text = 'extends: ../base.yaml\nfin: { thickness: 3 mm }\n';
    expect(caseFromText(text, join(tmp, 'variants', 'x.yaml')).fin.profile).toEqual(loadCase(thick).fin.profile);
  });

  it('standard input resolves from the current folder', async () => {
    const fromCwd = relative(process.cwd(), join(tmp, 'base.yaml'));
    const merged = resolveExtends({ extends: fromCwd, fin: { thickness: '3 mm' } }, undefined, undefined).raw;
    expect(merged).toMatchObject({ fin: { thickness: '3 mm', length: '30 mm' } });
    const viaStdin = await cliWithStdin(`extends: ${fromCwd}\nfin: { thickness: 3 mm }\n`, 'check', '-', '--json', '--reference', '1d');
    const viaFile = await cli('check', thick, '--json', '--reference', '1d');
    expect(viaStdin.code).toBe(0);
    const { case: _a, ...stdinRest } = JSON.parse(viaStdin.stdout) as Record<string, unknown>;
    const { case: _b, ...fileRest } = JSON.parse(viaFile.stdout) as Record<string, unknown>;
    expect(stdinRest).toEqual(fileRest);
  });

  it('the case schema documents extends and display', () => {
    const props = (caseJsonSchema() as { properties: Record<string, unknown> }).properties;
    expect(Object.keys(props)).toEqual(expect.arrayContaining(['extends', 'display']));
    const sinkProps = (heatSinkJsonSchema() as { properties: Record<string, unknown> }).properties;
    expect(Object.keys(sinkProps)).toEqual(expect.arrayContaining(['extends', 'display']));
  });
});

describe('extends in a heat-sink case', () => {
  it('a variant with more fins and no array key of its own is still a heat sink', () => {
    file(
      'sink.yaml',
      `name: sink base
fin: { profile: rectangular, length: 30 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 8, pitch: 8 mm }
plate: { width: 64 mm, length: 60 mm, thickness: 5 mm }
sources: [{ power: 30 W, centre: [32 mm, 30 mm], size: [20 mm, 20 mm] }]
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
`,
    );
    const f = file('sink-more.yaml', 'extends: sink.yaml\narray: { count: 10, pitch: 6 mm }\n');
    const any = loadAnyCase(f);
    expect(any.kind).toBe('heat-sink');
    if (any.kind !== 'heat-sink') return;
    expect(any.case.array).toMatchObject({ kind: 'plates', count: 10, pitch: 0.006 });
    expect(any.case.sources[0]?.power).toBe(30);
  });
});

describe('extends errors (exit 2, naming the chain)', () => {
  it('a cycle names every file of it', async () => {
    const a = file('cycle-a.yaml', 'extends: cycle-b.yaml\n');
    file('cycle-b.yaml', 'extends: cycle-a.yaml\n');
    const r = await cli('check', a);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('extends: got "cycle-a.yaml"');
    expect(r.stderr).toMatch(/cycle-a\.yaml -> .*cycle-b\.yaml -> .*cycle-a\.yaml is a cycle/);
  });

  it('a case extending itself is a cycle', () => {
    const self = file('self.yaml', 'extends: self.yaml\n');
    expect(() => loadCase(self)).toThrow(/is a cycle/);
  });

  it('a missing base names the file and the chain', async () => {
    const f = file('missing.yaml', 'extends: no-such-base.yaml\nfin: { thickness: 3 mm }\n');
    const r = await cli('check', f);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('missing.yaml:1:10: extends: got "no-such-base.yaml"');
    expect(r.stderr).toMatch(/no-such-base\.yaml: no such file \(.*missing\.yaml -> .*no-such-base\.yaml\)/);
  });

  it('a syntax error in a base names the base, its line and the chain', () => {
    file('broken.yaml', 'fin: [\n');
    const f = file('on-broken.yaml', 'extends: broken.yaml\n');
    expect(() => loadCase(f)).toThrow(InputError);
    expect(() => loadCase(f)).toThrow(/broken\.yaml:2:1: \(syntax\).*read through .*on-broken\.yaml -> .*broken\.yaml/);
  });

  it('extends must be a path', () => {
    const f = file('number.yaml', 'extends: 3\n');
    expect(() => loadCase(f)).toThrow(/extends: got 3; expected the path of the case file this one extends/);
  });

  it('a variant that changes units.length under its base is refused', () => {
    const f = file('units.yaml', 'extends: base.yaml\nunits: { length: mm }\n');
    expect(() => loadCase(f)).toThrow(/units\.length: got "mm"; expected the unit of bare lengths of its base/);
  });

  it('an error in the merged case is reported like any other (exit 2, key path)', async () => {
    const f = file('bad-value.yaml', 'extends: base.yaml\nfin: { thickness: -2 mm }\n');
    const r = await cli('check', f);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('bad-value.yaml:2:19: fin.thickness: got -2 mm; expected a length > 0');
  });
});
