/**
 * Adaptive Gauss-Kronrod quadrature of a smooth function on [a, b]: the 15-point Kronrod rule with its
 * embedded 7-point Gauss rule on each panel, |K15 - G7| as the panel error estimate, panels bisected
 * until the estimate meets the tolerance (Kronrod, A. S., 1965, "Nodes and Weights of Quadrature
 * Formulas", Consultants Bureau; nodes and weights as in QUADPACK's QK15, Piessens, de Doncker-Kapenga,
 * Ueberhuber & Kahaner, 1983, Springer [from memory, verified by the exactness tests in
 * tests/analytic/quadrature.test.ts]). The endpoints themselves are never evaluated, so an integrand
 * with a removable 0/0 at an end is fine.
 */

// The nodes and weights are written with all their published digits, more than a double holds.
/* eslint-disable no-loss-of-precision */
const kronrodNodes = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851, 0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
  0.586087235467691130294144845693013, 0.405845151377397166906606412076961, 0.207784955007898467600689403773245, 0,
];
const kronrodWeights = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204, 0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
  0.16900472663926790282658342659855, 0.190350578064785409913256402421014, 0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
/** Gauss weights for the Kronrod nodes 1, 3, 5, 7 (0-based: the odd entries, last one the centre). */
const gaussWeights = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378, 0.381830050505118944950369775488975, 0.417959183673469387755102040816327,
];

export interface QuadratureOptions {
  /** Relative tolerance on the integral (default 1e-13). */
  relTolerance?: number;
  /** Absolute tolerance (default 0). */
  absTolerance?: number;
  /** Maximum number of panels (default 2000). */
  maxPanels?: number;
}

interface Panel {
  a: number;
  b: number;
  value: number;
  error: number;
}

/** One K15/G7 panel. */
export function kronrodPanel(f: (x: number) => number, a: number, b: number): { kronrod: number; gauss: number } {
  const centre = 0.5 * (a + b);
  const halfWidth = 0.5 * (b - a);
  const fc = f(centre);
  let kronrod = fc * (kronrodWeights[7] ?? 0);
  let gauss = fc * (gaussWeights[3] ?? 0);
  for (let j = 0; j < 7; j++) {
    const dx = halfWidth * (kronrodNodes[j] ?? 0);
    const pair = f(centre - dx) + f(centre + dx);
    kronrod += (kronrodWeights[j] ?? 0) * pair;
    if (j % 2 === 1) gauss += (gaussWeights[(j - 1) / 2] ?? 0) * pair;
  }
  return { kronrod: kronrod * halfWidth, gauss: gauss * halfWidth };
}

function makePanel(f: (x: number) => number, a: number, b: number): Panel {
  const { kronrod, gauss } = kronrodPanel(f, a, b);
  return { a, b, value: kronrod, error: Math.abs(kronrod - gauss) };
}

/** Integral of f over [a, b] by globally adaptive Gauss-Kronrod (largest-error panel bisected first). */
export function integrate(f: (x: number) => number, a: number, b: number, options: QuadratureOptions = {}): number {
  const relTolerance = options.relTolerance ?? 1e-13;
  const absTolerance = options.absTolerance ?? 0;
  const maxPanels = options.maxPanels ?? 2000;
  const panels: Panel[] = [makePanel(f, a, b)];
  for (;;) {
    let total = 0;
    let error = 0;
    let worst = 0;
    for (let i = 0; i < panels.length; i++) {
      const p = panels[i] as Panel;
      total += p.value;
      error += p.error;
      if (p.error > (panels[worst] as Panel).error) worst = i;
    }
    if (Number.isNaN(total)) throw new Error(`integrate: NaN integrand on [${a}, ${b}]`);
    if (!Number.isFinite(total)) return total; // overflow: report +-Infinity to the caller
    if (error <= Math.max(absTolerance, relTolerance * Math.abs(total))) return total;
    if (panels.length >= maxPanels) throw new Error(`integrate: tolerance not met with ${maxPanels} panels (error estimate ${error})`);
    const p = panels[worst] as Panel;
    const mid = 0.5 * (p.a + p.b);
    panels[worst] = makePanel(f, p.a, mid);
    panels.push(makePanel(f, mid, p.b));
  }
}
