/**
 * Conservative vertex-centred finite-volume assembly of the 1-D fin equation.
 *
 * Equation: d/dx(k A(x) dθ/dx) - h(x) P(x) θ = 0, θ = T - T_amb (K), x from the base (m),
 * k in W/(m*K), h in W/(m^2*K), A in m^2, P in m.
 * Discrete form (energy balance of control volume i; rows in W, unknowns in K):
 *   -K_{i-1} θ_{i-1} + (K_{i-1} + K_i + G_i) θ_i - K_i θ_{i+1} = 0,
 *   K_i = k A_{i+1/2} / Δx_i (interface conductance), G_i = ∫_CV h P dx (convective conductance),
 * with half control volumes at the base and the tip; the boundary rows are then written by
 * boundary.ts (the only place that knows the boundary conditions). The system also carries its
 * exact row sums G_i (+ boundary conductances) for the row-sum solver (conservative-thomas.ts),
 * since the stored diagonal keeps G_i only to ~eps K/G. For a uniform fin on a uniform
 * grid with an adiabatic tip this is the three-point scheme θ_{i-1} - (2 + (mΔx)^2) θ_i + θ_{i+1} = 0
 * with its ghost-node tip. Source: Patankar, S. V., 1980, Numerical Heat Transfer and Fluid Flow,
 * Hemisphere, ch. 4 [from memory]; the fin equation as in Incropera et al., Fundamentals of Heat and
 * Mass Transfer, §3.6 [from memory for the section].
 *
 * The assembly takes nodal h values (h linear between nodes), so a nonlinear solver with h(θ) or
 * k(θ) can call it at every iteration with the current h and a constant (e.g. secant) conductivity.
 */
import type { Mesh1D } from '../../mesh/index.js';
import { applyBaseBoundary, applyTipBoundary, type BaseBoundary, type TipBoundary } from './boundary.js';
import { convectiveConductance, interfaceConductance } from './conductance.js';
import { createTridiagonalSystem, type RowSumSystem } from '../linear-algebra/tridiagonal-system.js';

/**
 * Working arrays a repeated solve may hand to the assembly (linear-solve.ts): the convective conductances G_i come
 * back in `convective` (the heat rates need them again), and `conductance`, when given, holds the interface
 * conductances K_i = k A / Δx of this very mesh and conductivity (interfaceConductances), which then are not divided
 * out again. The same numbers either way.
 */
export interface AssemblyParts {
  readonly convective: Float64Array;
  readonly conductance?: Float64Array;
}

/** K_i of every interface of `mesh` for conductivity k (W/(m*K)) into `out` (length >= mesh.nodes - 1), W/K. */
export function interfaceConductances(mesh: Mesh1D, conductivity: number, out: Float64Array): Float64Array {
  for (let i = 0; i < mesh.nodes - 1; i++) out[i] = interfaceConductance(mesh, conductivity, i);
  return out;
}

/**
 * Assembles the fin system on a mesh for conductivity k (W/(m*K)) and nodal h (W/(m^2*K)).
 * Writes into `into` when given (length = mesh.nodes), else allocates. Returns the system only
 * (lower, diag, upper, rhs and the row sums of the same matrix).
 */
export function assembleFin1D(
  mesh: Mesh1D,
  conductivity: number,
  hNodes: Float64Array,
  base: BaseBoundary,
  tip: TipBoundary,
  into?: RowSumSystem,
  parts?: AssemblyParts,
): RowSumSystem {
  const n = mesh.nodes;
  const system = into ?? createTridiagonalSystem(n);
  const { lower, diag, upper, rhs, rowSum } = system;
  if (parts === undefined) {
    for (let i = 0; i < n; i++) {
      const convective = convectiveConductance(mesh, hNodes, i);
      diag[i] = convective;
      rowSum[i] = convective;
      rhs[i] = 0;
    }
  } else {
    const g = parts.convective;
    for (let i = 0; i < n; i++) {
      const convective = convectiveConductance(mesh, hNodes, i);
      g[i] = convective;
      diag[i] = convective;
      rowSum[i] = convective;
      rhs[i] = 0;
    }
  }
  const known = parts?.conductance;
  for (let i = 0; i < n - 1; i++) {
    const conductance = known === undefined ? interfaceConductance(mesh, conductivity, i) : (known[i] as number);
    diag[i] = (diag[i] as number) + conductance;
    diag[i + 1] = (diag[i + 1] as number) + conductance;
    upper[i] = -conductance;
    lower[i + 1] = -conductance;
  }
  lower[0] = 0;
  upper[n - 1] = 0;
  applyBaseBoundary(system, base, mesh);
  applyTipBoundary(system, tip, mesh, conductivity, hNodes);
  return system;
}
