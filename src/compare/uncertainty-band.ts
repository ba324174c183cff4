/**
 * The uncertainty band of the reference heat rate from the inputs' standard uncertainties u_x (relative, the
 * case's `uncertainty` key; default h 25 %).
 *
 * First order (linear propagation of independent uncertainties, JCGM 100:2008 "Guide to the expression of
 * uncertainty in measurement", eq. 10, in relative form):
 *   u_Q / Q = sqrt( sum_x (S_x u_x)^2 ),   S_x = d ln Q / d ln x (sensitivities.ts).
 * The band is Q (1 -+ u_Q / Q): one standard uncertainty either side.
 *
 * First order assumes Q linear in every input over +-u_x. It is confirmed by a seeded Latin-hypercube sample
 * (latin-hypercube.ts; JCGM 101:2008, propagation of distributions by a Monte Carlo method) when the fin is
 * nonlinear (h(theta), k(T), radiation) or the first-order band exceeds SAMPLE_THRESHOLD = 20 % (common
 * practice, no source: over +-20 % the curvature of Q(h) ~ sqrt(h) tanh(mL) shifts the spread by a few
 * percent of itself, which a sample of 200 resolves). Each uncertain input x is drawn as x (1 + u_x z), z a
 * standard normal truncated to physical values (sizes, h and k above 1 % of nominal, emissivity at most 1,
 * a taper's tip no thicker than its base). The sample's relative spread is s_Q / Q_0 (sample standard
 * deviation over the nominal heat rate on the same grid); its standard error from the sample size is
 * (s_Q / Q_0) / sqrt(2 (n - 1)) (normal theory; a Latin hypercube does at least as well). The two agree when
 * they differ by at most twice that error; where they do not, the sample's band (its 15.9 and 84.1
 * percentiles) is reported and the method says so.
 * The sample solves the reference model on the coarsest grid of its study (a relative spread depends on the
 * grid only through the discretisation error, a few 1e-3 of itself there), so that 200 solves stay cheap.
 */
import { numericInputs, type Case } from '../case/index.js';
import { latinHypercubeNormal, type NormalBounds } from './latin-hypercube.js';
import type { Sensitivity, UncertaintyBand, UncertaintySample } from './types.js';

export const SAMPLE_THRESHOLD = 0.2;
export const DEFAULT_SAMPLE_SIZE = 200;
export const DEFAULT_SAMPLE_SEED = 1;
/** Lowest factor a size, h or k is drawn at (module header). */
const LOWEST_FACTOR = 0.01;

export type SampleWhen = 'auto' | 'always' | 'never';

export interface SampleSetup {
  when: SampleWhen;
  n: number;
  seed: number;
  /** The fin is nonlinear (a sample is drawn under 'auto'). */
  nonlinear: boolean;
  /** Null when 'auto' may draw the sample; else why it may not (its cost over the budget, reference-sensitivity.ts). */
  affordable: string | null;
  /** Heat rate of a variant on the sample's grid, W, and that grid in words. */
  rate: (variant: Case) => number;
  grid: string;
}

/** The band of `heatRate` (W) from the sensitivities (with their inputs' uncertainties) and, when due, a sample. */
export function uncertaintyBand(c: Case, sens: readonly Sensitivity[], heatRate: number, setup: SampleSetup): UncertaintyBand {
  const firstOrder = Math.sqrt(sens.reduce((sum, s) => sum + (s.dlnQ_dlnx * s.uncertainty) ** 2, 0));
  const h = sens.find((s) => s.key === 'convection.h');
  const fromH = h === undefined ? 0 : Math.abs(h.dlnQ_dlnx * h.uncertainty);
  const uncertain = sens.filter((s) => s.uncertainty > 0);
  const wanted = setup.nonlinear || firstOrder > SAMPLE_THRESHOLD;
  const due = setup.when === 'always' || (setup.when === 'auto' && wanted && setup.affordable === null);
  const sample = due && uncertain.length > 0 ? drawSample(c, uncertain, firstOrder, heatRate, setup) : null;
  const useSample = sample !== null && !sample.agrees;
  const relative = useSample ? sample.relative : firstOrder;
  const why =
    uncertain.length === 0
      ? 'no input has a stated uncertainty'
      : sample === null
        ? setup.when === 'never'
          ? 'no sample drawn (switched off)'
          : wanted
            ? `first order only, not confirmed by a sample: ${setup.affordable ?? ''}`
            : `first order only: the fin is linear and the band is within ${100 * SAMPLE_THRESHOLD} %`
        : sample.agrees
          ? `confirmed by a Latin-hypercube sample of ${sample.n} (seed ${sample.seed}, ${sample.grid}): ${pctText(sample.relative)} +/- ${pctText(sample.samplingError)}`
          : `a Latin-hypercube sample of ${sample.n} (seed ${sample.seed}, ${sample.grid}) gives ${pctText(sample.relative)} +/- ${pctText(sample.samplingError)}, more than twice its sampling error from first order (${pctText(firstOrder)}): the band is the sample's`;
  return {
    method: useSample ? 'latin-hypercube' : 'first-order',
    relative,
    low_W: useSample ? sample.low_W : heatRate * (1 - firstOrder),
    high_W: useSample ? sample.high_W : heatRate * (1 + firstOrder),
    firstOrder,
    fromH,
    sample,
    note: `One standard uncertainty of the reference heat rate from ${uncertain.map((s) => `${s.key} ${pctText(s.uncertainty)}`).join(', ') || 'nothing'}; first order, sqrt(sum (S u)^2) = ${pctText(firstOrder)}; ${why}`,
  };
}

