/**
 * From the fin problem (problem/fin-problem.ts) to the 2-D problem: the meshed section, the conductivity and the boundary
 * conditions (excess temperatures theta = T - T_inf, K).
 *
 * What the fd-2d model includes: conduction across the thickness (planar section for straight fins,
 * axisymmetric for pins and annular fins), the true sloped or curved faces (their slanted area and
 * normal), the h distribution along the fin (uniform, linear, points), the tip condition (adiabatic,
 * convective with its own or the local h, fixed temperature), the base temperature with or without a
 * contact resistance. Straight fins are solved per metre of width and multiplied by the width, so the
 * narrow side edges are insulated (`fin.edges` is not modelled: the 1-D model handles edges).
 * The nonlinear laws (k(T), the power-law h, radiation) act on top of this problem (problem/fin-problem.ts),
 * which is built here for the position part of h and the reference conductivity.
 *
 * Infinite tip (uniform rectangular fins and pins, uniform h only): the section is cut at
 * L_cut = 20 half-thicknesses (radii) and closed by the exact condition of the slowest 2-D mode,
 * -k d(theta)/dx = (k lambda1 / b) theta, where theta ~ cos(lambda1 y/b) exp(-lambda1 x/b) and
 *   planar: lambda1 tan(lambda1) = Bi,   pin: lambda1 J1(lambda1) = Bi J0(lambda1),   Bi = h b / k
 * (separation of variables, as in the 2-D series of scripts fin2d_series.py and pin2d_series.py; an exact
 * 2-D series for the rectangular fin is published in Moitsheki & Rowjee 2011, Math. Probl. Eng.
 * 826819). The next mode decays faster by at least exp(-(lambda2 - lambda1) L_cut / b)
 * <= exp(-1.43 * 20) ~ 4e-13 at the cut, so the cut changes the heat rate by less than that.
 */
import type { Case } from '../../case/index.js';
import { sectionOf, type Section2D } from '../../mesh/index.js';
import { finProblem, type FinProblem } from '../problem/fin-problem.js';
import { modelApplies, nonlinearity } from '../problem/model-applies.js';
import { ModelNotApplicableError } from '../../errors.js';
import type { BoundaryCondition2D, FinConditions2D, LinearH } from './boundary.js';

export interface Fin2DProblem {
  section: Section2D;
  /** W/(m*K). */
  k: number;
  conditions: FinConditions2D;
  /** Base excess temperature T_base - T_inf, K. */
  thetaBase: number;
  ambient_degC: number;
  /** Coefficient on the faces. */
  h: LinearH;
  /** True when the section was cut and closed by the exact slowest-mode condition (infinite tip). */
  truncatedInfinite: boolean;
}

/** Half-thicknesses (radii) kept before the cut of an infinite fin. */
export const INFINITE_CUT_HALF_SIZES = 20;

/**
 * Why the linear 2-D solver cannot solve this case, or null when it can: a nonlinearity (solved by
 * Newton's method on top of the linear problem, problem/fin-problem.ts), or a fin fd-2d does not cover.
 */
export function fin2dUnsupported(c: Case): string | null {
  const problem = finProblem(c);
  const nonlinear = nonlinearity(problem);
  if (nonlinear !== null) return `${nonlinear} is not modelled by the linear 2-D solver`;
  const coverage = modelApplies(problem, '2d');
  return coverage.ok ? null : coverage.reason;
}

/** The 2-D problem of a linear case; a ModelNotApplicableError when the linear 2-D solver does not cover it. */
export function fin2dProblem(c: Case): Fin2DProblem {
  const unsupported = fin2dUnsupported(c);
  if (unsupported !== null) throw new ModelNotApplicableError('fd-2d', unsupported);
  const problem = finProblem(c);
  return twoDProblem(problem, problem.conductivity.kind === 'constant' ? problem.conductivity.k : Number.NaN);
}

/**
 * The 2-D problem of a fin with conductivity k (W/(m*K)) and the position part of its h: the linear fin
 * itself, or the base of a nonlinear one (k = k_ref; the laws act on top, problem/fin-problem.ts). The
 * caller has asked modelApplies(problem, '2d').
 */
