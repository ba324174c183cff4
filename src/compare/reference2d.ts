/**
 * The 2-D reference of `fincheck check`: fd-2d across the thickness, and the one-dimensional
 * conduction row of the assumption ledger.
 *
 * fd-2d solves the longitudinal section (straight fins, times the width: insulated side edges) or the
 * axisymmetric section (pins, annular fins). Where a straight fin's side edges are cooled, the reference
 * adds the edges' heat measured by fd-1d on one grid (Q_1D,cooled - Q_1D,insulated), a correction of order
 * t/w; the note says how large it is. The one-dimensional conduction drift compares fd-1d with fd-2d on
 * the same idealisation (insulated edges in both): (Q_1D - Q_2D) / Q_2D.
 * Nonlinear fins (check-nonlinear.ts) use the same construction with their own solvers (Newton in 1-D and
 * 2-D): `reference2DWith` takes the models as functions.
 * Units: W, K.
 */
import type { Case } from '../case/index.js';
import { UsageError } from '../errors.js';
import { solveFin1D, type Fin1DStudy, type LinearFinCase, tipBoundary, idealHeatRate, studyFin2D, type Fin2DStudy } from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import type { AssumptionRow, UnjudgedReference } from './types.js';

/** The solvers behind a 2-D reference. */
export interface Reference2DModels<C extends Case> {
  /** fd-2d refinement study of the case (a UsageError when the 2-D model does not cover it). */
  study2D: (c: C) => Fin2DStudy;
  /** fd-1d heat rate of a variant of the case on `nodes` nodes, W. */
  heatRate1D: (variant: C, nodes: number) => number;
  /** fd-1d Q_ideal of a variant of the case (every cooled surface at the base temperature), W. */
  idealHeatRate1D: (variant: C) => number;
  /** Words appended to the reference note. */
  note?: (study: Fin2DStudy) => string;
}

const LINEAR_MODELS: Reference2DModels<LinearFinCase> = {
  study2D: (c) => studyFin2D(c),
  heatRate1D: (variant, nodes) => solveFin1D(variant, { nodes }).heatRate,
  idealHeatRate1D: (variant) =>
    idealHeatRate(finGeometry(variant), variant.convection.h, tipBoundary(variant), variant.base.T_degC - variant.convection.ambient_degC),
};

export interface Reference2D {
  reference: UnjudgedReference;
  study: Fin2DStudy;
  /** The ledger row "one-dimensional conduction". */
  oneDRow: AssumptionRow;
  /**
   * Q_ideal of the surface the 2-D model cools (true sloped faces; plus the side edges from fd-1d when
   * they are cooled), W; null for an infinite tip (efficiency-basis.ts).
   */
  idealHeatRate: number | null;
}

/**
 * fd-2d reference, or null when the case is outside the 2-D model and `required` is false
 * (then an automatic reference keeps fd-1d).
 */
export function reference2D(c: LinearFinCase, oneD: Fin1DStudy, ideal1D: number, effectivenessScale: number, required: boolean): Reference2D | null {
  return reference2DWith(c, oneD, ideal1D, effectivenessScale, required, LINEAR_MODELS);
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
  const edges = sideEdgeCorrection(c, oneD, models.heatRate1D);
  const { cooledEdges, insulatedHeatRate1D_W: insulated1d } = edges;
  const heatRate = study.heatRate_W + edges.edgeHeatRate_W;
  const edgeFactor = heatRate / study.heatRate_W;
  const finest = study.finest;
  const grids = study.grids.map((g) => `${g.nx}x${g.ny}`).join(', ');
  const order = study.heatRate.observedOrder;
  const section = finest.grid.section === 'planar' ? 'longitudinal section x width' : 'axisymmetric section';
  const edgeNote = cooledEdges ? `; side edges' cooling added from fd-1d (${pct(edgeFactor - 1)})` : '';
  const sectionIdeal = finest.efficiency === null ? null : finest.heatRate_W / finest.efficiency;
  const edgesIdeal = cooledEdges ? idealHeatRate - models.idealHeatRate1D({ ...c, fin: { ...c.fin, edges: 'insulated' } }) : 0;
  const ideal2D = sectionIdeal === null ? null : sectionIdeal + edgesIdeal;
  const reference: UnjudgedReference = {
    model: 'fd-2d',
    heatRate_W: heatRate,
    effectiveness: heatRate / effectivenessScale,
    // The edge factor's own error is fd-1d's (GCI ~1e-8), added to the 2-D GCI.
    discretizationError: study.discretizationError + edges.discretizationError,
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
  return { reference, study, oneDRow, idealHeatRate: ideal2D };
}

/**
 * The side edges of a straight fin, which fd-2d (a section times the width) sees insulated: when the case
 * cools them, fd-1d measures their own heat on one grid, Q_1D(cooled) - Q_1D(insulated), and the whole-fin
 * 2-D heat rate is the section's plus that heat (0 otherwise). Added, not applied as the ratio
 * Q_1D(cooled) / Q_1D(insulated): on a stubby tapered fin the thin-fin faces are a small part of the true
 * sloped faces, and the ratio (+40 % for a 2 mm long, 40 mm thick triangle) would scale the much larger
 * 2-D face heat. Used by check's reference and by `solve` with the 2-D model, so both print the same
 * whole-fin heat rate.
 */
export interface SideEdgeCorrection {
  /** A straight fin whose side edges the case cools. */
  cooledEdges: boolean;
  /** Q_1D(cooled) - Q_1D(insulated), W (0 when the edges are insulated or the fin is not straight). */
  edgeHeatRate_W: number;
  /** fd-1d heat rate with the edges insulated (the fd-1d heat rate itself when not cooledEdges), W. */
  insulatedHeatRate1D_W: number;
  /** Error the edges' heat adds: fd-1d's GCI when cooledEdges, else 0. */
  discretizationError: number;
}

export function sideEdgeCorrection<C extends Case>(c: C, oneD: Fin1DStudy, heatRate1D: (variant: C, nodes: number) => number): SideEdgeCorrection {
  const ref1d = oneD.result;
  const cooledEdges = ref1d.mesh.baseArea > 0 && c.fin.edges === 'cooled' && isStraight(c);
  const insulated = cooledEdges ? heatRate1D({ ...c, fin: { ...c.fin, edges: 'insulated' } }, ref1d.mesh.nodes) : ref1d.heatRate;
  return {
    cooledEdges,
    edgeHeatRate_W: ref1d.heatRate - insulated,
    insulatedHeatRate1D_W: insulated,
    discretizationError: cooledEdges ? oneD.study.gci : 0,
  };
}

/** Whether the fin is straight (has side edges): not a pin, conical pin, annular fin or tabulated pin. */
export function isStraight(c: Case): boolean {
  const p = c.fin.profile;
  return p.kind !== 'pin' && p.kind !== 'conical-pin' && p.kind !== 'annular' && !(p.kind === 'tabulated' && p.shape === 'pin');
}

function pct(x: number): string {
  return `${x >= 0 ? '+' : ''}${(100 * x).toFixed(2)} %`;
}
