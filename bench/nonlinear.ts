/**
 * Cost of the nonlinear 1-D solve (Newton) against the linear solve on the same grid (target: <= 10x).
 * Same fin both times: a plate fin with h at the base 10 W/(m^2*K); linear: uniform h; nonlinear: the
 * power law h ~ theta^(1/4), and power law + radiation + a conductivity table.
 */
import { parseCaseObject } from '../src/case/parse.js';
import { solveFin1D } from '../src/fd/one-d/linear-solve.js';
import { isLinearFinCase } from '../src/fd/problem/linear-case.js';
import { solveNonlinearFin1D } from '../src/fd/one-d/nonlinear-solve.js';
import { cpuText, formatMs, timeTask, type BenchRow } from './measure.js';

const NODES = 4001;

function plate(h: unknown, extra: Record<string, unknown> = {}, k: unknown = 200) {
  return parseCaseObject({
    name: 'bench plate',
    fin: { profile: 'rectangular', length: 0.05, thickness: 0.002, width: 0.1 },
    material: { k },
    convection: { ambient: 20, h, tip: 'convective', ...extra },
    base: { temperature: 90 },
  });
}

export async function benchNonlinear(): Promise<BenchRow[]> {
  const linear = plate(10);
  if (!isLinearFinCase(linear)) throw new Error('bench: the linear case is not linear');
  const t0 = await timeTask('linear', () => solveFin1D(linear, { nodes: NODES }), { time: 500, iterations: 50 });
  const cases: [string, ReturnType<typeof plate>][] = [
    ['power-law h (n = 1/4)', plate({ law: 'power', base: 10, exponent: 0.25 })],
    [
      'power-law h + radiation + k table',
      plate(
        { law: 'power', base: 10, exponent: 0.25 },
        { emissivity: 0.8 },
        {
          points: [
            [20, 210],
            [100, 200],
          ],
        },
      ),
    ],
  ];
  const rows: BenchRow[] = [];
  for (const [label, c] of cases) {
    const t = await timeTask(label, () => solveNonlinearFin1D(c, { nodes: NODES }), { time: 500, iterations: 30 });
    const ratio = t.medianMs / t0.medianMs;
    rows.push({
      area: 'nonlinear',
      item: `Newton 1-D solve, ${label}, ${NODES} nodes, vs the linear solve`,
      target: '<= 10x linear',
      measured: `${ratio.toFixed(1)}x (${formatMs(t.medianMs)} vs ${formatMs(t0.medianMs)})`,
      cpu: cpuText(t.cpuMedianMs),
      verdict: ratio <= 10 ? 'pass' : 'FAIL',
      note: `medians of ${t.samples} and ${t0.samples} runs; the nonlinear solve starts from coarser starting grids (nested) as in a refinement study`,
    });
  }
  return rows;
}
