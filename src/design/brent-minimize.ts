/**
 * Minimum of a scalar function on [a, b] without derivatives: Brent's method, golden-section steps safeguarding
 * successive parabolic interpolation (Brent, R. P., 1973, "Algorithms for Minimization without Derivatives",
 * Prentice-Hall, ch. 5, procedure localmin). It never evaluates outside [a, b], converges superlinearly on smooth
 * functions and, at worst, as golden section (interval shrinks by 0.618 a step). Stops when the bracket is within
 * 2 (relTol |x| + absTol) of its midpoint. For a unimodal f on [a, b] it finds the minimum; it may end at an end
 * of the interval when the minimum lies there. `f` may be async (each value of an optimisation is a whole
 * refinement study).
 */

export interface MinimizeOptions {
  /** Relative tolerance on x (default 1e-4: an optimum dimension to 0.01 %). */
  relTol?: number;
  /** Absolute tolerance on x (default 1e-12). */
  absTol?: number;
  maxEvaluations?: number;
}

export interface MinimizeResult {
  x: number;
  f: number;
  evaluations: number;
}

const GOLDEN = 0.5 * (3 - Math.sqrt(5));

export async function brentMinimize(
  f: (x: number) => number | Promise<number>,
  a: number,
  b: number,
  options: MinimizeOptions = {},
): Promise<MinimizeResult> {
  const relTol = options.relTol ?? 1e-4;
  const absTol = options.absTol ?? 1e-12;
  const maxEvaluations = options.maxEvaluations ?? 100;
  let lo = Math.min(a, b);
  let hi = Math.max(a, b);
  let x = lo + GOLDEN * (hi - lo);
  let w = x;
  let v = x;
  let fx = await f(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  let evaluations = 1;
  while (evaluations < maxEvaluations) {
    const mid = 0.5 * (lo + hi);
    const tol1 = relTol * Math.abs(x) + absTol;
    const tol2 = 2 * tol1;
    if (Math.abs(x - mid) <= tol2 - 0.5 * (hi - lo)) break;
    let golden = true;
    if (Math.abs(e) > tol1) {
      // Parabola through (v, fv), (w, fw), (x, fx).
      const r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      q = Math.abs(q);
      const eOld = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * eOld) && p > q * (lo - x) && p < q * (hi - x)) {
        d = p / q;
        const u = x + d;
        if (u - lo < tol2 || hi - u < tol2) d = x < mid ? tol1 : -tol1;
        golden = false;
      }
    }
    if (golden) {
      e = (x < mid ? hi : lo) - x;
      d = GOLDEN * e;
    }
    const u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
    const fu = await f(u);
    evaluations++;
    if (fu <= fx) {
      if (u < x) hi = x;
      else lo = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) lo = u;
      else hi = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, f: fx, evaluations };
}
