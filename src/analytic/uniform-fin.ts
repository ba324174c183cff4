/**
 * Fin of uniform cross-section, constant k and h, four tip conditions (closed forms).
 *
 *     d^2 theta/dx^2 - m^2 theta = 0,   m = sqrt(h P / (k A)),   theta(0) = thetaBase,
 *
 * theta = T - T_inf (K), x from the base (m), P perimeter (m), A cross-section (m^2), h W/(m^2 K),
 * k W/(m K). Sign convention: heatRate q (W) is positive when heat flows from the base into the fin;
 * at the tip, heat leaving the fin is -k A dtheta/dx(L) > 0.  M = sqrt(h P k A) thetaBase (W).
 *
 *   convective tip  (-k theta'(L) = hTip theta(L), beta = hTip/(m k)):
 *       theta/thetaBase = [cosh m(L-x) + beta sinh m(L-x)] / [cosh mL + beta sinh mL]
 *       q = M (tanh mL + beta) / (1 + beta tanh mL)
 *   adiabatic tip:  theta/thetaBase = cosh m(L-x) / cosh mL,   q = M tanh mL
 *   tip excess thetaTip:  theta/thetaBase = [(thetaTip/thetaBase) sinh mx + sinh m(L-x)] / sinh mL
 *       q = M (cosh mL - thetaTip/thetaBase) / sinh mL
 *   infinite fin:   theta/thetaBase = exp(-m x),  q = M
 *
 * Efficiency q/(h A_f thetaBase) with A_f = P L + A (convective tip) or P L (adiabatic tip)
 * (Harper, D. R. & Brown, W. B., 1922, NACA Report 158 [from memory]); it is not defined (null) for a
 * prescribed tip excess or an infinite fin. Effectiveness q/(h A thetaBase) (Gardner, K. A., 1945,
 * "Efficiency of extended surface", Trans. ASME 67, 621-631 [from memory]).
 * Source of the table: Incropera, DeWitt, Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer,
 * 6th ed., Wiley 2007, Table 3.4 [from memory]. Every hyperbolic function is written with exp(-m...)
 * factors only, so nothing overflows at large mL.
 */
import { requireFinite, requireNonNegative, requirePositive } from './check.js';

/** Tip condition at x = L. thetaTip is an excess temperature (K), not an absolute temperature. */
export type UniformTip = { kind: 'convective'; hTip?: number } | { kind: 'adiabatic' } | { kind: 'temperature'; thetaTip: number } | { kind: 'infinite' };

export interface UniformFinInput {
  /** Face convection coefficient, W/(m^2 K). */
  h: number;
  /** Conductivity, W/(m K). */
  k: number;
  /** Perimeter, m. */
  P: number;
  /** Cross-section area, m^2. */
  A: number;
  /** Length, m (ignored for an infinite fin). */
  L: number;
  /** Base excess temperature T_b - T_inf, K. */
  thetaBase: number;
  tip: UniformTip;
}

export interface UniformFinResult {
  /** Fin parameter m = sqrt(hP/(kA)), 1/m. */
  m: number;
  /** M = sqrt(h P k A) thetaBase, W (the heat rate of an infinitely long fin). */
  M: number;
  mL: number;
  /** Tip Biot group hTip/(m k) for a convective tip, 0 otherwise. */
  beta: number;
  /** Heat through the base, W. */
  heatRate: number;
  /** q/(h A_f thetaBase); null for a prescribed tip excess or an infinite fin. */
  efficiency: number | null;
  /** Surface A_f the efficiency refers to, m^2; null where efficiency is null. */
  finArea: number | null;
  /** q/(h A thetaBase). */
  effectiveness: number;
}

const where = 'uniformFin';

function checkInput(input: UniformFinInput): void {
  requirePositive(where, 'h', input.h);
  requirePositive(where, 'k', input.k);
  requirePositive(where, 'P', input.P);
  requirePositive(where, 'A', input.A);
  requireFinite(where, 'thetaBase', input.thetaBase);
  if (input.tip.kind !== 'infinite') requireNonNegative(where, 'L', input.L);
  if (input.tip.kind === 'temperature') {
    requirePositive(where, 'L (prescribed tip excess)', input.L);
    requireFinite(where, 'thetaTip', input.tip.thetaTip);
  }
  if (input.tip.kind === 'convective' && input.tip.hTip !== undefined) requireNonNegative(where, 'hTip', input.tip.hTip);
}

