/**
 * The library's part of issue 13: display units in charts and reports (`units`), the output schemas
 * (`outputSchema`), and `extends` through caseFromText. All cases are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { caseFromText, chartSvg, OUTPUT_SCHEMA_NAMES, outputSchema, report, UsageError } from '../../src/api/index.js';

const plateText = `name: api plate
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 }
base: { temperature: 80 degC }
`;

describe('display units in the library', () => {
  it('chartSvg with units us labels the axes in in and °F; the default in mm and °C', async () => {
    const c = caseFromText(plateText);
    const us = await chartSvg(c, 'profile', { reference: '1d', units: 'us' });
    expect(us).toContain('Distance from the base x (in)');
    expect(us).toContain('Temperature T (°F)');
    const plain = await chartSvg(c, 'profile', { reference: '1d' });
    expect(plain).toContain('Distance from the base x (mm)');
    expect(plain).toContain('Temperature T (°C)');
  });

  it('report with units us states the inputs in US units', async () => {
    const r = await report(caseFromText(plateText), { reference: '1d', units: 'us', date: '2026-01-01' });
    expect(r.markdown).toContain('176 °F');
    expect(r.markdown).toMatch(/Q \(BTU\/h\)/);
  });

  it('a bad units option names options.units and the accepted values', async () => {
    await expect(chartSvg(caseFromText(plateText), 'profile', { units: 'metric' as never })).rejects.toThrow(UsageError);
    await expect(chartSvg(caseFromText(plateText), 'profile', { units: 'metric' as never })).rejects.toThrow(
      /options\.units: got "metric"; expected 'si', 'mm' or 'us'/,
    );
  });
});

describe('outputSchema and extends', () => {
  it('every output has a draft 2020-12 schema', () => {
    for (const name of OUTPUT_SCHEMA_NAMES) expect(outputSchema(name).$schema).toBe('https://json-schema.org/draft/2020-12/schema');
  });

  it('caseFromText follows extends relative to the text file name', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-api-extends-'));
    writeFileSync(join(dir, 'base.yaml'), plateText);
    const c = caseFromText('extends: base.yaml\nfin: { thickness: 3 mm }\n', join(dir, 'thick.yaml'));
    expect(c.fin.profile).toMatchObject({ kind: 'rectangular', thickness: 0.003, length: 0.03 });
  });
});
