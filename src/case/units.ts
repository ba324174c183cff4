/**
 * Quantities with units: the only place in fincheck that reads a unit.
 *
 * A quantity is a bare number (SI: m, W/(m*K), W/(m^2*K), m^2*K/W; a bare temperature is degC) or a string
 * "<number> <unit>" such as "3 mm", "27 BTU/(h*ft^2*degF)", "185 degF". The unit expression is read by the mathjs
 * Unit class (built without the rest of mathjs, see buildUnitClass, so the CLI bundle stays small and starts
 * fast); the number is read here, so that non-finite input gets a message of its own.
 *
 * Temperatures: an absolute temperature (`ambient: 77 degF`) and a temperature difference (the K inside
 * W/(m^2*K), or `10 K` of excess) convert differently. mathjs treats a lone degC/degF as absolute and a degC/degF
 * inside a compound unit as a difference, which is right for compound units; lone temperature units are converted
 * here by their definitions and never by arithmetic on degC values in mathjs:
 *   T[degC] = T[K] - 273.15 = (T[degF] - 32) * 5/9 = T[degR] * 5/9 - 273.15      (absolute)
 *   dT[K] = dT[degC] = dT[degF] * 5/9 = dT[degR] * 5/9                               (difference)
 * (NIST SP 811 (2008), Guide for the Use of the International System of Units, sections 4.2.1.1 and B.9;
 * from memory, section numbers not checked).
 *
 * mathjs defines BTU as the International Table Btu, 1055.05585262 J, ft = 0.3048 m and h = 3600 s, which gives
 * 1 BTU/(h*ft^2*degF) = 5.678263341 W/(m^2*K) and 1 BTU/(h*ft*degF) = 1.730734666 W/(m*K); NIST SP 811 (2008),
 * Appendix B.8, lists 5.678263 E+00 and 1.730735 E+00 for these (from memory, not checked against the document).
 */
// @ts-expect-error -- mathjs exports these factories at run time (lib/esm/factoriesAny.js) but its typings omit them.
import { createBigNumberClass, createComplexClass, createFractionClass, createUnitClass } from 'mathjs';
import type { Unit } from 'mathjs';
import { clip, quoted } from './clip-text.js';

export type QuantityKind =
  'length' | 'conductivity' | 'heatTransferCoefficient' | 'contactResistance' | 'temperature' | 'temperatureDifference' | 'power' | 'dimensionless';

export type QuantityResult = { ok: true; value: number } | { ok: false; problem: string };

interface KindInfo {
  /** "a length": how the kind is named in messages. */
  noun: string;
  /** The unit a bare number is taken in. */
  bareUnit: string;
  /** Examples of accepted strings. */
  examples: string[];
}

export const quantityKinds: Record<QuantityKind, KindInfo> = {
  length: { noun: 'a length', bareUnit: 'm', examples: ['2 mm', '0.125 in'] },
  conductivity: { noun: 'a thermal conductivity', bareUnit: 'W/(m*K)', examples: ['205 W/(m*K)', '120 BTU/(h*ft*degF)'] },
  heatTransferCoefficient: {
    noun: 'a heat-transfer coefficient',
    bareUnit: 'W/(m^2*K)',
    examples: ['40 W/(m^2*K)', '7 BTU/(h*ft^2*degF)'],
  },
  contactResistance: { noun: 'a contact resistance', bareUnit: 'm^2*K/W', examples: ['1.5e-4 m^2*K/W'] },
  temperature: { noun: 'a temperature', bareUnit: 'degC', examples: ['85 degC', '185 degF', '358.15 K'] },
  temperatureDifference: { noun: 'a temperature difference', bareUnit: 'K', examples: ['10 K', '18 degF'] },
  power: { noun: 'a power', bareUnit: 'W', examples: ['60 W', '0.5 kW'] },
  dimensionless: { noun: 'a plain number', bareUnit: '', examples: ['0.9', '1/4'] },
};

