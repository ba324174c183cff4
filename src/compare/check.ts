/**
 * `fincheck check`: the reference solution, every applicable shortcut with its drift and verdict,
 * the assumption ledger, the design flags and the cautions (outputs.md).
 *
 * Pipeline: case -> fin problem -> fd-1d study (studyFin: a direct solve per grid for a linear fin,
 * Newton's method for a nonlinear one) -> reference (the fd-2d study where the 2-D model covers the fin
 * and the reference asked for is auto or 2d, else fd-1d; reference2d.ts) -> shortcuts -> ledger -> flags.
 * The shortcuts need one h and one k: a linear fin gives them its own; a nonlinear fin (power-law h,
 * radiation, k over temperature) is evaluated twice, with h and k at the base temperature and with h and k
 * averaged over the fin solved by fd-1d (linear-surrogate.ts), and its ledger adds one row per
 * nonlinearity (nonlinear-ledger.ts). Radiation: the fin sees only its surroundings (view factor 1, no
 * exchange with the base or neighbours).
 */
import type { Case } from '../case/index.js';
import { initBessel } from '../analytic/index.js';
import { ModelNotApplicableError } from '../errors.js';
import {
  finProblem,
  gridSolvers,
  modelApplies,
  solveFinWith,
  studyFinWith,
  type FinStudy,
  type FinStudy1D,
  type FinStudy2D,
  type GridSolvers,
} from '../fd/index.js';
import { finGeometry, type FinGeometry1D } from '../mesh/index.js';
import { cautionsFor, RADIATION_VIEW_NOTE } from './cautions.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import { assumptionLedger, LEDGER_NODES } from './ledger.js';
import { GUESS_LABEL, guessesFor, shortcutCase } from './linear-surrogate.js';
import { madeByReported, modelRows, shortcutInputs, type ModelInput } from './model-rows.js';
import { nonlinearRows } from './nonlinear-ledger.js';
import { reference2D, type Reference2D } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import type { CheckReport, Flag, NotApplicable, ReferenceResult } from './types.js';

export interface CheckOptions {
  /** Relative drift accepted as `ok` (0.02 = 2 %). */
  tolerance: number;
  /** The reference model: fd-2d where it covers the fin ('auto'), always fd-2d ('2d'), fd-1d ('1d'). */
  reference: 'auto' | '1d' | '2d';
  /** Compute the assumption ledger (default true); maps skip it, their points need only drifts. */
  ledger?: boolean;
}

export interface CheckOutcome {
  report: CheckReport;
  /** The fd-1d study (the reference, or the fd-1d model beside a 2-D reference); profiles for plots. */
  oneD: FinStudy1D;
  /** The fd-2d study when fd-2d is the reference (field for heat maps). */
  twoD: FinStudy2D | null;
}

/**
 * Runs the check. A '2d' reference on a fin the 2-D model does not cover throws ModelNotApplicableError
 * (ask modelApplies(finProblem(c), '2d') first).
 */
export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  await initBessel();
  const problem = finProblem(c);
  return check(c, await gridSolvers(problem), opts);
}

/** The fd-1d study as a reference. */
export function reference1D(oneD: FinStudy1D, extraNote = ''): ReferenceResult {
  const ref = oneD.finest;
  const refinement = oneD.refinement;
  return {
    model: 'fd-1d',
    heatRate_W: ref.heatRate,
    efficiency: ref.efficiency,
    effectiveness: ref.effectiveness,
    discretizationError: oneD.discretizationError ?? Number.NaN,
    energyBalance: ref.energyBalance,
    observedOrder: refinement === null ? null : refinement.observedOrder,
    grid: { nodes: ref.mesh.nodes },
    tipTemperature_degC: ref.tipTemperature_degC,
    note: `1-D finite volumes, ${refinement === null ? 1 : refinement.sizes.length} grids; ${refinement === null ? 'one grid' : refinement.note}${extraNote}`,
  };
}

/**
 * Bi = h_b (s_b/2)/k across the thickness at the base (s_b: base thickness, or diameter for pins) and mL
 * of the equivalent uniform fin (mean section and perimeter, area-weighted mean h): where the fin sits on
 * the textbook's charts. Dimensionless.
 */
export function dimensionless(geometry: FinGeometry1D, eq: EquivalentUniformFin): { biot: number; mL: number } {
  return {
    biot: (eq.hBase * geometry.size(0)) / 2 / eq.k,
    mL: Math.sqrt((eq.h * eq.P) / (eq.k * eq.A)) * eq.length,
  };
}

/** Flags from the equivalent uniform fin of the shortcuts and the reference. */
export function checkFlags(
  geometry: FinGeometry1D,
  eq: EquivalentUniformFin,
  reference: ReferenceResult,
  tolerance: number,
  converged: boolean,
  measuredOneDDrift: number | null,
): Flag[] {
  return designFlags({
    family: geometry.shape,
    ...dimensionless(geometry, eq),
    effectiveness: reference.effectiveness,
    hAoverkP: (eq.hBase * geometry.baseArea) / (eq.k * geometry.perimeter(0)),
    tolerance,
    discretizationError: reference.discretizationError,
    converged,
    energyBalance: reference.energyBalance,
    measuredOneDDrift,
  });
}

