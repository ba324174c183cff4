/**
 * The linear transfers of one sink coarsening step (aggregation.ts) applied direction by direction: P is the
 * tensor product of one-dimensional cell-centred interpolations (3/4 from the own coarse cell, 1/4 from the nearer
 * neighbour, 1 at an edge; Wesseling, "An Introduction to Multigrid Methods", 1992, section 5.3 [from memory]),
 *   plate  P = P_x ⊗ P_y ⊗ P_z,   fin f  P_f = P_rows ⊗ P_layers,
 * so x += P e and r_c = P^T r are a pass per coarsened direction over contiguous blocks, with no stored matrix.
 * The same P as coarsenSinkLevel's CSR form (the product of the weights), up to the order of the sums.
 */
import { coarseLevelGrid, transfer, type SinkCoarsening, type SinkLevelGrid } from './aggregation.js';
import { MemoryPlan, type KernelMemory } from '../wasm/kernel-memory.js';

/** One direction: for each fine index its own coarse index, the neighbouring one, and the own one's weight. */
export interface AxisTransfer {
  readonly n: number;
  readonly nc: number;
  readonly coarsened: boolean;
  readonly own: Int32Array;
  readonly other: Int32Array;
  readonly w: Float64Array;
}

export interface SinkTransfer {
  readonly fine: SinkLevelGrid;
  readonly coarse: SinkLevelGrid;
  readonly x: AxisTransfer;
  readonly y: AxisTransfer;
  readonly z: AxisTransfer;
  readonly rows: AxisTransfer[];
  readonly layers: AxisTransfer[];
  /** Directions coarsened (the coarse operator's scale factors). */
  readonly coarsened: SinkCoarsening['coarsened'];
}

function axis(n: number, nc: number, coarsened: boolean): AxisTransfer {
  return { n, nc, coarsened, ...transfer(n, nc, coarsened) };
}

export function sinkTransfer(g: SinkLevelGrid, flags: SinkCoarsening['coarsened']): SinkTransfer {
  const coarse = coarseLevelGrid(g, flags);
  return {
    fine: g,
    coarse,
    x: axis(g.nx, coarse.nx, flags.x),
    y: axis(g.ny, coarse.ny, flags.y),
    z: axis(g.nz, coarse.nz, flags.z),
    rows: g.fins.map((f, k) => axis(f.rows, coarse.fins[k].rows, flags.rows[k])),
    layers: g.fins.map((f, k) => axis(f.layers, coarse.fins[k].layers, flags.layers[k])),
    coarsened: flags,
  };
}

/** One pass of r_c = P^T r along one direction: src [outer][n][inner] (from so) -> dst [outer][nc][inner] (from d0). */
function restrictAxis(t: AxisTransfer, outer: number, inner: number, src: Float64Array, so: number, dst: Float64Array, d0: number): void {
  const { n, nc, own, other, w } = t;
  dst.fill(0, d0, d0 + outer * nc * inner);
  for (let o = 0; o < outer; o++) {
    for (let i = 0; i < n; i++) {
      const s = so + (o * n + i) * inner;
      const a = d0 + (o * nc + own[i]) * inner;
      const wi = w[i];
      if (wi === 1) {
        for (let m = 0; m < inner; m++) dst[a + m] += src[s + m];
        continue;
      }
      const b = d0 + (o * nc + other[i]) * inner;
      const wo = 1 - wi;
      for (let m = 0; m < inner; m++) {
        const v = src[s + m];
        dst[a + m] += wi * v;
        dst[b + m] += wo * v;
      }
    }
  }
}

/** One pass of P e along one direction: src [outer][nc][inner] -> dst [outer][n][inner]; add: dst += instead of =. */
function prolongAxis(t: AxisTransfer, outer: number, inner: number, src: Float64Array, so: number, dst: Float64Array, d0: number, add: boolean): void {
  const { n, nc, own, other, w } = t;
  for (let o = 0; o < outer; o++) {
    for (let i = 0; i < n; i++) {
      const d = d0 + (o * n + i) * inner;
      const a = so + (o * nc + own[i]) * inner;
      const wi = w[i];
      const b = so + (o * nc + other[i]) * inner;
      const wo = 1 - wi;
      if (add) for (let m = 0; m < inner; m++) dst[d + m] += wi * src[a + m] + wo * src[b + m];
      else for (let m = 0; m < inner; m++) dst[d + m] = wi * src[a + m] + wo * src[b + m];
    }
  }
}

