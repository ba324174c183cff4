/**
 * `fincheck solve`: one model's solution of the case (outputs.md, `fincheck solve --json`).
 * By default a refinement study (discretizationError from the GCI); with `nodes` exactly one grid
 * (discretizationError null).
 */
import type { Case } from '../case/types.js';
import { solveFin1D, studyFin1D, type Fin1DResult } from '../fd/one-d/linear-solve.js';
import { isLinearFinCase } from '../fd/problem/linear-case.js';
import { solveNonlinearFin1D, studyNonlinearFin1D } from '../fd/one-d/nonlinear-solve.js';

export interface ProfilePoint {
  x_m: number;
  T_degC: number;
}

export interface SolveReport {
  case: string;
  model: 'fd-1d';
  grid: { nodes: number };
  heatRate_W: number;
  efficiency: number;
  effectiveness: number;
  baseTemperature_degC: number;
  tipTemperature_degC: number;
  energyBalance: number;
  discretizationError: number | null;
  observedOrder: number | null;
  /** Every `profileStride`-th node of the grid (all nodes when 1). */
  profileStride: number;
  profile: ProfilePoint[];
}

/** At most this many profile points in the output; every k-th node, never interpolated. */
const MAX_PROFILE_POINTS = 401;

export function runSolve(c: Case, opts: { nodes?: number }): { report: SolveReport; result: Fin1DResult } {
  const single = opts.nodes !== undefined;
  // Linear fins: one tridiagonal solve per grid; nonlinear fins (power-law h, radiation, k(T)): Newton.
  const linear = isLinearFinCase(c);
  const study = single ? null : linear ? studyFin1D(c) : studyNonlinearFin1D(c);
  const result: Fin1DResult = study
    ? study.result
    : linear
      ? solveFin1D(c, { nodes: opts.nodes as number })
      : solveNonlinearFin1D(c, { nodes: opts.nodes as number });
  const n = result.mesh.nodes;
  const stride = single ? 1 : Math.max(1, Math.ceil((n - 1) / (MAX_PROFILE_POINTS - 1)));
  const ambient = c.convection.ambient_degC;
  const profile: ProfilePoint[] = [];
  for (let i = 0; i < n; i += stride) profile.push({ x_m: result.mesh.x[i] as number, T_degC: (result.theta[i] as number) + ambient });
  if ((n - 1) % stride !== 0) profile.push({ x_m: result.mesh.x[n - 1] as number, T_degC: (result.theta[n - 1] as number) + ambient });
  return {
    result,
    report: {
      case: c.name,
      model: 'fd-1d',
      grid: { nodes: n },
      heatRate_W: result.heatRate,
      efficiency: result.efficiency,
      effectiveness: result.effectiveness,
      baseTemperature_degC: (result.theta[0] as number) + ambient,
      tipTemperature_degC: result.tipTemperature_degC,
      energyBalance: result.energyBalance,
      discretizationError: study ? study.study.gci : null,
      observedOrder: study ? study.study.observedOrder : null,
      profileStride: stride,
      profile,
    },
  };
}
