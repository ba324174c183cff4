/**
 * How much the one-dimensional fin model over-predicts the heat rate, from the exact 2-D solution.
 *
 * Straight plate fin, adiabatic tip: the 2-D Laplace problem on 0 <= x <= L, -b <= y <= b with convective
 * faces has the separation-of-variables solution theta = sum a_n cos(lambda_n y / b) cosh(lambda_n (L - x)/b)
 * / cosh(lambda_n L / b), lambda_n tan lambda_n = Bi, Bi = h b / k (b = half-thickness). The axisymmetric pin
 * has the analogous Bessel series with lambda J1(lambda) = Bi J0(lambda), Bi = h R / k.
 * The tables below are err = q_1D / q_2D - 1 evaluated from those series in mpmath (series summed to 12
 * digits); the 1-D model is tanh(mL)/(mL) with m^2 = h / (k b) (plate) or 2 h / (k R) (pin).
 * Published treatments of the same error: Lau & Tan (1973), J. Heat Transfer 95(4), 549 (from memory).
 *
 * Used for the Biot flag when no 2-D solution is computed: bilinear interpolation in (ln Bi, mL),
 * linear in Bi below the table (err ~ c Bi, the small-Bi slope of the series), clamped in mL.
 */

const BI = [0.001, 0.01, 0.05, 0.1, 0.2, 0.5, 1, 2] as const;
const ML = [0.5, 1, 2, 4] as const;

/** Plate fin, adiabatic tip: 1-D error in percent; rows Bi, columns mL = 0.5, 1, 2, 4. */
const PLATE_PERCENT: readonly (readonly number[])[] = [
  [0.03, 0.026, 0.019, 0.017],
  [0.292, 0.249, 0.183, 0.16],
  [1.363, 1.188, 0.872, 0.756],
  [2.585, 2.297, 1.683, 1.45],
  [4.777, 4.384, 3.206, 2.737],
  [10.118, 10.005, 7.33, 6.126],
  [16.775, 18.041, 13.392, 10.903],
  [26.339, 31.088, 23.911, 18.783],
];

/** Cylindrical pin, adiabatic tip, Bi = hR/k: 1-D error in percent (the series table stops at Bi = 1). */
const PIN_PERCENT: readonly (readonly number[])[] = [
  [0.023, 0.019, 0.014, 0.012],
  [0.218, 0.186, 0.137, 0.119],
  [1.009, 0.883, 0.649, 0.562],
  [1.902, 1.703, 1.248, 1.075],
  [3.486, 3.237, 2.37, 2.023],
  [7.276, 7.334, 5.392, 4.511],
  [11.956, 13.121, 9.81, 8.014],
];

export interface OneDErrorEstimate {
  /** Estimated relative over-prediction of the 1-D heat rate (0.02 = 2 %). */
  error: number;
  /** False when Bi lies above the table: the value is then the table's last row (a lower bound). */
  withinTable: boolean;
  /** Which table was used. */
  basis: 'plate fin, exact 2-D series' | 'pin, exact axisymmetric series';
}

export function estimateOneDError(family: 'straight' | 'annular' | 'pin', biot: number, mL: number): OneDErrorEstimate {
  const pin = family === 'pin';
  const table = pin ? PIN_PERCENT : PLATE_PERCENT;
  const bis = BI.slice(0, table.length);
  const basis = pin ? 'pin, exact axisymmetric series' : 'plate fin, exact 2-D series';
  const mLc = Math.min(Math.max(mL, ML[0]), ML[ML.length - 1] as number);
  const atRow = (row: readonly number[]): number => interp1(ML, row, mLc);
  if (!(biot > 0)) return { error: 0, withinTable: true, basis };
  if (biot <= bis[0]!) {
    // Below the table the error is linear in Bi (small-Bi asymptote of the series).
    return { error: (atRow(table[0]!) / 100) * (biot / bis[0]!), withinTable: true, basis };
  }
  const last = bis.length - 1;
  if (biot >= bis[last]!) return { error: atRow(table[last]!) / 100, withinTable: biot === bis[last], basis };
  let j = 0;
  while (bis[j + 1]! < biot) j++;
  const t = (Math.log(biot) - Math.log(bis[j]!)) / (Math.log(bis[j + 1]!) - Math.log(bis[j]!));
  const e = (1 - t) * atRow(table[j]!) + t * atRow(table[j + 1]!);
  return { error: e / 100, withinTable: true, basis };
}

function interp1(xs: readonly number[], ys: readonly number[], x: number): number {
  for (let i = 0; i < xs.length - 1; i++) {
    const x0 = xs[i]!;
    const x1 = xs[i + 1]!;
    if (x <= x1) return ys[i]! + ((ys[i + 1]! - ys[i]!) * (x - x0)) / (x1 - x0);
  }
  return ys[ys.length - 1]!;
}
