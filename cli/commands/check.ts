/** `fincheck check CASE`: the reference solution against every applicable shortcut. */
import type { Command } from 'commander';
import { parseAnyCaseText } from '../../src/case/index.js';
import { UsageError } from '../../src/errors.js';
import { formatCheck, formatSinkCheck, resolvedSinkStudy, runCheck, runSinkCheck } from '../../src/compare/index.js';
import { printWarnings, readCaseInput } from '../case-input.js';
import type { Io, SetExit } from '../io.js';
import { requireReference } from '../model-coverage.js';
import { parseOption, referenceOption, sampleOption, toleranceOption } from '../options.js';

export function registerCheck(program: Command, io: Io, setExit: SetExit): Command {
  return program
    .command('check')
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
    .description('solve the fin and show how far each textbook shortcut drifts from the solution, and why')
    .option('--tolerance <t>', 'drift accepted as ok, e.g. 2% or 0.02', '2%')
    .option('--reference <model>', 'reference model: auto (2-D where the case allows), 1d or 2d', 'auto')
    .option('--json', 'print one JSON document instead of the table (its keys: README, "JSON output")')
    .option('--strict', 'exit with code 1 when any shortcut is unsafe')
    .option('--sample <when>', 'confirm the uncertainty band by a Latin-hypercube sample: auto (nonlinear fins, bands over 20 %), always or never', 'auto')
    .addHelpText(
      'after',
      `
Examples:
  fincheck check demo/inverter-plate-fin.yaml
  fincheck check demo/polymer-fin-liquid-cooled.yaml --tolerance 5% --json
  fincheck check my-fin.yaml --strict        # exit 1 when a shortcut is unsafe`,
    )
    .action(async (file: string, o: { tolerance: string; reference: string; json?: boolean; strict?: boolean; sample: string }) => {
      const tolerance = parseOption('--tolerance', toleranceOption, o.tolerance);
      const reference = parseOption('--reference', referenceOption, o.reference, 'auto, 1d or 2d');
      const sample = parseOption('--sample', sampleOption, o.sample, 'auto, always or never');
      const { text, fileName } = await readCaseInput(file, io);
      const any = parseAnyCaseText(text, fileName);
      printWarnings(any.case.warnings ?? [], io);
      if (any.kind === 'heat-sink') {
        // A heat sink: the fd-3d reference (resolved to a tenth of the tolerance where the budget allows) and the array shortcuts.
        if (reference !== 'auto')
          throw new UsageError(
            `--reference ${reference}: a heat sink's reference is fd-3d (the plate in 3-D, every fin conducting); leave --reference at auto`,
          );
        const sink = any.case;
        const report = await runSinkCheck(sink, (s) => resolvedSinkStudy(s, tolerance), { tolerance });
        io.out(o.json ? `${JSON.stringify({ ...report, warnings: sink.warnings ?? [] }, null, 2)}\n` : formatSinkCheck(sink, report));
        if (o.strict && report.models.some((m) => m.verdict === 'unsafe')) setExit(1);
        return;
      }
      const c = any.case;
      requireReference(c, reference);
      const { report } = await runCheck(c, { tolerance, reference, sample });
      io.out(o.json ? `${JSON.stringify({ ...report, warnings: c.warnings ?? [] }, null, 2)}\n` : formatCheck(c, report));
      if (o.strict && report.models.some((m) => m.verdict === 'unsafe')) setExit(1);
    });
}
