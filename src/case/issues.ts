/**
 * From zod issues and check results to the InputIssues the user reads: key path, value as given, what is
 * accepted, and where in the file.
 */
import type { z } from 'zod';
import type { InputIssue } from '../errors.js';
import { clip, escapeControl, maxEchoChars, quoted } from './clip-text.js';
import { formatKeyPath, getByKeyPath, type KeyPath } from './key-path.js';

/** An issue before the value and position are looked up. */
export interface PendingIssue {
  path: KeyPath;
  accepted: string;
}

/** Where a key path is in the source file; for a scalar, its text as written and the value read from it. */
export interface SourcePosition {
  line: number;
  column: number;
  scalar?: { text: string; value: unknown };
}

export type Locate = (path: KeyPath) => SourcePosition | undefined;

type ZodIssue = z.core.$ZodIssue;

/** Unknown keys of one mapping listed one by one; the rest are counted in one more issue. */
export const maxUnknownKeysListed = 10;

/** Flattens zod issues into pending issues: one per unknown key, and the intended option of a failed union. */
export function fromZodIssues(issues: readonly ZodIssue[], raw: unknown, prefix: KeyPath = []): PendingIssue[] {
  const out: PendingIssue[] = [];
  for (const issue of issues) {
    const path: KeyPath = [...prefix, ...issue.path.map((p) => (typeof p === 'symbol' ? String(p) : p))];
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys.slice(0, maxUnknownKeysListed)) out.push({ path: [...path, key], accepted: issue.message });
      const more = issue.keys.length - maxUnknownKeysListed;
      if (more > 0) {
        const where = formatKeyPath(path) || 'the top level';
        out.push({ path, accepted: `no unknown keys (and ${more.toLocaleString('en-US')} more unknown keys at ${where}, not listed)` });
      }
    } else if (issue.code === 'invalid_union' && issue.errors.length > 0) {
      out.push(...fromUnion(issue, path, raw));
    } else {
      out.push({ path, accepted: issue.message });
    }
  }
  return out;
}

/**
 * A union none of whose options matched. When the input is a mapping, the option it was meant for is the one
 * that did not fail on the type of the whole value and has the fewest issues (each unknown key counts once);
 * its issues are reported. Otherwise (or on a tie) the union's own message lists the accepted forms.
 */
function fromUnion(issue: Extract<ZodIssue, { code: 'invalid_union' }>, path: KeyPath, raw: unknown): PendingIssue[] {
  const given = getByKeyPath(raw, path);
  const isMapping = typeof given === 'object' && given !== null && !Array.isArray(given);
  if (isMapping) {
    const candidates = issue.errors
      .filter((branch) => !branch.some((i) => i.path.length === 0 && i.code !== 'unrecognized_keys'))
      .map((branch) => ({ branch, weight: branch.reduce((n, i) => n + (i.code === 'unrecognized_keys' ? i.keys.length : 1), 0) }))
      .sort((a, b) => a.weight - b.weight);
    const best = candidates[0];
    if (best && (candidates.length === 1 || (candidates[1]?.weight ?? Infinity) > best.weight)) {
      return fromZodIssues(best.branch, raw, path);
    }
  }
  // A "did you mean" from a word-list option (a misspelt `tip: convection`) is worth keeping.
  const hint = issue.errors
    .flat()
    .filter((i) => i.path.length === 0 && i.code === 'invalid_value')
    .map((i) => /\(did you mean [^)]*\)/.exec(i.message)?.[0])
    .find((h) => h !== undefined);
  return [{ path, accepted: hint ? `${issue.message} ${hint}` : issue.message }];
}

/**
 * The value at `path` as the user gave it: the scalar's source text when the raw value is still the one read
 * from the file (the map command substitutes values), else a compact rendering of the raw value.
 */
export function displayValue(raw: unknown, path: KeyPath, position?: SourcePosition): string {
  const value = getByKeyPath(raw, path);
  if (position?.scalar && Object.is(position.scalar.value, value)) return escapeControl(clip(position.scalar.text));
  return renderValue(value, pathExists(raw, path));
}

function pathExists(raw: unknown, path: KeyPath): boolean {
  if (path.length === 0) return raw !== undefined;
  const parent = getByKeyPath(raw, path.slice(0, -1));
  const last = path[path.length - 1];
  if (typeof last === 'number') return Array.isArray(parent) && last < parent.length;
  return typeof parent === 'object' && parent !== null && last !== undefined && Object.hasOwn(parent, last);
}

export function renderValue(value: unknown, present = true): string {
  if (value === undefined) return present ? 'an empty value' : 'nothing (the key is missing)';
  if (value === null) return 'an empty value';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return quoted(value);
  return escapeControl(clip(compactJson(value)));
}

/** JSON of a value, stopping once it is longer than can be shown (a value may hold a million keys). */
function compactJson(value: unknown): string {
  let length = 0;
  const budget = maxEchoChars * 4;
  const text = JSON.stringify(value, (_key, v: unknown) => {
    if (length > budget) return undefined;
    const shown = typeof v === 'number' && !Number.isFinite(v) ? String(v) : v;
    length += typeof shown === 'string' ? shown.length + 3 : 4;
    return typeof shown === 'string' && shown.length > maxEchoChars ? clip(shown) : shown;
  });
  return text ?? String(value);
}

/** Finalises pending issues: display path, value, and the position when the source is known. */
export function toInputIssues(pending: readonly PendingIssue[], raw: unknown, locate?: Locate): InputIssue[] {
  return pending.map(({ path, accepted }) => {
    const position = locate?.(path);
    const issue: InputIssue = {
      path: formatKeyPath(path) || '(top level)',
      value: displayValue(raw, path, position),
      accepted: escapeControl(accepted),
    };
    if (position) {
      issue.line = position.line;
      issue.column = position.column;
    }
    return issue;
  });
}
