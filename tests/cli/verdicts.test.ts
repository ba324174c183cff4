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

describe('shortcuts that do not apply are left out with the reason, not crashed on (item 2)', () => {
  it('surroundings hotter than the base: the single h is negative, every shortcut is notApplicable, exit 0', async () => {
    const file = caseFile(
      'hot.yaml',
      `name: hot surroundings
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 50 mm }
material: { k: 200 }
convection: { ambient: 25 degC, h: 5, emissivity: 0.9, surroundings: 400 degC, tip: convective }
base: { temperature: 85 degC }
`,
    );
    const r = await cli('check', file, '--json', '--reference', '1d');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    // The fin gains heat from the surroundings and gives it to the base: Q < 0, but a finite number.
    expect(Number.isFinite(j.reference.heatRate_W)).toBe(true);
    expect(j.models).toEqual([]);
    const ids = j.notApplicable.map((n: { model: string }) => n.model).sort();
    expect(ids).toEqual(['closed-form', 'convective-tip', 'tanh-L', 'tanh-Lc', 'tanh-Lc-thin']);
    for (const n of j.notApplicable) expect(n.reason).toMatch(/h > 0/);
    const text = await cli('check', file, '--reference', '1d');
    expect(text.code).toBe(0);
    expect(text.stdout).toMatch(/tanh-L\s+not applicable: the single h of this fin is -\d+/);
  });

  it('h ~ theta^-1/2 on a fin that reaches the ambient: finite reference, the fin-averaged guess left out with the reason', async () => {
    const file = caseFile(
      'negexp.yaml',
      `name: negative exponent
fin: { profile: pin, length: 300 mm, diameter: 2 mm }
material: { k: 15 }
convection: { ambient: 25 degC, h: { law: power, base: 20, exponent: -0.5 }, tip: adiabatic }
base: { temperature: 85 degC }
`,
    );
    const r = await cli('check', file, '--json', '--reference', '1d');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.reference.heatRate_W).toBeGreaterThan(0);
    for (const m of j.models) {
      expect(Number.isFinite(m.heatRate_W)).toBe(true);
      expect(Number.isFinite(m.drift)).toBe(true);
    }
    expect(j.models.some((m: { guess?: string }) => m.guess === 'mean')).toBe(false);
    expect(j.notApplicable.some((n: { reason: string }) => /fin-averaged guess: no finite single h/.test(n.reason))).toBe(true);
  });
});

describe('the text table and header (items 9 and 10)', () => {
  // Plate fin with insulated edges: A/P = t/2, m = sqrt(2h/(kt)), Lc = L + t/2; the corrected-length
  // efficiency tanh(mLc)/(mLc) (Harper & Brown 1922, NACA Report 158; Incropera et al. 2007, eq. 3.89).
  const plate = caseFile(
    'plate.yaml',
    `name: plate fin
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm, edges: insulated }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40, tip: convective }
base: { temperature: 80 degC }
`,
  );

  it('shows the textbook formula efficiency beside the common-definition efficiency', async () => {
    const r = await cli('check', plate, '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/efficiency\s+formula eff\.\s+drift/);
    const m = Math.sqrt((2 * 40) / (180 * 0.002));
    const mLc = m * (0.03 + 0.001);
    const formula = (Math.tanh(mLc) / mLc).toFixed(4);
    const row = r.stdout.split('\n').find((l) => /^\s+tanh-Lc\s+\d/.test(l));
    expect(row).toBeDefined();
    const cells = (row as string).trim().split(/\s+/);
    // model, Q, efficiency, formula eff., drift, %, verdict
    expect(cells[3]).toBe(formula);
    const j = JSON.parse((await cli('check', plate, '--json', '--reference', '1d')).stdout);
    const lc = j.models.find((x: { model: string }) => x.model === 'tanh-Lc');
    expect(lc.formulaEfficiency.toFixed(4)).toBe(formula);
  });

  it('names emissivity and surroundings of a radiating fin in the check and solve headers', async () => {
    const file = caseFile(
      'radiating.yaml',
      `name: radiating fin
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 50 mm }
material: { k: 200 }
convection: { ambient: 25 degC, h: 5, emissivity: 0.85, surroundings: 10 degC, tip: convective }
base: { temperature: 85 degC }
`,
    );
    for (const command of ['check', 'solve']) {
      const r = await cli(command, file, ...(command === 'check' ? ['--reference', '1d'] : []));
      expect(r.code).toBe(0);
      const header = r.stdout.split('\n').slice(0, 6).join('\n');
      expect(header).toContain('emissivity 0.85');
      expect(header).toContain('surroundings 10 degC');
    }
    const plain = await cli('check', plate, '--reference', '1d');
    expect(plain.stdout).not.toContain('emissivity');
  });
});
