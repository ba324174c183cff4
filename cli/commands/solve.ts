/** `fincheck solve CASE`: the numerical solution alone, with its discretisation error. */
import type { Command } from 'commander';
import {
  describeCase,
  formatSinkSolve,
  pointPosition,
  runSolve,
  runSolve2D,
  sinkSolveReport,
  type Solve2DReport,
  type SolveReport,
} from '../../src/compare/index.js';
import { studySink } from '../../src/fd/index.js';
import { loadAnyCaseInput } from '../case-input.js';
import type { Io } from '../io.js';
import { requireModel2D } from '../model-coverage.js';
import { displayUnitsOf, gridOption, modelOption, nodesOption, parseOption, unitsHelp } from '../options.js';
import { inUnit, type DisplayUnits } from '../../src/case/index.js';
import { UsageError } from '../../src/errors.js';
import { grid2dIssue } from '../../src/fd/index.js';
import { sectionOf } from '../../src/mesh/index.js';

export function registerSolve(program: Command, io: Io): Command {
  return program
    .command('solve')
    .argument('<case>', 'case file (YAML or JSON); - reads it from standard input')
    .description('solve the fin (or the heat sink, fd-3d) with finite volumes; a refinement study gives the discretisation error')
    .option('--model <m>', '1d (finite volumes along the fin) or 2d (across the thickness too)', '1d')
    .option('--nodes <n>', '1-D: solve once on exactly n nodes (no refinement study, discretisation error null)')
    .option('--grid <NXxNY>', '2-D: solve once on exactly NX x NY nodes (no refinement study)')
    .option('--json', 'print one JSON document with the temperature profile (its keys: README, "JSON output")')
    .option('--units <system>', unitsHelp)
    .addHelpText(
      'after',
      `
Examples:
  fincheck solve demo/inverter-plate-fin.yaml
  fincheck solve demo/motor-housing-tapered-fin.yaml --nodes 200 --json
  fincheck solve demo/polymer-fin-liquid-cooled.yaml --model 2d
  fincheck solve demo/polymer-fin-liquid-cooled.yaml --model 2d --grid 400x40 --json
  fincheck solve demo/enclosure-fin-natural-convection.yaml --model 2d   # nonlinear: Newton on each grid
  fincheck solve demo/motor-drive-sink.yaml --json                       # a heat sink: fd-3d, three grids`,
    )
    .action(async (file: string, o: { model: string; nodes?: string; grid?: string; json?: boolean; units?: string }, command: Command) => {
      const model = parseOption('--model', modelOption, o.model, '1d or 2d');
      const nodes = o.nodes === undefined ? undefined : parseOption('--nodes', nodesOption, o.nodes, 'a whole number of nodes from 3 to 10000000');
      const grid = o.grid === undefined ? undefined : parseOption('--grid', gridOption, o.grid, 'NXxNY with whole numbers from 2 to 20000, e.g. 400x40');
      if (model === '1d' && grid !== undefined) throw new UsageError('--grid goes with --model 2d; use --nodes N for the 1-D model');
      if (model === '2d' && nodes !== undefined) throw new UsageError('--nodes goes with --model 1d; use --grid NXxNY for the 2-D model');
      displayUnitsOf(o.units, undefined);
      const any = await loadAnyCaseInput(file, io);
      if (any.kind === 'heat-sink') {
        // A heat sink: fd-3d on its three nested grids; the fin models' options do not apply.
        const given = ['model', 'nodes', 'grid'].filter((name) => command.getOptionValueSource(name) === 'cli');
        if (given.length > 0)
          throw new UsageError(
            `--${given[0]}: a heat sink is solved by fd-3d (the plate in 3-D, every fin conducting) on three nested grids; leave out --model, --nodes and --grid`,
          );
        const sink = any.case;
        const report = sinkSolveReport(sink, studySink(sink));
        io.out(
          o.json
            ? `${JSON.stringify({ ...report, warnings: sink.warnings ?? [] }, null, 2)}\n`
            : formatSinkSolve(sink, report, displayUnitsOf(o.units, sink.display)),
        );
        return;
      }
      const c = any.case;
      const u = displayUnitsOf(o.units, c.display);
      const warnings = c.warnings ?? [];
      const gridIssue = grid === undefined ? null : grid2dIssue(sectionOf(c.fin.profile), grid.nx, grid.ny);
      if (gridIssue !== null) throw new UsageError(`--grid: ${gridIssue}`);
      if (model === '2d') {
        requireModel2D(c);
        const { report } = runSolve2D(c, grid === undefined ? {} : { grid });
        io.out(o.json ? `${JSON.stringify({ ...report, warnings }, null, 2)}\n` : formatSolve2D(report, describeCase(c, u), u));
        return;
      }
      const { report } = runSolve(c, nodes === undefined ? {} : { nodes });
      io.out(o.json ? `${JSON.stringify({ ...report, warnings }, null, 2)}\n` : formatSolve(report, describeCase(c, u), u));
    });
}

/** The effectiveness line of a solve: the number, or n/a with the reason. */
function effectivenessLine(r: { effectiveness: number | null; effectivenessNote: string | null }): string {
  return `  effectiveness  ${r.effectiveness === null ? `n/a (${r.effectivenessNote ?? ''})` : r.effectiveness.toPrecision(4)}`;
}

/** '  r1' on the first row and '  r2' on the last row of a radial profile table. */
function radialMark(radial: boolean, row: number, rows: number): string {
  if (!radial) return '';
  if (row === 0) return '   r1';
  return row === rows - 1 ? '   r2' : '';
}

