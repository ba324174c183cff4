/**
 * `fincheck check` for nonlinear fins: h that grows with the temperature excess (power law), grey
 * radiation from the faces, conductivity that depends on temperature.
 *
 * Reference: as for linear fins (reference2d.ts), fd-2d across the thickness where the 2-D model covers the
 * case and the reference asked for is auto or 2d, solved by Newton's method on the three grids of the 2-D study
 * (nonlinear2d*.ts); the straight fin's cooled side edges are added from fd-1d, the ledger's
 * "one-dimensional conduction" row compares fd-1d and fd-2d on the same idealisation, fd-1d is listed as a
 * model. Else (a 1-D reference asked for, or a case the 2-D model does not cover: a nonlinear infinite tip) fd-1d
 * solved by Newton's method on the 1-D grids (refinement study as for linear fins).
 * The shortcuts need one h and one k: they are evaluated twice, with h and k at the base temperature and
 * with h and k averaged over the fin solved by fd-1d (linear-surrogate.ts). The ledger adds one row per
 * nonlinearity, each re-solving the fin with fd-1d with that one effect removed: constant h (at the base
 * temperature), constant k (at the base temperature), no radiation.
 * Radiation: the fin sees only its surroundings (view factor 1, no exchange with the base or neighbours).
 */
import type { Case } from '../case/index.js';
import { ModelNotApplicableError } from '../errors.js';
import {
  solveNonlinearFin1D,
  studyNonlinearFin1D,
  nonlinear2dUnsupported,
  studyNonlinearFin2D,
  type NonlinearFin2DStudy,
  finProblem1D,
  decayGradingOf,
  resolveStudy1D,
} from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import { CAUTIONS } from './cautions.js';
import { checkFlags, dimensionless, reference1D, type CheckOptions, type CheckOutcome } from './check-common.js';
import { efficiencyBasis, ONE_D_SURFACE, TWO_D_SURFACE, withRowsNote } from './efficiency-basis.js';
import { choose2DReference, judgedReference, resolution2D, resolutionTarget } from './resolved-reference.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { assumptionLedger, LEDGER_NODES } from './ledger.js';
import { conductivityAt, GUESS_LABEL, linearSurrogate, type HGuess } from './linear-surrogate.js';
import { madeByReported, modelRows, shortcutInputs, type ModelInput } from './model-rows.js';
import { reference2DWith, type Reference2D, type Reference2DModels } from './reference2d.js';
import { evaluateShortcuts } from './shortcuts.js';
import type { AssumptionRow, ModelId, NotApplicable } from './types.js';

export const RADIATION_VIEW_NOTE = 'radiation: grey faces that see only the surroundings (view factor 1; no exchange with the base or other fins)';

/** The Newton solvers behind a nonlinear fd-2d reference. */
function nonlinearModels(radiationNote: string): Reference2DModels<Case> {
  return {
    study2D: (c) => studyNonlinearFin2D(c),
    heatRate1D: (variant, nodes) => solveNonlinearFin1D(variant, { nodes }).heatRate,
    // Q_ideal does not depend on the grid (exact integrals of the geometry): the coarsest grid gives it.
    idealHeatRate1D: (variant) => solveNonlinearFin1D(variant, { nodes: 3 }).idealHeatRate,
    note: (study) => {
      const steps = (study as NonlinearFin2DStudy).iterations.join('/');
      return `; nonlinear, Newton converged (residual <= 1e-10; ${steps} steps, coarsest to finest grid)${radiationNote}`;
    },
  };
}

export function nonlinearCheck(c: Case, opts: CheckOptions): CheckOutcome {
  const geometry = finGeometry(c);
  const target = resolutionTarget(opts.tolerance);
  const grading = decayGradingOf(finProblem1D(linearSurrogate(c, 'base', null)));
  const { study, resolution } = resolveStudy1D((nodes, g) => studyNonlinearFin1D(c, { nodes, grading: g }), grading, target, opts.resolutionBudget);
  const ref = study.result;
  const radiationNote = c.convection.emissivity > 0 ? `; ${RADIATION_VIEW_NOTE}` : '';
  const effectivenessScale = ref.heatRate / ref.effectiveness;
  let candidate: Reference2D | null = null;
  let outside2D = '';
  if (opts.reference !== '1d') {
    const unsupported = nonlinear2dUnsupported(c);
    if (unsupported === null) candidate = reference2DWith(c, study, ref.idealHeatRate, effectivenessScale, true, nonlinearModels(radiationNote));
    else if (opts.reference === '2d') throw new ModelNotApplicableError('fd-2d', unsupported);
    else outside2D = `; the 2-D model does not cover this fin (${unsupported})`;
  }
  const { twoD, fallback } = choose2DReference(candidate, opts.reference === '2d', target);
  const finestSteps = study.iterations[study.iterations.length - 1] ?? 0;
  const basis = twoD ? efficiencyBasis(c, twoD.idealHeatRate, TWO_D_SURFACE) : efficiencyBasis(c, ref.idealHeatRate, ONE_D_SURFACE);
  const reference = twoD
    ? judgedReference(twoD.reference, resolution2D(twoD.study, target), basis)
    : reference1D(
        study,
        resolution,
        basis,
        `; nonlinear, Newton converged (residual <= 1e-12, ${finestSteps} steps on the finest grid)${outside2D}${fallback}${radiationNote}`,
      );

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
    } else {
      // A shortcut the fin-averaged guess cannot take (while the base guess could) says why too.
      for (const n of na)
        if (!notApplicable.some((b) => b.model === n.model)) notApplicable.push({ model: n.model, reason: `fin-averaged guess: ${n.reason}` });
    }
  }
  const eq = eqBase as EquivalentUniformFin;
  const fd1d = twoD
    ? [
        {
          model: 'fd-1d' as const,
          heatRate_W: ref.heatRate,
          formulaEfficiency: null,
          m_per_m: null,
          length_m: null,
          basis: '1-D finite volumes, Newton: actual profile, h(theta), k(T), radiation, tip and edges; uniform temperature across the thickness',
          accuracy: `estimated discretisation error ${study.study.gci.toExponential(1)} (GCI)`,
        },
      ]
    : [];
  const models = modelRows([...inputs, ...fd1d], reference, basis, effectivenessScale, opts.tolerance);
  reference.efficiencyNote = withRowsNote(reference.efficiencyNote, models);

  const solve = (variant: Case): number => solveNonlinearFin1D(variant, { nodes: LEDGER_NODES }).heatRate;
  const assumptions = opts.ledger === false ? [] : [...nonlinearRows(c, solve), ...assumptionLedger(c, geometry, eq, solve)];
  if (twoD) assumptions.unshift(twoD.oneDRow);
  const converged = twoD ? twoD.study.heatRate.converged || twoD.study.discretizationError < opts.tolerance / 100 : study.study.converged;
  const flags = checkFlags(geometry, eq, reference, opts.tolerance, converged, twoD ? twoD.oneDRow.drift : null);
  const cautions =
    c.convection.emissivity > 0
      ? [
          ...CAUTIONS,
          `Radiation is modelled with ${RADIATION_VIEW_NOTE.replace('radiation: ', '')}; in an array, neighbouring fins see each other and radiate less.`,
        ]
      : [...CAUTIONS];
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
      cautions,
    },
    oneD: study,
    twoD: twoD ? twoD.study : null,
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
