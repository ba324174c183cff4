/**
 * Conduction operator of the 2-D fin section: vertex-centred finite volumes on a boundary-fitted grid.
 *
 * Equation: div(k r grad theta) = 0 in the section, theta = T - T_inf (K), k in W/(m*K), r the radius of
 * axisymmetric sections (r = 1 for the planar section of a straight fin, per metre of width).
 * Discrete form: each grid quadrilateral is split into two triangles (grid2d.ts); theta is linear in
 * each triangle, and the control volume of node p is its median-dual cell (the polygon joining the
 * triangle centroids and edge midpoints around p). The conductive heat leaving the control volume of
 * node a through the dual faces inside triangle T is
 *     sum_b K^T_ab theta_b,    K^T_ab = k r_T (e_a . e_b) / (4 |T|),
 * e_a the edge vector opposite vertex a, |T| the area, r_T the radius at the centroid (1 if planar).
 * This is the control-volume finite-element scheme of Baliga & Patankar (1980), "A new finite-element
 * formulation for convection-diffusion problems", Numer. Heat Transfer 3, 393-409 [from memory]; for
 * linear triangles and median-dual cells the flux integral equals the Galerkin form exactly
 * (Winslow 1966, J. Comput. Phys. 1, 149-172 [from memory]), so the matrix is symmetric and every row
 * sums to zero: conservation holds to round-off. On a rectangular grid it is the usual 5-point
 * vertex-centred finite-volume scheme (the hypotenuse couplings vanish); on sloped or graded cells the
 * diagonal couplings are the cross-derivative terms a boundary-fitted grid needs. Second order.
 * Units of the assembled coefficients: W/K per metre of width (planar) or per radian (axisymmetric).
 */
import { type Grid2D, radiusAt } from '../../mesh/index.js';
import { addCoupling, emptyStencil9, type Stencil9 } from '../linear-algebra/stencil9.js';

/**
 * The coincident nodes of a collapsed (sharp) tip are tied to each other by a conductance this many times
 * their own total coupling to the rest of the grid: the limit of the collapsing cells' conductance, which
 * grows without bound as their height goes to zero. Their temperatures then agree to ~1e-6 of the small
 * temperature differences around the tip point. A tie scaled to the largest coupling of the whole matrix
 * instead would lose the tip's own couplings (1e-8 of it on thin wedges) to round-off in the factorisation.
 */
const TIP_TIE_FACTOR = 1e6;

/**
 * Largest ratio of the conduction across a cell to the conduction along it (W/K to W/K). On a cell of
 * length D along the fin and height H across, the across conductance is k D / H and the along one k H / D:
 * their ratio (D / H)^2 grows without bound at a cusped tip, where the thickness vanishes faster than the
 * cells shorten (concave parabola: t ~ xi^2 at the distance xi from the tip; with the tip clustering of
 * grid2dSection.ts the last cells were 1e-7 m long and 1e-15 m high, a ratio of 1e16). The matrix is then
 * positive definite in exact arithmetic but not in doubles: the along-fin and convective conductances,
 * which decide the temperatures, fall below the round-off of the across ones in every factorisation or
 * Galerkin coarse operator (the banded Cholesky pivots went negative, multigrid CG returned NaN).
 * Such a cell is at one temperature across (its Biot number h H / k is ~1e-16 at the cusp), so its across
 * conductivity is lowered until the ratio is this bound; the cell still conducts across 1e6 times better
 * than along. The temperature difference across it, (D/H)^2 Bi_cell / 1e6 of the local excess, stays far
 * below the discretisation error (the heat rates of cusped fins that solved before moved by at most 1e-8,
 * relative, on 21 x 5 to 81 x 17 grids; their GCI is ~1e-5), and the operator stays symmetric, positive definite (each triangle's conductivity tensor
 * is) and conservative (zero row sums). 1e6 keeps ten digits of the small conductances in a factorisation.
 * Cells of ordinary grids (aspect D/H <= 1000) are unchanged.
 */
export const MAX_ACROSS_ALONG_RATIO = 1e6;

/**
 * Conductivity across a cell of length `along` and height `across` (m): k, or the value that caps the
 * across/along conductance ratio at MAX_ACROSS_ALONG_RATIO (W/(m*K)). A zero-height cell (collapsed tip)
 * keeps k: its triangles have no area and no couplings.
 */
export function acrossConductivity(k: number, along: number, across: number): number {
  if (!(across > 0)) return k;
  const ratio = (along / across) ** 2;
  return ratio > MAX_ACROSS_ALONG_RATIO ? (k * MAX_ACROSS_ALONG_RATIO) / ratio : k;
}

