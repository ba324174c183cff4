/**
 * The common-unit table of src/case/units.ts (COMMON_UNITS, COMMON_TEMPERATURE_UNITS), read without the mathjs Unit
 * class, against the mathjs reading of the same strings (parseQuantityWithMathjs): the same value, bit for bit, for
 * every entry at values of either sign and many magnitudes. The conversions themselves are checked against NIST
 * SP 811 (2008), Appendix B, in tests/case/units.test.ts; here the table is held to mathjs.
 */
import { describe, expect, it } from 'vitest';
import { COMMON_TEMPERATURE_UNITS, COMMON_UNITS, parseQuantity, parseQuantityWithMathjs, type QuantityKind } from '../../src/case/units.js';

const VALUES = ['1', '0.5', '3', '40', '85', '-40', '1e-3', '123.456', '7e5', '0.1', '2.54', '-459.67', '358.15'];

describe('common units read without the mathjs Unit class', () => {
  const entries: [QuantityKind, string][] = [
    ...Object.entries(COMMON_UNITS).flatMap(([kind, units]) => Object.keys(units).map((u): [QuantityKind, string] => [kind as QuantityKind, u])),
    ...[...COMMON_TEMPERATURE_UNITS].flatMap((u): [QuantityKind, string][] => [
      ['temperature', u],
      ['temperatureDifference', u],
    ]),
  ];

  it('cover the units of the demo cases', () => {
    const keys = entries.map(([kind, u]) => `${kind} ${u}`);
    for (const k of ['length mm', 'temperature degC', 'heatTransferCoefficient W/(m^2*K)', 'contactResistance m^2*K/W', 'power W'])
      expect(keys).toContain(k);
  });

  it.each(entries)('%s in %s: the same value as mathjs gives, bit for bit', (kind, unit) => {
    for (const v of VALUES) {
      const text = `${v} ${unit}`;
      const viaTable = parseQuantity(text, kind);
      const viaMathjs = parseQuantityWithMathjs(text, kind);
      expect(viaMathjs.ok, text).toBe(true);
      expect(viaTable.ok, text).toBe(true);
      if (viaTable.ok && viaMathjs.ok) expect(Object.is(viaTable.value, viaMathjs.value), `${text}: ${viaTable.value} vs ${viaMathjs.value}`).toBe(true);
    }
  });

  it('leaves every other unit to mathjs (a prefixed kelvin, kilometres, a unit of the wrong kind)', () => {
    expect(parseQuantity('300 mK', 'temperatureDifference')).toEqual(parseQuantityWithMathjs('300 mK', 'temperatureDifference'));
    expect(parseQuantity('0.002 km', 'length')).toEqual({ ok: true, value: 2 });
    const wrong = parseQuantity('3 W', 'length');
    expect(wrong.ok).toBe(false);
    expect(wrong).toEqual(parseQuantityWithMathjs('3 W', 'length'));
  });
});
