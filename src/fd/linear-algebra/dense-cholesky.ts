/**
 * Dense Cholesky factorisation A = L L^T of a small symmetric positive definite matrix (the coarsest level of
 * the 3-D sink multigrid), column-oriented, then forward and back substitution. Golub & Van Loan, "Matrix
 * Computations", 4th ed. 2013, Algorithm 4.2.1 [from memory].
 */
import { SolverError } from '../../errors.js';
import type { CsrMatrix } from './csr.js';

export interface DenseFactor {
  solve(b: Float64Array, x: Float64Array): void;
}

export function denseCholesky(a: CsrMatrix): DenseFactor {
  const n = a.n;
  const l = new Float64Array(n * n);
  for (let r = 0; r < n; r++) for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) l[r * n + a.col[e]] += a.val[e];
  for (let j = 0; j < n; j++) {
    let d = l[j * n + j];
    for (let k = 0; k < j; k++) d -= l[j * n + k] * l[j * n + k];
    if (!(d > 0)) throw new SolverError('3-D sink solve: the coarsest multigrid matrix is not positive definite');
    const root = Math.sqrt(d);
    l[j * n + j] = root;
    for (let i = j + 1; i < n; i++) {
      let s = l[i * n + j];
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      l[i * n + j] = s / root;
    }
  }
  return {
    solve(b, x) {
      for (let i = 0; i < n; i++) {
        let s = b[i];
        for (let k = 0; k < i; k++) s -= l[i * n + k] * x[k];
        x[i] = s / l[i * n + i];
      }
      for (let i = n - 1; i >= 0; i--) {
        let s = x[i];
        for (let k = i + 1; k < n; k++) s -= l[k * n + i] * x[k];
        x[i] = s / l[i * n + i];
      }
    },
  };
}
