/**
 * `fincheck check` on a heat-sink case (heat-sink.md): the fd-3d reference and the array shortcuts through the
 * command line, the contract's JSON keys, and the reference option refused for a sink. The sink is invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const sink = `name: small drive sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm], limit: 110 degC }
convection: { ambient: 30 degC, h: 40 W/(m^2*K), tip: convective }
`;

describe('check on a heat sink', () => {
  const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-cli-'));
  const file = join(dir, 'sink.yaml');
  writeFileSync(file, sink);

  it('--json: the reference, each source, each fin and each shortcut with its per-source rise and verdict', async () => {
    const r = await cli('check', file, '--json', '--tolerance', '10%');
    expect(r.code, r.stderr).toBe(0);
    const json = JSON.parse(r.stdout) as {
      sources: { name: string; power_W: number; meanTemperature_degC: number; maxTemperature_degC: number }[];
      sinkResistance_KperW: number;
      overallEfficiency: number;
      fins: { index: number; heatRate_W: number; rootTemperature_degC: number }[];
      models: { model: string; sourceRise_K: number[]; verdict: string }[];
    };
    expect(json.sources).toHaveLength(1);
    expect(json.sources[0]).toMatchObject({ name: 'chip', power_W: 15 });
    const source = json.sources[0] as { meanTemperature_degC: number; maxTemperature_degC: number };
    expect(source.maxTemperature_degC).toBeGreaterThan(source.meanTemperature_degC);
    expect(json.fins).toHaveLength(4);
    // Energy: the fins carry part of the 15 W, the exposed plate the rest.
    const finHeat = json.fins.reduce((a, f) => a + f.heatRate_W, 0);
    expect(finHeat).toBeGreaterThan(0);
    expect(finHeat).toBeLessThan(15);
    expect(json.sinkResistance_KperW).toBeGreaterThan(0);
    expect(json.overallEfficiency).toBeGreaterThan(0);
    expect(json.overallEfficiency).toBeLessThanOrEqual(1);
    expect(json.models.map((m) => m.model).sort()).toEqual(['overall-efficiency', 'overall-efficiency-exact-fin', 'spreading-series']);
    for (const m of json.models) {
      expect(m.sourceRise_K).toHaveLength(1);
      expect(['ok', 'marginal', 'unsafe', 'unresolved']).toContain(m.verdict);
    }
  }, 120_000);

  it('--reference other than auto is refused for a sink (its reference is fd-3d)', async () => {
    const r = await cli('check', file, '--reference', '1d');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^fincheck: --reference 1d: a heat sink's reference is fd-3d/);
    expect(r.stdout).toBe('');
  });
});
