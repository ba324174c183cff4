/**
 * `extends: base-case.yaml`: a case that inherits another case's keys and gives only the ones that change.
 *
 * The path is relative to the extending file's folder (standard input and objects: the current folder). The
 * base may itself extend another file. Merging, from the deepest base up: mappings merge key by key, lists and
 * single values replace. `name` is never inherited (each variant is named by its own `name` or its file name, so
 * a comparison of variants tells them apart). A variant whose `units.length` differs from its base's is refused:
 * the base's bare lengths would silently change meaning.
 *
 * Missing or unreadable bases, cycles and chains deeper than maxExtendsDepth are InputErrors (exit 2) naming the
 * chain of files, e.g. `a.yaml -> b.yaml -> a.yaml`.
 */
import { existsSync, statSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { InputError, type InputIssue } from '../errors.js';
import { quoted } from './clip-text.js';
import { readDocument } from './document.js';
import { getByKeyPath, type KeyPath } from './key-path.js';
import type { Locate } from './issues.js';
import { readCaseFile } from './read-input.js';
import { isLengthUnit } from './units.js';

/** Longest chain of bases (a variant of a variant of ... ): far more than a project needs, short enough to read. */
export const maxExtendsDepth = 16;

type Mapping = Record<string, unknown>;

function isMapping(value: unknown): value is Mapping {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Whether a raw case names a base (`extends` at its top level). */
export function hasExtends(raw: unknown): boolean {
  return isMapping(raw) && Object.hasOwn(raw, 'extends');
}

/** `base` with `over` laid on top: mappings merge key by key; lists and single values of `over` replace. */
export function deepMerge(base: unknown, over: unknown): unknown {
  if (!isMapping(base) || !isMapping(over)) return over;
  const out: Mapping = { ...base };
  for (const [key, value] of Object.entries(over)) out[key] = Object.hasOwn(base, key) ? deepMerge(base[key], value) : value;
  return out;
}

export interface ResolvedCase {
  /** The merged raw case, without `extends`. */
  raw: unknown;
  /** Where the position of a key path is: in the extending file when it gives that key, else nowhere (inherited). */
  locate: Locate | undefined;
}

const acceptedPath = 'the path of the case file this one extends, relative to this file (e.g. base-case.yaml)';

function refuse(file: string | undefined, locate: Locate | undefined, path: KeyPath, value: string, accepted: string): InputError {
  const at = locate?.(path);
  const issue: InputIssue = { path: path.join('.'), value, accepted, ...(at ? { line: at.line, column: at.column } : {}) };
  return new InputError([issue], file);
}

/**
 * An issue found in a base file: its position is in that file, not in the case being read, so the file and
 * position go into the key path (`base.yaml:5:3: fin.length`) and the chain into what is accepted.
 */
function inBase(issue: InputIssue, baseFile: string, chain: readonly string[]): InputIssue {
  const where = issue.line === undefined ? baseFile : `${baseFile}:${issue.line}${issue.column === undefined ? '' : `:${issue.column}`}`;
  return { path: `${where}: ${issue.path}`, value: issue.value, accepted: `${issue.accepted} (read through ${chain.join(' -> ')})` };
}

/**
 * The case `raw` (read from `file`; undefined for an object or standard input, whose bases are found from the
 * current folder) with its chain of bases merged in. A case without `extends` is returned as it is.
 */
export function resolveExtends(raw: unknown, file: string | undefined, locate: Locate | undefined): ResolvedCase {
  if (!hasExtends(raw) || !isMapping(raw)) return { raw, locate };
  const chain: string[] = [file ?? '(case)'];
  const seen = new Set<string>(file === undefined ? [] : [resolve(file)]);
  const layers: Mapping[] = [raw];
  let current: Mapping = raw;
  let currentFile = file;
  let currentLocate = locate;
  const fail = (error: InputError): InputError =>
    currentFile === file
      ? error
      : new InputError(
          error.issues.map((i) => inBase(i, currentFile ?? '(case)', chain)),
          file,
        );
  while (Object.hasOwn(current, 'extends')) {
    const given = current.extends;
    const shownFile = file;
    if (typeof given !== 'string' || given.trim() === '')
      throw fail(refuse(shownFile, currentLocate, ['extends'], typeof given === 'string' ? quoted(given) : String(JSON.stringify(given)), acceptedPath));
    const basePath = join(dirname(currentFile ?? '.'), given.trim());
    const absolute = resolve(basePath);
    if (seen.has(absolute))
      throw fail(
        refuse(
          shownFile,
          currentLocate,
          ['extends'],
          quoted(given),
          `a base that does not lead back to this case (${[...chain, basePath].join(' -> ')} is a cycle)`,
        ),
      );
    if (chain.length > maxExtendsDepth)
      throw fail(
        refuse(shownFile, currentLocate, ['extends'], quoted(given), `a chain of at most ${maxExtendsDepth} bases (${chain.join(' -> ')} -> ...)`),
      );
    if (!existsSync(absolute) || !statSync(absolute).isFile()) {
      const reason = existsSync(absolute) ? 'it is a folder' : 'no such file';
      throw fail(
        refuse(shownFile, currentLocate, ['extends'], quoted(given), `${acceptedPath}; ${basePath}: ${reason} (${[...chain, basePath].join(' -> ')})`),
      );
    }
    chain.push(basePath);
    seen.add(absolute);
    const document = readDocument(readCaseFile(basePath), basePath);
    if (document.problems.length > 0) {
      const issues: InputIssue[] = document.problems.map(({ issue, position, value }) => ({
        path: issue.path.join('.'),
        value,
        accepted: issue.accepted,
        ...(position ? { line: position.line, column: position.column } : {}),
      }));
      throw new InputError(
        issues.map((i) => inBase(i, basePath, chain)),
        file,
      );
    }
    if (!isMapping(document.raw))
      throw new InputError(
        [inBase({ path: '(file)', value: quoted(basePath), accepted: 'a case file: a mapping of keys such as name, fin, material' }, basePath, chain)],
        file,
      );
    const baseUnit = getByKeyPath(document.raw, ['units', 'length']);
    const ownUnit = getByKeyPath(current, ['units', 'length']);
    if (ownUnit !== undefined && isLengthUnit(ownUnit) && (isLengthUnit(baseUnit) ? baseUnit : 'm') !== ownUnit)
      throw fail(
        refuse(
          shownFile,
          currentLocate,
          ['units', 'length'],
          quoted(ownUnit),
          `the unit of bare lengths of its base ${basePath} (${isLengthUnit(baseUnit) ? baseUnit : 'm, no units key'}): its bare lengths would change meaning; write units on the lengths instead`,
        ),
      );
    layers.push(document.raw);
    current = document.raw;
    currentFile = basePath;
    currentLocate = document.locate;
  }
  let merged: unknown = {};
  for (let i = layers.length - 1; i >= 0; i--) {
    const own: Mapping = { ...(layers[i] as Mapping) };
    delete own.extends;
    delete own.name;
    merged = deepMerge(merged, own);
  }
  const result = merged as Mapping;
  if (Object.hasOwn(raw, 'name')) result.name = raw.name;
  const ownLocate: Locate | undefined = locate === undefined ? undefined : (path) => (getByKeyPath(raw, path) === undefined ? undefined : locate(path));
  return { raw: result, locate: ownLocate };
}
