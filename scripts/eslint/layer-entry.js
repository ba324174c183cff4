/**
 * Rule `fincheck/layer-entry`: a layer is reached from another layer only through its entry.
 *
 * The layers are the folders directly under src/ (case, mesh, fd, analytic, compare, plots, images, report,
 * map) and cli/. A file may import anything inside its own layer; from another layer it imports only that
 * layer's `index.ts` (written `../fd/index.js`). A file directly under src/ (errors.ts, version.ts) is a
 * layer of one file and is its own entry. Files outside src/ and cli/ (tests, bench, scripts) are not
 * checked: they may test a deep module directly.
 */
import path from 'node:path';
import { resolveImport } from './import-graph.js';

/**
 * The layer of a file and the path of its entry, both relative to the project root with `/` separators;
 * undefined outside src/ and cli/.
 * @param {string} relative
 * @returns {{ layer: string, entry: string } | undefined}
 */
export function layerOf(relative) {
  const parts = relative.split('/');
  if (parts[0] === 'cli') return { layer: 'cli', entry: 'cli/index.ts' };
  if (parts[0] !== 'src' || parts.length < 2) return undefined;
  if (parts.length === 2) return { layer: relative, entry: relative };
  return { layer: `src/${parts[1]}`, entry: `src/${parts[1]}/index.ts` };
}

/** @type {import('eslint').Rule.RuleModule} */
export const layerEntry = {
  meta: {
    type: 'problem',
    docs: { description: 'Import another layer only through its entry (index.ts).' },
    schema: [],
    messages: {
      deep: "'{{specifier}}' reaches into layer {{layer}} around its entry: import it from {{entry}} " + '(export it there if the other layers need it).',
    },
  },
  create(context) {
    const file = context.physicalFilename;
    const root = context.cwd;
    const relative = (/** @type {string} */ f) => path.relative(root, f).split(path.sep).join('/');
    const own = layerOf(relative(file));
    if (own === undefined) return {};
    /** @param {import('estree').Node & { source?: import('estree').Node | null }} node */
    function check(node) {
      const source = node.source;
      if (source == null || source.type !== 'Literal' || typeof source.value !== 'string') return;
      const target = resolveImport(file, source.value);
      if (target === undefined) return;
      const theirs = layerOf(relative(target));
      if (theirs === undefined || theirs.layer === own.layer || relative(target) === theirs.entry) return;
      context.report({
        node: source,
        messageId: 'deep',
        data: { specifier: source.value, layer: theirs.layer, entry: theirs.entry },
      });
    }
    return {
      ImportDeclaration: check,
      ExportNamedDeclaration: check,
      ExportAllDeclaration: check,
      ImportExpression: check,
    };
  },
};
