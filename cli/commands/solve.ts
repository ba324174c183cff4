/** `fincheck solve CASE`: the numerical solution alone, with its discretisation error. */
import type { Command } from 'commander';
import { loadCase } from '../../src/case/parse.js';
import { runSolve, type SolveReport } from '../../src/compare/solve.js';
import { describeCase } from '../../src/compare/describe-case.js';
import type { Io } from '../io.js';
import { nodesOption, parseOption } from '../options.js';

export function registerSolve(program: Command, io: Io): Command {
  return program
    .command('solve')
    .argument('<case>', 'case file (YAML or JSON)')
    .description('solve the fin with finite volumes; by default a refinement study gives the discretisation error')
    .option('--nodes <n>', 'solve once on exactly n nodes (no refinement study, discretisation error null)')
    .option('--json', 'print one JSON document (outputs.md) with the temperature profile')
    .addHelpText(
      'after',
      `
Examples:
  fincheck solve demo/inverter-plate-fin.yaml
  fincheck solve demo/motor-housing-tapered-fin.yaml --nodes 200 --json`,
    )
    .action((file: string, o: { nodes?: string; json?: boolean }) => {
      const nodes = o.nodes === undefined ? undefined : parseOption('--nodes', nodesOption, o.nodes, 'a whole number of nodes from 3 to 10000000');
      const c = loadCase(file);
      const { report } = runSolve(c, nodes === undefined ? {} : { nodes });
      io.out(o.json ? `${JSON.stringify(report, null, 2)}\n` : formatSolve(report, describeCase(c)));
    });
}

function formatSolve(r: SolveReport, description: string[]): string {
  const lines = [`fincheck solve: ${r.case}`, ...description.map((d) => `  ${d}`), ''];
  const err = r.discretizationError === null ? 'not estimated (single grid)' : `${r.discretizationError.toExponential(1)} relative (GCI${r.observedOrder === null ? '' : `, observed order ${r.observedOrder.toFixed(2)}`})`;
  lines.push(`Model ${r.model}, ${r.grid.nodes} nodes`);
  lines.push(`  heat rate      ${r.heatRate_W.toPrecision(6)} W  (discretisation error ${err})`);
  lines.push(`  efficiency     ${r.efficiency.toFixed(5)}`);
  lines.push(`  effectiveness  ${r.effectiveness.toPrecision(4)}`);
  lines.push(`  energy balance ${r.energyBalance.toExponential(1)} (|Q_base - Q_surfaces| / Q_base)`);
  lines.push('', '  x [mm]     T [degC]');
  const pts = r.profile;
  const want = Math.min(11, pts.length);
  for (let j = 0; j < want; j++) {
    const p = pts[Math.round((j * (pts.length - 1)) / Math.max(1, want - 1))];
    if (p) lines.push(`  ${(p.x_m * 1000).toFixed(3).padStart(8)}   ${p.T_degC.toFixed(3).padStart(9)}`);
  }
  lines.push('', 'Estimates of the stated model: confirm by test; h is usually the largest uncertainty.');
  return `${lines.join('\n')}\n`;
}