function formatSolve(r: SolveReport, description: string[], u: DisplayUnits): string {
  const [L, T, W] = [u.length, u.temperature, u.heat];
  const lines = [`fincheck solve: ${r.case}`, ...description.map((d) => `  ${d}`), ''];
  const err =
    r.discretizationError === null
      ? 'not estimated (single grid)'
      : `${r.discretizationError.toExponential(1)} relative (GCI${r.observedOrder === null ? '' : `, observed order ${r.observedOrder.toFixed(2)}`})`;
  lines.push(`Model ${r.model}, ${r.grid.nodes} nodes`);
  lines.push(`  heat rate      ${inUnit(W, r.heatRate_W).toPrecision(6)} ${W.ascii}  (discretisation error ${err})`);
  lines.push(`  efficiency     ${r.efficiency === null ? 'n/a' : r.efficiency.toFixed(5)}${r.efficiencyNote === null ? '' : ` (${r.efficiencyNote})`}`);
  lines.push(effectivenessLine(r));
  lines.push(`  energy balance ${r.energyBalance.toExponential(1)} (|Q_base - Q_surfaces| / Q_base)`);
  const pts = r.profile;
  const radial = pts[0] !== undefined && 'r_m' in pts[0];
  lines.push('', radial ? `  r [${L.ascii}]     T [${T.ascii}]   (radius: r1 at the base, r2 at the rim)` : `  x [${L.ascii}]     T [${T.ascii}]`);
  const want = Math.min(11, pts.length);
  for (let j = 0; j < want; j++) {
    const p = pts[Math.round((j * (pts.length - 1)) / Math.max(1, want - 1))];
    if (p)
      lines.push(`  ${inUnit(L, pointPosition(p)).toFixed(3).padStart(8)}   ${inUnit(T, p.T_degC).toFixed(3).padStart(9)}${radialMark(radial, j, want)}`);
  }
  lines.push('', 'Estimates of the stated model: confirm by test; h is usually the largest uncertainty.');
  return `${lines.join('\n')}\n`;
}

function formatSolve2D(r: Solve2DReport, description: string[], u: DisplayUnits): string {
  const [L, T, W] = [u.length, u.temperature, u.heat];
  const heat = (q: number, digits: number): string => inUnit(W, q).toPrecision(digits);
  const lines = [`fincheck solve: ${r.case}`, ...description.map((d) => `  ${d}`), ''];
  const err =
    r.discretizationError === null
      ? 'not estimated (single grid)'
      : r.heatRateFrom === 'extrapolated'
        ? `${r.discretizationError.toExponential(1)} relative, of the Richardson-extrapolated value (finest grid ${r.finestGridHeatRate_W.toPrecision(6)} W, GCI ${(r.finestGridDiscretizationError ?? Number.NaN).toExponential(1)}${r.observedOrder === null ? '' : `, observed order ${r.observedOrder.toFixed(2)}`})`
        : `${r.discretizationError.toExponential(1)} relative (GCI${r.observedOrder === null ? '' : `, observed order ${r.observedOrder.toFixed(2)}`})`;
  lines.push(`Model ${r.model}, ${r.grid.nx} x ${r.grid.ny} nodes (along x across)`);
  const edges = r.edgesHeatRate_W !== 0;
  lines.push(`  heat rate      ${heat(r.heatRate_W, 6)} ${W.ascii}  (${edges ? 'whole fin, as check reports it; ' : ''}discretisation error ${err})`);
  if (edges) {
    lines.push(`    section      ${heat(r.sectionHeatRate_W, 6)} ${W.ascii}  (2-D section x width: side edges insulated)`);
    lines.push(
      `    side edges   ${r.edgesHeatRate_W >= 0 ? '+' : ''}${heat(r.edgesHeatRate_W, 4)} ${W.ascii}  (the cooled side edges, from fd-1d: Q cooled / Q insulated = ${(r.heatRate_W / r.sectionHeatRate_W).toFixed(5)})`,
    );
  }
  if (r.efficiency !== null || r.efficiencyNote !== null)
    lines.push(`  efficiency     ${r.efficiency === null ? 'n/a' : r.efficiency.toFixed(5)}${r.efficiencyNote === null ? '' : ` (${r.efficiencyNote})`}`);
  lines.push(effectivenessLine(r));
  lines.push(`  energy balance ${r.energyBalance.toExponential(1)} (|Q_base - Q_surfaces| / Q_base)`);
  if (r.newton) {
    const grids =
      r.newton.stepsPerGrid.length > 1
        ? ` (${r.newton.stepsPerGrid.join('/')} steps, coarsest to finest grid)`
        : ` (${r.newton.stepsPerGrid[0] ?? 0} steps with the coarser grids that seeded it)`;
    lines.push(`  nonlinear      Newton converged${grids}, relative residual ${r.newton.finest.residual.toExponential(1)}`);
  }
  const radial = r.centreline[0] !== undefined && 'r_m' in r.centreline[0];
  lines.push(
    '',
    `  ${radial ? 'r' : 'x'} [${L.ascii}]   centre T [${T.ascii}]   surface T [${T.ascii}]${radial ? '   (radius: r1 at the base, r2 at the rim)' : ''}`,
  );
  const n = r.centreline.length;
  const want = Math.min(11, n);
  for (let j = 0; j < want; j++) {
    const i = Math.round((j * (n - 1)) / Math.max(1, want - 1));
    const c = r.centreline[i];
    const s = r.surface[i];
    if (c && s)
      lines.push(
        `  ${inUnit(L, pointPosition(c)).toFixed(3).padStart(8)}   ${inUnit(T, c.T_degC).toFixed(3).padStart(13)}   ${inUnit(T, s.T_degC).toFixed(3).padStart(15)}${radialMark(radial, j, want)}`,
      );
  }
  lines.push('', 'Estimates of the stated model: confirm by test; h is usually the largest uncertainty.');
  return `${lines.join('\n')}\n`;
}
