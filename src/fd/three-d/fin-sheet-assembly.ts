/**
 * The fins of a sink as reduced conducting fields (representation 'sheet'), coupled to the plate.
 *
 * Plate fin f: a sheet in (y, s) of thickness t(s), thin-fin (temperature uniform across t), node (j, l) on
 * the plate's y rows and the fin's layers [s_l, s_l+1], centre c_l. With the integrals of fin-integrals.ts
 * (unit width: R = ∫ ds/t, S = ∫ t ds, H = ∫ h P ds, P = 2 faces):
 *   along the height   G = k_f dy_j / R(c_l, c_l+1)
 *   along the plate    G = k_f S(s_l, s_l+1) / (yc_j+1 − yc_j)
 *   faces              G = dy_j H(s_l, s_l+1) to the ambient
 *   tip (l last)       convective: 1 / (1/(h_tip t(L) dy_j) + R(c_l, L)/(k_f dy_j)); prescribed: k_f dy_j / R(c_l, L)
 *   root               plate top cell (i, j) under the footprint (width W): half cell k_p dx_i dy_j/(dz/2) in series
 *                      with the fin's share dx_i/W of its first half layer, k_f dy_j (dx_i/W) / R(0, c_0).
 * Pin f: one node per layer with A(s) = pi D(s)^2/4, P = pi D; the root spreads over the footprint square in
 * proportion to each cell's area. The fins' end faces at the plate's ends are adiabatic (no term).
 */
import type { SinkGrid } from '../../mesh/index.js';
import type { ConductanceBuilder } from '../linear-algebra/csr.js';
import { hAt } from '../problem/convection.js';
import { finIntegrals } from './fin-integrals.js';
import type { FinAssembly, TermLists } from './heat-terms.js';
import type { SinkProblem } from './sink-problem.js';

export function assembleFinSheets(problem: SinkProblem, grid: SinkGrid, firstNode: number, builder: ConductanceBuilder, terms: TermLists): FinAssembly {
  const lines: number[][] = [];
  const geometry = problem.finGeometry;
  if (geometry === null || grid.ns === 0) return { lines, columnAbove: () => null };
  const { ny, nz, ns, x, y, z, s } = grid;
  const kf = problem.kFin;
  const kp = problem.kPlate;
  const L = geometry.length;
  const integrals = finIntegrals(geometry, problem.h);
  const centre = (l: number) => 0.5 * (s[l] + s[l + 1]);
  // Per-layer quantities, shared by every row of every fin (unit width or one pin).
  const along = new Float64Array(ns);
  const layerArea = new Float64Array(ns);
  const layerConvection = new Float64Array(ns);
  for (let l = 0; l < ns; l++) {
    along[l] = l + 1 < ns ? kf / integrals.resistance(centre(l), centre(l + 1)) : 0;
    layerArea[l] = integrals.area(s[l], s[l + 1]);
    layerConvection[l] = integrals.convection(s[l], s[l + 1]);
  }
  const rootConductance = kf / integrals.resistance(0, centre(0));
  const tipHalf = kf / integrals.resistance(centre(ns - 1), L);
  const tipArea = geometry.tipArea;
  const tip = problem.tip;
  const theta = (T: number) => T - problem.ambient_degC;
  const pins = problem.layout.finKind === 'pins';
  const zTop = 0.5 * (z[nz] - z[nz - 1]);
  const plateTop = (i: number, j: number) => (i * ny + j) * nz + nz - 1;

  /** The layers of one row (width w: dy for a plate fin, 1 for a pin), nodes first .. first + ns − 1. */
  const column = (first: number, w: number, owner: number): void => {
    for (let l = 0; l < ns; l++) {
      const node = first + l;
      if (l + 1 < ns) builder.couple(node, node + 1, along[l] * w);
      terms.loss(node, layerConvection[l] * w, Infinity, owner, 'fin-h');
    }
    const last = first + ns - 1;
    switch (tip.kind) {
      case 'adiabatic':
        break;
      case 'convective': {
        const hTip = tip.h ?? hAt(problem.h, L, L);
        if (tipArea > 0 && hTip > 0) terms.loss(last, hTip * tipArea * w, tipHalf * w, owner, tip.h === null ? 'fin-h' : 'linear');
        break;
      }
      case 'temperature':
        terms.loss(last, Infinity, tipHalf * w, owner, 'linear', theta(tip.T_degC));
        break;
      default: {
        const never: never = tip;
        throw new Error(`unknown tip ${JSON.stringify(never)}`);
      }
    }
    lines.push(Array.from({ length: ns }, (_, l) => first + l));
  };

  let next = firstNode;
  grid.fins.forEach((b, f) => {
    let footprint = 0;
    for (let i = b.i0; i < b.i1; i++) for (let j = b.j0; j < (pins ? b.j1 : b.j0 + 1); j++) footprint += (x[i + 1] - x[i]) * (pins ? y[j + 1] - y[j] : 1);
    if (pins) {
      column(next, 1, f);
      for (let i = b.i0; i < b.i1; i++) {
        for (let j = b.j0; j < b.j1; j++) {
          const a = (x[i + 1] - x[i]) * (y[j + 1] - y[j]);
          terms.root(plateTop(i, j), next, (kp * a) / zTop, (rootConductance * a) / footprint, f);
        }
      }
      next += ns;
      return;
    }
    for (let j = b.j0; j < b.j1; j++) {
      const w = y[j + 1] - y[j];
      const first = next + (j - b.j0) * ns;
      column(first, w, f);
      if (j + 1 < b.j1) {
        const d = 0.5 * (y[j + 2] - y[j]);
        for (let l = 0; l < ns; l++) builder.couple(first + l, first + ns + l, (kf * layerArea[l]) / d);
      }
      for (let i = b.i0; i < b.i1; i++) {
        const wx = x[i + 1] - x[i];
        terms.root(plateTop(i, j), first, (kp * wx * w) / zTop, (rootConductance * w * wx) / footprint, f);
      }
    }
    next += (b.j1 - b.j0) * ns;
  });
  return { lines, columnAbove: () => null };
}
