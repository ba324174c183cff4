/**
 * Root of a continuous scalar function on a bracket [a, b] with f(a) f(b) <= 0: Brent's method
 * (inverse quadratic interpolation and secant steps safeguarded by bisection), as in Brent, R. P., 1973,
 * "Algorithms for Minimization without Derivatives", Prentice-Hall, ch. 4 (procedure zero).
 * Converges to within 4 eps |x| + tolerance; never leaves the bracket.
 */

export interface RootOptions {
  /** Absolute tolerance on x (default 0: relative to double precision only). */
  xTolerance?: number;
  maxIterations?: number;
}

const eps = Number.EPSILON;

export function brentRoot(f: (x: number) => number, a: number, b: number, options: RootOptions = {}): number {
  const xTolerance = options.xTolerance ?? 0;
  const maxIterations = options.maxIterations ?? 200;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(fa * fb < 0)) throw new RangeError(`brentRoot: f(a) = ${fa} and f(b) = ${fb} do not bracket a root on [${a}, ${b}]`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * eps * Math.abs(b) + 0.5 * xTolerance;
    const half = 0.5 * (c - b);
    if (Math.abs(half) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolation: secant when a == c, inverse quadratic otherwise.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * half * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * half * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * half * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = half;
        e = d;
      }
    } else {
      d = half;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : half > 0 ? tol : -tol;
    fb = f(b);
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
  }
  throw new Error(`brentRoot: no convergence in ${maxIterations} iterations`);
}
