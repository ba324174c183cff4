/**
 * Assembly of the 3-D heat-sink system on one grid (cell-centred finite volumes), in excess temperature theta (K).
 *
 * Plate cell (i, j, k), volume dx_i dy_j dz_k, unknown index (i ny + j) nz + k. Between neighbouring cells the
 * conductance k_p A / d (A the shared face, d the distance between the centres):
 *   sum_nb G (theta_nb − theta_P) − G_b theta_P + Q_P = 0,
 * with, on the underside, Q_P = q''_s dx dy in source s (q''_s = P_s / its cells' area, so the power is exact)
 * and otherwise G_b = 1 / (1/(h_u dx dy) + (dz/2)/(k_p dx dy)) (h_u absent: adiabatic); on the exposed top the same
 * with h_plate; narrow edges adiabatic. Every boundary conductance is a half cell in series with the surface.
 *
 * Fins, representation 'sheet' (fin-sheet-assembly.ts): a plate fin is a 2-D conducting sheet in (y, s) with
 * the profile's thickness t(s) (temperature uniform across the thickness: thin fin), one node per (row j, layer l);
 * a pin one node per layer. Representation 'cells' (fin-cell-assembly.ts, rectangular plate fins): the fin's own
 * Cartesian cells on the plate's x and y lines, the plate's z columns continued up through the fin.
 * Where a fin meets the plate, each plate top cell under its footprint is joined to the fin's first node by a
 * half plate cell in series with the fin's share of its first half layer (conservative, continuous flux).
 *
 * The heat terms are kept as data so that every heat rate is computed from the same conductances as the
 * matrix: losses (node, G, fixed theta, owner: fin index, or PLATE_TOP / UNDERSIDE) and root couplings.
 */
import type { SinkGrid } from '../../mesh/index.js';
import { ConductanceBuilder, deferredCsr, type CsrMatrix } from '../linear-algebra/csr.js';
import { PLATE_TOP, TermLists, UNDERSIDE, type FinAssembly, type HeatTerms, type RootTerms } from './heat-terms.js';
import type { SinkLevelGrid } from '../linear-algebra/aggregation.js';
import type { LineSet } from '../linear-algebra/line-relaxation.js';
import { stencilFromCouplings, type SinkStencil } from '../linear-algebra/sink-stencil.js';
import type { Prolongation } from '../linear-algebra/prolongation.js';
import { assembleFinCells } from './fin-cell-assembly.js';
import { assembleFinSheets } from './fin-sheet-assembly.js';
import type { SinkProblem } from './sink-problem.js';

export type FinRepresentation = 'sheet' | 'cells';
export { PLATE_TOP, UNDERSIDE };
export type { FinAssembly, HeatTerms, RootTerms } from './heat-terms.js';

export interface SinkSystem {
  grid: SinkGrid;
  representation: FinRepresentation;
  matrix: CsrMatrix;
  /** The matrix as the multigrid's structured stencil (sink-stencil.ts); null for fins as cells. */
  stencil: SinkStencil | null;
  rhs: Float64Array;
  lines: LineSet;
  /** The unknowns in the sheet layout, for the multigrid (fins as cells: after `fold`). */
  levelGrid: SinkLevelGrid;
  /** Fins as cells: each fin cell onto its sheet node (weight 1); null for sheets. */
  fold: Prolongation | null;
  plateUnknowns: number;
  losses: HeatTerms;
  roots: RootTerms;
  /** Heat flux of each source on this grid, W/m^2. */
  sourceFlux: Float64Array;
  /** Fin covering each plate column (i ny + j), −1 where the top is exposed. */
  footprintOwner: Int32Array;
  /** Heat put in by the sources, W. */
  heatIn: number;
}

/** Unknowns of a grid (for the memory estimate before anything is allocated). */
export function sinkUnknowns(grid: SinkGrid, representation: FinRepresentation, finKind: 'plates' | 'pins' | 'bare'): number {
  const plate = grid.nx * grid.ny * grid.nz;
  let fins = 0;
  for (const f of grid.fins) {
    if (finKind === 'pins') fins += grid.ns;
    else if (representation === 'cells') fins += (f.i1 - f.i0) * (f.j1 - f.j0) * grid.ns;
    else fins += (f.j1 - f.j0) * grid.ns;
  }
  return plate + fins;
}

/**
 * Each phase of the assembly is a function of its own, called once a grid: a small function is optimised as soon as
 * its loop is hot, where one long function was recompiled whole for each loop it entered (and fell back to the
 * interpreter at every phase its first compilation had not seen). The couplings and terms are added in the same order.
 */
