/**
 * `fincheck check`: the reference solution, every applicable shortcut with its drift and verdict,
 * the assumption ledger, the design flags and the cautions (outputs.md).
 *
 * Pipeline: case -> 1-D geometry -> equivalent uniform fin -> fd-1d refinement study -> reference
 * (fd-2d study where the case allows and --reference is auto or 2d, else fd-1d) -> shortcuts ->
 * ledger -> flags.
 */
import type { Case } from '../case/types.js';
import { UsageError } from '../errors.js';
import type { Fin2DStudy } from '../fd/fin2dStudy.js';
import { initBessel } from '../analytic/bessel.js';
import { studyFin1D, type Fin1DStudy } from '../fd/fin1d.js';
import { isLinearFinCase, type LinearFinCase } from '../fd/linear-case.js';
import { finGeometry } from '../mesh/geometry1d.js';
import { CAUTIONS } from './cautions.js';
import { equivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import { assumptionLedger } from './ledger.js';
import { reference2D } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import { verdictOf, type CheckReport, type ModelResult, type ReferenceResult } from './types.js';

export interface CheckOptions {
  /** Relative drift accepted as `ok` (0.02 = 2 %). */
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  /** Compute the assumption ledger (default true); maps skip it, their points need only drifts. */
  ledger?: boolean;
}

export interface CheckOutcome {
  report: CheckReport;
  /** The 1-D solution (the reference, or the fd-1d model beside a 2-D reference); profiles for plots. */
  oneD: Fin1DStudy;
  /** The 2-D study when fd-2d is the reference (field for heat maps). */
  twoD: Fin2DStudy | null;
}

export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  const linear = requireLinear(c);
  await initBessel();
  const geometry = finGeometry(linear);
  const eq = equivalentUniformFin(linear, geometry);
  const oneD = studyFin1D(linear);
  const ref = oneD.result;
  const idealHeatRate = ref.idealHeatRate;
  const effectivenessScale = eq.hBase * eq.baseArea * eq.thetaBase;
  const reference1d: ReferenceResult = {
    model: 'fd-1d',
    heatRate_W: ref.heatRate,
    efficiency: ref.efficiency,
    effectiveness: ref.effectiveness,
    discretizationError: oneD.study.gci,
    energyBalance: ref.energyBalance,
    observedOrder: oneD.study.observedOrder,
    grid: { nodes: ref.mesh.nodes },
    tipTemperature_degC: ref.tipTemperature_degC,
    note: `1-D finite volumes, ${oneD.study.sizes.length} grids; ${oneD.study.note}`,
  };
  const twoD = opts.reference === '1d' ? null : reference2D(linear, oneD, idealHeatRate, effectivenessScale, opts.reference === '2d');
  const reference = twoD ? twoD.reference : reference1d;

  const { values, notApplicable } = evaluateShortcuts(linear, eq);
  const shortcutAccuracy = 'closed form: exact for its own assumptions (round-off); its error here is the drift';
  const rows: (Omit<ModelResult, 'drift' | 'verdict' | 'efficiency' | 'effectiveness'>)[] = values.map((v) => ({ ...v, accuracy: shortcutAccuracy }));
  if (twoD) {
    rows.push({
      model: 'fd-1d',
      heatRate_W: ref.heatRate,
      formulaEfficiency: null,
      m_per_m: null,
      length_m: null,
      basis: '1-D finite volumes: actual profile, h, tip and edges; uniform temperature across the thickness',
      accuracy: `estimated discretisation error ${oneD.study.gci.toExponential(1)} (GCI)`,
    });
  }
  const models: ModelResult[] = rows.map((v) => {
    const drift = (v.heatRate_W - reference.heatRate_W) / reference.heatRate_W;
    return {
      model: v.model,
      heatRate_W: v.heatRate_W,
      efficiency: v.heatRate_W / idealHeatRate,
      effectiveness: v.heatRate_W / effectivenessScale,
      drift,
      verdict: verdictOf(drift, opts.tolerance),
      formulaEfficiency: v.formulaEfficiency,
      m_per_m: v.m_per_m,
      length_m: v.length_m,
      basis: v.basis,
      accuracy: v.accuracy,
    };
  });

  const assumptions = opts.ledger === false ? [] : assumptionLedger(linear, geometry, eq, ref.heatRate);
  if (twoD) assumptions.unshift(twoD.oneDRow);
  const mL = Math.sqrt((eq.h * eq.P) / (eq.k * eq.A)) * eq.length;
  const flags = designFlags({
    family: geometry.shape,
    biot: (eq.hBase * geometry.size(0)) / 2 / eq.k,
    mL,
    effectiveness: reference.effectiveness,
    hAoverkP: (eq.hBase * geometry.baseArea) / (eq.k * geometry.perimeter(0)),
    tolerance: opts.tolerance,
    discretizationError: reference.discretizationError,
    converged: twoD ? twoD.study.heatRate.converged || twoD.study.discretizationError < opts.tolerance / 100 : oneD.study.converged,
    energyBalance: reference.energyBalance,
    measuredOneDDrift: twoD ? twoD.oneDRow.drift : null,
  });
  return {
    report: { case: c.name, tolerance: opts.tolerance, reference, models, notApplicable, assumptions, flags, cautions: [...CAUTIONS] },
    oneD,
    twoD: twoD ? twoD.study : null,
  };
}

function requireLinear(c: Case): LinearFinCase {
  if (isLinearFinCase(c)) return c;
  const what =
    c.convection.h.kind === 'power'
      ? 'convection.h with law: power'
      : c.material.k.kind === 'table'
        ? 'material.k as a table over temperature'
        : 'convection.emissivity > 0';
  throw new UsageError(`${what} makes the fin nonlinear; this build solves linear fins only (uniform, linear or tabulated h; constant k; no radiation)`);
}
