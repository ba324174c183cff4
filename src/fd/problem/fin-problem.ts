/**
 * The fin problem as plain data: the one problem every model of fd solves (1-D along the fin, 2-D across
 * its thickness), linear or not. A linear fin is the special case n = 0, ε = 0, constant k.
 *
 * - geometry: the 1-D geometry A(x), P(x) (mesh/geometry1d.ts) and the case's profile, from which the
 *   2-D section is built (mesh/grid2d-section.ts); the side edges of a straight fin, cooled or insulated;
 * - conductivity law: a constant k, or k(T) from a table (conductivity.ts, Kirchhoff transform);
 * - surface law (surface-law.ts): the position part h_x of h (uniform, linear or tabulated along x), the
 *   exponent n of a power law in θ, grey radiation to the surroundings;
 * - base: a fixed temperature, or a wall behind a contact resistance; tip: adiabatic, convective (the
 *   face law or its own h), a fixed temperature, or infinitely long (one-d/boundary.ts).
 *
 * Equation (θ = T - T_amb in K, x from the base in m, T in K where absolute):
 *   d/dx(k(T) A(x) dT/dx) = P(x) [h_x(x) g(θ) θ + ε σ (T^4 - T_s^4)],   g(θ) = |θ/θ_b|^n,
 * with h_x the position part of h (W/(m^2 K): uniform, linear or tabulated along x; for the power law
 * of the case format h = base (θ/θ_b)^n, h_x = base), n the exponent (> -1, so h θ is increasing in
 * θ), ε the grey emissivity and T_s the surroundings (K = degC + 273.15), σ = 5.670374419e-8
 * W/(m^2 K^4) (CODATA 2018). |θ| keeps the law defined and odd when part of the fin is colder than the
 * fluid (the same power of the excess either way). k(T) in W/(m K): constant or a table over T.
 */
import type { Case, Conductivity, Edges, Profile } from '../../case/index.js';
import { finGeometry, type FinGeometry1D } from '../../mesh/index.js';
import { baseBoundary, tipBoundary, type BaseBoundary, type TipBoundary } from './conditions.js';
import type { LinearHDistribution } from './linear-case.js';

/** Stefan-Boltzmann constant, W/(m^2 K^4) (CODATA 2018). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;
/** Offset between degC and K. */
export const KELVIN_OFFSET = 273.15;

export interface Radiation {
  /** Grey-body emissivity of the faces (and of a convective tip), 0..1; 0 = no radiation. */
  readonly emissivity: number;
  /** Absolute temperature of the surroundings the fin sees, K. */
  readonly surroundings_K: number;
}

export interface FinProblem {
  /** The case's name, for messages. */
  readonly name: string;
  readonly geometry: FinGeometry1D;
  /** The case's profile (the 2-D section is built from it). */
  readonly profile: Profile;
  /** Side edges of a straight fin (in `geometry` already; the 2-D section insulates them). */
  readonly edges: Edges;
  readonly conductivity: Conductivity;
  /** Position part h_x of the convection coefficient, W/(m^2 K). */
  readonly h: LinearHDistribution;
  /** Exponent n of g(θ) = |θ/θ_b|^n (0: h does not depend on temperature). */
  readonly exponent: number;
  readonly radiation: Radiation;
  readonly base: BaseBoundary;
  readonly tip: TipBoundary;
  /** Ambient (fluid) temperature, degC; θ = T - ambient. */
  readonly ambient_degC: number;
}

/** The problem of a case. */
export function finProblem(c: Case): FinProblem {
  const h = c.convection.h;
  return {
    name: c.name,
    geometry: finGeometry(c),
    profile: c.fin.profile,
    edges: c.fin.edges,
    conductivity: c.material.k,
    h: h.kind === 'power' ? { kind: 'uniform', h: h.base } : h,
    exponent: h.kind === 'power' ? h.exponent : 0,
    radiation: { emissivity: c.convection.emissivity, surroundings_K: c.convection.surroundings_degC + KELVIN_OFFSET },
    base: baseBoundary(c),
    tip: tipBoundary(c),
    ambient_degC: c.convection.ambient_degC,
  };
}

/** True when the problem is linear: n = 0, no radiation, constant k. */
export function isLinearProblem(problem: FinProblem): boolean {
  return problem.exponent === 0 && problem.radiation.emissivity === 0 && problem.conductivity.kind === 'constant';
}

/**
 * The problem with its nonlinearity scaled by s in [0, 1] (continuation): exponent s n, emissivity
 * s ε, and k(T) = k_ref + s (k(T) - k_ref) with k_ref the conductivity at the ambient temperature.
 * s = 1 is the problem itself; s = 0 is linear.
 */
export function scaleNonlinearity(problem: FinProblem, s: number, kRef: number): FinProblem {
  if (s === 1) return problem;
  const k = problem.conductivity;
  const conductivity: Conductivity = k.kind === 'constant' ? k : { kind: 'table', T_degC: k.T_degC, k: k.k.map((value) => kRef + s * (value - kRef)) };
  return {
    ...problem,
    conductivity,
    exponent: s * problem.exponent,
    radiation: { ...problem.radiation, emissivity: s * problem.radiation.emissivity },
  };
}