export function assembleSink(problem: SinkProblem, grid: SinkGrid, representation: FinRepresentation): SinkSystem {
  const { nx, ny, nz, x, y, z } = grid;
  const plateUnknowns = nx * ny * nz;
  const n = sinkUnknowns(grid, representation, problem.layout.finKind);
  // At most three couplings an unknown to higher neighbours (plate; fins as cells), plus a root per plate column.
  const builder = new ConductanceBuilder(n, 3 * n + nx * ny);
  const rhs = new Float64Array(n);
  const terms = new TermLists(builder, rhs);

  // Plate conduction; for sheets also into the multigrid's stencil (sink-stencil.ts), whose unknowns these are.
  const finCells = representation === 'cells' && problem.layout.finKind === 'plates';
  const known = finCells ? null : { line: new Float64Array(n), gx: new Float64Array(plateUnknowns), gy: new Float64Array(plateUnknowns), from: 0 };
  plateConduction(builder, grid, problem.kPlate, known);
  if (known !== null) known.from = builder.couplings;

  // Underside: sources (isoflux), elsewhere h_u or adiabatic.
  const heated = new Uint8Array(nx * ny);
  const sourceFlux = new Float64Array(grid.sources.length);
  let heatIn = 0;
  grid.sources.forEach((b, s) => {
    sourceFlux[s] = sourceHeat(grid, b, problem.sources[s].power, rhs, heated);
    heatIn += problem.sources[s].power;
  });
  const hu = problem.hUnderside;
  if (hu !== null && hu > 0) faceLosses(terms, grid, problem.kPlate, hu, 0, heated, UNDERSIDE);

  // Fin footprints, then the exposed top.
  const footprintOwner = new Int32Array(nx * ny).fill(-1);
  grid.fins.forEach((b, f) => {
    for (let i = b.i0; i < b.i1; i++) for (let j = b.j0; j < b.j1; j++) footprintOwner[i * ny + j] = f;
  });
  if (problem.hPlate > 0)
    faceLosses(
      terms,
      grid,
      problem.kPlate,
      problem.hPlate,
      nz - 1,
      Uint8Array.from(footprintOwner, (f) => (f >= 0 ? 1 : 0)),
      PLATE_TOP,
    );

  // Fins and the lines of the line relaxation.
  const fins = finCells ? assembleFinCells(problem, grid, plateUnknowns, builder, terms) : assembleFinSheets(problem, grid, plateUnknowns, builder, terms);
  const lines = lineOrder(grid, fins, n);

  const levelGrid: SinkLevelGrid = {
    nx,
    ny,
    nz,
    dx: (x[nx] - x[0]) / nx,
    dy: (y[ny] - y[0]) / ny,
    dz: (z[nz] - z[0]) / nz,
    fins: grid.fins.map((b) => ({
      rows: problem.layout.finKind === 'pins' ? 1 : b.j1 - b.j0,
      layers: grid.ns,
      dy: (y[b.j1] - y[b.j0]) / Math.max(1, b.j1 - b.j0),
      ds: (grid.s[grid.ns] - grid.s[0]) / Math.max(1, grid.ns),
    })),
  };
  // Sheets are solved through the stencil (the multigrid's operator in CG): their CSR form is formed only if read.
  const matrix = known === null ? builder.toCsr() : deferredCsr(builder);
  return {
    grid,
    representation: finCells ? 'cells' : 'sheet',
    matrix,
    // Sheets: the unknowns are the multigrid's level grid, so the matrix is also held as its stencil.
    stencil: known === null ? null : stencilFromCouplings(levelGrid, builder.couplingList(), builder.diagonal, builder.excess, known),
    rhs,
    lines,
    levelGrid,
    fold: finCells ? foldCells(grid, plateUnknowns) : null,
    plateUnknowns,
    losses: terms.losses(),
    roots: terms.roots(),
    sourceFlux,
    footprintOwner,
    heatIn,
  };
}

/** The plate's conductances between neighbouring cells, (i, j, k) to (i+1, j, k), (i, j+1, k) and (i, j, k+1) in turn. */
function plateConduction(
  builder: ConductanceBuilder,
  grid: SinkGrid,
  kp: number,
  known: { line: Float64Array; gx: Float64Array; gy: Float64Array } | null,
): void {
  const { nx, ny, nz, x, y, z } = grid;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      for (let k = 0; k < nz; k++) {
        const p = (i * ny + j) * nz + k;
        if (i + 1 < nx) {
          const g = (kp * (y[j + 1] - y[j]) * (z[k + 1] - z[k])) / (0.5 * (x[i + 1] - x[i] + (x[i + 2] - x[i + 1])));
          builder.couple(p, ((i + 1) * ny + j) * nz + k, g);
          if (known !== null) known.gx[p] = g;
        }
        if (j + 1 < ny) {
          const g = (kp * (x[i + 1] - x[i]) * (z[k + 1] - z[k])) / (0.5 * (y[j + 1] - y[j] + (y[j + 2] - y[j + 1])));
          builder.couple(p, (i * ny + j + 1) * nz + k, g);
          if (known !== null) known.gy[p] = g;
        }
        if (k + 1 < nz) {
          const g = (kp * (x[i + 1] - x[i]) * (y[j + 1] - y[j])) / (0.5 * (z[k + 1] - z[k] + (z[k + 2] - z[k + 1])));
          builder.couple(p, p + 1, g);
          if (known !== null) known.line[p] = g;
        }
      }
    }
  }
}

