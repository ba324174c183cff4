/**
 * Coarsening of a heat sink's unknowns for the 3-D sink multigrid (sink-multigrid.ts), level by level:
 *   plate cells: pairs of cells in x and in y become one coarse cell, each direction only where its mean cells are
 *     at most SEMI times the other in-plane direction's (semi-coarsening: the weakly coupled direction is left
 *     fine until the strong one catches up, since point-wise relaxation does not smooth errors along a weak
 *     direction; Trottenberg, Oosterlee & Schueller, "Multigrid", 2001, section 5.1 [from memory]); pairs of
 *     layers in z where the cells are flat (2 dz <= the smaller of the mean dx and dy) or nothing else can be
 *     coarsened (the z-line relaxation takes the rest of that anisotropy); an odd last cell stays alone;
 *   fin sheets (a plate fin's rows along y by its layers along the height) and pins (layers only): pairs of rows
 *     and pairs of layers, by the same rule between the rows' width and the layers' height.
 * Prolongation: cell-centred linear interpolation across pairs in every coarsened direction (3/4 from the own
 * coarse cell, 1/4 from the nearer neighbour, 1 at an edge; Wesseling, "An Introduction to Multigrid Methods",
 * 1992, section 5.3 [from memory]). Piecewise-constant interpolation with Galerkin operators lets the V-cycle
 * degrade level by level (measured on the 20-fin bench sink: 25, 32, 40 CG iterations on 16,640, 112,640 and
 * 819,200 unknowns; linear transfers and semi-coarsening: 11, 12, 13).
 * The aggregates (each fine unknown's own coarse unknown) and the coarsened directions also go to the coarse
 * operator (sink-coarse-operator.ts).
 * Unknowns of a level: plate cell (i, j, k) at (i ny + j) nz + k, then fin f's node (row J, layer l) at
 * its offset + J ns_f + l.
 */
import type { Prolongation } from './prolongation.js';

/** Semi-coarsening: an in-plane direction (or a fin's rows or layers) is coarsened only where its cells are at most this many times the other's. */
const SEMI = 1.5;

export interface SinkLevelGrid {
  nx: number;
  ny: number;
  nz: number;
  /** Mean cell sizes of the plate, m (they decide which directions are coarsened). */
  dx: number;
  dy: number;
  dz: number;
  /** Fins: rows along y (1 for a pin) and layers along the height, with their mean sizes, m. */
  fins: SinkLevelFin[];
}

export interface SinkLevelFin {
  rows: number;
  layers: number;
  /** Mean row width and layer height, m. */
  dy: number;
  ds: number;
}

/** One coarsening step: the coarse level, the prolongation, and what the coarse operator needs. */
export interface SinkCoarsening {
  coarse: SinkLevelGrid;
  p: Prolongation;
  /** Each fine unknown's own coarse unknown. */
  aggregate: Int32Array;
  /** Plate directions coarsened, and per fin whether its rows and its layers were. */
  coarsened: { x: boolean; y: boolean; z: boolean; rows: boolean[]; layers: boolean[] };
}

export function levelUnknowns(g: SinkLevelGrid): number {
  return g.nx * g.ny * g.nz + g.fins.reduce((s, f) => s + f.rows * f.layers, 0);
}

export function coarsenSinkLevel(g: SinkLevelGrid): SinkCoarsening {
  return coarsenWith(g, coarseningDirections(g));
}

/** The directions one coarsening step halves (the rule above). */
export function coarseningDirections(g: SinkLevelGrid): SinkCoarsening['coarsened'] {
  const cx = g.nx > 1 && (g.dx <= SEMI * g.dy || g.ny === 1);
  const cy = g.ny > 1 && (g.dy <= SEMI * g.dx || g.nx === 1);
  const cz = g.nz > 1 && (2 * g.dz <= Math.min(cx ? g.dx : Infinity, cy ? g.dy : Infinity) || (!cx && !cy));
  const rows = g.fins.map((f) => f.rows > 1 && (f.dy <= SEMI * f.ds || f.layers === 1));
  const layers = g.fins.map((f) => f.layers > 1 && (f.ds <= SEMI * f.dy || f.rows === 1));
  return { x: cx, y: cy, z: cz, rows, layers };
}

