/**
 * Symmetric 9-point operators on a structured node grid: the matrix format every 2-D solver reads.
 *
 * Nodes are numbered with the short (thickness) direction fastest: p = i * nodesY + j, with
 * i = 0..nodesX-1 along the fin and j = 0..nodesY-1 across it. A symmetric matrix whose couplings reach
 * only the eight neighbours is stored as five node arrays (the upper half of the stencil):
 *   diag[p]       A(p, p)
 *   east[p]       A(p, (i+1, j))        = A((i+1, j), p)
 *   north[p]      A(p, (i, j+1))
 *   northEast[p]  A(p, (i+1, j+1))
 *   southEast[p]  A(p, (i+1, j-1))
 * so that
 *   (A x)_p = diag_p x_p + east_p x_E + east_W x_W + north_p x_N + north_S x_S
 *           + northEast_p x_NE + northEast_SW x_SW + southEast_p x_SE + southEast_NW x_NW.
 * Entries that would point outside the grid are zero. Any symmetric matrix in this form has bandwidth
 * nodesY + 1, which is what the banded Cholesky factor exploits.
 */

export interface Stencil9 {
  readonly nodesX: number;
  readonly nodesY: number;
  readonly diag: Float64Array;
  readonly east: Float64Array;
  readonly north: Float64Array;
  readonly northEast: Float64Array;
  readonly southEast: Float64Array;
}

/**
 * A linear system A theta = rhs with A symmetric positive definite in the 9-point form.
 * `excess`, when given, is the exact row sum of A (for a conduction matrix: the conductance of each node
 * to fixed-temperature surroundings). Residuals are then evaluated in difference form,
 *   (A x)_p = sum_{q != p} A_pq (x_q - x_p) + excess_p x_p,
 * which does not lose the small heat flows along a thin fin to round-off in the large couplings across it.
 */
export interface System2D {
  readonly matrix: Stencil9;
  readonly rhs: Float64Array;
  readonly excess?: Float64Array;
}

/** Any solver of a 2-D system: returns the solution (a new array). */
export type Solver2D = (system: System2D) => Float64Array;

export function emptyStencil9(nodesX: number, nodesY: number): Stencil9 {
  const n = nodesX * nodesY;
  return {
    nodesX,
    nodesY,
    diag: new Float64Array(n),
    east: new Float64Array(n),
    north: new Float64Array(n),
    northEast: new Float64Array(n),
    southEast: new Float64Array(n),
  };
}

/**
 * Adds `value` to the symmetric pair A(p, q) = A(q, p), where q is the neighbour (di, dj) of p = (i, j),
 * with (di, dj) one of the eight neighbour offsets or (0, 0) for the diagonal.
 */
export function addCoupling(a: Stencil9, i: number, j: number, di: number, dj: number, value: number): void {
  const ny = a.nodesY;
  // Normalise to the upper half: di > 0, or di = 0 and dj > 0.
  if (di < 0 || (di === 0 && dj < 0)) {
    i += di;
    j += dj;
    di = -di;
    dj = -dj;
  }
  const p = i * ny + j;
  if (di === 0 && dj === 0) a.diag[p] = (a.diag[p] as number) + value;
  else if (di === 0 && dj === 1) a.north[p] = (a.north[p] as number) + value;
  else if (di === 1 && dj === 0) a.east[p] = (a.east[p] as number) + value;
  else if (di === 1 && dj === 1) a.northEast[p] = (a.northEast[p] as number) + value;
  else if (di === 1 && dj === -1) a.southEast[p] = (a.southEast[p] as number) + value;
  else throw new RangeError(`addCoupling: (${di}, ${dj}) is not a 9-point neighbour`);
}

/** out = A x (out may not alias x). */
export function applyStencil9(a: Stencil9, x: Float64Array, out: Float64Array): Float64Array {
  const { nodesX: nx, nodesY: ny, diag, east, north, northEast, southEast } = a;
  for (let i = 0; i < nx; i++) {
    const base = i * ny;
    for (let j = 0; j < ny; j++) {
      const p = base + j;
      let s = (diag[p] as number) * (x[p] as number);
      if (j + 1 < ny) s += (north[p] as number) * (x[p + 1] as number);
      if (j > 0) s += (north[p - 1] as number) * (x[p - 1] as number);
      if (i + 1 < nx) {
        s += (east[p] as number) * (x[p + ny] as number);
        if (j + 1 < ny) s += (northEast[p] as number) * (x[p + ny + 1] as number);
        if (j > 0) s += (southEast[p] as number) * (x[p + ny - 1] as number);
      }
      if (i > 0) {
        s += (east[p - ny] as number) * (x[p - ny] as number);
        if (j > 0) s += (northEast[p - ny - 1] as number) * (x[p - ny - 1] as number);
        if (j + 1 < ny) s += (southEast[p - ny + 1] as number) * (x[p - ny + 1] as number);
      }
      out[p] = s;
    }
  }
  return out;
}

