/**
 * Unit conversions of the case reader. Reference factors:
 * - inch = 0.0254 m and foot = 0.3048 m exactly: international yard and pound (1959), as listed in
 *   NIST SP 811 (2008), Guide for the Use of the International System of Units, Appendix B.8 (exact entries).
 * - T(degC) = T(K) - 273.15 and T(degC) = (T(degF) - 32) / 1.8: NIST SP 811 (2008), Appendix B.9 (from memory
 *   for the section number).
 * - 1 Btu_IT/(h*ft^2*degF) = 5.678263 W/(m^2*K), 1 Btu_IT/(h*ft*degF) = 1.730735 W/(m*K),
 *   1 degF*h*ft^2/Btu_IT = 0.1761102 m^2*K/W: NIST SP 811 (2008), Appendix B.8 (from memory, not checked
 *   against the document). These are given to 7 significant figures, so they are compared with a relative
 *   tolerance of 1e-6 (half a unit in the 7th figure is 5e-7 relative).
 */
import { describe, expect, it } from 'vitest';
import { fc, test as fcTest } from '@fast-check/vitest';
import { fromSI, normaliseUnitText, parseQuantity, type QuantityKind } from '../../src/case/units.js';

function value(given: unknown, kind: QuantityKind): number {
  const result = parseQuantity(given, kind);
  if (!result.ok) throw new Error(`expected ${String(given)} to parse as ${kind}: ${result.problem}`);
  return result.value;
}

function problem(given: unknown, kind: QuantityKind): string {
  const result = parseQuantity(given, kind);
  if (result.ok) throw new Error(`expected ${String(given)} to be rejected as ${kind}, got ${result.value}`);
  return result.problem;
}

/** Relative tolerance for factors quoted to 7 significant figures (see the header). */
const sevenFigures = 1e-6;

function expectRelative(actual: number, expected: number, tolerance: number): void {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(tolerance);
}

describe('lengths', () => {
  // Exact definitions (inch, foot) and SI prefixes: only floating-point rounding of one multiplication, so 1e-15.
  it.each([
    ['3 mm', 0.003],
    ['0.125 in', 0.003175],
    ['2 ft', 0.6096],
    ['40 um', 4e-5],
    ['40 µm', 4e-5], // micro sign U+00B5
    ['40 μm', 4e-5], // Greek mu U+03BC
    ['1.5 cm', 0.015],
    ['5mm', 0.005],
    ['1e-3 m', 0.001],
  ])('%s is %f m', (given, expected) => {
    expectRelative(value(given, 'length'), expected, 1e-15);
  });

  it('takes a bare number as metres', () => {
    expect(value(0.04, 'length')).toBe(0.04);
    expect(value('0.04', 'length')).toBe(0.04);
  });
});

describe('BTU-based units (NIST SP 811 Appendix B.8 factors, from memory)', () => {
  it('1 BTU/(h*ft^2*degF) = 5.678263 W/(m^2*K)', () => {
    expectRelative(value('1 BTU/(h*ft^2*degF)', 'heatTransferCoefficient'), 5.678263, sevenFigures);
    expectRelative(value('27 BTU/(h*ft^2*degF)', 'heatTransferCoefficient'), 27 * 5.678263, sevenFigures);
  });

  it('1 BTU/(h*ft*degF) = 1.730735 W/(m*K)', () => {
    expectRelative(value('1 BTU/(h*ft*degF)', 'conductivity'), 1.730735, sevenFigures);
    expectRelative(value('120 BTU/(h*ft*degF)', 'conductivity'), 120 * 1.730735, sevenFigures);
  });

  it('1 h*ft^2*degF/BTU = 0.1761102 m^2*K/W', () => {
    expectRelative(value('1 h*ft^2*degF/BTU', 'contactResistance'), 0.1761102, sevenFigures);
  });

  it('reads typographic notation: BTU/(h·ft²·°F)', () => {
    expectRelative(value('1 BTU/(h·ft²·°F)', 'heatTransferCoefficient'), 5.678263, sevenFigures);
  });
});

describe('absolute temperatures and temperature differences', () => {
  // Definitions (NIST SP 811 B.9): exact up to one or two roundings of decimal constants, hence 1e-12 K.
  it.each([
    ['77 degF', 25],
    ['185 degF', 85],
    ['-40 degF', -40],
    ['358.15 K', 85],
    ['0 K', -273.15],
    ['85 degC', 85],
    ['85 °C', 85],
    ['85 ℃', 85],
    ['185 °F', 85],
    ['536.67 degR', 25],
    [85, 85],
  ])('absolute %s is %f degC', (given, expected) => {
    expect(value(given, 'temperature')).toBeCloseTo(expected, 12);
  });

  it.each([
    ['18 degF', 10],
    ['10 degC', 10],
    ['10 K', 10],
    ['9 °F', 5],
    [10, 10],
  ])('difference %s is %f K', (given, expected) => {
    expect(value(given, 'temperatureDifference')).toBeCloseTo(expected, 12);
  });

  it('a degF inside h is a difference: 1 W/(m^2*degF) = 1.8 W/(m^2*K), not an offset temperature', () => {
    // 1 degF of difference = 5/9 K, so per degF is 9/5 per K (definition of the Fahrenheit degree).
    expect(value('1 W/(m^2*degF)', 'heatTransferCoefficient')).toBeCloseTo(1.8, 12);
    expect(value('40 W/(m^2*degC)', 'heatTransferCoefficient')).toBeCloseTo(40, 12);
  });

  it('rejects a compound of temperature units and units of the wrong kind', () => {
    expect(problem('3 K*m/m', 'temperature')).toMatch(/single temperature unit/);
    expect(problem('20 m', 'temperature')).toBe('"m" is a length, not a temperature');
  });
});

