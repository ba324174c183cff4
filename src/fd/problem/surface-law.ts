/**
 * Heat leaving the fin's faces: temperature-dependent convection and grey radiation.
 *
 * Flux from a face, W/m^2, at excess temperature θ = T - T_amb (K) and position part h_x of h:
 *   q(θ) = h_x g(θ) θ + ε σ (T^4 - T_s^4),   g(θ) = |θ/θ_b|^n,   T = T_amb + θ in K,
 *   dq/dθ = (n + 1) h_x g(θ) + 4 ε σ T^3.
 * Power-law h: Sen & Trinh 1986, J. Heat Transfer 108, 457-459; Ünal 1985, IJHMT 28, 2279-2284 [both
 * from memory]. Radiation: the fin sees only the surroundings, a black enclosure at T_s (view factor 1
 * from every face to the surroundings, none to the base wall or to neighbouring fins), grey faces of
 * emissivity ε; as in the radiating-fin analyses of Bartas & Sellers 1960, J. Heat Transfer 82, 73
 * [from memory]. T^4 - T_s^4 is formed as (T - T_s)(T + T_s)(T^2 + T_s^2), free of cancellation.
 *
 * Discrete form (control volume i of the vertex-centred mesh, W): the same lumping as the linear
 * scheme, θ taken at the node over its CV,
 *   loss_i = G_i g(θ_i) θ_i + ε σ S_i (T_i^4 - T_s^4),   G_i = ∫_CV h_x P dx,   S_i = ∫_CV P dx,
 * so that with n = 0 and ε = 0 it is the linear scheme's G_i θ_i exactly. The derivative is diagonal.
 * g θ is formed as |θ_b| sign(θ) |θ/θ_b|^(n+1) (one power, finite for every θ when n > -1; g alone overflows
 * for n < 0 as θ -> 0).
 *
 * Near the ambient with n < 0 the loss ~ |θ|^(n+1) has an infinite slope at θ = 0, and for n -> -1 it is
 * nearly a step: the fin reaches the fluid temperature at a finite distance and stays there (a dead zone,
 * θ = 0 exactly). Newton in θ cannot get there (each step from θ > 0 overshoots to -θ n/(n+1)), and θ carried
 * as a drop θ_b - d cannot hold a θ below ε |θ_b|, whose loss |θ_b| (ε)^(n+1) G is still ~16 % of the base
 * CV's for n = -0.95. Nodes near the ambient are therefore solved for the ambient variable
 *   u = sign(θ) |θ/θ_b|^(n+1),   θ(u) = |θ_b| sign(u) |u|^(1/(n+1)),   g θ = |θ_b| u,
 * in which the convective loss is linear (d(G g θ)/du = G |θ_b|) and θ has full relative precision down to
 * the underflow (`ambientVariable`, `thetaOfAmbient`, `ambientSlope`).
 */
import type { FinProblem } from './fin-problem.js';
import { KELVIN_OFFSET, STEFAN_BOLTZMANN } from './fin-problem.js';

/** The face-flux law of a problem, with everything that does not depend on position. */
export interface FaceLaw {
  /** Exponent n of g. */
  readonly exponent: number;
  /** 1/|θ_b|, 1/K. */
  readonly inverseBaseExcess: number;
  /** ε σ, W/(m^2 K^4). */
  readonly radiative: number;
  /** T_amb and T_s, K. */
  readonly ambient_K: number;
  readonly surroundings_K: number;
}

export function faceLaw(problem: FinProblem): FaceLaw {
  return {
    exponent: problem.exponent,
    inverseBaseExcess: 1 / Math.abs(problem.base.theta),
    radiative: problem.radiation.emissivity * STEFAN_BOLTZMANN,
    ambient_K: problem.ambient_degC + KELVIN_OFFSET,
    surroundings_K: problem.radiation.surroundings_K,
  };
}

/** g(θ) = |θ/θ_b|^n (1 when n = 0). */
export function powerFactor(law: FaceLaw, theta: number): number {
  return law.exponent === 0 ? 1 : power(Math.abs(theta) * law.inverseBaseExcess, law.exponent);
}

