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
 * uncertainty each side, confirmed by a seeded Latin-hypercube sample (sink-sample.ts, JCGM 101:2008) when asked
 * ('always'), or under 'auto' when the sink is nonlinear (k(T), a power-law h) or the band exceeds 20 %
 * (SAMPLE_THRESHOLD) and the sample's work (n x the coarsest grid's unknowns, a Newton solve counted 4 times) is within SINK_SAMPLE_WORK. Each
 * sample point is one fd-3d solve on the study's coarsest grid. Where the sample disagrees with first order by more
 * than twice its sampling error, the band is the sample's.
 */
import { DEFAULT_UNCERTAINTY, sinkNumericInputs, type HeatSinkCase } from '../case/index.js';
import { sinkRiseSlopes, type SinkGridSpec, type SinkRiseSlopes, type SinkRiseVariants, type SinkStudy } from '../fd/index.js';
import { NEWTON_WEIGHT } from './reference-sensitivity.js';
import { SINK_SAMPLE_WORK, sinkSample } from './sink-sample.js';
import type { SinkModelRow, SinkSensitivity, SinkUncertaintyBand } from './sink-types.js';
import { DEFAULT_SAMPLE_SEED, DEFAULT_SAMPLE_SIZE, SAMPLE_THRESHOLD, type SampleWhen } from './uncertainty-band.js';

/** When and how large the Latin-hypercube sample is (check's options). */
export interface SinkSampleOptions {
  when: SampleWhen;
  n: number;
  seed: number;
}

export const SINK_SENSITIVITY_STEP = 1e-3;

export interface SinkSensitivityResult {
  sensitivities: SinkSensitivity[];
  sensitivityMethod: string;
  uncertainty: SinkUncertaintyBand;
}

const pct = (x: number): string => `${Number((100 * x).toPrecision(3))} %`;

/** What the slopes of a study's sensitivities are computed from: the grid, the hottest source, each input's two variants. */
export interface SinkSlopeTask {
  spec: SinkGridSpec;
  source: number;
  variants: SinkRiseVariants[];
  step: number;
}

/** null when the study carries no grid to re-solve on (a study built by hand). */
export function sinkSlopeTask(c: HeatSinkCase, study: SinkStudy): SinkSlopeTask | null {
  const finest = study.finestGrid;
  if (finest === undefined) return null;
  return sinkSlopeTaskOn(c, { ...finest, refine: Math.max(1, finest.refine / 2) }, hottestSource(study));
}

/** The slopes of `source`'s rise on the grid `spec`. */
export function sinkSlopeTaskOn(c: HeatSinkCase, spec: SinkGridSpec, source: number): SinkSlopeTask {
  const d = SINK_SENSITIVITY_STEP;
  return { spec, source, variants: sinkNumericInputs(c).map((input) => ({ plus: input.scale(1 + d), minus: input.scale(1 - d) })), step: d };
}

/** The source of the largest mean rise (the first of equals). */
export function hottestSource(study: SinkStudy): number {
  let hottest = 0;
  study.sources.forEach((s, j) => {
    if (s.meanRise_K > (study.sources[hottest]?.meanRise_K ?? -Infinity)) hottest = j;
  });
  return hottest;
}

/**
 * null when the study carries no grid to re-solve on (a study built by hand). `computed`: the slopes of
 * sinkSlopeTask(c, study) found elsewhere (the check's second thread); without them they are computed here.
 */
