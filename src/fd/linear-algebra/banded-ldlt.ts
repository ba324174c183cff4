/**
 * Banded LDL^T factorisation that carries the row sums exactly: for conduction matrices with couplings
 * of very different sizes (nearly collapsed cells at a sharp or cusped tip, very elongated cells).
 *
 * A conduction matrix is a Laplacian plus a non-negative diagonal: A = -sum of couplings + diag(e), with
 * e_p = sum_q A_pq (the node's conductance to fixed temperatures: convection, fixed neighbours). Ordinary
 * Cholesky computes each pivot as A_pp - sum L_pk^2, a difference of large numbers when couplings are
 * large, and loses e_p to round-off. Here the elimination is right-looking and tracks the Schur
 * complement's row sums instead,
 *     e_j <- e_j - S_ji e_i / d_i        (S the current Schur complement, d_i the pivot),
 *     d_i  = e_i - sum_{k > i} S_ik,
 * which for couplings S_ik <= 0 adds numbers of one sign only: the pivots keep full relative accuracy.
 * This is the idea of Grassmann, Taksar & Heyman (1985), "Regenerative analysis and steady state
 * distributions for Markov chains", Oper. Res. 33, 1107-1116 [from memory], applied to a symmetric band.
 * Storage: the upper band of S row by row, U[i * (w + 1) + t] = S(i, i + t), t = 1..w, w = nodesY + 1.
 * Cost ~ N w^2 / 2 multiply-adds, as for Cholesky, but right-looking (writes the trailing band), so slower;
 * the solver uses it only when ordinary Cholesky shows cancellation (banded-solve.ts).
 */
import { SolverError } from '../../errors.js';
import type { BandedFactor } from './banded-factor.js';
import type { Stencil9 } from './stencil9.js';

export function factorBandedLdltRowSums(a: Stencil9, rowSums: Float64Array): BandedFactor {
  const { nodesX: nx, nodesY: ny, east, north, northEast, southEast } = a;
  const n = nx * ny;
  const w = ny + 1;
  const rl = w + 1;
  const U = new Float64Array(n * rl);
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const p = i * ny + j;
      const r = p * rl;
      if (j + 1 < ny) U[r + 1] = north[p] as number;
      if (i + 1 < nx) {
        U[r + ny] = east[p] as number;
        if (j + 1 < ny) U[r + ny + 1] = northEast[p] as number;
        if (j > 0) U[r + ny - 1] = southEast[p] as number;
      }
    }
  }
  const e = rowSums.slice();
  const invD = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const ri = i * rl;
    const tEnd = Math.min(w, n - 1 - i);
    let couplings = 0;
    for (let t = 1; t <= tEnd; t++) couplings += U[ri + t] as number;
    const d = (e[i] as number) - couplings;
    if (!(d > 0)) {
      throw new SolverError(`banded LDL^T: the 2-D system is not positive definite (pivot ${d.toExponential(3)} at unknown ${i})`, 'another-2d-grid');
    }
    const inv = 1 / d;
    invD[i] = inv;
    const ei = (e[i] as number) * inv;
    for (let t = 1; t <= tEnd; t++) {
      const sij = U[ri + t] as number;
      if (sij === 0) continue;
      const l = sij * inv;
      e[i + t] = (e[i + t] as number) - sij * ei;
      // Row j = i + t: U[(i + t) * rl + (s - t)] = S(j, i + s) for s = t + 1..tEnd.
      const rj = (i + t) * rl - t;
      for (let s = t + 1; s <= tEnd; s++) U[rj + s] = (U[rj + s] as number) - l * (U[ri + s] as number);
    }
  }
  return {
    size: n,
    bandwidth: w,
    solve(rhs: Float64Array, out = new Float64Array(n)): Float64Array {
      if (rhs.length !== n) throw new RangeError(`banded LDL^T: rhs has ${rhs.length} entries, expected ${n}`);
      const y = out;
      if (y !== rhs) y.set(rhs);
      for (let i = 0; i < n; i++) {
        const ri = i * rl;
        const tEnd = Math.min(w, n - 1 - i);
        const f = (y[i] as number) * (invD[i] as number);
        for (let t = 1; t <= tEnd; t++) y[i + t] = (y[i + t] as number) - (U[ri + t] as number) * f;
      }
      for (let i = 0; i < n; i++) y[i] = (y[i] as number) * (invD[i] as number);
      for (let i = n - 1; i >= 0; i--) {
        const ri = i * rl;
        const tEnd = Math.min(w, n - 1 - i);
        let s = 0;
        for (let t = 1; t <= tEnd; t++) s += (U[ri + t] as number) * (y[i + t] as number);
        y[i] = (y[i] as number) - s * (invD[i] as number);
      }
      return y;
    },
    release(): void {
      // Nothing kept: this factor is the rare fallback (banded-solve.ts).
    },
  };
}
