/**
 * A first guess for CG on a grid with twice the layers of a solved one (the same cells in x and y; twice the plate
 * layers in z and twice the layers up every fin): each column of cells (a plate column, a fin row's or a pin's
 * layers) carried over by linear interpolation between the coarser cells' centres,
 *   theta_2K = (3 theta_K + theta_(K−1)) / 4,   theta_(2K+1) = (3 theta_K + theta_(K+1)) / 4,
 * the coarser values held at a column's ends (exact for equal layers where theta is linear in the column). A guess
 * only: CG then solves the finer grid to its own tolerance. The check's further study (sink-resolve.ts) starts its
 * finest grid from the default study's finest this way.
 */
import type { SinkGrid } from '../../mesh/index.js';

/** null unless `fine` is `coarse` with doubled layers (fins as sheets: columns of ns nodes after the plate). */
export function doubledLayersStart(coarse: SinkGrid, theta: Float64Array, fine: SinkGrid, fineUnknowns: number): Float64Array | null {
  const plateC = coarse.nx * coarse.ny * coarse.nz;
  const plateF = fine.nx * fine.ny * fine.nz;
  const finC = theta.length - plateC;
  const finF = fineUnknowns - plateF;
  const same = fine.nx === coarse.nx && fine.ny === coarse.ny && fine.nz === 2 * coarse.nz;
  const fins = coarse.ns === 0 ? finC === 0 && finF === 0 : fine.ns === 2 * coarse.ns && finC % coarse.ns === 0 && finF === 2 * finC;
  if (!same || !fins) return null;
  const out = new Float64Array(fineUnknowns);
  const columns = (count: number, length: number, fromC: number, fromF: number) => {
    for (let c = 0; c < count; c++) {
      const a = fromC + c * length;
      const b = fromF + c * 2 * length;
      for (let k = 0; k < length; k++) {
        const mid = theta[a + k];
        const below = k > 0 ? theta[a + k - 1] : mid;
        const above = k + 1 < length ? theta[a + k + 1] : mid;
        out[b + 2 * k] = 0.75 * mid + 0.25 * below;
        out[b + 2 * k + 1] = 0.75 * mid + 0.25 * above;
      }
    }
  };
  columns(coarse.nx * coarse.ny, coarse.nz, 0, 0);
  if (coarse.ns > 0) columns(finC / coarse.ns, coarse.ns, plateC, plateF);
  return out;
}
