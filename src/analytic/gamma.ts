/**
 * Gamma function Gamma(x) (dimensionless), real argument, from Cephes `gamma`
 * (Moshier, S. L., 1989, "Methods and Programs for Mathematical Functions", Ellis Horwood).
 * Cephes loads on first use (cephes-runtime.ts).
 * Checked in tests/analytic/gamma.test.ts against Gamma(1/2) = sqrt(pi), integer factorials and the
 * reflection formula Gamma(x) Gamma(1-x) = pi / sin(pi x) (Abramowitz & Stegun 1964, eq. 6.1.17).
 */
import { cephesLibrary } from './cephes-runtime.js';

export function gammaFunction(x: number): number {
  if (Number.isNaN(x)) throw new RangeError('gammaFunction: argument is NaN');
  if (x <= 0 && Number.isInteger(x)) throw new RangeError(`gammaFunction: pole at x = ${x}`);
  return cephesLibrary().gamma(x);
}
