/** The `uncertainty` key of a case: relative and absolute standard uncertainties, the default, and bad input. */
import { describe, expect, it } from 'vitest';
import { parseCaseObject, parseCaseText } from '../../src/case/index.js';
import { InputError } from '../../src/errors.js';

const base = {
  fin: { profile: 'rectangular', length: '40 mm', thickness: '2 mm', width: '80 mm' },
  material: 'aluminium-6063',
  convection: { ambient: 35, h: 45 },
  base: { temperature: 85 },
};

function issues(uncertainty: unknown, extra: Record<string, unknown> = {}): { path: string; accepted: string }[] {
  try {
    parseCaseObject({ ...base, ...extra, uncertainty });
  } catch (err) {
    if (err instanceof InputError) return err.issues.map((i) => ({ path: i.path, accepted: i.accepted }));
    throw err;
  }
  return [];
}

describe('uncertainty', () => {
  it('reads relative (%) and absolute (with a unit) uncertainties into relative ones', () => {
    const c = parseCaseObject({
      ...base,
      uncertainty: { 'convection.h': '20 %', 'material.k': '5%', 'fin.thickness': '0.05 mm', 'base.temperature': '2 K' },
    });
    expect(c.uncertainty).toEqual([
      { key: 'convection.h', relative: 0.2, given: '20 %' },
      { key: 'material.k', relative: 0.05, given: '5%' },
      // 0.05 mm of 2 mm; 2 K of the base's 50 K rise.
      { key: 'fin.thickness', relative: expect.closeTo(0.025, 12), given: '0.05 mm' },
      { key: 'base.temperature', relative: expect.closeTo(0.04, 12), given: '2 K' },
    ]);
  });

  it('defaults to h 25 % when h is not named, and 0 % switches it off', () => {
    expect(parseCaseObject(base).uncertainty).toEqual([{ key: 'convection.h', relative: 0.25, given: 'default' }]);
    expect(parseCaseObject({ ...base, uncertainty: { 'material.k': '5 %' } }).uncertainty?.map((u) => u.key)).toEqual(['convection.h', 'material.k']);
    expect(parseCaseObject({ ...base, uncertainty: { 'convection.h': '0 %' } }).uncertainty).toEqual([{ key: 'convection.h', relative: 0, given: '0 %' }]);
  });

  it('names the key path and what is accepted for every bad entry', () => {
    const found = issues({ 'fin.diameter': '5 %', 'material.k': 5, 'convection.h': '120 %', 'fin.length': '-1 mm', 'fin.width': '3 W' });
    expect(found.map((i) => i.path)).toEqual([
      'uncertainty.fin.diameter',
      'uncertainty.material.k',
      'uncertainty.convection.h',
      'uncertainty.fin.length',
      'uncertainty.fin.width',
    ]);
    expect(found[0]?.accepted).toMatch(/convection\.h, material\.k, fin\.length, fin\.thickness, fin\.width, base\.temperature/);
    expect(found[1]?.accepted).toMatch(/a bare number has no unit here/);
    expect(found[2]?.accepted).toMatch(/below 100 %/);
    expect(found[4]?.accepted).toMatch(/not a length/);
  });

  it('refuses an absolute uncertainty of an h that varies along the fin', () => {
    const found = issues(
      { 'convection.h': '5 W/(m^2*K)' },
      {
        convection: {
          ambient: 35,
          h: {
            points: [
              ['0 mm', 60],
              ['40 mm', 30],
            ],
          },
        },
      },
    );
    expect(found).toEqual([{ path: 'uncertainty.convection.h', accepted: expect.stringMatching(/varies \(a table\)/) }]);
  });

  it('gives the line of a bad entry in a YAML file', () => {
    const text = [
      'fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }',
      'material: aluminium-6063',
      'convection: { ambient: 35, h: 45 }',
      'base: { temperature: 85 }',
      'uncertainty:',
      '  fin.thicknes: 5 %',
      '',
    ].join('\n');
    expect(() => parseCaseText(text, 'case.yaml')).toThrow(/case\.yaml:6:\d+: uncertainty\.fin\.thicknes/);
  });
});
