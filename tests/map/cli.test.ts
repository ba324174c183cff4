/**
 * `fincheck map` driven with real argv in-process: the files it writes, exactly one JSON document on stdout with
 * --json, exit 2 with a message and nothing written for bad options, the same numbers on worker threads as in-process,
 * and Ctrl-C (SIGINT) leaving no file behind with exit 130. Inputs are invented.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { caseFile, tmp } from './support.js';

const file = caseFile(
  'cli-plate.yaml',
  `name: cli plate
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }
material: aluminium-6063
convection: { ambient: 35 degC, h: 45 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
`,
);

const grid = ['--x', 'fin.thickness=1:4 mm', '--y', 'convection.h=20:400', '--log-y', '--reference', '1d'];

describe('fincheck map writes its files', () => {
  it('PNG: map.csv, map.json, one map per shortcut and the overview; a readable summary on stdout', async () => {
    const out = join(tmp, 'cli-png');
    const r = await cli('map', file, ...grid, '--steps', '5x4', '--jobs', '1', '--out', out);
    expect(r.code, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const shortcuts = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];
    expect(readdirSync(out).sort()).toEqual(['map.csv', 'map.json', ...shortcuts.map((m) => `map-${m}.png`), 'overview.png'].sort());
    expect(r.stdout).toMatch(
      // eslint-disable-next-line no-regex-spaces -- the summary's two-space indentation, as printed
      /^Map of cli plate\n  x: fin\.thickness from 1 mm to 4 mm, 5 values\n  y: convection\.h from 20 W\/\(m\^2\*K\) to 400 W\/\(m\^2\*K\), 4 values \(log spacing\)/,
    );
    expect(r.stdout).toContain('reference fd-1d');
    for (const m of shortcuts) expect(r.stdout).toMatch(new RegExp(`\\n${m.replace(/-/g, '\\-')} +\\d`));
    expect(r.stdout).toContain(join(out, 'overview.png'));
    expect(readFileSync(join(out, 'map.csv'), 'utf8').trim().split('\n')).toHaveLength(1 + 20);
  });

  it('--format svg writes SVG images; --models limits the maps; --json prints exactly one JSON document', async () => {
    const out = join(tmp, 'cli-svg');
    const r = await cli(
      'map',
      file,
      ...grid,
      '--steps',
      '3x3',
      '--jobs',
      '1',
      '--out',
      out,
      '--format',
      'svg',
      '--models',
      'tanh-Lc,convective-tip',
      '--json',
    );
    expect(r.code, r.stderr).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['map-convective-tip.svg', 'map-tanh-Lc.svg', 'map.csv', 'map.json', 'overview.svg']);
    expect(readFileSync(join(out, 'overview.svg'), 'utf8')).toMatch(/^<svg [^>]*>[\s\S]*<\/svg>\n$/);
    const j = JSON.parse(r.stdout);
    expect(Object.keys(j)).toEqual(expect.arrayContaining(['case', 'reference', 'tolerance', 'x', 'y', 'points']));
    expect(j.models).toEqual(['tanh-Lc', 'convective-tip']);
    expect(j.points[0].models.map((m: { model: string }) => m.model)).toEqual(['tanh-Lc', 'convective-tip']);
  });
});

describe('bad options: exit 2, a message naming the option, nothing on stdout, nothing written', () => {
  it.each([
    ['steps < 2', ['--steps', '1x5'], /--steps: got "1x5"; expected NXxNY such as 41x41, each from 2 to 1000/],
    ['steps not a grid', ['--steps', 'many'], /--steps: got "many"/],
    ['an unknown model', ['--models', 'tanh-X'], /--models: got "tanh-X"; expected a comma-separated list of tanh-L, tanh-Lc/],
    ['a model that is the reference', ['--models', 'fd-1d'], /--models: fd-1d does not apply to this case \(it is the reference here/],
    ['--jobs 0', ['--jobs', '0'], /--jobs: got "0"; expected a whole number of threads/],
    ['an unknown image format', ['--format', 'gif'], /--format: got "gif"; expected png or svg/],
    ['a bad tolerance', ['--tolerance', '200%'], /--tolerance: got "200%"/],
  ])('%s', async (_name, extra, message) => {
    const out = join(tmp, `bad-${_name.replace(/\W+/g, '-')}`);
    const r = await cli('map', file, ...grid, '--steps', '3x3', '--jobs', '1', '--out', out, ...extra);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(message);
    expect(existsSync(out)).toBe(false);
  });

  it('the same key on both axes', async () => {
    const r = await cli('map', file, '--x', 'fin.thickness=1:2 mm', '--y', 'fin.thickness=3:4 mm', '--steps', '3x3');
    expect([r.code, r.stdout]).toEqual([2, '']);
    expect(r.stderr).toMatch(/--x and --y both sweep fin\.thickness/);
  });

  it('a missing --y', async () => {
    const r = await cli('map', file, '--x', 'fin.thickness=1:2 mm');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/required option '--y <KEY=FROM:TO>' not specified/);
  });

  it('a missing case file names it', async () => {
    const r = await cli('map', join(tmp, 'no-such.yaml'), ...grid);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/no-such\.yaml/);
  });
});

describe('worker threads and Ctrl-C', () => {
  it('--jobs 2 (worker threads) gives the same JSON as --jobs 1 (in-process)', async () => {
    const one = await cli('map', file, ...grid, '--steps', '4x3', '--jobs', '1', '--json', '--out', join(tmp, 'jobs1'));
    const two = await cli('map', file, ...grid, '--steps', '4x3', '--jobs', '2', '--json', '--out', join(tmp, 'jobs2'));
    expect(one.code, one.stderr).toBe(0);
    expect(two.code, two.stderr).toBe(0);
    expect(two.stdout).toBe(one.stdout);
  });

  it.each([1, 2])('SIGINT during the run (--jobs %i): exit 130, a message, no file and no folder left', async (jobs) => {
    const out = join(tmp, `interrupted-${jobs}`);
    const running = cli('map', file, ...grid, '--steps', '60x60', '--jobs', String(jobs), '--out', out);
    // Emitted until the run ends: before the command listens for SIGINT an emit does nothing (no listener), so the
    // first one after it starts listening interrupts it; 3600 points take far longer than the first emits.
    let settled = false;
    void running.finally(() => {
      settled = true;
    });
    while (!settled) {
      await new Promise((resolve) => setTimeout(resolve, 150));
      if (!settled) process.emit('SIGINT');
    }
    const r = await running;
    expect(r.code).toBe(130);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^fincheck: interrupted after \d+ of 3600 points; no files were written\n$/);
    expect(existsSync(out)).toBe(false);
  });
});