/** T^4 - T_s^4 at excess θ, K^4. */
export function radiationGap(law: FaceLaw, theta: number): number {
  const T = law.ambient_K + theta;
  const Ts = law.surroundings_K;
  return (T - Ts) * (T + Ts) * (T * T + Ts * Ts);
}

/**
 * Largest convective slope (dq/dθ in W/(m^2 K), or G_i g (n+1) in W/K) put in the Newton matrix: for
 * n < 0 it is infinite at θ = 0, and a finite stand-in keeps the matrix finite.
 */
const LARGEST_SLOPE = 1e300;

/** g(θ) θ = |θ_b| sign(θ) |θ/θ_b|^(n+1), K (θ when n = 0; 0 at θ = 0 also for n < 0, where g is infinite). */
export function convectedExcess(law: FaceLaw, theta: number): number {
  if (law.exponent === 0) return theta;
  if (theta === 0) return 0;
  const a = Math.abs(theta) * law.inverseBaseExcess;
  // a^(n+1) as a a^n for n > 0 (sqrt for n = 1/4); for n < 0, a^n overflows where a^(n+1) does not.
  const magnitude = (law.exponent > 0 ? a * power(a, law.exponent) : Math.pow(a, law.exponent + 1)) / law.inverseBaseExcess;
  return theta > 0 ? magnitude : -magnitude;
}

/** The ambient variable u = sign(θ) |θ/θ_b|^(n+1) of a node at excess θ (header; dimensionless). */
export function ambientVariable(law: FaceLaw, theta: number): number {
  return convectedExcess(law, theta) * law.inverseBaseExcess;
}

/** θ(u) = |θ_b| sign(u) |u|^(1/(n+1)), K. */
export function thetaOfAmbient(law: FaceLaw, u: number): number {
  if (u === 0) return 0;
  const magnitude = Math.pow(Math.abs(u), 1 / (law.exponent + 1)) / law.inverseBaseExcess;
  return u > 0 ? magnitude : -magnitude;
}

/** dθ/du = |θ_b| |u|^(1/(n+1) - 1) / (n + 1), K (0 at u = 0 for n < 0). */
export function ambientSlope(law: FaceLaw, u: number): number {
  const p = law.exponent + 1;
  return Math.pow(Math.abs(u), 1 / p - 1) / law.inverseBaseExcess / p;
}

/** Face flux q(θ), W/m^2, for position part hx, W/(m^2 K). */
export function faceFlux(law: FaceLaw, hx: number, theta: number): number {
  const convected = hx === 0 ? 0 : hx * convectedExcess(law, theta);
  return law.radiative === 0 ? convected : convected + law.radiative * radiationGap(law, theta);
}

/** dq/dθ, W/(m^2 K). */
export function faceFluxSlope(law: FaceLaw, hx: number, theta: number): number {
  const convected = hx === 0 ? 0 : Math.min(LARGEST_SLOPE, (law.exponent + 1) * hx * powerFactor(law, theta));
  if (law.radiative === 0) return convected;
  const T = law.ambient_K + theta;
  return convected + 4 * law.radiative * T * T * T;
}

/** dq/du at the ambient variable u of excess θ (header), W/m^2: hx |θ_b| + 4 ε σ T^3 dθ/du. */
export function faceFluxAmbientSlope(law: FaceLaw, hx: number, theta: number, u: number): number {
  const convected = hx / law.inverseBaseExcess;
  if (law.radiative === 0) return convected;
  const T = law.ambient_K + theta;
  return convected + 4 * law.radiative * T * T * T * ambientSlope(law, u);
}

/** Nodes solved for their ambient variable (header): flag 1, the variable u, and the law that defines u. */
export interface AmbientNodes {
  readonly flags: Uint8Array;
  readonly u: Float64Array;
  readonly law: FaceLaw;
}

/**
 * a^n for a >= 0; the exponents of laminar natural convection (1/4) and of a square root through Math.sqrt, a
 * few times faster than Math.pow and correctly rounded at each step (within an ulp or two of Math.pow).
 */
function power(a: number, n: number): number {
  if (n === 0.25) return Math.sqrt(Math.sqrt(a));
  if (n === 0.5) return Math.sqrt(a);
  return Math.pow(a, n);
}

