/**
 * The part of `check` that says how sure the reference is of its inputs: the sensitivities of the reference
 * heat rate to every numeric input (sensitivities.ts), the uncertainty band they give with the case's
 * `uncertainty` (uncertainty-band.ts, its sample on the study's coarsest grid), and each model row's drift over
 * that band.
 *
 * Grids and work budgets. The sensitivities take two re-solves per input, on the coarsest grid of the study whose
 * estimated discretisation error (Fs |Q_grid - Q_extrapolated| / |Q_extrapolated|, the study's own Richardson
 * extrapolation and safety factor; the GCI on the finest grid) is at most SENSITIVITY_GRID_ERROR = 2e-7: a grid
 * changes S by the input's effect on its discretisation error e, and for the second-order schemes here e ~ (m L / N)^2
 * with m^2 ~ h / (k t), so |dS| <~ 2-3 e (measured: S_L off by 1.6e-6 at mL = 2.5 on 1001 nodes, whose e the study put just under 1e-6); S is then
 * good to 1e-6 (the accuracy tests/sensitivity asks of it), beyond the 4 digits shown, at a quarter of the finest
 * grid's work per halving. Where no grid is that accurate: the finest grid whose work 2 n_inputs N (N unknowns; a Newton solve of a
 * nonlinear fin counted NEWTON_WEIGHT times) stays within SENSITIVITY_WORK, else the coarsest grid: a refined study
 * of a thick or long fin reaches 1e6 unknowns, and two dozen solves there would take minutes for a number needed to
 * a few per cent (an uncertainty estimate). The method text names the grid and why it was chosen. The automatic Latin-hypercube sample
 * (the automatic choice) is drawn only when n_sample N_coarsest (Newton weighted) stays within SAMPLE_WORK;
 * otherwise the note says it was not drawn and why, and a sample asked for explicitly is drawn whatever its cost. Both budgets are chosen so
 * that the sensitivities and the sample each add at most a few seconds on a 2-core machine (measured: about
 * 1e6 unknowns per second in linear fd-2d solves, a third of that in Newton solves); common practice, no source.
 */
import { DEFAULT_UNCERTAINTY, numericInputs, type Case } from '../case/index.js';
import type { FinStudy1D, FinStudy2D, GridSolvers, Resolution } from '../fd/index.js';
import type { CheckOptions } from './check-common.js';
import { adjointReferenceRate, referenceGridText, referenceRate, type ReferenceGrid } from './reference-rate.js';
import { isStraight } from './reference2d.js';
import { SENSITIVITY_STEP, sensitivities, sensitivitiesFrom } from './sensitivities.js';
import type { ModelResult, Sensitivity, UncertaintyBand } from './types.js';
import type { Grading } from '../mesh/index.js';
import { DEFAULT_SAMPLE_SEED, DEFAULT_SAMPLE_SIZE, uncertaintyBand } from './uncertainty-band.js';

/** Largest estimated discretisation error (relative) of a grid that re-solved sensitivities may use (module header). */
export const SENSITIVITY_GRID_ERROR = 2e-7;
/** Budgets of the sensitivities and the automatic sample, in unknowns x solves (module header). */
export const SENSITIVITY_WORK = 2e6;
export const SAMPLE_WORK = 4e6;
/** A Newton solve counted as this many linear solves (its 2-4 steps, each a linear solve and an assembly). */
export const NEWTON_WEIGHT = 4;

