/** The `fincheck` program: one command a file under cli/commands/. */
import { Command, type OutputConfiguration } from 'commander';
import type { Io, SetExit } from './io.js';
import { registerCheck } from './commands/check.js';
import { registerSolve } from './commands/solve.js';
import { registerMaterials } from './commands/materials.js';
import { registerSchema } from './commands/schema.js';
import { registerDemo } from './commands/demo.js';
import { registerPlot } from './commands/plot.js';
import { registerReport } from './commands/report.js';
import { registerMap } from './commands/map.js';
import { registerOptimize } from './commands/optimize.js';
import { VERSION } from '../src/version.js';

export function buildProgram(io: Io, setExit: SetExit): Command {
  const program = new Command();
  program
    .name('fincheck')
    // One paragraph: commander wraps it to the terminal width (a hard line break here left a stray break).
    .description(
      'Solves a fin numerically (finite volumes along and across it) and shows how far the textbook ' +
        'shortcuts (tanh(mL)/(mL), corrected length, closed forms) drift from the solution, and why.',
    )
    .version(VERSION, '-V, --version')
    .exitOverride()
    .showHelpAfterError('fincheck: run with --help for usage and examples')
    .configureOutput(output(io));
  for (const register of [
    registerCheck,
    registerSolve,
    registerMaterials,
    registerSchema,
    registerPlot,
    registerReport,
    registerDemo,
    registerMap,
    registerOptimize,
  ]) {
    const cmd = register(program, io, setExit);
    cmd.exitOverride().configureOutput(output(io));
  }
  return program;
}

/**
 * Where commander writes: help to stdout, its usage errors to stderr, reworded from "error: ..." to
 * "fincheck: ..." like every other error line (cli/run.ts then exits with 2).
 */
function output(io: Io): OutputConfiguration {
  return {
    writeOut: (s) => io.out(s),
    writeErr: (s) => io.err(s),
    outputError: (s, write) => write(s.replace(/^error: /, 'fincheck: ')),
  };
}
