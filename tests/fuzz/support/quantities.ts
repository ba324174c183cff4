/**
 * Quantities as a case file may write them: a bare number (SI; temperatures in degC) or a string with one
 * of the units the case format documents (case-format.md, "Quantities and units"). The generators pick the
 * form at random, so every valid case is also a test of unit reading.
 *
 * Conversion factors: 1 in = 25.4 mm exactly; 1 BTU/(h*ft^2*degF) = 5.678263341 W/(m^2*K) and
 * 1 BTU/(h*ft*degF) = 1.730734666 W/(m*K) (International Table Btu, NIST SP 811 (2008), Appendix B.8,
 * from memory); degF and K by their definitions. Values are rounded to 6 significant digits so a
 * counterexample reads like a hand-written case.
 */
import { fc } from '@fast-check/vitest';

export type Quantity = number | string;

/** `value` rounded to `digits` significant digits (a plain JS number). */
export function sig(value: number, digits = 6): number {
  return Number(value.toPrecision(digits));
}

/** A number written out for a unit string (no exponent for ordinary magnitudes). */
function num(value: number): string {
  return String(sig(value));
}

export const lengthForms = ['bare', 'm', 'mm', 'cm', 'in'] as const;
export const temperatureForms = ['bare', 'degC', '°C', 'degF', 'K'] as const;
export const coefficientForms = ['bare', 'SI', 'SI-typographic', 'BTU'] as const;
export const conductivityForms = ['bare', 'SI', 'BTU'] as const;
export const resistanceForms = ['bare', 'SI'] as const;

export function length(m: number, form: (typeof lengthForms)[number]): Quantity {
  switch (form) {
    case 'bare':
      return sig(m);
    case 'm':
      return `${num(m)} m`;
    case 'mm':
      return `${num(m * 1000)} mm`;
    case 'cm':
      return `${num(m * 100)} cm`;
    case 'in':
      return `${num(m / 0.0254)} in`;
    default: {
      const never: never = form;
      throw new Error(String(never));
    }
  }
}

export function temperature(degC: number, form: (typeof temperatureForms)[number]): Quantity {
  switch (form) {
    case 'bare':
      return sig(degC);
    case 'degC':
      return `${num(degC)} degC`;
    case '°C':
      return `${num(degC)} °C`;
    case 'degF':
      return `${num((degC * 9) / 5 + 32)} degF`;
    case 'K':
      return `${num(degC + 273.15)} K`;
    default: {
      const never: never = form;
      throw new Error(String(never));
    }
  }
}

export function coefficient(h: number, form: (typeof coefficientForms)[number]): Quantity {
  switch (form) {
    case 'bare':
      return sig(h);
    case 'SI':
      return `${num(h)} W/(m^2*K)`;
    case 'SI-typographic':
      return `${num(h)} W/(m²·K)`;
    case 'BTU':
      return `${num(h / 5.678263341)} BTU/(h*ft^2*degF)`;
    default: {
      const never: never = form;
      throw new Error(String(never));
    }
  }
}

export function conductivity(k: number, form: (typeof conductivityForms)[number]): Quantity {
  switch (form) {
    case 'bare':
      return sig(k);
    case 'SI':
      return `${num(k)} W/(m*K)`;
    case 'BTU':
      return `${num(k / 1.730734666)} BTU/(h*ft*degF)`;
    default: {
      const never: never = form;
      throw new Error(String(never));
    }
  }
}

export function resistance(r: number, form: (typeof resistanceForms)[number]): Quantity {
  return form === 'bare' ? sig(r) : `${num(r)} m^2*K/W`;
}

/**
 * A log-uniform number in [min, max], 4 significant digits. Drawn from an integer grid, not fc.double:
 * fast-check's doubles favour values such as 5e-324 and 1e-300 even inside [min, max], which belong to the
 * extreme-value tests (extremes.ts), not to a practical case.
 */
export function logUniform(min: number, max: number): fc.Arbitrary<number> {
  const lo = Math.log10(min);
  const span = Math.log10(max) - lo;
  return fc.integer({ min: 0, max: 100_000 }).map((i) => sig(Math.min(max, Math.max(min, 10 ** (lo + (span * i) / 100_000))), 4));
}

/** A uniform number in [min, max], 4 significant digits (an integer grid, as logUniform). */
export function uniform(min: number, max: number): fc.Arbitrary<number> {
  return fc.integer({ min: 0, max: 100_000 }).map((i) => sig(min + ((max - min) * i) / 100_000, 4));
}
