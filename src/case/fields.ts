/**
 * Zod building blocks of the case schema: quantities with units and ranges, strict mappings whose messages name
 * the accepted keys, and lists of points.
 *
 * Every issue's `message` is the "accepted" text of an InputIssue (what the key accepts, with the reason in
 * parentheses); the key path and the value given are added when the issues are collected (issues.ts).
 * Issues about a value of the right type carry `continue: true`, so a union whose other options fail on the
 * type reports the precise issue of the option the input was meant for (zod 4 picks the only option that did
 * not abort).
 */
import { z } from 'zod';
import { nearWords } from './spelling.js';
import { describeQuantity, parseQuantity, quantityKinds, type QuantityKind } from './units.js';

/** An accepted interval of values, in the SI unit of the kind. */
export interface Range {
  test: (value: number) => boolean;
  /** As written after the noun: "> 0", "from 0 to 1". */
  text: string;
  /** A plausibility bound beyond `text`, written after the examples: "at least 1e-7 m (0.1 um) and at most 1000 m". */
  limit?: string;
}

/** The accepted range in words: "> 0 (at least 1e-7 m and at most 1000 m)". */
export function rangeText(range: Range): string {
  return range.limit ? `${range.text} (${range.limit})` : range.text;
}

export const positive: Range = { test: (v) => v > 0, text: '> 0' };
export const nonNegative: Range = { test: (v) => v >= 0, text: '>= 0' };
export const fraction: Range = { test: (v) => v >= 0 && v <= 1, text: 'from 0 to 1' };
export const aboveAbsoluteZero: Range = { test: (v) => v > -273.15, text: 'above absolute zero (-273.15 degC)' };

/*
 * Plausibility bounds: hard refusals (exit 2) for magnitudes no fin has. Without them, values such as a width of
 * 1e308 m, a thickness of 5e-324 m or an h of 1e308 overflowed or underflowed inside the solvers (NaN, null, energy
 * balances of 1e288, internal errors). Each bound is far outside any real fin, so that it never refuses one;
 * implausible-but-possible values (a 40 m fin from a bare `40`) are warnings instead (plausibility.ts).
 */

/**
 * A fin dimension (length, thickness, width, diameter, radius), m: from 0.1 um (micro-fabricated fins are
 * micrometres thick; below about 0.1 um conduction is no longer the continuum Fourier conduction the model
 * solves, as the phonon mean free path of silicon at room temperature is of that order) to 1 km (radiator fins
 * are metres long; 1 km leaves room for any study of very long fins and keeps every area and volume finite).
 */
export const finSize: Range = { test: (v) => v >= 1e-7 && v <= 1e3, text: '> 0', limit: 'at least 1e-7 m (0.1 um) and at most 1000 m' };
/** A size that may be 0 (a sharp tip), else within `finSize`. */
export const finSizeOrZero: Range = {
  test: (v) => v === 0 || finSize.test(v),
  text: '>= 0',
  limit: '0 for a sharp tip, else at least 1e-7 m (0.1 um) and at most 1000 m',
};
/** A position along the fin, m: from 0 (the base) to the largest fin length (1 km, see finSize). */
export const finPosition: Range = { test: (v) => v >= 0 && v <= 1e3, text: '>= 0', limit: 'at most 1000 m' };

/**
 * A temperature, degC: above absolute zero and at most 4000 degC, hotter than the melting point of every fin
 * material (tungsten melts at 3422 degC, the highest of the metals; CRC Handbook of Chemistry and Physics,
 * melting points of the elements; from memory). Radiation to T^4 stays far from overflow.
 */
export const temperatureRange: Range = {
  test: (v) => v > -273.15 && v <= 4000,
  text: 'above absolute zero (-273.15 degC)',
  limit: 'at most 4000 degC',
};

/**
 * A heat-transfer coefficient, W/(m^2*K): 0 to 1e6. Free convection in gases is 2-25, forced convection in
 * liquids 50-20,000, boiling and condensation 2500-100,000 (Incropera et al. 2007, Table 1.1); dropwise
 * condensation and jet impingement boiling reach a few 1e5, so 1e6 leaves a margin of ten over the largest.
 */
