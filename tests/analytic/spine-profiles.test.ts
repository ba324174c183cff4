import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/bessel.js';
import {
  concaveParabolicSpine,
  conicalSpine,
  convexParabolicSpine,
  cylindricalPinFin,
  truncatedConicalSpine,
  type SpineInput,
} from '../../src/analytic/spine-profiles.js';
import type { ProfileFinResult } from '../../src/analytic/profile-result.js';
import { expectRelClose, tenDigits } from './close.js';

beforeAll(async () => {
  await initBessel();
});

/** Input with the requested mL: k = 200, D_b = 4 mm, L = 30 mm, h from m^2 = 4h/(k D_b). */
function inputFor(mL: number): SpineInput {
  const k = 200;
  const baseDiameter = 0.004;
  const length = 0.03;
  const m = mL / length;
  return { h: (m * m * k * baseDiameter) / 4, k, length, baseDiameter, thetaBase: 55 };
}

const mLs = [0.25, 0.5, 1, 1.5, 2, 3];
// Efficiency table 2a (spines, m^2 = 4h/(k D_b)): computed reference values (mpmath, script profiles.py,
// each checked by finite volumes + Richardson), closed forms of Incropera et al. 2007, Table 3.5 (cylinder,
// cone, concave parabolic) and Kraus, Aziz & Welty 2001 (convex parabolic) [from memory].
// Tolerance `tenDigits`: 10 significant digits printed.
// The last entry is the area factor (2 pi int r dx)/(pi D_b L) of the convention.
const table: [string, (i: SpineInput) => ProfileFinResult, number[], number][] = [
  ['cylinder', cylindricalPinFin, [0.9796746496, 0.9242343145, 0.761594156, 0.6034321691, 0.48201379, 0.3316849179], 1],
  ['cone', conicalSpine, [0.9897434262, 0.9607748955, 0.8662548534, 0.7572315324, 0.6580472674, 0.5084840505], 1 / 2],
  ['concave parabolic', concaveParabolicSpine, [0.9931503636, 0.973665961, 0.9083269132, 0.8284271247, 0.75, 0.6180339887], 1 / 3],
  ['convex parabolic', convexParabolicSpine, [0.9863634934, 0.9482677238, 0.828228124, 0.697774658, 0.5864792074, 0.4317613055], 2 / 3],
];

describe.each(table)('%s spine (Table 2a)', (_name, fin, etas, areaFactor) => {
  it.each(mLs.map((mL, i) => [mL, etas[i] ?? NaN]))('mL = %d: eta = %d', (mL, eta) => {
    const input = inputFor(mL);
    const r = fin(input);
    expectRelClose(r.efficiency, eta, tenDigits, 'eta');
    expectRelClose(r.area, areaFactor * Math.PI * input.baseDiameter * input.length, 1e-14, 'area');
    expectRelClose(r.heatRate, eta * input.h * r.area * input.thetaBase, tenDigits, 'q');
  });
});

// Truncated cone, tau = D_tip/D_b: computed reference values (script profiles.py, derived closed form,
// FV-checked). Tolerance `tenDigits`.
describe.each([
  [0.25, [0.9460674754, 0.8236812131, 0.586118201]],
  [0.5, [0.9363294797, 0.7958160834, 0.5392202292]],
  [0.75, [0.9294067792, 0.7761718649, 0.506313926]],
] as [number, number[]][])('truncated cone, tau = %d', (tau, etas) => {
  it.each([0.5, 1, 2].map((mL, i) => [mL, etas[i] ?? NaN]))('mL = %d: eta = %d', (mL, eta) => {
    const input = inputFor(mL);
    const r = truncatedConicalSpine({ ...input, tipDiameter: tau * input.baseDiameter });
    expectRelClose(r.efficiency, eta, tenDigits, 'eta');
    expectRelClose(r.area, (Math.PI * input.baseDiameter * input.length * (1 + tau)) / 2, 1e-14, 'area');
  });
});

describe('truncated cone limits (profiles.py: tau -> 0 cone, tau -> 1 cylinder)', () => {
  // O(1 - tau) and O(sqrt(tau)) departures at tau = 1 - 1e-9 and tau = 1e-12: 1e-8 relative.
  it.each([0.25, 1, 2, 5])('mL = %d', (mL) => {
    const input = inputFor(mL);
    const D = input.baseDiameter;
    expectRelClose(truncatedConicalSpine({ ...input, tipDiameter: D * (1 - 1e-9) }).efficiency, cylindricalPinFin(input).efficiency, 1e-8, 'tau->1');
    expectRelClose(truncatedConicalSpine({ ...input, tipDiameter: D }).efficiency, cylindricalPinFin(input).efficiency, 1e-15, 'tau=1');
    expectRelClose(truncatedConicalSpine({ ...input, tipDiameter: 0 }).efficiency, conicalSpine(input).efficiency, 1e-14, 'tau=0');
    expectRelClose(truncatedConicalSpine({ ...input, tipDiameter: D * 1e-12 }).efficiency, conicalSpine(input).efficiency, 1e-8, 'tau->0');
  });
  it('rejects a tip wider than the base', () => {
    expect(() => truncatedConicalSpine({ ...inputFor(1), tipDiameter: 0.01 })).toThrow(RangeError);
  });
});
