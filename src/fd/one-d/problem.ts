/**
 * The linear 1-D fin problem as plain data: geometry, conductivity, h distribution, base and tip
 * conditions, ambient temperature. Built from a case here, or by hand for shapes the case format
 * does not name (e.g. parabolic spines in the verification tests).
 *
 * Units: k in W/(m*K), h in W/(m^2*K), θ in K, ambient in degC.
 */
import { finGeometry, type FinGeometry1D } from '../../mesh/index.js';
import { baseBoundary, tipBoundary, type BaseBoundary, type TipBoundary } from './boundary.js';
import type { LinearFinCase, LinearHDistribution } from '../problem/linear-case.js';

export interface FinProblem1D {
  readonly geometry: FinGeometry1D;
  /** Thermal conductivity k, W/(m*K). */
  readonly conductivity: number;
  readonly h: LinearHDistribution;
  readonly base: BaseBoundary;
  readonly tip: TipBoundary;
  /** Ambient (fluid) temperature, degC; θ = T - ambient. */
  readonly ambient_degC: number;
}

/** The 1-D problem of a linear case. */
export function finProblem1D(c: LinearFinCase): FinProblem1D {
  return {
    geometry: finGeometry(c),
    conductivity: c.material.k.k,
    h: c.convection.h,
    base: baseBoundary(c),
    tip: tipBoundary(c),
    ambient_degC: c.convection.ambient_degC,
  };
}
