/**
 * Spreading from isoflux rectangular sources on a rectangular plate: the separation-of-variables series of
 * Muzychka, Culham & Yovanovich (2003), "Thermal spreading resistance of eccentric heat sources on rectangular
 * flux channels", J. Electron. Packag. 125(2):178-185, superposed for several sources.
 *
 * Plate 0 < x < a, 0 < y < b, 0 < z < t, conductivity k (W/(m*K)); sources (centre Xc, Yc; size c x d, m; heat Q,
 * W) on z = 0, adiabatic elsewhere on z = 0 and on the four edges; -k dθ/dz = h θ on z = t (h in W/(m^2*K),
 * θ = T - T_ambient in K). With λ_m = mπ/a, δ_n = nπ/b, β_mn = sqrt(λ_m² + δ_n²) and
 *     φ(ζ) = (ζ tanh ζt + h/k) / (ζ + (h/k) tanh ζt),
 * the underside temperature is θ(x, y, 0) = A0 + Σ_m A_m cos λ_m x + Σ_n A_n cos δ_n y + Σ_m Σ_n A_mn cos λ_m x cos δ_n y,
 * each source adding
 *     A0   = Q (t/k + 1/h) / (a b)
 *     A_m  = 4 Q cos(λ_m Xc) sin(λ_m c/2) / (a b c k λ_m² φ(λ_m))          (A_n likewise in y)
 *     A_mn = 16 Q cos(λ_m Xc) sin(λ_m c/2) cos(δ_n Yc) sin(δ_n d/2) / (a b c d k β_mn λ_m δ_n φ(β_mn)).
 * The mean over a source (centre X, size C) replaces cos λ_m x by 2 cos(λ_m X) sin(λ_m C/2) / (λ_m C), and y likewise.
 * An interface resistance R'' (m^2*K/W) adds R'' Q / (c d) to its own source's mean.
 *
 * Truncation (M terms in x, N in y). Since |cos| ≤ 1, |sin| ≤ 1, φ(ζ) ≥ tanh(ζt) for h ≥ 0 (with u = tanh ζt and
 * v = h/(kζ), φ = (u + v)/(1 + uv) ≥ u), β ≥ λ_m and Σ_{m>M} m^-3 ≤ 1/(2M²), the terms left out in x are bounded, for
 * source i acting on the mean over source j, by
 *     single: 8 Q_i (a/π)³ / (a b c_i c_j k φ_M) / (2M²)
 *     double: 64 Q_i (a/π)³ (b/π)² (π²/6) / (a b c_i d_i c_j d_j k φ_M) / (2M²),   φ_M = tanh(λ_{M+1} t),
 * and likewise in y. The averaged terms fall off as 1/m³, so the left-out part falls as 1/M². M and N are chosen
 * so that each axis's bound is at most half of `relativeTolerance` times the plate-mean rise A0 (a lower bound of a
 * heated source's mean rise), up to `maxTermsPerAxis`; the bound reached is returned with the result.
 */
import { requireNonNegative, requirePositive } from './check.js';

export interface SpreadingPlate {
  /** a: extent in x, m. */
  width: number;
  /** b: extent in y, m. */
  length: number;
  /** t, m. */
  thickness: number;
  /** k, W/(m*K). */
  conductivity: number;
}

export interface SpreadingSource {
  /** [Xc, Yc], m. */
  centre: readonly [number, number];
  /** [c, d], m. */
  size: readonly [number, number];
  /** Q, W. */
  power: number;
  /** R'' per unit of source area, m^2*K/W (0 when absent). */
  contactResistance?: number;
}

export interface SpreadingSeriesInput {
  plate: SpreadingPlate;
  /** Uniform h on the face opposite the sources, W/(m^2*K), > 0. */
  h: number;
  sources: readonly SpreadingSource[];
  /**
   * Truncation bound per axis target, relative to the plate-mean rise A0 (default 1e-4: the bound is some 20 times
   * the actual truncation error in the checks of tests/analytic/spreading-series.test.ts, and 1e-4 is far below any
   * tolerance a shortcut is judged on).
   */
  relativeTolerance?: number;
  /** Most terms in x and in y (default 4000: 1.6e7 double-series terms at most). */
  maxTermsPerAxis?: number;
}

