/**
 * How sure a heat sink's check is of its inputs: S_x = d ln rise / d ln x of the hottest source's mean rise over
 * ambient (fd-3d) for every numeric input of the case (src/case sink-numeric-inputs.ts), on the second-finest grid
 * of the reference's study held fixed (the finest costs about 8 times as much; on the 4-fin sink of
 * tests/sensitivity the S of the two grids differ by 0.2 % (h) to 3 % (plate thickness) of themselves, far below
 * what an uncertainty band needs).
 * Linear sinks: the adjoint of the discrete system (src/fd sink-adjoint.ts): one adjoint solve for all inputs,
 * the system's change with each input by central differences of the assembly between x (1 + d) and x (1 - d),
 * d = 1e-3 (SINK_SENSITIVITY_STEP). Where a variant's grid changes its cell counts, and for nonlinear sinks, by
 * re-solves:
 *   S_x = (rise(x (1 + d)) - rise(x (1 - d))) / (2 d rise(x)),
 * each re-solve started from the case's own solution on that grid (CG to a relative residual of 1e-10: its error
 * over the step is ~1e-7 of S; the truncation error d^2 S'''/6 ~ 1e-7 too). The two agree to 1e-6 (tests). The
 * rise is linear in the sources' powers, so every S of a power is the share of the rise that source causes.
 * The band: first order (uncertainty-band.ts, JCGM 100:2008 eq. 10), sqrt(sum (S u)^2) of the rise, one standard
 * uncertainty each side. No Latin-hypercube sample for a sink: 200 fd-3d solves of ~1 s each are not a check's
 * cost; the note says so, and that first order is the linearisation of the rise about the case.
 */
import { DEFAULT_UNCERTAINTY, sinkNumericInputs, type HeatSinkCase } from '../case/index.js';
import { sinkGridAdjoint, solveSinkOnGrid, type SinkGridSolution, type SinkStudy } from '../fd/index.js';
import type { SinkModelRow, SinkSensitivity, SinkUncertaintyBand } from './sink-types.js';

export const SINK_SENSITIVITY_STEP = 1e-3;

export interface SinkSensitivityResult {
  sensitivities: SinkSensitivity[];
  sensitivityMethod: string;
  uncertainty: SinkUncertaintyBand;
}

const pct = (x: number): string => `${Number((100 * x).toPrecision(3))} %`;

/** null when the study carries no grid to re-solve on (a study built by hand). */
export function sinkSensitivity(c: HeatSinkCase, study: SinkStudy): SinkSensitivityResult | null {
  const finest = study.finestGrid;
  if (finest === undefined) return null;
  const spec = { ...finest, refine: Math.max(1, finest.refine / 2) };
  const unknowns = study.unknowns[finest.refine > 1 ? 1 : 0] ?? '?';
  let hottest = 0;
  study.sources.forEach((s, j) => {
    if (s.meanRise_K > (study.sources[hottest]?.meanRise_K ?? -Infinity)) hottest = j;
  });
  const d = SINK_SENSITIVITY_STEP;
  const given = new Map((c.uncertainty ?? DEFAULT_UNCERTAINTY).map((u) => [u.key, u.relative]));
  const inputs = sinkNumericInputs(c);
  // Linear sinks: one adjoint solve for every input; a variant whose grid changes shape, and nonlinear sinks, by re-solves.
  const adjoint = sinkGridAdjoint(c, spec, hottest);
  let nominal: SinkGridSolution | null = null;
  const resolve = (): SinkGridSolution => (nominal ??= solveSinkOnGrid(c, spec));
  const rise0 = adjoint?.rise ?? (resolve().sourceMeanRise[hottest] as number);
  const rise = (variant: HeatSinkCase): number => solveSinkOnGrid(variant, spec, resolve().theta).sourceMeanRise[hottest] as number;
  let resolved = 0;
  const sensitivities = inputs.map((input) => {
    const plus = input.scale(1 + d);
    const minus = input.scale(1 - d);
    const fromAdjoint = adjoint?.dRise_dlnx(plus, minus, d) ?? null;
    if (fromAdjoint === null) resolved++;
    const slope = fromAdjoint ?? (rise(plus) - rise(minus)) / (2 * d);
    return {
      key: input.key,
      dlnRise_dlnx: slope / rise0,
      method: fromAdjoint === null ? ('central-difference' as const) : ('adjoint' as const),
      value: input.nominal,
      uncertainty: given.get(input.key) ?? 0,
    };
  });
  const methodText =
    adjoint === null
      ? `central differences of fd-3d on the study's second-finest grid (${unknowns} unknowns, held fixed), relative step ${d}, each re-solve started from the case's solution: two re-solves per input`
      : `adjoint of fd-3d on the study's second-finest grid (${unknowns} unknowns, held fixed): one adjoint solve for all inputs, the system's change with each input by central differences of the assembly (relative step ${d}), exact for the discrete system up to O(step^2) in the dimensions` +
        (resolved > 0 ? `; ${resolved} input(s) change the grid's cell counts and were re-solved (two re-solves each)` : '');
  const firstOrder = Math.sqrt(sensitivities.reduce((sum, s) => sum + (s.dlnRise_dlnx * s.uncertainty) ** 2, 0));
  const h = sensitivities.find((s) => s.key === 'convection.h');
  const uncertain = sensitivities.filter((s) => s.uncertainty > 0);
  const riseRef = study.sources[hottest]?.meanRise_K ?? rise0;
  const name = study.sources[hottest]?.name ?? `source ${hottest}`;
  return {
    sensitivities,
    sensitivityMethod: methodText,
    uncertainty: {
      method: 'first-order',
      relative: firstOrder,
      low_K: riseRef * (1 - firstOrder),
      high_K: riseRef * (1 + firstOrder),
      firstOrder,
      fromH: h === undefined ? 0 : Math.abs(h.dlnRise_dlnx * h.uncertainty),
      sample: null,
      source: name,
      note: `One standard uncertainty of ${name}'s mean rise from ${uncertain.map((s) => `${s.key} ${pct(s.uncertainty)}`).join(', ') || 'nothing'}; first order, sqrt(sum (S u)^2) = ${pct(firstOrder)}; no sample for a heat sink (200 fd-3d solves): first order is the rise linearised about the case`,
    },
  };
}

/** Each model row's |drift| (its worst source) over the band of the hottest source's rise. */
export function sinkRowsWithBand(rows: SinkModelRow[], band: SinkUncertaintyBand): (SinkModelRow & { driftOverUncertainty: number | null })[] {
  return rows.map((r) => ({ ...r, driftOverUncertainty: band.relative > 0 ? Math.abs(r.drift) / band.relative : null }));
}
