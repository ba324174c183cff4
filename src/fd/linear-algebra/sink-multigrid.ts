/**
 * The preconditioner of the 3-D sink systems: a symmetric multigrid V(1,1) cycle on a hierarchy of
 *   level 0   the sink as assembled;
 *   (fold)    fins as full 3-D cells only: each fin's cells across its thickness summed onto one sheet node
 *             (weight 1), giving the layout of the sheet representation;
 *   level l+1 the plate's cells and the fins' nodes coarsened by pairs in the strongly coupled directions
 *             (semi-coarsening, aggregation.ts), down to at most COARSEST unknowns,
 * with linear transfers P and P^T, the fold's Galerkin operator (galerkin-csr.ts) and below it the merged
 * operators of sink-coarse-operator.ts (the re-discretisation's conductances, the fine sparsity), one forward sweep of line Gauss-Seidel before
 * the coarse correction and one backward sweep after it on every level (line-relaxation.ts: the plate's z
 * columns and the fins' lines along their height; a thin plate couples far more strongly across its thickness
 * than along it), and a Cholesky solve in the envelope on the coarsest level (envelope-cholesky.ts). Backward after forward, restriction the
 * transpose of prolongation and symmetric positive definite coarse operators make the cycle symmetric positive
 * definite, as CG needs (Tatebe 1993, "The multigrid preconditioned
 * conjugate gradient method", NASA CP-3224 [from memory]).
 */
import { coarseningDirections, levelUnknowns, prolongAddWith, restrictWith, type SinkLevelGrid } from './aggregation.js';
import { csrMultiply, csrResidual, type CsrMatrix } from './csr.js';
import { csrInMemory, csrMemoryBytes, type CsrKernels } from './csr-in-memory.js';
import { envelopeCholesky, type CholeskyFactor } from './envelope-cholesky.js';
import { galerkinCsr } from './galerkin-csr.js';
import type { Prolongation } from './prolongation.js';
import { buildLineRelaxation, lineRelaxationBytes, type LineSet } from './line-relaxation.js';
import { stencilEntries, stencilFromCsr, stencilLines, stencilToCsr, type SinkStencil } from './sink-stencil.js';
import { stencilInMemory, stencilMemoryBytes, stencilMultiply, stencilResidual, type KernelProducts } from './sink-stencil-product.js';
import { stencilCoarseOperator } from './sink-stencil-coarse.js';
import { relaxationBytes, stencilRelaxation, type RelaxationPrecision } from './sink-stencil-relaxation.js';
import { sinkTransfer, transferApply, transferBytes, type SinkTransfer, type TransferApply } from './sink-transfer.js';
import { dot } from './vector-ops.js';
import { MemoryPlan, tryKernelMemory, type KernelMemory } from '../wasm/kernel-memory.js';

export interface Preconditioner {
  /** z = M^-1 r (r unchanged); returns r · z (CG's next inner product, summed as the cycle's last sweep forms z). */
  apply(r: Float64Array, z: Float64Array): number;
  /** A line describing the method, for reports. */
  readonly method: string;
  /** Unknowns per level, finest first. */
  readonly levels: number[];
  /** Matrix entries per level, finest first (their sum over the first is the operator complexity). */
  readonly entries?: number[];
  /**
   * A by the preconditioner's own structured copy, when `a` is the matrix it was built from (the same products as
   * csrMultiply and csrResidual, up to the order of the sums); null otherwise.
   */
  operator?(a: CsrMatrix): StructuredOperator | null;
  /**
   * A vector of the system's size that apply overwrites and leaves free between applications (the finest level's
   * residual), for a caller's own scratch: CG keeps A p there, one new vector fewer to touch.
   */
  readonly workspace?: Float64Array;
  /** CG's vectors in the preconditioner's kernel memory, for one CG run at a time (see CgScratch). */
  readonly scratch?: CgScratch;
}

/**
 * Five vectors of the system's size in a preconditioner's kernel memory, for CG's residual r, z = M^-1 r, direction
 * p, iterate x and right-hand side b, with CG's two vector updates as WebAssembly (stencil-products.ts cgStep and cgDirection, the same
 * operations as sparse-pcg.ts step and direction): apply, the structured products and the updates then read and
 * write them without a copy. Valid for one CG run at a time.
 */
