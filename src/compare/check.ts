/**
 * `fincheck check`: the reference solution, every applicable shortcut with its drift and verdict,
 * the assumption ledger, the design flags and the cautions (outputs.md).
 *
 * Pipeline, one for every fin: case -> fin problem -> fd-1d study resolved to a tenth of the tolerance
 * (studyFin: one direct solve per grid for a linear fin, Newton's method for a nonlinear one;
 * resolved-reference.ts) -> reference (the fd-2d study where the 2-D model covers the fin and the reference
 * asked for is auto or 2d, reference2d.ts; an unresolved fd-2d study hands an automatic reference back to
 * fd-1d) -> shortcuts -> ledger -> flags.
 * The shortcuts need one h and one k: a linear fin gives them its own; a nonlinear fin (power-law h,
 * radiation, k over temperature) is evaluated twice, with h and k at the base temperature and with h and k
 * averaged over the fin solved by fd-1d (linear-surrogate.ts), and its ledger adds one row per
 * nonlinearity (nonlinear-ledger.ts). Radiation: the fin sees only its surroundings (view factor 1, no
 * exchange with the base or neighbours).
 */
import type { Case } from '../case/index.js';
import { GridError, ModelNotApplicableError } from '../errors.js';
import {
  finProblem,
  gridSolvers,
  modelApplies,
  resolveFinStudy1D,
  solveFinWith,
  studyFinWith,
  studyGridIssue,
  type FinProblem,
  type FinStudy,
  type FinStudy1D,
  type FinStudy2D,
  type GridSolvers,
  type RefinementStudy,
} from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import { checkFlags, dimensionless, reference1D, type CheckOptions, type CheckOutcome } from './check-common.js';
import { cautionsFor, RADIATION_VIEW_NOTE } from './cautions.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { assumptionLedger, LEDGER_NODES } from './ledger.js';
import { GUESS_LABEL, guessesFor, linearSurrogate, shortcutCase } from './linear-surrogate.js';
import { madeByReported, modelRows, shortcutInputs, type ModelInput } from './model-rows.js';
import { nonlinearRows } from './nonlinear-ledger.js';
import { reference2D, type Reference2D, type Solve1D } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import { efficiencyBasis, ONE_D_SURFACE, TWO_D_SURFACE, withRowsNote } from './efficiency-basis.js';
import { effectivenessBasisOf } from './effectiveness-basis.js';
import { choose2DReference, judgedReference, resolution2D, resolutionTarget } from './resolved-reference.js';
import type { NotApplicable } from './types.js';
import { referenceSensitivity, withDriftOverUncertainty } from './reference-sensitivity.js';

export type { CheckOptions, CheckOutcome } from './check-common.js';

/**
 * Runs the check. A '2d' reference on a fin the 2-D model does not cover throws ModelNotApplicableError
 * (ask modelApplies(finProblem(c), '2d') first).
 */
export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  const problem = finProblem(c);
  return check(c, problem, await gridSolvers(problem), opts);
}

/** How the study solved the fin, for the notes: Newton's method with its step counts, or nothing to add. */
function newtonNote(study: FinStudy, residual: string, steps: string): string {
  return study.newton === null ? '' : `; nonlinear, Newton converged (residual <= ${residual}${steps})`;
}

