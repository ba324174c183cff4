/**
 * Input that is valid YAML but absurd, hostile or huge: plausibility bounds (exit 2 naming the key, the value and
 * the accepted range), the alias bomb, size caps, echoed values, unknown keys by the hundred thousand, the case
 * name. All inputs are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { maxCaseBytes, parseCaseText, readCaseFile, readCaseStream } from '../../src/case/parse.js';
import { maxUnknownKeysListed } from '../../src/case/issues.js';

const valid = `name: limits
fin:
  profile: rectangular
  length: 40 mm
  thickness: 2 mm
  width: 80 mm
material: aluminium-6063
convection:
  ambient: 25 degC
  h: 40 W/(m^2*K)
base:
  temperature: 85 degC
`;

function failure(text: string): InputError {
  try {
    parseCaseText(text, 'limits.yaml');
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    return err as InputError;
  }
  throw new Error('expected an InputError');
}

describe('plausibility bounds: exit 2 naming the key, the value and the accepted range', () => {
  it.each([
    ['fin.width', '  width: 80 mm', '  width: 1e308', /at most 1000 m/],
    ['fin.thickness', '  thickness: 2 mm', '  thickness: 5e-324', /at least 1e-7 m/],
    ['fin.thickness', '  thickness: 2 mm', '  thickness: 1e-300', /at least 1e-7 m/],
    ['fin.thickness', '  thickness: 2 mm', '  thickness: 1e308', /at most 1000 m/],
    ['fin.length', '  length: 40 mm', '  length: 1e308', /at most 1000 m/],
    ['convection.h', '  h: 40 W/(m^2*K)', '  h: 1e308', /at most 1e6 W\/\(m\^2\*K\)/],
    // A nonzero h below 1e-3 is round-off, not a coefficient (fuzz: 2.2e-308 gave an energy balance of 42 on the 2-D grid).
    ['convection.h', '  h: 40 W/(m^2*K)', '  h: 2.2250738585072014e-308', /0 or at least 1e-3/],
    ['convection.h', '  h: 40 W/(m^2*K)', '  h: 5e-4', /0 or at least 1e-3/],
    ['base.temperature', '  temperature: 85 degC', '  temperature: 1e308', /at most 4000 degC/],
    ['convection.ambient', '  ambient: 25 degC', '  ambient: 5000 K', /at most 4000 degC/],
    ['material.k', 'material: aluminium-6063', 'material: { k: 1e-9 }', /at least 0\.001/],
    ['material.k', 'material: aluminium-6063', 'material: { k: 1e300 }', /at most 10000/],
  ])('%s: %s -> %s', (path, line, replacement, range) => {
    const err = failure(valid.replace(line, replacement));
    expect(err.exitCode).toBe(2);
    expect(err.issues).toHaveLength(1);
    const issue = err.issues[0];
    expect(issue?.path).toBe(path);
    expect(issue?.value).toBe(
      replacement
        .split(': ')
        .slice(1)
        .join(': ')
        .replace(/^\{ k: (.*) \}$/, '$1'),
    );
    expect(issue?.accepted).toMatch(range);
  });

  it('contact resistance, exponent and table length have bounds too', () => {
    const contact = failure(valid.replace('  temperature: 85 degC', '  temperature: 85 degC\n  contactResistance: 1e9'));
    expect(contact.issues[0]?.accepted).toMatch(/at most 10 m\^2\*K\/W/);
    // A nonzero resistance below 1e-9 is round-off (fuzz: 2.2e-308 overflowed 1/R in the nonlinear 2-D start).
    const tiny = failure(valid.replace('  temperature: 85 degC', '  temperature: 85 degC\n  contactResistance: 2.2250738585072014e-308'));
    expect(tiny.issues[0]?.path).toBe('base.contactResistance');
    expect(tiny.issues[0]?.accepted).toMatch(/0 or at least 1e-9/);
    expect(failure(valid.replace('  h: 40 W/(m^2*K)', '  h: { law: power, base: 1e-4, exponent: 0.25 }')).issues[0]?.path).toBe('convection.h.base');
    const exponent = failure(valid.replace('  h: 40 W/(m^2*K)', '  h: { law: power, base: 10, exponent: 50 }'));
    expect(exponent.issues[0]?.path).toBe('convection.h.exponent');
    expect(exponent.issues[0]?.accepted).toMatch(/at most 5/);
    const points = Array.from({ length: 1001 }, (_, i) => `[${i} mm, 40]`).join(', ');
    const table = failure(valid.replace('  h: 40 W/(m^2*K)', `  h: { points: [${points}] }`));
    expect(table.issues.map((i) => i.accepted).join('\n')).toMatch(/2 to 1000 pairs/);
  });

  it('the bounds do not refuse real fins: a 20 um micro fin and a 2 m radiator fin in boiling water', () => {
    expect(() =>
      parseCaseText(valid.replace('  thickness: 2 mm', '  thickness: 20 um').replace('  length: 40 mm', '  length: 200 um'), 'micro.yaml'),
    ).not.toThrow();
    const radiator = parseCaseText(valid.replace('  length: 40 mm', '  length: 2 m').replace('  h: 40 W/(m^2*K)', '  h: 5e4'), 'big.yaml');
    expect(radiator.fin.profile).toMatchObject({ length: 2 });
  });
});

describe('hostile documents', () => {
  it('an alias bomb is a file error (exit 2), not an internal error', () => {
    const bomb = [
      'a: &a ["x","x","x","x","x","x","x","x","x"]',
      'b: &b [*a,*a,*a,*a,*a,*a,*a,*a,*a]',
      'c: &c [*b,*b,*b,*b,*b,*b,*b,*b,*b]',
      'd: &d [*c,*c,*c,*c,*c,*c,*c,*c,*c]',
      'fin: *d',
    ].join('\n');
    const err = failure(bomb);
    expect(err.issues).toHaveLength(1);
    expect(err.issues[0]?.accepted).toMatch(/aliases .* at most 100 copies/);
  });

  it('a 1 MB value is echoed clipped, not whole', () => {
    const huge = 'x'.repeat(1_000_000);
    const err = failure(valid.replace('  thickness: 2 mm', `  thickness: ${huge}`));
    expect(err.issues[0]?.path).toBe('fin.thickness');
    // The echoed value is at most maxEchoChars plus the count of what was left out; the message about the unit
    // may quote a part of the text as well, so the whole message is bounded rather than exactly sized.
    expect(err.issues[0]?.value.length).toBeLessThan(200);
    expect(err.message.length).toBeLessThan(1000);
  });

  it('control characters in an echoed value are escaped, not passed to the terminal', () => {
    const err = failure(valid.replace('  thickness: 2 mm', '  thickness: "2 \\e[31mmm\\a"'));
    // eslint-disable-next-line no-control-regex -- the control characters are what the test looks for
    expect(err.message).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
    expect(err.message).toContain('\\u001b');
  });

  it('30,000 unknown keys: the first ten are listed, the rest counted in one more issue', () => {
    const keys = Array.from({ length: 30_000 }, (_, i) => `junk${i}: 1`).join('\n');
    const err = failure(`${valid}${keys}\n`);
    // Listing each key made the message grow with the count and locating each one by a linear search made the
    // parse quadratic; the count of issues is what stays bounded.
    expect(err.issues).toHaveLength(maxUnknownKeysListed + 1);
    expect(err.message).toContain('and 29,990 more unknown keys at the top level');
  });
});

describe('size cap on the input', () => {
  it('a file larger than the cap is refused (exit 2) after reading at most the cap', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-limits-'));
    const big = join(dir, 'big.yaml');
    writeFileSync(big, `${valid}# ${'x'.repeat(maxCaseBytes)}\n`);
    expect(() => readCaseFile(big)).toThrow(/at most 10 MB/);
  });

  it('an endless device (/dev/zero) stops at the cap', () => {
    expect(() => readCaseFile('/dev/zero')).toThrow(InputError);
  });

  it('a stream stops as soon as it passes the cap', async () => {
    let chunks = 0;
    async function* endless() {
      for (;;) {
        chunks++;
        yield new Uint8Array(1 << 20);
      }
    }
    await expect(readCaseStream(endless(), 'standard input')).rejects.toThrow(/at most 10 MB/);
    expect(chunks).toBe(11);
  });

  it('a folder is an input error naming it', () => {
    expect(() => readCaseFile(tmpdir())).toThrow(/a readable case file \(it is a folder\)/);
  });
});

describe('the case name', () => {
  it('is one line without control characters', () => {
    const c = parseCaseText(valid.replace('name: limits', 'name: "Fin\\n~~~\\n\\e[31mred\\a end"'), 'n.yaml');
    expect(c.name).toBe('Fin ~~~ [31mred end');
    expect(c.warnings).toEqual([]);
  });

  it('is shortened to 120 characters with an ellipsis and a warning', () => {
    const c = parseCaseText(valid.replace('name: limits', `name: ${'n'.repeat(100_000)}`), 'n.yaml');
    expect([...c.name]).toHaveLength(120);
    expect(c.name.endsWith('\u2026')).toBe(true);
    expect(c.warnings?.[0]).toMatchObject({ path: 'name', value: '100,000 characters' });
  });

  it('an empty or blank name falls back to the file name', () => {
    expect(parseCaseText(valid.replace('name: limits', 'name: "  \\n "'), 'my-fin.yaml').name).toBe('my-fin');
  });
});

describe('bare lengths: warnings and units: { length: mm }', () => {
  const pin = (length: string, extra = '') => `${extra}fin: { profile: pin, length: ${length}, diameter: 3 mm }
material: copper-pure
convection: { ambient: 25, h: 20 }
base: { temperature: 80 }
`;

  it('a bare 40 is 40 m, with a warning naming the key, the value and "did you mean 40 mm?"', () => {
    const c = parseCaseText(pin('40'), 'pin.yaml');
    expect(c.fin.profile).toMatchObject({ length: 40 });
    expect(c.warnings).toHaveLength(1);
    expect(c.warnings?.[0]).toMatchObject({ path: 'fin.length', value: '40' });
    expect(c.warnings?.[0]?.message).toContain('did you mean 40 mm?');
  });

  it('a plausible fin has no warning; an explicit implausible unit is warned without the mm hint', () => {
    expect(parseCaseText(pin('40 mm'), 'pin.yaml').warnings).toEqual([]);
    const explicit = parseCaseText(pin('40 m'), 'pin.yaml').warnings ?? [];
    expect(explicit[0]?.message).toMatch(/check the unit/);
    expect(explicit[0]?.message).not.toContain('did you mean');
  });

  it('units: { length: mm } reads bare lengths in mm (and leaves lengths with a unit as they are)', () => {
    const c = parseCaseText(
      `units: { length: mm }\nfin: { profile: pin, length: 40, diameter: 0.003 m }\nmaterial: copper-pure\nconvection: { ambient: 25, h: 20 }\nbase: { temperature: 80 }\n`,
      'mm.yaml',
    );
    expect(c.fin.profile).toEqual({ kind: 'pin', length: 0.04, diameter: 0.003 });
    expect(c.warnings).toEqual([]);
  });

  it('units: { length: mm } applies to tables too, and messages say "a bare number in mm"', () => {
    const text = `units: { length: mm }
fin: { profile: tabulated, shape: straight, width: 50, points: [[0, 2], [20, 1], [40, 0]] }
material: copper-pure
convection: { ambient: 25, h: { points: [[0, 30], [40, 20]] } }
base: { temperature: 80 }
`;
    const c = parseCaseText(text, 't.yaml');
    expect(c.fin.profile.kind === 'tabulated' ? Array.from(c.fin.profile.x) : []).toEqual([0, 0.02, 0.04]);
    expect(c.convection.h.kind === 'points' ? Array.from(c.convection.h.x) : []).toEqual([0, 0.04]);
    const err = failure(text.replace('width: 50', 'width: -5'));
    expect(err.issues[0]?.accepted).toContain('a bare number in mm');
  });

  it('an unknown unit for bare lengths is an error naming units.length', () => {
    const err = failure(pin('40', 'units: { length: furlong }\n'));
    expect(err.issues[0]?.path).toBe('units.length');
    expect(err.issues[0]?.accepted).toMatch(/one of m, cm, mm, um, in/);
  });
});