/** One source's heat on its underside cells (q'' dx dy each, q'' = power / its cells' area); marks them heated; returns q''. */
function sourceHeat(grid: SinkGrid, b: SinkGrid['sources'][number], power: number, rhs: Float64Array, heated: Uint8Array): number {
  const { ny, nz, x, y } = grid;
  let area = 0;
  for (let i = b.i0; i < b.i1; i++) for (let j = b.j0; j < b.j1; j++) area += (x[i + 1] - x[i]) * (y[j + 1] - y[j]);
  const flux = power / area;
  for (let i = b.i0; i < b.i1; i++) {
    for (let j = b.j0; j < b.j1; j++) {
      rhs[(i * ny + j) * nz] += flux * (x[i + 1] - x[i]) * (y[j + 1] - y[j]);
      heated[i * ny + j] = 1;
    }
  }
  return flux;
}

/**
 * The losses of a plate face, layer k (0: the underside, nz − 1: the top), through h in series with the half cell,
 * on every column not `covered` (1: a heated underside cell, the top under a fin).
 */
function faceLosses(terms: TermLists, grid: SinkGrid, kp: number, h: number, k: number, covered: Uint8Array, owner: number): void {
  const { nx, ny, nz, x, y, z } = grid;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      if (covered[i * ny + j] === 1) continue;
      const a = (x[i + 1] - x[i]) * (y[j + 1] - y[j]);
      terms.loss((i * ny + j) * nz + k, h * a, (kp * a) / (0.5 * (z[k + 1] - z[k])), owner, 'linear');
    }
  }
}

/** The lines of the line relaxation: each plate column with the fin nodes above it (fins as cells), then the fins' own lines. */
function lineOrder(grid: SinkGrid, fins: FinAssembly, n: number): LineSet {
  const order = new Int32Array(n);
  const start: number[] = [0];
  const q = finLines(fins, order, plateLines(grid, fins, order, start), start);
  if (q !== n) throw new Error(`assembleSink: ${q} unknowns on lines, ${n} expected`);
  return { order, start: Int32Array.from(start) };
}

/** The plate columns' lines into `order` from 0; returns the next free place. */
function plateLines(grid: SinkGrid, fins: FinAssembly, order: Int32Array, start: number[]): number {
  const { nx, ny, nz } = grid;
  let q = 0;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      for (let k = 0; k < nz; k++) order[q++] = (i * ny + j) * nz + k;
      const above = fins.columnAbove(i, j);
      if (above !== null) for (const node of above) order[q++] = node;
      start.push(q);
    }
  }
  return q;
}

/** The fins' own lines into `order` from q; returns the next free place. */
function finLines(fins: FinAssembly, order: Int32Array, from: number, start: number[]): number {
  let q = from;
  for (const line of fins.lines) {
    for (const node of line) order[q++] = node;
    start.push(q);
  }
  return q;
}

/** Fins as cells: plate cells onto themselves, fin f's cell (i, j, l) onto sheet node (j, l) of fin f. */
function foldCells(grid: SinkGrid, plateUnknowns: number): Prolongation {
  const { ny, ns } = grid;
  let fine = plateUnknowns;
  for (const b of grid.fins) fine += (b.i1 - b.i0) * (b.j1 - b.j0) * ns;
  const rowStart = new Int32Array(fine + 1);
  const col = new Int32Array(fine);
  for (let r = 0; r < fine; r++) rowStart[r + 1] = r + 1;
  for (let p = 0; p < plateUnknowns; p++) col[p] = p;
  let r = plateUnknowns;
  let sheet = plateUnknowns;
  for (const b of grid.fins) {
    const rows = b.j1 - b.j0;
    for (let i = b.i0; i < b.i1; i++)
      for (let j = 0; j < ny; j++) for (let l = 0; l < ns; l++) if (j >= b.j0 && j < b.j1) col[r++] = sheet + (j - b.j0) * ns + l;
    sheet += rows * ns;
  }
  return { rowStart, col, val: new Float64Array(fine).fill(1), coarse: sheet };
}
