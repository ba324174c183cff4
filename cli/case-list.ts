/**
 * The CASE arguments of commands that take several cases (`check`, `report`): files, `-` (standard input, once),
 * folders (their *.yaml, *.yml and *.json files, sorted by name, not recursive) and globs. A glob the shell did not
 * expand (quoted, or no match in a shell that keeps it) is expanded here: `*` and `?` within a path segment, `[...]`
 * character classes, and `**` for any depth of folders; its matches are sorted. A glob that matches nothing is a
 * usage error naming it (exit 2).
 */
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { UsageError } from '../src/errors.js';

const caseExtensions = /\.(ya?ml|json)$/i;
const globCharacters = /[*?[]/;

export interface CaseList {
  files: string[];
  /** More than one case, or a folder or a glob: the command compares cases (one argument naming one file does not). */
  several: boolean;
}

function byName(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** A glob segment as a regular expression (`*`, `?`, `[...]`; everything else literal). */
function segmentPattern(segment: string): RegExp {
  let source = '';
  for (let i = 0; i < segment.length; i++) {
    const ch = segment[i] as string;
    if (ch === '*') source += '[^/]*';
    else if (ch === '?') source += '[^/]';
    else if (ch === '[') {
      const end = segment.indexOf(']', i + 1);
      if (end < 0) source += '\\[';
      else {
        const inner = segment
          .slice(i + 1, end)
          .replace(/^!/, '^')
          .replace(/\\/g, '\\\\');
        source += `[${inner}]`;
        i = end;
      }
    } else source += ch.replace(/[.+^${}()|\\]/g, '\\$&');
  }
  return new RegExp(`^${source}$`);
}

function isFolder(path: string): boolean {
  return existsSync(path) && statSync(path).isDirectory();
}

/** Paths matching the glob `pattern` (segments split on /). */
export function expandGlob(pattern: string): string[] {
  const absolute = pattern.startsWith('/');
  const segments = pattern.split('/').filter((s, i) => s !== '' || i === 0);
  let paths: string[] = [absolute ? '/' : ''];
  for (const segment of absolute ? segments.slice(1) : segments) {
    const next: string[] = [];
    for (const base of paths) {
      const dir = base === '' ? '.' : base;
      if (segment === '**') {
        // Zero or more folders.
        const stack = [base];
        while (stack.length > 0) {
          const at = stack.pop() as string;
          next.push(at);
          const atDir = at === '' ? '.' : at;
          if (!isFolder(atDir)) continue;
          for (const entry of readdirSync(atDir, { withFileTypes: true }))
            if (entry.isDirectory()) stack.push(at === '' ? entry.name : join(at, entry.name));
        }
      } else if (globCharacters.test(segment)) {
        if (!isFolder(dir)) continue;
        const re = segmentPattern(segment);
        for (const name of readdirSync(dir))
          if (re.test(name) && !(name.startsWith('.') && !segment.startsWith('.'))) next.push(base === '' ? name : join(base, name));
      } else next.push(base === '' ? segment : join(base, segment));
    }
    paths = [...new Set(next)];
  }
  return paths.filter((p) => p !== '' && existsSync(p) && statSync(p).isFile()).sort(byName);
}

/** The case files named by `args`, in order (a folder's and a glob's files sorted), and whether they are several. */
export function caseList(args: readonly string[]): CaseList {
  const files: string[] = [];
  let several = args.length > 1;
  for (const arg of args) {
    if (arg === '-') {
      if (files.includes('-')) throw new UsageError('-: standard input can be read once; give it as one case only');
      files.push(arg);
    } else if (isFolder(arg)) {
      several = true;
      const found = readdirSync(arg)
        .filter((name) => caseExtensions.test(name) && statSync(join(arg, name)).isFile())
        .sort(byName)
        .map((name) => join(arg, name));
      if (found.length === 0) throw new UsageError(`${arg}: got a folder with no case files; expected a folder holding *.yaml, *.yml or *.json cases`);
      files.push(...found);
    } else if (!existsSync(arg) && globCharacters.test(arg)) {
      several = true;
      const found = expandGlob(arg);
      if (found.length === 0)
        throw new UsageError(`${arg}: got a pattern that matches no file; expected a file, a folder or a pattern matching case files`);
      files.push(...found);
    } else files.push(arg);
  }
  return { files, several };
}
