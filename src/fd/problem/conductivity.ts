/**
 * Temperature-dependent conductivity and its Kirchhoff transform, measured down from the base.
 *
 * k(T), W/(m K): a constant, or a table (T_j, k_j) linear between points and held constant beyond
 * the first and last points (no extrapolation: a table says nothing outside its range, and a
 * constant end keeps k > 0).
 * Kirchhoff transform (Kirchhoff, G., 1894, Vorlesungen über die Theorie der Wärme [from memory]):
 * with k_ref = k at the base temperature, k(T) dT/dx = k_ref dU/dx for U = ∫ k dT / k_ref, so
 * d/dx(k A dT/dx) = k_ref d/dx(A dU/dx) is linear in U. The solver carries temperatures as drops
 * below the base, d = θ_b - θ (K), as the linear solver does (drop-system.ts: no cancellation in the
 * base conduction), and U as the potential drop
 *   D(d) = U(θ_b) - U(θ_b - d) = (1/k_ref) ∫_0^d k(θ_b - e) de,   κ = dD/dd = k(T)/k_ref.
 * For a table, k is piecewise linear in e, so D is integrated exactly (trapezoids from e = 0 to the
 * last table point before d, then to d), every piece formed from drops, never from differences of
 * large potentials. For a constant k, D = d and κ = 1 exactly (the linear scheme, bit for bit).
 * Inverse (dropAt, for Newton steps taken in D): on the piece of k that holds D, k_ref D - I_0 = k_0 x + s x^2/2
 * with x = d - e_0 from the same start point (e_0, I_0 = ∫_0^{e_0} k de, k_0) as the forward trapezoid, solved
 * as x = 2 q / (k_0 + sqrt(k_0^2 + 2 s q)), q = k_ref D - I_0 (no cancellation; k_0^2 + 2 s q = k(d)^2 > 0).
 * Cost: the array forms (evaluate, dropsAt) keep the constants of the previous node's table piece and search again
 * only when a node leaves it (neighbouring nodes of a fin sit on the same piece almost always), so a node costs
 * two comparisons, a few flops (a square root for the inverse) and no call; they give the one-node forms' values
 * bit for bit.
 */
import type { Conductivity } from '../../case/index.js';

/** A piece of k over [from, to] in θ (K): k(θ) = k + slope (θ - from). */
export interface ConductivityPiece {
  readonly from: number;
  readonly to: number;
  /** k at `from`, W/(m K). */
  readonly k: number;
  /** dk/dθ, W/(m K^2). */
  readonly slope: number;
}

export interface KirchhoffTransform {
  /** True for a constant k (then D = d, κ = 1). */
  readonly constant: boolean;
  /** k_ref = k at the base temperature, W/(m K). */
  readonly kRef: number;
  /** k at excess temperature θ (K), W/(m K). */
  readonly conductivityAt: (theta: number) => number;
  /** The drop d (K) whose potential drop is D (K): the inverse of D(d). */
  readonly dropAt: (potentialDrop: number) => number;
  /** D(d) of one drop d, K. */
  readonly potentialDropAt: (drop: number) => number;
  /** Writes D(d_i) (K) and κ_i = k(T_i)/k_ref for the drops d_i (K) of every node. */
  readonly evaluate: (drop: Float64Array, potentialDrop: Float64Array, ratio: Float64Array) => void;
  /** Writes the drops d_i = D^-1(D_i) (K) of the potential drops D_i (K) of every node (dropAt of each). */
  readonly dropsAt: (potentialDrop: Float64Array, drop: Float64Array) => void;
  /** The linear pieces of k between θ = lo and θ = hi (lo < hi), in order. */
  readonly pieces: (lo: number, hi: number) => ConductivityPiece[];
}

/** Kirchhoff transform of a conductivity, fluid at ambient_degC, base excess thetaBase (K). */
export function kirchhoffTransform(conductivity: Conductivity, ambient_degC: number, thetaBase: number): KirchhoffTransform {
  switch (conductivity.kind) {
    case 'constant':
      return constantTransform(conductivity.k);
    case 'table':
      return conductivity.k.length === 1
        ? constantTransform(conductivity.k[0] as number)
        : tableTransform(conductivity.T_degC, conductivity.k, ambient_degC, thetaBase);
    default: {
      const never: never = conductivity;
      throw new Error(`unknown conductivity ${JSON.stringify(never)}`);
    }
  }
}

