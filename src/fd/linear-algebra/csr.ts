/**
 * Compressed sparse row (CSR) matrices for the 3-D sink systems, and their symmetric assembly.
 *
 * A symmetric conduction matrix is assembled as a diagonal plus a list of couplings (p, q, g): each coupling
 * adds g to A(p, p) and A(q, q) and −g to A(p, q) and A(q, p) (a conductance between two unknowns), so every
 * row sum is the node's conductance to fixed temperatures, which `addToDiagonal` adds. The CSR form then holds
 * both halves (row r: its diagonal, then its off-diagonal entries in the order the couplings were added).
 * Units are those of the problem (conductances W/K); the module is plain linear algebra.
 */

export interface CsrMatrix {
  readonly n: number;
  /** Row r's entries are [rowStart[r], rowStart[r + 1]). */
  readonly rowStart: Int32Array;
  readonly col: Int32Array;
  readonly val: Float64Array;
  /**
   * When present: each row's conductance to fixed temperatures (its row sum), with the diagonal stored first in
   * every row; residuals are then evaluated in difference form (csrResidual).
   */
  readonly excess?: Float64Array;
}

/** Diagonal plus symmetric couplings, grown as the assembly adds them. */
export class ConductanceBuilder {
  readonly diagonal: Float64Array;
  /** Each unknown's conductance to fixed temperatures (the row sums; the CSR form's `excess`). */
  readonly excess: Float64Array;
  private p: Int32Array;
  private q: Int32Array;
  private g: Float64Array;
  private count = 0;

  /** `capacity`: the couplings expected (the lists grow past it by doubling). */
  constructor(
    readonly n: number,
    capacity = 1024,
  ) {
    this.diagonal = new Float64Array(n);
    this.excess = new Float64Array(n);
    const size = Math.max(16, capacity);
    this.p = new Int32Array(size);
    this.q = new Int32Array(size);
    this.g = new Float64Array(size);
  }

  /** A conductance g (> 0) between unknowns p and q. */
  couple(p: number, q: number, g: number): void {
    if (this.count === this.p.length) this.grow();
    this.p[this.count] = p;
    this.q[this.count] = q;
    this.g[this.count] = g;
    this.count++;
    this.diagonal[p] += g;
    this.diagonal[q] += g;
  }

  /** A conductance g from unknown p to a fixed temperature (its value goes into the right-hand side). */
  addToDiagonal(p: number, g: number): void {
    this.diagonal[p] += g;
    this.excess[p] += g;
  }

  get couplings(): number {
    return this.count;
  }

  /** The couplings added so far (views, in the order added): conductance g[c] between p[c] and q[c]. */
  couplingList(): { p: Int32Array; q: Int32Array; g: Float64Array } {
    return { p: this.p.subarray(0, this.count), q: this.q.subarray(0, this.count), g: this.g.subarray(0, this.count) };
  }

  toCsr(): CsrMatrix {
    const n = this.n;
    const rowStart = csrRowStarts(n, this.p, this.q, this.count);
    const nnz = rowStart[n];
    const col = new Int32Array(nnz);
    const val = new Float64Array(nnz);
    csrScatter(n, this.diagonal, this.p, this.q, this.g, this.count, rowStart, col, val);
    return { n, rowStart, col, val, excess: this.excess };
  }

  private grow(): void {
    const size = this.p.length * 2;
    const p = new Int32Array(size);
    const q = new Int32Array(size);
    const g = new Float64Array(size);
    p.set(this.p);
    q.set(this.q);
    g.set(this.g);
    this.p = p;
    this.q = q;
    this.g = g;
  }
}

/*
 * toCsr's passes, one loop a function: a function whose one loop is hot is optimised with the feedback of all its
 * code (the method is called once a grid; a loop compiled on its own entry left the loops after it without feedback,
 * and each of them deoptimised it again).
 */

/** Row starts: each row its diagonal and one entry per coupling it takes part in. */
function csrRowStarts(n: number, p: Int32Array, q: Int32Array, count: number): Int32Array {
  const rowStart = new Int32Array(n + 1).fill(1);
  rowStart[0] = 0;
  countCouplings(p, q, count, rowStart);
  prefixSums(rowStart);
  return rowStart;
}

function countCouplings(p: Int32Array, q: Int32Array, count: number, rowStart: Int32Array): void {
  for (let c = 0; c < count; c++) {
    rowStart[p[c] + 1]++;
    rowStart[q[c] + 1]++;
  }
}

