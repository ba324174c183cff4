// The barrel exports what the comparison layer calls: a smoke test through it. The triangular-fin
// efficiency I1(2mL)/(mL I0(2mL)) (Gardner 1945, from memory) via the barrel must equal the same ratio
// built from the barrel's scaled Bessel functions (published values are checked in straight-profiles.test.ts).
import { describe, expect, it } from 'vitest';
import * as analytic from '../../src/analytic/index.js';

describe('src/analytic/index.ts', () => {
  it('initialises once and evaluates a Bessel-based closed form through the public API', async () => {
    await analytic.initBessel();
    const r = analytic.straightTriangularFin({ h: 100, k: 200, length: 0.02, baseThickness: 0.002, thetaBase: 1 });
    // m^2 = 2h/(k t_b) = 500, mL = sqrt(500) * 0.02 = 0.4472; check against the direct ratio form.
    expect(r.efficiency).toBeCloseTo(analytic.I1e(2 * r.mL) / (r.mL * analytic.I0e(2 * r.mL)), 14);
    expect(typeof analytic.uniformFin).toBe('function');
    expect(typeof analytic.radiatingAdiabaticFin).toBe('function');
  });
});
