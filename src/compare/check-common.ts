/**
 * The parts of `check` (check.ts) beside its pipeline: the options and the outcome, the fd-1d study as a
 * judged reference, the dimensionless groups and the flags.
 */
import type { FinStudy1D, FinStudy2D, RefinementStudy, Resolution, ResolutionBudget } from '../fd/index.js';
import type { FinGeometry1D } from '../mesh/index.js';
import type { EquivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import type { EfficiencyBasis } from './efficiency-basis.js';
import { judgedReference, resolution1D } from './resolved-reference.js';
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
  /** The fd-1d study (the reference, or the fd-1d model beside a 2-D reference); profiles for plots. */
  oneD: FinStudy1D;
  /** The fd-2d study when fd-2d is the reference (field for heat maps). */
  twoD: FinStudy2D | null;
}

/** The fd-1d study as a reference, judged against the resolution it reached. */
export function reference1D(oneD: FinStudy1D, resolution: Resolution, basis: EfficiencyBasis, extraNote = ''): ReferenceResult {
  const ref = oneD.finest;
  // A study (never a single grid) has its refinement.
  const refinement = oneD.refinement as RefinementStudy;
  const grids =
    resolution.refinements > 0 || resolution.grading !== 'default grading' ? ` (${resolution.nodes.join(', ')} nodes, ${resolution.grading})` : '';
  return judgedReference(
    {
      model: 'fd-1d',
      heatRate_W: ref.heatRate,
      effectiveness: ref.effectiveness,
      discretizationError: refinement.gci,
      energyBalance: ref.energyBalance,
      observedOrder: refinement.observedOrder,
      grid: { nodes: ref.mesh.nodes },
      tipTemperature_degC: ref.tipTemperature_degC,
      note: `1-D finite volumes, ${refinement.sizes.length} grids${grids}; ${refinement.note}${extraNote}`,
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
