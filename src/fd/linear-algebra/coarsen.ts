/**
 * Grid transfers and Galerkin coarse operators for the structured multigrid.
 *
 * Along a coarsened direction the coarse nodes are the fine nodes 0, 2, 4, ... and the last node; a fine
 * node between two coarse ones takes half of each (linear interpolation in the index). The prolongation is
 * the tensor product P = Px (x) Py (a direction not coarsened uses the identity), the restriction is P^T,
 * and the coarse operator is A_c = P^T A P (Galerkin), computed one direction at a time: a 9-point
 * stencil stays a 9-point stencil, symmetric positive definite when A is. Trottenberg, Oosterlee &
 * Schuller, "Multigrid" (2001), sections 2.3 and 7.2 (Galerkin coarse-grid operator) [from memory].
 */
import { emptyFullStencil, type FullStencil } from './full-stencil.js';

/** Parents of each fine index along one direction: p0 with weight w0, and p1 with w1 (p1 = -1: none). */
export interface Transfer1D {
  /** 'linear': coarse = even fine nodes and the last; 'identity': not coarsened. */
  readonly kind: 'linear' | 'identity';
  readonly fine: number;
  readonly coarse: number;
  readonly p0: Int32Array;
  readonly w0: Float64Array;
  readonly p1: Int32Array;
  readonly w1: Float64Array;
}

export function linearTransfer(fine: number): Transfer1D {
  const coarse = Math.ceil((fine - 1) / 2) + 1;
  const p0 = new Int32Array(fine);
  const w0 = new Float64Array(fine);
  const p1 = new Int32Array(fine).fill(-1);
  const w1 = new Float64Array(fine);
  for (let f = 0; f < fine; f++) {
    if (f % 2 === 0 || f === fine - 1) {
      p0[f] = Math.ceil(f / 2);
      w0[f] = 1;
    } else {
      p0[f] = (f - 1) / 2;
      w0[f] = 0.5;
      p1[f] = (f + 1) / 2;
      w1[f] = 0.5;
    }
  }
  return { kind: 'linear', fine, coarse, p0, w0, p1, w1 };
}

export function identityTransfer(n: number): Transfer1D {
  return {
    kind: 'identity',
    fine: n,
    coarse: n,
    p0: Int32Array.from({ length: n }, (_, f) => f),
    w0: new Float64Array(n).fill(1),
    p1: new Int32Array(n).fill(-1),
    w1: new Float64Array(n),
  };
}

/**
 * P^T A P with P acting along x only (t: the transfer along x). Coarse columns 1 <= I with 2I + 2 < nx
 * have the regular children 2I - 1, 2I, 2I + 1 (weights 1/2, 1, 1/2) and are gathered in one pass each
 * (galerkinColumnX); the columns at the two ends, whose children differ, are scattered fine column by
 * fine column.
 */
export function galerkinAlongX(a: FullStencil, t: Transfer1D): FullStencil {
  const { nodesX: nx, nodesY: ny, c } = a;
  const out = emptyFullStencil(t.coarse, ny);
  const oc = out.c;
  const { p0, w0, p1, w1 } = t;
  const regular = (I: number): boolean => t.kind === 'linear' && I >= 1 && 2 * I + 2 < nx;
  for (let I = 1; regular(I); I++) {
    for (let dj = -1; dj <= 1; dj++) galerkinColumnX(a, out, I, dj);
  }
  for (let i = 0; i < nx; i++) {
    if (regular(p0[i] as number) && (p1[i] as number) < 0) continue; // all its targets are gathered
    for (let di = -1; di <= 1; di++) {
      const i2 = i + di;
      if (i2 < 0 || i2 >= nx) continue;
      for (let dj = -1; dj <= 1; dj++) {
        if (!a.diagonals && di !== 0 && dj !== 0) continue; // zero diagonal couplings
        const coef = c[3 * (di + 1) + (dj + 1)] as Float64Array;
        for (let pa = 0; pa < 2; pa++) {
          const I = pa === 0 ? (p0[i] as number) : (p1[i] as number);
          if (I < 0 || regular(I)) continue;
          const wa = pa === 0 ? (w0[i] as number) : (w1[i] as number);
          for (let pb = 0; pb < 2; pb++) {
            const I2 = pb === 0 ? (p0[i2] as number) : (p1[i2] as number);
            if (I2 < 0) continue;
            const w = wa * (pb === 0 ? (w0[i2] as number) : (w1[i2] as number));
            const target = oc[3 * (I2 - I + 1) + (dj + 1)] as Float64Array;
            const fineStart = i * ny;
            const coarseStart = I * ny;
            for (let j = 0; j < ny; j++) target[coarseStart + j] = (target[coarseStart + j] as number) + w * (coef[fineStart + j] as number);
          }
        }
      }
    }
  }
  return out;
}