export function twoDProblem(problem: FinProblem, k: number): Fin2DProblem {
  const { base, h, ambient_degC } = problem;
  const thetaBase = base.theta;
  const baseCondition: BoundaryCondition2D =
    base.kind === 'contact' ? { kind: 'contact', resistance: base.resistance, theta: thetaBase } : { kind: 'fixed', theta: thetaBase };
  let section = sectionOf(problem.profile);
  const face: BoundaryCondition2D = { kind: 'convective', h };
  const length = section.length;
  let tip: BoundaryCondition2D;
  let truncatedInfinite = false;
  const t = problem.tip;
  switch (t.kind) {
    case 'adiabatic':
      tip = { kind: 'adiabatic' };
      break;
    case 'convective': {
      const hTip = t.h === 'local' ? faceCoefficientAtTip(h, length) : t.h;
      tip = { kind: 'convective', h: { kind: 'uniform', h: hTip } };
      break;
    }
    case 'temperature':
      tip = { kind: 'fixed', theta: t.theta };
      break;
    case 'infinite': {
      // modelApplies: a uniform rectangular fin or pin with a uniform h.
      const hUniform = h.kind === 'uniform' ? h.h : Number.NaN;
      const b = section.halfSize(0);
      const lambda1 = section.kind === 'pin' ? firstPinEigenvalue((hUniform * b) / k) : firstPlateEigenvalue((hUniform * b) / k);
      const cut = INFINITE_CUT_HALF_SIZES * b;
      section = { ...section, length: cut, breakpoints: [0, cut], ...(section.key === undefined ? {} : { key: `${section.key}|cut ${cut}` }) };
      tip = { kind: 'convective', h: { kind: 'uniform', h: (k * lambda1) / b } };
      truncatedInfinite = true;
      break;
    }
    default: {
      const never: never = t;
      throw new Error(`twoDProblem: unknown tip ${JSON.stringify(never)}`);
    }
  }
  return {
    section,
    k,
    conditions: { base: baseCondition, face, tip },
    thetaBase,
    ambient_degC,
    h,
    truncatedInfinite,
  };
}

function faceCoefficientAtTip(h: LinearH, length: number): number {
  switch (h.kind) {
    case 'uniform':
      return h.h;
    case 'linear':
      return h.tip;
    case 'points': {
      const n = h.x.length;
      // Beyond the last point h stays at its last value (the distribution is clamped).
      return (h.x[n - 1] as number) >= length ? interpolateAt(h, length) : (h.h[n - 1] as number);
    }
    default: {
      const never: never = h;
      throw new Error(`faceCoefficientAtTip: ${JSON.stringify(never)}`);
    }
  }
}

function interpolateAt(h: { x: Float64Array; h: Float64Array }, s: number): number {
  const n = h.x.length;
  if (s <= (h.x[0] as number)) return h.h[0] as number;
  let k = 1;
  while (k < n - 1 && (h.x[k] as number) < s) k++;
  const x0 = h.x[k - 1] as number;
  const x1 = h.x[k] as number;
  return (h.h[k - 1] as number) + (((h.h[k] as number) - (h.h[k - 1] as number)) * (s - x0)) / (x1 - x0);
}

/** First root of lambda tan(lambda) = Bi in (0, pi/2), by bisection on lambda sin - Bi cos. */
export function firstPlateEigenvalue(bi: number): number {
  return bisect((l) => l * Math.sin(l) - bi * Math.cos(l), 0, Math.PI / 2);
}

/** First root of lambda J1(lambda) = Bi J0(lambda) in (0, j0,1 = 2.404825557695773). */
export function firstPinEigenvalue(bi: number): number {
  return bisect((l) => l * besselJ(1, l) - bi * besselJ(0, l), 0, 2.404825557695773);
}

/** J0 or J1 by the power series (Abramowitz & Stegun 1964, eq. 9.1.10); accurate to ~1e-16 for |x| < 3. */
function besselJ(order: 0 | 1, x: number): number {
  const q = -(x * x) / 4;
  let term = order === 0 ? 1 : x / 2;
  let sum = term;
  for (let k = 1; k < 40; k++) {
    term *= q / (k * (k + order));
    sum += term;
    if (Math.abs(term) < 1e-18 * Math.abs(sum)) break;
  }
  return sum;
}

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let flo = f(lo);
  for (let it = 0; it < 200 && hi - lo > 1e-16 * hi; it++) {
    const mid = 0.5 * (lo + hi);
    const fm = f(mid);
    if (fm === 0) return mid;
    if (Math.sign(fm) === Math.sign(flo)) {
      lo = mid;
      flo = fm;
    } else hi = mid;
  }
  return 0.5 * (lo + hi);
}
