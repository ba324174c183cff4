/**
 * The coarse operator of the 3-D sink multigrid (sink-multigrid.ts): the fine conductance system merged onto the
 * coarse level's cells (aggregation.ts), as a re-discretisation would give it, with the sparsity of the fine one.
 *
 * A coarse cell R is the union of the fine cells r with aggregate(r) = R. Between two coarse cells R and C:
 *   G_RC = s * sum over fine couplings (r in R, c in C) of G_rc,
 * where s = 1/2 when the coupling runs along a direction that this step coarsened and 1 otherwise. Along a
 * coarsened direction the coarse interface is the same set of fine faces but the distance between the cell
 * centres doubles (k A / (2 d)); across it the faces add up at the same distance. Couplings between a fin and
 * the plate keep s = 1. Each coarse cell's conductance to fixed temperatures (h, a tip, the row sum) is the sum
 * of its fine cells', so A_c 1 = P_0^T A 1 with P_0 the piecewise-constant aggregation.
 * A_c is then symmetric, has nonpositive off-diagonal entries and is weakly diagonally dominant with a positive
 * row sum somewhere: symmetric positive definite, as the CG preconditioner needs. Used with the linear transfers
 * of aggregation.ts (P for prolongation, P^T for restriction) the cycle stays symmetric; the Galerkin product
 * P^T A P with those transfers would fill a 27-point stencil on every level (3.3x the fine level's entries on the
 * 20-fin bench sink, against about 1.6x here).
 * Units: conductances W/K, like the fine system.
 */
import type { CsrMatrix } from './csr.js';
import type { SinkCoarsening, SinkLevelGrid } from './aggregation.js';

export function sinkCoarseOperator(a: CsrMatrix, g: SinkLevelGrid, step: SinkCoarsening): CsrMatrix {
  const n = a.n;
  const nc = step.p.coarse;
  const { aggregate, coarsened } = step;
  const plateCells = g.nx * g.ny * g.nz;
  const layersOf = new Int32Array(g.fins.length);
  const finStart = new Int32Array(g.fins.length + 1);
  g.fins.forEach((f, index) => {
    layersOf[index] = f.layers;
    finStart[index + 1] = finStart[index] + f.rows * f.layers;
  });
  // The fin of every fin node (at index − plateCells).
  const finOf = new Int32Array(n - plateCells);
  for (let f = 0; f < g.fins.length; f++) finOf.fill(f, finStart[f], finStart[f + 1]);

  // A plate coupling's direction from the index difference ((i ny + j) nz + k: 1 in z, nz in y, ny nz in x).
  const { ny, nz } = g;
  const plateScale = (r: number, c: number): number => {
    const d = r > c ? r - c : c - r;
    if (d === 1 && nz > 1) return coarsened.z ? 0.5 : 1;
    if (d === nz && ny > 1) return coarsened.y ? 0.5 : 1;
    return coarsened.x ? 0.5 : 1;
  };
  const finScale = (r: number, c: number): number => {
    const f = finOf[r - plateCells];
    if (finOf[c - plateCells] !== f) return 1;
    const layers = layersOf[f];
    const d = Math.abs(r - c);
    const layerNeighbour = layers > 1 && d === 1;
    if (layerNeighbour) return coarsened.layers[f] ? 0.5 : 1;
    return coarsened.rows[f] ? 0.5 : 1;
  };

  // Members of each aggregate (counting sort).
  const memberStart = new Int32Array(nc + 1);
  for (let r = 0; r < n; r++) memberStart[aggregate[r] + 1]++;
  for (let c = 0; c < nc; c++) memberStart[c + 1] += memberStart[c];
  const members = new Int32Array(n);
  const fill = memberStart.slice(0, nc);
  for (let r = 0; r < n; r++) members[fill[aggregate[r]]++] = r;

  const { rowStart, col, val } = a;
  const excess = new Float64Array(nc);
  for (let r = 0; r < n; r++) {
    let sum = 0;
    if (a.excess !== undefined) sum = a.excess[r];
    else for (let e = rowStart[r]; e < rowStart[r + 1]; e++) sum += val[e];
    excess[aggregate[r]] += sum;
  }

  const coarseStart = new Int32Array(nc + 1);
  let cols = new Int32Array(Math.max(16, col.length));
  let vals = new Float64Array(cols.length);
  const marker = new Int32Array(nc).fill(-1);
  const slot = new Int32Array(nc);
  let nnz = 0;
  for (let rc = 0; rc < nc; rc++) {
    const diagonalAt = nnz;
    cols[nnz] = rc;
    vals[nnz++] = 0;
    marker[rc] = rc;
    slot[rc] = diagonalAt;
    let offSum = 0;
    for (let m = memberStart[rc]; m < memberStart[rc + 1]; m++) {
      const r = members[m];
      for (let e = rowStart[r]; e < rowStart[r + 1]; e++) {
        const c = col[e];
        if (c === r) continue;
        const cc = aggregate[c];
        if (cc === rc) continue;
        const s = r < plateCells && c < plateCells ? plateScale(r, c) : r >= plateCells && c >= plateCells ? finScale(r, c) : 1;
        const v = s * val[e];
        offSum += v;
        if (marker[cc] !== rc) {
          if (nnz === cols.length) {
            const c2 = new Int32Array(2 * cols.length);
            const v2 = new Float64Array(2 * cols.length);
            c2.set(cols);
            v2.set(vals);
            cols = c2;
            vals = v2;
          }
          marker[cc] = rc;
          slot[cc] = nnz;
          cols[nnz] = cc;
          vals[nnz++] = v;
        } else vals[slot[cc]] += v;
      }
    }
    vals[diagonalAt] = excess[rc] - offSum;
    coarseStart[rc + 1] = nnz;
  }
  return { n: nc, rowStart: coarseStart, col: cols.slice(0, nnz), val: vals.slice(0, nnz), excess };
}