/** "a length such as "2 mm", "0.125 in" or a bare number in m" (the range, if any, is added by the caller). */
export function describeQuantity(kind: QuantityKind, range = '', bareUnit = quantityKinds[kind].bareUnit): string {
  const info = quantityKinds[kind];
  const noun = range ? `${info.noun} ${range}` : info.noun;
  if (kind === 'dimensionless') return `${noun} such as ${info.examples.join(' or ')}`;
  const examples = info.examples.map((e) => `"${e}"`).join(', ');
  return `${noun} such as ${examples} or a bare number in ${bareUnit}`;
}

/** Units a case may choose for its bare lengths (`units: { length: mm }`); m is the default. */
export const lengthUnits = ['m', 'cm', 'mm', 'um', 'in'] as const;
export type LengthUnit = (typeof lengthUnits)[number];

export function isLengthUnit(value: unknown): value is LengthUnit {
  return typeof value === 'string' && (lengthUnits as readonly string[]).includes(value);
}

/**
 * mathjs's Unit class, built from its factory with plain-number arithmetic instead of mathjs's typed functions.
 * Values are JS numbers (config.number = 'number'); the few unit definitions that mathjs stores as fractions
 * (degF, degR: 5/9) are converted by Number(), which Fraction supports through valueOf. Creating the typed
 * functions of a full `create({ unitDependencies })` instance costs about 130 ms of CLI start-up (measured in
 * the esbuild bundle on this machine); this costs about 10 ms.
 */
interface UnitClass {
  parse(text: string): Unit;
}
type UnitFactory = (scope: Record<string, unknown>) => UnitClass;
type ClassFactory = (scope: Record<string, unknown>) => unknown;

let unitClass: UnitClass | undefined;

function buildUnitClass(): UnitClass {
  const config = { number: 'number', predictable: false, precision: 64, relTol: 1e-12, absTol: 1e-15 };
  const num = (x: unknown): number => Number(x);
  const makeFraction: ClassFactory = createFractionClass;
  const makeComplex: ClassFactory = createComplexClass;
  const makeBigNumber: ClassFactory = createBigNumberClass;
  const makeUnit: UnitFactory = createUnitClass;
  return makeUnit({
    config,
    Fraction: makeFraction({}),
    Complex: makeComplex({}),
    BigNumber: makeBigNumber({ config }),
    addScalar: (a: unknown, b: unknown) => num(a) + num(b),
    subtractScalar: (a: unknown, b: unknown) => num(a) - num(b),
    multiplyScalar: (a: unknown, b: unknown) => num(a) * num(b),
    divideScalar: (a: unknown, b: unknown) => num(a) / num(b),
    pow: (a: unknown, b: unknown) => Math.pow(num(a), num(b)),
    abs: (a: unknown) => Math.abs(num(a)),
    fix: (a: unknown) => Math.trunc(num(a)),
    round: (a: unknown, digits: unknown = 0) => {
      const scale = 10 ** num(digits);
      return Math.round(num(a) * scale) / scale;
    },
    equal: (a: unknown, b: unknown) => num(a) === num(b),
    isNumeric: (x: unknown) => typeof x === 'number' || (typeof x === 'object' && x !== null && ('isFraction' in x || 'isBigNumber' in x)),
    format: (x: unknown) => String(x),
    number: num,
  });
}

function unitOf(text: string): Unit {
  unitClass ??= buildUnitClass();
  return unitClass.parse(text);
}

/**
 * Rewrites typographic unit notation to what mathjs reads: °C, ℃, ², ³, ⁻¹, ·, ×, µ, μ, −. The patterns spell these
 * characters as \u escapes so that the bundle stays ASCII (one non-ASCII character makes V8 hold the whole chunk as a
 * two-byte string: about 10 ms more start-up for every command, scripts/build.mjs).
 */
