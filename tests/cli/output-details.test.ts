/**
 * Output-side details of the CLI: help texts cite only files that exist, the README's usage of `map` has every
 * option of `map --help`, `map` prints drifts signed as `check` does (one helper), and the progress bar's time left
 * waits for a fair rate instead of extrapolating from the first, slow point. Inputs are invented.
 */
import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { signedPercentText } from '../../src/compare/percent-text.js';
import { EtaEstimator } from '../../src/map/eta.js';
import { cli } from './run.js';

const root = join(import.meta.dirname, '../..');
const commands = ['check', 'solve', 'map', 'plot', 'report', 'materials', 'schema', 'demo'];

describe('help texts and README', () => {
  it.each(commands)('`%s --help`: the --json option cites no file that is not in the repository', async (command) => {
    const r = await cli(command, '--help');
    expect(r.code).toBe(0);
    // The --json entry with its wrapped continuation lines (up to the next option). Before: "(outputs.md)".
    const entry = /^\s+--json[\s\S]*?(?=\n\s+-|\n\n|$)/m.exec(r.stdout)?.[0] ?? '';
    const cited = entry.match(/[\w./-]+\.md\b/g) ?? [];
    for (const name of cited) expect(existsSync(join(root, name)), `${command} --help cites ${name}`).toBe(true);
  });

  it('the README documents the JSON keys that --json help points to', () => {
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    expect(readme).toContain('### JSON output (`--json`)');
    for (const key of ['heatRate_W', 'discretizationError', 'formulaEfficiency', 'notApplicable', 'profileStride', 'casePoint', '`files`']) {
      expect(readme).toContain(key);
    }
  });

  it("the README's `map` usage lists every option of `map --help`", async () => {
    const help = (await cli('map', '--help')).stdout;
    const readme = readFileSync(join(root, 'README.md'), 'utf8');
    const usage = /fincheck map CASE[\s\S]*?\n(?=fincheck plot)/.exec(readme)?.[0] ?? '';
    const options = [...help.matchAll(/^\s+(--[a-z-]+)/gm)].map((m) => m[1] as string).filter((o) => o !== '--help');
    expect(options).toContain('--tolerance');
    for (const option of options) expect(usage, `README map usage lacks ${option}`).toContain(option);
  });
});

describe('signed drifts', () => {
  it('one helper: +, - and a zero without a sign', () => {
    expect(signedPercentText(0.0241)).toBe('+2.41 %');
    expect(signedPercentText(-0.0175)).toBe('-1.75 %');
    expect(signedPercentText(0.00019)).toBe('+0.019 %');
    expect(signedPercentText(-1e-9)).toBe('0.000 %');
  });

  it('`map` prints the case point drifts and the drift range with their sign, as `check` prints them', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-details-'));
    const file = join(dir, 'plate.yaml');
    writeFileSync(
      file,
      `name: signed plate
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }
material: { k: 200 W/(m*K) }
convection: { ambient: 35 degC, h: 45 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
`,
    );
    const map = await cli(
      'map',
      file,
      '--x',
      'fin.thickness=1:4 mm',
      '--y',
      'convection.h=20:400',
      '--steps',
      '3x3',
      '--reference',
      '1d',
      '--jobs',
      '1',
      '--models',
      'tanh-L',
      '--out',
      join(dir, 'out'),
    );
    expect(map.code, map.stderr).toBe(0);
    const check = await cli('check', file, '--reference', '1d');
    // tanh-L (adiabatic tip) underestimates a convective-tip fin: a negative drift, printed with its sign in both.
    // Columns: model, Q, efficiency, formula eff., drift.
    const checkDrift = /tanh-L\s+\S+\s+\S+\s+\S+\s+(-\d+\.\d+ %)/.exec(check.stdout)?.[1];
    expect(checkDrift).toBeDefined();
    expect(map.stdout).toMatch(new RegExp(`tanh-L\\s+drift ${(checkDrift ?? '').replace('.', '\\.')}`));
    expect(map.stdout).toMatch(/tanh-L\s+\S+ %\s+\S+ %\s+\S+ %\s+-\d+\.\d+ % \.\. -\d+\.\d+ %/);
  });
});

describe('time left on the progress bar', () => {
  it('no estimate from the first slow point, then the true rate (the warm-up left out)', () => {
    // 1681 points: the first finishes after 2 s of warm-up, then 60 points a second (a 30 s map in all).
    const total = 1681;
    const eta = new EtaEstimator(total);
    const at = (done: number): number => (done === 0 ? 0 : 2 + (done - 1) / 60);
    // Before: elapsed * (total - done) / done at the first point = 2 * 1680 = 3360 s "left".
    expect(eta.observe(1, at(1))).toBeNull();
    for (let done = 2; done < 34; done += 4) expect(eta.observe(done, at(done))).toBeNull();
    const truth = (done: number): number => (total - done) / 60;
    for (let done = 200; done < total; done += 200) {
      const left = eta.observe(done, at(done));
      expect(left).not.toBeNull();
      // The rate after the warm-up is exact here; smoothing only starts from that rate: 1 % covers round-off.
      expect(Math.abs((left ?? NaN) - truth(done))).toBeLessThanOrEqual(0.01 * truth(done) + 1e-9);
    }
  });

  it('a sudden slow stretch moves the estimate gradually, not all at once', () => {
    const eta = new EtaEstimator(1000, { minPoints: 3, minSeconds: 1, smoothing: 0.3 });
    eta.observe(1, 0);
    const steady = eta.observe(101, 10) ?? NaN; // 10 points a second
    expect(steady).toBeCloseTo(89.9, 9);
    // The next 10 points take 10 s: the measured mean rate since the start drops from 10 to 5.5 points a second.
    const after = eta.observe(111, 20) ?? NaN;
    const measuredOnly = (1000 - 111) / (110 / 20);
    const smoothedRate = 10 + 0.3 * (110 / 20 - 10);
    expect(after).toBeCloseTo((1000 - 111) / smoothedRate, 9);
    expect(after).toBeLessThan(measuredOnly);
  });
});
