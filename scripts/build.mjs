// Bundles the CLI, the library and the map worker into ESM files in dist/ (no TypeScript at run time,
// tree-shaken mathjs). One build with code splitting: the three entries share chunks (dist/chunk-*.js), and a
// module imported with `import()` (a command, the 2-D and 3-D solvers, the report) is its own chunk, loaded only
// when a run needs it. Chunks sit beside the entries in dist/, so `new URL('./map-worker.js', import.meta.url)`
// and createRequire(import.meta.url) resolve the same from any of them. Native or WASM packages, and PDFKit
// (it reads its font metrics from its own folder at run time), stay external and load lazily.
import { rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { build } from 'esbuild';
import { runVendorScript, vendorScript } from './vendor-loader.mjs';

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

/**
 * The third-party packages every command loads, with the names fincheck imports from each: bundled apart into
 * dist/vendor.cjs (CommonJS) and loaded through scripts/vendor-loader.mjs with V8's code cache, which Node 20 has for
 * classic scripts only. A name imported from one of them that is not listed here fails the build ("No matching
 * export"): add it to the list.
 */
const VENDOR_EXPORTS = {
  zod: ['z'],
  yaml: ['LineCounter', 'isMap', 'isScalar', 'isSeq', 'parseDocument'],
  mathjs: ['createBigNumberClass', 'createComplexClass', 'createFractionClass', 'createUnitClass'],
  commander: ['Command', 'CommanderError'],
};
const VENDOR_FILTER = new RegExp(`^(${Object.keys(VENDOR_EXPORTS).join('|')})$`);

/**
 * Resolves fincheck's imports of the vendor packages to modules that re-export one shared loadVendor() result; the
 * shared module finds dist/vendor.cjs beside its own chunk (import.meta.url).
 */
const vendorBundle = {
  name: 'vendor-bundle',
  setup(b) {
    b.onResolve({ filter: VENDOR_FILTER }, (args) => (args.importer.includes('node_modules') ? undefined : { path: args.path, namespace: 'vendor' }));
    b.onResolve({ filter: /^vendor-instance$/ }, () => ({ path: 'vendor-instance', namespace: 'vendor-instance' }));
    b.onLoad({ filter: /.*/, namespace: 'vendor' }, (args) => ({
      contents: `import { vendor } from 'vendor-instance';\nexport const { ${VENDOR_EXPORTS[args.path].join(', ')} } = vendor;\n`,
      resolveDir: process.cwd(),
    }));
    b.onLoad({ filter: /.*/, namespace: 'vendor-instance' }, () => ({
      contents: `import { loadVendor } from ${JSON.stringify(resolve('scripts/vendor-loader.mjs'))};\nexport const vendor = loadVendor(new URL('./vendor.cjs', import.meta.url));\n`,
      resolveDir: process.cwd(),
    }));
  },
};

rmSync('dist', { recursive: true, force: true, maxRetries: 3 });

// The vendor bundle (CommonJS, one file) and its code cache, made by compiling and running it here once (a cache
// made after the run also holds the functions its top level compiled).
await build({
  stdin: {
    contents: Object.entries(VENDOR_EXPORTS)
      .map(([pkg, names]) => `export { ${names.join(', ')} } from ${JSON.stringify(pkg)};`)
      .join('\n'),
    resolveDir: process.cwd(),
    sourcefile: 'vendor-entry.js',
  },
  outfile: 'dist/vendor.cjs',
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  minifyWhitespace: true,
  minifySyntax: true,
  charset: 'ascii',
  plugins: [zodEnglishOnly],
  logLevel: 'warning',
});
{
  const file = resolve('dist/vendor.cjs');
  const script = vendorScript(file, undefined);
  runVendorScript(script, file);
  writeFileSync(`${file}.cache`, script.createCachedData());
}

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
  plugins: [vendorBundle],
  // Bundled CommonJS code (and createRequire users) call require: every file gets one.
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  external: ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'],
  logLevel: 'warning',
});