export function normaliseUnitText(text: string): string {
  const superscripts: Record<string, string> = {
    '⁰': '0',
    '¹': '1',
    '²': '2',
    '³': '3',
    '⁴': '4',
    '⁵': '5',
    '⁶': '6',
    '⁷': '7',
    '⁸': '8',
    '⁹': '9',
    '⁻': '-',
  };
  return text
    .replace(/\u2103/g, 'degC')
    .replace(/\u2109/g, 'degF')
    .replace(/[\u00b0\u00ba\u02da]\s*([CFR])\b/g, 'deg$1')
    .replace(/[\u00b0\u00ba\u02da]\s*K\b/g, 'K')
    .replace(/[\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079\u207b]+/g, (s) => '^' + [...s].map((c) => superscripts[c] ?? c).join(''))
    .replace(/[\u00b7\u22c5\u2022\u00d7]/g, '*')
    .replace(/[\u00b5\u03bc]/g, 'u')
    .replace(/\u2212/g, '-')
    .trim();
}

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;
const NON_FINITE = /^[+-]?(?:\.?inf(?:inity)?|\.?nan)\b/i;

/**
 * Lone temperature units by their definitions: scale of a difference (to K) and the absolute conversions.
 * mathjs aliases (celsius, fahrenheit, rankine, kelvin) share the entries.
 */
interface TemperatureUnit {
  differenceScale: number;
  toDegC: (n: number) => number;
  fromDegC: (t: number) => number;
}
const celsius: TemperatureUnit = { differenceScale: 1, toDegC: (n) => n, fromDegC: (t) => t };
const fahrenheit: TemperatureUnit = {
  differenceScale: 5 / 9,
  toDegC: (n) => ((n - 32) * 5) / 9,
  fromDegC: (t) => (t * 9) / 5 + 32,
};
const rankine: TemperatureUnit = {
  differenceScale: 5 / 9,
  toDegC: (n) => (n * 5) / 9 - 273.15,
  fromDegC: (t) => ((t + 273.15) * 9) / 5,
};
const kelvin: TemperatureUnit = { differenceScale: 1, toDegC: (n) => n - 273.15, fromDegC: (t) => t + 273.15 };
const temperatureUnits: Record<string, TemperatureUnit> = {
  degC: celsius,
  celsius,
  degF: fahrenheit,
  fahrenheit,
  degR: rankine,
  rankine,
  K: kelvin,
  kelvin,
};

const siReference: Partial<Record<QuantityKind, string>> = {
  length: 'm',
  conductivity: 'W/(m*K)',
  heatTransferCoefficient: 'W/(m^2*K)',
  contactResistance: 'm^2*K/W',
  power: 'W',
};

/** Names of common dimensions, to say what a wrong unit is ("W is a power, not a length"). */
const dimensionNames: [string, string][] = [
  ['a length', 'm'],
  ['an area', 'm^2'],
  ['a volume', 'm^3'],
  ['a power', 'W'],
  ['an energy', 'J'],
  ['a temperature', 'K'],
  ['a time', 's'],
  ['a mass', 'kg'],
  ['a thermal conductivity', 'W/(m*K)'],
  ['a heat-transfer coefficient', 'W/(m^2*K)'],
  ['a contact resistance', 'm^2*K/W'],
  ['a thermal resistance', 'K/W'],
  ['a heat flux', 'W/m^2'],
  ['a pressure', 'Pa'],
  ['a force', 'N'],
];

function dimensionName(u: Unit): string | undefined {
  return dimensionNames.find(([, ref]) => u.equalBase(unitOf(ref)))?.[0];
}

/**
 * Reads `given` as a quantity of `kind` and returns its value in SI (lengths m, conductivity W/(m*K),
 * h W/(m^2*K), contact resistance m^2*K/W, temperature degC, temperature difference K).
 * The result says what is wrong when it is not ok; ranges (> 0 and the like) are the caller's business.
 */
export function parseQuantity(given: unknown, kind: QuantityKind): QuantityResult {
  if (typeof given !== 'string') return readQuantity(given, kind);
  // A result depends only on the text and the kind: a map re-reads the same few strings at each of its points.
  const key = `${kind}\u0000${given}`;
  const known = quantityMemo.get(key);
  if (known !== undefined) return known;
  const result = Object.freeze(readQuantity(given, kind));
  if (quantityMemo.size >= QUANTITY_MEMO_SIZE) quantityMemo.clear();
  quantityMemo.set(key, result);
  return result;
}

