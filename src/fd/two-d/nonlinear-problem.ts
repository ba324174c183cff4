/**
 * The nonlinear fin across its thickness as plain data: the 2-D section and boundary conditions of the
 * linear model (two-d/problem.ts) for the position part of h and the reference conductivity, plus the laws
 * that make the fin nonlinear, exactly as the 1-D solver states them (problem/fin-problem.ts).
 *
 * Equation in the section (θ = T - T_amb in K, k in W/(m K), r the radius of axisymmetric sections,
 * 1 for the planar section of a straight fin):
 *   div(k(T) r grad T) = 0,
 * on the cooled faces (outward normal n, heat leaving positive)
 *   -k dT/dn = q(θ) = h_x(s) |θ/θ_b|^n θ + ε σ (T^4 - T_s^4),
 * h_x the position part of h along the fin (W/(m^2 K); the `base` of a power law), n its exponent, ε the
 * grey emissivity, T_s the surroundings (K). A convective tip loses the same q with h_x(L) ('face' tip
 * law), or with its own constant coefficient and the faces' radiation ('own-h'), as in 1-D
 * (one-d/newton-boundary.ts). Base: fixed temperature or a contact resistance; tip: adiabatic, convective or
 * fixed temperature. Radiation: the fin sees only its surroundings (view factor 1).
 *
 * Not covered in 2-D: the infinite tip of a nonlinear fin (the linear model closes a cut fin with its
 * slowest 2-D mode, which a nonlinear fin does not have); linear infinite fins are covered as in
 * two-d/problem.ts.
 */
import type { Case } from '../../case/index.js';
import { kirchhoffTransform } from '../problem/conductivity.js';
import { finProblem, type FinProblem } from '../problem/fin-problem.js';
import { requireModel } from '../problem/model-applies.js';
import { twoDProblem, type Fin2DProblem } from './problem.js';

export interface NonlinearFin2DProblem {
  /**
   * Section, base, face and tip conditions of the position part of h (W/(m^2 K)) with k = k_ref, the
   * conductivity at the base temperature (W/(m K)).
   */
  readonly linear: Fin2DProblem;
  /** The nonlinear laws (exponent, emissivity and surroundings, k(T), base excess) of the fin. */
  readonly physics: FinProblem;
  /** How a convective tip loses heat: the face law at x = L, or its own constant h plus radiation. */
  readonly tipLaw: 'face' | 'own-h';
}

/** The 2-D problem of any case the 2-D model covers; ModelNotApplicableError naming the reason otherwise. */
export function nonlinearFin2DProblem(c: Case): NonlinearFin2DProblem {
  const problem = finProblem(c);
  requireModel(problem, '2d');
  return twoDFinProblem(problem);
}

/** The 2-D problem of a fin (the caller has asked modelApplies(problem, '2d')). */
export function twoDFinProblem(physics: FinProblem): NonlinearFin2DProblem {
  const tip = physics.tip;
  const tipLaw = tip.kind === 'convective' && tip.h === 'local' ? 'face' : 'own-h';
  // The same fin with h reduced to its position part, k to k_ref (the conductivity at the base
  // temperature), and no radiation: its 2-D problem carries the section and every condition the
  // nonlinear laws then act on. A linear fin is this problem itself.
  const k = physics.conductivity;
  const kRef = k.kind === 'constant' ? k.k : kirchhoffTransform(k, physics.ambient_degC, physics.base.theta).kRef;
  return { linear: twoDProblem(physics, kRef), physics, tipLaw };
}