/** Unknowns of a reference grid (the 2-D section's nodes; the side edges' 1-D solves are small beside it). */
function unknownsOf(g: ReferenceGrid): number {
  return g.model === 'fd-1d' ? g.nodes : g.nx * g.ny;
}

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
  // The study's grids, finest first.
  const grids: ReferenceGrid[] =
    twoD === null
      ? [oneDFinest.nodes, ...[...resolution.nodes].reverse()]
          .filter((n, i, all) => all.indexOf(n) === i)
          .map((nodes) => ({ model: 'fd-1d' as const, nodes, grading: resolution.gridGrading }))
      : [
          { model: 'fd-2d' as const, nx: twoD.finest.grid.nodesX, ny: twoD.finest.grid.nodesY, edges: oneDFinest },
          ...[...twoD.grids]
            .sort((a, b) => b.nx * b.ny - a.nx * a.ny)
            .filter((g) => g.nx * g.ny < twoD.finest.grid.nodesX * twoD.finest.grid.nodesY)
            // The side edges' fd-1d correction (a few per cent of Q) on as many nodes as the 2-D grid has along: the
            // coarse grids serve the sample and over-budget sensitivities, which need Q to ~1e-4, not the finest 1-D grid.
            .map((g) => ({ model: 'fd-2d' as const, nx: g.nx, ny: g.ny, edges: { nodes: g.nx, grading: resolution.gridGrading } })),
        ];
  const weight = solvers.nonlinear ? NEWTON_WEIGHT : 1;
  const coarsest = grids[grids.length - 1] as ReferenceGrid;
  const errors = gridErrors(twoD ?? oneD, twoD === null ? grids.length : twoD.grids.length);
  const given = new Map((c.uncertainty ?? DEFAULT_UNCERTAINTY).map((u) => [u.key, u.relative]));
  const { sens, method } =
    twoD !== null && !solvers.nonlinear
      ? adjointSensitivities(c, twoD, { nodes: twoD.finest.grid.nodesX, grading: resolution.gridGrading }, given)
      : reSolvedSensitivities(c, solvers, grids, errors, given);
  const sampleWork = (opts.sampleSize ?? DEFAULT_SAMPLE_SIZE) * unknownsOf(coarsest) * weight;
  const uncertainty = uncertaintyBand(c, sens, referenceHeatRate, {
    when: opts.sample ?? 'auto',
    n: opts.sampleSize ?? DEFAULT_SAMPLE_SIZE,
    seed: opts.sampleSeed ?? DEFAULT_SAMPLE_SEED,
    nonlinear: solvers.nonlinear,
    affordable:
      sampleWork <= SAMPLE_WORK
        ? null
        : `the sample's ${sampleWork.toExponential(1)} unknowns x solves exceed the automatic budget of ${SAMPLE_WORK.toExponential(0)}; a sample asked for explicitly is drawn whatever its cost`,
    rate: referenceRate(solvers, coarsest, c),
    grid: `${referenceGridText(coarsest)}, the coarsest grid of the study`,
  });
  return {
    sensitivities: sens,
    sensitivityMethod: method,
    uncertainty,
  };
}

/**
 * A linear fin with the fd-2d reference: the discrete adjoint on the study's finest grid (one extra solve for
 * every input; reference-rate.ts adjointReferenceRate), no work budget needed beyond the study's own. The side
 * edges' correction (a few per cent of Q) is differenced on a 1-D grid of as many nodes as the 2-D grid has along
 * the fin (`edges`), as the coarse grids' corrections are: its derivative there differs from a fine 1-D grid's by
 * that grid's discretisation error (about (L / nx)^2 m^2 / 12, below 1e-4 of itself on the study's finest grids),
 * which moves S by under 1e-5 of the correction's share of Q (a few per cent): below the 4 digits shown.
 */
function adjointSensitivities(
  c: Case,
  twoD: FinStudy2D,
  edges: { nodes: number; grading: Grading | 'auto' },
  given: ReadonlyMap<string, number>,
): { sens: Sensitivity[]; method: string } {
  const grid = { model: 'fd-2d' as const, nx: twoD.finest.grid.nodesX, ny: twoD.finest.grid.nodesY, edges };
  const reference = adjointReferenceRate(grid, c, twoD.finest);
  const d = SENSITIVITY_STEP;
  const sens = sensitivitiesFrom(c, (input) => reference.derivative(input.scale, d), reference.nominal, given, true, 'adjoint');
  const edgeWords =
    c.fin.edges === 'cooled' && isStraight(c)
      ? `; the side edges' fd-1d correction by central differences on ${edges.nodes} nodes (as many as the 2-D grid has along the fin), relative step ${d}`
      : '';
  return {
    sens,
    method: `adjoint, exact for the discrete system (${referenceGridText(grid)}, its finest grid, held fixed; one extra solve for all inputs; the assembly differenced at relative step ${d})${edgeWords}`,
  };
}

