/**
 * The parts of `check` (check.ts) beside its pipeline: the options and the outcome, the fd-1d study as a
 * judged reference, the dimensionless groups and the flags.
 */
import type { FinStudy1D, FinStudy2D, RefinementStudy, Resolution, ResolutionBudget } from '../fd/index.js';
import type { FinGeometry1D } from '../mesh/index.js';
import type { EquivalentUniformFin } from './equivalent.js';
import { designFlags } from './flags.js';
import type { EfficiencyBasis } from './efficiency-basis.js';
import { definedEffectiveness, type EffectivenessBasis } from './effectiveness-basis.js';
import { judgedReference, resolution1D } from './resolved-reference.js';
import type { SampleWhen } from './uncertainty-band.js';
import type { CheckReport, Flag, ReferenceResult } from './types.js';

export interface CheckOptions {
  /** Relative drift accepted as `ok` (0.02 = 2 %). */
  tolerance: number;
  reference: 'auto' | '1d' | '2d';
  /** Compute the assumption ledger (default true); maps skip it, their points need only drifts. */
  ledger?: boolean;
  /** How far the fd-1d reference may be refined to reach tolerance / 10 (default DEFAULT_RESOLUTION_BUDGET). */
  resolutionBudget?: ResolutionBudget;
  /** Compute the sensitivities and the uncertainty band (default true); maps skip them. */
  sensitivities?: boolean;
  /** When to confirm the first-order band by a Latin-hypercube sample (default 'auto': uncertainty-band.ts). */
  sample?: SampleWhen;
  /** Size and seed of that sample (default 200 and 1). */
  sampleSize?: number;
  sampleSeed?: number;
}

export interface CheckOutcome {
  report: CheckReport;
  /** The fd-1d study (the reference, or the fd-1d model beside a 2-D reference); profiles for plots. */
  oneD: FinStudy1D;
  /** The fd-2d study when fd-2d is the reference (field for heat maps). */
  twoD: FinStudy2D | null;
}

/** The fd-1d study as a reference, judged against the resolution it reached. */
export function reference1D(
  oneD: FinStudy1D,
  resolution: Resolution,
  basis: EfficiencyBasis,
  effectiveness: EffectivenessBasis,
  extraNote = '',
): ReferenceResult {
  const ref = oneD.finest;
  // A study (never a single grid) has its refinement.
  const refinement = oneD.refinement as RefinementStudy;
  const grids =
    resolution.refinements > 0 || resolution.grading !== 'default grading' ? ` (${resolution.nodes.join(', ')} nodes, ${resolution.grading})` : '';
  return judgedReference(
    {
      model: 'fd-1d',
      heatRate_W: ref.heatRate,
      effectiveness: definedEffectiveness(ref.effectiveness, effectiveness),
      discretizationError: refinement.gci,
      heatRateFrom: 'finest-grid',
      finestGridHeatRate_W: ref.heatRate,
      finestGridDiscretizationError: refinement.gci,
      energyBalance: ref.energyBalance,
      observedOrder: refinement.observedOrder,
      grid: { nodes: ref.mesh.nodes },
      tipTemperature_degC: ref.tipTemperature_degC,
      note: `1-D finite volumes, ${refinement.sizes.length} grids${grids}; ${refinement.note}${extraNote}`,
    },
    resolution1D(resolution),
    basis,
    effectiveness,
  );
}

/**
 * Bi = h_b (s_b/2)/k across the thickness at the base (s_b: base thickness, or diameter for pins) and mL
 * of the equivalent uniform fin (mean section and perimeter, area-weighted mean h): where the fin sits on
 * the textbook's charts. Dimensionless. A nonlinear fin's single h is the base guess (h and radiation at
 * the base temperature as one equivalent h, linear-surrogate.ts). Where that h is negative (radiation from
 * surroundings hotter than the fin outweighs convection) the fin is on no chart: m^2 = hP/(kA) < 0 has no
 * real root and a negative Bi compares nothing, so each is null and dimensionlessNote says why (the
 * convective part alone would place on the charts a fin that radiation dominates).
 */
export function dimensionless(
  geometry: FinGeometry1D,
  eq: EquivalentUniformFin,
): { biot: number | null; mL: number | null; dimensionlessNote: string | null } {
  const biot = eq.hBase < 0 ? null : (eq.hBase * geometry.size(0)) / 2 / eq.k;
  const mL = eq.h < 0 ? null : Math.sqrt((eq.h * eq.P) / (eq.k * eq.A)) * eq.length;
  const w = (h: number): string => `${Number(h.toPrecision(3))} W/(m^2*K)`;
  const which = [biot === null ? `at the base ${w(eq.hBase)}` : null, mL === null ? `over the fin ${w(eq.h)}` : null].filter((x) => x !== null);
  const dimensionlessNote =
    which.length === 0
      ? null
      : `no ${biot === null && mL === null ? 'Bi or mL' : biot === null ? 'Bi' : 'mL'}: the single h (convection plus radiation as an equivalent h, at the base temperature) is ${which.join(' and ')}, below 0 because the surroundings radiate more into the fin than the fluid takes away; a negative h places the fin on no textbook chart (m^2 = hP/(kA) < 0)`;
  return { biot, mL, dimensionlessNote };
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
  const { biot, mL } = dimensionless(geometry, eq);
  return designFlags({
    family: geometry.shape,
    biot,
    mL,
    effectiveness: reference.effectiveness,
    hAoverkP: (eq.hBase * geometry.baseArea) / (eq.k * geometry.perimeter(0)),
    tolerance,
    discretizationError: reference.discretizationError,
    converged,
    energyBalance: reference.energyBalance,
    measuredOneDDrift,
  });
}
