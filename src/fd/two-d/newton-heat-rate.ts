/**
 * Figures of merit of a solved nonlinear 2-D fin, with the 1-D solver's definitions (one-d/newton-heat-rate.ts)
 * evaluated on the 2-D grid's lumped surfaces, as the linear 2-D solver does (two-d/linear-solve.ts).
 *
 * Efficiency (Harper, D. R. & Brown, W. B., 1922, NACA Report 158 [from memory], with the local laws at
 * the base temperature): η = Q / Q_ideal, Q_ideal = the heat of the same section with every cooled node
 * (faces, and the tip when convective) at the base excess θ_b, losing what θ_b gives there:
 *   Q_ideal = sum over those nodes of G_p g(θ_b) θ_b + ε σ S_p (T_b^4 - T_s^4),   g(θ_b) = 1,
 * W per unit depth. Effectiveness (Gardner, K. A., 1945, Trans. ASME 67 [from memory]):
 *   ε_f = Q / (A_b [h_x(0) θ_b + ε σ (T_b^4 - T_s^4)]),   A_b = the lumped base area.
 * Without radiation and with n = 0 both are the linear solver's expressions, evaluated in its order.
 */
import { lumpedIntegral } from './boundary.js';
import { hAt } from '../problem/convection.js';
import { cvLosses, radiationGap } from '../problem/surface-law.js';
import type { NonlinearFin2DProblem } from './nonlinear-problem.js';
import type { Newton2DSetup } from './newton-setup.js';

/** Q_ideal, W per unit depth (header); null for a cut infinite fin (no finite ideal). */
export function idealHeatRate2D(problem: NonlinearFin2DProblem, setup: Newton2DSetup): number | null {
  if (problem.linear.truncatedInfinite) return null;
  const { terms, surfaces } = setup.ops;
  const thetaBase = setup.thetaBase;
  let ideal = 0;
  for (const name of ['face', 'tip'] as const) {
    const side = terms[name];
    if (side.kind !== 'convective') continue;
    const count = side.nodes.length;
    const loss = new Float64Array(count);
    const slope = new Float64Array(count);
    cvLosses(name === 'tip' ? setup.tipLaw : setup.faceLaw, side.conductance, surfaces[name], new Float64Array(count).fill(thetaBase), loss, slope);
    for (const value of loss) ideal += value;
  }
  return ideal;
}

/** Heat flux the bare base would lose at θ_b, W/m^2: h_x(0) θ_b + ε σ (T_b^4 - T_s^4). */
export function bareBaseFlux(problem: NonlinearFin2DProblem, setup: Newton2DSetup): number {
  const hBase = hAt(problem.linear.h, 0, problem.linear.section.length);
  const law = setup.faceLaw;
  const thetaBase = setup.thetaBase;
  return law.radiative === 0 ? hBase * thetaBase : hBase * thetaBase + law.radiative * radiationGap(law, thetaBase);
}

/** h at the base with radiation as an equivalent coefficient on θ_b, W/(m^2 K) (h_x(0) exactly without radiation). */
export function baseCoefficient(problem: NonlinearFin2DProblem, setup: Newton2DSetup): number {
  const hBase = hAt(problem.linear.h, 0, problem.linear.section.length);
  return setup.faceLaw.radiative === 0 ? hBase : bareBaseFlux(problem, setup) / setup.thetaBase;
}

/** ε_f = Q / (A_b q_bare) with Q in W per unit depth (header). */
export function effectiveness2D(problem: NonlinearFin2DProblem, setup: Newton2DSetup, heatRate: number): number {
  const { grid, terms } = setup.ops;
  let baseArea = 0;
  for (const a of lumpedIntegral(grid, terms.base.nodes, () => 1)) baseArea += a;
  const law = setup.faceLaw;
  if (law.radiative === 0) {
    const hBase = hAt(problem.linear.h, 0, problem.linear.section.length);
    return heatRate / (hBase * baseArea * setup.thetaBase);
  }
  const bare = baseArea * bareBaseFlux(problem, setup);
  return bare === 0 ? Number.NaN : heatRate / bare;
}
