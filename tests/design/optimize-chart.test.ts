/** optimize --out: the chart of the heat rate along the constraint, both curves and both optima. */
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { decodePng } from '../images/helpers.js';

describe('optimize --out', () => {
  it('writes the chart and puts the curve in the JSON: no curve point above the reference optimum', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-optimize-chart-'));
    const file = join(dir, 'optimum.png');
    const r = await cli('optimize', 'demo/inverter-plate-fin.yaml', '--vary', 'fin.thickness', '--reference', '1d', '--json', '--out', file);
    expect(r.code, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout) as {
      chartFile: string;
      curve: { key: string; x_m: number[]; reference_W: number[]; shortcut_W: number[] };
      reference: { heatRate_W: number; values: Record<string, number> };
    };
    expect(j.chartFile).toBe(file);
    expect(decodePng(readFileSync(file))).toMatchObject({ width: 1200, height: 750 });
    expect(j.curve.key).toBe('fin.thickness');
    expect(j.curve.x_m).toHaveLength(25);
    // Both on fd-1d: the optimum (Brent to 1e-4 in x) is at least every sampled value, to the curvature's 1e-8.
    expect(Math.max(...j.curve.reference_W)).toBeLessThanOrEqual(j.reference.heatRate_W * (1 + 1e-6));
    // The shortcut tanh(mLc)/(mLc) stays within a few per cent of the reference along the curve for this fin.
    j.curve.shortcut_W.forEach((q, i) => expect(Math.abs(q / (j.curve.reference_W[i] as number) - 1)).toBeLessThan(0.05));
  }, 120_000);

  it('refuses a chart of two varied keys with exit code 2', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-optimize-chart-'));
    const r = await cli(
      'optimize',
      'demo/inverter-plate-fin.yaml',
      '--vary',
      'fin.thickness,fin.length',
      '--keep',
      'none',
      '--for',
      'min-material',
      '--heat',
      '10W',
      '--out',
      join(dir, 'x.svg'),
    );
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--out: the chart shows one varied key/);
  }, 120_000);
});
