/**
 * The assumption ledger's rows for what makes a fin nonlinear (power-law h, k over temperature,
 * radiation): each re-solves the fin with fd-1d with that one effect removed, on the same grid, and
 * reports (Q_without - Q_actual) / Q_actual. A linear fin has none of these rows.
 */
import type { Case } from '../case/index.js';
import { conductivityAt } from './linear-surrogate.js';
import type { AssumptionRow, ModelId } from './types.js';

const ALL_SHORTCUTS: ModelId[] = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];

/** One row per nonlinearity: the fin re-solved with that effect alone removed, same grid. */
export function nonlinearRows(c: Case, solve: (variant: Case) => number): AssumptionRow[] {
  const rows: AssumptionRow[] = [];
  // The fin as given, solved once and only when a row needs it (a linear fin has no row).
  let actual: number | null = null;
  const method = 'fd-1d (Newton) with and without the assumption, same grid';
  const drift = (variant: Case): number => {
    actual ??= solve(c);
    return (solve(variant) - actual) / actual;
  };
  const h = c.convection.h;
  if (h.kind === 'power') {
    rows.push({
      assumption: `constant h (h at the base temperature; actual h ~ theta^${h.exponent})`,
      drift: drift({ ...c, convection: { ...c.convection, h: { kind: 'uniform', h: h.base } } }),
      madeBy: ALL_SHORTCUTS,
      method,
    });
  }
  if (c.material.k.kind === 'table') {
    const k = conductivityAt(c.material.k, c.base.T_degC);
    rows.push({
      assumption: `constant k (k at the base temperature, ${k.toPrecision(4)} W/(m*K))`,
      drift: drift({ ...c, material: { ...c.material, k: { kind: 'constant', k } } }),
      madeBy: ALL_SHORTCUTS,
      method,
    });
  }
  if (c.convection.emissivity > 0) {
    rows.push({
      assumption: 'no radiation',
      drift: drift({ ...c, convection: { ...c.convection, emissivity: 0 } }),
      madeBy: [],
      method: `${method}; the shortcuts include radiation as an equivalent h`,
    });
  }
  return rows;
}