/**
 * Losses of every CV and their derivatives, W and W/K: loss_i = G_i g θ_i + ε σ S_i (T_i^4 - T_s^4).
 * G: convective conductances of the position part of h (W/K); S: CV surfaces (m^2). With `ambient`, a flagged
 * node's convective loss is formed from its u (G_i |θ_b| u_i: exact where θ = θ_b |u|^(1/(n+1)) underflows) and its
 * derivative is taken with respect to u (W). `ambient.law` defines u (a 2-D tip with its own h has exponent 0 but
 * the faces' variable); entries are index-aligned with `theta`.
 */
export function cvLosses(
  law: FaceLaw,
  G: Float64Array,
  S: Float64Array,
  theta: Float64Array,
  loss: Float64Array,
  slope: Float64Array,
  ambient?: AmbientNodes,
): void {
  const n = theta.length;
  const { exponent, radiative, ambient_K: Ta, surroundings_K: Ts } = law;
  const scale = law.inverseBaseExcess;
  const sameVariable = ambient !== undefined && ambient.law.exponent === exponent;
  for (let i = 0; i < n; i++) {
    const t = theta[i] as number;
    const Gi = G[i] as number;
    const inAmbient = ambient !== undefined && ambient.flags[i] === 1;
    const u = inAmbient ? (ambient.u[i] as number) : 0;
    const chain = inAmbient ? ambientSlope(ambient.law, u) : 1;
    // A CV without convective surface (G_i = 0: the node at a sharp or cusped tip) exchanges nothing: with
    // n < 0 at θ = 0, g is infinite and 0 * g would put NaN into the Newton matrix (fuzz finding: a convex
    // parabolic fin, n = -0.95, ended in a NaN pivot).
    let value: number;
    let derivative: number;
    if (inAmbient) {
      // The law in u: G |θ_b| u (the faces' law), or G θ(u) (exponent 0: linear in θ).
      value = sameVariable ? (Gi * u) / scale : Gi * t;
      derivative = sameVariable ? Gi / scale : Gi * chain;
    } else {
      if (exponent === 0 || Gi === 0) {
        value = Gi * t;
        derivative = Gi;
      } else {
        // With g = |θ/θ_b|^n, the loss G θ g and its slope (n + 1) G g: one power per node for n > 0. For n < 0
        // the loss is formed as |θ/θ_b|^(n+1) (g alone overflows near θ = 0 first; at θ = 0 the loss is 0 and
        // g infinite: the slope is capped at LARGEST_SLOPE as faceFluxSlope does).
        const g = power(Math.abs(t) * scale, exponent);
        value = t === 0 ? 0 : exponent > 0 ? Gi * t * g : Gi * convectedExcess(law, t);
        derivative = Math.min(LARGEST_SLOPE, (exponent + 1) * Gi * g);
      }
    }
    if (radiative !== 0) {
      const T = Ta + t;
      const Si = radiative * (S[i] as number);
      value += Si * ((T - Ts) * (T + Ts) * (T * T + Ts * Ts));
      const radiationSlope = 4 * Si * T * T * T;
      derivative += inAmbient ? radiationSlope * chain : radiationSlope;
    }
    loss[i] = value;
    slope[i] = derivative;
  }
}

/**
 * Equilibrium excess θ_e where q(θ_e) = 0 (the far end of an infinitely long fin), for position part
 * hx: 0 without radiation or when T_s = T_amb; T_s - T_amb without convection; otherwise between the
 * two (q is increasing in θ), found by bisection to the last bit.
 */
export function equilibriumExcess(law: FaceLaw, hx: number): number {
  const sinkExcess = law.surroundings_K - law.ambient_K;
  if (law.radiative === 0 || sinkExcess === 0) return 0;
  if (hx === 0) return sinkExcess;
  let low = Math.min(0, sinkExcess);
  let high = Math.max(0, sinkExcess);
  for (let it = 0; it < 200; it++) {
    const mid = 0.5 * (low + high);
    if (mid <= low || mid >= high) break;
    if (faceFlux(law, hx, mid) > 0) high = mid;
    else low = mid;
  }
  return 0.5 * (low + high);
}
