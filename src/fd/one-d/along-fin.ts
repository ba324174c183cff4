/**
 * Temperature, heat flow and heat loss along a solved 1-D fin, from the scheme's own discrete quantities
 * (the same fluxes the solver balanced, so the flow drops by exactly the control volumes' losses).
 *
 * Heat flow Q toward the tip, W: at the base the solver's base heat rate; at interface i+1/2 the scheme's
 * conductive flux F_i = K_i (D_{i+1} - D_i), K_i = k_ref A_{i+1/2} / Δx_i, D the Kirchhoff potential drop
 * below the base (problem/conductivity.ts; D = θ_b - θ for a constant k, so F_i = K_i (θ_i - θ_{i+1}));
 * at the tip the tip's own loss (one-d/newton-boundary.ts: h_tip A_tip θ, the infinite fin's
 * continuation, or for a fixed tip temperature the last cell's flux less its control volume's loss).
 * The Kirchhoff flux is the exact face flux of the two nodal temperatures for k(T) (k at the mean
 * temperature is not; one-d/nonlinear-solve.ts).
 * Heat lost per unit length q'(x) = P(x) q(θ(x)) at the nodes, W/m, with q the face law the solver uses
 * (problem/surface-law.ts: h_x g(θ) θ + ε σ (T^4 - T_s^4); h P θ for a linear fin).
 * Source of the scheme: Patankar, S. V., 1980, Numerical Heat Transfer and Fluid Flow, ch. 4 [from memory].
 */
import type { Mesh1D } from '../../mesh/index.js';
import type { AlongFin } from '../study/along-fin.js';
import { kirchhoffTransform } from '../problem/conductivity.js';
import { hAt } from '../problem/convection.js';
import type { FinProblem } from '../problem/fin-problem.js';
import { cvLosses, faceFlux, faceLaw } from '../problem/surface-law.js';
import { convectiveConductance, interfaceConductance } from './conductance.js';
import { nonlinearBoundaries, tipLoss } from './newton-boundary.js';
import { hAtNodes } from '../problem/convection.js';

/** Along-fin quantities of a solution θ (K) on `mesh` whose base heat rate is `heatRate` (W). */
export function alongFin1D(problem: FinProblem, mesh: Mesh1D, theta: Float64Array, heatRate: number): AlongFin {
  const n = mesh.nodes;
  const last = n - 1;
  const ambient = problem.ambient_degC;
  const thetaBase = problem.base.theta;
  const kirchhoff = kirchhoffTransform(problem.conductivity, ambient, thetaBase);
  const law = faceLaw(problem);
  const L = mesh.length;
  const drop = theta.map((t) => thetaBase - t);
  const potential = new Float64Array(n);
  const ratio = new Float64Array(n);
  kirchhoff.evaluate(drop, potential, ratio);

  const T = theta.map((t) => t + ambient);
  const loss = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = mesh.x[i] as number;
    loss[i] = problem.geometry.perimeter(x) * faceFlux(law, hAt(problem.h, x, L), theta[i] as number);
  }

  const flowX = new Float64Array(n + 1);
  const flow = new Float64Array(n + 1);
  flow[0] = heatRate;
  for (let i = 0; i < last; i++) {
    flowX[i + 1] = 0.5 * ((mesh.x[i] as number) + (mesh.x[i + 1] as number));
    flow[i + 1] = interfaceConductance(mesh, kirchhoff.kRef, i) * ((potential[i + 1] as number) - (potential[i] as number));
  }
  flowX[n] = L;
  if (problem.tip.kind === 'temperature') {
    // The last control volume's balance: what the last cell conducts in, less what its faces lose.
    const hx = hAtNodes(problem.h, mesh.x, L);
    const G = new Float64Array(n);
    for (let i = 0; i < n; i++) G[i] = convectiveConductance(mesh, hx, i);
    const cvLoss = new Float64Array(n);
    cvLosses(law, G, mesh.cvSurface, theta, cvLoss, new Float64Array(n));
    flow[n] = (flow[last] as number) - (cvLoss[last] as number);
  } else {
    const boundaries = nonlinearBoundaries(problem, mesh, law, kirchhoff);
    flow[n] = tipLoss(boundaries, theta[last] as number, { value: 0, slope: 0 }).value;
  }
  return {
    temperature: { x_m: mesh.x, values: T },
    faceTemperature: null,
    loss: { x_m: mesh.x, values: loss },
    flow: { x_m: flowX, values: flow },
  };
}
