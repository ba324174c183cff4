/**
 * `fincheck check` on nonlinear heat sinks (an invented natural-convection sink): a power-law h on the fins and a
 * k(T) table go through fd-3d's Newton solve; a table for the plate only is refused in the problem's words.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const sink = (convection: string, extra = '') => `name: small natural-convection sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm${extra} }
sources:
  - { name: regulator, power: 3 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm] }
convection: ${convection}
`;

describe('check on a nonlinear heat sink', () => {
  const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-nl-'));
  const write = (name: string, text: string) => {
    const file = join(dir, name);
    writeFileSync(file, text);
    return file;
  };

  it("a power-law h: the fd-3d reference by Newton, the law named with its reference (the fins' mean root rise)", async () => {
    const file = write('power.yaml', sink('{ ambient: 25 degC, h: { law: power, base: 7, exponent: 0.25 }, plate: 7 W/(m^2*K) }'));
    const text = await cli('check', file);
    expect(text.code, text.stderr).toBe(0);
    expect(text.stdout).toMatch(/\(theta\/theta_root\)\^0\.25, theta_root the fins' mean root rise/);
    const r = await cli('check', file, '--json');
    expect(r.code, r.stderr).toBe(0);
    const json = JSON.parse(r.stdout) as {
      energyBalance?: number;
      sources: { meanTemperature_degC: number }[];
      models: { model: string; verdict: string }[];
    };
    expect(json.sources[0]!.meanTemperature_degC).toBeGreaterThan(25);
    expect(json.models.map((m) => m.model)).toContain('overall-efficiency');
  });

  it('a k(T) table for the plate alone is refused: one Kirchhoff potential needs one law', async () => {
    const file = write(
      'table.yaml',
      sink('{ ambient: 25 degC, h: 7 W/(m^2*K) }', ', material: { k: { points: [[0 degC, 200 W/(m*K)], [200 degC, 180 W/(m*K)]] } }'),
    );
    const r = await cli('check', file);
    expect(r.stdout + r.stderr).toMatch(/k\(T\) table with plate and fins of different materials/);
  });
});
