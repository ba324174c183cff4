/**
 * Key paths into a raw case object: `fin.thickness`, `convection.h.points[2][0]`.
 *
 * Messages name keys by these paths, and the map command substitutes values into the raw (unvalidated) object
 * by path before validating it again.
 */
import { UsageError } from '../errors.js';

/** Path segments: object keys are strings, array indices numbers. */
export type KeyPath = readonly (string | number)[];

/** ['convection', 'h', 'points', 2, 0] -> 'convection.h.points[2][0]'. */
export function formatKeyPath(path: KeyPath): string {
  let text = '';
  for (const segment of path) {
    if (typeof segment === 'number') text += `[${segment}]`;
    else text += text === '' ? segment : `.${segment}`;
  }
  return text;
}

/** 'convection.h.points[2][0]' -> ['convection', 'h', 'points', 2, 0]. Throws UsageError on a malformed path. */
export function parseKeyPath(text: string): KeyPath {
  const segments: (string | number)[] = [];
  const pattern = /([A-Za-z_][A-Za-z0-9_-]*)|\[(\d+)\]|(\.)/gy;
  let expectKey = true;
  let match: RegExpExecArray | null;
  let end = 0;
  while ((match = pattern.exec(text)) !== null) {
    end = pattern.lastIndex;
    if (match[1] !== undefined) {
      if (!expectKey) break;
      segments.push(match[1]);
      expectKey = false;
    } else if (match[2] !== undefined) {
      if (expectKey) break;
      segments.push(Number(match[2]));
    } else {
      if (expectKey) break;
      expectKey = true;
    }
  }
  if (end !== text.length || expectKey || segments.length === 0) {
    throw new UsageError(`"${text}" is not a key path; write keys with dots and indices in brackets, e.g. fin.thickness or convection.h.points[2][0]`);
  }
  return segments;
}

function toPath(path: KeyPath | string): KeyPath {
  return typeof path === 'string' ? parseKeyPath(path) : path;
}

function isRecord(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** The value at `path` in `raw`, or undefined when any step is missing. */
export function getByKeyPath(raw: unknown, path: KeyPath | string): unknown {
  let node: unknown = raw;
  for (const segment of toPath(path)) {
    if (typeof segment === 'number') {
      if (!Array.isArray(node)) return undefined;
      node = node[segment];
    } else {
      if (!isRecord(node) || !Object.hasOwn(node, segment)) return undefined;
      node = node[segment];
    }
  }
  return node;
}

/**
 * A copy of `raw` with `value` at `path` (the input is not changed). Missing objects along the way are created;
 * an index must address an existing array element or the element just past the end. Throws UsageError when the
 * path runs through a value that is not an object or array.
 */
export function setByKeyPath<T>(raw: T, path: KeyPath | string, value: unknown): T {
  const segments = toPath(path);
  return setIn(raw, segments, 0, value, formatKeyPath(segments)) as T;
}

function setIn(node: unknown, path: KeyPath, depth: number, value: unknown, full: string): unknown {
  if (depth === path.length) return value;
  const segment = path[depth];
  const where = formatKeyPath(path.slice(0, depth)) || '(top level)';
  if (typeof segment === 'number') {
    if (!Array.isArray(node)) throw new UsageError(`cannot set ${full}: ${where} is not a list`);
    if (segment > node.length) throw new UsageError(`cannot set ${full}: ${where} has only ${node.length} items`);
    const copy: unknown[] = [...node];
    copy[segment] = setIn(node[segment], path, depth + 1, value, full);
    return copy;
  }
  if (node !== undefined && !isRecord(node)) throw new UsageError(`cannot set ${full}: ${where} is not a mapping`);
  const record = node ?? {};
  return { ...record, [segment as string]: setIn(record[segment as string], path, depth + 1, value, full) };
}
