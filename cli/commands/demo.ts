/**
 * `fincheck demo` (what `npm start` runs): `fincheck check` on the bundled demo case, printed, then
 * the demo's charts and report written into a folder it names (default ./fincheck-demo-output/); then the same
 * for the bundled heat-sink demo (the fd-3d reference and the array shortcuts), its report in heat-sink/ inside
 * that folder.
 */
import { existsSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Command } from 'commander';
import { loadAnyCase, loadCase } from '../../src/case/index.js';
import { formatCheck, formatSinkCheck } from '../../src/compare/index.js';
import { UsageError } from '../../src/errors.js';
import { reportDate } from '../../src/report/index.js';
import type { Io } from '../io.js';
import { parseOutDir, writeReport, writeSinkReport } from './report.js';

export const DEMO_CASE = 'demo/inverter-plate-fin.yaml';
export const DEMO_OUTPUT = 'fincheck-demo-output';
export const DEMO_SINK_CASE = 'demo/motor-drive-sink.yaml';
/** The heat-sink demo's report, inside the demo folder. */
export const DEMO_SINK_FOLDER = 'heat-sink';

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
    .description(`run \`fincheck check\` on the bundled demo fin (${DEMO_CASE}) and heat sink (${DEMO_SINK_CASE}) and write their charts and reports`)
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

      const sinkFile = join(projectRoot(), DEMO_SINK_CASE);
      const sinkCase = loadAnyCase(sinkFile);
      if (sinkCase.kind !== 'heat-sink') throw new Error(`${DEMO_SINK_CASE} is not a heat-sink case`);
      const sinkDir = join(outDir, DEMO_SINK_FOLDER);
      const sink = await writeSinkReport({ case: sinkCase.case, caseFile: sinkFile, outDir: sinkDir, tolerance: 0.02, dpi: 96, date });
      io.out(`\n$ fincheck check ${shown(sinkFile)}\n\n`);
      io.out(formatSinkCheck(sink.case, sink.check));
      io.out(`\nCharts and report of the heat-sink check (fincheck report ${shown(sinkFile)} --out ${shown(sinkDir)}):\n`);
      io.out(`  ${shown(sink.html)}   open in a browser; prints to A4\n`);
      io.out(`  ${shown(sink.markdown)}\n`);
      for (const image of sink.images) io.out(`  ${shown(image)}\n`);
    });
}