/**
 * The linear prolongation from one grid of a refinement study to the next finer one, when the finer one halves
 * every cell of the coarser (counts exactly doubled in x, y, z and along every fin's rows and layers; a count of 1
 * stays 1): the coarser grid's solution, prolonged, starts the finer grid's CG. Null when the grids are not nested so.
 */
export function nestedProlongation(coarse: SinkLevelGrid, fine: SinkLevelGrid): Prolongation | null {
  const doubled = (c: number, f: number): boolean | null => (f === 2 * c ? true : f === 1 && c === 1 ? false : null);
  const x = doubled(coarse.nx, fine.nx);
  const y = doubled(coarse.ny, fine.ny);
  const z = doubled(coarse.nz, fine.nz);
  if (x === null || y === null || z === null || coarse.fins.length !== fine.fins.length) return null;
  const rows = fine.fins.map((f, k) => doubled(coarse.fins[k].rows, f.rows));
  const layers = fine.fins.map((f, k) => doubled(coarse.fins[k].layers, f.layers));
  if (rows.some((r) => r === null) || layers.some((l) => l === null)) return null;
  return coarsenWith(fine, { x, y, z, rows: rows.map((r) => r === true), layers: layers.map((l) => l === true) }).p;
}

/**
 * nestedProlongation's P applied to the coarser grid's vector `e` (P e, a new vector), without forming P: the same
 * weights, products and sums in the same order as prolongAddWith on a zero vector, so the same bits; what starts a
 * finer grid's CG once, where P's ~8 entries a fine unknown would be formed (and their memory first touched) for a
 * single product. Null where nestedProlongation is.
 */
export function nestedProlongate(coarse: SinkLevelGrid, fine: SinkLevelGrid, e: Float64Array): Float64Array | null {
  const doubled = (c: number, f: number): boolean | null => (f === 2 * c ? true : f === 1 && c === 1 ? false : null);
  const cx = doubled(coarse.nx, fine.nx);
  const cy = doubled(coarse.ny, fine.ny);
  const cz = doubled(coarse.nz, fine.nz);
  if (cx === null || cy === null || cz === null || coarse.fins.length !== fine.fins.length) return null;
  const rows = fine.fins.map((f, k) => doubled(coarse.fins[k].rows, f.rows));
  const layers = fine.fins.map((f, k) => doubled(coarse.fins[k].layers, f.layers));
  if (rows.some((r) => r === null) || layers.some((l) => l === null)) return null;
  const { nx: nxc, ny: nyc, nz: nzc } = coarse;
  const out = new Float64Array(levelUnknowns(fine));
  prolongPlate(transfer(fine.nx, nxc, cx), transfer(fine.ny, nyc, cy), transfer(fine.nz, nzc, cz), nyc, nzc, e, out);
  let row = fine.nx * fine.ny * fine.nz;
  let offset = nxc * nyc * nzc;
  fine.fins.forEach((f, index) => {
    const c = coarse.fins[index];
    prolongFin(
      transfer(f.rows, c.rows, rows[index] === true),
      transfer(f.layers, c.layers, layers[index] === true),
      f.rows,
      f.layers,
      c.layers,
      offset,
      row,
      e,
      out,
    );
    row += f.rows * f.layers;
    offset += c.rows * c.layers;
  });
  return out;
}

type Transfer = ReturnType<typeof transfer>;