export interface CgScratch {
  readonly r: Float64Array;
  readonly z: Float64Array;
  readonly p: Float64Array;
  readonly x: Float64Array;
  /** For a copy of the right-hand side (the residuals then run as WebAssembly too). */
  readonly b: Float64Array;
  /** Whether v is a view into the same memory. */
  holds(v: Float64Array): boolean;
  /** x += alpha p, r −= alpha q (q in the same memory, e.g. the workspace); returns |r|_1. */
  step(alpha: number, q: Float64Array): number;
  /** p = z + beta p. */
  direction(beta: number): void;
}

export interface StructuredOperator {
  /** out = A x; returns x · out. */
  multiply(x: Float64Array, out: Float64Array): number;
  /** out = b − A x (difference form); returns |out|_1. */
  residual(x: Float64Array, b: Float64Array, out: Float64Array): number;
}

/** Unknowns of the coarsest level, solved by Cholesky in the envelope (at most ~n^3/6 = 1e7 multiply-adds at 400). */
const COARSEST = 400;

/** A level: its smoother, its residual and the transfers to the next coarser level (null on the coarsest). */
interface Level {
  n: number;
  /** Stored matrix entries (counted when asked). */
  entries(): number;
  /** A backward sweep; withDot: returns b · x of its result (0 otherwise). */
  postsmooth(b: Float64Array, x: Float64Array, withDot: boolean): number;
  /** x = 0, a forward sweep, then r = b − A x. */
  presmooth(b: Float64Array, x: Float64Array, r: Float64Array): void;
  down: TransferApply | null;
  /**
   * Work vectors, allocated on first use (levelVectors): the finest level's b and x are the cycle's arguments, so
   * it needs r alone and the coarsest needs no r; each vector not made saves its first touch, which costs more
   * than the arithmetic on it (the kernel maps and zeroes every new page: ~3 ms per MB on the development machine).
   */
  r: Float64Array;
  x: Float64Array;
  b: Float64Array;
}

const EMPTY = new Float64Array(0);

function csrLevel(a: CsrMatrix, lines: LineSet, memory: KernelMemory | null, kernels: CsrKernels | null): Level {
  const relax = buildLineRelaxation(a, lines, memory);
  const residual = (x: Float64Array, b: Float64Array, r: Float64Array): void => {
    if (kernels !== null && memory !== null && memory.holds(x) && memory.holds(b) && memory.holds(r)) kernels.residual(x, b, r);
    else csrResidual(a, x, b, r);
  };
  return {
    n: a.n,
    entries: () => a.col.length,
    postsmooth(b, x, withDot) {
      relax.sweep(b, x, 'backward');
      return withDot ? dot(b, x) : 0;
    },
    presmooth(b, x, r) {
      x.fill(0);
      relax.sweep(b, x, 'forward');
      residual(x, b, r);
    },
    down: null,
    r: EMPTY,
    x: EMPTY,
    b: EMPTY,
  };
}

function stencilLevel(s: SinkStencil, precision: RelaxationPrecision, memory: KernelMemory | null): Level {
  const relax = stencilRelaxation(s, precision, memory);
  return {
    n: s.n,
    entries: () => stencilEntries(s),
    postsmooth(b, x, withDot) {
      if (withDot) return relax.backwardDot(b, x);
      relax.sweep(b, x, 'backward');
      return 0;
    },
    presmooth: (b, x, r) => relax.forwardResidual(b, x, r),
    down: null,
    r: EMPTY,
    x: EMPTY,
    b: EMPTY,
  };
}

/**
 * Each level's work vectors: b and x below the finest; r where a coarser level follows, all of them views of one
 * vector of the finest size, since a level's residual is read only by its restriction, before the next level
 * forms its own (the cycle's order: presmooth, restrict, recurse).
 */
function levelVectors(levels: Level[], memory: KernelMemory | null): void {
  const vector = (n: number) => (memory !== null ? memory.f64(n) : new Float64Array(n));
  const residual = vector(levels.length > 1 ? levels[0].n : 0);
  levels.forEach((level, l) => {
    if (l + 1 < levels.length) level.r = residual.subarray(0, level.n);
    if (l > 0) {
      level.b = vector(level.n);
      level.x = vector(level.n);
    }
  });
}

/**
 * The kernel memory's size for the stencil levels' smoothers and transfers, the level vectors, CG's five scratch
 * vectors and (operator: a float64 finest stencil) the copy the product kernels read.
 */
