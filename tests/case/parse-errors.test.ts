/**
 * Bad input, one test per class: each checks the issue's key path, the value as given, what is accepted and the
 * line in the file, and that the error is an InputError with exit code 2 (the output contract).
 * All inputs are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError, type InputIssue } from '../../src/errors.js';
import { loadCase, parseCaseText } from '../../src/case/parse.js';

/** A valid case; each test breaks one line of it. Line numbers below refer to this text. */
const valid = `name: error tests
fin:
  profile: rectangular
  length: 40 mm
  thickness: 2 mm
  width: 80 mm
material: aluminium-6063
convection:
  ambient: 25 degC
  h: 40 W/(m^2*K)
  tip: convective
base:
  temperature: 85 degC
`;

function failure(text: string, fileName = 'bad.yaml'): InputError {
  try {
    parseCaseText(text, fileName);
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    const inputError = err as InputError;
    expect(inputError.exitCode).toBe(2);
    return inputError;
  }
  throw new Error('expected an InputError');
}

/** The single issue of a failure, after checking there is exactly one. */
function onlyIssue(text: string, fileName?: string): InputIssue {
  const err = failure(text, fileName);
  expect(err.issues, err.message).toHaveLength(1);
  const issue = err.issues[0];
  if (!issue) throw new Error('no issue');
  return issue;
}

function replaceLine(text: string, line: number, replacement: string): string {
  const lines = text.split('\n');
  lines[line - 1] = replacement;
  return lines.join('\n');
}

it('the valid case parses (so each failure below is due to its one change)', () => {
  expect(parseCaseText(valid, 'ok.yaml').fin.profile.kind).toBe('rectangular');
});