/** The plate rows of nestedProlongate (coarsenWith's plate loop, each entry's product summed at once). */
function prolongPlate(tx: Transfer, ty: Transfer, tz: Transfer, nyc: number, nzc: number, e: Float64Array, out: Float64Array): void {
  const nx = tx.w.length;
  const ny = ty.w.length;
  const nz = tz.w.length;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      for (let k = 0; k < nz; k++) {
        let s = 0;
        for (let a = 0; a < 2; a++) {
          const wa = a === 0 ? tx.w[i] : 1 - tx.w[i];
          if (wa === 0) continue;
          const ic = a === 0 ? tx.own[i] : tx.other[i];
          for (let b = 0; b < 2; b++) {
            const wb = b === 0 ? ty.w[j] : 1 - ty.w[j];
            if (wb === 0) continue;
            const jc = b === 0 ? ty.own[j] : ty.other[j];
            for (let d = 0; d < 2; d++) {
              const wd = d === 0 ? tz.w[k] : 1 - tz.w[k];
              if (wd === 0) continue;
              s += wa * wb * wd * e[(ic * nyc + jc) * nzc + (d === 0 ? tz.own[k] : tz.other[k])];
            }
          }
        }
        out[(i * ny + j) * nz + k] += s;
      }
    }
  }
}

/** One fin's rows of nestedProlongate (coarsenWith's fin loop), fine rows from `row`, coarse nodes from `offset`. */
function prolongFin(
  tr: Transfer,
  tl: Transfer,
  rows: number,
  layers: number,
  coarseLayers: number,
  offset: number,
  row: number,
  e: Float64Array,
  out: Float64Array,
): void {
  for (let j = 0; j < rows; j++) {
    for (let l = 0; l < layers; l++) {
      let s = 0;
      for (let a = 0; a < 2; a++) {
        const wa = a === 0 ? tr.w[j] : 1 - tr.w[j];
        if (wa === 0) continue;
        const jc = a === 0 ? tr.own[j] : tr.other[j];
        for (let d = 0; d < 2; d++) {
          const wd = d === 0 ? tl.w[l] : 1 - tl.w[l];
          if (wd === 0) continue;
          s += wa * wd * e[offset + jc * coarseLayers + (d === 0 ? tl.own[l] : tl.other[l])];
        }
      }
      out[row + j * layers + l] += s;
    }
  }
}

/** The coarse level of one step in the given directions (pairs of cells; an odd last one alone). */
export function coarseLevelGrid(g: SinkLevelGrid, flags: SinkCoarsening['coarsened']): SinkLevelGrid {
  const { x: cx, y: cy, z: cz, rows: rowsCoarsened, layers: layersCoarsened } = flags;
  return {
    nx: cx ? Math.ceil(g.nx / 2) : g.nx,
    ny: cy ? Math.ceil(g.ny / 2) : g.ny,
    nz: cz ? Math.ceil(g.nz / 2) : g.nz,
    dx: cx ? 2 * g.dx : g.dx,
    dy: cy ? 2 * g.dy : g.dy,
    dz: cz ? 2 * g.dz : g.dz,
    fins: g.fins.map((f, index) => ({
      rows: rowsCoarsened[index] ? Math.ceil(f.rows / 2) : f.rows,
      layers: layersCoarsened[index] ? Math.ceil(f.layers / 2) : f.layers,
      dy: rowsCoarsened[index] ? 2 * f.dy : f.dy,
      ds: layersCoarsened[index] ? 2 * f.ds : f.ds,
    })),
  };
}