/** Fin parameter m = sqrt(hP/(kA)), 1/m. */
export function finParameter(h: number, k: number, P: number, A: number): number {
  return Math.sqrt((h * P) / (k * A));
}

function tipBeta(input: UniformFinInput, m: number): number {
  return input.tip.kind === 'convective' ? (input.tip.hTip ?? input.h) / (m * input.k) : 0;
}

/** sinh(a)/sinh(b) for 0 < a <= b, without overflow. */
function sinhRatio(a: number, b: number): number {
  if (a === 0) return 0;
  return (Math.exp(a - b) * Math.expm1(-2 * a)) / Math.expm1(-2 * b);
}

/** [cosh a + beta sinh a] / [cosh b + beta sinh b] for 0 <= a <= b, without overflow. */
function coshBetaRatio(a: number, b: number, beta: number): number {
  const ea = Math.exp(-2 * a);
  const eb = Math.exp(-2 * b);
  return (Math.exp(a - b) * (1 + ea + beta * (1 - ea))) / (1 + eb + beta * (1 - eb));
}

/** Heat rate, efficiency and effectiveness of a uniform fin. */
export function uniformFin(input: UniformFinInput): UniformFinResult {
  checkInput(input);
  const { h, k, P, A, L, thetaBase, tip } = input;
  const m = finParameter(h, k, P, A);
  const M = Math.sqrt(h * P * k * A) * thetaBase;
  const mL = tip.kind === 'infinite' ? Infinity : m * L;
  const beta = tipBeta(input, m);
  let heatRate: number;
  let finArea: number | null;
  switch (tip.kind) {
    case 'convective': {
      const t = Math.tanh(mL);
      heatRate = (M * (t + beta)) / (1 + beta * t);
      finArea = P * L + A;
      break;
    }
    case 'adiabatic':
      heatRate = M * Math.tanh(mL);
      finArea = P * L;
      break;
    case 'temperature': {
      const ratio = tip.thetaTip / thetaBase;
      const inverseSinh = (-2 * Math.exp(-mL)) / Math.expm1(-2 * mL);
      heatRate = M * (1 / Math.tanh(mL) - ratio * inverseSinh);
      finArea = null;
      break;
    }
    case 'infinite':
      heatRate = M;
      finArea = null;
      break;
    default: {
      const unreachable: never = tip;
      throw new Error(`uniformFin: unknown tip ${JSON.stringify(unreachable)}`);
    }
  }
  const efficiency = finArea === null ? null : heatRate / (h * finArea * thetaBase);
  return { m, M, mL, beta, heatRate, efficiency, finArea, effectiveness: heatRate / (h * A * thetaBase) };
}

/** Excess temperature theta(x) = T(x) - T_inf (K) at distance x (m) from the base, 0 <= x <= L. */
export function uniformFinExcess(input: UniformFinInput, x: number): number {
  checkInput(input);
  const { h, k, P, A, L, thetaBase, tip } = input;
  if (!(x >= 0) || (tip.kind !== 'infinite' && x > L)) throw new RangeError(`${where}: x = ${x} outside the fin`);
  const m = finParameter(h, k, P, A);
  switch (tip.kind) {
    case 'convective':
      return thetaBase * coshBetaRatio(m * (L - x), m * L, tipBeta(input, m));
    case 'adiabatic':
      return thetaBase * coshBetaRatio(m * (L - x), m * L, 0);
    case 'temperature':
      return thetaBase * sinhRatio(m * (L - x), m * L) + tip.thetaTip * sinhRatio(m * x, m * L);
    case 'infinite':
      return thetaBase * Math.exp(-m * x);
    default: {
      const unreachable: never = tip;
      throw new Error(`uniformFin: unknown tip ${JSON.stringify(unreachable)}`);
    }
  }
}

/** theta at each position of `x` (m), as a new Float64Array (K). */
export function uniformFinExcessProfile(input: UniformFinInput, x: Float64Array): Float64Array {
  const out = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) out[i] = uniformFinExcess(input, x[i] ?? NaN);
  return out;
}
