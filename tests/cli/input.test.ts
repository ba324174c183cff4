/**
 * The input side of the CLI, driven in-process with real argv: `-` for standard input, warnings in every output,
 * error lines that all start with "fincheck:", bounded messages, the top-level help, map's --steps N and --out
 * into a place that cannot be written. All cases are invented.
 */
import { chmodSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli, cliWithStdin } from './run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-input-'));
function caseFile(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

const plateText = `name: stdin plate
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 }
base: { temperature: 80 degC }
`;
const plate = caseFile('plate.yaml', plateText);

/** A pin whose bare `length: 40` is 40 m. */
const barePinText = `name: bare pin
fin: { profile: pin, length: 40, diameter: 3 mm }
material: copper-pure
convection: { ambient: 25, h: 20 }
base: { temperature: 80 }
`;

describe('- reads the case from standard input', () => {
  it('check - gives the same JSON as check FILE', async () => {
    const fromFile = await cli('check', plate, '--json', '--reference', '1d');
    const fromStdin = await cliWithStdin(plateText, 'check', '-', '--json', '--reference', '1d');
    expect(fromStdin.code).toBe(0);
    expect(JSON.parse(fromStdin.stdout)).toEqual(JSON.parse(fromFile.stdout));
  });

  it('solve - and plot - read it too; JSON text on stdin is read as JSON', async () => {
    const json = JSON.stringify({
      name: 'json plate',
      fin: { profile: 'rectangular', length: '30 mm', thickness: '2 mm', width: '50 mm' },
      material: { k: 180 },
      convection: { ambient: 20, h: 40 },
      base: { temperature: 80 },
    });
    const solve = await cliWithStdin(json, 'solve', '-', '--nodes', '50', '--json');
    expect(solve.code).toBe(0);
    expect(JSON.parse(solve.stdout).case).toBe('json plate');
    const out = join(tmp, 'stdin-profile.svg');
    const plot = await cliWithStdin(plateText, 'plot', '-', '--out', out, '--reference', '1d', '--json');
    expect(plot.code).toBe(0);
    expect(JSON.parse(plot.stdout).file).toBe(out);
  });

  it('an error in standard input is located as stdin:LINE:COLUMN (exit 2)', async () => {
    const r = await cliWithStdin(plateText.replace('thickness: 2 mm', 'thickness: -2 mm'), 'check', '-');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^fincheck: stdin:2:\d+: fin\.thickness: got -2 mm/);
  });

  it('map - reads it as well', async () => {
    const out = join(tmp, 'stdin-map');
    const r = await cliWithStdin(
      plateText,
      'map',
      '-',
      '--x',
      'fin.length=20mm:40mm',
      '--y',
      'convection.h=20:60',
      '--steps',
      '2',
      '--reference',
      '1d',
      '--format',
      'svg',
      '--out',
      out,
      '--json',
    );
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    // --steps 2 is the N x N shorthand: 2 values on each axis.
    expect(j.x.values).toHaveLength(2);
    expect(j.y.values).toHaveLength(2);
    expect(j.warnings).toEqual([]);
  });
});

