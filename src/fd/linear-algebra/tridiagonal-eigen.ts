/**
 * Eigenvalues and eigenvectors of a real symmetric tridiagonal matrix T (n x n): T W = W diag(lambda),
 * W orthogonal.
 *
 * Method: the implicit QL algorithm with Wilkinson-type shifts, plane rotations accumulated into W; the
 * procedure tql2 of Bowdler, Martin, Reinsch & Wilkinson (1968), "The QR and QL algorithms for symmetric
 * matrices", Numer. Math. 11, 293-306 (also in EISPACK) [from memory]. An off-diagonal entry is taken as zero
 * once |e_m| <= eps (|d_m| + |d_{m+1}|). Cost ~ 3 n^2 rotations for the vectors (n^3 order in all, small here:
 * n is the short side of a 2-D grid). Accuracy: each eigenvalue to a few eps times ||T|| in absolute terms (not
 * relative: a small eigenvalue of a matrix with large entries has fewer correct digits; the caller refines).
 * Units are the caller's.
 */

/** Sweeps of the QL iteration allowed per eigenvalue (1-3 are typical: the convergence is cubic). */
const MAX_SWEEPS = 60;

export interface TridiagonalEigen {
  /** Eigenvalues, ascending. */
  readonly values: Float64Array;
  /** Eigenvectors by columns: vectors[j * n + k] is component j of the eigenvector of values[k]. */
  readonly vectors: Float64Array;
}

/**
 * The eigen-decomposition of the symmetric tridiagonal matrix with diagonal `diag` (n) and off-diagonal
 * `off` (n - 1: off[j] = T(j, j + 1)). The inputs are not modified. Throws when an eigenvalue does not converge
 * (never seen for a finite matrix; it would mean NaN or infinite entries).
 */
export function tridiagonalEigen(diag: Float64Array, off: Float64Array): TridiagonalEigen {
  const n = diag.length;
  const d = Float64Array.from(diag);
  const e = new Float64Array(n);
  for (let j = 0; j + 1 < n; j++) e[j] = off[j] as number;
  const z = new Float64Array(n * n);
  for (let j = 0; j < n; j++) z[j * n + j] = 1;
  for (let l = 0; l < n; l++) {
    for (let sweep = 0; ; sweep++) {
      let m = l;
      for (; m < n - 1; m++) {
        const dd = Math.abs(d[m] as number) + Math.abs(d[m + 1] as number);
        if (Math.abs(e[m] as number) <= Number.EPSILON * dd) break;
      }
      if (m === l) break;
      if (sweep === MAX_SWEEPS) throw new Error(`tridiagonalEigen: eigenvalue ${l} did not converge in ${MAX_SWEEPS} sweeps`);
      // Shift from the leading 2 x 2 block, then chase the bulge from row m - 1 up to row l.
      let g = ((d[l + 1] as number) - (d[l] as number)) / (2 * (e[l] as number));
      let r = Math.hypot(g, 1);
      g = (d[m] as number) - (d[l] as number) + (e[l] as number) / (g + (g >= 0 ? r : -r));
      let s = 1;
      let c = 1;
      let p = 0;
      let i = m - 1;
      let deflated = false;
      for (; i >= l; i--) {
        const f = s * (e[i] as number);
        const b = c * (e[i] as number);
        r = Math.hypot(f, g);
        e[i + 1] = r;
        if (r === 0) {
          // Underflow: the matrix splits here; drop the rotation and start again.
          d[i + 1] = (d[i + 1] as number) - p;
          e[m] = 0;
          deflated = true;
          break;
        }
        s = f / r;
        c = g / r;
        g = (d[i + 1] as number) - p;
        r = ((d[i] as number) - g) * s + 2 * c * b;
        p = s * r;
        d[i + 1] = g + p;
        g = c * r - b;
        for (let k = 0; k < n; k++) {
          const zk = k * n;
          const a = z[zk + i + 1] as number;
          const w = z[zk + i] as number;
          z[zk + i + 1] = s * w + c * a;
          z[zk + i] = c * w - s * a;
        }
      }
      if (deflated) continue;
      d[l] = (d[l] as number) - p;
      e[l] = g;
      e[m] = 0;
    }
  }
  // Ascending order, vectors with their values.
  const order = Array.from({ length: n }, (_, k) => k).sort((a, b) => (d[a] as number) - (d[b] as number));
  const values = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  order.forEach((from, k) => {
    values[k] = d[from] as number;
    for (let j = 0; j < n; j++) vectors[j * n + k] = z[j * n + from] as number;
  });
  return { values, vectors };
}
