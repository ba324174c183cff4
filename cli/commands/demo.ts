/**
 * `fincheck demo` (what `npm start` runs): `fincheck check` on the bundled demo case, printed, then
 * the demo's charts and report written into a folder it names (default ./fincheck-demo-output/).
 */
import { existsSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Command } from 'commander';
import { loadCase } from '../../src/case/index.js';
import { formatCheck } from '../../src/compare/index.js';
import { UsageError } from '../../src/errors.js';
import { reportDate } from '../../src/report/index.js';
import type { Io } from '../io.js';
import { parseOutDir, writeReport } from './report.js';

export const DEMO_CASE = 'demo/inverter-plate-fin.yaml';
export const DEMO_OUTPUT = 'fincheck-demo-output';

/** The project folder: where demo/ lives, from src (tsx, vitest) or from the bundle in dist/. */
export function projectRoot(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let i = 0; i < 5; i++) {
    if (existsSync(join(dir, 'package.json')) && existsSync(join(dir, 'demo'))) return dir;
    dir = dirname(dir);
  }
  throw new UsageError('cannot find the demo/ folder next to the fincheck installation');
}

/** A path as the user would type it from the current folder. */
function shown(path: string): string {
  const r = relative(process.cwd(), path);
  return r === '' ? path : r.startsWith('..') ? path : `./${r}`;
}

export function registerDemo(program: Command, io: Io): Command {
  return program
    .command('demo')
    .description(`run \`fincheck check\` on the bundled demo case (${DEMO_CASE}) and write its charts and report`)
    .option('--out <dir>', 'folder for the demo report and charts', DEMO_OUTPUT)
    .addHelpText('after', '\nExamples:\n  npm start          # the same as: fincheck demo\n  fincheck demo --out /tmp/fin-demo')
    .action(async (o: { out: string }) => {
      const outDir = parseOutDir(o.out);
      const date = reportDate(undefined, process.env.SOURCE_DATE_EPOCH);
      const file = join(projectRoot(), DEMO_CASE);
      const written = await writeReport({ case: loadCase(file), caseFile: file, outDir, tolerance: 0.02, reference: 'auto', dpi: 96, date });
      io.out(`$ fincheck check ${shown(file)}\n\n`);
      io.out(formatCheck(written.case, written.check));
      io.out(`\nCharts and report of this check (fincheck report ${shown(file)} --out ${shown(outDir)}):\n`);
      io.out(`  ${shown(written.html)}   open in a browser; prints to A4\n`);
      io.out(`  ${shown(written.markdown)}\n`);
      for (const image of written.images) io.out(`  ${shown(image)}\n`);
    });
}