/**
 * Results of parseQuantity for strings, by kind and text (frozen: callers share them). Reading "3 mm" through the
 * mathjs Unit class costs tens of microseconds; a 41 x 41 map reads each of its case's quantities at every point,
 * and without the memo that reading was close to half of the map's case validation (--cpu-prof, 2026-12-03).
 */
const QUANTITY_MEMO_SIZE = 1024;
const quantityMemo = new Map<string, QuantityResult>();

function readQuantity(given: unknown, kind: QuantityKind, commonUnits = true): QuantityResult {
  if (typeof given === 'number') {
    if (!Number.isFinite(given)) return { ok: false, problem: `${String(given)} is not a finite number` };
    return { ok: true, value: given };
  }
  if (typeof given !== 'string') return { ok: false, problem: 'a number or a string with a unit is needed' };
  const text = normaliseUnitText(given);
  if (NON_FINITE.test(text)) return { ok: false, problem: 'not a finite number' };
  if (kind === 'dimensionless') return parsePlainNumber(text);
  const numberMatch = NUMBER.exec(text);
  if (!numberMatch) return { ok: false, problem: 'it does not start with a number' };
  const n = Number(numberMatch[0]);
  if (!Number.isFinite(n)) return { ok: false, problem: `${numberMatch[0]} is not a finite number` };
  const unitText = text.slice(numberMatch[0].length).trim();
  if (unitText === '') return { ok: true, value: n };
  const common = commonUnits ? commonUnitValue(n, unitText, kind) : undefined;
  if (common !== undefined) return common;

  let u: Unit;
  try {
    u = unitOf(unitText);
  } catch (err) {
    return { ok: false, problem: unitProblem(unitText, err) };
  }
  if (u.value !== null || u.units.length === 0) {
    return { ok: false, problem: `${quoted(unitText)} is not a unit (write one number followed by one unit)` };
  }
  if (kind === 'temperature' || kind === 'temperatureDifference') return temperatureValue(n, u, unitText, kind);

  const reference = siReference[kind];
  if (reference === undefined) throw new Error(`no SI reference for ${kind}`);
  if (!u.equalBase(unitOf(reference))) return { ok: false, problem: wrongKind(u, unitText, kind) };
  const value = n * u.toNumber(reference);
  if (!Number.isFinite(value)) return { ok: false, problem: `${quoted(String(given))} is not a finite value in ${reference}` };
  return { ok: true, value };
}

/**
 * The units most cases are written in, with the factor mathjs gives from each to the kind's SI unit
 * (u.toNumber(reference) in readQuantity): read without building the mathjs Unit class, about 6 ms of every
 * start-up (--cpu-prof, buildUnitClass). The value is n times the same factor, so the same bits as through mathjs;
 * tests/case/common-units.test.ts checks every entry against the mathjs reading. Any other unit text goes to mathjs.
 */
export const COMMON_UNITS: Partial<Record<QuantityKind, Readonly<Record<string, number>>>> = {
  length: { m: 1, cm: 0.01, mm: 0.001, um: 0.000001, in: 0.0254, ft: 0.3048 },
  conductivity: { 'W/(m*K)': 1, 'BTU/(h*ft*degF)': 1.7307346663713907 },
  heatTransferCoefficient: { 'W/(m^2*K)': 1, 'BTU/(h*ft^2*degF)': 5.678263341113487 },
  contactResistance: { 'm^2*K/W': 1 },
  power: { W: 1, kW: 1000 },
};
/** Lone temperature units without a prefix (prefix scale 1 in temperatureValue), read by their definitions. */
export const COMMON_TEMPERATURE_UNITS: ReadonlySet<string> = new Set(['degC', 'degF', 'degR', 'K']);

/** n in a common unit of `kind` (COMMON_UNITS), or undefined for any other unit text. */
function commonUnitValue(n: number, unitText: string, kind: QuantityKind): QuantityResult | undefined {
  if (kind === 'temperature' || kind === 'temperatureDifference') {
    const definition = COMMON_TEMPERATURE_UNITS.has(unitText) ? temperatureUnits[unitText] : undefined;
    if (definition === undefined) return undefined;
    return { ok: true, value: kind === 'temperatureDifference' ? n * definition.differenceScale : definition.toDegC(n) };
  }
  const factor = COMMON_UNITS[kind]?.[unitText];
  if (factor === undefined) return undefined;
  const value = n * factor;
  return Number.isFinite(value) ? { ok: true, value } : undefined;
}