export interface TransferApply {
  /** r_c = P^T r. */
  restrict(r: Float64Array, rc: Float64Array): void;
  /** x += P e. */
  prolongAdd(e: Float64Array, x: Float64Array): void;
}

/** One pass over a block: the direction, the counts outside and inside it, and where it reads and writes. */
interface Pass {
  axis: AxisTransfer;
  outer: number;
  inner: number;
  /** 0: the vector given, 1 and 2: the scratch vectors, 3: the vector returned. */
  from: number;
  to: number;
  fromStart: number;
  toStart: number;
}

/** A block (the plate, or one fin) with no coarsened direction is copied (restriction) or added (prolongation). */
interface BlockPlan {
  passes: Pass[];
  fineStart: number;
  coarseStart: number;
  size: number;
}

interface TransferPlan {
  restrictPlan: BlockPlan[];
  prolongPlan: BlockPlan[];
  /** Size of each of the two scratch vectors. */
  scratch: number;
  /** The directions the passes use, each once. */
  axes: AxisTransfer[];
}

/** The bytes transferApply(t, memory) takes from `memory`: the scratch vectors and the passes' weight tables. */
export function transferBytes(t: SinkTransfer): number {
  const { scratch, axes } = planTransfer(t);
  const plan = new MemoryPlan().add(scratch, 8).add(scratch, 8);
  for (const a of axes)
    plan
      .add(a.n, 4)
      .add(a.n, 4)
      .add(a.n, 8)
      .add(a.nc + 1, 4)
      .add(2 * a.n, 4)
      .add(2 * a.n, 8);
  return plan.bytes;
}

/**
 * P^T of one direction by coarse cell: for coarse cell c its contributors k in start[c] .. start[c + 1] − 1, the
 * fine cells in ascending order with their weights (w_i to the own cell, 1 − w_i to the other unless w_i = 1): the
 * shares restrictAxis adds, in the order it adds them.
 */
export function gatherTable(a: AxisTransfer): { start: Int32Array; fine: Int32Array; weight: Float64Array } {
  const start = new Int32Array(a.nc + 1);
  for (let i = 0; i < a.n; i++) {
    start[a.own[i] + 1]++;
    if (a.w[i] !== 1) start[a.other[i] + 1]++;
  }
  for (let c = 0; c < a.nc; c++) start[c + 1] += start[c];
  const fill = start.slice(0, a.nc);
  const fine = new Int32Array(start[a.nc]);
  const weight = new Float64Array(start[a.nc]);
  for (let i = 0; i < a.n; i++) {
    const k = fill[a.own[i]]++;
    fine[k] = i;
    weight[k] = a.w[i];
    if (a.w[i] !== 1) {
      const o = fill[a.other[i]]++;
      fine[o] = i;
      weight[o] = 1 - a.w[i];
    }
  }
  return { start, fine, weight };
}

/**
 * The passes of P and P^T for a step, planned once; two scratch vectors hold the intermediate shapes of a block
 * coarsened in more than one direction. `memory`, when given (sized with transferBytes), holds the scratch vectors
 * and the weight tables: a transfer between vectors in the same block runs as WebAssembly
 * (src/fd/wasm/assembly/axis-transfers.ts, the same operations in the same order, so the same bits; P^T as a
 * gather by coarse cell, gatherTable).
 */