function check(c: Case, problem: FinProblem, solvers: GridSolvers, opts: CheckOptions): CheckOutcome {
  const geometry = finGeometry(c);
  const target = resolutionTarget(opts.tolerance);
  // The decay length near the base comes from the fin's single h and k at the base temperature (the
  // fin's own when it is linear).
  const decayFrom = finProblem(linearSurrogate(c, 'base', null));
  const { study: oneD, resolution } = resolveFinStudy1D(solvers, problem, decayFrom, target, opts.resolutionBudget);
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
    const guessValues = guess === null ? undefined : { guess, guessValues: { h_W_per_m2K: eq.h, k_W_per_mK: eq.k, description: GUESS_LABEL[guess] } };
    inputs.push(...shortcutInputs(values, guessValues));
    if (eqFirst === null) {
      notApplicable = na;
      eqFirst = eq;
    } else {
      // A shortcut the fin-averaged guess cannot take (while the base guess could) says why too.
      for (const n of na)
        if (!notApplicable.some((b) => b.model === n.model)) notApplicable.push({ model: n.model, reason: `fin-averaged guess: ${n.reason}` });
    }
  }
  const eq = eqFirst as EquivalentUniformFin;
  // The heat the bare base area would lose at the base temperature (radiation as an equivalent h), W.
  const effectiveness = effectivenessBasisOf(eq.hBase * eq.baseArea * eq.thetaBase);

  const solve1D: Solve1D = (variant, nodes) => solveFinWith(solvers, finProblem(variant), { model: '1d', nodes }) as FinStudy1D;
  let candidate: Reference2D | null = null;
  let outside2D = '';
  if (opts.reference !== '1d') {
    const coverage = modelApplies(problem, '2d');
    const gridIssue = coverage.ok ? studyGridIssue(problem, { model: '2d' }) : null;
    if (coverage.ok && gridIssue === null) {
      const study = studyFinWith(solvers, problem, { model: '2d' }) as FinStudy2D;
      const steps = study.newton === null ? '' : `; ${study.newton.stepsPerGrid.join('/')} steps, coarsest to finest grid`;
      candidate = reference2D(c, oneD, study, effectiveness, solve1D, `${newtonNote(study, '1e-10', steps)}${radiationNote}`);
    } else if (!coverage.ok) {
      if (opts.reference === '2d') throw new ModelNotApplicableError('fd-2d', coverage.reason);
      outside2D = `; the 2-D model does not cover this fin (${coverage.reason})`;
    } else {
      if (opts.reference === '2d') throw new GridError(gridIssue as string);
      outside2D = `; fd-2d was not used (${gridIssue as string})`;
    }
  }
  const { twoD, fallback } = choose2DReference(candidate, opts.reference === '2d', target);
  const basis = twoD ? efficiencyBasis(c, twoD.idealHeatRate, TWO_D_SURFACE) : efficiencyBasis(c, ref.idealHeatRate, ONE_D_SURFACE);
  const finestSteps = oneD.newton === null ? '' : `, ${oneD.newton.stepsPerGrid[oneD.newton.stepsPerGrid.length - 1] ?? 0} steps on the finest grid`;
  const reference = twoD
    ? judgedReference(twoD.reference, resolution2D(twoD.study, target), basis, effectiveness)
    : reference1D(oneD, resolution, basis, effectiveness, `${newtonNote(oneD, '1e-12', finestSteps)}${outside2D}${fallback}${radiationNote}`);

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
  const rows = modelRows([...inputs, ...fd1d], reference, basis, effectiveness, opts.tolerance);
  const sensitivity =
    opts.sensitivities === false ? null : referenceSensitivity(c, solvers, opts, twoD ? twoD.study : null, oneD, resolution, reference.heatRate_W);
  const models = sensitivity === null ? rows : withDriftOverUncertainty(rows, sensitivity.uncertainty);
  reference.efficiencyNote = withRowsNote(reference.efficiencyNote, models);

  const solveLedger = (variant: Case): number => solve1D(variant, LEDGER_NODES).heatRate_W;
  const assumptions = opts.ledger === false ? [] : [...nonlinearRows(c, solveLedger), ...assumptionLedger(c, geometry, eq, solveLedger)];
  if (twoD) assumptions.unshift(twoD.oneDRow);
  const converged = twoD
    ? (twoD.study.refinement as RefinementStudy).converged || (twoD.study.discretizationError ?? Number.NaN) < opts.tolerance / 100
    : (oneD.refinement as RefinementStudy).converged;
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
      ...(sensitivity ?? {}),
    },
    oneD,
    twoD: twoD ? twoD.study : null,
  };
}
