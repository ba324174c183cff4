/**
 * The cases the linear 1-D solver accepts, by type: h independent of temperature (uniform, linear,
 * piecewise linear), constant conductivity and no radiation. A power-law h, a temperature-dependent
 * k and radiation make the fin equation nonlinear; the nonlinear solver wraps the same assembly
 * (assembleFin1D takes nodal h values) inside a Newton or Picard iteration.
 */
import type { Case, Conductivity, Convection, HDistribution, Material } from '../../case/index.js';

/** The h distributions that do not depend on temperature. */
export type LinearHDistribution = Exclude<HDistribution, { kind: 'power' }>;

/** A case whose fin equation is linear in θ. */
export type LinearFinCase = Case & {
  readonly convection: Convection & { readonly h: LinearHDistribution; readonly emissivity: 0 };
  readonly material: Material & { readonly k: Extract<Conductivity, { kind: 'constant' }> };
};

/** Narrows a case to LinearFinCase: linear h kind, constant k and no radiation. */
export function isLinearFinCase(c: Case): c is LinearFinCase {
  return c.convection.h.kind !== 'power' && c.material.k.kind === 'constant' && c.convection.emissivity === 0;
}
