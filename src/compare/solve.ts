/**
 * `fincheck solve`: one model's solution of the case (outputs.md, the JSON of `fincheck solve`).
 * By default a refinement study (discretizationError from the GCI); with `nodes` exactly one grid
 * (discretizationError null).
 */
import type { Case } from '../case/index.js';
import { finProblem, solveFin, studyFin, type FinStudy1D } from '../fd/index.js';

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

export async function runSolve(c: Case, opts: { nodes?: number }): Promise<{ report: SolveReport; study: FinStudy1D }> {
  const problem = finProblem(c);
  const single = opts.nodes !== undefined;
  // The one study: a direct solve per grid for a linear fin, Newton's method for a nonlinear one.
  const study = (single ? await solveFin(problem, { model: '1d', nodes: opts.nodes as number }) : await studyFin(problem, { model: '1d' })) as FinStudy1D;
  const result = study.finest;
  const refinement = study.refinement;
  const n = result.mesh.nodes;
  const stride = single ? 1 : Math.max(1, Math.ceil((n - 1) / (MAX_PROFILE_POINTS - 1)));
  const ambient = c.convection.ambient_degC;
  const profile: ProfilePoint[] = [];
  for (let i = 0; i < n; i += stride) profile.push({ x_m: result.mesh.x[i] as number, T_degC: (result.theta[i] as number) + ambient });
  if ((n - 1) % stride !== 0) profile.push({ x_m: result.mesh.x[n - 1] as number, T_degC: (result.theta[n - 1] as number) + ambient });
  return {
    study,
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
      discretizationError: study.discretizationError,
      observedOrder: refinement === null ? null : refinement.observedOrder,
      profileStride: stride,
      profile,
    },
  };
}
