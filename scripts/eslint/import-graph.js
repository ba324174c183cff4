/**
 * The project's import graph as the rules in this folder see it: every relative import of a TypeScript file,
 * type-only imports and re-exports included, read with TypeScript's own `preProcessFile` (so `import type`,
 * `export ... from` and `import()` all count) and resolved the way NodeNext resolves our sources: a `.js`
 * specifier names the `.ts` file beside it. Package imports are not followed.
 */
import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import ts from 'typescript';

/** @type {Map<string, { mtimeMs: number, imports: string[] }>} */
const cache = new Map();

/**
 * Resolves a relative specifier written in `fromFile` to an absolute `.ts` path, or undefined for a package
 * or a file that does not exist (tsc reports those).
 * @param {string} fromFile
 * @param {string} specifier
 * @returns {string | undefined}
 */
export function resolveImport(fromFile, specifier) {
  if (!specifier.startsWith('./') && !specifier.startsWith('../')) return undefined;
  const target = path.resolve(path.dirname(fromFile), specifier);
  for (const candidate of [target.replace(/\.js$/, '.ts'), target, `${target}.ts`, path.join(target, 'index.ts')]) {
    if (candidate.endsWith('.ts') && existsSync(candidate)) return candidate;
  }
  return undefined;
}

/**
 * The resolved imports of one file (absolute paths), cached by modification time.
 * @param {string} file absolute path of a `.ts` file
 * @returns {string[]}
 */
export function importsOf(file) {
  const mtimeMs = statSync(file).mtimeMs;
  const hit = cache.get(file);
  if (hit !== undefined && hit.mtimeMs === mtimeMs) return hit.imports;
  const info = ts.preProcessFile(readFileSync(file, 'utf8'), true, true);
  const imports = [];
  for (const { fileName } of info.importedFiles) {
    const resolved = resolveImport(file, fileName);
    if (resolved !== undefined) imports.push(resolved);
  }
  cache.set(file, { mtimeMs, imports });
  return imports;
}

/**
 * A shortest chain of imports from `start` back to `file`, or undefined when `start` cannot reach `file`.
 * Breadth-first, so the reported cycle is one of the shortest.
 * @param {string} start
 * @param {string} file
 * @returns {string[] | undefined} the files from `start` to `file`, both included
 */
export function pathBack(start, file) {
  /** @type {Map<string, string | null>} */
  const cameFrom = new Map([[start, null]]);
  const queue = [start];
  while (queue.length > 0) {
    const current = /** @type {string} */ (queue.shift());
    if (current === file) {
      const chain = [];
      for (let at = /** @type {string | null} */ (current); at !== null; at = cameFrom.get(at) ?? null) chain.unshift(at);
      return chain;
    }
    for (const next of importsOf(current)) {
      if (!cameFrom.has(next)) {
        cameFrom.set(next, current);
        queue.push(next);
      }
    }
  }
  return undefined;
}
