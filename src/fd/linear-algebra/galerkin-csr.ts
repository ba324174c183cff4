/**
 * Galerkin product A_c = P^T A P for CSR matrices (P fine x coarse, a few entries per row): row by row over the
 * coarse unknowns with a dense marker (Gustavson's sparse product, Gustavson 1978, ACM TOMS 4(3):250-269
 * [from memory]). Symmetric A gives symmetric A_c; positive definite A and full-rank P give positive definite A_c.
 */
import type { CsrMatrix } from './csr.js';
import type { Prolongation } from './prolongation.js';

export function galerkinCsr(a: CsrMatrix, p: Prolongation): CsrMatrix {
  const nc = p.coarse;
  const n = a.n;
  // P^T by rows.
  const tStart = new Int32Array(nc + 1);
  for (let e = 0; e < p.col.length; e++) tStart[p.col[e] + 1]++;
  for (let c = 0; c < nc; c++) tStart[c + 1] += tStart[c];
  const tRow = new Int32Array(p.col.length);
  const tVal = new Float64Array(p.col.length);
  const fill = tStart.slice(0, nc);
  for (let r = 0; r < n; r++) {
    for (let e = p.rowStart[r]; e < p.rowStart[r + 1]; e++) {
      const c = p.col[e];
      tRow[fill[c]] = r;
      tVal[fill[c]++] = p.val[e];
    }
  }
  const marker = new Int32Array(nc).fill(-1);
  const acc = new Float64Array(nc);
  const touched = new Int32Array(nc);
  let cols = new Int32Array(Math.max(16, 8 * nc));
  let vals = new Float64Array(cols.length);
  const rowStart = new Int32Array(nc + 1);
  let nnz = 0;
  for (let ca = 0; ca < nc; ca++) {
    let count = 0;
    for (let t = tStart[ca]; t < tStart[ca + 1]; t++) {
      const r = tRow[t];
      const pa = tVal[t];
      for (let e = a.rowStart[r]; e < a.rowStart[r + 1]; e++) {
        const s = a.col[e];
        const v = pa * a.val[e];
        for (let eb = p.rowStart[s]; eb < p.rowStart[s + 1]; eb++) {
          const cb = p.col[eb];
          if (marker[cb] !== ca) {
            marker[cb] = ca;
            acc[cb] = 0;
            touched[count++] = cb;
          }
          acc[cb] += v * p.val[eb];
        }
      }
    }
    if (nnz + count > cols.length) {
      const size = Math.max(2 * cols.length, nnz + count);
      const c2 = new Int32Array(size);
      const v2 = new Float64Array(size);
      c2.set(cols.subarray(0, nnz));
      v2.set(vals.subarray(0, nnz));
      cols = c2;
      vals = v2;
    }
    for (let k = 0; k < count; k++) {
      cols[nnz] = touched[k];
      vals[nnz++] = acc[touched[k]];
    }
    rowStart[ca + 1] = nnz;
  }
  return { n: nc, rowStart, col: cols.slice(0, nnz), val: vals.slice(0, nnz) };
}