describe('warnings: a bare length read in metres', () => {
  it('check: on stderr and in the JSON warnings, naming the key, the value and "did you mean 40 mm?"', async () => {
    const r = await cliWithStdin(barePinText, 'check', '-', '--json', '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stderr).toMatch(/^fincheck: warning: fin\.length: 40 is 40 m.*did you mean 40 mm\?/);
    const j = JSON.parse(r.stdout);
    expect(j.warnings).toEqual([expect.objectContaining({ path: 'fin.length', value: '40' })]);
  });

  it('check text output: the warning on stderr, the table on stdout', async () => {
    const r = await cliWithStdin(barePinText, 'check', '-', '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('did you mean 40 mm?');
    expect(r.stdout).not.toContain('did you mean');
  });

  it('solve --json lists them too; units: { length: mm } makes the same file a 40 mm pin without warning', async () => {
    const r = await cliWithStdin(barePinText, 'solve', '-', '--nodes', '50', '--json');
    expect(JSON.parse(r.stdout).warnings[0].path).toBe('fin.length');
    const mm = await cliWithStdin(
      `units: { length: mm }\n${barePinText.replace('diameter: 3 mm', 'diameter: 3')}`,
      'solve',
      '-',
      '--nodes',
      '50',
      '--json',
    );
    expect(mm.code).toBe(0);
    expect(mm.stderr).toBe('');
    const j = JSON.parse(mm.stdout);
    expect(j.warnings).toEqual([]);
    expect(j.profile[j.profile.length - 1].x_m).toBeCloseTo(0.04, 12);
  });

  it('map: a bare length axis swept to 300 (metres) is warned in the JSON and on stderr', async () => {
    const out = join(tmp, 'bare-map');
    const r = await cli(
      'map',
      plate,
      '--x',
      'fin.length=20:300',
      '--y',
      'convection.h=20:60',
      '--steps',
      '2',
      '--reference',
      '1d',
      '--format',
      'svg',
      '--out',
      out,
      '--json',
    );
    expect(r.code).toBe(0);
    expect(r.stderr).toContain('fincheck: warning: --x fin.length: 300 is 300 m');
    expect(JSON.parse(r.stdout).warnings[0].message).toContain('did you mean 300 mm?');
  });
});

describe('error lines', () => {
  it.each([[['check', '--bogus', 'x.yaml']], [['bogus-command']], [['check']], [['check', join(tmp, 'missing.yaml')]]])(
    '%j: exit 2, every stderr line starts with "fincheck:"',
    async (argv) => {
      const r = await cli(...argv);
      expect(r.code).toBe(2);
      const lines = r.stderr.trimEnd().split('\n');
      expect(lines.length).toBeGreaterThan(0);
      for (const line of lines) expect(line).toMatch(/^fincheck: /);
    },
  );

  it('a case with thousands of problems prints a bounded message', async () => {
    const points = Array.from({ length: 900 }, (_, i) => `[${i} mm, -1]`).join(', ');
    const bad = caseFile('many.yaml', plateText.replace('h: 40', `h: { points: [${points}] }`));
    const r = await cli('check', bad);
    expect(r.code).toBe(2);
    const lines = r.stderr.trimEnd().split('\n');
    // 900 issues: the first 60 lines and one line counting the rest.
    expect(lines).toHaveLength(61);
    expect(lines[60]).toMatch(/^fincheck: \.\.\. and \d+ more lines$/);
  });

  it('the alias bomb and a width of 1e308 are exit 2 (they were internal errors, exit 70)', async () => {
    const bomb = caseFile(
      'bomb.yaml',
      [
        'a: &a [1,1,1,1,1,1,1,1,1]',
        'b: &b [*a,*a,*a,*a,*a,*a,*a,*a,*a]',
        'c: &c [*b,*b,*b,*b,*b,*b,*b,*b,*b]',
        'd: &d [*c,*c,*c,*c,*c,*c,*c,*c,*c]',
        'fin: *d',
      ].join('\n'),
    );
    expect((await cli('check', bomb)).code).toBe(2);
    const wide = await cli('check', caseFile('wide.yaml', plateText.replace('width: 50 mm', 'width: 1e308')));
    expect(wide.code).toBe(2);
    expect(wide.stderr).toMatch(/fin\.width: got 1e308; expected .*at most 1000 m/);
    const thin = await cli('check', caseFile('thin.yaml', plateText.replace('thickness: 2 mm', 'thickness: 5e-324')));
    expect(thin.code).toBe(2);
  });

  it('absurd magnitudes that used to exit 0 with NaN are refused: h 1e308, base 1e308, thickness 1e-300', async () => {
    for (const [from, to] of [
      ['h: 40', 'h: 1e308'],
      ['temperature: 80 degC', 'temperature: 1e308'],
      ['thickness: 2 mm', 'thickness: 1e-300'],
    ] as const) {
      const r = await cli('check', caseFile('absurd.yaml', plateText.replace(from, to)), '--json');
      expect(r.code, to).toBe(2);
      expect(r.stdout).toBe('');
    }
  });

  it('an option value is echoed clipped: a 5000-character --tolerance gives one short line', async () => {
    const r = await cli('check', plate, '--tolerance', 'x'.repeat(5000));
    expect(r.code).toBe(2);
    expect(r.stderr.length).toBeLessThan(400);
    expect(r.stderr).toContain('(5,000 characters in all)');
  });

  it('control characters of the name never reach the output', async () => {
    const r = await cliWithStdin(plateText.replace('name: stdin plate', 'name: "bell\\a \\e[2J clear"'), 'solve', '-', '--nodes', '20');
    expect(r.code).toBe(0);
    expect(r.stdout).toContain('fincheck solve: bell [2J clear');
    // eslint-disable-next-line no-control-regex -- the control characters are what the test looks for
    expect(r.stdout).not.toMatch(/[\u0007\u001b]/);
  });
});

describe('help and map options', () => {
  it('the top-level description is one paragraph (no line break inside a sentence)', async () => {
    const r = await cli('--help');
    expect(r.code).toBe(0);
    const description = r.stdout.split('\n\n')[1] ?? '';
    expect(description.replace(/\n/g, ' ')).toContain('shows how far the textbook shortcuts');
    // commander wraps at the terminal width; the stray break left a short line ending in "textbook".
    expect(description).not.toMatch(/textbook\n/);
  });

  it('map --help documents --steps N as N x N', async () => {
    const r = await cli('map', '--help');
    expect(r.stdout).toMatch(/--steps <NXxNY>\s+grid points along x and y: NXxNY, or N for N x N/);
  });

  it('map --out where a folder cannot be made is exit 2 with the reason', async () => {
    const file = caseFile('not-a-folder', 'x');
    const r = await cli(
      'map',
      plate,
      '--x',
      'fin.length=20mm:40mm',
      '--y',
      'convection.h=20:60',
      '--steps',
      '2',
      '--reference',
      '1d',
      '--format',
      'svg',
      '--out',
      file,
    );
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^fincheck: cannot write the output: E(EXIST|NOTDIR)/);
  });

  it.skipIf(process.getuid?.() === 0)('map --out into a read-only folder is exit 2 (EACCES)', async () => {
    const locked = mkdtempSync(join(tmpdir(), 'fincheck-locked-'));
    chmodSync(locked, 0o500);
    const r = await cli(
      'map',
      plate,
      '--x',
      'fin.length=20mm:40mm',
      '--y',
      'convection.h=20:60',
      '--steps',
      '2',
      '--reference',
      '1d',
      '--out',
      join(locked, 'map'),
    );
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('EACCES');
  });
});

describe('material sources in design-note outputs', () => {
  it('check shows the table or "typical; confirm with the supplier\'s data sheet", never "from memory"', async () => {
    const alloy = await cliWithStdin(plateText.replace('material: { k: 180 }', 'material: aluminium-6063'), 'check', '-', '--reference', '1d');
    expect(alloy.stdout).toContain('aluminium-6063, k = 209 W/(m*K) (typical of aluminium 6063-T5');
    expect(alloy.stdout).toContain("confirm with the supplier's data sheet");
    const pure = await cliWithStdin(plateText.replace('material: { k: 180 }', 'material: copper-pure'), 'check', '-', '--reference', '1d');
    expect(pure.stdout).toMatch(/copper-pure, k = 401 W\/\(m\*K\) \(Incropera, DeWitt, Bergman & Lavine 2007, .*Table A\.1, 300 K\)/);
    const list = await cli('materials');
    for (const r of [alloy, pure, list]) expect(r.stdout).not.toMatch(/from memory|\(checked/);
  });
});
