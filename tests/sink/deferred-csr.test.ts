/**
 * The CSR form a sheet sink's system carries without forming it (src/fd/linear-algebra/csr.ts deferredCsr): its
 * arrays, when read (a residual of a perturbed system for the adjoint sensitivities, a Newton step), are those
 * toCsr gives from the same builder, entry for entry. The matrix is a small conduction network made up for the test.
 */
import { describe, expect, it } from 'vitest';
import { ConductanceBuilder, csrResidual, deferredCsr } from '../../src/fd/linear-algebra/csr.js';

function network(): ConductanceBuilder {
  const builder = new ConductanceBuilder(6, 4);
  builder.couple(0, 1, 2.5);
  builder.couple(1, 2, 1.25);
  builder.couple(2, 3, 0.5);
  builder.couple(0, 4, 3);
  builder.couple(4, 5, 0.75);
  builder.couple(3, 5, 1.5);
  builder.addToDiagonal(5, 0.2);
  builder.addToDiagonal(2, 0.1);
  return builder;
}

describe('a CSR form formed on first use', () => {
  it("reads as toCsr's arrays, entry for entry, and keeps the row sums to fixed temperatures", () => {
    const eager = network().toCsr();
    const deferred = deferredCsr(network());
    expect(deferred.n).toBe(eager.n);
    expect(Array.from(deferred.excess ?? [])).toEqual(Array.from(eager.excess ?? []));
    expect(Array.from(deferred.rowStart)).toEqual(Array.from(eager.rowStart));
    expect(Array.from(deferred.col)).toEqual(Array.from(eager.col));
    expect(Array.from(deferred.val)).toEqual(Array.from(eager.val));
    // Formed once: the same arrays on every read.
    expect(deferred.val).toBe(deferred.val);
  });

  it('gives the residual the eager form gives, bit for bit', () => {
    const eager = network().toCsr();
    const deferred = deferredCsr(network());
    const x = Float64Array.from([1, 0.5, -0.25, 2, 0.125, 3]);
    const b = Float64Array.from([0.3, 0, 1, 0, 0, 0.5]);
    const r1 = new Float64Array(6);
    const r2 = new Float64Array(6);
    expect(csrResidual(deferred, x, b, r2)).toBe(csrResidual(eager, x, b, r1));
    expect(Array.from(r2)).toEqual(Array.from(r1));
  });
});
