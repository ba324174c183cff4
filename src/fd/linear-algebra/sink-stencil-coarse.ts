/**
 * The coarse operator of the 3-D sink multigrid on structured stencils: sink-coarse-operator.ts's merge of the
 * fine conductances onto the coarse cells, computed stencil to stencil in one pass over the fine couplings.
 * Between two coarse cells R and C:
 *   G_RC = s * sum over fine couplings (r in R, c in C) of G_rc,
 * s = 1/2 along a direction this step coarsened (the same faces, twice the distance between centres) and 1
 * otherwise (faces add up at the same distance); the extra couplings (fin roots) keep s = 1; couplings inside a
 * coarse cell drop out; each coarse cell's conductance to fixed temperatures is the sum of its fine cells'
 * (A_c 1 = P_0^T A 1). Neighbouring fine cells in different coarse cells are in neighbouring coarse cells, so
 * the coarse operator is again a stencil. Symmetric, nonpositive couplings, weakly diagonally dominant with a
 * positive excess somewhere: SPD, as the CG preconditioner needs. Units W/K.
 */
import { buildStencil, type Couplings, type ExtraCouplings, type SinkStencil } from './sink-stencil.js';
import type { RelaxationPrecision } from './sink-stencil-relaxation.js';
import type { SinkTransfer } from './sink-transfer.js';

/**
 * `precision` 'float32': the couplings are summed into Float32Array storage (each partial sum rounded, ~6e-8
 * relative), what a float32 smoother would store anyway, and the diagonal formed from them in float64, so the
 * level is exactly the symmetric, diagonally dominant matrix of its stored couplings. Half the new memory of the
 * level, and no float64 copy for the smoother to round.
 */
export function stencilCoarseOperator(s: SinkStencil, t: SinkTransfer, precision: RelaxationPrecision = 'float64'): SinkStencil {
  const g = s.grid;
  const c = t.coarse;
  const { nx, ny, nz } = g;
  const plateC = c.nx * c.ny * c.nz;
  const nC = plateC + c.fins.reduce((sum, f) => sum + f.rows * f.layers, 0);
  const couplings = (length: number) => (precision === 'float32' ? new Float32Array(length) : new Float64Array(length));
  const line = couplings(nC);
  const gx = couplings(plateC);
  const gy = couplings(plateC);
  const row = couplings(nC - plateC);
  const excess = new Float64Array(nC);
  const half = (coarsened: boolean) => (coarsened ? 0.5 : 1);
  const sxs = half(t.coarsened.x);
  const sys = half(t.coarsened.y);
  const szs = half(t.coarsened.z);
  const ox = t.x.own;
  const oy = t.y.own;
  const oz = t.z.own;
  plateSums(
    { nx, ny, nz, cny: c.ny, cnz: c.nz, ox, oy, oz, sxs, sys, szs },
    { excess: s.excess, line: s.line, gx: s.gx, gy: s.gy },
    { excess, line, gx, gy },
  );
  let fine = s.plate;
  let coarse = plateC;
  g.fins.forEach((f, index) => {
    const or = t.rows[index].own;
    const ol = t.layers[index].own;
    const cf = c.fins[index];
    const srs = half(t.coarsened.rows[index]);
    const sls = half(t.coarsened.layers[index]);
    for (let r = 0; r < f.rows; r++) {
      const rowCross = r + 1 < f.rows && or[r + 1] !== or[r];
      for (let l = 0; l < f.layers; l++) {
        const p = fine + r * f.layers + l;
        const rc = coarse + or[r] * cf.layers + ol[l];
        excess[rc] += s.excess[p];
        if (l + 1 < f.layers && ol[l + 1] !== ol[l]) line[rc] += sls * s.line[p];
        if (rowCross) row[rc - plateC] += srs * s.row[p - s.plate];
      }
    }
    fine += f.rows * f.layers;
    coarse += cf.rows * cf.layers;
  });
  // The coarse index of a fine unknown, for the extras' ends alone (no array over every unknown).
  const fineStart: number[] = [];
  const coarseStart: number[] = [];
  fine = s.plate;
  coarse = plateC;
  g.fins.forEach((f, index) => {
    fineStart.push(fine);
    coarseStart.push(coarse);
    fine += f.rows * f.layers;
    coarse += c.fins[index].rows * c.fins[index].layers;
  });
  const aggregateOf = (p: number): number => {
    if (p < s.plate) {
      const k = p % nz;
      const column = (p - k) / nz;
      const j = column % ny;
      return (ox[(column - j) / ny] * c.ny + oy[j]) * c.nz + oz[k];
    }
    let f = fineStart.length - 1;
    while (fineStart[f] > p) f--;
    const layers = g.fins[f].layers;
    const l = (p - fineStart[f]) % layers;
    const r = (p - fineStart[f] - l) / layers;
    return coarseStart[f] + t.rows[f].own[r] * c.fins[f].layers + t.layers[f].own[l];
  };
  // Extras: each pair once (from < to), merged per coarse pair.
  const extras: ExtraCouplings = { from: [], to: [], g: [] };
  const slot = new Map<number, number>();
  for (let e = 0; e < s.extraFrom.length; e++) {
    const p = s.extraFrom[e];
    const q = s.extraTo[e];
    if (p > q) continue;
    const a = aggregateOf(p);
    const b = aggregateOf(q);
    if (a === b) continue;
    const lo = Math.min(a, b);
    const hi = Math.max(a, b);
    const key = lo * nC + hi;
    const at = slot.get(key);
    if (at === undefined) {
      slot.set(key, extras.from.length);
      extras.from.push(lo);
      extras.to.push(hi);
      extras.g.push(s.extraG[e]);
    } else extras.g[at] += s.extraG[e];
  }
  return buildStencil(c, { line, gx, gy, row, excess }, extras);
}

interface PlateSteps {
  nx: number;
  ny: number;
  nz: number;
  cny: number;
  cnz: number;
  ox: Int32Array;
  oy: Int32Array;
  oz: Int32Array;
  sxs: number;
  sys: number;
  szs: number;
}

/**
 * The plate's part of the merge: every fine cell's excess onto its coarse cell, each coupling that crosses between
 * coarse cells scaled onto theirs. A function of its own over plain arrays (one monomorphic loop, its arrays in
 * registers, not read through the stencil object at every cell).
 */
function plateSums(
  steps: PlateSteps,
  fine: { excess: Float64Array; line: Couplings; gx: Couplings; gy: Couplings },
  coarse: { excess: Float64Array; line: Couplings; gx: Couplings; gy: Couplings },
): void {
  const { nx, ny, nz, cny, cnz, ox, oy, oz, sxs, sys, szs } = steps;
  const { excess: fe, line: fl, gx: fgx, gy: fgy } = fine;
  const { excess: ce, line: cl, gx: cgx, gy: cgy } = coarse;
  for (let i = 0; i < nx; i++) {
    const xCross = i + 1 < nx && ox[i + 1] !== ox[i];
    for (let j = 0; j < ny; j++) {
      const p0 = (i * ny + j) * nz;
      const rc0 = (ox[i] * cny + oy[j]) * cnz;
      const yCross = j + 1 < ny && oy[j + 1] !== oy[j];
      for (let k = 0; k < nz; k++) {
        const p = p0 + k;
        const rc = rc0 + oz[k];
        ce[rc] += fe[p];
        if (k + 1 < nz && oz[k + 1] !== oz[k]) cl[rc] += szs * fl[p];
        if (yCross) cgy[rc] += sys * fgy[p];
        if (xCross) cgx[rc] += sxs * fgx[p];
      }
    }
  }
}
