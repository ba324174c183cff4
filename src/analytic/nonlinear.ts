/**
 * Nonlinear uniform fins (constant A, P) with closed-form or quadrature oracles, from the first integral
 * of the fin equation (multiply by theta' and integrate once). Adiabatic or infinite tip; x from the base.
 * Oracles for the nonlinear numerical solver.
 *
 * (a) Power-law h = h_b (theta/theta_b)^n (n = 1/4 laminar, 1/3 turbulent natural convection, 2 boiling):
 *     k A theta'' = P h_b theta_b^{-n} theta^{n+1},  m^2 = h_b P/(k A),  u = theta/theta_b,
 *     Q = q / (sqrt(h_b P k A) theta_b).
 *       infinite fin:  Q = sqrt(2/(n+2)),  u = [1 + n m x / sqrt(2(n+2))]^{-2/n}
 *       adiabatic tip, tip ratio u_t:  Q = sqrt(2/(n+2)) sqrt(1 - u_t^{n+2}),
 *                       mL = sqrt((n+2)/2) int_{u_t}^1 du / sqrt(u^{n+2} - u_t^{n+2});  eta = Q/mL.
 *     Sen, A. K. & Trinh, S., 1986, J. Heat Transfer 108, 457-459; Unal, H. C., 1985, IJHMT 28,
 *     2279-2284 [both from memory].
 * (b) Conductivity linear in theta, k = k0 (1 + beta theta), constant h; B = beta theta_b, m0^2 = hP/(k0 A),
 *     Q = q / (sqrt(h P k0 A) theta_b). Kirchhoff flux W = (1 + B u) u' gives W^2 = G(u) - G(u_t),
 *     G(u) = u^2 + (2/3) B u^3:
 *       infinite fin:  Q = sqrt(1 + 2B/3)
 *       adiabatic tip: Q = sqrt(1 - u_t^2 + (2/3) B (1 - u_t^3)),  m0 L = int_{u_t}^1 (1 + B u) du / sqrt(G(u) - G(u_t)).
 *     Aziz, A. & Enamul-Huq, S. M., 1975, J. Heat Transfer 97, 300-301 (perturbation solution) [from memory].
 * (c) Pure radiation to a sink at T_s (no convection, no fin-base view factor), temperatures in K:
 *     k A T'' = sigma eps P (T^4 - T_s^4),  F(T) = T^5/5 - T_s^4 T,  c = 2 sigma eps P/(k A):
 *       infinite fin:  q = sqrt(2 sigma eps P k A [F(T_b) - F(T_s)])
 *       adiabatic tip: q = sqrt(2 sigma eps P k A [F(T_b) - F(T_t)]),  L = int_{T_t}^{T_b} dT / sqrt(c (F(T) - F(T_t))).
 *     Classic radiating-fin analyses: Bartas & Sellers 1960, J. Heat Transfer 82, 73; Mackay 1963, Design of
 *     Space Powerplants [both from memory].
 * Units: h W/(m^2 K), k W/(m K), P m, A m^2, L m, theta K, q W (W/m per unit width when P = 2, A = t).
 * Discrete form: the length integrals use u = u_t + (1 - u_t) s^2, which removes the inverse-square-root
 * singularity at u_t (the integrand becomes smooth in s, and the difference u^{n+2} - u_t^{n+2} is
 * factored so that it never cancels); adaptive Gauss-Kronrod (quadrature.ts) then integrates over
 * s in [0, 1], and the tip value is the root (Brent, roots.ts) of length(u_t) = L in ln u_t.
 */
import { requireFinite, requirePositive } from './check.js';
import { integrate } from './quadrature.js';
import { brentRoot } from './roots.js';

/** Stefan-Boltzmann constant, W/(m^2 K^4) (CODATA 2018). */
export const stefanBoltzmann = 5.670374419e-8;

const quadratureTolerance = { relTolerance: 1e-13 };
/** Below u_t = e^{-700} the tip is indistinguishable from an infinite fin in double precision. */
const lowestLogTip = -700;

