#!/usr/bin/env node
/**
 * Entry point of the `fincheck` command, bundled to dist/fincheck.cjs (package.json bin): a CommonJS file, which
 * Node starts without its ES-module loader (about 20 ms less CPU per run than an ES-module entry, measured on
 * `check --reference 1d`). It stays tiny: `--version` is answered here, before anything else loads; every other run
 * loads the program (cli/program-exports.ts), which loads only the command it names. Built, the program is
 * dist/program.cjs beside this file, compiled from its V8 code cache (scripts/cached-script.mjs: Node 20 caches no ES
 * module, and parsing and compiling the program's functions cost every start-up about 15 ms); from the TypeScript
 * sources (`tsx cli/main.ts`), the module itself.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { VERSION } from '../src/version.js';

type Program = typeof import('./program-exports.js');

const argv = process.argv.slice(2);

// A reader that stops early (`fincheck ... | head`) is not an error.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});

async function loadProgram(): Promise<Program> {
  const bundled = new URL('./program.cjs', import.meta.url);
  if (!existsSync(fileURLToPath(bundled))) return import('./program-exports.js');
  const { loadCachedScript } = await import('../scripts/cached-script.mjs');
  return loadCachedScript(bundled) as Program;
}

async function main(): Promise<void> {
  const { processIo, runCli } = await loadProgram();
  process.exitCode = await runCli(argv, processIo());
}

if (argv.length === 1 && (argv[0] === '--version' || argv[0] === '-V')) {
  process.stdout.write(`${VERSION}\n`);
} else {
  // runCli answers every error with its exit code; a rejection here would be a bug, and Node reports it as one.
  void main();
}
