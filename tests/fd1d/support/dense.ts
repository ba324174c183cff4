/**
 * Dense reference solve of a tridiagonal system: ml-matrix LuDecomposition (Gaussian elimination with
 * partial pivoting; Golub & Van Loan, Matrix Computations, §3.4 [from memory for the section]).
 */
import { LuDecomposition, Matrix } from 'ml-matrix';
import type { TridiagonalSystem } from '../../../src/fd/linear-algebra/tridiagonal.js';

export function denseSolve(system: TridiagonalSystem): Float64Array {
  const n = system.diag.length;
  const a = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    a.set(i, i, system.diag[i] as number);
    if (i > 0) a.set(i, i - 1, system.lower[i] as number);
    if (i < n - 1) a.set(i, i + 1, system.upper[i] as number);
  }
  const x = new LuDecomposition(a).solve(Matrix.columnVector(Array.from(system.rhs)));
  return Float64Array.from(x.getColumn(0));
}