/**
 * out = sum_{q != p} A_pq (x_q - x_p) + excess_p x_p: A x for a matrix whose row sums are `excess`
 * (zero for a conduction operator K), without the cancellation of the diagonal against the couplings.
 * Returns x . (A x), which conjugate gradients needs and costs nothing extra here. `fivePoint` (isFivePoint(a),
 * asked here unless given) lets the interior rows skip the four zero diagonal couplings: the same bits, 1.8x faster
 * (241 x 33 thin-fin grid: 49 us against 90 us).
 */
export function applyDifferenceForm(
  a: Stencil9,
  excess: Float64Array | null,
  x: Float64Array,
  out: Float64Array,
  fivePoint: boolean = isFivePoint(a),
): number {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = a;
  let energy = 0;
  for (let i = 0; i < nx; i++) {
    const start = i * ny;
    if (i === 0 || i === nx - 1 || ny < 3) {
      for (let j = 0; j < ny; j++) {
        const v = differenceRowChecked(a, excess, x, i, j);
        out[start + j] = v;
        energy += v * (x[start + j] as number);
      }
      continue;
    }
    const first = differenceRowChecked(a, excess, x, i, 0);
    out[start] = first;
    energy += first * (x[start] as number);
    if (fivePoint && excess !== null) {
      // Interior rows of a 5-point operator: the four diagonal couplings are zero, and adding their zero terms
      // would not change a single bit of the sum; left out, the loop reads four arrays fewer.
      for (let p = start + 1; p < start + ny - 1; p++) {
        const xp = x[p] as number;
        const pw = p - ny;
        const v =
          (excess[p] as number) * xp +
          (north[p] as number) * ((x[p + 1] as number) - xp) +
          (north[p - 1] as number) * ((x[p - 1] as number) - xp) +
          (east[p] as number) * ((x[p + ny] as number) - xp) +
          (east[pw] as number) * ((x[pw] as number) - xp);
        out[p] = v;
        energy += v * xp;
      }
      const lastRow = differenceRowChecked(a, excess, x, i, ny - 1);
      out[start + ny - 1] = lastRow;
      energy += lastRow * (x[start + ny - 1] as number);
      continue;
    }
    // Interior rows: every neighbour exists.
    for (let p = start + 1; p < start + ny - 1; p++) {
      const xp = x[p] as number;
      const pw = p - ny;
      const pe = p + ny;
      const v =
        (excess === null ? 0 : (excess[p] as number) * xp) +
        (north[p] as number) * ((x[p + 1] as number) - xp) +
        (north[p - 1] as number) * ((x[p - 1] as number) - xp) +
        (east[p] as number) * ((x[pe] as number) - xp) +
        (northEast[p] as number) * ((x[pe + 1] as number) - xp) +
        (southEast[p] as number) * ((x[pe - 1] as number) - xp) +
        (east[pw] as number) * ((x[pw] as number) - xp) +
        (northEast[pw - 1] as number) * ((x[pw - 1] as number) - xp) +
        (southEast[pw + 1] as number) * ((x[pw + 1] as number) - xp);
      out[p] = v;
      energy += v * xp;
    }
    const lastRow = differenceRowChecked(a, excess, x, i, ny - 1);
    out[start + ny - 1] = lastRow;
    energy += lastRow * (x[start + ny - 1] as number);
  }
  return energy;
}

/**
 * Whether a matrix has no diagonal couplings (rectangular cells): a scan of two arrays that stops at the first
 * coupling. A caller that multiplies by the same matrix many times (CG) asks once and passes the answer on.
 */
export function isFivePoint(a: Stencil9): boolean {
  const { northEast, southEast } = a;
  for (let p = 0; p < northEast.length; p++) if (northEast[p] !== 0 || southEast[p] !== 0) return false;
  return true;
}

function differenceRowChecked(a: Stencil9, excess: Float64Array | null, x: Float64Array, i: number, j: number): number {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = a;
  const p = i * ny + j;
  const xp = x[p] as number;
  let s = excess === null ? 0 : (excess[p] as number) * xp;
  if (j + 1 < ny) s += (north[p] as number) * ((x[p + 1] as number) - xp);
  if (j > 0) s += (north[p - 1] as number) * ((x[p - 1] as number) - xp);
  if (i + 1 < nx) {
    s += (east[p] as number) * ((x[p + ny] as number) - xp);
    if (j + 1 < ny) s += (northEast[p] as number) * ((x[p + ny + 1] as number) - xp);
    if (j > 0) s += (southEast[p] as number) * ((x[p + ny - 1] as number) - xp);
  }
  if (i > 0) {
    s += (east[p - ny] as number) * ((x[p - ny] as number) - xp);
    if (j > 0) s += (northEast[p - ny - 1] as number) * ((x[p - ny - 1] as number) - xp);
    if (j + 1 < ny) s += (southEast[p - ny + 1] as number) * ((x[p - ny + 1] as number) - xp);
  }
  return s;
}

