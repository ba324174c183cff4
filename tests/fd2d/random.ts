/** Test matrices for the 2-D solvers. */
import { addCoupling, emptyStencil9, type Stencil9 } from '../../src/fd/linear-algebra/stencil9.js';

/**
 * A random symmetric 9-point conduction-like matrix (negative couplings, positive row sums `excess`),
 * hence positive definite; seeded and repeatable. fivePoint: without diagonal couplings (a 5-point matrix).
 */
export function randomSpdStencil(nx: number, ny: number, seed: number, fivePoint = false): Stencil9 & { excess: Float64Array } {
  let state = seed;
  const rand = (): number => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
  const a = emptyStencil9(nx, ny);
  const excess = new Float64Array(nx * ny);
  const offsets: [number, number][] = [
    [1, 0],
    [0, 1],
    [1, 1],
    [1, -1],
  ];
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      for (const [di, dj] of offsets) {
        if (fivePoint && di !== 0 && dj !== 0) continue; // no diagonal couplings (rectangular cells)
        if (i + di >= nx || j + dj < 0 || j + dj >= ny) continue;
        const v = -rand();
        addCoupling(a, i, j, di, dj, v);
        addCoupling(a, i, j, 0, 0, -v);
        addCoupling(a, i + di, j + dj, 0, 0, -v);
      }
      const e = 0.01 + 0.1 * rand();
      excess[i * ny + j] = e;
      addCoupling(a, i, j, 0, 0, e);
    }
  }
  return { ...a, excess };
}
