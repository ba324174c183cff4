/**
 * `fincheck check` for nonlinear fins: h that grows with the temperature excess (power law), grey
 * radiation from the faces, conductivity that depends on temperature.
 *
 * Reference: fd-1d solved by Newton's method on the same finite-volume grids (refinement study as for
 * linear fins). The shortcuts need one h and one k: they are evaluated twice, with h and k at the base
 * temperature and with h and k averaged over the solved fin (linear-surrogate.ts). The ledger adds one
 * row per nonlinearity, each re-solving the fin with that one effect removed: constant h (at the base
 * temperature), constant k (at the base temperature), no radiation.
 * Radiation: the fin sees only its surroundings (view factor 1, no exchange with the base or neighbours).
 */
import type { Case } from '../case/types.js';
import { UsageError } from '../errors.js';
import { solveNonlinearFin1D, studyNonlinearFin1D } from '../fd/nonlinear1d.js';
import { finGeometry } from '../mesh/geometry1d.js';
import { CAUTIONS } from './cautions.js';
import { checkFlags, reference1D, type CheckOptions, type CheckOutcome } from './check.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { assumptionLedger, LEDGER_NODES } from './ledger.js';
import { conductivityAt, GUESS_LABEL, linearSurrogate, type HGuess } from './linear-surrogate.js';
import { modelRows, shortcutInputs, type ModelInput } from './model-rows.js';
import { evaluateShortcuts } from './shortcuts.js';
import type { AssumptionRow, ModelId, NotApplicable } from './types.js';

export const RADIATION_VIEW_NOTE = 'radiation: grey faces that see only the surroundings (view factor 1; no exchange with the base or other fins)';

export function nonlinearCheck(c: Case, opts: CheckOptions): CheckOutcome {
  if (opts.reference === '2d') {
    throw new UsageError('--reference 2d: the 2-D model does not solve nonlinear fins (power-law h, radiation, k over temperature); use --reference 1d or auto');
  }
  const geometry = finGeometry(c);
  const study = studyNonlinearFin1D(c);
  const ref = study.result;
  const finestSteps = study.iterations[study.iterations.length - 1] ?? 0;
  const radiationNote = c.convection.emissivity > 0 ? `; ${RADIATION_VIEW_NOTE}` : '';
  const reference = reference1D(study, `; nonlinear, Newton converged (residual <= 1e-12, ${finestSteps} steps on the finest grid); the 2-D model does not cover nonlinear fins${radiationNote}`);

  const inputs: ModelInput[] = [];
  let notApplicable: NotApplicable[] = [];
  let eqBase: EquivalentUniformFin | null = null;
  for (const guess of ['base', 'mean'] as HGuess[]) {
    const surrogate = linearSurrogate(c, guess, ref);
    const eq = equivalentUniformFin(surrogate, geometry);
    const { values, notApplicable: na } = evaluateShortcuts(surrogate, eq);
    const guessValues = { h_W_per_m2K: eq.h, k_W_per_mK: eq.k, description: GUESS_LABEL[guess] };
    inputs.push(...shortcutInputs(values, { guess, guessValues }));
    if (guess === 'base') {
      notApplicable = na;
      eqBase = eq;
    }
  }
  const eq = eqBase as EquivalentUniformFin;
  const effectivenessScale = ref.heatRate / ref.effectiveness;
  const models = modelRows(inputs, reference, ref.idealHeatRate, effectivenessScale, opts.tolerance);

  const solve = (variant: Case): number => solveNonlinearFin1D(variant, { nodes: LEDGER_NODES }).heatRate;
  const assumptions = opts.ledger === false ? [] : [...nonlinearRows(c, solve), ...assumptionLedger(c, geometry, eq, solve)];
  const flags = checkFlags(geometry, eq, reference, opts.tolerance, study.study.converged, null);
  const cautions = c.convection.emissivity > 0 ? [...CAUTIONS, `Radiation is modelled with ${RADIATION_VIEW_NOTE.replace('radiation: ', '')}; in an array, neighbouring fins see each other and radiate less.`] : [...CAUTIONS];
  return {
    report: { case: c.name, tolerance: opts.tolerance, reference, models, notApplicable, assumptions, flags, cautions },
    oneD: study,
    twoD: null,
  };
}

const ALL_SHORTCUTS: ModelId[] = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];

/** One row per nonlinearity: the fin re-solved with that effect alone removed, same grid. */
function nonlinearRows(c: Case, solve: (variant: Case) => number): AssumptionRow[] {
  const rows: AssumptionRow[] = [];
  const actual = solve(c);
  const method = 'fd-1d (Newton) with and without the assumption, same grid';
  const drift = (variant: Case): number => (solve(variant) - actual) / actual;
  const h = c.convection.h;
  if (h.kind === 'power') {
    rows.push({
      assumption: `constant h (h at the base temperature; actual h ~ theta^${h.exponent})`,
      drift: drift({ ...c, convection: { ...c.convection, h: { kind: 'uniform', h: h.base } } }),
      madeBy: ALL_SHORTCUTS,
      method,
    });
  }
  if (c.material.k.kind === 'table') {
    const k = conductivityAt(c.material.k, c.base.T_degC);
    rows.push({
      assumption: `constant k (k at the base temperature, ${k.toPrecision(4)} W/(m*K))`,
      drift: drift({ ...c, material: { ...c.material, k: { kind: 'constant', k } } }),
      madeBy: ALL_SHORTCUTS,
      method,
    });
  }
  if (c.convection.emissivity > 0) {
    rows.push({
      assumption: 'no radiation',
      drift: drift({ ...c, convection: { ...c.convection, emissivity: 0 } }),
      madeBy: [],
      method: `${method}; the shortcuts include radiation as an equivalent h`,
    });
  }
  return rows;
}
