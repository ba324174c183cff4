/**
 * fd-2d on a thin annular fin behind a large contact resistance: the fin "floats" at a level set by weak
 * conductances to the body and the fluid, while its own conductances are ~1e5 times larger. Multigrid CG
 * stalled at a relative residual of 1.2e-7 (the round-off of eps |theta| in those conductances) and `check`
 * failed (16 of 384 cases of a sweep, copper and aluminium behind 1e-3 m^2 K/W); fin2d.ts now solves for
 * the departure from the lumped level (lumpedLevel). These tests failed before that.
 */
import { describe, expect, it } from 'vitest';
import { annularFin, annularFinConvectiveTip } from '../../src/analytic/annular.js';
import { initBessel } from '../../src/analytic/bessel.js';
import { studyFin2D } from '../../src/fd/two-d/linear-study.js';
import { THETA_B, TEMPERATURES_2D } from './cases.js';
import { finCase } from '../support/fin-case.js';

describe('thin annular fin behind a contact resistance (t = 0.05 mm, radii 3.1 / 5.6 mm)', () => {
  const r1 = 3.1e-3;
  const r2 = 5.6e-3;
  const t = 5e-5;
  const R = 1e-3; // m^2 K / W
  it.each([
    [401, 45, 'convective'],
    [209, 5, 'adiabatic'],
    [110, 1, 'adiabatic'],
  ] as const)(
    'k = %s W/(m K), h = %s W/(m^2 K), %s rim: solves, balances, agrees with the 1-D closed form',
    async (k, h, tip) => {
      await initBessel();
      const c = finCase({
        profile: { kind: 'annular', innerRadius: r1, outerRadius: r2, thickness: t },
        k: k,
        h: { kind: 'uniform', h },
        tip: tip === 'convective' ? { kind: 'convective', h: null } : { kind: 'adiabatic' },
        contactResistance: R,
        ...TEMPERATURES_2D,
      });
      const s = studyFin2D(c);
      expect(s.energyBalance).toBeLessThan(1e-9);
      // 1-D closed form of the fin (Gardner 1945, Trans. ASME 67, 621-631; the convective rim from the
      // general Bessel solution, src/analytic/annular.ts) in series with the contact resistance over the
      // base ring 2 pi r1 t: Q = theta_b / (R / A_b + theta_b / Q_fin).
      const input = { h, k, innerRadius: r1, outerRadius: r2, thickness: t, thetaBase: THETA_B };
      const fin = tip === 'convective' ? annularFinConvectiveTip(input) : annularFin(input);
      const expected = THETA_B / (R / (2 * Math.PI * r1 * t) + THETA_B / fin.heatRate);
      // Bi = h t / (2 k) <= 3e-6: the 1-D model's gap is of that order, below the GCI (~1e-6 to 1e-5).
      const bi = (h * t) / (2 * k);
      expect(Math.abs(s.heatRate_W / expected - 1)).toBeLessThan(s.discretizationError + 10 * bi);
    },
    60_000,
  );
});
