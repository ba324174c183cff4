/**
 * The part of `check` that says how sure the reference is of its inputs: the sensitivities of the reference
 * heat rate to every numeric input (sensitivities.ts, on the reference's finest grid), the uncertainty band
 * they give with the case's `uncertainty` (uncertainty-band.ts, its sample on the study's coarsest grid), and
 * each model row's drift over that band.
 */
import { DEFAULT_UNCERTAINTY, type Case } from '../case/index.js';
import type { FinStudy1D, FinStudy2D, GridSolvers, Resolution } from '../fd/index.js';
import type { CheckOptions } from './check-common.js';
import { referenceGridText, referenceRate, type ReferenceGrid } from './reference-rate.js';
import { SENSITIVITY_STEP, sensitivities } from './sensitivities.js';
import type { ModelResult, Sensitivity, UncertaintyBand } from './types.js';
import { DEFAULT_SAMPLE_SEED, DEFAULT_SAMPLE_SIZE, uncertaintyBand } from './uncertainty-band.js';

export interface ReferenceSensitivity {
  sensitivities: Sensitivity[];
  sensitivityMethod: string;
  uncertainty: UncertaintyBand;
}

export function referenceSensitivity(
  c: Case,
  solvers: GridSolvers,
  opts: CheckOptions,
  twoD: FinStudy2D | null,
  oneD: FinStudy1D,
  resolution: Resolution,
  referenceHeatRate: number,
): ReferenceSensitivity {
  const oneDFinest = { nodes: oneD.finest.mesh.nodes, grading: resolution.gridGrading };
  const oneDCoarsest = { nodes: resolution.nodes[0] ?? oneDFinest.nodes, grading: resolution.gridGrading };
  let finest: ReferenceGrid;
  let coarsest: ReferenceGrid;
  if (twoD === null) {
    finest = { model: 'fd-1d', ...oneDFinest };
    coarsest = { model: 'fd-1d', ...oneDCoarsest };
  } else {
    const coarse = twoD.grids.reduce((a, b) => (b.nx < a.nx ? b : a));
    finest = { model: 'fd-2d', nx: twoD.finest.grid.nodesX, ny: twoD.finest.grid.nodesY, edges: oneDFinest };
    coarsest = { model: 'fd-2d', nx: coarse.nx, ny: coarse.ny, edges: oneDCoarsest };
  }
  const rate = referenceRate(solvers, finest, c);
  const nominal = rate(c);
  const given = new Map((c.uncertainty ?? DEFAULT_UNCERTAINTY).map((u) => [u.key, u.relative]));
  const sens = sensitivities(c, rate, nominal, given, !solvers.nonlinear);
  const uncertainty = uncertaintyBand(c, sens, referenceHeatRate, {
    when: opts.sample ?? 'auto',
    n: opts.sampleSize ?? DEFAULT_SAMPLE_SIZE,
    seed: opts.sampleSeed ?? DEFAULT_SAMPLE_SEED,
    nonlinear: solvers.nonlinear,
    rate: referenceRate(solvers, coarsest, c),
    grid: `${referenceGridText(coarsest)}, the coarsest grid of the study`,
  });
  return {
    sensitivities: sens,
    sensitivityMethod: `central differences of the reference (${referenceGridText(finest)}, its finest grid, held fixed), relative step ${SENSITIVITY_STEP}: two re-solves per input`,
    uncertainty,
  };
}

/** Each row's |drift| over the band's relative half-width (null when the band is 0). */
export function withDriftOverUncertainty(rows: ModelResult[], band: UncertaintyBand): ModelResult[] {
  return rows.map((r) => ({ ...r, driftOverUncertainty: band.relative > 0 ? Math.abs(r.drift) / band.relative : null }));
}
