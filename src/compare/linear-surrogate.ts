/**
 * The one h (and one k) a hand calculation uses for a nonlinear fin, as a linear case the shortcuts
 * can take. Two common guesses:
 *   'base': h and k at the base temperature;
 *   'mean': h and k averaged over the fin at the temperatures of the reference solution
 *           (h area-weighted over the cooled faces, k weighted by the conducting volume).
 * Radiation enters as an equivalent coefficient on the excess over ambient,
 *   h_rad(T) = eps sigma (T^4 - T_s^4) / (T - T_amb)   (T, T_s, T_amb absolute, K),
 * so that h_rad theta is the radiated flux (the fin sees only its surroundings).
 * Power-law h: h(theta) = h_b (theta/theta_b)^n. Conductivity tables: linear between points, constant
 * beyond the ends (as the solver). Units: W/(m^2*K), W/(m*K), K.
 */
import type { Case, Conductivity, HDistribution } from '../case/index.js';
import { KELVIN_OFFSET, STEFAN_BOLTZMANN, type Fin1DResult } from '../fd/index.js';
import { isLinearFinCase, type LinearFinCase } from '../fd/index.js';

export type HGuess = 'base' | 'mean';

export const GUESS_LABEL: Record<HGuess, string> = {
  base: 'h and k at the base temperature',
  mean: 'h and k averaged over the solved fin',
};

export function conductivityAt(k: Conductivity, T_degC: number): number {
  if (k.kind === 'constant') return k.k;
  const T = k.T_degC;
  const n = T.length;
  if (T_degC <= (T[0] as number)) return k.k[0] as number;
  if (T_degC >= (T[n - 1] as number)) return k.k[n - 1] as number;
  let i = 0;
  while ((T[i + 1] as number) < T_degC) i++;
  const t = (T_degC - (T[i] as number)) / ((T[i + 1] as number) - (T[i] as number));
  return (k.k[i] as number) * (1 - t) + (k.k[i + 1] as number) * t;
}

/** Convective factor (theta/theta_b)^n of a power-law h; 1 for the linear kinds. */
function powerFactor(h: HDistribution, theta: number, thetaBase: number): number {
  return h.kind === 'power' ? Math.abs(theta / thetaBase) ** h.exponent : 1;
}

/** Equivalent radiative coefficient on the excess over ambient at excess theta, W/(m^2*K). */
function radiativeH(c: Case, theta: number): number {
  const eps = c.convection.emissivity;
  if (eps === 0) return 0;
  const Ta = c.convection.ambient_degC + KELVIN_OFFSET;
  const Ts = c.convection.surroundings_degC + KELVIN_OFFSET;
  const T = Ta + theta;
  const flux = eps * STEFAN_BOLTZMANN * (T ** 4 - Ts ** 4);
  // theta -> 0 with T_s = T_amb: the limit 4 eps sigma T^3.
  return Math.abs(theta) > 1e-9 ? flux / theta : 4 * eps * STEFAN_BOLTZMANN * T ** 3;
}

/** h with `extra` added everywhere and the temperature factor `factor` applied; a linear kind. */
function scaledH(h: HDistribution, factor: number, extra: number): Exclude<HDistribution, { kind: 'power' }> {
  switch (h.kind) {
    case 'uniform':
      return { kind: 'uniform', h: h.h * factor + extra };
    case 'linear':
      return { kind: 'linear', base: h.base * factor + extra, tip: h.tip * factor + extra };
    case 'points':
      return { kind: 'points', x: h.x, h: h.h.map((v) => v * factor + extra) };
    case 'power':
      return { kind: 'uniform', h: h.base * factor + extra };
    default: {
      const never: never = h;
      return never;
    }
  }
}

/**
 * The linear case of one guess. `ref` (the nonlinear reference) supplies the fin's temperatures for 'mean'
 * ('base' needs none: null).
 */
export function linearSurrogate(c: Case, guess: HGuess, ref: Fin1DResult | null): LinearFinCase {
  const thetaBase = c.base.T_degC - c.convection.ambient_degC;
  let factor: number;
  let hRad: number;
  let k: number;
  if (guess === 'base') {
    factor = 1;
    hRad = radiativeH(c, thetaBase);
    k = conductivityAt(c.material.k, c.base.T_degC);
  } else {
    if (ref === null) throw new Error('linearSurrogate: the fin-averaged guess needs the solved fin');
    const { mesh, theta } = ref;
    let s = 0;
    let sf = 0;
    let sr = 0;
    for (let i = 0; i < mesh.nodes; i++) {
      const w = mesh.cvSurface[i] as number;
      const th = theta[i] as number;
      s += w;
      sf += w * powerFactor(c.convection.h, th, thetaBase);
      sr += w * radiativeH(c, th);
    }
    factor = sf / s;
    hRad = sr / s;
    let v = 0;
    let sk = 0;
    for (let i = 0; i < mesh.nodes - 1; i++) {
      const w = (mesh.interfaceArea[i] as number) * (mesh.dx[i] as number);
      const T = ((theta[i] as number) + (theta[i + 1] as number)) / 2 + c.convection.ambient_degC;
      v += w;
      sk += w * conductivityAt(c.material.k, T);
    }
    k = sk / v;
  }
  const tip = c.convection.tip;
  return {
    ...c,
    material: { ...c.material, k: { kind: 'constant', k } },
    convection: {
      ...c.convection,
      h: scaledH(c.convection.h, factor, hRad),
      emissivity: 0,
      tip: tip.kind === 'convective' && tip.h !== null ? { kind: 'convective', h: tip.h + hRad } : tip,
    },
  };
}

/**
 * The single-h guesses the shortcuts of a fin are evaluated with: none for a linear fin (it has one h
 * and one k: null stands for the case itself), 'base' then 'mean' for a nonlinear fin.
 */
export function guessesFor(c: Case): readonly (HGuess | null)[] {
  return isLinearFinCase(c) ? [null] : ['base', 'mean'];
}

/** The linear case the shortcuts take: the case itself (guess null, a linear case), or a guess. */
export function shortcutCase(c: Case, guess: HGuess | null, ref: Fin1DResult): LinearFinCase {
  if (guess !== null) return linearSurrogate(c, guess, ref);
  if (!isLinearFinCase(c)) throw new Error('shortcutCase: a nonlinear fin needs a guess (guessesFor)');
  return c;
}

/**
 * The single h (W/(m^2*K)) of the base guess at the base temperature, over the cooled surface: its least
 * and largest value on the faces and a convective tip, and its value at the base. h θ_b is each surface's
 * flux at the base temperature (convection plus radiation as an equivalent h), so a negative h marks a
 * surface that would gain heat there: radiation from surroundings hotter than the fin outweighs convection.
 */
export function baseTemperatureH(c: Case): { least: number; largest: number; atBase: number } {
  const s = linearSurrogate(c, 'base', null);
  const h = s.convection.h;
  const faces = h.kind === 'uniform' ? [h.h] : h.kind === 'linear' ? [h.base, h.tip] : [...h.h];
  const tip = s.convection.tip;
  const values = tip.kind === 'convective' && tip.h !== null ? [...faces, tip.h] : faces;
  return { least: Math.min(...values), largest: Math.max(...values), atBase: faces[0] as number };
}
