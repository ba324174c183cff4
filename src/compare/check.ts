/**
 * `fincheck check`: the reference solution, every applicable shortcut with its drift and verdict,
 * the assumption ledger, the design flags and the cautions (outputs.md).
 *
 * Pipeline: case -> 1-D geometry -> equivalent uniform fin -> reference (fd-1d refinement study)
 * -> shortcuts -> ledger -> flags.
 */
import type { Case } from '../case/types.js';
import { UsageError } from '../errors.js';
import { initBessel } from '../analytic/bessel.js';
import { studyFin1D, type Fin1DStudy } from '../fd/fin1d.js';
import { isLinearFinCase, type LinearFinCase } from '../fd/linear-case.js';
import { finGeometry } from '../mesh/geometry1d.js';
import { CAUTIONS } from './cautions.js';
import { equivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import { assumptionLedger } from './ledger.js';
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
  /** The reference's 1-D solution (profiles for plots). */
  oneD: Fin1DStudy;
}

export async function runCheck(c: Case, opts: CheckOptions): Promise<CheckOutcome> {
  const linear = requireLinear(c);
  if (opts.reference === '2d') {
    throw new UsageError('--reference 2d: the 2-D model is not available in this build; use --reference 1d or auto');
  }
  await initBessel();
  const geometry = finGeometry(linear);
  const eq = equivalentUniformFin(linear, geometry);
  const oneD = studyFin1D(linear);
  const ref = oneD.result;
  const reference: ReferenceResult = {
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

  const { values, notApplicable } = evaluateShortcuts(linear, eq);
  const idealHeatRate = ref.idealHeatRate;
  const effectivenessScale = eq.hBase * eq.baseArea * eq.thetaBase;
  const models: ModelResult[] = values.map((v) => {
    const drift = (v.heatRate_W - ref.heatRate) / ref.heatRate;
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
      accuracy: 'closed form: exact for its own assumptions (round-off); its error here is the drift',
    };
  });

  const assumptions = opts.ledger === false ? [] : assumptionLedger(linear, geometry, eq, ref.heatRate);
  const mL = Math.sqrt((eq.h * eq.P) / (eq.k * eq.A)) * eq.length;
  const flags = designFlags({
    family: geometry.shape,
    biot: (eq.hBase * geometry.size(0)) / 2 / eq.k,
    mL,
    effectiveness: ref.effectiveness,
    hAoverkP: (eq.hBase * geometry.baseArea) / (eq.k * geometry.perimeter(0)),
    tolerance: opts.tolerance,
    discretizationError: oneD.study.gci,
    converged: oneD.study.converged,
    energyBalance: ref.energyBalance,
    measuredOneDDrift: null,
  });
  return {
    report: { case: c.name, tolerance: opts.tolerance, reference, models, notApplicable, assumptions, flags, cautions: [...CAUTIONS] },
    oneD,
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
