/**
 * Full 9-point stencils for the multigrid levels: one coefficient array per neighbour direction, so the
 * kernels read a node's row without looking up its neighbours' storage.
 *
 * c[k][p] = A(p, (i + di, j + dj)) with k = 3 (di + 1) + (dj + 1):
 *   k: 0 SW (-1,-1)  1 W (-1,0)  2 NW (-1,1)  3 S (0,-1)  4 centre  5 N (0,1)  6 SE (1,-1)  7 E (1,0)  8 NE (1,1).
 * Coefficients pointing outside the grid are zero. Conversion to and from the symmetric form of
 * stencil9.ts is exact. A 5-point operator (no diagonal couplings: rectangular cells, as on the fine grid
 * of a rectangular section) shares one zero array among its four diagonal directions and says so
 * (`diagonals: false`), so that kernels can skip them: 4 of 9 arrays less to allocate, copy and stream;
 * its centre, north and east arrays are the operator's own, not copies (no kernel writes a stencil).
 */
import { emptyStencil9, type Stencil9 } from './stencil9.js';

export interface FullStencil {
  readonly nodesX: number;
  readonly nodesY: number;
  /** false: the diagonal couplings (SW, NW, SE, NE) are all zero and share one array (do not write it). */
  readonly diagonals: boolean;
  readonly c: readonly [Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array, Float64Array];
}

export function emptyFullStencil(nodesX: number, nodesY: number): FullStencil {
  const n = nodesX * nodesY;
  const make = (): Float64Array => new Float64Array(n);
  return { nodesX, nodesY, diagonals: true, c: [make(), make(), make(), make(), make(), make(), make(), make(), make()] };
}

function allZero(v: Float64Array): boolean {
  for (let p = 0; p < v.length; p++) if (v[p] !== 0) return false;
  return true;
}

export function toFullStencil(a: Stencil9): FullStencil {
  const { nodesX: nx, nodesY: ny, diag, east, north, northEast, southEast } = a;
  const n = nx * ny;
  if (allZero(northEast) && allZero(southEast)) {
    const zero = new Float64Array(n);
    // The centre, north and east arrays are the operator's own (read only here: no copies).
    const [w, s, centre, nn, e] = [new Float64Array(n), new Float64Array(n), diag, north, east];
    s.set(north.subarray(0, n - 1), 1);
    if (n > ny) w.set(east.subarray(0, n - ny), ny);
    return { nodesX: nx, nodesY: ny, diagonals: false, c: [zero, w, zero, s, centre, nn, zero, e, zero] };
  }
  const f = emptyFullStencil(nx, ny);
  const [sw, w, nw, s, centre, nn, se, e, ne] = f.c;
  // Block copies: the symmetric form keeps every coupling that would point outside the grid at zero
  // (stencil9.ts), so the shifted copies below put zeros exactly where the full form needs them.
  centre.set(diag);
  nn.set(north);
  e.set(east);
  ne.set(northEast);
  se.set(southEast);
  s.set(north.subarray(0, n - 1), 1); // S(p) = N(p - 1)
  if (n > ny) {
    w.set(east.subarray(0, n - ny), ny); // W(p) = E(p - ny)
    nw.set(southEast.subarray(1, n - ny + 1), ny); // NW(p) = SE(p - ny + 1)
    if (n > ny + 1) sw.set(northEast.subarray(0, n - ny - 1), ny + 1); // SW(p) = NE(p - ny - 1)
  }
  return f;
}

/** The symmetric form (upper half); the lower half of a Galerkin operator equals it to round-off. */
export function toStencil9(f: FullStencil): Stencil9 {
  const a = emptyStencil9(f.nodesX, f.nodesY);
  a.diag.set(f.c[4]);
  a.north.set(f.c[5]);
  a.east.set(f.c[7]);
  a.northEast.set(f.c[8]);
  a.southEast.set(f.c[6]);
  return a;
}

/** out = A x. Interior rows run without bounds checks; the grid's edges take the checked path. */
export function applyFullStencil(f: FullStencil, x: Float64Array, out: Float64Array): void {
  const { nodesX: nx, nodesY: ny, c } = f;
  const [sw, w, nw, s, centre, n, se, e, ne] = c;
  for (let i = 0; i < nx; i++) {
    const start = i * ny;
    if (i === 0 || i === nx - 1 || ny < 3) {
      for (let j = 0; j < ny; j++) out[start + j] = rowChecked(f, x, i, j);
      continue;
    }
    out[start] = rowChecked(f, x, i, 0);
    for (let p = start + 1; p < start + ny - 1; p++) {
      const pw = p - ny;
      const pe = p + ny;
      out[p] =
        (centre[p] as number) * (x[p] as number) +
        (s[p] as number) * (x[p - 1] as number) +
        (n[p] as number) * (x[p + 1] as number) +
        (w[p] as number) * (x[pw] as number) +
        (sw[p] as number) * (x[pw - 1] as number) +
        (nw[p] as number) * (x[pw + 1] as number) +
        (e[p] as number) * (x[pe] as number) +
        (se[p] as number) * (x[pe - 1] as number) +
        (ne[p] as number) * (x[pe + 1] as number);
    }
    out[start + ny - 1] = rowChecked(f, x, i, ny - 1);
  }
}

function rowChecked(f: FullStencil, x: Float64Array, i: number, j: number): number {
  const { nodesX: nx, nodesY: ny, c } = f;
  const [sw, w, nw, s, centre, n, se, e, ne] = c;
  const p = i * ny + j;
  let v = (centre[p] as number) * (x[p] as number);
  if (j > 0) v += (s[p] as number) * (x[p - 1] as number);
  if (j + 1 < ny) v += (n[p] as number) * (x[p + 1] as number);
  if (i > 0) {
    v += (w[p] as number) * (x[p - ny] as number);
    if (j > 0) v += (sw[p] as number) * (x[p - ny - 1] as number);
    if (j + 1 < ny) v += (nw[p] as number) * (x[p - ny + 1] as number);
  }
  if (i + 1 < nx) {
    v += (e[p] as number) * (x[p + ny] as number);
    if (j > 0) v += (se[p] as number) * (x[p + ny - 1] as number);
    if (j + 1 < ny) v += (ne[p] as number) * (x[p + ny + 1] as number);
  }
  return v;
}
