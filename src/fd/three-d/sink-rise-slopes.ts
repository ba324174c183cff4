/**
 * The slopes d rise / d ln x of one source's mean rise (K) on one fd-3d grid, for inputs each given as the case
 * with the input scaled by (1 + d) and by (1 − d): what the check's sensitivities (compare/sink-sensitivity.ts)
 * divide by the rise. Linear sinks: the adjoint of the discrete system (sink-adjoint.ts), one adjoint solve for
 * all inputs. Where a variant's grid changes its cell counts, and for nonlinear sinks, central differences of
 * re-solves on the grid (sink-grid-solve.ts), each started from the case's own solution:
 *   slope = (rise(x (1 + d)) − rise(x (1 − d))) / (2 d).
 * `solved`: the case already set up and solved on this grid (a study's kept grid), used instead of solving again.
 */
import type { HeatSinkCase } from '../../case/index.js';
import { sinkGridAdjoint } from './sink-adjoint.js';
import { sameSinkGrid, type SolvedSinkGrid } from './sink-grid-setup.js';
import { solveSinkOnGrid, type SinkGridSolution } from './sink-grid-solve.js';
import type { SinkGridSpec } from './sink-study-types.js';

export interface SinkRiseVariants {
  plus: HeatSinkCase;
  minus: HeatSinkCase;
}

export interface SinkRiseSlopes {
  /** The source's mean rise on the grid, K. */
  rise: number;
  /** Per input, in the order given: d rise / d ln x (K) and how it was found. */
  slopes: { slope: number; method: 'adjoint' | 'central-difference' }[];
  /** Whether the adjoint was available (a linear sink). */
  adjoint: boolean;
}

export function sinkRiseSlopes(
  c: HeatSinkCase,
  spec: SinkGridSpec,
  source: number,
  variants: SinkRiseVariants[],
  step: number,
  solved?: SolvedSinkGrid,
): SinkRiseSlopes {
  const adjoint = sinkGridAdjoint(c, spec, source, solved);
  // The re-solves start from the case's linear solution on the grid: the kept one of a linear sink, else solved here.
  const kept = adjoint !== null && solved !== undefined && sameSinkGrid(solved.spec, spec) ? solved.theta : null;
  let nominal: SinkGridSolution | null = null;
  const resolve = (): SinkGridSolution => (nominal ??= solveSinkOnGrid(c, spec));
  const start = (): Float64Array => kept ?? resolve().theta;
  const rise0 = adjoint?.rise ?? (resolve().sourceMeanRise[source] as number);
  const rise = (variant: HeatSinkCase): number => solveSinkOnGrid(variant, spec, start()).sourceMeanRise[source] as number;
  const slopes = variants.map(({ plus, minus }) => {
    const fromAdjoint = adjoint?.dRise_dlnx(plus, minus, step) ?? null;
    return fromAdjoint === null
      ? { slope: (rise(plus) - rise(minus)) / (2 * step), method: 'central-difference' as const }
      : { slope: fromAdjoint, method: 'adjoint' as const };
  });
  return { rise: rise0, slopes, adjoint: adjoint !== null };
}
