/**
 * Rule `fincheck/no-import-cycle`: no chain of imports leads from a module back to itself.
 *
 * Type-only imports count. A cycle through types alone costs nothing at run time, but it still means two
 * modules each need the other to be read, which is what the layers are meant to prevent (issue 10 named
 * cli/program <-> commands, fd/tridiagonal <-> conservative-thomas and sparse/bandedCholesky <-> bandedLdlt,
 * all three through types). import-x/no-cycle skips type-only imports by design, so it misses those.
 * The error stands on the import that closes the cycle and lists the chain.
 */
import path from 'node:path';
import { pathBack, resolveImport } from './import-graph.js';

/** @type {import('eslint').Rule.RuleModule} */
export const noImportCycle = {
  meta: {
    type: 'problem',
    docs: { description: 'Forbid import cycles, type-only imports included.' },
    schema: [],
    messages: {
      cycle: 'Import cycle: {{chain}}. Move what both modules need into a third module, or invert the dependency.',
    },
  },
  create(context) {
    const file = context.physicalFilename;
    const root = context.cwd;
    /** @param {import('estree').Node & { source?: import('estree').Node | null }} node */
    function check(node) {
      const source = node.source;
      if (source == null || source.type !== 'Literal' || typeof source.value !== 'string') return;
      const target = resolveImport(file, source.value);
      if (target === undefined) return;
      const chain = pathBack(target, file);
      if (chain === undefined) return;
      const shown = [file, ...chain].map((f) => path.relative(root, f).split(path.sep).join('/'));
      context.report({ node, messageId: 'cycle', data: { chain: shown.join(' -> ') } });
    }
    return {
      ImportDeclaration: check,
      ExportNamedDeclaration: check,
      ExportAllDeclaration: check,
      ImportExpression: check,
    };
  },
};
