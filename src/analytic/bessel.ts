/**
 * Modified Bessel functions of integer order, unscaled and exponentially scaled (dimensionless).
 *
 *     I0e(x) = e^{-x} I0(x),  I1e(x) = e^{-x} I1(x),  K0e(x) = e^{x} K0(x),  K1e(x) = e^{x} K1(x)
 *
 * Orders 0 and 1 come from Cephes (Moshier 1989; Chebyshev expansions, the same as SciPy's i0e/k0e ...).
 * Higher orders are built without overflow or cancellation:
 *   - I_n: Ine(n, x) = I1e(x) * prod_{j=2..n} r_j(x), with r_j = I_j/I_{j-1} from the continued fraction
 *     of bessel-ratio.ts (the backward-stable direction; the upward recurrence for I loses digits).
 *   - K_n: upward recurrence K_{n+1} = K_{n-1} + (2n/x) K_n (Abramowitz & Stegun 1964, eq. 9.6.26),
 *     stable for K because every term is positive; the scaled forms obey the same recurrence.
 * Cephes `iv`/`kn` are not used: `iv` fails for some negative orders and returns 0 where I overflows,
 * and `kn` throws on underflow.
 *
 * The Cephes library loads on the first call (cephes-runtime.ts).
 */
import { cephesLibrary } from './cephes-runtime.js';
import { besselIRatio } from './bessel-ratio.js';

export { initBessel, isBesselReady } from './cephes-runtime.js';
export { besselIRatio } from './bessel-ratio.js';

function checkI(name: string, x: number): void {
  if (!(x >= 0)) throw new RangeError(`${name}: argument must be >= 0, got ${x}`);
}
function checkK(name: string, x: number): void {
  if (!(x > 0)) throw new RangeError(`${name}: argument must be > 0, got ${x}`);
}
function checkOrder(name: string, n: number): void {
  if (!(Number.isInteger(n) && n >= 0)) throw new RangeError(`${name}: order must be an integer >= 0, got ${n}`);
}

/** e^{-x} I0(x), x >= 0. */
export function I0e(x: number): number {
  checkI('I0e', x);
  return cephesLibrary().i0e(x);
}
/** e^{-x} I1(x), x >= 0. */
export function I1e(x: number): number {
  checkI('I1e', x);
  return cephesLibrary().i1e(x);
}
/** e^{x} K0(x), x > 0. */
export function K0e(x: number): number {
  checkK('K0e', x);
  return cephesLibrary().k0e(x);
}
/** e^{x} K1(x), x > 0. */
export function K1e(x: number): number {
  checkK('K1e', x);
  return cephesLibrary().k1e(x);
}

/** I0(x), x >= 0 (Infinity beyond x ~ 713). */
export function I0(x: number): number {
  checkI('I0', x);
  return cephesLibrary().i0(x);
}
/** I1(x), x >= 0. */
export function I1(x: number): number {
  checkI('I1', x);
  return cephesLibrary().i1(x);
}
/** K0(x), x > 0 (0 by underflow beyond x ~ 705). */
export function K0(x: number): number {
  checkK('K0', x);
  return cephesLibrary().k0(x);
}
/** K1(x), x > 0. */
export function K1(x: number): number {
  checkK('K1', x);
  return cephesLibrary().k1(x);
}

/** e^{-x} I_n(x) for integer n >= 0, x >= 0. */
export function Ine(n: number, x: number): number {
  checkOrder('Ine', n);
  checkI('Ine', x);
  if (n === 0) return cephesLibrary().i0e(x);
  let value = cephesLibrary().i1e(x);
  for (let j = 2; j <= n; j++) value *= besselIRatio(j, x);
  return value;
}

/** e^{x} K_n(x) for integer n >= 0, x > 0. */
export function Kne(n: number, x: number): number {
  checkOrder('Kne', n);
  checkK('Kne', x);
  const lib = cephesLibrary();
  let previous = lib.k0e(x);
  if (n === 0) return previous;
  let current = lib.k1e(x);
  for (let j = 1; j < n; j++) {
    const next = previous + ((2 * j) / x) * current;
    previous = current;
    current = next;
  }
  return current;
}

/** I_n(x), unscaled (overflows to Infinity for large x: prefer Ine in formulas). */
export function In(n: number, x: number): number {
  return Ine(n, x) * Math.exp(x);
}
/** K_n(x), unscaled (underflows to 0 for large x: prefer Kne in formulas). */
export function Kn(n: number, x: number): number {
  return Kne(n, x) * Math.exp(-x);
}

/** e^{-x} I2(x). */
export function I2e(x: number): number {
  return Ine(2, x);
}
/** e^{x} K2(x). */
export function K2e(x: number): number {
  return Kne(2, x);
}
/** I2(x). */
export function I2(x: number): number {
  return In(2, x);
}
/** K2(x). */
export function K2(x: number): number {
  return Kn(2, x);
}