/**
 * The coarse couplings (dI = -1, 0, 1; dj) of a regular coarse column I, from fine columns a = 2I - 1,
 * b = 2I, c = 2I + 1 (A-, A0, A+: fine couplings to the west, same and east column, all with this dj):
 *   T0 = A0(a)/4 + A+(a)/2 + A-(b)/2 + A0(b) + A+(b)/2 + A-(c)/2 + A0(c)/4,
 *   T+ = A+(b)/2 + A0(c)/4 + A+(c)/2,     T- = A-(b)/2 + A0(a)/4 + A-(a)/2.
 */
function galerkinColumnX(a: FullStencil, out: FullStencil, I: number, dj: number): void {
  const ny = a.nodesY;
  const am = a.c[dj + 1] as Float64Array;
  const az = a.c[4 + dj] as Float64Array;
  const ap = a.c[7 + dj] as Float64Array;
  const tm = out.c[dj + 1] as Float64Array;
  const tz = out.c[4 + dj] as Float64Array;
  const tp = out.c[7 + dj] as Float64Array;
  const fa = (2 * I - 1) * ny;
  const fb = fa + ny;
  const fc = fb + ny;
  const o = I * ny;
  if (!a.diagonals && dj !== 0) {
    // 5-point fine operator: only the couplings within a column (A0) carry this dj.
    for (let j = 0; j < ny; j++) {
      const za = 0.25 * (az[fa + j] as number);
      const zc = 0.25 * (az[fc + j] as number);
      tz[o + j] = za + (az[fb + j] as number) + zc;
      tp[o + j] = zc;
      tm[o + j] = za;
    }
    return;
  }
  for (let j = 0; j < ny; j++) {
    const za = 0.25 * (az[fa + j] as number);
    const zc = 0.25 * (az[fc + j] as number);
    const pb = 0.5 * (ap[fb + j] as number);
    const mb = 0.5 * (am[fb + j] as number);
    tz[o + j] = za + 0.5 * (ap[fa + j] as number) + mb + (az[fb + j] as number) + pb + 0.5 * (am[fc + j] as number) + zc;
    tp[o + j] = pb + zc + 0.5 * (ap[fc + j] as number);
    tm[o + j] = mb + za + 0.5 * (am[fa + j] as number);
  }
}

/** P^T A P with P acting along y only (column by column, contiguous in memory). */
export function galerkinAlongY(a: FullStencil, t: Transfer1D): FullStencil {
  const { nodesX: nx, nodesY: ny, c } = a;
  const nyc = t.coarse;
  const out = emptyFullStencil(nx, nyc);
  const oc = out.c;
  const { p0, w0, p1, w1 } = t;
  for (let i = 0; i < nx; i++) {
    const fs = i * ny;
    const cs = i * nyc;
    for (let k = 0; k < 9; k++) {
      if (!a.diagonals && k !== 1 && k !== 3 && k !== 4 && k !== 5 && k !== 7) continue; // zero diagonal couplings
      const diOffset = 3 * Math.floor(k / 3);
      const dj = (k % 3) - 1;
      const coef = c[k] as Float64Array;
      for (let j = 0; j < ny; j++) {
        const v = coef[fs + j] as number;
        if (v === 0) continue;
        const j2 = j + dj;
        const Ja = p0[j] as number;
        const wa = w0[j] as number;
        const Jb = p1[j] as number;
        const wb = w1[j] as number;
        const J2a = p0[j2] as number;
        const w2a = w0[j2] as number;
        const J2b = p1[j2] as number;
        const w2b = w1[j2] as number;
        let target = oc[diOffset + (J2a - Ja + 1)] as Float64Array;
        target[cs + Ja] = (target[cs + Ja] as number) + wa * w2a * v;
        if (J2b >= 0) {
          target = oc[diOffset + (J2b - Ja + 1)] as Float64Array;
          target[cs + Ja] = (target[cs + Ja] as number) + wa * w2b * v;
        }
        if (Jb >= 0) {
          target = oc[diOffset + (J2a - Jb + 1)] as Float64Array;
          target[cs + Jb] = (target[cs + Jb] as number) + wb * w2a * v;
          if (J2b >= 0) {
            target = oc[diOffset + (J2b - Jb + 1)] as Float64Array;
            target[cs + Jb] = (target[cs + Jb] as number) + wb * w2b * v;
          }
        }
      }
    }
  }
  return out;
}

