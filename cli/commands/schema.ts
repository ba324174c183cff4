/** `fincheck schema`: the JSON Schema of a case file, or (--output NAME) of a command's JSON output. */
import type { Command } from 'commander';
import { caseJsonSchema } from '../../src/case/index.js';
import { OUTPUT_SCHEMA_NAMES, outputJsonSchema } from '../../src/outputs/index.js';
import { z } from 'zod';
import type { Io } from '../io.js';
import { parseOption } from '../options.js';

const outputOption = z.enum(OUTPUT_SCHEMA_NAMES);

export function registerSchema(program: Command, io: Io): Command {
  return program
    .command('schema')
    .description("print the JSON Schema of a case file (for editors and validators), or of a command's --json output")
    .option('--output <command>', `the schema of a command's --json output: ${OUTPUT_SCHEMA_NAMES.join(', ')} (check-many: check with several cases)`)
    .addHelpText('after', '\nExamples:\n  fincheck schema > fincheck-case.schema.json\n  fincheck schema --output check > fincheck-check.schema.json')
    .action((o: { output?: string }) => {
      const schema =
        o.output === undefined ? caseJsonSchema() : outputJsonSchema(parseOption('--output', outputOption, o.output, OUTPUT_SCHEMA_NAMES.join(', ')));
      io.out(`${JSON.stringify(schema, null, 2)}\n`);
    });
}
