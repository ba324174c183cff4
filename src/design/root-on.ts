/**
 * The dimension at which a monotone quantity reaches a target: a log-spaced scan of the bounds for a sign change
 * (9 values), then bisection in log space to 1e-5 relative (the objective is a whole refinement study and may be
 * async, so Brent's synchronous root finder is not used here). A target not reached within the bounds is a usage
 * error that says the most the bounds give.
 */
import { UsageError } from '../errors.js';
import { fmtMm } from './format-mm.js';

export interface RootLabels {
  heat: string;
  bounds: string;
}

/** The root of g on [a, b], or a usage error saying the required heat is not reached within the bounds. */
export async function rootOn(g: (x: number) => Promise<number>, a: number, b: number, key: string, q: number, labels: RootLabels): Promise<number> {
  const xs = Array.from({ length: 9 }, (_, i) => a * (b / a) ** (i / 8));
  const gs: number[] = [];
  for (const x of xs) gs.push(await g(x));
  for (let i = 1; i < xs.length; i++) {
    const g0 = gs[i - 1] as number;
    const g1 = gs[i] as number;
    if (Number.isNaN(g0) || Number.isNaN(g1) || g0 * g1 > 0) continue;
    let lo = xs[i - 1] as number;
    let hi = xs[i] as number;
    let glo = g0;
    for (let k = 0; k < 60 && hi - lo > 1e-5 * hi; k++) {
      const mid = Math.sqrt(lo * hi);
      const gm = await g(mid);
      if (Number.isNaN(gm)) break;
      if (glo * gm <= 0) hi = mid;
      else {
        lo = mid;
        glo = gm;
      }
    }
    return 0.5 * (lo + hi);
  }
  const finite = gs.filter((v) => !Number.isNaN(v));
  const most = finite.length > 0 ? Math.max(...finite) + q : Number.NaN;
  throw new UsageError(
    `${labels.heat}: ${q} W is not reached with ${key} from ${fmtMm(a)} to ${fmtMm(b)} (at most ${most.toPrecision(4)} W there); widen ${labels.bounds} or ask less heat`,
  );
}
