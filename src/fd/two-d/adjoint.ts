/**
 * Sensitivities of the fd-2d heat rate of a linear fin by the discrete adjoint: every input's derivative for
 * one extra solve, exact for the discrete system on a fixed grid.
 *
 * The section on one grid is the linear system A(p) theta = b(p) (two-d/boundary.ts: A symmetric positive
 * definite, fixed nodes eliminated symmetrically) and its base heat rate is affine in theta,
 *   Q(theta; p) = depth(p) (g(p) . theta + c(p))                                        [W]
 * (two-d/heat-rate.ts: the reaction of the fixed base nodes, or the flux through a contact resistance). With
 * the adjoint field lambda of A^T lambda = dQ/dtheta (A^T = A, so the same solver),
 *   dQ/dp = dQ/dp|_theta + lambda . (db/dp - dA/dp theta)                                (1)
 * (Giles & Pierce 2000, "An introduction to the adjoint approach to design", Flow Turbul. Combust. 65,
 * 393-415, eq. 2.3, discrete form). dA/dp, db/dp and dQ/dp|_theta are central differences of the ASSEMBLY
 * only, on the same nx x ny grid (node positions move with the dimensions, as in a re-solve on a fixed grid):
 *   dX/dp ~ (X(p (1 + d)) - X(p (1 - d))) / (2 d p),
 * exact to round-off for entries linear in p (h, 1/R'', k, the base temperature) and O(d^2) otherwise (sizes:
 * d = 1e-4 gives ~1e-8 relative). The term db/dp - dA/dp theta is the difference of the residuals of the nominal
 * theta in the two perturbed systems, each in difference form, so no large product cancels; round-off ~eps / d
 * ~ 1e-12 relative. Units: dQ/dp in W per unit of p; callers pass
 * the two perturbed problems and the step of the scale factor, and get dQ/df at f = 1 (W), f scaling the input.
 */
import { buildGrid2D, type Grid2D } from '../../mesh/index.js';
import { couplingOf, residual, residualAt, type Stencil9, type System2D } from '../linear-algebra/stencil9.js';
import { prepareSolver2D } from '../linear-algebra/auto-solver.js';
import { doneWith, keptSolver2D } from './kept-solver.js';
import { assembleConduction2D } from './assemble.js';
import { buildSystem2D, discretizeBoundaries, type BoundaryTerms2D, type SideTerms } from './boundary.js';
import { baseHeatRate2D } from './heat-rate.js';
import { conductionOperator } from './conduction-cache.js';
import type { Fin2DProblem } from './problem.js';
import { DEFAULT_GRADING, lumpedLevel, shiftSystem, solveFin2DProblem, type Fin2DResult } from './linear-solve.js';
import { twoDFinProblem } from './nonlinear-problem.js';
import type { FinProblem } from '../problem/fin-problem.js';

/** The discrete section on one grid: grid, conduction operator, boundary terms and the system (no solve). */
export interface SectionAssembly {
  grid: Grid2D;
  K: Stencil9;
  terms: BoundaryTerms2D;
  system: System2D;
}

/**
 * Assembles the section of `problem` on nx x ny nodes with the default grading (what solveFin2DProblem solves).
 * `like`: an assembly whose conduction operator (per unit depth) is reused when the grid's nodes (cached by section,
 * grid2d.ts: the same arrays) and k are the same, as for a variant of h, the width, a contact resistance or the base
 * temperature.
 */
export function assembleSection2D(problem: Fin2DProblem, nx: number, ny: number, like?: SectionAssembly & { k: number }): SectionAssembly & { k: number } {
  const grid = buildGrid2D(problem.section, { nx, ny, baseGrading: DEFAULT_GRADING.base, faceGrading: DEFAULT_GRADING.face });
  // Without `like`: the grid's kept operator (conduction-cache.ts; the study's own on its grids, the sample's
  // variants of h on theirs). A variant that cannot share `like`'s is assembled apart, so that the kept one stays.
  const K =
    like === undefined
      ? conductionOperator(grid, problem.k)
      : like.grid.x === grid.x && like.grid.y === grid.y && like.k === problem.k
        ? like.K
        : assembleConduction2D(grid, problem.k);
  const terms = discretizeBoundaries(grid, problem.conditions);
  return { grid, K, terms, system: buildSystem2D(K, terms), k: problem.k };
}