/** ln(e^X - 1) for X > 0 without overflow. */
function logExpm1(x: number): number {
  return x > 1 ? x + Math.log1p(-Math.exp(-x)) : Math.log(Math.expm1(x));
}

/**
 * Tip value v in (0, 1] (v = 1: zero length) with lengthOf(v) = target; lengthOf decreasing in v and
 * +Infinity where it overflows. Bracketed in w = ln v by doubling |w|, then Brent. Returns 0 when even
 * v = e^{-700} gives a shorter fin (the fin is infinite to double precision).
 */
function tipFromLength(lengthOf: (v: number) => number, target: number): number {
  const g = (w: number): number => (w === 0 ? -target : lengthOf(Math.exp(w)) - target);
  let high = 0;
  let low = -1;
  for (let step = 0; ; step++) {
    if (step > 5000) throw new Error('nonlinear fin: could not bracket the tip value');
    const value = g(low);
    if (Number.isNaN(value)) throw new Error('nonlinear fin: length integral is NaN');
    if (value > 0 && Number.isFinite(value)) break;
    if (value === Infinity) {
      // Overflowed: the root lies between low and high; move low towards high.
      low = 0.5 * (low + high);
      continue;
    }
    if (value === 0) return Math.exp(low);
    high = low;
    if (low <= lowestLogTip) return 0;
    low = Math.max(2 * low, lowestLogTip);
  }
  return Math.exp(brentRoot(g, low, high, { xTolerance: 1e-15 }));
}

// ---------------------------------------------------------------- (a) power-law h

function checkExponent(where: string, n: number): void {
  if (!(n > -2) || !Number.isFinite(n)) throw new RangeError(`${where}: n must be finite and > -2, got ${n}`);
}

/** Infinite fin, Q = sqrt(2/(n+2)). */
export function powerLawHInfiniteQ(n: number): number {
  checkExponent('powerLawHInfiniteQ', n);
  return Math.sqrt(2 / (n + 2));
}

/** Infinite fin profile u = theta/theta_b at X = m x. For n < 0 the fin reaches theta = 0 at a finite X. */
export function powerLawHInfiniteProfile(n: number, mx: number): number {
  checkExponent('powerLawHInfiniteProfile', n);
  if (n === 0) return Math.exp(-mx);
  const base = 1 + (n * mx) / Math.sqrt(2 * (n + 2));
  return base <= 0 ? 0 : Math.pow(base, -2 / n);
}

/** mL of an adiabatic-tip fin whose tip ratio is u_t (0 < u_t <= 1). */
export function powerLawHLength(n: number, tipRatio: number): number {
  checkExponent('powerLawHLength', n);
  if (!(tipRatio > 0 && tipRatio <= 1)) throw new RangeError(`powerLawHLength: tipRatio must be in (0, 1], got ${tipRatio}`);
  if (tipRatio === 1) return 0;
  const ut = tipRatio;
  const logUt = Math.log(ut);
  const logGap = Math.log1p(-ut);
  // u^{n+2} - u_t^{n+2} = u_t^{n+1} (1 - u_t) s^2 phi(w), phi(w) = ((1 + w)^{n+2} - 1)/w, w = (1 - u_t) s^2/u_t.
  const integrand = (s: number): number => {
    const w = ((1 - ut) * s * s) / ut;
    const logW = logGap + 2 * Math.log(s) - logUt;
    const logPhi = logExpm1((n + 2) * Math.log1p(w)) - logW;
    return 2 * Math.sqrt(1 - ut) * Math.exp(-0.5 * ((n + 1) * logUt + logPhi));
  };
  return Math.sqrt((n + 2) / 2) * integrate(integrand, 0, 1, quadratureTolerance);
}

export interface NonlinearTipResult {
  /** theta(L)/theta_b (0 when the fin is effectively infinite or, for n < 0, reaches theta = 0). */
  tipRatio: number;
  /** Dimensionless heat rate Q. */
  Q: number;
}