export interface SpreadingSeriesResult {
  /** Mean temperature rise over each source (its interface drop included), K. */
  sourceRise_K: number[];
  /** Rise of the plate's mean (A0), K: what a plate of infinite conductivity in-plane would give. */
  plateMeanRise_K: number;
  /** The interface drop of each source, K (included in sourceRise_K). */
  contactDrop_K: number[];
  /** Bound on the series' truncation error of each source's mean rise, K. */
  truncationBound_K: number[];
  /** Terms used: [M in x, N in y]. */
  terms: [number, number];
}

/** tanh(ζt) equals 1 in double precision beyond ζt ≈ 19.06 (1 - tanh = 2e^(-2ζt) < 2^-53). */
const TANH_ONE = 19.1;

function phi(zeta: number, t: number, hk: number): number {
  const th = zeta * t > TANH_ONE ? 1 : Math.tanh(zeta * t);
  return (zeta * th + hk) / (zeta + hk * th);
}

export function spreadingSeries(input: SpreadingSeriesInput): SpreadingSeriesResult {
  const where = 'spreadingSeries';
  const { width: a, length: b, thickness: t, conductivity: k } = input.plate;
  requirePositive(where, 'plate.width', a);
  requirePositive(where, 'plate.length', b);
  requirePositive(where, 'plate.thickness', t);
  requirePositive(where, 'plate.conductivity', k);
  requirePositive(where, 'h', input.h);
  if (input.sources.length === 0) throw new RangeError(`${where}: at least one source is needed`);
  for (const s of input.sources) {
    requirePositive(where, 'source size x', s.size[0]);
    requirePositive(where, 'source size y', s.size[1]);
    requireNonNegative(where, 'source power', s.power);
    requireNonNegative(where, 'source contactResistance', s.contactResistance ?? 0);
  }
  const h = input.h;
  const hk = h / k;
  const sources = input.sources;
  const count = sources.length;
  const totalPower = sources.reduce((sum, s) => sum + s.power, 0);
  const A0 = (totalPower * (t / k + 1 / h)) / (a * b);
  const relativeTolerance = input.relativeTolerance ?? 1e-4;
  const maxTerms = input.maxTermsPerAxis ?? 4000;

  // ---- term counts from the truncation bounds ----------------------------------------------------------------
  // boundCoefficient(axis) * 1/(2 M^2 phi_M) is the bound of the terms left out along that axis, for each target j.
  const coefficients = (axis: 0 | 1): number[] => {
    const [span, other] = axis === 0 ? [a, b] : [b, a];
    return sources.map((target) => {
      let sum = 0;
      for (const s of sources) {
        const single = (8 * s.power * (span / Math.PI) ** 3) / (a * b * s.size[axis] * target.size[axis] * k);
        const double =
          (64 * s.power * (span / Math.PI) ** 3 * (other / Math.PI) ** 2 * (Math.PI ** 2 / 6)) /
          (a * b * s.size[0] * s.size[1] * target.size[0] * target.size[1] * k);
        sum += single + double;
      }
      return sum;
    });
  };
  const target = relativeTolerance * A0 * 0.5;
  const termsFor = (axis: 0 | 1): number => {
    const span = axis === 0 ? a : b;
    const worst = Math.max(...coefficients(axis));
    let terms = maxTerms;
    for (let iteration = 0; iteration < 6; iteration++) {
      const phiM = Math.tanh((Math.PI * (Math.min(terms, maxTerms) + 1) * t) / span);
      const needed = Math.ceil(Math.sqrt(worst / (2 * phiM * target)));
      terms = Math.max(1, Math.min(maxTerms, needed));
    }
    return terms;
  };
  const M = totalPower > 0 ? termsFor(0) : 1;
  const N = totalPower > 0 ? termsFor(1) : 1;
  const boundX = coefficients(0).map((c) => c / (2 * M * M * Math.tanh((Math.PI * (M + 1) * t) / a)));
  const boundY = coefficients(1).map((c) => c / (2 * N * N * Math.tanh((Math.PI * (N + 1) * t) / b)));

  // ---- per-source factors --------------------------------------------------------------------------------------
  const lambda = Float64Array.from({ length: M }, (_, i) => ((i + 1) * Math.PI) / a);
  const delta = Float64Array.from({ length: N }, (_, i) => ((i + 1) * Math.PI) / b);
  // g[i][m] = cos(λ Xc_i) sin(λ c_i/2); mean factor f[j][m] = 2 cos(λ X_j) sin(λ C_j/2) / (λ C_j) = 2 g[j][m] / (λ C_j).
  const gx = sources.map((s) => lambda.map((l) => Math.cos(l * s.centre[0]) * Math.sin((l * s.size[0]) / 2)));
  const gy = sources.map((s) => delta.map((d) => Math.cos(d * s.centre[1]) * Math.sin((d * s.size[1]) / 2)));
  const fx = sources.map((s, j) => lambda.map((l, m) => (2 * (gx[j]?.[m] ?? 0)) / (l * s.size[0])));
  const fy = sources.map((s, j) => delta.map((d, n) => (2 * (gy[j]?.[n] ?? 0)) / (d * s.size[1])));

  const rise = new Float64Array(count).fill(A0);
  // Single series in x and in y.
  for (let m = 0; m < M; m++) {
    const l = lambda[m] ?? 0;
    let Am = 0;
    sources.forEach((s, i) => (Am += (4 * s.power * (gx[i]?.[m] ?? 0)) / (a * b * s.size[0] * k * l * l)));
    Am /= phi(l, t, hk);
    for (let j = 0; j < count; j++) rise[j] = (rise[j] ?? 0) + Am * (fx[j]?.[m] ?? 0);
  }
  for (let n = 0; n < N; n++) {
    const d = delta[n] ?? 0;
    let An = 0;
    sources.forEach((s, i) => (An += (4 * s.power * (gy[i]?.[n] ?? 0)) / (a * b * s.size[1] * k * d * d)));
    An /= phi(d, t, hk);
    for (let j = 0; j < count; j++) rise[j] = (rise[j] ?? 0) + An * (fy[j]?.[n] ?? 0);
  }
  // Double series: u[i][m] v[i][n] / (β φ(β)) summed over sources i, then averaged over each target j.
  // Flat typed arrays (index i * N + n) keep the M x N loop fast.
  const v = new Float64Array(count * N);
  const fyFlat = new Float64Array(count * N);
  for (let i = 0; i < count; i++) {
    for (let n = 0; n < N; n++) {
      v[i * N + n] = (gy[i]?.[n] ?? 0) / (delta[n] ?? 1);
      fyFlat[i * N + n] = fy[i]?.[n] ?? 0;
    }
  }
  const deltaSquared = delta.map((d) => d * d);
  const row = new Float64Array(count * count);
  for (let m = 0; m < M; m++) {
    const l = lambda[m] ?? 0;
    const l2 = l * l;
    row.fill(0);
    for (let n = 0; n < N; n++) {
      const beta = Math.sqrt(l2 + (deltaSquared[n] ?? 0));
      const w = 1 / (beta * phi(beta, t, hk));
      for (let i = 0; i < count; i++) {
        const vin = (v[i * N + n] ?? 0) * w;
        for (let j = 0; j < count; j++) row[i * count + j] = (row[i * count + j] ?? 0) + vin * (fyFlat[j * N + n] ?? 0);
      }
    }
    for (let i = 0; i < count; i++) {
      const s = sources[i];
      if (s === undefined) continue;
      const uim = (16 * s.power * (gx[i]?.[m] ?? 0)) / (a * b * s.size[0] * s.size[1] * k * l);
      for (let j = 0; j < count; j++) rise[j] = (rise[j] ?? 0) + uim * (fx[j]?.[m] ?? 0) * (row[i * count + j] ?? 0);
    }
  }

  const contactDrop_K = sources.map((s) => ((s.contactResistance ?? 0) * s.power) / (s.size[0] * s.size[1]));
  return {
    sourceRise_K: Array.from(rise, (r, j) => r + (contactDrop_K[j] ?? 0)),
    plateMeanRise_K: A0,
    contactDrop_K,
    truncationBound_K: sources.map((_, j) => (boundX[j] ?? 0) + (boundY[j] ?? 0)),
    terms: [M, N],
  };
}
