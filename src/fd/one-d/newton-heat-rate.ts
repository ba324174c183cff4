/**
 * Heat rates of a solved nonlinear 1-D fin, W, and its figures of merit.
 *
 * Q_base: the base CV's energy balance, K_0 (D_1 - D_0) + loss_0 (temperature base; D the Kirchhoff
 * potential drop below the base, problem/conductivity.ts), or the flow through the contact
 * resistance C_b d_0 (one-d/newton-boundary.ts). Q_surf = Q_tip + Σ_i loss_i (every CV's convection and
 * radiation plus the tip). The interface fluxes F_i = K_i (D_{i+1} - D_i) cancel in pairs, so
 * Q_base - Q_surf is the sum of the converged residuals: energyBalance = |Q_base - Q_surf| / |Q_base|
 * is round-off.
 *
 * Efficiency for a nonlinear fin (the efficiency of Harper, D. R. & Brown, W. B., 1922, NACA Report
 * 158 [from memory], with the local laws at the base temperature): η = Q / Q_ideal, with Q_ideal the
 * heat of the same fin with every cooled surface (faces, and the tip when it is convective) at the
 * base temperature, losing what the base temperature gives there:
 *   Q_ideal = θ_b ∫_0^L h_x P dx + θ_b h_tip A_tip + ε σ (T_b^4 - T_s^4) (A_faces + A_tip),
 * the tip terms for a convective tip only; g(θ_b) = 1, so h at the base temperature is h_x. Computed
 * exactly from the geometry (not the grid). For the power law over a uniform fin this is the
 * η = Q / (h_b P L θ_b) of Sen & Trinh (1986).
 * Effectiveness (Gardner, K. A., 1945, Trans. ASME 67 [from memory]): Q over the heat the bare base
 * area would lose at the base temperature, convection and radiation:
 *   ε_f = Q / (A_b [h_x(0) θ_b + ε σ (T_b^4 - T_s^4)]).
 * T_b is the wall temperature (behind any contact resistance). Without radiation and with n = 0 these
 * are the linear solver's definitions (one-d/heat-rate.ts), evaluated in the same order.
 */
import type { FinGeometry1D } from '../../mesh/index.js';
import { hAt } from '../problem/convection.js';
import { idealHeatRate, type FinHeatRates1D } from './heat-rate.js';
import { tipLoss } from './newton-boundary.js';
import { cvLosses, radiationGap } from '../problem/surface-law.js';
import type { NewtonSetup } from './newton-system.js';
import type { FinProblem } from '../problem/fin-problem.js';

/**
 * Base and surface heat rates of a solution given by its drops d = θ_b - θ and its excess temperatures θ (K;
 * both from the solve: θ near the ambient is carried to full relative precision, not as θ_b - d), and their
 * energy balance. `evaluated`: the potential drops D(d) and the CV losses of these temperatures when the solve
 * has them already (formed from θ as here: NewtonOutcome), else they are computed.
 */
export function nonlinearHeatRates(
  setup: NewtonSetup,
  drop: Float64Array,
  theta: Float64Array,
  evaluated: { readonly potential: Float64Array; readonly loss: Float64Array } | null = null,
): FinHeatRates1D {
  const n = drop.length;
  const last = n - 1;
  const b = setup.boundaries;
  const { potential, loss } = evaluated ?? evaluateSolution(setup, drop, theta);
  const heatRate =
    b.base.kind === 'temperature'
      ? (setup.K[0] as number) * ((potential[1] as number) - (potential[0] as number)) + (loss[0] as number)
      : b.contact * (drop[0] as number);
  let surfaceHeatRate =
    b.tip.kind === 'temperature'
      ? (setup.K[last - 1] as number) * ((potential[last] as number) - (potential[last - 1] as number)) - (loss[last] as number)
      : tipLoss(b, theta[last] as number, { value: 0, slope: 0 }).value;
  for (let i = 0; i < n; i++) surfaceHeatRate += loss[i] as number;
  const scale = Math.max(Math.abs(heatRate), Math.abs(surfaceHeatRate));
  const energyBalance = scale === 0 ? 0 : Math.abs(heatRate - surfaceHeatRate) / (Math.abs(heatRate) || scale);
  return { heatRate, surfaceHeatRate, energyBalance };
}

/** D(d) (K) and the CV losses (W) of a solution. */
function evaluateSolution(setup: NewtonSetup, drop: Float64Array, theta: Float64Array): { potential: Float64Array; loss: Float64Array } {
  const n = drop.length;
  const potential = new Float64Array(n);
  const loss = new Float64Array(n);
  setup.kirchhoff.evaluate(drop, potential, new Float64Array(n));
  cvLosses(setup.law, setup.G, setup.mesh.cvSurface, theta, loss, new Float64Array(n));
  return { potential, loss };
}

/** Radiated flux at the base temperature, ε σ (T_b^4 - T_s^4), W/m^2 (0 without radiation). */
function baseRadiation(setup: NewtonSetup, thetaBase: number): number {
  return setup.law.radiative === 0 ? 0 : setup.law.radiative * radiationGap(setup.law, thetaBase);
}

/** Q_ideal, W (header). */
export function nonlinearIdealHeatRate(problem: FinProblem, setup: NewtonSetup): number {
  const geometry: FinGeometry1D = problem.geometry;
  const thetaBase = problem.base.theta;
  const convective = idealHeatRate(geometry, problem.h, problem.tip, thetaBase);
  if (setup.law.radiative === 0) return convective;
  const radiatingArea = geometry.faceArea + (problem.tip.kind === 'convective' ? geometry.tipArea : 0);
  return convective + baseRadiation(setup, thetaBase) * radiatingArea;
}

/** Effectiveness ε_f (header); NaN when the bare base would lose no heat (T_b = T_s without convection). */
export function nonlinearEffectiveness(heatRate: number, problem: FinProblem, setup: NewtonSetup): number {
  const geometry = problem.geometry;
  const thetaBase = problem.base.theta;
  const hx0 = hAt(problem.h, 0, geometry.length);
  if (setup.law.radiative === 0) return heatRate / (hx0 * geometry.baseArea * thetaBase);
  const bare = geometry.baseArea * (hx0 * thetaBase + baseRadiation(setup, thetaBase));
  return bare === 0 ? Number.NaN : heatRate / bare;
}
