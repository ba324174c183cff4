/**
 * Heat rates of a solved 1-D fin, W, and the figures of merit built on them.
 *
 * Base heat rate Q_base: the energy balance of the base control volume (conduction to node 1 plus
 * the base CV's own convection), or the flow through the contact resistance (boundary.ts).
 * Surface heat rate: Q_surf = Σ_i G_i θ_i + Q_tip (convection from every CV plus the tip loss).
 * The scheme is conservative (interface fluxes cancel in pairs), so Q_base = Q_surf up to the
 * round-off of the solve: energyBalance = |Q_base - Q_surf| / |Q_base| (about 1e-12 and below).
 * The solution comes as θ_i = reference - drop_i so that the base conduction K_0 (θ_0 - θ_1) is
 * formed from drops, without cancellation (drop-system.ts).
 *
 * Ideal heat rate (efficiency, Harper, D. R. & Brown, W. B., 1922, NACA Report 158 [from memory]):
 * every cooled surface at the base excess θ_b with the same h distribution, computed exactly from
 * the geometry (not the grid): Q_ideal = θ_b [∫_0^L h P dx + h_tip A_tip (convective tip only)].
 * efficiency = Q / Q_ideal. Effectiveness (Gardner, K. A., 1945, Trans. ASME 67 [from memory]):
 * Q / (h(0) A_b θ_b), the heat rate of the bare base area the fin covers.
 */
import type { FinGeometry1D, Mesh1D } from '../../mesh/index.js';
import { baseHeatRate, tipHeatLoss, type BaseBoundary, type ExcessField, type TipBoundary } from './boundary.js';
import { convectiveConductance } from './conductance.js';
import { hAt, idealConvectiveConductance } from '../problem/convection.js';
import type { LinearHDistribution } from '../problem/linear-case.js';

export interface FinHeatRates1D {
  /** Q_base: heat entering the fin at its base, W. */
  readonly heatRate: number;
  /** Q_surf: heat leaving the faces and the tip, W. */
  readonly surfaceHeatRate: number;
  /** |Q_base - Q_surf| / |Q_base| (0 when both vanish). */
  readonly energyBalance: number;
}

/**
 * Base and surface heat rates of a solution (θ_i = reference - drop_i, K) and their energy balance. `convective`:
 * the G_i of every node as the assembly computed them (AssemblyParts), instead of computing them again.
 */
export function finHeatRates(
  mesh: Mesh1D,
  conductivity: number,
  hNodes: Float64Array,
  base: BaseBoundary,
  tip: TipBoundary,
  field: ExcessField,
  convective?: Float64Array,
): FinHeatRates1D {
  const heatRate = baseHeatRate(base, mesh, conductivity, hNodes, field);
  let surfaceHeatRate = tipHeatLoss(tip, mesh, conductivity, hNodes, field);
  const { reference, drop } = field;
  if (convective === undefined) {
    for (let i = 0; i < mesh.nodes; i++) {
      surfaceHeatRate += convectiveConductance(mesh, hNodes, i) * (reference - (drop[i] as number));
    }
  } else {
    for (let i = 0; i < mesh.nodes; i++) surfaceHeatRate += (convective[i] as number) * (reference - (drop[i] as number));
  }
  const scale = Math.max(Math.abs(heatRate), Math.abs(surfaceHeatRate));
  const energyBalance = scale === 0 ? 0 : Math.abs(heatRate - surfaceHeatRate) / (Math.abs(heatRate) || scale);
  return { heatRate, surfaceHeatRate, energyBalance };
}

/** Q_ideal, W: every cooled surface (the tip too when convective) at the base excess θ_b (K). */
export function idealHeatRate(geometry: FinGeometry1D, h: LinearHDistribution, tip: TipBoundary, thetaBase: number): number {
  const tipH = tip.kind === 'convective' ? (tip.h === 'local' ? hAt(h, geometry.length, geometry.length) : tip.h) : 0;
  return thetaBase * (idealConvectiveConductance(geometry, h) + tipH * geometry.tipArea);
}

/** Effectiveness: Q over the heat rate of the bare base area at the base h, h(0) A_b θ_b. */
export function finEffectiveness(heatRate: number, geometry: FinGeometry1D, h: LinearHDistribution, thetaBase: number): number {
  return heatRate / (hAt(h, 0, geometry.length) * geometry.baseArea * thetaBase);
}
