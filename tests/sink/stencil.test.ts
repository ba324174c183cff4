/**
 * The structured kernels of the 3-D sink multigrid (src/fd/linear-algebra/sink-stencil*.ts, sink-transfer.ts)
 * against the CSR forms they replace, on small invented sinks (pins, plate fins as sheets, a bare plate):
 *   - the stencil read from the assembled matrix (and the one the assembly forms from its couplings) gives the same A x and b − A x as csrMultiply and csrResidual,
 *     and turns back into the same matrix;
 *   - the direction-by-direction transfers give the same P e and P^T r as coarsenSinkLevel's CSR prolongation;
 *   - the stencil coarse operator equals the CSR merge (sink-coarse-operator.ts) entry by entry, on every level;
 *   - the stencil line Gauss-Seidel (both directions, from zero, fused with the residual) equals the CSR line
 *     relaxation (line-relaxation.ts).
 * The tolerances are 1e-12 relative: the same sums in another order (a few hundred terms at most per entry).
 */
import { describe, expect, it } from 'vitest';
import { buildSinkGrid } from '../../src/mesh/index.js';
import { coarsenSinkLevel, coarseningDirections, levelLines, type SinkLevelGrid } from '../../src/fd/linear-algebra/aggregation.js';
import { csrEntry, csrMultiply, csrResidual, type CsrMatrix } from '../../src/fd/linear-algebra/csr.js';
import { buildLineRelaxation } from '../../src/fd/linear-algebra/line-relaxation.js';
import { sinkCoarseOperator } from '../../src/fd/linear-algebra/sink-coarse-operator.js';
import { stencilFromCsr, stencilToCsr, type SinkStencil } from '../../src/fd/linear-algebra/sink-stencil.js';
import { stencilMultiply, stencilResidual } from '../../src/fd/linear-algebra/sink-stencil-product.js';
import { stencilCoarseOperator } from '../../src/fd/linear-algebra/sink-stencil-coarse.js';
import { stencilRelaxation } from '../../src/fd/linear-algebra/sink-stencil-relaxation.js';
import { sinkTransfer, transferApply } from '../../src/fd/linear-algebra/sink-transfer.js';
import { assembleSink } from '../../src/fd/three-d/sink-system.js';
import { sinkProblem } from '../../src/fd/three-d/sink-problem.js';
import type { HeatSinkCase } from '../../src/case/index.js';
import { plateFin, sinkCase } from './support/sink-case.js';

const common = {
  plate: [0.02, 0.016, 0.003] as [number, number, number],
  kPlate: 150,
  kFin: 200,
  hPlate: 25,
  hUnderside: 5,
  h: { kind: 'linear' as const, base: 60, tip: 30 },
  tip: { kind: 'convective' as const, h: null },
  sources: [{ centre: [0.008, 0.007] as [number, number], size: [0.006, 0.006] as [number, number], power: 4, contactResistance: 1e-5 }],
};

const cases: [string, HeatSinkCase][] = [
  [
    'pins',
    sinkCase({
      ...common,
      fin: { kind: 'pin', length: 0.012, diameter: 0.003 },
      array: { kind: 'pins', rows: 2, columns: 3, pitch: [0.006, 0.007], pattern: 'inline' },
    }),
  ],
  ['plate fins', sinkCase({ ...common, fin: plateFin(0.012, 0.002, 0.016), array: { kind: 'plates', count: 3, pitch: 0.006 } })],
  [
    'a bare plate',
    sinkCase({ plate: [0.032, 0.024, 0.002], kPlate: 180, hPlate: 20, sources: [{ centre: [0.012, 0.014], size: [0.008, 0.008], power: 5 }] }),
  ],
];

let seed = 11;
const random = (n: number) => Float64Array.from({ length: n }, () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 - 1);

/** max |u − v| / max |v|. */
function relativeDifference(u: Float64Array, v: Float64Array): number {
  let worst = 0;
  let scale = 0;
  for (let k = 0; k < v.length; k++) {
    worst = Math.max(worst, Math.abs(u[k]! - v[k]!));
    scale = Math.max(scale, Math.abs(v[k]!));
  }
  return worst / scale;
}

/** Largest difference between two CSR matrices entry by entry, relative to the entry's size. */
function matrixDifference(a: CsrMatrix, b: CsrMatrix): number {
  let worst = 0;
  for (let r = 0; r < a.n; r++) {
    for (let e = a.rowStart[r]!; e < a.rowStart[r + 1]!; e++) {
      const c = a.col[e]!;
      const va = csrEntry(a, r, c);
      worst = Math.max(worst, Math.abs(va - csrEntry(b, r, c)) / Math.abs(va));
    }
    for (let e = b.rowStart[r]!; e < b.rowStart[r + 1]!; e++) if (csrEntry(a, r, b.col[e]!) === 0 && b.val[e] !== 0) worst = Infinity;
  }
  return worst;
}