function pctText(x: number): string {
  return `${Number((100 * x).toPrecision(3))} %`;
}

function drawSample(c: Case, uncertain: readonly Sensitivity[], firstOrder: number, heatRate: number, setup: SampleSetup): UncertaintySample {
  const inputs = numericInputs(c);
  const bounds: NormalBounds[] = uncertain.map((s) => {
    const input = inputs.find((i) => i.key === s.key);
    const lowest = input === undefined ? LOWEST_FACTOR : input.minFactor >= 0 ? Math.max(input.minFactor, LOWEST_FACTOR) : input.minFactor;
    const highest = input === undefined ? Number.POSITIVE_INFINITY : input.maxFactor;
    return { lower: (lowest - 1) / s.uncertainty, upper: (highest - 1) / s.uncertainty };
  });
  const points = latinHypercubeNormal(setup.n, bounds, setup.seed);
  const nominal = setup.rate(c);
  // The first input scales the case itself, whose inputs are listed above; each further one scales the variant so far.
  const firstInput = uncertain.length > 0 ? inputs.find((i) => i.key === (uncertain[0] as Sensitivity).key) : undefined;
  const rates = points.map((z) => {
    let variant = c;
    uncertain.forEach((s, j) => {
      const input = j === 0 ? firstInput : numericInputs(variant).find((i) => i.key === s.key);
      if (input !== undefined) variant = input.scale(1 + s.uncertainty * (z[j] as number));
    });
    return setup.rate(variant);
  });
  const stats = sampleStatistics(rates, nominal, firstOrder);
  return {
    method: 'latin-hypercube',
    n: stats.n,
    seed: setup.seed,
    relative: stats.relative,
    samplingError: stats.samplingError,
    agrees: stats.agrees,
    grid: setup.grid,
    low_W: heatRate * stats.lowFactor,
    high_W: heatRate * stats.highFactor,
  };
}

/**
 * What a sample of a result says, relative to its nominal value: the relative standard deviation, its sampling
 * error sigma / sqrt(2 (n - 1)) (normal samples), whether it agrees with first order (within twice that), and
 * the one-standard-uncertainty ends (the 15.87 % and 84.13 % quantiles) as factors on the nominal value.
 */
export function sampleStatistics(
  values: readonly number[],
  nominal: number,
  firstOrder: number,
): { n: number; relative: number; samplingError: number; agrees: boolean; lowFactor: number; highFactor: number } {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const sd = Math.sqrt(values.reduce((a, q) => a + (q - mean) ** 2, 0) / Math.max(1, n - 1));
  const relative = sd / nominal;
  const samplingError = relative / Math.sqrt(2 * Math.max(1, n - 1));
  const sorted = [...values].sort((a, b) => a - b);
  return {
    n,
    relative,
    samplingError,
    agrees: Math.abs(relative - firstOrder) <= 2 * samplingError,
    lowFactor: quantile(sorted, 0.1587) / nominal,
    highFactor: quantile(sorted, 0.8413) / nominal,
  };
}

/** Linear interpolation between order statistics (Hyndman & Fan 1996, definition 7). */
export function quantile(sorted: readonly number[], p: number): number {
  const at = p * (sorted.length - 1);
  const i = Math.floor(at);
  const lo = sorted[i] as number;
  const hi = sorted[Math.min(i + 1, sorted.length - 1)] as number;
  return lo + (at - i) * (hi - lo);
}