/** Coupling A(p, q) between p = (i, j) and q = (i + di, j + dj), |di|, |dj| <= 1 (0 outside the grid). */
export function couplingOf(a: Stencil9, i: number, j: number, di: number, dj: number): number {
  const ni = i + di;
  const nj = j + dj;
  if (ni < 0 || nj < 0 || ni >= a.nodesX || nj >= a.nodesY) return 0;
  if (di < 0 || (di === 0 && dj < 0)) return couplingOf(a, ni, nj, -di, -dj);
  const p = i * a.nodesY + j;
  if (di === 0 && dj === 0) return a.diag[p] as number;
  if (di === 0) return a.north[p] as number;
  if (dj === 0) return a.east[p] as number;
  return dj === 1 ? (a.northEast[p] as number) : (a.southEast[p] as number);
}

/** r = rhs - A x (difference form when the system carries its row sums). */
export function residual(system: System2D, x: Float64Array, out: Float64Array = new Float64Array(x.length)): Float64Array {
  if (system.excess === undefined) applyStencil9(system.matrix, x, out);
  else applyDifferenceForm(system.matrix, system.excess, x, out);
  const b = system.rhs;
  for (let p = 0; p < out.length; p++) out[p] = (b[p] as number) - (out[p] as number);
  return out;
}

/**
 * rhs_p - (A x)_p at the given rows only, in difference form (the system must carry its row sums): the same value,
 * bit for bit, as residual(system, x)[p] (applyDifferenceForm computes every row as differenceRowChecked does, in
 * the same order; its interior shortcut only leaves out terms that are exactly zero). For callers that know the
 * other rows of two residuals agree, so that only these rows' difference matters (two-d/adjoint.ts).
 */
export function residualAt(system: System2D, x: Float64Array, rows: Int32Array): Float64Array {
  const { matrix: a, rhs, excess } = system;
  if (excess === undefined) throw new RangeError('residualAt: the system must carry its row sums (excess)');
  const ny = a.nodesY;
  const out = new Float64Array(rows.length);
  for (let r = 0; r < rows.length; r++) {
    const p = rows[r] as number;
    const i = Math.floor(p / ny);
    out[r] = (rhs[p] as number) - differenceRowChecked(a, excess, x, i, p - i * ny);
  }
  return out;
}

/** The full matrix as rows of numbers (small grids only: tests and dense reference solves). */
export function stencilToDense(a: Stencil9): number[][] {
  const n = a.nodesX * a.nodesY;
  if (n > 4000) throw new RangeError(`stencilToDense: ${n} unknowns is too many for a dense matrix`);
  const rows: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  const e = new Float64Array(n);
  const col = new Float64Array(n);
  for (let q = 0; q < n; q++) {
    e.fill(0);
    e[q] = 1;
    applyStencil9(a, e, col);
    for (let p = 0; p < n; p++) (rows[p] as number[])[q] = col[p] as number;
  }
  return rows;
}

/**
 * sum |rhs_p| over the rows that have at least one coupling: the scale of the heat flows, without the
 * identity rows of fixed nodes (their rhs is a temperature, not a heat flow).
 */
export function coupledRhsNorm1(system: System2D): number {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = system.matrix;
  const rhs = system.rhs;
  let s = 0;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const coupled =
        east[p] !== 0 ||
        north[p] !== 0 ||
        northEast[p] !== 0 ||
        southEast[p] !== 0 ||
        (j > 0 && north[p - 1] !== 0) ||
        (i > 0 && (east[p - ny] !== 0 || (j > 0 && northEast[p - ny - 1] !== 0) || (j + 1 < ny && southEast[p - ny + 1] !== 0)));
      if (coupled) s += Math.abs(rhs[p] as number);
    }
  }
  return s;
}

/**
 * The same operator with the roles of i and j exchanged (node (i, j) becomes (j, i)): lets a banded
 * factorisation number the shorter direction fastest on grids with fewer nodes along than across.
 */
export function transposeStencil9(a: Stencil9): Stencil9 {
  const { nodesX: nx, nodesY: ny } = a;
  const t = emptyStencil9(ny, nx);
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const q = j * nx + i; // (j, i) in the transposed grid
      t.diag[q] = a.diag[p] as number;
      t.north[q] = a.east[p] as number; // (i+1, j) -> (j, i+1)
      t.east[q] = a.north[p] as number; // (i, j+1) -> (j+1, i)
      t.northEast[q] = a.northEast[p] as number; // (i+1, j+1) -> (j+1, i+1)
      // A(p, (i+1, j-1)) -> A((j, i), (j-1, i+1)) = southEast stored at (j-1, i+1).
      if (j > 0) t.southEast[(j - 1) * nx + i + 1] = a.southEast[p] as number;
    }
  }
  return t;
}

/** Node values of a grid of nodesX x nodesY, renumbered for its transpose. */
export function transposeField(v: Float64Array, nodesX: number, nodesY: number): Float64Array {
  const out = new Float64Array(v.length);
  for (let i = 0; i < nodesX; i++) for (let j = 0; j < nodesY; j++) out[j * nodesX + i] = v[i * nodesY + j] as number;
  return out;
}
