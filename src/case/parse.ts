/**
 * Reading a case: text or file -> raw object -> schema (shape, units, ranges) -> cross-key checks -> Case.
 * Every problem found is collected and thrown together as one InputError (exit code 2); nothing is computed
 * for a case with an error.
 */
import { basename, extname } from 'node:path';
import { InputError, type InputIssue } from '../errors.js';
import { checkCase } from './checks.js';
import { readDocument } from './document.js';
import { fromZodIssues, toInputIssues, type Locate } from './issues.js';
import { toCase } from './normalise.js';
import { readCaseFile } from './read-input.js';
import { caseName } from './case-name.js';
import { getByKeyPath } from './key-path.js';
import { dimensionWarnings } from './plausibility.js';
import { caseSchemaFor } from './schema.js';
import { isProfileName } from './fin-profile-schema.js';
import { readUncertainty } from './uncertainty.js';
import { isHeatSinkObject } from './heat-sink-detect.js';
import { resolveExtends } from './extends.js';
import { detectDisplaySystem, resolveDisplayUnits } from './display-units.js';
import { isLengthUnit, type LengthUnit } from './units.js';
import type { Case } from './types.js';

export interface ParseOptions {
  /** The case name when the file has no `name` key (parseCaseText uses the file name without extension). */
  defaultName?: string;
  /** The file name shown before line numbers in messages. */
  file?: string;
}

/**
 * Validates and normalises a raw case object (as read from YAML/JSON, or with values substituted by key path).
 * `locate` maps a key path to its line and column in the source, when there is one.
 * Throws InputError listing every issue.
 */
export function parseCaseObject(given: unknown, givenLocate?: Locate, options: ParseOptions = {}): Case {
  const { raw, locate } = resolveExtends(given, options.file, givenLocate);
  if (isHeatSinkObject(raw)) {
    const accepted =
      'a single-fin case (keys fin, material, convection and base): a case with an array key is a heat sink, and only single-fin cases are taken here';
    throw new InputError(toInputIssues([{ path: ['array'], accepted }], raw, locate), options.file);
  }
  const lengthUnit = bareLengthUnit(raw);
  // jitless: one case is parsed per run, and compiling zod's fast path (new Function) costs more than it saves.
  const profile = getByKeyPath(raw, ['fin', 'profile']);
  const result = caseSchemaFor(lengthUnit, isProfileName(profile) ? profile : undefined).safeParse(raw, { jitless: true });
  const pending = result.success ? checkCase(result.data) : fromZodIssues(result.error.issues, raw);
  if (pending.length > 0 || !result.success) {
    throw new InputError(sortByPosition(toInputIssues(pending, raw, locate)), options.file);
  }
  const defaultName = options.defaultName ?? 'unnamed case';
  const c = toCase(result.data, defaultName);
  const { uncertainty, issues } = readUncertainty(result.data.uncertainty, c);
  if (issues.length > 0) throw new InputError(sortByPosition(toInputIssues(issues, raw, locate)), options.file);
  const nameWarning = caseName(result.data.name, defaultName).warning;
  const warnings = [...(nameWarning ? [nameWarning] : []), ...dimensionWarnings(result.data.fin, raw, result.data.units !== undefined)];
  return { ...c, warnings, uncertainty, display: resolveDisplayUnits(result.data.display, detectDisplaySystem(raw)) };
}

/**
 * The unit of bare lengths chosen by the case (`units: { length: mm }`), else m. An invalid `units` is reported
 * by the schema (which then reads bare lengths in m).
 */
export function bareLengthUnit(raw: unknown): LengthUnit {
  const unit = getByKeyPath(raw, ['units', 'length']);
  return isLengthUnit(unit) ? unit : 'm';
}

/** Parses case text, YAML or JSON (by the file name's extension, else by content). Throws InputError. */
export function parseCaseText(text: string, fileName: string): Case {
  return parseTextWith(text, fileName, parseCaseObject);
}

/** Reads case text with `parseObject` (a single-fin or any case), document and case issues reported together. */
export function parseTextWith<T>(text: string, fileName: string, parseObject: (raw: unknown, locate: Locate, options: ParseOptions) => T): T {
  const document = readDocument(text, fileName);
  const defaultName = basename(fileName, extname(fileName)) || 'unnamed case';
  const options: ParseOptions = { defaultName, file: fileName };
  const documentIssues: InputIssue[] = document.problems.map(({ issue, position, value }) => ({
    path: issue.path.join('.'),
    value,
    accepted: issue.accepted,
    ...(position ? { line: position.line, column: position.column } : {}),
  }));
  if (document.problems.some((p) => p.issue.path[0] === '(syntax)')) {
    throw new InputError(documentIssues, fileName);
  }
  let parsed: T | undefined;
  let caseIssues: InputIssue[] = [];
  try {
    parsed = parseObject(document.raw, document.locate, options);
  } catch (err) {
    if (!(err instanceof InputError)) throw err;
    caseIssues = err.issues;
  }
  const issues = [...documentIssues, ...caseIssues];
  if (issues.length > 0 || parsed === undefined) throw new InputError(sortByPosition(issues), fileName);
  return parsed;
}

export { readCaseFile, readCaseStream, maxCaseBytes } from './read-input.js';

/** Reads and parses a case file. A missing or unreadable file is an InputError too. */
export function loadCase(path: string): Case {
  return parseCaseText(readCaseFile(path), path);
}

/** Issues in file order (those without a position keep their order, after the located ones). */
export function sortByPosition(issues: InputIssue[]): InputIssue[] {
  const line = (i: InputIssue) => i.line ?? Number.MAX_SAFE_INTEGER;
  return issues
    .map((issue, index) => ({ issue, index }))
    .sort((a, b) => line(a.issue) - line(b.issue) || (a.issue.column ?? 0) - (b.issue.column ?? 0) || a.index - b.index)
    .map(({ issue }) => issue);
}
