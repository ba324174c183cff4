/**
 * Tridiagonal solvers against a dense LU reference (ml-matrix LuDecomposition, Doolittle with
 * partial pivoting; Golub & Van Loan, Matrix Computations, §3.4 [from memory for the section]).
 *
 * Tolerance 1e-12 relative to max|x|: the systems are strictly diagonally dominant with a margin of
 * at least 10 % of the diagonal, so their condition numbers are below ~20 and both solvers lose only
 * a few hundred ulps at n <= 60.
 */
import { fc, test } from '@fast-check/vitest';
import { describe, expect } from 'vitest';
import { conservativeThomas, conservativeThomasFromTipInto, conservativeThomasInto } from '../../src/fd/linear-algebra/conservative-thomas.js';
import {
  createTridiagonalSystem,
  solveTridiagonal,
  thomas,
  thomasInto,
  twoSidedThomas,
  twoSidedThomasInto,
  type TridiagonalSolver,
} from '../../src/fd/linear-algebra/tridiagonal.js';
import { denseSolve } from './support/dense.js';

function maxRelativeDifference(x: Float64Array, y: Float64Array): number {
  let scale = 0;
  let worst = 0;
  for (let i = 0; i < x.length; i++) scale = Math.max(scale, Math.abs(y[i] as number));
  for (let i = 0; i < x.length; i++) worst = Math.max(worst, Math.abs((x[i] as number) - (y[i] as number)));
  return scale === 0 ? worst : worst / scale;
}

/** A double in [min, max] without subnormals (their few significant bits make relative checks meaningless). */
const normal = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map((v) => (Math.abs(v) < 1e-100 ? 0 : v));

/** Random strictly diagonally dominant system (any signs); `mMatrix` gives l, u <= 0 < d with row sums. */
const systemArbitrary = (mMatrix: boolean) =>
  fc.integer({ min: 1, max: 60 }).chain((n) =>
    fc
      .record({
        lower: fc.array(normal(-1, 1), { minLength: n, maxLength: n }),
        upper: fc.array(normal(-1, 1), { minLength: n, maxLength: n }),
        margin: fc.array(normal(0.1, 3), { minLength: n, maxLength: n }),
        sign: fc.array(fc.boolean(), { minLength: n, maxLength: n }),
        rhs: fc.array(normal(-5, 5), { minLength: n, maxLength: n }),
      })
      .map(({ lower, upper, margin, sign, rhs }) => {
        const system = createTridiagonalSystem(n);
        for (let i = 0; i < n; i++) {
          const l = i > 0 ? (mMatrix ? -Math.abs(lower[i] as number) : (lower[i] as number)) : 0;
          const u = i < n - 1 ? (mMatrix ? -Math.abs(upper[i] as number) : (upper[i] as number)) : 0;
          const offDiagonal = Math.abs(l) + Math.abs(u);
          const d = (offDiagonal + (margin[i] as number) * Math.max(offDiagonal, 1)) * (mMatrix || !sign[i] ? 1 : -1);
          system.lower[i] = l;
          system.upper[i] = u;
          system.diag[i] = d;
          system.rowSum[i] = d + l + u;
          system.rhs[i] = rhs[i] as number;
        }
        return system;
      }),
  );

const SOLVERS: [string, TridiagonalSolver][] = [
  ['thomas', thomas],
  ['twoSidedThomas', twoSidedThomas],
  ['conservativeThomas', conservativeThomas],
];

describe.each(SOLVERS)('%s against dense LU', (_name, solver) => {
  test.prop([systemArbitrary(false)])('any strictly diagonally dominant system', (system) => {
    // Without row sums the row-sum solver recovers them from the stored entries.
    const { rowSum: _dropped, ...plain } = system;
    expect(maxRelativeDifference(solver(plain), denseSolve(system))).toBeLessThan(1e-12);
  });
  test.prop([systemArbitrary(true)])('M-matrices with row sums', (system) => {
    expect(maxRelativeDifference(solver(system), denseSolve(system))).toBeLessThan(1e-12);
  });
});

describe('in-place variants', () => {
  test.prop([systemArbitrary(true)])('write into the caller arrays, leave the system unchanged', (system) => {
    const n = system.diag.length;
    const before = [system.lower, system.diag, system.upper, system.rhs, system.rowSum].map((a) => Float64Array.from(a));
    const reference = denseSolve(system);
    for (const into of [thomasInto, twoSidedThomasInto, conservativeThomasInto, conservativeThomasFromTipInto]) {
      const solution = new Float64Array(n);
      const work = new Float64Array(n);
      expect(into(system, solution, work)).toBe(solution);
      expect(maxRelativeDifference(solution, reference)).toBeLessThan(1e-12);
    }
    [system.lower, system.diag, system.upper, system.rhs, system.rowSum].forEach((a, k) => expect(a).toEqual(before[k]));
  });

  test('the default solver is the row-sum solver', () => {
    expect(solveTridiagonal).toBe(conservativeThomas);
  });
});
