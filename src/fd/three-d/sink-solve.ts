/**
 * One grid of the fd-3d model (a nonlinear sink: Newton from the linear solution, sink-newton.ts, and every
 * quantity below formed in the Kirchhoff potential and mapped to temperature through sink-faces.ts): assemble, solve A theta = b by preconditioned CG (two-level.ts) to a relative
 * residual of 1e-10 (|b − A theta|_1 / |b|_1), and derive every reported quantity from the solution and the
 * scheme's own conductances:
 *   face temperatures: underside in a source theta_P + q'' (dz/2)/k_p; underside or top with h through the
 *     half cell, theta_P k_p/(k_p + h dz/2); adiabatic underside theta_P; top under a fin the junction
 *     temperature (G_p theta_P + G_f theta_fin)/(G_p + G_f);
 *   a source's mean rise: area mean of its cells' underside face rises plus q'' R_c (the contact resistance's
 *     drop: the plate sees the flux, the source is hotter by q'' R_c); its maximum the largest cell value plus q'' R_c;
 *   heat per fin: sum over its root junctions of G (theta_P − theta_fin); losses G (theta − theta_fixed);
 *   energy balance |Q_sources − Q_losses| / Q_sources.
 */
import type { SinkGrid } from '../../mesh/index.js';
import { sparsePcg } from '../linear-algebra/sparse-pcg.js';
import { sinkMultigrid, type Preconditioner } from '../linear-algebra/sink-multigrid.js';
import { PLATE_TOP, UNDERSIDE } from './heat-terms.js';
import type { SinkSystem } from './sink-system.js';
import type { SinkProblem } from './sink-problem.js';
import type { SinkFaces } from './sink-faces.js';
import { solveSinkNewton } from './sink-newton.js';

/** Relative residual target: the energy balance of the result is below it (see sparse-pcg.ts). */
export const RESIDUAL_TARGET = 1e-10;
const MAX_ITERATIONS = 400;

export interface SinkGridResult {
  grid: SinkGrid;
  unknowns: number;
  /** The solution: excess temperature of every unknown, K. */
  theta: Float64Array;
  /** Per source: mean and maximum rise over the footprint including the contact drop, K. */
  sourceMeanRise: number[];
  sourceMaxRise: number[];
  /** Per fin: heat from the plate, W, and the mean junction rise over the footprint, K. */
  finHeat: number[];
  finRootRise: number[];
  totalHeat: number;
  finsHeat: number;
  plateHeat: number;
  energyBalance: number;
  /** Face rises per plate column (i ny + j), K. */
  undersideRise: Float64Array;
  topRise: Float64Array;
  /** Area-weighted mean rise of the plate's top, K. */
  topMeanRise: number;
  method: string;
  iterations: number;
  relativeResidual: number;
}

/**
 * `start`: a first guess of theta (e.g. the next coarser grid's solution prolonged; it is overwritten); zero when
 * absent. `pre`: the system's multigrid when the caller has built it (sink-grid-setup.ts).
 */
export function solveSinkSystem(
  problem: SinkProblem,
  system: SinkSystem,
  start?: Float64Array,
  pre: Preconditioner = sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold, system.stencil, 'float32'),
): SinkGridResult {
  return solveSinkSystemWithLinear(problem, system, start, pre).result;
}

/**
 * As solveSinkSystem, with the linear system's solution beside the result (for a nonlinear sink, Newton's start):
 * what re-solves of perturbed variants start their linear solve from (sink-grid-solve.ts).
 */
export function solveSinkSystemWithLinear(
  problem: SinkProblem,
  system: SinkSystem,
  start: Float64Array | undefined,
  pre: Preconditioner,
): { result: SinkGridResult; linear: Float64Array } {
  const x0 = start !== undefined && start.length === system.matrix.n ? start : undefined;
  const { x: theta, report } = sparsePcg(system.matrix, system.rhs, pre, RESIDUAL_TARGET, MAX_ITERATIONS, x0);
  if (!isNonlinearSink(problem))
    return { result: sinkQuantities(problem, system, theta, pre.method, report.iterations, report.relativeResidual), linear: theta };
  const newton = solveSinkNewton(problem, system, theta, pre, RESIDUAL_TARGET, MAX_ITERATIONS);
  const method = `Newton in the Kirchhoff potential (${newton.steps} steps from the linear solve at the base h), each step by ${pre.method}`;
  return {
    result: sinkQuantities(problem, system, newton.phi, method, report.iterations + newton.cgIterations, newton.relativeResidual, newton.faces),
    linear: theta,
  };
}

/** A sink that needs Newton: a power-law h on the fins or a k(T) table. */
export function isNonlinearSink(problem: SinkProblem): boolean {
  return problem.powerLaw !== null || !problem.conductivity.constant;
}