/** Conduction operator K (zero row sums), W/K per unit depth, for a uniform conductivity k (W/(m*K)). */
export function assembleConduction2D(grid: Grid2D, k: number): Stencil9 {
  const { nodesX: nx, nodesY: ny, x, y, diagonal, section } = grid;
  const K = emptyStencil9(nx, ny);
  // The two triangles' couplings of the current cell (k01, k12, k20): written in place, not an object per triangle
  // (13 000 of them on a 205 x 33 grid, garbage for the collector until V8 optimises the loop).
  const t1 = new Float64Array(3);
  const t2 = new Float64Array(3);
  // Local corners of cell (i, j): a = (i, j), b = (i+1, j), c = (i+1, j+1), d = (i, j+1).
  // Each couple of corners is one stencil entry: ab east[a], ad north[a], ac northEast[a], bc north[b],
  // dc east[d], db southEast[d].
  for (let i = 0; i + 1 < nx; i++) {
    for (let j = 0; j + 1 < ny; j++) {
      const a = i * ny + j;
      const b = a + ny;
      const c = b + 1;
      const d = a + 1;
      const kAcross = acrossConductivity(
        k,
        (x[b] as number) - (x[a] as number),
        Math.max((y[d] as number) - (y[a] as number), (y[c] as number) - (y[b] as number)),
      );
      if (diagonal[i * (ny - 1) + j] === 0) {
        // Triangles (a, b, c) and (a, c, d).
        triangleCouplings(x, y, a, b, c, k, kAcross, section, t1);
        triangleCouplings(x, y, a, c, d, k, kAcross, section, t2);
        K.east[a] = (K.east[a] as number) + (t1[0] as number);
        K.north[b] = (K.north[b] as number) + (t1[1] as number);
        K.northEast[a] = (K.northEast[a] as number) + (t1[2] as number) + (t2[0] as number);
        K.east[d] = (K.east[d] as number) + (t2[1] as number);
        K.north[a] = (K.north[a] as number) + (t2[2] as number);
        addDiagonals(K, a, b, c, t1);
        addDiagonals(K, a, c, d, t2);
      } else {
        // Triangles (a, b, d) and (b, c, d).
        triangleCouplings(x, y, a, b, d, k, kAcross, section, t1);
        triangleCouplings(x, y, b, c, d, k, kAcross, section, t2);
        K.east[a] = (K.east[a] as number) + (t1[0] as number);
        K.southEast[d] = (K.southEast[d] as number) + (t1[1] as number) + (t2[2] as number);
        K.north[a] = (K.north[a] as number) + (t1[2] as number);
        K.north[b] = (K.north[b] as number) + (t2[0] as number);
        K.east[d] = (K.east[d] as number) + (t2[1] as number);
        addDiagonals(K, a, b, d, t1);
        addDiagonals(K, b, c, d, t2);
      }
    }
  }
  if (grid.collapsedTip) {
    const i = nx - 1;
    let own = 0;
    for (let j = 0; j < ny; j++) own = Math.max(own, K.diag[i * ny + j] as number);
    const tie = TIP_TIE_FACTOR * own;
    for (let j = 0; j + 1 < ny; j++) {
      addCoupling(K, i, j, 0, 1, -tie);
      addCoupling(K, i, j, 0, 0, tie);
      addCoupling(K, i, j + 1, 0, 0, tie);
    }
  }
  return K;
}

/**
 * Couplings of triangle (p0, p1, p2) into out = [k01, k12, k20], W/K per unit depth; all zero for the zero-area
 * triangles of a collapsed tip.
 */
function triangleCouplings(
  x: Float64Array,
  y: Float64Array,
  p0: number,
  p1: number,
  p2: number,
  k: number,
  kAcross: number,
  section: Grid2D['section'],
  out: Float64Array,
): void {
  const x0 = x[p0] as number;
  const y0 = y[p0] as number;
  const x1 = x[p1] as number;
  const y1 = y[p1] as number;
  const x2 = x[p2] as number;
  const y2 = y[p2] as number;
  // Edge vectors opposite each vertex.
  const ex0 = x2 - x1;
  const ey0 = y2 - y1;
  const ex1 = x0 - x2;
  const ey1 = y0 - y2;
  const ex2 = x1 - x0;
  const ey2 = y1 - y0;
  const area = 0.5 * Math.abs(ex2 * -ey1 - ey2 * -ex1);
  // Only the collapsed tip has coincident vertices (exactly: then the cross product is exactly 0). A relative
  // threshold (area <= 1e-14 x longest edge^2) also dropped the real cells next to a cusp, which are that
  // thin (1e-26 m high and 1e-12 m long on a 5273 x 33 grid of a long concave fin): their nodes were
  // left without any coupling and the matrix singular.
  if (!(area > 0)) {
    out[0] = 0;
    out[1] = 0;
    out[2] = 0;
    return;
  }
  const r = radiusAt(section, (x0 + x1 + x2) / 3, (y0 + y1 + y2) / 3);
  // grad phi_a = (ey_a, -ex_a) / (2 |T|) rotated: the along-fin gradient comes from the y-components of the
  // edges, the across gradient from their x-components.
  const f = r / (4 * area);
  out[0] = f * (k * ey0 * ey1 + kAcross * ex0 * ex1);
  out[1] = f * (k * ey1 * ey2 + kAcross * ex1 * ex2);
  out[2] = f * (k * ey2 * ey0 + kAcross * ex2 * ex0);
}

/** Zero row sums: each vertex's diagonal is minus its couplings in the triangle (t = [k01, k12, k20]). */
function addDiagonals(K: Stencil9, p0: number, p1: number, p2: number, t: Float64Array): void {
  const k01 = t[0] as number;
  const k12 = t[1] as number;
  const k20 = t[2] as number;
  K.diag[p0] = (K.diag[p0] as number) - k01 - k20;
  K.diag[p1] = (K.diag[p1] as number) - k01 - k12;
  K.diag[p2] = (K.diag[p2] as number) - k12 - k20;
}
