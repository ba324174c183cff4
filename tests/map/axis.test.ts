/**
 * `--x KEY=FROM:TO` against a case: units, the case's own value in the user's unit, spacing, and every check that
 * can be made before the run. Unit factors: 1 in = 0.0254 m exactly, 1 BTU/(h*ft^2*degF) = 5.678263341 W/(m^2*K),
 * T[degF] = 1.8 T[degC] + 32 (NIST SP 811 (2008), Appendix B; from memory). Inputs are invented.
 */
import { describe, expect, it } from 'vitest';
import { parseCaseText, readDocument } from '../../src/case/index.js';
import { UsageError } from '../../src/errors.js';
import { parseMapAxis } from '../../src/map/axis.js';
import { axisValues } from '../../src/map/spacing.js';

const text = `name: axis test
fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }
material: aluminium-6063
convection: { ambient: 35 degC, h: 45 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
`;
const c = parseCaseText(text, 'axis.yaml');
const { raw } = readDocument(text, 'axis.yaml');
const axis = (spec: string, steps = 5, log = false) => parseMapAxis({ option: '--x', text: spec, steps, log }, raw, c);

describe('axis units and the case value in them', () => {
  it('inches: values spaced in inches, the case thickness 2 mm shown as 2/25.4 in', () => {
    const a = axis('fin.thickness=0.04:0.2 in');
    expect(a).toMatchObject({ key: 'fin.thickness', kind: 'length', unit: 'in', displayUnit: 'in', log: false });
    expect(Array.from(a.values)).toEqual([0.04, 0.08, 0.12, 0.16, 0.2]);
    // Conversion round-off only (1e-15 relative).
    expect(a.caseValue).toBeCloseTo(2 / 25.4, 14);
  });

  it("a unit on TO alone applies to FROM too; TO in another unit is converted to FROM's", () => {
    expect(Array.from(axis('fin.thickness=1:3 mm', 3).values)).toEqual([1, 2, 3]);
    const mixed = axis('fin.thickness=1 mm:0.2 in', 2);
    expect(mixed.unit).toBe('mm');
    expect(mixed.values[1]).toBeCloseTo(5.08, 12);
  });

  it('h in BTU/(h*ft^2*degF): 45 W/(m^2*K) is 45 / 5.678263341', () => {
    const a = axis('convection.h=1:20 BTU/(h*ft^2*degF)');
    // Nine-digit factor: 1e-9 relative.
    expect(Math.abs((a.caseValue ?? 0) / (45 / 5.678263341) - 1)).toBeLessThan(1e-9);
  });

  it('a temperature axis in degF shows the case ambient 35 degC as 95 degF (absolute, not a difference)', () => {
    expect(axis('convection.ambient=50:100 degF').caseValue).toBeCloseTo(95, 12);
  });

  it('bare numbers are SI: the unit shown is the SI one', () => {
    const a = axis('fin.length=0.01:0.05');
    expect([a.unit, a.displayUnit, a.caseValue]).toEqual(['', 'm', 0.04]);
  });

  it('material.k of a built-in material: its k is the case value; an absent optional key its default', () => {
    expect(axis('material.k=100:300').caseValue).toBe(c.material.k.kind === 'constant' ? c.material.k.k : Number.NaN);
    expect(axis('base.contactResistance=0:1e-3 m^2*K/W').caseValue).toBe(0);
  });

  it('FROM above TO gives ascending values', () => {
    expect(Array.from(axis('fin.thickness=3:1 mm', 3).values)).toEqual([1, 2, 3]);
  });
});

describe('axis spacing', () => {
  it('linear: even steps, both ends exact', () => {
    expect(Array.from(axisValues(0.1, 0.7, 7, false))).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7]);
  });
  it('log: constant ratio (to the 12 digits kept), both ends exact', () => {
    const v = axisValues(10, 1000, 5, true);
    expect([v[0], v[4]]).toEqual([10, 1000]);
    for (let i = 1; i < 5; i++) expect((v[i] as number) / (v[i - 1] as number)).toBeCloseTo(Math.sqrt(10), 10);
  });
});

describe('what is refused before the run (UsageError naming the option)', () => {
  it.each([
    ['no =', 'fin.thickness', /--x: got "fin\.thickness"; expected KEY=FROM:TO/],
    ['no TO', 'fin.thickness=1mm', /--x: fin\.thickness: got "1mm"; expected FROM:TO/],
    ['bad key path', 'fin..thickness=1:2 mm', /--x: "fin\.\.thickness" is not a key path/],
    ['not a numeric key', 'fin.profile=1:2', /--x: fin\.profile is not a numeric key of a case/],
    ['a key this case does not have', 'fin.diameter=1:2 mm', /--x: fin\.diameter is not in this case \(fin has profile, length, thickness, width\)/],
    ['units of the wrong kind', 'fin.thickness=1 W:2 W', /--x: fin\.thickness takes a length; "W" is a power, not a length/],
    ['an unknown unit', 'convection.h=1 furlong:2 furlong', /--x: convection\.h takes a heat-transfer coefficient; unit "furlong" is not known/],
    ['FROM == TO', 'fin.thickness=2 mm:2 mm', /--x: fin\.thickness: FROM and TO are the same/],
    ["an end outside the key's range", 'fin.thickness=-1:2 mm', /--x: fin\.thickness = -1 mm is outside its range: a length > 0/],
    ['not a number', 'fin.thickness=thin:thick', /--x: fin\.thickness: got "thin"; expected a number/],
  ])('%s', (_name, spec, message) => {
    expect(() => axis(spec)).toThrow(UsageError);
    expect(() => axis(spec)).toThrow(message);
  });

  it('a log axis through zero', () => {
    expect(() => axis('convection.h=0:100', 5, true)).toThrow(/--x: a log axis needs FROM and TO above 0/);
  });

  it('a distribution, not a single value', () => {
    const t = text.replace('h: 45 W/(m^2*K)', 'h: { base: 60, tip: 20 }');
    expect(() =>
      parseMapAxis({ option: '--y', text: 'convection.h=10:100', steps: 3, log: false }, readDocument(t, 'd.yaml').raw, parseCaseText(t, 'd.yaml')),
    ).toThrow(/--y: convection\.h is not a single value in this case \(it is a mapping\); map one of its values instead, e\.g\. convection\.h\.base/);
  });
});
