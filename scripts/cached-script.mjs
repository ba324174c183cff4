// Loads a CommonJS bundle of fincheck's (dist/vendor.cjs, the third-party code every command needs, and dist/program.cjs,
// the command-line program) as a classic script with V8's code cache beside it (`<bundle>.cache`, which
// scripts/build.mjs writes).
//
// Why: Node 20 keeps no compiled ES module between runs (node:module's enableCompileCache is Node 22.1+), so V8
// parsed this code on every start-up (measured: loading the vendor bundle 75-85 ms CPU without the cache, 41-48 ms with
// it, load about 10). A cache from another Node version or other V8 flags is rejected by V8 (script.cachedDataRejected)
// and the source compiled as usual: the same code runs either way, only slower.
//
// scripts/build.mjs bundles this file into dist (the bundle's `zod`, `yaml`, `mathjs` and `commander` imports read the
// exports of one loadCachedScript call; dist/fincheck.cjs loads dist/program.cjs with it) and calls compileCachedScript
// and runCachedScript itself to write the caches.
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Script } from 'node:vm';

/**
 * The bundle compiled as Node's own CommonJS loader wraps a file (one function of exports, require, module,
 * __filename, __dirname), with the cache when given. The file is ASCII (esbuild charset ascii), so latin1 reads it
 * as written without a UTF-8 decode.
 */
export function compileCachedScript(file, cachedData) {
  const source = readFileSync(file, 'latin1');
  return new Script(`(function (exports, require, module, __filename, __dirname) {${source}\n})`, { filename: file, cachedData });
}

/**
 * Built-in modules the vendor bundle requires at load but fincheck never uses: commander requires child_process for
 * subcommands that are separate executables (fincheck has none); loading it costs ~5 ms of every start-up. The
 * bundle gets an object that loads the module on its first property access.
 */
const LOADED_ON_USE = new Set(['child_process', 'node:child_process']);

function bundleRequire(file) {
  const load = createRequire(file);
  return (id) => {
    if (!LOADED_ON_USE.has(id)) return load(id);
    let loaded;
    return new Proxy({}, { get: (_target, key) => (loaded ??= load(id))[key] });
  };
}

/** Runs the compiled bundle once and returns its exports. */
export function runCachedScript(script, file) {
  const module = { exports: {} };
  script.runInThisContext()(module.exports, bundleRequire(file), module, file, dirname(file));
  return module.exports;
}

/** The exports of the bundle at `url` (a file: URL), compiled from its cache when one lies beside it. */
export function loadCachedScript(url) {
  const file = fileURLToPath(url);
  const cache = `${file}.cache`;
  return runCachedScript(compileCachedScript(file, existsSync(cache) ? readFileSync(cache) : undefined), file);
}
