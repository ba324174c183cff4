/**
 * Newton steps in the Kirchhoff potential (src/fd/one-d/newton-system.ts): the linearised system is exact in
 * U = ∫ k dT / k_ref (conduction is linear in U), so the steps are taken in the potential drop D and mapped
 * back by the exact inverse of D(d) (src/fd/problem/conductivity.ts, dropAt). Taken in the drop d, a k(T)
 * table whose k changes 2000-fold within a few kelvin made each step jump across the table: the line search
 * halved ~18 times a step and a 4001-node solve failed after 215 s (fuzz case wild-conductivity-table-hang.yaml).
 * No external source: the inverse is checked against the forward map, the solve by its energy balance.
 */
import { describe, expect, test } from 'vitest';
import { kirchhoffTransform } from '../../src/fd/problem/conductivity.js';
import { finProblem } from '../../src/fd/problem/fin-problem.js';
import { solveNonlinearProblem1D } from '../../src/fd/one-d/nonlinear-solve.js';
import { parseCaseObject } from '../../src/case/parse.js';

// The fuzz case's table, in degC: k from 429.6 down to 0.2, up to 154.2 and down to 0.2 again.
const T_degC = Float64Array.from([-50, 84.6, 92.1, 145.4]);
const k = Float64Array.from([429.6, 0.2002, 154.2, 0.2]);

describe('inverse of the potential drop', () => {
  test.each([299.8, 100, 50])('d = dropAt(D(d)) over the table and beyond its ends (base excess %s K)', (thetaBase) => {
    const transform = kirchhoffTransform({ kind: 'table', T_degC, k }, -40, thetaBase);
    const kMin = 0.2 / transform.kRef;
    for (let i = 0; i <= 2000; i++) {
      const d = -100 + (i / 2000) * (thetaBase + 200);
      const back = transform.dropAt(transform.potentialDropAt(d));
      // D carries ~ε |D|; its inverse divides that by κ = k/k_ref, down to kMin on the flat pieces: 64 ε / κ_min.
      expect(Math.abs(back - d)).toBeLessThanOrEqual((64 * Number.EPSILON * Math.max(1, Math.abs(d), Math.abs(thetaBase))) / Math.min(1, kMin));
    }
  });

  // The array forms start each node's search for its table piece at the previous node's piece: the order of the
  // nodes must not matter, so a fin's ascending drops, the same descending, and a scrambled order (every node on
  // another piece than the one before) give the one-node forms' values bit for bit.
  test.each([299.8, 100, 50])('evaluate and dropsAt equal potentialDropAt and dropAt node by node (base excess %s K)', (thetaBase) => {
    const transform = kirchhoffTransform({ kind: 'table', T_degC, k }, -40, thetaBase);
    // The drops of the table's points themselves (where a piece begins) among them, and the ends of the range.
    const points = Array.from(T_degC, (T) => thetaBase - T - 40);
    const ascending = Float64Array.from([
      ...Array.from({ length: 401 }, (_, i) => -100 + (i / 400) * (thetaBase + 200)),
      ...points,
      -Infinity,
      Infinity,
    ]).sort();
    const count = ascending.length;
    const scrambled = Float64Array.from(ascending, (_, i) => ascending[(i * 173) % count] as number);
    for (const drops of [ascending, ascending.slice().reverse(), scrambled]) {
      const potential = new Float64Array(drops.length);
      const ratio = new Float64Array(drops.length);
      transform.evaluate(drops, potential, ratio);
      const back = new Float64Array(drops.length);
      transform.dropsAt(potential, back);
      drops.forEach((d, i) => {
        expect(potential[i]).toBe(transform.potentialDropAt(d));
        expect(back[i]).toBe(transform.dropAt(potential[i] as number));
      });
    }
  });

  test('a constant k: D = d, bit for bit', () => {
    const transform = kirchhoffTransform({ kind: 'constant', k: 12 }, 20, 60);
    for (const d of [0, 1e-300, 0.1, 59.999, 60, 75]) expect(transform.dropAt(transform.potentialDropAt(d))).toBe(d);
  });
});

test('the wild k(T) fin converges by plain Newton on 4001 nodes', () => {
  const c = parseCaseObject({
    name: 'wild conductivity table',
    fin: { profile: 'parabolic-concave', length: '7.2 mm', baseThickness: '2.59 mm', width: '61.4 mm', edges: 'insulated' },
    material: {
      k: {
        points: [
          ['-58 degF', 429.6],
          ['184.28 degF', 0.2002],
          ['197.843 degF', 154.2],
          ['293.738 degF', 0.2],
        ],
      },
    },
    convection: {
      ambient: '-40 degF',
      h: { law: 'power', base: 1, exponent: 0.9721 },
      tip: { temperature: '166.897 degF' },
      emissivity: 0.06751,
      surroundings: '225.3 degC',
    },
    base: { temperature: '259.8 degC' },
  });
  const r = solveNonlinearProblem1D(finProblem(c), { nodes: 4001, nested: false });
  // Measured: 5 Newton steps, no continuation (before: continuation failed after 215 s).
  expect(r.newton.continuationStages).toBe(0);
  expect(r.newton.iterations).toBeLessThanOrEqual(10);
  // Conservative scheme: round-off (measured 2.8e-15 here; 1e-12 leaves room for the Newton tolerance).
  expect(r.energyBalance).toBeLessThan(1e-12);
});
