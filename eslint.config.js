// Lint rules that a contributor runs (`npm run lint`, part of `npm test`). typescript-eslint's recommended
// rules, plus fincheck's own (scripts/eslint/): no import cycles (type-only imports count), layers meet only
// at their entries (src/<layer>/index.ts), and no module under src/ names a command-line flag.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import fincheck from './scripts/eslint/plugin.js';

/** A string or template text that names a command-line flag (`--grid`, "--reference 2d"). */
const flagPattern = String.raw`/(^|[\s\x60'"(])--[a-z]/`;
const noFlagNames = [
  'error',
  {
    selector: `Literal[value=${flagPattern}]`,
    message: "Only cli/ knows the command-line flags: throw a domain error in the problem's words and let cli/ name the flag.",
  },
  {
    selector: `TemplateElement[value.raw=${flagPattern}]`,
    message: "Only cli/ knows the command-line flags: throw a domain error in the problem's words and let cli/ name the flag.",
  },
];

export default tseslint.config(
  {
    ignores: [
      'node_modules/**',
      'dist/**',
      'out/**',
      'fincheck-demo-output/**',
      '.tsbuild/**',
      'tests/guard-rails/fixtures/**',
      'src/fd/wasm/assembly/**',
    ],
  },
  {
    files: ['**/*.ts', '**/*.js', '**/*.mjs'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    plugins: { fincheck },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      'fincheck/no-import-cycle': 'error',
      // A name starting with _ is unused on purpose (a skipped tuple element, a destructured-away key).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
    },
  },
  {
    files: ['scripts/**/*.js', 'scripts/**/*.mjs', 'eslint.config.js'],
    languageOptions: { globals: { process: 'readonly', console: 'readonly' } },
  },
  {
    files: ['src/**/*.ts', 'cli/**/*.ts'],
    rules: { 'fincheck/layer-entry': 'error' },
  },
  {
    files: ['src/**/*.ts'],
    rules: { 'no-restricted-syntax': noFlagNames },
  },
);
