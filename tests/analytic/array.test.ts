import { describe, expect, it } from 'vitest';
import { finArray } from '../../src/analytic/array.js';
import { correctedLengthFin } from '../../src/analytic/corrected-length.js';
import { expectRelClose, tenDigits } from './close.js';

// Overall surface efficiency (Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer (6th ed.), sec. 3.6,
// from memory). Array example: 20 fins of case R1 (corrected-length form) on a 0.05 m x 0.10 m base,
// h = 40, thetaBase = 60 K; computed reference values (script make_tables2.py). Tolerance `tenDigits`.
describe('array of 20 R1 fins', () => {
  const fin = correctedLengthFin({ h: 40, k: 180, P: 0.104, A: 1e-4, L: 0.03, thetaBase: 60 });
  const result = finArray({
    finCount: 20,
    finArea: fin.area,
    finEfficiency: fin.efficiency,
    unfinnedArea: 0.05 * 0.1 - 20 * 1e-4,
    h: 40,
    thetaBase: 60,
  });
  it('A_f, A_t, eta_f, eta_o and q_total', () => {
    expectRelClose(fin.area, 0.00322, tenDigits, 'A_f');
    expectRelClose(result.totalArea, 0.0674, tenDigits, 'A_t');
    expectRelClose(fin.efficiency, 0.9321568913, tenDigits, 'eta_f');
    expectRelClose(result.overallEfficiency, 0.9351766142, tenDigits, 'eta_o');
    expectRelClose(result.heatRate, 151.2741691, tenDigits, 'q_total');
    expect(result.contactFactor).toBe(1);
  });
  // With contact resistance the fin's heat must equal thetaBase over the series resistance
  // R''/A_b + 1/(eta_f h A_f) (the physical meaning of C1); the base between fins is unaffected.
  // Different algebra from the C1 form, so agreement to round-off (1e-13) checks the implementation.
  it.each([1e-5, 1e-4, 2e-3])('contact resistance %d m^2K/W equals the series-resistance picture', (R) => {
    const withContact = finArray({
      finCount: 20,
      finArea: fin.area,
      finEfficiency: fin.efficiency,
      unfinnedArea: 0.003,
      h: 40,
      thetaBase: 60,
      contactResistance: R,
      finBaseArea: 1e-4,
    });
    const perFin = 60 / (R / 1e-4 + 1 / (fin.efficiency * 40 * fin.area));
    const expected = 20 * perFin + 40 * 0.003 * 60;
    expectRelClose(withContact.heatRate, expected, 1e-13, 'q with contact');
    expect(withContact.overallEfficiency).toBeLessThan(result.overallEfficiency);
  });
  it('needs the fin base area when a contact resistance is given', () => {
    expect(() => finArray({ finCount: 1, finArea: 1, finEfficiency: 1, unfinnedArea: 0, h: 1, thetaBase: 1, contactResistance: 1 })).toThrow(RangeError);
  });
});