/** coarse = P^T fine (overwrites coarse). */
export function restrict(fine: Float64Array, coarse: Float64Array, tx: Transfer1D, ty: Transfer1D): void {
  coarse.fill(0);
  const nyf = ty.fine;
  const nyc = ty.coarse;
  const linearY = ty.kind === 'linear';
  for (let i = 0; i < tx.fine; i++) {
    for (let pa = 0; pa < 2; pa++) {
      const I = pa === 0 ? (tx.p0[i] as number) : (tx.p1[i] as number);
      if (I < 0) continue;
      const wx = pa === 0 ? (tx.w0[i] as number) : (tx.w1[i] as number);
      const fs = i * nyf;
      const cs = I * nyc;
      if (!linearY) {
        for (let j = 0; j < nyf; j++) coarse[cs + j] = (coarse[cs + j] as number) + wx * (fine[fs + j] as number);
        continue;
      }
      // Fine j even -> coarse j/2 (weight 1); j odd inside -> half to each neighbour; the last -> the last.
      let j = 0;
      for (; j + 2 < nyf; j += 2) {
        const half = 0.5 * wx * (fine[fs + j + 1] as number);
        const cj = cs + (j >> 1);
        coarse[cj] = (coarse[cj] as number) + wx * (fine[fs + j] as number) + half;
        coarse[cj + 1] = (coarse[cj + 1] as number) + half;
      }
      const cj = cs + (j >> 1);
      coarse[cj] = (coarse[cj] as number) + wx * (fine[fs + j] as number);
      if (j + 1 < nyf) coarse[cj + 1] = (coarse[cj + 1] as number) + wx * (fine[fs + j + 1] as number);
    }
  }
}

/**
 * coarse = P^T fine for a fine vector that is zero on the odd columns (the residual right after a zebra
 * sweep, odd columns last), with tx linear: each coarse column I is then the y-restriction of fine
 * column 2I alone (weight 1); the odd columns are not read (they need not even be cleared). The last
 * coarse column of an even-sized grid has only the odd last fine column as child, so it is zero.
 */
export function restrictEvenColumns(fine: Float64Array, coarse: Float64Array, tx: Transfer1D, ty: Transfer1D): void {
  if (tx.kind !== 'linear') throw new Error('restrictEvenColumns: needs a linear transfer along x');
  const nyf = ty.fine;
  const nyc = ty.coarse;
  const linearY = ty.kind === 'linear';
  coarse.fill(0, (tx.coarse - 1) * nyc);
  for (let i = 0; i < tx.fine; i += 2) {
    const fs = i * nyf;
    const cs = (i >> 1) * nyc;
    if (!linearY) {
      coarse.set(fine.subarray(fs, fs + nyf), cs);
      continue;
    }
    let j = 0;
    let carry = 0;
    for (; j + 2 < nyf; j += 2) {
      const half = 0.5 * (fine[fs + j + 1] as number);
      coarse[cs + (j >> 1)] = carry + (fine[fs + j] as number) + half;
      carry = half;
    }
    const cj = cs + (j >> 1);
    coarse[cj] = carry + (fine[fs + j] as number);
    if (j + 1 < nyf) coarse[cj + 1] = fine[fs + j + 1] as number;
  }
}

/** fine += P coarse. */
export function prolongAdd(coarse: Float64Array, fine: Float64Array, tx: Transfer1D, ty: Transfer1D): void {
  const nyf = ty.fine;
  const nyc = ty.coarse;
  const linearY = ty.kind === 'linear';
  for (let i = 0; i < tx.fine; i++) {
    for (let pa = 0; pa < 2; pa++) {
      const I = pa === 0 ? (tx.p0[i] as number) : (tx.p1[i] as number);
      if (I < 0) continue;
      const wx = pa === 0 ? (tx.w0[i] as number) : (tx.w1[i] as number);
      const fs = i * nyf;
      const cs = I * nyc;
      if (!linearY) {
        for (let j = 0; j < nyf; j++) fine[fs + j] = (fine[fs + j] as number) + wx * (coarse[cs + j] as number);
        continue;
      }
      let j = 0;
      for (; j + 2 < nyf; j += 2) {
        const cj = cs + (j >> 1);
        const a = coarse[cj] as number;
        const b = coarse[cj + 1] as number;
        fine[fs + j] = (fine[fs + j] as number) + wx * a;
        fine[fs + j + 1] = (fine[fs + j + 1] as number) + 0.5 * wx * (a + b);
      }
      const cj = cs + (j >> 1);
      fine[fs + j] = (fine[fs + j] as number) + wx * (coarse[cj] as number);
      if (j + 1 < nyf) fine[fs + j + 1] = (fine[fs + j + 1] as number) + wx * (coarse[cj + 1] as number);
    }
  }
}
