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
}

export const positive: Range = { test: (v) => v > 0, text: '> 0' };
export const nonNegative: Range = { test: (v) => v >= 0, text: '>= 0' };
export const fraction: Range = { test: (v) => v >= 0 && v <= 1, text: 'from 0 to 1' };
export const aboveAbsoluteZero: Range = { test: (v) => v > -273.15, text: 'above absolute zero (-273.15 degC)' };

export interface QuantityOptions {
  range: Range;
  /** Meaning and unit of the key, for the JSON schema. */
  description: string;
  /** Added to the message when the key is missing, e.g. "a rectangular fin needs length, thickness and width". */
  whenMissing?: string;
}

/**
 * A quantity key: a bare number (SI, temperatures degC) or a string with a unit; the output is the SI number.
 */
export function quantity(kind: QuantityKind, options: QuantityOptions) {
  const accepted = describeQuantity(kind, options.range.text);
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
      const result = parseQuantity(given, kind);
      if (!result.ok) {
        ctx.issues.push({ code: 'custom', input: given, message: `${accepted} (${result.problem})`, continue: true });
        return z.NEVER;
      }
      if (!options.range.test(result.value)) {
        const si = kind === 'dimensionless' || typeof given === 'number' ? '' : ` (that is ${formatSI(result.value, kind)})`;
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

export function unknownKeyMessage(unknown: readonly string[], known: readonly string[], what: string): string {
  const suggestions = unknown
    .map((key) => ({ key, near: nearWords(key, known, 2)[0] }))
    .filter((s): s is { key: string; near: string } => s.near !== undefined)
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
  return z
    .array(pair, { error: () => `a list of at least ${minimum} pairs ${what}` })
    .min(minimum, { error: () => `a list of at least ${minimum} pairs ${what}` })
    .describe(description);
}
