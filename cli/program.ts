/** The `fincheck` program: one command a file under cli/commands/. */
import { Command } from 'commander';
import type { Io, SetExit } from './io.js';
import { registerCheck } from './commands/check.js';
import { registerSolve } from './commands/solve.js';
import { registerMaterials } from './commands/materials.js';
import { registerSchema } from './commands/schema.js';
import { registerDemo } from './commands/demo.js';
import { registerPlot } from './commands/plot.js';
import { registerReport } from './commands/report.js';
import { registerMap } from './commands/map.js';
import { VERSION } from '../src/version.js';

export function buildProgram(io: Io, setExit: SetExit): Command {
  const program = new Command();
  program
    .name('fincheck')
    .description(
      'Solves a fin numerically (finite volumes along and across it) and shows how far the textbook\n' +
        'shortcuts (tanh(mL)/(mL), corrected length, closed forms) drift from the solution, and why.',
    )
    .version(VERSION, '-V, --version')
    .exitOverride()
    .showHelpAfterError('(run with --help for usage and examples)')
    .configureOutput({ writeOut: (s) => io.out(s), writeErr: (s) => io.err(s) });
  for (const register of [registerCheck, registerSolve, registerMaterials, registerSchema, registerPlot, registerReport, registerDemo, registerMap]) {
    const cmd = register(program, io, setExit);
    cmd.exitOverride().configureOutput({ writeOut: (s) => io.out(s), writeErr: (s) => io.err(s) });
  }
  return program;
}