/** a[k] += a[k − 1], k ascending. */
function prefixSums(a: Int32Array): void {
  for (let k = 1; k < a.length; k++) a[k] += a[k - 1];
}

/** Each row's diagonal first, then −g of its couplings in the order added. */
function csrScatter(
  n: number,
  diagonal: Float64Array,
  p: Int32Array,
  q: Int32Array,
  g: Float64Array,
  count: number,
  rowStart: Int32Array,
  col: Int32Array,
  val: Float64Array,
): void {
  const fill = rowStart.slice(0, n);
  scatterDiagonal(n, diagonal, fill, col, val);
  scatterCouplings(p, q, g, count, fill, col, val);
}

function scatterDiagonal(n: number, diagonal: Float64Array, fill: Int32Array, col: Int32Array, val: Float64Array): void {
  for (let r = 0; r < n; r++) {
    col[fill[r]] = r;
    val[fill[r]++] = diagonal[r];
  }
}

function scatterCouplings(p: Int32Array, q: Int32Array, g: Float64Array, count: number, fill: Int32Array, col: Int32Array, val: Float64Array): void {
  for (let c = 0; c < count; c++) {
    const a = p[c];
    const b = q[c];
    col[fill[a]] = b;
    val[fill[a]++] = -g[c];
    col[fill[b]] = a;
    val[fill[b]++] = -g[c];
  }
}

/**
 * The CSR form of `builder` as toCsr gives it, its arrays formed on first use: a system solved through another form
 * of the matrix (the 3-D sink's sheets: its multigrid's stencil, sink-stencil.ts) skips the pass over every coupling
 * and the first touch of 12 bytes an entry, unless something reads them (a residual of a perturbed system, a Newton
 * step). No couplings may be added to the builder afterwards; it is let go once the form is made.
 */
export function deferredCsr(builder: ConductanceBuilder): CsrMatrix {
  let source: ConductanceBuilder | null = builder;
  let formed: CsrMatrix | null = null;
  const form = (): CsrMatrix => {
    if (formed === null) {
      formed = (source as ConductanceBuilder).toCsr();
      source = null;
    }
    return formed;
  };
  return {
    n: builder.n,
    excess: builder.excess,
    get rowStart() {
      return form().rowStart;
    },
    get col() {
      return form().col;
    },
    get val() {
      return form().val;
    },
  };
}

/** out = A x (out may not alias x); in difference form when the matrix carries its `excess` (see csrResidual). */
export function csrMultiply(a: CsrMatrix, x: Float64Array, out: Float64Array): void {
  const { n, rowStart, col, val, excess } = a;
  if (excess !== undefined) {
    for (let r = 0; r < n; r++) {
      const xr = x[r];
      let s = excess[r] * xr;
      for (let e = rowStart[r] + 1; e < rowStart[r + 1]; e++) s += val[e] * (x[col[e]] - xr);
      out[r] = s;
    }
    return;
  }
  for (let r = 0; r < n; r++) {
    let s = 0;
    for (let e = rowStart[r]; e < rowStart[r + 1]; e++) s += val[e] * x[col[e]];
    out[r] = s;
  }
}

/**
 * out = b − A x; returns |out|_1. With `excess` the difference form
 *   (A x)_p = e_p x_p + sum_{q != p} A_pq (x_q − x_p),
 * which keeps the small heat flows of a nearly isothermal region (a plate of high conductivity) above the
 * round-off of its large couplings.
 */
export function csrResidual(a: CsrMatrix, x: Float64Array, b: Float64Array, out: Float64Array): number {
  const { n, rowStart, col, val, excess } = a;
  let norm = 0;
  if (excess !== undefined) {
    for (let r = 0; r < n; r++) {
      const xr = x[r];
      let s = b[r] - excess[r] * xr;
      for (let e = rowStart[r] + 1; e < rowStart[r + 1]; e++) s -= val[e] * (x[col[e]] - xr);
      out[r] = s;
      norm += Math.abs(s);
    }
    return norm;
  }
  for (let r = 0; r < n; r++) {
    let s = b[r];
    for (let e = rowStart[r]; e < rowStart[r + 1]; e++) s -= val[e] * x[col[e]];
    out[r] = s;
    norm += Math.abs(s);
  }
  return norm;
}

/** A(r, c), summing repeated entries; 0 when absent. */
export function csrEntry(a: CsrMatrix, r: number, c: number): number {
  let s = 0;
  for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) if (a.col[e] === c) s += a.val[e];
  return s;
}
