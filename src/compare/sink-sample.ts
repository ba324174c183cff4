/**
 * The Latin-hypercube confirmation of a heat sink's uncertainty band (the sink's form of uncertainty-band.ts):
 * propagation of distributions by sampling (JCGM 101:2008, "Evaluation of measurement data - Supplement 1 to the
 * GUM - Propagation of distributions using a Monte Carlo method", with a Latin-hypercube design, McKay, Beckman &
 * Conover 1979; latin-hypercube.ts). Each uncertain input x of the sink (sink-numeric-inputs.ts) is drawn as
 * x (1 + u_x z), z a standard normal truncated to physical values (sizes, h and k above 1 % of nominal), and the
 * hottest source's mean rise r is solved for every point: fd-3d on ONE grid, the coarsest of the check's study
 * (a relative spread depends on the grid only through the discretisation error, a few 1e-3 of itself there;
 * Newton where the sink is nonlinear, src/fd studySink with grids: 1).
 * The sample's relative spread is s_r / r_0 (sample standard deviation over the nominal rise on the same grid),
 * its standard error (s_r / r_0) / sqrt(2 (n - 1)) (normal theory; a Latin hypercube does at least as well). It
 * agrees with first order when the two differ by at most twice that error; its band is the 15.9 and 84.1
 * percentiles (Hyndman & Fan 1996, definition 7), scaled to the reference's rise.
 * When it is drawn (sink-sensitivity.ts): always when asked; under 'auto' when the sink is nonlinear or the first-order
 * band exceeds SAMPLE_THRESHOLD (20 %), and n x (the coarsest grid's unknowns) stays within SINK_SAMPLE_WORK.
 */
import { sinkNumericInputs, type HeatSinkCase } from '../case/index.js';
import { studySink, type SinkGridSpec } from '../fd/index.js';
import { latinHypercubeNormal, type NormalBounds } from './latin-hypercube.js';
import type { SinkSensitivity, SinkUncertaintySample } from './sink-types.js';
import { sampleStatistics } from './uncertainty-band.js';

/**
 * Unknowns x solves the automatic sample may take: 200 solves of a 2000-unknown grid. Measured on the demo sink
 * (demo/motor-drive-sink.yaml: coarsest grid 1258 unknowns) 1.4 s of CPU for the 200 solves at load 9 on the 2-core
 * machine, against 3.0 s for the rest of its check (common practice, no source: a confirmation should not much more
 * than double a check's time).
 */
export const SINK_SAMPLE_WORK = 4e5;
/** Lowest factor a size, h or k is drawn at (as for a fin, uncertainty-band.ts). */
const LOWEST_FACTOR = 0.01;

/** The sample of the rise of source `hottest` (index) over the uncertain inputs, on the study's coarsest grid. */
export function sinkSample(
  c: HeatSinkCase,
  uncertain: readonly SinkSensitivity[],
  firstOrder: number,
  hottest: number,
  riseRef: number,
  setup: { n: number; seed: number; grid: SinkGridSpec; gridWords: string },
): SinkUncertaintySample {
  const inputs = sinkNumericInputs(c);
  const bounds: NormalBounds[] = uncertain.map((s) => {
    const input = inputs.find((i) => i.key === s.key);
    const lowest = input === undefined ? LOWEST_FACTOR : input.minFactor >= 0 ? Math.max(input.minFactor, LOWEST_FACTOR) : input.minFactor;
    const highest = input === undefined ? Number.POSITIVE_INFINITY : input.maxFactor;
    return { lower: (lowest - 1) / s.uncertainty, upper: (highest - 1) / s.uncertainty };
  });
  const g = setup.grid;
  const rise = (variant: HeatSinkCase): number =>
    studySink(variant, { cellSize: g.cellSize, plateLayers: g.plateLayers, finLayers: g.finLayers, finRepresentation: g.finRepresentation, grids: 1 })
      .sources[hottest]?.meanRise_K ?? Number.NaN;
  const nominal = rise(c);
  const rises = latinHypercubeNormal(setup.n, bounds, setup.seed).map((z) => {
    let variant = c;
    uncertain.forEach((s, j) => {
      const input = sinkNumericInputs(variant).find((i) => i.key === s.key);
      if (input !== undefined) variant = input.scale(1 + s.uncertainty * (z[j] as number));
    });
    return rise(variant);
  });
  const stats = sampleStatistics(rises, nominal, firstOrder);
  return {
    method: 'latin-hypercube',
    n: stats.n,
    seed: setup.seed,
    relative: stats.relative,
    samplingError: stats.samplingError,
    agrees: stats.agrees,
    grid: setup.gridWords,
    low_K: riseRef * stats.lowFactor,
    high_K: riseRef * stats.highFactor,
  };
}
