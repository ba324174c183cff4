/**
 * Rectangular plate fins as full 3-D cells (representation 'cells'), the reference against which the sheet
 * reduction's drift is measured on small sinks. Fin cell (i, j, l): the plate's x and y cells under the footprint
 * (i0 <= i < i1), the fin's layers [s_l, s_l+1] above the plate; conductances k_f A / d between neighbours
 * (the plate's z column continues up through the fin), the two side faces (x = footprint edges) convecting with
 * h(s) through a half cell, 1 / (1/(dy H_l/2) + (dx/2)/(k_f dy ds_l)) (H_l/2: one face of the unit-width layer),
 * the tip face with the tip condition, the end faces adiabatic, and each fin cell on the plate top cell below it
 * through two half cells in series, k_p dx dy/(dz/2) and k_f dx dy/(ds_0/2).
 */
import type { SinkGrid } from '../../mesh/index.js';
import { ModelNotApplicableError } from '../../errors.js';
import type { ConductanceBuilder } from '../linear-algebra/csr.js';
import { hAt } from '../problem/convection.js';
import { finIntegrals } from './fin-integrals.js';
import type { FinAssembly, TermLists } from './heat-terms.js';
import type { SinkProblem } from './sink-problem.js';

export function assembleFinCells(problem: SinkProblem, grid: SinkGrid, firstNode: number, builder: ConductanceBuilder, terms: TermLists): FinAssembly {
  const geometry = problem.finGeometry;
  if (geometry === null || grid.ns === 0) return { lines: [], columnAbove: () => null };
  if (geometry.tipTaperExponent !== 0 || Math.abs(geometry.area(0) - geometry.area(geometry.length)) > 1e-12 * geometry.area(0)) {
    throw new ModelNotApplicableError('fd-3d', 'fins as full 3-D cells are built for rectangular plate fins only');
  }
  const { nx, ny, nz, ns, x, y, z, s } = grid;
  const kf = problem.kFin;
  const kp = problem.kPlate;
  const L = geometry.length;
  const integrals = finIntegrals(geometry, problem.h);
  const tip = problem.tip;
  const theta = (T: number) => T - problem.ambient_degC;
  const ds = (l: number) => s[l + 1] - s[l];
  const dx = (i: number) => x[i + 1] - x[i];
  const dy = (j: number) => y[j + 1] - y[j];
  const base = new Int32Array(nx * ny).fill(-1);
  let next = firstNode;
  grid.fins.forEach((b, f) => {
    const node = (i: number, j: number, l: number) => next + ((i - b.i0) * ny + j) * ns + l;
    for (let i = b.i0; i < b.i1; i++) {
      for (let j = b.j0; j < b.j1; j++) {
        base[i * ny + j] = node(i, j, 0);
        const a = dx(i) * dy(j);
        terms.root((i * ny + j) * nz + nz - 1, node(i, j, 0), (kp * a) / (0.5 * (z[nz] - z[nz - 1])), (kf * a) / (0.5 * ds(0)), f);
        for (let l = 0; l < ns; l++) {
          const p = node(i, j, l);
          if (l + 1 < ns) builder.couple(p, p + 1, (kf * a) / (0.5 * (ds(l) + ds(l + 1))));
          if (i + 1 < b.i1) builder.couple(p, node(i + 1, j, l), (kf * dy(j) * ds(l)) / (0.5 * (dx(i) + dx(i + 1))));
          if (j + 1 < b.j1) builder.couple(p, node(i, j + 1, l), (kf * dx(i) * ds(l)) / (0.5 * (dy(j) + dy(j + 1))));
          const face = 0.5 * dy(j) * integrals.convection(s[l], s[l + 1]);
          const half = (0.5 * dx(i)) / (kf * dy(j) * ds(l));
          if (i === b.i0) terms.loss(p, face, 1 / half, f, 'fin-h');
          if (i === b.i1 - 1) terms.loss(p, face, 1 / half, f, 'fin-h');
        }
        const top = node(i, j, ns - 1);
        const tipHalf = (kf * a) / (0.5 * ds(ns - 1));
        switch (tip.kind) {
          case 'adiabatic':
            break;
          case 'convective': {
            const hTip = tip.h ?? hAt(problem.h, L, L);
            if (hTip > 0) terms.loss(top, hTip * a, tipHalf, f, tip.h === null ? 'fin-h' : 'linear');
            break;
          }
          case 'temperature':
            terms.loss(top, Infinity, tipHalf, f, 'linear', theta(tip.T_degC));
            break;
          default: {
            const never: never = tip;
            throw new Error(`unknown tip ${JSON.stringify(never)}`);
          }
        }
      }
    }
    next += (b.i1 - b.i0) * (b.j1 - b.j0) * ns;
  });
  return {
    lines: [],
    columnAbove: (i, j) => {
      const first = base[i * ny + j];
      return first < 0 ? null : Array.from({ length: ns }, (_, l) => first + l);
    },
  };
}
