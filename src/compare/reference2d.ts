/**
 * The 2-D reference of `fincheck check`: fd-2d across the thickness, and the one-dimensional
 * conduction row of the assumption ledger.
 *
 * fd-2d solves the longitudinal section (straight fins, times the width: insulated side edges) or the
 * axisymmetric section (pins, annular fins). Where a straight fin's side edges are cooled, the reference
 * adds their effect measured by fd-1d on one grid (Q_1D,cooled / Q_1D,insulated), a correction of order
 * t/w; the note says how large it is. The one-dimensional conduction drift compares fd-1d with fd-2d on
 * the same idealisation (insulated edges in both): (Q_1D - Q_2D) / Q_2D.
 * Nonlinear fins (check-nonlinear.ts) use the same construction with their own solvers (Newton in 1-D and
 * 2-D): `reference2DWith` takes the models as functions.
 * Units: W, K.
 */
import type { Case } from '../case/types.js';
import { UsageError } from '../errors.js';
import { solveFin1D, type Fin1DStudy } from '../fd/one-d/linear-solve.js';
import type { LinearFinCase } from '../fd/problem/linear-case.js';
import { studyFin2D, type Fin2DStudy } from '../fd/two-d/linear-study.js';
import type { AssumptionRow, ReferenceResult } from './types.js';

/** The solvers behind a 2-D reference. */
export interface Reference2DModels<C extends Case> {
  /** fd-2d refinement study of the case (a UsageError when the 2-D model does not cover it). */
  study2D: (c: C) => Fin2DStudy;
  /** fd-1d heat rate of a variant of the case on `nodes` nodes, W. */
  heatRate1D: (variant: C, nodes: number) => number;
  /** Words appended to the reference note. */
  note?: (study: Fin2DStudy) => string;
}

const LINEAR_MODELS: Reference2DModels<LinearFinCase> = {
  study2D: (c) => studyFin2D(c),
  heatRate1D: (variant, nodes) => solveFin1D(variant, { nodes }).heatRate,
};

export interface Reference2D {
  reference: ReferenceResult;
  study: Fin2DStudy;
  /** The ledger row "one-dimensional conduction". */
  oneDRow: AssumptionRow;
}

/**
 * fd-2d reference, or null when the case is outside the 2-D model and `required` is false
 * (then `check --reference auto` keeps fd-1d).
 */
export function reference2D(c: LinearFinCase, oneD: Fin1DStudy, idealHeatRate: number, effectivenessScale: number, required: boolean): Reference2D | null {
  return reference2DWith(c, oneD, idealHeatRate, effectivenessScale, required, LINEAR_MODELS);
}

/** reference2D with the given solvers (any case they accept). */
export function reference2DWith<C extends Case>(
  c: C,
  oneD: Fin1DStudy,
  idealHeatRate: number,
  effectivenessScale: number,
  required: boolean,
  models: Reference2DModels<C>,
): Reference2D | null {
  let study: Fin2DStudy;
  try {
    study = models.study2D(c);
  } catch (e) {
    if (!required && e instanceof UsageError) return null;
    throw e;
  }
  const ref1d = oneD.result;
  const cooledEdges = ref1d.mesh.baseArea > 0 && c.fin.edges === 'cooled' && isStraight(c);
  const insulated1d = cooledEdges ? models.heatRate1D({ ...c, fin: { ...c.fin, edges: 'insulated' } }, ref1d.mesh.nodes) : ref1d.heatRate;
  const edgeFactor = ref1d.heatRate / insulated1d;
  const heatRate = study.heatRate_W * edgeFactor;
  const finest = study.finest;
  const grids = study.grids.map((g) => `${g.nx}x${g.ny}`).join(', ');
  const order = study.heatRate.observedOrder;
  const section = finest.grid.section === 'planar' ? 'longitudinal section x width' : 'axisymmetric section';
  const edgeNote = cooledEdges ? `; side edges' cooling added from fd-1d (${pct(edgeFactor - 1)})` : '';
  const reference: ReferenceResult = {
    model: 'fd-2d',
    heatRate_W: heatRate,
    efficiency: heatRate / idealHeatRate,
    effectiveness: heatRate / effectivenessScale,
    // The edge factor's own error is fd-1d's (GCI ~1e-8), added to the 2-D GCI.
    discretizationError: study.discretizationError + (cooledEdges ? oneD.study.gci : 0),
    energyBalance: study.energyBalance,
    observedOrder: order,
    grid: { nx: finest.grid.nodesX, ny: finest.grid.nodesY },
    tipTemperature_degC: finest.tipTemperature_degC,
    note: `2-D finite volumes, ${section}, nodes ${grids}; ${study.heatRate.note}${edgeNote}${models.note ? models.note(study) : ''}`,
  };
  const oneDRow: AssumptionRow = {
    assumption: 'one-dimensional conduction (uniform temperature across the thickness)',
    drift: (insulated1d - study.heatRate_W) / study.heatRate_W,
    madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d'],
    method: 'fd-1d vs fd-2d on the same idealisation (side edges insulated in both)',
  };
  return { reference, study, oneDRow };
}

function isStraight(c: Case): boolean {
  const p = c.fin.profile;
  return p.kind !== 'pin' && p.kind !== 'conical-pin' && p.kind !== 'annular' && !(p.kind === 'tabulated' && p.shape === 'pin');
}

function pct(x: number): string {
  return `${x >= 0 ? '+' : ''}${(100 * x).toFixed(2)} %`;
}
