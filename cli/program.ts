/**
 * The `fincheck` program: one command a file under cli/commands/. A run loads only the command it names (each
 * command file and what it imports is its own chunk of the bundle, scripts/build.mjs): `fincheck check` does not
 * load the report, the charts or the 2-D and 3-D solvers' callers of other commands. Help on the whole program, `help`, or a
 * name that is no command load them all (commander lists them, or suggests the nearest).
 */
import { Command, type OutputConfiguration } from 'commander';
import type { Io, SetExit } from './io.js';
import { VERSION } from '../src/version.js';

type Register = (program: Command, io: Io, setExit: SetExit) => Command;

/** The commands in the order help lists them, each loaded on demand. */
const COMMANDS: ReadonlyArray<readonly [name: string, load: () => Promise<Register>]> = [
  ['check', async () => (await import('./commands/check.js')).registerCheck],
  ['solve', async () => (await import('./commands/solve.js')).registerSolve],
  ['materials', async () => (await import('./commands/materials.js')).registerMaterials],
  ['schema', async () => (await import('./commands/schema.js')).registerSchema],
  ['plot', async () => (await import('./commands/plot.js')).registerPlot],
  ['report', async () => (await import('./commands/report.js')).registerReport],
  ['demo', async () => (await import('./commands/demo.js')).registerDemo],
  ['map', async () => (await import('./commands/map.js')).registerMap],
  ['optimize', async () => (await import('./commands/optimize.js')).registerOptimize],
];

/** The command `argv` names (its first word that is not an option), when it is one of ours; else null. */
function namedCommand(argv: readonly string[]): string | null {
  const word = argv.find((a) => !a.startsWith('-'));
  return word !== undefined && COMMANDS.some(([name]) => name === word) ? word : null;
}

export async function buildProgram(io: Io, setExit: SetExit, argv: readonly string[]): Promise<Command> {
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
  const named = namedCommand(argv);
  const wanted = COMMANDS.filter(([name]) => named === null || name === named);
  const registers = await Promise.all(wanted.map(([, load]) => load()));
  for (const register of registers) {
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
