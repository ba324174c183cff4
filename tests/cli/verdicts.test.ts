/**
 * What `check` concludes on cases at the edge of the model (issue 9): nothing to cool, surroundings
 * hotter than the base, power laws that reach the ambient, the text table and header.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-verdicts-'));
function caseFile(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

describe('nothing to cool (item 11)', () => {
  it('h = 0 with radiation to surroundings at the base temperature is bad input (exit 2 naming the keys), not a solver failure', async () => {
    const file = caseFile(
      'h0.yaml',
      `name: h zero
fin: { profile: pin, length: 30 mm, diameter: 3 mm }
material: { k: 388 }
convection: { ambient: 25 degC, h: 0, emissivity: 0.8, surroundings: 85 degC, tip: adiabatic }
base: { temperature: 85 degC }
`,
    );
    const r = await cli('check', file);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/^fincheck: /);
    expect(r.stderr).toContain('convection.h');
    expect(r.stderr).toContain('convection.surroundings');
    expect(r.stderr).toContain('base.temperature');
    expect(r.stderr).toMatch(/nothing to cool/);
    expect(r.stdout).toBe('');
  });

  it('h = 0 with radiation to colder surroundings still runs (radiation cools the fin)', async () => {
    const file = caseFile(
      'h0-cold.yaml',
      `name: h zero, radiating
fin: { profile: pin, length: 30 mm, diameter: 3 mm }
material: { k: 388 }
convection: { ambient: 25 degC, h: 0, emissivity: 0.8, tip: adiabatic }
base: { temperature: 85 degC }
`,
    );
    const r = await cli('check', file, '--json', '--reference', '1d');
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).reference.heatRate_W).toBeGreaterThan(0);
  });
});