/** Q(theta) of an assembled section, W (the whole fin: the grid's depth times the base heat rate per unit depth). */
export function sectionHeatRate(a: SectionAssembly, theta: Float64Array): number {
  return a.grid.depth * baseHeatRate2D(a.K, a.terms, theta);
}

/**
 * dQ/dtheta of the base heat rate (W/K per node), the exact gradient of the affine map sectionHeatRate: for a
 * fixed base, sum over its nodes p of the couplings to the nodes off the base, K_pq (theta_q - theta_p), plus
 * the exchange of p through the other sides, G (theta_p - thetaFar); for a contact base, -G_p at its nodes.
 */
export function heatRateGradient(a: SectionAssembly): Float64Array {
  const { K, terms, grid } = a;
  const ny = K.nodesY;
  const n = K.nodesX * ny;
  const g = new Float64Array(n);
  const base: SideTerms = terms.base;
  if (base.kind === 'fixed') {
    const onBase = new Uint8Array(n);
    for (const p of base.nodes) onBase[p] = 1;
    for (const p of base.nodes) {
      const i = Math.floor(p / ny);
      const j = p - i * ny;
      for (let di = -1; di <= 1; di++) {
        for (let dj = -1; dj <= 1; dj++) {
          if (di === 0 && dj === 0) continue;
          const c = couplingOf(K, i, j, di, dj);
          const q = p + di * ny + dj;
          if (c !== 0 && onBase[q] === 0) {
            g[q] = (g[q] as number) + c;
            g[p] = (g[p] as number) - c;
          }
        }
      }
    }
    for (const side of [terms.face, terms.tip]) {
      if (side.kind === 'fixed') continue;
      side.nodes.forEach((p, e) => {
        if (onBase[p] === 1) g[p] = (g[p] as number) + (side.conductance[e] as number);
      });
    }
  } else {
    base.nodes.forEach((p, e) => {
      g[p] = (g[p] as number) - (base.conductance[e] as number);
    });
  }
  const depth = grid.depth;
  for (let p = 0; p < n; p++) g[p] = (g[p] as number) * depth;
  return g;
}

export interface SectionAdjoint {
  /** Q on the grid, W (the solved field's). */
  heatRate_W: number;
  /** dQ/df at f = 1, W: `plus` and `minus` are the problem with one input scaled by 1 + step and 1 - step. */
  derivative(plus: Fin2DProblem, minus: Fin2DProblem, step: number): number;
}

/**
 * The adjoint of the section of a linear fin on nx x ny nodes: one solve for lambda (and one for theta unless
 * `solved`, the same problem's result on this grid, is given); then every input costs two assemblies (eq. 1).
 */
