/**
 * Key paths, and the map command's use of them: substitute a value into the raw case by path and validate again.
 * Inputs are invented.
 */
import { describe, expect, it } from 'vitest';
import { UsageError, InputError } from '../../src/errors.js';
import { formatKeyPath, getByKeyPath, parseKeyPath, setByKeyPath } from '../../src/case/key-path.js';
import { readDocument } from '../../src/case/document.js';
import { parseCaseObject } from '../../src/case/parse.js';

describe('parseKeyPath and formatKeyPath', () => {
  it.each([
    ['fin.thickness', ['fin', 'thickness']],
    ['convection.h.points[2][0]', ['convection', 'h', 'points', 2, 0]],
    ['material.k.points[0][1]', ['material', 'k', 'points', 0, 1]],
    ['name', ['name']],
  ])('%s', (text, segments) => {
    expect(parseKeyPath(text)).toEqual(segments);
    expect(formatKeyPath(segments)).toBe(text);
  });

  it.each(['', 'fin.', '.fin', 'fin..thickness', 'fin[x]', '[0]', 'fin.thickness]', 'fin thickness'])('rejects %j', (text) => {
    expect(() => parseKeyPath(text)).toThrow(UsageError);
  });
});

describe('getByKeyPath and setByKeyPath', () => {
  const raw = {
    fin: { profile: 'rectangular', thickness: '2 mm' },
    convection: {
      h: {
        points: [
          [0, 60],
          ['40 mm', 25],
        ],
      },
    },
  };

  it('reads values by path and gives undefined for missing steps', () => {
    expect(getByKeyPath(raw, 'fin.thickness')).toBe('2 mm');
    expect(getByKeyPath(raw, 'convection.h.points[1][0]')).toBe('40 mm');
    expect(getByKeyPath(raw, 'convection.h.points[5][0]')).toBeUndefined();
    expect(getByKeyPath(raw, 'fin.thickness.value')).toBeUndefined();
    expect(getByKeyPath(raw, ['fin', 'profile'])).toBe('rectangular');
  });

  it('sets by path on a copy, leaving the input unchanged', () => {
    const changed = setByKeyPath(raw, 'convection.h.points[1][1]', '30 W/(m^2*K)');
    expect(getByKeyPath(changed, 'convection.h.points[1][1]')).toBe('30 W/(m^2*K)');
    expect(getByKeyPath(raw, 'convection.h.points[1][1]')).toBe(25);
    expect(getByKeyPath(changed, 'fin')).toBe(raw.fin); // untouched branches are shared, not copied
  });

  it('creates missing mappings and appends list items', () => {
    const changed = setByKeyPath(raw, 'base.contactResistance', 1e-4);
    expect(getByKeyPath(changed, 'base.contactResistance')).toBe(1e-4);
    const appended = setByKeyPath(raw, 'convection.h.points[2]', ['50 mm', 20]);
    expect(getByKeyPath(appended, 'convection.h.points[2][0]')).toBe('50 mm');
  });

  it('refuses to go through a scalar or skip list items', () => {
    expect(() => setByKeyPath(raw, 'fin.thickness.value', 1)).toThrow(/fin.thickness is not a mapping/);
    expect(() => setByKeyPath(raw, 'convection.h.points[7]', 1)).toThrow(/has only 2 items/);
    expect(() => setByKeyPath(raw, 'fin[0]', 1)).toThrow(/fin is not a list/);
  });
});

describe('substitute and validate again (what the map command does)', () => {
  const text = `fin:
  profile: rectangular
  length: 40 mm
  thickness: 2 mm
  width: 80 mm
material: aluminium-6063
convection: { ambient: 25, h: 40 }
base: { temperature: 85 }
`;
  const document = readDocument(text, 'map.yaml');

  it('gives the case with the substituted value', () => {
    const changed = setByKeyPath(document.raw, 'fin.thickness', '3.5 mm');
    const c = parseCaseObject(changed, document.locate, { defaultName: 'map' });
    expect(c.fin.profile).toMatchObject({ kind: 'rectangular', thickness: 0.0035 });
    expect(c.name).toBe('map');
  });

  it('reports a substituted value that makes the case invalid, at the key the file has', () => {
    const changed = setByKeyPath(document.raw, 'fin.thickness', '-1 mm');
    expect(() => parseCaseObject(changed, document.locate)).toThrow(InputError);
    expect.assertions(2);
    try {
      parseCaseObject(changed, document.locate);
    } catch (err) {
      const issue = (err as InputError).issues[0];
      // The value shown is the substituted one, not the file's text; the line is where the key is in the file.
      expect(issue).toMatchObject({ path: 'fin.thickness', value: '"-1 mm"', line: 4 });
    }
  });

  it('works without a locate function (no lines)', () => {
    try {
      parseCaseObject(setByKeyPath(document.raw, 'convection.h', 'lots'));
      throw new Error('expected an InputError');
    } catch (err) {
      expect(err).toBeInstanceOf(InputError);
      const issue = (err as InputError).issues[0];
      expect(issue).toMatchObject({ path: 'convection.h', value: '"lots"' });
      expect(issue?.line).toBeUndefined();
    }
  });
});
