/**
 * Geometric multigrid V-cycle on the structured grid, used as the preconditioner of conjugate gradients.
 *
 * One V(1,1) cycle from a zero guess: zebra line Gauss-Seidel across the thin direction (even columns,
 * then odd), residual, restriction (P^T), the same on the Galerkin coarse operator P^T A P, prolongation
 * (P), zebra again in the reverse colour order; an exact banded Cholesky solve on the coarsest grid.
 * Zebra instead of lexicographic line relaxation: 6-9 instead of 10-11 CG iterations on the fin grids of
 * tests/fd2d. Reversed colour order after the correction, R = P^T and Galerkin coarse operators make the
 * cycle a symmetric positive definite operator, as CG requires (Tatebe 1993, "The multigrid preconditioned conjugate gradient method", NASA CP-3224 [from memory]).
 * Coarsening: always along x (the long direction); along y too while the couplings across (y) are at
 * least half as strong as those along (x). Where the x couplings dominate (cells shorter than high), y-line
 * relaxation cannot smooth along y, and semicoarsening along x alone keeps the cycle robust (line
 * relaxation + semicoarsening: Trottenberg, Oosterlee & Schuller 2001, section 5.1 [from memory]).
 */
import { factorBandedCholesky } from './banded-cholesky.js';
import type { BandedFactor } from './banded-factor.js';
import {
  galerkinAlongX,
  galerkinAlongY,
  identityTransfer,
  linearTransfer,
  prolongAdd,
  restrict,
  restrictEvenColumns,
  type Transfer1D,
} from './coarsen.js';
import { toFullStencil, toStencil9, type FullStencil } from './full-stencil.js';
import { factorLines, zebraFromZero, zebraLineGaussSeidel, type LineFactors } from './line-smoother.js';
import type { Stencil9 } from './stencil9.js';

export interface MultigridLevel {
  readonly nodesX: number;
  readonly nodesY: number;
}

export interface Multigrid {
  /** Grids from fine to coarse. */
  readonly levels: MultigridLevel[];
  /** z = M^-1 r: one V-cycle from zero (r is not modified). */
  apply(r: Float64Array, z: Float64Array): void;
}

/** Stop coarsening below this many nodes (the coarsest grid is solved exactly). */
const COARSEST_NODES = 400;
/**
 * Coarsen across (y) too only where the y couplings of a node are at least this multiple of its x
 * couplings, at all but a small fraction of the nodes (graded grids change the cell aspect ratio, and
 * with it the local anisotropy, by up to 64 between the base and the tip).
 */
const FULL_COARSENING_RATIO = 0.5;
const FULL_COARSENING_EXCEPTIONS = 0.01;

interface Level {
  a: FullStencil;
  lines: LineFactors;
  /** Solution and right-hand side of the coarse-grid equations (unused on the finest level). */
  x: Float64Array;
  b: Float64Array;
  r: Float64Array;
  work: Float64Array;
  /** Transfers to the next coarser level (absent on the coarsest). */
  tx: Transfer1D | null;
  ty: Transfer1D | null;
}