describe('one class of bad input per test', () => {
  it('unknown key: names the key, its value, the keys accepted, a near spelling and the line', () => {
    const issue = onlyIssue(replaceLine(valid, 6, '  width: 80 mm\n  thikness: 3 mm'));
    expect(issue.path).toBe('fin.thikness');
    expect(issue.value).toBe('3 mm');
    expect(issue.accepted).toContain('profile, length, thickness, width, edges');
    expect(issue.accepted).toContain('did you mean thickness?');
    expect(issue.line).toBe(7);
  });

  it('unknown key at the top level', () => {
    const issue = onlyIssue(valid + 'colour: blue\n');
    expect(issue).toMatchObject({ path: 'colour', value: 'blue', line: 14 });
    expect(issue.accepted).toContain('name, fin, material, convection, base');
  });

  it('unknown unit', () => {
    const issue = onlyIssue(replaceLine(valid, 5, '  thickness: 2 mmm'));
    expect(issue).toMatchObject({ path: 'fin.thickness', value: '2 mmm', line: 5, column: 14 });
    expect(issue.accepted).toMatch(/^a length > 0 such as "2 mm"/);
    expect(issue.accepted).toContain('unit "mmm" is not known');
  });

  it('wrong kind of unit', () => {
    const issue = onlyIssue(replaceLine(valid, 5, '  thickness: 3 W'));
    expect(issue).toMatchObject({ path: 'fin.thickness', value: '3 W', line: 5 });
    expect(issue.accepted).toContain('"W" is a power, not a length');
  });

  it('negative size', () => {
    const issue = onlyIssue(replaceLine(valid, 4, '  length: -40 mm'));
    expect(issue).toMatchObject({ path: 'fin.length', value: '-40 mm', line: 4 });
    expect(issue.accepted).toMatch(/^a length > 0/);
    expect(issue.accepted).toContain('that is -0.04 m');
  });

  it('zero size', () => {
    const issue = onlyIssue(replaceLine(valid, 5, '  thickness: 0'));
    expect(issue).toMatchObject({ path: 'fin.thickness', value: '0', line: 5 });
    expect(issue.accepted).toMatch(/^a length > 0/);
  });

  it.each([
    ['.nan', 'NaN is not a finite number'],
    ['.inf', 'Infinity is not a finite number'],
    ['-.inf', '-Infinity is not a finite number'],
    ['Infinity', 'not a finite number'],
  ])('non-finite number in YAML: %s', (given, reason) => {
    const issue = onlyIssue(replaceLine(valid, 6, `  width: ${given}`));
    expect(issue).toMatchObject({ path: 'fin.width', value: given, line: 6 });
    expect(issue.accepted).toContain(reason);
  });

  it('non-finite number in JSON: "Infinity" and 1e999', () => {
    const json = JSON.stringify(
      {
        fin: { profile: 'pin', length: 'Infinity', diameter: '5 mm' },
        material: 'copper-pure',
        convection: { ambient: 20, h: 10 },
        base: { temperature: 100 },
      },
      null,
      2,
    ).replace('"diameter": "5 mm"', '"diameter": 1e999');
    const err = failure(json, 'bad.json');
    expect(err.issues.map((i) => [i.path, i.value, i.line])).toEqual([
      ['fin.length', '"Infinity"', 4],
      ['fin.diameter', '1e999', 5],
    ]);
    expect(err.issues.every((i) => i.accepted.includes('not a finite number'))).toBe(true);
  });

  it('tip thicker than the base of a trapezoidal fin', () => {
    const text = valid.replace(
      '  profile: rectangular\n  length: 40 mm\n  thickness: 2 mm\n',
      '  profile: trapezoidal\n  length: 40 mm\n  baseThickness: 2 mm\n  tipThickness: 2.5 mm\n',
    );
    const issue = onlyIssue(text);
    expect(issue).toMatchObject({ path: 'fin.tipThickness', value: '2.5 mm', line: 6 });
    expect(issue.accepted).toContain('from 0 to baseThickness (2 mm)');
  });

  it('tip wider than the base of a conical pin', () => {
    const text = valid.replace(
      '  profile: rectangular\n  length: 40 mm\n  thickness: 2 mm\n  width: 80 mm\n',
      '  profile: conical-pin\n  length: 40 mm\n  baseDiameter: 4 mm\n  tipDiameter: 5 mm\n',
    );
    const issue = onlyIssue(text);
    expect(issue).toMatchObject({ path: 'fin.tipDiameter', value: '5 mm', line: 6 });
    expect(issue.accepted).toContain('from 0 to baseDiameter (4 mm)');
  });

  it('YAML syntax error, with its line', () => {
    const issue = onlyIssue(replaceLine(valid, 10, '  h: [40 W/(m^2*K)'));
    expect(issue.path).toBe('(syntax)');
    expect(issue.accepted).toMatch(/^valid YAML \(/);
    expect(issue.line).toBe(11);
    expect(issue.value).toBe('"tip: convective"');
  });

  it('several YAML documents in one file: the advice is about the file, not the parser', () => {
    const issue = onlyIssue(`${valid}---\nname: second case\n`);
    expect(issue.path).toBe('(syntax)');
    expect(issue.value).toBe('"---"');
    expect(issue.accepted).toContain('one document per case file');
    expect(issue.accepted).not.toMatch(/parseAllDocuments|\(\)/);
  });

  it('JSON syntax error, with its line', () => {
    const issue = onlyIssue('{\n  "name": "x",\n  "fin": {"profile": "pin",,}\n}\n', 'bad.json');
    expect(issue.path).toBe('(syntax)');
    expect(issue.accepted).toMatch(/^valid JSON/);
    expect(issue.line).toBe(3);
  });

  it('duplicate key', () => {
    const issue = onlyIssue(replaceLine(valid, 6, '  width: 80 mm\n  length: 30 mm'));
    expect(issue).toMatchObject({ path: 'fin.length', value: '30 mm', line: 7, column: 3 });
    expect(issue.accepted).toBe('each key once (length is first given on line 4, column 3)');
  });

  it('missing required key', () => {
    const issue = onlyIssue(valid.replace('  width: 80 mm\n', ''));
    expect(issue.path).toBe('fin.width');
    expect(issue.value).toBe('nothing (the key is missing)');
    expect(issue.accepted).toContain('a rectangular fin needs length, thickness and width');
    expect(issue.line).toBe(3); // where the fin's keys are
  });

  it('missing section', () => {
    const issue = onlyIssue(valid.replace('base:\n  temperature: 85 degC\n', ''));
    expect(issue).toMatchObject({ path: 'base', value: 'nothing (the key is missing)' });
    expect(issue.accepted).toContain('a mapping with the keys temperature, contactResistance');
  });

  it('unknown material', () => {
    const issue = onlyIssue(replaceLine(valid, 7, 'material: alumnium-6063'));
    expect(issue).toMatchObject({ path: 'material', value: 'alumnium-6063', line: 7, column: 11 });
    expect(issue.accepted).toContain('aluminium-6063');
    expect(issue.accepted).toContain('or { k: 205 W/(m*K) }');
    expect(issue.accepted).toContain('did you mean aluminium-6063');
  });

  it('unknown profile', () => {
    const issue = onlyIssue(replaceLine(valid, 3, '  profile: rectangle'));
    expect(issue).toMatchObject({ path: 'fin.profile', value: 'rectangle', line: 3, column: 12 });
    expect(issue.accepted).toContain('rectangular, pin, trapezoidal, triangular, parabolic-concave, parabolic-convex, conical-pin, annular, tabulated');
    expect(issue.accepted).toContain('did you mean rectangular?');
  });

  it('base at ambient temperature', () => {
    const issue = onlyIssue(replaceLine(valid, 13, '  temperature: 77 degF'));
    expect(issue).toMatchObject({ path: 'base.temperature', value: '77 degF', line: 13 });
    expect(issue.accepted).toContain('different from convection.ambient (25 degC)');
  });

  it('temperature below absolute zero', () => {
    const issue = onlyIssue(replaceLine(valid, 9, '  ambient: -10 K'));
    expect(issue).toMatchObject({ path: 'convection.ambient', value: '-10 K', line: 9 });
    expect(issue.accepted).toContain('above absolute zero');
  });

  it('infinite tip on a tapered fin', () => {
    const text = replaceLine(
      valid.replace('  profile: rectangular\n  length: 40 mm\n  thickness: 2 mm\n', '  profile: triangular\n  length: 40 mm\n  baseThickness: 2 mm\n'),
      11,
      '  tip: infinite',
    );
    const issue = onlyIssue(text);
    expect(issue).toMatchObject({ path: 'convection.tip', value: 'infinite', line: 11 });
    expect(issue.accepted).toContain('uniform profile (rectangular or pin), not triangular');
  });

  it('misspelt tip condition', () => {
    const issue = onlyIssue(replaceLine(valid, 11, '  tip: convection'));
    expect(issue).toMatchObject({ path: 'convection.tip', value: 'convection', line: 11 });
    expect(issue.accepted).toContain('adiabatic, convective, infinite, { convective: 55 W/(m^2*K) } or { temperature: 30 degC }');
    expect(issue.accepted).toContain('did you mean convective?');
  });

  it('h given as a mapping of one form with a wrong key reports the form meant', () => {
    // The power law is the nearest form: its missing exponent and the unknown key are both reported, rather than
    // one message listing every form of h.
    const err = failure(replaceLine(valid, 10, '  h: { law: power, base: 12, exponnt: 0.25 }'));
    expect(err.issues.map((i) => [i.path, i.value])).toEqual([
      ['convection.h.exponent', 'nothing (the key is missing)'],
      ['convection.h.exponnt', '0.25'],
    ]);
    expect(err.issues[1]?.accepted).toContain('law, base, exponent (unknown key; did you mean exponent?)');
  });

  it('h that fits no form at all lists the accepted forms', () => {
    const issue = onlyIssue(replaceLine(valid, 10, '  h: [40]'));
    expect(issue).toMatchObject({ path: 'convection.h', value: '[40]', line: 10 });
    expect(issue.accepted).toContain('{ base: 60, tip: 25 }, { points: [[0 mm, 60], [40 mm, 25]] } or { law: power');
  });

  it('h table out of order and beyond the fin', () => {
    const err = failure(replaceLine(valid, 10, '  h: { points: [[0, 60], [30 mm, 40], [20 mm, 30], [50 mm, 25]] }'));
    expect(err.issues.map((i) => [i.path, i.value])).toEqual([
      ['convection.h.points[2][0]', '20 mm'],
      ['convection.h.points[3][0]', '50 mm'],
    ]);
    expect(err.issues[0]?.accepted).toContain('strictly increasing');
    expect(err.issues[1]?.accepted).toContain("from 0 to the fin's length (40 mm)");
  });

  it('tabulated profile not starting at x = 0, and a straight one without width', () => {
    const text = valid.replace(
      '  profile: rectangular\n  length: 40 mm\n  thickness: 2 mm\n  width: 80 mm\n',
      '  profile: tabulated\n  shape: straight\n  points: [[1 mm, 2 mm], [40 mm, 1 mm]]\n',
    );
    const err = failure(text);
    expect(err.issues.map((i) => i.path)).toEqual(['fin.width', 'fin.points[0][0]']);
    expect(err.issues[1]?.accepted).toContain('x = 0');
  });

  it('emissivity outside 0..1', () => {
    const issue = onlyIssue(replaceLine(valid, 11, '  tip: convective\n  emissivity: 1.2'));
    expect(issue).toMatchObject({ path: 'convection.emissivity', value: '1.2', line: 12 });
    expect(issue.accepted).toMatch(/^a plain number from 0 to 1/);
  });

  it('negative contact resistance', () => {
    const issue = onlyIssue(valid + '  contactResistance: -1e-4 m^2*K/W\n');
    expect(issue).toMatchObject({ path: 'base.contactResistance', value: '-1e-4 m^2*K/W', line: 14 });
    expect(issue.accepted).toMatch(/^a contact resistance >= 0/);
  });

  it('a document that is not a mapping', () => {
    const issue = onlyIssue('- just\n- a list\n');
    expect(issue.path).toBe('(top level)');
    expect(issue.accepted).toContain('a mapping with the keys name, fin, material, convection, base');
  });

  it('missing file', () => {
    let caught: unknown;
    try {
      loadCase('/nonexistent/fincheck/case.yaml');
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(InputError);
    expect((caught as InputError).exitCode).toBe(2);
    expect((caught as InputError).message).toContain('"/nonexistent/fincheck/case.yaml"');
    expect((caught as InputError).message).toContain('no such file');
  });
});

describe('all issues at once', () => {
  it('collects every problem of a file, in file order, each with its line', () => {
    const text = `fin:
  profile: rectangular
  length: -40 mm
  thickness: 2 furlongs
  width: 80 W
material: unobtainium
convection:
  ambient: 25 degC
  h: 40 W/(m^2*K)
  tip: convective
base:
  temperature: 85 degC
  colour: red
`;
    const err = failure(text);
    expect(err.issues.map((i) => [i.path, i.line])).toEqual([
      ['fin.length', 3],
      ['fin.thickness', 4],
      ['fin.width', 5],
      ['material', 6],
      ['base.colour', 13],
    ]);
    // The message is one line per issue: file:line:column: path: got value; expected accepted.
    const lines = err.message.split('\n');
    expect(lines).toHaveLength(5);
    expect(lines[0]).toMatch(/^bad\.yaml:3:11: fin\.length: got -40 mm; expected a length > 0/);
  });
});

describe('loadCase', () => {
  it('reads a file and reports issues with the file name', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-case-'));
    const good = join(dir, 'good.yaml');
    writeFileSync(good, valid);
    expect(loadCase(good).name).toBe('error tests');
    const bad = join(dir, 'bad.yaml');
    writeFileSync(bad, replaceLine(valid, 5, '  thickness: 0'));
    expect(() => loadCase(bad)).toThrow(`${bad}:5:14: fin.thickness: got 0; expected a length > 0`);
  });
});