export function sectionAdjoint(problem: Fin2DProblem, nx: number, ny: number, solved?: Fin2DResult): SectionAdjoint {
  const nominal = assembleSection2D(problem, nx, ny);
  const theta =
    solved !== undefined && solved.grid.nodesX === nx && solved.grid.nodesY === ny ? solved.field : solveFin2DProblem(problem, { nx, ny }).field;
  const gradient = heatRateGradient(nominal);
  const adjointSystem: System2D = { ...nominal.system, rhs: gradient };
  // The study's own solver of this matrix when it is kept (kept-solver.ts), else a new one.
  const prepared = keptSolver2D(adjointSystem);
  const lambda = prepared.solve(adjointSystem);
  doneWith(prepared, adjointSystem);
  const heatRate = sectionHeatRate(nominal, theta);
  let rows: Int32Array | null = null;
  return {
    heatRate_W: heatRate,
    derivative: (plus, minus, step) => {
      const up = assembleSection2D(plus, nx, ny, nominal);
      const down = assembleSection2D(minus, nx, ny, nominal);
      const explicit = sectionHeatRate(up, theta) - sectionHeatRate(down, theta);
      // b(p) - A(p) theta is the residual of the nominal field in the perturbed system, in difference form with the
      // exact row sums (stencil9.ts residual): the couplings across a thin fin are ~(t/L)^-2 times the losses and
      // would cancel in round-off as sum_q A_pq theta_q. The nominal residual (the solver's) cancels in the difference.
      let implicit = 0;
      if (boundaryOnly(up, down)) {
        // The two systems differ in their boundary terms alone: every other row of the two residuals is the same
        // computation on the same numbers, so its difference is exactly 0 and the boundary rows, in order, give the
        // same sum, bit for bit.
        rows ??= boundaryRows(nominal.terms);
        const rUp = residualAt(up.system, theta, rows);
        const rDown = residualAt(down.system, theta, rows);
        for (let r = 0; r < rows.length; r++) implicit += (lambda[rows[r] as number] as number) * ((rUp[r] as number) - (rDown[r] as number));
      } else {
        const rUp = residual(up.system, theta);
        const rDown = residual(down.system, theta);
        for (let p = 0; p < theta.length; p++) implicit += (lambda[p] as number) * ((rUp[p] as number) - (rDown[p] as number));
      }
      return (explicit + implicit) / (2 * step);
    },
  };
}

/**
 * Whether two assemblies differ only in their boundary terms (h, a contact resistance, the width): the same nodes
 * and conduction operator, the same kinds of condition, and the same values at fixed boundaries (whose columns
 * buildSystem2D moves into the right-hand side of the rows next to them, off the boundary).
 */
function boundaryOnly(a: SectionAssembly, b: SectionAssembly): boolean {
  if (a.K !== b.K || a.grid.x !== b.grid.x || a.grid.y !== b.grid.y) return false;
  for (const side of ['base', 'face', 'tip'] as const) {
    const s = a.terms[side];
    const t = b.terms[side];
    if (s.kind !== t.kind || s.nodes.length !== t.nodes.length) return false;
    if (s.kind === 'fixed' && s.farTheta !== t.farTheta) return false;
  }
  return true;
}

/** The nodes of the base, face and tip, each once, in increasing order. */
function boundaryRows(terms: BoundaryTerms2D): Int32Array {
  const all = new Set<number>([...terms.base.nodes, ...terms.face.nodes, ...terms.tip.nodes]);
  return Int32Array.from(all).sort();
}

/**
 * The section adjoint of a fin problem (a linear fin: problem/fin-problem.ts; its 2-D section, twoDFinProblem), with
 * the derivative taking the perturbed fin problems.
 */
export function finSectionAdjoint(
  problem: FinProblem,
  nx: number,
  ny: number,
  solved?: Fin2DResult,
): { heatRate_W: number; derivative(plus: FinProblem, minus: FinProblem, step: number): number } {
  const adjoint = sectionAdjoint(twoDFinProblem(problem).linear, nx, ny, solved);
  return {
    heatRate_W: adjoint.heatRate_W,
    derivative: (plus, minus, step) => adjoint.derivative(twoDFinProblem(plus).linear, twoDFinProblem(minus).linear, step),
  };
}

/**
 * The base heat rate of a linear fin's section on nx x ny nodes, W: the same system, level shift and solver as
 * solveFin2DProblem, without the lines, efficiencies and other quantities a result carries (the uncertainty sample
 * solves hundreds of variants for this one number).
 */
export function finSectionHeatRate(problem: FinProblem, nx: number, ny: number): number {
  const a = assembleSection2D(twoDFinProblem(problem).linear, nx, ny);
  const level = lumpedLevel(a.system);
  const shifted = shiftSystem(a.system, level);
  const prepared = prepareSolver2D(shifted, 'auto');
  const field = prepared.solve(shifted);
  // Its band (when banded) serves the next variant's factor (banded-cholesky.ts newBand) instead of new memory.
  prepared.release();
  for (let p = 0; p < field.length; p++) field[p] = (field[p] as number) + level;
  return sectionHeatRate(a, field);
}
