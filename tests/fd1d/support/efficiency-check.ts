/**
 * Shared assertions for fd-1d efficiency checks against closed-form tables (the study's finest
 * grid, its GCI and its Richardson extrapolation against one published value).
 */
import { expect } from 'vitest';
import type { Fin1DStudy } from '../../../src/fd/one-d/linear-solve.js';

/**
 * Tolerances:
 * - finest grid within 1e-6: the brief's accuracy target for the default grids (8000 cells; smooth
 *   fins reach 1e-7, the graded parabolic profiles ~1e-7 at mL = 3);
 * - the GCI of Celik et al. (2008) must bound the true relative error of the finest grid, up to the
 *   table's rounding (values to 10 decimals: 5e-11 absolute);
 * - the extrapolated efficiency within 3e-9: the tables give 10 significant digits (<= 5e-10
 *   relative) and the extrapolation leaves an O(h^3) remainder of a few 1e-10 at mL <= 3;
 * - energy balance <= 1e-10: the scheme is conservative, so only round-off remains.
 */
export function expectEfficiency(run: Fin1DStudy, expected: number): void {
  const { result, study } = run;
  const error = Math.abs(result.efficiency / expected - 1);
  expect(error).toBeLessThan(1e-6);
  const tableRounding = 5e-11 / expected;
  expect(error).toBeLessThanOrEqual(study.gci + tableRounding);
  const extrapolatedEfficiency = study.extrapolated / result.idealHeatRate;
  expect(Math.abs(extrapolatedEfficiency / expected - 1)).toBeLessThan(3e-9);
  expect(result.energyBalance).toBeLessThan(1e-10);
}
