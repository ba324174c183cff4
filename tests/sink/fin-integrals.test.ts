/**
 * The per-layer integrals of a sink's fins (src/fd/three-d/fin-integrals.ts) add up to the whole fin's:
 * the convective conductance to fincheck's exact ideal conductance (the integral of h P over the fin, the
 * denominator of the fin efficiency, Harper & Brown 1922), the conduction resistance of a rectangular fin to L/t
 * and its area to t L. Exactness (round-off) is what the energy balance and the 1-D limit rely on.
 */
import { describe, expect, it } from 'vitest';
import type { HDistribution } from '../../src/case/index.js';
import { geometryOfProfile } from '../../src/mesh/index.js';
import { idealConvectiveConductance } from '../../src/fd/index.js';
import { finIntegrals } from '../../src/fd/three-d/fin-integrals.js';

const layers = (L: number, n: number) => Array.from({ length: n + 1 }, (_, l) => (L * l) / n);

describe.each([
  ['uniform h', { kind: 'uniform', h: 40 }],
  ['linear h', { kind: 'linear', base: 50, tip: 20 }],
  ['h by points', { kind: 'points', x: Float64Array.of(0, 0.007, 0.02), h: Float64Array.of(60, 30, 45) }],
] as const)('%s', (_name, h: HDistribution) => {
  it('the layers of a trapezoidal fin add up to its ideal conductance', () => {
    const g = geometryOfProfile({ kind: 'trapezoidal', length: 0.02, baseThickness: 0.002, tipThickness: 0.001, width: 1 }, 'insulated');
    if (h.kind === 'power') throw new Error('linear h only');
    const f = finIntegrals(g, h);
    const s = layers(0.02, 7);
    let sum = 0;
    for (let l = 0; l + 1 < s.length; l++) sum += f.convection(s[l]!, s[l + 1]!);
    // 1e-13: the same Gauss rule piece by piece, exact for these polynomials.
    expect(Math.abs(sum - idealConvectiveConductance(g, h)) / sum).toBeLessThan(1e-13);
  });
});

describe('a rectangular fin of unit width', () => {
  it('conducts as L/t and holds t L', () => {
    const g = geometryOfProfile({ kind: 'rectangular', length: 0.03, thickness: 0.0016, width: 1 }, 'insulated');
    const f = finIntegrals(g, { kind: 'uniform', h: 10 });
    expect(f.resistance(0.004, 0.019) / (0.015 / 0.0016)).toBeCloseTo(1, 13);
    expect(f.area(0, 0.03) / (0.03 * 0.0016)).toBeCloseTo(1, 13);
  });
});
