/**
 * What the heat-sink display-unit tests share: three invented cases (the same small sink written in SI, the same
 * with a `display` key, and a sink written in US units), the conversion factors they check against, and a
 * comparison that allows for the digits a number was printed with.
 *
 * Factors: NIST SP 811 (2008), Guide for the Use of the International System of Units, Appendix B.8 (7 significant
 * digits as listed there; recalled from memory, as in tests/case/display-units.test.ts) and B.9 (temperatures,
 * exact): 1 Btu_IT/h = 0.2930711 W; 1 degF*h/Btu_IT = 1.895634 K/W; 1 in = 0.0254 m (exact);
 * 1 Btu_IT/(h*ft^2*degF) = 5.678263 W/(m^2*K); 1 Btu_IT/(h*ft*degF) = 1.730735 W/(m*K);
 * 1 degF*h*ft^2/Btu_IT = 0.1761102 m^2*K/W; t[degF] = 1.8 t[degC] + 32; a difference of 1 K = 1.8 degF (no offset).
 */
import { expect } from 'vitest';

export const NIST = {
  btuPerHour_W: 0.2930711,
  degFHourPerBtu_KperW: 1.895634,
  inch_m: 0.0254,
  h_W_per_m2K: 5.678263,
  k_W_per_mK: 1.730735,
  insulance_m2KperW: 0.1761102,
};

/** degC -> degF (B.9). */
export const toDegF = (t: number): number => 1.8 * t + 32;
/** A temperature difference K -> degF: 9/5, no offset (B.9). */
export const riseToDegF = (d: number): number => 1.8 * d;

/** The small sink of tests/cli/sink-commands.test.ts with an interface resistance on the chip: SI inputs. */
export const siSinkText = `name: small drive sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm], limit: 110 degC, contactResistance: 3e-5 m^2*K/W }
  - { name: driver, power: 2 W, centre: [32 mm, 10 mm], size: [6 mm, 6 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K), tip: convective }
`;

/** The same sink, shown with temperatures in degF and heat in BTU/h (lengths stay mm, the rest SI). */
export const keyedSinkText = `${siSinkText}display: { temperature: degF, heat: BTU/h }\n`;

/** A sink written in US units: shown in US units without --units. */
export const usSinkText = `name: small drive sink in US units
fin: { profile: rectangular, length: 0.8 in, thickness: 0.06 in }
material: aluminium-6063
array: { count: 4, pitch: 0.4 in }
plate: { width: 1.6 in, length: 1.6 in, thickness: 0.16 in }
sources:
  - { name: chip, power: 51 BTU/h, centre: [0.8 in, 0.8 in], size: [0.4 in, 0.4 in], limit: 230 degF, contactResistance: 2e-4 h*ft^2*degF/BTU }
  - { name: driver, power: 7 BTU/h, centre: [1.25 in, 0.4 in], size: [0.24 in, 0.24 in] }
convection: { ambient: 86 degF, h: 7 BTU/(h*ft^2*degF), tip: convective }
`;

/** Half a unit in the last digit printed ("104.8" -> 0.05, "1.2e-3" -> 0.05e-3): what rounding to those digits costs. */
export function halfLastDigit(text: string): number {
  const m = /^[-+\u2212]?\d*(?:\.(\d*))?(?:e([-+]?\d+))?$/.exec(text);
  if (m === null) throw new Error(`not a number: ${text}`);
  return 0.5 * 10 ** (Number(m[2] ?? 0) - (m[1]?.length ?? 0));
}

/**
 * `text` (a number as printed) shows `expected`: within half a unit of its last digit, plus 1e-6 of the value for the
 * 7 significant digits the NIST factors are listed with (the code uses the exact definitions).
 */
export function expectShown(text: string | undefined, expected: number, what = ''): void {
  expect(text, `${what}: no number printed`).toBeDefined();
  const t = text as string;
  const value = Number(t.replace('\u2212', '-'));
  expect(Math.abs(value - expected), `${what}: printed ${t}, expected ${expected}`).toBeLessThanOrEqual(halfLastDigit(t) + 1e-6 * Math.abs(expected));
}

/** The numbers in a line, as printed. */
export function numbersIn(line: string): string[] {
  return line.match(/[-\u2212]?\d+(?:\.\d+)?(?:e[-+]?\d+)?/g) ?? [];
}

/** The first line of `text` that contains `marker` (fails the test when there is none). */
export function lineWith(text: string, marker: string | RegExp): string {
  const line = text.split('\n').find((l) => (typeof marker === 'string' ? l.includes(marker) : marker.test(l)));
  expect(line, `no line with ${String(marker)}`).toBeDefined();
  return line as string;
}
