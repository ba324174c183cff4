/**
 * The library's options, checked the way the command line checks its flags, but named by their property
 * (`tolerance`, `reference`, ...): a UsageError says which property, the value and what is accepted.
 */
import { clip, displaySystem, isDisplaySystem, type DisplaySystem, type DisplayUnits } from '../case/index.js';
import { UsageError } from '../errors.js';

export type ReferenceChoice = 'auto' | '1d' | '2d';

function refuse(name: string, value: unknown, accepted: string): never {
  throw new UsageError(`options.${name}: got ${clip(JSON.stringify(value) ?? String(value))}; expected ${accepted}`);
}

/** A relative tolerance strictly between 0 and 1 (0.02 = 2 %); default 0.02. */
export function toleranceOf(value: unknown): number {
  if (value === undefined) return 0.02;
  if (typeof value !== 'number' || !(value > 0 && value < 1)) refuse('tolerance', value, 'a number between 0 and 1, e.g. 0.02 for 2 %');
  return value;
}

/** auto (the 2-D model where the fin allows), 1d or 2d; default auto. */
export function referenceOf(value: unknown): ReferenceChoice {
  if (value === undefined) return 'auto';
  if (value !== 'auto' && value !== '1d' && value !== '2d') refuse('reference', value, "'auto', '1d' or '2d'");
  return value;
}

/** The case with the display units asked for ('si', 'mm' or 'us'); unchanged when none is asked. */
export function withUnitsOf<C extends { display?: DisplayUnits }>(c: C, value: unknown): C {
  if (value === undefined) return c;
  if (!isDisplaySystem(value)) refuse('units', value, "'si', 'mm' or 'us'");
  return { ...c, display: displaySystem(value) };
}

export type UnitsChoice = DisplaySystem;

/** A whole number in [min, max], or undefined when not given. */
export function wholeNumberOf(name: string, value: unknown, min: number, max: number): number | undefined {
  if (value === undefined) return undefined;
  if (typeof value !== 'number' || !Number.isInteger(value) || value < min || value > max) refuse(name, value, `a whole number from ${min} to ${max}`);
  return value;
}

/** A number in [min, max], or the default when not given. */
export function numberOf(name: string, value: unknown, min: number, max: number, fallback: number): number {
  if (value === undefined) return fallback;
  if (typeof value !== 'number' || !(value >= min && value <= max)) refuse(name, value, `a number from ${min} to ${max}`);
  return value;
}
