/**
 * Heat rates of a solved 2-D section, from the node balances of the finite-volume scheme.
 *
 * For node p the balance of its control volume reads (sign convention of two-d/boundary.ts: heat
 * leaving the fin is positive)
 *     R_p = (K theta)_p + sum over its non-fixed boundaries s of G_s,p (theta_p - thetaFar_s),
 * where R_p is the heat entering through a fixed-temperature boundary (0 on every other node). The heat
 * entering through a boundary is then: fixed, the sum of R_p over its nodes (the "reaction"); convective or
 * contact, sum G_p (thetaFar - theta_p); adiabatic, 0. Because K has zero row and column sums, heat in at
 * the base equals heat out through the faces and tip up to the solver's residual:
 *     energyBalance = |Q_base - Q_surfaces| / |Q_base|.
 * Units: W per unit depth (per metre of width, or per radian); multiply by the grid's depth for the fin.
 */
import type { BoundaryTerms2D, SideTerms } from './boundary.js';
import { couplingOf, type Stencil9 } from '../linear-algebra/stencil9.js';

export interface HeatRates2D {
  /** Heat entering the fin through the base, W per unit depth. */
  base: number;
  /** Heat leaving through the faces, W per unit depth. */
  face: number;
  /** Heat leaving through the tip, W per unit depth. */
  tip: number;
  /** face + tip. */
  surfaces: number;
  /** |base - surfaces| / |base|. */
  energyBalance: number;
}

export function heatRates2D(K: Stencil9, terms: BoundaryTerms2D, theta: Float64Array): HeatRates2D {
  // Boundary exchange G (theta - thetaFar) of every node of each non-fixed boundary.
  // A plain loop: Float64Array.from with a map function walks the iterator protocol (~25x slower in V8).
  const exchangeOf = (side: SideTerms): Float64Array | null => {
    if (side.kind === 'fixed') return null;
    const out = new Float64Array(side.nodes.length);
    for (let e = 0; e < out.length; e++) out[e] = (side.conductance[e] as number) * ((theta[side.nodes[e] as number] as number) - side.farTheta);
    return out;
  };
  return heatRatesFromExchange(K, terms, theta, { base: exchangeOf(terms.base), face: exchangeOf(terms.face), tip: exchangeOf(terms.tip) });
}

/**
 * The same balances for any boundary law: `exchange[side][e]` is the heat leaving the fin through node e
 * of that boundary (W per unit depth; null for a fixed boundary), and `potential` the field the conduction
 * operator K acts on (theta itself, or the Kirchhoff potential of a temperature-dependent k; only its
 * differences are used).
 */
export function heatRatesFromExchange(
  K: Stencil9,
  terms: BoundaryTerms2D,
  potential: Float64Array,
  exchangeBySide: Record<'base' | 'face' | 'tip', Float64Array | null>,
): HeatRates2D {
  const n = potential.length;
  const sides: SideTerms[] = [terms.base, terms.face, terms.tip];
  // Boundary exchange of every node with its non-fixed boundaries.
  const exchange = new Float64Array(n);
  for (const side of sides) {
    const values = exchangeBySide[side.name as 'base' | 'face' | 'tip'];
    if (side.kind === 'fixed' || values === null) continue;
    side.nodes.forEach((p, e) => {
      exchange[p] = (exchange[p] as number) + (values[e] as number);
    });
  }
  const claimed = new Uint8Array(n);
  const inSide = new Uint8Array(n);
  const heatIn = (side: SideTerms): number => {
    let q = 0;
    inSide.fill(0);
    for (const p of side.nodes) inSide[p] = 1;
    const values = exchangeBySide[side.name as 'base' | 'face' | 'tip'];
    side.nodes.forEach((p, e) => {
      if (side.kind === 'fixed') {
        if (claimed[p] === 1) return; // a corner shared by two fixed boundaries counts once
        claimed[p] = 1;
        q += conductionOffSide(K, p, potential, (nb) => inSide[nb] === 1) + (exchange[p] as number);
      } else if (values !== null) {
        q += -(values[e] as number);
      }
    });
    return q;
  };
  const base = heatIn(terms.base);
  const tip = -heatIn(terms.tip);
  const face = -heatIn(terms.face);
  const surfaces = face + tip;
  return { base, face, tip, surfaces, energyBalance: Math.abs(base - surfaces) / Math.abs(base) };
}

/**
 * The heat entering through the base alone, W per unit depth: heatRates2D(K, terms, theta).base, the same
 * operations in the same order (so the same bits), without the node arrays the full balance allocates: the sample
 * and the adjoint's perturbed assemblies need this one number many times. Fixed base: the conduction from each base
 * node to the nodes off the base plus its exchange through the other (non-fixed) boundaries it lies on, summed side
 * by side in the order base, face, tip as heatRatesFromExchange does; any other base: minus the sum of its exchanges.
 */
export function baseHeatRate2D(K: Stencil9, terms: BoundaryTerms2D, theta: Float64Array): number {
  const base = terms.base;
  if (base.kind !== 'fixed') {
    let q = 0;
    for (let e = 0; e < base.nodes.length; e++) {
      const value = (base.conductance[e] as number) * ((theta[base.nodes[e] as number] as number) - base.farTheta);
      q += -value;
    }
    return q;
  }
  const onBase = new Set<number>(base.nodes);
  // Exchange of the base nodes through the other boundaries, accumulated side by side (heatRatesFromExchange).
  const exchange = new Map<number, number>();
  for (const side of [terms.face, terms.tip]) {
    if (side.kind === 'fixed') continue;
    for (let e = 0; e < side.nodes.length; e++) {
      const p = side.nodes[e] as number;
      if (!onBase.has(p)) continue;
      const value = (side.conductance[e] as number) * ((theta[p] as number) - side.farTheta);
      exchange.set(p, (exchange.get(p) ?? 0) + value);
    }
  }
  const claimed = new Set<number>();
  let q = 0;
  for (const p of base.nodes) {
    if (claimed.has(p)) continue;
    claimed.add(p);
    q += conductionOffSide(K, p, theta, (nb) => onBase.has(nb)) + (exchange.get(p) ?? 0);
  }
  return q;
}

/**
 * Conduction from node p to its neighbours off a boundary (onSide false), W per unit depth, in difference form:
 * the couplings between nodes of the boundary cancel in pairs and are left out, so no round-off of them remains.
 */
function conductionOffSide(K: Stencil9, p: number, potential: Float64Array, onSide: (q: number) => boolean): number {
  const ny = K.nodesY;
  const i = Math.floor(p / ny);
  const j = p - i * ny;
  const tp = potential[p] as number;
  let conducted = 0;
  for (let di = -1; di <= 1; di++) {
    for (let dj = -1; dj <= 1; dj++) {
      if (di === 0 && dj === 0) continue;
      const c = couplingOf(K, i, j, di, dj);
      const nb = p + di * ny + dj;
      if (c !== 0 && !onSide(nb)) conducted += c * ((potential[nb] as number) - tp);
    }
  }
  return conducted;
}
