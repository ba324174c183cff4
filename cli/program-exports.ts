/**
 * What the command-line program exports to its entry (cli/main.ts): run a command line, and the two kinds of
 * input/output. Bundled by scripts/build.mjs into dist/program.cjs, a classic script that dist/fincheck.cjs loads with
 * its V8 code cache (scripts/cached-script.mjs); run from the TypeScript sources, cli/main.ts imports this module.
 */
export { runCli } from './run.js';
export { bufferIo, processIo } from './io.js';