export function transferApply(t: SinkTransfer, memory: KernelMemory | null = null): TransferApply {
  const { restrictPlan, prolongPlan, scratch, axes } = planTransfer(t);
  const s1 = memory !== null ? memory.f64(scratch) : new Float64Array(scratch);
  const s2 = memory !== null ? memory.f64(scratch) : new Float64Array(scratch);
  const pick = (k: number, given: Float64Array, returned: Float64Array) => (k === 0 ? given : k === 1 ? s1 : k === 2 ? s2 : returned);
  /** Per direction, the byte offsets of its tables in the kernel memory. */
  const tables = new Map<AxisTransfer, { own: number; other: number; w: number; start: number; fine: number; weight: number }>();
  if (memory !== null) {
    for (const a of axes) {
      const g = gatherTable(a);
      tables.set(a, {
        own: memory.copyI32(a.own),
        other: memory.copyI32(a.other),
        w: memory.copyF64(a.w),
        start: memory.copyI32(g.start),
        fine: memory.copyI32(g.fine),
        weight: memory.copyF64(g.weight),
      });
    }
  }
  const kernels = (u: Float64Array, v: Float64Array) => (memory !== null && memory.holds(u) && memory.holds(v) ? memory.kernels : null);
  /** A pass's vector as the kernels take it: the byte offset of element 0 of the vector (the pass adds its start). */
  const at = (v: Float64Array) => v.byteOffset;

  return {
    restrict(r, rc) {
      const k = kernels(r, rc);
      for (const b of restrictPlan) {
        if (b.passes.length === 0) rc.set(r.subarray(b.fineStart, b.fineStart + b.size), b.coarseStart);
        for (const q of b.passes) {
          const src = pick(q.from, r, rc);
          const dst = pick(q.to, r, rc);
          const tab = tables.get(q.axis);
          if (k !== null && tab !== undefined)
            k.restrictGather(q.axis.n, q.axis.nc, tab.start, tab.fine, tab.weight, q.outer, q.inner, at(src), q.fromStart, at(dst), q.toStart);
          else restrictAxis(q.axis, q.outer, q.inner, src, q.fromStart, dst, q.toStart);
        }
      }
    },
    prolongAdd(e, x) {
      const k = kernels(e, x);
      for (const b of prolongPlan) {
        if (b.passes.length === 0) for (let m = 0; m < b.size; m++) x[b.fineStart + m] += e[b.coarseStart + m];
        for (const q of b.passes) {
          const src = pick(q.from, e, x);
          const dst = pick(q.to, e, x);
          const tab = tables.get(q.axis);
          if (k !== null && tab !== undefined)
            k.prolongAxis(q.axis.n, q.axis.nc, tab.own, tab.other, tab.w, q.outer, q.inner, at(src), q.fromStart, at(dst), q.toStart, q.to === 3 ? 1 : 0);
          else prolongAxis(q.axis, q.outer, q.inner, src, q.fromStart, dst, q.toStart, q.to === 3);
        }
      }
    },
  };
}

function planTransfer(t: SinkTransfer): TransferPlan {
  const blocks: { axes: AxisTransfer[]; fineStart: number; coarseStart: number }[] = [{ axes: [t.x, t.y, t.z], fineStart: 0, coarseStart: 0 }];
  let fineStart = t.fine.nx * t.fine.ny * t.fine.nz;
  let coarseStart = t.coarse.nx * t.coarse.ny * t.coarse.nz;
  t.fine.fins.forEach((f, k) => {
    blocks.push({ axes: [t.rows[k], t.layers[k]], fineStart, coarseStart });
    fineStart += f.rows * f.layers;
    coarseStart += t.coarse.fins[k].rows * t.coarse.fins[k].layers;
  });
  let scratch = 0;
  const product = (dims: number[], from: number, to: number) => dims.slice(from, to).reduce((s, v) => s * v, 1);
  /** Passes in the order given (restriction: outermost first; prolongation: innermost first). */
  const plan = (restriction: boolean): BlockPlan[] =>
    blocks.map((b) => {
      const dims = b.axes.map((a) => (restriction ? a.n : a.nc));
      const order = b.axes.map((a, d) => (a.coarsened ? d : -1)).filter((d) => d >= 0);
      if (!restriction) order.reverse();
      const passes: Pass[] = [];
      let from = 0;
      let fromStart = restriction ? b.fineStart : b.coarseStart;
      order.forEach((d, index) => {
        const a = b.axes[d];
        const last = index === order.length - 1;
        const to = last ? 3 : from === 1 ? 2 : 1;
        const toStart = last ? (restriction ? b.coarseStart : b.fineStart) : 0;
        passes.push({ axis: a, outer: product(dims, 0, d), inner: product(dims, d + 1, dims.length), from, to, fromStart, toStart });
        dims[d] = restriction ? a.nc : a.n;
        if (!last) scratch = Math.max(scratch, product(dims, 0, dims.length));
        from = to;
        fromStart = toStart;
      });
      return { passes, fineStart: b.fineStart, coarseStart: b.coarseStart, size: product(dims, 0, dims.length) };
    });
  const restrictPlan = plan(true);
  const prolongPlan = plan(false);
  const axes = [...new Set([...restrictPlan, ...prolongPlan].flatMap((b) => b.passes.map((q) => q.axis)))];
  return { restrictPlan, prolongPlan, scratch, axes };
}
