/**
 * The assumption ledger: the drift each shortcut assumption causes on its own.
 *
 * Each row solves the fin twice with fd-1d on the same grid, once as given and once with one
 * assumption imposed, and reports (Q_assumed - Q_actual) / Q_actual. Same grid, same solver: the
 * discretisation errors cancel to well below the drifts shown (both are O(1/N^2) with nearly the same
 * constant). The corrected-length row compares two closed forms on the equivalent uniform fin.
 */
import type { Case, HDistribution, Profile } from '../case/index.js';
import { uniformFin } from '../analytic/index.js';
import { unusableEquivalent } from './shortcuts.js';
import type { FinGeometry1D } from '../mesh/index.js';
import type { EquivalentUniformFin } from './equivalent.js';
import type { AssumptionRow, ModelId } from './types.js';

/**
 * One grid for every row (1001 nodes: the rows' drifts are differences of two solves on it, good to ~1e-7 of Q on
 * an ordinary fin). 4001 nodes printed the same drifts on every demo case and cost about 40 ms more at start-up
 * (each variant's mesh and solve compiled and optimised anew).
 */
export const LEDGER_NODES = 1001;

/**
 * Rows for the geometric and boundary assumptions. `solve` is the fd-1d heat rate of a variant case on
 * one fixed grid (LEDGER_NODES; the check's own solvers); `eq` the equivalent uniform fin the shortcuts used.
 */
export function assumptionLedger(c: Case, geometry: FinGeometry1D, eq: EquivalentUniformFin, solve: (variant: Case) => number): AssumptionRow[] {
  const rows: AssumptionRow[] = [];
  // The fin as given, on the same grid as every variant (so discretisation errors cancel).
  const actualHeatRate = solve(c);
  const sameGrid = 'fd-1d with and without the assumption, same grid';
  const drift = (q: number): number => (q - actualHeatRate) / actualHeatRate;
  const tip = c.convection.tip;
  const kind = c.fin.profile.kind;
  const uniformSection = kind === 'rectangular' || kind === 'pin' || kind === 'annular';
  const taperedClosedForm = !uniformSection && kind !== 'tabulated';

  if (tip.kind !== 'adiabatic' && geometry.tipArea > 0) {
    const madeBy: ModelId[] = ['tanh-L'];
    if (taperedClosedForm) madeBy.push('closed-form');
    rows.push({
      assumption: `adiabatic tip (the tip is ${tip.kind})`,
      drift: drift(solve(withTip(c, { kind: 'adiabatic' }))),
      madeBy,
      method: sameGrid,
    });
  }
  // Rows measured with closed forms need a single finite h > 0 (shortcuts.ts, unusableEquivalent).
  const closedFormsApply = unusableEquivalent(eq) === null;
  if (tip.kind === 'convective' && closedFormsApply) {
    const common = { h: eq.h, k: eq.k, P: eq.P, A: eq.A, thetaBase: 1 } as const;
    const exact = uniformFin({ ...common, L: eq.length, tip: { kind: 'convective', hTip: eq.hTip } }).heatRate;
    const lc = uniformFin({ ...common, L: eq.length + eq.A / eq.P, tip: { kind: 'adiabatic' } }).heatRate;
    rows.push({
      assumption: 'corrected length Lc = L + A/P for the convecting tip',
      drift: (lc - exact) / exact,
      madeBy: ['tanh-Lc', 'tanh-Lc-thin'],
      method: 'closed forms on the equivalent uniform fin (adiabatic at Lc vs exact convective tip)',
    });
  }
  if (geometry.shape === 'annular' && closedFormsApply) {
    const uTip = tip.kind === 'convective' ? ({ kind: 'convective', hTip: eq.hTip } as const) : ({ kind: 'adiabatic' } as const);
    const straight = uniformFin({ h: eq.h, k: eq.k, P: eq.P, A: eq.A, L: eq.length, thetaBase: eq.thetaBase, tip: uTip }).heatRate;
    const withResistance = eq.contactResistance > 0 ? eq.thetaBase / (eq.contactResistance + eq.thetaBase / straight) : straight;
    rows.push({
      assumption: 'radial fin treated as straight (mean radius)',
      drift: drift(withResistance),
      madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip'],
      method: 'uniform straight fin of the mean section and the same tip, closed form, vs fd-1d',
    });
  }
  if (geometry.shape === 'straight' && c.fin.edges === 'cooled') {
    const madeBy: ModelId[] = ['tanh-Lc-thin'];
    if (taperedClosedForm) madeBy.push('closed-form');
    rows.push({
      assumption: 'thin-fin perimeter P = 2w (side edges not cooled)',
      drift: drift(solve({ ...c, fin: { ...c.fin, edges: 'insulated' } })),
      madeBy,
      method: sameGrid,
    });
  }
  if (!uniformSection) {
    const uniform = uniformProfile(c.fin.profile, eq);
    if (uniform) {
      const variant = { ...c, fin: { ...c.fin, profile: uniform } };
      // A sharp tip convects nothing; keep it that way so this row isolates the section alone.
      const v = geometry.tipArea === 0 && tip.kind !== 'adiabatic' ? withTip(variant, { kind: 'adiabatic' }) : variant;
      rows.push({
        assumption: 'uniform section (mean thickness or diameter)',
        drift: drift(solve(v)),
        madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip'],
        method: sameGrid,
      });
    }
  }
  if (c.convection.h.kind !== 'uniform' && c.convection.h.kind !== 'power') {
    const h: HDistribution = { kind: 'uniform', h: eq.h };
    const variant: Case = { ...c, convection: { ...c.convection, h } };
    const keepTip = tip.kind === 'convective' && tip.h === null ? withTip(variant, { kind: 'convective', h: eq.hTip }) : variant;
    rows.push({
      assumption: 'uniform h (area-weighted mean)',
      drift: drift(solve(keepTip)),
      madeBy: ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'],
      method: `${sameGrid}; the tip keeps its own h`,
    });
  }
  return rows;
}

function withTip(c: Case, tip: Case['convection']['tip']): Case {
  return { ...c, convection: { ...c.convection, tip } };
}

/** The uniform profile of the same length and mean section, or null where there is none. */
function uniformProfile(p: Profile, eq: EquivalentUniformFin): Profile | null {
  switch (p.kind) {
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return { kind: 'rectangular', length: p.length, thickness: eq.size, width: p.width };
    case 'conical-pin':
      return { kind: 'pin', length: p.length, diameter: eq.size };
    case 'tabulated': {
      const L = p.x[p.x.length - 1] as number;
      return p.shape === 'pin'
        ? { kind: 'pin', length: L, diameter: eq.size }
        : { kind: 'rectangular', length: L, thickness: eq.size, width: p.width ?? 0 };
    }
    case 'rectangular':
    case 'pin':
    case 'annular':
      return null;
    default: {
      const never: never = p;
      return never;
    }
  }
}
