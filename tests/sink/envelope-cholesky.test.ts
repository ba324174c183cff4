/**
 * The coarsest level's Cholesky in the envelope (src/fd/linear-algebra/envelope-cholesky.ts) against the dense
 * column-oriented algorithm it replaces (Golub & Van Loan, "Matrix Computations", 4th ed. 2013, Algorithm 4.2.1
 * [from memory], written out below as it stood in src/ before): the same solutions bit for bit, since the envelope
 * leaves out only products with an exact zero; and A x = b to round-off. The matrices are random conduction-like
 * ones (a positive diagonal dominating negative couplings) with the shapes of the sink's coarsest levels: a banded
 * plate block and a few far couplings to unknowns numbered after it (fin nodes to their root cells).
 */
import { describe, expect, it } from 'vitest';
import { ConductanceBuilder, type CsrMatrix } from '../../src/fd/linear-algebra/csr.js';
import { envelopeCholesky } from '../../src/fd/linear-algebra/envelope-cholesky.js';
import { SolverError } from '../../src/errors.js';

/** The dense algorithm (row-major n x n, lower triangle), as the multigrid used it. */
function denseSolve(a: CsrMatrix, b: Float64Array): Float64Array {
  const n = a.n;
  const l = new Float64Array(n * n);
  const at = (i: number, j: number): number => l[i * n + j]!;
  for (let r = 0; r < n; r++) for (let e = a.rowStart[r]!; e < a.rowStart[r + 1]!; e++) l[r * n + a.col[e]!] = at(r, a.col[e]!) + a.val[e]!;
  for (let j = 0; j < n; j++) {
    let d = at(j, j);
    for (let k = 0; k < j; k++) d -= at(j, k) * at(j, k);
    const root = Math.sqrt(d);
    l[j * n + j] = root;
    for (let i = j + 1; i < n; i++) {
      let s = at(i, j);
      for (let k = 0; k < j; k++) s -= at(i, k) * at(j, k);
      l[i * n + j] = s / root;
    }
  }
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i]!;
    for (let k = 0; k < i; k++) s -= at(i, k) * x[k]!;
    x[i] = s / at(i, i);
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i]!;
    for (let k = i + 1; k < n; k++) s -= at(k, i) * x[k]!;
    x[i] = s / at(i, i);
  }
  return x;
}

/** A deterministic generator (xorshift32), so a failure repeats. */
function random(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => {
    s ^= s << 13;
    s ^= s >>> 17;
    s ^= s << 5;
    return (s >>> 0) / 2 ** 32;
  };
}

/** A plate block of nx x ny x nz cells (7-point couplings) and `extra` unknowns after it, each coupled to a plate top cell and its neighbour. */
function conductionLike(nx: number, ny: number, nz: number, extra: number, seed: number): CsrMatrix {
  const rnd = random(seed);
  const plate = nx * ny * nz;
  const n = plate + extra;
  const builder = new ConductanceBuilder(n);
  const cell = (i: number, j: number, k: number) => (i * ny + j) * nz + k;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      for (let k = 0; k < nz; k++) {
        if (i + 1 < nx) builder.couple(cell(i, j, k), cell(i + 1, j, k), 0.5 + rnd());
        if (j + 1 < ny) builder.couple(cell(i, j, k), cell(i, j + 1, k), 0.5 + rnd());
        if (k + 1 < nz) builder.couple(cell(i, j, k), cell(i, j, k + 1), 10 * (0.5 + rnd()));
      }
    }
  }
  for (let e = 0; e < extra; e++) {
    const root = cell(Math.floor(rnd() * nx), Math.floor(rnd() * ny), nz - 1);
    builder.couple(root, plate + e, 0.5 + rnd());
    if (e > 0) builder.couple(plate + e - 1, plate + e, 0.5 + rnd());
    builder.addToDiagonal(plate + e, 0.01 + 0.1 * rnd());
  }
  for (let p = 0; p < plate; p++) if (rnd() < 0.2) builder.addToDiagonal(p, 0.05 * rnd());
  return builder.toCsr();
}

describe('Cholesky in the envelope (the multigrid coarsest level)', () => {
  it.each([
    [8, 11, 1, 0, 1],
    [8, 11, 1, 40, 2],
    [6, 9, 2, 60, 3],
    [3, 4, 2, 5, 4],
    [1, 1, 1, 0, 5],
  ])('gives the dense algorithm bit for bit and solves A x = b, plate %i x %i x %i, %i unknowns after it (seed %i)', (nx, ny, nz, extra, seed) => {
    const a = conductionLike(nx, ny, nz, extra, seed);
    const rnd = random(100 + seed);
    const b = Float64Array.from({ length: a.n }, () => rnd() - 0.3);
    const x = new Float64Array(a.n);
    envelopeCholesky(a).solve(b, x);
    const dense = denseSolve(a, b);
    for (let i = 0; i < a.n; i++) expect(Object.is(x[i], dense[i]), `x[${i}] = ${x[i]}, dense ${dense[i]}`).toBe(true);
    // A x = b to round-off: the matrix is well conditioned (diagonally dominant), so 1e-10 of |b| is ample.
    let worst = 0;
    for (let r = 0; r < a.n; r++) {
      let s = -b[r]!;
      for (let e = a.rowStart[r]!; e < a.rowStart[r + 1]!; e++) s += a.val[e]! * x[a.col[e]!]!;
      worst = Math.max(worst, Math.abs(s));
    }
    expect(worst).toBeLessThan(1e-10 * Math.max(...b.map(Math.abs)));
  });

  it('the same factor solves again with other right-hand sides (the factor is not overwritten by a solve)', () => {
    const a = conductionLike(5, 6, 2, 12, 7);
    const factor = envelopeCholesky(a);
    for (let t = 0; t < 3; t++) {
      const rnd = random(200 + t);
      const b = Float64Array.from({ length: a.n }, () => rnd());
      const x = new Float64Array(a.n);
      factor.solve(b, x);
      const dense = denseSolve(a, b);
      for (let i = 0; i < a.n; i++) expect(Object.is(x[i], dense[i])).toBe(true);
    }
  });

  it('refuses a matrix that is not positive definite in the problem words of a solver failure', () => {
    const builder = new ConductanceBuilder(2);
    builder.couple(0, 1, 1);
    // A singular conduction matrix: no conductance to a fixed temperature.
    expect(() => envelopeCholesky(builder.toCsr())).toThrow(SolverError);
  });
});
