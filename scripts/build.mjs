// Bundles the CLI, the library and the map worker into ESM files in dist/ (no TypeScript at run time,
// tree-shaken mathjs). One build with code splitting: the three entries share chunks (dist/chunk-*.js), and a
// module imported with `import()` (a command, the 2-D and 3-D solvers, the report) is its own chunk, loaded only
// when a run needs it. Chunks sit beside the entries in dist/, so `new URL('./map-worker.js', import.meta.url)`
// and createRequire(import.meta.url) resolve the same from any of them. Native or WASM packages, and PDFKit
// (it reads its font metrics from its own folder at run time), stay external and load lazily.
import { chmodSync, cpSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join, resolve } from 'node:path';
import { build } from 'esbuild';
import { compileCachedScript, runCachedScript } from './cached-script.mjs';

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
 * dist/vendor.cjs (CommonJS) and loaded through scripts/cached-script.mjs with V8's code cache, which Node 20 has for
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
 * Resolves fincheck's imports of the vendor packages to modules that re-export one shared loadCachedScript() result; the
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
      contents: `import { loadCachedScript } from ${JSON.stringify(resolve('scripts/cached-script.mjs'))};\nexport const vendor = loadCachedScript(new URL('./vendor.cjs', import.meta.url));\n`,
      resolveDir: process.cwd(),
    }));
  },
};

/** Packages loaded from node_modules at run time (native or WASM code, or files read from their own folders). */
const EXTERNAL = ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'];

rmSync('dist', { recursive: true, force: true, maxRetries: 3 });

// The charts' font subsets and their license (src/images/chart-font-subset.ts), in fonts/ beside the bundles, where
// src/images/render.ts looks for them from dist as from src.
cpSync('src/images/fonts', 'dist/fonts', { recursive: true });

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
  const script = compileCachedScript(file, undefined);
  runCachedScript(script, file);
  writeFileSync(`${file}.cache`, script.createCachedData());
}

await build({
  entryPoints: {
    // The library entry (package.json exports '.'): src/api, for `import { check } from 'fincheck'`. Its
    // declarations are written by `npm pack` (prepack: tsconfig.lib.json), not on every build.
    lib: 'src/api/index.ts',
    // The map command's worker thread (src/map/worker.ts): dist/fincheck.cjs starts dist/map-worker.js beside it
    // (src/map/worker-start.ts).
    'map-worker': 'src/map/worker.ts',
    // The fd-3d worker thread of a heat-sink check (src/fd/three-d/sink-lane-worker.ts), started as
    // dist/sink-worker.js beside the chunk that runs the check (src/fd/three-d/sink-lanes.ts).
    'sink-worker': 'src/fd/three-d/sink-lane-worker.ts',
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
  external: EXTERNAL,
  logLevel: 'warning',
});

/**
 * One CommonJS file in dist/ (`<name>.cjs`) from `entry`: import.meta.url is the file's own URL (a banner sets it
 * from __filename), and import() becomes require (a classic script has no import(): the packages imported on demand,
 * the rasteriser and the PDF writer, are CommonJS and are required when first asked for, as before).
 */
async function commonJsBundle(name, entry, extra) {
  await build({
    entryPoints: { [name]: entry },
    outdir: 'dist',
    outExtension: { '.js': '.cjs' },
    bundle: true,
    platform: 'node',
    format: 'cjs',
    target: 'node20',
    minifyWhitespace: true,
    minifySyntax: true,
    charset: 'ascii',
    define: { 'import.meta.url': '__fileUrl' },
    banner: { js: "var __fileUrl = require('node:url').pathToFileURL(__filename).href;" },
    supported: { 'dynamic-import': false },
    logLevel: 'warning',
    ...extra,
  });
}

// The command (package.json bin): cli/main.ts as dist/fincheck.cjs, CommonJS (Node starts it without its ES-module
// loader; its hashbang stays on the first line). It answers --version itself and loads dist/program.cjs for the rest;
// its fallback to the program's modules (run from the sources) stays an unresolved require here, never reached.
await commonJsBundle('fincheck', 'cli/main.ts', { external: ['./program-exports.js'] });
chmodSync('dist/fincheck.cjs', 0o755);

// The command-line program (cli/program-exports.ts: every command, the solvers they call) as one classic script,
// dist/program.cjs, which dist/fincheck.cjs loads with its V8 code cache (scripts/cached-script.mjs). Its imports of the
// vendor packages read dist/vendor.cjs as the chunks do; the workers (dist/map-worker.js, dist/sink-worker.js) and
// dist/vendor.cjs are found beside it. A command the program imports on demand is bundled in, and its module's top
// level runs only when the command is asked for (esbuild's lazy init).
await commonJsBundle('program', 'cli/program-exports.ts', { plugins: [vendorBundle], external: EXTERNAL });

// The program's code cache, made after one run of `check` on the demo fin (output discarded): V8's cache holds the
// functions compiled by then, so a check starts without parsing or compiling the functions it calls (measured on the
// demo fin: about 15 ms of every run). Other commands compile what they add, as before.
{
  const file = resolve('dist/program.cjs');
  const script = compileCachedScript(file, undefined);
  const program = runCachedScript(script, file);
  const io = program.bufferIo();
  const code = await program.runCli(['check', 'demo/inverter-plate-fin.yaml'], io);
  if (code !== 0) throw new Error(`build: the program's warm-up check exited with ${code}: ${io.stderr()}`);
  writeFileSync(`${file}.cache`, script.createCachedData());
}
