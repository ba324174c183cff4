/** Test helpers: relative and absolute closeness with the numbers in the failure message. */
import { expect } from 'vitest';

export function expectRelClose(actual: number, expected: number, relTol: number, what = ''): void {
  const rel = Math.abs(actual - expected) / Math.abs(expected);
  expect(Number.isFinite(actual), `${what}: got non-finite ${actual}`).toBe(true);
  expect(rel, `${what}: got ${actual}, expected ${expected} (rel. diff ${rel.toExponential(2)} > ${relTol})`).toBeLessThanOrEqual(relTol);
}

export function expectAbsClose(actual: number, expected: number, absTol: number, what = ''): void {
  const diff = Math.abs(actual - expected);
  expect(Number.isFinite(actual), `${what}: got non-finite ${actual}`).toBe(true);
  expect(diff, `${what}: got ${actual}, expected ${expected} (abs. diff ${diff.toExponential(2)} > ${absTol})`).toBeLessThanOrEqual(absTol);
}

/**
 * Tolerance for reference values printed to 10 significant digits: rounding alone can be up to
 * half a unit in the 10th digit, i.e. 5e-10 relative when the leading digit is 1; 1e-9 adds room for
 * the double-precision evaluation (~1e-14).
 */
export const tenDigits = 1e-9;
/** Reference values printed to 13 significant digits: rounding <= 5e-13 relative, plus round-off. */
export const thirteenDigits = 1e-12;
