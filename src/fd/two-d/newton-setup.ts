/**
 * The discrete operators of the nonlinear 2-D fin on one grid: what the Newton iteration reads and never
 * changes (two-d/newton-system.ts).
 *
 * Conduction: the linear scheme's operator K (two-d/assemble.ts: median-dual finite volumes on the triangles
 * of the boundary-fitted grid, zero row sums) assembled with k_ref, the conductivity at the base
 * temperature, W/K per unit depth. With the Kirchhoff potential U = ∫ k dT / k_ref
 * (problem/conductivity.ts) the conductive heat leaving node p is (K U)_p exactly as the linear scheme's
 * (K θ)_p: the section's geometry does not change with temperature, so div(k grad T) = k_ref div(grad U)
 * is discretised by the same K, and U is taken linear in each triangle (the 1-D solver's choice: one flux
 * per dual face, conservative, second order; one-d/nonlinear-solve.ts).
 * Boundaries: the linear scheme's terms of the position part (two-d/boundary.ts: per boundary node the
 * lumped conductance G_p = ∫ h_x r ds over its two half-edges, or ∫ r/R'' ds for a contact base), plus
 * the radiating surface S_p = ∫ r ds of the same half-edges (m^2 per unit depth). A node's face loss is
 * then, as in 1-D (problem/surface-law.ts), G_p |θ_p/θ_b|^n θ_p + ε σ S_p (T_p^4 - T_s^4), W per unit depth.
 */
import type { Grid2D } from '../../mesh/index.js';
import { assembleConduction2D } from './assemble.js';
import { discretizeBoundaries, lumpedIntegral, type BoundaryTerms2D } from './boundary.js';
import type { KirchhoffTransform } from '../problem/conductivity.js';
import { kirchhoffTransform } from '../problem/conductivity.js';
import { faceLaw, type FaceLaw } from '../problem/surface-law.js';
import { isLinearProblem, type FinProblem } from '../problem/fin-problem.js';
import type { NonlinearFin2DProblem } from './nonlinear-problem.js';
import type { Stencil9 } from '../linear-algebra/stencil9.js';

export type SideName = 'base' | 'face' | 'tip';
export const SIDE_NAMES: readonly SideName[] = ['base', 'face', 'tip'];

/** Everything about one grid that does not depend on the nonlinear laws. */
export interface GridOperators2D {
  readonly grid: Grid2D;
  /** Conduction operator with k_ref, W/K per unit depth (zero row sums). */
  readonly K: Stencil9;
  /** Boundary terms of the position part: nodes, G_p (W/K per depth), far-side excess. */
  readonly terms: BoundaryTerms2D;
  /** Radiating surface S_p of each node of each side, m^2 per unit depth. */
  readonly surfaces: Record<SideName, Float64Array>;
  /** 1 at the nodes of a fixed-temperature boundary. */
  readonly fixed: Uint8Array;
  /** Drop θ_b - θ held at the fixed nodes, K (0 elsewhere). */
  readonly fixedDrop: Float64Array;
}

/** The laws on top of the grid operators: one stage of the problem (continuation scales them). */
export interface Newton2DSetup {
  readonly ops: GridOperators2D;
  readonly kirchhoff: KirchhoffTransform;
  /** The face law, and the law of a convective tip (the face law, or exponent 0 for its own h). */
  readonly faceLaw: FaceLaw;
  readonly tipLaw: FaceLaw;
  /** Base excess θ_b (the wall behind a contact resistance), K: θ = θ_b - d. */
  readonly thetaBase: number;
  /** True for a linear problem: one Newton step solves it. */
  readonly linear: boolean;
  /** No node may change the sign of its θ in one step (one-d/newton-system.ts, keepSign). */
  readonly keepSign: boolean;
  /** Nodes near the ambient are solved for their ambient variable (n < 0; one-d/newton-system.ts). */
  readonly ambientVariables: boolean;
}

export function gridOperators2D(problem: NonlinearFin2DProblem, grid: Grid2D): GridOperators2D {
  const { linear } = problem;
  const K = assembleConduction2D(grid, linear.k);
  const terms = discretizeBoundaries(grid, linear.conditions);
  const radiating = problem.physics.radiation.emissivity > 0;
  const surfaceOf = (name: SideName): Float64Array => {
    const side = terms[name];
    return radiating && side.kind === 'convective' ? lumpedIntegral(grid, side.nodes, () => 1) : new Float64Array(side.nodes.length);
  };
  const n = grid.nodesX * grid.nodesY;
  const fixed = new Uint8Array(n);
  const fixedDrop = new Float64Array(n);
  for (const name of SIDE_NAMES) {
    const side = terms[name];
    if (side.kind !== 'fixed') continue;
    for (const p of side.nodes) {
      fixed[p] = 1;
      fixedDrop[p] = linear.thetaBase - side.farTheta;
    }
  }
  return { grid, K, terms, surfaces: { base: surfaceOf('base'), face: surfaceOf('face'), tip: surfaceOf('tip') }, fixed, fixedDrop };
}

/** The laws of `physics` (the problem's own, or a continuation stage of it) on the grid operators. */
export function newton2DSetup(problem: NonlinearFin2DProblem, physics: FinProblem, ops: GridOperators2D): Newton2DSetup {
  const law = faceLaw(physics);
  const kirchhoff = kirchhoffTransform(physics.conductivity, physics.ambient_degC, physics.base.theta);
  const sinkAcrossAmbient = law.radiative !== 0 && (law.surroundings_K - law.ambient_K) * physics.base.theta < 0;
  return {
    ops,
    kirchhoff,
    faceLaw: law,
    tipLaw: problem.tipLaw === 'face' ? law : { ...law, exponent: 0 },
    thetaBase: physics.base.theta,
    linear: isLinearProblem(physics),
    keepSign: physics.exponent < 0 && !sinkAcrossAmbient,
    ambientVariables: physics.exponent < 0 && process.env['NOAMB'] !== '1',
  };
}