export function sinkQuantities(
  problem: SinkProblem,
  system: SinkSystem,
  theta: Float64Array,
  method: string,
  iterations: number,
  relativeResidual: number,
  faces: SinkFaces | null = null,
): SinkGridResult {
  const { grid, losses, roots } = system;
  const { nx, ny, nz, x, y, z } = grid;
  const kp = problem.kPlate;
  const cols = nx * ny;
  const area = (c: number) => {
    const i = Math.floor(c / ny);
    const j = c - i * ny;
    return (x[i + 1] - x[i]) * (y[j + 1] - y[j]);
  };
  const dz0 = z[1] - z[0];
  const dzTop = z[nz] - z[nz - 1];

  // Underside faces.
  const undersideRise = new Float64Array(cols);
  const hu = problem.hUnderside;
  for (let c = 0; c < cols; c++) {
    if (faces === null) undersideRise[c] = theta[c * nz] * (hu !== null && hu > 0 ? kp / (kp + 0.5 * hu * dz0) : 1);
    else
      undersideRise[c] =
        hu !== null && hu > 0 ? faces.face(theta[c * nz], hu * area(c), (kp * area(c)) / (0.5 * dz0), 0, 0).theta : faces.thetaOf(theta[c * nz]);
  }
  const sourceMeanRise: number[] = [];
  const sourceMaxRise: number[] = [];
  grid.sources.forEach((b, s) => {
    const flux = system.sourceFlux[s];
    const contact = flux * problem.sources[s].contactResistance;
    let sum = 0;
    let total = 0;
    let max = -Infinity;
    for (let i = b.i0; i < b.i1; i++) {
      for (let j = b.j0; j < b.j1; j++) {
        const c = i * ny + j;
        const rise = faces === null ? theta[c * nz] + (flux * 0.5 * dz0) / kp : faces.thetaOf(theta[c * nz] + (flux * 0.5 * dz0) / kp);
        undersideRise[c] = rise;
        const a = area(c);
        sum += a * rise;
        total += a;
        max = Math.max(max, rise);
      }
    }
    sourceMeanRise.push(sum / total + contact);
    sourceMaxRise.push(max + contact);
  });

  // Top faces: exposed through h_plate, under fins the junction temperature.
  const topRise = new Float64Array(cols);
  for (let c = 0; c < cols; c++) {
    const top = theta[c * nz + nz - 1];
    if (faces === null) topRise[c] = top * (problem.hPlate > 0 ? kp / (kp + 0.5 * problem.hPlate * dzTop) : 1);
    else topRise[c] = problem.hPlate > 0 ? faces.face(top, problem.hPlate * area(c), (kp * area(c)) / (0.5 * dzTop), 0, 0).theta : faces.thetaOf(top);
  }
  const nFins = grid.fins.length;
  const finHeat = new Array<number>(nFins).fill(0);
  const rootSum = new Array<number>(nFins).fill(0);
  const rootArea = new Array<number>(nFins).fill(0);
  for (let r = 0; r < roots.plate.length; r++) {
    const p = roots.plate[r];
    const tp = theta[p];
    const tf = theta[roots.fin[r]];
    const gp = roots.gPlate[r];
    const gf = roots.gFin[r];
    const f = roots.owner[r];
    finHeat[f] += (tp - tf) / (1 / gp + 1 / gf);
    const junction = faces === null ? (gp * tp + gf * tf) / (gp + gf) : faces.thetaOf((gp * tp + gf * tf) / (gp + gf));
    const c = Math.floor(p / nz);
    topRise[c] = junction;
    rootSum[f] += area(c) * junction;
    rootArea[f] += area(c);
  }
  let topSum = 0;
  let plateArea = 0;
  for (let c = 0; c < cols; c++) {
    topSum += area(c) * topRise[c];
    plateArea += area(c);
  }

  let finsHeat = 0;
  let plateHeat = 0;
  for (let t = 0; t < losses.node.length; t++) {
    const q =
      faces === null
        ? losses.g[t] * (theta[losses.node[t]] - losses.fixed[t])
        : faces.face(theta[losses.node[t]], losses.surface[t], losses.half[t], losses.law[t], losses.fixed[t]).q;
    const owner = losses.owner[t];
    if (owner === PLATE_TOP || owner === UNDERSIDE) plateHeat += q;
    else finsHeat += q;
  }
  const totalHeat = system.heatIn;
  return {
    grid,
    unknowns: theta.length,
    theta: faces === null ? theta : theta.map((phi) => faces.thetaOf(phi)),
    sourceMeanRise,
    sourceMaxRise,
    finHeat,
    finRootRise: rootSum.map((s, f) => s / rootArea[f]),
    totalHeat,
    finsHeat,
    plateHeat,
    energyBalance: Math.abs(totalHeat - finsHeat - plateHeat) / totalHeat,
    undersideRise,
    topRise,
    topMeanRise: topSum / plateArea,
    method,
    iterations,
    relativeResidual,
  };
}
