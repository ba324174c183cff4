/** Entry point of the `fincheck` command (bundled to dist/fincheck.js). */
import { processIo } from './io.js';
import { runCli } from './run.js';

// A reader that stops early (`fincheck ... | head`) is not an error.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});

process.exitCode = await runCli(process.argv.slice(2), processIo());