/** Adiabatic-tip fin of given mL: tip ratio and Q (efficiency = Q/mL). */
export function powerLawHAdiabatic(n: number, mL: number): NonlinearTipResult & { efficiency: number } {
  checkExponent('powerLawHAdiabatic', n);
  requirePositive('powerLawHAdiabatic', 'mL', mL);
  // For n < 0 the temperature reaches zero at mL_max = sqrt(2(n+2))/(-n); longer fins carry the infinite-fin Q.
  const reachesZero = n < 0 && mL >= Math.sqrt(2 * (n + 2)) / -n;
  const tipRatio = reachesZero ? 0 : tipFromLength((v) => powerLawHLength(n, v), mL);
  const Q = Math.sqrt(2 / (n + 2)) * Math.sqrt(1 - Math.pow(tipRatio, n + 2));
  return { tipRatio, Q, efficiency: Q / mL };
}

export interface PowerLawHFinInput {
  /** h at the base temperature, W/(m^2 K). */
  hBase: number;
  n: number;
  k: number;
  P: number;
  A: number;
  thetaBase: number;
}

export interface NonlinearFinResult {
  /** Heat through the base, W. */
  heatRate: number;
  /** Dimensionless heat rate Q. */
  Q: number;
  /** theta(L)/theta_b (0 for an infinite fin). */
  tipRatio: number;
  /** Fin parameter (m or m0), 1/m. */
  m: number;
}

function checkFin(where: string, k: number, P: number, A: number, thetaBase: number): void {
  requirePositive(where, 'k', k);
  requirePositive(where, 'P', P);
  requirePositive(where, 'A', A);
  requirePositive(where, 'thetaBase', thetaBase);
}

/** Power-law h, infinite fin (dimensional). */
export function powerLawHInfiniteFin(input: PowerLawHFinInput): NonlinearFinResult {
  checkFin('powerLawHInfiniteFin', input.k, input.P, input.A, input.thetaBase);
  requirePositive('powerLawHInfiniteFin', 'hBase', input.hBase);
  const Q = powerLawHInfiniteQ(input.n);
  const scale = Math.sqrt(input.hBase * input.P * input.k * input.A) * input.thetaBase;
  return { heatRate: Q * scale, Q, tipRatio: 0, m: Math.sqrt((input.hBase * input.P) / (input.k * input.A)) };
}

/** Power-law h, adiabatic tip at length L (dimensional); efficiency = q/(h_b P L theta_b). */
export function powerLawHAdiabaticFin(input: PowerLawHFinInput & { L: number }): NonlinearFinResult & { efficiency: number } {
  checkFin('powerLawHAdiabaticFin', input.k, input.P, input.A, input.thetaBase);
  requirePositive('powerLawHAdiabaticFin', 'hBase', input.hBase);
  requirePositive('powerLawHAdiabaticFin', 'L', input.L);
  const m = Math.sqrt((input.hBase * input.P) / (input.k * input.A));
  const { tipRatio, Q, efficiency } = powerLawHAdiabatic(input.n, m * input.L);
  const scale = Math.sqrt(input.hBase * input.P * input.k * input.A) * input.thetaBase;
  return { heatRate: Q * scale, Q, tipRatio, m, efficiency };
}

// ---------------------------------------------------------------- (b) k linear in theta

function checkB(where: string, B: number): void {
  if (!(B > -1) || !Number.isFinite(B)) throw new RangeError(`${where}: B = beta thetaBase must be finite and > -1 (k > 0), got ${B}`);
}

/** Infinite fin with k = k0 (1 + B u): Q = sqrt(1 + 2B/3). */
export function linearConductivityInfiniteQ(B: number): number {
  checkB('linearConductivityInfiniteQ', B);
  return Math.sqrt(1 + (2 * B) / 3);
}