/** parseQuantity through the mathjs Unit class always (no memo, no common-unit table): for tests of the table. */
export function parseQuantityWithMathjs(given: string, kind: QuantityKind): QuantityResult {
  return readQuantity(given, kind, false);
}

function parsePlainNumber(text: string): QuantityResult {
  const fraction = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*\/\s*((?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)$/.exec(text);
  const value = fraction ? Number(fraction[1]) / Number(fraction[2]) : NUMBER.exec(text)?.[0] === text ? Number(text) : NaN;
  if (Number.isNaN(value)) return { ok: false, problem: `"${text}" is not a plain number (no unit is taken here)` };
  if (!Number.isFinite(value)) return { ok: false, problem: 'not a finite number' };
  return { ok: true, value };
}

/** The single temperature unit of `u` and its prefix scale (only kelvin takes SI prefixes, e.g. mK). */
function loneTemperatureUnit(u: Unit): { definition: TemperatureUnit; prefixScale: number } | undefined {
  const single = u.units.length === 1 && u.units[0]?.power === 1 ? u.units[0] : undefined;
  const definition = single ? temperatureUnits[single.unit.name] : undefined;
  if (!single || !definition) return undefined;
  const prefixScale = definition === kelvin ? u.toNumber('K') : 1;
  return { definition, prefixScale };
}

function temperatureValue(n: number, u: Unit, unitText: string, kind: 'temperature' | 'temperatureDifference'): QuantityResult {
  const lone = loneTemperatureUnit(u);
  if (!lone) {
    if (u.equalBase(unitOf('K'))) {
      return { ok: false, problem: `write a single temperature unit (K, degC, degF, degR), not ${quoted(unitText)}` };
    }
    return { ok: false, problem: wrongKind(u, unitText, kind) };
  }
  const scaled = n * lone.prefixScale;
  if (kind === 'temperatureDifference') return { ok: true, value: scaled * lone.definition.differenceScale };
  return { ok: true, value: lone.definition.toDegC(scaled) };
}

function wrongKind(u: Unit, unitText: string, kind: QuantityKind): string {
  const noun = quantityKinds[kind].noun;
  const what = dimensionName(u);
  const hint = /(^|[^A-Za-z])[CF]([^A-Za-z]|$)/.test(unitText) ? ' (C is the coulomb and F the farad: write degC or degF)' : '';
  return what ? `${quoted(unitText)} is ${what}, not ${noun}${hint}` : `${quoted(unitText)} is not ${noun}${hint}`;
}

function unitProblem(unitText: string, err: unknown): string {
  const message = err instanceof Error ? err.message : String(err);
  const notFound = /Unit "([^"]*)" not found/.exec(message);
  if (notFound) return `unit ${quoted(notFound[1] ?? '')} is not known`;
  return `cannot read the unit ${quoted(unitText)} (${clip(message.replace(/\.$/, ''))})`;
}

/**
 * Converts an SI value of `kind` (degC for temperatures, K for differences) to `unit`, for showing numbers in
 * the user's unit (a map axis in mm, say). Throws an Error naming the problem for a unit of the wrong kind.
 */
export function fromSI(value: number, kind: QuantityKind, unit: string): number {
  if (kind === 'dimensionless') return value;
  const unitText = normaliseUnitText(unit);
  if (kind === 'temperature' || kind === 'temperatureDifference') {
    const check = parseQuantity(`1 ${unitText}`, kind);
    if (!check.ok) throw new Error(check.problem);
    const lone = loneTemperatureUnit(unitOf(unitText));
    if (!lone) throw new Error(`"${unitText}" is not a temperature unit`);
    return kind === 'temperature' ? lone.definition.fromDegC(value) / lone.prefixScale : value / lone.definition.differenceScale / lone.prefixScale;
  }
  const probe = parseQuantity(`1 ${unitText}`, kind);
  if (!probe.ok) throw new Error(probe.problem);
  return value / probe.value;
}
