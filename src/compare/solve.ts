/**
 * `fincheck solve`: one model's solution of the case (outputs.md, the JSON of `fincheck solve`).
 * By default a refinement study (discretizationError from the GCI); with `nodes` exactly one grid
 * (discretizationError null).
 */
import { efficiencyBasis, ONE_D_SURFACE } from './efficiency-basis.js';
import { definedEffectiveness, effectivenessBasis } from './effectiveness-basis.js';
import type { Case } from '../case/index.js';
import { finProblem, gridSolversNow, solveFinWith, studyFinWith, type FinStudy1D } from '../fd/index.js';

/**
 * One point of a temperature profile: x_m, the distance along the fin from the base (m), or for annular
 * (radial) fins r_m, the radius (m, from the inner radius r1 at the base to the outer radius r2).
 */
export type ProfilePoint = { x_m: number; T_degC: number } | { r_m: number; T_degC: number };

/** Annular fins are described by the radius: profiles give r_m from r1 to r2 instead of x_m. */
export function isRadial(c: Case): boolean {
  return c.fin.profile.kind === 'annular';
}

/** The position of a point: x_m or r_m (m). */
export function pointPosition(p: ProfilePoint): number {
  return 'r_m' in p ? p.r_m : p.x_m;
}

export interface SolveReport {
  case: string;
  model: 'fd-1d';
  grid: { nodes: number };
  heatRate_W: number;
  /** Q / Q_ideal; null for an infinite tip (no finite surface) or a surface that would both lose and gain heat at the base temperature (see efficiencyNote). */
  efficiency: number | null;
  /** Why the efficiency is null or may exceed 1; null otherwise (efficiency-basis.ts). */
  efficiencyNote: string | null;
  /** Q / Q_bare; null where h is 0 at the base (see effectivenessNote). */
  effectiveness: number | null;
  /** Why the effectiveness is null; null otherwise (effectiveness-basis.ts). */
  effectivenessNote: string | null;
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

export function runSolve(c: Case, opts: { nodes?: number }): { report: SolveReport; study: FinStudy1D } {
  const single = opts.nodes !== undefined;
  // The one study: one direct solve per grid for a linear fin, Newton's method for a nonlinear one.
  const problem = finProblem(c);
  const solvers = gridSolversNow(problem);
  const study = (
    opts.nodes === undefined ? studyFinWith(solvers, problem, { model: '1d' }) : solveFinWith(solvers, problem, { model: '1d', nodes: opts.nodes })
  ) as FinStudy1D;
  const result = study.finest;
  const efficiency = efficiencyBasis(c, result.idealHeatRate, ONE_D_SURFACE);
  const effectiveness = effectivenessBasis(c);
  const n = result.mesh.nodes;
  const stride = single ? 1 : Math.max(1, Math.ceil((n - 1) / (MAX_PROFILE_POINTS - 1)));
  const ambient = c.convection.ambient_degC;
  // Annular fins: the 1-D mesh measures from the base, so the radius is r1 + x.
  const r1 = c.fin.profile.kind === 'annular' ? c.fin.profile.innerRadius : 0;
  const point = (i: number): ProfilePoint => {
    const T_degC = (result.theta[i] as number) + ambient;
    const x = result.mesh.x[i] as number;
    return isRadial(c) ? { r_m: r1 + x, T_degC } : { x_m: x, T_degC };
  };
  const profile: ProfilePoint[] = [];
  for (let i = 0; i < n; i += stride) profile.push(point(i));
  if ((n - 1) % stride !== 0) profile.push(point(n - 1));
  return {
    study,
    report: {
      case: c.name,
      model: 'fd-1d',
      grid: { nodes: n },
      heatRate_W: result.heatRate,
      efficiency: efficiency.idealHeatRate === null ? null : result.efficiency,
      efficiencyNote: efficiency.note,
      effectiveness: definedEffectiveness(result.effectiveness, effectiveness),
      effectivenessNote: effectiveness.note,
      baseTemperature_degC: (result.theta[0] as number) + ambient,
      tipTemperature_degC: result.tipTemperature_degC,
      energyBalance: result.energyBalance,
      discretizationError: study.discretizationError,
      observedOrder: study.refinement === null ? null : study.refinement.observedOrder,
      profileStride: stride,
      profile,
    },
  };
}