/** m0 L of an adiabatic-tip fin whose tip ratio is u_t. */
export function linearConductivityLength(B: number, tipRatio: number): number {
  checkB('linearConductivityLength', B);
  if (!(tipRatio > 0 && tipRatio <= 1)) throw new RangeError(`linearConductivityLength: tipRatio must be in (0, 1], got ${tipRatio}`);
  if (tipRatio === 1) return 0;
  const ut = tipRatio;
  // G(u_t + d) - G(u_t) = d E(d), E = 2u_t + d + (2/3) B (3u_t^2 + 3u_t d + d^2), d = (1 - u_t) s^2.
  const integrand = (s: number): number => {
    const d = (1 - ut) * s * s;
    const E = 2 * ut + d + (2 / 3) * B * (3 * ut * ut + 3 * ut * d + d * d);
    return (2 * Math.sqrt(1 - ut) * (1 + B * (ut + d))) / Math.sqrt(E);
  };
  return integrate(integrand, 0, 1, quadratureTolerance);
}

/** Adiabatic-tip fin of given m0 L: tip ratio and Q. */
export function linearConductivityAdiabatic(B: number, m0L: number): NonlinearTipResult {
  checkB('linearConductivityAdiabatic', B);
  requirePositive('linearConductivityAdiabatic', 'm0L', m0L);
  const tipRatio = tipFromLength((v) => linearConductivityLength(B, v), m0L);
  const Q = Math.sqrt(1 - tipRatio * tipRatio + (2 / 3) * B * (1 - tipRatio * tipRatio * tipRatio));
  return { tipRatio, Q };
}

export interface LinearConductivityFinInput {
  h: number;
  /** Conductivity at the fluid temperature (theta = 0), W/(m K). */
  k0: number;
  /** Slope beta in k = k0 (1 + beta theta), 1/K. */
  beta: number;
  P: number;
  A: number;
  thetaBase: number;
}

/** k linear in theta, infinite fin (dimensional). */
export function linearConductivityInfiniteFin(input: LinearConductivityFinInput): NonlinearFinResult {
  checkFin('linearConductivityInfiniteFin', input.k0, input.P, input.A, input.thetaBase);
  requirePositive('linearConductivityInfiniteFin', 'h', input.h);
  requireFinite('linearConductivityInfiniteFin', 'beta', input.beta);
  const Q = linearConductivityInfiniteQ(input.beta * input.thetaBase);
  const scale = Math.sqrt(input.h * input.P * input.k0 * input.A) * input.thetaBase;
  return { heatRate: Q * scale, Q, tipRatio: 0, m: Math.sqrt((input.h * input.P) / (input.k0 * input.A)) };
}

/** k linear in theta, adiabatic tip at length L (dimensional). */
export function linearConductivityAdiabaticFin(input: LinearConductivityFinInput & { L: number }): NonlinearFinResult {
  checkFin('linearConductivityAdiabaticFin', input.k0, input.P, input.A, input.thetaBase);
  requirePositive('linearConductivityAdiabaticFin', 'h', input.h);
  requirePositive('linearConductivityAdiabaticFin', 'L', input.L);
  requireFinite('linearConductivityAdiabaticFin', 'beta', input.beta);
  const m = Math.sqrt((input.h * input.P) / (input.k0 * input.A));
  const { tipRatio, Q } = linearConductivityAdiabatic(input.beta * input.thetaBase, m * input.L);
  const scale = Math.sqrt(input.h * input.P * input.k0 * input.A) * input.thetaBase;
  return { heatRate: Q * scale, Q, tipRatio, m };
}

// ---------------------------------------------------------------- (c) pure radiation

export interface RadiatingFinInput {
  /** Grey-body emissivity, 0 < eps <= 1. */
  emissivity: number;
  k: number;
  P: number;
  A: number;
  /** Absolute base temperature, K. */
  baseTemperature_K: number;
  /** Absolute sink temperature, K (0 for deep space); below the base temperature. */
  sinkTemperature_K: number;
}

export interface RadiatingFinResult {
  /** Heat through the base, W. */
  heatRate: number;
  /** Tip temperature, K (the sink temperature for an infinite fin). */
  tipTemperature_K: number;
}

