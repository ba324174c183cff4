/**
 * Coarsening of a heat sink's unknowns for the 3-D sink multigrid (sink-multigrid.ts), level by level:
 *   plate cells: 2 x 2 columns in x and y become one coarse column (an odd last one stays alone), and pairs of
 *     layers in z one layer where the cells are flat (2 dz <= the smaller of the mean dx and dy) or nothing else
 *     can be coarsened;
 *   fin sheets (a plate fin's rows along y by its layers along the height) and pins (layers only): pairs of rows
 *     and pairs of layers.
 * Prolongation: cell-centred linear interpolation across pairs (3/4 from the own coarse cell, 1/4 from the nearer
 * neighbour, 1 at an edge; Wesseling, "An Introduction to Multigrid Methods", 1992, section 5.3 [from memory]) in x
 * and y (piecewise constant in the weakly coupled one of them, see WEAK) and along a fin's rows; piecewise
 * constant in z and along a fin's height, where the line relaxation works.
 * Unknowns of a level: plate cell (i, j, k) at (i ny + j) nz + k, then fin f's node (row J, layer l) at
 * its offset + J ns_f + l.
 */
import type { Prolongation } from './prolongation.js';

/**
 * A direction whose mean cells are this many times longer than the other's couples weakly (conductance ~ 1/d^2
 * relative): piecewise-constant interpolation there is enough and keeps the coarse operators sparser. Measured
 * on the 20-fin sink (dy/dx 2.2): 32 instead of 28 CG iterations, 1.4x less time; a bare plate keeps linear.
 */
const WEAK = 1.5;

export interface SinkLevelGrid {
  nx: number;
  ny: number;
  nz: number;
  /** Mean cell sizes of the plate, m (they decide whether z is coarsened). */
  dx: number;
  dy: number;
  dz: number;
  /** Fins: rows along y (1 for a pin) and layers along the height. */
  fins: { rows: number; layers: number }[];
}

export function levelUnknowns(g: SinkLevelGrid): number {
  return g.nx * g.ny * g.nz + g.fins.reduce((s, f) => s + f.rows * f.layers, 0);
}

export function coarsenSinkLevel(g: SinkLevelGrid): { coarse: SinkLevelGrid; p: Prolongation } {
  const cx = g.nx > 1;
  const cy = g.ny > 1;
  const cz = g.nz > 1 && (2 * g.dz <= Math.min(cx ? g.dx : Infinity, cy ? g.dy : Infinity) || (!cx && !cy));
  const nxc = cx ? Math.ceil(g.nx / 2) : g.nx;
  const nyc = cy ? Math.ceil(g.ny / 2) : g.ny;
  const nzc = cz ? Math.ceil(g.nz / 2) : g.nz;
  const coarseFins = g.fins.map((f) => ({ rows: Math.ceil(f.rows / 2), layers: Math.ceil(f.layers / 2) }));
  const coarse: SinkLevelGrid = {
    nx: nxc,
    ny: nyc,
    nz: nzc,
    dx: cx ? 2 * g.dx : g.dx,
    dy: cy ? 2 * g.dy : g.dy,
    dz: cz ? 2 * g.dz : g.dz,
    fins: coarseFins,
  };
  const n = levelUnknowns(g);
  const rowStart = new Int32Array(n + 1);
  const col = new Int32Array(4 * n);
  const val = new Float64Array(4 * n);
  let e = 0;
  const [ix0, ix1, wx0] = transfer(g.nx, nxc, cx, cy && g.dx > WEAK * g.dy);
  const [iy0, iy1, wy0] = transfer(g.ny, nyc, cy, cx && g.dy > WEAK * g.dx);
  for (let i = 0; i < g.nx; i++) {
    for (let j = 0; j < g.ny; j++) {
      for (let k = 0; k < g.nz; k++) {
        const r = (i * g.ny + j) * g.nz + k;
        const kc = cz ? k >> 1 : k;
        for (let a = 0; a < 2; a++) {
          const ax = a === 0 ? wx0[i] : 1 - wx0[i];
          if (ax === 0) continue;
          const ic = a === 0 ? ix0[i] : ix1[i];
          for (let b = 0; b < 2; b++) {
            const ay = b === 0 ? wy0[j] : 1 - wy0[j];
            if (ay === 0) continue;
            col[e] = ((ic * nyc + (b === 0 ? iy0[j] : iy1[j])) * nzc + kc) | 0;
            val[e++] = ax * ay;
          }
        }
        rowStart[r + 1] = e;
      }
    }
  }
  let fine = g.nx * g.ny * g.nz;
  let offset = nxc * nyc * nzc;
  g.fins.forEach((f, index) => {
    const c = coarseFins[index];
    const [r0, r1, w0] = transfer(f.rows, c.rows, f.rows > 1);
    for (let j = 0; j < f.rows; j++) {
      for (let l = 0; l < f.layers; l++) {
        const lc = f.layers > 1 ? l >> 1 : l;
        col[e] = offset + r0[j] * c.layers + lc;
        val[e++] = w0[j];
        if (w0[j] < 1) {
          col[e] = offset + r1[j] * c.layers + lc;
          val[e++] = 1 - w0[j];
        }
        rowStart[++fine] = e;
      }
    }
    offset += c.rows * c.layers;
  });
  return { coarse, p: { rowStart, col: col.slice(0, e), val: val.slice(0, e), coarse: offset } };
}

/** For each fine index: its own coarse index, the neighbouring one, and the own one's weight (1: no neighbour). */
function transfer(n: number, nc: number, coarsened: boolean, constant = false): [Int32Array, Int32Array, Float64Array] {
  const own = new Int32Array(n);
  const other = new Int32Array(n);
  const w = new Float64Array(n).fill(1);
  for (let i = 0; i < n; i++) {
    own[i] = coarsened ? i >> 1 : i;
    other[i] = own[i];
    if (!coarsened || constant) continue;
    const o = i % 2 === 0 ? own[i] - 1 : own[i] + 1;
    if (o >= 0 && o < nc) {
      other[i] = o;
      w[i] = 0.75;
    }
  }
  return [own, other, w];
}

/** Lines of a level: the plate's z columns, then each fin row along the height. */
export function levelLines(g: SinkLevelGrid): { order: Int32Array; start: Int32Array } {
  const n = levelUnknowns(g);
  const order = new Int32Array(n);
  for (let r = 0; r < n; r++) order[r] = r;
  const start: number[] = [];
  for (let c = 0; c < g.nx * g.ny; c++) start.push(c * g.nz);
  let q = g.nx * g.ny * g.nz;
  for (const f of g.fins) {
    for (let j = 0; j < f.rows; j++) {
      start.push(q);
      q += f.layers;
    }
  }
  start.push(q);
  return { order, start: Int32Array.from(start) };
}

/** rc = P^T r. */
export function restrictWith(p: Prolongation, r: Float64Array, rc: Float64Array): void {
  rc.fill(0);
  const n = p.rowStart.length - 1;
  for (let k = 0; k < n; k++) {
    const v = r[k];
    for (let e = p.rowStart[k]; e < p.rowStart[k + 1]; e++) rc[p.col[e]] += p.val[e] * v;
  }
}

/** x += P e. */
export function prolongAddWith(p: Prolongation, e: Float64Array, x: Float64Array): void {
  const n = p.rowStart.length - 1;
  for (let k = 0; k < n; k++) {
    let s = 0;
    for (let q = p.rowStart[k]; q < p.rowStart[k + 1]; q++) s += p.val[q] * e[p.col[q]];
    x[k] += s;
  }
}
