/**
 * The order in which grid points are solved, and how they are dealt out to workers. Points follow a serpentine
 * path (row 0 left to right, row 1 right to left, ...; or column by column), so consecutive points are always grid
 * neighbours; the path is cut into batches of consecutive points, each solved by one worker in order. A solver that
 * keeps state from the previous solve (a cached mesh, a factorisation, a warm start) therefore always meets a
 * neighbour's parameters next. Batches are small enough (about 8 per worker) that a slow region of the map does not
 * leave the other workers idle.
 *
 * Walking along y (column by column) suits a map whose x axis changes the fin's shape and whose y axis does not
 * (thickness x h): a whole column then shares one geometry, and the 1-D meshes of its points come from the mesh
 * cache (src/mesh/grid1d.ts) instead of being rebuilt at every point.
 */

export interface Schedule {
  /** Point indices (j * nx + i) in solving order. */
  order: Int32Array;
  /** Batch b is order[starts[b] .. starts[b + 1]). */
  starts: Int32Array;
}

export function serpentineSchedule(nx: number, ny: number, workers: number, alongY = false): Schedule {
  const total = nx * ny;
  const order = new Int32Array(total);
  let k = 0;
  if (alongY) {
    for (let i = 0; i < nx; i++) {
      for (let s = 0; s < ny; s++) order[k++] = (i % 2 === 0 ? s : ny - 1 - s) * nx + i;
    }
  } else {
    for (let j = 0; j < ny; j++) {
      for (let s = 0; s < nx; s++) order[k++] = j * nx + (j % 2 === 0 ? s : nx - 1 - s);
    }
  }
  const line = alongY ? ny : nx;
  const size = Math.max(1, Math.min(line, Math.ceil(total / (Math.max(1, workers) * 8))));
  const count = Math.ceil(total / size);
  const starts = new Int32Array(count + 1);
  for (let b = 0; b <= count; b++) starts[b] = Math.min(total, b * size);
  return { order, starts };
}
