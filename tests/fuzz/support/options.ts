/** The options each command accepts, read from its own --help (so advice in a message can be checked against them). */
import { cli } from '../../cli/run.js';

const cache = new Map<string, string[]>();

export async function commandOptions(command: string): Promise<string[]> {
  const known = cache.get(command);
  if (known) return known;
  const help = await cli(command, '--help');
  const options = [...new Set([...help.stdout.matchAll(/--[a-z][a-z-]*/g)].map((m) => m[0]))];
  cache.set(command, options);
  return options;
}
