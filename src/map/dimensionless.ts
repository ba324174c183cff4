/**
 * The two numbers that place a fin on the textbook's charts, computed as `fincheck check` computes them for its
 * flags (src/compare/check.ts):
 *   Bi = h_b (s_b / 2) / k   Biot number across the thickness at the base, s_b = base thickness (straight and
 *                            annular fins) or base diameter (pins), h_b = h at the base (case-format.md);
 *   mL = sqrt(h P / (k A)) L of the equivalent uniform fin (mean section A, mean perimeter P, area-weighted mean
 *                            h; equivalent.ts), the fin parameter m of Harper & Brown (1922) times the length.
 * Both dimensionless.
 */
import type { LinearFinCase } from '../fd/linear-case.js';
import { equivalentUniformFin } from '../compare/equivalent.js';
import { finGeometry } from '../mesh/geometry1d.js';

export function biotAndML(c: LinearFinCase): { biot: number; mL: number } {
  const geometry = finGeometry(c);
  const eq = equivalentUniformFin(c, geometry);
  return {
    biot: (eq.hBase * geometry.size(0)) / 2 / eq.k,
    mL: Math.sqrt((eq.h * eq.P) / (eq.k * eq.A)) * eq.length,
  };
}