export function buildMultigrid(matrix: Stencil9): Multigrid {
  const levels: Level[] = [];
  let a = toFullStencil(matrix);
  for (;;) {
    const { nodesX: nx, nodesY: ny } = a;
    const n = nx * ny;
    const first = levels.length === 0;
    const level: Level = {
      a,
      lines: factorLines(a),
      x: new Float64Array(first ? 0 : n),
      b: new Float64Array(first ? 0 : n),
      r: new Float64Array(n),
      work: new Float64Array(ny),
      tx: null,
      ty: null,
    };
    levels.push(level);
    const canX = nx > 3;
    // Along y as well when the y couplings are strong enough, or when x cannot be coarsened any more.
    const canY = ny > 3 && (!canX || xStrongFraction(a) <= FULL_COARSENING_EXCEPTIONS);
    if (n <= COARSEST_NODES || (!canX && !canY)) break;
    level.tx = canX ? linearTransfer(nx) : identityTransfer(nx);
    level.ty = canY ? linearTransfer(ny) : identityTransfer(ny);
    let coarse = canX ? galerkinAlongX(a, level.tx) : a;
    if (canY) coarse = galerkinAlongY(coarse, level.ty);
    a = coarse;
  }
  const coarsest = levels[levels.length - 1] as Level;
  const direct: BandedFactor = factorBandedCholesky(toStencil9(coarsest.a));

  // One V-cycle on level l for A_l x = b, from x = 0 (level 0 uses the caller's arrays: no copies).
  const cycle = (l: number, b: Float64Array, x: Float64Array): void => {
    const level = levels[l] as Level;
    if (l === levels.length - 1) {
      direct.solve(b, x);
      return;
    }
    const { a: al, lines, r, work } = level;
    zebraFromZero(al, lines, b, x, work);
    const tx = level.tx as Transfer1D;
    residualAfterZebra(al, x, r, tx.kind === 'linear');
    const next = levels[l + 1] as Level;
    if (tx.kind === 'linear') restrictEvenColumns(r, next.b, tx, level.ty as Transfer1D);
    else restrict(r, next.b, tx, level.ty as Transfer1D);
    cycle(l + 1, next.b, next.x);
    prolongAdd(next.x, x, level.tx as Transfer1D, level.ty as Transfer1D);
    zebraLineGaussSeidel(al, lines, b, x, work, false);
  };

  return {
    levels: levels.map((l) => ({ nodesX: l.a.nodesX, nodesY: l.a.nodesY })),
    apply(r: Float64Array, z: Float64Array): void {
      cycle(0, r, z);
    },
  };
}

/**
 * r = b - A x right after a zebra sweep (even columns, then odd) from x = 0: the odd columns were solved
 * last, exactly, so their residual is zero; each even column was solved with its odd neighbours still at
 * zero, so its residual is minus its couplings to them times their new values.
 */
function residualAfterZebra(a: FullStencil, x: Float64Array, r: Float64Array, evenOnly: boolean): void {
  const { nodesX: nx, nodesY: ny, c } = a;
  const [sw, w, nw, , , , se, e, ne] = c;
  for (let i = 0; i < nx; i++) {
    const start = i * ny;
    if (i % 2 === 1) {
      // Zero residual; written only when the restriction reads odd columns (no coarsening along x).
      if (!evenOnly) r.fill(0, start, start + ny);
      continue;
    }
    if (!a.diagonals) {
      // 5-point rows: west and east neighbours only.
      for (let p = start; p < start + ny; p++) {
        let v = 0;
        if (i > 0) v += (w[p] as number) * (x[p - ny] as number);
        if (i + 1 < nx) v += (e[p] as number) * (x[p + ny] as number);
        r[p] = -v;
      }
      continue;
    }
    for (let j = 0; j < ny; j++) {
      const p = start + j;
      let v = 0;
      if (i > 0) {
        const q = p - ny;
        v += (w[p] as number) * (x[q] as number);
        if (j > 0) v += (sw[p] as number) * (x[q - 1] as number);
        if (j + 1 < ny) v += (nw[p] as number) * (x[q + 1] as number);
      }
      if (i + 1 < nx) {
        const q = p + ny;
        v += (e[p] as number) * (x[q] as number);
        if (j > 0) v += (se[p] as number) * (x[q - 1] as number);
        if (j + 1 < ny) v += (ne[p] as number) * (x[q + 1] as number);
      }
      r[p] = -v;
    }
  }
}

/** Fraction of the nodes whose y couplings are below FULL_COARSENING_RATIO x their x couplings. */
function xStrongFraction(a: FullStencil): number {
  const [sw, w, nw, s, , n, se, e, ne] = a.c;
  let count = 0;
  const total = a.nodesX * a.nodesY;
  for (let p = 0; p < total; p++) {
    const diagonal = 0.5 * (Math.abs(sw[p] as number) + Math.abs(nw[p] as number) + Math.abs(se[p] as number) + Math.abs(ne[p] as number));
    const along = Math.abs(w[p] as number) + Math.abs(e[p] as number) + diagonal;
    const across = Math.abs(s[p] as number) + Math.abs(n[p] as number) + diagonal;
    if (across < FULL_COARSENING_RATIO * along) count++;
  }
  return count / total;
}
