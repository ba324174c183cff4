/** `fincheck schema`: the JSON Schema of a case file. */
import type { Command } from 'commander';
import { caseJsonSchema } from '../../src/case/index.js';
import type { Io } from '../io.js';

export function registerSchema(program: Command, io: Io): Command {
  return program
    .command('schema')
    .description('print the JSON Schema of a case file (for editors and validators)')
    .addHelpText('after', '\nExamples:\n  fincheck schema > fincheck-case.schema.json')
    .action(() => {
      io.out(`${JSON.stringify(caseJsonSchema(), null, 2)}\n`);
    });
}
