/**
 * Plain-text rendering of `solve` on a heat sink: the fd-3d study's per-source mean and maximum temperatures, heat
 * per fin, the plate top's mean, the sink resistance and the energy balance, each with its estimated
 * discretisation error (GCI), then the cautions. Numbers in the display units `u` (the JSON output stays SI).
 */
import { defaultDisplayUnits, inUnit, type DisplayUnits, type HeatSinkCase } from '../case/index.js';
import { describeSink } from './format-sink-check.js';
import type { SinkSolveReport } from './sink-solve.js';

const gci = (e: number | null): string => (e === null ? 'n/a (single grid)' : e.toExponential(1));
const pad = (s: string, n: number): string => (s.length >= n ? s : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number): string => (s.length >= n ? s : ' '.repeat(n - s.length) + s);
/** At most this many fins are listed one a line; beyond it the list keeps the first, last, hottest and coolest. */
const FIN_LINES = 24;

export function formatSinkSolve(c: HeatSinkCase, r: SinkSolveReport, u: DisplayUnits = defaultDisplayUnits): string {
  const [W, T] = [u.heat.ascii, u.temperature.ascii];
  const temp = (t: number): string => inUnit(u.temperature, t).toFixed(2);
  const heat = (q: number, digits: number): string => inUnit(u.heat, q).toPrecision(digits);
  const out: string[] = [`fincheck solve (heat sink): ${r.case}`, ...describeSink(c, u).map((d) => `  ${d}`), ''];
  const grids = r.unknowns.map((n) => n.toLocaleString('en-US')).join(' / ');
  out.push(`Model fd-3d, ${r.unknowns.length} grids of ${grids} unknowns (finest first); ${r.finModel}`);
  out.push('  errors: GCI (Celik et al. 2008) relative to the rise above ambient or to the heat rate');
  const w = Math.max(10, ...r.sources.map((s) => s.name.length + 2));
  // Each column two wider than its header (11, 13, 12 in W and degC).
  const heads = [`power [${W}]`, `mean [${T}]`, `max [${T}]`] as const;
  const widths = heads.map((h) => h.length + 2) as [number, number, number];
  const head = `  ${pad('source', w)}${lpad(heads[0], widths[0])}${lpad(heads[1], widths[1])}${lpad('GCI', 10)}${lpad(heads[2], widths[2])}${lpad('GCI', 10)}  order`;
  out.push(head, `  ${'-'.repeat(head.length - 2)}`);
  for (const s of r.sources) {
    const order = s.observedOrder === null ? 'n/a' : s.observedOrder.toFixed(2);
    out.push(
      `  ${pad(s.name, w)}${lpad(heat(s.power_W, 4), widths[0])}${lpad(temp(s.meanTemperature_degC), widths[1])}${lpad(gci(s.meanDiscretizationError), 10)}${lpad(temp(s.maxTemperature_degC), widths[2])}${lpad(gci(s.maxDiscretizationError), 10)}  ${order}`,
    );
  }
  out.push('');
  out.push(`  plate top, mean  ${temp(r.plateTopMeanTemperature_degC)} ${T}  (GCI ${gci(r.plateTopMeanDiscretizationError)})`);
  out.push(
    `  sink resistance  ${inUnit(u.resistance, r.sinkResistance_KperW).toPrecision(4)} ${u.resistance.ascii}, hottest point over total power  (GCI ${gci(r.sinkResistanceDiscretizationError)})`,
  );
  out.push(
    `  heat             ${heat(r.totalHeat_W, 5)} ${W} in; out through the fins ${heat(r.finsHeat_W, 5)} ${W}, the plate ${heat(r.plateHeat_W, 5)} ${W}`,
  );
  out.push(`  energy balance   ${r.energyBalance.toExponential(1)} (|Q_sources - Q_surfaces| / Q_sources, the largest over the grids)`);
  out.push(`  solver           ${r.solver.method}: ${r.solver.iterations} iterations, relative residual ${r.solver.relativeResidual.toExponential(1)}`);
  if (r.fins.length > 0) {
    const heatHead = `heat [${W}]`;
    const heatWidth = Math.max(11, heatHead.length + 3);
    out.push('', `  ${lpad('fin', 3)}${lpad(heatHead, heatWidth)}${lpad('GCI', 11)}${lpad(`root [${T}]`, 14)}`);
    const hottest = r.fins.reduce((a, f) => (f.rootTemperature_degC > a.rootTemperature_degC ? f : a)).index;
    const coolest = r.fins.reduce((a, f) => (f.rootTemperature_degC < a.rootTemperature_degC ? f : a)).index;
    const shown =
      r.fins.length <= FIN_LINES ? r.fins : r.fins.filter((f, k) => k < 3 || k >= r.fins.length - 3 || f.index === hottest || f.index === coolest);
    let last = -1;
    for (const f of shown) {
      if (f.index > last + 1) out.push('  ...');
      const mark = f.index === hottest ? '  hottest root' : f.index === coolest ? '  coolest root' : '';
      out.push(
        `  ${lpad(String(f.index), 3)}${lpad(heat(f.heatRate_W, 4), heatWidth)}${lpad(gci(f.heatRateDiscretizationError), 11)}${lpad(temp(f.rootTemperature_degC), 14)}${mark}`,
      );
      last = f.index;
    }
  }
  out.push('', 'Cautions:', ...r.cautions.map((t) => `  - ${t}`));
  return `${out.join('\n')}\n`;
}