/**
 * The estimated relative discretisation error of each grid of a study, finest first (module header): the GCI on the
 * finest, Fs |Q_grid - Q_extrapolated| / |Q_extrapolated| on the others; null for every grid when the study has no
 * refinement or its grids are not the `count` expected.
 */
function gridErrors(study: FinStudy1D | FinStudy2D, count: number): (number | null)[] {
  const r = study.refinement;
  const values = study.model === 'fd-2d' ? study.grids.map((g) => g.heatRate_W) : (r?.values ?? []);
  if (r === null || values.length !== count || !(Math.abs(r.extrapolated) > 0)) return new Array<null>(count).fill(null);
  return values.map((v, i) => (i === 0 ? r.gci : (r.safetyFactor * Math.abs(v - r.extrapolated)) / Math.abs(r.extrapolated)));
}

/**
 * Central differences of re-solves (a nonlinear fin: Newton from the case's own solution; or the fd-1d reference) on
 * the coarsest grid accurate to SENSITIVITY_GRID_ERROR, else the finest within SENSITIVITY_WORK (module header).
 * `errors` are the grids' estimated discretisation errors, in the order of `grids` (finest first).
 */
function reSolvedSensitivities(
  c: Case,
  solvers: GridSolvers,
  grids: readonly ReferenceGrid[],
  errors: readonly (number | null)[],
  given: ReadonlyMap<string, number>,
): { sens: Sensitivity[]; method: string } {
  const weight = solvers.nonlinear ? NEWTON_WEIGHT : 1;
  const coarsest = grids[grids.length - 1] as ReferenceGrid;
  const solvesPerInput = 2;
  const inputs = Math.max(1, numericInputs(c).length);
  const affordable = (g: ReferenceGrid): boolean => solvesPerInput * inputs * unknownsOf(g) * weight <= SENSITIVITY_WORK;
  let accurate = -1;
  grids.forEach((g, i) => {
    const e = errors[i];
    if (e !== null && e !== undefined && e <= SENSITIVITY_GRID_ERROR && affordable(g)) accurate = i;
  });
  const within = grids.find(affordable);
  const chosen = accurate >= 0 ? (grids[accurate] as ReferenceGrid) : (within ?? coarsest);
  const gridWords =
    accurate >= 0
      ? accurate === 0
        ? `its finest grid (estimated discretisation error ${(errors[0] as number).toExponential(1)}; the coarser grids' exceed ${SENSITIVITY_GRID_ERROR.toExponential(0)})`
        : `the coarsest grid of the study whose estimated discretisation error, ${(errors[accurate] as number).toExponential(1)}, is within ${SENSITIVITY_GRID_ERROR.toExponential(0)}`
      : chosen === grids[0]
        ? 'its finest grid'
        : `the finest grid of the study within the work budget of ${SENSITIVITY_WORK.toExponential(0)} unknowns x solves (the finest, ${referenceGridText(grids[0] as ReferenceGrid)}, would take ${(solvesPerInput * inputs * unknownsOf(grids[0] as ReferenceGrid) * weight).toExponential(1)})`;
  const finest = chosen;
  const rate = referenceRate(solvers, finest, c);
  const nominal = rate(c);
  return {
    sens: sensitivities(c, rate, nominal, given, !solvers.nonlinear),
    method: `central differences of the reference (${referenceGridText(finest)}, ${gridWords}, held fixed), relative step ${SENSITIVITY_STEP}: two re-solves per input`,
  };
}

/** Each row's |drift| over the band's relative half-width (null when the band is 0). */
export function withDriftOverUncertainty(rows: ModelResult[], band: UncertaintyBand): ModelResult[] {
  return rows.map((r) => ({ ...r, driftOverUncertainty: band.relative > 0 ? Math.abs(r.drift) / band.relative : null }));
}
