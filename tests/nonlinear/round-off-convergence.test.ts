/**
 * Newton's convergence test at round-off (issue 9, item 11). With a power-law h of negative exponent
 * (h ~ theta^-1/2) the loss ~ |theta|^(1/2) has a slope that grows without bound as a node approaches
 * the ambient; the residual of such a row cannot be evaluated more accurately than that slope times the
 * round-off of theta. These fins used to stall at a relative residual of 1.0e-12 .. 2.3e-12 with no
 * change in the heat rate and were reported as "no convergence in 50 Newton steps" (exit 3): converged
 * solves called failures. Found by a random search over nonlinear cases; the cases are rounded.
 * Checks: the solve converges, the energy balance closes to round-off (the scheme is conservative), the
 * maximum principle holds (0 <= theta <= theta_b for a fin cooled by its faces) and the refinement study
 * converges (observed order near 2, or a GCI far below any tolerance).
 */
import { describe, expect, it } from 'vitest';
import { parseCaseObject } from '../../src/case/parse.js';
import { studyNonlinearFin1D } from '../../src/fd/one-d/nonlinear-solve.js';

const cases: [string, Record<string, unknown>][] = [
  [
    'plastic pin, h ~ theta^-1/2, radiating',
    {
      fin: { profile: 'pin', length: '35 mm', diameter: '1.36 mm' },
      material: { k: 0.34 },
      convection: { ambient: 20, h: { law: 'power', base: 2.64, exponent: -0.5 }, emissivity: 0.5, tip: 'adiabatic' },
      base: { temperature: 200 },
    },
  ],
  [
    'plastic cone, h ~ theta^-1/2',
    {
      fin: { profile: 'conical-pin', length: '220 mm', baseDiameter: '15 mm', tipDiameter: 0 },
      material: { k: 0.67 },
      convection: { ambient: -10, h: { law: 'power', base: 7, exponent: -0.5 }, tip: 'adiabatic' },
      base: { temperature: 40 },
    },
  ],
  [
    'thin plate, k(T), h ~ theta^-1/2, radiating at 900 degC',
    {
      fin: { profile: 'rectangular', length: '17 mm', thickness: '3.2 mm', width: '50 mm' },
      material: { k: 0.39 },
      convection: { ambient: -10, h: { law: 'power', base: 239, exponent: -0.5 }, emissivity: 0.9, tip: 'adiabatic' },
      base: { temperature: 900 },
    },
  ],
];

describe.each(cases)('%s', (_name, raw) => {
  it('converges (no solver failure), with energy balance and maximum principle', () => {
    const c = parseCaseObject({ name: 'round-off', ...raw });
    const study = studyNonlinearFin1D(c);
    const r = study.result;
    expect(r.newton.residual).toBeLessThanOrEqual(1e-12);
    // Conservative scheme: heat in equals heat out to round-off (1e-9 leaves room for the Newton
    // tolerance 1e-12 times the row scales, which exceed Q by up to ~1e3 here).
    expect(r.energyBalance).toBeLessThan(1e-9);
    const thetaB = (raw.base as { temperature: number }).temperature - (raw.convection as { ambient: number }).ambient;
    for (const t of r.theta) {
      expect(t).toBeGreaterThanOrEqual(0);
      expect(t).toBeLessThanOrEqual(thetaB * (1 + 1e-12));
    }
    expect(study.study.gci).toBeLessThan(1e-3);
  });
});
