#!/usr/bin/env node
/**
 * Entry point of the `fincheck` command (bundled to dist/fincheck.js). It stays tiny: `--version` is answered
 * here, before anything else loads; every other run imports the program (cli/run.ts), which loads only the
 * command it names.
 */
import { VERSION } from '../src/version.js';

const argv = process.argv.slice(2);

// A reader that stops early (`fincheck ... | head`) is not an error.
process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw e;
});

if (argv.length === 1 && (argv[0] === '--version' || argv[0] === '-V')) {
  process.stdout.write(`${VERSION}\n`);
} else {
  const [{ processIo }, { runCli }] = await Promise.all([import('./io.js'), import('./run.js')]);
  process.exitCode = await runCli(argv, processIo());
}
