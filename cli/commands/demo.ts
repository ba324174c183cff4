/**
 * `fincheck demo` (what `npm start` runs): `fincheck check` on the bundled demo case, printed.
 */
import { existsSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Command } from 'commander';
import { loadCase } from '../../src/case/parse.js';
import { runCheck } from '../../src/compare/check.js';
import { formatCheck } from '../../src/compare/format-check.js';
import { UsageError } from '../../src/errors.js';
import type { Io } from '../io.js';

export const DEMO_CASE = 'demo/inverter-plate-fin.yaml';

/** The project folder: where demo/ lives, from src (tsx, vitest) or from the bundle in dist/. */
export function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 5; i++) {
    if (existsSync(join(dir, 'package.json')) && existsSync(join(dir, 'demo'))) return dir;
    dir = dirname(dir);
  }
  throw new UsageError('cannot find the demo/ folder next to the fincheck installation');
}

export function registerDemo(program: Command, io: Io): Command {
  return program
    .command('demo')
    .description(`run \`fincheck check\` on the bundled demo case (${DEMO_CASE})`)
    .addHelpText('after', '\nExamples:\n  npm start          # the same as: fincheck demo\n  fincheck demo')
    .action(async () => {
      const root = projectRoot();
      const file = join(root, DEMO_CASE);
      const c = loadCase(file);
      const { report } = await runCheck(c, { tolerance: 0.02, reference: 'auto' });
      io.out(`$ fincheck check ${relative(process.cwd(), file) || file}\n\n`);
      io.out(formatCheck(c, report));
    });
}
