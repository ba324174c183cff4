/**
 * Boundary conditions of the 1-D fin as data, and their discretisation (the only place that knows them).
 *
 * Sign convention (stated once): θ = T - T_amb in K. Every equation row reads
 *   "heat leaving control volume i" = "heat entering it from outside the fin",
 * so the matrix has a positive diagonal. Heat flows named here are positive in these directions:
 *   base heat rate Q_base: from the wall INTO the fin, W;
 *   tip loss Q_tip: OUT of the fin through its tip section, W.
 *
 * Base (node 0):
 *   temperature: θ_0 = θ_b (row replaced). Q_base = K_0 (θ_0 - θ_1) + G_0 θ_0 (base CV balance).
 *   contact:     a resistance R'' (m^2 K/W, per unit base area A_b) between the wall at θ_b and node 0:
 *                Q_base = (A_b / R'') (θ_b - θ_0), added to row 0 as C_b θ_0 = C_b θ_b, C_b = A_b / R''.
 * Tip (node n-1, half CV of the last cell):
 *   adiabatic:   Q_tip = 0.
 *   convective:  Q_tip = h_tip A_tip θ_{n-1}; h_tip given, or 'local' (the face h at x = L).
 *   temperature: θ_{n-1} = θ_L (row replaced); Q_tip = K_{n-2}(θ_{n-2} - θ_{n-1}) - G_{n-1} θ_{n-1}.
 *   infinite:    the fin continues with the tip section: -k A θ' = sqrt(h P k A) θ at x = L, so
 *                Q_tip = sqrt(h_L P_L k A_L) θ_{n-1} (exact for a uniform fin: Incropera et al.,
 *                Fundamentals of Heat and Mass Transfer, Table 3.4 case D, q = sqrt(hPkA) θ_b).
 */
import type { Mesh1D } from '../../mesh/index.js';
import { convectiveConductance, interfaceConductance } from './conductance.js';
import type { RowSumSystem } from '../linear-algebra/tridiagonal-system.js';
import type { BaseBoundary, TipBoundary } from '../problem/conditions.js';

export type { BaseBoundary, TipBoundary } from '../problem/conditions.js';
export { baseBoundary, tipBoundary } from '../problem/conditions.js';

/**
 * A solution as the heat rates read it: θ_i = reference - drop_i (K). Differences of θ come from the
 * drops (accurate when θ is nearly uniform, see drop-system.ts); a plain θ is { reference: 0, drop: -θ }.
 */
export interface ExcessField {
  readonly reference: number;
  readonly drop: Float64Array;
}

/** The field of a plain θ array (differences then carry the round-off of θ itself). */
export function fieldFromTheta(theta: Float64Array): ExcessField {
  return { reference: 0, drop: theta.map((t) => -t) };
}

/** Conductance C_b = A_b / R'' of a contact base, W/K. */
export function contactConductance(base: Extract<BaseBoundary, { kind: 'contact' }>, mesh: Mesh1D): number {
  return mesh.baseArea / base.resistance;
}

/** Tip conductance C_tip (W/K) with Q_tip = C_tip θ_{n-1}, for the tips that lose heat in proportion to θ. */
export function tipConductance(tip: TipBoundary, mesh: Mesh1D, conductivity: number, hNodes: Float64Array): number {
  const hTip = hNodes[mesh.nodes - 1] as number;
  switch (tip.kind) {
    case 'adiabatic':
    case 'temperature':
      return 0;
    case 'convective':
      return (tip.h === 'local' ? hTip : tip.h) * mesh.tipArea;
    case 'infinite':
      return Math.sqrt(hTip * mesh.tipPerimeter * conductivity * mesh.tipArea);
    default: {
      const never: never = tip;
      throw new Error(`unknown tip condition ${JSON.stringify(never)}`);
    }
  }
}

/** Writes the base condition into row 0 of an assembled system. */
export function applyBaseBoundary(system: RowSumSystem, base: BaseBoundary, mesh: Mesh1D): void {
  switch (base.kind) {
    case 'temperature':
      system.diag[0] = 1;
      system.upper[0] = 0;
      system.rowSum[0] = 1;
      system.rhs[0] = base.theta;
      return;
    case 'contact': {
      const cb = contactConductance(base, mesh);
      system.diag[0] = (system.diag[0] as number) + cb;
      system.rowSum[0] = (system.rowSum[0] as number) + cb;
      system.rhs[0] = (system.rhs[0] as number) + cb * base.theta;
      return;
    }
    default: {
      const never: never = base;
      throw new Error(`unknown base condition ${JSON.stringify(never)}`);
    }
  }
}

/** Writes the tip condition into row n-1 of an assembled system. */
export function applyTipBoundary(system: RowSumSystem, tip: TipBoundary, mesh: Mesh1D, conductivity: number, hNodes: Float64Array): void {
  const last = mesh.nodes - 1;
  if (tip.kind === 'temperature') {
    system.diag[last] = 1;
    system.lower[last] = 0;
    system.rowSum[last] = 1;
    system.rhs[last] = tip.theta;
    return;
  }
  const conductance = tipConductance(tip, mesh, conductivity, hNodes);
  system.diag[last] = (system.diag[last] as number) + conductance;
  system.rowSum[last] = (system.rowSum[last] as number) + conductance;
}

/** Q_base, W: heat entering the fin at its base (see the header for each condition). */
export function baseHeatRate(base: BaseBoundary, mesh: Mesh1D, conductivity: number, hNodes: Float64Array, field: ExcessField): number {
  const drop0 = field.drop[0] as number;
  switch (base.kind) {
    case 'temperature':
      return (
        interfaceConductance(mesh, conductivity, 0) * ((field.drop[1] as number) - drop0) +
        convectiveConductance(mesh, hNodes, 0) * (field.reference - drop0)
      );
    case 'contact':
      return contactConductance(base, mesh) * (base.theta - field.reference + drop0);
    default: {
      const never: never = base;
      throw new Error(`unknown base condition ${JSON.stringify(never)}`);
    }
  }
}

/** Q_tip, W: heat leaving the fin through its tip section (see the header for each condition). */
export function tipHeatLoss(tip: TipBoundary, mesh: Mesh1D, conductivity: number, hNodes: Float64Array, field: ExcessField): number {
  const last = mesh.nodes - 1;
  const dropTip = field.drop[last] as number;
  const thetaTip = field.reference - dropTip;
  if (tip.kind === 'temperature') {
    return (
      interfaceConductance(mesh, conductivity, last - 1) * (dropTip - (field.drop[last - 1] as number)) -
      convectiveConductance(mesh, hNodes, last) * thetaTip
    );
  }
  return tipConductance(tip, mesh, conductivity, hNodes) * thetaTip;
}
