/**
 * The uniform-base heat-sink shortcut (analytic/overall-efficiency.ts): overall surface efficiency with one base
 * temperature (Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., section
 * 3.6.5; from memory), 1-D plate conduction under the sources, interface drops.
 */
import { describe, expect, it } from 'vitest';
import { finArray } from '../../src/analytic/array.js';
import { correctedLengthFin } from '../../src/analytic/corrected-length.js';
import { tanhEfficiency, uniformBaseSink } from '../../src/analytic/overall-efficiency.js';

describe('tanhEfficiency', () => {
  it('is tanh(x)/x, and 1 - x^2/3 at tiny x (the series of tanh x / x; 1e-15: round-off)', () => {
    expect(tanhEfficiency(1)).toBeCloseTo(Math.tanh(1), 15);
    expect(tanhEfficiency(2.5)).toBeCloseTo(Math.tanh(2.5) / 2.5, 15);
    expect(tanhEfficiency(0)).toBe(1);
    expect(tanhEfficiency(1e-9)).toBeCloseTo(1, 15);
  });
});

describe('uniformBaseSink', () => {
  // 20 fins of the corrected-length fin R1 (h = 40, k = 180, P = 0.104 m, A = 1e-4 m^2, L = 30 mm) on a 50 x 100 mm
  // base, the exposed base at the same h: eta_o must be finArray's (the Incropera form), and theta_b = Q / (eta_o h A_t).
  const fin = correctedLengthFin({ h: 40, k: 180, P: 0.104, A: 1e-4, L: 0.03, thetaBase: 1 });
  const exposed = 0.05 * 0.1 - 20 * 1e-4;
  const input = {
    sources: [
      { power: 30, area: 0.02 * 0.03, contactResistance: 0 },
      { power: 10, area: 0.01 * 0.01, contactResistance: 5e-5 },
    ],
    finCount: 20,
    finConductance: 40 * fin.efficiency * fin.area,
    finArea: fin.area,
    hFin: 40,
    exposedArea: exposed,
    hPlate: 40,
    plateThickness: 0.005,
    plateConductivity: 200,
  };
  const r = uniformBaseSink(input);
  const reference = finArray({ finCount: 20, finArea: fin.area, finEfficiency: fin.efficiency, unfinnedArea: exposed, h: 40, thetaBase: 1 });

  it('eta_o and A_t equal the overall surface efficiency of finArray when h_plate = h (1e-14: the same algebra rearranged)', () => {
    expect(r.overallEfficiency).toBeCloseTo(reference.overallEfficiency, 14);
    expect(r.totalArea).toBeCloseTo(reference.totalArea, 14);
  });

  it('theta_b = Q / (eta_o h A_t), the plate drop Q t / (k A_sources), the interface drop R\u2032\u2032 Q_j / A_j', () => {
    const Q = 40;
    expect(r.baseRise_K).toBeCloseTo(Q / (reference.overallEfficiency * 40 * reference.totalArea), 10);
    expect(r.plateDrop_K).toBeCloseTo((Q * 0.005) / (200 * (0.0006 + 0.0001)), 12);
    expect(r.contactDrop_K).toEqual([0, (5e-5 * 10) / 1e-4]);
    expect(r.sourceRise_K[1]).toBeCloseTo(r.baseRise_K + r.plateDrop_K + 5, 12);
  });

  it('energy: the conductance carries the total power at theta_b (1e-12: round-off)', () => {
    expect(r.conductance_WperK * r.baseRise_K).toBeCloseTo(40, 12);
  });

  it('a bare plate: theta_b = Q / (h_plate A)', () => {
    const bare = uniformBaseSink({ ...input, finCount: 0, exposedArea: 0.005, hPlate: 25 });
    expect(bare.baseRise_K).toBeCloseTo(40 / (25 * 0.005), 12);
    expect(bare.overallEfficiency).toBeCloseTo(1, 14);
  });

  it('refuses a sink with nothing that cools (a programming error upstream)', () => {
    expect(() => uniformBaseSink({ ...input, finCount: 0, hPlate: 0 })).toThrow(RangeError);
  });
});