function checkRadiating(where: string, input: RadiatingFinInput): void {
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'P', input.P);
  requirePositive(where, 'A', input.A);
  if (!(input.emissivity > 0 && input.emissivity <= 1)) throw new RangeError(`${where}: emissivity must be in (0, 1]`);
  if (!(input.sinkTemperature_K >= 0 && input.baseTemperature_K > input.sinkTemperature_K) || !Number.isFinite(input.baseTemperature_K)) {
    throw new RangeError(`${where}: need 0 <= sinkTemperature_K < baseTemperature_K`);
  }
}

/**
 * (F(T_t + D) - F(T_t)) / D = (T_t^4 - T_s^4) + 2 T_t^3 D + 2 T_t^2 D^2 + T_t D^3 + D^4/5, written with the
 * tip excess over the sink, gap = T_t - T_s, so that T_t^4 - T_s^4 = gap (2T_s + gap)(T_t^2 + T_s^2) never
 * cancels, even when the tip is within round-off of the sink.
 */
function radiationIncrement(gap: number, Ts: number, D: number): number {
  const Tt = Ts + gap;
  const fourthPowerGap = gap * (2 * Ts + gap) * (Tt * Tt + Ts * Ts);
  return fourthPowerGap + D * (2 * Tt * Tt * Tt + D * (2 * Tt * Tt + D * (Tt + D / 5)));
}

function radiationHeatRate(input: RadiatingFinInput, gap: number): number {
  const D = input.baseTemperature_K - input.sinkTemperature_K - gap;
  const scale = 2 * stefanBoltzmann * input.emissivity * input.P * input.k * input.A;
  return Math.sqrt(scale * D * radiationIncrement(gap, input.sinkTemperature_K, D));
}

/** Length for a tip excess over the sink gap = T_t - T_s in (0, T_b - T_s]. */
function radiatingLengthFromGap(input: RadiatingFinInput, gap: number): number {
  const span = input.baseTemperature_K - input.sinkTemperature_K - gap;
  if (span <= 0) return 0;
  const c = (2 * stefanBoltzmann * input.emissivity * input.P) / (input.k * input.A);
  // T = T_t + d, d = (T_b - T_t) s^2: integrand 2 sqrt(T_b - T_t) / sqrt(c E(d)).
  const integrand = (s: number): number => (2 * Math.sqrt(span)) / Math.sqrt(c * radiationIncrement(gap, input.sinkTemperature_K, span * s * s));
  return integrate(integrand, 0, 1, quadratureTolerance);
}

/** Radiating infinite fin. */
export function radiatingInfiniteFin(input: RadiatingFinInput): RadiatingFinResult {
  checkRadiating('radiatingInfiniteFin', input);
  return { heatRate: radiationHeatRate(input, 0), tipTemperature_K: input.sinkTemperature_K };
}

/** Length (m) of the adiabatic-tip radiating fin whose tip temperature is T_t (T_s < T_t <= T_b). */
export function radiatingFinLength(input: RadiatingFinInput, tipTemperature_K: number): number {
  checkRadiating('radiatingFinLength', input);
  const Ts = input.sinkTemperature_K;
  if (!(tipTemperature_K > Ts && tipTemperature_K <= input.baseTemperature_K)) {
    throw new RangeError('radiatingFinLength: tip temperature must lie in (sink, base]');
  }
  return radiatingLengthFromGap(input, tipTemperature_K - Ts);
}

/** Radiating fin with an adiabatic tip at length L (m). */
export function radiatingAdiabaticFin(input: RadiatingFinInput & { L: number }): RadiatingFinResult {
  checkRadiating('radiatingAdiabaticFin', input);
  requirePositive('radiatingAdiabaticFin', 'L', input.L);
  const span = input.baseTemperature_K - input.sinkTemperature_K;
  // Tip excess over the sink as a fraction v of the base excess, v in (0, 1].
  const v = tipFromLength((fraction) => radiatingLengthFromGap(input, span * fraction), input.L);
  return { heatRate: radiationHeatRate(input, span * v), tipTemperature_K: input.sinkTemperature_K + span * v };
}