/*
 * The lower bound of a nonzero h, 1e-3 W/(m^2*K), is 2000 times below the smallest of those (free convection in
 * gases, 2); radiation, the other small loss, is given by emissivity. Below it an h is no coefficient but round-off:
 * a subnormal h (5e-324) made the heat rate exactly 0 and every efficiency null, and an h of 2.2e-308 on the 2-D
 * grid gave an energy balance of 42 with exit 0 (fuzz findings, tests/fuzz/cases/subnormal-h*.yaml).
 */
export const coefficientRange: Range = {
  test: (v) => v === 0 || (v >= 1e-3 && v <= 1e6),
  text: '>= 0',
  limit: '0 or at least 1e-3 and at most 1e6 W/(m^2*K)',
};
/** The same bound where 0 has no meaning (the power law's h at the base temperature). */
export const positiveCoefficient: Range = { test: (v) => v >= 1e-3 && v <= 1e6, text: '> 0', limit: 'at least 1e-3 and at most 1e6 W/(m^2*K)' };

/**
 * A thermal conductivity, W/(m*K): 0.001 to 10,000. Silica aerogel, about the least conductive solid, is near
 * 0.01-0.02; diamond is about 2300 (Incropera et al. 2007, Tables A.2 and A.3) and the in-plane conductivity of
 * pyrolytic graphite about 2000; 10,000 leaves room for any measured in-plane value of graphene films (from memory).
 */
export const conductivityRange: Range = { test: (v) => v >= 1e-3 && v <= 1e4, text: '> 0', limit: 'at least 0.001 and at most 10000 W/(m*K)' };

/**
 * A contact resistance per unit area, m^2*K/W: 0 to 10. Metallic joints are 1e-6 to 1e-3 (Incropera et al.
 * 2007, Tables 3.1 and 3.2); 10 is the resistance of a 10 mm gap of still air, far beyond any bonded fin. A nonzero
 * resistance is at least 1e-9, a thousand times below the best joint: smaller is no joint but round-off (0 says
 * "none"); 2.2e-308 overflowed 1/R at the start of the nonlinear 2-D solve (fuzz finding,
 * tests/fuzz/cases/tiny-contact-resistance.yaml).
 */
export const contactResistanceRange: Range = {
  test: (v) => v === 0 || (v >= 1e-9 && v <= 10),
  text: '>= 0',
  limit: '0 or at least 1e-9 and at most 10 m^2*K/W',
};

/**
 * The exponent of a power-law h, theta^n: above -1 (so that the flux h * theta vanishes with theta) and at most 5.
 * Laminar natural convection is 1/4, turbulent 1/3, nucleate boiling about 2 (Rohsenow's correlation gives a
 * flux ~ theta^3, an h ~ theta^2); 5 is beyond any correlation in use.
 */
export const exponentRange: Range = { test: (v) => v > -1 && v <= 5, text: '> -1', limit: 'at most 5' };

/**
 * The most points a table (profile, h or k) may have: the 1-D and 2-D grids put a node on every breakpoint, so the
 * count bounds the grid; a drawn or measured profile needs tens to hundreds of points.
 */
export const maxTablePoints = 1000;

export interface QuantityOptions {
  range: Range;
  /** Meaning and unit of the key, for the JSON schema. */
  description: string;
  /** Added to the message when the key is missing, e.g. "a rectangular fin needs length, thickness and width". */
  whenMissing?: string;
  /** The unit of a bare number when it is not the SI one (lengths, from the case's `units: { length: mm }`). */
  bareUnit?: string;
}

/**
 * A quantity key: a bare number (SI, temperatures degC) or a string with a unit; the output is the SI number.
 */