function constantTransform(k: number): KirchhoffTransform {
  return {
    constant: true,
    kRef: k,
    conductivityAt: () => k,
    dropAt: (potentialDrop) => potentialDrop,
    potentialDropAt: (drop) => drop,
    evaluate: (drop, potentialDrop, ratio) => {
      potentialDrop.set(drop);
      ratio.fill(1);
    },
    dropsAt: (potentialDrop, drop) => drop.set(potentialDrop),
    pieces: (lo, hi) => [{ from: lo, to: hi, k, slope: 0 }],
  };
}

/** A table as a piecewise-linear function of a coordinate, ascending points, constant beyond the ends. */
interface PiecewiseLinear {
  readonly at: Float64Array;
  readonly values: Float64Array;
  readonly slopes: Float64Array;
}

function piecewiseLinear(at: Float64Array, values: Float64Array): PiecewiseLinear {
  const slopes = new Float64Array(at.length - 1);
  for (let j = 0; j + 1 < at.length; j++) {
    slopes[j] = ((values[j + 1] as number) - (values[j] as number)) / ((at[j + 1] as number) - (at[j] as number));
  }
  return { at, values, slopes };
}

/** Segment j with at[j] <= s < at[j+1]; -1 below the first point, last index at or above the last. */
function segmentOf(f: PiecewiseLinear, s: number): number {
  const { at } = f;
  const last = at.length - 1;
  if (s < (at[0] as number)) return -1;
  if (s >= (at[last] as number)) return last;
  let low = 0;
  let high = last;
  while (high - low > 1) {
    const mid = (low + high) >> 1;
    if ((at[mid] as number) <= s) low = mid;
    else high = mid;
  }
  return low;
}

/** f(s) on its segment j = segmentOf(f, s). */
function valueOnSegment(f: PiecewiseLinear, j: number, s: number): number {
  const last = f.at.length - 1;
  if (j < 0) return f.values[0] as number;
  if (j === last) return f.values[last] as number;
  return (f.values[j] as number) + (f.slopes[j] as number) * (s - (f.at[j] as number));
}

function valueAt(f: PiecewiseLinear, s: number): number {
  return valueOnSegment(f, segmentOf(f, s), s);
}

/**
 * A table's Kirchhoff transform as plain data: k over the drop e = θ_b - θ (ascending e), ∫_0^{e_j} k de at its
 * points, and the segment of e = 0. The per-node functions below take it as an argument (not closures over it), so
 * a node loop reads its fields once: closures re-read them at every node (measured 3x slower in a Newton solve).
 */
interface DropTable {
  readonly byDrop: PiecewiseLinear;
  /** ∫_0^{e_j} k de at every table point, W/m (signed: negative below e = 0), as the coordinate of a PiecewiseLinear. */
  readonly integralAt: PiecewiseLinear;
  readonly kRef: number;
  readonly zeroSegment: number;
}

/** (1/k_ref) ∫_0^d k de, d on segment j of byDrop, kd = k(d): from the last table point between 0 and d (or from 0), one exact trapezoid. */
function potentialOnSegment(t: DropTable, j: number, d: number, kd: number): number {
  const { kRef, zeroSegment } = t;
  if (j === zeroSegment) return (0.5 * d * (kRef + kd)) / kRef;
  // d above the segment of 0: start from point j (<= d); below it: from point j + 1 (>= d).
  const from = j > zeroSegment ? j : j + 1;
  const e = t.byDrop.at[from] as number;
  return ((t.integralAt.at[from] as number) + 0.5 * (d - e) * ((t.byDrop.values[from] as number) + kd)) / kRef;
}

