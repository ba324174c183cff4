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
import { type Fin1DStudy, finProblem1D, resolveFinProblem1D, type Resolution, type ResolutionBudget, type Fin2DStudy, isLinearFinCase, type LinearFinCase } from '../fd/index.js';
import { finGeometry, type FinGeometry1D } from '../mesh/index.js';
import { CAUTIONS } from './cautions.js';
import { nonlinearCheck } from './check-nonlinear.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import { assumptionLedger } from './ledger.js';
import { madeByReported, modelRows, shortcutInputs } from './model-rows.js';
import { reference2D } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import { efficiencyBasis, ONE_D_SURFACE, TWO_D_SURFACE, withRowsNote, type EfficiencyBasis } from './efficiency-basis.js';
import { choose2DReference, judgedReference, resolution1D, resolution2D, resolutionTarget } from './resolved-reference.js';
import type { CheckReport, Flag, ReferenceResult } from './types.js';

export interface CheckOptions {
  /** Relative drift accepted as `ok` (0.02 = 2 %). */
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  /** Compute the assumption ledger (default true); maps skip it, their points need only drifts. */
  ledger?: boolean;
  /** How far the fd-1d reference may be refined to reach tolerance / 10 (default DEFAULT_RESOLUTION_BUDGET). */
  resolutionBudget?: ResolutionBudget;
}

export interface CheckOutcome {
  report: CheckReport;
  /** The 1-D solution (the reference, or the fd-1d model beside a 2-D reference); profiles for plots. */
  oneD: Fin1DStudy;
  /** The 2-D study when fd-2d is the reference (field for heat maps). */
  twoD: Fin2DStudy | null;
}

export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  await initBessel();
  return isLinearFinCase(c) ? linearCheck(c, opts) : nonlinearCheck(c, opts);
}

/** The fd-1d study as a reference, judged against the resolution it reached. */
export function reference1D(oneD: Fin1DStudy, resolution: Resolution, basis: EfficiencyBasis, extraNote = ''): ReferenceResult {
  const ref = oneD.result;
  const grids =
    resolution.refinements > 0 || resolution.grading !== 'default grading' ? ` (${resolution.nodes.join(', ')} nodes, ${resolution.grading})` : '';
  return judgedReference(
    {
      model: 'fd-1d',
      heatRate_W: ref.heatRate,
      effectiveness: ref.effectiveness,
      discretizationError: oneD.study.gci,
      energyBalance: ref.energyBalance,
      observedOrder: oneD.study.observedOrder,
      grid: { nodes: ref.mesh.nodes },
      tipTemperature_degC: ref.tipTemperature_degC,
      note: `1-D finite volumes, ${oneD.study.sizes.length} grids${grids}; ${oneD.study.note}${extraNote}`,
    },
    resolution1D(resolution),
    basis,
  );
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
