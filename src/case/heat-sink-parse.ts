/**
 * Reading a heat-sink case, and reading any case: text or file -> raw object -> a single fin (parse.ts) or,
 * when the object has an `array` key, a heat sink (heat-sink-schema.ts -> heat-sink-checks.ts ->
 * heat-sink-normalise.ts). Every problem is collected and thrown together as one InputError (exit code 2).
 */
import { InputError } from '../errors.js';
import { caseName } from './case-name.js';
import { isHeatSinkObject } from './heat-sink-detect.js';
import { resolveExtends } from './extends.js';
import { detectDisplaySystem, resolveDisplayUnits } from './display-units.js';
import { checkHeatSink } from './heat-sink-checks.js';
import { toHeatSinkCase } from './heat-sink-normalise.js';
import { heatSinkSchemaFor } from './heat-sink-schema.js';
import type { HeatSinkCase } from './heat-sink-types.js';
import { fromZodIssues, toInputIssues, type Locate } from './issues.js';
import { bareLengthUnit, parseCaseObject, parseTextWith, sortByPosition, type ParseOptions } from './parse.js';
import { dimensionWarnings } from './plausibility.js';
import { readCaseFile } from './read-input.js';
import type { Case } from './types.js';
import { sinkNumericInputs } from './sink-numeric-inputs.js';
import { readUncertaintyOf } from './uncertainty.js';

/** A case of either kind, told apart by `kind`. */
export type AnyCase = { kind: 'fin'; case: Case } | { kind: 'heat-sink'; case: HeatSinkCase };

/** Validates and normalises a raw heat-sink case object. Throws InputError listing every issue. */
export function parseHeatSinkObject(given: unknown, givenLocate?: Locate, options: ParseOptions = {}): HeatSinkCase {
  const { raw, locate } = resolveExtends(given, options.file, givenLocate);
  const result = heatSinkSchemaFor(bareLengthUnit(raw)).safeParse(raw);
  const pending = result.success ? checkHeatSink(result.data) : fromZodIssues(result.error.issues, raw);
  if (pending.length > 0 || !result.success) {
    throw new InputError(sortByPosition(toInputIssues(pending, raw, locate)), options.file);
  }
  const defaultName = options.defaultName ?? 'unnamed case';
  const c = toHeatSinkCase(result.data, defaultName);
  const { uncertainty, issues } = readUncertaintyOf(result.data.uncertainty, sinkNumericInputs(c));
  if (issues.length > 0) throw new InputError(sortByPosition(toInputIssues(issues, raw, locate)), options.file);
  const nameWarning = caseName(result.data.name, defaultName).warning;
  const finWarnings = result.data.fin ? dimensionWarnings(result.data.fin, raw, result.data.units !== undefined) : [];
  return {
    ...c,
    warnings: [...(nameWarning ? [nameWarning] : []), ...finWarnings],
    uncertainty,
    display: resolveDisplayUnits(result.data.display, detectDisplaySystem(raw)),
  };
}

/** A raw case object of either kind (a heat sink when it has an `array` key). Throws InputError. */
export function parseAnyCaseObject(given: unknown, givenLocate?: Locate, options: ParseOptions = {}): AnyCase {
  const { raw, locate } = resolveExtends(given, options.file, givenLocate);
  return isHeatSinkObject(raw)
    ? { kind: 'heat-sink', case: parseHeatSinkObject(raw, locate, options) }
    : { kind: 'fin', case: parseCaseObject(raw, locate, options) };
}

/** Parses case text of either kind, YAML or JSON. Throws InputError. */
export function parseAnyCaseText(text: string, fileName: string): AnyCase {
  return parseTextWith(text, fileName, parseAnyCaseObject);
}

/** Reads and parses a case file of either kind. A missing or unreadable file is an InputError too. */
export function loadAnyCase(path: string): AnyCase {
  return parseAnyCaseText(readCaseFile(path), path);
}

/** Parses heat-sink case text; a single-fin case is an InputError naming what is accepted. */
export function parseHeatSinkText(text: string, fileName: string): HeatSinkCase {
  return parseTextWith(text, fileName, (raw, locate, options) => {
    const resolved = resolveExtends(raw, options.file, locate);
    if (!isHeatSinkObject(resolved.raw)) {
      const accepted = 'a heat-sink case: one with an array key (array.count, or array.pins) beside plate, sources and convection';
      throw new InputError(toInputIssues([{ path: ['array'], accepted }], raw, locate), options.file);
    }
    return parseHeatSinkObject(resolved.raw, resolved.locate, options);
  });
}
