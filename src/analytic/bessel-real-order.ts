/**
 * Modified Bessel function I_nu(x) of real order nu > -1 by its power series, and the ratio
 * I_mu(z) / I_{-mu}(z) for 0 < mu < 1 (orders of opposite sign, needed by the variable-h fin NU2).
 *
 *     I_nu(x) = (x/2)^nu * sum_{k>=0} (x^2/4)^k / (k! Gamma(k + nu + 1))
 *                                        (Abramowitz & Stegun 1964, eq. 9.6.10)
 *
 * For nu > -1 every term is positive, so the sum has no cancellation and its relative error is a few
 * units of round-off times the number of terms (about x + 20). It is used for 0 <= x <= 700
 * (beyond, e^x overflows).
 *
 * Ratio of opposite orders. From I_{-mu} = I_mu + (2/pi) sin(mu pi) K_mu (A&S 9.6.2),
 *
 *     I_mu / I_{-mu} = 1 / (1 + (2/pi) sin(mu pi) K_mu/I_mu),   K_mu/I_mu ~ pi e^{-2z} (A&S 9.7.1, 9.7.2).
 *
 * For z <= 25 the two power series are divided directly; for z > 25 the correction 2 sin(mu pi) e^{-2z}
 * is below 4e-22, so 1/(1 + 2 sin(mu pi) e^{-2z}) is exact to double precision and cannot overflow.
 * Gamma comes from Cephes (loaded on first use, cephes-runtime.ts).
 */
import { gammaFunction } from './gamma.js';

const seriesLimit = 700;
const asymptoticFrom = 25;

/** Power series sum_{k>=0} (x^2/4)^k Gamma(nu+1) / (k! Gamma(k+nu+1)) (all terms positive for nu > -1). */
function reducedSeries(nu: number, x: number): number {
  const q = (x * x) / 4;
  let term = 1;
  let sum = 1;
  for (let k = 1; k < 10_000; k++) {
    term *= q / (k * (k + nu));
    sum += term;
    if (term < 1e-17 * sum) return sum;
  }
  throw new Error(`Iv: power series did not converge (nu = ${nu}, x = ${x})`);
}

/** I_nu(x) for real nu > -1 and 0 <= x <= 700 (unscaled). */
export function Iv(nu: number, x: number): number {
  if (!(nu > -1)) throw new RangeError(`Iv: order must be > -1, got ${nu}`);
  if (!(x >= 0 && x <= seriesLimit)) throw new RangeError(`Iv: argument must be in [0, ${seriesLimit}], got ${x}`);
  if (x === 0) return nu === 0 ? 1 : nu > 0 ? 0 : Infinity;
  return (Math.pow(x / 2, nu) / gammaFunction(nu + 1)) * reducedSeries(nu, x);
}

/** I_mu(z) / I_{-mu}(z) for 0 < mu < 1 and z >= 0; finite for all z (tends to 1). */
export function besselIReflectionRatio(mu: number, z: number): number {
  if (!(mu > 0 && mu < 1)) throw new RangeError(`besselIReflectionRatio: mu must be in (0, 1), got ${mu}`);
  if (!(z >= 0)) throw new RangeError(`besselIReflectionRatio: z must be >= 0, got ${z}`);
  if (z === 0) return 0;
  if (z > asymptoticFrom) return 1 / (1 + 2 * Math.sin(mu * Math.PI) * Math.exp(-2 * z));
  const gammaRatio = gammaFunction(1 - mu) / gammaFunction(1 + mu);
  return Math.pow(z / 2, 2 * mu) * gammaRatio * (reducedSeries(mu, z) / reducedSeries(-mu, z));
}