/** D^-1(D) for the target k_ref D on its segment j of integralAt (header: the root of a quadratic). */
function dropOnSegment(t: DropTable, j: number, target: number): number {
  const { byDrop, kRef, zeroSegment } = t;
  // Start point and slope of the piece, as in potentialOnSegment.
  let e0 = 0;
  let I0 = 0;
  let k0 = kRef;
  if (j !== zeroSegment) {
    const from = j > zeroSegment ? j : j + 1;
    e0 = byDrop.at[from] as number;
    I0 = t.integralAt.at[from] as number;
    k0 = byDrop.values[from] as number;
  }
  const slope = j < 0 || j === byDrop.at.length - 1 ? 0 : (byDrop.slopes[j] as number);
  const q = target - I0;
  return e0 + (2 * q) / (k0 + Math.sqrt(Math.max(0, k0 * k0 + 2 * slope * q)));
}

function tableTransform(T_degC: Float64Array, k: Float64Array, ambient_degC: number, thetaBase: number): KirchhoffTransform {
  const count = k.length;
  const byTheta = piecewiseLinear(
    Float64Array.from(T_degC, (T) => T - ambient_degC),
    k,
  );
  // The same table over the drop e = θ_b - θ (ascending e: reversed order).
  const byDrop = piecewiseLinear(
    Float64Array.from({ length: count }, (_, j) => thetaBase - (T_degC[count - 1 - j] as number) + ambient_degC),
    Float64Array.from({ length: count }, (_, j) => k[count - 1 - j] as number),
  );
  const kRef = valueAt(byDrop, 0);
  // ∫_0^{e_j} k de at every table point (signed: negative below e = 0), by exact trapezoids outward from 0.
  const pointIntegral = new Float64Array(count);
  const zeroSegment = segmentOf(byDrop, 0);
  for (let j = zeroSegment + 1; j < count; j++) {
    const e = byDrop.at[j] as number;
    const previous = j === zeroSegment + 1 ? 0 : (byDrop.at[j - 1] as number);
    const kPrevious = j === zeroSegment + 1 ? kRef : (byDrop.values[j - 1] as number);
    const base = j === zeroSegment + 1 ? 0 : (pointIntegral[j - 1] as number);
    pointIntegral[j] = base + 0.5 * (e - previous) * (kPrevious + (byDrop.values[j] as number));
  }
  for (let j = zeroSegment; j >= 0; j--) {
    const e = byDrop.at[j] as number;
    const next = j === zeroSegment ? 0 : (byDrop.at[j + 1] as number);
    const kNext = j === zeroSegment ? kRef : (byDrop.values[j + 1] as number);
    const base = j === zeroSegment ? 0 : (pointIntegral[j + 1] as number);
    pointIntegral[j] = base - 0.5 * (next - e) * (kNext + (byDrop.values[j] as number));
  }
  // The integral at every table point is increasing in e (k > 0): the piece of a potential drop is found on it.
  const table: DropTable = { byDrop, integralAt: piecewiseLinear(pointIntegral, new Float64Array(count)), kRef, zeroSegment };
  return {
    constant: false,
    kRef,
    conductivityAt: (theta) => valueAt(byTheta, theta),
    dropAt: (D) => {
      const target = D * kRef;
      return dropOnSegment(table, segmentOf(table.integralAt, target), target);
    },
    potentialDropAt: (d) => {
      const j = segmentOf(byDrop, d);
      return potentialOnSegment(table, j, d, valueOnSegment(byDrop, j, d));
    },
    evaluate: (drop, potential, ratio) => evaluateTable(table, drop, potential, ratio),
    dropsAt: (potential, drop) => dropsOfTable(table, potential, drop),
    pieces: (lo, hi) => {
      const cuts = [lo];
      for (let j = 0; j < count; j++) {
        const c = byTheta.at[j] as number;
        if (c > lo && c < hi) cuts.push(c);
      }
      cuts.push(hi);
      const pieces: ConductivityPiece[] = [];
      for (let p = 0; p + 1 < cuts.length; p++) {
        const from = cuts[p] as number;
        const to = cuts[p + 1] as number;
        const j = segmentOf(byTheta, 0.5 * (from + to));
        const slope = j < 0 || j === count - 1 ? 0 : (byTheta.slopes[j] as number);
        pieces.push({ from, to, k: valueAt(byTheta, from), slope });
      }
      return pieces;
    },
  };
}

