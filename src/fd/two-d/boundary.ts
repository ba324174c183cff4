/**
 * Boundary conditions of the 2-D fin section, as data, and the one place they are discretised.
 *
 * Sign convention (stated here only): theta = T - T_inf (K); a boundary heat flux q'' (W/m^2) is positive
 * when it LEAVES the fin.
 *   adiabatic   q'' = 0
 *   fixed       theta = thetaFixed; the heat through the boundary is the reaction of its nodes' balances
 *   convective  q'' = h(s) theta, h in W/(m^2*K) as a function of s, the distance from the base (m)
 *   contact     q'' = (theta - thetaBody) / R'', through a contact resistance R'' (m^2*K/W) to a body
 *               held at excess thetaBody (the base of a fin with a contact resistance)
 * The symmetry plane (or axis) is adiabatic by construction and has no term.
 *
 * Discrete form (lumped, finite-volume): node p on a boundary receives the conductance
 *   G_p = integral of c(s) r ds over its two half-edges on that boundary, W/K per unit depth,
 * c = h or 1/R'', r the radius (1 for planar sections), by Simpson's rule on each half-edge (exact for h
 * and r linear along the edge). The system is A = K + sum diag(G), rhs = sum G thetaFar; fixed nodes are
 * eliminated symmetrically (their columns moved to the right-hand side), which keeps A symmetric
 * positive definite.
 */
import { hAt } from '../problem/convection.js';
import type { HDistribution } from '../../case/index.js';
import { boundaryNodes, radiusAt, type BoundaryName, type Grid2D } from '../../mesh/index.js';
import { applyStencil9, couplingOf, type Stencil9, type System2D } from '../linear-algebra/stencil9.js';

/** Convection coefficient along the fin (the linear distributions of the case contract). */
export type LinearH = Exclude<HDistribution, { kind: 'power' }>;

export type BoundaryCondition2D =
  { kind: 'adiabatic' } | { kind: 'fixed'; theta: number } | { kind: 'convective'; h: LinearH } | { kind: 'contact'; resistance: number; theta: number };

/** Conditions on the named boundaries of the section (the symmetry boundary is always adiabatic). */
export interface FinConditions2D {
  base: BoundaryCondition2D;
  face: BoundaryCondition2D;
  tip: BoundaryCondition2D;
}

/** The discrete terms of one boundary. */
export interface SideTerms {
  name: BoundaryName;
  kind: BoundaryCondition2D['kind'];
  /** Node indices along the boundary. */
  nodes: Int32Array;
  /** Conductance of each of those nodes to the far side, W/K per unit depth (zeros when adiabatic/fixed). */
  conductance: Float64Array;
  /** Excess temperature of the far side: 0 (fluid), the body (contact) or the fixed value. */
  farTheta: number;
}

export type BoundaryTerms2D = Record<'base' | 'face' | 'tip', SideTerms>;

export function discretizeBoundaries(grid: Grid2D, conditions: FinConditions2D): BoundaryTerms2D {
  return {
    base: sideTerms(grid, 'base', conditions.base),
    face: sideTerms(grid, 'face', conditions.face),
    tip: sideTerms(grid, 'tip', conditions.tip),
  };
}

function sideTerms(grid: Grid2D, name: 'base' | 'face' | 'tip', condition: BoundaryCondition2D): SideTerms {
  const nodes = boundaryNodes(grid, name);
  const length = (grid.x[grid.x.length - 1] as number) - grid.baseX;
  switch (condition.kind) {
    case 'adiabatic':
      return { name, kind: condition.kind, nodes, conductance: new Float64Array(nodes.length), farTheta: 0 };
    case 'fixed':
      return { name, kind: condition.kind, nodes, conductance: new Float64Array(nodes.length), farTheta: condition.theta };
    case 'convective': {
      const h = condition.h;
      const conductance = h.kind === 'uniform' ? lumpedConstant(grid, nodes, h.h) : lumpedIntegral(grid, nodes, (xAt) => hAt(h, xAt - grid.baseX, length));
      return { name, kind: condition.kind, nodes, conductance, farTheta: 0 };
    }
    case 'contact': {
      if (!(condition.resistance > 0)) throw new RangeError('contact condition: resistance must be > 0 (use fixed for none)');
      const c = 1 / condition.resistance;
      return { name, kind: condition.kind, nodes, conductance: lumpedConstant(grid, nodes, c), farTheta: condition.theta };
    }
    default: {
      const never: never = condition;
      throw new Error(`discretizeBoundaries: unknown condition ${JSON.stringify(never)}`);
    }
  }
}

/**
 * Per boundary node: integral of c(x) r ds over the half-edges next to it (Simpson on each half-edge).
 * `c` receives the x coordinate of the point (m).
 */
export function lumpedIntegral(grid: Grid2D, nodes: Int32Array, c: (x: number) => number): Float64Array {
  const out = new Float64Array(nodes.length);
  const { x, y, section } = grid;
  const f = (px: number, py: number): number => c(px) * radiusAt(section, px, py);
  for (let e = 0; e + 1 < nodes.length; e++) {
    const a = nodes[e] as number;
    const b = nodes[e + 1] as number;
    const xa = x[a] as number;
    const ya = y[a] as number;
    const xb = x[b] as number;
    const yb = y[b] as number;
    const half = Math.hypot(xb - xa, yb - ya) / 2;
    if (half === 0) continue;
    const xm = (xa + xb) / 2;
    const ym = (ya + yb) / 2;
    const simpson = (x0: number, y0: number): number => (half / 6) * (f(x0, y0) + 4 * f((x0 + xm) / 2, (y0 + ym) / 2) + f(xm, ym));
    out[e] = (out[e] as number) + simpson(xa, ya);
    out[e + 1] = (out[e + 1] as number) + simpson(xb, yb);
  }
  return out;
}

