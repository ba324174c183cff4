/**
 * Image benchmarks: the time from plain data to PNG bytes (chart SVG built by our chart module, then
 * rasterised by resvg with the bundled DejaVu fonts), for
 *  - a 1200 x 750 temperature-profile chart: the demo case's fd-1d solution (4001 nodes) as the
 *    reference series, two panels (temperature and heat flow along the fin), two comparison series and
 *    a tip annotation;
 *  - a heat map of a 400 x 40 node field: the demo case solved by fd-2d on that grid, with colour bar,
 *    default isotherms and base/tip labels, 1200 x 750.
 * The solves are done once, outside the timed part. resvg is loaded before timing (warm-up runs).
 */
import { loadCase } from '../src/case/parse.js';
import { solveFin1D } from '../src/fd/one-d/linear-solve.js';
import { solveFin2D } from '../src/fd/two-d/linear-solve.js';
import { isLinearFinCase } from '../src/fd/problem/linear-case.js';
import { fieldChart, type FieldChartSpec } from '../src/images/field-chart.js';
import { lineChart, type LineChartSpec } from '../src/images/line-chart.js';
import { svgToPng } from '../src/images/render.js';
import { atMost, cpuText, formatMs, spread, timeTask, type BenchRow } from './measure.js';

const AREA = 'images';
const DEMO_CASE = 'demo/inverter-plate-fin.yaml';

function profileSpec(): LineChartSpec {
  const c = loadCase(DEMO_CASE);
  if (!isLinearFinCase(c)) throw new Error(`bench: ${DEMO_CASE} is expected to be a linear case`);
  const r = solveFin1D(c, { nodes: 4001 });
  const n = r.mesh.nodes;
  const ambient = c.convection.ambient_degC;
  const xMm = r.mesh.x.map((v) => v * 1000);
  const T = r.theta.map((v) => v + ambient);
  const L = r.mesh.x[n - 1] as number;
  // Comparison curves of the same shape (for the drawing only): cosh profiles with m from the tip temperature.
  const thetaBase = r.theta[0] as number;
  const m = Math.acosh(thetaBase / (r.theta[n - 1] as number)) / L;
  const adiabatic = r.mesh.x.map((x) => ambient + (thetaBase * Math.cosh(m * 0.97 * (L - x))) / Math.cosh(m * 0.97 * L));
  const corrected = r.mesh.x.map((x) => ambient + (thetaBase * Math.cosh(m * (L * 1.02 - x))) / Math.cosh(m * L * 1.02));
  // Heat flow along the fin, W, from the temperature gradient (k A dθ/dx with A per the demo: 80 mm x 2 mm).
  const kA = 209 * 0.08 * 0.002;
  const flow = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = Math.max(0, i - 1);
    const b = Math.min(n - 1, i + 1);
    flow[i] = (-kA * ((r.theta[b] as number) - (r.theta[a] as number))) / ((r.mesh.x[b] as number) - (r.mesh.x[a] as number));
  }
  return {
    title: `Temperature along the fin — ${c.name}`,
    subtitle: ['fd-1d reference, 4001 nodes; shortcuts on the equivalent uniform fin.'],
    xLabel: 'Distance from base x (mm)',
    width: 1200,
    height: 750,
    panels: [
      {
        yLabel: 'Temperature (°C)',
        series: [
          { label: 'fd-1d (reference)', x: xMm, y: T },
          { label: 'tanh-L', x: xMm, y: adiabatic, note: 'drift −1.75 %' },
          { label: 'tanh-Lc', x: xMm, y: corrected, note: 'drift 0.00 %' },
        ],
        points: [{ x: L * 1000, y: T[n - 1] as number, label: `tip ${(T[n - 1] as number).toFixed(1)} °C` }],
      },
      { yLabel: 'Heat flow (W)', includeZero: true, series: [{ label: 'fd-1d (reference)', x: xMm, y: flow }] },
    ],
  };
}

function heatMapSpec(): FieldChartSpec {
  const c = loadCase(DEMO_CASE);
  const r = solveFin2D(c, { nx: 400, ny: 40 });
  const { nodesX, nodesY } = r.grid;
  return {
    title: `Temperature field — ${c.name}`,
    subtitle: 'fd-2d, 400 x 40 nodes across the half-thickness',
    xLabel: 'x (mm)',
    yLabel: 'y (mm)',
    valueLabel: 'Temperature (°C)',
    valueUnit: ' °C',
    grid: {
      ni: nodesX,
      nj: nodesY,
      x: r.grid.x.map((v) => v * 1000),
      y: r.grid.y.map((v) => v * 1000),
      strideI: r.grid.stride[0],
      strideJ: r.grid.stride[1],
    },
    values: r.field.map((v) => v + r.ambient_degC),
    edgeLabels: { iMin: 'base', iMax: 'tip' },
    width: 1200,
    height: 750,
  };
}

export async function benchImages(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  const profile = profileSpec();
  const heatMap = heatMapSpec();
  const cases: { item: string; svg: () => string; limit: number }[] = [
    { item: '1200x750 profile PNG (2 panels, 3 series of 4001 points): SVG + resvg', svg: () => lineChart(profile).svg, limit: 100 },
    { item: 'heat map of a 400x40 field, 1200x750 PNG (isotherms, colour bar): SVG + resvg', svg: () => fieldChart(heatMap).svg, limit: 200 },
  ];
  for (const { item, svg, limit } of cases) {
    const svgOnly = await timeTask(`${item} svg`, svg, { time: 1000, iterations: 10 });
    const png = await timeTask(item, () => svgToPng(svg()), { time: 2500, iterations: 15 });
    rows.push({
      area: AREA,
      item,
      target: `<= ${limit} ms`,
      measured: formatMs(png.medianMs),
      cpu: cpuText(png.cpuMedianMs),
      verdict: atMost(png.medianMs, limit),
      note: `${spread(png)}; of which building the SVG ${formatMs(svgOnly.medianMs)} (median), the rest resvg + PNG encoding`,
    });
  }
  return rows;
}
