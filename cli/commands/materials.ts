/** `fincheck materials`: the built-in materials with k and the published source of each value. */
import type { Command } from 'commander';
import { builtInMaterials } from '../../src/case/index.js';
import type { Io } from '../io.js';

export function registerMaterials(program: Command, io: Io): Command {
  return program
    .command('materials')
    .description('list the built-in materials: conductivity near room temperature and its published source')
    .option('--json', 'print one JSON document')
    .addHelpText('after', '\nExamples:\n  fincheck materials\n  fincheck materials --json')
    .action((o: { json?: boolean }) => {
      if (o.json) {
        const list = builtInMaterials.map((m) => ({ name: m.name, description: m.description, k_W_per_mK: m.k, source: m.source }));
        io.out(`${JSON.stringify({ materials: list }, null, 2)}\n`);
        return;
      }
      const w = Math.max(...builtInMaterials.map((m) => m.name.length)) + 2;
      io.out(`${'name'.padEnd(w)}${'k [W/(m*K)]'.padStart(12)}  description; source\n`);
      for (const m of builtInMaterials) {
        io.out(`${m.name.padEnd(w)}${String(m.k).padStart(12)}  ${m.description}\n${' '.repeat(w + 14)}source: ${m.source}\n`);
      }
      io.out('\nValues are near room temperature; alloys vary by temper and grade. Give material: { k: ... } for a measured value.\n');
    });
}
