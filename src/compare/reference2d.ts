/**
 * The 2-D reference of `fincheck check`: fd-2d across the thickness, and the one-dimensional
 * conduction row of the assumption ledger.
 *
 * fd-2d solves the longitudinal section (straight fins, times the width: insulated side edges) or the
 * axisymmetric section (pins, annular fins). Where a straight fin's side edges are cooled, the reference
 * adds the edges' heat measured by fd-1d on one grid (Q_1D,cooled - Q_1D,insulated), a correction of order
 * t/w; the note says how large it is. The one-dimensional conduction drift compares fd-1d with fd-2d on
 * the same idealisation (insulated edges in both): (Q_1D - Q_2D) / Q_2D.
 * Linear and nonlinear fins alike: the studies come from the one study (studyFin), which solves a
 * nonlinear fin by Newton's method; the caller asks modelApplies(problem, '2d') before it studies the fin.
 * Units: W, K.
 */
import type { Case } from '../case/index.js';
import type { FinStudy1D, FinStudy2D, RefinementStudy } from '../fd/index.js';
import { effectivenessOf, type EffectivenessBasis } from './effectiveness-basis.js';
import type { AssumptionRow, UnjudgedReference } from './types.js';

/** The fd-1d solution of a variant of the case on one grid of `nodes` nodes (the check's own solvers). */
export type Solve1D = (variant: Case, nodes: number) => FinStudy1D;

export interface Reference2D {
  reference: UnjudgedReference;
  study: FinStudy2D;
  /** The ledger row "one-dimensional conduction". */
  oneDRow: AssumptionRow;
  /**
   * Q_ideal of the surface the 2-D model cools (true sloped faces; plus the side edges from fd-1d when
   * they are cooled), W; null for an infinite tip (efficiency-basis.ts).
   */
  idealHeatRate: number | null;
}

/**
 * The fd-2d reference from the 2-D study of the case and its fd-1d study. `effectiveness` holds the bare
 * base's heat (W), `solve1D` the check's fd-1d solve of a variant, `extraNote` is appended to the note.
 */
export function reference2D(
  c: Case,
  oneD: FinStudy1D,
  study: FinStudy2D,
  effectiveness: EffectivenessBasis,
  solve1D: Solve1D,
  extraNote: string,
): Reference2D {
  const edges = sideEdgeCorrection(c, oneD, solve1D);
  const { cooledEdges, insulatedHeatRate1D_W: insulated1d } = edges;
  // The study's best value: Richardson-extrapolated where the grids give it an error estimate of its own
  // (fd/study/refinement.ts, extrapolationError), else the finest grid's with its GCI.
  const extrapolated = study.extrapolated;
  const section2D = extrapolated === null ? study.heatRate_W : extrapolated.heatRate_W;
  const heatRate = section2D + edges.edgeHeatRate_W;
  const edgeFactor = heatRate / section2D;
  const finest = study.finest;
  // A study (never a single grid) has its refinement.
  const refinement = study.refinement as RefinementStudy;
  const grids = study.grids.map((g) => `${g.nx}x${g.ny}`).join(', ');
  const section = finest.grid.section === 'planar' ? 'longitudinal section x width' : 'axisymmetric section';
  const edgeNote = cooledEdges ? `; side edges' cooling added from fd-1d (${pct(edgeFactor - 1)})` : '';
  const sectionIdeal = finest.efficiency === null ? null : finest.heatRate_W / finest.efficiency;
  const ideal2D = sectionIdeal === null ? null : sectionIdeal + edges.edgesIdealHeatRate_W;
  const reference: UnjudgedReference = {
    model: 'fd-2d',
    heatRate_W: heatRate,
    effectiveness: effectivenessOf(heatRate, effectiveness),
    // The edge factor's own error is fd-1d's (GCI ~1e-8), added to the 2-D estimate.
    discretizationError: (extrapolated === null ? refinement.gci : extrapolated.error) + edges.discretizationError,
    heatRateFrom: extrapolated === null ? 'finest-grid' : 'extrapolated',
    finestGridHeatRate_W: study.heatRate_W + edges.edgeHeatRate_W,
    finestGridDiscretizationError: refinement.gci + edges.discretizationError,
    energyBalance: study.energyBalance,
    observedOrder: refinement.observedOrder,
    grid: { nx: finest.grid.nodesX, ny: finest.grid.nodesY },
    tipTemperature_degC: extrapolated === null ? finest.tipTemperature_degC : extrapolated.tipTemperature_degC,
    note: `2-D finite volumes, ${section}, nodes ${grids}; ${refinement.note}${extrapolationNote(extrapolated !== null)}${edgeNote}${extraNote}`,
  };
  const oneDRow: AssumptionRow = {
    assumption: 'one-dimensional conduction (uniform temperature across the thickness)',
    drift: (insulated1d - section2D) / section2D,
    madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d'],
    method: 'fd-1d vs fd-2d on the same idealisation (side edges insulated in both)',
  };
  return { reference, study, oneDRow, idealHeatRate: ideal2D };
}

/** How the reference's value was obtained, for its note. */
function extrapolationNote(extrapolated: boolean): string {
  return extrapolated
    ? '; Richardson-extrapolated value, its error estimated from one more, coarser grid (Roache 1998)'
    : '; finest-grid value (the grids support no error estimate of the extrapolated value)';
}

/** Q_ideal does not depend on the grid (exact integrals of the geometry): the coarsest grid gives it. */
const IDEAL_NODES = 3;

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
  /** fd-1d's Q_ideal of the edges alone, Q_ideal,1D(cooled) - Q_ideal,1D(insulated), W (0 when not cooledEdges). */
  edgesIdealHeatRate_W: number;
  /** Error the edges' heat adds: fd-1d's GCI when cooledEdges, else 0. */
  discretizationError: number;
}

export function sideEdgeCorrection(c: Case, oneD: FinStudy1D, solve1D: Solve1D): SideEdgeCorrection {
  const ref1d = oneD.finest;
  const cooledEdges = ref1d.mesh.baseArea > 0 && c.fin.edges === 'cooled' && isStraight(c);
  const insulatedCase: Case = { ...c, fin: { ...c.fin, edges: 'insulated' } };
  const insulated = cooledEdges ? solve1D(insulatedCase, ref1d.mesh.nodes).heatRate_W : ref1d.heatRate;
  return {
    cooledEdges,
    edgeHeatRate_W: ref1d.heatRate - insulated,
    insulatedHeatRate1D_W: insulated,
    edgesIdealHeatRate_W: cooledEdges ? ref1d.idealHeatRate - solve1D(insulatedCase, IDEAL_NODES).idealHeatRate_W : 0,
    discretizationError: cooledEdges ? (oneD.discretizationError ?? Number.NaN) : 0,
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
