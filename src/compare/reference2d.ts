/**
 * The 2-D reference of `fincheck check`: fd-2d across the thickness, and the one-dimensional
 * conduction row of the assumption ledger.
 *
 * fd-2d solves the longitudinal section (straight fins, times the width: insulated side edges) or the
 * axisymmetric section (pins, annular fins). Where a straight fin's side edges are cooled, the reference
 * adds their effect measured by fd-1d on one grid (Q_1D,cooled / Q_1D,insulated), a correction of order
 * t/w; the note says how large it is. The one-dimensional conduction drift compares fd-1d with fd-2d on
 * the same idealisation (insulated edges in both): (Q_1D - Q_2D) / Q_2D.
 * Nonlinear fins use the same construction: the studies come from the one study (studyFin), which solves
 * them by Newton's method.
 * Units: W, K.
 */
import type { Case } from '../case/index.js';
import type { FinStudy1D, FinStudy2D } from '../fd/index.js';
import type { AssumptionRow, ReferenceResult } from './types.js';

export interface Reference2D {
  reference: ReferenceResult;
  study: FinStudy2D;
  /** The ledger row "one-dimensional conduction". */
  oneDRow: AssumptionRow;
}

/**
 * The fd-2d reference from the 2-D study of the case and its fd-1d study. `heatRate1D(variant, nodes)` is
 * the fd-1d heat rate of a variant of the case on one grid (W); `extraNote` is appended to the note.
 */
export function reference2D(
  c: Case,
  oneD: FinStudy1D,
  study: FinStudy2D,
  idealHeatRate: number,
  effectivenessScale: number,
  heatRate1D: (variant: Case, nodes: number) => number,
  extraNote: string,
): Reference2D {
  const ref1d = oneD.finest;
  const cooledEdges = ref1d.mesh.baseArea > 0 && c.fin.edges === 'cooled' && isStraight(c);
  const insulated1d = cooledEdges ? heatRate1D({ ...c, fin: { ...c.fin, edges: 'insulated' } }, ref1d.mesh.nodes) : ref1d.heatRate;
  const edgeFactor = ref1d.heatRate / insulated1d;
  const heatRate = study.heatRate_W * edgeFactor;
  const finest = study.finest;
  const grids = study.grids.map((g) => `${g.nx}x${g.ny}`).join(', ');
  const refinement = study.refinement;
  const order = refinement === null ? null : refinement.observedOrder;
  const section = finest.grid.section === 'planar' ? 'longitudinal section x width' : 'axisymmetric section';
  const edgeNote = cooledEdges ? `; side edges' cooling added from fd-1d (${pct(edgeFactor - 1)})` : '';
  const discretizationError = study.discretizationError ?? Number.NaN;
  const reference: ReferenceResult = {
    model: 'fd-2d',
    heatRate_W: heatRate,
    efficiency: heatRate / idealHeatRate,
    effectiveness: heatRate / effectivenessScale,
    // The edge factor's own error is fd-1d's (GCI ~1e-8), added to the 2-D GCI.
    discretizationError: discretizationError + (cooledEdges ? (oneD.discretizationError ?? Number.NaN) : 0),
    energyBalance: study.energyBalance,
    observedOrder: order,
    grid: { nx: finest.grid.nodesX, ny: finest.grid.nodesY },
    tipTemperature_degC: finest.tipTemperature_degC,
    note: `2-D finite volumes, ${section}, nodes ${grids}; ${refinement === null ? 'one grid' : refinement.note}${edgeNote}${extraNote}`,
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
