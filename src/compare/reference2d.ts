/**
 * The 2-D reference of `fincheck check`: fd-2d across the thickness, and the one-dimensional
 * conduction row of the assumption ledger.
 *
 * fd-2d solves the longitudinal section (straight fins, times the width: insulated side edges) or the
 * axisymmetric section (pins, annular fins). Where a straight fin's side edges are cooled, the reference
 * adds their effect measured by fd-1d on one grid (Q_1D,cooled / Q_1D,insulated), a correction of order
 * t/w; the note says how large it is. The one-dimensional conduction drift compares fd-1d with fd-2d on
 * the same idealisation (insulated edges in both): (Q_1D - Q_2D) / Q_2D.
 * Units: W, K.
 */
import { UsageError } from '../errors.js';
import { solveFin1D, type Fin1DStudy } from '../fd/fin1d.js';
import type { LinearFinCase } from '../fd/linear-case.js';
import { studyFin2D, type Fin2DStudy } from '../fd/fin2dStudy.js';
import type { AssumptionRow, ReferenceResult } from './types.js';

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
  let study: Fin2DStudy;
  try {
    study = studyFin2D(c);
  } catch (e) {
    if (!required && e instanceof UsageError) return null;
    throw e;
  }
  const ref1d = oneD.result;
  const cooledEdges = ref1d.mesh.baseArea > 0 && c.fin.edges === 'cooled' && isStraight(c);
  const insulated1d = cooledEdges
    ? solveFin1D({ ...c, fin: { ...c.fin, edges: 'insulated' } }, { nodes: ref1d.mesh.nodes }).heatRate
    : ref1d.heatRate;
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
    note: `2-D finite volumes, ${section}, nodes ${grids}; ${study.heatRate.note}${edgeNote}`,
  };
  const oneDRow: AssumptionRow = {
    assumption: 'one-dimensional conduction (uniform temperature across the thickness)',
    drift: (insulated1d - study.heatRate_W) / study.heatRate_W,
    madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d'],
    method: 'fd-1d vs fd-2d on the same idealisation (side edges insulated in both)',
  };
  return { reference, study, oneDRow };
}

function isStraight(c: LinearFinCase): boolean {
  const p = c.fin.profile;
  return p.kind !== 'pin' && p.kind !== 'conical-pin' && p.kind !== 'annular' && !(p.kind === 'tabulated' && p.shape === 'pin');
}

function pct(x: number): string {
  return `${x >= 0 ? '+' : ''}${(100 * x).toFixed(2)} %`;
}
