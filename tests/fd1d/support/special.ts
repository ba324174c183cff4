/**
 * Special functions for the closed-form oracles of the tests: the Cephes library (Moshier, S. L.,
 * 1989, Methods and Programs for Mathematical Functions, Ellis Horwood) through the `cephes` package,
 * loaded through its CommonJS entry (which carries the type declarations). Test-only: the tests do
 * not depend on src/analytic.
 */
import { createRequire } from 'node:module';
import type CephesModule from 'cephes' with { 'resolution-mode': 'require' };

type Cephes = typeof CephesModule;

let library: Cephes | null = null;

/** Loads Cephes once (await before the first call). */
export async function loadSpecial(): Promise<void> {
  if (library !== null) return;
  const required = createRequire(import.meta.url)('cephes') as { default: Cephes };
  await required.default.compiled;
  library = required.default;
}

function cephes(): Cephes {
  if (library === null) throw new Error('call loadSpecial() first');
  return library;
}

/** Modified Bessel function of the first kind I_v(x), real order v. */
export const besselI = (v: number, x: number): number => cephes().iv(v, x);
/** Modified Bessel function of the second kind K_n(x), integer order n. */
export const besselK = (n: number, x: number): number => cephes().kn(n, x);
/** Gamma function. */
export const gamma = (x: number): number => cephes().gamma(x);
