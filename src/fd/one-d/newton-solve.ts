/**
 * The nonlinear 1-D fin on one mesh: set up the discrete operators, run damped Newton
 * (one-d/newton-system.ts), fall back on continuation when Newton alone fails, and report a failure as
 * a SolverError that says what to change.
 *
 * Continuation (natural-parameter continuation; Allgower, E. L. & Georg, K., 1990, Numerical
 * Continuation Methods, Springer, ch. 1 [from memory]): the problem with its nonlinearity scaled by s
 * (exponent s n, emissivity s ε, k_ref + s (k - k_ref); problem/fin-problem.ts) is solved for
 * s = 0 (linear), then s increased by Δs = 1/4, each stage started from the previous solution; a
 * stage that fails halves Δs, one that succeeds doubles it (up to 1/2); below Δs = 2^-12 it gives up.
 */
import { continueFromLinear } from '../newton/continuation.js';
import { SolverError } from '../../errors.js';
import type { Mesh1D } from '../../mesh/index.js';
import { interfaceConductance, convectiveConductance } from './conductance.js';
import { hAtNodes } from '../problem/convection.js';
import { nonlinearBoundaries } from './newton-boundary.js';
import { kirchhoffTransform } from '../problem/conductivity.js';
import { faceLaw } from '../problem/surface-law.js';
import { leading, newtonSolve, type NewtonOptions, type NewtonOutcome, type NewtonSetup, type NewtonWorkspace } from './newton-system.js';
import { isLinearProblem, scaleNonlinearity, type FinProblem } from '../problem/fin-problem.js';

/**
 * The discrete operators of a problem on a mesh (one-d/newton-system.ts, NewtonSetup); their arrays in `workspace`
 * when given (then valid until the workspace's next setup).
 */
export function newtonSetup(problem: FinProblem, mesh: Mesh1D, workspace?: NewtonWorkspace): NewtonSetup {
  const n = mesh.nodes;
  const kirchhoff = kirchhoffTransform(problem.conductivity, problem.ambient_degC, problem.base.theta);
  const K = workspace === undefined ? new Float64Array(n - 1) : leading(workspace.conductances, n - 1);
  for (let i = 0; i < n - 1; i++) K[i] = interfaceConductance(mesh, kirchhoff.kRef, i);
  const hx = hAtNodes(problem.h, mesh.x, mesh.length, workspace === undefined ? undefined : leading(workspace.hNodes, n));
  const G = workspace === undefined ? new Float64Array(n) : leading(workspace.convective, n);
  for (let i = 0; i < n; i++) G[i] = convectiveConductance(mesh, hx, i);
  const law = faceLaw(problem);
  const sinkAcrossAmbient = law.radiative !== 0 && (law.surroundings_K - law.ambient_K) * problem.base.theta < 0;
  return {
    mesh,
    K,
    G,
    law,
    kirchhoff,
    boundaries: nonlinearBoundaries(problem, mesh, law, kirchhoff),
    linear: isLinearProblem(problem),
    keepSign: problem.exponent < 0 && !sinkAcrossAmbient,
    ambientVariables: problem.exponent < 0,
  };
}

export interface MeshSolve {
  readonly setup: NewtonSetup;
  /** Drops d = θ_b - θ and excess temperatures θ at the nodes, K. */
  readonly drop: Float64Array;
  readonly theta: Float64Array;
  /** The solution's potential drops and CV losses, when the solve has them (NewtonOutcome). */
  readonly evaluated: NewtonOutcome['evaluated'];
  /** Newton steps on the problem itself (the last stage when continuation ran). */
  readonly iterations: number;
  /** Newton steps over every attempt and continuation stage. */
  readonly totalIterations: number;
  readonly halvings: number;
  /** Continuation stages run (0 when plain Newton converged). */
  readonly continuationStages: number;
  readonly residual: number;
  readonly heatRateChange: number;
}

/**
 * Solves the problem on a mesh from the drops `initial` (d = θ_b - θ, K; default 0: the whole fin at
 * the base temperature); throws SolverError when it cannot. Plain Newton works in `workspace` when given (the
 * solution is then left in it; continuation stages, rare, allocate their own).
 */
export function solveNonlinearOnMesh(
  problem: FinProblem,
  mesh: Mesh1D,
  opts: NewtonOptions = {},
  initial?: Float64Array,
  workspace?: NewtonWorkspace,
): MeshSolve {
  const setup = newtonSetup(problem, mesh, workspace !== undefined && mesh.nodes <= workspace.capacity ? workspace : undefined);
  const start = initial ?? new Float64Array(mesh.nodes);
  const direct = newtonSolve(setup, start, opts, workspace);
  if (direct.converged) return summary(setup, direct, direct.iterations, direct.halvings, 0);
  if (setup.linear) throw failure(problem, mesh, direct, 0);

  const kRef = setup.kirchhoff.kRef;
  const c = continueFromLinear<Float64Array, NewtonOutcome>(
    direct,
    (target, from) =>
      newtonSolve(target === 1 ? setup : newtonSetup(scaleNonlinearity(problem, target, kRef), mesh), from ?? new Float64Array(mesh.nodes), opts),
    (attempt, reached, budget) => failure(problem, mesh, attempt, reached, budget),
  );
  return summary(setup, c.outcome, c.totalIterations, c.halvings, c.stages);
}

function summary(setup: NewtonSetup, outcome: NewtonOutcome, total: number, halvings: number, stages: number): MeshSolve {
  return {
    setup,
    drop: outcome.drop,
    theta: outcome.theta,
    evaluated: outcome.evaluated,
    iterations: outcome.iterations,
    totalIterations: total,
    halvings,
    continuationStages: stages,
    residual: outcome.residual,
    heatRateChange: outcome.heatRateChange,
  };
}

/** What makes the problem nonlinear, as advice on what to change. */
function advice(problem: FinProblem): string {
  const items: string[] = [];
  if (problem.exponent > 0) items.push(`lower the exponent of the power-law h (now ${problem.exponent})`);
  if (problem.exponent < 0) {
    items.push(
      `use an exponent closer to 0 or a shorter fin (now ${problem.exponent}: the fin reaches the fluid temperature, where h = base (θ/θ_b)^n is infinite)`,
    );
  }
  if (problem.radiation.emissivity !== 0) items.push(`give a smaller emissivity (now ${problem.radiation.emissivity})`);
  const k = problem.conductivity;
  if (k.kind === 'table') {
    const lo = Math.min(...k.k);
    const hi = Math.max(...k.k);
    items.push(`give a smoother conductivity table (k runs from ${lo} to ${hi} W/(m*K))`);
  }
  if (items.length === 0) return 'this case is linear and should never fail to converge: please report it, with the case file';
  items.push('or change the number of nodes');
  return items.join(', ');
}

function failure(problem: FinProblem, mesh: Mesh1D, outcome: NewtonOutcome, reached: number, budget: string | null = null): SolverError {
  const progress =
    (reached > 0 ? `; continuation from the linear fin reached ${(100 * reached).toFixed(1)} % of the nonlinearity` : '') +
    (budget === null ? '' : `; ${budget}`);
  return new SolverError(
    `fd-1d (nonlinear fin) did not converge on ${mesh.nodes} nodes: ${outcome.failure ?? 'unknown reason'}` +
      ` after ${outcome.iterations} Newton steps (relative residual ${outcome.residual.toExponential(2)})${progress}. ` +
      `To get a solution: ${advice(problem)}.`,
  );
}