function coarsenWith(g: SinkLevelGrid, flags: SinkCoarsening['coarsened']): SinkCoarsening {
  const { x: cx, y: cy, z: cz, rows: rowsCoarsened, layers: layersCoarsened } = flags;
  const coarse = coarseLevelGrid(g, flags);
  const { nx: nxc, ny: nyc, nz: nzc } = coarse;
  const coarseFins = coarse.fins;
  const n = levelUnknowns(g);
  const rowStart = new Int32Array(n + 1);
  const aggregate = new Int32Array(n);
  const tx = transfer(g.nx, nxc, cx);
  const ty = transfer(g.ny, nyc, cy);
  const tz = transfer(g.nz, nzc, cz);
  const fineTransfers = g.fins.map((f, index) => ({
    rows: transfer(f.rows, coarseFins[index].rows, rowsCoarsened[index]),
    layers: transfer(f.layers, coarseFins[index].layers, layersCoarsened[index]),
  }));
  // Entries of P: a tensor product, so the count is the product of each direction's (1 or 2 per index).
  const entries = (t: { w: Float64Array }) => t.w.reduce((sum, w) => sum + (w < 1 ? 2 : 1), 0);
  const size = entries(tx) * entries(ty) * entries(tz) + fineTransfers.reduce((sum, t) => sum + entries(t.rows) * entries(t.layers), 0);
  const col = new Int32Array(size);
  const val = new Float64Array(size);
  let e = 0;
  for (let i = 0; i < g.nx; i++) {
    for (let j = 0; j < g.ny; j++) {
      for (let k = 0; k < g.nz; k++) {
        const r = (i * g.ny + j) * g.nz + k;
        aggregate[r] = (tx.own[i] * nyc + ty.own[j]) * nzc + tz.own[k];
        for (let a = 0; a < 2; a++) {
          const wa = a === 0 ? tx.w[i] : 1 - tx.w[i];
          if (wa === 0) continue;
          const ic = a === 0 ? tx.own[i] : tx.other[i];
          for (let b = 0; b < 2; b++) {
            const wb = b === 0 ? ty.w[j] : 1 - ty.w[j];
            if (wb === 0) continue;
            const jc = b === 0 ? ty.own[j] : ty.other[j];
            for (let d = 0; d < 2; d++) {
              const wd = d === 0 ? tz.w[k] : 1 - tz.w[k];
              if (wd === 0) continue;
              col[e] = (ic * nyc + jc) * nzc + (d === 0 ? tz.own[k] : tz.other[k]);
              val[e++] = wa * wb * wd;
            }
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
    const { rows: tr, layers: tl } = fineTransfers[index];
    for (let j = 0; j < f.rows; j++) {
      for (let l = 0; l < f.layers; l++) {
        aggregate[fine] = offset + tr.own[j] * c.layers + tl.own[l];
        for (let a = 0; a < 2; a++) {
          const wa = a === 0 ? tr.w[j] : 1 - tr.w[j];
          if (wa === 0) continue;
          const jc = a === 0 ? tr.own[j] : tr.other[j];
          for (let d = 0; d < 2; d++) {
            const wd = d === 0 ? tl.w[l] : 1 - tl.w[l];
            if (wd === 0) continue;
            col[e] = offset + jc * c.layers + (d === 0 ? tl.own[l] : tl.other[l]);
            val[e++] = wa * wd;
          }
        }
        rowStart[++fine] = e;
      }
    }
    offset += c.rows * c.layers;
  });
  if (e !== size) throw new Error(`coarsenSinkLevel: ${e} prolongation entries, ${size} expected`);
  return {
    coarse,
    p: { rowStart, col, val, coarse: offset },
    aggregate,
    coarsened: { x: cx, y: cy, z: cz, rows: rowsCoarsened, layers: layersCoarsened },
  };
}

/** For each fine index: its own coarse index, the neighbouring one, and the own one's weight (1: no neighbour). */
export function transfer(n: number, nc: number, coarsened: boolean): { own: Int32Array; other: Int32Array; w: Float64Array } {
  const own = new Int32Array(n);
  const other = new Int32Array(n);
  const w = new Float64Array(n).fill(1);
  for (let i = 0; i < n; i++) {
    own[i] = coarsened ? i >> 1 : i;
    other[i] = own[i];
    if (!coarsened) continue;
    const o = i % 2 === 0 ? own[i] - 1 : own[i] + 1;
    if (o >= 0 && o < nc) {
      other[i] = o;
      w[i] = 0.75;
    }
  }
  return { own, other, w };
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
