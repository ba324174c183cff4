/**
 * Display units: the conversion factors against NIST SP 811 (2008), Appendix B.8 and B.9 (values recalled from
 * memory, not checked against the document), the detection of a case written in US units, the display key and its
 * errors, the --units option, and its order of precedence (option over key over detection). All cases are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { defaultDisplayUnits, detectDisplaySystem, displaySystem, inUnit, loadCase, parseCaseText } from '../../src/case/index.js';
import { cli } from '../cli/run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-display-'));
function file(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

const us = displaySystem('us');
/** 1 of the US unit in SI: the inverse of the display scale. */
const siOfOne = (scale: number): number => 1 / scale;

describe('conversion factors (NIST SP 811, 2008, Appendix B.8; 7 significant digits as listed there)', () => {
  it.each([
    ['heat, Btu_IT/h = 2.930711E-01 W', us.heat.scale, 0.2930711],
    ['h, Btu_IT/(h ft^2 degF) = 5.678263 W/(m^2 K)', us.h.scale, 5.678263],
    ['k, Btu_IT/(h ft degF) = 1.730735 W/(m K)', us.k.scale, 1.730735],
    ['flux, Btu_IT/(h ft^2) = 3.154591 W/m^2', us.flux.scale, 3.154591],
    ['resistance, degF h/Btu_IT = 1.895634 K/W', us.resistance.scale, 1.895634],
    ['length, in = 2.54E-02 m (exact)', us.length.scale, 0.0254],
  ])('%s', (_label, scale, nist) => {
    // 7 significant digits as published: agreement to half a unit in the 7th digit.
    expect(Math.abs(siOfOne(scale) - nist)).toBeLessThanOrEqual(0.5 * 10 ** (Math.floor(Math.log10(nist)) - 6));
  });

  it('temperatures: 100 degC = 212 degF = 373.15 K; a difference of 1 K = 1.8 degF (B.9, exact)', () => {
    expect(inUnit(us.temperature, 100)).toBeCloseTo(212, 12);
    expect(inUnit(displaySystem('si').temperature, 0)).toBe(0);
    expect(inUnit(us.temperatureDifference, 1)).toBeCloseTo(1.8, 14);
    expect(defaultDisplayUnits.length.ascii).toBe('mm');
  });
});

const siText = `name: si plate
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 W/(m^2*K) }
base: { temperature: 80 degC }
`;
const usText = `name: us plate
fin: { profile: rectangular, length: 1.2 in, thickness: 0.08 in, width: 2 in }
material: { k: 104 BTU/(h*ft*degF) }
convection: { ambient: 68 degF, h: 7 BTU/(h*ft^2*degF) }
base: { temperature: 176 degF }
`;

describe('what a case shows by default', () => {
  it('a case written in US units shows US units; a metric one mm and SI', () => {
    expect(detectDisplaySystem({ fin: { length: '1.2 in' }, base: { temperature: '176 degF' } })).toBe('us');
    expect(parseCaseText(usText, 'us.yaml').display?.system).toBe('us');
    expect(parseCaseText(siText, 'si.yaml').display?.system).toBe('mm');
    expect(detectDisplaySystem({ units: { length: 'in' }, fin: { length: 2 } })).toBe('us');
  });

  it('the display key sets units one by one over the detected ones', () => {
    const c = parseCaseText(`${usText}display: { temperature: degC }\n`, 'us.yaml');
    expect(c.display?.temperature.ascii).toBe('degC');
    expect(c.display?.length.ascii).toBe('in');
    expect(c.display?.temperatureDifference.ascii).toBe('K');
  });

  it('a bad display unit names the field and the accepted values (exit 2)', async () => {
    const f = file('bad-display.yaml', `${siText}display: { temperature: degK }\n`);
    expect(() => loadCase(f)).toThrow(/display\.temperature: got degK; expected one of degC, K, degF, degR/);
    const r = await cli('check', f);
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('display.temperature: got degK; expected one of');
    const unknownKey = file('bad-display-key.yaml', `${siText}display: { pressure: Pa }\n`);
    expect(() => loadCase(unknownKey)).toThrow(/display\.pressure/);
  });
});

describe('check text in display units', () => {
  const siFile = file('si.yaml', siText);
  const usFile = file('us.yaml', usText);

  it('the default text of a metric case is unchanged by --units mm', async () => {
    const plain = await cli('check', siFile, '--reference', '1d');
    const mm = await cli('check', siFile, '--reference', '1d', '--units', 'mm');
    expect(mm.stdout).toBe(plain.stdout);
    expect(plain.stdout).toContain('rectangular fin, length 30 mm, thickness 2 mm, width 50 mm');
    expect(plain.stdout).toMatch(/Reference \(fd-1d\): heat rate \d+\.\d+ W, .* tip at \d+\.\d\d degC/);
  });

  it('--units us: lengths in in, temperatures in degF, heat in BTU/h, h and k in BTU units; JSON stays SI', async () => {
    const r = await cli('check', siFile, '--reference', '1d', '--units', 'us');
    expect(r.code).toBe(0);
    // 30 mm = 1.181 in; 40 W/(m^2 K) = 7.044 BTU/(h ft^2 degF); 80 degC = 176 degF; 20 degC = 68 degF.
    expect(r.stdout).toContain('length 1.181 in, thickness 0.07874 in, width 1.969 in');
    expect(r.stdout).toContain('h = 7.044 BTU/(h*ft^2*degF) uniform');
    expect(r.stdout).toContain('base 176 degF; ambient 68 degF');
    expect(r.stdout).toMatch(/heat rate \d+\.\d+ BTU\/h/);
    expect(r.stdout).toContain('Q [BTU/h]');
    const json = await cli('check', siFile, '--reference', '1d', '--units', 'us', '--json');
    const plain = await cli('check', siFile, '--reference', '1d', '--json');
    expect(json.stdout).toBe(plain.stdout);
  });

  it('a US case shows US units without the option; the option overrides the key, which overrides detection', async () => {
    expect((await cli('check', usFile, '--reference', '1d')).stdout).toContain('base 176 degF; ambient 68 degF');
    const keyed = file('us-keyed.yaml', `${usText}display: { temperature: degC, length: mm }\n`);
    expect((await cli('check', keyed, '--reference', '1d')).stdout).toContain('base 80 degC; ambient 20 degC');
    const flagged = await cli('check', keyed, '--reference', '1d', '--units', 'si');
    expect(flagged.stdout).toContain('length 0.03048 m');
  });

  it('a bad --units value names the option and the accepted values (exit 2)', async () => {
    const r = await cli('check', siFile, '--units', 'metric');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--units: got "metric"; expected si, mm or us');
  });
});