describe.each(cases)('%s', (_, c) => {
  const problem = sinkProblem(c);
  const system = assembleSink(problem, buildSinkGrid(problem.layout, { cellSize: 0.002, plateLayers: 2, finLayers: 3, refine: 2 }), 'sheet');
  const a = system.matrix;
  const stencil = stencilFromCsr(a, system.levelGrid);
  const x = random(a.n);

  it('multiplies and forms residuals as the CSR matrix does', () => {
    expect(a.n).toBeGreaterThan(1000);
    const viaCsr = new Float64Array(a.n);
    const viaStencil = new Float64Array(a.n);
    csrMultiply(a, x, viaCsr);
    const xAx = stencilMultiply(stencil, x, viaStencil);
    expect(relativeDifference(viaStencil, viaCsr)).toBeLessThan(1e-12);
    // The returned x · A x, summed while the product is formed, against the dot product of the CSR product.
    const expected = x.reduce((sum, v, p) => sum + v * (viaCsr[p] ?? Number.NaN), 0);
    expect(Math.abs(xAx - expected)).toBeLessThan(1e-12 * Math.abs(expected));
    csrResidual(a, x, system.rhs, viaCsr);
    stencilResidual(stencil, x, system.rhs, viaStencil);
    expect(relativeDifference(viaStencil, viaCsr)).toBeLessThan(1e-12);
  });

  it('turns back into the assembled matrix, read from the matrix or from the assembly', () => {
    expect(matrixDifference(a, stencilToCsr(stencil))).toBeLessThan(1e-12);
    expect(system.stencil).not.toBeNull();
    expect(matrixDifference(a, stencilToCsr(system.stencil!))).toBeLessThan(1e-12);
  });

  it('relaxes as the CSR line Gauss-Seidel does', () => {
    const csr = buildLineRelaxation(a, system.lines);
    const structured = stencilRelaxation(stencil);
    const u = new Float64Array(a.n);
    const v = new Float64Array(a.n);
    csr.sweep(system.rhs, u, 'forward');
    structured.sweep(system.rhs, v, 'forward', true);
    expect(relativeDifference(v, u)).toBeLessThan(1e-12);
    // The fused sweep and residual from zero.
    const r = new Float64Array(a.n);
    const w = random(a.n);
    structured.forwardResidual(system.rhs, w, r);
    expect(relativeDifference(w, u)).toBeLessThan(1e-12);
    const rCsr = new Float64Array(a.n);
    csrResidual(a, u, system.rhs, rCsr);
    expect(relativeDifference(r, rCsr)).toBeLessThan(1e-12);
    // From a nonzero start, both directions.
    u.set(x);
    v.set(x);
    csr.sweep(system.rhs, u, 'backward');
    structured.sweep(system.rhs, v, 'backward');
    csr.sweep(system.rhs, u, 'forward');
    structured.sweep(system.rhs, v, 'forward');
    expect(relativeDifference(v, u)).toBeLessThan(1e-12);
  });

  it('transfers and merges as the CSR forms do on every level', () => {
    let s: SinkStencil = stencil;
    let csr: CsrMatrix = a;
    let g: SinkLevelGrid = system.levelGrid;
    let levels = 0;
    while (s.n > 50) {
      const step = coarsenSinkLevel(g);
      if (step.p.coarse === s.n) break;
      const t = sinkTransfer(g, coarseningDirections(g));
      const apply = transferApply(t);
      const r = random(s.n);
      const e = random(step.p.coarse);
      // P^T r and x + P e by the CSR prolongation.
      const rc = new Float64Array(step.p.coarse);
      const xp = Float64Array.from(x.subarray(0, s.n));
      for (let k = 0; k < s.n; k++) {
        for (let q = step.p.rowStart[k]!; q < step.p.rowStart[k + 1]!; q++) {
          rc[step.p.col[q]!]! += step.p.val[q]! * r[k]!;
          xp[k]! += step.p.val[q]! * e[step.p.col[q]!]!;
        }
      }
      const rcStructured = new Float64Array(step.p.coarse);
      apply.restrict(r, rcStructured);
      expect(relativeDifference(rcStructured, rc)).toBeLessThan(1e-12);
      const xStructured = Float64Array.from(x.subarray(0, s.n));
      apply.prolongAdd(e, xStructured);
      expect(relativeDifference(xStructured, xp)).toBeLessThan(1e-12);
      // The coarse operators.
      const merged = sinkCoarseOperator(csr, g, step);
      const coarse = stencilCoarseOperator(s, t);
      expect(matrixDifference(merged, stencilToCsr(coarse))).toBeLessThan(1e-12);
      expect(levelLines(t.coarse).start.length - 1).toBeGreaterThan(0);
      s = coarse;
      csr = merged;
      g = t.coarse;
      levels++;
    }
    expect(levels).toBeGreaterThanOrEqual(2);
  });
});