/**
 * lumpedIntegral(grid, nodes, () => value), the same numbers bit for bit: on a planar section (r = 1) the integrand is
 * value * 1 = value at every point, so each half-edge's Simpson sum is (half / 6) (value + 4 value + value) without
 * the six calls per half-edge (the sample assembles its 200 variants' faces with it). Other sections: lumpedIntegral.
 */
export function lumpedConstant(grid: Grid2D, nodes: Int32Array, value: number): Float64Array {
  if (grid.section !== 'planar') return lumpedIntegral(grid, nodes, () => value);
  const out = new Float64Array(nodes.length);
  const { x, y } = grid;
  for (let e = 0; e + 1 < nodes.length; e++) {
    const a = nodes[e] as number;
    const b = nodes[e + 1] as number;
    const half = Math.hypot((x[b] as number) - (x[a] as number), (y[b] as number) - (y[a] as number)) / 2;
    if (half === 0) continue;
    const simpson = (half / 6) * (value + 4 * value + value);
    out[e] = (out[e] as number) + simpson;
    out[e + 1] = (out[e + 1] as number) + simpson;
  }
  return out;
}

/**
 * The linear system of the section: A = K + sum diag(G), rhs = sum G thetaFar, with the fixed nodes
 * eliminated symmetrically (row and column replaced by the identity, the column moved to the rhs).
 * K is not modified.
 */
export function buildSystem2D(K: Stencil9, terms: BoundaryTerms2D): System2D {
  const { nodesX: nx, nodesY: ny } = K;
  const n = nx * ny;
  const sides = [terms.base, terms.face, terms.tip];
  // slice(), not Float64Array.from: a copy at memcpy speed (from() walks the iterator, ~30x slower in V8).
  const diag = K.diag.slice();
  const rhs = new Float64Array(n);
  // Exact row sums after elimination: boundary conductances plus the couplings to fixed nodes.
  const excess = new Float64Array(n);
  for (const side of sides) {
    const { nodes, conductance, farTheta } = side;
    for (let e = 0; e < nodes.length; e++) {
      const p = nodes[e] as number;
      const g = conductance[e] as number;
      diag[p] = (diag[p] as number) + g;
      rhs[p] = (rhs[p] as number) + g * farTheta;
      excess[p] = (excess[p] as number) + g;
    }
  }
  // Without fixed nodes (a base behind a contact resistance, a tip not fixed) there is nothing to eliminate, and the
  // couplings are K's own (read, never written, by every solver). A fixed side has nodes (every boundary has).
  if (!sides.some((side) => side.kind === 'fixed' && side.nodes.length > 0)) {
    return { matrix: { nodesX: nx, nodesY: ny, diag, east: K.east, north: K.north, northEast: K.northEast, southEast: K.southEast }, rhs, excess };
  }
  const fixed = new Uint8Array(n);
  const fixedTheta = new Float64Array(n);
  for (const side of sides) {
    if (side.kind !== 'fixed') continue;
    for (const p of side.nodes) {
      fixed[p] = 1;
      fixedTheta[p] = side.farTheta;
    }
  }
  const matrix: Stencil9 = {
    nodesX: nx,
    nodesY: ny,
    diag,
    east: K.east.slice(),
    north: K.north.slice(),
    northEast: K.northEast.slice(),
    southEast: K.southEast.slice(),
  };
  // Move the fixed columns to the right-hand side.
  const moved = applyStencil9(matrix, fixedTheta, new Float64Array(n));
  for (let p = 0; p < n; p++) {
    if (fixed[p] === 0) rhs[p] = (rhs[p] as number) - (moved[p] as number);
  }
  for (let p = 0; p < n; p++) {
    if (fixed[p] === 1) {
      excess[p] = 1;
      continue;
    }
    const i = Math.floor(p / ny);
    const j = p - i * ny;
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const q = p + di * ny + dj;
        if ((di !== 0 || dj !== 0) && i + di >= 0 && i + di < nx && j + dj >= 0 && j + dj < ny && fixed[q] === 1) {
          excess[p] = (excess[p] as number) - couplingOf(K, i, j, di, dj);
        }
      }
    }
  }
  for (let p = 0; p < n; p++) {
    if (fixed[p] === 0) continue;
    const i = Math.floor(p / ny);
    const j = p - i * ny;
    matrix.diag[p] = 1;
    rhs[p] = fixedTheta[p] as number;
    matrix.east[p] = 0;
    matrix.north[p] = 0;
    matrix.northEast[p] = 0;
    matrix.southEast[p] = 0;
    if (j > 0) matrix.north[p - 1] = 0;
    if (i > 0) {
      matrix.east[p - ny] = 0;
      if (j > 0) matrix.northEast[p - ny - 1] = 0;
      if (j + 1 < ny) matrix.southEast[p - ny + 1] = 0;
    }
  }
  return { matrix, rhs, excess };
}
