/**
 * One fin of a heat sink as a single-fin case, for the 1-D fin models the array shortcuts use: the array's
 * profile (plate fins run the plate's length, so their width is plate.length), the fins' material, h and tip, and
 * the root at a given excess temperature. A plate fin's two end faces (at the plate's ends) are adiabatic
 * (heat-sink.md), which is the single-fin format's `edges: insulated`.
 */
import type { Case, Conductivity, HeatSinkCase, Material } from '../case/index.js';

/** The fin of `c` as a single-fin case with its root `thetaRoot` K above ambient; null for a bare plate. */
export function sinkFinCase(c: HeatSinkCase, thetaRoot: number): Case | null {
  if (c.fin === null) return null;
  return {
    name: `${c.name}: one fin`,
    fin: { profile: c.fin.profile, edges: 'insulated' },
    material: c.fin.material,
    convection: {
      ambient_degC: c.convection.ambient_degC,
      h: c.convection.h,
      tip: c.convection.tip,
      emissivity: 0,
      surroundings_degC: c.convection.ambient_degC,
    },
    base: { T_degC: c.convection.ambient_degC + thetaRoot, contactResistance: 0 },
  };
}

/** k at temperature T (degC): the constant, or the table linear between points and held beyond its ends. */
export function conductivityAt(k: Conductivity, T_degC: number): number {
  if (k.kind === 'constant') return k.k;
  const n = k.T_degC.length;
  if (T_degC <= (k.T_degC[0] ?? 0)) return k.k[0] ?? 0;
  for (let i = 1; i < n; i++) {
    const T1 = k.T_degC[i] ?? 0;
    if (T_degC <= T1) {
      const T0 = k.T_degC[i - 1] ?? 0;
      const k0 = k.k[i - 1] ?? 0;
      return k0 + (((k.k[i] ?? 0) - k0) * (T_degC - T0)) / (T1 - T0);
    }
  }
  return k.k[n - 1] ?? 0;
}

/** The material with its conductivity fixed at T (degC): what a hand calculation with one k uses. */
export function materialAt(material: Material, T_degC: number): Material & { k: { kind: 'constant'; k: number } } {
  return { ...material, k: { kind: 'constant', k: conductivityAt(material.k, T_degC) } };
}