function memoryBytes(
  levelSizes: number[],
  stencils: SinkStencil[],
  steps: SinkTransfer[],
  precision: RelaxationPrecision,
  operator: SinkStencil | null,
): number {
  const plan = new MemoryPlan();
  if (operator !== null) plan.add(stencilMemoryBytes(operator), 1);
  for (const s of stencils) plan.add(relaxationBytes(s, precision), 1);
  for (const t of steps) plan.add(transferBytes(t), 1);
  if (levelSizes.length > 1) plan.add(levelSizes[0], 8);
  for (let l = 1; l < levelSizes.length; l++) plan.add(levelSizes[l], 8).add(levelSizes[l], 8);
  for (let k = 0; k < 5; k++) plan.add(levelSizes[0], 8);
  return plan.bytes;
}

/** Whether a stencil's couplings are float64 (the product kernels read no other). */
function float64Stencil(s: SinkStencil): boolean {
  return s.line instanceof Float64Array && s.gx instanceof Float64Array && s.gy instanceof Float64Array && s.row instanceof Float64Array;
}

/** A by its CSR kernels on vectors in the memory, by csr.ts otherwise. */
function csrOperator(a: CsrMatrix, k: CsrKernels, memory: KernelMemory): StructuredOperator {
  return {
    multiply(x, out) {
      if (memory.holds(x) && memory.holds(out)) k.multiply(x, out);
      else csrMultiply(a, x, out);
      return dot(x, out);
    },
    residual: (x, b, out) => (memory.holds(x) && memory.holds(b) && memory.holds(out) ? k.residual(x, b, out) : csrResidual(a, x, b, out)),
  };
}

function cgScratch(memory: KernelMemory, n: number): CgScratch {
  const r = memory.f64(n);
  const z = memory.f64(n);
  const p = memory.f64(n);
  const x = memory.f64(n);
  const b = memory.f64(n);
  const k = memory.kernels;
  return {
    r,
    z,
    p,
    x,
    b,
    holds: (v) => memory.holds(v),
    step: (alpha, q) => k.cgStep(n, alpha, p.byteOffset, q.byteOffset, x.byteOffset, r.byteOffset),
    direction: (beta) => k.cgDirection(n, beta, z.byteOffset, p.byteOffset),
  };
}

/** The CSR fold (fins as cells onto sheets) as a level's transfers. */
function foldTransfer(p: Prolongation): TransferApply {
  return { restrict: (r, rc) => restrictWith(p, r, rc), prolongAdd: (e, x) => prolongAddWith(p, e, x) };
}

/** Whether the assembled lines are the level grid's (sheets: plate columns, then fin rows, in index order). */
function linesAreStencilLines(lines: LineSet, grid: SinkLevelGrid): boolean {
  const own = stencilLines(grid);
  if (lines.start.length !== own.first.length + 1) return false;
  for (let l = 0; l < own.first.length; l++) if (lines.start[l] !== own.first[l]) return false;
  for (let q = 0; q < lines.order.length; q++) if (lines.order[q] !== q) return false;
  return true;
}

/**
 * `grid` describes the unknowns of the sheet layout (aggregation.ts); `fold`, when given, maps the assembled
 * unknowns onto it first (fins as cells); `assembled`, when given, is `a` as its stencil (sink-system.ts), read
 * from the matrix otherwise. Every level in the sheet layout is held as its structured stencil
 * (sink-stencil.ts) with the direction-by-direction transfers of sink-transfer.ts; fins as cells keep their CSR
 * matrix and line relaxation on the finest level.
 * `precision` is the storage of the stencil levels' smoother coefficients (sink-stencil-relaxation.ts): 'float32'
 * halves the sweeps' memory traffic and leaves the cycle symmetric only to ~1e-7 relative (the float32 rounding of
 * the couplings and line factors); CG, whose products and residuals use `a` itself in float64, still reaches the
 * same residual target (tests/sink/solver.test.ts compares the two).
 */