/** How the study solved the fin, for the notes: Newton's method, with its step counts, or nothing to add. */
function newtonNote(study: FinStudy, tolerance: string, steps: string): string {
  return study.newton === null ? '' : `; nonlinear, Newton converged (residual <= ${tolerance}${steps})`;
}

function check(c: Case, solvers: GridSolvers, opts: CheckOptions): CheckOutcome {
  const problem = finProblem(c);
  const geometry = finGeometry(c);
  const oneD = studyFinWith(solvers, problem, { model: '1d' }) as FinStudy1D;
  const ref = oneD.finest;
  const radiationNote = c.convection.emissivity > 0 ? `; ${RADIATION_VIEW_NOTE}` : '';

  // The shortcuts: the fin's own h and k, or one guess each for a nonlinear fin.
  const inputs: ModelInput[] = [];
  let notApplicable: NotApplicable[] = [];
  let eqFirst: EquivalentUniformFin | null = null;
  for (const guess of guessesFor(c)) {
    const surrogate = shortcutCase(c, guess, ref);
    const eq = equivalentUniformFin(surrogate, geometry);
    const { values, notApplicable: na } = evaluateShortcuts(surrogate, eq);
    inputs.push(...(guess === null ? shortcutInputs(values) : shortcutInputs(values, { guess, guessValues: { h_W_per_m2K: eq.h, k_W_per_mK: eq.k, description: GUESS_LABEL[guess] } })));
    if (eqFirst === null) {
      notApplicable = na;
      eqFirst = eq;
    }
  }
  const eq = eqFirst as EquivalentUniformFin;
  // The heat the bare base area would lose at the base temperature (radiation as an equivalent h), W.
  const effectivenessScale = eq.hBase * eq.baseArea * eq.thetaBase;

  const solve1D = (variant: Case, nodes: number): number => solveFinWith(solvers, finProblem(variant), { model: '1d', nodes }).heatRate_W;
  let twoD: Reference2D | null = null;
  let outside2D = '';
  if (opts.reference !== '1d') {
    const coverage = modelApplies(problem, '2d');
    if (coverage.ok) {
      const study = studyFinWith(solvers, problem, { model: '2d' }) as FinStudy2D;
      const steps = study.newton === null ? '' : `; ${study.newton.stepsPerGrid.join('/')} steps, coarsest to finest grid`;
      twoD = reference2D(c, oneD, study, ref.idealHeatRate, effectivenessScale, solve1D, `${newtonNote(study, '1e-10', steps)}${radiationNote}`);
    } else if (opts.reference === '2d') throw new ModelNotApplicableError('fd-2d', coverage.reason);
    else outside2D = `; the 2-D model does not cover this fin (${coverage.reason})`;
  }
  const finestSteps = oneD.newton === null ? '' : `, ${oneD.newton.stepsPerGrid[oneD.newton.stepsPerGrid.length - 1] ?? 0} steps on the finest grid`;
  const reference = twoD ? twoD.reference : reference1D(oneD, `${newtonNote(oneD, '1e-12', finestSteps)}${outside2D}${radiationNote}`);

  const fd1d = twoD
    ? [
        {
          model: 'fd-1d' as const,
          heatRate_W: ref.heatRate,
          formulaEfficiency: null,
          m_per_m: null,
          length_m: null,
          basis:
            oneD.newton === null
              ? '1-D finite volumes: actual profile, h, tip and edges; uniform temperature across the thickness'
              : '1-D finite volumes, Newton: actual profile, h(theta), k(T), radiation, tip and edges; uniform temperature across the thickness',
          accuracy: `estimated discretisation error ${(oneD.discretizationError ?? Number.NaN).toExponential(1)} (GCI)`,
        },
      ]
    : [];
  const models = modelRows([...inputs, ...fd1d], reference, ref.idealHeatRate, effectivenessScale, opts.tolerance);

  const solveLedger = (variant: Case): number => solve1D(variant, LEDGER_NODES);
  const assumptions = opts.ledger === false ? [] : [...nonlinearRows(c, solveLedger), ...assumptionLedger(c, geometry, eq, solveLedger)];
  if (twoD) assumptions.unshift(twoD.oneDRow);
  const converged = twoD
    ? (twoD.study.refinement?.converged ?? false) || (twoD.study.discretizationError ?? Number.NaN) < opts.tolerance / 100
    : (oneD.refinement?.converged ?? false);
  const flags = checkFlags(geometry, eq, reference, opts.tolerance, converged, twoD ? twoD.oneDRow.drift : null);
  return {
    report: {
      case: c.name,
      tolerance: opts.tolerance,
      ...dimensionless(geometry, eq),
      reference,
      models,
      notApplicable,
      assumptions: madeByReported(assumptions, models),
      flags,
      cautions: cautionsFor(c.convection.emissivity),
    },
    oneD,
    twoD: twoD ? twoD.study : null,
  };
}
