/**
 * Case text (YAML or JSON) to a raw object, with a map from key paths to lines and columns.
 *
 * JSON is read by the YAML 1.2 parser too (a JSON document is a YAML 1.2 document), so both formats get the same
 * line numbers, the same duplicate-key check and the same `.inf`/`.nan` handling. Syntax errors and duplicate
 * keys are issues; the raw value is still returned for what could be read.
 */
import { LineCounter, isMap, isScalar, isSeq, parseDocument, type Node, type Pair } from 'yaml';
import { clip, escapeControl, quoted } from './clip-text.js';
import type { KeyPath } from './key-path.js';
import type { Locate, PendingIssue, SourcePosition } from './issues.js';

export type SourceFormat = 'yaml' | 'json';

export interface ReadDocument {
  raw: unknown;
  locate: Locate;
  /** Syntax and duplicate-key problems, each with its position. */
  problems: { issue: PendingIssue; position?: SourcePosition; value: string }[];
  format: SourceFormat;
}

/** JSON by extension (.json), YAML by extension (.yaml, .yml), otherwise JSON when the text starts with `{`. */
export function detectFormat(text: string, fileName: string): SourceFormat {
  const lower = fileName.toLowerCase();
  if (lower.endsWith('.json')) return 'json';
  if (lower.endsWith('.yaml') || lower.endsWith('.yml')) return 'yaml';
  return text.trimStart().startsWith('{') ? 'json' : 'yaml';
}

export function readDocument(text: string, fileName: string): ReadDocument {
  const format = detectFormat(text, fileName);
  const lineCounter = new LineCounter();
  // Duplicate keys are found below, by path; yaml's own check would only give a position.
  const doc = parseDocument(text, { lineCounter, uniqueKeys: false, prettyErrors: false });
  const position = (offset: number): SourcePosition => {
    const { line, col } = lineCounter.linePos(offset);
    return { line, column: col };
  };
  const lines = text.split(/\r?\n/);
  const problems: ReadDocument['problems'] = [];

  for (const error of doc.errors) {
    const at = position(error.pos[0]);
    const sourceLine = (lines[at.line - 1] ?? '').trim();
    const name = format === 'json' ? 'JSON' : 'YAML';
    // The parser's advice for several documents names its own function; a case file is one document.
    const reason =
      error.code === 'MULTIPLE_DOCS'
        ? 'one document per case file: remove the "---" and what follows, or split the file'
        : error.message.replace(/\.$/, '');
    problems.push({
      issue: { path: ['(syntax)'], accepted: `valid ${name} (${reason})` },
      position: at,
      value: sourceLine === '' ? 'the end of the file' : quoted(sourceLine),
    });
  }

  const contents = doc.contents as Node | null;
  if (doc.errors.length === 0) findDuplicateKeys(contents, [], problems, position, text);

  const locate: Locate = (path) => locateIn(contents, path, position, text);
  const raw: unknown = doc.errors.length === 0 ? toPlainValue(doc, problems) : undefined;
  return { raw, locate, problems, format };
}

/** At most this many alias expansions (`*name`) in a document: a case needs a few; a billion-laughs file has millions. */
const maxAliasCount = 100;

/**
 * The document as plain data. yaml refuses to expand too many aliases by throwing (it has no way to ask first);
 * that refusal is the file's problem, reported like a syntax error (exit 2), not an internal error.
 */
function toPlainValue(doc: ReturnType<typeof parseDocument>, problems: ReadDocument['problems']): unknown {
  try {
    return doc.toJS({ maxAliasCount });
  } catch (err) {
    if (!(err instanceof ReferenceError)) throw err;
    problems.push({
      issue: {
        path: ['(syntax)'],
        accepted: `a case whose aliases (*name) expand to at most ${maxAliasCount} copies (this one expands to far more, as a file made to exhaust memory does)`,
      },
      value: 'aliases that expand without bound',
    });
    return undefined;
  }
}

function keyOf(pair: Pair): string | undefined {
  const key = pair.key;
  if (isScalar(key)) return String(key.value);
  return typeof key === 'string' || typeof key === 'number' ? String(key) : undefined;
}

function nodeRange(node: unknown): [number, number] | undefined {
  if (node && typeof node === 'object' && 'range' in node) {
    const range = (node as { range?: [number, number, number] | null }).range;
    if (range) return [range[0], range[1]];
  }
  return undefined;
}

/** The source text of a pair's value, or "an empty value". */
function valueText(pair: Pair, text: string): string {
  const range = nodeRange(pair.value);
  const source = range ? text.slice(range[0], range[1]).trim() : '';
  if (source === '') return 'an empty value';
  return escapeControl(clip(source));
}

function findDuplicateKeys(
  node: Node | null,
  path: (string | number)[],
  problems: ReadDocument['problems'],
  position: (offset: number) => SourcePosition,
  text: string,
): void {
  if (isMap(node)) {
    const seen = new Map<string, number>();
    for (const pair of node.items) {
      const key = keyOf(pair);
      const keyRange = nodeRange(pair.key);
      if (key !== undefined && keyRange) {
        const first = seen.get(key);
        if (first !== undefined) {
          const at = position(keyRange[0]);
          problems.push({
            issue: {
              path: [...path, key],
              accepted: `each key once (${key} is first given on line ${position(first).line}, column ${position(first).column})`,
            },
            position: at,
            value: valueText(pair, text),
          });
        } else {
          seen.set(key, keyRange[0]);
        }
      }
      if (key !== undefined) findDuplicateKeys(pair.value as Node | null, [...path, key], problems, position, text);
    }
  } else if (isSeq(node)) {
    node.items.forEach((item, i) => findDuplicateKeys(item as Node | null, [...path, i], problems, position, text));
  }
}

const pairIndex = new WeakMap<object, Map<string, Pair>>();

/**
 * The pairs of a mapping by key (the first of duplicates), built once per mapping: looking each issue's key up by a
 * linear search made 100,000 unknown keys take minutes (quadratic).
 */
function pairsByKey(node: { items: Pair[] }): Map<string, Pair> {
  let index = pairIndex.get(node);
  if (index === undefined) {
    index = new Map();
    for (const pair of node.items) {
      const key = keyOf(pair);
      if (key !== undefined && !index.has(key)) index.set(key, pair);
    }
    pairIndex.set(node, index);
  }
  return index;
}

/**
 * The position of the value at `path`; for a missing key, the position of the nearest key that exists (where
 * the missing one belongs). Scalars carry their source text.
 */
function locateIn(contents: Node | null, path: KeyPath, position: (offset: number) => SourcePosition, text: string): SourcePosition | undefined {
  let node: unknown = contents;
  const contentsRange = nodeRange(contents);
  let best: SourcePosition | undefined = contentsRange ? position(contentsRange[0]) : undefined;
  for (const segment of path) {
    let next: unknown;
    let keyNode: unknown;
    if (typeof segment === 'number' && isSeq(node)) {
      next = node.items[segment];
    } else if (isMap(node)) {
      const pair = pairsByKey(node).get(String(segment));
      next = pair?.value;
      keyNode = pair?.key;
    }
    const found = nodeRange(next) ?? nodeRange(keyNode);
    if (!found) return best;
    best = position(found[0]);
    if (!nodeRange(next)) return best;
    node = next;
  }
  const range = nodeRange(node);
  if (best && isScalar(node) && range) best = { ...best, scalar: { text: text.slice(range[0], range[1]).trim(), value: node.value } };
  return best;
}
