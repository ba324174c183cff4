/**
 * Extreme magnitudes: a random valid case with one quantity replaced by a value at the edge of what a double
 * holds (1e308, the largest double, 5e-324, 1e-300, the smallest normal double) or far outside any fin
 * (1e30 m, h = 1e12, a base at 1e6 degC), as a bare number or with a unit (1e308 km overflows on conversion).
 * The double limits are those of IEEE 754-2008 binary64 (largest 1.7976931348623157e308, smallest normal
 * 2.2250738585072014e-308, smallest subnormal 5e-324): inputs at the edge, not reference values.
 * fincheck must refuse it (exit 2 naming a key), solve it (exit 0 with finite, sane numbers) or say that the
 * solver failed and what to change (exit 3); never crash (issue 9, items 2 and 3).
 */
import { fc } from '@fast-check/vitest';
import { validCase, type CaseFacts, type FuzzCase } from './cases.js';
import { quantityPaths, setAt, type Kind } from './paths.js';

const huge = [1e308, 1.7976931348623157e308, 1e300, 1e30, 1e12, 1e6];
const tiny = [5e-324, 2.2250738585072014e-308, 1e-300, 1e-30, 1e-12];

/** Extreme values for a kind, each with the temperature in degC it stands for (temperatures only). */
const extremes: Record<Kind, unknown[]> = {
  length: [...huge, ...tiny, '1e308 km', '1e308 in', '5e-324 mm', '1e-300 m'],
  size: [...huge, ...tiny, '1e308 km', '1e308 in', '5e-324 mm', '1e-300 m'],
  tipSize: [...tiny, '5e-324 mm'],
  temperature: [1e308, 1e30, 1e6, -273.1499999, '1e308 K', '1e308 degF', '1e-300 K', '5e-324 K', '1e6 K'],
  h: [...huge, ...tiny, '1e308 BTU/(h*ft^2*degF)', '5e-324 W/(m^2*K)'],
  lawBase: [...huge, ...tiny],
  k: [...huge, ...tiny, '1e308 BTU/(h*ft*degF)'],
  resistance: [...huge, ...tiny, '1e308 m^2*K/W'],
  emissivity: [5e-324, 1e-300, 2.2250738585072014e-308, 1 - 1e-16, 0.9999999999],
  exponent: [-0.9999999999, -0.999, 5e-324, 1e-300, 1e3, 1e308, 50],
};

/** The degC a temperature extreme stands for (bare numbers are degC; K and degF by definition). */
function degC(value: unknown): number | undefined {
  if (typeof value === 'number') return value;
  if (typeof value !== 'string') return undefined;
  const [n, unit] = value.split(' ');
  const v = Number(n);
  if (unit === 'K') return v - 273.15;
  if (unit === 'degF') return ((v - 32) * 5) / 9;
  return undefined;
}

export interface ExtremeCase {
  doc: Record<string, unknown>;
  format: 'yaml' | 'json';
  facts: CaseFacts;
  what: string;
  path: string;
}

/** The facts after a temperature key changed (the properties judge temperatures and signs by them). */
function withTemperature(facts: CaseFacts, path: string, value: unknown): CaseFacts {
  if (path === 'convection.emissivity') {
    const radiates = typeof value === 'number' && value > 0;
    return { ...facts, radiates, nonlinear: facts.nonlinear || radiates };
  }
  const t = degC(value);
  if (t === undefined) return facts;
  switch (path) {
    case 'base.temperature':
      return { ...facts, baseC: t };
    case 'convection.ambient':
      return { ...facts, ambientC: t, surroundingsC: facts.radiates && facts.surroundingsC !== facts.ambientC ? facts.surroundingsC : t };
    case 'convection.surroundings':
      return { ...facts, surroundingsC: t };
    case 'convection.tip.temperature':
      return { ...facts, tipC: t };
    default:
      return facts;
  }
}

export const extremeCase: fc.Arbitrary<ExtremeCase> = validCase.chain((c: FuzzCase) =>
  fc
    .constantFrom(...quantityPaths(c.doc))
    .chain((q) => fc.constantFrom(...extremes[q.kind]).map((value) => ({ q, value })))
    .map(({ q, value }) => ({
      doc: setAt(c.doc, q.path, value),
      format: c.format,
      facts: withTemperature(c.facts, q.text, value),
      what: `${q.text} = ${String(value)}`,
      path: q.text,
    })),
);