describe('rejected quantities', () => {
  it('names an unknown unit', () => {
    expect(problem('3 mmm', 'length')).toBe('unit "mmm" is not known');
  });

  it('names the kind of a unit of the wrong kind', () => {
    expect(problem('3 W', 'length')).toBe('"W" is a power, not a length');
    expect(problem('40 W/m^2', 'heatTransferCoefficient')).toBe('"W/m^2" is a heat flux, not a heat-transfer coefficient');
  });

  it('hints that C and F are coulomb and farad', () => {
    expect(problem('40 W/(m^2*C)', 'heatTransferCoefficient')).toMatch(/C is the coulomb and F the farad/);
  });

  it.each([NaN, Infinity, -Infinity, 'Infinity', '-inf', '.inf mm', 'NaN', '1e999 m'])('rejects the non-finite %s', (given) => {
    expect(problem(given, 'length')).toMatch(/not a finite number/);
  });

  it('needs a number before the unit, and one number only', () => {
    expect(problem('mm', 'length')).toMatch(/does not start with a number/);
    expect(problem('2 3 m', 'length')).toMatch(/not a unit/);
    expect(problem(true, 'length')).toMatch(/a number or a string/);
  });

  it('reads plain numbers and fractions as dimensionless, nothing with a unit', () => {
    expect(value('1/4', 'dimensionless')).toBe(0.25);
    expect(value('0.9', 'dimensionless')).toBe(0.9);
    expect(problem('0.9 m', 'dimensionless')).toMatch(/not a plain number/);
  });
});

describe('normaliseUnitText', () => {
  it('rewrites degree signs, superscripts, dots and micro signs', () => {
    expect(normaliseUnitText('W/(m²·°C)')).toBe('W/(m^2*degC)');
    expect(normaliseUnitText('W·m⁻²·K⁻¹')).toBe('W*m^-2*K^-1');
    expect(normaliseUnitText('3 μm')).toBe('3 um');
    expect(normaliseUnitText('−5 °F')).toBe('-5 degF');
  });
});

describe('fromSI', () => {
  it('inverts the conversions', () => {
    expect(fromSI(0.002, 'length', 'mm')).toBeCloseTo(2, 12);
    expect(fromSI(25, 'temperature', 'degF')).toBeCloseTo(77, 12);
    expect(fromSI(25, 'temperature', 'K')).toBeCloseTo(298.15, 12);
    expect(fromSI(10, 'temperatureDifference', 'degF')).toBeCloseTo(18, 12);
    expect(fromSI(5.678263, 'heatTransferCoefficient', 'BTU/(h*ft^2*degF)')).toBeCloseTo(1, 6);
  });

  it('throws on a unit of the wrong kind', () => {
    expect(() => fromSI(1, 'length', 'W')).toThrow(/power/);
  });
});

// Factors of the length units: exact by definition (inch, foot, mil = 0.001 in) or SI prefixes.
const lengthUnits: [string, number][] = [
  ['m', 1],
  ['mm', 1e-3],
  ['cm', 1e-2],
  ['um', 1e-6],
  ['μm', 1e-6],
  ['km', 1e3],
  ['in', 0.0254],
  ['ft', 0.3048],
  ['mil', 2.54e-5],
];

describe('property: lengths in random units', () => {
  // The parser multiplies the number by the unit's factor: one or two roundings, so 1e-13 relative is ample and
  // still catches any wrong factor or prefix (the smallest factor error here would be 1e-3 or more).
  fcTest.prop([fc.double({ min: 1e-6, max: 1e6, noNaN: true, noDefaultInfinity: true }), fc.constantFrom(...lengthUnits), fc.constantFrom('', ' ', '  ')])(
    '"<v><space><unit>" is v * factor in m, and fromSI gives v back',
    (v, [unit, factor], space) => {
      const si = value(`${v}${space}${unit}`, 'length');
      expectRelative(si, v * factor, 1e-13);
      expectRelative(fromSI(si, 'length', unit), v, 1e-13);
    },
  );

  fcTest.prop([fc.double({ min: -200, max: 2000, noNaN: true }), fc.constantFrom('degC', 'degF', 'K', 'degR', '°C', '°F')])(
    'absolute temperatures round-trip through degC',
    (t, unit) => {
      const degC = value(`${t} ${unit}`, 'temperature');
      // Affine conversions with constants like 273.15 and 459.67: absolute error a few ulps of ~1e3, so 1e-9.
      expect(Math.abs(fromSI(degC, 'temperature', unit) - t)).toBeLessThan(1e-9);
    },
  );
});