/** The interval [lo, hi) of θ-drops (or integrals) that segmentOf maps to segment j: as wide as the search's answer. */
function segmentBounds(f: PiecewiseLinear, j: number): [number, number] {
  const last = f.at.length - 1;
  if (j < 0) return [-Infinity, f.at[0] as number];
  if (j >= last) return [f.at[last] as number, Infinity];
  return [f.at[j] as number, f.at[j + 1] as number];
}

/**
 * D(d_i) and κ_i = k(d_i)/k_ref of every node (KirchhoffTransform.evaluate): valueOnSegment and potentialOnSegment
 * with the constants of the current segment held in locals, looked up again only when a node leaves the segment
 * (neighbouring nodes almost never do). The same operations in the same order: the one-node forms' bits (test).
 */
function evaluateTable(t: DropTable, drop: Float64Array, potential: Float64Array, ratio: Float64Array): void {
  const { byDrop, kRef, zeroSegment } = t;
  const last = byDrop.at.length - 1;
  let lo = Infinity;
  let hi = -Infinity;
  // k(d) = kAt + kSlope (d - eAt) inside the table, kEnd beyond its ends.
  let inside = false;
  let eAt = 0;
  let kAt = 0;
  let kSlope = 0;
  let kEnd = 0;
  // The trapezoid from 0 (segment of 0), or from the point (eFrom, iFrom, kFrom).
  let fromZero = true;
  let eFrom = 0;
  let iFrom = 0;
  let kFrom = 0;
  for (let i = 0; i < drop.length; i++) {
    const d = drop[i] as number;
    if (!(lo <= d && d < hi)) {
      const j = segmentOf(byDrop, d);
      [lo, hi] = segmentBounds(byDrop, j);
      inside = j >= 0 && j < last;
      kEnd = byDrop.values[j < 0 ? 0 : last] as number;
      if (inside) {
        eAt = byDrop.at[j] as number;
        kAt = byDrop.values[j] as number;
        kSlope = byDrop.slopes[j] as number;
      }
      fromZero = j === zeroSegment;
      if (!fromZero) {
        const from = j > zeroSegment ? j : j + 1;
        eFrom = byDrop.at[from] as number;
        iFrom = t.integralAt.at[from] as number;
        kFrom = byDrop.values[from] as number;
      }
    }
    const kd = inside ? kAt + kSlope * (d - eAt) : kEnd;
    potential[i] = fromZero ? (0.5 * d * (kRef + kd)) / kRef : (iFrom + 0.5 * (d - eFrom) * (kFrom + kd)) / kRef;
    ratio[i] = kd / kRef;
  }
}

/** d_i = D^-1(D_i) of every node (KirchhoffTransform.dropsAt): dropOnSegment with its segment's constants in locals, as evaluateTable. */
function dropsOfTable(t: DropTable, potential: Float64Array, drop: Float64Array): void {
  const { byDrop, integralAt, kRef, zeroSegment } = t;
  const last = byDrop.at.length - 1;
  let lo = Infinity;
  let hi = -Infinity;
  let e0 = 0;
  let I0 = 0;
  let k0 = kRef;
  let slope = 0;
  for (let i = 0; i < potential.length; i++) {
    const target = (potential[i] as number) * kRef;
    if (!(lo <= target && target < hi)) {
      const j = segmentOf(integralAt, target);
      [lo, hi] = segmentBounds(integralAt, j);
      e0 = 0;
      I0 = 0;
      k0 = kRef;
      if (j !== zeroSegment) {
        const from = j > zeroSegment ? j : j + 1;
        e0 = byDrop.at[from] as number;
        I0 = integralAt.at[from] as number;
        k0 = byDrop.values[from] as number;
      }
      slope = j < 0 || j === last ? 0 : (byDrop.slopes[j] as number);
    }
    const q = target - I0;
    drop[i] = e0 + (2 * q) / (k0 + Math.sqrt(Math.max(0, k0 * k0 + 2 * slope * q)));
  }
}
