/**
 * `fincheck check`: the reference solution, every applicable shortcut with its drift and verdict,
 * the assumption ledger, the design flags and the cautions (outputs.md).
 *
 * Pipeline (linear fins): case -> 1-D geometry -> equivalent uniform fin -> fd-1d refinement study ->
 * reference (fd-2d study where the case allows and the reference asked for is auto or 2d, else fd-1d) -> shortcuts
 * -> ledger -> flags. Nonlinear fins (power-law h, radiation, k over temperature): check-nonlinear.ts.
 */
import type { Case } from '../case/index.js';
import { initBessel } from '../analytic/index.js';
import { finProblem1D, resolveFinProblem1D, isLinearFinCase, type LinearFinCase } from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import { checkFlags, dimensionless, reference1D, type CheckOptions, type CheckOutcome } from './check-common.js';
import { CAUTIONS } from './cautions.js';
import { nonlinearCheck } from './check-nonlinear.js';
import { equivalentUniformFin } from './equivalent.js';
import { assumptionLedger } from './ledger.js';
import { madeByReported, modelRows, shortcutInputs } from './model-rows.js';
import { reference2D } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import { efficiencyBasis, ONE_D_SURFACE, TWO_D_SURFACE, withRowsNote } from './efficiency-basis.js';
import { choose2DReference, judgedReference, resolution2D, resolutionTarget } from './resolved-reference.js';

export type { CheckOptions, CheckOutcome } from './check-common.js';

export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  await initBessel();
  return isLinearFinCase(c) ? linearCheck(c, opts) : nonlinearCheck(c, opts);
}

function linearCheck(c: LinearFinCase, opts: CheckOptions): CheckOutcome {
  const geometry = finGeometry(c);
  const eq = equivalentUniformFin(c, geometry);
  const target = resolutionTarget(opts.tolerance);
  const { study: oneD, resolution } = resolveFinProblem1D(finProblem1D(c), target, opts.resolutionBudget);
  const ref = oneD.result;
  const effectivenessScale = eq.hBase * eq.baseArea * eq.thetaBase;
  const required = opts.reference === '2d';
  const { twoD, fallback } = choose2DReference(
    opts.reference === '1d' ? null : reference2D(c, oneD, ref.idealHeatRate, effectivenessScale, required),
    required,
    target,
  );
  const basis = twoD ? efficiencyBasis(c, twoD.idealHeatRate, TWO_D_SURFACE) : efficiencyBasis(c, ref.idealHeatRate, ONE_D_SURFACE);
  const reference = twoD ? judgedReference(twoD.reference, resolution2D(twoD.study, target), basis) : reference1D(oneD, resolution, basis, fallback);

  const { values, notApplicable } = evaluateShortcuts(c, eq);
  const inputs = shortcutInputs(values);
  const fd1d = twoD
    ? [
        {
          model: 'fd-1d' as const,
          heatRate_W: ref.heatRate,
          formulaEfficiency: null,
          m_per_m: null,
          length_m: null,
          basis: '1-D finite volumes: actual profile, h, tip and edges; uniform temperature across the thickness',
          accuracy: `estimated discretisation error ${oneD.study.gci.toExponential(1)} (GCI)`,
        },
      ]
    : [];
  const models = modelRows([...inputs, ...fd1d], reference, basis, effectivenessScale, opts.tolerance);
  reference.efficiencyNote = withRowsNote(reference.efficiencyNote, models);

  const assumptions = opts.ledger === false ? [] : assumptionLedger(c, geometry, eq);
  if (twoD) assumptions.unshift(twoD.oneDRow);
  const converged = twoD ? twoD.study.heatRate.converged || twoD.study.discretizationError < opts.tolerance / 100 : oneD.study.converged;
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
      cautions: [...CAUTIONS],
    },
    oneD,
    twoD: twoD ? twoD.study : null,
  };
}
