// Bundles the CLI, the library and the map worker into ESM files in dist/ (no TypeScript at run time,
// tree-shaken mathjs). One build with code splitting: the three entries share chunks (dist/chunk-*.js), and a
// module imported with `import()` (a command, the 2-D and 3-D solvers, the report) is its own chunk, loaded only
// when a run needs it. Chunks sit beside the entries in dist/, so `new URL('./map-worker.js', import.meta.url)`
// and createRequire(import.meta.url) resolve the same from any of them. Native or WASM packages, and PDFKit
// (it reads its font metrics from its own folder at run time), stay external and load lazily.
import { rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { build } from 'esbuild';

/**
 * zod's namespace object re-exports its 100-odd message locales (`z.locales`, about 350 kB of the bundle, a sixth of
 * the start-up of `fincheck check`); fincheck words its own messages and zod uses English (`config(en())` in zod's
 * classic entry). This plugin gives zod's locales index the English locale alone.
 */
const zodEnglishOnly = {
  name: 'zod-english-only',
  setup(b) {
    const zodRoot = dirname(createRequire(import.meta.url).resolve('zod/package.json'));
    b.onResolve({ filter: /^\.\.\/locales\/index\.js$/ }, (args) =>
      args.importer.startsWith(zodRoot) ? { path: 'zod-locales-en', namespace: 'zod-english-only' } : undefined,
    );
    b.onLoad({ filter: /.*/, namespace: 'zod-english-only' }, () => ({
      contents: `export { default as en } from ${JSON.stringify(join(zodRoot, 'v4/locales/en.js'))};`,
      resolveDir: zodRoot,
    }));
  },
};

rmSync('dist', { recursive: true, force: true, maxRetries: 3 });

await build({
  entryPoints: {
    // The command (package.json bin): cli/main.ts (its hashbang stays on the first line) answers --version itself and
    // imports the rest on demand.
    fincheck: 'cli/main.ts',
    // The library entry (package.json exports '.'): src/api, for `import { check } from 'fincheck'`. Its
    // declarations are written by `npm pack` (prepack: tsconfig.lib.json), not on every build.
    lib: 'src/api/index.ts',
    // The map command's worker thread (src/map/worker.ts): dist/fincheck.js starts dist/map-worker.js beside it
    // (src/map/worker-start.ts).
    'map-worker': 'src/map/worker.ts',
  },
  outdir: 'dist',
  chunkNames: 'chunk-[hash]',
  bundle: true,
  splitting: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  // Less text to parse at start-up (identifiers kept: stack traces of an internal error stay readable).
  minifyWhitespace: true,
  minifySyntax: true,
  // ASCII output (strings escaped): V8 holds a chunk with one non-ASCII character as a two-byte string, slower to decode
  // and scan (about 10 ms of every start-up for the 670 kB vendor chunk). esbuild leaves regular-expression literals as
  // written, so patterns in src/ spell non-ASCII characters as \u escapes (src/case/units.ts).
  charset: 'ascii',
  plugins: [zodEnglishOnly],
  // Bundled CommonJS code (and createRequire users) call require: every file gets one.
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  external: ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'],
  logLevel: 'warning',
});
