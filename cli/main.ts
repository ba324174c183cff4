/** Entry point of the `fincheck` command (bundled to dist/fincheck.js). */
import { processIo } from './io.js';
import { runCli } from './run.js';

process.exitCode = await runCli(process.argv.slice(2), processIo());
