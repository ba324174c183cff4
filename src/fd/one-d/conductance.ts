/**
 * Discrete conductances of the vertex-centred finite-volume fin, W/K.
 *
 *   interface i (between nodes i and i+1):  K_i = k A_{i+1/2} / Δx_i          (Fourier's law)
 *   control volume i (convection):          G_i = ∫_CV h P dx
 *                                               = wPrev_i h_{i-1} + wSelf_i h_i + wNext_i h_{i+1}
 * with the Simpson weights of the mesh (exact for h linear between nodes and P at most quadratic
 * within a cell). Source: Patankar, S. V., 1980, Numerical Heat Transfer and Fluid Flow, ch. 4 [from memory].
 */
import type { Mesh1D } from '../../mesh/index.js';

/** K_i = k A_{i+1/2} / Δx_i, W/K, for conductivity k in W/(m*K). */
export function interfaceConductance(mesh: Mesh1D, conductivity: number, i: number): number {
  return (conductivity * (mesh.interfaceArea[i] as number)) / (mesh.dx[i] as number);
}

/** G_i = ∫_CV h P dx, W/K, from nodal h (W/(m^2*K)) linear between nodes. */
export function convectiveConductance(mesh: Mesh1D, hNodes: Float64Array, i: number): number {
  const self = (mesh.surfaceWeightSelf[i] as number) * (hNodes[i] as number);
  const prev = i > 0 ? (mesh.surfaceWeightPrev[i] as number) * (hNodes[i - 1] as number) : 0;
  const next = i < mesh.nodes - 1 ? (mesh.surfaceWeightNext[i] as number) * (hNodes[i + 1] as number) : 0;
  return prev + self + next;
}