export function quantity(kind: QuantityKind, options: QuantityOptions) {
  const bareUnit = options.bareUnit ?? quantityKinds[kind].bareUnit;
  const accepted = describeQuantity(kind, options.range.text, bareUnit) + (options.range.limit ? `, ${options.range.limit}` : '');
  return z
    .unknown()
    .transform((given, ctx) => {
      if (given === undefined || given === null) {
        ctx.issues.push({ code: 'custom', input: given, message: options.whenMissing ? `${accepted} (${options.whenMissing})` : accepted });
        return z.NEVER;
      }
      if (typeof given !== 'number' && typeof given !== 'string') {
        ctx.issues.push({ code: 'custom', input: given, message: accepted });
        return z.NEVER;
      }
      const result = parseQuantity(typeof given === 'number' && Number.isFinite(given) && options.bareUnit ? `${given} ${options.bareUnit}` : given, kind);
      if (!result.ok) {
        ctx.issues.push({ code: 'custom', input: given, message: `${accepted} (${result.problem})`, continue: true });
        return z.NEVER;
      }
      if (!options.range.test(result.value)) {
        const si = kind === 'dimensionless' || (typeof given === 'number' && !options.bareUnit) ? '' : ` (that is ${formatSI(result.value, kind)})`;
        ctx.issues.push({ code: 'custom', input: given, message: `${accepted}${si}`, continue: true });
        return z.NEVER;
      }
      return result.value;
    })
    .meta({
      description: `${options.description}. ${capitalise(accepted)}.`,
      anyOf: [{ type: 'number' }, { type: 'string' }],
    });
}

function formatSI(value: number, kind: QuantityKind): string {
  return `${Number(value.toPrecision(6))} ${quantityKinds[kind].bareUnit}`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

/** A strict mapping: unknown keys are errors whose message lists the keys `what` takes. */
export function mapping<S extends z.ZodRawShape>(shape: S, what: string, description: string) {
  const keys = Object.keys(shape);
  return z
    .strictObject(shape, {
      error: (issue) => {
        if (issue.code === 'unrecognized_keys') return unknownKeyMessage(issue.keys, keys, what);
        return `${what}: a mapping with the keys ${keys.join(', ')}`;
      },
    })
    .describe(description);
}

/** Most "did you mean" suggestions in one message (each unknown key's issue carries the message). */
const maxSuggestions = 5;

export function unknownKeyMessage(unknown: readonly string[], known: readonly string[], what: string): string {
  const suggestions = unknown
    .map((key) => ({ key, near: nearWords(key, known, 2)[0] }))
    .filter((s): s is { key: string; near: string } => s.near !== undefined)
    .slice(0, maxSuggestions)
    .map((s) => (unknown.length === 1 ? `did you mean ${s.near}?` : `${s.key}: did you mean ${s.near}?`));
  const hint = suggestions.length > 0 ? `; ${suggestions.join('; ')}` : '';
  return `one of the keys of ${what}: ${known.join(', ')} (unknown key${hint})`;
}

/** A fixed word (`adiabatic`), with the accepted words in the message. */
export function word<const T extends readonly [string, ...string[]]>(words: T, description: string) {
  return z
    .enum(words, {
      error: (issue) => {
        const near = typeof issue.input === 'string' ? nearWords(issue.input, words, 2) : [];
        return `one of ${words.join(', ')}${near.length > 0 ? ` (did you mean ${near[0]}?)` : ''}`;
      },
    })
    .describe(description);
}

/**
 * A list of [first, second] pairs, at least `minimum` of them; `what` names a pair in messages,
 * e.g. "[x, thickness] pairs".
 */
export function pairs<A extends z.ZodType, B extends z.ZodType>(first: A, second: B, what: string, minimum: number, description: string) {
  const pair = z.tuple([first, second], { error: () => `a pair ${what}` });
  const accepted = `a list of ${minimum} to ${maxTablePoints} pairs ${what}`;
  return z
    .array(pair, { error: () => accepted })
    .min(minimum, { error: () => accepted })
    .max(maxTablePoints, { error: () => accepted })
    .describe(description);
}