export function sinkSensitivity(
  c: HeatSinkCase,
  study: SinkStudy,
  sampleOptions: SinkSampleOptions = { when: 'auto', n: DEFAULT_SAMPLE_SIZE, seed: DEFAULT_SAMPLE_SEED },
  computed?: SinkRiseSlopes,
): SinkSensitivityResult | null {
  const task = sinkSlopeTask(c, study);
  const finest = study.finestGrid;
  if (task === null || finest === undefined) return null;
  const unknowns = study.unknowns[finest.refine > 1 ? 1 : 0] ?? '?';
  const hottest = task.source;
  const d = task.step;
  const given = new Map((c.uncertainty ?? DEFAULT_UNCERTAINTY).map((u) => [u.key, u.relative]));
  const inputs = sinkNumericInputs(c);
  // Linear sinks: one adjoint solve for every input; a variant whose grid changes shape, and nonlinear sinks, by re-solves.
  const found = computed ?? sinkRiseSlopes(c, task.spec, hottest, task.variants, d);
  const rise0 = found.rise;
  const resolved = found.slopes.filter((s) => s.method === 'central-difference').length;
  const sensitivities = inputs.map((input, k) => {
    const slope = found.slopes[k];
    if (slope === undefined) throw new Error(`sinkSensitivity: no slope for ${input.key}`);
    return {
      key: input.key,
      dlnRise_dlnx: slope.slope / rise0,
      method: slope.method,
      value: input.nominal,
      uncertainty: given.get(input.key) ?? 0,
    };
  });
  const methodText = !found.adjoint
    ? `central differences of fd-3d on the study's second-finest grid (${unknowns} unknowns, held fixed), relative step ${d}, each re-solve started from the case's solution: two re-solves per input`
    : `adjoint of fd-3d on the study's second-finest grid (${unknowns} unknowns, held fixed): one adjoint solve for all inputs, the system's change with each input by central differences of the assembly (relative step ${d}), exact for the discrete system up to O(step^2) in the dimensions` +
      (resolved > 0 ? `; ${resolved} input(s) change the grid's cell counts and were re-solved (two re-solves each)` : '');
  const firstOrder = Math.sqrt(sensitivities.reduce((sum, s) => sum + (s.dlnRise_dlnx * s.uncertainty) ** 2, 0));
  const h = sensitivities.find((s) => s.key === 'convection.h');
  const uncertain = sensitivities.filter((s) => s.uncertainty > 0);
  const riseRef = study.sources[hottest]?.meanRise_K ?? rise0;
  const name = study.sources[hottest]?.name ?? `source ${hottest}`;
  // The sample: on the study's coarsest grid (refine 1).
  const coarsest = { ...finest, refine: 1 };
  const coarsestUnknowns = study.unknowns[study.unknowns.length - 1] ?? 0;
  const nonlinear = isNonlinearCase(c);
  // A Newton solve counted as NEWTON_WEIGHT linear ones, as for a fin (reference-sensitivity.ts).
  const work = sampleOptions.n * coarsestUnknowns * (nonlinear ? NEWTON_WEIGHT : 1);
  const wanted = nonlinear || firstOrder > SAMPLE_THRESHOLD;
  const affordable = work <= SINK_SAMPLE_WORK;
  const due = sampleOptions.when === 'always' || (sampleOptions.when === 'auto' && wanted && affordable);
  const gridWords = `fd-3d on the study's coarsest grid (${coarsestUnknowns} unknowns), one solve a point`;
  const sample =
    due && uncertain.length > 0
      ? sinkSample(c, uncertain, firstOrder, hottest, riseRef, { n: sampleOptions.n, seed: sampleOptions.seed, grid: coarsest, gridWords })
      : null;
  const useSample = sample !== null && !sample.agrees;
  const why =
    uncertain.length === 0
      ? 'no input has a stated uncertainty'
      : sample === null
        ? sampleOptions.when === 'never'
          ? 'no sample drawn (switched off)'
          : wanted
            ? `first order only, not confirmed by a sample: its ${work.toExponential(1)} unknowns x solves exceed the automatic budget of ${SINK_SAMPLE_WORK.toExponential(0)}; a sample asked for explicitly is drawn whatever its cost`
            : `first order only: the sink is linear and the band is within ${100 * SAMPLE_THRESHOLD} % (the rise linearised about the case)`
        : sample.agrees
          ? `confirmed by a Latin-hypercube sample of ${sample.n} (seed ${sample.seed}, ${sample.grid}): ${pct(sample.relative)} +/- ${pct(sample.samplingError)}`
          : `a Latin-hypercube sample of ${sample.n} (seed ${sample.seed}, ${sample.grid}) gives ${pct(sample.relative)} +/- ${pct(sample.samplingError)}, more than twice its sampling error from first order (${pct(firstOrder)}): the band is the sample's`;
  return {
    sensitivities,
    sensitivityMethod: methodText,
    uncertainty: {
      method: useSample ? 'latin-hypercube' : 'first-order',
      relative: useSample ? sample.relative : firstOrder,
      low_K: useSample ? sample.low_K : riseRef * (1 - firstOrder),
      high_K: useSample ? sample.high_K : riseRef * (1 + firstOrder),
      firstOrder,
      fromH: h === undefined ? 0 : Math.abs(h.dlnRise_dlnx * h.uncertainty),
      sample,
      source: name,
      note: `One standard uncertainty of ${name}'s mean rise from ${uncertain.map((s) => `${s.key} ${pct(s.uncertainty)}`).join(', ') || 'nothing'}; first order, sqrt(sum (S u)^2) = ${pct(firstOrder)}; ${why}`,
    },
  };
}

/** A sink whose rise is not linear in its inputs: a conductivity table (fins or plate) or a power-law h. */
function isNonlinearCase(c: HeatSinkCase): boolean {
  const tabled = (k: { kind: string }): boolean => k.kind !== 'constant';
  return (c.fin !== null && tabled(c.fin.material.k)) || tabled(c.plate.material.k) || (c.fin !== null && c.convection.h.kind === 'power');
}

/** Each model row's |drift| (its worst source) over the band of the hottest source's rise. */
export function sinkRowsWithBand(rows: SinkModelRow[], band: SinkUncertaintyBand): (SinkModelRow & { driftOverUncertainty: number | null })[] {
  return rows.map((r) => ({ ...r, driftOverUncertainty: band.relative > 0 ? Math.abs(r.drift) / band.relative : null }));
}