export function sinkMultigrid(
  a: CsrMatrix,
  lines: LineSet,
  grid: SinkLevelGrid,
  fold: Prolongation | null = null,
  assembled: SinkStencil | null = null,
  precision: RelaxationPrecision = 'float64',
): Preconditioner {
  // The hierarchy first (a CSR level where the finest is not a stencil, then the stencils with the transfers between
  // them), the smoothers after, once the kernel memory that holds them is sized.
  const csrFinest = fold !== null || a.n <= COARSEST || !linesAreStencilLines(lines, grid);
  /** The stencil levels, finest first; `stencil` the one the next coarsening starts from. */
  const stencils: SinkStencil[] = [];
  const steps: SinkTransfer[] = [];
  let finest: SinkStencil | null = null;
  let stencil: SinkStencil | null = null;
  if (csrFinest) {
    if (fold !== null) {
      stencil = stencilFromCsr(galerkinCsr(a, fold), grid);
      stencils.push(stencil);
    } else if (a.n > COARSEST) {
      // Lines other than the grid's: the finest level in CSR, every coarser one a stencil.
      if (levelUnknowns(grid) !== a.n) throw new Error('sinkMultigrid: the level grid does not describe the system');
      stencil = stencilFromCsr(a, grid);
    }
  } else {
    finest = assembled ?? stencilFromCsr(a, grid);
    stencil = finest;
    stencils.push(finest);
  }
  if (stencil !== null && stencil.n !== levelUnknowns(grid)) throw new Error('sinkMultigrid: the level grid does not describe the system');
  let g = grid;
  while (stencil !== null && stencil.n > COARSEST) {
    const t = sinkTransfer(g, coarseningDirections(g));
    const coarse = stencilCoarseOperator(stencil, t, precision);
    if (coarse.n === stencil.n) break;
    steps.push(t);
    stencil = coarse;
    stencils.push(stencil);
    g = t.coarse;
  }
  // A stencil level with lines to sweep (the one-level case is a direct solve): its smoothers in WebAssembly.
  const levelSizes = [...(csrFinest ? [a.n] : []), ...stencils.map((s) => s.n)];
  const operatorStencil = finest !== null && float64Stencil(finest) ? finest : null;
  let memory: KernelMemory | null = null;
  if (stencils.length > 0 && levelSizes.length > 1) {
    const bytes = memoryBytes(levelSizes, stencils, steps, precision, operatorStencil);
    memory = tryKernelMemory(bytes + (csrFinest ? csrMemoryBytes(a) + lineRelaxationBytes(a, lines) : 0));
  }
  const products: KernelProducts | null = memory !== null && operatorStencil !== null ? stencilInMemory(operatorStencil, memory) : null;
  const csrProducts: CsrKernels | null = memory !== null && csrFinest ? csrInMemory(a, memory) : null;
  // A CSR finest level (fins as cells, or other lines): its line relaxation and products as CSR kernels.
  const csr = csrFinest ? csrLevel(a, lines, memory, csrProducts) : null;
  if (csr !== null && fold !== null) csr.down = foldTransfer(fold);
  const levels: Level[] = [...(csr !== null ? [csr] : []), ...stencils.map((s) => stencilLevel(s, precision, memory))];
  // The coarsenings' transfers belong to the levels they leave: after the fold's level when there is one.
  const first = fold !== null ? 1 : 0;
  steps.forEach((t, k) => (levels[first + k].down = transferApply(t, memory)));
  const direct: CholeskyFactor = envelopeCholesky(levels.length === 1 && stencil === null ? a : stencilToCsr(stencil as SinkStencil));
  levelVectors(levels, memory);
  const scratch = memory !== null ? cgScratch(memory, levelSizes[0]) : undefined;

  /** One V-cycle from level l; returns b · x on the finest level (0 below it). */
  const cycle = (l: number, b: Float64Array, x: Float64Array): number => {
    const level = levels[l];
    if (l === levels.length - 1) {
      direct.solve(b, x);
      return l === 0 ? dot(b, x) : 0;
    }
    const next = levels[l + 1];
    const down = level.down as TransferApply;
    level.presmooth(b, x, level.r);
    down.restrict(level.r, next.b);
    cycle(l + 1, next.b, next.x);
    down.prolongAdd(next.x, x);
    return level.postsmooth(b, x, l === 0);
  };
  return {
    method: `CG preconditioned by a multigrid V(1,1) cycle (z-line Gauss-Seidel, semi-coarsening of plate and fins with linear transfers, ${levels.length} levels)`,
    levels: levels.map((l) => l.n),
    get entries() {
      return levels.map((l) => l.entries());
    },
    apply: (r, z) => cycle(0, r, z),
    workspace: levels.length > 1 ? levels[0].r : undefined,
    scratch,
    operator(m) {
      if (m === a && csrProducts !== null && memory !== null) return csrOperator(a, csrProducts, memory);
      if (m !== a || finest === null) return null;
      const s = finest;
      const held = (...v: Float64Array[]) => products !== null && memory !== null && v.every((u) => memory.holds(u));
      return {
        multiply: (x, out) => (held(x, out) ? (products as KernelProducts).multiply(x, out) : stencilMultiply(s, x, out)),
        residual(x, b, out) {
          if (held(x, b, out)) return (products as KernelProducts).residual(x, b, out);
          stencilResidual(s, x, b, out);
          let norm = 0;
          for (let p = 0; p < out.length; p++) norm += Math.abs(out[p]);
          return norm;
        },
      };
    },
  };
}
